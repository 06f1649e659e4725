package dev.filmshear.solver.physics;

import java.math.BigDecimal;

/**
 * Tolerances for checks against printed tables: a value printed as "86.278" is known to +/- 0.0005, half
 * a unit in its last printed digit, so a formula that reproduces the table must land inside that band.
 */
final class PrintedDigits {

    private PrintedDigits() {
    }

    /** The printed number. */
    static double value(String printed) {
        return Double.parseDouble(printed);
    }

    /** Half a unit in the last printed digit of {@code printed}. */
    static double halfUnit(String printed) {
        return new BigDecimal(printed).ulp().doubleValue() / 2;
    }
}
