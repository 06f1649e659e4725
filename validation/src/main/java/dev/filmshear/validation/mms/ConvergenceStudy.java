package dev.filmshear.validation.mms;

import dev.filmshear.solver.base.InvalidParameterException;
import dev.filmshear.solver.model.FilmCase;
import dev.filmshear.solver.model.FilmResult;
import dev.filmshear.solver.model.FilmSolver;
import dev.filmshear.solver.model.GridSpec;
import dev.filmshear.solver.model.SolverOptions;
import dev.filmshear.solver.time.StepControl;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import java.util.Objects;
import java.util.function.ToDoubleFunction;

/**
 * Runs one case on a sequence of grids and collects measures of each run: error norms against an exact
 * solution, or results whose discretization error is to be estimated.
 *
 * <p>Grid k has n_k nodes (21, 41, 81, 161 by default) with the case's clustering; the spacing in the
 * grid's mapped coordinate is 1/(n_k - 1), so the refinement ratio between neighbours is
 * r = h_(k-1)/h_k = (n_k - 1)/(n_(k-1) - 1), on clustered grids too. A transient case runs with equal time
 * steps refined with the grid, dt_k = t_end / (c (n_k - 1)) for c steps per grid interval: TR-BDF2 is
 * second order in time and the film's finite volumes second order in space, so with dt proportional to dy
 * the total error falls like dy^2 (K. Salari and P. Knupp, SAND2000-1444, 2000, on refining space and time
 * together). A steady case is solved directly on each grid.
 *
 * <p>From the measures: observed orders of an error e, p = ln(e_(k-1)/e_k) / ln r; and for a result f
 * on the three finest grids the Richardson extrapolation and Grid Convergence Index
 * ({@link GridConvergenceIndex}).
 */
public final class ConvergenceStudy {
    /** Default grids: 21, 41, 81 and 161 nodes. */
    public static final int[] DEFAULT_POINTS = {21, 41, 81, 161};

    private ConvergenceStudy() {
    }

    /**
     * A quantity read from each run.
     *
     * @param name a name for tables and messages
     * @param of the quantity of a run
     */
    public record Measure(String name, ToDoubleFunction<FilmResult> of) {
        public Measure {
            Objects.requireNonNull(name, "name");
            Objects.requireNonNull(of, "of");
        }
    }

    /**
     * The measures of every grid, coarsest first.
     *
     * @param points nodes of each grid
     * @param steps time step of each grid (s); NaN for a steady case
     * @param names the measures' names
     * @param values values[k][m]: measure m on grid k
     */
    public record Result(int[] points, double[] steps, List<String> names, double[][] values) {
        public Result {
            points = points.clone();
            steps = steps.clone();
            names = List.copyOf(names);
            double[][] copy = new double[values.length][];
            for (int k = 0; k < values.length; k++) {
                copy[k] = values[k].clone();
            }
            values = copy;
        }

        @Override
        public int[] points() {
            return points.clone();
        }

        @Override
        public double[] steps() {
            return steps.clone();
        }

        @Override
        public double[][] values() {
            double[][] copy = new double[values.length][];
            for (int k = 0; k < values.length; k++) {
                copy[k] = values[k].clone();
            }
            return copy;
        }

        /** Number of grids. */
        public int levels() {
            return points.length;
        }

        /** Measure {@code name} on each grid, coarsest first. */
        public double[] values(String name) {
            int m = names.indexOf(name);
            if (m < 0) {
                throw new IllegalArgumentException("no measure named '" + name + "' among " + names);
            }
            double[] out = new double[points.length];
            for (int k = 0; k < points.length; k++) {
                out[k] = values[k][m];
            }
            return out;
        }

        /** h_(k-1)/h_k = (n_k - 1)/(n_(k-1) - 1), above 1, for k from 1. */
        public double refinementRatio(int k) {
            return (points[k] - 1.0) / (points[k - 1] - 1.0);
        }

        /** Observed orders ln(e_(k-1)/e_k) / ln r_k of error measure {@code name}, one per refinement. */
        public double[] observedOrders(String name) {
            double[] e = values(name);
            double[] orders = new double[e.length - 1];
            for (int k = 1; k < e.length; k++) {
                orders[k - 1] = Math.log(e[k - 1] / e[k]) / Math.log(refinementRatio(k));
            }
            return orders;
        }

        /** Richardson extrapolation and GCI of result {@code name} from the three finest grids (Fs = 1.25). */
        public GridConvergenceIndex.Estimate gci(String name) {
            if (points.length < 3) {
                throw new IllegalStateException("a three-grid estimate needs three grids, the study has "
                        + points.length);
            }
            double[] f = values(name);
            int n = f.length;
            return GridConvergenceIndex.threeGrids(f[n - 1], f[n - 2], f[n - 3], refinementRatio(n - 1),
                    refinementRatio(n - 2));
        }

        /** Richardson extrapolation and GCI of result {@code name} from the two finest grids (Fs = 3). */
        public GridConvergenceIndex.Estimate twoGridGci(String name, double formalOrder) {
            double[] f = values(name);
            int n = f.length;
            return GridConvergenceIndex.twoGrids(f[n - 1], f[n - 2], refinementRatio(n - 1), formalOrder);
        }

        /** The table of the study, one grid per line, with the observed orders of every measure. */
        @Override
        public String toString() {
            StringBuilder b = new StringBuilder("points  step");
            for (String name : names) {
                b.append(" | ").append(name).append(" (order)");
            }
            for (int k = 0; k < points.length; k++) {
                b.append(String.format("%n%6d  %.4g", points[k], steps[k]));
                for (int m = 0; m < names.size(); m++) {
                    b.append(String.format(" | %.6e", values[k][m]));
                    if (k > 0) {
                        double order = Math.log(values[k - 1][m] / values[k][m]) / Math.log(refinementRatio(k));
                        b.append(String.format(" (%.3f)", order));
                    }
                }
            }
            return b.toString();
        }
    }

    /** Runs {@code base} on the default grids with TR-BDF2 and one time step per grid interval. */
    public static Result run(FilmCase base, List<Measure> measures) {
        return run(base, measures, DEFAULT_POINTS, 1, SolverOptions.defaults());
    }

    /**
     * Runs {@code base} on grids of {@code points} nodes.
     *
     * @param base the case; its grid's clustering is kept, its node count replaced
     * @param measures what to read from each run
     * @param points nodes of each grid, increasing, at least two grids
     * @param stepsPerInterval c: a transient case runs c (n - 1) equal steps on a grid of n nodes
     * @param options the scheme; its step control is replaced by the fixed step (ignored for a steady case)
     */
    public static Result run(FilmCase base, List<Measure> measures, int[] points, double stepsPerInterval,
                             SolverOptions options) {
        Objects.requireNonNull(base, "base");
        Objects.requireNonNull(options, "options");
        if (points.length < 2) {
            throw new InvalidParameterException("points", Arrays.toString(points), "at least two grids");
        }
        for (int k = 1; k < points.length; k++) {
            if (points[k] <= points[k - 1]) {
                throw new InvalidParameterException("points", Arrays.toString(points), "increasing node counts");
            }
        }
        InvalidParameterException.requirePositive("steps_per_interval", stepsPerInterval, "");
        List<String> names = new ArrayList<>();
        for (Measure m : measures) {
            names.add(m.name());
        }
        double[] steps = new double[points.length];
        double[][] values = new double[points.length][measures.size()];
        for (int k = 0; k < points.length; k++) {
            FilmCase filmCase = base.withGrid(new GridSpec(points[k], base.grid().clustering()));
            FilmResult result;
            if (filmCase.isSteady()) {
                steps[k] = Double.NaN;
                result = FilmSolver.solve(filmCase, options);
            } else {
                steps[k] = filmCase.endTime() / (stepsPerInterval * (points[k] - 1));
                result = FilmSolver.solve(filmCase, options.withStepControl(StepControl.Fixed.of(steps[k])));
            }
            for (int m = 0; m < measures.size(); m++) {
                values[k][m] = measures.get(m).of().applyAsDouble(result);
            }
        }
        return new Result(points, steps, names, values);
    }
}
