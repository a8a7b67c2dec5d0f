package org.telltale.audit;

import java.util.List;
import java.util.Map;
import org.telltale.model.NaiveBayesModel;
import org.telltale.model.NaiveBayesTrainer;
import org.telltale.model.TermCounter;
import org.telltale.model.TrainingSet;
import org.telltale.text.Document;

/** Built-in models trained in the tests through the models' own Java API. */
public final class TrainedModels {
    private TrainedModels() {
    }

    /** Multinomial naive Bayes with Laplace smoothing over the standard analyzer's terms. */
    public static NaiveBayesModel naiveBayes(List<Document> docs) {
        TermCounter counter = new TermCounter("standard", 1);
        List<Map<String, Integer>> counts = docs.stream().map(d -> counter.count(d.text())).toList();
        TrainingSet data = TrainingSet.of(counts, docs.stream().map(Document::label).toList());
        return new NaiveBayesTrainer(1.0).fit(data, counter, null);
    }
}
