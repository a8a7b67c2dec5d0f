package org.telltale.overlap;

import java.util.Arrays;

/** A growable array of primitive longs; not thread-safe. */
final class LongList {
    private long[] values = new long[1024];
    private int size;

    void add(long value) {
        if (size == values.length) {
            values = Arrays.copyOf(values, size * 2);
        }
        values[size++] = value;
    }

    int size() {
        return size;
    }

    /** Sorts the values and drops repeats, in place. */
    void sortDistinct() {
        long[] kept = Shingler.distinctSorted(values, size);
        values = kept.length == 0 ? new long[16] : Arrays.copyOf(kept, Math.max(16, kept.length));
        size = kept.length;
    }

    long[] toArray() {
        return Arrays.copyOf(values, size);
    }
}
