package org.telltale.model;

/**
 * How a numerical fit ended.
 *
 * @param method       the optimiser, e.g. {@code L-BFGS}
 * @param iterations   iterations taken
 * @param evaluations  objective and gradient evaluations, line searches included
 * @param converged    whether the gradient tolerance was met (rather than the iteration limit or a stall)
 * @param objective    the objective at the end
 * @param gradientNorm the largest absolute gradient component at the end
 */
public record OptimiserReport(String method, int iterations, int evaluations, boolean converged, double objective,
        double gradientNorm) {
}
