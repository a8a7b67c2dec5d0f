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
    private final long[] bits; // row-major, `stride` words per row: one array, not one per probe
    private final int stride;
    private final int rows;
    private final int units;

    private PresenceMatrix(long[] bits, int stride, int rows, int units) {
        this.bits = bits;
        this.stride = stride;
        this.rows = rows;
        this.units = units;
    }

    /** The presence matrix of probes given by the units each removes. */
    public static PresenceMatrix fromRemoved(List<BitSet> removed, int units) {
        int words = (units + 63) >>> 6;
        int n = removed.size();
        long[] bits = new long[n * words];
        long last = (units & 63) == 0 ? -1L : (1L << (units & 63)) - 1;
        for (int i = 0; i < n; i++) {
            int base = i * words;
            Arrays.fill(bits, base, base + words, -1L);
            if (words > 0) {
                bits[base + words - 1] = last;
            }
            BitSet cut = removed.get(i);
            for (int j = cut.nextSetBit(0); j >= 0 && j < units; j = cut.nextSetBit(j + 1)) {
                bits[base + (j >>> 6)] &= ~(1L << (j & 63));
            }
        }
        return new PresenceMatrix(bits, words, n, units);
    }

    /** The matrix of the given rows, in the order given. */
    PresenceMatrix rows(int[] which) {
        long[] out = new long[which.length * stride];
        for (int i = 0; i < which.length; i++) {
            System.arraycopy(bits, which[i] * stride, out, i * stride, stride);
        }
        return new PresenceMatrix(out, stride, which.length, units);
    }

    @Override
    public int rows() {
        return rows;
    }

    @Override
    public int columns() {
        return units;
    }

    public boolean present(int row, int unit) {
        return (bits[row * stride + (unit >>> 6)] >>> (unit & 63) & 1L) != 0;
    }

    /** The number of units probe {@code row} keeps. */
    public int presentCount(int row) {
        int n = 0;
        for (int w = row * stride, end = w + stride; w < end; w++) {
            n += Long.bitCount(bits[w]);
        }
        return n;
    }

    /**
     * Writes the units probe {@code row} removes into {@code out} in ascending order and returns
     * their number: one pass over the row's words, O(d/64 + removed).
     */
    int removedUnits(int row, int[] out) {
        int n = 0;
        for (int w = 0; w < stride; w++) {
            int base = w << 6;
            long word = ~bits[row * stride + w];
            if (base + 64 > units) {
                word &= (1L << (units - base)) - 1;
            }
            while (word != 0) {
                out[n++] = base + Long.numberOfTrailingZeros(word);
                word &= word - 1;
            }
        }
        return n;
    }

    @Override
    public void transposeTimes(double[] v, double[] out) {
        Arrays.fill(out, 0, units, 0.0);
        for (int i = 0; i < rows; i++) {
            double vi = v[i];
            if (vi == 0.0) {
                continue;
            }
            int row = i * stride;
            for (int w = 0; w < stride; w++) {
                long word = bits[row + w];
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
        for (int i = 0; i < rows; i++) {
            int row = i * stride;
            double s = 0;
            for (int w = 0; w < stride; w++) {
                long word = bits[row + w];
                int base = w << 6;
                while (word != 0) {
                    s += b[base + Long.numberOfTrailingZeros(word)];
                    word &= word - 1;
                }
            }
            out[i] = s;
        }
    }

    /**
     * {@code out[j] = Σ_i (scale_i·(X[i][j] − means_j))²} for every column, summed over the rows
     * in order: the squared norms of the columns {@link WeightedCentered} materialises, to the
     * same bits, in one pass over the words.
     */
    void centredSquaredNorms(double[] scale, double[] means, double[] out) {
        Arrays.fill(out, 0, units, 0.0);
        for (int i = 0; i < rows; i++) {
            double s = scale[i];
            int row = i * stride;
            for (int w = 0; w < stride; w++) {
                long word = bits[row + w];
                int base = w << 6;
                int width = Math.min(64, units - base);
                for (int b = 0; b < width; b++) {
                    double v = s * ((double) (word >>> b & 1L) - means[base + b]);
                    out[base + b] += v * v;
                }
            }
        }
    }

    @Override
    public void column(int j, double[] out) {
        int word = j >>> 6;
        int shift = j & 63;
        for (int i = 0; i < rows; i++) {
            out[i] = (bits[i * stride + word] >>> shift & 1L);
        }
    }
}
