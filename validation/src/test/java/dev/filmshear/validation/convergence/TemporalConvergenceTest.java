package dev.filmshear.validation.convergence;

import dev.filmshear.solver.model.FilmCase;
import dev.filmshear.solver.model.FilmResult;
import dev.filmshear.solver.model.FilmSolver;
import dev.filmshear.solver.model.GridSpec;
import dev.filmshear.solver.model.History;
import dev.filmshear.solver.model.SolverOptions;
import dev.filmshear.solver.physics.FilmPhysics;
import dev.filmshear.solver.physics.WallMotion;
import dev.filmshear.solver.time.DirkScheme;
import dev.filmshear.solver.time.StepControl;
import org.junit.jupiter.api.Test;

import static org.junit.jupiter.api.Assertions.assertTrue;

/**
 * Observed order of accuracy in time: a film in a gap whose upper wall oscillates from rest
 * (u = U sin(omega t), the finite-gap Stokes problem of L. D. Landau and E. M. Lifshitz, <i>Fluid
 * Mechanics</i>, section 24), marched with equal steps dt, dt/2, dt/4, dt/8 on one grid. To isolate the time
 * error from the space error, each run is compared with the same grid marched at dt/128 (whose own time error
 * is then far below the coarse runs'). TR-BDF2 must show order 2; backward Euler, kept as a deliberately
 * first-order scheme, must be caught with order 1, which shows the test can fail.
 */
class TemporalConvergenceTest {
    private static final double BAND = 0.2;
    private static final double GAP = 1e-4;
    private static final double DENSITY = 870;
    private static final double VISCOSITY = 0.04;
    private static final double DIFFUSION_TIME = GAP * GAP * DENSITY / VISCOSITY;
    private static final double END = 0.5 * DIFFUSION_TIME;
    private static final double COARSE_STEP = END / 40;

    private static double[] run(DirkScheme scheme, double step) {
        FilmPhysics physics = FilmPhysics.isothermalCouette(GAP, DENSITY, VISCOSITY, new WallMotion.Steady(0),
                new WallMotion.Sine(0, 1, 1 / (0.4 * DIFFUSION_TIME), 0));
        FilmCase filmCase = FilmCase.until(physics, END).withGrid(new GridSpec(81, 0));
        FilmResult r = FilmSolver.solve(filmCase, SolverOptions.defaults().withScheme(scheme)
                .withStepControl(StepControl.Fixed.of(step)));
        double[] u = r.finalSnapshot().velocity();
        int row = r.history().rowAt(END);
        double[] out = new double[u.length + 2];
        System.arraycopy(u, 0, out, 0, u.length);
        out[u.length] = r.history().get(History.Column.WALL_SHEAR_STRESS_LOWER, row);
        out[u.length + 1] = r.history().get(History.Column.WALL_SHEAR_STRESS_UPPER, row);
        return out;
    }

    private static double[] orders(DirkScheme scheme) {
        double[] reference = run(scheme, COARSE_STEP / 128);
        int levels = 4;
        double[] error = new double[levels];
        for (int k = 0; k < levels; k++) {
            double[] v = run(scheme, COARSE_STEP / (1 << k));
            double max = 0;
            for (int i = 0; i < v.length - 2; i++) {
                max = Math.max(max, Math.abs(v[i] - reference[i]));
            }
            error[k] = max;
        }
        double[] orders = new double[levels - 1];
        for (int k = 1; k < levels; k++) {
            orders[k - 1] = Math.log(error[k - 1] / error[k]) / Math.log(2);
        }
        return orders;
    }

    @Test
    void trBdf2IsSecondOrderInTime() {
        for (double order : orders(DirkScheme.TR_BDF2)) {
            assertTrue(Math.abs(order - 2) <= BAND, "observed order " + order);
        }
    }

    @Test
    void backwardEulerIsCaughtAsFirstOrder() {
        for (double order : orders(DirkScheme.BACKWARD_EULER)) {
            assertTrue(Math.abs(order - 1) <= BAND, "observed order " + order);
            assertTrue(order < 2 - BAND, "a first-order scheme must fail the second-order band");
        }
    }
}
