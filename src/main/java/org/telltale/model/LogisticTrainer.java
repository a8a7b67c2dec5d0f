package org.telltale.model;

import java.util.ArrayList;
import java.util.List;

/**
 * Fits multinomial logistic regression by minimising the mean negative log-likelihood plus an L2
 * penalty on the weights (the intercepts are not penalised):
 *
 * <pre>
 *   J(W, b) = (1/n) sum_i [ log sum_c exp(z_ic) - z_i,y_i ] + (l2/2) sum_c,t w_ct^2,
 *   z_ic = b_c + sum_t w_ct x_it,   x_it = log(1 + count_it)
 * </pre>
 *
 * with {@link Lbfgs}, starting from zero. This is the minimiser of scikit-learn's multinomial
 * objective {@code (1/2)||W||^2 + C sum_i loss_i} when {@code l2 = 1 / (C n)}. Because only
 * differences of intercepts matter, the intercepts are centred to mean zero after the fit; the
 * weights of each term already sum to zero over the labels at the optimum.
 */
public final class LogisticTrainer {
    private final double l2;
    private final int maxIterations;
    private final double tolerance;

    /**
     * @param l2            penalty strength on the per-document mean loss, > 0
     * @param maxIterations L-BFGS iterations at most
     * @param tolerance     stop when every gradient component is at most this in absolute value
     */
    public LogisticTrainer(double l2, int maxIterations, double tolerance) {
        if (!(l2 > 0) || Double.isInfinite(l2)) {
            throw new IllegalArgumentException("l2 must be a positive number: " + l2);
        }
        this.l2 = l2;
        this.maxIterations = maxIterations;
        this.tolerance = tolerance;
    }

    /** Defaults for training from the command line: at most 500 iterations, gradient tolerance 1e-6. */
    public LogisticTrainer(double l2) {
        this(l2, 500, 1e-6);
    }

    /** Fits on {@code data} (raw counts); the model reads texts with {@code counter}, which it then owns. */
    public LogisticModel fit(TrainingSet data, TermCounter counter, TrainingInfo training) {
        int k = data.labels().size();
        int v = data.vocabulary().size();
        List<SparseCounts> rows = new ArrayList<>(data.size());
        data.rows().forEach(r -> rows.add(r.log1p()));
        Loss loss = new Loss(rows, data.labelOf(), k, v, l2);
        Lbfgs.Result result = new Lbfgs(10, maxIterations, tolerance).minimize(loss, new double[k * v + k]);
        double[] theta = result.x();
        double[][] weights = new double[k][];
        for (int c = 0; c < k; c++) {
            weights[c] = new double[v];
            System.arraycopy(theta, c * v, weights[c], 0, v);
        }
        double[] intercepts = new double[k];
        System.arraycopy(theta, k * v, intercepts, 0, k);
        double mean = 0;
        for (double b : intercepts) {
            mean += b / k;
        }
        for (int c = 0; c < k; c++) {
            intercepts[c] -= mean;
        }
        return new LogisticModel(data.labels(), counter, data.vocabulary(), training, null, l2, intercepts, weights,
                result.report());
    }

    /** The objective J and its gradient; parameters are the weights label by label, then the intercepts. */
    static final class Loss implements Lbfgs.Objective {
        private final List<SparseCounts> rows;
        private final int[] labelOf;
        private final int k;
        private final int v;
        private final double l2;

        Loss(List<SparseCounts> rows, int[] labelOf, int k, int v, double l2) {
            this.rows = rows;
            this.labelOf = labelOf;
            this.k = k;
            this.v = v;
            this.l2 = l2;
        }

        @Override
        public double evaluate(double[] theta, double[] gradient) {
            int n = rows.size();
            java.util.Arrays.fill(gradient, 0);
            double[] z = new double[k];
            double total = 0;
            for (int i = 0; i < n; i++) {
                SparseCounts row = rows.get(i);
                int[] cols = row.columns();
                double[] x = row.values();
                double max = Double.NEGATIVE_INFINITY;
                for (int c = 0; c < k; c++) {
                    double s = theta[k * v + c];
                    int base = c * v;
                    for (int j = 0; j < cols.length; j++) {
                        s += theta[base + cols[j]] * x[j];
                    }
                    z[c] = s;
                    max = Math.max(max, s);
                }
                double sum = 0;
                for (int c = 0; c < k; c++) {
                    sum += Math.exp(z[c] - max);
                }
                double logNormaliser = max + Math.log(sum);
                total += logNormaliser - z[labelOf[i]];
                for (int c = 0; c < k; c++) {
                    // d loss_i / d z_ic = p_ic - [c = y_i]
                    double residual = (Math.exp(z[c] - logNormaliser) - (c == labelOf[i] ? 1 : 0)) / n;
                    int base = c * v;
                    for (int j = 0; j < cols.length; j++) {
                        gradient[base + cols[j]] += residual * x[j];
                    }
                    gradient[k * v + c] += residual;
                }
            }
            double penalty = 0;
            for (int p = 0; p < k * v; p++) {
                penalty += theta[p] * theta[p];
                gradient[p] += l2 * theta[p];
            }
            return total / n + 0.5 * l2 * penalty;
        }
    }
}
