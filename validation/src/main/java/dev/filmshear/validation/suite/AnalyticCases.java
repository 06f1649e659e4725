package dev.filmshear.validation.suite;

import dev.filmshear.solver.model.FilmCase;
import dev.filmshear.solver.model.FilmResult;
import dev.filmshear.solver.model.FilmSolver;
import dev.filmshear.solver.model.GridSpec;
import dev.filmshear.solver.model.Snapshot;
import dev.filmshear.solver.model.SolverOptions;
import dev.filmshear.solver.physics.ConstantViscosity;
import dev.filmshear.solver.physics.DensityLaw;
import dev.filmshear.solver.physics.Domain;
import dev.filmshear.solver.physics.ExponentialViscosity;
import dev.filmshear.solver.physics.FilmPhysics;
import dev.filmshear.solver.physics.Fluid;
import dev.filmshear.solver.physics.PropertyLaw;
import dev.filmshear.solver.physics.ThermalCondition;
import dev.filmshear.solver.physics.ViscosityLaw;
import dev.filmshear.solver.physics.Wall;
import dev.filmshear.solver.physics.WallMotion;
import dev.filmshear.solver.time.StepControl;
import dev.filmshear.validation.analytic.AnalyticSolution;
import dev.filmshear.validation.analytic.ConstantPropertyFilm;
import dev.filmshear.validation.analytic.CouettePoiseuilleFlow;
import dev.filmshear.validation.analytic.CouetteViscousHeating;
import dev.filmshear.validation.analytic.HeatedFilmStartup;
import dev.filmshear.validation.analytic.NahmeCouette;
import dev.filmshear.validation.analytic.StokesFirstProblem;
import dev.filmshear.validation.analytic.StokesSecondProblem;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.function.DoubleUnaryOperator;

/**
 * The verification cases with closed-form solutions: every exact solution of the analytic package, set up against
 * the solver and run on refined levels.
 *
 * <p>The film is the oil of the project's checks (typical values, references.md 6.1): gap h = 100 um,
 * rho = 870 kg/m^3, mu = 0.04 Pa s, cp = 1950 J/(kg K), k = 0.13 W/(m K), walls at T0 = 313.15 K, so the viscous
 * diffusion time h^2/nu is 0.2175 ms and the thermal one h^2/alpha 0.1305 s.
 *
 * <p>Two kinds of study, stated per case:
 * <ul>
 *   <li><b>grid and time step together</b>: equal steps dt = t_end / (c (n - 1)) on n nodes, so dt is
 *       proportional to dy; TR-BDF2 is second order in time and the finite volumes second order in space, so the
 *       total error falls like dy^2 (K. Salari and P. Knupp, SAND2000-1444, 2000);</li>
 *   <li><b>grid only</b>: a steady solve (no time error), or adaptive steps at a tolerance tight enough that the
 *       time error is far below the space error of the finest grid.</li>
 * </ul>
 * Errors are max norms over the nodes at the compared time, and absolute differences of wall values (wall shear
 * stress mu du/dy, heat flux into a wall, the film's highest temperature). A profile the scheme reproduces exactly
 * (linear velocity, quadratic temperature: a face's difference quotient is exact for a quadratic, and the
 * three-point wall formula too) is checked against a round-off floor instead of an order.
 */
public final class AnalyticCases {
    /** Gap (m), density (kg/m^3), viscosity (Pa s), specific heat (J/(kg K)), conductivity (W/(m K)). */
    static final double GAP = 1e-4;
    static final double DENSITY = 870;
    static final double VISCOSITY = 0.04;
    static final double SPECIFIC_HEAT = 1950;
    static final double CONDUCTIVITY = 0.13;
    /** Wall and initial temperature T0 (K). */
    static final double WALL_TEMPERATURE = 313.15;
    /** Viscous diffusion time h^2 / nu (s). */
    static final double MOMENTUM_TIME = GAP * GAP * DENSITY / VISCOSITY;
    /** Thermal diffusion time h^2 / alpha (s). */
    static final double THERMAL_TIME = GAP * GAP * DENSITY * SPECIFIC_HEAT / CONDUCTIVITY;

    /**
     * Tolerance of the grid-only transient study: tight enough that the time error stays below the space error on
     * every grid of the full suite (the observed orders stay at 2.0 to 641 nodes, where the velocity error is
     * 1.2e-6 m/s; measured).
     */
    static final double SPACE_ONLY_TOLERANCE = 1e-11;

    /**
     * Round-off floor of the cases the scheme reproduces exactly, as a fraction of each quantity's scale (the wall
     * speed, mu U / h, T0, mu U^2 / h): a direct solve loses about 1e-16 times the condition number of its matrix,
     * which grows like n^2 and reaches about 1e6 on 641 clustered nodes: 1e-10 of the scale, ten times below this
     * floor (measured: at most 1.4e-11 of it, a wall heat flux on 641 nodes). A scheme that did not reproduce the
     * profile would err by about 1e-3 of the scale on 21 nodes, six orders above.
     */
    static final double ROUND_OFF_FRACTION = 1e-9;

    /** Coarsest grid of most cases: 21 nodes, already in the asymptotic range of their errors. */
    static final int COARSEST = 21;
    /**
     * Coarsest grid of the Nahme cases: at Nahme number 10 the wall shear stress is not yet in its asymptotic
     * range on 21 nodes (observed order 1.7 from 21 to 41 nodes, 1.9 from 41 to 81, measured).
     */
    static final int NAHME_COARSEST = 41;
    /**
     * Clustering of the oscillating Stokes layer's grid: with 0.5 the wall shear stress reaches its asymptotic order
     * only from about 161 nodes (observed 1.54, 1.82, 1.92 from 21 nodes on), with 0.7 from 21 (2.00; measured).
     */
    static final double STOKES_LAYER_CLUSTERING = 0.7;

    private AnalyticCases() {
    }

    /**
     * Every analytic case with {@code levels} grids, each refined by 2 (n - 1 doubling) from its coarsest grid, and
     * {@code options}' time scheme for the transient cases refined in grid and step together.
     */
    public static List<VerificationCase> all(int levels, SolverOptions options) {
        int[] standard = doubling(COARSEST, levels);
        int[] fluxWall = doubling(COARSEST, levels);
        List<VerificationCase> cases = new ArrayList<>();
        cases.add(couetteStartUp(standard, options));
        cases.add(stokesFirstProblem(standard, options));
        cases.add(stokesSecondProblem(standard, options));
        cases.add(oscillatingGap(standard, options));
        cases.add(couettePoiseuilleStartUp(standard));
        cases.add(couettePoiseuilleSteady(standard));
        cases.add(viscousHeatingTwoTemperatures(standard));
        cases.add(viscousHeatingAdiabaticWall(fluxWall));
        cases.add(nahmeBothWallsAtT0(doubling(NAHME_COARSEST, levels)));
        cases.add(nahmeAdiabaticWallClustered(doubling(NAHME_COARSEST, levels)));
        cases.add(heatedFilmStartUp(standard, options));
        return cases;
    }

    /** {@code levels} node counts from {@code coarsest}, the spacing halved each time: n_k = 2 n_(k-1) - 1. */
    public static int[] doubling(int coarsest, int levels) {
        int[] points = new int[levels];
        points[0] = coarsest;
        for (int k = 1; k < levels; k++) {
            points[k] = 2 * points[k - 1] - 1;
        }
        return points;
    }

    /** The oil with a viscosity law, constant density, specific heat and conductivity. */
    static Fluid oil(ViscosityLaw law) {
        return new Fluid(DensityLaw.constant(DENSITY), law, PropertyLaw.constant(SPECIFIC_HEAT),
                PropertyLaw.constant(CONDUCTIVITY));
    }

    /** Upper wall set impulsively moving at 1 m/s over fluid at rest; compared at nu t / h^2 = 0.1. */
    public static VerificationCase couetteStartUp(int[] points, SolverOptions options) {
        double speed = 1;
        double end = 0.1 * MOMENTUM_TIME;
        FilmPhysics physics = FilmPhysics.isothermalCouette(GAP, DENSITY, VISCOSITY, new WallMotion.Steady(0),
                new WallMotion.Steady(speed));
        ConstantPropertyFilm exact = new ConstantPropertyFilm(GAP, DENSITY, VISCOSITY, new WallMotion.Steady(0),
                new WallMotion.Steady(speed), 0, 0);
        return transientFilm("Couette start-up (impulsive)", exact.source(),
                "rho du/dt = mu d2u/dy2, u(0, t) = 0, u(h, t) = U for t > 0, u(y, 0) = 0; h = 100 um, "
                        + "rho = 870 kg/m^3, mu = 0.04 Pa s, U = 1 m/s; compared at nu t/h^2 = 0.1",
                FilmCase.until(physics, end), 0, exact, points, 1, options);
    }

    /**
     * Stokes' first problem: a wall started impulsively at 1 m/s under fluid at rest, compared at t = 10 ms, the
     * domain truncated at 12 sqrt(nu t) (the exact solution there is erfc(6) = 2e-17 of the wall speed).
     */
    public static VerificationCase stokesFirstProblem(int[] points, SolverOptions options) {
        double end = 0.01;
        double nu = VISCOSITY / DENSITY;
        double depth = 12 * Math.sqrt(nu * end);
        FilmPhysics physics = new FilmPhysics(new Domain.SemiInfinite(depth),
                Fluid.isothermal(DENSITY, new ConstantViscosity(VISCOSITY)), Wall.isothermal(new WallMotion.Steady(1)),
                null, 0, 0, Double.NaN, null, null);
        StokesFirstProblem exact = new StokesFirstProblem(DENSITY, VISCOSITY, new WallMotion.Steady(1), 0);
        return transientFilm("Stokes' first problem", exact.source(),
                "rho du/dt = mu d2u/dy2 for y > 0, u(0, t) = U for t > 0, u(y, 0) = 0, u -> 0 far away; exact "
                        + "u = U erfc(y / (2 sqrt(nu t))); rho = 870 kg/m^3, mu = 0.04 Pa s, U = 1 m/s; compared at "
                        + "t = 10 ms on a domain truncated at 12 sqrt(nu t) = 8.1 mm, grid clustered at the wall (0.5)",
                FilmCase.until(physics, end), 0.5, exact, points, 1, options);
    }

    /**
     * Stokes' second problem: a wall started from rest oscillating as U sin(omega t), 50 Hz, compared after 1.25
     * periods; the domain truncated at 30 penetration depths.
     */
    public static VerificationCase stokesSecondProblem(int[] points, SolverOptions options) {
        double frequency = 50;
        double end = 1.25 / frequency;
        double nu = VISCOSITY / DENSITY;
        double delta = Math.sqrt(2 * nu / (2 * Math.PI * frequency));
        double depth = Math.max(30 * delta, 12 * Math.sqrt(nu * end));
        WallMotion.Sine wall = new WallMotion.Sine(0, 1, frequency, 0);
        FilmPhysics physics = new FilmPhysics(new Domain.SemiInfinite(depth),
                Fluid.isothermal(DENSITY, new ConstantViscosity(VISCOSITY)), Wall.isothermal(wall), null, 0, 0,
                Double.NaN, null, null);
        StokesSecondProblem exact = new StokesSecondProblem(DENSITY, VISCOSITY, wall, 0);
        return transientFilm("Stokes' second problem", exact.source(),
                "rho du/dt = mu d2u/dy2 for y > 0, u(0, t) = U sin(omega t), u(y, 0) = 0, u -> 0 far away; "
                        + "rho = 870 kg/m^3, mu = 0.04 Pa s, U = 1 m/s, 50 Hz (penetration depth sqrt(2 nu/omega) = "
                        + String.format(Locale.ROOT, "%.3g", delta * 1e3) + " mm); compared after 1.25 periods on a domain truncated "
                        + "at 30 penetration depths, grid clustered at the wall (0.7)",
                FilmCase.until(physics, end), STOKES_LAYER_CLUSTERING, exact, points, 1, options);
    }

    /**
     * Oscillating Couette flow in a finite gap: the lower wall oscillates from rest as U sin(omega t) with
     * h sqrt(omega / 2 nu) = 3 (a Stokes layer inside the gap), the upper wall at rest; compared after 1.25 periods.
     */
    public static VerificationCase oscillatingGap(int[] points, SolverOptions options) {
        double nu = VISCOSITY / DENSITY;
        double omega = 2 * nu * 9 / (GAP * GAP);
        double frequency = omega / (2 * Math.PI);
        double end = 1.25 / frequency;
        WallMotion.Sine lower = new WallMotion.Sine(0, 1, frequency, 0);
        FilmPhysics physics = FilmPhysics.isothermalCouette(GAP, DENSITY, VISCOSITY, lower, new WallMotion.Steady(0));
        ConstantPropertyFilm exact = new ConstantPropertyFilm(GAP, DENSITY, VISCOSITY, lower, new WallMotion.Steady(0),
                0, 0);
        return transientFilm("Oscillating Couette flow, finite gap", exact.source(),
                "rho du/dt = mu d2u/dy2, u(0, t) = U sin(omega t), u(h, t) = 0, u(y, 0) = 0; h = 100 um, "
                        + "rho = 870 kg/m^3, mu = 0.04 Pa s, U = 1 m/s, h sqrt(omega/(2 nu)) = 3; compared after "
                        + "1.25 periods",
                FilmCase.until(physics, end), 0, exact, points, 1, options);
    }

    /**
     * Start-up of Couette–Poiseuille flow: the upper wall ramped to 2 m/s over 0.002 h^2/nu with dp/dx = -3e6 Pa/m,
     * compared at nu t / h^2 = 0.1, on grids clustered at both walls (0.6); grid only, the time error made negligible.
     */
    public static VerificationCase couettePoiseuilleStartUp(int[] points) {
        double end = 0.1 * MOMENTUM_TIME;
        double gradient = -3e6;
        WallMotion upper = new WallMotion.Ramp(0, 2, 0, 0.02 * end);
        FilmPhysics physics = FilmPhysics.isothermalCouette(GAP, DENSITY, VISCOSITY, new WallMotion.Steady(0), upper)
                .withPressureGradient(gradient);
        ConstantPropertyFilm exact = new ConstantPropertyFilm(GAP, DENSITY, VISCOSITY, new WallMotion.Steady(0), upper,
                gradient, 0);
        FilmCase base = FilmCase.until(physics, end).withTolerance(SPACE_ONLY_TOLERANCE);
        List<Level> levels = new ArrayList<>();
        for (int n : points) {
            levels.add(Level.grid(n));
        }
        return new VerificationCase("Couette-Poiseuille start-up, clustered grid", VerificationCase.Kind.ANALYTIC,
                exact.source(),
                "rho du/dt = mu d2u/dy2 - dp/dx, u(0, t) = 0, u(h, t) ramped from 0 to 2 m/s over 0.002 h^2/nu, "
                        + "u(y, 0) = 0; h = 100 um, rho = 870 kg/m^3, mu = 0.04 Pa s, dp/dx = -3e6 Pa/m; compared at "
                        + "nu t/h^2 = 0.1; grid clustered at both walls (0.6)",
                "grid only; adaptive time steps at a tolerance of " + SPACE_ONLY_TOLERANCE
                        + " make the time error negligible",
                levels, velocityAndBothStresses(),
                level -> profileAndStresses(FilmSolver.solve(base.withGrid(new GridSpec(level.points(), 0.6))), exact,
                        end, true));
    }

    /** Steady Couette–Poiseuille flow (a parabola): reproduced to round-off on a clustered grid. */
    public static VerificationCase couettePoiseuilleSteady(int[] points) {
        double gradient = -3e6;
        FilmPhysics physics = FilmPhysics.isothermalCouette(GAP, DENSITY, VISCOSITY, new WallMotion.Steady(0),
                new WallMotion.Steady(2)).withPressureGradient(gradient);
        CouettePoiseuilleFlow exact = new CouettePoiseuilleFlow(GAP, VISCOSITY, 0, 2, gradient);
        FilmCase base = FilmCase.steady(physics);
        double speed = 2;
        double stressScale = VISCOSITY * speed / GAP;
        List<Check> checks = List.of(
                Check.roundOff("velocity, max over nodes", "m/s", ROUND_OFF_FRACTION * speed),
                Check.roundOff("wall shear stress, lower wall", "Pa", ROUND_OFF_FRACTION * stressScale),
                Check.roundOff("wall shear stress, upper wall", "Pa", ROUND_OFF_FRACTION * stressScale));
        return steadyCase("Couette-Poiseuille, steady", exact.source(),
                "0 = mu d2u/dy2 - dp/dx, u(0) = 0, u(h) = 2 m/s; h = 100 um, mu = 0.04 Pa s, dp/dx = -3e6 Pa/m "
                        + "(a parabola); grid clustered at both walls (0.6)",
                points, checks, level -> profileAndStresses(FilmSolver.solve(
                        base.withGrid(new GridSpec(level.points(), 0.6))), exact, Double.POSITIVE_INFINITY, true));
    }

    /**
     * Steady Couette flow with viscous heating, walls at two temperatures (Brinkman number 8): linear velocity and
     * quadratic temperature, reproduced to round-off.
     */
    public static VerificationCase viscousHeatingTwoTemperatures(int[] points) {
        double speed = 10;
        double brinkman = 8;
        double upperTemperature = WALL_TEMPERATURE + VISCOSITY * speed * speed / (CONDUCTIVITY * brinkman);
        ThermalCondition lower = new ThermalCondition.FixedTemperature(WALL_TEMPERATURE);
        ThermalCondition upper = new ThermalCondition.FixedTemperature(upperTemperature);
        return viscousHeating("Couette viscous heating, walls at two temperatures",
                "walls at T0 = 313.15 K and T0 + mu U^2/(k Br) with Br = 8", speed, lower, upper, points);
    }

    /** Steady Couette flow with viscous heating, the moving wall adiabatic: reproduced to round-off. */
    public static VerificationCase viscousHeatingAdiabaticWall(int[] points) {
        return viscousHeating("Couette viscous heating, adiabatic moving wall",
                "lower wall at T0 = 313.15 K, moving upper wall adiabatic", 10,
                new ThermalCondition.FixedTemperature(WALL_TEMPERATURE), ThermalCondition.HeatFlux.ADIABATIC, points);
    }

    private static VerificationCase viscousHeating(String name, String walls, double speed, ThermalCondition lower,
                                                   ThermalCondition upper, int[] points) {
        FilmPhysics physics = new FilmPhysics(new Domain.Gap(GAP), oil(new ConstantViscosity(VISCOSITY)),
                new Wall(new WallMotion.Steady(0), lower), new Wall(new WallMotion.Steady(speed), upper), 0, 0,
                WALL_TEMPERATURE, null, null);
        CouetteViscousHeating exact = new CouetteViscousHeating(GAP, VISCOSITY, CONDUCTIVITY, 0, speed, lower, upper);
        FilmCase base = FilmCase.steady(physics);
        double stressScale = VISCOSITY * speed / GAP;
        double fluxScale = stressScale * speed;
        List<Check> checks = List.of(
                Check.roundOff("temperature, max over nodes", "K", ROUND_OFF_FRACTION * WALL_TEMPERATURE),
                Check.roundOff("wall shear stress, lower wall", "Pa", ROUND_OFF_FRACTION * stressScale),
                Check.roundOff("heat flux into the lower wall", "W/m^2", ROUND_OFF_FRACTION * fluxScale),
                Check.roundOff("heat flux into the upper wall", "W/m^2", ROUND_OFF_FRACTION * fluxScale));
        return steadyCase(name, exact.source(),
                "0 = d/dy(mu du/dy), 0 = k d2T/dy2 + mu (du/dy)^2, u(0) = 0, u(h) = U; " + walls + "; h = 100 um, "
                        + "mu = 0.04 Pa s, k = 0.13 W/(m K), U = " + (int) speed + " m/s; grid clustered at both "
                        + "walls (0.6)",
                points, checks, level -> {
                    FilmResult r = FilmSolver.solve(base.withGrid(new GridSpec(level.points(), 0.6)));
                    return new double[] {
                        maxTemperatureError(r.finalSnapshot(), exact, Double.POSITIVE_INFINITY),
                        Math.abs(r.summary().wallShearStressLower() - exact.shearStress()),
                        Math.abs(r.summary().heatFluxIntoLowerWall() - exact.heatFluxIntoLowerWall()),
                        Math.abs(r.summary().heatFluxIntoUpperWall() - exact.heatFluxIntoUpperWall())};
                });
    }

    /** The Nahme problem at Nahme number 10, both walls at T0, uniform grids. */
    public static VerificationCase nahmeBothWallsAtT0(int[] points) {
        return nahme("Nahme-Griffith, exponential viscosity, walls at T0", NahmeCouette.Walls.BOTH_AT_WALL_TEMPERATURE,
                0, points);
    }

    /** The Nahme problem at Nahme number 10, the moving wall adiabatic, grids clustered at the walls (0.6). */
    public static VerificationCase nahmeAdiabaticWallClustered(int[] points) {
        return nahme("Nahme-Griffith, exponential viscosity, adiabatic wall, clustered grid",
                NahmeCouette.Walls.UPPER_ADIABATIC, 0.6, points);
    }

    private static VerificationCase nahme(String name, NahmeCouette.Walls walls, double clustering, int[] points) {
        double beta = 0.03;
        double nahme = 10;
        double speed = Math.sqrt(nahme * CONDUCTIVITY / (beta * VISCOSITY));
        // the law's stated range covers the largest rise, ln(1 + Na/2)/beta = 60 K
        ExponentialViscosity law = new ExponentialViscosity(VISCOSITY, WALL_TEMPERATURE, beta, WALL_TEMPERATURE - 10,
                WALL_TEMPERATURE + 120);
        ThermalCondition atT0 = new ThermalCondition.FixedTemperature(WALL_TEMPERATURE);
        ThermalCondition upper = walls == NahmeCouette.Walls.UPPER_ADIABATIC ? ThermalCondition.HeatFlux.ADIABATIC : atT0;
        FilmPhysics physics = new FilmPhysics(new Domain.Gap(GAP), oil(law), new Wall(new WallMotion.Steady(0), atT0),
                new Wall(new WallMotion.Steady(speed), upper), 0, 0, WALL_TEMPERATURE, null, null);
        NahmeCouette exact = new NahmeCouette(GAP, 0, speed, VISCOSITY, beta, CONDUCTIVITY, WALL_TEMPERATURE, walls);
        FilmCase base = FilmCase.steady(physics);
        List<Check> checks = List.of(
                Check.secondOrder("velocity, max over nodes", "m/s"),
                Check.secondOrder("temperature, max over nodes", "K"),
                Check.secondOrder("wall shear stress, lower wall", "Pa"),
                Check.secondOrder("highest temperature", "K"));
        return steadyCase(name, exact.source(),
                "0 = d/dy(mu(T) du/dy), 0 = k d2T/dy2 + mu(T) (du/dy)^2, mu = mu0 exp(-beta (T - T0)); u(0) = 0, "
                        + "u(h) = U; lower wall at T0, upper wall "
                        + (walls == NahmeCouette.Walls.UPPER_ADIABATIC ? "adiabatic" : "at T0") + "; h = 100 um, "
                        + "mu0 = 0.04 Pa s, beta = 0.03 1/K, k = 0.13 W/(m K), T0 = 313.15 K, Nahme number "
                        + "beta mu0 U^2/k = 10" + (clustering > 0 ? "; grid clustered at both walls (" + clustering + ")"
                        : ""),
                points, checks, level -> {
                    FilmResult r = FilmSolver.solve(base.withGrid(new GridSpec(level.points(), clustering)));
                    return new double[] {
                        maxVelocityError(r.finalSnapshot(), exact, Double.POSITIVE_INFINITY),
                        maxTemperatureError(r.finalSnapshot(), exact, Double.POSITIVE_INFINITY),
                        Math.abs(r.summary().wallShearStressLower() - exact.shearStress()),
                        Math.abs(r.summary().maxTemperature() - exact.maxTemperature())};
                });
    }

    /**
     * Thermal start-up of a film heated by a uniform source S = mu (U/h)^2 for U = 10 m/s, walls at rest and at
     * T0, compared at alpha t / h^2 = 0.1.
     */
    public static VerificationCase heatedFilmStartUp(int[] points, SolverOptions options) {
        double source = VISCOSITY * (10 / GAP) * (10 / GAP);
        double end = 0.1 * THERMAL_TIME;
        ThermalCondition atT0 = new ThermalCondition.FixedTemperature(WALL_TEMPERATURE);
        FilmPhysics physics = new FilmPhysics(new Domain.Gap(GAP), oil(new ConstantViscosity(VISCOSITY)),
                new Wall(new WallMotion.Steady(0), atT0), new Wall(new WallMotion.Steady(0), atT0), 0, 0,
                WALL_TEMPERATURE, null, (y, t) -> source);
        HeatedFilmStartup exact = new HeatedFilmStartup(GAP, CONDUCTIVITY, CONDUCTIVITY / (DENSITY * SPECIFIC_HEAT),
                source, WALL_TEMPERATURE);
        FilmCase base = FilmCase.until(physics, end);
        List<Check> checks = List.of(
                Check.secondOrder("temperature, max over nodes", "K"),
                Check.secondOrder("heat flux into the lower wall", "W/m^2"));
        return new VerificationCase("Heated film start-up", VerificationCase.Kind.ANALYTIC,
                "H. S. Carslaw, J. C. Jaeger, Conduction of Heat in Solids, 2nd ed., 1959, section 3.3 (form); series "
                        + "derived and checked for filmshear (references.md 7(f))",
                "rho cp dT/dt = k d2T/dy2 + S, T(0, t) = T(h, t) = T0, T(y, 0) = T0, walls at rest; h = 100 um, "
                        + "rho = 870 kg/m^3, cp = 1950 J/(kg K), k = 0.13 W/(m K), S = mu (U/h)^2 with mu = 0.04 Pa s, "
                        + "U = 10 m/s; compared at alpha t/h^2 = 0.1",
                together(1, options), togetherLevels(points, end, 1), checks, level -> {
                    FilmResult r = solveAt(base, level, 0, options);
                    Snapshot s = r.finalSnapshot();
                    double[] y = s.y();
                    double[] temperature = s.temperature();
                    double max = 0;
                    for (int i = 0; i < y.length; i++) {
                        max = Math.max(max, Math.abs(temperature[i] - exact.temperature(y[i], end)));
                    }
                    return new double[] {max,
                        Math.abs(r.summary().heatFluxIntoLowerWall() - exact.heatFluxIntoEachWall(end))};
                });
    }

    /** A transient isothermal case refined in grid and step together, checking the profile and the wall stresses. */
    private static VerificationCase transientFilm(String name, String source, String equations, FilmCase base,
                                                  double clustering, AnalyticSolution exact, int[] points,
                                                  double stepsPerInterval, SolverOptions options) {
        double end = base.endTime();
        boolean upper = exact.hasUpperWall();
        return new VerificationCase(name, VerificationCase.Kind.ANALYTIC, source, equations,
                together(stepsPerInterval, options),
                togetherLevels(points, end, stepsPerInterval), upper ? velocityAndBothStresses()
                        : List.of(Check.secondOrder("velocity, max over nodes", "m/s"),
                                Check.secondOrder("wall shear stress, lower wall", "Pa")),
                level -> profileAndStresses(solveAt(base, level, clustering, options), exact, end, upper));
    }

    private static VerificationCase steadyCase(String name, String source, String equations, int[] points,
                                               List<Check> checks, VerificationCase.Measurement measurement) {
        return new VerificationCase(name, VerificationCase.Kind.ANALYTIC, source, equations,
                "grid only; steady solve (no time error)", gridLevels(points), checks, measurement);
    }

    /** The refinement in words, naming the options' scheme. */
    static String together(double stepsPerInterval, SolverOptions options) {
        String scheme = options.scheme().name().replace('_', '-');
        return "grid and time step together: " + (stepsPerInterval == 1 ? "one " + scheme + " step"
                : stepsPerInterval + " " + scheme + " steps") + " per grid interval, dt proportional to dy";
    }

    private static List<Level> togetherLevels(int[] points, double end, double stepsPerInterval) {
        List<Level> levels = new ArrayList<>();
        for (int n : points) {
            levels.add(Level.refinedTogether(n, end, stepsPerInterval));
        }
        return levels;
    }

    static List<Level> gridLevels(int[] points) {
        List<Level> levels = new ArrayList<>();
        for (int n : points) {
            levels.add(Level.grid(n));
        }
        return levels;
    }

    private static List<Check> velocityAndBothStresses() {
        return List.of(Check.secondOrder("velocity, max over nodes", "m/s"),
                Check.secondOrder("wall shear stress, lower wall", "Pa"),
                Check.secondOrder("wall shear stress, upper wall", "Pa"));
    }

    /** Solves {@code base} on the level's grid, with its fixed step when it has one. */
    static FilmResult solveAt(FilmCase base, Level level, double clustering, SolverOptions options) {
        FilmCase c = base.withGrid(new GridSpec(level.points(), clustering));
        return level.hasTimeStep() ? FilmSolver.solve(c, options.withStepControl(StepControl.Fixed.of(level.timeStep())))
                : FilmSolver.solve(c, options);
    }

    private static double[] profileAndStresses(FilmResult r, AnalyticSolution exact, double t, boolean upper) {
        double velocity = maxVelocityError(r.finalSnapshot(), exact, t);
        double lower = Math.abs(r.summary().wallShearStressLower() - exact.wallShearStressLower(t));
        return upper ? new double[] {velocity, lower,
            Math.abs(r.summary().wallShearStressUpper() - exact.wallShearStressUpper(t))}
                : new double[] {velocity, lower};
    }

    static double maxVelocityError(Snapshot s, AnalyticSolution exact, double t) {
        return maxError(s.y(), s.velocity(), y -> exact.velocity(y, t));
    }

    static double maxTemperatureError(Snapshot s, AnalyticSolution exact, double t) {
        return maxError(s.y(), s.temperature(), y -> exact.temperature(y, t));
    }

    private static double maxError(double[] y, double[] values, DoubleUnaryOperator exact) {
        double max = 0;
        for (int i = 0; i < y.length; i++) {
            max = Math.max(max, Math.abs(values[i] - exact.applyAsDouble(y[i])));
        }
        return max;
    }
}
