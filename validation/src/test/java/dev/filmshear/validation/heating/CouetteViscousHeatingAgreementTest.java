package dev.filmshear.validation.heating;

import dev.filmshear.solver.model.FilmCase;
import dev.filmshear.solver.model.FilmResult;
import dev.filmshear.solver.model.FilmSummary;
import dev.filmshear.solver.model.GridSpec;
import dev.filmshear.solver.model.FilmSolver;
import dev.filmshear.solver.model.Snapshot;
import dev.filmshear.solver.physics.ConstantViscosity;
import dev.filmshear.solver.physics.FilmPhysics;
import dev.filmshear.solver.physics.ThermalCondition;
import dev.filmshear.validation.analytic.CouetteViscousHeating;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

import java.util.List;

import static dev.filmshear.validation.heating.HeatedFilms.AT_WALL_TEMPERATURE;
import static dev.filmshear.validation.heating.HeatedFilms.CONDUCTIVITY;
import static dev.filmshear.validation.heating.HeatedFilms.GAP;
import static dev.filmshear.validation.heating.HeatedFilms.THERMAL_TIME;
import static dev.filmshear.validation.heating.HeatedFilms.VISCOSITY;
import static dev.filmshear.validation.heating.HeatedFilms.WALL_TEMPERATURE;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

/**
 * Steady Couette flow with viscous heating and constant properties against the closed form of R. B. Bird,
 * W. E. Stewart and E. N. Lightfoot, <i>Transport Phenomena</i>, 2nd ed., 2002, §10.4, Eq. 10.4-9
 * ({@link CouetteViscousHeating}; check values of references.md 7(f)): the oil film (typical values,
 * references.md 6.1) with the upper wall at U = 10 m/s, solved by the steady solver and by a transient run of
 * 15 thermal diffusion times h^2/alpha, long enough to settle to round-off (the slowest mode decays like
 * exp(-pi^2 t alpha / (4 h^2)) with an adiabatic wall, exp(-pi^2 t alpha / h^2) otherwise).
 *
 * <p>The velocity is linear and the temperature quadratic; the vertex-centred flux form reproduces both exactly,
 * on clustered grids too (a face's difference quotient is exact at the face's mid-point for a quadratic, and the
 * half-interval dissipations sum to mu U'^2 times the control volume), and the wall fluxes come from a
 * three-point formula exact for quadratics. So every check is at round-off, clustered grids included; the
 * second order on clustered grids is shown by the Nahme problem (NahmeAgreementTest), whose profile is not a
 * polynomial.
 */
class CouetteViscousHeatingAgreementTest {
    private static final double SPEED = 10;
    private static final int POINTS = 201;
    /** Round-off of temperatures near 320 K after the solves (measured 1e-13 K). */
    private static final double TEMPERATURE_ROUND_OFF = 1e-9;
    /** Round-off of wall heat fluxes of order 1e5 W/m^2 (measured 2e-12 relative). */
    private static final double FLUX_ROUND_OFF = 1e-9;
    /** Round-off of the wall shear stress (measured 1e-15 relative). */
    private static final double STRESS_ROUND_OFF = 1e-10;
    /** Transient runs: 15 thermal times, adaptive steps at this relative tolerance. */
    private static final double SETTLE_TIME = 15 * THERMAL_TIME;
    private static final double TRANSIENT_TOLERANCE = 1e-8;

    /** The three ways of solving the case: steady uniform, steady clustered (0.6), transient settled. */
    private static List<FilmResult> solutions(FilmPhysics physics) {
        return List.of(FilmSolver.solve(FilmCase.steady(physics).withGrid(new GridSpec(POINTS, 0))),
                FilmSolver.solve(FilmCase.steady(physics).withGrid(new GridSpec(POINTS, 0.6))),
                FilmSolver.solve(FilmCase.until(physics, SETTLE_TIME).withTolerance(TRANSIENT_TOLERANCE)
                        .withGrid(new GridSpec(POINTS, 0))));
    }

    private static void assertAgrees(FilmResult r, CouetteViscousHeating exact, String label) {
        Snapshot s = r.finalSnapshot();
        FilmSummary m = r.summary();
        String what = label + (r.filmCase().isSteady() ? ", steady" : ", transient") + ", clustering "
                + r.filmCase().grid().clustering();
        assertTrue(m.steady(), what + ": settled");
        assertEquals(0, HeatedFilms.maxTemperatureError(s, exact::temperature), TEMPERATURE_ROUND_OFF, what);
        assertEquals(exact.heatFluxIntoLowerWall(), m.heatFluxIntoLowerWall(),
                FLUX_ROUND_OFF * Math.abs(exact.dissipation()), what + ": lower wall flux");
        assertEquals(exact.heatFluxIntoUpperWall(), m.heatFluxIntoUpperWall(),
                FLUX_ROUND_OFF * Math.abs(exact.dissipation()), what + ": upper wall flux");
        assertEquals(exact.shearStress(), m.wallShearStressLower(), STRESS_ROUND_OFF * exact.shearStress(), what);
        // the hottest node: exact where the maximum lies on a node (uniform grids here); on a clustered grid the
        // nodal maximum is the exact temperature of a node within one spacing of the true position
        int hot = HeatedFilms.hottestNode(s);
        double[] y = s.y();
        assertEquals(exact.temperature(y[hot]), m.maxTemperature(), TEMPERATURE_ROUND_OFF, what);
        double spacing = Math.max(hot > 0 ? y[hot] - y[hot - 1] : 0, hot < y.length - 1 ? y[hot + 1] - y[hot] : 0);
        if (r.filmCase().grid().clustering() == 0) {
            assertEquals(exact.maxTemperaturePosition(), y[hot], 1e-12 * GAP, what + ": position of the maximum");
            assertEquals(exact.maxTemperature(), m.maxTemperature(), TEMPERATURE_ROUND_OFF, what);
        } else {
            assertTrue(Math.abs(y[hot] - exact.maxTemperaturePosition()) <= spacing, what + ": position");
            assertTrue(m.maxTemperature() <= exact.maxTemperature() + TEMPERATURE_ROUND_OFF, what);
        }
    }

    @ParameterizedTest(name = "Br = {0}")
    @CsvSource({
        // Br, xi_max, Theta_max, dTheta/dxi at 0, dTheta/dxi at 1: references.md 7(f) check values (computed from
        // BSL Eq. 10.4-9)
        "0.5, 1, 1, 1.25, 0.75",
        "8, 0.625, 1.5625, 5, -3"})
    void wallsAtTwoTemperatures(double brinkman, double xiMax, double thetaMax, double slopeLower, double slopeUpper) {
        // BSL §10.4, Eq. 10.4-9: Theta = xi + (Br/2) xi (1 - xi), Br = mu U^2 / (k (T_b - T0)); the moving wall
        // (upper) is at T_b
        double rise = VISCOSITY * SPEED * SPEED / (CONDUCTIVITY * brinkman);
        double upperTemperature = WALL_TEMPERATURE + rise;
        FilmPhysics physics = HeatedFilms.couette(new ConstantViscosity(VISCOSITY), SPEED, AT_WALL_TEMPERATURE,
                new ThermalCondition.FixedTemperature(upperTemperature));
        CouetteViscousHeating exact = CouetteViscousHeating.fixedTemperatures(GAP, VISCOSITY, CONDUCTIVITY, 0, SPEED,
                WALL_TEMPERATURE, upperTemperature);
        assertEquals(brinkman, exact.brinkmanNumber(), 1e-12);
        for (FilmResult r : solutions(physics)) {
            assertAgrees(r, exact, "Br = " + brinkman);
            FilmSummary m = r.summary();
            if (r.filmCase().grid().clustering() == 0) {
                assertEquals(thetaMax, (m.maxTemperature() - WALL_TEMPERATURE) / rise, 1e-9);
                int hot = HeatedFilms.hottestNode(r.finalSnapshot());
                assertEquals(xiMax, r.finalSnapshot().y()[hot] / GAP, 1e-12);
            }
            // heat into the lower wall k dT/dy(0) = (k dT/h) dTheta/dxi(0); into the upper -(k dT/h) dTheta/dxi(1)
            double fluxScale = CONDUCTIVITY * rise / GAP;
            assertEquals(slopeLower, m.heatFluxIntoLowerWall() / fluxScale, 1e-9);
            assertEquals(slopeUpper, -m.heatFluxIntoUpperWall() / fluxScale, 1e-9);
        }
    }

    @Test
    void bothWallsAtOneTemperature() {
        // references.md 7(f) oil example: mu = 0.04 Pa s, U = 10 m/s, k = 0.13 W/(m K) give a mid-gap rise
        // mu U^2 / (8 k) = 3.846 K with both walls at T0 (printed to 4 significant digits)
        FilmPhysics physics = HeatedFilms.couette(new ConstantViscosity(VISCOSITY), SPEED, AT_WALL_TEMPERATURE,
                AT_WALL_TEMPERATURE);
        CouetteViscousHeating exact = CouetteViscousHeating.fixedTemperatures(GAP, VISCOSITY, CONDUCTIVITY, 0, SPEED,
                WALL_TEMPERATURE, WALL_TEMPERATURE);
        for (FilmResult r : solutions(physics)) {
            assertAgrees(r, exact, "both walls at T0");
            assertEquals(3.846, r.summary().maxTemperature() - WALL_TEMPERATURE, 5e-4);
            // half the dissipation mu U^2 / h leaves through each wall
            assertEquals(0.5 * exact.dissipation(), r.summary().heatFluxIntoLowerWall(), 1e-9 * exact.dissipation());
        }
    }

    @Test
    void oneWallAdiabatic() {
        // references.md 7(f): with the moving wall adiabatic, T - T0 = (mu U^2 / 2k)(1 - eta_a^2); the oil example
        // gives 15.385 K at the adiabatic wall (printed to 5 significant digits), and all the heat leaves through
        // the wall at T0
        FilmPhysics physics = HeatedFilms.couette(new ConstantViscosity(VISCOSITY), SPEED, AT_WALL_TEMPERATURE,
                ThermalCondition.HeatFlux.ADIABATIC);
        CouetteViscousHeating exact = new CouetteViscousHeating(GAP, VISCOSITY, CONDUCTIVITY, 0, SPEED,
                AT_WALL_TEMPERATURE, ThermalCondition.HeatFlux.ADIABATIC);
        for (FilmResult r : solutions(physics)) {
            assertAgrees(r, exact, "upper wall adiabatic");
            assertEquals(15.385, r.summary().maxTemperature() - WALL_TEMPERATURE, 5e-4);
            assertEquals(GAP, r.finalSnapshot().y()[HeatedFilms.hottestNode(r.finalSnapshot())], 1e-12 * GAP);
            assertEquals(exact.dissipation(), r.summary().heatFluxIntoLowerWall(), 1e-9 * exact.dissipation());
        }
    }
}
