package dev.filmshear.validation.suite;

import java.util.Objects;

/**
 * One quantity a verification case measures, with the rule it must meet: one row of the suite's table.
 *
 * @param quantity what is measured, in words (for example "velocity, max over nodes")
 * @param unit the error's unit ("m/s", "K", "Pa")
 * @param rule when it passes
 */
public record Check(String quantity, String unit, Rule rule) {

    /** The order band of the suite: formal order 2, observed orders in [1.8, 2.2]. */
    public static final Rule.Order SECOND_ORDER = Rule.Order.of(2, 0.2);

    public Check {
        Objects.requireNonNull(quantity, "quantity");
        Objects.requireNonNull(unit, "unit");
        Objects.requireNonNull(rule, "rule");
    }

    /** A check of order 2 in [1.8, 2.2]. */
    public static Check secondOrder(String quantity, String unit) {
        return new Check(quantity, unit, SECOND_ORDER);
    }

    /** A check that every error stays below {@code floor} (round-off). */
    public static Check roundOff(String quantity, String unit, double floor) {
        return new Check(quantity, unit, new Rule.RoundOff(floor));
    }
}
