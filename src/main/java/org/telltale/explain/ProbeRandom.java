package org.telltale.explain;

import java.nio.charset.StandardCharsets;

/**
 * The random stream of one document: SplitMix64 (Steele, Lea &amp; Flood 2014) seeded from the run
 * seed and a stable 64-bit hash of the document id, so a document draws the same probes whatever
 * order or thread it is explained in. The generator is written out here rather than borrowed from
 * the JDK so that its output cannot change with the Java version.
 *
 * <p>Not thread-safe: one instance per document.
 */
public final class ProbeRandom {
    private static final long GOLDEN = 0x9E3779B97F4A7C15L;
    private long state;

    /** A stream started at {@code seed} exactly (SplitMix64's own seeding). */
    public ProbeRandom(long seed) {
        this.state = seed;
    }

    /** The stream of document {@code id} under run seed {@code runSeed}. */
    public static ProbeRandom forDocument(long runSeed, String id) {
        return new ProbeRandom(mix(runSeed ^ mix(hash(id))));
    }

    /** FNV-1a over the UTF-8 bytes of {@code text}: stable across JVMs, unlike String.hashCode's spread. */
    static long hash(String text) {
        long h = 0xCBF29CE484222325L;
        for (byte b : text.getBytes(StandardCharsets.UTF_8)) {
            h ^= b & 0xFF;
            h *= 0x100000001B3L;
        }
        return h;
    }

    private static long mix(long z) {
        z = (z ^ (z >>> 30)) * 0xBF58476D1CE4E5B9L;
        z = (z ^ (z >>> 27)) * 0x94D049BB133111EBL;
        return z ^ (z >>> 31);
    }

    public long nextLong() {
        state += GOLDEN;
        return mix(state);
    }

    /** Uniform in {@code [0, bound)}, without modulo bias (rejection of the short last block). */
    public int nextInt(int bound) {
        if (bound <= 0) {
            throw new IllegalArgumentException("bound must be positive: " + bound);
        }
        long limit = Long.remainderUnsigned(-1L, bound) + 1; // the 2^64 mod bound values to reject
        while (true) {
            long r = nextLong();
            if (Long.compareUnsigned(r, -limit) < 0 || limit == bound) {
                return (int) Long.remainderUnsigned(r, bound);
            }
        }
    }

    /** Uniform in {@code [0, 1)} with 53 random bits. */
    public double nextDouble() {
        return (nextLong() >>> 11) * 0x1.0p-53;
    }

    /** An independent stream for a sub-task (bootstrap, split-half), drawn from this one. */
    public ProbeRandom split() {
        return new ProbeRandom(mix(nextLong()));
    }
}
