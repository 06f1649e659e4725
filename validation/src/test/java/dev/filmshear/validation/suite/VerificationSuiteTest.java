package dev.filmshear.validation.suite;

import dev.filmshear.solver.model.FilmCase;
import dev.filmshear.solver.model.FilmResult;
import dev.filmshear.solver.model.SolverOptions;
import dev.filmshear.solver.model.Snapshot;
import dev.filmshear.solver.physics.ExponentialViscosity;
import dev.filmshear.solver.physics.FilmPhysics;
import dev.filmshear.solver.physics.VolumeSource;
import dev.filmshear.solver.physics.WallMotion;
import dev.filmshear.solver.time.DirkScheme;
import dev.filmshear.solver.time.StepControl;
import dev.filmshear.validation.analytic.ConstantPropertyFilm;
import dev.filmshear.validation.mms.ManufacturedCase;
import dev.filmshear.validation.mms.ManufacturedCases;
import dev.filmshear.validation.mms.ManufacturedSolution;
import org.junit.jupiter.api.Test;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

/**
 * The verification suite as a whole: the quick suite passes every check (the order-of-accuracy test of the method of
 * manufactured solutions and of the closed forms, K. Salari and P. Knupp, SAND2000-1444, 2000; references.md 10.1),
 * and the same machinery fails a deliberately perturbed discretization, so the suite can fail.
 */
class VerificationSuiteTest {
    /** The quick suite runs in mvn verify; on two cores it takes about 5 s (measured), allowed 30 s. */
    private static final double QUICK_BUDGET_SECONDS = 30;
    /**
     * A first-order discretization refined by 2 shows observed orders near 1 (references.md 10.1: backward Euler is
     * first order in time, and a two-point wall derivative first order in space): allowed 1 +- 0.3, since the
     * coarse pairs still carry some of the second-order part.
     */
    private static final double FIRST_ORDER_BAND = 0.3;
    private static final int[] POINTS = {21, 41, 81};

    @Test
    void quickSuitePassesEveryCheckWithinItsBudget() {
        VerificationSuite.Result r = VerificationSuite.quick().run();
        assertTrue(r.passed(), r.table());
        assertEquals(0, r.failedChecks());
        assertTrue(r.seconds() < QUICK_BUDGET_SECONDS, "quick suite took " + r.seconds() + " s");
        for (VerificationRun run : r.runs()) {
            assertEquals(VerificationSuite.QUICK_LEVELS, run.verificationCase().levels().size(),
                    run.verificationCase().name());
        }
    }

    @Test
    void quickAndFullSuitesHoldTheSameCasesAndEveryManufacturedOne() {
        List<String> quick = VerificationSuite.quick().cases().stream().map(VerificationCase::name).toList();
        List<String> full = VerificationSuite.full().cases().stream().map(VerificationCase::name).toList();
        assertEquals(quick, full);
        for (ManufacturedCase c : ManufacturedCases.all()) {
            assertTrue(quick.contains("MMS: " + c.name()), c.name());
        }
        for (String analytic : List.of("Couette start-up (impulsive)", "Stokes' first problem", "Stokes' second problem",
                "Oscillating Couette flow, finite gap", "Couette-Poiseuille, steady",
                "Couette viscous heating, walls at two temperatures", "Couette viscous heating, adiabatic moving wall",
                "Nahme-Griffith, exponential viscosity, walls at T0")) {
            assertTrue(quick.contains(analytic), analytic);
        }
        for (VerificationCase c : VerificationSuite.full().cases()) {
            assertTrue(c.levels().size() > VerificationSuite.QUICK_LEVELS, c.name() + " has more levels in full");
        }
    }

    @Test
    void aPerturbedDiscretizationFailsTheSuite() {
        SolverOptions backwardEuler = SolverOptions.defaults().withScheme(DirkScheme.BACKWARD_EULER);
        List<VerificationCase> perturbed = new ArrayList<>();
        // a first-order time scheme through the suite's own cases
        perturbed.add(ManufacturedVerification.of(ManufacturedCases.fixedWalls(), POINTS, backwardEuler));
        perturbed.add(AnalyticCases.couetteStartUp(POINTS, backwardEuler));
        // a first-order wall flux: the moving wall's shear stress from a two-point difference
        perturbed.add(twoPointWallStress());
        // a manufactured source that forgets d mu/dy du/dy
        perturbed.add(sourceWithoutViscositySlope());
        VerificationSuite.Result r = new VerificationSuite("perturbed", perturbed).run();
        assertFalse(r.passed(), r.table());
        for (VerificationRun run : r.runs()) {
            assertFalse(run.passed(), run.verificationCase().name() + " passed:\n" + r.table());
        }
        // backward Euler with dt proportional to dy: temperature order 1 (the velocity's falls towards 1 from above)
        assertFirstOrder(r.runs().get(0), 1);
        assertFirstOrder(r.runs().get(1), 0);
        assertFirstOrder(r.runs().get(2), 0);
        // the wrong source: the error stops falling at the size the missing term drives
        double[] stalled = r.runs().get(3).observedOrders(0);
        assertTrue(stalled[stalled.length - 1] < 0.5, Arrays.toString(stalled));
        assertTrue(r.table().contains("FAIL"));
        assertTrue(r.runs().get(1).verificationCase().refinement().contains("BACKWARD-EULER"),
                "the table names the scheme that was run");
    }

    private static void assertFirstOrder(VerificationRun run, int check) {
        for (double p : run.observedOrders(check)) {
            assertEquals(1, p, FIRST_ORDER_BAND, run.verificationCase().name() + ": " + p);
        }
    }

    /**
     * Couette–Poiseuille start-up with the moving wall's stress mu (u_n - u_(n-1)) / dy: first order in dy, its error
     * mu u''(h) dy / 2. The pressure gradient keeps u'' = (dp/dx)/mu at the wall once the wall has stopped
     * accelerating; without it u''(h) would vanish there (rho du/dt = mu u'' and the wall speed is constant) and the
     * two-point formula would pass as second order.
     */
    private static VerificationCase twoPointWallStress() {
        double end = 0.1 * AnalyticCases.MOMENTUM_TIME;
        double gradient = -3e6;
        FilmPhysics physics = FilmPhysics.isothermalCouette(AnalyticCases.GAP, AnalyticCases.DENSITY,
                AnalyticCases.VISCOSITY, new WallMotion.Steady(0), new WallMotion.Steady(1))
                .withPressureGradient(gradient);
        ConstantPropertyFilm exact = new ConstantPropertyFilm(AnalyticCases.GAP, AnalyticCases.DENSITY,
                AnalyticCases.VISCOSITY, new WallMotion.Steady(0), new WallMotion.Steady(1), gradient, 0);
        List<Level> levels = new ArrayList<>();
        for (int n : POINTS) {
            levels.add(Level.refinedTogether(n, end, 1));
        }
        return new VerificationCase("Couette-Poiseuille start-up, two-point wall stress", VerificationCase.Kind.ANALYTIC,
                exact.source(), "perturbed", "grid and time step together", levels,
                List.of(Check.secondOrder("wall shear stress, upper wall", "Pa")), level -> {
                    FilmResult r = AnalyticCases.solveAt(FilmCase.until(physics, end), level, 0,
                            SolverOptions.defaults());
                    Snapshot s = r.finalSnapshot();
                    int n = s.points();
                    double stress = AnalyticCases.VISCOSITY * (s.velocity()[n - 1] - s.velocity()[n - 2])
                            / (s.y()[n - 1] - s.y()[n - 2]);
                    return new double[] {Math.abs(stress - exact.wallShearStressUpper(end))};
                });
    }

    /** The fixed-wall manufactured case with S_u lacking -beta mu dT/dy du/dy. */
    private static VerificationCase sourceWithoutViscositySlope() {
        ManufacturedCase c = ManufacturedCases.fixedWalls();
        ManufacturedSolution s = c.solution();
        double beta = ((ExponentialViscosity) s.fluid().viscosity()).coefficient();
        VolumeSource wrong = (y, t) -> s.momentumSource(y, t)
                - beta * s.viscosity(y, t) * s.temperatureGradient(y, t) * s.velocityGradient(y, t);
        VerificationCase right = ManufacturedVerification.of(c, POINTS, SolverOptions.defaults());
        return new VerificationCase("MMS: fixed walls, wrong momentum source", right.kind(), right.source(),
                right.equations(), right.refinement(), right.levels(), right.checks(), level -> {
                    FilmCase filmCase = c.filmCase(level.points());
                    FilmCase broken = filmCase.withPhysics(filmCase.physics().withSources(wrong, s.heatSource()));
                    FilmResult r = dev.filmshear.solver.model.FilmSolver.solve(broken,
                            SolverOptions.defaults().withStepControl(StepControl.Fixed.of(level.timeStep())));
                    ManufacturedCase.FieldErrors e = c.errors(r);
                    return new double[] {e.velocity(), e.temperature()};
                });
    }
}
