package dev.filmshear.validation.agreement;

import dev.filmshear.solver.model.FilmCase;
import dev.filmshear.solver.model.FilmModel;
import dev.filmshear.solver.model.FilmResult;
import dev.filmshear.solver.model.SolverOptions;
import dev.filmshear.solver.model.FilmSolver;
import dev.filmshear.solver.model.GridSpec;
import dev.filmshear.solver.model.Snapshot;
import dev.filmshear.solver.physics.FilmPhysics;
import dev.filmshear.solver.physics.WallMotion;
import dev.filmshear.validation.analytic.AnalyticFamilies;
import dev.filmshear.validation.analytic.AnalyticSolution;
import dev.filmshear.validation.analytic.ConstantPropertyFilm;
import org.junit.jupiter.api.Test;

import static dev.filmshear.validation.agreement.Films.DENSITY;
import static dev.filmshear.validation.agreement.Films.DIFFUSION_TIME;
import static dev.filmshear.validation.agreement.Films.GAP;
import static dev.filmshear.validation.agreement.Films.NU;
import static dev.filmshear.validation.agreement.Films.VISCOSITY;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertInstanceOf;
import static org.junit.jupiter.api.Assertions.assertTrue;

/**
 * Start-up of plane Couette flow: the upper wall set impulsively in motion, fluid at rest. Exact solution
 * by Fourier series, R. B. Bird, W. E. Stewart, E. N. Lightfoot, <i>Transport Phenomena</i>, 2nd ed., 2002,
 * section 4.1 (finite-slab example; example number from memory), through {@link ConstantPropertyFilm},
 * whose own tests reproduce the published check table.
 */
class ImpulsiveStartCouetteAgreementTest {
    private static final double U = 1.0;
    /** Non-dimensional output times nu t / h^2 of the check table (references: section 7(a)). */
    private static final double[] TAU = {0.01, 0.05, 0.1, 0.2, 0.5, 1.0};
    /**
     * Largest velocity error allowed at 201 nodes, relative to U: the spatial error of a second-order
     * scheme at h/200 on the steepest profile (tau = 0.01, layer about 0.1 h thick) is of order
     * (pi dy / delta)^2 / 12 ~ 1e-3, far smaller at later times.
     */
    private static final double PROFILE_TOLERANCE = 2e-3;
    /**
     * Wall shear error allowed relative to mu U / h from tau = 0.05 on: the one-sided three-point derivative
     * errs by about dy^2 u''' / 3, which at tau = 0.05 on 201 nodes is 2.4e-4 mu U / h (measured; it falls
     * fourfold with each halving of dy, see SpatialConvergenceTest).
     */
    private static final double SHEAR_TOLERANCE = 5e-4;

    private static FilmResult startUp() {
        FilmPhysics physics = FilmPhysics.isothermalCouette(GAP, DENSITY, VISCOSITY, new WallMotion.Steady(0),
                new WallMotion.Steady(U));
        double[] times = new double[TAU.length];
        for (int i = 0; i < TAU.length; i++) {
            times[i] = TAU[i] * DIFFUSION_TIME;
        }
        FilmCase filmCase = FilmCase.until(physics, DIFFUSION_TIME, times).withTolerance(1e-8)
                .withGrid(new GridSpec(201, 0));
        return FilmSolver.solve(filmCase);
    }

    @Test
    void profilesAndWallShearStressAgreeWithTheFourierSeries() {
        FilmResult result = startUp();
        AnalyticSolution exact = AnalyticFamilies.match(result.filmCase()).orElseThrow();
        assertInstanceOf(ConstantPropertyFilm.class, exact);
        double shearScale = VISCOSITY * U / GAP;
        for (double tau : TAU) {
            double t = tau * DIFFUSION_TIME;
            Snapshot s = result.snapshotAt(t);
            assertTrue(Films.maxVelocityError(s, exact) < PROFILE_TOLERANCE * U, "profile at tau = " + tau);
            if (tau >= 0.05) {
                assertTrue(Films.upperShearError(result, exact, t) < SHEAR_TOLERANCE * shearScale,
                        "moving-wall shear at tau = " + tau);
                assertTrue(Films.lowerShearError(result, exact, t) < SHEAR_TOLERANCE * shearScale,
                        "fixed-wall shear at tau = " + tau);
            }
        }
        // check values of the table (references section 7(a)): moving-wall shear 1.784286 and fixed-wall
        // shear 0.292900 (units of mu U / h) at tau = 0.1
        double t = 0.1 * DIFFUSION_TIME;
        assertEquals(1.784286, exact.wallShearStressUpper(t) / shearScale, 1e-6);
        int row = result.history().rowAt(t);
        assertEquals(1.784286, result.history().get(dev.filmshear.solver.model.History.Column.WALL_SHEAR_STRESS_UPPER,
                row) / shearScale, 1e-3);
        assertEquals(0.292900, result.history().get(dev.filmshear.solver.model.History.Column.WALL_SHEAR_STRESS_LOWER,
                row) / shearScale, 1e-3);
        assertTrue(result.summary().steady(), "settled by tau = 1");
        // the moving-wall shear 1 + 2 sum exp(-n^2 pi^2 tau) comes within 1 % of its steady value at
        // tau = ln(200) / pi^2 = 0.53683 (the n = 1 term, later terms below 1e-10 there)
        double settle = Math.log(200) / (Math.PI * Math.PI);
        assertEquals(settle, result.summary().settleTime() / DIFFUSION_TIME, 0.01 * settle);
    }

    /**
     * The momentum settling time from the smallest eigenvalue of the discrete diffusion operator (EJML)
     * tends to gap^2 / (pi^2 nu), the decay time of the slowest Fourier mode in the series above; the
     * discrete eigenvalue (4 / dy^2) sin^2(pi dy / (2 h)) differs by (pi dy / h)^2 / 12.
     */
    @Test
    void settlingTimeFromTheDiscreteOperatorMatchesTheSlowestMode() {
        FilmResult result = startUp();
        double continuous = GAP * GAP / (Math.PI * Math.PI * NU);
        double dy = GAP / 200;
        double expectedRelative = Math.pow(Math.PI * dy / GAP, 2) / 12;
        double relative = result.numbers().momentumTimeScale() / continuous - 1;
        assertEquals(expectedRelative, relative, 0.05 * expectedRelative);
        // the inverse iteration behind the summary equals EJML's full symmetric QR
        FilmModel model = new FilmModel(result.filmCase(), SolverOptions.defaults());
        assertEquals(model.momentumTimeScale(true), result.numbers().momentumTimeScale(),
                1e-10 * result.numbers().momentumTimeScale());
    }
}
