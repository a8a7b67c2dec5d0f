package org.telltale.explain;

import java.util.ArrayList;
import java.util.BitSet;
import java.util.List;

/**
 * Draws which units each probe removes, by the sampling of Ribeiro, Singh &amp; Guestrin 2016
 * ("Why should I trust you?", §3.3): first the number removed, uniform in 1..d, then a subset of
 * that size, uniform among all subsets of that size (Floyd's algorithm, Bentley &amp; Floyd 1987,
 * "A sample of brilliance", CACM 30(9)). Probe 0, the untouched document, is not drawn: callers
 * add it.
 */
public final class ProbeSampler {
    private ProbeSampler() {
    }

    /** The units one random probe of a d-unit document removes. */
    public static BitSet draw(int d, ProbeRandom random) {
        int size = 1 + random.nextInt(d);
        BitSet removed = new BitSet(d);
        for (int j = d - size; j < d; j++) {
            int t = random.nextInt(j + 1);
            removed.set(removed.get(t) ? j : t);
        }
        return removed;
    }

    /** {@code count} random probes of a d-unit document. */
    public static List<BitSet> draw(int d, int count, ProbeRandom random) {
        List<BitSet> out = new ArrayList<>(count);
        for (int i = 0; i < count; i++) {
            out.add(draw(d, random));
        }
        return out;
    }

    /** Every subset of d units, each once, ordered by its bits as a number: the empty set first. */
    public static List<BitSet> enumerate(int d) {
        if (d > 30) {
            throw new IllegalArgumentException("cannot enumerate 2^" + d + " subsets");
        }
        int count = 1 << d;
        List<BitSet> out = new ArrayList<>(count);
        for (long m = 0; m < count; m++) {
            out.add(BitSet.valueOf(new long[] {m}));
        }
        return out;
    }

    /** The probability that {@link #draw(int, ProbeRandom)} removes exactly a given set of k units. */
    public static double probability(int d, int k) {
        if (k < 1 || k > d) {
            return 0.0;
        }
        return 1.0 / (d * org.apache.commons.math3.util.CombinatoricsUtils.binomialCoefficientDouble(d, k));
    }
}
