package dev.filmshear.cli;

import dev.filmshear.cli.input.ViscosityLaws;
import dev.filmshear.solver.physics.FluidPreset;
import dev.filmshear.solver.physics.FluidPresets;
import dev.filmshear.solver.physics.ViscosityLaw;
import picocli.CommandLine.Command;
import picocli.CommandLine.Spec;
import picocli.CommandLine.Model.CommandSpec;

import java.io.PrintWriter;
import java.util.LinkedHashMap;
import java.util.Map;
import java.util.concurrent.Callable;

/** {@code fluids}: lists the built-in fluids and the viscosity laws with their keys and validity ranges. */
@Command(mixinStandardHelpOptions = true, name = "fluids", description = "List the built-in fluids and the viscosity laws, with their parameters "
        + "and validity ranges.")
final class FluidsCommand implements Callable<Integer> {

    /** The formula of each law, keyed by the name a case file uses. */
    static final Map<String, String> FORMULAS = formulas();

    @Spec
    CommandSpec spec;

    private static Map<String, String> formulas() {
        Map<String, String> f = new LinkedHashMap<>();
        f.put("constant", "mu = value");
        f.put("exponential", "mu = reference * exp(-coefficient * (T - reference_temperature))");
        f.put("vogel", "mu = a * exp(b / (T - c))");
        f.put("power", "mu = reference * (T / reference_temperature)^exponent");
        f.put("sutherland", "mu = reference * (T/Tr)^1.5 * (Tr + constant) / (T + constant)");
        f.put("walther", "ASTM D341: log10 log10(nu + 0.7 + ...) = A - B log10 T, through two points");
        f.put("table", "monotone (Fritsch-Carlson) interpolation of ln mu between measured points");
        f.put("water", "IAPWS 2008 viscosity with IAPWS-IF97 density at the given pressure");
        return f;
    }

    @Override
    public Integer call() {
        PrintWriter out = spec.commandLine().getOut();
        out.println("Built-in fluids ([fluid] preset = \"NAME\"; keys given beside it override the preset):");
        for (FluidPreset p : FluidPresets.all()) {
            ViscosityLaw law = p.viscosity();
            out.printf("%n  %s%n", p.name());
            out.printf("    %s%n", p.description());
            out.printf("    viscosity law   %s%n", law.describe());
            out.printf("    valid from      %.2f K to %.2f K (%.1f to %.1f degC)%n", law.validFrom(), law.validTo(),
                    law.validFrom() - 273.15, law.validTo() - 273.15);
            double t40 = 313.15;
            out.printf("    at 40 degC      mu = %.5g Pa*s, rho = %.5g kg/m^3, nu = %.5g mm^2/s%n", law.mu(t40),
                    p.density().density(t40), law.mu(t40) / p.density().density(t40) * 1e6);
            out.printf("    specific heat   %.5g J/(kg*K); thermal conductivity %.5g W/(m*K)%n",
                    p.specificHeat().reference(), p.conductivity().reference());
            out.printf("    note            %s%n", p.validityNote());
        }
        out.printf("%nViscosity laws ([fluid.viscosity] law = \"NAME\", every law also takes valid_from and valid_to):%n");
        ViscosityLaws.standard().forEach((name, reader) -> out.printf("%n  %-12s keys: %s%n  %-12s %s%n", name,
                String.join(", ", reader.keys()), "", FORMULAS.getOrDefault(name, "")));
        return ExitCode.DONE.code();
    }
}
