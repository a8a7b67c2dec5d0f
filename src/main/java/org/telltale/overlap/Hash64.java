package org.telltale.overlap;

/**
 * The 64-bit hash functions overlap detection is built on: the SplitMix64 finaliser (Steele, Lea
 * and Flood 2014) as a fast bijective mixer, and FNV-1a (Fowler, Noll and Vo) over UTF-16 code
 * units for words. Stateless and thread-safe.
 */
final class Hash64 {
    /** The SplitMix64 increment, 2^64 divided by the golden ratio. */
    static final long GOLDEN = 0x9e3779b97f4a7c15L;
    private static final long FNV_OFFSET = 0xcbf29ce484222325L;
    private static final long FNV_PRIME = 0x100000001b3L;

    private Hash64() {
    }

    /** The SplitMix64 output function: a bijection of 64-bit values with full avalanche. */
    static long mix(long z) {
        z = (z ^ (z >>> 30)) * 0xbf58476d1ce4e5b9L;
        z = (z ^ (z >>> 27)) * 0x94d049bb133111ebL;
        return z ^ (z >>> 31);
    }

    /** FNV-1a over the UTF-16 code units {@code text[start, end)}; equals byte-wise FNV-1a for ASCII. */
    static long fnv1a(CharSequence text, int start, int end) {
        long h = FNV_OFFSET;
        for (int i = start; i < end; i++) {
            h ^= text.charAt(i);
            h *= FNV_PRIME;
        }
        return h;
    }

    /** The {@code index}-th value of the SplitMix64 sequence started at {@code seed} (index 0 is the first output). */
    static long splitMix(long seed, int index) {
        return mix(seed + GOLDEN * (index + 1L));
    }

    /**
     * Two independent 64-bit hashes of a text (FNV-1a, and a multiply-add chain, each finished by
     * {@link #mix}) that together make a 128-bit key; a newline counts as a space, so the key of
     * {@link TextNormalizer#forShingles} output equals that of {@link TextNormalizer#forExact}.
     */
    static long[] exactKey(CharSequence norm) {
        long a = FNV_OFFSET;
        long b = 0x6a09e667f3bcc909L;
        for (int i = 0; i < norm.length(); i++) {
            char c = norm.charAt(i);
            if (c == '\n') {
                c = ' ';
            }
            a = (a ^ c) * FNV_PRIME;
            b = (b + c) * 0xd6e8feb86659fd93L;
        }
        return new long[] {mix(a ^ norm.length()), mix(b + GOLDEN)};
    }
}
