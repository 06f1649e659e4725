package dev.filmshear.solver.physics;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.apache.commons.math3.analysis.interpolation.SplineInterpolator;
import org.apache.commons.math3.analysis.polynomials.PolynomialSplineFunction;
import org.junit.jupiter.api.Test;

/**
 * Monotone (Fritsch-Carlson) interpolation of ln mu. Properties from F. N. Fritsch and R. E. Carlson,
 * SIAM J. Numer. Anal. 17 (1980) 238-246: the interpolant passes through the data, is C1, and is
 * monotone on every interval where the data are.
 */
class TabulatedViscosityTest {

    /** Reproducing a straight line in ln mu (an exponential law) involves only rounding. */
    private static final double EXPONENTIAL_TOLERANCE = 1e-12;
    /**
     * Left and right derivatives 1e-9 K either side of a node differ only by mu'' times the gap (below 1e-7
     * relative even at the knee below, where mu'' is largest); a jump in the slope would not shrink with it.
     */
    private static final double CONTINUITY_TOLERANCE = 1e-6;
    private static final double NODE_GAP = 1e-9;
    private static final int DENSE_SAMPLES = 2000;

    /** A table with a sharp knee, where an ordinary cubic spline overshoots. */
    private static final double[] KNEE_T = {300, 320, 340, 360, 380, 400};
    private static final double[] KNEE_MU = {1.0, 0.9, 0.89, 0.888, 0.2, 0.19};

    @Test
    void reproducesItsNodesExactly() {
        double[] t = {293.15, 313.15, 333.15, 353.15, 373.15};
        double[] mu = {0.1103, 0.04007, 0.01803, 0.009812, 0.005913};
        TabulatedViscosity law = new TabulatedViscosity(t, mu);
        for (int k = 0; k < t.length; k++) {
            assertEquals(mu[k], law.mu(t[k]), 0, "node " + k);
        }
        assertEquals(293.15, law.validFrom(), 0);
        assertEquals(373.15, law.validTo(), 0);
    }

    @Test
    void monotoneBetweenMonotoneDataWithoutOvershoot() {
        TabulatedViscosity law = new TabulatedViscosity(KNEE_T, KNEE_MU);
        double previous = law.mu(KNEE_T[0]);
        for (int k = 1; k <= DENSE_SAMPLES; k++) {
            double t = KNEE_T[0] + (KNEE_T[KNEE_T.length - 1] - KNEE_T[0]) * k / DENSE_SAMPLES;
            double mu = law.mu(t);
            assertTrue(mu <= previous, "rises at " + t + " K");
            int interval = Math.min((int) ((t - KNEE_T[0]) / 20), KNEE_T.length - 2);
            assertTrue(mu <= KNEE_MU[interval] && mu >= KNEE_MU[interval + 1], "leaves its interval's bounds at " + t);
            previous = mu;
        }
    }

    /** The monotonicity test can fail: a natural cubic spline (Commons Math) of the same ln mu data rises. */
    @Test
    void ordinarySplineOfTheSameDataOvershoots() {
        double[] logMu = new double[KNEE_MU.length];
        for (int k = 0; k < logMu.length; k++) {
            logMu[k] = Math.log(KNEE_MU[k]);
        }
        PolynomialSplineFunction spline = new SplineInterpolator().interpolate(KNEE_T, logMu);
        boolean rises = false;
        for (int k = 1; k <= DENSE_SAMPLES && !rises; k++) {
            double t0 = KNEE_T[0] + 100.0 * (k - 1) / DENSE_SAMPLES;
            double t1 = KNEE_T[0] + 100.0 * k / DENSE_SAMPLES;
            rises = spline.value(t1) > spline.value(t0);
        }
        assertTrue(rises);
    }

    @Test
    void derivativeContinuousAtNodesAndEnds() {
        TabulatedViscosity law = new TabulatedViscosity(KNEE_T, KNEE_MU);
        for (double node : KNEE_T) {
            double left = law.dMuDT(node - NODE_GAP);
            double right = law.dMuDT(node + NODE_GAP);
            double scale = Math.max(Math.abs(left), 1e-3 * law.mu(node));
            assertEquals(left, right, CONTINUITY_TOLERANCE * scale, "at node " + node + " K");
            assertEquals(law.dMuDT(node), right, CONTINUITY_TOLERANCE * scale, "value at node " + node + " K");
        }
    }

    /** Data from an exponential law lie on a straight line in ln mu, which the method reproduces exactly. */
    @Test
    void reproducesAnExponentialLawEverywhere() {
        ExponentialViscosity exact = ExponentialViscosity.of(0.04, 313.15, 0.031);
        double[] t = {290, 301, 317, 333, 341};
        double[] mu = new double[t.length];
        for (int k = 0; k < t.length; k++) {
            mu[k] = exact.mu(t[k]);
        }
        TabulatedViscosity law = new TabulatedViscosity(t, mu, 280, 360);
        for (double temperature = 280; temperature <= 360; temperature += 0.7) {
            assertEquals(exact.mu(temperature), law.mu(temperature), EXPONENTIAL_TOLERANCE * exact.mu(temperature));
            assertEquals(exact.dMuDT(temperature), law.dMuDT(temperature),
                    EXPONENTIAL_TOLERANCE * Math.abs(exact.dMuDT(temperature)));
        }
    }

    /** A flat stretch of data stays flat (Fritsch-Carlson: zero slopes on an interval with zero secant). */
    @Test
    void flatDataStayFlat() {
        TabulatedViscosity law = new TabulatedViscosity(new double[] {300, 310, 320, 330},
                new double[] {0.05, 0.03, 0.03, 0.02});
        for (double t = 310; t <= 320; t += 0.5) {
            assertEquals(0.03, law.mu(t), 1e-15, "at " + t + " K");
        }
    }

    @Test
    void kinematicTableUsesTheDensityAtEachNode() {
        DensityLaw density = new DensityLaw(870, 288.15, 7e-4);
        double[] t = {313.15, 373.15};
        TabulatedViscosity law = TabulatedViscosity.kinematic(t, new double[] {46e-6, 6.8e-6}, density);
        assertEquals(46e-6 * density.density(313.15), law.mu(313.15), 0);
        assertEquals(6.8e-6 * density.density(373.15), law.mu(373.15), 0);
    }

    @Test
    void holdsCopiesOfItsArrays() {
        double[] t = {300, 320};
        double[] mu = {0.03, 0.02};
        TabulatedViscosity law = new TabulatedViscosity(t, mu);
        t[0] = 250;
        mu[0] = 1;
        law.temperatures()[1] = 999;
        assertArrayEquals(new double[] {300, 320}, law.temperatures());
        assertArrayEquals(new double[] {0.03, 0.02}, law.viscosities());
        assertEquals(new TabulatedViscosity(new double[] {300, 320}, new double[] {0.03, 0.02}), law);
    }
}
