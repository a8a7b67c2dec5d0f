package org.telltale.overlap;

import java.util.Arrays;
import java.util.HashMap;
import java.util.Map;

/**
 * Groups documents whose normalised texts share the 128-bit exact key. Each group is represented
 * by its first document; only representatives take part in near-duplicate search, so k identical
 * copies cost one signature comparison, not k².
 */
final class ExactGroups {
    private ExactGroups() {
    }

    private record Key(long hi, long lo) {
    }

    /** rep[i]: the first document with document i's exact key (i itself for singletons and empty documents). */
    static int[] representatives(DocumentTable table) {
        int n = table.size();
        int[] rep = new int[n];
        for (int i = 0; i < n; i++) {
            rep[i] = i;
        }
        long indexMask = indexMask(n);
        long[] packed = new long[n];
        int m = 0;
        for (int i = 0; i < n; i++) {
            if (!table.empty.get(i)) {
                packed[m++] = (table.exactHi[i] & ~indexMask) | i;
            }
        }
        Arrays.parallelSort(packed, 0, m);
        int start = 0;
        while (start < m) {
            int end = start + 1;
            while (end < m && (packed[end] & ~indexMask) == (packed[start] & ~indexMask)) {
                end++;
            }
            if (end - start > 1) {
                Map<Key, Integer> first = new HashMap<>();
                for (int p = start; p < end; p++) {
                    int i = (int) (packed[p] & indexMask);
                    rep[i] = first.computeIfAbsent(new Key(table.exactHi[i], table.exactLo[i]), k -> i);
                }
            }
            start = end;
        }
        return rep;
    }

    /** The low bits that hold a document position when a position is packed into a 64-bit sort key. */
    static long indexMask(int n) {
        int bits = Math.max(1, 64 - Long.numberOfLeadingZeros(Math.max(1, n - 1)));
        return (1L << bits) - 1;
    }
}
