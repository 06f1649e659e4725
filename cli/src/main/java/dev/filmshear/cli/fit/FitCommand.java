package dev.filmshear.cli.fit;

import dev.filmshear.cli.ExitCode;
import dev.filmshear.cli.input.InputException;
import dev.filmshear.cli.input.QuantityKind;
import dev.filmshear.cli.input.UnitException;
import dev.filmshear.cli.input.Units;
import dev.filmshear.solver.base.InvalidParameterException;
import dev.filmshear.solver.base.NumericalFailureException;
import dev.filmshear.solver.physics.DensityLaw;
import picocli.CommandLine.Command;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;
import picocli.CommandLine.Spec;

import java.io.PrintWriter;
import java.nio.file.Path;
import java.util.Arrays;
import java.util.Iterator;
import java.util.List;
import java.util.Locale;
import java.util.concurrent.Callable;
import java.util.function.Supplier;

/**
 * {@code fit DATA.csv --law LAW [--out DIR] [--density Q [--density-temperature Q] [--expansion Q]]}: fits a
 * viscosity-temperature law to measured points, prints the parameters with standard errors, the residuals
 * and the lines for a case file, and writes fit.json and fit.png.
 *
 * <p>The command reads and checks (the data file through {@link ViscosityCsv}, the options here), turns the
 * data into the law's quantity with the density where the two differ, hands the arrays to
 * {@link ViscosityFitter} and passes the result to {@link FitReport}. Every input problem is an
 * {@link InputException} (exit code 2); an option's problem names the data file with line 0 and the
 * option as the key. A fit that does not converge is a {@link NumericalFailureException} (exit code 3).
 */
@Command(name = "fit", mixinStandardHelpOptions = true, description = {
        "Fit a viscosity-temperature law to measured points: least squares on ln(mu), that is on relative errors "
                + "(Levenberg-Marquardt), or for walther the ASTM D341 line in (log T, log log Z).",
        "DATA.csv: a header naming the temperature column and then the viscosity column, each with its unit in "
                + "parentheses or brackets, e.g. \"temperature (degC), viscosity (cSt)\" or \"T [K], mu [mPa*s]\"; "
                + "then one row per point; # starts a comment. Kinematic data for a dynamic law, or dynamic data "
                + "for walther, need --density.",
        "Prints the parameters with standard errors, the residuals and the lines to paste into a case's "
                + "[fluid.viscosity] table; writes fit.json and fit.png."})
public final class FitCommand implements Callable<Integer> {

    @Parameters(index = "0", paramLabel = "DATA.csv", description = "the measured points")
    Path dataFile;

    @Option(names = "--law", required = true, paramLabel = "LAW", completionCandidates = LawNames.class,
            description = "the law to fit: ${COMPLETION-CANDIDATES}")
    String lawName;

    @Option(names = "--out", paramLabel = "DIR",
            description = "result folder (default: ./out/<data file name without extension>-fit)")
    Path out;

    @Option(names = "--density", paramLabel = "QUANTITY",
            description = "density, e.g. \"870 kg/m^3\"; needed to fit kinematic data with a dynamic law or "
                    + "dynamic data with walther (no default)")
    String density;

    @Option(names = "--density-temperature", paramLabel = "QUANTITY",
            description = "temperature at which --density holds, e.g. \"15 degC\"; needed with --expansion")
    String densityTemperature;

    @Option(names = "--expansion", paramLabel = "QUANTITY",
            description = "volumetric thermal expansion, e.g. \"7e-4 1/K\": rho(T) = density * (1 - expansion * "
                    + "(T - density temperature)); without it the density is constant")
    String expansion;

    @Spec
    CommandSpec spec;

    /** The law names for the help text, generated from {@link FitLaw}. */
    static final class LawNames implements Iterable<String> {
        @Override
        public Iterator<String> iterator() {
            return Arrays.stream(FitLaw.values()).map(FitLaw::key).iterator();
        }
    }

    @Override
    public Integer call() {
        String fileName = dataFile.toString();
        FitLaw law = FitLaw.byName(lawName).orElseThrow(() -> new InputException(fileName, 0, "--law",
                "unknown law", InputException.quote(lawName), "one of " + FitLaw.names()));
        ViscosityData data = ViscosityCsv.read(dataFile);
        DensityLaw densityLaw = densityLaw(fileName);
        Conversion conversion = law.kinematic() == data.kinematic() ? Conversion.NONE
                : law.kinematic() ? Conversion.TO_KINEMATIC : Conversion.TO_DYNAMIC;
        double[] temperatures = data.points().stream().mapToDouble(ViscosityData.Point::temperature).toArray();
        double[] values = lawValues(data, law, densityLaw, conversion);
        requireEnoughPoints(data, law);

        FitResult result;
        try {
            result = ViscosityFitter.fit(law, temperatures, values);
        } catch (InvalidParameterException e) {
            // the walther record calls the D341 constants a and b; the fit writes them as the standard does, A and B
            String parameter = law == FitLaw.WALTHER ? e.parameter().toUpperCase(Locale.ROOT) : e.parameter();
            String article = "aeiou".indexOf(law.key().charAt(0)) >= 0 ? "an " : "a ";
            throw new InputException(fileName, 0, "--law", "the data do not follow " + article + law.key() + " law: its "
                    + "fitted " + parameter + " is " + e.given() + ", where the law needs " + e.allowed(),
                    InputException.quote(law.key()), suitedLaws(temperatures, values), e);
        } catch (NumericalFailureException e) {
            throw new NumericalFailureException(fileName + ":0: --law: " + e.getMessage() + " (given "
                    + data.points().size() + " points, allowed data that a " + law.key() + " law can follow)");
        }

        PrintWriter console = spec.commandLine().getOut();
        FitReport report = new FitReport(data, result, densityLaw, conversion);
        report.print(console);
        Path dir = out != null ? out : Path.of("out", baseName(dataFile) + "-fit");
        report.write(dir);
        console.printf("wrote %s and %s%n", dir.resolve("fit.json"), dir.resolve("fit.png"));
        return ExitCode.DONE.code();
    }

    /** The file name without its extension. */
    static String baseName(Path file) {
        String name = file.getFileName().toString();
        int dot = name.lastIndexOf('.');
        return dot > 0 ? name.substring(0, dot) : name;
    }

    /** The density law of the options, or null when {@code --density} is not given. */
    private DensityLaw densityLaw(String fileName) {
        if (density == null) {
            String stray = expansion != null ? "--expansion"
                    : densityTemperature != null ? "--density-temperature" : null;
            if (stray != null) {
                throw new InputException(fileName, 0, "--density", stray + " given without --density", "nothing",
                        "--density \"870 kg/m^3\" beside " + stray);
            }
            return null;
        }
        double rho = option(fileName, "--density", density, QuantityKind.DENSITY);
        if (expansion == null) {
            if (densityTemperature != null) {
                option(fileName, "--density-temperature", densityTemperature, QuantityKind.ABSOLUTE_TEMPERATURE);
            }
            return build(fileName, () -> DensityLaw.constant(rho));
        }
        double alpha = option(fileName, "--expansion", expansion, QuantityKind.EXPANSION);
        if (densityTemperature == null) {
            throw new InputException(fileName, 0, "--density-temperature", "--expansion needs the temperature at "
                    + "which --density holds", "nothing", "a temperature such as \"15 degC\"");
        }
        double t0 = option(fileName, "--density-temperature", densityTemperature, QuantityKind.ABSOLUTE_TEMPERATURE);
        return build(fileName, () -> new DensityLaw(rho, t0, alpha));
    }

    private static double option(String fileName, String name, String text, QuantityKind kind) {
        try {
            return Units.toSi(text, kind);
        } catch (UnitException e) {
            throw new InputException(fileName, 0, name, e.problem(), InputException.quote(text), e.allowed(), e);
        }
    }

    private DensityLaw build(String fileName, Supplier<DensityLaw> constructor) {
        try {
            return constructor.get();
        } catch (InvalidParameterException e) {
            String option = switch (e.parameter()) {
                case "thermal_expansion" -> "--expansion";
                case "density_temperature" -> "--density-temperature";
                default -> "--density";
            };
            String given = switch (option) {
                case "--expansion" -> expansion;
                case "--density-temperature" -> densityTemperature;
                default -> density;
            };
            throw new InputException(fileName, 0, option, "value not allowed", InputException.quote(given),
                    e.allowed(), e);
        }
    }

    /** The data in the law's quantity: dynamic (Pa s), or kinematic (m^2/s) for walther. */
    private static double[] lawValues(ViscosityData data, FitLaw law, DensityLaw densityLaw, Conversion conversion) {
        List<ViscosityData.Point> points = data.points();
        String column = data.viscosity().key();
        if (conversion != Conversion.NONE && densityLaw == null) {
            String from = data.kinematic() ? "kinematic" : "dynamic";
            String to = law.kinematic() ? "kinematic (ASTM D341)" : "dynamic";
            throw new InputException(data.fileName(), data.headerLine(), column, "the data are " + from
                    + " viscosities and the " + law.key() + " law is " + to + ": converting them needs a density",
                    "no --density", "--density \"870 kg/m^3\" (with --density-temperature and --expansion for a "
                            + "density that changes with temperature)");
        }
        double[] values = new double[points.size()];
        for (int i = 0; i < values.length; i++) {
            ViscosityData.Point p = points.get(i);
            double rho = densityLaw == null ? Double.NaN : densityLaw.density(p.temperature());
            if (conversion != Conversion.NONE && !(rho > 0)) {
                throw new InputException(data.fileName(), p.line(), data.temperature().key(), "the density from "
                        + "--density and --expansion is not positive at this temperature",
                        InputException.quote(Double.toString(p.writtenTemperature())),
                        "temperatures at which the density law stays positive");
            }
            values[i] = switch (conversion) {
                case NONE -> p.value();
                case TO_DYNAMIC -> p.value() * rho;
                case TO_KINEMATIC -> p.value() / rho;
            };
            if (law == FitLaw.WALTHER && !(ViscosityFitter.d341Z(values[i]) > 1)) {
                throw new InputException(data.fileName(), p.line(), column, "below the range of ASTM D341 (Z = "
                        + "nu/(mm^2/s) + 0.7 + exp(-1.47 - 1.84 nu - 0.51 nu^2) must exceed 1)",
                        InputException.quote(Double.toString(p.writtenValue())),
                        "kinematic viscosities above about 0.12 mm^2/s (cSt)");
            }
        }
        return values;
    }

    private static void requireEnoughPoints(ViscosityData data, FitLaw law) {
        int n = data.points().size();
        if (n < law.minimumPoints()) {
            int line = n == 0 ? data.headerLine() : data.points().get(n - 1).line();
            String why = law == FitLaw.WALTHER ? "two points fix its ASTM D341 line"
                    : "one more than its " + law.parameters() + " parameters, to leave a degree of freedom for the "
                            + "standard errors";
            throw new InputException(data.fileName(), line, "(points)", "too few points for the " + law.key() + " law",
                    n + (n == 1 ? " point" : " points"), "at least " + law.minimumPoints() + ": " + why);
        }
    }

    /** The laws that suit data whose viscosity falls (a liquid) or rises (a gas) with temperature, for a message. */
    private static String suitedLaws(double[] temperatures, double[] values) {
        int coldest = 0;
        int hottest = 0;
        for (int i = 1; i < temperatures.length; i++) {
            coldest = temperatures[i] < temperatures[coldest] ? i : coldest;
            hottest = temperatures[i] > temperatures[hottest] ? i : hottest;
        }
        return values[hottest] > values[coldest]
                ? "a gas law for viscosities that rise with temperature: " + FitLaw.POWER.key() + " or "
                        + FitLaw.SUTHERLAND.key()
                : "a liquid law for viscosities that fall with temperature: " + FitLaw.EXPONENTIAL.key() + ", "
                        + FitLaw.VOGEL.key() + " or " + FitLaw.WALTHER.key();
    }
}
