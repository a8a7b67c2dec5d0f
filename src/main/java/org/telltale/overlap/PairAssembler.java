package org.telltale.overlap;

import java.util.ArrayList;
import java.util.BitSet;
import java.util.Comparator;
import java.util.HashMap;
import java.util.List;
import java.util.Map;

/**
 * Turns exact groups and verified near pairs of representatives into document pairs, and counts
 * them. A near pair of two representatives stands for every pair of their groups' members.
 */
final class PairAssembler {
    private final DocumentTable table;
    private final int[] rep;
    private final int[] head;
    private final int[] next;

    private record Raw(int x, int y, double similarity, boolean exact) {
    }

    PairAssembler(DocumentTable table, int[] rep) {
        this.table = table;
        this.rep = rep;
        int n = table.size();
        head = new int[n];
        next = new int[n];
        java.util.Arrays.fill(head, -1);
        // Built backwards so that each member list runs in reading order.
        for (int i = n - 1; i >= 0; i--) {
            next[i] = head[rep[i]];
            head[rep[i]] = i;
        }
    }

    /** Documents in exact groups of two or more: their texts are wanted for the HTML view. */
    BitSet groupedDocuments() {
        BitSet grouped = new BitSet(table.size());
        for (int i = 0; i < table.size(); i++) {
            if (next[head[rep[i]]] >= 0) {
                grouped.set(i);
            }
        }
        return grouped;
    }

    /** The corpus-wide counts of the summary: the table may hold only the documents in pairs. */
    record Counts(long train, long test, long trainEmpty, long testEmpty, long candidates) {
        static Counts of(DocumentTable table, long candidates) {
            long trainEmpty = table.empty.get(0, Math.max(0, table.trainCount)).cardinality();
            return new Counts(table.trainCount, table.size() - table.trainCount, trainEmpty,
                    table.empty.cardinality() - trainEmpty, candidates);
        }
    }

    OverlapResult assemble(String trainName, String testName, OverlapSettings settings, VerificationPass.Verified verified,
                           Counts counts) {
        List<Raw> raws = new ArrayList<>();
        for (int r = 0; r < table.size(); r++) {
            if (rep[r] != r) {
                continue;
            }
            for (int x = head[r]; x >= 0; x = next[x]) {
                for (int y = next[x]; y >= 0; y = next[y]) {
                    raws.add(new Raw(x, y, 1.0, true));
                }
            }
        }
        for (int v = 0; v < verified.pairs().length; v++) {
            int a = (int) (verified.pairs()[v] >>> 32);
            int b = (int) verified.pairs()[v];
            for (int x = head[a]; x >= 0; x = next[x]) {
                for (int y = head[b]; y >= 0; y = next[y]) {
                    raws.add(new Raw(Math.min(x, y), Math.max(x, y), verified.similarity()[v], false));
                }
            }
        }
        raws.sort(Comparator.comparingInt((Raw p) -> kind(p).ordinal())
                .thenComparing(Comparator.comparingDouble(Raw::similarity).reversed())
                .thenComparingInt(Raw::x).thenComparingInt(Raw::y));

        int trainCount = table.trainCount;
        int testCount = table.size() - trainCount;
        BitSet seen = new BitSet(testCount);
        BitSet seenExact = new BitSet(testCount);
        BitSet conflicting = new BitSet(testCount);
        BitSet trainSeen = new BitSet(trainCount);
        long[] byKind = new long[PairKind.values().length];
        long exactCross = 0;
        List<OverlapPair> pairs = new ArrayList<>(raws.size());
        Map<String, String> trainTexts = new HashMap<>();
        Map<String, String> testTexts = new HashMap<>();
        for (Raw p : raws) {
            PairKind kind = kind(p);
            byKind[kind.ordinal()]++;
            OverlapPair pair = new OverlapPair(kind, table.ids[p.x], table.ids[p.y], p.similarity, p.exact,
                    table.labels[p.x], table.labels[p.y]);
            pairs.add(pair);
            if (kind == PairKind.TRAIN_TEST) {
                int t = p.y - trainCount;
                seen.set(t);
                trainSeen.set(p.x);
                if (p.exact) {
                    exactCross++;
                    seenExact.set(t);
                }
                if (Boolean.FALSE.equals(pair.sameLabel())) {
                    conflicting.set(t);
                }
            }
            if (settings.keepTexts()) {
                keepText(p.x, verified.texts(), trainTexts, testTexts);
                keepText(p.y, verified.texts(), trainTexts, testTexts);
            }
        }
        OverlapSummary summary = new OverlapSummary(counts.train(), counts.test(), counts.trainEmpty(), counts.testEmpty(),
                byKind[PairKind.TRAIN_TEST.ordinal()], exactCross, byKind[PairKind.WITHIN_TRAIN.ordinal()],
                byKind[PairKind.WITHIN_TEST.ordinal()], seen.cardinality(), seenExact.cardinality(),
                conflicting.cardinality(), trainSeen.cardinality(), counts.candidates());
        return new OverlapResult(trainName, testName, settings, pairs, summary,
                trainTexts, testTexts, null);
    }

    private void keepText(int position, String[] texts, Map<String, String> trainTexts, Map<String, String> testTexts) {
        String text = texts[position];
        if (text != null) {
            (table.isTrain(position) ? trainTexts : testTexts).put(table.ids[position], text);
        }
    }

    private PairKind kind(Raw p) {
        boolean xTrain = table.isTrain(p.x);
        boolean yTrain = table.isTrain(p.y);
        if (xTrain && yTrain) {
            return PairKind.WITHIN_TRAIN;
        }
        return xTrain || yTrain ? PairKind.TRAIN_TEST : PairKind.WITHIN_TEST;
    }
}
