package dev.filmshear.validation.bench;

import dev.filmshear.solver.model.FilmCase;
import dev.filmshear.solver.model.GridSpec;
import dev.filmshear.solver.physics.DensityLaw;
import dev.filmshear.solver.physics.Domain;
import dev.filmshear.solver.physics.FilmPhysics;
import dev.filmshear.solver.physics.Fluid;
import dev.filmshear.solver.physics.PropertyLaw;
import dev.filmshear.solver.physics.ThermalCondition;
import dev.filmshear.solver.physics.VogelViscosity;
import dev.filmshear.solver.physics.Wall;
import dev.filmshear.solver.physics.WallMotion;

/**
 * The cases the benchmarks time, as the speed issue states them: a Vogel oil (a = 5.264e-5 Pa s, b = 948 K,
 * c = 170 K; density 860 kg/m^3, c_p 1950 J/(kg K), k 0.13 W/(m K)) in a 25 um gap, both walls at 313.15 K,
 * the upper wall ramped to 20 m/s in 2 us, run to 40 ms at the default tolerance on 201 nodes.
 */
final class BenchmarkCases {
    static final int POINTS = 201;
    static final double GAP = 25e-6;
    static final double WALL_TEMPERATURE = 313.15;

    private BenchmarkCases() {
    }

    static Fluid vogelOil() {
        return new Fluid(DensityLaw.constant(860), VogelViscosity.of(5.264e-5, 948, 170), PropertyLaw.constant(1950),
                PropertyLaw.constant(0.13));
    }

    /** The heated start-up of the speed issue, at gap {@code gap} (m) and final speed {@code speed} (m/s). */
    static FilmCase heatedStartUp(double gap, double speed) {
        FilmPhysics physics = new FilmPhysics(new Domain.Gap(gap), vogelOil(),
                new Wall(new WallMotion.Steady(0), new ThermalCondition.FixedTemperature(WALL_TEMPERATURE)),
                new Wall(new WallMotion.Ramp(0, speed, 0, 2e-6), new ThermalCondition.FixedTemperature(WALL_TEMPERATURE)),
                0, 0, WALL_TEMPERATURE, null, null);
        return FilmCase.until(physics, 0.040, 5e-6, 2e-5, 1e-4, 1e-3, 5e-3, 2e-2)
                .withGrid(new GridSpec(POINTS, 0));
    }

    /** The same film solved straight to its steady state at 20 m/s. */
    static FilmCase steady() {
        FilmCase startUp = heatedStartUp(GAP, 20);
        FilmPhysics p = startUp.physics();
        FilmPhysics held = p.withWalls(p.lower(), new Wall(new WallMotion.Steady(20), p.upper().thermal()));
        return FilmCase.steady(held).withGrid(new GridSpec(POINTS, 0));
    }

    /** The isothermal film of the same oil at 313.15 K, the upper wall oscillating (so every step has work). */
    static FilmCase isothermalOscillation() {
        FilmPhysics physics = FilmPhysics.isothermalCouette(GAP, 860, vogelOil().viscosity().mu(WALL_TEMPERATURE),
                new WallMotion.Steady(0), new WallMotion.Sine(0, 20, 1000, 0));
        return FilmCase.until(physics, 1e9).withGrid(new GridSpec(POINTS, 0));
    }

    /** The heated film with the upper wall oscillating about 20 m/s: every step is a full coupled step. */
    static FilmCase coupledOscillation() {
        FilmCase startUp = heatedStartUp(GAP, 20);
        FilmPhysics p = startUp.physics();
        FilmPhysics moving = p.withWalls(p.lower(), new Wall(new WallMotion.Sine(20, 2, 1000, 0), p.upper().thermal()));
        return FilmCase.until(moving, 1e9).withGrid(new GridSpec(POINTS, 0));
    }
}
