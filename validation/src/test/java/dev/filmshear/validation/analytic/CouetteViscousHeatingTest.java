package dev.filmshear.validation.analytic;

import dev.filmshear.solver.base.InvalidParameterException;
import dev.filmshear.solver.physics.ThermalCondition;
import org.junit.jupiter.api.Test;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;

/** Steady Couette flow with viscous heating, constant properties. */
class CouetteViscousHeatingTest {
    /** Polynomial closed forms: rounding only. */
    private static final double EXACT = 1e-12;
    /** The oil example is printed to three decimals of a kelvin. */
    private static final double MILLIKELVIN = 5e-4;

    private static final double GAP = 50e-6;
    private static final double K = 0.13;
    private static final double T0 = 313.15;
    private static final double ADIABATIC_FLUX = 0;

    @Test
    void brinkmanTableOfProfileMaximaAndWallSlopes() {
        // Bird, Stewart & Lightfoot, Transport Phenomena, 2nd ed., 2002, §10.4, Eq. 10.4-9:
        // Theta = xi + (Br/2) xi (1 - xi); check values of references.md 7(f).
        double[][] table = {
            // Br, xi_max, Theta_max, dTheta/dxi at 0, dTheta/dxi at 1
            {0.5, 1, 1, 1.25, 0.75},
            {2, 1, 1, 2, 0},
            {4, 0.75, 1.125, 3, -1},
            {8, 0.625, 1.5625, 5, -3},
        };
        double dT = 10;
        double mu = 0.04;
        for (double[] row : table) {
            // lower wall fixed at T0, upper wall moving at U and held at T0 + dT: Br = mu U^2 / (k dT)
            double u = Math.sqrt(row[0] * K * dT / mu);
            CouetteViscousHeating film = CouetteViscousHeating.fixedTemperatures(GAP, mu, K, 0, u, T0, T0 + dT);
            assertEquals(row[0], film.brinkmanNumber(), EXACT * row[0]);
            assertEquals(row[1], film.maxTemperaturePosition() / GAP, EXACT, "xi_max at Br " + row[0]);
            assertEquals(row[2], (film.maxTemperature() - T0) / dT, EXACT, "Theta_max at Br " + row[0]);
            // dTheta/dxi = h q / (k dT) at the lower wall, -h q / (k dT) at the upper wall
            assertEquals(row[3], film.heatFluxIntoLowerWall() * GAP / (K * dT), EXACT, "slope at 0, Br " + row[0]);
            assertEquals(row[4], -film.heatFluxIntoUpperWall() * GAP / (K * dT), EXACT, "slope at 1, Br " + row[0]);
            assertEquals(0.5 + 0.125 * row[0], (film.temperature(GAP / 2) - T0) / dT, EXACT, "Theta(1/2)");
        }
    }

    @Test
    void oilExampleRises() {
        // references.md 7(f) example: mu = 0.04 Pa s, U = 10 m/s, k = 0.13 W/(m K): mid-gap rise 3.846 K with both
        // walls at T0 (mu U^2/(8k)); 15.385 K at the adiabatic wall (mu U^2/(2k)), whichever wall moves.
        CouetteViscousHeating isothermalWalls = CouetteViscousHeating.fixedTemperatures(GAP, 0.04, K, 0, 10, T0, T0);
        assertEquals(3.846, isothermalWalls.maxTemperature() - T0, MILLIKELVIN);
        assertEquals(GAP / 2, isothermalWalls.maxTemperaturePosition(), EXACT * GAP);
        ThermalCondition fixed = new ThermalCondition.FixedTemperature(T0);
        ThermalCondition adiabatic = new ThermalCondition.HeatFlux(ADIABATIC_FLUX);
        CouetteViscousHeating lowerAdiabatic = new CouetteViscousHeating(GAP, 0.04, K, 0, 10, adiabatic, fixed);
        CouetteViscousHeating upperAdiabatic = new CouetteViscousHeating(GAP, 0.04, K, 10, 0, fixed, adiabatic);
        assertEquals(15.385, lowerAdiabatic.maxTemperature() - T0, MILLIKELVIN);
        assertEquals(0, lowerAdiabatic.maxTemperaturePosition(), 0);
        assertEquals(15.385, upperAdiabatic.maxTemperature() - T0, MILLIKELVIN);
        assertEquals(GAP, upperAdiabatic.maxTemperaturePosition(), 0);
        // T - T_w = (mu U^2/(2k)) (1 - eta_a^2)
        assertEquals(0.04 * 100 / (2 * K) * (1 - 0.09), lowerAdiabatic.temperature(0.3 * GAP) - T0, EXACT * 100);
        assertEquals(0, lowerAdiabatic.heatFluxIntoLowerWall(), EXACT);
    }

    @Test
    void dissipatedHeatLeavesThroughTheWalls() {
        // energy balance of the steady film: q_lower + q_upper = mu U^2 / h
        CouetteViscousHeating film = CouetteViscousHeating.fixedTemperatures(GAP, 0.02, K, -3, 7, T0, T0 + 4);
        assertEquals(film.dissipation(), film.heatFluxIntoLowerWall() + film.heatFluxIntoUpperWall(),
                EXACT * film.dissipation());
        assertEquals(0.02 * 100 / GAP, film.dissipation(), EXACT * film.dissipation());
        assertEquals(2, film.velocity(GAP / 2), EXACT);
    }

    @Test
    void refusesConditionsOutsideTheFamily() {
        ThermalCondition adiabatic = new ThermalCondition.HeatFlux(ADIABATIC_FLUX);
        assertThrows(InvalidParameterException.class,
                () -> new CouetteViscousHeating(GAP, 0.04, K, 0, 1, adiabatic, adiabatic));
        assertThrows(InvalidParameterException.class, () -> new CouetteViscousHeating(GAP, 0.04, K, 0, 1,
                new ThermalCondition.HeatFlux(100), new ThermalCondition.FixedTemperature(T0)));
        assertThrows(IllegalStateException.class,
                () -> CouetteViscousHeating.fixedTemperatures(GAP, 0.04, K, 0, 1, T0, T0).brinkmanNumber());
    }
}
