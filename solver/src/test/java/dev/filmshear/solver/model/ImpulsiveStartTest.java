package dev.filmshear.solver.model;

import dev.filmshear.solver.physics.FilmPhysics;
import dev.filmshear.solver.physics.WallMotion;
import dev.filmshear.solver.time.DirkScheme;
import dev.filmshear.solver.time.StepControl;
import org.junit.jupiter.api.Test;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

/**
 * An impulsive start puts a velocity jump at the moving wall. In the exact start-up solution the velocity
 * at every point rises monotonically in time towards the steady profile (the Fourier series of Bird,
 * Stewart and Lightfoot, <i>Transport Phenomena</i>, 2nd ed., 2002, section 4.1, has a time derivative of one
 * sign). With steps fifty times the diffusion time of one grid cell, the first step of any one-step scheme
 * overshoots near the jump; an L-stable scheme (TR-BDF2) then damps the jump's grid-scale modes at once and
 * the velocity rises monotonically within 0 &lt;= u &lt;= U, while the A-stable Crank–Nicolson scheme carries
 * them on step after step with alternating sign, the well-known ringing (P. M. Gresho and R. L. Lee,
 * Computers and Fluids 9 (1981) 223-253, from memory). The adaptive controller keeps the first overshoot at
 * the tolerance by taking short first steps; these fixed steps are deliberately too long.
 */
class ImpulsiveStartTest {
    private static final double GAP = 1e-4;
    private static final double NU = 0.04 / 870;

    /**
     * Largest drop in time of the velocity at any node and largest excursion outside [0, U], both after the
     * second step, and the excursion of the first step.
     */
    private static double[] worstRinging(DirkScheme scheme) {
        FilmPhysics physics = FilmPhysics.isothermalCouette(GAP, 870, 0.04, new WallMotion.Steady(0),
                new WallMotion.Steady(1));
        double tau = GAP * GAP / NU;
        double cellTime = Math.pow(GAP / 100, 2) / NU;
        FilmCase filmCase = FilmCase.until(physics, 0.05 * tau).withGrid(new GridSpec(101, 0));
        FilmModel model = new FilmModel(filmCase, SolverOptions.defaults().withScheme(scheme)
                .withStepControl(StepControl.Fixed.of(50 * cellTime)));
        double worstDrop = 0;
        double worstExcursion = 0;
        double firstExcursion = 0;
        double[] previous = new double[model.points()];
        boolean landed;
        do {
            landed = model.advance(0.05 * tau);
            for (int i = 1; i < model.points() - 1; i++) {
                double u = model.velocity(i);
                double excursion = Math.max(u - 1, -u);
                if (model.steps() == 1) {
                    firstExcursion = Math.max(firstExcursion, excursion);
                } else {
                    worstExcursion = Math.max(worstExcursion, excursion);
                    if (model.steps() > 2) {
                        worstDrop = Math.max(worstDrop, previous[i] - u);
                    }
                }
                previous[i] = u;
            }
        } while (!landed);
        return new double[] {worstDrop, worstExcursion, firstExcursion};
    }

    @Test
    void trBdf2DoesNotRingButCrankNicolsonDoes() {
        double[] trBdf2 = worstRinging(DirkScheme.TR_BDF2);
        double[] crankNicolson = worstRinging(DirkScheme.CRANK_NICOLSON);
        assertTrue(trBdf2[0] < 1e-12, "TR-BDF2: velocity fell by " + trBdf2[0]);
        assertTrue(trBdf2[1] < 1e-12, "TR-BDF2: velocity left [0, U] by " + trBdf2[1]);
        assertTrue(trBdf2[2] < 0.02, "TR-BDF2: first-step overshoot " + trBdf2[2]);
        assertTrue(crankNicolson[0] > 0.1, "Crank-Nicolson should ring, fell by " + crankNicolson[0]);
        assertTrue(crankNicolson[1] > 0.1, "Crank-Nicolson should leave [0, U], by " + crankNicolson[1]);
    }

    /**
     * Steady plane Couette–Poiseuille flow u = U eta + (h^2 / (2 mu)) (-dp/dx) eta (1 - eta) is quadratic,
     * which the three-point flux difference on a uniform grid reproduces to round-off (F. M. White,
     * <i>Viscous Fluid Flow</i>, 3rd ed., 2006, ch. 3; section number from memory).
     */
    @Test
    void steadyCouettePoiseuilleIsExactOnAUniformGrid() {
        double mu = 0.04;
        double dpdx = -2e6;
        double u = 2;
        FilmPhysics physics = FilmPhysics.isothermalCouette(GAP, 870, mu, new WallMotion.Steady(0),
                new WallMotion.Steady(u)).withPressureGradient(dpdx);
        FilmResult result = FilmSolver.solve(FilmCase.steady(physics).withGrid(new GridSpec(21, 0)));
        Snapshot s = result.finalSnapshot();
        double[] y = s.y();
        double[] velocity = s.velocity();
        for (int i = 0; i < y.length; i++) {
            double eta = y[i] / GAP;
            double exact = u * eta + GAP * GAP / (2 * mu) * (-dpdx) * eta * (1 - eta);
            assertEquals(exact, velocity[i], 1e-12 * u);
        }
        // wall shear mu du/dy at eta = 0 and 1: mu U/h +- (h/2)(-dp/dx), exact for the three-point formula too
        assertEquals(mu * u / GAP + GAP / 2 * (-dpdx), result.summary().wallShearStressLower(), 1e-9);
        assertEquals(mu * u / GAP - GAP / 2 * (-dpdx), result.summary().wallShearStressUpper(), 1e-9);
        assertTrue(result.summary().steady());
    }
}
