package dev.filmshear.validation.analytic;

import dev.filmshear.solver.base.InvalidParameterException;

/** Argument checks shared by the solutions of this package. */
final class Checks {
    private Checks() {
    }

    /** Throws unless {@code applies}; {@code allowed} says which times are allowed. */
    static void time(boolean applies, double t, String allowed) {
        if (!applies) {
            throw new InvalidParameterException("time", InvalidParameterException.format(t, "s"), allowed);
        }
    }

    /** Throws unless 0 &lt;= y &lt;= gap. */
    static void inGap(double y, double gap) {
        if (!(y >= 0 && y <= gap)) {
            throw new InvalidParameterException("y", InvalidParameterException.format(y, "m"),
                    "0 to the gap, " + gap + " m");
        }
    }

    /** Throws unless y is finite and not negative. */
    static void aboveWall(double y) {
        InvalidParameterException.requireNonNegative("y", y, "m");
    }
}
