package dev.filmshear.validation.heating;

import dev.filmshear.solver.model.FilmCase;
import dev.filmshear.solver.physics.DensityLaw;
import dev.filmshear.solver.physics.Domain;
import dev.filmshear.solver.physics.ExponentialViscosity;
import dev.filmshear.solver.physics.FilmPhysics;
import dev.filmshear.solver.physics.Fluid;
import dev.filmshear.solver.physics.PropertyLaw;
import dev.filmshear.solver.physics.ThermalCondition;
import dev.filmshear.solver.physics.VogelViscosity;
import dev.filmshear.solver.physics.Wall;
import dev.filmshear.solver.physics.WallMotion;
import dev.filmshear.validation.analytic.AnalyticFamilies;
import dev.filmshear.validation.analytic.AnalyticSolution;
import dev.filmshear.validation.analytic.NahmeCouette;
import org.junit.jupiter.api.Test;

import static dev.filmshear.validation.heating.HeatedFilms.GAP;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertInstanceOf;
import static org.junit.jupiter.api.Assertions.assertTrue;

/**
 * Recognising the Nahme family (references.md 7(g)) from a case's records: a steady heated Couette film with an
 * exponential viscosity law, walls at one temperature or one wall adiabatic, in the style of AnalyticFamiliesTest.
 */
class NahmeFamilyMatchTest {
    private static final double T_REFERENCE = 313.15;
    /** Walls 10 K above the law's reference: the family must move mu0 to the wall temperature. */
    private static final double T_WALL = 323.15;
    private static final double MU_REFERENCE = 0.04;
    private static final double BETA = 0.03;
    private static final double K = 0.13;
    private static final ThermalCondition FIXED = new ThermalCondition.FixedTemperature(T_WALL);
    private static final ThermalCondition ADIABATIC = ThermalCondition.HeatFlux.ADIABATIC;

    private static FilmPhysics nahme(double lowerSpeed, double upperSpeed, ThermalCondition lower,
                                     ThermalCondition upper) {
        Fluid oil = new Fluid(DensityLaw.constant(870), ExponentialViscosity.of(MU_REFERENCE, T_REFERENCE, BETA),
                PropertyLaw.constant(1950), PropertyLaw.constant(K));
        return new FilmPhysics(new Domain.Gap(GAP), oil, new Wall(new WallMotion.Steady(lowerSpeed), lower),
                new Wall(new WallMotion.Steady(upperSpeed), upper), 0, 0, T_WALL, null, null);
    }

    private static AnalyticSolution match(FilmPhysics physics) {
        return AnalyticFamilies.match(FilmCase.steady(physics)).orElseThrow();
    }

    @Test
    void wallsAtOneTemperatureAreCaseOne() {
        // references.md 7(g) table: Na = 4, Case 1: tau h/(mu0 U) = 0.76034600, beta dT_max = 0.40546511
        double mu0 = MU_REFERENCE * Math.exp(-BETA * (T_WALL - T_REFERENCE));
        double speed = Math.sqrt(4 * K / (BETA * mu0));
        NahmeCouette n = assertInstanceOf(NahmeCouette.class, match(nahme(0, speed, FIXED, FIXED)));
        assertEquals(NahmeCouette.Walls.BOTH_AT_WALL_TEMPERATURE, n.walls());
        assertEquals(mu0, n.referenceViscosity(), 1e-15);
        assertEquals(T_WALL, n.wallTemperature());
        assertEquals(4, n.nahmeNumber(), 1e-12);
        assertEquals(0.76034600, n.shearStress() * GAP / (mu0 * speed), 5e-9);
        assertEquals(0.40546511, BETA * (n.maxTemperature() - T_WALL), 5e-9);
        // either wall may be the moving one
        NahmeCouette lowerMoving = assertInstanceOf(NahmeCouette.class, match(nahme(speed, 0, FIXED, FIXED)));
        assertEquals(-speed, lowerMoving.relativeSpeed(), 0);
    }

    @Test
    void oneAdiabaticWallIsCaseTwo() {
        // references.md 7(g): Case 2 at Na equals Case 1 at 4 Na; Na = 1: beta dT_max = ln(1 + 1/2) = 0.40546511
        double mu0 = MU_REFERENCE * Math.exp(-BETA * (T_WALL - T_REFERENCE));
        double speed = Math.sqrt(K / (BETA * mu0));
        NahmeCouette lower = assertInstanceOf(NahmeCouette.class, match(nahme(0, speed, ADIABATIC, FIXED)));
        assertEquals(NahmeCouette.Walls.LOWER_ADIABATIC, lower.walls());
        assertEquals(0, lower.maxTemperaturePosition());
        assertEquals(0.40546511, BETA * (lower.maxTemperature() - T_WALL), 5e-9);
        NahmeCouette upper = assertInstanceOf(NahmeCouette.class, match(nahme(0, speed, FIXED, ADIABATIC)));
        assertEquals(NahmeCouette.Walls.UPPER_ADIABATIC, upper.walls());
        assertEquals(GAP, upper.maxTemperaturePosition());
        assertEquals(0.76034600, upper.shearStress() * GAP / (mu0 * speed), 5e-9);
    }

    @Test
    void casesOutsideTheNahmeFamilyHaveNoMatch() {
        double speed = 20;
        FilmPhysics base = nahme(0, speed, FIXED, FIXED);
        assertTrue(AnalyticFamilies.match(FilmCase.until(base, 1e-3)).isEmpty(), "transient");
        assertTrue(AnalyticFamilies.match(FilmCase.steady(nahme(0, speed, FIXED,
                new ThermalCondition.FixedTemperature(T_WALL + 5)))).isEmpty(), "walls at two temperatures");
        assertTrue(AnalyticFamilies.match(FilmCase.steady(nahme(0, speed, FIXED,
                new ThermalCondition.HeatTransfer(1000, T_WALL)))).isEmpty(), "heat-transfer wall");
        assertTrue(AnalyticFamilies.match(FilmCase.steady(nahme(0, speed, FIXED,
                new ThermalCondition.HeatFlux(100)))).isEmpty(), "heated wall");
        assertTrue(AnalyticFamilies.match(FilmCase.steady(nahme(5, speed, FIXED, FIXED))).isEmpty(), "both moving");
        assertTrue(AnalyticFamilies.match(FilmCase.steady(base.withPressureGradient(-1e6))).isEmpty(),
                "pressure gradient");
        assertTrue(AnalyticFamilies.match(FilmCase.steady(base.withSources(null, (y, t) -> 1e3))).isEmpty(),
                "heat source");
        Fluid varyingK = new Fluid(DensityLaw.constant(870), ExponentialViscosity.of(MU_REFERENCE, T_REFERENCE, BETA),
                PropertyLaw.constant(1950), new PropertyLaw(K, T_REFERENCE, -5e-4));
        assertTrue(AnalyticFamilies.match(FilmCase.steady(new FilmPhysics(base.domain(), varyingK, base.lower(),
                base.upper(), 0, 0, T_WALL, null, null))).isEmpty(), "conductivity varies");
        Fluid expanding = new Fluid(new DensityLaw(870, T_REFERENCE, 7e-4),
                ExponentialViscosity.of(MU_REFERENCE, T_REFERENCE, BETA), PropertyLaw.constant(1950),
                PropertyLaw.constant(K));
        assertTrue(AnalyticFamilies.match(FilmCase.steady(new FilmPhysics(base.domain(), expanding, base.lower(),
                base.upper(), 0, 0, T_WALL, null, null))).isEmpty(), "density varies");
        Fluid vogel = new Fluid(DensityLaw.constant(870), VogelViscosity.of(5e-5, 900, 180),
                PropertyLaw.constant(1950), PropertyLaw.constant(K));
        assertTrue(AnalyticFamilies.match(FilmCase.steady(new FilmPhysics(base.domain(), vogel, base.lower(),
                base.upper(), 0, 0, T_WALL, null, null))).isEmpty(), "another temperature-dependent law");
    }
}
