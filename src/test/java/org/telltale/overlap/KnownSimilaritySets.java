package org.telltale.overlap;

/** Pairs of random 64-bit sets with a chosen exact Jaccard similarity, for MinHash and banding checks. */
final class KnownSimilaritySets {
    private long state;

    KnownSimilaritySets(long seed) {
        state = seed;
    }

    /** Two sets with |A ∪ B| = union and |A ∩ B| = shared, so Jaccard = shared / union. */
    long[][] pair(int union, int shared) {
        int onlyA = (union - shared) / 2;
        int onlyB = union - shared - onlyA;
        long[] a = new long[shared + onlyA];
        long[] b = new long[shared + onlyB];
        for (int i = 0; i < shared; i++) {
            long v = next();
            a[i] = v;
            b[i] = v;
        }
        for (int i = 0; i < onlyA; i++) {
            a[shared + i] = next();
        }
        for (int i = 0; i < onlyB; i++) {
            b[shared + i] = next();
        }
        java.util.Arrays.sort(a);
        java.util.Arrays.sort(b);
        return new long[][] {a, b};
    }

    private long next() {
        state += Hash64.GOLDEN;
        // A different finaliser from MinHasher's so that set elements and hash functions are unrelated:
        // Stafford's variant 13 constants (common practice).
        long z = state;
        z = (z ^ (z >>> 30)) * 0xbf58476d1ce4e5b9L;
        z = (z ^ (z >>> 27)) * 0x94d049bb133111ebL;
        return Long.rotateLeft(z ^ (z >>> 31), 17) * 0xff51afd7ed558ccdL;
    }
}
