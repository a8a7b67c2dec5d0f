package org.telltale.explain;

/**
 * The weighted cross-products of one design, gathered in one pass over the units each probe
 * removed, from which every least-squares quantity the explainer needs on that design follows
 * without another pass over the N probes: the centred Gram matrix and the centred products with
 * the target (the normal equations of any subset of columns, Golub &amp; Van Loan, Matrix
 * Computations, 4th ed., §5.3), the weighted total sum of squares, and the weighted residual sum
 * of squares of any surrogate on these probes.
 *
 * <p>Why the removed units: a probe keeps most units, so its presence vector is z = 1 − r with r
 * sparse (the units it removed). With Σw, Σw·y, Σw·y², R = Σ w·r, Σ w·r·y and Σ w·r·rᵀ (cost
 * Σ kᵢ² for probes removing kᵢ units, instead of N·d² for the presence vectors), the centred
 * products of z equal those of r up to sign: z − z̄ = −(r − r̄), so the centred Gram matrices are
 * the same and the centred products with y are negated.
 *
 * <p>The target is taken relative to probe 0's value ({@link #shift}), so that the sums of
 * squares do not lose digits to a large mean of y.
 */
final class CrossProducts {
    /**
     * Designs of up to this many units are fitted from their cross-products. Gathering them costs
     * about Σ kᵢ²/2 additions, 0.04·N·d² under the default kernel (probes remove a quarter of the
     * units on average), against N·d per selected unit for a pass over the bit matrix, so beyond
     * a few hundred units the passes are cheaper; the d × d matrix also grows as d².
     */
    static final int MAX_UNITS = 256;

    final int d;
    /** Σ w. */
    final double total;
    /** The value subtracted from y before it is summed: the first probe's target. */
    final double shift;
    /** Σ w (y − shift). */
    final double wy;
    /** Σ w (y − shift)². */
    final double wyy;
    /** Σ w r_j: the weight of the probes that removed unit j. */
    private final double[] rw;
    /** Σ w r_j (y − shift). */
    private final double[] rwy;
    /** Σ w r_a r_b, symmetric, row-major d × d. */
    private final double[] rr;

    private CrossProducts(int d, double total, double shift, double wy, double wyy, double[] rw, double[] rwy,
            double[] rr) {
        this.d = d;
        this.total = total;
        this.shift = shift;
        this.wy = wy;
        this.wyy = wyy;
        this.rw = rw;
        this.rwy = rwy;
        this.rr = rr;
    }

    /** The cross-products of a design under its own weights. */
    static CrossProducts of(PresenceMatrix x, double[] y, double[] w) {
        return of(x, y, new double[][] {w})[0];
    }

    /**
     * The cross-products of one set of probes under each of several weightings, in one pass over
     * the removed units (the weightings of {@link BandwidthChoice}'s candidates differ only in the
     * weights). The sums for the weightings are kept side by side, so each pair of removed units
     * costs one run over adjacent numbers.
     */
    static CrossProducts[] of(PresenceMatrix x, double[] y, double[][] weights) {
        int n = x.rows();
        int d = x.columns();
        int sets = weights.length;
        double shift = n == 0 ? 0.0 : y[0];
        double[] total = new double[sets];
        double[] wy = new double[sets];
        double[] wyy = new double[sets];
        double[] rw = new double[d * sets];
        double[] rwy = new double[d * sets];
        double[] rr = new double[d * d * sets]; // lower triangle, the sets interleaved
        int[] removed = new int[d];
        double[] v = new double[sets];
        double[] vy = new double[sets];
        for (int i = 0; i < n; i++) {
            double yi = y[i] - shift;
            for (int s = 0; s < sets; s++) {
                double wi = weights[s][i];
                v[s] = wi;
                vy[s] = wi * yi;
                total[s] += wi;
                wy[s] += vy[s];
                wyy[s] += vy[s] * yi;
            }
            int k = x.removedUnits(i, removed);
            for (int a = 0; a < k; a++) {
                int ua = removed[a];
                for (int s = 0; s < sets; s++) {
                    rw[ua * sets + s] += v[s];
                    rwy[ua * sets + s] += vy[s];
                }
                int row = ua * d;
                // removed is ascending, so (ua, removed[b]) is on or below the diagonal.
                if (sets == 4) { // the bandwidth choice's candidates: written out, the hot loop of an explanation
                    double v0 = v[0];
                    double v1 = v[1];
                    double v2 = v[2];
                    double v3 = v[3];
                    for (int b = 0; b <= a; b++) {
                        int at = (row + removed[b]) << 2;
                        rr[at] += v0;
                        rr[at + 1] += v1;
                        rr[at + 2] += v2;
                        rr[at + 3] += v3;
                    }
                } else if (sets == 1) {
                    double v0 = v[0];
                    for (int b = 0; b <= a; b++) {
                        rr[row + removed[b]] += v0;
                    }
                } else {
                    for (int b = 0; b <= a; b++) {
                        int at = (row + removed[b]) * sets;
                        for (int s = 0; s < sets; s++) {
                            rr[at + s] += v[s];
                        }
                    }
                }
            }
        }
        CrossProducts[] out = new CrossProducts[sets];
        for (int s = 0; s < sets; s++) {
            double[] g = new double[d * d];
            double[] r = new double[d];
            double[] ry = new double[d];
            for (int a = 0; a < d; a++) {
                r[a] = rw[a * sets + s];
                ry[a] = rwy[a * sets + s];
                for (int b = 0; b <= a; b++) {
                    double value = rr[(a * d + b) * sets + s];
                    g[a * d + b] = value;
                    g[b * d + a] = value;
                }
            }
            out[s] = new CrossProducts(d, total[s], shift, wy[s], wyy[s], r, ry, g);
        }
        return out;
    }

    /**
     * The cross-products of two sets of probes taken together, when both begin with the same
     * probe, one that removes nothing (probe 0, which {@link BandwidthChoice}'s halves share): it
     * adds only its weight to Σw (its y − shift is 0, and it has no removed units), so that weight
     * is counted once. Equal to gathering the union, up to the order of the sums.
     */
    static CrossProducts joined(CrossProducts a, CrossProducts b, double sharedWeight) {
        if (a.d != b.d || a.shift != b.shift) {
            throw new IllegalArgumentException("cross-products of different designs");
        }
        double[] rw = a.rw.clone();
        double[] rwy = a.rwy.clone();
        double[] rr = a.rr.clone();
        for (int j = 0; j < rw.length; j++) {
            rw[j] += b.rw[j];
            rwy[j] += b.rwy[j];
        }
        for (int j = 0; j < rr.length; j++) {
            rr[j] += b.rr[j];
        }
        return new CrossProducts(a.d, a.total + b.total - sharedWeight, a.shift, a.wy + b.wy, a.wyy + b.wyy, rw, rwy,
                rr);
    }

    /** The weighted mean of y. */
    double yMean() {
        return shift + wy / total;
    }

    /** The weighted share of probes that keep unit j: the presence column's weighted mean. */
    double presenceMean(int j) {
        return 1.0 - rw[j] / total;
    }

    /** Σ w (z_a − z̄_a)(z_b − z̄_b) = Σ w r_a r_b − R_a R_b / Σw. */
    double centredGram(int a, int b) {
        return rr[a * d + b] - rw[a] * rw[b] / total;
    }

    /** Σ w (z_j − z̄_j)(y − ȳ) = −(Σ w r_j (y − shift) − R_j Σ w (y − shift) / Σw). */
    double centredCross(int j) {
        return -(rwy[j] - rw[j] * wy / total);
    }

    /** Σ w (y − ȳ)²: the weighted total sum of squares. */
    double centredTotal() {
        return Math.max(0.0, wyy - wy * wy / total);
    }

    /** The centred Gram matrix of the given units, row-major p × p. */
    double[] centredGram(int[] units) {
        int p = units.length;
        double[] g = new double[p * p];
        for (int a = 0; a < p; a++) {
            for (int b = 0; b < p; b++) {
                g[a * p + b] = centredGram(units[a], units[b]);
            }
        }
        return g;
    }

    /** The centred products of the given units' presence columns with y. */
    double[] centredCross(int[] units) {
        double[] c = new double[units.length];
        for (int j = 0; j < units.length; j++) {
            c[j] = centredCross(units[j]);
        }
        return c;
    }

    /**
     * Σ w (y − g(z))² for the surrogate g(z) = b₀ + Σ b_j z_j on these probes. With z = 1 − r,
     * g = a − bᵀr where a = b₀ + Σ b_j, so the residual is (y − a) + bᵀr and its weighted square
     * sums to Σw(y − a)² + 2 bᵀ Σ w r (y − a) + bᵀ (Σ w r rᵀ) b: the held-out error of a fold
     * from its own cross-products, without predicting its probes one by one.
     */
    double residualSquares(double intercept, int[] units, double[] weights) {
        double a = intercept - shift;
        for (double b : weights) {
            a += b;
        }
        double sse = wyy - 2 * a * wy + a * a * total;
        int p = units.length;
        for (int j = 0; j < p; j++) {
            int u = units[j];
            sse += 2 * weights[j] * (rwy[u] - a * rw[u]);
            double row = 0;
            for (int l = 0; l < p; l++) {
                row += rr[u * d + units[l]] * weights[l];
            }
            sse += weights[j] * row;
        }
        return Math.max(0.0, sse);
    }
}
