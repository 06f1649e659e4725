package dev.filmshear.validation.mms;

import dev.filmshear.solver.base.InvalidParameterException;
import dev.filmshear.solver.model.FilmCase;
import dev.filmshear.solver.model.FilmResult;
import dev.filmshear.solver.model.GridSpec;
import dev.filmshear.solver.model.Horizon;
import dev.filmshear.solver.model.Snapshot;
import dev.filmshear.solver.model.SolverOptions;
import dev.filmshear.solver.physics.ThermalCondition;
import dev.filmshear.solver.physics.ViscosityLaw;

import java.util.List;
import java.util.Objects;

/**
 * A runnable manufactured-solution case: a {@link ManufacturedSolution}, the walls' thermal conditions, an
 * end time, the grid's clustering and the number of time steps per grid interval (so that the step is
 * refined with the grid, dt proportional to dy, in a {@link ConvergenceStudy}).
 *
 * <p>The constructor checks what makes the case a fair test, so that a wrong variant fails at once rather than
 * as a puzzling order of accuracy:
 * <ul>
 *   <li>the fields are uniform at t = 0, because the solver starts from a uniform velocity and temperature
 *       (and fixed wall temperatures equal to it);</li>
 *   <li>at t = 0 and at eight times up to the end, each wall's condition holds for the fields: a fixed
 *       temperature equals T_m there, a heat flux into the fluid equals -k dT_m/dy at y = 0 (+k dT_m/dy at
 *       y = L), a heat-transfer wall's flux equals h (T_ambient - T_m); the far field of a semi-infinite film
 *       has zero du_m/dy and dT_m/dy;</li>
 *   <li>the temperatures reached lie inside the viscosity law's validity range.</li>
 * </ul>
 * Between the sampled times the conditions hold because the thermal conditions used are homogeneous in
 * T - T0 and the fields' temperature terms vanish or have zero slope where they must for every t; the
 * samples catch a shape that does not.
 *
 * <p>The error measure is the largest difference over the nodes at the end time, max_i |u_i - u_m(y_i)| and
 * max_i |T_i - T_m(y_i)|.
 *
 * @param name a short name for tables
 * @param solution the manufactured fields and fluid
 * @param lowerThermal thermal condition of the lower wall
 * @param upperThermal thermal condition of the upper wall; null for a semi-infinite film
 * @param endTime s
 * @param clustering grid clustering, 0 (uniform) to 1
 * @param stepsPerInterval time steps per grid interval: a grid of n nodes runs (n - 1) times this many equal
 *     steps to the end; a whole number keeps every step equal
 */
public record ManufacturedCase(String name, ManufacturedSolution solution, ThermalCondition lowerThermal,
                               ThermalCondition upperThermal, double endTime, double clustering,
                               double stepsPerInterval) {
    /** Name of the velocity error measure. */
    public static final String VELOCITY_ERROR = "velocity error";
    /** Name of the temperature error measure. */
    public static final String TEMPERATURE_ERROR = "temperature error";
    /** Fields count as uniform at t = 0 when they vary by less than this (m/s or K): round-off only. */
    static final double UNIFORM_SLACK = 1e-12;
    /** A fixed wall temperature must equal T_m there to this (K): round-off of T near 300 K. */
    static final double WALL_TEMPERATURE_SLACK = 1e-9;
    /** A wall heat flux must equal the fields' to this fraction of the flux scale k sum|A_i| / L. */
    static final double WALL_FLUX_SLACK = 1e-9;
    /** Samples across the film and in time for the checks above. */
    private static final int SAMPLES = 8;

    /** The max-norm errors at the end time. */
    public record FieldErrors(double velocity, double temperature) {
    }

    public ManufacturedCase {
        Objects.requireNonNull(name, "name");
        Objects.requireNonNull(solution, "solution");
        Objects.requireNonNull(lowerThermal, "lower_thermal");
        if (solution.isSemiInfinite() != (upperThermal == null)) {
            throw new InvalidParameterException("upper_thermal", String.valueOf(upperThermal),
                    solution.isSemiInfinite() ? "none for a semi-infinite film" : "a condition for the upper wall");
        }
        InvalidParameterException.requirePositive("end", endTime, "s");
        if (!(clustering >= 0 && clustering <= 1)) {
            throw new InvalidParameterException("clustering", Double.toString(clustering), "0 to 1");
        }
        InvalidParameterException.requirePositive("steps_per_interval", stepsPerInterval, "");
        requireUniformStart(solution);
        for (int k = 0; k <= SAMPLES; k++) {
            double t = endTime * k / SAMPLES;
            requireWall(solution, lowerThermal, 0, t);
            if (upperThermal != null) {
                requireWall(solution, upperThermal, 1, t);
            } else {
                requireFarField(solution, t);
            }
        }
        requireValidViscosity(solution, endTime);
    }

    private static void requireUniformStart(ManufacturedSolution s) {
        double u0 = s.velocity().value(0, 0);
        double t0 = s.temperature().value(0, 0);
        for (int i = 1; i <= SAMPLES; i++) {
            double eta = (double) i / SAMPLES;
            if (Math.abs(s.velocity().value(eta, 0) - u0) > UNIFORM_SLACK
                    || Math.abs(s.temperature().value(eta, 0) - t0) > UNIFORM_SLACK) {
                throw new InvalidParameterException("fields", "not uniform at t = 0 (eta = " + eta + ")",
                        "uniform initial fields: the solver starts from a uniform state");
            }
        }
    }

    private static void requireWall(ManufacturedSolution s, ThermalCondition condition, double eta, double t) {
        double y = eta * s.extent();
        double wallTemperature = s.temperature(y, t);
        if (condition instanceof ThermalCondition.FixedTemperature fixed) {
            if (Math.abs(wallTemperature - fixed.temperature()) > WALL_TEMPERATURE_SLACK) {
                throw mismatch(condition, eta, t, "T_m = " + wallTemperature + " K");
            }
            return;
        }
        double k = s.fluid().conductivity().reference();
        // heat flux into the fluid: -k dT/dy at the lower wall, +k dT/dy at the upper wall
        double inflow = (eta == 0 ? -1 : 1) * k * s.temperatureGradient(y, t);
        double required = condition instanceof ThermalCondition.HeatFlux flux ? flux.flux()
                : ((ThermalCondition.HeatTransfer) condition).coefficient()
                        * (((ThermalCondition.HeatTransfer) condition).ambient() - wallTemperature);
        if (Math.abs(inflow - required) > WALL_FLUX_SLACK * fluxScale(s)) {
            throw mismatch(condition, eta, t, "heat flux into the fluid " + inflow + " W/m^2, condition " + required);
        }
    }

    private static void requireFarField(ManufacturedSolution s, double t) {
        double l = s.extent();
        if (Math.abs(s.velocity().slope(1, t)) > UNIFORM_SLACK || Math.abs(s.temperature().slope(1, t))
                > WALL_FLUX_SLACK * fluxScale(s) * l / s.fluid().conductivity().reference()) {
            throw new InvalidParameterException("fields", "shear or heat flux at the truncation depth at t = " + t
                    + " s", "zero du/dy and dT/dy at the depth (the solver's far-field condition)");
        }
    }

    /** k sum|A_i| / L (W/m^2): the size of the heat fluxes the temperature terms can carry. */
    private static double fluxScale(ManufacturedSolution s) {
        double sum = 0;
        for (Field.Term term : s.temperature().terms()) {
            sum += Math.abs(term.amplitude());
        }
        return Math.max(1, s.fluid().conductivity().reference() * sum / s.extent());
    }

    private static InvalidParameterException mismatch(ThermalCondition condition, double eta, double t, String found) {
        return new InvalidParameterException(eta == 0 ? "lower_thermal" : "upper_thermal",
                condition + " with " + found + " at t = " + t + " s", "a condition the manufactured fields meet");
    }

    private static void requireValidViscosity(ManufacturedSolution s, double end) {
        ViscosityLaw law = s.fluid().viscosity();
        for (int k = 0; k <= 4 * SAMPLES; k++) {
            for (int i = 0; i <= 4 * SAMPLES; i++) {
                double temperature = s.temperature().value((double) i / (4 * SAMPLES), end * k / (4 * SAMPLES));
                if (!law.isValidAt(temperature)) {
                    throw new InvalidParameterException("temperature", temperature + " K",
                            "inside the viscosity law's range " + law.validFrom() + " K to " + law.validTo() + " K");
                }
            }
        }
    }

    /** The solver's case on a grid of {@code points} nodes (the case's clustering, default tolerance). */
    public FilmCase filmCase(int points) {
        return new FilmCase(solution.physics(lowerThermal, upperThermal), new Horizon.Until(endTime),
                new GridSpec(points, clustering), FilmCase.DEFAULT_TOLERANCE, null);
    }

    /** max_i |u_i - u_m| and max_i |T_i - T_m| over the nodes at the end time of {@code result}. */
    public FieldErrors errors(FilmResult result) {
        Snapshot s = result.finalSnapshot();
        if (s.time() != endTime) {
            throw new IllegalArgumentException("the result ends at " + s.time() + " s, the case at " + endTime + " s");
        }
        double[] y = s.y();
        double[] u = s.velocity();
        double[] temperature = s.temperature();
        double velocityError = 0;
        double temperatureError = 0;
        for (int i = 0; i < y.length; i++) {
            velocityError = Math.max(velocityError, Math.abs(u[i] - solution.velocity(y[i], endTime)));
            temperatureError = Math.max(temperatureError,
                    Math.abs(temperature[i] - solution.temperature(y[i], endTime)));
        }
        return new FieldErrors(velocityError, temperatureError);
    }

    /** The two error measures, for a {@link ConvergenceStudy}: {@value #VELOCITY_ERROR} (m/s) and
     * {@value #TEMPERATURE_ERROR} (K). */
    public List<ConvergenceStudy.Measure> measures() {
        return List.of(new ConvergenceStudy.Measure(VELOCITY_ERROR, r -> errors(r).velocity()),
                new ConvergenceStudy.Measure(TEMPERATURE_ERROR, r -> errors(r).temperature()));
    }

    /** Runs the case on the default grids with TR-BDF2 and the step refined with the grid. */
    public ConvergenceStudy.Result study() {
        return study(ConvergenceStudy.DEFAULT_POINTS, SolverOptions.defaults());
    }

    /** Runs the case on grids of {@code points} nodes with {@code options}' scheme, steps refined with the grid. */
    public ConvergenceStudy.Result study(int[] points, SolverOptions options) {
        return ConvergenceStudy.run(filmCase(points[0]), measures(), points, stepsPerInterval, options);
    }
}
