package dev.filmshear.validation.convergence;

import dev.filmshear.solver.model.FilmCase;
import dev.filmshear.solver.model.FilmResult;
import dev.filmshear.solver.model.FilmSolver;
import dev.filmshear.solver.model.GridSpec;
import dev.filmshear.solver.model.History;
import dev.filmshear.solver.model.Snapshot;
import dev.filmshear.solver.physics.FilmPhysics;
import dev.filmshear.solver.physics.WallMotion;
import dev.filmshear.validation.analytic.ConstantPropertyFilm;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.ValueSource;

import static org.junit.jupiter.api.Assertions.assertTrue;

/**
 * Observed order of accuracy in space: the start-up of Couette–Poiseuille flow (upper wall ramped to speed,
 * a pressure gradient along the film) on grids of 21, 41, 81 and 161 nodes, with the time error made
 * negligible (tolerance 1e-11), against the exact solution by eigenfunction expansion and Duhamel's
 * principle ({@link ConstantPropertyFilm}; R. B. Bird, W. E. Stewart, E. N. Lightfoot, <i>Transport
 * Phenomena</i>, 2nd ed., 2002, section 4.1, and F. M. White, <i>Viscous Fluid Flow</i>, 3rd ed., 2006,
 * ch. 3, section number from memory). Uniform and wall-clustered grids must both show order 2 in the
 * velocity profile (max norm) and in the wall shear stress.
 */
class SpatialConvergenceTest {
    /** Observed orders must lie in [2 - BAND, 2 + BAND]. */
    private static final double BAND = 0.2;
    private static final double GAP = 1e-4;
    private static final double DENSITY = 870;
    private static final double VISCOSITY = 0.04;
    private static final double TIME = 0.1 * GAP * GAP * DENSITY / VISCOSITY;

    private static double[] errors(int points, double clustering) {
        FilmPhysics physics = FilmPhysics.isothermalCouette(GAP, DENSITY, VISCOSITY, new WallMotion.Steady(0),
                new WallMotion.Ramp(0, 2, 0, 0.02 * TIME)).withPressureGradient(-3e6);
        FilmCase filmCase = FilmCase.until(physics, TIME).withTolerance(1e-11)
                .withGrid(new GridSpec(points, clustering));
        FilmResult r = FilmSolver.solve(filmCase);
        ConstantPropertyFilm exact = new ConstantPropertyFilm(GAP, DENSITY, VISCOSITY, new WallMotion.Steady(0),
                new WallMotion.Ramp(0, 2, 0, 0.02 * TIME), -3e6, 0);
        Snapshot s = r.finalSnapshot();
        double[] y = s.y();
        double[] u = s.velocity();
        double profile = 0;
        for (int i = 0; i < y.length; i++) {
            profile = Math.max(profile, Math.abs(u[i] - exact.velocity(y[i], TIME)));
        }
        int row = r.history().rowAt(TIME);
        double lower = Math.abs(r.history().get(History.Column.WALL_SHEAR_STRESS_LOWER, row)
                - exact.wallShearStressLower(TIME));
        double upper = Math.abs(r.history().get(History.Column.WALL_SHEAR_STRESS_UPPER, row)
                - exact.wallShearStressUpper(TIME));
        return new double[] {profile, lower, upper};
    }

    @ParameterizedTest(name = "clustering {0}")
    @ValueSource(doubles = {0.0, 0.6})
    void observedOrderIsTwo(double clustering) {
        int[] points = {21, 41, 81, 161};
        double[][] e = new double[points.length][];
        for (int k = 0; k < points.length; k++) {
            e[k] = errors(points[k], clustering);
        }
        String[] names = {"velocity profile", "lower wall shear stress", "upper wall shear stress"};
        for (int q = 0; q < names.length; q++) {
            for (int k = 1; k < points.length; k++) {
                double order = Math.log(e[k - 1][q] / e[k][q]) / Math.log(2);
                assertTrue(Math.abs(order - 2) <= BAND, names[q] + ", " + points[k - 1] + " -> " + points[k]
                        + " nodes: observed order " + order + " (errors " + e[k - 1][q] + ", " + e[k][q] + ")");
            }
        }
    }
}
