package dev.filmshear.validation.analytic;

/**
 * The stopping rule shared by every infinite series of this package: a series stops when the bound on its
 * current term (the term's magnitude without the oscillating factor, so that a term that happens to vanish,
 * such as sin(n pi / 2) for even n, does not stop it early) falls below {@link #RELATIVE_TOLERANCE} times
 * the partial sum, or underflows. A series that reaches {@link #MAX_TERMS} is a programming error (the
 * callers choose the form that converges fast at the time asked), reported by an exception.
 */
final class Series {
    /** A term below this fraction of the partial sum ends a series. */
    static final double RELATIVE_TOLERANCE = 1e-15;
    /** No series of this package needs more terms in the form it is evaluated in. */
    static final int MAX_TERMS = 100_000;

    private Series() {
    }

    /** True when a term bounded by {@code envelope} no longer changes {@code sum}. */
    static boolean converged(double envelope, double sum) {
        return envelope <= RELATIVE_TOLERANCE * Math.abs(sum) || envelope < Double.MIN_NORMAL;
    }

    /** Throws when term {@code n} of the series {@code what} reaches the cap. */
    static void checkCap(int n, String what) {
        if (n >= MAX_TERMS) {
            throw new ArithmeticException(what + " did not converge in " + MAX_TERMS + " terms");
        }
    }
}
