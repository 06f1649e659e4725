package dev.filmshear.solver.model;

import dev.filmshear.solver.base.NumericalFailureException;
import dev.filmshear.solver.physics.FilmPhysics;
import dev.filmshear.solver.physics.JournalGeometry;
import dev.filmshear.solver.physics.ViscosityLaw;
import dev.filmshear.solver.physics.WallMotion;

import java.util.ArrayList;
import java.util.List;

/**
 * The facade most callers use: a {@link FilmCase} in, an immutable {@link FilmResult} out.
 *
 * <p>A transient case runs a {@link Simulation} to its end time; a steady case goes to the
 * {@link SteadySolver}. A numerical failure part-way is thrown as a {@link SimulationFailure} that carries
 * everything computed until then. The result carries the warnings where the model is out of its depth,
 * each with the number that tripped it.
 */
public final class FilmSolver {
    /**
     * A transient run counts as steady at its end when the remaining change, estimated as the largest rate of
     * change times the slowest time scale, is below this fraction of the velocity and temperature scales.
     */
    public static final double STEADY_THRESHOLD = 1e-3;
    /** The band around the final wall shear stress that defines the settling time. */
    public static final double SETTLE_BAND = 0.01;
    /** Relative energy imbalance above which a run carries a warning. */
    public static final double ENERGY_IMBALANCE_LIMIT = 0.01;
    /**
     * Clearance-to-radius ratio above which the unwrapped film misjudges a journal's torque by more than about
     * 1.5 %: for concentric cylinders, the exact laminar torque 4 pi mu Omega L R1^2 R2^2 / (R2^2 - R1^2)
     * exceeds the flat-film torque 2 pi mu Omega R^3 L / c by the factor 2 (1 + e)^2 / (2 + e) ~ 1 + 1.5 e,
     * e = c / R (derived from the cylindrical Couette solution, L. D. Landau and E. M. Lifshitz, <i>Fluid
     * Mechanics</i>, section 18, from memory).
     */
    public static final double CURVATURE_LIMIT = 0.01;
    /**
     * Critical Taylor number Ta = Re^2 c / R (Re = U c / nu) of narrow-gap circular Couette flow with the outer
     * cylinder at rest, above which Taylor vortices replace the laminar Couette film (G. I. Taylor, Phil. Trans.
     * R. Soc. A 223 (1923) 289-343; value 1708 as in the project's reference sheet, section 8).
     */
    public static final double TAYLOR_LIMIT = 1708;
    /**
     * Reynolds number U c / nu above which the film of a journal bearing begins its gradual transition to
     * turbulence (about 1000 at onset, fully turbulent by about 1600: A. Harnoy, <i>Bearing Design in
     * Machinery</i>, 2002, section 5.5).
     */
    public static final double JOURNAL_REYNOLDS_LIMIT = 1000;

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
        boolean impulsive = !model.filmCase().startSteady()
                && (Math.abs(physics.lower().motion().velocity(0) - physics.initialVelocity()) > 0
                || (physics.upper() != null
                && Math.abs(physics.upper().motion().velocity(0) - physics.initialVelocity()) > 0));
        HistoryRecorder history = new HistoryRecorder(options.recordSteps(), impulsive);
        RunTracker tracker = new RunTracker(physics);
        List<Snapshot> snapshots = new ArrayList<>();
        FilmObserver snapshotTaker = new FilmObserver() {
            @Override
            public void onOutput(FilmState state) {
                snapshots.add(Snapshot.of(state));
            }
        };
        Simulation simulation = new Simulation(model, List.of(history, tracker, snapshotTaker));
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
            FilmResult partial = assemble(model, numbers, history, tracker, snapshots, false, false);
            throw new SimulationFailure(failure, partial);
        }
        double thermalScale = Double.isNaN(numbers.thermalTimeScale()) ? 0 : numbers.thermalTimeScale();
        double momentumScale = physics.isSemiInfinite() ? Double.POSITIVE_INFINITY : numbers.momentumTimeScale();
        if (!Double.isNaN(numbers.drivenWallTimeScale())) {
            momentumScale = Math.max(momentumScale, numbers.drivenWallTimeScale());
        }
        boolean steady = model.relativeRateOfChange(momentumScale, thermalScale) < STEADY_THRESHOLD;
        return assemble(model, numbers, history, tracker, snapshots, steady, true);
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
        RunTracker tracker = new RunTracker(model.filmCase().physics());
        tracker.onStep(model);
        FilmSummary summary = summarize(model, true, model.time(), model.wallShearStressLower(),
                model.wallShearStressUpper(), model.temperature(0), model.temperature(model.points() - 1),
                model.maxTemperature(), model.meanTemperature(), dissipation, model.heatFluxIntoLowerWall(),
                model.heatFluxIntoUpperWall(), Double.NaN, Double.NaN, Double.NaN, imbalance, steps, tracker);
        List<Warning> warnings = warnings(model, numbers, summary, tracker);
        HistoryRecorder empty = new HistoryRecorder(true, true);
        return new FilmResult(model.filmCase(), numbers, summary, empty.history(), List.of(snapshot), warnings, true);
    }

    private static FilmResult assemble(FilmModel model, CaseNumbers numbers, HistoryRecorder recorder,
                                       RunTracker tracker, List<Snapshot> snapshots, boolean steady,
                                       boolean complete) {
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
            summary = summarize(model, steady, model.time(), model.wallShearStressLower(),
                    model.wallShearStressUpper(), model.temperature(0), model.temperature(model.points() - 1),
                    model.maxTemperature(), model.meanTemperature(), model.dissipation(),
                    model.heatFluxIntoLowerWall(), model.heatFluxIntoUpperWall(), dissipated, conducted, stored,
                    imbalance, model.steps(), tracker);
        } catch (NumericalFailureException unusable) {
            // the last state is outside the property laws: report the last recorded step instead
            History h = recorder.history();
            int last = h.size() - 1;
            java.util.function.ToDoubleFunction<History.Column> at = c -> last >= 0 ? h.get(c, last) : Double.NaN;
            summary = summarize(model, false, last >= 0 ? h.get(History.Column.TIME, last) : 0,
                    at.applyAsDouble(History.Column.WALL_SHEAR_STRESS_LOWER),
                    at.applyAsDouble(History.Column.WALL_SHEAR_STRESS_UPPER), Double.NaN, Double.NaN,
                    at.applyAsDouble(History.Column.MAX_TEMPERATURE), at.applyAsDouble(History.Column.MEAN_TEMPERATURE),
                    at.applyAsDouble(History.Column.DISSIPATION), at.applyAsDouble(History.Column.HEAT_FLUX_LOWER),
                    at.applyAsDouble(History.Column.HEAT_FLUX_UPPER), dissipated, conducted, stored, imbalance,
                    model.steps(), tracker);
        }
        List<Warning> warnings = warnings(model, numbers, summary, tracker);
        return new FilmResult(model.filmCase(), numbers, summary, recorder.history(), snapshots, warnings, complete);
    }

    /** The summary record, with the journal and driven-wall numbers that follow from the others. */
    private static FilmSummary summarize(FilmModel model, boolean steady, double time, double shearLower,
                                         double shearUpper, double lowerWallT, double upperWallT, double maxT,
                                         double meanT, double dissipation, double fluxLower, double fluxUpper,
                                         double dissipated, double conducted, double stored, double imbalance,
                                         long steps, RunTracker tracker) {
        FilmCase filmCase = model.filmCase();
        double torque = Double.NaN;
        double power = Double.NaN;
        double petroff = Double.NaN;
        JournalGeometry journal = filmCase.journal();
        if (journal != null) {
            double speed = model.upperWallVelocity();
            torque = shearUpper * journal.area() * journal.radius();
            power = shearUpper * journal.area() * speed;
            double muMean = filmCase.physics().fluid().viscosity()
                    .mu(Double.isNaN(meanT) ? filmCase.physics().referenceTemperature() : meanT);
            // Petroff: T = 2 pi mu Omega R^3 L / c = mu (U / c) (pi D L) R
            petroff = muMean * speed / filmCase.physics().gap() * journal.area() * journal.radius();
        }
        double fraction = drivenFraction(filmCase.physics());
        return new FilmSummary(steady, time, shearLower, shearUpper, lowerWallT, upperWallT, maxT, meanT,
                dissipation, fluxLower, fluxUpper, dissipated, conducted, stored, imbalance, steps,
                model.integrator().rejectedSteps(), model.integrator().newtonIterations(), torque, power, petroff,
                tracker.speedRiseTime(), Double.isNaN(fraction) ? Double.NaN : tracker.coastDownTime(fraction),
                Math.max(tracker.maxTemperature(), Double.isNaN(maxT) ? Double.NEGATIVE_INFINITY : maxT),
                Double.isFinite(time) ? tracker.settleTime(SETTLE_BAND) : Double.NaN);
    }

    private static double drivenFraction(FilmPhysics physics) {
        if (physics.lower().motion() instanceof WallMotion.Driven d) {
            return d.coastDownFraction();
        }
        if (physics.upper() != null && physics.upper().motion() instanceof WallMotion.Driven d) {
            return d.coastDownFraction();
        }
        return Double.NaN;
    }

    /** The warnings a finished (or failed) run carries, each with the number that tripped it. */
    private static List<Warning> warnings(FilmModel model, CaseNumbers numbers, FilmSummary summary,
                                          RunTracker tracker) {
        List<Warning> warnings = new ArrayList<>();
        FilmCase filmCase = model.filmCase();
        FilmPhysics physics = filmCase.physics();
        double maxTemperature = Math.max(tracker.maxTemperature(), summary.maxTemperature());
        double minTemperature = Math.min(tracker.minTemperature(), physics.referenceTemperature());
        ViscosityLaw law = physics.fluid().viscosity();
        // the thinnest fluid the film saw: what decides laminar flow
        double hottest = Double.isFinite(maxTemperature) ? maxTemperature : physics.referenceTemperature();
        double nuMin = Math.min(law.mu(hottest) / physics.fluid().density().density(hottest),
                numbers.kinematicViscosity());
        double speed = Math.max(tracker.maxSpeed(), numbers.relativeSpeed());
        if (filmCase.isJournal()) {
            double c = physics.gap();
            double r = filmCase.journal().radius();
            double reynolds = speed * c / nuMin;
            double taylor = reynolds * reynolds * c / r;
            if (c / r > CURVATURE_LIMIT) {
                warnings.add(new Warning("curvature_too_large", String.format(
                        "clearance/radius = %.4g is above %.3g: the unwrapped film underestimates the torque of "
                                + "concentric cylinders by about %.2g %%", c / r, CURVATURE_LIMIT, 150 * c / r)));
            }
            if (taylor > TAYLOR_LIMIT) {
                warnings.add(new Warning("taylor_vortices", String.format(
                        "Taylor number (U c / nu)^2 c / R = %.4g is above %.0f (Taylor 1923): Taylor vortices "
                                + "replace the laminar Couette film; the torque and heating are underestimated",
                        taylor, TAYLOR_LIMIT)));
            }
            if (reynolds > JOURNAL_REYNOLDS_LIMIT) {
                warnings.add(new Warning("laminar_flow_doubtful", String.format(
                        "Reynolds number U c / nu = %.4g is above %.0f, where a journal bearing's film begins its "
                                + "transition to turbulence (Harnoy, Bearing Design in Machinery, 2002, 5.5)",
                        reynolds, JOURNAL_REYNOLDS_LIMIT)));
            }
        } else if (!physics.isSemiInfinite()) {
            double reynolds = speed * physics.gap() / nuMin;
            if (reynolds > CaseNumbers.LAMINAR_REYNOLDS_LIMIT) {
                warnings.add(new Warning("laminar_flow_doubtful", String.format(
                        "Reynolds number U*gap/nu = %.4g is above %.0f, where plane Couette flow can turn turbulent "
                                + "(Duguet, Schlatter and Henningson, J. Fluid Mech. 650, 2010); the laminar film "
                                + "model may underestimate shear stress and heating",
                        reynolds, CaseNumbers.LAMINAR_REYNOLDS_LIMIT)));
            }
        }
        if (!law.isConstant() && (!law.isValidAt(maxTemperature) || !law.isValidAt(minTemperature))) {
            warnings.add(new Warning("viscosity_law_extrapolated", String.format(
                    "film temperatures %.2f K to %.2f K leave the %s law's validity range %.2f K to %.2f K",
                    minTemperature, maxTemperature, law.name(), law.validFrom(), law.validTo())));
        }
        double limit = filmCase.limits().maxTemperature();
        if (!Double.isNaN(limit) && maxTemperature > limit) {
            warnings.add(new Warning("temperature_limit_exceeded", String.format(
                    "the film reached %.2f K (%.2f degC), above the case's limit of %.2f K (%.2f degC)",
                    maxTemperature, maxTemperature - 273.15, limit, limit - 273.15)));
        }
        if (physics.isSemiInfinite() && !filmCase.isSteady()) {
            double t = model.time();
            double expected = physics.initialVelocity()
                    - physics.pressureGradient() * t / physics.fluid().density().density(physics.referenceTemperature());
            double far = model.velocity(model.points() - 1);
            double allowed = 100 * filmCase.tolerance() * model.velocityScale();
            if (Math.abs(far - expected) > allowed) {
                warnings.add(new Warning("semi_infinite_depth_reached", String.format(
                        "the velocity at the truncated depth %.4g m changed by %.3g m/s (allowed %.3g m/s): the "
                                + "diffusion front reached the far field; set [geometry] depth larger",
                        model.grid().depth(), far - expected, allowed)));
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
