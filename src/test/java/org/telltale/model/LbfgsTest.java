package org.telltale.model;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.SplittableRandom;
import org.apache.commons.math3.linear.Array2DRowRealMatrix;
import org.apache.commons.math3.linear.ArrayRealVector;
import org.apache.commons.math3.linear.CholeskyDecomposition;
import org.apache.commons.math3.linear.RealMatrix;
import org.junit.jupiter.api.Test;

class LbfgsTest {

    @Test
    void findsTheMinimumOfTheRosenbrockFunction() {
        // Rosenbrock's function, minimum 0 at (1, …, 1); the standard test of N&W §9 (from memory, common practice).
        Lbfgs.Objective rosenbrock = (x, g) -> {
            double f = 0;
            java.util.Arrays.fill(g, 0);
            for (int i = 0; i + 1 < x.length; i++) {
                double a = x[i + 1] - x[i] * x[i];
                double b = 1 - x[i];
                f += 100 * a * a + b * b;
                g[i] += -400 * x[i] * a - 2 * b;
                g[i + 1] += 200 * a;
            }
            return f;
        };
        double[] start = new double[10];
        for (int i = 0; i < start.length; i++) {
            start[i] = i % 2 == 0 ? -1.2 : 1.0;
        }
        Lbfgs.Result r = new Lbfgs(7, 2000, 1e-9).minimize(rosenbrock, start);
        assertTrue(r.report().converged(), r.report().toString());
        for (double v : r.x()) {
            assertEquals(1.0, v, 1e-7);
        }
        assertTrue(r.report().objective() < 1e-14, r.report().toString());
    }

    @Test
    void minimisesAQuadraticToTheLinearSolveOfCommonsMath() {
        // The minimiser of x'Ax/2 - b'x is A^{-1} b; solved here by Apache Commons Math's Cholesky.
        SplittableRandom random = new SplittableRandom(7);
        int n = 25;
        double[][] m = new double[n][n];
        for (int i = 0; i < n; i++) {
            for (int j = 0; j < n; j++) {
                m[i][j] = random.nextDouble(-1, 1);
            }
        }
        RealMatrix mm = new Array2DRowRealMatrix(m);
        RealMatrix a = mm.transpose().multiply(mm).add(new Array2DRowRealMatrix(n, n).scalarAdd(0));
        for (int i = 0; i < n; i++) {
            a.addToEntry(i, i, 0.5);
        }
        double[] b = new double[n];
        for (int i = 0; i < n; i++) {
            b[i] = random.nextDouble(-3, 3);
        }
        double[] expected = new CholeskyDecomposition(a).getSolver().solve(new ArrayRealVector(b)).toArray();
        double[][] aa = a.getData();
        Lbfgs.Objective quadratic = (x, g) -> {
            double f = 0;
            for (int i = 0; i < n; i++) {
                double ax = 0;
                for (int j = 0; j < n; j++) {
                    ax += aa[i][j] * x[j];
                }
                g[i] = ax - b[i];
                f += 0.5 * x[i] * ax - b[i] * x[i];
            }
            return f;
        };
        Lbfgs.Result r = new Lbfgs(10, 1000, 1e-11).minimize(quadratic, new double[n]);
        assertTrue(r.report().converged(), r.report().toString());
        for (int i = 0; i < n; i++) {
            assertEquals(expected[i], r.x()[i], 1e-8);
        }
    }

    @Test
    void cubicInterpolationFindsTheMinimumOfACubicInsideTheBracket() {
        // phi(a) = (a - 0.3)^2 (a + 1): its local minimum in [0, 1] is at 0.3 (common practice: calculus).
        double fa = 0.09 * 1;
        double da = 2 * (0 - 0.3) * 1 + 0.09;
        double fb = 0.49 * 2;
        double db = 2 * 0.7 * 2 + 0.49;
        assertEquals(0.3, Lbfgs.interpolate(0, fa, da, 1, fb, db), 1e-12);
        // An unusable end (non-finite value) falls back to bisection.
        assertEquals(0.5, Lbfgs.interpolate(0, fa, da, 1, Double.POSITIVE_INFINITY, db), 0);
    }

    @Test
    void stopsAtTheIterationLimitWithoutClaimingConvergence() {
        Lbfgs.Objective bowl = (x, g) -> {
            g[0] = 2 * (x[0] - 3);
            g[1] = 200 * (x[1] + 1);
            return (x[0] - 3) * (x[0] - 3) + 100 * (x[1] + 1) * (x[1] + 1);
        };
        Lbfgs.Result r = new Lbfgs(5, 1, 1e-12).minimize(bowl, new double[2]);
        assertEquals(1, r.report().iterations());
        assertTrue(!r.report().converged());
    }
}
