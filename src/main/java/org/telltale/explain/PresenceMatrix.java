package org.telltale.explain;

import java.util.Arrays;
import java.util.BitSet;
import java.util.List;

/**
 * The probes' presence vectors packed one bit per unit: row i, column j is 1 when probe i keeps
 * unit j. N probes of d units take N·d/8 bytes, so a few thousand probes of a few thousand units
 * stay within a few megabytes.
 */
public final class PresenceMatrix implements Columns {
    private final long[][] bits;
    private final int units;

    private PresenceMatrix(long[][] bits, int units) {
        this.bits = bits;
        this.units = units;
    }

    /** The presence matrix of probes given by the units each removes. */
    public static PresenceMatrix fromRemoved(List<BitSet> removed, int units) {
        int words = (units + 63) >>> 6;
        long[][] bits = new long[removed.size()][];
        for (int i = 0; i < bits.length; i++) {
            long[] row = new long[words];
            Arrays.fill(row, -1L);
            if ((units & 63) != 0 && words > 0) {
                row[words - 1] = (1L << (units & 63)) - 1;
            }
            long[] cut = removed.get(i).toLongArray();
            for (int w = 0; w < Math.min(cut.length, words); w++) {
                row[w] &= ~cut[w];
            }
            bits[i] = row;
        }
        return new PresenceMatrix(bits, units);
    }

    @Override
    public int rows() {
        return bits.length;
    }

    @Override
    public int columns() {
        return units;
    }

    public boolean present(int row, int unit) {
        return (bits[row][unit >>> 6] >>> (unit & 63) & 1L) != 0;
    }

    /** The number of units probe {@code row} keeps. */
    public int presentCount(int row) {
        int n = 0;
        for (long w : bits[row]) {
            n += Long.bitCount(w);
        }
        return n;
    }

    @Override
    public void transposeTimes(double[] v, double[] out) {
        Arrays.fill(out, 0, units, 0.0);
        for (int i = 0; i < bits.length; i++) {
            double vi = v[i];
            if (vi == 0.0) {
                continue;
            }
            long[] row = bits[i];
            for (int w = 0; w < row.length; w++) {
                long word = row[w];
                int base = w << 6;
                while (word != 0) {
                    out[base + Long.numberOfTrailingZeros(word)] += vi;
                    word &= word - 1;
                }
            }
        }
    }

    @Override
    public void times(double[] b, double[] out) {
        for (int i = 0; i < bits.length; i++) {
            long[] row = bits[i];
            double s = 0;
            for (int w = 0; w < row.length; w++) {
                long word = row[w];
                int base = w << 6;
                while (word != 0) {
                    s += b[base + Long.numberOfTrailingZeros(word)];
                    word &= word - 1;
                }
            }
            out[i] = s;
        }
    }

    @Override
    public void column(int j, double[] out) {
        for (int i = 0; i < bits.length; i++) {
            out[i] = present(i, j) ? 1.0 : 0.0;
        }
    }
}
