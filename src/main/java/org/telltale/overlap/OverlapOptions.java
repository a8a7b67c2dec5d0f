package org.telltale.overlap;

import org.telltale.UsageException;

/**
 * The overlap options that {@code telltale overlap} and the Spark front take under the same names
 * ({@code --threshold}, {@code --shingle}, {@code --signature}, {@code --rows}, {@code --bands}),
 * checked once and turned into {@link OverlapSettings}. Errors name the option and the value, so
 * both fronts report a bad value in the same words.
 */
public final class OverlapOptions {
    private OverlapOptions() {
    }

    /**
     * @param rows  {@code --rows}, or {@code null}; given together with {@code bands} or not at all
     * @param bands {@code --bands}, or {@code null}
     */
    public static OverlapSettings settings(double threshold, int shingle, int signature, Integer rows, Integer bands,
                                           long seed, int threads, boolean keepTexts) {
        if (!(threshold > 0 && threshold <= 1)) {
            throw new UsageException("--threshold must be in (0, 1]: " + threshold);
        }
        if (shingle < 1) {
            throw new UsageException("--shingle must be at least 1: " + shingle);
        }
        if (signature < 1) {
            throw new UsageException("--signature must be at least 1: " + signature);
        }
        if ((rows == null) != (bands == null)) {
            throw new UsageException("--rows and --bands go together");
        }
        Banding banding = null;
        if (rows != null) {
            if (rows < 1 || bands < 1) {
                throw new UsageException("--rows and --bands must be at least 1: " + rows + ", " + bands);
            }
            banding = new Banding(rows, bands);
            if (banding.hashes() > signature) {
                throw new UsageException("--rows × --bands = " + banding.hashes() + " exceeds --signature " + signature);
            }
        }
        return new OverlapSettings(threshold, shingle, signature, banding, seed, threads, keepTexts);
    }
}
