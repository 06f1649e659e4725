package dev.filmshear.cli.fit;

import java.util.Arrays;
import java.util.Locale;
import java.util.Optional;
import java.util.stream.Collectors;

/**
 * The viscosity laws {@code fit} can fit, by their case-file names, with the number of parameters the
 * fit adjusts. The exponential, power and Sutherland laws also carry a reference temperature, which is
 * chosen from the data and held fixed (it only moves where the reference viscosity is quoted).
 */
public enum FitLaw {
    /** mu = reference exp(-coefficient (T - Tr)); fitted: reference, coefficient. */
    EXPONENTIAL("exponential", 2, false, "mu = reference * exp(-coefficient * (T - reference_temperature))"),
    /** mu = a exp(b / (T - c)); fitted: a, b, c. */
    VOGEL("vogel", 3, false, "mu = a * exp(b / (T - c))"),
    /** mu = reference (T / Tr)^exponent; fitted: reference, exponent. */
    POWER("power", 2, false, "mu = reference * (T / reference_temperature)^exponent"),
    /** mu = reference (T/Tr)^1.5 (Tr + S) / (T + S); fitted: reference, S. */
    SUTHERLAND("sutherland", 2, false,
            "mu = reference * (T / reference_temperature)^1.5 * (reference_temperature + constant) / (T + constant)"),
    /** ASTM D341: log10 log10 Z = A - B log10 T, Z from the kinematic viscosity in mm^2/s; fitted: A, B. */
    WALTHER("walther", 2, true, "log10(log10(Z)) = A - B * log10(T / K), Z = nu/(mm^2/s) + 0.7 + "
            + "exp(-1.47 - 1.84 nu - 0.51 nu^2) (ASTM D341)");

    private final String key;
    private final int parameters;
    private final boolean kinematic;
    private final String formula;

    FitLaw(String key, int parameters, boolean kinematic, String formula) {
        this.key = key;
        this.parameters = parameters;
        this.kinematic = kinematic;
        this.formula = formula;
    }

    /** The law's name in a case file and on the command line. */
    public String key() {
        return key;
    }

    /** How many parameters the fit adjusts. */
    public int parameters() {
        return parameters;
    }

    /** True when the law is written for the kinematic viscosity (walther); the others are dynamic. */
    public boolean kinematic() {
        return kinematic;
    }

    /** The law as a formula, for the console and fit.json. */
    public String formula() {
        return formula;
    }

    /**
     * The fewest points the fit accepts: one more than the parameters, so that at least one degree of
     * freedom is left to estimate the scatter and the standard errors. Walther takes two as well: through
     * two points the ASTM D341 line is exact, as the standard uses it (an oil's 40 and 100 degC values).
     */
    public int minimumPoints() {
        return this == WALTHER ? 2 : parameters + 1;
    }

    /** The law called {@code name} (case-insensitive), if {@code fit} knows it. */
    public static Optional<FitLaw> byName(String name) {
        String wanted = name.strip().toLowerCase(Locale.ROOT);
        return Arrays.stream(values()).filter(law -> law.key.equals(wanted)).findFirst();
    }

    /** Every law's name, comma-separated, for messages and help. */
    public static String names() {
        return Arrays.stream(values()).map(FitLaw::key).collect(Collectors.joining(", "));
    }
}
