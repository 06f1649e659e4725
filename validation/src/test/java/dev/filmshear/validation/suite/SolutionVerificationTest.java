package dev.filmshear.validation.suite;

import dev.filmshear.solver.model.FilmCase;
import dev.filmshear.solver.model.FilmModel;
import dev.filmshear.solver.model.GridSpec;
import dev.filmshear.solver.physics.ConstantViscosity;
import dev.filmshear.solver.physics.Domain;
import dev.filmshear.solver.physics.ExponentialViscosity;
import dev.filmshear.solver.physics.FilmPhysics;
import dev.filmshear.solver.physics.Fluid;
import dev.filmshear.solver.physics.ThermalCondition;
import dev.filmshear.solver.physics.Wall;
import dev.filmshear.solver.physics.WallMotion;
import dev.filmshear.validation.analytic.ConstantPropertyFilm;
import dev.filmshear.validation.analytic.NahmeCouette;
import dev.filmshear.validation.suite.SolutionVerification.Estimate;
import dev.filmshear.validation.suite.SolutionVerification.Quantity;
import org.junit.jupiter.api.Test;

import java.util.Map;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

/**
 * Solution verification by Richardson extrapolation and Roache's Grid Convergence Index (P. J. Roache, Verification
 * and Validation in Computational Science and Engineering, 1998; ASME V&amp;V 20-2009; references.md 10.2): the
 * three grids and tolerances of a study, the estimate on values of known behaviour, and, on cases with a known exact
 * answer, that the GCI band around the finest value contains it.
 */
class SolutionVerificationTest {
    /**
     * With a reasonable observed order the band is Fs = 1.25 times Richardson's error estimate, which in the
     * asymptotic range is the true error: the band must contain the exact value yet be less than twice the true
     * error wide, or the estimate would be uselessly loose.
     */
    private static final double BAND_SHARPNESS = 2;

    @Test
    void smallGridsAreDoubledTwiceWithTheToleranceCubed() {
        FilmCase base = couetteStartUp().withGrid(new GridSpec(51, 0.3)).withTolerance(1e-6);
        SolutionVerification.Plan plan = SolutionVerification.plan(base);
        assertArrayEquals(new int[] {51, 101, 201}, plan.points());
        // tol (h / h_case)^3: the time error, like tol^(2/3), then falls like h^2
        assertArrayEquals(new double[] {1e-6, 1e-6 / 8, 1e-6 / 64}, plan.tolerances(), 1e-20);
        for (FilmCase c : plan.cases()) {
            assertEquals(0.3, c.grid().clustering());
            assertEquals(base.physics(), c.physics());
        }
    }

    @Test
    void largeGridsRefineByOneAndAHalfAndNeverBelowTheCase() {
        FilmCase mid = couetteStartUp().withGrid(new GridSpec(701, 0));
        assertArrayEquals(new int[] {701, 1051, 1576}, SolutionVerification.plan(mid).points());
        FilmCase fine = couetteStartUp().withGrid(new GridSpec(1201, 0)).withTolerance(1e-6);
        SolutionVerification.Plan plan = SolutionVerification.plan(fine);
        assertArrayEquals(new int[] {534, 801, 1201}, plan.points());
        assertEquals(1e-6, plan.finest().tolerance(), 1e-20, "the case's own grid keeps its tolerance");
    }

    @Test
    void aSemiInfiniteFilmKeepsOneTruncationDepthOnEveryGrid() {
        FilmPhysics physics = new FilmPhysics(Domain.SemiInfinite.automatic(),
                Fluid.isothermal(AnalyticCases.DENSITY, new ConstantViscosity(AnalyticCases.VISCOSITY)),
                Wall.isothermal(new WallMotion.Steady(1)), null, 0, 0, Double.NaN, null, null);
        FilmCase base = FilmCase.until(physics, 0.01).withGrid(new GridSpec(101, 0.5));
        SolutionVerification.Plan plan = SolutionVerification.plan(base);
        double depth = FilmModel.semiInfiniteDepth(physics, 0.01, plan.finest().tolerance());
        for (FilmCase c : plan.cases()) {
            assertEquals(depth, ((Domain.SemiInfinite) c.physics().domain()).depth());
        }
    }

    @Test
    void anExactSecondOrderSeriesIsExtrapolatedExactly() {
        // f = 3 + 0.5 h^2, h = 1/(n - 1): Richardson recovers 3 and the observed order 2 (Roache 1998)
        int[] points = {21, 41, 81};
        double[] f = new double[3];
        for (int k = 0; k < 3; k++) {
            double h = 1.0 / (points[k] - 1);
            f[k] = 3 + 0.5 * h * h;
        }
        Estimate e = SolutionVerification.estimate(f, points);
        assertEquals(SolutionVerification.Behaviour.MONOTONE, e.behaviour());
        assertEquals(2, e.observedOrder(), 1e-9);
        assertTrue(e.reasonable());
        assertEquals(1.25, e.safetyFactor());
        assertEquals(3, e.extrapolated(), 1e-12);
        // band = 1.25 |f2 - f1| / 3 = 1.25 (f1 - 3): just wider than the true error
        assertEquals(1.25 * (f[2] - 3), e.band(), 1e-15);
        assertTrue(e.brackets(3));
        assertEquals(f[2] / f[1], e.asymptoticRatio(), 1e-9);
    }

    @Test
    void aFirstOrderSeriesGetsTheWideBandOfAnUnreasonableOrder() {
        // f = 1 + h: observed order 1, not within 0.2 of 2, so Fs = 3 with p = 1 (Roache 2011)
        int[] points = {21, 41, 81};
        double[] f = {1 + 1.0 / 20, 1 + 1.0 / 40, 1 + 1.0 / 80};
        Estimate e = SolutionVerification.estimate(f, points);
        assertEquals(1, e.observedOrder(), 1e-9);
        assertFalse(e.reasonable());
        assertEquals(3, e.safetyFactor());
        assertEquals(1, e.orderUsed(), 1e-9);
        assertEquals(1, e.extrapolated(), 1e-12);
        assertEquals(3 * (f[2] - 1), e.band(), 1e-12);
    }

    @Test
    void oscillatingDivergingAndSettledValuesAreNamed() {
        int[] points = {21, 41, 81};
        Estimate swing = SolutionVerification.estimate(new double[] {1.1, 0.95, 1.02}, points);
        assertEquals(SolutionVerification.Behaviour.OSCILLATORY, swing.behaviour());
        assertTrue(Double.isNaN(swing.observedOrder()));
        assertEquals(3, swing.safetyFactor());
        assertEquals(2, swing.orderUsed());
        Estimate growing = SolutionVerification.estimate(new double[] {1.0, 1.01, 1.03}, points);
        assertEquals(SolutionVerification.Behaviour.DIVERGENT, growing.behaviour());
        Estimate settled = SolutionVerification.estimate(new double[] {2.5, 2.5 + 1e-15, 2.5}, points);
        assertEquals(SolutionVerification.Behaviour.GRID_INDEPENDENT, settled.behaviour());
        assertEquals(0, settled.band(), 1e-14);
    }

    @Test
    void gciBracketsTheExactNahmeWallStressAndHighestTemperature() {
        // the Nahme problem at Na = 10, both walls at T0: closed form of references.md 7(g) (NahmeCouette;
        // R. Nahme 1940, J. Gavis and R. L. Laurence 1968, citations from memory)
        double beta = 0.03;
        double speed = Math.sqrt(10 * AnalyticCases.CONDUCTIVITY / (beta * AnalyticCases.VISCOSITY));
        ThermalCondition atT0 = new ThermalCondition.FixedTemperature(AnalyticCases.WALL_TEMPERATURE);
        ExponentialViscosity law = new ExponentialViscosity(AnalyticCases.VISCOSITY, AnalyticCases.WALL_TEMPERATURE,
                beta, AnalyticCases.WALL_TEMPERATURE - 10, AnalyticCases.WALL_TEMPERATURE + 120);
        FilmPhysics physics = new FilmPhysics(new Domain.Gap(AnalyticCases.GAP), AnalyticCases.oil(law),
                new Wall(new WallMotion.Steady(0), atT0), new Wall(new WallMotion.Steady(speed), atT0), 0, 0,
                AnalyticCases.WALL_TEMPERATURE, null, null);
        NahmeCouette exact = new NahmeCouette(AnalyticCases.GAP, 0, speed, AnalyticCases.VISCOSITY, beta,
                AnalyticCases.CONDUCTIVITY, AnalyticCases.WALL_TEMPERATURE, NahmeCouette.Walls.BOTH_AT_WALL_TEMPERATURE);
        SolutionVerification.Study study = SolutionVerification.run(FilmCase.steady(physics)
                .withGrid(new GridSpec(51, 0)));
        Map<Quantity, Estimate> e = study.estimates();
        assertEquals(3, e.size());
        assertBracketsSharply(e.get(Quantity.WALL_SHEAR_STRESS_LOWER), exact.shearStress(), "lower wall stress");
        assertBracketsSharply(e.get(Quantity.WALL_SHEAR_STRESS_UPPER), exact.shearStress(), "upper wall stress");
        assertBracketsSharply(e.get(Quantity.MAX_TEMPERATURE), exact.maxTemperature(), "highest temperature");
    }

    @Test
    void gciBracketsTheExactWallStressOfACouetteStartUpAtAFixedTime() {
        // start-up of Couette flow, compared at nu t / h^2 = 0.1 (R. B. Bird, W. E. Stewart, E. N. Lightfoot,
        // Transport Phenomena, 2nd ed., 2002, section 4.1, through ConstantPropertyFilm); adaptive time steps at the
        // plan's tolerances, so time and space errors are both in the estimate
        FilmCase base = couetteStartUp().withGrid(new GridSpec(51, 0));
        ConstantPropertyFilm exact = new ConstantPropertyFilm(AnalyticCases.GAP, AnalyticCases.DENSITY,
                AnalyticCases.VISCOSITY, new WallMotion.Steady(0), new WallMotion.Steady(1), 0, 0);
        double end = base.endTime();
        Map<Quantity, Estimate> e = SolutionVerification.run(base).estimates();
        assertEquals(2, e.size(), "isothermal: no temperature");
        assertBracketsSharply(e.get(Quantity.WALL_SHEAR_STRESS_LOWER), exact.wallShearStressLower(end), "lower");
        assertBracketsSharply(e.get(Quantity.WALL_SHEAR_STRESS_UPPER), exact.wallShearStressUpper(end), "upper");
    }

    private static void assertBracketsSharply(Estimate e, double exact, String what) {
        double error = Math.abs(e.finest() - exact);
        String text = what + ": values " + java.util.Arrays.toString(e.values()) + ", exact " + exact + ", order "
                + e.observedOrder() + ", band " + e.band() + ", error " + error;
        assertTrue(e.reasonable(), text);
        assertTrue(e.brackets(exact), text);
        assertTrue(e.band() < BAND_SHARPNESS * error, text);
        assertEquals(1, e.asymptoticRatio(), 0.05, text);
    }

    private static FilmCase couetteStartUp() {
        FilmPhysics physics = FilmPhysics.isothermalCouette(AnalyticCases.GAP, AnalyticCases.DENSITY,
                AnalyticCases.VISCOSITY, new WallMotion.Steady(0), new WallMotion.Steady(1));
        return FilmCase.until(physics, 0.1 * AnalyticCases.MOMENTUM_TIME);
    }
}
