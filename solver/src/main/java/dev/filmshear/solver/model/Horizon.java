package dev.filmshear.solver.model;

import dev.filmshear.solver.base.InvalidParameterException;

/** How far a case runs: to an end time, or straight to the steady state. */
public sealed interface Horizon permits Horizon.Until, Horizon.Steady {

    /**
     * March in time from t = 0 to {@code end}.
     *
     * @param end s
     */
    record Until(double end) implements Horizon {
        public Until {
            InvalidParameterException.requirePositive("end", end, "s");
        }
    }

    /** Solve the steady equations directly. */
    record Steady() implements Horizon {
    }
}
