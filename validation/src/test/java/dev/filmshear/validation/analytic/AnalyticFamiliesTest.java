package dev.filmshear.validation.analytic;

import dev.filmshear.solver.model.FilmCase;
import dev.filmshear.solver.physics.ConstantViscosity;
import dev.filmshear.solver.physics.DensityLaw;
import dev.filmshear.solver.physics.Domain;
import dev.filmshear.solver.physics.FilmPhysics;
import dev.filmshear.solver.physics.Fluid;
import dev.filmshear.solver.physics.PropertyLaw;
import dev.filmshear.solver.physics.ThermalCondition;
import dev.filmshear.solver.physics.ViscosityLaw;
import dev.filmshear.solver.physics.Wall;
import dev.filmshear.solver.physics.WallMotion;
import org.junit.jupiter.api.Test;

import java.util.Optional;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertInstanceOf;
import static org.junit.jupiter.api.Assertions.assertTrue;

/** Recognising the closed-form family of a case from its records. */
class AnalyticFamiliesTest {
    private static final double GAP = 25e-6;
    private static final double RHO = 870;
    private static final double MU = 0.04;
    private static final double T0 = 313.15;

    /** An exponential law mu0 exp(-beta (T - T0)) as a test fixture; the solver has none yet. */
    private record ExponentialLaw(double mu0, double beta, double reference) implements ViscosityLaw {
        @Override
        public String name() {
            return "exponential";
        }

        @Override
        public double mu(double temperature) {
            return mu0 * Math.exp(-beta * (temperature - reference));
        }

        @Override
        public double dMuDT(double temperature) {
            return -beta * mu(temperature);
        }

        @Override
        public double validFrom() {
            return 250;
        }

        @Override
        public double validTo() {
            return 450;
        }

        @Override
        public String describe() {
            return "exponential test law";
        }
    }

    private static FilmPhysics isothermalGap(WallMotion lower, WallMotion upper) {
        return FilmPhysics.isothermalCouette(GAP, RHO, MU, lower, upper);
    }

    private static FilmPhysics semiInfinite(WallMotion wall) {
        return new FilmPhysics(Domain.SemiInfinite.automatic(), Fluid.isothermal(RHO, new ConstantViscosity(MU)),
                Wall.isothermal(wall), null, 0, 0, Double.NaN, null, null);
    }

    private static FilmPhysics heated(double lowerSpeed, double upperSpeed, ThermalCondition lower,
                                      ThermalCondition upper, PropertyLaw conductivity) {
        Fluid oil = new Fluid(DensityLaw.constant(RHO), new ConstantViscosity(MU), PropertyLaw.constant(1950),
                conductivity);
        return new FilmPhysics(new Domain.Gap(GAP), oil, new Wall(new WallMotion.Steady(lowerSpeed), lower),
                new Wall(new WallMotion.Steady(upperSpeed), upper), 0, 0, T0, null, null);
    }

    private static final ThermalCondition FIXED = new ThermalCondition.FixedTemperature(T0);

    @Test
    void isothermalGapIsTheConstantPropertyFilmOrItsSteadyLimit() {
        // the case of references.md 7(a) (Bird, Stewart & Lightfoot, Transport Phenomena, 2nd ed., §4.1): the
        // matched solution reproduces the table value u/U = 0.262756 at eta = 0.5, tau = 0.1
        FilmPhysics startUp = isothermalGap(new WallMotion.Steady(2), new WallMotion.Steady(0));
        double diffusionTime = GAP * GAP * RHO / MU;
        Optional<AnalyticSolution> startUpMatch = AnalyticFamilies.match(FilmCase.until(startUp, diffusionTime));
        ConstantPropertyFilm film = assertInstanceOf(ConstantPropertyFilm.class, startUpMatch.orElseThrow());
        assertEquals(0.262756, film.velocity(GAP / 2, 0.1 * diffusionTime) / 2, 5e-7);

        FilmCase steadyCase = FilmCase.steady(startUp.withPressureGradient(-1e6));
        AnalyticSolution steady = AnalyticFamilies.match(steadyCase).orElseThrow();
        CouettePoiseuilleFlow flow = assertInstanceOf(CouettePoiseuilleFlow.class, steady);
        assertEquals(-1e6, flow.pressureGradient(), 0);
        assertTrue(steady.appliesAt(Double.POSITIVE_INFINITY));

        FilmPhysics oscillating = isothermalGap(new WallMotion.Sine(0, 1, 100, 0), new WallMotion.Steady(0));
        assertTrue(AnalyticFamilies.match(FilmCase.steady(oscillating)).isEmpty(), "an oscillating wall never settles");
        Optional<AnalyticSolution> oscillatingMatch = AnalyticFamilies.match(FilmCase.until(oscillating, 1));
        assertInstanceOf(ConstantPropertyFilm.class, oscillatingMatch.orElseThrow());
    }

    @Test
    void semiInfiniteFluidIsAStokesProblem() {
        assertInstanceOf(StokesFirstProblem.class,
                AnalyticFamilies.match(FilmCase.until(semiInfinite(new WallMotion.Steady(1)), 0.01)).orElseThrow());
        assertInstanceOf(StokesFirstProblem.class, AnalyticFamilies.match(
                FilmCase.until(semiInfinite(new WallMotion.Ramp(0, 1, 0, 1e-3)), 0.01)).orElseThrow());
        AnalyticSolution plate = AnalyticFamilies.match(
                FilmCase.until(semiInfinite(new WallMotion.Sine(0, 1, 50, 0)), 0.1)).orElseThrow();
        assertInstanceOf(StokesSecondProblem.class, plate);
        assertTrue(!plate.hasUpperWall() && Double.isNaN(plate.wallShearStressUpper(0.05)));
        // BSL Example 4.1-1 oil example of references.md 7(b): |tau_w| = 33.274 Pa at 0.01 s (nu = 46e-6 m^2/s)
        FilmPhysics oil = new FilmPhysics(Domain.SemiInfinite.automatic(),
                Fluid.isothermal(0.040 / 46e-6, new ConstantViscosity(0.040)), Wall.moving(1), null, 0, 0, Double.NaN,
                null, null);
        AnalyticSolution oilLayer = AnalyticFamilies.match(FilmCase.until(oil, 0.02)).orElseThrow();
        assertEquals(-33.274, oilLayer.wallShearStressLower(0.01), 5e-4);
        assertTrue(AnalyticFamilies.match(FilmCase.until(semiInfinite(new WallMotion.Steady(1))
                .withPressureGradient(-1e5), 0.01)).isEmpty(), "accelerating far field is not modelled");
    }

    @Test
    void steadyHeatedCouetteIsViscousHeating() {
        // references.md 7(f) oil example (Bird, Stewart & Lightfoot §10.4): 3.846 K rise at mid-gap, U = 10 m/s
        AnalyticSolution both = AnalyticFamilies.match(FilmCase.steady(
                heated(0, 10, FIXED, FIXED, PropertyLaw.constant(0.13)))).orElseThrow();
        CouetteViscousHeating heating = assertInstanceOf(CouetteViscousHeating.class, both);
        assertEquals(3.846, heating.maxTemperature() - T0, 5e-4);
        assertEquals(T0 + 3.846, both.temperature(GAP / 2, Double.POSITIVE_INFINITY), 5e-4);
        AnalyticSolution adiabatic = AnalyticFamilies.match(FilmCase.steady(
                heated(10, 0, ThermalCondition.HeatFlux.ADIABATIC, FIXED, PropertyLaw.constant(0.13)))).orElseThrow();
        assertEquals(T0 + 15.385, adiabatic.temperature(0, Double.POSITIVE_INFINITY), 5e-4);
    }

    @Test
    void casesOutsideEveryFamilyHaveNoMatch() {
        PropertyLaw constantK = PropertyLaw.constant(0.13);
        FilmPhysics transientHeated = heated(0, 10, FIXED, FIXED, constantK);
        assertTrue(AnalyticFamilies.match(FilmCase.until(transientHeated, 1e-3)).isEmpty(), "transient heating");
        assertTrue(AnalyticFamilies.match(FilmCase.steady(heated(3, 10, FIXED, FIXED, constantK))).isEmpty(),
                "both walls moving");
        assertTrue(AnalyticFamilies.match(FilmCase.steady(heated(0, 10, FIXED, FIXED,
                new PropertyLaw(0.13, T0, -5e-4)))).isEmpty(), "conductivity varies");
        assertTrue(AnalyticFamilies.match(FilmCase.steady(heated(0, 10, new ThermalCondition.HeatTransfer(800, 300),
                FIXED, constantK))).isEmpty(), "convective wall");
        assertTrue(AnalyticFamilies.match(FilmCase.steady(heated(0, 10, new ThermalCondition.HeatFlux(500), FIXED,
                constantK))).isEmpty(), "heated wall");
        assertTrue(AnalyticFamilies.match(FilmCase.steady(transientHeated.withPressureGradient(-1e6))).isEmpty(),
                "pressure gradient with heating");
        FilmPhysics sourced = isothermalGap(new WallMotion.Steady(1), new WallMotion.Steady(0))
                .withSources((y, t) -> 1e3, null);
        assertTrue(AnalyticFamilies.match(FilmCase.until(sourced, 1e-3)).isEmpty(), "volume source");
        FilmPhysics expanding = new FilmPhysics(new Domain.Gap(GAP), new Fluid(new DensityLaw(RHO, T0, 7e-4),
                new ConstantViscosity(MU), null, null), Wall.moving(1), Wall.atRest(), 0, 0, T0, null, null);
        assertTrue(AnalyticFamilies.match(FilmCase.until(expanding, 1e-3)).isEmpty(), "density varies");
        // extension point: exponential viscosity (the Nahme family) is not matched until the solver has such a law
        Fluid nahmeOil = new Fluid(DensityLaw.constant(RHO), new ExponentialLaw(MU, 0.03, T0),
                PropertyLaw.constant(1950),
                constantK);
        FilmPhysics nahme = new FilmPhysics(new Domain.Gap(GAP), nahmeOil, new Wall(Wall.atRest().motion(), FIXED),
                new Wall(new WallMotion.Steady(10), FIXED), 0, 0, T0, null, null);
        assertTrue(AnalyticFamilies.match(FilmCase.steady(nahme)).isEmpty(), "exponential viscosity: extension point");
    }
}
