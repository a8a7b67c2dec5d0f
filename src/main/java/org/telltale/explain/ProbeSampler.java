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
        return subset(d, 1 + random.nextInt(d), random);
    }

    /**
     * The units one probe removes when the removed count k is drawn from {@code cumulative}
     * (cumulative[k − 1] = P(count ≤ k), k = 1..d) instead of uniformly; the subset of that size is
     * uniform as before.
     */
    public static BitSet draw(int d, double[] cumulative, ProbeRandom random) {
        double u = random.nextDouble() * cumulative[d - 1];
        int lo = 0;
        int hi = d - 1;
        while (lo < hi) {
            int mid = (lo + hi) >>> 1;
            if (cumulative[mid] > u) {
                hi = mid;
            } else {
                lo = mid + 1;
            }
        }
        return subset(d, lo + 1, random);
    }

    /**
     * The removed-count distribution matched to a kernel: P(k) ∝ the kernel's weight of a probe
     * that removes k of d units (counts the kernel turns into constraints get none), as a
     * cumulative array for {@link #draw(int, double[], ProbeRandom)}.
     */
    public static double[] matchedCounts(Kernel kernel, int d) {
        double[] c = new double[d];
        double sum = 0;
        for (int k = 1; k <= d; k++) {
            sum += kernel.constrains(d, k) ? 0 : kernel.sampled(d, k);
            c[k - 1] = sum;
        }
        return c;
    }

    /**
     * The weight each probe drawn from {@link #matchedCounts} carries so that the fit estimates the
     * same weighted regression as uniform counts with kernel weights: the kernel's mean weight
     * over the counts 1..d, Σ_k π(k) / d.
     */
    public static double meanWeight(Kernel kernel, int d) {
        double sum = 0;
        for (int k = 1; k <= d; k++) {
            sum += kernel.constrains(d, k) ? 0 : kernel.sampled(d, k);
        }
        return sum / d;
    }

    /** {@code count} probes with removed counts from {@code cumulative} (null: uniform counts). */
    public static List<BitSet> draw(int d, int count, double[] cumulative, ProbeRandom random) {
        if (cumulative == null) {
            return draw(d, count, random);
        }
        List<BitSet> out = new ArrayList<>(count);
        for (int i = 0; i < count; i++) {
            out.add(draw(d, cumulative, random));
        }
        return out;
    }

    /**
     * {@code count} probes in antithetic pairs (an odd count ends with a lone draw): the first of
     * a pair is drawn as by {@link #draw(int, int, double[], ProbeRandom)}, the second is its
     * complement ({@link Pairing#COMPLEMENT}) or removes as many units, taken first from those the
     * first keeps ({@link Pairing#DISJOINT}: a uniform subset of them when the first removes at
     * most half, else all of them and a uniform subset of the rest). Under DISJOINT the second
     * probe, alone, has the distribution of the first, because a uniform k-subset's complement is
     * a uniform (d − k)-subset; under COMPLEMENT only when the removed-count distribution is
     * symmetric (the Shapley kernel's).
     */
    public static List<BitSet> drawPaired(int d, int count, double[] cumulative, Pairing pairing, ProbeRandom random) {
        if (pairing == Pairing.NONE) {
            return draw(d, count, cumulative, random);
        }
        List<BitSet> out = new ArrayList<>(count);
        while (out.size() < count) {
            BitSet first = cumulative == null ? draw(d, random) : draw(d, cumulative, random);
            out.add(first);
            if (out.size() < count) {
                out.add(pairing == Pairing.COMPLEMENT ? complement(first, d) : disjoint(first, d, random));
            }
        }
        return out;
    }

    private static BitSet complement(BitSet removed, int d) {
        BitSet out = new BitSet(d);
        out.set(0, d);
        out.andNot(removed);
        return out;
    }

    /** As many units as {@code removed}, as few of them shared as possible, uniform otherwise. */
    private static BitSet disjoint(BitSet removed, int d, ProbeRandom random) {
        int k = removed.cardinality();
        BitSet kept = complement(removed, d);
        int[] keptUnits = kept.stream().toArray();
        if (k <= keptUnits.length) {
            return pick(keptUnits, k, random);
        }
        BitSet out = pick(removed.stream().toArray(), k - keptUnits.length, random);
        out.or(kept);
        return out;
    }

    /** A uniform subset of {@code size} of the given units (Floyd's algorithm over their positions). */
    private static BitSet pick(int[] units, int size, ProbeRandom random) {
        BitSet positions = subset(units.length, size, random);
        BitSet out = new BitSet();
        for (int i = positions.nextSetBit(0); i >= 0; i = positions.nextSetBit(i + 1)) {
            out.set(units[i]);
        }
        return out;
    }

    /** A subset of {@code size} of d units, uniform among all such subsets (Floyd's algorithm). */
    private static BitSet subset(int d, int size, ProbeRandom random) {
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
