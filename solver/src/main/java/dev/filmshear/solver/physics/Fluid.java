package dev.filmshear.solver.physics;

import java.util.Objects;

/**
 * The film's fluid: its density law, its viscosity law and, when the energy equation is solved, its
 * specific heat and thermal conductivity.
 *
 * @param density density law
 * @param viscosity viscosity law
 * @param specificHeat J/(kg K); null for an isothermal film
 * @param conductivity W/(m K); null for an isothermal film
 */
public record Fluid(DensityLaw density, ViscosityLaw viscosity, PropertyLaw specificHeat, PropertyLaw conductivity) {

    public Fluid {
        Objects.requireNonNull(density, "density");
        Objects.requireNonNull(viscosity, "viscosity");
        if ((specificHeat == null) != (conductivity == null)) {
            throw new IllegalArgumentException("specific heat and conductivity must be given together");
        }
    }

    /** An isothermal fluid (no thermal properties). */
    public static Fluid isothermal(double density, ViscosityLaw viscosity) {
        return new Fluid(DensityLaw.constant(density), viscosity, null, null);
    }

    /** True when the fluid carries the properties the energy equation needs. */
    public boolean hasThermalProperties() {
        return specificHeat != null;
    }

    /** Kinematic viscosity nu = mu / rho (m^2/s) at temperature {@code t}. */
    public double kinematicViscosity(double t) {
        return viscosity.mu(t) / density.density(t);
    }

    /** Thermal diffusivity alpha = k / (rho cp) (m^2/s) at temperature {@code t}. */
    public double thermalDiffusivity(double t) {
        return conductivity.value(t) / (density.density(t) * specificHeat.value(t));
    }
}
