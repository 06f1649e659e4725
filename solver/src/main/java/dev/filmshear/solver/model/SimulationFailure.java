package dev.filmshear.solver.model;

import dev.filmshear.solver.base.NumericalFailureException;

/**
 * A run that failed part-way, carrying what it computed up to the failure so that it can be written out.
 */
public final class SimulationFailure extends NumericalFailureException {
    private static final long serialVersionUID = 1L;

    private final transient FilmResult partial;

    SimulationFailure(NumericalFailureException cause, FilmResult partial) {
        super(describe(cause), cause);
        this.partial = partial;
    }

    private static String describe(NumericalFailureException cause) {
        StringBuilder text = new StringBuilder(cause.getMessage());
        if (!Double.isNaN(cause.time()) && !cause.getMessage().contains(" at t = ")) {
            text.append(" at t = ").append(cause.time()).append(" s");
            if (cause.step() >= 0) {
                text.append(" (step ").append(cause.step()).append(')');
            }
        }
        return text.toString();
    }

    /** What was computed before the failure (marked incomplete). */
    public FilmResult partialResult() {
        return partial;
    }
}
