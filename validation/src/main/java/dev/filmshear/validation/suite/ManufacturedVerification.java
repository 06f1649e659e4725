package dev.filmshear.validation.suite;

import dev.filmshear.solver.model.FilmResult;
import dev.filmshear.solver.model.FilmSolver;
import dev.filmshear.solver.model.SolverOptions;
import dev.filmshear.solver.physics.DensityLaw;
import dev.filmshear.solver.physics.ExponentialViscosity;
import dev.filmshear.solver.physics.Fluid;
import dev.filmshear.solver.physics.ThermalCondition;
import dev.filmshear.solver.time.StepControl;
import dev.filmshear.validation.mms.Field;
import dev.filmshear.validation.mms.Harmonic;
import dev.filmshear.validation.mms.ManufacturedCase;
import dev.filmshear.validation.mms.ManufacturedCases;
import dev.filmshear.validation.mms.ManufacturedSolution;
import dev.filmshear.validation.mms.Shape;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;

/**
 * The manufactured-solution cases of {@link ManufacturedCases} as verification cases (method of manufactured
 * solutions: K. Salari and P. Knupp, <i>Code Verification by the Method of Manufactured Solutions</i>, Sandia report
 * SAND2000-1444, 2000): the full coupled system with a temperature-dependent viscosity, viscous heating, every
 * thermal wall condition, a clustered grid and a semi-infinite domain, each refined in grid and time step together
 * (the case's steps per grid interval, dt proportional to dy), with the max-norm errors of velocity and temperature at
 * the end time checked for order 2.
 *
 * <p>The equations each case prints are generated from its {@link Field}s and fluid, so the report cannot drift from
 * the code.
 */
public final class ManufacturedVerification {
    /** The equations every manufactured case solves, with the sources that make its fields exact. */
    public static final String SYSTEM = "rho(T) du/dt = d/dy(mu(T) du/dy) - dp/dx + S_u,  "
            + "rho(T) cp dT/dt = k d2T/dy2 + mu(T) (du/dy)^2 + S_T, with "
            + "S_u = rho(T_m) du_m/dt - mu(T_m) (d2u_m/dy2 - beta dT_m/dy du_m/dy) + dp/dx and "
            + "S_T = rho(T_m) cp dT_m/dt - k d2T_m/dy2 - mu(T_m) (du_m/dy)^2";
    /** The method's source. */
    public static final String SOURCE = "K. Salari, P. Knupp, Code Verification by the Method of Manufactured "
            + "Solutions, Sandia report SAND2000-1444, 2000; source terms derived for filmshear by substituting the "
            + "fields into the equations (dev.filmshear.validation.mms.ManufacturedSolution) and checked against a "
            + "symbolic derivation";

    private ManufacturedVerification() {
    }

    /** Every case of {@link ManufacturedCases#all()} on the given grids with {@code options}' scheme. */
    public static List<VerificationCase> all(int[] points, SolverOptions options) {
        List<VerificationCase> cases = new ArrayList<>();
        for (ManufacturedCase c : ManufacturedCases.all()) {
            cases.add(of(c, points, options));
        }
        return cases;
    }

    /**
     * One manufactured case on grids of {@code points} nodes, marched with {@code options}' scheme in
     * stepsPerInterval (n - 1) equal steps (the rule of {@link dev.filmshear.validation.mms.ConvergenceStudy}).
     */
    public static VerificationCase of(ManufacturedCase c, int[] points, SolverOptions options) {
        List<Level> levels = new ArrayList<>();
        for (int n : points) {
            levels.add(Level.refinedTogether(n, c.endTime(), c.stepsPerInterval()));
        }
        List<Check> checks = List.of(Check.secondOrder("velocity, max over nodes", "m/s"),
                Check.secondOrder("temperature, max over nodes", "K"));
        String refinement = AnalyticCases.together(c.stepsPerInterval(), options);
        return new VerificationCase("MMS: " + c.name(), VerificationCase.Kind.MANUFACTURED, SOURCE, equations(c),
                refinement, levels, checks, level -> {
                    FilmResult r = FilmSolver.solve(c.filmCase(level.points()),
                            options.withStepControl(StepControl.Fixed.of(level.timeStep())));
                    ManufacturedCase.FieldErrors e = c.errors(r);
                    return new double[] {e.velocity(), e.temperature()};
                });
    }

    /** The case's fields, fluid, walls and grid in plain text. */
    public static String equations(ManufacturedCase c) {
        ManufacturedSolution s = c.solution();
        StringBuilder b = new StringBuilder();
        b.append("u_m = ").append(field(s.velocity(), "m/s")).append("; T_m = ").append(field(s.temperature(), "K"))
                .append("; eta = y/L, L = ").append(number(s.extent() * 1e6)).append(" um")
                .append(s.isSemiInfinite() ? " (truncation depth of a semi-infinite film: no shear and no heat flux "
                        + "there)" : " (the gap)")
                .append(". ").append(fluid(s.fluid()));
        if (s.pressureGradient() != 0) {
            b.append(", dp/dx = ").append(number(s.pressureGradient())).append(" Pa/m");
        }
        b.append(". Lower wall: ").append(thermal(c.lowerThermal()));
        if (c.upperThermal() != null) {
            b.append("; upper wall: ").append(thermal(c.upperThermal()));
        }
        b.append("; wall velocities u_m at the walls. Run to t = ").append(number(c.endTime())).append(" s");
        if (c.clustering() > 0) {
            b.append(" on grids clustered at the walls (").append(number(c.clustering())).append(')');
        }
        return b.append(". Sources: ").append(SYSTEM).append('.').toString();
    }

    /** A field as a sum of its terms: "0.3 m/s (1 - cos(100 t)) sin(pi eta)". */
    static String field(Field f, String unit) {
        StringBuilder b = new StringBuilder();
        if (f.base() != 0 || f.terms().isEmpty()) {
            b.append(number(f.base())).append(' ').append(unit);
        }
        for (Field.Term term : f.terms()) {
            b.append(b.length() == 0 ? "" : term.amplitude() < 0 ? " - " : " + ")
                    .append(number(b.length() == 0 ? term.amplitude() : Math.abs(term.amplitude()))).append(' ')
                    .append(unit);
            String time = harmonic(term.time());
            if (!time.equals("1")) {
                b.append(' ').append(time);
            }
            String shape = shape(term.shape());
            if (!shape.equals("1")) {
                b.append(' ').append(shape);
            }
        }
        return b.toString();
    }

    /** mean + C cos(omega t) + S sin(omega t), omega in 1/s; in parentheses when it has more than one term. */
    static String harmonic(Harmonic g) {
        if (g.isConstant()) {
            return number(g.mean());
        }
        String w = number(g.angularFrequency());
        StringBuilder b = new StringBuilder();
        int terms = 0;
        if (g.mean() != 0) {
            b.append(number(g.mean()));
            terms++;
        }
        terms += appendTerm(b, g.cosine(), "cos(" + w + " t)");
        terms += appendTerm(b, g.sine(), "sin(" + w + " t)");
        return terms > 1 ? "(" + b + ")" : b.toString();
    }

    /** Appends c f with its sign; returns 1 when it appended a term. */
    private static int appendTerm(StringBuilder b, double coefficient, String function) {
        if (coefficient == 0) {
            return 0;
        }
        if (b.length() == 0) {
            b.append(coefficient < 0 ? "-" : "");
        } else {
            b.append(coefficient < 0 ? " - " : " + ");
        }
        double magnitude = Math.abs(coefficient);
        if (magnitude != 1) {
            b.append(number(magnitude)).append(' ');
        }
        b.append(function);
        return 1;
    }

    static String shape(Shape shape) {
        if (shape instanceof Shape.Constant) {
            return "1";
        }
        if (shape instanceof Shape.Linear) {
            return "eta";
        }
        if (shape instanceof Shape.Sine s) {
            return "sin(" + waves(s.waves()) + "eta)";
        }
        return "cos(" + waves(((Shape.Cosine) shape).waves()) + "eta)";
    }

    private static String waves(double waves) {
        return waves == 1 ? "pi " : waves == 0.5 ? "pi/2 " : number(waves) + " pi ";
    }

    private static String fluid(Fluid fluid) {
        ExponentialViscosity mu = (ExponentialViscosity) fluid.viscosity();
        DensityLaw rho = fluid.density();
        String density = rho.isConstant() ? "rho = " + number(rho.reference()) + " kg/m^3"
                : "rho = " + number(rho.reference()) + " kg/m^3 (1 - " + number(rho.expansion()) + "/K (T - "
                        + number(rho.referenceTemperature()) + " K))";
        return density + ", cp = " + number(fluid.specificHeat().reference()) + " J/(kg K), k = "
                + number(fluid.conductivity().reference()) + " W/(m K), mu = " + number(mu.reference())
                + " Pa s exp(-" + number(mu.coefficient()) + "/K (T - " + number(mu.referenceTemperature()) + " K))";
    }

    private static String thermal(ThermalCondition condition) {
        if (condition instanceof ThermalCondition.FixedTemperature f) {
            return "fixed temperature " + number(f.temperature()) + " K";
        }
        if (condition instanceof ThermalCondition.HeatFlux q) {
            return q.flux() == 0 ? "adiabatic (heat flux 0)" : "heat flux " + number(q.flux()) + " W/m^2";
        }
        ThermalCondition.HeatTransfer h = (ThermalCondition.HeatTransfer) condition;
        return "heat transfer, " + number(h.coefficient()) + " W/(m^2 K) to an ambient at " + number(h.ambient()) + " K";
    }

    /** Up to 6 significant digits, without trailing zeros. */
    static String number(double x) {
        if (x == Math.rint(x) && Math.abs(x) < 1e7) {
            return Long.toString((long) x);
        }
        String text = String.format(Locale.ROOT, "%.6g", x);
        if (text.contains("e")) {
            String[] parts = text.split("e");
            return stripZeros(parts[0]) + "e" + Integer.parseInt(parts[1]);
        }
        return stripZeros(text);
    }

    private static String stripZeros(String decimal) {
        if (!decimal.contains(".")) {
            return decimal;
        }
        String s = decimal.replaceAll("0+$", "");
        return s.endsWith(".") ? s.substring(0, s.length() - 1) : s;
    }
}
