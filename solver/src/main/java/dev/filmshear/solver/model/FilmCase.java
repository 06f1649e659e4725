package dev.filmshear.solver.model;

import dev.filmshear.solver.base.InvalidParameterException;
import dev.filmshear.solver.physics.FilmPhysics;
import dev.filmshear.solver.physics.JournalGeometry;

import java.util.Arrays;
import java.util.Objects;

/**
 * One case to solve, in SI units: the physics, how far to run, the grid, the accuracy target and the
 * times at which full profiles are wanted. Validated before anything runs.
 *
 * @param physics the equations, walls, fluid and initial state
 * @param horizon an end time, or steady
 * @param grid nodes across the film
 * @param tolerance relative accuracy target of each time step
 * @param outputTimes times (s) of profile snapshots, increasing, within (0, end]; the end is always added
 * @param journal the journal bearing the film is unwrapped from, or null for a plane film
 * @param limits limits on the results, beyond which the run warns
 * @param startSteady true to start from the steady state with every wall held at its velocity at t = 0 (a
 *     machine running steadily before the transient), instead of the uniform initial state
 */
public record FilmCase(FilmPhysics physics, Horizon horizon, GridSpec grid, double tolerance, double[] outputTimes,
                       JournalGeometry journal, Limits limits, boolean startSteady) {
    /** Accuracy target when a case does not say. */
    public static final double DEFAULT_TOLERANCE = 1e-6;

    public FilmCase {
        Objects.requireNonNull(physics, "physics");
        Objects.requireNonNull(horizon, "horizon");
        Objects.requireNonNull(grid, "grid");
        if (!(tolerance >= 1e-12 && tolerance <= 0.1)) {
            throw new InvalidParameterException("tolerance", Double.toString(tolerance), "1e-12 to 0.1");
        }
        outputTimes = outputTimes == null ? new double[0] : outputTimes.clone();
        double previous = 0;
        for (double t : outputTimes) {
            if (!(t > previous)) {
                throw new InvalidParameterException("times", t + " s",
                        "increasing times above 0 s without repeats");
            }
            if (horizon instanceof Horizon.Until u && t > u.end()) {
                throw new InvalidParameterException("times", t + " s", "times up to the end time " + u.end() + " s");
            }
            previous = t;
        }
        if (horizon instanceof Horizon.Steady && outputTimes.length > 0) {
            throw new InvalidParameterException("times", outputTimes.length + " output times",
                    "no output times for a steady case");
        }
        if (journal != null && physics.isSemiInfinite()) {
            throw new InvalidParameterException("journal", "a semi-infinite film", "a journal has a finite gap");
        }
        limits = limits == null ? Limits.NONE : limits;
        if (startSteady && horizon instanceof Horizon.Steady) {
            throw new InvalidParameterException("steady", "a steady start", "a transient case (an end time)");
        }
    }

    /** A plane film without limits, from its uniform initial state. */
    public FilmCase(FilmPhysics physics, Horizon horizon, GridSpec grid, double tolerance, double[] outputTimes) {
        this(physics, horizon, grid, tolerance, outputTimes, null, Limits.NONE, false);
    }

    /** A transient case with the default grid and tolerance. */
    public static FilmCase until(FilmPhysics physics, double end, double... outputTimes) {
        return new FilmCase(physics, new Horizon.Until(end), GridSpec.defaults(), DEFAULT_TOLERANCE, outputTimes);
    }

    /** A steady case with the default grid and tolerance. */
    public static FilmCase steady(FilmPhysics physics) {
        return new FilmCase(physics, new Horizon.Steady(), GridSpec.defaults(), DEFAULT_TOLERANCE, null);
    }

    /** True for a direct steady solve. */
    public boolean isSteady() {
        return horizon instanceof Horizon.Steady;
    }

    /** End time (s), or +infinity for a steady case. */
    public double endTime() {
        return horizon instanceof Horizon.Until u ? u.end() : Double.POSITIVE_INFINITY;
    }

    @Override
    public double[] outputTimes() {
        return outputTimes.clone();
    }

    /** A copy with another grid. */
    public FilmCase withGrid(GridSpec newGrid) {
        return new FilmCase(physics, horizon, newGrid, tolerance, outputTimes, journal, limits, startSteady);
    }

    /** A copy with another tolerance. */
    public FilmCase withTolerance(double newTolerance) {
        return new FilmCase(physics, horizon, grid, newTolerance, outputTimes, journal, limits, startSteady);
    }

    /** A copy with other physics. */
    public FilmCase withPhysics(FilmPhysics newPhysics) {
        return new FilmCase(newPhysics, horizon, grid, tolerance, outputTimes, journal, limits, startSteady);
    }

    /** A copy with another horizon and output times. */
    public FilmCase withHorizon(Horizon newHorizon, double... newOutputTimes) {
        return new FilmCase(physics, newHorizon, grid, tolerance, newOutputTimes, journal, limits, startSteady);
    }

    /** A copy for a journal bearing with the given limits. */
    public FilmCase withJournal(JournalGeometry newJournal, Limits newLimits) {
        return new FilmCase(physics, horizon, grid, tolerance, outputTimes, newJournal, newLimits, startSteady);
    }

    /** True for a film unwrapped from a journal bearing. */
    public boolean isJournal() {
        return journal != null;
    }

    @Override
    public boolean equals(Object o) {
        return o instanceof FilmCase c && physics.equals(c.physics) && horizon.equals(c.horizon)
                && grid.equals(c.grid) && tolerance == c.tolerance && Arrays.equals(outputTimes, c.outputTimes)
                && Objects.equals(journal, c.journal) && limits.equals(c.limits) && startSteady == c.startSteady;
    }

    @Override
    public int hashCode() {
        return Objects.hash(physics, horizon, grid, tolerance, Arrays.hashCode(outputTimes), journal, limits, startSteady);
    }

    @Override
    public String toString() {
        return "FilmCase[" + physics + ", " + horizon + ", " + grid + ", tolerance=" + tolerance
                + ", outputTimes=" + Arrays.toString(outputTimes) + ", journal=" + journal + ", limits=" + limits
                + ", startSteady=" + startSteady + "]";
    }
}
