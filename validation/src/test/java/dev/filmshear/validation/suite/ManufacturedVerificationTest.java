package dev.filmshear.validation.suite;

import dev.filmshear.solver.model.SolverOptions;
import dev.filmshear.validation.mms.ManufacturedCase;
import dev.filmshear.validation.mms.ManufacturedCases;
import org.junit.jupiter.api.Test;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

/**
 * The manufactured cases as the suite prints them: the fields written out from the code must be the fields of
 * references.md 10.1 as ManufacturedCases adapts them (u_m = U [eta sin(omega t) + a sin(pi eta) (1 - cos(omega t))],
 * T_m = T0 + dT sin(pi eta) (1 - cos(omega t) + b sin(omega t)), U = 1 m/s, a = 0.3, omega = 100 1/s, T0 = 313.15 K,
 * dT = 5 K, b = 0.5).
 */
class ManufacturedVerificationTest {

    @Test
    void fixedWallFieldsAreWrittenAsReferencesTenOneGivesThem() {
        String text = ManufacturedVerification.equations(ManufacturedCases.fixedWalls());
        assertTrue(text.startsWith("u_m = 1 m/s sin(100 t) eta + 0.3 m/s (1 - cos(100 t)) sin(pi eta); "
                + "T_m = 313.15 K + 5 K (1 - cos(100 t) + 0.5 sin(100 t)) sin(pi eta); eta = y/L, L = 100 um"), text);
        assertTrue(text.contains("rho = 870 kg/m^3, cp = 1950 J/(kg K), k = 0.13 W/(m K), "
                + "mu = 0.04 Pa s exp(-0.03/K (T - 313.15 K))"), text);
        assertTrue(text.contains("Lower wall: fixed temperature 313.15 K; upper wall: fixed temperature 313.15 K"), text);
        assertTrue(text.contains(ManufacturedVerification.SYSTEM), text);
    }

    @Test
    void everyBoundaryKindIsNamedInItsCase() {
        assertTrue(ManufacturedVerification.equations(ManufacturedCases.adiabaticWall()).contains("adiabatic"));
        assertTrue(ManufacturedVerification.equations(ManufacturedCases.heatTransferWall())
                .contains("heat transfer, 1300 W/(m^2 K) to an ambient at 313.15 K"));
        assertTrue(ManufacturedVerification.equations(ManufacturedCases.semiInfinite()).contains("truncation depth"));
        assertTrue(ManufacturedVerification.equations(ManufacturedCases.clusteredGrid())
                .contains("dp/dx = -2000000 Pa/m"));
        assertTrue(ManufacturedVerification.equations(ManufacturedCases.expandingFluid())
                .contains("rho = 870 kg/m^3 (1 - 0.0007/K (T - 313.15 K))"));
    }

    @Test
    void aCaseRefinesItsStepWithItsGrid() {
        ManufacturedCase c = ManufacturedCases.fixedWalls();
        VerificationCase v = ManufacturedVerification.of(c, new int[] {21, 41}, SolverOptions.defaults());
        // one TR-BDF2 step per grid interval: 20 steps of 0.5 ms to 10 ms on 21 nodes
        assertEquals(5e-4, v.levels().get(0).timeStep(), 1e-18);
        assertEquals(2.5e-4, v.levels().get(1).timeStep(), 1e-18);
        assertEquals("MMS: fixed walls", v.name());
        assertTrue(v.refinement().contains("TR-BDF2"));
    }
}
