package dev.filmshear.validation.suite;

import dev.filmshear.solver.base.InvalidParameterException;

/**
 * When a check of the verification suite passes.
 *
 * <p>{@link Order}: the error must fall like h^p with every observed order p = ln(e_(k-1)/e_k) / ln r_k between
 * two refinements inside a band around the formal order (method of manufactured solutions and order-of-accuracy
 * tests: K. Salari and P. Knupp, SAND2000-1444, 2000; references.md 10.1, step 5). {@link RoundOff}: the
 * discretization reproduces the exact solution (a linear velocity, a quadratic temperature), so there is no
 * order to observe and every level's error must stay below a round-off floor instead.
 */
public sealed interface Rule permits Rule.Order, Rule.RoundOff {

    /** True when the errors of the levels (coarsest first) pass. */
    boolean passes(double[] errors, double[] observedOrders);

    /** The expectation in words, for tables. */
    String describe(String unit);

    /**
     * An observed order inside [low, high] between every pair of neighbouring levels.
     *
     * @param expected the formal order
     * @param low lowest observed order that passes
     * @param high highest observed order that passes
     */
    record Order(double expected, double low, double high) implements Rule {
        public Order {
            InvalidParameterException.requirePositive("expected", expected, "");
            if (!(low < expected && expected < high)) {
                throw new InvalidParameterException("band", "[" + low + ", " + high + "]",
                        "a band around the expected order " + expected);
            }
        }

        /** Order p with the band [p - halfWidth, p + halfWidth]. */
        public static Order of(double expected, double halfWidth) {
            return new Order(expected, expected - halfWidth, expected + halfWidth);
        }

        @Override
        public boolean passes(double[] errors, double[] observedOrders) {
            if (observedOrders.length == 0) {
                return false;
            }
            for (double p : observedOrders) {
                if (!(p >= low && p <= high)) {
                    return false;
                }
            }
            return true;
        }

        @Override
        public String describe(String unit) {
            return String.format("%s in [%s, %s]", plain(expected), plain(low), plain(high));
        }
    }

    /**
     * Every level's error at most {@code floor}.
     *
     * @param floor largest error (in the check's unit) that is still round-off, with its reason where the case is
     *     defined
     */
    record RoundOff(double floor) implements Rule {
        public RoundOff {
            InvalidParameterException.requirePositive("floor", floor, "");
        }

        @Override
        public boolean passes(double[] errors, double[] observedOrders) {
            for (double e : errors) {
                if (!(e <= floor)) {
                    return false;
                }
            }
            return errors.length > 0;
        }

        @Override
        public String describe(String unit) {
            return String.format("exact to round-off (< %.0e %s)", floor, unit);
        }
    }

    /** 2 as "2", 1.8 as "1.8". */
    private static String plain(double x) {
        return x == Math.rint(x) ? Long.toString((long) x) : Double.toString(x);
    }
}
