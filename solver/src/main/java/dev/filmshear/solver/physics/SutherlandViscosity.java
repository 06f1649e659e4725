package dev.filmshear.solver.physics;

import dev.filmshear.solver.base.InvalidParameterException;

/**
 * Sutherland's law for the viscosity of a gas:
 * mu(T) = reference * (T / Tr)^(3/2) * (Tr + S) / (T + S), with Tr the reference temperature and S the
 * Sutherland constant.
 *
 * <p>W. Sutherland, <i>Phil. Mag.</i> S.5, 36 (1893) 507-531. Equivalently mu = C1 T^(3/2) / (T + S)
 * with C1 = reference (Tr + S) / Tr^(3/2). The logarithmic derivative is
 * d ln mu / dT = 3 / (2T) - 1 / (T + S), positive for every S &gt;= 0, so the law rises with temperature;
 * d mu / dT follows from mu with no further transcendental call.
 *
 * <p>The factory {@link #of} states a validity range of 170-1900 K, the range over which F. M. White
 * (<i>Viscous Fluid Flow</i>, 3rd ed., 2006, Table 1-2) gives the law as within about 2 % for air
 * (value from memory, not checked against the book).
 *
 * @param reference viscosity at the reference temperature (Pa s)
 * @param referenceTemperature K
 * @param constant Sutherland constant S (K); zero or positive
 * @param validFrom lowest temperature of the stated validity range (K)
 * @param validTo highest temperature of the stated validity range (K)
 */
public record SutherlandViscosity(double reference, double referenceTemperature, double constant,
                                  double validFrom, double validTo) implements ViscosityLaw {

    /** Default lower validity limit (K); White 2006, Table 1-2, from memory. */
    public static final double DEFAULT_VALID_FROM = 170;
    /** Default upper validity limit (K); White 2006, Table 1-2, from memory. */
    public static final double DEFAULT_VALID_TO = 1900;

    /** U.S. Standard Atmosphere 1976, Eq. 51: beta_s = C1 = 1.458e-6 kg/(m s K^0.5). */
    private static final double USSA_1976_C1 = 1.458e-6;
    /** U.S. Standard Atmosphere 1976, Eq. 51: S = 110.4 K. */
    private static final double USSA_1976_S = 110.4;
    /** Sea-level standard temperature of the U.S. Standard Atmosphere 1976 (K). */
    private static final double USSA_1976_T0 = 288.15;

    /**
     * Air after the U.S. Standard Atmosphere 1976 (NOAA/NASA/USAF), Eq. 51: mu = C1 T^1.5 / (T + S) with
     * C1 = 1.458e-6 kg/(m s K^0.5) and S = 110.4 K, written here through its value at 288.15 K
     * (1.7894e-5 Pa s, the standard sea-level viscosity). Validity 170-1900 K as for {@link #of}.
     */
    public static final SutherlandViscosity AIR_USSA_1976 = of(
            USSA_1976_C1 * USSA_1976_T0 * Math.sqrt(USSA_1976_T0) / (USSA_1976_T0 + USSA_1976_S),
            USSA_1976_T0, USSA_1976_S);

    public SutherlandViscosity {
        InvalidParameterException.requirePositive("reference", reference, "Pa*s");
        InvalidParameterException.requirePositive("reference_temperature", referenceTemperature, "K");
        InvalidParameterException.requireNonNegative("constant", constant, "K");
        LawChecks.requireRange(validFrom, validTo);
    }

    /** The law valid from 170 K to 1900 K. */
    public static SutherlandViscosity of(double reference, double referenceTemperature, double constant) {
        return new SutherlandViscosity(reference, referenceTemperature, constant, DEFAULT_VALID_FROM,
                DEFAULT_VALID_TO);
    }

    @Override
    public String name() {
        return "sutherland";
    }

    @Override
    public double mu(double temperature) {
        double ratio = temperature / referenceTemperature;
        return reference * ratio * Math.sqrt(ratio) * (referenceTemperature + constant) / (temperature + constant);
    }

    @Override
    public double dMuDT(double temperature) {
        return dMuDT(temperature, mu(temperature));
    }

    @Override
    public double dMuDT(double temperature, double mu) {
        return mu * (1.5 / temperature - 1 / (temperature + constant));
    }

    @Override
    public String describe() {
        return "sutherland: mu = " + reference + " Pa*s * (T / " + referenceTemperature + " K)^1.5 * ("
                + referenceTemperature + " K + " + constant + " K) / (T + " + constant + " K), valid "
                + validFrom + " K to " + validTo + " K";
    }
}
