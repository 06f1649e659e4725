package dev.filmshear.solver.model;

import java.util.Arrays;

/**
 * Time histories of the wall quantities, one row per recorded step. Immutable; columns are copied out.
 */
public final class History {
    /** The columns, in the order of {@link #column(Column)}. */
    public enum Column {
        /** s */
        TIME,
        /** m/s */
        LOWER_WALL_VELOCITY,
        /** m/s */
        UPPER_WALL_VELOCITY,
        /** Pa */
        WALL_SHEAR_STRESS_LOWER,
        /** Pa */
        WALL_SHEAR_STRESS_UPPER,
        /** K */
        MAX_TEMPERATURE,
        /** K */
        MEAN_TEMPERATURE,
        /** W/m^2 */
        DISSIPATION,
        /** W/m^2, from the fluid into the lower wall */
        HEAT_FLUX_LOWER,
        /** W/m^2, from the fluid into the upper wall */
        HEAT_FLUX_UPPER
    }

    private final double[][] columns;
    private final int rows;

    History(double[][] columns, int rows) {
        this.columns = new double[columns.length][];
        for (int c = 0; c < columns.length; c++) {
            this.columns[c] = Arrays.copyOf(columns[c], rows);
        }
        this.rows = rows;
    }

    /** Number of rows. */
    public int size() {
        return rows;
    }

    /** Value of {@code column} in row {@code row}. */
    public double get(Column column, int row) {
        if (row >= rows) {
            throw new IndexOutOfBoundsException(row);
        }
        return columns[column.ordinal()][row];
    }

    /** A copy of one column. */
    public double[] column(Column column) {
        return columns[column.ordinal()].clone();
    }

    /** Index of the row at time {@code t} exactly, or -1. */
    public int rowAt(double t) {
        double[] time = columns[Column.TIME.ordinal()];
        for (int r = 0; r < rows; r++) {
            if (time[r] == t) {
                return r;
            }
        }
        return -1;
    }
}
