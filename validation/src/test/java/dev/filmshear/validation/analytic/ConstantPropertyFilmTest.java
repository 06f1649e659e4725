package dev.filmshear.validation.analytic;

import dev.filmshear.solver.physics.WallMotion;
import org.apache.commons.math3.analysis.integration.gauss.GaussIntegratorFactory;
import org.junit.jupiter.api.Test;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

/**
 * The general constant-property film (any wall histories, pressure gradient, initial velocity) checked against
 * its defining problem: the momentum equation rho u_t = mu u_yy - dp/dx (Bird, Stewart & Lightfoot, Transport
 * Phenomena, 2nd ed., 2002, Eq. 4.1-2 form), the wall conditions, the initial state and the integral momentum
 * balance, across the switch between image and Fourier forms.
 */
class ConstantPropertyFilmTest {
    /** Centred differences with steps of 1e-3 of the length and time scales: truncation near 1e-6 of the
     * velocity scale. */
    private static final double RESIDUAL = 3e-5;
    /** Exact superposition: wall values to rounding. */
    private static final double ROUNDING = 1e-12;
    /** 24-point Gauss–Legendre on 16 pieces integrates the erfc-like layers (thicker than h/50 at the earliest
     * time) to better than 1e-11 of U h. */
    private static final double QUADRATURE = 1e-10;

    private static final double GAP = 30e-6;
    private static final double RHO = 870;
    private static final double MU = 0.04;
    private static final double GRADIENT = -3e7;
    private static final double U0 = 0.4;

    private static final WallMotion.Table LOWER_TABLE = new WallMotion.Table(
            new double[] {0, 2e-6, 5e-6, 9e-6}, new double[] {1, 4, -2, 3});
    private static final WallMotion.Ramp UPPER_RAMP = new WallMotion.Ramp(-1, 6, 1e-6, 4e-6);

    private final ConstantPropertyFilm piecewise =
            new ConstantPropertyFilm(GAP, RHO, MU, LOWER_TABLE, UPPER_RAMP, GRADIENT, U0);
    private final ConstantPropertyFilm oscillating = new ConstantPropertyFilm(GAP, RHO, MU,
            new WallMotion.Sine(0.5, 2, 2e4, 0.6), new WallMotion.Steady(-1), GRADIENT, U0);

    /** tau values on both sides of the image/Fourier switch (0.1) and of the oscillation switch (1e-3). */
    private static final double[] TAUS = {5e-4, 2e-3, 0.03, 0.09, 0.11, 0.4, 1.5};

    private static void checkMomentumEquation(ConstantPropertyFilm film) {
        double nu = film.kinematicViscosity();
        double scale = 5;
        for (double tau : TAUS) {
            double t = tau * film.diffusionTime();
            double dy = 1e-3 * Math.min(GAP, Math.sqrt(nu * t));
            double dt = 1e-4 * t;
            for (double eta : new double[] {0.05, 0.3, 0.5, 0.8}) {
                double y = eta * GAP;
                double ut = (film.velocity(y, t + dt) - film.velocity(y, t - dt)) / (2 * dt);
                double uyy = (film.velocity(y + dy, t) - 2 * film.velocity(y, t) + film.velocity(y - dy, t))
                        / (dy * dy);
                double residual = RHO * ut - MU * uyy + GRADIENT;
                // scaled by the larger of the inertial and viscous terms' natural size rho U / t
                assertEquals(0, residual * t / (RHO * scale), RESIDUAL, "residual at tau " + tau + ", eta " + eta);
            }
        }
    }

    @Test
    void piecewiseLinearWallsSatisfyTheMomentumEquation() {
        checkMomentumEquation(piecewise);
    }

    @Test
    void oscillatingWallSatisfiesTheMomentumEquation() {
        checkMomentumEquation(oscillating);
    }

    @Test
    void wallValuesFollowTheWallHistories() {
        for (ConstantPropertyFilm film : new ConstantPropertyFilm[] {piecewise, oscillating}) {
            WallMotion lower = film == piecewise ? LOWER_TABLE : new WallMotion.Sine(0.5, 2, 2e4, 0.6);
            WallMotion upper = film == piecewise ? UPPER_RAMP : new WallMotion.Steady(-1);
            for (double tau : TAUS) {
                double t = tau * film.diffusionTime();
                assertEquals(lower.velocity(t), film.velocity(0, t), ROUNDING * 10, "lower wall at tau " + tau);
                assertEquals(upper.velocity(t), film.velocity(GAP, t), ROUNDING * 10, "upper wall at tau " + tau);
            }
        }
    }

    @Test
    void startsFromTheUniformInitialVelocity() {
        // away from the walls the fluid has not yet felt them: erfc(0.2/(2 sqrt(1e-6))) underflows
        double t = 1e-6 * piecewise.diffusionTime();
        double acceleration = -GRADIENT / RHO;
        for (double eta : new double[] {0.2, 0.5, 0.8}) {
            assertEquals(U0 + acceleration * t, piecewise.velocity(eta * GAP, t), ROUNDING);
        }
    }

    @Test
    void wallShearStressesAreTheSlopeOfTheProfile() {
        for (ConstantPropertyFilm film : new ConstantPropertyFilm[] {piecewise, oscillating}) {
            for (double tau : TAUS) {
                double t = tau * film.diffusionTime();
                double dy = 1e-4 * Math.min(GAP, Math.sqrt(film.kinematicViscosity() * t));
                double lower = (-3 * film.velocity(0, t) + 4 * film.velocity(dy, t) - film.velocity(2 * dy, t))
                        / (2 * dy);
                double upper = (3 * film.velocity(GAP, t) - 4 * film.velocity(GAP - dy, t)
                        + film.velocity(GAP - 2 * dy, t))
                        / (2 * dy);
                double scale = Math.abs(film.wallShearStressLower(t)) + Math.abs(film.wallShearStressUpper(t));
                assertEquals(MU * lower, film.wallShearStressLower(t), 1e-5 * scale, "lower at tau " + tau);
                assertEquals(MU * upper, film.wallShearStressUpper(t), 1e-5 * scale, "upper at tau " + tau);
            }
        }
    }

    @Test
    void flowRateIsTheIntegralOfTheProfileAndObeysTheMomentumBalance() {
        // Q = integral u dy (Commons Math Gauss–Legendre quadrature), and dQ/dt = (tau_upper - tau_lower)/rho
        // - (dp/dx) h / rho, the momentum balance of the whole film.
        GaussIntegratorFactory gauss = new GaussIntegratorFactory();
        for (ConstantPropertyFilm film : new ConstantPropertyFilm[] {piecewise, oscillating}) {
            for (double tau : TAUS) {
                double t = tau * film.diffusionTime();
                double integral = 0;
                int pieces = 16;
                for (int i = 0; i < pieces; i++) {
                    integral += gauss.legendre(24, i * GAP / pieces, (i + 1) * GAP / pieces)
                            .integrate(y -> film.velocity(y, t));
                }
                assertEquals(integral, film.flowRate(t), QUADRATURE * 5 * GAP, "Q at tau " + tau);
                double dt = 1e-4 * t;
                double dqdt = (film.flowRate(t + dt) - film.flowRate(t - dt)) / (2 * dt);
                double balance = (film.wallShearStressUpper(t) - film.wallShearStressLower(t) - GRADIENT * GAP) / RHO;
                assertEquals(balance, dqdt, 1e-6 * (Math.abs(balance) + Math.abs(GRADIENT * GAP / RHO)),
                        "momentum balance at tau " + tau);
            }
        }
    }

    @Test
    void rampTendsToTheImpulsiveStartAsItsDurationShrinks() {
        // Duhamel's principle: a ramp of duration d differs from the step by O(d).
        ConstantPropertyFilm step = new ConstantPropertyFilm(GAP, RHO, MU, new WallMotion.Steady(3),
                new WallMotion.Steady(0), 0, 0);
        double t = 0.05 * step.diffusionTime();
        double previous = Double.POSITIVE_INFINITY;
        for (double fraction : new double[] {1e-2, 1e-3, 1e-4}) {
            ConstantPropertyFilm ramp = new ConstantPropertyFilm(GAP, RHO, MU,
                    new WallMotion.Ramp(0, 3, 0, fraction * t), new WallMotion.Steady(0), 0, 0);
            double error = Math.abs(ramp.velocity(0.2 * GAP, t) - step.velocity(0.2 * GAP, t)) / 3;
            assertTrue(error < 0.11 * previous, "first order in the ramp duration");
            previous = error;
        }
        assertTrue(previous < 1e-4);
    }

    @Test
    void tableThroughTheRampCornersEqualsTheRamp() {
        ConstantPropertyFilm asTable = new ConstantPropertyFilm(GAP, RHO, MU, LOWER_TABLE,
                new WallMotion.Table(new double[] {1e-6, 5e-6}, new double[] {-1, 6}), GRADIENT, U0);
        for (double tau : TAUS) {
            double t = tau * piecewise.diffusionTime();
            assertEquals(piecewise.velocity(0.37 * GAP, t), asTable.velocity(0.37 * GAP, t), ROUNDING);
            assertEquals(piecewise.wallShearStressUpper(t), asTable.wallShearStressUpper(t),
                    ROUNDING * Math.abs(piecewise.wallShearStressUpper(t)) + ROUNDING);
        }
    }

    @Test
    void swappingTheWallsMirrorsTheFilm() {
        ConstantPropertyFilm mirrored = new ConstantPropertyFilm(GAP, RHO, MU, UPPER_RAMP, LOWER_TABLE, GRADIENT, U0);
        for (double tau : TAUS) {
            double t = tau * piecewise.diffusionTime();
            assertEquals(piecewise.velocity(0.2 * GAP, t), mirrored.velocity(0.8 * GAP, t), ROUNDING);
            assertEquals(piecewise.wallShearStressLower(t), -mirrored.wallShearStressUpper(t),
                    ROUNDING * Math.abs(piecewise.wallShearStressLower(t)));
        }
    }

    @Test
    void settlesToCouettePoiseuilleFlow() {
        // White, Viscous Fluid Flow, 3rd ed., §3-2 (section number from memory): the steady limit.
        CouettePoiseuilleFlow steady = piecewise.steadyLimit().orElseThrow();
        assertEquals(3, steady.lowerVelocity(), 0);
        assertEquals(6, steady.upperVelocity(), 0);
        double late = 30 * piecewise.diffusionTime();
        for (double eta : new double[] {0.1, 0.5, 0.9}) {
            assertEquals(steady.velocity(eta * GAP), piecewise.velocity(eta * GAP, late), ROUNDING * 10);
            assertEquals(steady.velocity(eta * GAP), piecewise.velocity(eta * GAP, Double.POSITIVE_INFINITY), 0);
        }
        assertEquals(steady.flowRate(), piecewise.flowRate(late), ROUNDING * GAP * 10);
    }
}
