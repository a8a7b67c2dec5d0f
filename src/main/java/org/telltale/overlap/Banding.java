package org.telltale.overlap;

/**
 * Locality-sensitive hashing of MinHash signatures by banding (Leskovec, Rajaraman and Ullman,
 * <i>Mining of Massive Datasets</i>, §3.4): the signature is cut into {@code bands} bands of
 * {@code rows} components; two documents become a candidate pair when they agree on all rows of
 * at least one band, which happens with probability 1 − (1 − s^r)^b for Jaccard similarity s.
 *
 * @param rows  r, components per band
 * @param bands b, number of bands; the signature needs r·b components
 */
public record Banding(int rows, int bands) {
    /** The candidate probability the chosen banding must reach at the threshold. */
    public static final double RECALL_AT_THRESHOLD = 0.98;

    public Banding {
        if (rows < 1 || bands < 1) {
            throw new IllegalArgumentException("banding needs rows and bands of at least 1: rows " + rows
                    + ", bands " + bands);
        }
    }

    /** r·b, the number of signature components the banding reads. */
    public int hashes() {
        return rows * bands;
    }

    /** 1 − (1 − s^r)^b: the probability that a pair of Jaccard similarity s becomes a candidate. */
    public double candidateProbability(double s) {
        return 1.0 - Math.pow(1.0 - Math.pow(s, rows), bands);
    }

    /** The similarity where the S-curve rises fastest, approximately (1/b)^(1/r) (MMDS §3.4.3). */
    public double steepestPoint() {
        return Math.pow(1.0 / bands, 1.0 / rows);
    }

    /**
     * ∫₀^t P(s) ds: the expected share of pairs below the threshold that still become candidates,
     * for similarities spread evenly over [0, t]. Simpson's rule on 400 intervals.
     */
    public double falsePositiveArea(double threshold) {
        return simpson(0.0, threshold, false);
    }

    /** ∫ₜ¹ (1 − P(s)) ds: the missed share above the threshold, for similarities spread evenly over [t, 1]. */
    public double falseNegativeArea(double threshold) {
        return simpson(threshold, 1.0, true);
    }

    private double simpson(double from, double to, boolean complement) {
        int n = 400;
        double h = (to - from) / n;
        double sum = 0;
        for (int i = 0; i <= n; i++) {
            double p = candidateProbability(from + i * h);
            double f = complement ? 1.0 - p : p;
            sum += f * (i == 0 || i == n ? 1 : i % 2 == 1 ? 4 : 2);
        }
        return sum * h / 3.0;
    }

    /**
     * The banding for a similarity threshold within a budget of {@code maxHashes} signature
     * components. Rule: among all r, b with r·b ≤ maxHashes whose candidate probability at the
     * threshold is at least {@link #RECALL_AT_THRESHOLD}, take the one with the least false-positive
     * area ∫₀^t P(s) ds (ties: fewer hashes). Every candidate is verified by exact Jaccard, so a
     * false positive costs only time while a false negative is a missed duplicate; hence the
     * floor on recall instead of the symmetric FN + FP area. If no banding reaches the floor, the
     * one with the highest candidate probability at the threshold.
     */
    public static Banding forThreshold(double threshold, int maxHashes) {
        if (!(threshold > 0.0 && threshold <= 1.0)) {
            throw new IllegalArgumentException("threshold must be in (0, 1]: " + threshold);
        }
        if (maxHashes < 1) {
            throw new IllegalArgumentException("signature length must be at least 1: " + maxHashes);
        }
        Banding best = null;
        double bestArea = Double.POSITIVE_INFINITY;
        Banding fallback = new Banding(1, maxHashes);
        for (int r = 1; r <= maxHashes; r++) {
            for (int b = 1; b * r <= maxHashes; b++) {
                Banding candidate = new Banding(r, b);
                double p = candidate.candidateProbability(threshold);
                if (p > fallback.candidateProbability(threshold)) {
                    fallback = candidate;
                }
                if (p >= RECALL_AT_THRESHOLD) {
                    double area = candidate.falsePositiveArea(threshold);
                    if (area < bestArea - 1e-12 || (Math.abs(area - bestArea) <= 1e-12 && candidate.hashes() < best.hashes())) {
                        best = candidate;
                        bestArea = area;
                    }
                    break; // more bands at this r only add false positives
                }
            }
        }
        return best != null ? best : fallback;
    }

    /** The hash of band {@code band} of a signature: its r components mixed with the band number. */
    public long bandKey(long[] signature, int band) {
        long h = Hash64.mix(Hash64.GOLDEN * (band + 1L));
        int from = band * rows;
        for (int i = from; i < from + rows; i++) {
            h = Hash64.mix(h ^ signature[i]);
        }
        return h;
    }
}
