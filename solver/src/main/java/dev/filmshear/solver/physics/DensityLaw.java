package dev.filmshear.solver.physics;

import dev.filmshear.solver.base.InvalidParameterException;

/**
 * Density with linear thermal expansion: rho(T) = reference * (1 - expansion * (T - referenceTemperature)).
 *
 * <p>The linear form is the first term of the volume correction used for lubricating oils in
 * API MPMS Ch. 11.1 / ASTM D1250 (CTL = exp(-alpha dT (1 + 0.8 alpha dT))); over the tens of kelvin of a
 * film's temperature rise the two differ by less than 0.1 %. In the film model the density enters
 * only the inertia and heat-capacity terms; the small volume change itself is not followed
 * (the film is treated as incompressible across y).
 *
 * @param reference density at the reference temperature (kg/m^3)
 * @param referenceTemperature K
 * @param expansion volumetric thermal expansion coefficient (1/K); 0 for constant density
 */
public record DensityLaw(double reference, double referenceTemperature, double expansion) {

    public DensityLaw {
        InvalidParameterException.requirePositive("density", reference, "kg/m^3");
        InvalidParameterException.requireFinite("density_temperature", referenceTemperature, "K");
        if (!(expansion >= 0 && expansion < 0.01)) {
            throw new InvalidParameterException("thermal_expansion", expansion + " 1/K",
                    "0 to 0.01 1/K (liquids are near 1e-3 1/K)");
        }
    }

    /** A density that does not change with temperature. */
    public static DensityLaw constant(double density) {
        return new DensityLaw(density, 0, 0);
    }

    /** True when the density does not change with temperature. */
    public boolean isConstant() {
        return expansion == 0;
    }

    /** Density (kg/m^3) at temperature {@code t} (K). */
    public double density(double t) {
        return expansion == 0 ? reference : reference * (1 - expansion * (t - referenceTemperature));
    }

    /** d rho / dT (kg/(m^3 K)). */
    public double derivative(double t) {
        return -reference * expansion;
    }
}
