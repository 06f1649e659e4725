package dev.filmshear.validation.suite;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;

/**
 * The suite's outcome as a plain-text table for a terminal: one block per case (its name, kind, levels and how
 * they refine space and time), then one row per check with the error on each level (coarsest first), the observed
 * orders between neighbouring levels, the expectation and PASS or FAIL; last a one-line verdict.
 */
public final class VerificationTable {
    private static final int QUANTITY_WIDTH = 38;
    private static final int ERROR_WIDTH = 10;
    private static final int ORDER_WIDTH = 6;
    private static final int EXPECTED_WIDTH = 34;

    private VerificationTable() {
    }

    /** The table of a finished suite. */
    public static String format(VerificationSuite.Result result) {
        int maxLevels = 0;
        for (VerificationRun r : result.runs()) {
            maxLevels = Math.max(maxLevels, r.verificationCase().levels().size());
        }
        int errorColumns = maxLevels * (ERROR_WIDTH + 1);
        int orderColumns = (maxLevels - 1) * (ORDER_WIDTH + 1);
        StringBuilder b = new StringBuilder();
        b.append(String.format(Locale.ROOT, "Verification suite (%s): %d cases, %d checks%n", result.suite(),
                result.runs().size(), result.checks()));
        b.append(String.format(Locale.ROOT, "  %-" + QUANTITY_WIDTH + "s %-" + errorColumns + "s %-" + orderColumns
                + "s %-" + EXPECTED_WIDTH + "s %s%n", "quantity (unit)", "error per level, coarse to fine", "observed order",
                "expected", "result"));
        for (VerificationRun run : result.runs()) {
            VerificationCase c = run.verificationCase();
            b.append(String.format(Locale.ROOT, "%n%s [%s; %s nodes; %s]%n", c.name(), c.kind().label(),
                    points(c.levels()), c.refinement()));
            for (int k = 0; k < c.checks().size(); k++) {
                Check check = c.checks().get(k);
                StringBuilder errors = new StringBuilder();
                for (double e : run.errors(k)) {
                    errors.append(String.format(Locale.ROOT, "%-" + ERROR_WIDTH + "s ", error(e)));
                }
                StringBuilder orders = new StringBuilder();
                if (check.rule() instanceof Rule.Order) {
                    for (double p : run.observedOrders(k)) {
                        orders.append(String.format(Locale.ROOT, "%-" + ORDER_WIDTH + "s ", order(p)));
                    }
                } else {
                    orders.append("-");
                }
                b.append(String.format(Locale.ROOT, "  %-" + QUANTITY_WIDTH + "s %-" + errorColumns + "s %-"
                        + orderColumns + "s %-" + EXPECTED_WIDTH + "s %s%n", check.quantity() + " (" + check.unit() + ")", errors,
                        orders, check.rule().describe(check.unit()), run.passed(k) ? "PASS" : "FAIL"));
            }
            if (run.failure() != null) {
                b.append("  failed: ").append(run.failure()).append(String.format("%n"));
            }
        }
        b.append(String.format(Locale.ROOT, "%n%s: %d of %d checks passed in %.1f s on %d thread%s%n",
                result.passed() ? "PASSED" : "FAILED", result.checks() - result.failedChecks(), result.checks(),
                result.seconds(), result.threads(), result.threads() == 1 ? "" : "s"));
        return b.toString();
    }

    /** "21, 41, 81". */
    static String points(List<Level> levels) {
        List<String> out = new ArrayList<>();
        for (Level l : levels) {
            out.add(Integer.toString(l.points()));
        }
        return String.join(", ", out);
    }

    static String error(double e) {
        return Double.isNaN(e) ? "-" : String.format(Locale.ROOT, "%.3e", e);
    }

    static String order(double p) {
        return Double.isNaN(p) ? "-" : String.format(Locale.ROOT, "%.2f", p);
    }
}
