package dev.filmshear.solver.physics;

import dev.filmshear.solver.base.InvalidParameterException;

/**
 * Power-law temperature dependence, used for gases: mu(T) = reference * (T / referenceTemperature)^exponent.
 *
 * <p>For air the exponent is about 0.67-0.7 (F. M. White, <i>Viscous Fluid Flow</i>, 3rd ed., 2006,
 * Table 1-2, n = 0.666 over 210-1900 K; value from memory). Its derivative is d mu / dT = exponent * mu / T.
 * The factory {@link #of} states a validity range of half to twice the reference temperature, a
 * common-practice span for a one-parameter gas fit, not a published limit.
 *
 * @param reference viscosity at the reference temperature (Pa s)
 * @param referenceTemperature K
 * @param exponent dimensionless; positive for a gas
 * @param validFrom lowest temperature of the stated validity range (K)
 * @param validTo highest temperature of the stated validity range (K)
 */
public record PowerLawViscosity(double reference, double referenceTemperature, double exponent,
                                double validFrom, double validTo) implements ViscosityLaw {

    public PowerLawViscosity {
        InvalidParameterException.requirePositive("reference", reference, "Pa*s");
        InvalidParameterException.requirePositive("reference_temperature", referenceTemperature, "K");
        InvalidParameterException.requireFinite("exponent", exponent, "");
        LawChecks.requireRange(validFrom, validTo);
        LawChecks.requireUsableMu("power",
                reference * Math.pow(validFrom / referenceTemperature, exponent), "valid_from", validFrom);
        LawChecks.requireUsableMu("power",
                reference * Math.pow(validTo / referenceTemperature, exponent), "valid_to", validTo);
    }

    /** The law valid from half to twice the reference temperature. */
    public static PowerLawViscosity of(double reference, double referenceTemperature, double exponent) {
        return new PowerLawViscosity(reference, referenceTemperature, exponent,
                0.5 * referenceTemperature, 2 * referenceTemperature);
    }

    @Override
    public String name() {
        return "power";
    }

    @Override
    public double mu(double temperature) {
        return reference * Math.pow(temperature / referenceTemperature, exponent);
    }

    @Override
    public double dMuDT(double temperature) {
        return exponent * mu(temperature) / temperature;
    }

    @Override
    public double dMuDT(double temperature, double mu) {
        return exponent * mu / temperature;
    }

    @Override
    public boolean isConstant() {
        return exponent == 0;
    }

    @Override
    public String describe() {
        return "power: mu = " + reference + " Pa*s * (T / " + referenceTemperature + " K)^" + exponent
                + ", valid " + validFrom + " K to " + validTo + " K";
    }
}
