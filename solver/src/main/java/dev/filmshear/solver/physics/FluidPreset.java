package dev.filmshear.solver.physics;

import dev.filmshear.solver.base.InvalidParameterException;
import java.util.Objects;

/**
 * A built-in fluid: its laws and where they come from.
 *
 * @param name key as written in a case file ({@code preset = "iso-vg-46"})
 * @param description one line saying what the fluid is and the sources of its values
 * @param density density law
 * @param viscosity viscosity law
 * @param specificHeat specific heat c_p (J/(kg K))
 * @param conductivity thermal conductivity (W/(m K))
 * @param validityNote one line on the temperature range and the simplifications the values carry
 */
public record FluidPreset(String name, String description, DensityLaw density, ViscosityLaw viscosity,
                          PropertyLaw specificHeat, PropertyLaw conductivity, String validityNote) {

    public FluidPreset {
        Objects.requireNonNull(name, "name");
        Objects.requireNonNull(description, "description");
        Objects.requireNonNull(density, "density");
        Objects.requireNonNull(viscosity, "viscosity");
        Objects.requireNonNull(specificHeat, "specificHeat");
        Objects.requireNonNull(conductivity, "conductivity");
        Objects.requireNonNull(validityNote, "validityNote");
        if (name.isBlank()) {
            throw new InvalidParameterException("preset", "\"" + name + "\"", "a non-blank name");
        }
    }

    /** The preset as the solver's fluid, with its thermal properties. */
    public Fluid fluid() {
        return new Fluid(density, viscosity, specificHeat, conductivity);
    }
}
