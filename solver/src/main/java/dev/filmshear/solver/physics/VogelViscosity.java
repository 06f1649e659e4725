package dev.filmshear.solver.physics;

import dev.filmshear.solver.base.InvalidParameterException;

/**
 * Vogel (Vogel-Fulcher-Tammann) viscosity law: mu(T) = a * exp(b / (T - c)).
 *
 * <p>H. Vogel, <i>Physikalische Zeitschrift</i> 22 (1921) 645-646. With T, b and c in kelvin the law
 * follows a mineral oil's viscosity over a wide range with three constants. Its derivative is
 * d mu / dT = -b / (T - c)^2 * mu, which costs one division once mu is known.
 *
 * <p>The law diverges at T = c. {@link #mu} throws nothing: for T &lt;= c it returns +infinity (and
 * {@link #dMuDT} -infinity), so a Newton iterate that strays there is caught by the caller's NaN and
 * infinity guard rather than here; the validity range itself must lie above c.
 *
 * <p>The factory {@link #of} states a validity range from max(c + 30 K, 253.15 K) to 423.15 K
 * (-20 to 150 degC): common practice for mineral oils, whose fits are made from data in about that
 * range, and which keeps well clear of the divergence at c. It is not taken from a standard.
 *
 * @param a viscosity scale (Pa s)
 * @param b K; positive, so that the viscosity falls with temperature
 * @param c divergence temperature (K)
 * @param validFrom lowest temperature of the stated validity range (K); above c
 * @param validTo highest temperature of the stated validity range (K)
 */
public record VogelViscosity(double a, double b, double c, double validFrom, double validTo)
        implements ViscosityLaw {

    /** Default distance of the lower validity limit above c (K); common practice. */
    public static final double DEFAULT_MARGIN_ABOVE_C = 30;
    /** Default lower validity limit (K), -20 degC; common practice for mineral oils. */
    public static final double DEFAULT_VALID_FROM = 253.15;
    /** Default upper validity limit (K), 150 degC; common practice for mineral oils. */
    public static final double DEFAULT_VALID_TO = 423.15;

    public VogelViscosity {
        InvalidParameterException.requirePositive("a", a, "Pa*s");
        InvalidParameterException.requirePositive("b", b, "K");
        InvalidParameterException.requireFinite("c", c, "K");
        LawChecks.requireRange(validFrom, validTo);
        if (!(validFrom > c)) {
            throw new InvalidParameterException("valid_from", InvalidParameterException.format(validFrom, "K"),
                    "a temperature above c = " + InvalidParameterException.format(c, "K")
                            + ", where the Vogel law diverges");
        }
        LawChecks.requireUsableMu("vogel", a * Math.exp(b / (validFrom - c)), "valid_from", validFrom);
    }

    /** The law valid from max(c + 30 K, 253.15 K) to 423.15 K. */
    public static VogelViscosity of(double a, double b, double c) {
        return new VogelViscosity(a, b, c, Math.max(c + DEFAULT_MARGIN_ABOVE_C, DEFAULT_VALID_FROM), DEFAULT_VALID_TO);
    }

    @Override
    public String name() {
        return "vogel";
    }

    @Override
    public double mu(double temperature) {
        double excess = temperature - c;
        return excess > 0 ? a * Math.exp(b / excess) : Double.POSITIVE_INFINITY;
    }

    @Override
    public double dMuDT(double temperature) {
        return dMuDT(temperature, mu(temperature));
    }

    @Override
    public double dMuDT(double temperature, double mu) {
        double excess = temperature - c;
        return excess > 0 ? -b / (excess * excess) * mu : Double.NEGATIVE_INFINITY;
    }

    @Override
    public String describe() {
        return "vogel: mu = " + a + " Pa*s * exp(" + b + " K / (T - " + c + " K)), valid " + validFrom
                + " K to " + validTo + " K";
    }
}
