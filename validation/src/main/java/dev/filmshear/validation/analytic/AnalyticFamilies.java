package dev.filmshear.validation.analytic;

import dev.filmshear.solver.model.FilmCase;
import dev.filmshear.solver.physics.ExponentialViscosity;
import dev.filmshear.solver.physics.FilmPhysics;
import dev.filmshear.solver.physics.Fluid;
import dev.filmshear.solver.physics.ThermalCondition;
import dev.filmshear.solver.physics.Wall;
import dev.filmshear.solver.physics.WallMotion;

import java.util.Optional;
import java.util.OptionalDouble;

/**
 * Recognises, from a case's immutable records, when a case has an exact solution in this package.
 *
 * <p>Common conditions: no volume sources, constant density. With a viscosity law that does not depend on
 * temperature:
 * <ul>
 *   <li>isothermal, finite gap: {@link ConstantPropertyFilm} for a transient case, its steady limit
 *       {@link CouettePoiseuilleFlow} for a steady one (an oscillating wall has no steady state: no match);</li>
 *   <li>isothermal, semi-infinite, no pressure gradient, transient: {@link StokesFirstProblem} for a steady,
 *       ramp or table wall, {@link StokesSecondProblem} (started form) for a sine wall;</li>
 *   <li>heated, steady, finite gap, no pressure gradient, constant specific heat and conductivity, one wall at
 *       rest and the other moving, walls at fixed temperatures or one fixed and one adiabatic:
 *       {@link CouetteViscousHeating}.</li>
 * </ul>
 * A heated film whose viscosity follows the exponential law ({@link ExponentialViscosity}) under the same
 * conditions, with both walls at one temperature or one of them adiabatic, is the Nahme problem
 * {@link NahmeCouette}.
 * Everything else has no closed form here and gives an empty result.
 */
public final class AnalyticFamilies {

    private AnalyticFamilies() {
    }

    /** The exact solution of {@code filmCase}, or empty when it belongs to no family of this package. */
    public static Optional<AnalyticSolution> match(FilmCase filmCase) {
        FilmPhysics physics = filmCase.physics();
        Fluid fluid = physics.fluid();
        if (physics.momentumSource() != null || physics.heatSource() != null || !fluid.density().isConstant()) {
            return Optional.empty();
        }
        if (!physics.lower().motion().isPrescribed()
                || (physics.upper() != null && !physics.upper().motion().isPrescribed())) {
            return Optional.empty(); // a driven wall: its velocity is part of the solution (see CoastDown)
        }
        if (!fluid.viscosity().isConstant()) {
            return physics.isThermal() ? matchTemperatureDependentViscosity(filmCase) : Optional.empty();
        }
        double temperature = physics.referenceTemperature();
        double viscosity = fluid.viscosity().mu(temperature);
        double density = fluid.density().density(temperature);
        return physics.isThermal() ? matchHeated(filmCase, viscosity)
                : matchIsothermal(filmCase, density, viscosity);
    }

    private static Optional<AnalyticSolution> matchIsothermal(FilmCase filmCase, double density, double viscosity) {
        FilmPhysics physics = filmCase.physics();
        if (physics.isSemiInfinite()) {
            // a semi-infinite layer never settles; a pressure gradient would accelerate the far field (not modelled)
            if (filmCase.isSteady() || physics.pressureGradient() != 0) {
                return Optional.empty();
            }
            WallMotion wall = physics.lower().motion();
            if (wall instanceof WallMotion.Sine sine) {
                return Optional.of(new StokesSecondProblem(density, viscosity, sine, physics.initialVelocity()));
            }
            return Optional.of(new StokesFirstProblem(density, viscosity, wall, physics.initialVelocity()));
        }
        ConstantPropertyFilm film = new ConstantPropertyFilm(physics.gap(), density, viscosity,
                physics.lower().motion(), physics.upper().motion(), physics.pressureGradient(),
                physics.initialVelocity());
        if (!filmCase.isSteady()) {
            return Optional.of(film);
        }
        return film.steadyLimit().map(AnalyticSolution.class::cast);
    }

    private static Optional<AnalyticSolution> matchHeated(FilmCase filmCase, double viscosity) {
        FilmPhysics physics = filmCase.physics();
        Fluid fluid = physics.fluid();
        if (!filmCase.isSteady() || physics.isSemiInfinite() || physics.pressureGradient() != 0
                || !fluid.specificHeat().isConstant() || !fluid.conductivity().isConstant()) {
            return Optional.empty();
        }
        OptionalDouble lowerVelocity = physics.lower().motion().settledVelocity();
        OptionalDouble upperVelocity = physics.upper().motion().settledVelocity();
        if (lowerVelocity.isEmpty() || upperVelocity.isEmpty()
                || (lowerVelocity.getAsDouble() == 0) == (upperVelocity.getAsDouble() == 0)) {
            return Optional.empty();
        }
        Wall lower = physics.lower();
        Wall upper = physics.upper();
        if (!fixedOrAdiabatic(lower.thermal()) || !fixedOrAdiabatic(upper.thermal())
                || !(lower.thermal() instanceof ThermalCondition.FixedTemperature
                        || upper.thermal() instanceof ThermalCondition.FixedTemperature)) {
            return Optional.empty();
        }
        double conductivity = fluid.conductivity().value(physics.referenceTemperature());
        return Optional.of(new CouetteViscousHeating(physics.gap(), viscosity, conductivity,
                lowerVelocity.getAsDouble(), upperVelocity.getAsDouble(), lower.thermal(), upper.thermal()));
    }

    private static boolean fixedOrAdiabatic(ThermalCondition condition) {
        return condition instanceof ThermalCondition.FixedTemperature
                || (condition instanceof ThermalCondition.HeatFlux flux && flux.flux() == 0);
    }

    /**
     * Heated films whose viscosity depends on temperature: the exponential law mu = mu_r exp(-beta (T - T_r))
     * ({@link ExponentialViscosity}) has the closed form {@link NahmeCouette} when the case is steady, in a finite
     * gap, without pressure gradient (volume sources and a varying density were excluded by the caller), with
     * constant specific heat and conductivity, one wall at rest and the other moving (settled velocities), and
     * either both walls at one fixed temperature T_w ({@link NahmeCouette.Walls#BOTH_AT_WALL_TEMPERATURE}) or one
     * wall at T_w and the other adiabatic ({@link NahmeCouette.Walls#LOWER_ADIABATIC} /
     * {@link NahmeCouette.Walls#UPPER_ADIABATIC}). The solution is
     * {@code new NahmeCouette(gap, u_a, u_b, mu_r exp(-beta (T_w - T_r)), beta, k, T_w, walls)}: the law's
     * reference moved to the wall temperature, where the Nahme problem's mu0 is taken (references.md 7(g)).
     * Other laws (Vogel, Walther, tables) have no closed form here.
     */
    private static Optional<AnalyticSolution> matchTemperatureDependentViscosity(FilmCase filmCase) {
        FilmPhysics physics = filmCase.physics();
        Fluid fluid = physics.fluid();
        if (!(fluid.viscosity() instanceof ExponentialViscosity law) || !filmCase.isSteady()
                || physics.isSemiInfinite() || physics.pressureGradient() != 0
                || !fluid.specificHeat().isConstant() || !fluid.conductivity().isConstant()) {
            return Optional.empty();
        }
        OptionalDouble lowerVelocity = physics.lower().motion().settledVelocity();
        OptionalDouble upperVelocity = physics.upper().motion().settledVelocity();
        if (lowerVelocity.isEmpty() || upperVelocity.isEmpty()
                || (lowerVelocity.getAsDouble() == 0) == (upperVelocity.getAsDouble() == 0)) {
            return Optional.empty();
        }
        ThermalCondition lower = physics.lower().thermal();
        ThermalCondition upper = physics.upper().thermal();
        NahmeCouette.Walls walls;
        double wallTemperature;
        if (lower instanceof ThermalCondition.FixedTemperature a
                && upper instanceof ThermalCondition.FixedTemperature b) {
            if (a.temperature() != b.temperature()) {
                return Optional.empty();
            }
            walls = NahmeCouette.Walls.BOTH_AT_WALL_TEMPERATURE;
            wallTemperature = a.temperature();
        } else if (isAdiabatic(lower) && upper instanceof ThermalCondition.FixedTemperature b) {
            walls = NahmeCouette.Walls.LOWER_ADIABATIC;
            wallTemperature = b.temperature();
        } else if (lower instanceof ThermalCondition.FixedTemperature a && isAdiabatic(upper)) {
            walls = NahmeCouette.Walls.UPPER_ADIABATIC;
            wallTemperature = a.temperature();
        } else {
            return Optional.empty();
        }
        double conductivity = fluid.conductivity().value(wallTemperature);
        double wallViscosity = law.reference() * Math.exp(-law.coefficient() * (wallTemperature
                - law.referenceTemperature()));
        return Optional.of(new NahmeCouette(physics.gap(), lowerVelocity.getAsDouble(), upperVelocity.getAsDouble(),
                wallViscosity, law.coefficient(), conductivity, wallTemperature, walls));
    }

    private static boolean isAdiabatic(ThermalCondition condition) {
        return condition instanceof ThermalCondition.HeatFlux flux && flux.flux() == 0;
    }
}
