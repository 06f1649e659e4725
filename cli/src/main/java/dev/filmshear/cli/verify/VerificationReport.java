package dev.filmshear.cli.verify;

import com.fasterxml.jackson.databind.ObjectMapper;
import com.fasterxml.jackson.databind.SerializationFeature;
import com.fasterxml.jackson.databind.node.ArrayNode;
import com.fasterxml.jackson.databind.node.ObjectNode;
import dev.filmshear.cli.output.Caution;
import dev.filmshear.cli.output.Version;
import dev.filmshear.validation.suite.Check;
import dev.filmshear.validation.suite.Level;
import dev.filmshear.validation.suite.ManufacturedVerification;
import dev.filmshear.validation.suite.Rule;
import dev.filmshear.validation.suite.VerificationCase;
import dev.filmshear.validation.suite.VerificationRun;
import dev.filmshear.validation.suite.VerificationSuite;

import java.io.IOException;
import java.io.UncheckedIOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Base64;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;

/**
 * What {@code verify} leaves in its folder for a reviewer: {@value #HTML} (self-contained), {@value #CSV} (one row per
 * case, check and level), {@value #JSON} (the whole outcome with every case's problem statement and source) and one
 * PNG per case with an order to observe ({@code error_<case>.png}).
 *
 * <p>The page: a title block with the verdict and the build's version, the standing caution, how to read the
 * numbers, an overview table, then one section per case (the problem or the manufactured fields and sources written
 * out, the source of the exact solution, how the levels refine space and time, its table of errors and orders, and
 * its log-log plot of error against grid spacing with slope-2 and slope-1 reference lines), the methods and
 * references, and the build. Plots are {@code data:image/png;base64} URIs; the CSS is inline; there is no script and
 * no link off the page. The markup also parses as XML (every element closed, all text escaped), as the run report's
 * does.
 */
public final class VerificationReport {
    /** The page's file name. */
    public static final String HTML = "report.html";
    /** The table's file name. */
    public static final String CSV = "verification.csv";
    /** The outcome's file name. */
    public static final String JSON = "verification.json";
    /** Header of {@value #CSV}. */
    static final String CSV_HEADER = "case,kind,quantity,unit,level,points,time_step_s,error,observed_order,rule,"
            + "expected_order,band_low,band_high,round_off_floor,passed";

    private static final ObjectMapper MAPPER = new ObjectMapper().enable(SerializationFeature.INDENT_OUTPUT);

    private VerificationReport() {
    }

    /** A plot of one case: its file and the image as a data URI. */
    record Plot(String caseName, String fileName, String dataUri) {
    }

    /**
     * Writes every file into {@code dir}, creating it.
     *
     * @throws UncheckedIOException when a file cannot be written
     */
    public static void write(Path dir, VerificationSuite.Result result) {
        try {
            Files.createDirectories(dir);
            Files.writeString(dir.resolve(CSV), csv(result), StandardCharsets.UTF_8);
            Files.writeString(dir.resolve(JSON), MAPPER.writeValueAsString(json(result)) + "\n", StandardCharsets.UTF_8);
            List<Plot> plots = new ArrayList<>();
            for (VerificationRun run : result.runs()) {
                Path png = dir.resolve("error_" + slug(run.verificationCase().name()) + ".png");
                if (VerificationPlots.write(png, run)) {
                    plots.add(new Plot(run.verificationCase().name(), png.getFileName().toString(),
                            "data:image/png;base64," + Base64.getEncoder().encodeToString(Files.readAllBytes(png))));
                }
            }
            Files.writeString(dir.resolve(HTML), html(result, plots), StandardCharsets.UTF_8);
        } catch (IOException e) {
            throw new UncheckedIOException("cannot write the verification report to " + dir + ": " + e.getMessage(), e);
        }
    }

    /** A file-name fragment: lower case letters and digits joined by underscores. */
    static String slug(String name) {
        return name.toLowerCase(Locale.ROOT).replaceAll("[^a-z0-9]+", "_").replaceAll("^_+|_+$", "");
    }

    // ------------------------------------------------------------------ verification.csv

    /** One row per case, check and level; the observed order of a level is the one from the level before. */
    static String csv(VerificationSuite.Result result) {
        StringBuilder b = new StringBuilder(CSV_HEADER).append('\n');
        for (VerificationRun run : result.runs()) {
            VerificationCase c = run.verificationCase();
            for (int k = 0; k < c.checks().size(); k++) {
                Check check = c.checks().get(k);
                double[] errors = run.errors(k);
                double[] orders = run.observedOrders(k);
                for (int level = 0; level < errors.length; level++) {
                    Level l = c.levels().get(level);
                    List<String> row = new ArrayList<>();
                    row.add(c.name());
                    row.add(c.kind().name().toLowerCase(Locale.ROOT));
                    row.add(check.quantity());
                    row.add(check.unit());
                    row.add(Integer.toString(level));
                    row.add(Integer.toString(l.points()));
                    row.add(number(l.timeStep()));
                    row.add(number(errors[level]));
                    row.add(level == 0 || !(check.rule() instanceof Rule.Order) ? "" : number(orders[level - 1]));
                    if (check.rule() instanceof Rule.Order o) {
                        row.addAll(List.of("order", number(o.expected()), number(o.low()), number(o.high()), ""));
                    } else {
                        row.addAll(List.of("round_off", "", "", "", number(((Rule.RoundOff) check.rule()).floor())));
                    }
                    row.add(Boolean.toString(run.passed(k)));
                    b.append(String.join(",", row.stream().map(VerificationReport::field).toList())).append('\n');
                }
            }
        }
        return b.toString();
    }

    /** A CSV field, quoted when it holds a comma, a quote or a line break (RFC 4180). */
    static String field(String text) {
        if (text.contains(",") || text.contains("\"") || text.contains("\n") || text.contains("\r")) {
            return "\"" + text.replace("\"", "\"\"") + "\"";
        }
        return text;
    }

    /** Shortest round-trip decimal; empty for NaN. */
    private static String number(double value) {
        return Double.isNaN(value) ? "" : Double.toString(value);
    }

    // ------------------------------------------------------------------ verification.json

    static ObjectNode json(VerificationSuite.Result result) {
        ObjectNode root = MAPPER.createObjectNode();
        root.put("suite", result.suite());
        root.put("passed", result.passed());
        root.put("checks", result.checks());
        root.put("failed_checks", result.failedChecks());
        root.put("seconds", result.seconds());
        root.put("threads", result.threads());
        root.put("filmshear_version", Version.get());
        root.put("java_version", System.getProperty("java.version"));
        ArrayNode cases = root.putArray("cases");
        for (VerificationRun run : result.runs()) {
            VerificationCase c = run.verificationCase();
            ObjectNode node = cases.addObject();
            node.put("name", c.name());
            node.put("kind", c.kind().name().toLowerCase(Locale.ROOT));
            node.put("source", c.source());
            node.put("problem", c.equations());
            node.put("refinement", c.refinement());
            node.put("passed", run.passed());
            node.put("seconds", run.seconds());
            if (run.failure() != null) {
                node.put("failure", run.failure());
            }
            ArrayNode levels = node.putArray("levels");
            for (Level l : c.levels()) {
                ObjectNode level = levels.addObject();
                level.put("points", l.points());
                put(level, "time_step_s", l.timeStep());
            }
            ArrayNode checks = node.putArray("checks");
            for (int k = 0; k < c.checks().size(); k++) {
                Check check = c.checks().get(k);
                ObjectNode cn = checks.addObject();
                cn.put("quantity", check.quantity());
                cn.put("unit", check.unit());
                if (check.rule() instanceof Rule.Order o) {
                    cn.put("rule", "order");
                    cn.put("expected_order", o.expected());
                    cn.put("band_low", o.low());
                    cn.put("band_high", o.high());
                } else {
                    cn.put("rule", "round_off");
                    cn.put("round_off_floor", ((Rule.RoundOff) check.rule()).floor());
                }
                ArrayNode errors = cn.putArray("errors");
                for (double e : run.errors(k)) {
                    add(errors, e);
                }
                ArrayNode orders = cn.putArray("observed_orders");
                for (double p : run.observedOrders(k)) {
                    add(orders, p);
                }
                cn.put("passed", run.passed(k));
            }
        }
        return root;
    }

    private static void put(ObjectNode node, String key, double value) {
        if (Double.isFinite(value)) {
            node.put(key, value);
        } else {
            node.putNull(key);
        }
    }

    private static void add(ArrayNode array, double value) {
        if (Double.isFinite(value)) {
            array.add(value);
        } else {
            array.addNull();
        }
    }

    // ------------------------------------------------------------------ report.html

    static String html(VerificationSuite.Result result, List<Plot> plots) {
        Map<String, Plot> plotOf = new LinkedHashMap<>();
        for (Plot p : plots) {
            plotOf.put(p.caseName(), p);
        }
        String verdict = result.passed() ? "Passed" : "Failed";
        StringBuilder h = new StringBuilder(256 * 1024);
        h.append("<!DOCTYPE html>\n<html lang=\"en\">\n<head>\n<meta charset=\"utf-8\"/>\n")
                .append("<meta name=\"viewport\" content=\"width=device-width, initial-scale=1\"/>\n")
                .append("<meta name=\"generator\" content=\"filmshear ").append(esc(Version.get())).append("\"/>\n")
                .append("<title>Verification report · filmshear ").append(esc(Version.get())).append("</title>\n")
                .append("<style>\n").append(VerificationStyle.CSS).append("</style>\n</head>\n<body>\n")
                .append("<div class=\"page\">\n<header class=\"title-block\">\n")
                .append("<p class=\"kicker\">filmshear · verification report</p>\n")
                .append("<h1>Code verification: ").append(esc(result.suite())).append(" suite</h1>\n<dl class=\"meta\">\n");
        meta(h, "Verdict", "<span class=\"" + (result.passed() ? "pass" : "fail") + "\">" + verdict + ": "
                + (result.checks() - result.failedChecks()) + " of " + result.checks() + " checks passed</span>");
        meta(h, "Cases", Integer.toString(result.runs().size()));
        meta(h, "Built with", "filmshear " + esc(Version.get()) + " on Java " + esc(System.getProperty("java.version")));
        meta(h, "Run time", esc(String.format(Locale.ROOT, "%.1f s on %d thread%s", result.seconds(), result.threads(),
                result.threads() == 1 ? "" : "s")));
        h.append("</dl>\n</header>\n");
        h.append("<aside class=\"box caution\" role=\"note\" aria-label=\"Safety caution\">\n")
                .append("<p class=\"box-head\">Safety caution</p>\n<p>").append(esc(Caution.TEXT)).append("</p>\n</aside>\n");
        h.append("<main>\n");
        reading(h);
        overview(h, result);
        h.append("<section id=\"cases\">\n<h2><span class=\"no\">3</span>The cases</h2>\n");
        int figure = 0;
        for (VerificationRun run : result.runs()) {
            Plot plot = plotOf.get(run.verificationCase().name());
            caseSection(h, run, plot, plot == null ? 0 : ++figure);
        }
        h.append("</section>\n");
        methods(h);
        build(h, result);
        h.append("</main>\n<footer><p>Verification report by filmshear ").append(esc(Version.get()))
                .append(". verification.csv and verification.json beside this page hold every number unrounded.</p>")
                .append("</footer>\n</div>\n</body>\n</html>\n");
        return h.toString();
    }

    private static void meta(StringBuilder h, String term, String htmlValue) {
        h.append("<div><dt>").append(esc(term)).append("</dt><dd>").append(htmlValue).append("</dd></div>\n");
    }

    private static void reading(StringBuilder h) {
        h.append("<section id=\"reading\">\n<h2><span class=\"no\">1</span>What was checked</h2>\n")
                .append("<p>Code verification asks whether the program solves its equations correctly. Each case has ")
                .append("an exact solution: a closed form from the literature, or a manufactured solution (chosen ")
                .append("smooth fields made exact by added source terms). Each is solved on a sequence of grids ")
                .append("whose spacing halves from level to level, with the time step refined with the grid or the ")
                .append("time error made negligible, as each case states. Errors are maximum norms over the nodes, or ")
                .append("absolute differences of wall values.</p>\n")
                .append("<p>Between two levels the observed order is p = ln(e<sub>coarse</sub> / e<sub>fine</sub>) / ")
                .append("ln r, with r the ratio of the grid spacings (2 here). The solver's scheme is second order in ")
                .append("space and time, so a check passes when every observed order lies in [1.8, 2.2]. Where the ")
                .append("scheme reproduces the exact solution (a linear velocity, a quadratic temperature) there is ")
                .append("no order to observe; such a check passes when every error stays below a round-off floor.</p>\n")
                .append("<p>The suite can fail: its tests run it on a deliberately perturbed discretization (a ")
                .append("first-order time scheme, a first-order wall derivative, a manufactured source missing a ")
                .append("term) and require it to report FAIL.</p>\n</section>\n");
    }

    private static void overview(StringBuilder h, VerificationSuite.Result result) {
        h.append("<section id=\"overview\">\n<h2><span class=\"no\">2</span>Overview</h2>\n")
                .append("<div class=\"table-scroll\">\n<table>\n<thead><tr><th scope=\"col\">Case</th>")
                .append("<th scope=\"col\">Exact solution</th><th scope=\"col\" class=\"num\">Nodes</th>")
                .append("<th scope=\"col\" class=\"num\">Checks passed</th><th scope=\"col\">Result</th></tr></thead>\n")
                .append("<tbody>\n");
        for (VerificationRun run : result.runs()) {
            VerificationCase c = run.verificationCase();
            int checks = c.checks().size();
            h.append("<tr><th scope=\"row\"><a href=\"#").append(anchor(c.name())).append("\">").append(esc(c.name()))
                    .append("</a></th><td>").append(esc(c.kind().label())).append("</td><td class=\"num\">")
                    .append(esc(points(c))).append("</td><td class=\"num\">").append(checks - run.failedChecks())
                    .append(" of ").append(checks).append("</td><td>").append(result(run.passed())).append("</td></tr>\n");
        }
        h.append("</tbody>\n</table>\n</div>\n</section>\n");
    }

    private static void caseSection(StringBuilder h, VerificationRun run, Plot plot, int figure) {
        VerificationCase c = run.verificationCase();
        h.append("<article class=\"case\" id=\"").append(anchor(c.name())).append("\">\n<h3>").append(esc(c.name()))
                .append(" ").append(result(run.passed())).append("</h3>\n<dl class=\"facts\">\n");
        boolean manufactured = c.kind() == VerificationCase.Kind.MANUFACTURED;
        sentences(h, manufactured ? "Manufactured solution" : "Problem", c.equations());
        fact(h, manufactured ? "Method" : "Source", c.source());
        fact(h, "Refinement", c.refinement());
        if (run.failure() != null) {
            fact(h, "Solver failure", run.failure());
        }
        h.append("</dl>\n");
        table(h, run);
        if (plot != null) {
            h.append("<figure>\n<img src=\"").append(plot.dataUri()).append("\" alt=\"")
                    .append(esc("Error against grid spacing, " + c.name())).append("\"/>\n<figcaption>")
                    .append("<span class=\"figno\">Figure ").append(figure).append(".</span> ")
                    .append(esc(c.name() + ": each error divided by its value on the coarsest grid, against the grid "
                            + "spacing divided by the coarsest spacing, on log-log axes. The dashed line has slope 2 "
                            + "(second order; drawn below the points, which run parallel to it when second order), "
                            + "the dotted line slope 1 (first order) through the first point; checks against a "
                            + "round-off floor are not drawn."))
                    .append(" <code>").append(esc(plot.fileName())).append("</code></figcaption>\n</figure>\n");
        }
        h.append("</article>\n");
    }

    /** A fact whose sentences each start a line: the long statements of the manufactured cases read better so. */
    private static void sentences(StringBuilder h, String term, String text) {
        List<String> lines = new ArrayList<>();
        for (String sentence : text.split("(?<=\\.) (?=[A-Z])")) {
            lines.add(esc(sentence));
        }
        h.append("<dt>").append(esc(term)).append("</dt><dd>").append(String.join("<br/>", lines)).append("</dd>\n");
    }

    private static void fact(StringBuilder h, String term, String text) {
        h.append("<dt>").append(esc(term)).append("</dt><dd>").append(esc(text)).append("</dd>\n");
    }

    private static void table(StringBuilder h, VerificationRun run) {
        VerificationCase c = run.verificationCase();
        List<Level> levels = c.levels();
        h.append("<div class=\"table-scroll\">\n<table class=\"errors\">\n<thead><tr><th scope=\"col\">Quantity</th>");
        for (Level l : levels) {
            h.append("<th scope=\"col\" class=\"num\">n = ").append(l.points()).append("</th>");
        }
        for (int k = 1; k < levels.size(); k++) {
            h.append("<th scope=\"col\" class=\"num\">p ").append(levels.get(k - 1).points()).append("→")
                    .append(levels.get(k).points()).append("</th>");
        }
        h.append("<th scope=\"col\">Expected</th><th scope=\"col\">Result</th></tr></thead>\n<tbody>\n");
        for (int k = 0; k < c.checks().size(); k++) {
            Check check = c.checks().get(k);
            h.append("<tr><th scope=\"row\">").append(esc(check.quantity() + " (" + check.unit() + ")")).append("</th>");
            for (double e : run.errors(k)) {
                h.append("<td class=\"num\">").append(esc(Double.isNaN(e) ? "–"
                        : String.format(Locale.ROOT, "%.3e", e))).append("</td>");
            }
            double[] orders = run.observedOrders(k);
            for (double p : orders) {
                h.append("<td class=\"num\">").append(check.rule() instanceof Rule.Order && !Double.isNaN(p)
                        ? String.format(Locale.ROOT, "%.2f", p) : "–").append("</td>");
            }
            h.append("<td>").append(esc(check.rule().describe(check.unit()))).append("</td><td>")
                    .append(result(run.passed(k))).append("</td></tr>\n");
        }
        h.append("</tbody>\n</table>\n</div>\n");
    }

    private static void methods(StringBuilder h) {
        h.append("<section id=\"methods\">\n<h2><span class=\"no\">4</span>Methods and references</h2>\n<ul>\n")
                .append("<li>Method of manufactured solutions: K. Salari, P. Knupp, <i>Code Verification by the Method ")
                .append("of Manufactured Solutions</i>, Sandia report SAND2000-1444, 2000. Every manufactured case ")
                .append("solves ").append(esc(ManufacturedVerification.SYSTEM)).append(".</li>\n")
                .append("<li>Grid Convergence Index and Richardson extrapolation, used by <code>filmshear run CASE.toml ")
                .append("--convergence</code> for the discretization error of a user's case: P. J. Roache, ")
                .append("<i>Verification and Validation in Computational Science and Engineering</i>, Hermosa, 1998; ")
                .append("ASME V&amp;V 20-2009, <i>Standard for Verification and Validation in Computational Fluid ")
                .append("Dynamics and Heat Transfer</i>; observed order for unequal ratios from I. B. Celik et al., ")
                .append("<i>J. Fluids Eng.</i> 130, 078001, 2008.</li>\n")
                .append("<li>The closed forms: the source named in each case above.</li>\n</ul>\n</section>\n");
    }

    private static void build(StringBuilder h, VerificationSuite.Result result) {
        h.append("<section id=\"build\">\n<h2><span class=\"no\">5</span>Build</h2>\n<dl class=\"facts\">\n");
        fact(h, "filmshear version", Version.get());
        fact(h, "Java", System.getProperty("java.version") + " (" + System.getProperty("java.vendor") + ")");
        fact(h, "Suite", result.suite() + ", " + result.runs().size() + " cases, " + result.checks() + " checks");
        h.append("</dl>\n</section>\n");
    }

    private static String result(boolean passed) {
        return passed ? "<span class=\"pass\">PASS</span>" : "<span class=\"fail\">FAIL</span>";
    }

    private static String points(VerificationCase c) {
        List<String> out = new ArrayList<>();
        for (Level l : c.levels()) {
            out.add(Integer.toString(l.points()));
        }
        return String.join(", ", out);
    }

    /** An id for a case's section. */
    static String anchor(String name) {
        return "case-" + slug(name);
    }

    /** Text for HTML, through the run report's escaper. */
    static String esc(String text) {
        return dev.filmshear.cli.report.Html.escape(text);
    }
}
