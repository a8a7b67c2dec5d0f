package org.telltale.model;

import java.util.ArrayList;
import java.util.List;
import java.util.Map;

/** Builds small models from texts and labels written in a test. */
final class ModelTesting {
    private ModelTesting() {
    }

    /** Texts and labels alternate: text, label, text, label, … */
    static TrainingSet trainingSet(TermCounter counter, String... textsAndLabels) {
        List<Map<String, Integer>> counts = new ArrayList<>();
        List<String> gold = new ArrayList<>();
        for (int i = 0; i < textsAndLabels.length; i += 2) {
            counts.add(counter.count(textsAndLabels[i]));
            gold.add(textsAndLabels[i + 1]);
        }
        return TrainingSet.of(counts, gold);
    }

    static NaiveBayesModel bayes(String analyzer, String... textsAndLabels) {
        TermCounter counter = new TermCounter(analyzer, 1);
        return new NaiveBayesTrainer(1.0).fit(trainingSet(counter, textsAndLabels), counter, null);
    }
}
