package dev.filmshear.validation.mms;

import dev.filmshear.solver.physics.DensityLaw;
import dev.filmshear.solver.physics.Domain;
import dev.filmshear.solver.physics.ExponentialViscosity;
import dev.filmshear.solver.physics.Fluid;
import dev.filmshear.solver.physics.PropertyLaw;
import dev.filmshear.solver.physics.ThermalCondition;

import java.util.List;

/**
 * The manufactured-solution cases that together exercise every term of the film equations and every kind of
 * boundary the solver has (method of manufactured solutions: K. Salari and P. Knupp, SAND2000-1444, 2000).
 *
 * <p>All start from the solution of references.md 10.1: an oil film (h = 100 um, rho = 870 kg/m^3,
 * cp = 1950 J/(kg K), k = 0.13 W/(m K), mu = 0.04 Pa s exp(-0.03/K (T - 313.15 K))), U = 1 m/s, a = 0.3,
 * omega = 100 1/s, dT = 5 K, b = 0.5, run to t = 0.01 s (omega t = 1). Its time factors are changed so that
 * the fields are uniform at t = 0, as the solver's initial state is:
 * <pre>
 *   u_m = U [ X_u(eta) sin(omega t) + a Y_u(eta) (1 - cos(omega t)) ]
 *   T_m = T0 + dT Y_T(eta) (1 - cos(omega t) + b sin(omega t))
 * </pre>
 * and the shapes are chosen per case so that the wall conditions hold for every t. Each thermal condition
 * used is homogeneous in T - T0 (fixed at T0, adiabatic, heat transfer to an ambient at T0), so a shape
 * meeting it once meets it at every t. A constant non-zero wall heat flux cannot be manufactured this way:
 * with a uniform start the wall slope is zero at t = 0 and a constant flux would make the exact solution
 * non-smooth there, so the heat-flux row is exercised by the adiabatic wall.
 * <ol>
 *   <li>{@link #fixedWalls()}: both walls at T0; X_u = eta, Y_u = Y_T = sin(pi eta) (the shapes of 10.1).</li>
 *   <li>{@link #adiabaticWall()}: lower wall adiabatic, upper at T0; Y_T = cos(pi eta/2), zero slope at
 *       eta = 0.</li>
 *   <li>{@link #heatTransferWall()}: upper wall losing heat to an ambient at T0 through h = k/h_gap (Biot
 *       number 1), lower at T0; Y_T = sin(pi eta/2) + (Bi/pi) sin(pi eta), so that k dT/dy = -h (T - T0) at
 *       eta = 1.</li>
 *   <li>{@link #semiInfinite()}: one wall moving as U sin(omega t) at T0, the fluid truncated at depth
 *       L = 100 um with no shear and no heat flux there; X_u = (1 + cos(pi eta))/2, Y_u = Y_T = sin(pi eta/2),
 *       all with zero slope at eta = 1.</li>
 *   <li>{@link #clusteredGrid()}: case 1 on a grid clustered towards both walls (clustering 0.7), with a
 *       pressure gradient dp/dx = -2e6 Pa/m added (S_u carries +dp/dx).</li>
 *   <li>{@link #expandingFluid()}: case 1 with rho = 870 kg/m^3 (1 - 7e-4/K (T - 313.15 K)).</li>
 * </ol>
 * Every case runs one TR-BDF2 step per grid interval (20 steps of 0.5 ms on 21 nodes).
 */
public final class ManufacturedCases {
    /** Film thickness, or truncation depth (m). */
    public static final double GAP = 1e-4;
    /** Wall speed scale U (m/s). */
    public static final double SPEED = 1;
    /** Amplitude a of the velocity bump, relative to U. */
    public static final double BUMP = 0.3;
    /** omega (1/s). */
    public static final double OMEGA = 100;
    /** Wall and initial temperature T0 (K). */
    public static final double WALL_TEMPERATURE = 313.15;
    /** Temperature amplitude dT (K). */
    public static final double TEMPERATURE_RISE = 5;
    /** b of the temperature's time factor. */
    public static final double TEMPERATURE_SWING = 0.5;
    /** rho (kg/m^3), cp (J/(kg K)), k (W/(m K)), mu0 (Pa s), beta (1/K): the oil of references.md 10.1. */
    public static final double DENSITY = 870;
    public static final double SPECIFIC_HEAT = 1950;
    public static final double CONDUCTIVITY = 0.13;
    public static final double VISCOSITY = 0.04;
    public static final double VISCOSITY_COEFFICIENT = 0.03;
    /** Thermal expansion of the expanding-fluid case (1/K), a typical oil's. */
    public static final double EXPANSION = 7e-4;
    /** Pressure gradient of the clustered-grid case (Pa/m). */
    public static final double PRESSURE_GRADIENT = -2e6;
    /** Grid clustering of the clustered-grid case. */
    public static final double CLUSTERING = 0.7;
    /** Biot number h_c L / k of the heat-transfer wall. */
    public static final double BIOT = 1;
    /** End time (s): omega t = 1, the spot time of references.md 10.1. */
    public static final double END = 0.01;
    /** Time steps per grid interval. */
    public static final double STEPS_PER_INTERVAL = 1;

    private static final ThermalCondition AT_T0 = new ThermalCondition.FixedTemperature(WALL_TEMPERATURE);

    private ManufacturedCases() {
    }

    /** Every case, in the order of the class comment. */
    public static List<ManufacturedCase> all() {
        return List.of(fixedWalls(), adiabaticWall(), heatTransferWall(), semiInfinite(), clusteredGrid(),
                expandingFluid());
    }

    /** The oil of references.md 10.1 with the given density law. */
    public static Fluid oil(DensityLaw density) {
        return new Fluid(density, ExponentialViscosity.of(VISCOSITY, WALL_TEMPERATURE, VISCOSITY_COEFFICIENT),
                PropertyLaw.constant(SPECIFIC_HEAT), PropertyLaw.constant(CONDUCTIVITY));
    }

    /** u_m = U [X_u sin(omega t) + a Y_u (1 - cos(omega t))] with the given shapes. */
    public static Field velocity(Shape... shapes) {
        Field.Term[] terms = new Field.Term[shapes.length];
        for (int i = 0; i < shapes.length; i++) {
            terms[i] = i == 0 ? new Field.Term(SPEED, Harmonic.sine(OMEGA), shapes[i])
                    : new Field.Term(SPEED * BUMP, Harmonic.oneMinusCosine(OMEGA), shapes[i]);
        }
        return Field.of(0, terms);
    }

    /** T_m = T0 + dT sum_i w_i Y_i (1 - cos(omega t) + b sin(omega t)) for shapes Y_i with weights w_i. */
    public static Field temperature(double[] weights, Shape... shapes) {
        Harmonic phi = new Harmonic(1, TEMPERATURE_SWING, -1, OMEGA);
        Field.Term[] terms = new Field.Term[shapes.length];
        for (int i = 0; i < shapes.length; i++) {
            terms[i] = new Field.Term(TEMPERATURE_RISE * weights[i], phi, shapes[i]);
        }
        return Field.of(WALL_TEMPERATURE, terms);
    }

    /** Case 1: both walls at T0, the shapes of references.md 10.1. */
    public static ManufacturedCase fixedWalls() {
        return fixedWalls("fixed walls", DensityLaw.constant(DENSITY), 0, 0);
    }

    /** Case 2: lower wall adiabatic, upper wall at T0. */
    public static ManufacturedCase adiabaticWall() {
        ManufacturedSolution s = new ManufacturedSolution(new Domain.Gap(GAP), oil(DensityLaw.constant(DENSITY)),
                velocity(new Shape.Linear(), new Shape.Sine(1)),
                temperature(new double[] {1}, new Shape.Cosine(0.5)), 0);
        return new ManufacturedCase("adiabatic lower wall", s, ThermalCondition.HeatFlux.ADIABATIC, AT_T0, END, 0,
                STEPS_PER_INTERVAL);
    }

    /** Case 3: upper wall exchanging heat with an ambient at T0 (Biot number 1), lower wall at T0. */
    public static ManufacturedCase heatTransferWall() {
        ManufacturedSolution s = new ManufacturedSolution(new Domain.Gap(GAP), oil(DensityLaw.constant(DENSITY)),
                velocity(new Shape.Linear(), new Shape.Sine(1)),
                temperature(new double[] {1, BIOT / Math.PI}, new Shape.Sine(0.5), new Shape.Sine(1)), 0);
        ThermalCondition transfer = new ThermalCondition.HeatTransfer(BIOT * CONDUCTIVITY / GAP, WALL_TEMPERATURE);
        return new ManufacturedCase("heat-transfer upper wall", s, AT_T0, transfer, END, 0, STEPS_PER_INTERVAL);
    }

    /** Case 4: one wall, the fluid truncated at depth {@link #GAP} with no shear and no heat flux there. */
    public static ManufacturedCase semiInfinite() {
        Field u = Field.of(0,
                new Field.Term(SPEED / 2, Harmonic.sine(OMEGA), new Shape.Constant()),
                new Field.Term(SPEED / 2, Harmonic.sine(OMEGA), new Shape.Cosine(1)),
                new Field.Term(SPEED * BUMP, Harmonic.oneMinusCosine(OMEGA), new Shape.Sine(0.5)));
        ManufacturedSolution s = new ManufacturedSolution(new Domain.SemiInfinite(GAP),
                oil(DensityLaw.constant(DENSITY)), u, temperature(new double[] {1}, new Shape.Sine(0.5)), 0);
        return new ManufacturedCase("semi-infinite, truncated", s, AT_T0, null, END, 0, STEPS_PER_INTERVAL);
    }

    /** Case 5: case 1 on a grid clustered at the walls (0.7), with a pressure gradient. */
    public static ManufacturedCase clusteredGrid() {
        return fixedWalls("clustered grid, pressure gradient", DensityLaw.constant(DENSITY), CLUSTERING,
                PRESSURE_GRADIENT);
    }

    /** Case 6: case 1 with a density that falls with temperature. */
    public static ManufacturedCase expandingFluid() {
        return fixedWalls("temperature-dependent density", new DensityLaw(DENSITY, WALL_TEMPERATURE, EXPANSION), 0, 0);
    }

    private static ManufacturedCase fixedWalls(String name, DensityLaw density, double clustering, double gradient) {
        ManufacturedSolution s = new ManufacturedSolution(new Domain.Gap(GAP), oil(density),
                velocity(new Shape.Linear(), new Shape.Sine(1)),
                temperature(new double[] {1}, new Shape.Sine(1)), gradient);
        return new ManufacturedCase(name, s, AT_T0, AT_T0, END, clustering, STEPS_PER_INTERVAL);
    }
}
