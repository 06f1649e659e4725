package dev.filmshear.validation.analytic;

import dev.filmshear.solver.base.InvalidParameterException;
import dev.filmshear.solver.physics.WallMotion;
import org.apache.commons.math3.analysis.integration.IterativeLegendreGaussIntegrator;
import org.apache.commons.math3.special.Erf;
import org.junit.jupiter.api.Test;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

/** Stokes' first problem: a wall started in fluid without bound, impulsively or along a ramp or table. */
class StokesFirstProblemTest {
    /** references.md 7(b) prints erfc to seven decimals. */
    private static final double ERFC_ROUNDING = 5e-8;
    /** Similarity depths printed to six decimals. */
    private static final double DEPTH_ROUNDING = 5e-7;
    /** Centred second differences with steps of 1e-3 of the layer scale: truncation near 1e-6 of the
     * velocity scale; rounding of u/dy^2 stays far below. */
    private static final double RESIDUAL = 2e-5;
    /** Quadrature of erfc to 1e-13 against the i2erfc closed form. */
    private static final double QUADRATURE = 1e-11;

    // VG 46 oil at 40 degC, references.md 7(b) example: mu = 0.040 Pa s, nu = 46e-6 m^2/s
    private static final double MU = 0.040;
    private static final double NU = 46e-6;
    private static final double RHO = MU / NU;

    @Test
    void impulsiveStartFollowsErfc() {
        // Bird, Stewart & Lightfoot, Transport Phenomena, 2nd ed., 2002, Example 4.1-1: u/U = erfc(y/(2 sqrt(nu t)));
        // erfc values from references.md 7(b).
        StokesFirstProblem layer = new StokesFirstProblem(RHO, MU, new WallMotion.Steady(1), 0);
        double t = 0.01;
        double scale = 2 * Math.sqrt(NU * t);
        double[][] table = {{0.25, 0.7236736}, {0.5, 0.4795001}, {1, 0.1572992}, {1.5, 0.0338949}, {2, 0.0046777}};
        for (double[] row : table) {
            assertEquals(row[1], layer.velocity(row[0] * scale, t), ERFC_ROUNDING, "erfc(" + row[0] + ")");
        }
    }

    @Test
    void similarityDepthsOfOneAndFivePercent() {
        // references.md 7(b): u/U = 0.01 at y/(2 sqrt(nu t)) = 1.821386, so delta99 = 3.6428 sqrt(nu t);
        // u/U = 0.05 at 1.385904.
        assertEquals(1.821386, StokesFirstProblem.similarityDepth(0.01), DEPTH_ROUNDING);
        assertEquals(1.385904, StokesFirstProblem.similarityDepth(0.05), DEPTH_ROUNDING);
        assertEquals(3.6428, StokesFirstProblem.depthOfFraction(1, 1, 0.01), 5e-5);
        assertEquals(0.01, Erf.erfc(StokesFirstProblem.similarityDepth(0.01)), 1e-15);
    }

    @Test
    void oilExampleWallStressAndLayerThickness() {
        // references.md 7(b) example (BSL Example 4.1-1 formula): mu = 0.040 Pa s, nu = 46e-6 m^2/s, U = 1 m/s,
        // t = 0.01 s give |tau_w| = 33.274 Pa and delta99 = 2.4706 mm.
        StokesFirstProblem layer = new StokesFirstProblem(RHO, MU, new WallMotion.Steady(1), 0);
        assertEquals(-33.274, layer.wallShearStress(0.01), 5e-4);
        assertEquals(2.4706e-3, StokesFirstProblem.depthOfFraction(NU, 0.01, 0.01), 5e-8);
        assertEquals(0.01, layer.velocity(2.4706e-3, 0.01), 1e-5);
    }

    @Test
    void rampResponseIsTheTimeIntegralOfTheStepResponse() {
        // Carslaw & Jaeger, Conduction of Heat in Solids, 2nd ed., 1959, §2.5: integral_0^t erfc(y/(2 sqrt(nu s))) ds
        // = 4 t i2erfc(y/(2 sqrt(nu t))); checked here against Commons Math quadrature of erfc.
        double rate = 30;
        double t = 0.02;
        StokesFirstProblem layer = new StokesFirstProblem(RHO, MU, new WallMotion.Ramp(0, rate * 1, 0, 1), 0);
        IterativeLegendreGaussIntegrator integrator = new IterativeLegendreGaussIntegrator(16, 1e-13, 1e-16);
        for (double y : new double[] {0, 2e-4, 1e-3, 3e-3}) {
            double quadrature = rate * integrator.integrate(100_000,
                    s -> Erf.erfc(y / (2 * Math.sqrt(NU * s))), 0, t);
            assertEquals(quadrature, layer.velocity(y, t), QUADRATURE, "y = " + y);
        }
        // wall stress of a ramp: -2 mu s sqrt(t/(pi nu))
        assertEquals(-2 * MU * rate * Math.sqrt(t / (Math.PI * NU)), layer.wallShearStress(t), 1e-12);
    }

    @Test
    void rampTendsToTheImpulsiveStartAsItsDurationShrinks() {
        // Duhamel's principle: (U/d)[R(t) - R(t - d)] -> U erfc as d -> 0, with an error of order d.
        double t = 0.01;
        double y = 5e-4;
        StokesFirstProblem step = new StokesFirstProblem(RHO, MU, new WallMotion.Steady(2), 0);
        double previous = Double.POSITIVE_INFINITY;
        for (double duration : new double[] {1e-3, 1e-4, 1e-5}) {
            StokesFirstProblem ramp = new StokesFirstProblem(RHO, MU, new WallMotion.Ramp(0, 2, 0, duration), 0);
            double error = Math.abs(ramp.velocity(y, t) - step.velocity(y, t));
            double stressError = Math.abs(ramp.wallShearStress(t) / step.wallShearStress(t) - 1);
            assertTrue(error < 0.11 * previous, "first-order convergence in the ramp duration");
            assertTrue(stressError < duration / t, "wall stress approaches the impulsive value");
            previous = error;
        }
        assertTrue(previous < 1e-4 * 2, "within 1e-4 of the wall speed at d = 1e-3 t");
    }

    @Test
    void tableHistorySatisfiesTheDiffusionEquationAndTheWallCondition() {
        // The governing equation du/dt = nu d2u/dy2 (BSL Eq. 4.1-2 form), checked by centred differences, with a
        // wall that starts from 1.5 m/s in fluid moving at 0.5 m/s and follows a table.
        WallMotion.Table table = new WallMotion.Table(new double[] {0, 0.002, 0.005, 0.008},
                new double[] {1.5, 3, 2, -1});
        StokesFirstProblem layer = new StokesFirstProblem(RHO, MU, table, 0.5);
        for (double t : new double[] {0.001, 0.003, 0.006, 0.012}) {
            double length = Math.sqrt(NU * t);
            double dy = 1e-3 * length;
            double dt = 1e-4 * t;
            for (double y : new double[] {0.3 * length, length, 2 * length}) {
                double ut = (layer.velocity(y, t + dt) - layer.velocity(y, t - dt)) / (2 * dt);
                double uyy = (layer.velocity(y + dy, t) - 2 * layer.velocity(y, t) + layer.velocity(y - dy, t))
                        / (dy * dy);
                assertEquals(0, (ut - NU * uyy) * t, RESIDUAL, "residual at t = " + t + ", y = " + y);
            }
            assertEquals(table.velocity(t), layer.velocity(0, t), 1e-13, "wall value at t = " + t);
            double slope = (-3 * layer.velocity(0, t) + 4 * layer.velocity(dy, t) - layer.velocity(2 * dy, t))
                    / (2 * dy);
            assertEquals(MU * slope, layer.wallShearStress(t), 1e-5 * Math.abs(layer.wallShearStress(t)));
        }
        assertEquals(0.5, layer.velocity(1, 0.012), 1e-15);
    }

    @Test
    void refusesAnOscillatingWallAndTimesOutsideTheSolution() {
        assertThrows(InvalidParameterException.class,
                () -> new StokesFirstProblem(RHO, MU, new WallMotion.Sine(0, 1, 50, 0), 0));
        StokesFirstProblem layer = new StokesFirstProblem(RHO, MU, new WallMotion.Steady(1), 0);
        assertFalse(layer.appliesAt(0));
        assertFalse(layer.appliesAt(Double.POSITIVE_INFINITY));
        assertFalse(layer.hasUpperWall());
        assertThrows(InvalidParameterException.class, () -> layer.velocity(0, 0));
    }
}
