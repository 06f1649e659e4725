package dev.filmshear.solver.physics;

import dev.filmshear.solver.base.InvalidParameterException;
import java.util.Objects;

/**
 * ASTM D341 (Walther) viscosity-temperature relation for petroleum oils, turned into a dynamic
 * viscosity with a density law.
 *
 * <p>Mathematics (ASTM D341, Section 5 of the -17/-20 editions; equation numbers inside the standard not
 * checked), with the kinematic viscosity nu in mm^2/s, T in K and both logarithms base 10:
 * <pre>
 *   log10(log10(Z)) = a - b * log10(T)
 *   Z = nu + 0.7 + exp(-1.47 - 1.84 nu - 0.51 nu^2)         (the standard's low-viscosity form)
 *   mu(T) = nu(T) * 1e-6 * rho(T)
 * </pre>
 * The standard's explicit inverse nu(Z) = (Z - 0.7) - exp(-0.7487 - 3.295 w + 0.6119 w^2 - 0.3193 w^3),
 * w = Z - 0.7, is only approximate (about 1e-4 relative), so this class uses it as the starting point of
 * Newton's method on f(nu) = nu + 0.7 + exp(-1.47 - 1.84 nu - 0.51 nu^2) - Z, which is increasing and
 * convex for nu &gt; 0 and so converges from any start; three to four steps reach double precision.
 * Above nu = {@value #NU_CORRECTION_NEGLIGIBLE} mm^2/s the correction term is below 1e-18 of nu and is
 * dropped exactly (nu = Z - 0.7), so ordinary oil viscosities cost one log and two exps.
 *
 * <p>The derivative is analytic. With Y = log10 Z = 10^(a - b log10 T):
 * <pre>
 *   dZ/dT  = -ln(10) * b * Y * Z / T
 *   dnu/dT = (dZ/dT) / (1 - (1.84 + 1.02 nu) exp(-1.47 - 1.84 nu - 0.51 nu^2))
 *   dmu/dT = 1e-6 * (dnu/dT * rho + nu * drho/dT)
 * </pre>
 *
 * <p>Scope (ASTM D341, paraphrased): only where the oil is a homogeneous liquid, between its cloud
 * point and its initial boiling point. The default validity of {@link #throughPoints} runs from 20 K
 * below the colder point to 50 K above the hotter one: extrapolating towards cold oil (wax, cloud point)
 * is less safe than towards hot oil. These margins are common practice, not part of the standard.
 *
 * @param a the constant A of D341 in the kelvin form (dimensionless)
 * @param b the slope B of D341 (dimensionless); positive, so that the viscosity falls with temperature
 * @param density density law that turns the kinematic viscosity into a dynamic one
 * @param validFrom lowest temperature of the stated validity range (K)
 * @param validTo highest temperature of the stated validity range (K)
 */
public record WaltherViscosity(double a, double b, DensityLaw density, double validFrom, double validTo)
        implements ViscosityLaw {

    /** Default margin of the validity range below the colder input point (K); common practice. */
    public static final double DEFAULT_MARGIN_BELOW = 20;
    /** Default margin of the validity range above the hotter input point (K); common practice. */
    public static final double DEFAULT_MARGIN_ABOVE = 50;

    /**
     * Kinematic viscosity (mm^2/s) above which the D341 low-viscosity term exp(-1.47 - 1.84 nu - 0.51 nu^2)
     * is below 1e-18 nu (it is 8.6e-18 at 7 mm^2/s), far under double precision, so nu = Z - 0.7.
     */
    static final double NU_CORRECTION_NEGLIGIBLE = 7;

    /** 1 mm^2/s in m^2/s. */
    private static final double MM2_PER_S = 1e-6;
    private static final double LN10 = Math.log(10);
    /** ASTM D341 low-viscosity term: exp(C0 + C1 nu + C2 nu^2). */
    private static final double C0 = -1.47;
    private static final double C1 = -1.84;
    private static final double C2 = -0.51;
    /** ASTM D341 approximate inverse: nu = w - exp(D0 + D1 w + D2 w^2 + D3 w^3), w = Z - 0.7. */
    private static final double D0 = -0.7487;
    private static final double D1 = -3.295;
    private static final double D2 = 0.6119;
    private static final double D3 = -0.3193;
    /** Newton stops when its step is below this fraction of nu (a few units in the last place). */
    private static final double NEWTON_TOLERANCE = 1e-15;
    /** Newton from the D341 inverse (error about 1e-4) needs 3-4 steps; this is a generous bound. */
    private static final int NEWTON_MAX_STEPS = 8;

    public WaltherViscosity {
        InvalidParameterException.requireFinite("a", a, "");
        InvalidParameterException.requirePositive("b", b, "");
        Objects.requireNonNull(density, "density");
        LawChecks.requireRange(validFrom, validTo);
        requirePositiveDensity(density, "valid_from", validFrom);
        requirePositiveDensity(density, "valid_to", validTo);
        LawChecks.requireUsableMu("walther",
                kinematic(a, b, validFrom) * MM2_PER_S * density.density(validFrom), "valid_from", validFrom);
        LawChecks.requireUsableMu("walther",
                kinematic(a, b, validTo) * MM2_PER_S * density.density(validTo), "valid_to", validTo);
    }

    /**
     * The D341 line through two measured kinematic viscosities, valid from 20 K below the colder point to
     * 50 K above the hotter one (ASTM D341: B = [loglog Z1 - loglog Z2] / [log T2 - log T1],
     * A = loglog Z1 + B log T1).
     *
     * @param t1 temperature of the first point (K)
     * @param nu1 kinematic viscosity at t1 (m^2/s)
     * @param t2 temperature of the second point (K), different from t1
     * @param nu2 kinematic viscosity at t2 (m^2/s)
     * @param density density law of the oil
     */
    public static WaltherViscosity throughPoints(double t1, double nu1, double t2, double nu2, DensityLaw density) {
        InvalidParameterException.requirePositive("temperatures", t1, "K");
        InvalidParameterException.requirePositive("temperatures", t2, "K");
        if (t1 == t2) {
            throw new InvalidParameterException("temperatures", InvalidParameterException.format(t2, "K"),
                    "two different temperatures");
        }
        double logLogZ1 = logLogZ(nu1);
        double logLogZ2 = logLogZ(nu2);
        double log1 = Math.log10(t1);
        double slope = (logLogZ1 - logLogZ2) / (Math.log10(t2) - log1);
        if (!(slope > 0)) {
            throw new InvalidParameterException("values", nu1 + " m^2/s at " + t1 + " K and " + nu2 + " m^2/s at "
                    + t2 + " K", "kinematic viscosities that fall as the temperature rises");
        }
        return new WaltherViscosity(logLogZ1 + slope * log1, slope, density,
                Math.min(t1, t2) - DEFAULT_MARGIN_BELOW, Math.max(t1, t2) + DEFAULT_MARGIN_ABOVE);
    }

    /** A linear density law turns negative far enough above its reference; the range must stop short. */
    private static void requirePositiveDensity(DensityLaw density, String endKey, double temperature) {
        if (!(density.density(temperature) > 0)) {
            throw new InvalidParameterException(endKey, InvalidParameterException.format(temperature, "K"),
                    "a temperature at which the density law stays positive");
        }
    }

    /** log10(log10(Z(nu))) for a kinematic viscosity in m^2/s, rejecting values D341 cannot take. */
    private static double logLogZ(double nu) {
        InvalidParameterException.requirePositive("values", nu, "m^2/s");
        double z = d341Z(nu / MM2_PER_S);
        if (!(z > 1)) {
            throw new InvalidParameterException("values", InvalidParameterException.format(nu, "m^2/s"),
                    "a kinematic viscosity above about 1.153e-7 m^2/s (ASTM D341 needs Z > 1)");
        }
        return Math.log10(Math.log10(z));
    }

    /** Kinematic viscosity (m^2/s) at temperature {@code temperature} (K). */
    public double kinematicViscosity(double temperature) {
        return kinematic(a, b, temperature) * MM2_PER_S;
    }

    @Override
    public String name() {
        return "walther";
    }

    @Override
    public double mu(double temperature) {
        return kinematic(a, b, temperature) * MM2_PER_S * density.density(temperature);
    }

    @Override
    public double dMuDT(double temperature) {
        double y = Math.exp(LN10 * a - b * Math.log(temperature));
        double z = Math.exp(LN10 * y);
        double nu = kinematicFromZ(z);
        return derivative(temperature, nu, y, z);
    }

    @Override
    public double dMuDT(double temperature, double mu) {
        // Recover nu and Z from mu: one exp (only below 7 mm^2/s) and one log instead of mu's two exps.
        double nu = mu / (MM2_PER_S * density.density(temperature));
        double z = d341Z(nu);
        return derivative(temperature, nu, Math.log10(z), z);
    }

    /** dmu/dT from nu (mm^2/s), Y = log10 Z and Z at temperature T (chain rule, class javadoc). */
    private double derivative(double temperature, double nu, double y, double z) {
        double dZdT = -LN10 * b * y * z / temperature;
        double dNuDT = dZdT / dZdNu(nu);
        return MM2_PER_S * (dNuDT * density.density(temperature) + nu * density.derivative(temperature));
    }

    @Override
    public String describe() {
        return "walther: log10(log10(Z)) = " + a + " - " + b + " * log10(T / K), Z = nu/(mm^2/s) + 0.7 + "
                + "exp(-1.47 - 1.84 nu - 0.51 nu^2) (ASTM D341); density " + density.reference() + " kg/m^3 at "
                + density.referenceTemperature() + " K, expansion " + density.expansion() + " 1/K; valid "
                + validFrom + " K to " + validTo + " K";
    }

    /** Kinematic viscosity (mm^2/s) of the D341 line (a, b) at temperature T (K). */
    private static double kinematic(double a, double b, double temperature) {
        // Y = log10 Z = 10^(a - b log10 T) = exp(a ln10 - b ln T); Z = 10^Y.
        double y = Math.exp(LN10 * a - b * Math.log(temperature));
        return kinematicFromZ(Math.exp(LN10 * y));
    }

    /** ASTM D341 Z (dimensionless) for a kinematic viscosity nu in mm^2/s, low-viscosity form. */
    static double d341Z(double nu) {
        return nu >= NU_CORRECTION_NEGLIGIBLE ? nu + 0.7 : nu + 0.7 + Math.exp(C0 + nu * (C1 + C2 * nu));
    }

    /** dZ/dnu of {@link #d341Z}. */
    private static double dZdNu(double nu) {
        return nu >= NU_CORRECTION_NEGLIGIBLE ? 1 : 1 + (C1 + 2 * C2 * nu) * Math.exp(C0 + nu * (C1 + C2 * nu));
    }

    /**
     * Kinematic viscosity (mm^2/s) for a D341 Z, the exact inverse of {@link #d341Z} to double
     * precision: the standard's approximate inverse refined by Newton's method (class javadoc).
     */
    static double kinematicFromZ(double z) {
        double w = z - 0.7;
        if (w >= NU_CORRECTION_NEGLIGIBLE) {
            return w;
        }
        double nu = w - Math.exp(D0 + w * (D1 + w * (D2 + w * D3)));
        for (int step = 0; step < NEWTON_MAX_STEPS; step++) {
            double correction = Math.exp(C0 + nu * (C1 + C2 * nu));
            double change = (nu + correction - w) / (1 + (C1 + 2 * C2 * nu) * correction);
            nu -= change;
            if (Math.abs(change) <= NEWTON_TOLERANCE * nu) {
                break;
            }
        }
        return nu;
    }
}
