package dev.filmshear.solver.model;

import dev.filmshear.solver.base.NumericalFailureException;
import dev.filmshear.solver.discretization.FilmDiscretization;
import dev.filmshear.solver.grid.FilmGrid;
import dev.filmshear.solver.linalg.SymmetricTridiagonalEigen;
import dev.filmshear.solver.physics.Domain;
import dev.filmshear.solver.physics.FilmPhysics;
import dev.filmshear.solver.physics.ThermalCondition;
import dev.filmshear.solver.physics.Wall;
import dev.filmshear.solver.physics.WallMotion;
import dev.filmshear.solver.time.DirkIntegrator;
import dev.filmshear.solver.time.StepControl;
import org.apache.commons.math3.special.Erf;

/**
 * The film at one time and the means to advance it by one step. Knows nothing of end times, output
 * schedules or observers; those belong to {@link Simulation}.
 *
 * <p>For a semi-infinite film the model truncates the fluid at a depth where neither momentum nor heat
 * can have arrived by the end time to within the tolerance: the larger of
 * 2 erfc^-1(tol) sqrt(D t_end) (the reach of an impulsive change, erfc profile, for D = nu and D = alpha)
 * and ln(1/tol) sqrt(2 nu / omega) (the decay of an oscillating wall's Stokes layer), times
 * {@link #DEPTH_SAFETY}. Whether the front did reach the far field is checked after the run.
 */
public final class FilmModel implements FilmState {
    /** Margin on the truncation depth of a semi-infinite film. */
    public static final double DEPTH_SAFETY = 1.25;

    private final FilmCase filmCase;
    private final FilmPhysics physics;
    private final FilmGrid grid;
    private final FilmDiscretization discretization;
    private final DirkIntegrator integrator;
    private final double[] state;
    private final double velocityScale;
    private final double temperatureScale;
    private final double initialTemperature;
    private boolean current;
    private boolean steadySolution;

    /**
     * Builds the grid, the discrete equations and the integrator, and sets the initial state at t = 0.
     */
    public FilmModel(FilmCase filmCase, SolverOptions options) {
        this.filmCase = filmCase;
        this.physics = filmCase.physics();
        double end = filmCase.endTime();
        this.velocityScale = velocityScale(physics, end);
        this.grid = buildGrid(filmCase);
        this.temperatureScale = temperatureScale(physics, grid.depth(), velocityScale);
        this.discretization = new FilmDiscretization(grid, physics, velocityScale, temperatureScale);
        this.initialTemperature = physics.referenceTemperature();
        StepControl control = options.stepControl() != null ? options.stepControl()
                : StepControl.Adaptive.of(filmCase.tolerance());
        this.integrator = new DirkIntegrator(discretization, options.scheme(), control);
        this.state = new double[discretization.size()];
        // the state at t = 0+: the fluid as it was, the walls already at their starting velocities; an
        // impulsive start is then a jump at the wall that the error estimate resolves with short first steps
        discretization.initialState(state);
        discretization.applyPrescribed(0, state);
        if (filmCase.startSteady()) {
            steadyStart(filmCase, state);
        }
        if (!discretization.update(0, state)) {
            throw new NumericalFailureException("the initial state is outside the property laws: "
                    + discretization.describeUnusable(state), 0, 0, -1, "temperature");
        }
        double horizon = Double.isFinite(end) ? end : 1;
        double cellTime = momentumTimeScaleEstimate();
        // too long a first step is cheap: the controller rejects it and shrinks it fivefold per attempt
        double firstStep = Math.min(horizon * 1e-3, cellTime);
        // a step a million times shorter than the diffusion time of the finest cell resolves nothing more
        integrator.start(0, state, firstStep, 1e-6 * cellTime);
        current = true;
    }

    /**
     * Replaces the initial state by the steady state of the same film with every wall held at its velocity at
     * t = 0 (a driven wall at its initial velocity), solved on the same grid.
     */
    private static void steadyStart(FilmCase filmCase, double[] state) {
        FilmPhysics physics = filmCase.physics();
        FilmPhysics frozen = physics.withWalls(held(physics.lower()), physics.upper() == null ? null
                : held(physics.upper()));
        FilmCase steadyCase = new FilmCase(frozen, new Horizon.Steady(), filmCase.grid(), filmCase.tolerance(), null);
        FilmModel steadyModel = new FilmModel(steadyCase, SolverOptions.defaults());
        SteadySolver.solve(steadyModel, state);
    }

    private static Wall held(Wall wall) {
        return new Wall(new WallMotion.Steady(wall.motion().velocity(0)), wall.thermal());
    }

    /** The grid the case resolves to (for a semi-infinite film, truncated at the chosen depth). */
    static FilmGrid buildGrid(FilmCase filmCase) {
        FilmPhysics physics = filmCase.physics();
        GridSpec spec = filmCase.grid();
        if (physics.domain() instanceof Domain.Gap g) {
            return FilmGrid.betweenWalls(g.gap(), spec.points(), spec.clustering());
        }
        double depth = ((Domain.SemiInfinite) physics.domain()).depth();
        if (Double.isNaN(depth)) {
            depth = semiInfiniteDepth(physics, filmCase.endTime(), filmCase.tolerance());
        }
        return FilmGrid.fromWall(depth, spec.points(), spec.clustering());
    }

    /** Truncation depth (m) of a semi-infinite film run to {@code end} at tolerance {@code tol}. */
    public static double semiInfiniteDepth(FilmPhysics physics, double end, double tol) {
        if (!Double.isFinite(end)) {
            throw new NumericalFailureException("a semi-infinite film has no steady state: give an end time");
        }
        double t0 = physics.referenceTemperature();
        double diffusivity = physics.fluid().kinematicViscosity(t0);
        if (physics.isThermal()) {
            diffusivity = Math.max(diffusivity, physics.fluid().thermalDiffusivity(t0));
        }
        double reach = 2 * Erf.erfcInv(Math.max(tol, 1e-15)) * Math.sqrt(diffusivity * end);
        if (physics.lower().motion() instanceof WallMotion.Sine s) {
            double nu = physics.fluid().kinematicViscosity(t0);
            double stokes = Math.sqrt(2 * nu / s.angularFrequency());
            reach = Math.max(reach, Math.log(1 / tol) * stokes);
        }
        return DEPTH_SAFETY * reach;
    }

    /** The velocity (m/s) against which velocity errors are measured: the largest speed the film sees. */
    static double velocityScale(FilmPhysics physics, double end) {
        double horizon = Double.isFinite(end) ? end : Double.MAX_VALUE;
        double scale = Math.abs(physics.initialVelocity());
        scale = Math.max(scale, settledOrMax(physics.lower(), horizon));
        if (physics.upper() != null) {
            scale = Math.max(scale, settledOrMax(physics.upper(), horizon));
        }
        double dpdx = Math.abs(physics.pressureGradient());
        if (dpdx > 0) {
            double t0 = physics.referenceTemperature();
            double mu = physics.fluid().viscosity().mu(t0);
            if (physics.domain() instanceof Domain.Gap g) {
                scale = Math.max(scale, dpdx * g.gap() * g.gap() / (8 * mu));
            } else if (Double.isFinite(end)) {
                scale = Math.max(scale, dpdx * end / physics.fluid().density().density(t0));
            }
        }
        return scale > 0 ? scale : 1;
    }

    private static double settledOrMax(Wall wall, double horizon) {
        return wall.motion().maxSpeed(horizon);
    }

    /**
     * The temperature difference (K) against which temperature errors are measured: the largest of 1 K,
     * the shear-heating rise mu U^2 / (2 k) of a film with one adiabatic wall, the wall-to-initial
     * temperature differences and the rise q h / k a wall flux could drive.
     */
    static double temperatureScale(FilmPhysics physics, double depth, double velocityScale) {
        if (!physics.isThermal()) {
            return 1;
        }
        double t0 = physics.initialTemperature();
        double k = physics.fluid().conductivity().value(t0);
        double scale = Math.max(1, physics.fluid().viscosity().mu(t0) * velocityScale * velocityScale / (2 * k));
        for (Wall wall : new Wall[] {physics.lower(), physics.upper()}) {
            if (wall == null) {
                continue;
            }
            if (wall.thermal() instanceof ThermalCondition.FixedTemperature f) {
                scale = Math.max(scale, Math.abs(f.temperature() - t0));
            } else if (wall.thermal() instanceof ThermalCondition.HeatFlux q) {
                scale = Math.max(scale, Math.abs(q.flux()) * depth / k);
            } else if (wall.thermal() instanceof ThermalCondition.HeatTransfer h) {
                scale = Math.max(scale, Math.abs(h.ambient() - t0));
            }
        }
        return scale;
    }

    private double momentumTimeScaleEstimate() {
        double nu = physics.fluid().kinematicViscosity(physics.referenceTemperature());
        double dy = grid.minSpacing();
        return Math.max(dy * dy / nu, 1e-300);
    }

    /**
     * The time constant (s) of the slowest velocity mode: 1 / lambda_min of the discrete momentum diffusion
     * operator M^-1 K at the current viscosities (by inverse iteration; EJML's QR is the reference, see
     * {@link SymmetricTridiagonalEigen}). For a constant-viscosity film between
     * two walls it tends to gap^2 / (pi^2 nu) as the grid is refined. NaN for a semi-infinite film, whose
     * truncated domain has no physical slowest mode.
     */
    public double momentumTimeScale() {
        return momentumTimeScale(false);
    }

    /**
     * The slowest velocity mode's time constant as {@link #momentumTimeScale()}, computed with EJML's full
     * symmetric QR when {@code withEjml} (the reference, O(n^2)) or by inverse iteration (O(n)).
     */
    public double momentumTimeScale(boolean withEjml) {
        if (physics.isSemiInfinite()) {
            return Double.NaN;
        }
        refresh();
        int m = discretization.freeVelocityNodes();
        double[] diagonal = new double[m];
        double[] off = new double[Math.max(0, m - 1)];
        discretization.momentumDiffusionOperator(diagonal, off);
        return 1 / (withEjml ? SymmetricTridiagonalEigen.smallest(diagonal, off)
                : SymmetricTridiagonalEigen.smallestPositiveDefinite(diagonal, off));
    }

    /**
     * Advances by one accepted step, landing exactly on {@code stop} when the step reaches it.
     *
     * @return true when the step landed on {@code stop}
     */
    public boolean advance(double stop) {
        boolean landed = integrator.step(stop);
        integrator.copyState(state);
        current = false;
        return landed;
    }

    /** Brings the derived quantities up to date with the state. */
    void refresh() {
        if (!current) {
            if (!discretization.update(integrator.time(), state)) {
                String what = discretization.describeUnusable(state);
                throw new NumericalFailureException("the film left the range of its property laws: "
                        + (what == null ? "a property is not usable" : what), integrator.time(),
                        integrator.acceptedSteps(), -1, "temperature");
            }
            current = true;
        }
    }

    /**
     * Checks every value of the state; throws naming the first node and field that is not finite.
     */
    void checkFinite() {
        int stride = discretization.isThermal() ? 2 : 1;
        for (int i = 0; i < state.length; i++) {
            if (!Double.isFinite(state[i])) {
                int node = i / stride;
                String field = stride == 2 && i % 2 == 1 ? "temperature" : "velocity";
                throw new NumericalFailureException("the " + field + " became " + state[i] + " at node " + node
                        + " (y = " + grid.yAt(node) + " m)", integrator.time(), integrator.acceptedSteps(), node, field);
            }
        }
    }

    /**
     * The largest relative rate of change of the film: max |dU/dt| times the momentum time scale over the
     * velocity scale, and the same for temperature with the thermal time scale. Small when steady.
     */
    double relativeRateOfChange(double momentumTimeScale, double thermalTimeScale) {
        int stride = discretization.isThermal() ? 2 : 1;
        double tm = momentumTimeScale;
        double max = 0;
        for (int i = 0; i < grid.points(); i++) {
            max = Math.max(max, Math.abs(integrator.rate(stride * i)) * tm / velocityScale);
            if (stride == 2) {
                max = Math.max(max, Math.abs(integrator.rate(2 * i + 1)) * thermalTimeScale / temperatureScale);
            }
        }
        return max;
    }

    /** The case being solved. */
    public FilmCase filmCase() {
        return filmCase;
    }

    /** The grid. */
    public FilmGrid grid() {
        return grid;
    }

    /** The discrete equations. */
    FilmDiscretization discretization() {
        return discretization;
    }

    /** The integrator. */
    DirkIntegrator integrator() {
        return integrator;
    }

    /** The velocity scale of the error norm (m/s). */
    public double velocityScale() {
        return velocityScale;
    }

    /** The temperature scale of the error norm (K). */
    public double temperatureScale() {
        return temperatureScale;
    }

    // ------------------------------------------------------------------ FilmState

    /** Replaces the state by a steady solution; time then reads +infinity. */
    void setSteadyState(double[] steady) {
        System.arraycopy(steady, 0, state, 0, state.length);
        steadySolution = true;
        current = false;
    }

    @Override
    public double time() {
        return steadySolution ? Double.POSITIVE_INFINITY : integrator.time();
    }

    @Override
    public long steps() {
        return integrator.acceptedSteps();
    }

    @Override
    public int points() {
        return grid.points();
    }

    @Override
    public double y(int i) {
        return grid.yAt(i);
    }

    @Override
    public double velocity(int i) {
        return state[discretization.velocityIndex(i)];
    }

    @Override
    public double temperature(int i) {
        return discretization.isThermal() ? state[discretization.temperatureIndex(i)] : initialTemperature;
    }

    @Override
    public double viscosity(int i) {
        refresh();
        return discretization.viscosityAt(i);
    }

    @Override
    public double lowerWallVelocity() {
        return state[0];
    }

    @Override
    public double upperWallVelocity() {
        return state[discretization.velocityIndex(grid.points() - 1)];
    }

    @Override
    public double wallShearStressLower() {
        refresh();
        return discretization.wallShearStressLower(state);
    }

    @Override
    public double wallShearStressUpper() {
        if (physics.isSemiInfinite()) {
            return Double.NaN;
        }
        refresh();
        return discretization.wallShearStressUpper(state);
    }

    @Override
    public double dissipation() {
        refresh();
        return discretization.dissipation(state);
    }

    @Override
    public double maxTemperature() {
        if (!discretization.isThermal()) {
            return initialTemperature;
        }
        double max = Double.NEGATIVE_INFINITY;
        for (int i = 0; i < grid.points(); i++) {
            max = Math.max(max, state[2 * i + 1]);
        }
        return max;
    }

    @Override
    public double meanTemperature() {
        if (!discretization.isThermal()) {
            return initialTemperature;
        }
        double sum = 0;
        for (int i = 0; i < grid.points(); i++) {
            sum += grid.volumeAt(i) * state[2 * i + 1];
        }
        return sum / grid.depth();
    }

    @Override
    public double heatFluxIntoLowerWall() {
        if (!discretization.isThermal()) {
            return 0;
        }
        refresh();
        return discretization.heatFluxIntoLowerWall(state);
    }

    @Override
    public double heatFluxIntoUpperWall() {
        if (!discretization.isThermal() || physics.isSemiInfinite()) {
            return 0;
        }
        refresh();
        return discretization.heatFluxIntoUpperWall(state);
    }

    @Override
    public double storedHeat() {
        if (!discretization.isThermal()) {
            return 0;
        }
        return discretization.storedHeat(state, physics.initialTemperature());
    }
}
