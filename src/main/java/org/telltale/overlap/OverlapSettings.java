package org.telltale.overlap;

/**
 * How overlap detection runs.
 *
 * @param threshold least Jaccard similarity of shingle sets for a near duplicate, in (0, 1]
 * @param shingle   words per shingle
 * @param signature the most MinHash components the banding may use (k)
 * @param banding   rows and bands to use, or {@code null} to choose them from the threshold
 *                  ({@link Banding#forThreshold})
 * @param seed      seed of the MinHash functions; it changes only which borderline pairs are missed
 * @param threads   worker threads for signatures and verification, at least 1
 * @param keepTexts whether the result carries the texts of documents in pairs (for the HTML view)
 */
public record OverlapSettings(double threshold, int shingle, int signature, Banding banding, long seed,
                              int threads, boolean keepTexts) {
    public static final double DEFAULT_THRESHOLD = 0.8;
    public static final int DEFAULT_SHINGLE = 5;
    public static final int DEFAULT_SIGNATURE = 128;

    public OverlapSettings {
        if (!(threshold > 0.0 && threshold <= 1.0)) {
            throw new IllegalArgumentException("threshold must be in (0, 1]: " + threshold);
        }
        if (shingle < 1) {
            throw new IllegalArgumentException("shingle must be at least 1: " + shingle);
        }
        if (signature < 1) {
            throw new IllegalArgumentException("signature must be at least 1: " + signature);
        }
        if (banding != null && banding.hashes() > signature) {
            throw new IllegalArgumentException("banding of rows × bands = " + banding.hashes()
                    + " components exceeds signature " + signature);
        }
        if (threads < 1) {
            throw new IllegalArgumentException("threads must be at least 1: " + threads);
        }
        if (banding == null) {
            banding = Banding.forThreshold(threshold, signature);
        }
    }

    /**
     * The settings of the options every overlap front takes under the same names, each checked
     * once, here and in the canonical constructor, in the core's own words ({@code "shingle must be
     * at least 1: 0"}); the fronts map the setting names to option names ({@code OptionWords}).
     *
     * @param rows  rows per band, or {@code null}; given together with {@code bands} or not at all
     * @param bands number of bands, or {@code null}
     */
    public static OverlapSettings of(double threshold, int shingle, int signature, Integer rows, Integer bands,
                                     long seed, int threads, boolean keepTexts) {
        if ((rows == null) != (bands == null)) {
            throw new IllegalArgumentException("banding needs both rows and bands, or neither: rows "
                    + (rows == null ? "absent" : rows) + ", bands " + (bands == null ? "absent" : bands));
        }
        return new OverlapSettings(threshold, shingle, signature, rows == null ? null : new Banding(rows, bands), seed,
                threads, keepTexts);
    }

    /** Worker threads for {@code threads} as the fronts take it: 0 for one per core, else the number itself. */
    public static int workers(int threads) {
        if (threads < 0) {
            throw new IllegalArgumentException("threads must be 0 (one per core) or more: " + threads);
        }
        return threads == 0 ? Runtime.getRuntime().availableProcessors() : threads;
    }

    /** Defaults: threshold 0.8, 5-word shingles, 128 components, seed 1, one thread per core. */
    public static OverlapSettings defaults() {
        return new OverlapSettings(DEFAULT_THRESHOLD, DEFAULT_SHINGLE, DEFAULT_SIGNATURE, null, 1L,
                Runtime.getRuntime().availableProcessors(), false);
    }

    public OverlapSettings withThreshold(double t) {
        return new OverlapSettings(t, shingle, signature, null, seed, threads, keepTexts);
    }

    public OverlapSettings withBanding(Banding b) {
        return new OverlapSettings(threshold, shingle, signature, b, seed, threads, keepTexts);
    }

    public OverlapSettings withSeed(long s) {
        return new OverlapSettings(threshold, shingle, signature, banding, s, threads, keepTexts);
    }

    public OverlapSettings withKeepTexts(boolean keep) {
        return new OverlapSettings(threshold, shingle, signature, banding, seed, threads, keep);
    }
}
