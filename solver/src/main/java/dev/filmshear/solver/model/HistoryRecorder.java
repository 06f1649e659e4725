package dev.filmshear.solver.model;

import java.util.Arrays;

/**
 * Records the wall quantities after each accepted step (or only at output times) and keeps the film's
 * energy account over every step: heat dissipated and heat conducted into the walls, integrated by the
 * trapezoidal rule, against the change of heat stored in the film.
 */
final class HistoryRecorder implements FilmObserver {
    private final boolean everyStep;
    private final boolean skipInitial;
    private double[][] columns = new double[History.Column.values().length][256];
    private int rows;

    private boolean started;
    private double lastTime;
    private double lastNetInflow;
    private double lastDissipation;
    private double dissipated;
    private double conductedOut;
    private double initialStored;
    private double lastStored;

    /**
     * @param everyStep record every accepted step, not only output times
     * @param skipInitial leave out the row at t = 0 (an impulsive start, where wall quantities are singular)
     */
    HistoryRecorder(boolean everyStep, boolean skipInitial) {
        this.everyStep = everyStep;
        this.skipInitial = skipInitial;
    }

    @Override
    public void onStep(FilmState s) {
        double t = s.time();
        double dissipation = s.dissipation();
        double out = s.heatFluxIntoLowerWall() + s.heatFluxIntoUpperWall();
        if (!started) {
            started = true;
            initialStored = s.storedHeat();
        } else {
            double dt = t - lastTime;
            dissipated += 0.5 * dt * (dissipation + lastDissipation);
            conductedOut += 0.5 * dt * (out + lastNetInflow);
        }
        lastTime = t;
        lastDissipation = dissipation;
        lastNetInflow = out;
        lastStored = s.storedHeat();
        boolean initial = s.steps() == 0;
        if (everyStep && !(initial && skipInitial)) {
            add(s);
        }
    }

    @Override
    public void onOutput(FilmState s) {
        if (!everyStep && (rows == 0 || columns[0][rows - 1] != s.time())) {
            add(s);
        }
    }

    private void add(FilmState s) {
        if (rows == columns[0].length) {
            for (int c = 0; c < columns.length; c++) {
                columns[c] = Arrays.copyOf(columns[c], 2 * rows);
            }
        }
        columns[History.Column.TIME.ordinal()][rows] = s.time();
        columns[History.Column.LOWER_WALL_VELOCITY.ordinal()][rows] = s.lowerWallVelocity();
        columns[History.Column.UPPER_WALL_VELOCITY.ordinal()][rows] = s.upperWallVelocity();
        columns[History.Column.WALL_SHEAR_STRESS_LOWER.ordinal()][rows] = s.wallShearStressLower();
        columns[History.Column.WALL_SHEAR_STRESS_UPPER.ordinal()][rows] = s.wallShearStressUpper();
        columns[History.Column.MAX_TEMPERATURE.ordinal()][rows] = s.maxTemperature();
        columns[History.Column.MEAN_TEMPERATURE.ordinal()][rows] = s.meanTemperature();
        columns[History.Column.DISSIPATION.ordinal()][rows] = s.dissipation();
        columns[History.Column.HEAT_FLUX_LOWER.ordinal()][rows] = s.heatFluxIntoLowerWall();
        columns[History.Column.HEAT_FLUX_UPPER.ordinal()][rows] = s.heatFluxIntoUpperWall();
        rows++;
    }

    History history() {
        return new History(columns, rows);
    }

    /** Heat dissipated in the film since t = 0 (J/m^2). */
    double dissipated() {
        return dissipated;
    }

    /** Heat conducted from the film into the walls since t = 0 (J/m^2). */
    double conductedOut() {
        return conductedOut;
    }

    /** Change of the heat stored in the film since t = 0 (J/m^2). */
    double storedChange() {
        return lastStored - initialStored;
    }
}
