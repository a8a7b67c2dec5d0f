package org.telltale.overlap;

import java.util.Arrays;

/**
 * MinHash signatures (Broder 1997; Leskovec, Rajaraman and Ullman, <i>Mining of Massive
 * Datasets</i>, §3.3): component i of a set's signature is the least value of the i-th hash
 * function over the set, so two sets agree in a component with probability equal to their
 * Jaccard similarity. The i-th hash function is {@code x -> mix(x ^ seed_i)}, a bijection of
 * 64-bit values, with seeds drawn from SplitMix64 started at the run seed.
 *
 * <p>Immutable and thread-safe.
 */
public final class MinHasher {
    private final long[] seeds;

    /** A family of {@code length} hash functions derived from {@code seed}. */
    public MinHasher(int length, long seed) {
        if (length < 1) {
            throw new IllegalArgumentException("signature length must be at least 1: " + length);
        }
        seeds = new long[length];
        for (int i = 0; i < length; i++) {
            seeds[i] = Hash64.splitMix(seed, i);
        }
    }

    public int length() {
        return seeds.length;
    }

    /** The signature of a set of 64-bit element hashes; all components are Long.MAX_VALUE for the empty set. */
    public long[] signature(long[] set) {
        long[] sig = new long[seeds.length];
        signature(set, sig);
        return sig;
    }

    /** Writes the signature of {@code set} into {@code sig}, which must have {@link #length()} slots. */
    public void signature(long[] set, long[] sig) {
        Arrays.fill(sig, Long.MAX_VALUE);
        long[] s = seeds;
        for (long x : set) {
            for (int i = 0; i < s.length; i++) {
                long v = Hash64.mix(x ^ s[i]);
                if (v < sig[i]) {
                    sig[i] = v;
                }
            }
        }
    }

    /** The share of components in which two signatures agree: the MinHash estimate of Jaccard similarity. */
    public static double estimate(long[] a, long[] b) {
        if (a.length != b.length) {
            throw new IllegalArgumentException("signatures of different lengths: " + a.length + " and " + b.length);
        }
        int same = 0;
        for (int i = 0; i < a.length; i++) {
            if (a[i] == b[i]) {
                same++;
            }
        }
        return (double) same / a.length;
    }
}
