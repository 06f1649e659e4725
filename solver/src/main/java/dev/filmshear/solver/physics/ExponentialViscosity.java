package dev.filmshear.solver.physics;

import dev.filmshear.solver.base.InvalidParameterException;

/**
 * Exponential (Reynolds) viscosity law: mu(T) = reference * exp(-coefficient * (T - referenceTemperature)).
 *
 * <p>d mu / dT = -coefficient * mu, so the derivative costs nothing once mu is known. The law is the
 * one behind the Nahme/Gavis-Laurence closed form for viscous heating; it fits a real oil only over a
 * few tens of kelvin around its reference temperature, because ln mu of a liquid is not linear in T
 * (it curves like the Vogel law). The factory {@link #of} therefore states a validity range of
 * referenceTemperature +/- 30 K, a common-practice figure rather than one from a standard.
 *
 * @param reference viscosity at the reference temperature (Pa s)
 * @param referenceTemperature K
 * @param coefficient temperature-viscosity coefficient beta (1/K); zero or positive, since a liquid's
 *     viscosity does not rise with temperature
 * @param validFrom lowest temperature of the stated validity range (K)
 * @param validTo highest temperature of the stated validity range (K)
 */
public record ExponentialViscosity(double reference, double referenceTemperature, double coefficient,
                                   double validFrom, double validTo) implements ViscosityLaw {

    /** Half-width of the default validity range around the reference temperature (K); common practice. */
    public static final double DEFAULT_HALF_RANGE = 30;

    public ExponentialViscosity {
        InvalidParameterException.requirePositive("reference", reference, "Pa*s");
        InvalidParameterException.requirePositive("reference_temperature", referenceTemperature, "K");
        InvalidParameterException.requireNonNegative("coefficient", coefficient, "1/K");
        LawChecks.requireRange(validFrom, validTo);
        LawChecks.requireUsableMu("exponential",
                reference * Math.exp(-coefficient * (validFrom - referenceTemperature)), "valid_from", validFrom);
        LawChecks.requireUsableMu("exponential",
                reference * Math.exp(-coefficient * (validTo - referenceTemperature)), "valid_to", validTo);
    }

    /** The law valid over referenceTemperature +/- {@value #DEFAULT_HALF_RANGE} K. */
    public static ExponentialViscosity of(double reference, double referenceTemperature, double coefficient) {
        return new ExponentialViscosity(reference, referenceTemperature, coefficient,
                referenceTemperature - DEFAULT_HALF_RANGE, referenceTemperature + DEFAULT_HALF_RANGE);
    }

    @Override
    public String name() {
        return "exponential";
    }

    @Override
    public double mu(double temperature) {
        return reference * Math.exp(-coefficient * (temperature - referenceTemperature));
    }

    @Override
    public double dMuDT(double temperature) {
        return -coefficient * mu(temperature);
    }

    @Override
    public double dMuDT(double temperature, double mu) {
        return -coefficient * mu;
    }

    @Override
    public boolean isConstant() {
        return coefficient == 0;
    }

    @Override
    public String describe() {
        return "exponential: mu = " + reference + " Pa*s * exp(-" + coefficient + " 1/K * (T - "
                + referenceTemperature + " K)), valid " + validFrom + " K to " + validTo + " K";
    }
}
