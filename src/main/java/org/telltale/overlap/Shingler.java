package org.telltale.overlap;

import java.util.Arrays;

/**
 * Cuts a document into its set of word shingles — runs of {@code size} consecutive words
 * (Broder 1997) — each reduced to a 64-bit hash, returned sorted and without repeats.
 *
 * <p>A word is a maximal run of letters, digits and combining marks of the normalised text (see
 * {@link TextNormalizer}); punctuation separates words. Shingles never cross a sentence end
 * ({@code . ! ? ;}) or a paragraph break, so reordering sentences or paragraphs leaves the shingle
 * set unchanged. A sentence with fewer than {@code size} words contributes one shingle of all its
 * words. Characters outside the Basic Multilingual Plane count as word characters. Two distinct shingles share a hash with probability 2^-64, so Jaccard similarity on
 * these sets is, for any practical corpus, the exact Jaccard similarity of the shingle sets.
 *
 * <p>Immutable and thread-safe.
 */
public final class Shingler {
    private static final long SHINGLE_START = 0x2545f4914f6cdd1dL;
    private final int size;

    public Shingler(int size) {
        if (size < 1) {
            throw new IllegalArgumentException("shingle size must be at least 1: " + size);
        }
        this.size = size;
    }

    public int size() {
        return size;
    }

    /** The sorted, distinct shingle hashes of {@code text}; empty when the text has no words. */
    public long[] shingles(String text) {
        return shinglesOfNormalised(TextNormalizer.forShingles(text));
    }

    /** The shingles of a text already passed through {@link TextNormalizer#forShingles}. */
    long[] shinglesOfNormalised(String norm) {
        long[] words = new long[16];
        long[] out = new long[16];
        int count = 0;
        int nWords = 0;
        int i = 0;
        int n = norm.length();
        while (i <= n) {
            boolean end = i == n || isSentenceEnd(norm.charAt(i));
            if (i < n && isWordChar(norm.charAt(i))) {
                int start = i;
                while (i < n && isWordChar(norm.charAt(i))) {
                    i++;
                }
                if (nWords == words.length) {
                    words = Arrays.copyOf(words, nWords * 2);
                }
                words[nWords++] = Hash64.fnv1a(norm, start, i);
                continue;
            }
            if (end && nWords > 0) {
                int made = Math.max(1, nWords - size + 1);
                if (count + made > out.length) {
                    out = Arrays.copyOf(out, Math.max(out.length * 2, count + made));
                }
                for (int s = 0; s < made; s++) {
                    out[count++] = shingleHash(words, s, Math.min(nWords, s + size));
                }
                nWords = 0;
            }
            i++;
        }
        return distinctSorted(out, count);
    }

    private static long shingleHash(long[] words, int from, int to) {
        long h = SHINGLE_START;
        for (int w = from; w < to; w++) {
            h = Hash64.mix(h ^ words[w]);
        }
        return h;
    }

    static long[] distinctSorted(long[] values, int count) {
        Arrays.sort(values, 0, count);
        int kept = 0;
        for (int i = 0; i < count; i++) {
            if (kept == 0 || values[i] != values[kept - 1]) {
                values[kept++] = values[i];
            }
        }
        return Arrays.copyOf(values, kept);
    }

    static boolean isWordChar(char c) {
        if (Character.isLetterOrDigit(c)) {
            return true;
        }
        int type = Character.getType(c);
        return type == Character.NON_SPACING_MARK || type == Character.COMBINING_SPACING_MARK
                || Character.isSurrogate(c);
    }

    private static boolean isSentenceEnd(char c) {
        return c == '.' || c == '!' || c == '?' || c == ';' || c == '\n';
    }

    /** Jaccard similarity |A ∩ B| / |A ∪ B| of two sorted, distinct arrays; 1 when both are empty. */
    public static double jaccard(long[] a, long[] b) {
        if (a.length == 0 && b.length == 0) {
            return 1.0;
        }
        int i = 0;
        int j = 0;
        int common = 0;
        while (i < a.length && j < b.length) {
            if (a[i] == b[j]) {
                common++;
                i++;
                j++;
            } else if (a[i] < b[j]) {
                i++;
            } else {
                j++;
            }
        }
        return (double) common / (a.length + b.length - common);
    }
}
