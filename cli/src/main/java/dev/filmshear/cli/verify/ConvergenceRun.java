package dev.filmshear.cli.verify;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import com.fasterxml.jackson.databind.SerializationFeature;
import com.fasterxml.jackson.databind.node.ArrayNode;
import com.fasterxml.jackson.databind.node.ObjectNode;
import dev.filmshear.cli.input.CaseFile;
import dev.filmshear.cli.report.CaseText;
import dev.filmshear.cli.report.HtmlReport;
import dev.filmshear.solver.base.NumericalFailureException;
import dev.filmshear.solver.model.FilmCase;
import dev.filmshear.solver.model.FilmSolver;
import dev.filmshear.solver.model.FilmSummary;
import dev.filmshear.validation.suite.SolutionVerification;
import dev.filmshear.validation.suite.SolutionVerification.Estimate;
import dev.filmshear.validation.suite.SolutionVerification.Quantity;

import java.io.IOException;
import java.io.PrintWriter;
import java.io.UncheckedIOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.function.Function;

/**
 * {@code run CASE.toml --convergence}: solution verification of a user's case. The case runs on the three grids
 * (and tolerances) of {@link SolutionVerification#plan}; the finest grid's run is the run's result and is written
 * by the ordinary writer (summary.json, history.csv, profiles.csv, plots, report.html); the two coarser runs only
 * give their key results. Their observed order, Richardson extrapolate and Grid Convergence Index (P. J. Roache,
 * 1998; ASME V&amp;V 20-2009) then go into summary.json under {@code "convergence"}, the report is written again so
 * that it shows them, a plot {@value #PLOT} is added when the case asks for plots, and the console gets a table.
 *
 * <p>The finest grid runs first, so a case that fails there fails as an ordinary run does (its partial results
 * written, exit 3). A coarser grid that fails afterwards leaves the finest results in place, records the failure under
 * {@code "convergence"} and ends with exit 3 in the contract's one-line form, pointing at {@code grid.points}.
 */
public final class ConvergenceRun {
    /** The plot of the study. */
    static final String PLOT = "grid_convergence_of_key_results.png";
    /** The summary key of the study. */
    static final String KEY = "convergence";
    private static final ObjectMapper JSON = new ObjectMapper().enable(SerializationFeature.INDENT_OUTPUT);

    private ConvergenceRun() {
    }

    /** Solves a case file and writes its result folder (the ordinary run), returning the exit code. */
    @FunctionalInterface
    public interface CaseWriter {
        int run(CaseFile caseFile, Path dir, PrintWriter console);
    }

    /**
     * Runs the study.
     *
     * @param caseFile the case as read
     * @param dir the result folder
     * @param console where the table goes
     * @param writer the ordinary run of one case file into a folder
     * @param caseText the case as text for the report
     * @return the exit code
     */
    public static int run(CaseFile caseFile, Path dir, PrintWriter console, CaseWriter writer,
                          Function<CaseFile, CaseText> caseText) {
        SolutionVerification.Plan plan = SolutionVerification.plan(caseFile.filmCase());
        int[] points = plan.points();
        console.printf("Solution verification: the case on %d, %d and %d nodes; the results below and in %s are "
                + "those of the finest grid%n", points[0], points[1], points[2], dir);
        CaseFile finest = new CaseFile(caseFile.fileName(), caseFile.title(), plan.finest(), caseFile.plots(),
                caseFile.document(), caseFile.journal());
        int code = writer.run(finest, dir, console);
        if (code != 0) {
            return code;
        }
        ObjectNode summary = readSummary(dir);
        List<FilmSummary> coarser = new ArrayList<>();
        for (int k = 0; k < 2; k++) {
            FilmCase c = plan.cases().get(k);
            try {
                coarser.add(FilmSolver.solve(c).summary());
            } catch (NumericalFailureException failure) {
                String message = "the run on " + c.grid().points() + " nodes of the grid-convergence study failed: "
                        + failure.getMessage();
                ObjectNode node = method(plan);
                node.put("failure", message);
                finish(dir, summary, node, caseText.apply(finest));
                String key = caseFile.document().has("grid.points") ? "grid.points" : "grid";
                int line = caseFile.document().has(key) ? caseFile.document().line(key) : 0;
                NumericalFailureException oneLine = new NumericalFailureException(caseFile.fileName() + ":" + line
                        + ": " + key + ": " + message + "; the finest grid's results are kept in " + dir,
                        failure.time(), failure.step(), failure.node(), failure.field());
                oneLine.initCause(failure);
                throw oneLine;
            }
        }
        Map<Quantity, Estimate> estimates = new LinkedHashMap<>();
        for (Quantity q : Quantity.of(plan.finest())) {
            JsonNode fine = summary.path(key(q));
            if (!fine.isNumber()) {
                continue;
            }
            double[] values = {q.of(coarser.get(0)), q.of(coarser.get(1)), fine.doubleValue()};
            estimates.put(q, SolutionVerification.estimate(values, points));
        }
        ObjectNode node = json(plan, estimates);
        try {
            if (caseFile.plots()) {
                ConvergencePlot.write(dir.resolve(PLOT), estimates, points);
            }
        } catch (IOException e) {
            throw new UncheckedIOException("cannot write " + dir.resolve(PLOT) + ": " + e.getMessage(), e);
        }
        finish(dir, summary, node, caseText.apply(finest));
        console.print(table(plan, estimates));
        console.flush();
        return code;
    }

    /** The summary key of a quantity: the contract's name of the same result. */
    static String key(Quantity q) {
        return switch (q) {
            case WALL_SHEAR_STRESS_LOWER -> "wall_shear_stress_lower_Pa";
            case WALL_SHEAR_STRESS_UPPER -> "wall_shear_stress_upper_Pa";
            case MAX_TEMPERATURE -> "max_temperature_K";
        };
    }

    private static ObjectNode readSummary(Path dir) {
        Path file = dir.resolve("summary.json");
        try {
            return (ObjectNode) JSON.readTree(file.toFile());
        } catch (IOException e) {
            throw new UncheckedIOException("cannot read " + file + ": " + e.getMessage(), e);
        }
    }

    /** Adds the study to the summary, writes summary.json again, and the report with it. */
    private static void finish(Path dir, ObjectNode summary, ObjectNode convergence, CaseText caseText) {
        summary.set(KEY, convergence);
        try {
            Files.writeString(dir.resolve("summary.json"), JSON.writeValueAsString(summary) + "\n",
                    StandardCharsets.UTF_8);
            HtmlReport.write(dir, summary, caseText);
        } catch (IOException e) {
            throw new UncheckedIOException("cannot write results to " + dir + ": " + e.getMessage(), e);
        }
    }

    /** The study's grids and method, without estimates. */
    private static ObjectNode method(SolutionVerification.Plan plan) {
        ObjectNode node = JSON.createObjectNode();
        node.put("method", "three grids refined together with the step tolerance; observed order (Celik et al. "
                + "2008), Richardson extrapolation and Grid Convergence Index (Roache 1998; ASME V&V 20-2009) with "
                + "Fs = 1.25 when the observed order is within 0.2 of 2, else Fs = 3 (Roache 2011)");
        ArrayNode nodes = node.putArray("grid_nodes");
        for (int n : plan.points()) {
            nodes.add(n);
        }
        int[] p = plan.points();
        ArrayNode ratios = node.putArray("refinement_ratios");
        ratios.add((p[1] - 1.0) / (p[0] - 1.0));
        ratios.add((p[2] - 1.0) / (p[1] - 1.0));
        ArrayNode tolerances = node.putArray("tolerances");
        for (double t : plan.tolerances()) {
            tolerances.add(t);
        }
        node.put("formal_order", SolutionVerification.FORMAL_ORDER);
        return node;
    }

    /** The "convergence" object of summary.json. */
    static ObjectNode json(SolutionVerification.Plan plan, Map<Quantity, Estimate> estimates) {
        ObjectNode node = method(plan);
        for (Map.Entry<Quantity, Estimate> entry : estimates.entrySet()) {
            String unit = "_" + entry.getKey().unit();
            Estimate e = entry.getValue();
            ObjectNode q = node.putObject(key(entry.getKey()));
            ArrayNode values = q.putArray("values" + unit);
            for (double v : e.values()) {
                values.add(v);
            }
            q.put("behaviour", e.behaviour().name().toLowerCase(Locale.ROOT).replace('_', ' '));
            number(q, "observed_order", e.observedOrder());
            q.put("order_reasonable", e.reasonable());
            number(q, "order_used", e.orderUsed());
            number(q, "safety_factor", e.safetyFactor());
            number(q, "extrapolated" + unit, e.extrapolated());
            number(q, "gci_fine", e.gciFine());
            number(q, "error_band" + unit, e.band());
            number(q, "asymptotic_ratio", e.asymptoticRatio());
        }
        return node;
    }

    private static void number(ObjectNode node, String key, double value) {
        if (Double.isFinite(value)) {
            node.put(key, value);
        } else {
            node.putNull(key);
        }
    }

    /** The console's table of the study. */
    static String table(SolutionVerification.Plan plan, Map<Quantity, Estimate> estimates) {
        int[] p = plan.points();
        StringBuilder b = new StringBuilder(String.format(Locale.ROOT, "Grid convergence (Roache's GCI, ASME V&V "
                + "20-2009) on %d, %d, %d nodes:%n", p[0], p[1], p[2]));
        b.append(String.format(Locale.ROOT, "  %-36s %-16s %-16s %-16s %-7s %-5s %-16s %s%n", "quantity", "coarse",
                "middle", "fine", "order", "Fs", "extrapolated", "GCI band of the fine value"));
        for (Map.Entry<Quantity, Estimate> entry : estimates.entrySet()) {
            Estimate e = entry.getValue();
            double[] v = e.values();
            String unit = entry.getKey().unit();
            b.append(String.format(Locale.ROOT, "  %-36s %-16.9g %-16.9g %-16.9g %-7s %-5s %-16.9g +-%.3g %s (%s)%n",
                    entry.getKey().label() + " (" + unit + ")", v[0], v[1], v[2],
                    Double.isNaN(e.observedOrder()) ? "-" : String.format(Locale.ROOT, "%.2f", e.observedOrder()),
                    String.format(Locale.ROOT, "%.3g", e.safetyFactor()), e.extrapolated(), e.band(), unit,
                    e.behaviour() == SolutionVerification.Behaviour.MONOTONE
                            ? (e.reasonable() ? "order confirmed" : "order not confirmed")
                            : e.behaviour().name().toLowerCase(Locale.ROOT).replace('_', ' ')));
        }
        return b.toString();
    }
}
