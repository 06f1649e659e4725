package dev.filmshear.validation.suite;

import dev.filmshear.solver.base.InvalidParameterException;

import java.util.List;
import java.util.Objects;

/**
 * One case of the verification suite: a problem with a known exact solution, run on a sequence of refinement
 * levels, and the quantities whose errors are checked.
 *
 * @param name a short name for tables and the report
 * @param kind a closed-form solution or a manufactured one
 * @param source the published source of the exact solution, or of the method for a manufactured one
 * @param equations the problem in plain text: equations, fields, parameters, wall conditions
 * @param refinement how the levels refine space and time, in words (for example "grid and time step together,
 *     dt proportional to dy" or "grid only; time error made negligible by a tolerance of 1e-11")
 * @param levels the refinement levels, coarsest first, at least two
 * @param checks the quantities measured, in the order {@link Measurement#errors} returns them
 * @param measurement runs one level and returns one error per check
 */
public record VerificationCase(String name, Kind kind, String source, String equations, String refinement,
                               List<Level> levels, List<Check> checks, Measurement measurement) {

    /** Where the exact solution comes from. */
    public enum Kind {
        /** A closed-form solution of the film equations without sources. */
        ANALYTIC("closed form"),
        /** A manufactured solution: chosen fields made exact by source terms. */
        MANUFACTURED("manufactured");

        private final String label;

        Kind(String label) {
            this.label = label;
        }

        /** A word for tables. */
        public String label() {
            return label;
        }
    }

    /** Runs the solver at one level and measures the error of each check. */
    @FunctionalInterface
    public interface Measurement {
        /**
         * The errors at {@code level}, one per check, each a non-negative number in the check's unit.
         *
         * @throws dev.filmshear.solver.base.NumericalFailureException when the solver fails
         */
        double[] errors(Level level);
    }

    public VerificationCase {
        Objects.requireNonNull(name, "name");
        Objects.requireNonNull(kind, "kind");
        Objects.requireNonNull(source, "source");
        Objects.requireNonNull(equations, "equations");
        Objects.requireNonNull(refinement, "refinement");
        Objects.requireNonNull(measurement, "measurement");
        levels = List.copyOf(levels);
        checks = List.copyOf(checks);
        if (levels.size() < 2) {
            throw new InvalidParameterException("levels", levels.size() + " levels", "at least two");
        }
        for (int k = 1; k < levels.size(); k++) {
            if (levels.get(k).points() <= levels.get(k - 1).points()) {
                throw new InvalidParameterException("levels", levels.toString(), "increasing node counts");
            }
        }
        if (checks.isEmpty()) {
            throw new InvalidParameterException("checks", "none", "at least one quantity");
        }
    }

    /** A copy with other levels (for example fewer for the quick suite). */
    public VerificationCase withLevels(List<Level> newLevels) {
        return new VerificationCase(name, kind, source, equations, refinement, newLevels, checks, measurement);
    }
}
