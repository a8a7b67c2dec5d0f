package org.telltale.connect;

import java.util.List;
import org.telltale.model.ScoreMatrix;
import org.telltale.model.TextClassifier;

/**
 * Scores a batch with a model in this JVM (a built-in model file). Its answers go through the same
 * validation as a remote model's, which costs little and catches a corrupt model file. With
 * {@code logits}, it hands on the model's logits (built-in models have them), and the validator
 * turns them into probabilities while keeping them for the explainer.
 */
final class InProcessScorer implements BatchScorer {
    private final TextClassifier model;
    private final boolean logits;

    InProcessScorer(TextClassifier model, boolean logits) {
        this.model = model;
        this.logits = logits;
    }

    @Override
    public RawScores score(List<String> texts) {
        ScoreMatrix m = model.score(texts);
        if (logits && !m.hasLogits()) {
            throw new IllegalStateException(model.describe() + " answered no logits");
        }
        return new RawScores(m.labels(), logits ? m.logits() : m.rows(), m.toString());
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
