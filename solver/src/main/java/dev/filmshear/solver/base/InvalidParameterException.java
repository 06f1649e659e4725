package dev.filmshear.solver.base;

/**
 * A physical or numerical parameter is outside what the model allows.
 *
 * <p>Carries the parameter's name as the solver knows it (for example {@code "b"} of a Vogel law or
 * {@code "gap"}), the value given and what is allowed, so that the command line can point at the
 * exact key of the case file. Thrown by compact constructors of the physics records.
 */
public final class InvalidParameterException extends IllegalArgumentException {
    private static final long serialVersionUID = 1L;

    private final String parameter;
    private final String given;
    private final String allowed;

    /**
     * @param parameter name of the parameter, as used in the solver's records
     * @param given the value given, as text (with its SI unit where it has one)
     * @param allowed what is allowed, in words
     */
    public InvalidParameterException(String parameter, String given, String allowed) {
        super(parameter + ": " + given + " is not allowed (" + allowed + ")");
        this.parameter = parameter;
        this.given = given;
        this.allowed = allowed;
    }

    /** The parameter's name as the solver knows it. */
    public String parameter() {
        return parameter;
    }

    /** The value given, as text. */
    public String given() {
        return given;
    }

    /** What is allowed, in words. */
    public String allowed() {
        return allowed;
    }

    /** Throws unless {@code value} is finite and strictly positive. */
    public static double requirePositive(String parameter, double value, String unit) {
        if (!(value > 0) || !Double.isFinite(value)) {
            throw new InvalidParameterException(parameter, format(value, unit), "a finite value above zero");
        }
        return value;
    }

    /** Throws unless {@code value} is finite and not negative. */
    public static double requireNonNegative(String parameter, double value, String unit) {
        if (!(value >= 0) || !Double.isFinite(value)) {
            throw new InvalidParameterException(parameter, format(value, unit), "a finite value of zero or more");
        }
        return value;
    }

    /** Throws unless {@code value} is finite. */
    public static double requireFinite(String parameter, double value, String unit) {
        if (!Double.isFinite(value)) {
            throw new InvalidParameterException(parameter, format(value, unit), "a finite number");
        }
        return value;
    }

    /** Formats a value with its unit for a message. */
    public static String format(double value, String unit) {
        String number = Double.toString(value);
        return unit == null || unit.isEmpty() ? number : number + " " + unit;
    }
}
