package dev.filmshear.cli.report;

import java.math.BigDecimal;
import java.math.MathContext;
import java.math.RoundingMode;
import java.util.List;

/**
 * Numbers for the report: five significant figures, the unit named by the summary key's suffix (the project's
 * convention: {@code wall_shear_stress_lower_Pa}, {@code dissipation_W_per_m2}, {@code momentum_time_scale_s}),
 * and an SI prefix where engineers read one more easily (25 µm, 1.3762 µs, 22.459 kPa).
 *
 * <p>A value x is rounded once to five significant figures; with d its decimal exponent (10^d ≤ |x| &lt; 10^(d+1))
 * it is written plainly for -3 ≤ d ≤ 5 and as m × 10^d otherwise. A prefix 10^(3k) is chosen from the rounded
 * value, clamped to the prefixes the unit allows. Spaces inside a value are non-breaking so a table cell never
 * splits a number from its unit.
 */
final class ValueFormat {
    /** Significant figures of every number in the report. */
    static final int SIGNIFICANT = 5;
    private static final MathContext ROUNDING = new MathContext(SIGNIFICANT, RoundingMode.HALF_EVEN);
    private static final int PLAIN_FROM = -3;
    private static final int PLAIN_TO = 5;
    private static final String SPACE = "\u00a0";
    private static final String SUPERSCRIPT_DIGITS = "⁰¹²³⁴⁵⁶⁷⁸⁹";
    /** Offset between the kelvin and Celsius scales (ISO 80000-5). */
    private static final double CELSIUS_ZERO_K = 273.15;

    /**
     * A unit named by a key suffix.
     *
     * @param suffix the key's ending, with its leading underscore
     * @param symbol what the report prints
     * @param minPower the smallest power of ten (a multiple of 3) whose SI prefix the unit takes
     * @param maxPower the largest such power
     */
    record Unit(String suffix, String symbol, int minPower, int maxPower) {
    }

    /** A key without a unit suffix: a pure number. */
    static final Unit NONE = new Unit("", "", 0, 0);
    private static final Unit KELVIN = new Unit("_K", "K", 0, 0);

    /** Every suffix the summary uses, longest first so that {@code _Pa_s} wins over {@code _s}. */
    private static final List<Unit> UNITS = List.of(
            new Unit("_W_per_m2", "W/m²", 0, 9),
            new Unit("_J_per_m2", "J/m²", 0, 9),
            new Unit("_kg_per_m3", "kg/m³", 0, 0),
            new Unit("_m2_per_s", "m²/s", 0, 0),
            new Unit("_rad_per_s", "rad/s", 0, 0),
            new Unit("_m_per_s", "m/s", 0, 0),
            new Unit("_percent", "%", 0, 0),
            new Unit("_per_K", "1/K", 0, 0),
            new Unit("_per_s", "1/s", 0, 0),
            new Unit("_Pa_s", "Pa·s", -3, 0),
            new Unit("_N_m", "N·m", 0, 0),
            new Unit("_rpm", "rpm", 0, 0),
            new Unit("_Pa", "Pa", 0, 9),
            new Unit("_Hz", "Hz", 0, 6),
            KELVIN,
            new Unit("_s", "s", -9, 0),
            new Unit("_m", "m", -9, 0),
            new Unit("_W", "W", 0, 9),
            new Unit("_J", "J", 0, 9),
            new Unit("_N", "N", 0, 6));

    private ValueFormat() {
    }

    /** The unit a summary key names by its suffix, or {@link #NONE}. */
    static Unit unitOf(String key) {
        for (Unit u : UNITS) {
            if (key.endsWith(u.suffix()) && key.length() > u.suffix().length()) {
                return u;
            }
        }
        return NONE;
    }

    /** The key without its unit suffix. */
    static String stem(String key) {
        Unit u = unitOf(key);
        return key.substring(0, key.length() - u.suffix().length());
    }

    /** The value with its unit (and an SI prefix where the unit takes one). */
    static String quantity(double value, Unit unit) {
        if (!Double.isFinite(value)) {
            return String.valueOf(value);
        }
        BigDecimal rounded = round(value);
        int power = 0;
        if (rounded.signum() != 0) {
            power = Math.max(unit.minPower(), Math.min(unit.maxPower(), Math.floorDiv(exponent(rounded), 3) * 3));
        }
        String digits = number(rounded.movePointLeft(power));
        return unit.symbol().isEmpty() ? digits : digits + SPACE + prefix(power) + unit.symbol();
    }

    /** A temperature in kelvin, then in degrees Celsius for the reader who thinks in them. */
    static String temperature(double kelvin) {
        return quantity(kelvin, KELVIN) + " (" + number(round(kelvin - CELSIUS_ZERO_K)) + SPACE + "°C)";
    }

    /** The value to five significant figures, without a unit. */
    static String number(double value) {
        return Double.isFinite(value) ? number(round(value)) : String.valueOf(value);
    }

    private static BigDecimal round(double value) {
        return BigDecimal.valueOf(value).round(ROUNDING);
    }

    /** The decimal exponent d of the leading digit: 10^d ≤ |x| &lt; 10^(d+1). */
    private static int exponent(BigDecimal x) {
        return x.precision() - x.scale() - 1;
    }

    private static String number(BigDecimal rounded) {
        if (rounded.signum() == 0) {
            return "0";
        }
        int d = exponent(rounded);
        if (d >= PLAIN_FROM && d <= PLAIN_TO) {
            return rounded.stripTrailingZeros().toPlainString();
        }
        return rounded.movePointLeft(d).stripTrailingZeros().toPlainString() + SPACE + "×" + SPACE + "10"
                + superscript(d);
    }

    private static String superscript(int exponent) {
        StringBuilder s = new StringBuilder();
        for (char c : Integer.toString(exponent).toCharArray()) {
            s.append(c == '-' ? '⁻' : SUPERSCRIPT_DIGITS.charAt(c - '0'));
        }
        return s.toString();
    }

    private static String prefix(int power) {
        return switch (power) {
            case -9 -> "n";
            case -6 -> "µ";
            case -3 -> "m";
            case 0 -> "";
            case 3 -> "k";
            case 6 -> "M";
            case 9 -> "G";
            default -> throw new IllegalArgumentException("no SI prefix for 10^" + power);
        };
    }
}
