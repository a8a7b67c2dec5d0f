package org.telltale.overlap;

import java.util.Arrays;
import java.util.function.Consumer;

/**
 * Banding (MMDS §3.4.1): for each band, documents whose band keys agree become candidate pairs.
 * Each band is a sort of 64-bit words holding the band key's high bits and the document position
 * in the low bits; equal high bits form a bucket. Cutting the key to make room for the position
 * only adds chance candidates (about n²/2^(65−log₂n) per band), and every candidate is verified.
 *
 * <p>A bucket of m documents yields m(m−1)/2 candidates: thousands of distinct but nearly identical
 * texts (form letters with a name changed) cost quadratic time, as they would in any pairwise report.
 */
final class CandidatePairs {
    private static final int COMPACT_AT = 1 << 23;

    private CandidatePairs() {
    }

    /** Sorted distinct candidates as {@code (first << 32) | second} with first < second. */
    static long[] find(DocumentTable table, int[] rep, Consumer<String> progress) {
        int n = table.size();
        long indexMask = ExactGroups.indexMask(n);
        int[] members = new int[n];
        int m = 0;
        for (int i = 0; i < n; i++) {
            if (rep[i] == i && !table.empty.get(i)) {
                members[m++] = i;
            }
        }
        int b = table.bands;
        long[] packed = new long[m];
        LongList out = new LongList();
        for (int band = 0; band < b; band++) {
            for (int p = 0; p < m; p++) {
                int i = members[p];
                packed[p] = PairRules.bucketKey(table.bandKeys[i * b + band], n) | i;
            }
            Arrays.parallelSort(packed, 0, m);
            int start = 0;
            while (start < m) {
                int end = start + 1;
                long key = packed[start] & ~indexMask;
                while (end < m && (packed[end] & ~indexMask) == key) {
                    end++;
                }
                for (int x = start; x < end; x++) {
                    long first = packed[x] & indexMask;
                    for (int y = x + 1; y < end; y++) {
                        out.add((first << 32) | (packed[y] & indexMask));
                    }
                }
                start = end;
            }
            if (out.size() > COMPACT_AT) {
                out.sortDistinct();
            }
        }
        out.sortDistinct();
        progress.accept(String.format(java.util.Locale.ROOT, "%,d candidate pairs from %d bands", out.size(), b));
        return out.toArray();
    }
}
