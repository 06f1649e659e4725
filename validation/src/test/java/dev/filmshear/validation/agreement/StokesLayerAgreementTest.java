package dev.filmshear.validation.agreement;

import dev.filmshear.solver.model.FilmCase;
import dev.filmshear.solver.model.FilmModel;
import dev.filmshear.solver.model.FilmResult;
import dev.filmshear.solver.model.FilmSolver;
import dev.filmshear.solver.model.GridSpec;
import dev.filmshear.solver.model.History;
import dev.filmshear.solver.model.SolverOptions;
import dev.filmshear.solver.time.StepControl;
import dev.filmshear.solver.physics.ConstantViscosity;
import dev.filmshear.solver.physics.Domain;
import dev.filmshear.solver.physics.FilmPhysics;
import dev.filmshear.solver.physics.Fluid;
import dev.filmshear.solver.physics.Wall;
import dev.filmshear.solver.physics.WallMotion;
import dev.filmshear.validation.analytic.AnalyticFamilies;
import dev.filmshear.validation.analytic.AnalyticSolution;
import dev.filmshear.validation.analytic.StokesFirstProblem;
import dev.filmshear.validation.analytic.StokesSecondProblem;
import org.junit.jupiter.api.Test;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertInstanceOf;
import static org.junit.jupiter.api.Assertions.assertTrue;

/**
 * A wall under a semi-infinite fluid: Stokes' first problem (impulsive start, u/U = erfc(y / 2 sqrt(nu t)),
 * R. B. Bird, W. E. Stewart, E. N. Lightfoot, <i>Transport Phenomena</i>, 2nd ed., 2002, Example 4.1-1) and
 * Stokes' second problem (an oscillating wall started from rest, L. D. Landau and E. M. Lifshitz, <i>Fluid
 * Mechanics</i>, section 24, with the start-up by Duhamel's principle), against the solver's truncated
 * domain.
 */
class StokesLayerAgreementTest {
    /** Light oil, nu = 46e-6 m^2/s (references section 7(b) example: mu = 0.040 Pa s, rho chosen to match). */
    private static final double VISCOSITY = 0.040;
    private static final double DENSITY = VISCOSITY / 46e-6;

    private static FilmPhysics semiInfinite(WallMotion wall, double depth) {
        return new FilmPhysics(new Domain.SemiInfinite(depth),
                Fluid.isothermal(DENSITY, new ConstantViscosity(VISCOSITY)), Wall.isothermal(wall), null, 0, 0,
                Double.NaN, null, null);
    }

    @Test
    void impulsivelyStartedWallFollowsTheErfcSolution() {
        double end = 0.01;
        double[] times = {0.001, 0.002, 0.005, 0.01};
        FilmCase filmCase = FilmCase.until(semiInfinite(new WallMotion.Steady(1), Double.NaN), end, times)
                .withGrid(new GridSpec(401, 0.5)).withTolerance(1e-8);
        FilmResult r = FilmSolver.solve(filmCase);
        AnalyticSolution exact = AnalyticFamilies.match(filmCase).orElseThrow();
        assertInstanceOf(StokesFirstProblem.class, exact);
        for (double t : times) {
            assertTrue(Films.maxVelocityError(r.snapshotAt(t), exact) < 1e-4, "profile at t = " + t);
            double shear = exact.wallShearStressLower(t);
            assertTrue(Films.lowerShearError(r, exact, t) < 1e-3 * Math.abs(shear), "wall shear at t = " + t);
        }
        // the worked example of references section 7(b): |tau_w| = 33.274 Pa at t = 0.01 s for U = 1 m/s
        int row = r.history().rowAt(end);
        assertEquals(-33.274, r.history().get(History.Column.WALL_SHEAR_STRESS_LOWER, row), 0.05);
        assertTrue(r.warnings().isEmpty(), "no warning: the front did not reach the truncated depth " + r.warnings());
    }

    /**
     * The automatic truncation depth is deep enough: doubling it (with twice the nodes, so the spacing near
     * the wall is unchanged, and the same steps, so the time error is the same) moves the wall shear stress
     * and the profile by less than the tolerance.
     */
    @Test
    void deepeningTheTruncatedDomainChangesNothingBeyondTheTolerance() {
        double end = 0.01;
        double tol = 1e-7;
        FilmPhysics automatic = semiInfinite(new WallMotion.Steady(1), Double.NaN);
        double depth = FilmModel.semiInfiniteDepth(automatic, end, tol);
        SolverOptions sameSteps = SolverOptions.defaults().withStepControl(StepControl.Fixed.of(end / 400));
        FilmResult base = FilmSolver.solve(FilmCase.until(semiInfinite(new WallMotion.Steady(1), depth), end)
                .withGrid(new GridSpec(201, 0)).withTolerance(tol), sameSteps);
        FilmResult deep = FilmSolver.solve(FilmCase.until(semiInfinite(new WallMotion.Steady(1), 2 * depth), end)
                .withGrid(new GridSpec(401, 0)).withTolerance(tol), sameSteps);
        double shearBase = base.summary().wallShearStressLower();
        double shearDeep = deep.summary().wallShearStressLower();
        assertEquals(shearBase, shearDeep, tol * Math.abs(shearBase));
        double[] u = base.finalSnapshot().velocity();
        double[] v = deep.finalSnapshot().velocity();
        for (int i = 0; i < u.length; i++) {
            assertEquals(u[i], v[i], tol, "node " + i);
        }
    }

    @Test
    void oscillatingWallStartedFromRestFollowsTheDuhamelSolution() {
        double frequency = 50;
        WallMotion.Sine wall = new WallMotion.Sine(0, 0.1, frequency, 0);
        double period = 1 / frequency;
        double end = 3 * period;
        double[] times = {2 * period, 2.25 * period, 2.5 * period, 2.75 * period, 3 * period};
        FilmCase filmCase = FilmCase.until(semiInfinite(wall, Double.NaN), end, times).withGrid(new GridSpec(401, 0.5))
                .withTolerance(1e-8);
        FilmResult r = FilmSolver.solve(filmCase);
        AnalyticSolution exact = AnalyticFamilies.match(filmCase).orElseThrow();
        assertInstanceOf(StokesSecondProblem.class, exact);
        StokesSecondProblem stokes = (StokesSecondProblem) exact;
        for (double t : times) {
            assertTrue(Films.maxVelocityError(r.snapshotAt(t), exact) < 1e-4 * 0.1, "profile at t = " + t);
            assertTrue(Films.lowerShearError(r, exact, t) < 2e-3 * stokes.wallShearStressAmplitude(),
                    "wall shear at t = " + t);
        }
    }
}
