package dev.filmshear.cli.input;

import java.util.ArrayList;
import java.util.Collections;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.regex.Matcher;
import java.util.regex.Pattern;

/**
 * Reads quantities written as {@code "NUMBER UNIT"} ({@code "25 um"}, {@code "0.13 W/(m*K)"},
 * {@code "-2e6 Pa/m"}) into a number and a {@link Unit} with its SI factor and dimension.
 *
 * <p><b>Why this is written by hand.</b> The spellings the case-file contract promises its users
 * ({@code um} beside {@code µm} and {@code μm}, {@code degC}/{@code degF}, {@code rpm}, {@code cSt},
 * {@code cP}, {@code mil}) are not in the default unit format of JSR 385 (its reference implementation
 * would need a custom format and a registered unit for each), absolute temperatures need an affine
 * conversion that must apply only to a lone {@code degC}/{@code degF} and never inside a compound unit,
 * and a table of some sixty units plus a small grammar is smaller than that dependency and its
 * transitive ones.
 *
 * <p><b>Grammar</b> (spaces allowed around operators; a number and its unit may also touch):
 * <pre>
 *   quantity := NUMBER [unit]
 *   unit     := power (("*" | "·" | "/") power)*        left to right: a/b*c = (a/b)*c
 *   power    := primary ["^" INTEGER | "^(" INTEGER ")" | "²" | "³"]
 *   primary  := SYMBOL | "1" | "(" unit ")"
 * </pre>
 * Two units side by side without an operator ({@code "Pa s"}) are refused, so that a typo never turns
 * into a product.
 *
 * <p><b>Conventions.</b> All factors are exact where the unit is defined exactly (NIST SP 811, 2008,
 * Appendix B): 1 in = 0.0254 m, 1 ft = 0.3048 m, 1 mil = 0.001 in = 25.4e-6 m, 1 lbf = 0.45359237 kg *
 * 9.80665 m/s^2 so 1 psi = 6894.757293168361 Pa, 1 P = 0.1 Pa*s, 1 St = 1e-4 m^2/s, 1 degF = 5/9 K with
 * its zero at 459.67 degF below the ice point's 32 degF. Revolutions are counted as a pure number,
 * <b>1 rev = 1</b>: then 1 Hz = 1 rev/s, 1 rpm = 1/60 1/s, 1 rad = 1/(2 pi) and 1 rad/s = 1/(2 pi) 1/s,
 * 1 deg = 1/360. A rotational speed thus comes out in rev/s and an angle in revolutions, which
 * {@link QuantityKind#ANGLE} turns into radians. A lone {@code degC} or {@code degF} carries its zero
 * offset (used only for absolute temperatures); in compound units and for temperature differences a
 * degree is an interval (1 degF = 5/9 K, so "1 1/degF" = 1.8 1/K).
 */
public final class Units {

    private static final Map<String, Unit> TABLE = table();

    /** Common misspellings, to suggest the right symbol in a message. */
    private static final Map<String, String> HINTS = Map.of(
            "C", "degC", "F", "degF", "sec", "s", "micron", "um", "microns", "um", "rps", "rev/s",
            "cps", "cP", "hr", "h", "mins", "min");

    private static final Pattern NUMBER = Pattern.compile("^[+-]?(?:\\d+(?:\\.\\d*)?|\\.\\d+)(?:[eE][+-]?\\d+)?");

    private Units() {
    }

    private static Map<String, Unit> table() {
        Map<String, Unit> t = new LinkedHashMap<>();
        // length
        put(t, Dimension.LENGTH, 1, "m");
        put(t, Dimension.LENGTH, 1e3, "km");
        put(t, Dimension.LENGTH, 1e-2, "cm");
        put(t, Dimension.LENGTH, 1e-3, "mm");
        put(t, Dimension.LENGTH, 1e-6, "um", "µm", "μm");
        put(t, Dimension.LENGTH, 1e-9, "nm");
        put(t, Dimension.LENGTH, 0.0254, "in", "inch");
        put(t, Dimension.LENGTH, 0.3048, "ft");
        put(t, Dimension.LENGTH, 25.4e-6, "mil");
        // time
        put(t, Dimension.TIME, 1, "s");
        put(t, Dimension.TIME, 1e-3, "ms");
        put(t, Dimension.TIME, 1e-6, "us", "µs", "μs");
        put(t, Dimension.TIME, 60, "min");
        put(t, Dimension.TIME, 3600, "h");
        // frequency, revolutions and angles (1 rev = 1)
        put(t, Dimension.FREQUENCY, 1, "Hz");
        put(t, Dimension.FREQUENCY, 1e3, "kHz");
        putAngular(t, Dimension.FREQUENCY, 1.0 / 60, "rpm");
        putAngular(t, Dimension.NONE, 1, "rev");
        putAngular(t, Dimension.NONE, 1 / (2 * Math.PI), "rad");
        putAngular(t, Dimension.NONE, 1.0 / 360, "deg", "°");
        // mass
        put(t, Dimension.MASS, 1, "kg");
        put(t, Dimension.MASS, 1e-3, "g");
        // temperature: K, and the two shifted scales (offset in their own degrees)
        put(t, Dimension.TEMPERATURE, 1, "K");
        for (String s : List.of("degC", "°C")) {
            t.put(s, new Unit(s, 1, 273.15, Dimension.TEMPERATURE, false));
        }
        for (String s : List.of("degF", "°F")) {
            t.put(s, new Unit(s, 5.0 / 9.0, 459.67, Dimension.TEMPERATURE, false));
        }
        // pressure, force, energy, power
        put(t, Dimension.PRESSURE, 1, "Pa");
        put(t, Dimension.PRESSURE, 1e-3, "mPa");
        put(t, Dimension.PRESSURE, 1e3, "kPa");
        put(t, Dimension.PRESSURE, 1e6, "MPa");
        put(t, Dimension.PRESSURE, 1e9, "GPa");
        put(t, Dimension.PRESSURE, 1e5, "bar");
        // lbf / in^2 = 0.45359237 * 9.80665 / 0.0254^2 Pa, exactly 6894.757293168361... (NIST SP 811, 2008, Appendix B)
        put(t, Dimension.PRESSURE, 6894.757293168361, "psi");
        put(t, Dimension.FORCE, 1, "N");
        put(t, Dimension.ENERGY, 1, "J");
        put(t, Dimension.ENERGY, 1e3, "kJ");
        put(t, Dimension.POWER, 1, "W");
        put(t, Dimension.POWER, 1e3, "kW");
        // viscosity: poise and stokes with their centi- forms
        put(t, Dimension.DYNAMIC_VISCOSITY, 0.1, "P");
        put(t, Dimension.DYNAMIC_VISCOSITY, 1e-3, "cP");
        put(t, Dimension.KINEMATIC_VISCOSITY, 1e-4, "St");
        put(t, Dimension.KINEMATIC_VISCOSITY, 1e-6, "cSt");
        return Collections.unmodifiableMap(t);
    }

    private static void put(Map<String, Unit> t, Dimension d, double factor, String... symbols) {
        for (String s : symbols) {
            t.put(s, new Unit(s, factor, 0, d, false));
        }
    }

    private static void putAngular(Map<String, Unit> t, Dimension d, double factor, String... symbols) {
        for (String s : symbols) {
            t.put(s, new Unit(s, factor, 0, d, true));
        }
    }

    /** Every unit symbol known, in the order of the table. */
    public static List<String> symbols() {
        return List.copyOf(TABLE.keySet());
    }

    /**
     * Reads {@code "NUMBER"} or {@code "NUMBER UNIT"}.
     *
     * @throws UnitException when the text is not a number followed by a known unit
     */
    public static Quantity parse(String text) {
        String trimmed = text.strip();
        Matcher m = NUMBER.matcher(trimmed);
        if (!m.find()) {
            throw new UnitException("not a number with a unit",
                    "\"NUMBER UNIT\" such as \"25 um\", or a bare number in SI units");
        }
        double number = Double.parseDouble(m.group());
        if (!Double.isFinite(number)) {
            throw new UnitException("number out of range", "a finite number");
        }
        String rest = trimmed.substring(m.end()).strip();
        return rest.isEmpty() ? Quantity.bare(number) : new Quantity(number, unit(rest));
    }

    /**
     * Reads a unit such as {@code W/(m*K)}.
     *
     * @throws UnitException when the unit is unknown or malformed
     */
    public static Unit unit(String text) {
        return new Parser(text.strip()).parseAll();
    }

    /** Reads a quantity's text and converts it to the SI value a key of {@code kind} expects. */
    public static double toSi(String text, QuantityKind kind) {
        return kind.toSi(parse(text));
    }

    private static String knownUnits() {
        return "units such as " + String.join(", ", TABLE.keySet()) + " joined by *, / and ^";
    }

    /** Recursive descent over the grammar in the class comment; one instance per unit text. */
    private static final class Parser {
        private final String text;
        private int pos;

        Parser(String text) {
            this.text = text;
        }

        Unit parseAll() {
            Unit unit = product();
            skipSpaces();
            if (pos < text.length()) {
                char c = text.charAt(pos);
                if (isSymbolChar(c) || c == '(' || c == '1') {
                    throw new UnitException("units must be joined by \"*\" or \"/\" in \"" + text + "\"",
                            "a unit such as \"Pa*s\" or \"W/(m*K)\"");
                }
                throw new UnitException("unexpected \"" + c + "\" in unit \"" + text + "\"", knownUnits());
            }
            return unit.renamed(text);
        }

        private Unit product() {
            Unit unit = power();
            while (true) {
                skipSpaces();
                if (pos >= text.length()) {
                    return unit;
                }
                char c = text.charAt(pos);
                if (c == '*' || c == '·') {
                    pos++;
                    unit = unit.times(power(), "");
                } else if (c == '/') {
                    pos++;
                    unit = unit.over(power(), "");
                } else {
                    return unit;
                }
            }
        }

        private Unit power() {
            Unit base = primary();
            skipSpaces();
            if (pos < text.length()) {
                char c = text.charAt(pos);
                if (c == '^') {
                    pos++;
                    return base.pow(exponent(), "");
                }
                if (c == '²' || c == '³') {
                    pos++;
                    return base.pow(c == '²' ? 2 : 3, "");
                }
            }
            return base;
        }

        private int exponent() {
            skipSpaces();
            boolean parenthesized = pos < text.length() && text.charAt(pos) == '(';
            if (parenthesized) {
                pos++;
                skipSpaces();
            }
            int start = pos;
            if (pos < text.length() && (text.charAt(pos) == '-' || text.charAt(pos) == '+')) {
                pos++;
            }
            while (pos < text.length() && Character.isDigit(text.charAt(pos))) {
                pos++;
            }
            String digits = text.substring(start, pos);
            if (digits.isEmpty() || digits.equals("-") || digits.equals("+") || digits.length() > 3) {
                throw new UnitException("\"^\" must be followed by a small whole number in \"" + text + "\"",
                        "a power such as \"m^2\" or \"m^-1\"");
            }
            if (parenthesized) {
                skipSpaces();
                expectClosing();
            }
            return Integer.parseInt(digits);
        }

        private Unit primary() {
            skipSpaces();
            if (pos >= text.length()) {
                throw new UnitException(text.isEmpty() ? "empty unit" : "unit \"" + text + "\" ends too early",
                        knownUnits());
            }
            char c = text.charAt(pos);
            if (c == '(') {
                pos++;
                Unit inner = product();
                skipSpaces();
                expectClosing();
                return inner;
            }
            if (c == '1' && (pos + 1 >= text.length() || !Character.isDigit(text.charAt(pos + 1)))) {
                pos++;
                return new Unit("1", 1, 0, Dimension.NONE, false);
            }
            if (!isSymbolChar(c)) {
                throw new UnitException("unexpected \"" + c + "\" in unit \"" + text + "\"", knownUnits());
            }
            int start = pos;
            while (pos < text.length() && isSymbolChar(text.charAt(pos))) {
                pos++;
            }
            String symbol = text.substring(start, pos);
            Unit unit = TABLE.get(symbol);
            if (unit == null) {
                throw new UnitException("unknown unit \"" + symbol + "\"" + hint(symbol), knownUnits());
            }
            return unit;
        }

        private void expectClosing() {
            if (pos >= text.length() || text.charAt(pos) != ')') {
                throw new UnitException("unclosed \"(\" in unit \"" + text + "\"", "a unit such as \"W/(m*K)\"");
            }
            pos++;
        }

        private void skipSpaces() {
            while (pos < text.length() && Character.isWhitespace(text.charAt(pos))) {
                pos++;
            }
        }

        private static boolean isSymbolChar(char c) {
            return Character.isLetter(c) || c == '°';
        }

        private static String hint(String symbol) {
            String hinted = HINTS.get(symbol);
            if (hinted != null) {
                return "; did you mean \"" + hinted + "\"?";
            }
            List<String> sameLetters = new ArrayList<>();
            for (String known : TABLE.keySet()) {
                if (known.toLowerCase(Locale.ROOT).equals(symbol.toLowerCase(Locale.ROOT))) {
                    sameLetters.add("\"" + known + "\"");
                }
            }
            return sameLetters.isEmpty() ? "" : "; did you mean " + String.join(" or ", sameLetters) + "?";
        }
    }
}
