package dev.filmshear.solver.model;

import dev.filmshear.solver.physics.Wall;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import java.util.TreeSet;

/**
 * Runs a {@link FilmModel} from t = 0 to the case's end time: owns the stop rule, the schedule of stops
 * (output times, corners of the wall velocity histories, the end), the observers and the guard that
 * every value stays finite.
 *
 * <p>Stop times come from the case's numbers, never from summing steps; the model lands on each exactly.
 */
public final class Simulation {
    private final FilmModel model;
    private final List<FilmObserver> observers;
    private final double[] stops;
    private final boolean[] isOutput;

    /**
     * @param model the film at t = 0
     * @param observers told of every accepted step and every output time
     * @throws IllegalArgumentException when the case has no end time (a steady case)
     */
    public Simulation(FilmModel model, List<FilmObserver> observers) {
        this.model = model;
        this.observers = List.copyOf(observers);
        FilmCase filmCase = model.filmCase();
        double end = filmCase.endTime();
        if (!Double.isFinite(end)) {
            throw new IllegalArgumentException("a simulation needs an end time; solve steady cases with SteadySolver");
        }
        TreeSet<Double> all = new TreeSet<>();
        TreeSet<Double> outputs = new TreeSet<>();
        for (double t : filmCase.outputTimes()) {
            all.add(t);
            outputs.add(t);
        }
        outputs.add(end);
        all.add(end);
        for (Wall wall : new Wall[] {filmCase.physics().lower(), filmCase.physics().upper()}) {
            if (wall != null) {
                for (double corner : wall.motion().corners()) {
                    if (corner > 0 && corner < end) {
                        all.add(corner);
                    }
                }
            }
        }
        List<Double> merged = new ArrayList<>();
        for (double t : all) {
            // a corner a hair away from an output time would force a useless sliver of a step
            if (!merged.isEmpty() && t - merged.get(merged.size() - 1) < 1e-12 * end && !outputs.contains(t)) {
                continue;
            }
            merged.add(t);
        }
        stops = merged.stream().mapToDouble(Double::doubleValue).toArray();
        isOutput = new boolean[stops.length];
        for (int i = 0; i < stops.length; i++) {
            isOutput[i] = outputs.contains(stops[i]);
        }
    }

    /** The stop times in order (output times, corners and the end). */
    public double[] stops() {
        return Arrays.copyOf(stops, stops.length);
    }

    /** Runs to the end, telling the observers as it goes. */
    public void run() {
        for (FilmObserver o : observers) {
            o.onStep(model);
        }
        for (int k = 0; k < stops.length; k++) {
            double stop = stops[k];
            boolean landed;
            do {
                landed = model.advance(stop);
                model.checkFinite();
                for (FilmObserver o : observers) {
                    o.onStep(model);
                }
            } while (!landed);
            if (isOutput[k]) {
                for (FilmObserver o : observers) {
                    o.onOutput(model);
                }
            }
        }
    }
}
