package dev.filmshear.solver.physics;

/**
 * The saturation line of water from the IAPWS Industrial Formulation 1997, region 4.
 *
 * <p>Source: IAPWS R7-97(2012), <i>Revised Release on the IAPWS Industrial Formulation 1997 for the
 * Thermodynamic Properties of Water and Steam</i>, Eqs. 28-31 (equation numbers from memory). Range:
 * 273.15 K &lt;= T &lt;= 647.096 K, 611.213 Pa &lt;= p &lt;= 22.064 MPa.
 *
 * <p>Mathematics. One implicit quadratic in beta = (p_s / 1 MPa)^(1/4) and theta = T_s / 1 K + n9 / (T_s / 1 K - n10),
 * <pre>
 *   beta^2 theta^2 + n1 beta^2 theta + n2 beta^2 + n3 beta theta^2 + n4 beta theta + n5 beta
 *     + n6 theta^2 + n7 theta + n8 = 0,
 * </pre>
 * solved explicitly both ways:
 * <pre>
 *   p_s: A = theta^2 + n1 theta + n2,  B = n3 theta^2 + n4 theta + n5,  C = n6 theta^2 + n7 theta + n8,
 *        p_s / 1 MPa = [2C / (-B + sqrt(B^2 - 4AC))]^4
 *   T_s: E = beta^2 + n3 beta + n6,    F = n1 beta^2 + n4 beta + n7,    G = n2 beta^2 + n5 beta + n8,
 *        D = 2G / (-F - sqrt(F^2 - 4EG)),  T_s / 1 K = [n10 + D - sqrt((n10 + D)^2 - 4(n9 + n10 D))] / 2
 * </pre>
 * The coefficients n1..n10 were typed from memory and match public transcriptions of the release; the
 * tests check them through the release's published check values (Tables 35 and 36), which several
 * independent public test files quote identically.
 * Neither EJML nor Apache Commons Math provides water properties, so the equations are typed in here.
 *
 * <p>All arguments and results are SI: T in K, p in Pa. The methods do not check the range.
 */
public final class Iapws97Region4 {

    /** Lowest temperature of the saturation equations (K); the release extends them to 273.15 K. */
    public static final double MIN_TEMPERATURE = 273.15;
    /** Critical temperature (K), the upper end of the saturation line. */
    public static final double CRITICAL_TEMPERATURE = 647.096;
    /** Critical pressure (Pa), the upper end of the saturation line. */
    public static final double CRITICAL_PRESSURE = 22.064e6;

    /** Reducing pressure p* = 1 MPa (Pa). */
    private static final double P_STAR = 1e6;

    private static final double N1 = 0.11670521452767e4;
    private static final double N2 = -0.72421316703206e6;
    private static final double N3 = -0.17073846940092e2;
    private static final double N4 = 0.12020824702470e5;
    private static final double N5 = -0.32325550322333e7;
    private static final double N6 = 0.14915108613530e2;
    private static final double N7 = -0.48232657361591e4;
    private static final double N8 = 0.40511340542057e6;
    private static final double N9 = -0.23855557567849;
    private static final double N10 = 0.65017534844798e3;

    private Iapws97Region4() {
    }

    /** Saturation pressure p_s (Pa) at temperature {@code temperature} (K). */
    public static double saturationPressure(double temperature) {
        double theta = temperature + N9 / (temperature - N10);
        double a = theta * theta + N1 * theta + N2;
        double b = N3 * theta * theta + N4 * theta + N5;
        double c = N6 * theta * theta + N7 * theta + N8;
        double root = 2 * c / (-b + Math.sqrt(b * b - 4 * a * c));
        double squared = root * root;
        return P_STAR * squared * squared;
    }

    /** Saturation temperature T_s (K) at pressure {@code pressure} (Pa). */
    public static double saturationTemperature(double pressure) {
        double beta = Math.sqrt(Math.sqrt(pressure / P_STAR));
        double e = beta * beta + N3 * beta + N6;
        double f = N1 * beta * beta + N4 * beta + N7;
        double g = N2 * beta * beta + N5 * beta + N8;
        double d = 2 * g / (-f - Math.sqrt(f * f - 4 * e * g));
        double sum = N10 + d;
        return 0.5 * (sum - Math.sqrt(sum * sum - 4 * (N9 + N10 * d)));
    }
}
