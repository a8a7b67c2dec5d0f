package org.telltale.model;

import java.util.ArrayList;
import java.util.BitSet;
import java.util.List;
import java.util.SplittableRandom;
import org.telltale.text.Masker;
import org.telltale.text.TermIndex;

/**
 * Scores the masks of one document for a built-in model from term counts instead of texts: a
 * mask's known-feature counts are the document's counts minus what each removed unit takes away,
 * and the model scores those counts with the same arithmetic, in the same order, as it scores a
 * text ({@link BuiltinModel#linearScores(int[], double[], int)}). Equal counts therefore give
 * equal logits to the last bit.
 *
 * <p>What a unit takes away is not assumed: {@link #prepare} masks the document once per unit,
 * with that unit alone removed, and analyses the text as the model would. That the removals add
 * up (no two removed units' cuts join or split the terms around them) is then checked on masks
 * that remove many units at once: all of them, every other one, and a few at random. A document
 * where any check differs, where a cut makes a known term appear or grow, or a model with bigrams
 * (whose counts are not additive in removed units) is declined, and its probes go through the
 * text. Preparing costs {@code d + 1 + CHECKS} analyses of the text.
 *
 * <p>Not thread-safe: one instance per document (it keeps scratch arrays).
 */
final class MaskedCounts implements MaskScorer {
    /** Random masks checked beside "all", "even" and "odd". */
    static final int RANDOM_CHECKS = 8;
    /** The masks {@link #prepare} analyses beyond the document and each unit alone. */
    static final int CHECKS = RANDOM_CHECKS + 3;

    private final BuiltinModel model;
    private final int[] columns; // the document's known vocabulary columns, ascending
    private final int[] counts; // their counts in the document
    private final int[][] at; // per unit: the positions in `columns` it takes counts from
    private final int[][] taken; // per unit: how many it takes there
    private final int[] left;
    private final int[] keptColumns;
    private final double[] keptValues;

    private MaskedCounts(BuiltinModel model, int[] columns, int[] counts, int[][] at, int[][] taken) {
        this.model = model;
        this.columns = columns;
        this.counts = counts;
        this.at = at;
        this.taken = taken;
        this.left = new int[columns.length];
        this.keptColumns = new int[columns.length];
        this.keptValues = new double[columns.length];
    }

    /** The scorer for {@code index}'s masks, or {@code null} when its counts are not additive in removed units. */
    static MaskedCounts prepare(BuiltinModel model, TermIndex index, Masker masker) {
        if (model.ngrams() != 1) {
            return null;
        }
        int d = index.size();
        SparseCounts whole = model.counts(index.text());
        int[] columns = whole.columns();
        int[] counts = new int[columns.length];
        for (int k = 0; k < counts.length; k++) {
            counts[k] = (int) whole.values()[k];
        }
        int[][] at = new int[d][];
        int[][] taken = new int[d][];
        BitSet alone = new BitSet(d);
        for (int u = 0; u < d; u++) {
            alone.clear();
            alone.set(u);
            SparseCounts without = model.counts(masker.mask(index, alone));
            if (!takeAway(columns, counts, without, u, at, taken)) {
                return null;
            }
        }
        MaskedCounts scorer = new MaskedCounts(model, columns, counts, at, taken);
        for (BitSet mask : checks(d, index.text().hashCode())) {
            if (!scorer.matches(mask, model.counts(masker.mask(index, mask)))) {
                return null;
            }
        }
        return scorer;
    }

    /**
     * Records what unit {@code u} takes away: the document's counts minus {@code without}'s.
     * False when {@code without} has a column the document lacks or more of one.
     */
    private static boolean takeAway(int[] columns, int[] counts, SparseCounts without, int u, int[][] at,
            int[][] taken) {
        int[] wc = without.columns();
        double[] wv = without.values();
        int[] positions = new int[columns.length];
        int[] amounts = new int[columns.length];
        int n = 0;
        int w = 0;
        for (int k = 0; k < columns.length; k++) {
            int rest = 0;
            if (w < wc.length && wc[w] == columns[k]) {
                rest = (int) wv[w++];
            }
            if (rest > counts[k]) {
                return false;
            }
            if (rest < counts[k]) {
                positions[n] = k;
                amounts[n++] = counts[k] - rest;
            }
        }
        if (w != wc.length) {
            return false; // a known term the document does not have appeared
        }
        at[u] = java.util.Arrays.copyOf(positions, n);
        taken[u] = java.util.Arrays.copyOf(amounts, n);
        return true;
    }

    /** The masks that must add up: every unit, every other unit each way, and some at random. */
    private static List<BitSet> checks(int d, long seed) {
        List<BitSet> out = new ArrayList<>(CHECKS);
        BitSet all = new BitSet(d);
        all.set(0, d);
        out.add(all);
        for (int parity = 0; parity < 2; parity++) {
            BitSet alternate = new BitSet(d);
            for (int u = parity; u < d; u += 2) {
                alternate.set(u);
            }
            out.add(alternate);
        }
        SplittableRandom random = new SplittableRandom(seed);
        for (int c = 0; c < RANDOM_CHECKS; c++) {
            double share = (c + 1.0) / (RANDOM_CHECKS + 1);
            BitSet mask = new BitSet(d);
            for (int u = 0; u < d; u++) {
                if (random.nextDouble() < share) {
                    mask.set(u);
                }
            }
            out.add(mask);
        }
        return out;
    }

    /** True when this scorer's counts for {@code removed} are {@code analysed}, column for column. */
    private boolean matches(BitSet removed, SparseCounts analysed) {
        int n = countsOf(removed);
        if (n < 0 || n != analysed.nonZeros()) {
            return false;
        }
        for (int k = 0; k < n; k++) {
            if (keptColumns[k] != analysed.columns()[k] || keptValues[k] != analysed.values()[k]) {
                return false;
            }
        }
        return true;
    }

    /** Fills the kept columns and counts of mask {@code removed}; their number, or -1 when a count went below zero. */
    private int countsOf(BitSet removed) {
        System.arraycopy(counts, 0, left, 0, counts.length);
        for (int u = removed.nextSetBit(0); u >= 0 && u < at.length; u = removed.nextSetBit(u + 1)) {
            int[] positions = at[u];
            int[] amounts = taken[u];
            for (int e = 0; e < positions.length; e++) {
                left[positions[e]] -= amounts[e];
            }
        }
        int n = 0;
        for (int k = 0; k < left.length; k++) {
            if (left[k] < 0) {
                return -1;
            }
            if (left[k] > 0) {
                keptColumns[n] = columns[k];
                keptValues[n++] = left[k];
            }
        }
        return n;
    }

    @Override
    public ScoreMatrix score(List<BitSet> removed) {
        double[][] rows = new double[removed.size()][];
        double[][] logits = new double[removed.size()][];
        for (int i = 0; i < rows.length; i++) {
            int n = countsOf(removed.get(i));
            if (n < 0) {
                throw new IllegalStateException("a mask removed more of a term than the document has;"
                        + " the checked removals did not add up for this mask");
            }
            logits[i] = model.linearScores(keptColumns, keptValues, n);
            rows[i] = Softmax.of(logits[i]);
        }
        return new ScoreMatrix(model.labels(), rows, logits);
    }
}
