package dev.filmshear.solver.physics;

import dev.filmshear.solver.base.InvalidParameterException;

import java.util.Objects;

/**
 * The physical problem across the film, in SI units: the equations
 * <pre>
 *   rho dU/dt    = d/dy( mu dU/dy ) - dp/dx + f(y, t)
 *   rho cp dT/dt = d/dy( k dT/dy ) + mu (dU/dy)^2 + q(y, t)     (only when the film is not isothermal)
 * </pre>
 * with the domain, the fluid, the walls' motions and thermal conditions, and a uniform initial state.
 *
 * <p>The film is isothermal when the fluid has no thermal properties and the walls no thermal
 * conditions: the energy equation is then not solved and every property is taken at the initial
 * temperature.
 *
 * @param domain a finite gap or a semi-infinite fluid
 * @param fluid the fluid
 * @param lower the lower wall (y = 0)
 * @param upper the upper wall (y = gap); null for a semi-infinite domain
 * @param pressureGradient dp/dx along the flow (Pa/m), constant
 * @param initialVelocity uniform initial velocity (m/s)
 * @param initialTemperature uniform initial temperature (K); for an isothermal film the temperature of
 *     every property (may be NaN when every property is constant)
 * @param momentumSource extra body force f(y, t) (N/m^3), or null
 * @param heatSource extra heat release q(y, t) (W/m^3), or null
 */
public record FilmPhysics(Domain domain, Fluid fluid, Wall lower, Wall upper, double pressureGradient,
                          double initialVelocity, double initialTemperature,
                          VolumeSource momentumSource, VolumeSource heatSource) {

    public FilmPhysics {
        Objects.requireNonNull(domain, "domain");
        Objects.requireNonNull(fluid, "fluid");
        Objects.requireNonNull(lower, "lower");
        boolean semiInfinite = domain instanceof Domain.SemiInfinite;
        if (semiInfinite != (upper == null)) {
            throw new IllegalArgumentException(semiInfinite
                    ? "a semi-infinite film has no upper wall" : "a film in a gap needs an upper wall");
        }
        InvalidParameterException.requireFinite("gradient", pressureGradient, "Pa/m");
        InvalidParameterException.requireFinite("velocity", initialVelocity, "m/s");
        boolean thermal = fluid.hasThermalProperties();
        if (thermal != (lower.thermal() != null) || (upper != null && thermal != (upper.thermal() != null))) {
            throw new IllegalArgumentException(
                    "thermal properties of the fluid and thermal conditions of the walls must be given together");
        }
        boolean needsTemperature = thermal || !fluid.viscosity().isConstant() || !fluid.density().isConstant();
        if (needsTemperature) {
            InvalidParameterException.requirePositive("temperature", initialTemperature, "K");
        }
    }

    /** An isothermal film in a gap with fixed properties, walls moving as given, no pressure gradient. */
    public static FilmPhysics isothermalCouette(double gap, double density, double viscosity,
                                                WallMotion lower, WallMotion upper) {
        return new FilmPhysics(new Domain.Gap(gap), Fluid.isothermal(density, new ConstantViscosity(viscosity)),
                Wall.isothermal(lower), Wall.isothermal(upper), 0, 0, Double.NaN, null, null);
    }

    /** True when the energy equation is solved. */
    public boolean isThermal() {
        return fluid.hasThermalProperties();
    }

    /** True for one wall and unbounded fluid. */
    public boolean isSemiInfinite() {
        return domain instanceof Domain.SemiInfinite;
    }

    /** The gap (m) of a finite film, NaN for a semi-infinite one. */
    public double gap() {
        return domain instanceof Domain.Gap g ? g.gap() : Double.NaN;
    }

    /** The temperature at which an isothermal film's properties are taken (K); 293.15 K when not given. */
    public double referenceTemperature() {
        return Double.isNaN(initialTemperature) ? 293.15 : initialTemperature;
    }

    /** A copy with another domain. */
    public FilmPhysics withDomain(Domain newDomain, Wall newUpper) {
        return new FilmPhysics(newDomain, fluid, lower, newUpper, pressureGradient, initialVelocity,
                initialTemperature, momentumSource, heatSource);
    }

    /** A copy with other walls. */
    public FilmPhysics withWalls(Wall newLower, Wall newUpper) {
        return new FilmPhysics(domain, fluid, newLower, newUpper, pressureGradient, initialVelocity,
                initialTemperature, momentumSource, heatSource);
    }

    /** A copy with other sources. */
    public FilmPhysics withSources(VolumeSource momentum, VolumeSource heat) {
        return new FilmPhysics(domain, fluid, lower, upper, pressureGradient, initialVelocity,
                initialTemperature, momentum, heat);
    }

    /** A copy with another pressure gradient (Pa/m). */
    public FilmPhysics withPressureGradient(double gradient) {
        return new FilmPhysics(domain, fluid, lower, upper, gradient, initialVelocity,
                initialTemperature, momentumSource, heatSource);
    }

    /** A copy with another uniform initial state. */
    public FilmPhysics withInitialState(double velocity, double temperature) {
        return new FilmPhysics(domain, fluid, lower, upper, pressureGradient, velocity,
                temperature, momentumSource, heatSource);
    }
}
