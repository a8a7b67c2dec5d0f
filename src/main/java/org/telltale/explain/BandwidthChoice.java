package org.telltale.explain;

import java.util.ArrayList;
import java.util.BitSet;
import java.util.List;

/**
 * Chooses the cosine kernel's bandwidth σ for one document from the probes already scored, with
 * no further model calls. The probes were drawn for the proposal bandwidth σ₀, so under another σ
 * each probe that removes k units is reweighted by π_σ(k) / π_σ₀(k) (importance sampling, common
 * practice). Each candidate is scored by two-fold cross-validation of the whole explanation (Stone
 * 1974, "Cross-validatory choice and assessment of statistical predictions", JRSS B 36(2)): the
 * probes are dealt alternately into two halves, the K units are selected and refitted on one half
 * under σ's weights and predict the other, and back; the score is 1 − SSE / SST over both held-out
 * halves, each weighted by σ's own kernel, i.e. the share of the model's local variation (local as
 * σ defines it) that the surrogate predicts for probes it has not seen. The selection is inside
 * the folds, so a narrow kernel's fewer effective probes show as held-out error instead of being
 * rewarded. The highest score wins if it beats the proposal's by {@link #MARGIN}.
 *
 * <p>Up to {@link CrossProducts#MAX_UNITS} units the eight selections and refits and the held-out
 * errors work from each half's {@link CrossProducts}, gathered for the four candidates in one pass
 * per half: the held-out error of a fold is a quadratic form in its cross-products.
 */
final class BandwidthChoice {
    /** The candidates, narrowest first; the proposal σ₀ is one of them. */
    static final double[] CANDIDATES = {0.1, 0.15, 0.25, 0.35};
    /**
     * Another σ replaces the proposal only when its held-out R² is higher by this much: where the
     * candidates fit about equally (a model near linear in presence, whose weights every σ
     * estimates alike), the proposal's matched probes give the steadier answer.
     */
    static final double MARGIN = 0.05;

    private BandwidthChoice() {
    }

    /** The chosen bandwidth, its reweighted design and every candidate's held-out R². */
    record Choice(double bandwidth, SurrogateFit.Design design, double[] heldOut) {
    }

    /**
     * @param fitter   the fitter whose selection is used (its kernel is the proposal)
     * @param base     the probes weighted for the proposal bandwidth
     * @param proposal σ₀, the bandwidth the probes were drawn and weighted for
     * @param k        the number of units reported
     * @param rows     what each probe removed, probe 0 first
     * @param y        the explained target of each probe
     * @param draws    the drawn probes the fit stands for
     */
    static Choice choose(SurrogateFit fitter, SurrogateFit.Design base, List<BitSet> rows,
            double[] y, int draws, double proposal, int k) {
        SurrogateFit.Design[][] folds = candidateHalves(base.rows() == rows.size() ? halves(base)
                : halves(fitter, base.d, rows, y, draws), proposal);
        double[] scores = new double[CANDIDATES.length];
        double proposalScore = Double.NEGATIVE_INFINITY;
        int best = -1;
        for (int c = 0; c < CANDIDATES.length; c++) {
            scores[c] = twoFold(fitter, folds[c], k);
            if (CANDIDATES[c] == proposal) {
                proposalScore = scores[c];
            }
            if (best < 0 || scores[c] > scores[best]) {
                best = c;
            }
        }
        double sigma = CANDIDATES[best];
        int chosen = best;
        if (sigma == proposal || !(scores[best] > proposalScore + MARGIN)) {
            sigma = proposal;
            for (int c = 0; c < CANDIDATES.length; c++) {
                chosen = CANDIDATES[c] == proposal ? c : chosen;
            }
        }
        // Only the winner's full design is reweighted; the candidates were scored on the halves.
        double[] weights = sigma == proposal ? base.w : reweight(base, removedCounts(base), proposal, sigma);
        SurrogateFit.Design[] winner = folds[chosen];
        if (!base.fitsFromCrossProducts() || CANDIDATES[chosen] != sigma || winner[0].x.presentCount(0) != base.d
                || winner[1].x.presentCount(0) != base.d) {
            return new Choice(sigma, sigma == proposal ? base : base.reweighted(weights), scores);
        }
        // The halves share probe 0 (it removes nothing) and hold every other probe once between them.
        CrossProducts whole = CrossProducts.joined(winner[0].crossProducts(), winner[1].crossProducts(),
                winner[0].w[0]);
        return new Choice(sigma, base.reweighted(weights, whole), scores);
    }

    private static int[] removedCounts(SurrogateFit.Design design) {
        int[] removed = new int[design.rows()];
        for (int i = 0; i < removed.length; i++) {
            removed[i] = design.d - design.x.presentCount(i);
        }
        return removed;
    }

    /**
     * The probes dealt alternately into two halves, probe 0 in both, taken from the design's rows
     * when it holds every probe (the cosine kernel sets none apart): a probe's weight depends only
     * on how many units it removes, so a half's rows are the design's rows.
     */
    private static SurrogateFit.Design[] halves(SurrogateFit.Design base) {
        SurrogateFit.Design[] out = new SurrogateFit.Design[2];
        int n = base.rows();
        for (int h = 0; h < 2; h++) {
            int[] which = new int[n];
            int at = 0;
            for (int i = 0; i < n; i++) {
                if (i == 0 || i % 2 == h) {
                    which[at++] = i;
                }
            }
            out[h] = base.rows(java.util.Arrays.copyOf(which, at));
        }
        return out;
    }

    /** The probes dealt alternately into two halves, probe 0 in both, each made a design of its own. */
    private static SurrogateFit.Design[] halves(SurrogateFit fitter, int d, List<BitSet> rows,
            double[] y, int draws) {
        SurrogateFit.Design[] out = new SurrogateFit.Design[2];
        for (int h = 0; h < 2; h++) {
            List<BitSet> part = new ArrayList<>();
            List<Double> py = new ArrayList<>();
            for (int i = 0; i < rows.size(); i++) {
                if (i == 0 || i % 2 == h) {
                    part.add(rows.get(i));
                    py.add(y[i]);
                }
            }
            out[h] = fitter.design(d, part, py.stream().mapToDouble(Double::doubleValue).toArray(), false, draws);
        }
        return out;
    }

    /**
     * Per candidate (index as {@link #CANDIDATES}) the two halves weighted for it. Where the fits
     * work from cross-products, each half's are gathered for all candidates in one pass over its
     * removed units, since the candidates differ only in the weights.
     */
    private static SurrogateFit.Design[][] candidateHalves(SurrogateFit.Design[] halves, double proposal) {
        SurrogateFit.Design[][] out = new SurrogateFit.Design[CANDIDATES.length][2];
        for (int h = 0; h < 2; h++) {
            SurrogateFit.Design half = halves[h];
            int[] removed = removedCounts(half);
            double[][] weights = new double[CANDIDATES.length][];
            for (int c = 0; c < CANDIDATES.length; c++) {
                weights[c] = CANDIDATES[c] == proposal ? half.w : reweight(half, removed, proposal, CANDIDATES[c]);
            }
            CrossProducts[] gathered = half.fitsFromCrossProducts() ? CrossProducts.of(half.x, half.y, weights) : null;
            for (int c = 0; c < CANDIDATES.length; c++) {
                out[c][h] = gathered != null ? half.reweighted(weights[c], gathered[c])
                        : CANDIDATES[c] == proposal ? half : half.reweighted(weights[c]);
            }
        }
        return out;
    }

    /** Select and fit on one half, predict the other; 1 − SSE / SST over both directions. */
    private static double twoFold(SurrogateFit fitter, SurrogateFit.Design[] halves, int k) {
        double sse = 0;
        double sst = 0;
        for (int h = 0; h < 2; h++) {
            SurrogateFit.Design train = halves[h];
            SurrogateFit.Design test = halves[1 - h];
            Surrogate s = fitter.pointFit(train, fitter.select(train, k));
            if (test.fitsFromCrossProducts()) {
                CrossProducts held = test.crossProducts();
                sse += held.residualSquares(s.intercept(), s.units(), s.weights());
                sst += held.centredTotal();
            } else {
                sse += residualSquares(test, s);
                sst += totalSquares(test);
            }
        }
        return sst > 0 ? 1 - sse / sst : Double.NEGATIVE_INFINITY;
    }

    /** Σ w (y − g(z))² over the design's probes, one by one. */
    private static double residualSquares(SurrogateFit.Design test, Surrogate s) {
        int[] units = s.units();
        double[] weights = s.weights();
        double sse = 0;
        for (int i = 0; i < test.rows(); i++) {
            double g = s.intercept();
            for (int j = 0; j < units.length; j++) {
                if (test.x.present(i, units[j])) {
                    g += weights[j];
                }
            }
            sse += test.w[i] * (test.y[i] - g) * (test.y[i] - g);
        }
        return sse;
    }

    /** Σ w (y − ȳ)² over the design's probes, one by one. */
    private static double totalSquares(SurrogateFit.Design test) {
        double total = 0;
        double mean = 0;
        for (int i = 0; i < test.rows(); i++) {
            total += test.w[i];
            mean += test.w[i] * test.y[i];
        }
        mean /= total;
        double sst = 0;
        for (int i = 0; i < test.rows(); i++) {
            sst += test.w[i] * (test.y[i] - mean) * (test.y[i] - mean);
        }
        return sst;
    }

    /** The weights of the design's rows under σ instead of σ₀. */
    static double[] reweight(SurrogateFit.Design base, int[] removed, double proposal, double sigma) {
        double[] w = new double[base.rows()];
        double inverse = 1 / (sigma * sigma) - 1 / (proposal * proposal);
        double[] ratio = new double[base.d + 1]; // per removed count, computed once: it depends on nothing else
        java.util.Arrays.fill(ratio, Double.NaN);
        for (int i = 0; i < w.length; i++) {
            int k = removed[i];
            if (Double.isNaN(ratio[k])) {
                double dist = Kernel.cosineDistance(base.d, k);
                // π_σ(k) / π_σ₀(k) = exp(−D²(1/σ² − 1/σ₀²)); 1 for probe 0.
                ratio[k] = Math.exp(-dist * dist * inverse);
            }
            w[i] = base.w[i] * ratio[k];
        }
        return w;
    }

}
