package org.telltale.model;

import java.util.ArrayDeque;
import java.util.Arrays;
import java.util.Deque;
import java.util.Iterator;
import java.util.Objects;

/**
 * Limited-memory BFGS minimisation of a smooth function, after Nocedal and Wright, <i>Numerical
 * Optimization</i> (2nd ed., 2006): the search direction comes from the two-loop recursion
 * (Algorithm 7.4) with the initial Hessian scaled by {@code s'y / y'y} (eq. 7.20), and the step
 * from a line search that satisfies the strong Wolfe conditions (Algorithms 3.5 and 3.6, with
 * safeguarded cubic interpolation, eq. 3.59), where rounding hides the decrease, relaxed to
 * the approximate Wolfe condition of Hager and Zhang. The strong Wolfe conditions guarantee
 * {@code s'y > 0}, so every stored pair keeps the inverse Hessian approximation positive definite.
 *
 * <p>Not thread-safe; one instance per fit.
 */
public final class Lbfgs {
    /** A function and its gradient. */
    public interface Objective {
        /** Writes the gradient at {@code x} into {@code gradient} and returns the value at {@code x}. */
        double evaluate(double[] x, double[] gradient);
    }

    /** The minimiser found (copied in and out; once per fit) and how the search ended. */
    public record Result(double[] x, OptimiserReport report) {
        public Result {
            x = x.clone();
        }

        @Override
        public double[] x() {
            return x.clone();
        }

        @Override
        public boolean equals(Object o) {
            return o instanceof Result r && Arrays.equals(x, r.x) && Objects.equals(report, r.report);
        }

        @Override
        public int hashCode() {
            return 31 * Arrays.hashCode(x) + Objects.hashCode(report);
        }

        @Override
        public String toString() {
            return "Result[x=" + Arrays.toString(x) + ", report=" + report + "]";
        }
    }

    /** Sufficient decrease constant c1 and curvature constant c2, the values N&W recommend for quasi-Newton methods. */
    static final double C1 = 1e-4;
    static final double C2 = 0.9;
    private static final int MAX_LINE_SEARCH_STEPS = 40;
    /** Relative rise of the objective tolerated as rounding by the approximate Wolfe test. */
    static final double ROUNDING = 1e-10;
    /** Iterations in a row without a lower value or a smaller gradient before giving up. */
    private static final int MAX_IDLE_ITERATIONS = 10;

    private final int memory;
    private final int maxIterations;
    private final double gradientTolerance;

    private Objective objective;
    private int evaluations;

    /**
     * @param memory            pairs (s, y) kept; 5–20 is usual
     * @param maxIterations     iterations before giving up
     * @param gradientTolerance stop when the largest absolute gradient component is at most this
     */
    public Lbfgs(int memory, int maxIterations, double gradientTolerance) {
        if (memory < 1 || maxIterations < 0 || !(gradientTolerance >= 0)) {
            throw new IllegalArgumentException("memory >= 1, maxIterations >= 0 and gradientTolerance >= 0 required");
        }
        this.memory = memory;
        this.maxIterations = maxIterations;
        this.gradientTolerance = gradientTolerance;
    }

    /** Minimises {@code f} from {@code start} (not modified). */
    public Result minimize(Objective f, double[] start) {
        this.objective = f;
        this.evaluations = 0;
        int n = start.length;
        double[] x = start.clone();
        double[] g = new double[n];
        double fx = eval(x, g);
        if (!Double.isFinite(fx)) {
            throw new IllegalArgumentException("objective is not finite at the start: " + fx);
        }
        Deque<double[][]> pairs = new ArrayDeque<>(); // {s, y, {rho}} newest first
        double[] d = new double[n];
        double[] xNew = new double[n];
        double[] gNew = new double[n];
        int iteration = 0;
        int idle = 0;
        double bestGradient = maxNorm(g);
        boolean converged = maxNorm(g) <= gradientTolerance;
        while (!converged && iteration < maxIterations) {
            direction(g, pairs, d);
            double slope = dot(g, d);
            if (!(slope < 0)) { // not a descent direction: forget the curvature pairs
                pairs.clear();
                negate(g, d);
                slope = dot(g, d);
            }
            double initial = iteration == 0 && pairs.isEmpty() ? Math.min(1.0, 1.0 / Math.sqrt(dot(g, g))) : 1.0;
            double fNew = lineSearch(x, fx, g, d, slope, initial, xNew, gNew);
            if (Double.isNaN(fNew)) {
                if (pairs.isEmpty()) {
                    break; // even steepest descent finds no acceptable step: numerically at the minimum
                }
                pairs.clear();
                continue;
            }
            iteration++;
            double[] s = new double[n];
            double[] y = new double[n];
            for (int i = 0; i < n; i++) {
                s[i] = xNew[i] - x[i];
                y[i] = gNew[i] - g[i];
            }
            double sy = dot(s, y);
            if (sy > 1e-16 * dot(y, y)) {
                pairs.addFirst(new double[][] {s, y, {1.0 / sy}});
                if (pairs.size() > memory) {
                    pairs.removeLast();
                }
            }
            double fOld = fx;
            System.arraycopy(xNew, 0, x, 0, n);
            System.arraycopy(gNew, 0, g, 0, n);
            fx = fNew;
            converged = maxNorm(g) <= gradientTolerance;
            double gradientNorm = maxNorm(g);
            if (fx < fOld || gradientNorm < bestGradient) {
                idle = 0;
                bestGradient = Math.min(bestGradient, gradientNorm);
            } else if (++idle >= MAX_IDLE_ITERATIONS) {
                break; // neither value nor gradient improves any more: nothing left to gain in double precision
            }
        }
        return new Result(x, new OptimiserReport("L-BFGS", iteration, evaluations, converged, fx, maxNorm(g)));
    }

    /** Two-loop recursion (N&W Algorithm 7.4): {@code d = -H g}. */
    private static void direction(double[] g, Deque<double[][]> pairs, double[] d) {
        int m = pairs.size();
        double[] q = g.clone();
        double[] alpha = new double[m];
        int k = 0;
        for (double[][] p : pairs) { // newest to oldest
            alpha[k] = p[2][0] * dot(p[0], q);
            axpy(-alpha[k], p[1], q);
            k++;
        }
        double gamma = 1.0;
        if (m > 0) {
            double[][] newest = pairs.peekFirst();
            gamma = dot(newest[0], newest[1]) / dot(newest[1], newest[1]);
        }
        for (int i = 0; i < q.length; i++) {
            q[i] *= gamma;
        }
        Iterator<double[][]> oldestFirst = pairs.descendingIterator();
        k = m - 1;
        while (oldestFirst.hasNext()) {
            double[][] p = oldestFirst.next();
            double beta = p[2][0] * dot(p[1], q);
            axpy(alpha[k] - beta, p[0], q);
            k--;
        }
        negate(q, d);
    }

    /**
     * Line search for the strong Wolfe conditions (N&W Algorithm 3.5). On success writes the point
     * and its gradient into {@code xOut}, {@code gOut} and returns its value; returns NaN when no
     * acceptable step was found.
     */
    private double lineSearch(double[] x, double f0, double[] g0, double[] d, double slope0, double initial,
            double[] xOut, double[] gOut) {
        double previous = 0;
        double fPrevious = f0;
        double slopePrevious = slope0;
        double step = initial;
        for (int i = 0; i < MAX_LINE_SEARCH_STEPS; i++) {
            double fStep = evalAt(x, d, step, xOut, gOut);
            double slope = dot(gOut, d);
            boolean approximate = approximatelyWolfe(f0, slope0, fStep, slope);
            if (!Double.isFinite(fStep) || !(fStep <= f0 + C1 * step * slope0 || approximate)
                    || (i > 0 && fStep >= fPrevious && !approximate)) {
                return zoom(x, f0, slope0, d, previous, fPrevious, slopePrevious, step, fStep, slope, xOut, gOut);
            }
            if (Math.abs(slope) <= -C2 * slope0) {
                return fStep;
            }
            if (slope >= 0) {
                return zoom(x, f0, slope0, d, step, fStep, slope, previous, fPrevious, slopePrevious, xOut, gOut);
            }
            previous = step;
            fPrevious = fStep;
            slopePrevious = slope;
            step *= 2;
        }
        return Double.NaN;
    }

    /**
     * Near the minimum, differences of the objective drown in rounding while its slope is still
     * accurate. There the sufficient-decrease test is replaced by the approximate Wolfe condition
     * of Hager and Zhang (SIAM J. Optim. 16(1), 2005, eq. 4.1): the value may not rise by more
     * than a relative {@link #ROUNDING} and the slope must satisfy {@code phi'(a) <= (2 c1 - 1) phi'(0)}.
     */
    private static boolean approximatelyWolfe(double f0, double slope0, double fStep, double slope) {
        return fStep <= f0 + ROUNDING * Math.abs(f0) && slope <= (2 * C1 - 1) * slope0;
    }

    /** N&W Algorithm 3.6: shrinks the bracket between {@code lo} (lower value) and {@code hi}. */
    private double zoom(double[] x, double f0, double slope0, double[] d, double lo, double fLo, double slopeLo,
            double hi, double fHi, double slopeHi, double[] xOut, double[] gOut) {
        for (int i = 0; i < MAX_LINE_SEARCH_STEPS; i++) {
            double step = interpolate(lo, fLo, slopeLo, hi, fHi, slopeHi);
            double fStep = evalAt(x, d, step, xOut, gOut);
            double slope = dot(gOut, d);
            boolean approximate = approximatelyWolfe(f0, slope0, fStep, slope);
            if (!Double.isFinite(fStep) || !(fStep <= f0 + C1 * step * slope0 || approximate)
                    || (fStep >= fLo && !approximate)) {
                hi = step;
                fHi = fStep;
                slopeHi = slope;
            } else {
                if (Math.abs(slope) <= -C2 * slope0) {
                    return fStep;
                }
                if (slope * (hi - lo) >= 0) {
                    hi = lo;
                    fHi = fLo;
                    slopeHi = slopeLo;
                }
                lo = step;
                fLo = fStep;
                slopeLo = slope;
            }
            if (Math.abs(hi - lo) <= 1e-16 * Math.max(1.0, Math.abs(lo))) {
                break;
            }
        }
        return Double.NaN;
    }

    /**
     * The minimiser of the cubic through both ends' values and slopes (N&W eq. 3.59), kept at
     * least a tenth of the bracket away from its ends; bisection when the cubic is unusable.
     */
    static double interpolate(double a, double fa, double da, double b, double fb, double db) {
        double lowEnd = Math.min(a, b);
        double width = Math.abs(b - a);
        double step = Double.NaN;
        if (Double.isFinite(fb) && Double.isFinite(db)) {
            double d1 = da + db - 3 * (fa - fb) / (a - b);
            double radicand = d1 * d1 - da * db;
            if (radicand >= 0) {
                double d2 = Math.signum(b - a) * Math.sqrt(radicand);
                step = b - (b - a) * (db + d2 - d1) / (db - da + 2 * d2);
            }
        }
        if (!Double.isFinite(step) || step < lowEnd + 0.1 * width || step > lowEnd + 0.9 * width) {
            step = (a + b) / 2;
        }
        return step;
    }

    private double evalAt(double[] x, double[] d, double step, double[] xOut, double[] gOut) {
        for (int i = 0; i < x.length; i++) {
            xOut[i] = x[i] + step * d[i];
        }
        return eval(xOut, gOut);
    }

    private double eval(double[] x, double[] g) {
        evaluations++;
        return objective.evaluate(x, g);
    }

    static double dot(double[] a, double[] b) {
        double s = 0;
        for (int i = 0; i < a.length; i++) {
            s += a[i] * b[i];
        }
        return s;
    }

    private static void axpy(double a, double[] x, double[] y) {
        for (int i = 0; i < x.length; i++) {
            y[i] += a * x[i];
        }
    }

    private static void negate(double[] in, double[] out) {
        for (int i = 0; i < in.length; i++) {
            out[i] = -in[i];
        }
    }

    static double maxNorm(double[] g) {
        double m = 0;
        for (double v : g) {
            m = Math.max(m, Math.abs(v));
        }
        return m;
    }
}
