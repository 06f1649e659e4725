package dev.filmshear.solver.physics;

import dev.filmshear.solver.base.InvalidParameterException;

/**
 * Parameter checks shared by the viscosity laws' compact constructors. Parameter names are the
 * case-file keys ({@code valid_from}, {@code valid_to}) so that a message points at the line to fix.
 */
final class LawChecks {

    private LawChecks() {
    }

    /** Throws unless 0 K &lt; validFrom &lt; validTo &lt; infinity. */
    static void requireRange(double validFrom, double validTo) {
        InvalidParameterException.requirePositive("valid_from", validFrom, "K");
        InvalidParameterException.requirePositive("valid_to", validTo, "K");
        if (!(validFrom < validTo)) {
            throw new InvalidParameterException("valid_to", InvalidParameterException.format(validTo, "K"),
                    "a temperature above valid_from = " + InvalidParameterException.format(validFrom, "K"));
        }
    }

    /**
     * Throws unless the viscosity at the given end of the validity range is finite and positive: a law
     * whose value overflows or underflows inside its own range cannot be used by the solver.
     */
    static void requireUsableMu(String law, double mu, String endKey, double temperature) {
        if (!(mu > 0) || !Double.isFinite(mu)) {
            throw new InvalidParameterException(endKey, InvalidParameterException.format(temperature, "K"),
                    "a temperature at which the " + law + " law's viscosity is finite and positive (it gives "
                            + mu + " Pa*s there)");
        }
    }
}
