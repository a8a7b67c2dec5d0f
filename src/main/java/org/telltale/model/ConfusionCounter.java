package org.telltale.model;

import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Map;

/**
 * Counts (gold, predicted) pairs one document at a time, so a corpus can be evaluated while it
 * streams past. Gold labels the model does not know are added as extra rows and columns, never
 * dropped. Not thread-safe.
 */
public final class ConfusionCounter {
    private final List<String> labels = new ArrayList<>();
    private final Map<String, Integer> index = new HashMap<>();
    private final Map<Long, Long> cells = new HashMap<>();

    /** @param modelLabels the classifier's labels, in score-column order */
    public ConfusionCounter(List<String> modelLabels) {
        modelLabels.forEach(this::indexOf);
    }

    private int indexOf(String label) {
        return index.computeIfAbsent(label, l -> {
            labels.add(l);
            return labels.size() - 1;
        });
    }

    public void add(String gold, String predicted) {
        long key = ((long) indexOf(gold) << 32) | indexOf(predicted);
        cells.merge(key, 1L, Long::sum);
    }

    /** Whether any pair was counted. */
    public boolean isEmpty() {
        return cells.isEmpty();
    }

    public Evaluation result() {
        int n = labels.size();
        long[][] counts = new long[n][n];
        cells.forEach((key, count) -> counts[(int) (key >>> 32)][(int) (key & 0xffffffffL)] = count);
        return new Evaluation(labels, counts);
    }
}
