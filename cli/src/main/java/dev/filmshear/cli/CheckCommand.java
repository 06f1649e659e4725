package dev.filmshear.cli;

import dev.filmshear.cli.input.CaseFile;
import dev.filmshear.cli.input.CaseReader;
import dev.filmshear.solver.model.CaseNumbers;
import dev.filmshear.solver.model.FilmCase;
import dev.filmshear.solver.physics.Domain;
import dev.filmshear.solver.physics.FilmPhysics;
import dev.filmshear.solver.physics.ThermalCondition;
import dev.filmshear.solver.physics.ViscosityLaw;
import dev.filmshear.solver.physics.Wall;
import dev.filmshear.solver.physics.WallMotion;
import picocli.CommandLine.Command;
import picocli.CommandLine.Parameters;
import picocli.CommandLine.Spec;
import picocli.CommandLine.Model.CommandSpec;

import java.io.PrintWriter;
import java.nio.file.Path;
import java.util.Arrays;
import java.util.concurrent.Callable;

/**
 * {@code check CASE.toml}: reads and validates a case and prints it resolved to SI units with its derived
 * numbers; solves nothing.
 */
@Command(mixinStandardHelpOptions = true, name = "check", description = "Read and validate a case; print it in SI units with its time scales, "
        + "Reynolds number and the warnings known before solving. Solves nothing.")
final class CheckCommand implements Callable<Integer> {

    @Parameters(index = "0", paramLabel = "CASE.toml", description = "the case file")
    Path caseFile;

    @Spec
    CommandSpec spec;

    @Override
    public Integer call() {
        CaseFile file = new CaseReader().read(caseFile);
        PrintWriter out = spec.commandLine().getOut();
        describe(file, out);
        return ExitCode.DONE.code();
    }

    static void describe(CaseFile file, PrintWriter out) {
        FilmCase c = file.filmCase();
        FilmPhysics p = c.physics();
        out.printf("case %s: %s%n", file.fileName(), file.title());
        if (p.domain() instanceof Domain.Gap g) {
            out.printf("  gap                 %s m%n", g.gap());
        } else {
            double depth = ((Domain.SemiInfinite) p.domain()).depth();
            out.printf("  semi-infinite       %s%n", Double.isNaN(depth) ? "depth chosen by the solver" : depth + " m");
        }
        ViscosityLaw law = p.fluid().viscosity();
        out.printf("  viscosity law       %s%n", law.describe());
        var density = p.fluid().density();
        if (density.isConstant()) {
            out.printf("  density             %s kg/m^3%n", density.reference());
        } else {
            out.printf("  density             %s kg/m^3 at %s K, expansion %s 1/K%n", density.reference(),
                    density.referenceTemperature(), density.expansion());
        }
        if (p.isThermal()) {
            out.printf("  specific heat       %s%n", property(p.fluid().specificHeat(), "J/(kg*K)"));
            out.printf("  conductivity        %s%n", property(p.fluid().conductivity(), "W/(m*K)"));
        } else {
            out.printf("  energy equation     not solved (isothermal film)%n");
        }
        wall(out, "lower wall", p.lower());
        if (p.upper() != null) {
            wall(out, "upper wall", p.upper());
        }
        out.printf("  pressure gradient   %s Pa/m%n", p.pressureGradient());
        out.printf("  initial state       velocity %s m/s, temperature %s K%n", p.initialVelocity(),
                p.initialTemperature());
        out.printf("  time                %s, tolerance %s%n",
                c.isSteady() ? "steady solve" : "to " + c.endTime() + " s", c.tolerance());
        out.printf("  grid                %d points, clustering %s%n", c.grid().points(), c.grid().clustering());
        if (c.isJournal()) {
            out.printf("  journal             diameter %s m, length %s m, film area %.6g m^2%n",
                    c.journal().diameter(), c.journal().length(), c.journal().area());
        }
        if (!Double.isNaN(c.limits().maxTemperature())) {
            out.printf("  temperature limit   %s K%n", c.limits().maxTemperature());
        }
        out.printf("  output times        %s s%n", Arrays.toString(c.outputTimes()));

        CaseNumbers n = CaseNumbers.of(c);
        out.printf("derived numbers at %s K:%n", n.referenceTemperature());
        out.printf("  density             %.6g kg/m^3%n", n.density());
        out.printf("  viscosity           %.6g Pa*s (kinematic %.6g m^2/s)%n", n.viscosity(), n.kinematicViscosity());
        out.printf("  wall speed          %.6g m/s (largest difference)%n", n.relativeSpeed());
        out.printf("  Reynolds number     %.6g%s%n", n.reynoldsNumber(),
                p.isSemiInfinite() ? " (on the penetration depth)" : " (U*gap/nu)");
        if (!p.isSemiInfinite()) {
            double ejml = new dev.filmshear.solver.model.FilmModel(c,
                    dev.filmshear.solver.model.SolverOptions.defaults()).momentumTimeScale(true);
            out.printf("  momentum time scale %.6g s (slowest mode of the discrete operator, EJML QR %.6g s; "
                    + "gap^2/(pi^2 nu) = %.6g s)%n", n.momentumTimeScale(), ejml, n.momentumTimeScaleAnalytic());
        } else {
            out.printf("  truncated depth     %.6g m%n", n.depth());
        }
        if (p.isSemiInfinite() && !Double.isNaN(n.penetrationDepth())) {
            out.printf("  penetration depth   %.6g m%n", n.penetrationDepth());
        }
        if (p.isThermal()) {
            out.printf("  thermal time scale  %.6g s (gap^2/alpha), Prandtl number %.6g%n", n.thermalTimeScale(),
                    n.prandtlNumber());
            out.printf("  Nahme number        %.6g (beta mu U^2 / k, beta = %.4g 1/K)%n", n.nahmeNumber(),
                    n.viscosityTemperatureCoefficient());
            if (!Double.isNaN(n.brinkmanNumber())) {
                out.printf("  Brinkman number     %.6g (mu U^2 / (k dT_walls))%n", n.brinkmanNumber());
            }
            out.printf("  shear-heating rise  %.6g K at constant viscosity (BSL section 10.4)%n", n.shearHeatingRise());
        }
        if (!Double.isNaN(n.drivenWallTimeScale())) {
            out.printf("  driven-wall time    %.6g s (mass per area * gap / mu: coast-down time constant)%n",
                    n.drivenWallTimeScale());
        }
        boolean anyWarning = false;
        if (c.isJournal()) {
            double ratio = p.gap() / c.journal().radius();
            double ta = Math.pow(n.reynoldsNumber(), 2) * ratio;
            out.printf("  clearance/radius    %.4g (warning above %.3g)%n", ratio,
                    dev.filmshear.solver.model.FilmSolver.CURVATURE_LIMIT);
            out.printf("  Taylor number       %.4g at the start (critical %.0f)%n", ta,
                    dev.filmshear.solver.model.FilmSolver.TAYLOR_LIMIT);
            if (ratio > dev.filmshear.solver.model.FilmSolver.CURVATURE_LIMIT) {
                out.printf("warning: clearance/radius %.4g is too large for the unwrapped-film model%n", ratio);
                anyWarning = true;
            }
            if (ta > dev.filmshear.solver.model.FilmSolver.TAYLOR_LIMIT) {
                out.printf("warning: Taylor number %.4g above %.0f: Taylor vortices expected%n", ta,
                        dev.filmshear.solver.model.FilmSolver.TAYLOR_LIMIT);
                anyWarning = true;
            }
        }
        if (n.laminarFlowDoubtful()) {
            out.printf("warning: Reynolds number %.4g above %.0f: the film may not stay laminar%n",
                    n.reynoldsNumber(), CaseNumbers.LAMINAR_REYNOLDS_LIMIT);
            anyWarning = true;
        }
        if (!law.isConstant() && !law.isValidAt(p.referenceTemperature())) {
            out.printf("warning: the initial temperature %s K is outside the %s law's range %s K to %s K%n",
                    p.referenceTemperature(), law.name(), law.validFrom(), law.validTo());
            anyWarning = true;
        }
        if (!anyWarning) {
            out.printf("no warnings before solving%n");
        }
    }

    private static String property(dev.filmshear.solver.physics.PropertyLaw law, String unit) {
        if (law.isConstant()) {
            return law.reference() + " " + unit;
        }
        return law.reference() + " " + unit + " at " + law.referenceTemperature() + " K, changing by "
                + law.slope() + " per K";
    }

    private static void wall(PrintWriter out, String name, Wall wall) {
        out.printf("  %-19s %s%s%n", name, motion(wall.motion()), thermal(wall.thermal()));
    }

    static String motion(WallMotion m) {
        if (m instanceof WallMotion.Steady s) {
            return "velocity " + s.velocity() + " m/s from t = 0";
        }
        if (m instanceof WallMotion.Ramp r) {
            return "ramp " + r.from() + " -> " + r.to() + " m/s from t = " + r.start() + " s over " + r.duration() + " s";
        }
        if (m instanceof WallMotion.Sine s) {
            return "sine: " + s.mean() + " + " + s.amplitude() + " sin(2 pi " + s.frequency() + " t + " + s.phase()
                    + ") m/s";
        }
        if (m instanceof WallMotion.Driven d) {
            return "driven: mass " + d.massPerArea() + " kg/m^2, drive " + d.drive() + " Pa, starting at "
                    + d.initialVelocity() + " m/s";
        }
        WallMotion.Table t = (WallMotion.Table) m;
        return "table of " + t.times().length + " points, " + Arrays.toString(t.values()) + " m/s at "
                + Arrays.toString(t.times()) + " s";
    }

    static String thermal(ThermalCondition c) {
        if (c == null) {
            return "";
        }
        if (c instanceof ThermalCondition.FixedTemperature f) {
            return "; temperature " + f.temperature() + " K";
        }
        if (c instanceof ThermalCondition.HeatFlux q) {
            return q.flux() == 0 ? "; adiabatic" : "; heat flux " + q.flux() + " W/m^2 into the fluid";
        }
        ThermalCondition.HeatTransfer h = (ThermalCondition.HeatTransfer) c;
        return "; heat transfer " + h.coefficient() + " W/(m^2*K) to " + h.ambient() + " K";
    }
}
