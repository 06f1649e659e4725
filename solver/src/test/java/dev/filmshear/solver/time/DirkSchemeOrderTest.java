package dev.filmshear.solver.time;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.EnumSource;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

/**
 * Every registered scheme against the Prothero–Robinson problem y' = lambda (y - g(t)) + g'(t), whose
 * exact solution is y = g(t) for y(0) = g(0) (A. Prothero and A. Robinson, Math. Comp. 28 (1974) 145-162).
 * Each scheme must show its declared order under fixed-step refinement, and its tableau must satisfy the
 * order conditions it claims.
 */
class DirkSchemeOrderTest {
    /** Observed orders within this band of the declared order pass. */
    private static final double ORDER_BAND = 0.2;

    /** The scalar test problem with g(t) = sin t. */
    static final class ProtheroRobinson implements ImplicitSystem {
        private final double lambda;
        private double tolerance = 1e-6;

        ProtheroRobinson(double lambda) {
            this.lambda = lambda;
        }

        @Override
        public int size() {
            return 1;
        }

        @Override
        public void setTolerance(double tolerance) {
            this.tolerance = tolerance;
        }

        @Override
        public void rate(double t, double[] y, double[] k) {
            k[0] = lambda * (y[0] - Math.sin(t)) + Math.cos(t);
        }

        private double lastG;

        @Override
        public int solveStage(double t, double g, double[] z, double[] y) {
            // (Y - Z) - g (lambda (Y - sin t) + cos t) = 0, linear in Y
            y[0] = (z[0] + g * (-lambda * Math.sin(t) + Math.cos(t))) / (1 - g * lambda);
            lastG = g;
            return 1;
        }

        @Override
        public void filterError(double[] e) {
            e[0] /= 1 - lastG * lambda;
        }

        @Override
        public double errorNorm(double[] e, double[] yOld, double[] yNew) {
            return Math.abs(e[0]) / (tolerance * (1 + Math.abs(yNew[0])));
        }

        @Override
        public boolean isLinear() {
            return true;
        }
    }

    private static double errorAtEnd(DirkScheme scheme, double step, double lambda) {
        DirkIntegrator integrator = new DirkIntegrator(new ProtheroRobinson(lambda), scheme, StepControl.Fixed.of(step));
        integrator.start(0, new double[] {0}, step, 1e-14);
        while (!integrator.step(1.0)) {
            // fixed steps until the end
        }
        assertEquals(1.0, integrator.time(), 0, "landed exactly on the end time");
        return Math.abs(integrator.state(0) - Math.sin(1.0));
    }

    @ParameterizedTest
    @EnumSource(DirkScheme.class)
    void observedOrderMatchesDeclaredOrder(DirkScheme scheme) {
        double[] steps = {0.1, 0.05, 0.025, 0.0125};
        double[] errors = new double[steps.length];
        for (int i = 0; i < steps.length; i++) {
            errors[i] = errorAtEnd(scheme, steps[i], -2.0);
        }
        for (int i = 1; i < steps.length; i++) {
            double order = Math.log(errors[i - 1] / errors[i]) / Math.log(2);
            assertEquals(scheme.order(), order, ORDER_BAND, scheme + " refinement " + i + " errors " + errors[i - 1]
                    + " -> " + errors[i]);
        }
    }

    @ParameterizedTest
    @EnumSource(DirkScheme.class)
    void tableauSatisfiesTheOrderConditionsItClaims(DirkScheme scheme) {
        int s = scheme.stages();
        double sumB = 0;
        double sumBc = 0;
        double sumBHat = 0;
        double sumBHatC = 0;
        for (int j = 0; j < s; j++) {
            sumB += scheme.b(j);
            sumBc += scheme.b(j) * scheme.c(j);
            sumBHat += scheme.bHat(j);
            sumBHatC += scheme.bHat(j) * scheme.c(j);
            double rowSum = 0;
            for (int k = 0; k <= j; k++) {
                rowSum += scheme.a(j, k);
            }
            assertEquals(scheme.c(j), rowSum, 1e-15, "row sum equals c (internal consistency)");
        }
        assertEquals(1, sumB, 1e-15);
        assertEquals(1, sumBHat, 1e-15);
        if (scheme.order() >= 2) {
            assertEquals(0.5, sumBc, 1e-15);
        }
        if (scheme.embeddedOrder() >= 2) {
            assertEquals(0.5, sumBHatC, 1e-15);
        }
        if (scheme.embeddedOrder() >= 3) {
            double sumBHatC2 = 0;
            double sumBHatAc = 0;
            for (int j = 0; j < s; j++) {
                sumBHatC2 += scheme.bHat(j) * scheme.c(j) * scheme.c(j);
                double ac = 0;
                for (int k = 0; k < s; k++) {
                    ac += scheme.a(j, k) * scheme.c(k);
                }
                sumBHatAc += scheme.bHat(j) * ac;
            }
            assertEquals(1.0 / 3, sumBHatC2, 1e-15);
            assertEquals(1.0 / 6, sumBHatAc, 1e-15);
        }
    }

    /** L-stability: the stability function R(z) tends to 0 as z -> -infinity (Hairer and Wanner II, IV.3). */
    @ParameterizedTest
    @EnumSource(DirkScheme.class)
    void stiffDecayMatchesLStabilityClaim(DirkScheme scheme) {
        // one step of y' = lambda y with h lambda = -1e8 from y = 1 (g = 0 in the problem above is not this
        // problem, so use lambda with sin-term removed by starting on the solution's stiff part)
        double lambda = -1e8;
        DirkIntegrator integrator = new DirkIntegrator(new ProtheroRobinson(lambda), scheme, StepControl.Fixed.of(1.0));
        integrator.start(0, new double[] {1}, 1, 1e-14);
        integrator.step(1.0);
        double departure = Math.abs(integrator.state(0) - Math.sin(1.0));
        if (scheme.isLStable()) {
            assertTrue(departure < 1e-6, scheme + ": initial departure should be damped, was " + departure);
        } else {
            assertTrue(departure > 0.5, scheme + ": an A-stable scheme keeps a stiff departure, was " + departure);
        }
    }

    @Test
    void adaptiveStepsMeetTheToleranceAndLandOnTheStop() {
        for (double tol : new double[] {1e-4, 1e-6, 1e-8}) {
            DirkIntegrator integrator = new DirkIntegrator(new ProtheroRobinson(-50), DirkScheme.TR_BDF2,
                    StepControl.Adaptive.of(tol));
            integrator.start(0, new double[] {0}, 1e-3, 1e-14);
            while (!integrator.step(2.0)) {
                // adaptive steps
            }
            assertEquals(2.0, integrator.time(), 0);
            double error = Math.abs(integrator.state(0) - Math.sin(2.0));
            // local control at tol keeps the global error within a modest multiple of tol
            assertTrue(error < 20 * tol, "tol " + tol + " error " + error);
        }
    }
}
