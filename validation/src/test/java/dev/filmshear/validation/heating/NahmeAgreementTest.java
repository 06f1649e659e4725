package dev.filmshear.validation.heating;

import dev.filmshear.solver.model.FilmCase;
import dev.filmshear.solver.model.FilmResult;
import dev.filmshear.solver.model.FilmSolver;
import dev.filmshear.solver.model.GridSpec;
import dev.filmshear.solver.model.Snapshot;
import dev.filmshear.solver.physics.ExponentialViscosity;
import dev.filmshear.solver.physics.FilmPhysics;
import dev.filmshear.solver.physics.ThermalCondition;
import dev.filmshear.validation.analytic.AnalyticFamilies;
import dev.filmshear.validation.analytic.NahmeCouette;
import dev.filmshear.validation.mms.GridConvergenceIndex;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

import static dev.filmshear.validation.heating.HeatedFilms.AT_WALL_TEMPERATURE;
import static dev.filmshear.validation.heating.HeatedFilms.CONDUCTIVITY;
import static dev.filmshear.validation.heating.HeatedFilms.GAP;
import static dev.filmshear.validation.heating.HeatedFilms.THERMAL_TIME;
import static dev.filmshear.validation.heating.HeatedFilms.VISCOSITY;
import static dev.filmshear.validation.heating.HeatedFilms.WALL_TEMPERATURE;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertInstanceOf;
import static org.junit.jupiter.api.Assertions.assertTrue;

/**
 * Steady Couette flow with viscous heating and an exponential viscosity mu = mu0 exp(-beta (T - T0)), the
 * Nahme (Nahme–Griffith, Gavis–Laurence) problem, against the closed forms and check table of references.md
 * 7(g) (derived there and checked against an independent boundary-value solver; literature citations from
 * memory: R. Nahme, Ing.-Arch. 11, 191, 1940; J. Gavis and R. L. Laurence, Ind. Eng. Chem. Fundam. 7, 232-239,
 * 1968) and {@link NahmeCouette}. Nahme number Na = beta mu0 U^2 / k (references.md 7(g)); the oil film
 * (typical values, references.md 6.1) with beta = 0.03 1/K, the lower wall at rest at T0 and the upper wall moving
 * at U = sqrt(Na k / (beta mu0)), either at T0 (Case 1) or adiabatic (Case 2).
 *
 * <p>Tolerance: the steady solver is second order, so each comparison is allowed the two-grid Grid Convergence
 * Index of the value from 101 and 201 nodes (Fs = 3 with the formal order 2; P. J. Roache, Verification and
 * Validation in Computational Science and Engineering, 1998), and the order itself is checked on two grids at
 * Na = 10, uniform and clustered.
 */
class NahmeAgreementTest {
    private static final double BETA = 0.03;
    /** The law's stated range covers the largest rise here, ln(21)/beta = 101 K (Case 2, Na = 40). */
    private static final ExponentialViscosity LAW =
            new ExponentialViscosity(VISCOSITY, WALL_TEMPERATURE, BETA, WALL_TEMPERATURE - 10, WALL_TEMPERATURE + 120);
    private static final int COARSE = 101;
    private static final int FINE = 201;
    private static final double BAND = 0.2;

    private static double speed(double nahme) {
        return Math.sqrt(nahme * CONDUCTIVITY / (BETA * VISCOSITY));
    }

    private static FilmPhysics physics(double nahme, boolean adiabatic) {
        return HeatedFilms.couette(LAW, speed(nahme), AT_WALL_TEMPERATURE,
                adiabatic ? ThermalCondition.HeatFlux.ADIABATIC : AT_WALL_TEMPERATURE);
    }

    private static FilmResult steady(double nahme, boolean adiabatic, int points, double clustering) {
        return FilmSolver.solve(FilmCase.steady(physics(nahme, adiabatic)).withGrid(new GridSpec(points, clustering)));
    }

    /** tau h / (mu0 U) at the fixed lower wall. */
    private static double stressRatio(FilmResult r, double nahme) {
        return r.summary().wallShearStressLower() * GAP / (VISCOSITY * speed(nahme));
    }

    /** beta (T_max - T0). */
    private static double rise(FilmResult r) {
        return BETA * (r.summary().maxTemperature() - WALL_TEMPERATURE);
    }

    private static void assertWithinGci(double expected, double fine, double coarse, String what) {
        GridConvergenceIndex.Estimate e = GridConvergenceIndex.twoGrids(fine, coarse, 2, 2);
        double band = e.gciFine() * Math.abs(fine);
        assertTrue(Math.abs(fine - expected) <= band, what + ": " + fine + " against " + expected + ", error "
                + Math.abs(fine - expected) + " outside the GCI band " + band);
    }

    @ParameterizedTest(name = "Case {0}, Na = {1}")
    @CsvSource({
        // case, Na, tau h/(mu0 U), beta dT_max: references.md 7(g) check table
        "1, 0.1, 0.99174912, 0.01242252",
        "1, 1, 0.92419624, 0.11778304",
        "1, 4, 0.76034600, 0.40546511",
        "1, 10, 0.57387859, 0.81093022",
        "1, 40, 0.28198308, 1.79175947",
        "2, 0.1, 0.96794529, 0.04879016",
        "2, 1, 0.76034600, 0.40546511",
        "2, 4, 0.46794066, 1.09861229",
        "2, 10, 0.28198308, 1.79175947",
        "2, 40, 0.10750931, 3.04452244"})
    void steadySolverMatchesTheClosedForm(int nahmeCase, double nahme, double stressTable, double riseTable) {
        boolean adiabatic = nahmeCase == 2;
        FilmResult fine = steady(nahme, adiabatic, FINE, 0);
        FilmResult coarse = steady(nahme, adiabatic, COARSE, 0);
        NahmeCouette exact = assertInstanceOf(NahmeCouette.class,
                AnalyticFamilies.match(fine.filmCase()).orElseThrow());
        assertEquals(nahme, exact.nahmeNumber(), 1e-12 * nahme);
        // the closed form reproduces the table to its 8 printed digits
        double stressExact = exact.shearStress() * GAP / (VISCOSITY * speed(nahme));
        double riseExact = BETA * (exact.maxTemperature() - WALL_TEMPERATURE);
        assertEquals(stressTable, stressExact, 5e-9);
        assertEquals(riseTable, riseExact, 5e-9);
        String label = "Case " + nahmeCase + ", Na = " + nahme;
        assertWithinGci(stressExact, stressRatio(fine, nahme), stressRatio(coarse, nahme), label + ", wall stress");
        assertWithinGci(riseExact, rise(fine), rise(coarse), label + ", temperature rise");
        // the hottest node is where the closed form puts the maximum: mid-gap (Case 1) or the adiabatic wall
        Snapshot s = fine.finalSnapshot();
        assertEquals(exact.maxTemperaturePosition(), s.y()[HeatedFilms.hottestNode(s)], 1e-12 * GAP, label);
        // no pressure gradient: the stress is uniform, so the moving wall carries the same (within its own GCI)
        double scale = GAP / (VISCOSITY * speed(nahme));
        assertWithinGci(stressExact, fine.summary().wallShearStressUpper() * scale,
                coarse.summary().wallShearStressUpper() * scale, label + ", moving-wall stress");
    }

    @ParameterizedTest(name = "Case {0}, clustering {1}")
    @CsvSource({"1, 0", "2, 0", "1, 0.6", "2, 0.6"})
    void secondOrderOnTwoGridsAtNahmeTen(int nahmeCase, double clustering) {
        double nahme = 10;
        boolean adiabatic = nahmeCase == 2;
        NahmeCouette exact = new NahmeCouette(GAP, 0, speed(nahme), VISCOSITY, BETA, CONDUCTIVITY, WALL_TEMPERATURE,
                adiabatic ? NahmeCouette.Walls.UPPER_ADIABATIC : NahmeCouette.Walls.BOTH_AT_WALL_TEMPERATURE);
        double[] profile = new double[2];
        double[] stress = new double[2];
        int[] points = {COARSE, FINE};
        for (int k = 0; k < 2; k++) {
            FilmResult r = steady(nahme, adiabatic, points[k], clustering);
            profile[k] = HeatedFilms.maxTemperatureError(r.finalSnapshot(), exact::temperature);
            stress[k] = Math.abs(r.summary().wallShearStressLower() - exact.shearStress());
        }
        double profileOrder = HeatedFilms.order(profile[0], profile[1]);
        double stressOrder = HeatedFilms.order(stress[0], stress[1]);
        assertTrue(Math.abs(profileOrder - 2) <= BAND, "temperature profile: observed order " + profileOrder);
        assertTrue(Math.abs(stressOrder - 2) <= BAND, "wall shear stress: observed order " + stressOrder);
    }

    @Test
    void transientCoupledSolverSettlesOnTheSteadySolution() {
        // velocity-driven Nahme flow has a unique steady state for every Na (references.md 7(g), pitfall 5 of
        // section 11): the coupled transient run from rest at T0 must end on the steady solver's answer
        double nahme = 4;
        FilmPhysics physics = physics(nahme, false);
        double tolerance = 1e-8;
        FilmResult steady = FilmSolver.solve(FilmCase.steady(physics));
        FilmResult run = FilmSolver.solve(FilmCase.until(physics, 10 * THERMAL_TIME).withTolerance(tolerance));
        assertTrue(run.summary().steady(), "the run has settled");
        // allowed: the step tolerance times the scales (the wall speed and the rise mu0 U^2 / (2k), 30 K here)
        double speed = speed(nahme);
        double temperatureScale = VISCOSITY * speed * speed / (2 * CONDUCTIVITY);
        double[] ts = steady.finalSnapshot().temperature();
        double[] tr = run.finalSnapshot().temperature();
        double[] us = steady.finalSnapshot().velocity();
        double[] ur = run.finalSnapshot().velocity();
        for (int i = 0; i < ts.length; i++) {
            assertEquals(ts[i], tr[i], tolerance * temperatureScale, "temperature at node " + i);
            assertEquals(us[i], ur[i], tolerance * speed, "velocity at node " + i);
        }
        assertEquals(steady.summary().wallShearStressLower(), run.summary().wallShearStressLower(),
                tolerance * Math.abs(steady.summary().wallShearStressLower()));
        // and both sit on the closed form: beta dT_max = ln(1 + Na/8) (references.md 7(g), Case 1)
        assertEquals(Math.log1p(nahme / 8), rise(run), 1e-5);
    }
}
