package org.telltale.connect;

import java.util.List;
import org.telltale.model.ScoreMatrix;
import org.telltale.model.TextClassifier;

/**
 * Scores a batch with a model in this JVM (a built-in model file). Its answers go through the same
 * validation as a remote model's, which costs little and catches a corrupt model file.
 */
final class InProcessScorer implements BatchScorer {
    private final TextClassifier model;

    InProcessScorer(TextClassifier model) {
        this.model = model;
    }

    @Override
    public RawScores score(List<String> texts) {
        ScoreMatrix m = model.score(texts);
        return new RawScores(m.labels(), m.rows(), m.toString());
    }

    @Override
    public String describe() {
        return model.describe();
    }

    @Override
    public void close() {
        model.close();
    }
}
