package dev.filmshear.validation.heating;

import dev.filmshear.solver.model.FilmCase;
import dev.filmshear.solver.model.FilmResult;
import dev.filmshear.solver.model.FilmSolver;
import dev.filmshear.solver.model.GridSpec;
import dev.filmshear.solver.physics.ConstantViscosity;
import dev.filmshear.solver.physics.Domain;
import dev.filmshear.solver.physics.FilmPhysics;
import dev.filmshear.solver.physics.Wall;
import dev.filmshear.solver.physics.WallMotion;
import dev.filmshear.validation.analytic.HeatedFilmStartup;
import org.junit.jupiter.api.Test;

import static dev.filmshear.validation.heating.HeatedFilms.AT_WALL_TEMPERATURE;
import static dev.filmshear.validation.heating.HeatedFilms.CONDUCTIVITY;
import static dev.filmshear.validation.heating.HeatedFilms.GAP;
import static dev.filmshear.validation.heating.HeatedFilms.THERMAL_TIME;
import static dev.filmshear.validation.heating.HeatedFilms.VISCOSITY;
import static dev.filmshear.validation.heating.HeatedFilms.WALL_TEMPERATURE;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

/**
 * Thermal start-up of a film heated by a uniform source S, walls at rest and held at T0, against the series of
 * references.md 7(f) "Extra thermal start-up check" (derived and checked there against Crank–Nicolson; form of
 * H. S. Carslaw and J. C. Jaeger, <i>Conduction of Heat in Solids</i>, 2nd ed., 1959, §3.3):
 * (T - T0) k / (S h^2) = eta (1 - eta)/2 - sum_{n odd} 4/(n^3 pi^3) exp(-n^2 pi^2 tau_T) sin(n pi eta),
 * tau_T = alpha t / h^2. The tabulated mid-plane and eta = 0.25 values are compared with the solver on 101 and
 * 201 nodes and with the Richardson extrapolation of the two.
 */
class HeatedFilmStartupAgreementTest {
    /** S = mu (U/h)^2 for U = 10 m/s: the dissipation of the oil film at that speed (W/m^3). */
    private static final double SOURCE = VISCOSITY * (10 / GAP) * (10 / GAP);
    /** Dimensionless times tau_T of the table. */
    private static final double[] TAU = {0.01, 0.05, 0.1, 0.2, 0.5};
    /** references.md 7(f): (T - T0) k / (S h^2) at eta = 0.5 for the times above. */
    private static final double[] MID_PLANE = {0.0099990, 0.0462983, 0.0769191, 0.1070796, 0.1240722};
    /** references.md 7(f): the same at eta = 0.25. */
    private static final double[] QUARTER = {0.0097761, 0.0380199, 0.0597507, 0.0810784, 0.0930939};
    /** Step tolerance: the time error stays well below the space error of 201 nodes. */
    private static final double TOLERANCE = 1e-8;
    /**
     * Dimensionless discretization error allowed on 201 nodes: the second-order error measured there is at most
     * 9.5e-7 (tau_T = 0.1, mid-plane) and falls fourfold from 101 nodes, as asserted below.
     */
    private static final double FINE_GRID_TOLERANCE = 1.5e-6;
    /** The Richardson extrapolation must meet the table to its print rounding (5e-8) plus 5e-8 of residual. */
    private static final double EXTRAPOLATED_TOLERANCE = 1e-7;
    private static final double BAND = 0.2;

    private static double[][] run(int points) {
        FilmPhysics physics = new FilmPhysics(new Domain.Gap(GAP), HeatedFilms.oil(new ConstantViscosity(VISCOSITY)),
                new Wall(new WallMotion.Steady(0), AT_WALL_TEMPERATURE),
                new Wall(new WallMotion.Steady(0), AT_WALL_TEMPERATURE), 0, 0, WALL_TEMPERATURE, null,
                (y, t) -> SOURCE);
        double[] times = new double[TAU.length];
        for (int i = 0; i < TAU.length; i++) {
            times[i] = TAU[i] * THERMAL_TIME;
        }
        FilmResult r = FilmSolver.solve(FilmCase.until(physics, times[times.length - 1], times)
                .withGrid(new GridSpec(points, 0)).withTolerance(TOLERANCE));
        double scale = SOURCE * GAP * GAP / CONDUCTIVITY;
        double[][] out = new double[2][TAU.length];
        for (int i = 0; i < TAU.length; i++) {
            double[] t = r.snapshotAt(times[i]).temperature();
            out[0][i] = (t[(points - 1) / 2] - WALL_TEMPERATURE) / scale;
            out[1][i] = (t[(points - 1) / 4] - WALL_TEMPERATURE) / scale;
        }
        return out;
    }

    @Test
    void midPlaneAndQuarterPlaneFollowTheSeries() {
        double[][] coarse = run(101);
        double[][] fine = run(201);
        double[][] table = {MID_PLANE, QUARTER};
        double[] eta = {0.5, 0.25};
        for (int row = 0; row < 2; row++) {
            for (int i = 0; i < TAU.length; i++) {
                String at = "eta = " + eta[row] + ", tau_T = " + TAU[i];
                // the table against the closed form it came from
                assertEquals(table[row][i], HeatedFilmStartup.dimensionlessRise(eta[row], TAU[i]), 5e-8, at);
                double fineError = fine[row][i] - table[row][i];
                assertEquals(0, fineError, FINE_GRID_TOLERANCE, at + ", 201 nodes");
                double extrapolated = (4 * fine[row][i] - coarse[row][i]) / 3;
                assertEquals(table[row][i], extrapolated, EXTRAPOLATED_TOLERANCE, at + ", Richardson (101, 201 nodes)");
                double coarseError = coarse[row][i] - table[row][i];
                // second order where the error is above the table's rounding: every point but the mid-plane at
                // tau_T = 0.01, where the walls' influence has not yet arrived
                if (Math.abs(fineError) > 1e-7) {
                    double p = HeatedFilms.order(Math.abs(coarseError), Math.abs(fineError));
                    assertTrue(Math.abs(p - 2) <= BAND, at + ": observed order " + p);
                }
            }
        }
    }
}
