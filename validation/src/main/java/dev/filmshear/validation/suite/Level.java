package dev.filmshear.validation.suite;

import dev.filmshear.solver.base.InvalidParameterException;

/**
 * One refinement level of a verification case: the nodes across the film and, when the time step is refined
 * with the grid, the fixed time step.
 *
 * @param points nodes across the film, at least 3
 * @param timeStep the fixed step (s) of a study that refines space and time together; NaN when the level has no
 *     time step of its own (a steady solve, or a transient run whose time error is made negligible by a tight
 *     tolerance)
 */
public record Level(int points, double timeStep) {

    public Level {
        if (points < 3) {
            throw new InvalidParameterException("points", Integer.toString(points), "at least 3 nodes");
        }
        if (!Double.isNaN(timeStep)) {
            InvalidParameterException.requirePositive("time_step", timeStep, "s");
        }
    }

    /** A level without a time step of its own. */
    public static Level grid(int points) {
        return new Level(points, Double.NaN);
    }

    /**
     * A level whose equal time steps are refined with the grid: {@code stepsPerInterval (points - 1)} steps to
     * {@code end}, so that dt is proportional to the grid spacing (K. Salari and P. Knupp, SAND2000-1444, 2000,
     * on refining space and time together).
     */
    public static Level refinedTogether(int points, double end, double stepsPerInterval) {
        return new Level(points, end / (stepsPerInterval * (points - 1)));
    }

    /** True when the level carries a fixed time step. */
    public boolean hasTimeStep() {
        return !Double.isNaN(timeStep);
    }

    /**
     * The refinement ratio r = h_coarse / h_fine between a coarser level and this one, from the spacing
     * 1/(n - 1) of the grid's mapped coordinate (so it holds on clustered grids too).
     */
    public double ratioFrom(Level coarser) {
        return (points - 1.0) / (coarser.points - 1.0);
    }
}
