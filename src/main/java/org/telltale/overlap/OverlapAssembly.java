package org.telltale.overlap;

import java.util.ArrayList;
import java.util.BitSet;
import java.util.Comparator;
import java.util.HashMap;
import java.util.List;
import java.util.Map;

/**
 * The overlap result from reduced statistics, for a front that computed keys, exact groups and
 * verified near pairs elsewhere (the Spark front): only the documents that take part in a pair
 * come here, with corpus-wide counts. It runs the same {@link PairAssembler} as
 * {@link OverlapFinder}, so both order, expand and count pairs in one way.
 */
public final class OverlapAssembly {
    private OverlapAssembly() {
    }

    /**
     * A document that takes part in a pair: every member of an exact group of two or more, and
     * every member of a group whose representative is in a near pair.
     *
     * @param position       reading position over train then test (train positions come first)
     * @param representative position of the first document with the same exact key
     * @param text           the text, when the result keeps texts; else null
     */
    public record Member(long position, String id, String label, long representative, String text) {
    }

    /** A verified near pair of two representatives' positions, {@code first < second}. */
    public record Near(long first, long second, double similarity) {
    }

    /** Corpus-wide counts: documents and documents without a word in each corpus, and candidates. */
    public record Counts(long train, long test, long trainEmpty, long testEmpty, long candidates) {
    }

    public static OverlapResult assemble(String trainName, String testName, OverlapSettings settings,
                                         List<Member> members, List<Near> near, Counts counts) {
        List<Member> sorted = new ArrayList<>(members);
        sorted.sort(Comparator.comparingLong(Member::position));
        int n = sorted.size();
        Map<Long, Integer> compact = new HashMap<>();
        String[] ids = new String[n];
        String[] labels = new String[n];
        String[] texts = new String[n];
        int trainCount = 0;
        for (int i = 0; i < n; i++) {
            Member m = sorted.get(i);
            if (compact.put(m.position(), i) != null) {
                throw new IllegalArgumentException("document position " + m.position() + " given twice");
            }
            ids[i] = m.id();
            labels[i] = m.label();
            texts[i] = m.text();
            if (m.position() < counts.train()) {
                trainCount++;
            }
        }
        int[] rep = new int[n];
        for (int i = 0; i < n; i++) {
            rep[i] = at(compact, sorted.get(i).representative());
        }
        long[] pairs = new long[near.size()];
        double[] similarity = new double[near.size()];
        for (int v = 0; v < near.size(); v++) {
            Near p = near.get(v);
            pairs[v] = ((long) at(compact, p.first()) << 32) | at(compact, p.second());
            similarity[v] = p.similarity();
        }
        DocumentTable table = new DocumentTable(ids, labels, new long[n], new long[n], new long[0], 0, new BitSet(), trainCount);
        PairAssembler.Counts totals = new PairAssembler.Counts(counts.train(), counts.test(), counts.trainEmpty(),
                counts.testEmpty(), counts.candidates());
        return new PairAssembler(table, rep).assemble(trainName, testName, settings,
                new VerificationPass.Verified(pairs, similarity, texts), totals);
    }

    private static int at(Map<Long, Integer> compact, long position) {
        Integer i = compact.get(position);
        if (i == null) {
            throw new IllegalArgumentException("no member at document position " + position);
        }
        return i;
    }
}
