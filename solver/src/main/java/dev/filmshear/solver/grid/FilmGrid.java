package dev.filmshear.solver.grid;

import dev.filmshear.solver.base.InvalidParameterException;

import java.util.Arrays;

/**
 * Nodes across the film and the control volumes around them (vertex-centred finite volumes).
 *
 * <p>Conventions, fixed once here: nodes {@code i = 0..n-1} carry the unknowns (velocity,
 * temperature) at positions {@code y[i]}, with {@code y[0] = 0} on the lower wall and
 * {@code y[n-1] = depth}. Face {@code i} (written i+1/2 in the equations) lies half-way between node
 * {@code i} and node {@code i+1}; {@code spacing[i] = y[i+1] - y[i]} is the distance between the two
 * nodes a face separates, and face quantities such as the face viscosity are stored at index
 * {@code i}. The control volume of node {@code i} runs from face {@code i-1} to face {@code i}; its
 * width {@code volume[i]} is half a spacing for the two wall nodes.
 *
 * <p>Clustered grids map a uniform computational coordinate xi in [0, 1] through a smooth stretching
 * function, so the spacing varies smoothly and the scheme stays second order (the truncation error of
 * the three-point flux difference on a smoothly mapped grid is O(dxi^2); see J. F. Thompson,
 * Z. U. A. Warsi, C. W. Mastin, <i>Numerical Grid Generation</i>, 1985, ch. 8, from memory).
 * Two-wall grids use y = h (1 + tanh(s (2 xi - 1)) / tanh s) / 2; one-wall grids use
 * y = L (1 + tanh(s (xi - 1)) / tanh s). The clustering parameter c in [0, 1] sets s = 3 c, so that at
 * c = 1 the wall spacing is about 1/100 of the widest spacing.
 *
 * <p>Instances are immutable; accessors hand out copies, the {@code ...At} methods read single values.
 */
public final class FilmGrid {
    /** Stretching parameter at clustering 1 (ratio of wall to widest spacing about sech^2(3) = 0.01). */
    public static final double MAX_STRETCHING = 3.0;
    /** Fewest nodes a grid may have: two walls and one interior node. */
    public static final int MIN_POINTS = 3;

    private final double[] y;
    private final double[] spacing;
    private final double[] volume;
    private final boolean twoWalls;
    private final double clustering;

    private FilmGrid(double[] y, boolean twoWalls, double clustering) {
        this.y = y;
        this.twoWalls = twoWalls;
        this.clustering = clustering;
        int n = y.length;
        spacing = new double[n - 1];
        for (int i = 0; i < n - 1; i++) {
            spacing[i] = y[i + 1] - y[i];
        }
        volume = new double[n];
        volume[0] = 0.5 * spacing[0];
        for (int i = 1; i < n - 1; i++) {
            volume[i] = 0.5 * (spacing[i - 1] + spacing[i]);
        }
        volume[n - 1] = 0.5 * spacing[n - 2];
    }

    /**
     * A grid between two walls, clustered symmetrically towards both.
     *
     * @param gap film thickness (m)
     * @param points number of nodes, walls included
     * @param clustering 0 for uniform, up to 1 for strongly clustered at the walls
     */
    public static FilmGrid betweenWalls(double gap, int points, double clustering) {
        check(gap, points, clustering);
        double s = MAX_STRETCHING * clustering;
        double[] y = new double[points];
        for (int i = 0; i < points; i++) {
            double xi = (double) i / (points - 1);
            y[i] = s == 0 ? gap * xi : gap * 0.5 * (1 + Math.tanh(s * (2 * xi - 1)) / Math.tanh(s));
        }
        y[0] = 0;
        y[points - 1] = gap;
        return new FilmGrid(y, true, clustering);
    }

    /**
     * A grid from one wall (y = 0) into the fluid, clustered towards the wall only.
     *
     * @param depth distance from the wall to the last node (m)
     * @param points number of nodes
     * @param clustering 0 for uniform, up to 1 for strongly clustered at the wall
     */
    public static FilmGrid fromWall(double depth, int points, double clustering) {
        check(depth, points, clustering);
        double s = MAX_STRETCHING * clustering;
        double[] y = new double[points];
        for (int i = 0; i < points; i++) {
            double xi = (double) i / (points - 1);
            y[i] = s == 0 ? depth * xi : depth * (1 + Math.tanh(s * (xi - 1)) / Math.tanh(s));
        }
        y[0] = 0;
        y[points - 1] = depth;
        return new FilmGrid(y, false, clustering);
    }

    private static void check(double extent, int points, double clustering) {
        InvalidParameterException.requirePositive("gap", extent, "m");
        if (points < MIN_POINTS) {
            throw new InvalidParameterException("points", Integer.toString(points),
                    "at least " + MIN_POINTS + " nodes");
        }
        if (!(clustering >= 0 && clustering <= 1)) {
            throw new InvalidParameterException("clustering", Double.toString(clustering), "0 to 1");
        }
    }

    /** Number of nodes, walls included. */
    public int points() {
        return y.length;
    }

    /** Distance from the lower wall to the last node (m): the gap, or the truncated depth. */
    public double depth() {
        return y[y.length - 1];
    }

    /** True when both ends are walls; false for a one-wall (semi-infinite) grid. */
    public boolean betweenWalls() {
        return twoWalls;
    }

    /** The clustering parameter the grid was built with. */
    public double clustering() {
        return clustering;
    }

    /** Position of node {@code i} (m). */
    public double yAt(int i) {
        return y[i];
    }

    /** Distance between node {@code i} and node {@code i+1} (m). */
    public double spacingAt(int i) {
        return spacing[i];
    }

    /** Width of the control volume of node {@code i} (m). */
    public double volumeAt(int i) {
        return volume[i];
    }

    /** Smallest node spacing (m). */
    public double minSpacing() {
        return Arrays.stream(spacing).min().orElseThrow();
    }

    /** A copy of the node positions (m). */
    public double[] y() {
        return y.clone();
    }

    /** A copy of the node spacings (m), one per face. */
    public double[] spacing() {
        return spacing.clone();
    }

    /** A copy of the control-volume widths (m), one per node. */
    public double[] volume() {
        return volume.clone();
    }
}
