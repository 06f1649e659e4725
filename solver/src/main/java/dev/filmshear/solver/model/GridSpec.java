package dev.filmshear.solver.model;

import dev.filmshear.solver.base.InvalidParameterException;
import dev.filmshear.solver.grid.FilmGrid;

/**
 * How many nodes go across the film and how they cluster at the walls.
 *
 * @param points nodes, walls included
 * @param clustering 0 uniform, up to 1 strongly clustered at the walls
 */
public record GridSpec(int points, double clustering) {
    /** Nodes across the film when a case does not say. */
    public static final int DEFAULT_POINTS = 201;
    /** Most nodes a case may ask for. */
    public static final int MAX_POINTS = 100_001;

    public GridSpec {
        if (points < FilmGrid.MIN_POINTS || points > MAX_POINTS) {
            throw new InvalidParameterException("points", Integer.toString(points),
                    FilmGrid.MIN_POINTS + " to " + MAX_POINTS);
        }
        if (!(clustering >= 0 && clustering <= 1)) {
            throw new InvalidParameterException("clustering", Double.toString(clustering), "0 to 1");
        }
    }

    /** The default grid: 201 uniform nodes. */
    public static GridSpec defaults() {
        return new GridSpec(DEFAULT_POINTS, 0);
    }
}
