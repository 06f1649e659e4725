package dev.filmshear.validation.analytic;

import org.apache.commons.math3.analysis.UnivariateFunction;
import org.apache.commons.math3.analysis.integration.IterativeLegendreGaussIntegrator;
import org.apache.commons.math3.analysis.integration.gauss.GaussIntegratorFactory;

/**
 * Integral of a smooth function over consecutive pieces with Commons Math's
 * {@link IterativeLegendreGaussIntegrator}. A first pass with a 16-point Gauss–Legendre rule estimates
 * integral |f| on each piece; each piece is then refined until two successive estimates agree to the
 * requested accuracy times that piece's integral of |f|, so the whole integral is accurate to the requested
 * accuracy times integral |f| over the range.
 */
final class PiecewiseQuadrature {
    private static final int POINTS = 16;
    private static final int MAX_ITERATIONS = 40;
    private static final int MAX_EVALUATIONS = 10_000_000;
    private static final GaussIntegratorFactory GAUSS = new GaussIntegratorFactory();

    private PiecewiseQuadrature() {
    }

    /**
     * @param f integrand
     * @param breaks increasing breakpoints; pieces are [breaks[i], breaks[i+1]]
     * @param accuracy relative accuracy, with respect to the integral of |f|
     */
    static double integrate(UnivariateFunction f, double[] breaks, double accuracy) {
        double integral = 0;
        for (int i = 0; i + 1 < breaks.length; i++) {
            double magnitude = GAUSS.legendre(POINTS, breaks[i], breaks[i + 1]).integrate(x -> Math.abs(f.value(x)));
            if (magnitude == 0) {
                continue;
            }
            IterativeLegendreGaussIntegrator piece = new IterativeLegendreGaussIntegrator(POINTS, accuracy,
                    accuracy * magnitude, 1, MAX_ITERATIONS);
            integral += piece.integrate(MAX_EVALUATIONS, f, breaks[i], breaks[i + 1]);
        }
        return integral;
    }
}
