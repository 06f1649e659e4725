package dev.filmshear.validation.agreement;

import dev.filmshear.solver.model.FilmCase;
import dev.filmshear.solver.model.FilmResult;
import dev.filmshear.solver.model.FilmSolver;
import dev.filmshear.solver.model.GridSpec;
import dev.filmshear.solver.physics.FilmPhysics;
import dev.filmshear.solver.physics.WallMotion;
import dev.filmshear.validation.analytic.AnalyticFamilies;
import dev.filmshear.validation.analytic.AnalyticSolution;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.ValueSource;

import static dev.filmshear.validation.agreement.Films.DENSITY;
import static dev.filmshear.validation.agreement.Films.GAP;
import static dev.filmshear.validation.agreement.Films.NU;
import static dev.filmshear.validation.agreement.Films.VISCOSITY;
import static org.junit.jupiter.api.Assertions.assertTrue;

/**
 * Oscillating Couette flow in a finite gap: the lower wall moves as U cos(omega t) (written as a sine with a
 * 90 degree phase), the upper wall is fixed; exact solution Re{U e^(i omega t) sinh(lambda (h - y)) /
 * sinh(lambda h)}, lambda = (1 + i) sqrt(omega / 2 nu) (L. D. Landau and E. M. Lifshitz, <i>Fluid Mechanics</i>,
 * section 24, problem number from memory), plus the decaying transient of a start from rest. Checked at
 * H = h sqrt(omega / 2 nu) = 1 (film nearly quasi-steady) and 3 (a Stokes layer inside the gap).
 */
class OscillatingGapAgreementTest {

    @ParameterizedTest(name = "H = {0}")
    @ValueSource(doubles = {1.0, 3.0})
    void profilesAndBothWallStressesFollowTheExactSolution(double h) {
        double omega = 2 * NU * h * h / (GAP * GAP);
        double frequency = omega / (2 * Math.PI);
        double period = 1 / frequency;
        WallMotion.Sine lower = new WallMotion.Sine(0, 1, frequency, Math.PI / 2);
        FilmPhysics physics = FilmPhysics.isothermalCouette(GAP, DENSITY, VISCOSITY, lower, new WallMotion.Steady(0));
        double[] times = new double[9];
        for (int k = 0; k < times.length; k++) {
            times[k] = (2 + k / 8.0) * period;
        }
        FilmCase filmCase = FilmCase.until(physics, times[times.length - 1], times).withTolerance(1e-8)
                .withGrid(new GridSpec(201, 0));
        FilmResult r = FilmSolver.solve(filmCase);
        AnalyticSolution exact = AnalyticFamilies.match(filmCase).orElseThrow();
        double shearScale = VISCOSITY * 1 / GAP * Math.max(1, h);
        for (double t : times) {
            assertTrue(Films.maxVelocityError(r.snapshotAt(t), exact) < 1e-4, "profile at t = " + t / period + " T");
            assertTrue(Films.lowerShearError(r, exact, t) < 5e-4 * shearScale, "moving-wall shear at " + t / period);
            assertTrue(Films.upperShearError(r, exact, t) < 5e-4 * shearScale, "fixed-wall shear at " + t / period);
        }
    }
}
