package dev.filmshear.validation.analytic;

import org.apache.commons.math3.analysis.UnivariateFunction;

import java.util.ArrayList;
import java.util.List;
import java.util.function.DoubleUnaryOperator;

/**
 * Duhamel's integral for a wall started at t = 0 with velocity A sin(omega t + phase), acting on a linear
 * medium initially at rest whose response to a unit step of the wall is K(sigma):
 * <pre>
 *   r(t) = A sin(phase) K(t) + A omega integral_0^t cos(omega (t - sigma) + phase) K(sigma) d sigma
 * </pre>
 * (the jump A sin(phase) at t = 0 followed by the wall's smooth change). Substituting sigma = rho^2,
 * <pre>
 *   integral_0^t ... d sigma = integral_0^sqrt(t) cos(omega (t - rho^2) + phase) K(rho^2) 2 rho d rho,
 * </pre>
 * which turns the integrable singularity of a wall-stress kernel, K ~ -1/sqrt(pi nu sigma), into a bounded
 * integrand.
 *
 * <p>Quadrature: Commons Math's Gauss–Legendre integrator ({@link PiecewiseQuadrature}) on pieces of
 * [0, sqrt(t)] that (i) halve geometrically from sqrt(t) down to a sixteenth of sqrt(featureTime), the time
 * at which the kernel at the point asked rises from zero (y^2 / (4 nu) for a point at depth y; below it the
 * kernel is smaller than erfc(16)), and (ii) span at most a quarter period of the wall each, to
 * {@link #RELATIVE_ACCURACY} of the integral of |integrand| (or to the rounding of the phase omega t after
 * many periods). The cost grows with the number of periods; callers switch to a periodic-plus-transient form
 * after the first ones.
 */
final class SineDuhamel {
    /** Accuracy of the integral, relative to the integral of the magnitude of its integrand. */
    static final double RELATIVE_ACCURACY = 1e-13;
    /** Multiple of the rounding of the phase omega t below which the integral is not refined. */
    private static final double PHASE_ROUNDING = 64;
    private static final double MAX_PHASE_PER_PIECE = Math.PI / 2;
    private static final int MAX_HALVINGS = 60;

    private SineDuhamel() {
    }

    /**
     * @param stepResponse K(sigma), the response at elapsed time sigma &gt; 0 (s) to a unit wall step
     * @param featureTime time (s) at which K starts to rise from zero; 0 when it does not start from zero
     * @param amplitude A (m/s)
     * @param omega angular frequency (rad/s)
     * @param phase rad
     * @param t time (s), above zero
     */
    static double response(DoubleUnaryOperator stepResponse, double featureTime, double amplitude, double omega,
                           double phase, double t) {
        double jumpPart = amplitude * Math.sin(phase) * stepResponse.applyAsDouble(t);
        UnivariateFunction integrand = rho -> {
            double sigma = rho * rho;
            return 2 * rho * Math.cos(omega * (t - sigma) + phase) * stepResponse.applyAsDouble(sigma);
        };
        // the phase omega (t - rho^2) carries a rounding error of about ulp(omega t): no piece can be resolved better
        double accuracy = Math.max(RELATIVE_ACCURACY, PHASE_ROUNDING * Math.ulp(omega * t));
        return jumpPart + amplitude * omega
                * PiecewiseQuadrature.integrate(integrand, breakpoints(t, featureTime, omega), accuracy);
    }

    /** Increasing breakpoints in rho = sqrt(sigma) from 0 to sqrt(t). */
    private static double[] breakpoints(double t, double featureTime, double omega) {
        List<Double> graded = new ArrayList<>();
        double top = Math.sqrt(t);
        graded.add(0.0);
        if (featureTime > 0) {
            double floor = Math.sqrt(featureTime) / 16;
            double rho = top / Math.pow(2, MAX_HALVINGS);
            while (rho < floor) {
                rho *= 2;
            }
            for (; rho < top; rho *= 2) {
                graded.add(rho);
            }
        }
        graded.add(top);
        List<Double> breaks = new ArrayList<>();
        breaks.add(0.0);
        for (int i = 1; i < graded.size(); i++) {
            double lo2 = graded.get(i - 1) * graded.get(i - 1);
            double hi2 = graded.get(i) * graded.get(i);
            int parts = (int) Math.max(1, Math.ceil(omega * (hi2 - lo2) / MAX_PHASE_PER_PIECE));
            for (int j = 1; j < parts; j++) {
                breaks.add(Math.sqrt(lo2 + j * (hi2 - lo2) / parts));
            }
            breaks.add(graded.get(i));
        }
        return breaks.stream().mapToDouble(Double::doubleValue).toArray();
    }
}
