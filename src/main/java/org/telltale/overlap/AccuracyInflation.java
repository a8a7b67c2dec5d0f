package org.telltale.overlap;

import java.util.ArrayList;
import java.util.List;
import java.util.Set;
import org.telltale.model.ScoreMatrix;
import org.telltale.model.TextClassifier;
import org.telltale.text.Document;

/**
 * Scores the labelled test documents with a model and splits its accuracy into the documents the
 * model has already seen in train (an exact or near duplicate) and the rest. The difference is how
 * much the overlap inflates the accuracy a user would report.
 */
public final class AccuracyInflation {
    /** Texts per call; connectors batch and parallelise inside one call. */
    static final int CHUNK = 2048;

    private AccuracyInflation() {
    }

    public static Inflation measure(TextClassifier model, DocumentSource test, Set<String> seenTestIds) {
        long[] counts = new long[4]; // labelled, correct, labelledUnseen, correctUnseen
        List<Document> chunk = new ArrayList<>(CHUNK);
        test.forEach(doc -> {
            if (doc.label() == null) {
                return;
            }
            chunk.add(doc);
            if (chunk.size() == CHUNK) {
                score(model, chunk, seenTestIds, counts);
                chunk.clear();
            }
        });
        if (!chunk.isEmpty()) {
            score(model, chunk, seenTestIds, counts);
        }
        return new Inflation(model.describe(), counts[0], counts[1], counts[2], counts[3]);
    }

    private static void score(TextClassifier model, List<Document> docs, Set<String> seen, long[] counts) {
        List<String> texts = new ArrayList<>(docs.size());
        for (Document doc : docs) {
            texts.add(doc.text());
        }
        ScoreMatrix scores = model.score(texts);
        if (scores.size() != docs.size()) {
            throw new org.telltale.TelltaleException(model.describe() + " returned " + scores.size()
                    + " score rows for " + docs.size() + " texts (from " + docs.get(0).describe() + ")");
        }
        for (int i = 0; i < docs.size(); i++) {
            Document doc = docs.get(i);
            boolean correct = doc.label().equals(scores.predicted(i));
            boolean unseen = !seen.contains(doc.id());
            counts[0]++;
            counts[1] += correct ? 1 : 0;
            counts[2] += unseen ? 1 : 0;
            counts[3] += unseen && correct ? 1 : 0;
        }
    }
}
