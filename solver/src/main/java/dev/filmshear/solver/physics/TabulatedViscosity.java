package dev.filmshear.solver.physics;

import dev.filmshear.solver.base.InvalidParameterException;
import java.util.Arrays;
import java.util.Objects;

/**
 * Viscosity interpolated from a table of measured dynamic viscosities at strictly increasing temperatures.
 *
 * <p>Mathematics. Between nodes, ln mu is a monotone piecewise-cubic Hermite interpolant of the points
 * (T_k, ln mu_k): on [T_k, T_k+1] with h = T_k+1 - T_k and s = (T - T_k) / h,
 * <pre>
 *   ln mu = (1 + 2s)(1 - s)^2 y_k + s (1 - s)^2 h d_k + s^2 (3 - 2s) y_k+1 + s^2 (s - 1) h d_k+1
 * </pre>
 * The node slopes d_k follow F. N. Fritsch and R. E. Carlson, "Monotone piecewise cubic interpolation",
 * <i>SIAM J. Numer. Anal.</i> 17 (1980) 238-246: (1) three-point slopes from the secants delta_k
 * (one-sided three-point formulas at the ends); (2) d_k = 0 where the secants on either side differ in
 * sign or one is zero, and an end slope whose sign differs from its secant is set to zero; (3) on each
 * interval with alpha = d_k / delta_k and beta = d_k+1 / delta_k, if alpha^2 + beta^2 &gt; 9 both are
 * scaled by 3 / sqrt(alpha^2 + beta^2). The interpolant is then C1 and monotone on every interval where
 * the data are, so it never overshoots between monotone data. With two points the law is the straight
 * line in ln mu (an exponential law). Beyond the table's ends, ln mu continues as the straight line with
 * the end slope, which keeps the derivative continuous. At a node the tabulated value itself is returned.
 *
 * <p>Interpolating ln mu rather than mu follows the roughly exponential fall of a liquid's viscosity,
 * so few points suffice. Apache Commons Math 3.6.1 has no monotone interpolator (its spline and
 * Akima interpolators may overshoot), so this one is written here. Slopes and logarithms are computed
 * once in the constructor; an evaluation is a binary search and one exp, and allocates nothing.
 *
 * <p>This is a final class rather than a record because a record cannot keep the precomputed slopes;
 * its constructor and accessors are those a record with components (temperatures, viscosities,
 * validFrom, validTo) would have, and the accessors return copies, so instances are immutable.
 */
public final class TabulatedViscosity implements ViscosityLaw {

    /** Fritsch-Carlson: (alpha, beta) inside the circle of radius 3 is sufficient for monotonicity. */
    private static final double MONOTONE_RADIUS = 3;

    private final double[] temperatures;
    private final double[] viscosities;
    private final double validFrom;
    private final double validTo;
    /** ln mu at the nodes. */
    private final double[] logMu;
    /** d ln mu / dT at the nodes (1/K). */
    private final double[] slopes;

    /**
     * @param temperatures node temperatures (K), strictly increasing, at least 2; copied
     * @param viscosities dynamic viscosities at the nodes (Pa s), positive; copied
     * @param validFrom lowest temperature of the stated validity range (K)
     * @param validTo highest temperature of the stated validity range (K)
     */
    public TabulatedViscosity(double[] temperatures, double[] viscosities, double validFrom, double validTo) {
        this.temperatures = Objects.requireNonNull(temperatures, "temperatures").clone();
        this.viscosities = Objects.requireNonNull(viscosities, "viscosities").clone();
        int n = this.temperatures.length;
        if (n < 2) {
            throw new InvalidParameterException("temperatures", n + " point(s)", "at least 2 points");
        }
        if (this.viscosities.length != n) {
            throw new InvalidParameterException("values", this.viscosities.length + " values for " + n
                    + " temperatures", "one value per temperature");
        }
        for (int k = 0; k < n; k++) {
            InvalidParameterException.requirePositive("temperatures[" + k + "]", this.temperatures[k], "K");
            InvalidParameterException.requirePositive("values[" + k + "]", this.viscosities[k], "Pa*s");
            if (k > 0 && !(this.temperatures[k] > this.temperatures[k - 1])) {
                throw new InvalidParameterException("temperatures[" + k + "]",
                        InvalidParameterException.format(this.temperatures[k], "K") + " after temperatures["
                                + (k - 1) + "] = " + InvalidParameterException.format(this.temperatures[k - 1], "K"),
                        "strictly increasing temperatures");
            }
        }
        LawChecks.requireRange(validFrom, validTo);
        this.validFrom = validFrom;
        this.validTo = validTo;
        this.logMu = new double[n];
        for (int k = 0; k < n; k++) {
            logMu[k] = Math.log(this.viscosities[k]);
        }
        this.slopes = fritschCarlsonSlopes(this.temperatures, logMu);
        LawChecks.requireUsableMu("table", mu(validFrom), "valid_from", validFrom);
        LawChecks.requireUsableMu("table", mu(validTo), "valid_to", validTo);
    }

    /** A table valid over its own temperature range. */
    public TabulatedViscosity(double[] temperatures, double[] viscosities) {
        this(temperatures, viscosities, first(temperatures), last(temperatures));
    }

    /**
     * A table of kinematic viscosities nu_k (m^2/s), turned into dynamic ones with mu_k = nu_k rho(T_k);
     * valid over the table's temperature range.
     */
    public static TabulatedViscosity kinematic(double[] temperatures, double[] kinematicViscosities,
                                               DensityLaw density) {
        return kinematic(temperatures, kinematicViscosities, density, first(temperatures), last(temperatures));
    }

    /** As {@link #kinematic(double[], double[], DensityLaw)} with an explicit validity range (K). */
    public static TabulatedViscosity kinematic(double[] temperatures, double[] kinematicViscosities,
                                               DensityLaw density, double validFrom, double validTo) {
        Objects.requireNonNull(temperatures, "temperatures");
        Objects.requireNonNull(kinematicViscosities, "kinematicViscosities");
        Objects.requireNonNull(density, "density");
        if (kinematicViscosities.length != temperatures.length) {
            throw new InvalidParameterException("values", kinematicViscosities.length + " values for "
                    + temperatures.length + " temperatures", "one value per temperature");
        }
        double[] dynamic = new double[temperatures.length];
        for (int k = 0; k < dynamic.length; k++) {
            InvalidParameterException.requirePositive("values[" + k + "]", kinematicViscosities[k], "m^2/s");
            dynamic[k] = kinematicViscosities[k] * density.density(temperatures[k]);
        }
        return new TabulatedViscosity(temperatures, dynamic, validFrom, validTo);
    }

    private static double first(double[] values) {
        Objects.requireNonNull(values, "temperatures");
        return values.length == 0 ? Double.NaN : values[0];
    }

    private static double last(double[] values) {
        Objects.requireNonNull(values, "temperatures");
        return values.length == 0 ? Double.NaN : values[values.length - 1];
    }

    /** Node slopes of ln mu after Fritsch and Carlson (1980), steps (1)-(3) of the class javadoc. */
    private static double[] fritschCarlsonSlopes(double[] t, double[] y) {
        int n = t.length;
        double[] secant = new double[n - 1];
        for (int k = 0; k < n - 1; k++) {
            secant[k] = (y[k + 1] - y[k]) / (t[k + 1] - t[k]);
        }
        double[] d = new double[n];
        if (n == 2) {
            d[0] = secant[0];
            d[1] = secant[0];
            return d;
        }
        // (1)-(2) interior: derivative of the parabola through three points, zero at an extremum.
        for (int k = 1; k < n - 1; k++) {
            double hLeft = t[k] - t[k - 1];
            double hRight = t[k + 1] - t[k];
            d[k] = secant[k - 1] * secant[k] > 0
                    ? (hRight * secant[k - 1] + hLeft * secant[k]) / (hLeft + hRight)
                    : 0;
        }
        d[0] = endSlope(t[1] - t[0], t[2] - t[1], secant[0], secant[1]);
        d[n - 1] = endSlope(t[n - 1] - t[n - 2], t[n - 2] - t[n - 3], secant[n - 2], secant[n - 3]);
        // (3) pull (alpha, beta) of each interval into the circle of radius 3.
        for (int k = 0; k < n - 1; k++) {
            if (secant[k] == 0) {
                d[k] = 0;
                d[k + 1] = 0;
                continue;
            }
            double alpha = d[k] / secant[k];
            double beta = d[k + 1] / secant[k];
            double radius = Math.hypot(alpha, beta);
            if (radius > MONOTONE_RADIUS) {
                double scale = MONOTONE_RADIUS / radius;
                d[k] = scale * alpha * secant[k];
                d[k + 1] = scale * beta * secant[k];
            }
        }
        return d;
    }

    /**
     * One-sided three-point slope at an end node (derivative of the parabola through the three end
     * points), set to zero when its sign differs from the end interval's secant.
     *
     * @param hNear width of the end interval
     * @param hNext width of the interval next to it
     * @param secantNear secant of the end interval
     * @param secantNext secant of the interval next to it
     */
    private static double endSlope(double hNear, double hNext, double secantNear, double secantNext) {
        double slope = ((2 * hNear + hNext) * secantNear - hNear * secantNext) / (hNear + hNext);
        return slope * secantNear > 0 ? slope : 0;
    }

    /** Node temperatures (K); a copy. */
    public double[] temperatures() {
        return temperatures.clone();
    }

    /** Dynamic viscosities at the nodes (Pa s); a copy. */
    public double[] viscosities() {
        return viscosities.clone();
    }

    @Override
    public double validFrom() {
        return validFrom;
    }

    @Override
    public double validTo() {
        return validTo;
    }

    @Override
    public String name() {
        return "table";
    }

    @Override
    public double mu(double temperature) {
        int last = temperatures.length - 1;
        if (temperature > temperatures[0] && temperature < temperatures[last]) {
            int found = Arrays.binarySearch(temperatures, temperature);
            if (found >= 0) {
                return viscosities[found];
            }
            return Math.exp(interpolateLogMu(-found - 2, temperature));
        }
        if (temperature == temperatures[0]) {
            return viscosities[0];
        }
        if (temperature == temperatures[last]) {
            return viscosities[last];
        }
        // Outside the table (or NaN, which propagates): ln mu continues with the end slope.
        int end = temperature > temperatures[last] ? last : 0;
        return Math.exp(logMu[end] + slopes[end] * (temperature - temperatures[end]));
    }

    @Override
    public double dMuDT(double temperature) {
        return dMuDT(temperature, mu(temperature));
    }

    @Override
    public double dMuDT(double temperature, double mu) {
        return mu * logSlope(temperature);
    }

    /** d ln mu / dT (1/K) at a temperature. */
    private double logSlope(double temperature) {
        int last = temperatures.length - 1;
        if (temperature > temperatures[0] && temperature < temperatures[last]) {
            int found = Arrays.binarySearch(temperatures, temperature);
            return found >= 0 ? slopes[found] : interpolateLogSlope(-found - 2, temperature);
        }
        return temperature > temperatures[0] ? slopes[last] : slopes[0];
    }

    /** The cubic Hermite ln mu on interval k (class javadoc). */
    private double interpolateLogMu(int k, double temperature) {
        double h = temperatures[k + 1] - temperatures[k];
        double s = (temperature - temperatures[k]) / h;
        double oneMinusS = 1 - s;
        return (1 + 2 * s) * oneMinusS * oneMinusS * logMu[k]
                + s * oneMinusS * oneMinusS * h * slopes[k]
                + s * s * (3 - 2 * s) * logMu[k + 1]
                + s * s * (s - 1) * h * slopes[k + 1];
    }

    /** d/dT of {@link #interpolateLogMu} on interval k. */
    private double interpolateLogSlope(int k, double temperature) {
        double h = temperatures[k + 1] - temperatures[k];
        double s = (temperature - temperatures[k]) / h;
        return 6 * s * (s - 1) * (logMu[k] - logMu[k + 1]) / h
                + (3 * s * s - 4 * s + 1) * slopes[k]
                + (3 * s * s - 2 * s) * slopes[k + 1];
    }

    @Override
    public String describe() {
        StringBuilder text = new StringBuilder("table: ln mu interpolated monotonically (Fritsch-Carlson) through");
        for (int k = 0; k < temperatures.length; k++) {
            text.append(k == 0 ? " " : ", ").append('(').append(temperatures[k]).append(" K, ")
                    .append(viscosities[k]).append(" Pa*s)");
        }
        return text.append("; straight in ln mu beyond the ends; valid ").append(validFrom).append(" K to ")
                .append(validTo).append(" K").toString();
    }

    @Override
    public boolean equals(Object other) {
        return other instanceof TabulatedViscosity table
                && Arrays.equals(temperatures, table.temperatures)
                && Arrays.equals(viscosities, table.viscosities)
                && Double.compare(validFrom, table.validFrom) == 0
                && Double.compare(validTo, table.validTo) == 0;
    }

    @Override
    public int hashCode() {
        return Objects.hash(Arrays.hashCode(temperatures), Arrays.hashCode(viscosities), validFrom, validTo);
    }

    @Override
    public String toString() {
        return "TabulatedViscosity[temperatures=" + Arrays.toString(temperatures) + ", viscosities="
                + Arrays.toString(viscosities) + ", validFrom=" + validFrom + ", validTo=" + validTo + "]";
    }
}
