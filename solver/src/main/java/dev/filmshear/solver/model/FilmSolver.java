package dev.filmshear.solver.model;

import dev.filmshear.solver.base.NumericalFailureException;
import dev.filmshear.solver.physics.FilmPhysics;
import dev.filmshear.solver.physics.ViscosityLaw;

import java.util.ArrayList;
import java.util.List;

/**
 * The facade most callers use: a {@link FilmCase} in, an immutable {@link FilmResult} out.
 *
 * <p>A transient case runs a {@link Simulation} to its end time; a steady case goes to the
 * {@link SteadySolver}. A numerical failure part-way is thrown as a {@link SimulationFailure} that carries
 * everything computed until then.
 */
public final class FilmSolver {
    /**
     * A transient run counts as steady at its end when the remaining change, estimated as the largest rate of
     * change times the slowest time scale, is below this fraction of the velocity and temperature scales.
     */
    public static final double STEADY_THRESHOLD = 1e-3;
    /** Relative energy imbalance above which a run carries a warning. */
    public static final double ENERGY_IMBALANCE_LIMIT = 0.01;

    private FilmSolver() {
    }

    /** Solves a case with the default options. */
    public static FilmResult solve(FilmCase filmCase) {
        return solve(filmCase, SolverOptions.defaults());
    }

    /**
     * Solves a case.
     *
     * @throws SimulationFailure when the physics or numerics fail part-way (with the partial result)
     * @throws NumericalFailureException when the case fails before anything was computed
     */
    public static FilmResult solve(FilmCase filmCase, SolverOptions options) {
        FilmModel model = new FilmModel(filmCase, options);
        CaseNumbers numbers = CaseNumbers.of(filmCase, model);
        return filmCase.isSteady() ? solveSteady(model, numbers) : solveTransient(model, numbers, options);
    }

    private static FilmResult solveTransient(FilmModel model, CaseNumbers numbers, SolverOptions options) {
        FilmPhysics physics = model.filmCase().physics();
        boolean impulsive = Math.abs(physics.lower().motion().velocity(0) - physics.initialVelocity()) > 0
                || (physics.upper() != null
                && Math.abs(physics.upper().motion().velocity(0) - physics.initialVelocity()) > 0);
        HistoryRecorder history = new HistoryRecorder(options.recordSteps(), impulsive);
        List<Snapshot> snapshots = new ArrayList<>();
        FilmObserver snapshotTaker = new FilmObserver() {
            @Override
            public void onOutput(FilmState state) {
                snapshots.add(Snapshot.of(state));
            }
        };
        Simulation simulation = new Simulation(model, List.of(history, snapshotTaker));
        try {
            simulation.run();
        } catch (NumericalFailureException failure) {
            if (snapshots.isEmpty() || snapshots.get(snapshots.size() - 1).time() != model.time()) {
                try {
                    snapshots.add(Snapshot.of(model));
                } catch (NumericalFailureException ignored) {
                    // the state itself is unusable; keep the snapshots taken before
                }
            }
            FilmResult partial = assemble(model, numbers, history, snapshots, false, false);
            throw new SimulationFailure(failure, partial);
        }
        double thermalScale = Double.isNaN(numbers.thermalTimeScale()) ? 0 : numbers.thermalTimeScale();
        double momentumScale = physics.isSemiInfinite() ? Double.POSITIVE_INFINITY : numbers.momentumTimeScale();
        boolean steady = model.relativeRateOfChange(momentumScale, thermalScale) < STEADY_THRESHOLD;
        return assemble(model, numbers, history, snapshots, steady, true);
    }

    private static FilmResult solveSteady(FilmModel model, CaseNumbers numbers) {
        double[] state = new double[model.discretization().size()];
        long steps = SteadySolver.solve(model, state);
        model.setSteadyState(state);
        Snapshot snapshot = Snapshot.of(model);
        double dissipation = model.dissipation();
        double out = model.heatFluxIntoLowerWall() + model.heatFluxIntoUpperWall();
        double imbalance = model.filmCase().physics().isThermal()
                ? Math.abs(dissipation - out) / Math.max(Math.abs(dissipation), Math.abs(out)) : Double.NaN;
        FilmSummary summary = new FilmSummary(true, Double.POSITIVE_INFINITY, model.wallShearStressLower(),
                model.wallShearStressUpper(), model.temperature(0), model.temperature(model.points() - 1),
                model.maxTemperature(), model.meanTemperature(), dissipation, model.heatFluxIntoLowerWall(),
                model.heatFluxIntoUpperWall(), Double.NaN, Double.NaN, Double.NaN, imbalance, steps, 0, 0);
        List<Warning> warnings = warnings(model, numbers, summary, model.maxTemperature(), minTemperature(model));
        HistoryRecorder empty = new HistoryRecorder(true, true);
        return new FilmResult(model.filmCase(), numbers, summary, empty.history(), List.of(snapshot), warnings, true);
    }

    private static FilmResult assemble(FilmModel model, CaseNumbers numbers, HistoryRecorder recorder,
                                       List<Snapshot> snapshots, boolean steady, boolean complete) {
        boolean thermal = model.filmCase().physics().isThermal();
        double dissipated = recorder.dissipated();
        double conducted = recorder.conductedOut();
        double stored = recorder.storedChange();
        double imbalance = Double.NaN;
        if (thermal) {
            double scale = Math.max(Math.abs(dissipated), Math.max(Math.abs(conducted), Math.abs(stored)));
            imbalance = scale > 0 ? Math.abs(dissipated - conducted - stored) / scale : 0;
        }
        FilmSummary summary;
        try {
            summary = new FilmSummary(steady, model.time(), model.wallShearStressLower(), model.wallShearStressUpper(),
                    model.temperature(0), model.temperature(model.points() - 1), model.maxTemperature(),
                    model.meanTemperature(), model.dissipation(), model.heatFluxIntoLowerWall(),
                    model.heatFluxIntoUpperWall(), dissipated, conducted, stored, imbalance,
                    model.steps(), model.integrator().rejectedSteps(), model.integrator().newtonIterations());
        } catch (NumericalFailureException unusable) {
            // the last state is outside the property laws: report the last recorded step instead
            History h = recorder.history();
            int last = h.size() - 1;
            java.util.function.ToDoubleFunction<History.Column> at = c -> last >= 0 ? h.get(c, last) : Double.NaN;
            summary = new FilmSummary(false, last >= 0 ? h.get(History.Column.TIME, last) : 0,
                    at.applyAsDouble(History.Column.WALL_SHEAR_STRESS_LOWER),
                    at.applyAsDouble(History.Column.WALL_SHEAR_STRESS_UPPER), Double.NaN, Double.NaN,
                    at.applyAsDouble(History.Column.MAX_TEMPERATURE), at.applyAsDouble(History.Column.MEAN_TEMPERATURE),
                    at.applyAsDouble(History.Column.DISSIPATION), at.applyAsDouble(History.Column.HEAT_FLUX_LOWER),
                    at.applyAsDouble(History.Column.HEAT_FLUX_UPPER), dissipated, conducted, stored, imbalance,
                    model.steps(), model.integrator().rejectedSteps(), model.integrator().newtonIterations());
        }
        History history = recorder.history();
        double maxT = summary.maxTemperature();
        double minT = model.filmCase().physics().referenceTemperature();
        double[] maxColumn = history.column(History.Column.MAX_TEMPERATURE);
        for (double t : maxColumn) {
            maxT = Double.isNaN(maxT) ? t : Math.max(maxT, t);
        }
        for (Snapshot s : snapshots) {
            for (double t : s.temperature()) {
                maxT = Math.max(maxT, t);
                minT = Math.min(minT, t);
            }
        }
        List<Warning> warnings = warnings(model, numbers, summary, maxT, minT);
        return new FilmResult(model.filmCase(), numbers, summary, history, snapshots, warnings, complete);
    }

    private static double minTemperature(FilmModel model) {
        double min = Double.POSITIVE_INFINITY;
        for (int i = 0; i < model.points(); i++) {
            min = Math.min(min, model.temperature(i));
        }
        return min;
    }

    /** The warnings a finished (or failed) run carries. */
    private static List<Warning> warnings(FilmModel model, CaseNumbers numbers, FilmSummary summary,
                                          double maxTemperature, double minTemperature) {
        List<Warning> warnings = new ArrayList<>();
        FilmPhysics physics = model.filmCase().physics();
        if (numbers.laminarFlowDoubtful()) {
            warnings.add(new Warning("laminar_flow_doubtful", String.format(
                    "Reynolds number U*gap/nu = %.4g is above %.0f, where plane Couette flow can turn turbulent "
                            + "(Duguet, Schlatter and Henningson, J. Fluid Mech. 650, 2010); the laminar film "
                            + "model may underestimate shear stress and heating",
                    numbers.reynoldsNumber(), CaseNumbers.LAMINAR_REYNOLDS_LIMIT)));
        }
        ViscosityLaw law = physics.fluid().viscosity();
        if (!law.isConstant() && (!law.isValidAt(maxTemperature) || !law.isValidAt(minTemperature))) {
            warnings.add(new Warning("viscosity_law_extrapolated", String.format(
                    "film temperatures %.2f K to %.2f K leave the %s law's validity range %.2f K to %.2f K",
                    minTemperature, maxTemperature, law.name(), law.validFrom(), law.validTo())));
        }
        if (physics.isSemiInfinite() && !model.filmCase().isSteady()) {
            double t = model.time();
            double expected = physics.initialVelocity()
                    - physics.pressureGradient() * t / physics.fluid().density().density(physics.referenceTemperature());
            double far = model.velocity(model.points() - 1);
            double limit = 100 * model.filmCase().tolerance() * model.velocityScale();
            if (Math.abs(far - expected) > limit) {
                warnings.add(new Warning("semi_infinite_depth_reached", String.format(
                        "the velocity at the truncated depth %.4g m changed by %.3g m/s (allowed %.3g m/s): the "
                                + "diffusion front reached the far field; set [geometry] depth larger",
                        model.grid().depth(), far - expected, limit)));
            }
        }
        if (!Double.isNaN(summary.energyImbalance()) && summary.energyImbalance() > ENERGY_IMBALANCE_LIMIT) {
            warnings.add(new Warning("energy_imbalance", String.format(
                    "energy balance of the run is off by %.3g %% (limit %.3g %%): refine the grid or the tolerance",
                    100 * summary.energyImbalance(), 100 * ENERGY_IMBALANCE_LIMIT)));
        }
        return warnings;
    }
}
