package dev.filmshear.cli.fit;

import com.fasterxml.jackson.databind.ObjectMapper;
import com.fasterxml.jackson.databind.SerializationFeature;
import com.fasterxml.jackson.databind.node.ArrayNode;
import com.fasterxml.jackson.databind.node.ObjectNode;
import dev.filmshear.solver.physics.DensityLaw;

import java.io.IOException;
import java.io.PrintWriter;
import java.io.UncheckedIOException;
import java.math.BigDecimal;
import java.math.MathContext;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;

/**
 * What {@code fit} tells its user: the parameters with standard errors, the residual table, the lines for
 * a case file's {@code [fluid.viscosity]} table (on the console and in fit.json), and fit.json itself.
 *
 * <p>The case-file lines use exactly the keys the case reader's law table accepts
 * ({@link dev.filmshear.cli.input.ViscosityLaws}), every value with its unit and
 * {@value #SIGNIFICANT} significant digits, so that the law read back from a case equals the fitted law to
 * about 1e-9 relative, far inside any standard error. {@code valid_from} and {@code valid_to} are the data's
 * temperature range. For walther the two points written are the fitted line's kinematic viscosities at
 * 40 and 100 degC (an oil sheet's pair) when both lie within the data, else at the data's lowest and
 * highest temperatures.
 */
public final class FitReport {
    /** Significant digits of the case-file values: far beyond any standard error, so nothing of the fit is lost. */
    static final int SIGNIFICANT = 10;
    /** 40 degC and 100 degC: the pair of temperatures at which oil grades state kinematic viscosity. */
    private static final List<Anchor> OIL_SHEET =
            List.of(new Anchor(313.15, "40 degC"), new Anchor(373.15, "100 degC"));
    private static final double MM2_PER_S = 1e-6;
    private static final ObjectMapper JSON = new ObjectMapper().enable(SerializationFeature.INDENT_OUTPUT);

    private final ViscosityData data;
    private final FitResult result;
    private final DensityLaw density;
    private final Conversion conversion;

    /**
     * @param data the data as read
     * @param result the fit
     * @param density the density from the command line, or null when none was given
     * @param conversion how the data were turned into the law's quantity
     */
    public FitReport(ViscosityData data, FitResult result, DensityLaw density, Conversion conversion) {
        this.data = data;
        this.result = result;
        this.density = density;
        this.conversion = conversion;
    }

    /** The lines for a case file, from {@code [fluid.viscosity]} on, each ending in a line break. */
    public String toml() {
        StringBuilder t = new StringBuilder("[fluid.viscosity]\n");
        t.append(String.format(Locale.ROOT, "# fitted by filmshear fit to %s: %d points, RMS relative residual "
                + "%.3g %%%n", data.fileName(), result.size(), 100 * result.rmsRelativeResidual()));
        if (conversion != Conversion.NONE) {
            t.append("# converted with ").append(densityText()).append("; give [fluid] the same density\n");
        }
        t.append("law = \"").append(result.law().key()).append("\"\n");
        if (result.law() == FitLaw.WALTHER) {
            List<Anchor> at = waltherAnchors();
            t.append("temperatures = [\"").append(at.get(0).text()).append("\", \"").append(at.get(1).text())
                    .append("\"]\n");
            t.append("values = [\"").append(decimal(result.value(at.get(0).temperature()) / MM2_PER_S))
                    .append(" cSt\", \"").append(decimal(result.value(at.get(1).temperature()) / MM2_PER_S))
                    .append(" cSt\"]\n");
        } else {
            for (FittedParameter p : result.parameters()) {
                t.append(p.name()).append(" = ");
                t.append(p.unit().isEmpty() ? decimal(p.value()) : "\"" + decimal(p.value()) + " " + p.unit() + "\"");
                t.append('\n');
            }
        }
        t.append("valid_from = \"").append(decimal(result.validFrom())).append(" K\"\n");
        t.append("valid_to = \"").append(decimal(result.validTo())).append(" K\"\n");
        return t.toString();
    }

    /** A temperature at which the walther lines state a viscosity: K, and as the case file writes it. */
    private record Anchor(double temperature, String text) {
    }

    /** 40 and 100 degC when the data reach both, else the data's end temperatures. */
    private List<Anchor> waltherAnchors() {
        double from = result.validFrom();
        double to = result.validTo();
        if (from <= OIL_SHEET.get(0).temperature() && to >= OIL_SHEET.get(1).temperature()) {
            return OIL_SHEET;
        }
        return List.of(new Anchor(from, decimal(from) + " K"), new Anchor(to, decimal(to) + " K"));
    }

    /** Prints the fit to the console. */
    public void print(PrintWriter out) {
        out.printf(Locale.ROOT, "fit: %s law to %s, %d points from %s K to %s K%n", result.law().key(),
                data.fileName(), result.size(), decimal(result.validFrom()), decimal(result.validTo()));
        out.printf("  %s%n", result.law().formula());
        if (result.law() == FitLaw.WALTHER) {
            out.printf("  straight line in (log10 T, log10 log10 Z) by least squares, nu in mm^2/s, T in K%n");
        } else {
            out.printf("  least squares on ln(mu), that is on relative errors (Levenberg-Marquardt, %d iteration%s)%n",
                    result.iterations(), result.iterations() == 1 ? "" : "s");
        }
        if (conversion != Conversion.NONE) {
            out.printf("  %s viscosities converted to %s with %s%n",
                    conversion == Conversion.TO_DYNAMIC ? "kinematic" : "dynamic",
                    conversion == Conversion.TO_DYNAMIC ? "dynamic" : "kinematic", densityText());
        } else if (density != null) {
            out.printf("  --density not used: the data are already %s viscosities%n",
                    data.kinematic() ? "kinematic" : "dynamic");
        }
        out.printf("parameters, with one standard error (covariance scaled by the residual variance, %d degrees "
                + "of freedom):%n", result.degreesOfFreedom());
        for (FittedParameter p : result.parameters()) {
            String value = String.format(Locale.ROOT, "%.6g", p.value()) + (p.unit().isEmpty() ? "" : " " + p.unit());
            String error = p.fixed() ? "(held fixed: a measured temperature near the data's centre)"
                    : Double.isNaN(p.standardError()) ? "(no standard error)"
                    : String.format(Locale.ROOT, "+/- %.3g (%.3g %%)", p.standardError(),
                            100 * p.relativeStandardError());
            out.printf(Locale.ROOT, "  %-22s %-22s %s%n", p.name(), value, error);
        }
        out.printf("residuals (fitted / measured - 1):%n");
        String tHead = data.temperature().heading();
        String vHead = data.viscosity().heading();
        out.printf("  %6s  %18s  %18s  %14s  %9s%n", "line", tHead, vHead, "fitted", "residual");
        List<ViscosityData.Point> points = data.points();
        for (int i = 0; i < points.size(); i++) {
            ViscosityData.Point p = points.get(i);
            double r = result.relativeResidual(i);
            out.printf(Locale.ROOT, "  %6d  %18.6g  %18.6g  %14.6g  %7.3f %%%n", p.line(), p.writtenTemperature(),
                    p.writtenValue(), p.writtenValue() * (1 + r), 100 * r);
        }
        int worst = result.largestResidualIndex();
        out.printf(Locale.ROOT, "  RMS %.3g %%, largest %.3g %% at line %d%n", 100 * result.rmsRelativeResidual(),
                100 * result.maxRelativeResidual(), points.get(worst).line());
        for (String note : result.notes()) {
            out.printf("note: %s%n", note);
        }
        out.printf("%nlines for the case file's [fluid.viscosity] table:%n%n%s%n", toml());
    }

    /** fit.json: the law, its parameters and standard errors, the residuals and the case-file lines. */
    public ObjectNode json() {
        ObjectNode root = JSON.createObjectNode();
        root.put("data_file", data.fileName());
        root.put("law", result.law().key());
        root.put("formula", result.law().formula());
        root.put("residual", result.law() == FitLaw.WALTHER
                ? "least-squares line in (log10 T, log10 log10 Z) (ASTM D341); relative_residual = fitted/measured - 1"
                : "least squares on ln(mu) (relative errors), Levenberg-Marquardt; relative_residual = fitted/measured - 1");
        root.put("points", result.size());
        root.put("degrees_of_freedom", result.degreesOfFreedom());
        root.put("iterations", result.iterations());
        ArrayNode parameters = root.putArray("parameters");
        List<String> adjusted = new ArrayList<>();
        for (FittedParameter p : result.parameters()) {
            ObjectNode node = parameters.addObject();
            node.put("name", p.name());
            node.put("value", p.value());
            number(node, "standard_error", p.standardError());
            node.put("unit", p.unit());
            node.put("fixed", p.fixed());
            if (!p.fixed()) {
                adjusted.add(p.name());
            }
        }
        ObjectNode correlation = root.putObject("correlation");
        ArrayNode names = correlation.putArray("parameters");
        adjusted.forEach(names::add);
        ArrayNode matrix = correlation.putArray("matrix");
        for (double[] row : result.correlation()) {
            ArrayNode r = matrix.addArray();
            for (double v : row) {
                if (Double.isFinite(v)) {
                    r.add(v);
                } else {
                    r.addNull();
                }
            }
        }
        root.put("rms_relative_residual", result.rmsRelativeResidual());
        root.put("max_relative_residual", result.maxRelativeResidual());
        root.put("valid_from_K", result.validFrom());
        root.put("valid_to_K", result.validTo());
        if (density != null) {
            ObjectNode d = root.putObject("density");
            d.put("density_kg_per_m3", density.reference());
            d.put("temperature_K", density.referenceTemperature());
            d.put("expansion_per_K", density.expansion());
            d.put("used", conversion != Conversion.NONE);
        } else {
            root.putNull("density");
        }
        root.put("value_unit", result.law().kinematic() ? "m^2/s" : "Pa*s");
        ArrayNode residuals = root.putArray("residuals");
        double[] t = result.temperatures();
        double[] measured = result.measured();
        double[] fitted = result.fitted();
        for (int i = 0; i < result.size(); i++) {
            ObjectNode r = residuals.addObject();
            r.put("line", data.points().get(i).line());
            r.put("temperature_K", t[i]);
            r.put("measured", measured[i]);
            r.put("fitted", fitted[i]);
            r.put("relative_residual", result.relativeResidual(i));
        }
        ArrayNode notes = root.putArray("notes");
        result.notes().forEach(notes::add);
        root.put("toml", toml());
        return root;
    }

    /**
     * Writes fit.json and fit.png into {@code dir}, creating it.
     *
     * @throws UncheckedIOException when a file cannot be written
     */
    public void write(Path dir) {
        try {
            Files.createDirectories(dir);
            Files.writeString(dir.resolve("fit.json"), JSON.writeValueAsString(json()) + "\n",
                    StandardCharsets.UTF_8);
            FitPlot.write(dir.resolve("fit.png"), data, result);
        } catch (IOException e) {
            throw new UncheckedIOException("cannot write the fit to " + dir + ": " + e.getMessage(), e);
        }
    }

    private static void number(ObjectNode node, String key, double value) {
        if (Double.isFinite(value)) {
            node.put(key, value);
        } else {
            node.putNull(key);
        }
    }

    private String densityText() {
        if (density.isConstant()) {
            return "density " + decimal(density.reference()) + " kg/m^3 (constant)";
        }
        return "density " + decimal(density.reference()) + " kg/m^3 at " + decimal(density.referenceTemperature())
                + " K, expansion " + decimal(density.expansion()) + " 1/K";
    }

    /**
     * A number to {@value #SIGNIFICANT} significant digits without trailing zeros, plain between 1e-3 and
     * 1e7 ({@code 948}, {@code 313.15}) and in e-notation outside ({@code 5.264e-5}), as the case file reads it.
     */
    static String decimal(double x) {
        double magnitude = Math.abs(x);
        if (magnitude == 0 || (magnitude >= 1e-3 && magnitude < 1e7)) {
            return new BigDecimal(x).round(new MathContext(SIGNIFICANT)).stripTrailingZeros().toPlainString();
        }
        String s = String.format(Locale.ROOT, "%." + (SIGNIFICANT - 1) + "e", x);
        int e = s.indexOf('e');
        String mantissa = s.substring(0, e);
        if (mantissa.contains(".")) {
            mantissa = mantissa.replaceAll("0+$", "").replaceAll("\\.$", "");
        }
        return mantissa + "e" + Integer.parseInt(s.substring(e + 1));
    }
}
