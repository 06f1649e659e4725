package dev.filmshear.validation.suite;

import java.util.Objects;

/**
 * The outcome of one verification case: the errors of every check on every level, the observed orders, and
 * whether each check passed.
 *
 * <p>Observed order between levels k-1 and k: p_k = ln(e_(k-1) / e_k) / ln r_k, with r_k = h_(k-1)/h_k the
 * refinement ratio (references.md 10.1; K. Salari and P. Knupp, SAND2000-1444, 2000). A case whose solver failed
 * carries the failure's message and fails every check.
 *
 * @param verificationCase the case
 * @param errors errors[k][c]: check c on level k (NaN from the level where the solver failed on)
 * @param seconds wall-clock time of the case's runs
 * @param failure the solver's failure message, or null
 */
public record VerificationRun(VerificationCase verificationCase, double[][] errors, double seconds, String failure) {

    public VerificationRun {
        Objects.requireNonNull(verificationCase, "verificationCase");
        int levels = verificationCase.levels().size();
        int checks = verificationCase.checks().size();
        if (errors.length != levels) {
            throw new IllegalArgumentException(errors.length + " rows of errors for " + levels + " levels");
        }
        double[][] copy = new double[levels][];
        for (int k = 0; k < levels; k++) {
            if (errors[k].length != checks) {
                throw new IllegalArgumentException(errors[k].length + " errors on level " + k + " for " + checks
                        + " checks");
            }
            copy[k] = errors[k].clone();
        }
        errors = copy;
    }

    @Override
    public double[][] errors() {
        double[][] copy = new double[errors.length][];
        for (int k = 0; k < errors.length; k++) {
            copy[k] = errors[k].clone();
        }
        return copy;
    }

    /** The errors of check {@code c}, coarsest level first. */
    public double[] errors(int c) {
        double[] out = new double[errors.length];
        for (int k = 0; k < errors.length; k++) {
            out[k] = errors[k][c];
        }
        return out;
    }

    /** The observed orders of check {@code c}, one per refinement (NaN where an error is zero or missing). */
    public double[] observedOrders(int c) {
        double[] e = errors(c);
        double[] orders = new double[e.length - 1];
        for (int k = 1; k < e.length; k++) {
            double r = verificationCase.levels().get(k).ratioFrom(verificationCase.levels().get(k - 1));
            orders[k - 1] = e[k - 1] > 0 && e[k] > 0 ? Math.log(e[k - 1] / e[k]) / Math.log(r) : Double.NaN;
        }
        return orders;
    }

    /** True when check {@code c} meets its rule (and the solver did not fail). */
    public boolean passed(int c) {
        return failure == null && verificationCase.checks().get(c).rule().passes(errors(c), observedOrders(c));
    }

    /** True when every check passed. */
    public boolean passed() {
        for (int c = 0; c < verificationCase.checks().size(); c++) {
            if (!passed(c)) {
                return false;
            }
        }
        return true;
    }

    /** Number of checks that failed. */
    public int failedChecks() {
        int failed = 0;
        for (int c = 0; c < verificationCase.checks().size(); c++) {
            if (!passed(c)) {
                failed++;
            }
        }
        return failed;
    }
}
