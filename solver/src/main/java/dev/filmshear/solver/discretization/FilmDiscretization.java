package dev.filmshear.solver.discretization;

import dev.filmshear.solver.grid.FilmGrid;
import dev.filmshear.solver.linalg.BlockTridiagonalSolver;
import dev.filmshear.solver.linalg.TridiagonalSolver;
import dev.filmshear.solver.physics.DensityLaw;
import dev.filmshear.solver.physics.Drive;
import dev.filmshear.solver.physics.FilmPhysics;
import dev.filmshear.solver.physics.PropertyLaw;
import dev.filmshear.solver.physics.ThermalCondition;
import dev.filmshear.solver.physics.ViscosityLaw;
import dev.filmshear.solver.physics.VolumeSource;
import dev.filmshear.solver.physics.WallMotion;
import dev.filmshear.solver.time.ImplicitSystem;

/**
 * The film's momentum and energy equations discretized in space by vertex-centred finite volumes.
 *
 * <p>Continuous equations (see {@link FilmPhysics}):
 * <pre>
 *   rho dU/dt    = d/dy( mu dU/dy ) - dp/dx + f
 *   rho cp dT/dt = d/dy( k dT/dy ) + mu (dU/dy)^2 + q
 * </pre>
 * Discrete form on node i with control volume V_i and faces i-1/2, i+1/2 (grid conventions in
 * {@link FilmGrid}; face j lies between nodes j and j+1):
 * <pre>
 *   rho_i V_i dU_i/dt       = S_(i+1/2) - S_(i-1/2) + V_i (-dp/dx + f_i)
 *   rho_i cp_i V_i dT_i/dt  = Q_(i+1/2) - Q_(i-1/2) + (D_(i-1/2) + D_(i+1/2)) / 2 + V_i q_i
 *
 *   S_j = muFace_j (U_(j+1) - U_j) / dy_j          shear stress on face j
 *   Q_j = kFace_j (T_(j+1) - T_j) / dy_j           heat conducted towards -y across face j
 *   D_j = S_j (U_(j+1) - U_j)                      power dissipated between nodes j and j+1, per area
 * </pre>
 * Each row is a difference of face fluxes, so what leaves one control volume enters its neighbour and
 * the scheme conserves momentum and energy by construction (flux form: S. V. Patankar, <i>Numerical Heat
 * Transfer and Fluid Flow</i>, 1980, ch. 4). Face viscosity and conductivity are harmonic means of the two
 * nodal values, the mean that keeps the flux right across layers of very different viscosity (Patankar
 * 1980, section 4.2-3). Splitting each interval's dissipation D_j half to either node makes the heat
 * released equal, step by step, to the mechanical energy the discrete momentum equation loses. The scheme
 * is second order on uniform and smoothly stretched grids.
 *
 * <p>Boundary rows replace, never add: a wall velocity, and a fixed wall temperature, make the wall node's
 * row algebraic (prescribed). A heat flux or heat-transfer wall keeps the half control volume at the wall,
 * whose outer face flux is the wall's heat flux into the fluid. The far field of a semi-infinite film is a
 * half control volume with no shear and no heat flux.
 *
 * <p>State layout: an isothermal film has one unknown per node, {@code y[i] = U_i}; a heated film has two,
 * interleaved, {@code y[2i] = U_i, y[2i+1] = T_i}, so the Newton matrix is 2x2 block tridiagonal. For the
 * isothermal film every property is taken at the initial temperature and the system is linear.
 *
 * <p>Work arrays are allocated once; stage solves allocate nothing. Not thread-safe.
 */
public final class FilmDiscretization implements ImplicitSystem {
    /** Newton stops when the weighted update is this fraction of the tolerance. */
    private static final double NEWTON_FRACTION = 0.01;
    /** Newton gives up after this many iterations in one stage. */
    private static final int NEWTON_MAX_ITERATIONS = 10;
    /** Contraction rate assumed before any has been measured. */
    private static final double NEWTON_INITIAL_THETA = 0.1;
    /**
     * A reused (simplified-Newton) Jacobian is refreshed when its iterations contract more slowly than this:
     * the price of a new factorization is then lower than that of the extra iterations (E. Hairer and
     * G. Wanner, <i>Solving ODEs II</i>, section IV.8, for the same policy in RADAU5).
     */
    private static final double NEWTON_SLOW_THETA = 0.2;
    /** The second Newton update may be this many times the first before Newton counts as diverging. */
    private static final double NEWTON_SECOND_UPDATE_RATIO = 4;
    /** Newton is diverging when successive updates (from the third on) shrink by less than this ratio. */
    private static final double NEWTON_DIVERGENCE_RATIO = 0.9;
    /**
     * Relative update (against the velocity and temperature scales) below which Newton has converged whatever
     * the tolerance: round-off in a tridiagonal solve of condition number ~ n^2 leaves updates of this order,
     * so asking for less would stall a tight-tolerance run.
     */
    private static final double NEWTON_ROUNDOFF_FLOOR = 1e-11;

    private final FilmGrid grid;
    private final FilmPhysics physics;
    private final int n;
    private final boolean thermal;
    private final int stride;
    private final double[] y;
    private final double[] volume;
    private final double[] inverseSpacing;

    private final ViscosityLaw viscosityLaw;
    private final DensityLaw densityLaw;
    private final PropertyLaw specificHeatLaw;
    private final PropertyLaw conductivityLaw;
    private final WallMotion lowerMotion;
    private final WallMotion upperMotion;
    private final ThermalCondition lowerThermal;
    private final ThermalCondition upperThermal;
    private final boolean upperVelocityPrescribed;
    private final boolean lowerVelocityPrescribed;
    /** The driven wall at node 0, or null. */
    private final WallMotion.Driven lowerDriven;
    /** The driven wall at the last node, or null. */
    private final WallMotion.Driven upperDriven;
    /** True when a drive depends on the wall's speed, which makes even the momentum equation nonlinear. */
    private final boolean speedDependentDrive;
    private final boolean lowerTemperaturePrescribed;
    private final boolean upperTemperaturePrescribed;
    private final double pressureGradient;
    private final VolumeSource momentumSource;
    private final VolumeSource heatSource;
    private final boolean linear;

    // nodal properties
    private final double[] mu;
    private final double[] dMu;
    private final double[] rho;
    private final double[] dRho;
    private final double[] cp;
    private final double[] dCp;
    private final double[] kNode;
    private final double[] dK;
    // face properties and fluxes
    private final double[] muFace;
    private final double[] dMuFaceLeft;
    private final double[] dMuFaceRight;
    private final double[] kFace;
    private final double[] dKFaceLeft;
    private final double[] dKFaceRight;
    private final double[] shearFace;
    private final double[] heatFace;
    private final double[] dissipationFace;
    // node balances F and masses M
    private final double[] momentumBalance;
    private final double[] energyBalance;
    private final double[] massU;
    private final double[] massT;
    // Newton work
    private final double[] residual;
    private final double[] delta;
    private final double[] lower;
    private final double[] diag;
    private final double[] upper;
    private final double[] blockA;
    private final double[] blockB;
    private final double[] blockC;
    private final TridiagonalSolver tridiagonal;
    private final BlockTridiagonalSolver blockTridiagonal;
    private double factoredG = Double.NaN;
    /** 1 for time stepping; 0 for the steady equations, which drop the storage term. */
    private double massWeight = 1;
    private double factoredMassWeight = Double.NaN;
    /** g and mass weight of the block factorization held for reuse (simplified Newton); NaN when none. */
    private double blockFactoredG = Double.NaN;
    private double blockFactoredMassWeight = Double.NaN;
    /** Contraction rate of the last Newton iterations, for judging convergence after a single iteration. */
    private double lastTheta = NEWTON_INITIAL_THETA;
    /** The stage's starting guess, kept to restart with a fresh Jacobian when a reused one fails. */
    private final double[] guess;
    private final boolean constantDensity;
    private final boolean constantSpecificHeat;
    private final boolean constantConductivity;
    /** True once the constant nodal masses (and, below, conductivities) have been computed. */
    private boolean massesFixed;
    private boolean conductivityFixed;
    /** The time of the stage being assembled (for time-dependent drives). */
    private double currentTime;
    /** Steady continuation parameter: scales wall speeds and the pressure gradient; NaN when time stepping. */
    private double steadyLambda = Double.NaN;

    private double tolerance = 1e-6;
    private final double velocityScale;
    private final double temperatureScale;

    /**
     * @param grid nodes across the film; for a semi-infinite film its depth is the truncation depth
     * @param physics the equations
     * @param velocityScale the velocity (m/s) against which velocity errors are measured
     * @param temperatureScale the temperature difference (K) against which temperature errors are measured
     */
    public FilmDiscretization(FilmGrid grid, FilmPhysics physics, double velocityScale, double temperatureScale) {
        this.grid = grid;
        this.physics = physics;
        this.n = grid.points();
        this.thermal = physics.isThermal();
        this.stride = thermal ? 2 : 1;
        this.y = grid.y();
        this.volume = grid.volume();
        this.inverseSpacing = new double[n - 1];
        for (int j = 0; j < n - 1; j++) {
            inverseSpacing[j] = 1 / grid.spacingAt(j);
        }
        this.viscosityLaw = physics.fluid().viscosity();
        this.densityLaw = physics.fluid().density();
        this.specificHeatLaw = physics.fluid().specificHeat();
        this.conductivityLaw = physics.fluid().conductivity();
        this.lowerMotion = physics.lower().motion();
        this.upperMotion = physics.upper() == null ? null : physics.upper().motion();
        this.upperVelocityPrescribed = upperMotion != null && upperMotion.isPrescribed();
        this.lowerVelocityPrescribed = lowerMotion.isPrescribed();
        this.lowerDriven = lowerMotion instanceof WallMotion.Driven d ? d : null;
        this.upperDriven = upperMotion instanceof WallMotion.Driven d ? d : null;
        this.speedDependentDrive = (lowerDriven != null && lowerDriven.drive() instanceof Drive.SpeedCurve)
                || (upperDriven != null && upperDriven.drive() instanceof Drive.SpeedCurve);
        this.lowerThermal = thermal ? physics.lower().thermal() : null;
        this.upperThermal = thermal
                ? (physics.upper() == null ? ThermalCondition.HeatFlux.ADIABATIC : physics.upper().thermal()) : null;
        this.lowerTemperaturePrescribed = lowerThermal instanceof ThermalCondition.FixedTemperature;
        this.upperTemperaturePrescribed = upperThermal instanceof ThermalCondition.FixedTemperature;
        this.pressureGradient = physics.pressureGradient();
        this.momentumSource = physics.momentumSource();
        this.heatSource = physics.heatSource();
        this.linear = !thermal && !speedDependentDrive;
        this.velocityScale = velocityScale > 0 ? velocityScale : 1;
        this.temperatureScale = temperatureScale > 0 ? temperatureScale : 1;

        mu = new double[n];
        dMu = new double[n];
        rho = new double[n];
        dRho = new double[n];
        cp = new double[n];
        dCp = new double[n];
        kNode = new double[n];
        dK = new double[n];
        muFace = new double[n - 1];
        dMuFaceLeft = new double[n - 1];
        dMuFaceRight = new double[n - 1];
        kFace = new double[n - 1];
        dKFaceLeft = new double[n - 1];
        dKFaceRight = new double[n - 1];
        shearFace = new double[n - 1];
        heatFace = new double[n - 1];
        dissipationFace = new double[n - 1];
        momentumBalance = new double[n];
        energyBalance = new double[n];
        massU = new double[n];
        massT = new double[n];
        residual = new double[n * stride];
        guess = new double[n * stride];
        constantDensity = densityLaw.isConstant();
        constantSpecificHeat = specificHeatLaw == null || specificHeatLaw.isConstant();
        constantConductivity = conductivityLaw == null || conductivityLaw.isConstant();
        delta = new double[n * stride];
        lower = new double[n];
        diag = new double[n];
        upper = new double[n];
        blockA = new double[4 * n];
        blockB = new double[4 * n];
        blockC = new double[4 * n];
        tridiagonal = thermal ? null : new TridiagonalSolver(n);
        blockTridiagonal = thermal ? new BlockTridiagonalSolver(n) : null;

        if (!thermal) {
            double tRef = physics.referenceTemperature();
            double mu0 = viscosityLaw.mu(tRef);
            double rho0 = densityLaw.density(tRef);
            for (int i = 0; i < n; i++) {
                mu[i] = mu0;
                rho[i] = rho0;
                massU[i] = rho0 * volume[i] + wallMass(i);
            }
            for (int j = 0; j < n - 1; j++) {
                muFace[j] = mu0;
            }
        }
    }

    // ------------------------------------------------------------------ layout

    @Override
    public int size() {
        return n * stride;
    }

    /** Number of nodes. */
    public int points() {
        return n;
    }

    /** True when the energy equation is part of the system. */
    public boolean isThermal() {
        return thermal;
    }

    /** The grid. */
    public FilmGrid grid() {
        return grid;
    }

    /** The equations. */
    public FilmPhysics physics() {
        return physics;
    }

    /** Index of node {@code i}'s velocity in the state vector. */
    public int velocityIndex(int i) {
        return stride * i;
    }

    /** Index of node {@code i}'s temperature in the state vector (heated films only). */
    public int temperatureIndex(int i) {
        return stride * i + 1;
    }

    /**
     * Writes the initial state: uniform velocity and temperature, wall values where prescribed.
     *
     * @param state overwritten
     */
    public void initialState(double[] state) {
        for (int i = 0; i < n; i++) {
            state[stride * i] = physics.initialVelocity();
            if (thermal) {
                state[stride * i + 1] = physics.initialTemperature();
            }
        }
        if (lowerDriven != null) {
            state[0] = lowerDriven.initialVelocity();
        }
        if (upperDriven != null) {
            state[stride * (n - 1)] = upperDriven.initialVelocity();
        }
        if (thermal) {
            if (lowerTemperaturePrescribed) {
                state[1] = ((ThermalCondition.FixedTemperature) lowerThermal).temperature();
            }
            if (upperTemperaturePrescribed) {
                state[stride * (n - 1) + 1] = ((ThermalCondition.FixedTemperature) upperThermal).temperature();
            }
        }
    }

    /** Sets the prescribed rows of {@code state} to their values at time {@code t}. */
    public void applyPrescribed(double t, double[] state) {
        if (Double.isNaN(steadyLambda)) {
            if (lowerVelocityPrescribed) {
                state[0] = lowerMotion.velocity(t);
            }
            if (upperVelocityPrescribed) {
                state[stride * (n - 1)] = upperMotion.velocity(t);
            }
        } else {
            if (lowerVelocityPrescribed) {
                state[0] = steadyLambda * lowerMotion.settledVelocity().orElseThrow();
            }
            if (upperVelocityPrescribed) {
                state[stride * (n - 1)] = steadyLambda * upperMotion.settledVelocity().orElseThrow();
            }
        }
        if (thermal) {
            if (lowerTemperaturePrescribed) {
                state[1] = ((ThermalCondition.FixedTemperature) lowerThermal).temperature();
            }
            if (upperTemperaturePrescribed) {
                state[stride * (n - 1) + 1] = ((ThermalCondition.FixedTemperature) upperThermal).temperature();
            }
        }
    }

    // ------------------------------------------------------------------ properties and fluxes

    /** Nodal and face properties at the temperatures of {@code state}; false when a property is not usable. */
    private boolean evaluateProperties(double[] state) {
        return evaluateProperties(state, true);
    }

    /**
     * Nodal and face properties at the temperatures of {@code state}; the derivatives with respect to
     * temperature only when {@code derivatives} (they feed the Jacobian, not the residual).
     */
    private boolean evaluateProperties(double[] state, boolean derivatives) {
        if (!thermal) {
            return true;
        }
        boolean constantMu = viscosityLaw.isConstant();
        boolean fixedMasses = constantDensity && constantSpecificHeat && massesFixed;
        for (int i = 0; i < n; i++) {
            double t = state[2 * i + 1];
            if (!(t > 0) || t == Double.POSITIVE_INFINITY) {
                return false;
            }
            double m = viscosityLaw.mu(t);
            if (!(m > 0) || m == Double.POSITIVE_INFINITY) {
                return false;
            }
            mu[i] = m;
            if (derivatives) {
                dMu[i] = constantMu ? 0 : viscosityLaw.dMuDT(t, m);
            }
            if (fixedMasses) {
                continue;
            }
            double r = densityLaw.density(t);
            if (!(r > 0)) {
                return false;
            }
            rho[i] = r;
            dRho[i] = densityLaw.derivative(t);
            cp[i] = specificHeatLaw.value(t);
            dCp[i] = specificHeatLaw.derivative(t);
            if (!(cp[i] > 0)) {
                return false;
            }
            massU[i] = r * volume[i] + wallMass(i);
            massT[i] = r * cp[i] * volume[i];
        }
        if (constantDensity && constantSpecificHeat) {
            massesFixed = true;
        }
        if (derivatives) {
            for (int j = 0; j < n - 1; j++) {
                // harmonic mean and its derivatives with respect to the two nodal temperatures
                double a = mu[j];
                double b = mu[j + 1];
                double s = 1 / (a + b);
                muFace[j] = 2 * a * b * s;
                dMuFaceLeft[j] = 2 * b * b * s * s * dMu[j];
                dMuFaceRight[j] = 2 * a * a * s * s * dMu[j + 1];
            }
        } else {
            for (int j = 0; j < n - 1; j++) {
                double a = mu[j];
                double b = mu[j + 1];
                muFace[j] = 2 * a * b / (a + b);
            }
        }
        if (constantConductivity && conductivityFixed) {
            return true;
        }
        for (int i = 0; i < n; i++) {
            double t = state[2 * i + 1];
            kNode[i] = conductivityLaw.value(t);
            dK[i] = conductivityLaw.derivative(t);
            if (!(kNode[i] > 0)) {
                return false;
            }
        }
        for (int j = 0; j < n - 1; j++) {
            double ka = kNode[j];
            double kb = kNode[j + 1];
            double ks = 1 / (ka + kb);
            kFace[j] = 2 * ka * kb * ks;
            dKFaceLeft[j] = 2 * kb * kb * ks * ks * dK[j];
            dKFaceRight[j] = 2 * ka * ka * ks * ks * dK[j + 1];
        }
        conductivityFixed = constantConductivity;
        return true;
    }

    /** Face fluxes and node balances F at time {@code t} for {@code state}; properties must be current. */
    private void evaluateBalances(double t, double[] state) {
        for (int j = 0; j < n - 1; j++) {
            double du = state[stride * (j + 1)] - state[stride * j];
            double s = muFace[j] * inverseSpacing[j] * du;
            shearFace[j] = s;
            if (thermal) {
                dissipationFace[j] = s * du;
                heatFace[j] = kFace[j] * inverseSpacing[j] * (state[stride * (j + 1) + 1] - state[stride * j + 1]);
            }
        }
        double pressureForce = -pressureGradient * (Double.isNaN(steadyLambda) ? 1 : steadyLambda);
        for (int i = 0; i < n; i++) {
            double inner = i > 0 ? shearFace[i - 1] : 0;
            double outer = i < n - 1 ? shearFace[i] : 0; // far field: no shear
            double body = pressureForce;
            if (momentumSource != null) {
                body += momentumSource.value(y[i], t);
            }
            momentumBalance[i] = outer - inner + volume[i] * body;
        }
        if (lowerDriven != null) {
            momentumBalance[0] += driveForce(lowerDriven, t, state[0]);
        }
        if (upperDriven != null) {
            momentumBalance[n - 1] += driveForce(upperDriven, t, state[stride * (n - 1)]);
        }
        if (thermal) {
            for (int i = 0; i < n; i++) {
                double in = i > 0 ? heatFace[i - 1] : -wallHeatInflow(lowerThermal, state[1]);
                double out = i < n - 1 ? heatFace[i] : wallHeatInflow(upperThermal, state[stride * i + 1]);
                double dissipation = 0.5 * ((i > 0 ? dissipationFace[i - 1] : 0) + (i < n - 1 ? dissipationFace[i] : 0));
                double source = heatSource == null ? 0 : volume[i] * heatSource.value(y[i], t);
                energyBalance[i] = out - in + dissipation + source;
            }
        }
    }

    /** The mass per unit area of a driven wall lumped with node {@code i}'s half control volume (kg/m^2). */
    private double wallMass(int i) {
        if (i == 0 && lowerDriven != null) {
            return lowerDriven.massPerArea();
        }
        if (i == n - 1 && upperDriven != null) {
            return upperDriven.massPerArea();
        }
        return 0;
    }

    /** The drive's force per area (Pa); scaled by the continuation parameter and taken at t = infinity when steady. */
    private double driveForce(WallMotion.Driven wall, double t, double u) {
        return Double.isNaN(steadyLambda) ? wall.drive().force(t, u)
                : steadyLambda * wall.drive().force(Double.POSITIVE_INFINITY, u);
    }

    private double driveForceDerivative(WallMotion.Driven wall, double t, double u) {
        return Double.isNaN(steadyLambda) ? wall.drive().forceDerivative(t, u)
                : steadyLambda * wall.drive().forceDerivative(Double.POSITIVE_INFINITY, u);
    }

    /** Heat flux from a flux or heat-transfer wall into the fluid (W/m^2) when the wall node is at {@code tWall}. */
    private static double wallHeatInflow(ThermalCondition condition, double tWall) {
        if (condition instanceof ThermalCondition.HeatFlux f) {
            return f.flux();
        }
        if (condition instanceof ThermalCondition.HeatTransfer h) {
            return h.coefficient() * (h.ambient() - tWall);
        }
        return 0; // fixed temperature: the row is prescribed and this value is not used
    }

    private static double wallHeatInflowDerivative(ThermalCondition condition) {
        return condition instanceof ThermalCondition.HeatTransfer h ? -h.coefficient() : 0;
    }

    // ------------------------------------------------------------------ ImplicitSystem

    @Override
    public void setTolerance(double tolerance) {
        this.tolerance = tolerance;
    }

    @Override
    public boolean isLinear() {
        return linear;
    }

    @Override
    public void rate(double t, double[] state, double[] k) {
        if (!evaluateProperties(state, false)) {
            throw new IllegalStateException("rate requested at an unusable state (temperature or property not positive)");
        }
        evaluateBalances(t, state);
        for (int i = 0; i < n; i++) {
            k[stride * i] = momentumBalance[i] / massU[i];
            if (thermal) {
                k[stride * i + 1] = energyBalance[i] / massT[i];
            }
        }
        zeroPrescribed(k);
    }

    private void zeroPrescribed(double[] v) {
        if (lowerVelocityPrescribed) {
            v[0] = 0;
        }
        if (upperVelocityPrescribed) {
            v[stride * (n - 1)] = 0;
        }
        if (thermal) {
            if (lowerTemperaturePrescribed) {
                v[1] = 0;
            }
            if (upperTemperaturePrescribed) {
                v[stride * (n - 1) + 1] = 0;
            }
        }
    }

    @Override
    public int solveStage(double t, double g, double[] z, double[] state) {
        applyPrescribed(t, state);
        return thermal ? solveCoupledStage(t, g, z, state) : solveMomentumStage(t, g, z, state);
    }

    /**
     * Momentum alone: Newton on the tridiagonal Jacobian of R = w M (Y - Z) - g F(Y), w the mass weight. The
     * equations are linear unless a drive depends on the wall's speed, so one iteration solves them exactly
     * and the factorization is reused while g is unchanged.
     */
    private int solveMomentumStage(double t, double g, double[] z, double[] state) {
        double previous = Double.NaN;
        for (int iteration = 1; iteration <= NEWTON_MAX_ITERATIONS; iteration++) {
            boolean refactor = g != factoredG || massWeight != factoredMassWeight || speedDependentDrive;
            if (refactor) {
                for (int i = 0; i < n; i++) {
                    double left = i > 0 ? muFace[i - 1] * inverseSpacing[i - 1] : 0;
                    double right = i < n - 1 ? muFace[i] * inverseSpacing[i] : 0;
                    lower[i] = -g * left;
                    upper[i] = -g * right;
                    diag[i] = massWeight * massU[i] + g * (left + right);
                }
                if (lowerDriven != null) {
                    diag[0] -= g * driveForceDerivative(lowerDriven, t, state[0]);
                } else {
                    diag[0] = 1;
                    upper[0] = 0;
                }
                if (upperDriven != null) {
                    diag[n - 1] -= g * driveForceDerivative(upperDriven, t, state[n - 1]);
                } else if (upperVelocityPrescribed) {
                    diag[n - 1] = 1;
                    lower[n - 1] = 0;
                }
                tridiagonal.factor(lower, diag, upper, n);
                factoredG = speedDependentDrive ? Double.NaN : g;
                factoredMassWeight = massWeight;
            }
            evaluateBalances(t, state);
            for (int i = 0; i < n; i++) {
                residual[i] = -(massWeight * massU[i] * (state[i] - z[i]) - g * momentumBalance[i]);
            }
            if (lowerVelocityPrescribed) {
                residual[0] = 0;
            }
            if (upperVelocityPrescribed) {
                residual[n - 1] = 0;
            }
            tridiagonal.solve(residual, delta);
            double norm = 0;
            for (int i = 0; i < n; i++) {
                state[i] += delta[i];
                double w = delta[i] / (velocityScale + Math.abs(state[i]));
                norm += w * w;
            }
            if (linear) {
                return 1;
            }
            norm = Math.sqrt(norm / n) / tolerance;
            if (!(norm < Double.POSITIVE_INFINITY)) {
                return -iteration;
            }
            if (norm <= Math.max(NEWTON_FRACTION, NEWTON_ROUNDOFF_FLOOR / tolerance)) {
                return iteration;
            }
            if (iteration > 1 && norm / previous >= NEWTON_DIVERGENCE_RATIO) {
                return -iteration;
            }
            previous = norm;
        }
        return -NEWTON_MAX_ITERATIONS;
    }

    /**
     * Momentum and energy: Newton on the 2x2 block-tridiagonal Jacobian, simplified where it pays: the
     * factorization of M - g J is kept while g is unchanged (both stages of TR-BDF2 share g, and the integrator
     * keeps h when it would change it only a little), so a stage usually costs one residual evaluation and one
     * back-substitution. A reused Jacobian that contracts slowly, or fails, is refreshed and the stage redone.
     * Convergence after the first iteration is judged with the last measured contraction rate theta:
     * converged when theta / (1 - theta) |delta| is below a fraction of the tolerance (E. Hairer and G. Wanner,
     * <i>Solving ODEs II</i>, 2nd ed., section IV.8, eq. (8.15) and the RADAU5 code).
     */
    private int solveCoupledStage(double t, double g, double[] z, double[] state) {
        boolean reuse = g == blockFactoredG && massWeight == blockFactoredMassWeight;
        System.arraycopy(state, 0, guess, 0, state.length);
        double previous = Double.NaN;
        int total = 0;
        for (int iteration = 1; iteration <= NEWTON_MAX_ITERATIONS; iteration++) {
            total++;
            boolean usable = evaluateProperties(state, !reuse);
            if (usable) {
                evaluateBalances(t, state);
                currentTime = t;
                if (reuse) {
                    residualCoupled(g, z, state);
                } else {
                    assembleCoupled(g, z, state);
                    blockTridiagonal.factor(blockA, blockB, blockC, n);
                    blockFactoredG = g;
                    blockFactoredMassWeight = massWeight;
                    factoredG = Double.NaN;
                }
                blockTridiagonal.solve(residual, delta);
            }
            double norm = 0;
            if (usable) {
                for (int i = 0; i < n; i++) {
                    double du = delta[2 * i];
                    double dt = delta[2 * i + 1];
                    state[2 * i] += du;
                    state[2 * i + 1] += dt;
                    double wu = du / (velocityScale + Math.abs(state[2 * i]));
                    double wt = dt / temperatureScale;
                    norm += wu * wu + wt * wt;
                }
                norm = Math.sqrt(norm / (2 * n)) / tolerance;
            }
            double theta = iteration > 1 ? norm / previous : Double.NaN;
            // the second update may exceed the first: momentum and energy are coupled one way (dissipation),
            // so the temperature learns of a new velocity field only in the second iteration
            boolean failing = !usable || !(norm < Double.POSITIVE_INFINITY)
                    || (iteration == 2 && theta >= NEWTON_SECOND_UPDATE_RATIO)
                    || (iteration > 2 && theta >= NEWTON_DIVERGENCE_RATIO);
            if (failing) {
                if (reuse) {
                    // a stale Jacobian: refresh it and start the stage again from its guess
                    reuse = false;
                    System.arraycopy(guess, 0, state, 0, state.length);
                    iteration = 0;
                    previous = Double.NaN;
                    continue;
                }
                blockFactoredG = Double.NaN;
                return -total;
            }
            if (norm <= Math.max(NEWTON_FRACTION, NEWTON_ROUNDOFF_FLOOR / tolerance)) {
                return total;
            }
            if (iteration == 1) {
                // one update says nothing about convergence: from a state at rest the Jacobian holds no
                // coupling through dissipation, and accepting on an estimated contraction rate was measured to
                // triple the start-up's wall-stress error; a second update is always taken
                previous = norm;
                continue;
            } else {
                lastTheta = theta;
                if (reuse && theta > NEWTON_SLOW_THETA) {
                    blockFactoredG = Double.NaN; // refresh at the next stage
                }
                if (theta < 1 && theta / (1 - theta) * norm <= NEWTON_FRACTION) {
                    return total;
                }
            }
            previous = norm;
        }
        blockFactoredG = Double.NaN;
        return -total;
    }

    /** The negated residual -R of the stage equation only (the Jacobian is reused). */
    private void residualCoupled(double g, double[] z, double[] state) {
        double mw = massWeight;
        for (int i = 0; i < n; i++) {
            int iu = 2 * i;
            residual[iu] = -(mw * massU[i] * (state[iu] - z[iu]) - g * momentumBalance[i]);
            residual[iu + 1] = -(mw * massT[i] * (state[iu + 1] - z[iu + 1]) - g * energyBalance[i]);
        }
        if (lowerVelocityPrescribed) {
            residual[0] = 0;
        }
        if (upperVelocityPrescribed) {
            residual[2 * (n - 1)] = 0;
        }
        if (lowerTemperaturePrescribed) {
            residual[1] = 0;
        }
        if (upperTemperaturePrescribed) {
            residual[2 * (n - 1) + 1] = 0;
        }
    }

    /**
     * The Newton system J delta = -R for R = M(Y)(Y - Z) - g F(Y): residual into {@code residual} (negated),
     * Jacobian blocks into blockA/B/C. Balances and properties must be current.
     */
    private void assembleCoupled(double g, double[] z, double[] state) {
        for (int i = 0; i < n; i++) {
            int k = 4 * i;
            int iu = 2 * i;
            int it = iu + 1;
            double u = state[iu];
            double temp = state[it];
            double ru = massWeight * massU[i] * (u - z[iu]) - g * momentumBalance[i];
            double rt = massWeight * massT[i] * (temp - z[it]) - g * energyBalance[i];
            residual[iu] = -ru;
            residual[it] = -rt;

            // d F / d (neighbours): see the class comment for S, Q, D; face i-1 is "left", face i is "right"
            double fuUm = 0, fuTm = 0, fuU = 0, fuT = 0, fuUp = 0, fuTp = 0;
            double ftUm = 0, ftTm = 0, ftU = 0, ftT = 0, ftUp = 0, ftTp = 0;
            if (i > 0) {
                int j = i - 1;
                double gj = inverseSpacing[j];
                double sg = muFace[j] * gj;
                double du = state[iu] - state[iu - 2];
                double dT = state[it] - state[it - 2];
                double kg = kFace[j] * gj;
                // momentum: -S_j
                fuUm += sg;
                fuU -= sg;
                fuTm -= gj * du * dMuFaceLeft[j];
                fuT -= gj * du * dMuFaceRight[j];
                // energy: -Q_j + D_j / 2
                ftTm += kg - gj * dT * dKFaceLeft[j];
                ftT -= kg + gj * dT * dKFaceRight[j];
                ftUm -= sg * du;
                ftU += sg * du;
                ftTm += 0.5 * gj * du * du * dMuFaceLeft[j];
                ftT += 0.5 * gj * du * du * dMuFaceRight[j];
            } else {
                ftT += wallHeatInflowDerivative(lowerThermal);
            }
            if (i < n - 1) {
                int j = i;
                double gj = inverseSpacing[j];
                double sg = muFace[j] * gj;
                double du = state[iu + 2] - state[iu];
                double dT = state[it + 2] - state[it];
                double kg = kFace[j] * gj;
                // momentum: +S_j
                fuU -= sg;
                fuUp += sg;
                fuT += gj * du * dMuFaceLeft[j];
                fuTp += gj * du * dMuFaceRight[j];
                // energy: +Q_j + D_j / 2
                ftT += -kg + gj * dT * dKFaceLeft[j];
                ftTp += kg + gj * dT * dKFaceRight[j];
                ftU -= sg * du;
                ftUp += sg * du;
                ftT += 0.5 * gj * du * du * dMuFaceLeft[j];
                ftTp += 0.5 * gj * du * du * dMuFaceRight[j];
            } else {
                ftT += wallHeatInflowDerivative(upperThermal);
            }
            if (i == 0 && lowerDriven != null) {
                fuU += driveForceDerivative(lowerDriven, currentTime, u);
            }
            if (i == n - 1 && upperDriven != null) {
                fuU += driveForceDerivative(upperDriven, currentTime, u);
            }

            // J = M + M'(Y - Z) - g dF/dY
            double v = volume[i];
            blockA[k] = -g * fuUm;
            blockA[k + 1] = -g * fuTm;
            blockA[k + 2] = -g * ftUm;
            blockA[k + 3] = -g * ftTm;
            double mw = massWeight;
            blockB[k] = mw * massU[i] - g * fuU;
            blockB[k + 1] = mw * v * dRho[i] * (u - z[iu]) - g * fuT;
            blockB[k + 2] = -g * ftU;
            blockB[k + 3] = mw * (massT[i] + v * (dRho[i] * cp[i] + rho[i] * dCp[i]) * (temp - z[it])) - g * ftT;
            blockC[k] = -g * fuUp;
            blockC[k + 1] = -g * fuTp;
            blockC[k + 2] = -g * ftUp;
            blockC[k + 3] = -g * ftTp;
        }
        // prescribed rows: identity, zero update (state already holds the prescribed value)
        if (lowerVelocityPrescribed) {
            prescribeVelocityRow(0);
        }
        if (upperVelocityPrescribed) {
            prescribeVelocityRow(n - 1);
        }
        if (lowerTemperaturePrescribed) {
            prescribeTemperatureRow(0);
        }
        if (upperTemperaturePrescribed) {
            prescribeTemperatureRow(n - 1);
        }
    }

    private void prescribeVelocityRow(int i) {
        int k = 4 * i;
        blockA[k] = 0;
        blockA[k + 1] = 0;
        blockB[k] = 1;
        blockB[k + 1] = 0;
        blockC[k] = 0;
        blockC[k + 1] = 0;
        residual[2 * i] = 0;
    }

    private void prescribeTemperatureRow(int i) {
        int k = 4 * i;
        blockA[k + 2] = 0;
        blockA[k + 3] = 0;
        blockB[k + 2] = 0;
        blockB[k + 3] = 1;
        blockC[k + 2] = 0;
        blockC[k + 3] = 0;
        residual[2 * i + 1] = 0;
    }

    /**
     * Solves the steady equations F(Y) = 0 by Newton's method, with the wall speeds and the pressure
     * gradient scaled by {@code lambda} (the continuation parameter; 1 is the case itself). Wall speeds are
     * the walls' settled velocities.
     *
     * @param lambda continuation parameter in [0, 1]
     * @param state on entry the initial guess, on exit the solution
     * @return Newton iterations used, or a negative number when Newton did not converge
     */
    public int solveSteady(double lambda, double[] state) {
        steadyLambda = lambda;
        massWeight = 0;
        blockFactoredG = Double.NaN;
        try {
            applyPrescribed(0, state);
            if (!thermal) {
                return solveMomentumStage(0, 1, state, state);
            }
            return solveCoupledStage(0, 1, state, state);
        } finally {
            steadyLambda = Double.NaN;
            massWeight = 1;
            blockFactoredG = Double.NaN;
        }
    }

    @Override
    public void filterError(double[] e) {
        zeroPrescribed(e);
        if (thermal) {
            for (int i = 0; i < n; i++) {
                e[2 * i] *= massU[i];
                e[2 * i + 1] *= massT[i];
            }
            zeroPrescribed(e);
            blockTridiagonal.solve(e, e);
        } else {
            for (int i = 0; i < n; i++) {
                e[i] *= massU[i];
            }
            zeroPrescribed(e);
            tridiagonal.solve(e, e);
        }
    }

    @Override
    public double errorNorm(double[] e, double[] yOld, double[] yNew) {
        double sum = 0;
        int count = 0;
        for (int i = 0; i < n; i++) {
            int iu = stride * i;
            double w = velocityScale + Math.max(Math.abs(yOld[iu]), Math.abs(yNew[iu]));
            double r = e[iu] / w;
            sum += r * r;
            count++;
            if (thermal) {
                double rt = e[iu + 1] / temperatureScale;
                sum += rt * rt;
                count++;
            }
        }
        return Math.sqrt(sum / count) / tolerance;
    }

    // ------------------------------------------------------------------ derived quantities

    /**
     * Brings the stored properties and fluxes up to date with {@code state} at time {@code t}, for the
     * derived quantities below.
     *
     * @return false when a property is not usable at this state
     */
    public boolean update(double t, double[] state) {
        if (!evaluateProperties(state, false)) {
            return false;
        }
        evaluateBalances(t, state);
        return true;
    }

    /**
     * Says which node makes {@code state} unusable (a temperature not above 0 K, a viscosity, density,
     * specific heat or conductivity that is not a positive finite number), or returns null when none does.
     */
    public String describeUnusable(double[] state) {
        for (int i = 0; i < n; i++) {
            double t = thermal ? state[2 * i + 1] : physics.referenceTemperature();
            String where = " at node " + i + " (y = " + y[i] + " m, T = " + t + " K)";
            if (!(t > 0) || Double.isInfinite(t)) {
                return "temperature " + t + " K" + where;
            }
            double m = viscosityLaw.mu(t);
            if (!(m > 0) || Double.isInfinite(m)) {
                return "viscosity " + m + " Pa*s from the " + viscosityLaw.name() + " law" + where;
            }
            double r = densityLaw.density(t);
            if (!(r > 0)) {
                return "density " + r + " kg/m^3 from the thermal expansion" + where;
            }
            if (thermal && !(specificHeatLaw.value(t) > 0)) {
                return "specific heat " + specificHeatLaw.value(t) + " J/(kg*K)" + where;
            }
            if (thermal && !(conductivityLaw.value(t) > 0)) {
                return "thermal conductivity " + conductivityLaw.value(t) + " W/(m*K)" + where;
            }
        }
        return null;
    }

    /** Viscosity (Pa s) at node {@code i}, as of the last {@link #update}. */
    public double viscosityAt(int i) {
        return mu[i];
    }

    /** Density (kg/m^3) at node {@code i}, as of the last {@link #update}. */
    public double densityAt(int i) {
        return rho[i];
    }

    /** Face viscosity (Pa s) of face {@code j}, as of the last {@link #update}. */
    public double faceViscosityAt(int j) {
        return muFace[j];
    }

    /**
     * Wall shear stress mu dU/dy (Pa) at the lower wall, dU/dy from the second-order one-sided three-point
     * formula on the (possibly non-uniform) grid. Same sign convention at both walls.
     */
    public double wallShearStressLower(double[] state) {
        return mu[0] * derivativeAtLower(state, 0);
    }

    /** Wall shear stress mu dU/dy (Pa) at the upper wall (last node). */
    public double wallShearStressUpper(double[] state) {
        return mu[n - 1] * derivativeAtUpper(state, 0);
    }

    /** Heat flux (W/m^2) from the fluid into the lower wall, k dT/dy at y = 0 (heated films only). */
    public double heatFluxIntoLowerWall(double[] state) {
        return kNode[0] * derivativeAtLower(state, 1);
    }

    /** Heat flux (W/m^2) from the fluid into the upper wall, -k dT/dy at the last node. */
    public double heatFluxIntoUpperWall(double[] state) {
        return -kNode[n - 1] * derivativeAtUpper(state, 1);
    }

    /** Power dissipated in the film per unit wall area (W/m^2): the sum of the interval dissipations. */
    public double dissipation(double[] state) {
        double sum = 0;
        for (int j = 0; j < n - 1; j++) {
            double du = state[stride * (j + 1)] - state[stride * j];
            sum += muFace[j] * inverseSpacing[j] * du * du;
        }
        return sum;
    }

    /** Heat (J/m^2) stored in the film relative to a uniform temperature {@code reference}, integral of rho cp dT. */
    public double storedHeat(double[] state, double reference) {
        double sum = 0;
        for (int i = 0; i < n; i++) {
            double t = state[stride * i + 1];
            double mid = 0.5 * (t + reference);
            // Simpson's rule: exact for rho cp quadratic in T (linear density times linear specific heat)
            double f0 = densityLaw.density(reference) * specificHeatLaw.value(reference);
            double f1 = densityLaw.density(mid) * specificHeatLaw.value(mid);
            double f2 = densityLaw.density(t) * specificHeatLaw.value(t);
            sum += volume[i] * (t - reference) * (f0 + 4 * f1 + f2) / 6;
        }
        return sum;
    }

    private double derivativeAtLower(double[] state, int offset) {
        double d1 = y[1] - y[0];
        double d2 = y[2] - y[1];
        double f0 = state[offset];
        double f1 = state[stride + offset];
        double f2 = state[2 * stride + offset];
        return -(2 * d1 + d2) / (d1 * (d1 + d2)) * f0 + (d1 + d2) / (d1 * d2) * f1 - d1 / (d2 * (d1 + d2)) * f2;
    }

    private double derivativeAtUpper(double[] state, int offset) {
        double e1 = y[n - 1] - y[n - 2];
        double e2 = y[n - 2] - y[n - 3];
        double f0 = state[stride * (n - 1) + offset];
        double f1 = state[stride * (n - 2) + offset];
        double f2 = state[stride * (n - 3) + offset];
        return (2 * e1 + e2) / (e1 * (e1 + e2)) * f0 - (e1 + e2) / (e1 * e2) * f1 + e1 / (e2 * (e1 + e2)) * f2;
    }

    /**
     * The symmetric form of the momentum diffusion operator at the current face viscosities, over the nodes
     * whose velocity is not prescribed: M^-1/2 K M^-1/2 with K the stiffness (flux-difference) matrix and
     * M the nodal masses. Its smallest eigenvalue is the decay rate (1/s) of the slowest velocity mode.
     *
     * @param diagonal overwritten with the diagonal, length {@link #freeVelocityNodes()}
     * @param offDiagonal overwritten with the entries beside it, length one less
     */
    public void momentumDiffusionOperator(double[] diagonal, double[] offDiagonal) {
        int first = 1;
        int last = upperMotion != null ? n - 2 : n - 1;
        for (int i = first; i <= last; i++) {
            double left = muFace[i - 1] * inverseSpacing[i - 1];
            double right = i < n - 1 ? muFace[i] * inverseSpacing[i] : 0;
            diagonal[i - first] = (left + right) / massU[i];
            if (i < last) {
                offDiagonal[i - first] = -right / Math.sqrt(massU[i] * massU[i + 1]);
            }
        }
    }

    /** Number of nodes whose velocity is not prescribed. */
    public int freeVelocityNodes() {
        return upperMotion != null ? n - 2 : n - 1;
    }
}
