package dev.filmshear.cli.report;

import com.fasterxml.jackson.databind.JsonNode;
import dev.filmshear.cli.output.Caution;
import dev.filmshear.cli.output.Version;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Set;

/**
 * {@code report.html}: one self-contained page per result folder, for reading on a screen, a phone or paper.
 *
 * <p>Layout: a title block (title, case file, completion status, warning count, the filmshear version; no date,
 * so the same run gives the same page), a "stopped early" box when the run failed, the standing safety caution,
 * a list of contents, then numbered sections: key results, warnings, the comparison with the closed-form
 * solution (when the summary has one), the plots, and the case (resolved in SI units and as written).
 *
 * <p>Self-contained: the CSS is inline ({@link ReportStyle}), each plot is a {@code data:image/png;base64} URI,
 * there is no script, no web font and no link off the page. Every piece of text from the run passes through
 * {@link Html#escape}; the markup is written so that it also parses as XML (void elements closed, attributes
 * quoted), which lets the tests read it with the JDK's own parser.
 */
public final class HtmlReport {
    /** The report's file name in the result folder. */
    public static final String FILE_NAME = "report.html";

    private HtmlReport() {
    }

    /**
     * Writes {@value #FILE_NAME} into {@code dir}, embedding every PNG already there.
     *
     * @param dir the result folder, holding the plots
     * @param summary the tree written to summary.json
     * @param caseText the case in SI units and as written, or null when the caller has none
     */
    public static void write(Path dir, JsonNode summary, CaseText caseText) throws IOException {
        Files.writeString(dir.resolve(FILE_NAME), render(summary, Figure.inFolder(dir), caseText),
                StandardCharsets.UTF_8);
    }

    /** A numbered part of the page. */
    private record Section(String id, String title, String body) {
    }

    /** The page as text. */
    static String render(JsonNode summary, List<Figure> figures, CaseText caseText) {
        String title = summary.path("title").asText("");
        String caseFile = summary.path("case_file").asText("");
        String heading = !title.isBlank() ? title : !caseFile.isBlank() ? caseFile : "filmshear run";
        List<String> warnings = strings(summary.path("warnings"));

        List<Section> sections = new ArrayList<>();
        sections.add(new Section("results", "Key results", keyResults(summary)));
        sections.add(new Section("warnings", "Warnings", warnings(warnings, strings(summary.path("warning_codes")))));
        if (summary.path("analytic").isObject()) {
            sections.add(new Section("analytic", "Comparison with the closed-form solution",
                    analytic(summary.get("analytic"))));
        }
        sections.add(new Section("plots", "Plots", plots(figures)));
        sections.add(new Section("case", "The case", caseSection(caseFile, caseText)));

        StringBuilder h = new StringBuilder(64 * 1024);
        h.append("<!DOCTYPE html>\n<html lang=\"en\">\n<head>\n<meta charset=\"utf-8\"/>\n")
                .append("<meta name=\"viewport\" content=\"width=device-width, initial-scale=1\"/>\n")
                .append("<meta name=\"generator\" content=\"filmshear ").append(esc(Version.get())).append("\"/>\n")
                .append("<title>").append(esc(heading)).append(" · filmshear report</title>\n")
                .append("<style>\n").append(ReportStyle.CSS).append("</style>\n</head>\n")
                .append("<body>\n<div class=\"page\">\n");
        titleBlock(h, summary, heading, caseFile, warnings.size());
        stoppedEarly(h, summary);
        h.append("<aside class=\"box caution\" role=\"note\" aria-label=\"Safety caution\">\n")
                .append("<p class=\"box-head\">Safety caution</p>\n<p>").append(esc(Caution.TEXT))
                .append("</p>\n</aside>\n");
        h.append("<nav class=\"contents\" aria-label=\"Contents\"><strong>Contents</strong>\n<ol>\n");
        for (Section s : sections) {
            h.append("<li><a href=\"#").append(s.id()).append("\">").append(esc(s.title())).append("</a></li>\n");
        }
        h.append("</ol>\n</nav>\n<main>\n");
        for (int i = 0; i < sections.size(); i++) {
            Section s = sections.get(i);
            h.append("<section id=\"").append(s.id()).append("\">\n<h2><span class=\"no\">").append(i + 1)
                    .append("</span>").append(esc(s.title())).append("</h2>\n").append(s.body()).append("</section>\n");
        }
        h.append("</main>\n<footer><p>Report of the files in this folder by filmshear ").append(esc(Version.get()))
                .append(". Values are rounded to ").append(ValueFormat.SIGNIFICANT)
                .append(" significant figures; summary.json holds them unrounded, in SI units.</p></footer>\n")
                .append("</div>\n</body>\n</html>\n");
        return h.toString();
    }

    /** True when the summary says the run did not reach its end. */
    static boolean stoppedEarly(JsonNode summary) {
        return !summary.path("complete").asBoolean(true) || summary.hasNonNull("failure");
    }

    private static void titleBlock(StringBuilder h, JsonNode summary, String heading, String caseFile,
                                   int warningCount) {
        h.append("<header class=\"title-block\">\n<p class=\"kicker\">filmshear · result report</p>\n<h1>")
                .append(esc(heading)).append("</h1>\n<dl class=\"meta\">\n");
        if (!caseFile.isBlank()) {
            meta(h, "Case file", "<code>" + esc(caseFile) + "</code>");
        }
        meta(h, "Status", stoppedEarly(summary)
                ? "<span class=\"status-failed\">" + esc(stoppedText(summary)) + "</span>"
                : "<span class=\"status-ok\">" + esc(completeText(summary)) + "</span>");
        meta(h, "Warnings", warningCount == 0 ? "<a href=\"#warnings\">none</a>"
                : "<a class=\"warn-count\" href=\"#warnings\">" + warningCount + "</a>");
        meta(h, "Built with", "filmshear " + esc(Version.get()));
        h.append("</dl>\n</header>\n");
    }

    private static void meta(StringBuilder h, String term, String htmlValue) {
        h.append("<div><dt>").append(esc(term)).append("</dt><dd>").append(htmlValue).append("</dd></div>\n");
    }

    private static String completeText(JsonNode summary) {
        JsonNode end = summary.path("end_time_s");
        boolean steady = summary.path("steady").asBoolean(false);
        if (!end.isNumber()) {
            return steady ? "Complete: steady solution" : "Complete";
        }
        String reached = "Complete: solved to t = " + time(end);
        return steady ? reached + "; the film had settled" : reached;
    }

    private static String stoppedText(JsonNode summary) {
        JsonNode end = summary.path("end_time_s");
        return end.isNumber() ? "Stopped early, at t = " + time(end) : "Stopped early";
    }

    private static String time(JsonNode seconds) {
        return ValueFormat.quantity(seconds.doubleValue(), ValueFormat.unitOf("end_time_s"));
    }

    private static void stoppedEarly(StringBuilder h, JsonNode summary) {
        if (!stoppedEarly(summary)) {
            return;
        }
        String why = summary.hasNonNull("failure") ? summary.get("failure").asText() : "no reason was recorded";
        h.append("<div class=\"box stopped\" role=\"alert\">\n<p class=\"box-head\">Run stopped early</p>\n")
                .append("<p>The run stopped before its end: ").append(esc(why)).append("</p>\n")
                .append("<p>Every value, plot and table below is what had been computed up to that point, not the ")
                .append("result of a finished run.</p>\n</div>\n");
    }

    private static String keyResults(JsonNode summary) {
        List<SummaryRows.Row> rows = SummaryRows.keyResults(summary);
        if (rows.isEmpty()) {
            return "<p class=\"quiet\">The summary holds no results.</p>\n";
        }
        StringBuilder h = new StringBuilder();
        tableHead(h, "Key in summary.json");
        SummaryRows.Group group = null;
        for (SummaryRows.Row row : rows) {
            if (row.group() != group) {
                h.append(group == null ? "<tbody>\n" : "</tbody>\n<tbody>\n")
                        .append("<tr class=\"group\"><th colspan=\"3\" scope=\"rowgroup\">")
                        .append(esc(row.group().title())).append("</th></tr>\n");
                group = row.group();
            }
            row(h, row);
        }
        return h.append("</tbody>\n</table>\n</div>\n").toString();
    }

    private static void tableHead(StringBuilder h, String keyColumn) {
        h.append("<div class=\"table-scroll\">\n<table>\n<thead><tr><th scope=\"col\">Quantity</th>")
                .append("<th scope=\"col\" class=\"num\">Value</th><th scope=\"col\">").append(esc(keyColumn))
                .append("</th></tr></thead>\n");
    }

    private static void row(StringBuilder h, SummaryRows.Row row) {
        h.append("<tr><th scope=\"row\">").append(esc(row.label())).append("</th><td class=\"num\">")
                .append(esc(row.value())).append("</td><td class=\"key\"><code>").append(esc(row.key()))
                .append("</code></td></tr>\n");
    }

    private static String warnings(List<String> messages, List<String> codes) {
        if (messages.isEmpty()) {
            return "<p class=\"quiet\">The run raised no warnings.</p>\n";
        }
        StringBuilder h = new StringBuilder("<ul class=\"warnings\">\n");
        for (int i = 0; i < messages.size(); i++) {
            String code = i < codes.size() ? codes.get(i) : "";
            h.append("<li class=\"box warning\">\n<p class=\"box-head\">Warning")
                    .append(code.isEmpty() ? "" : " · <code>" + esc(code) + "</code>").append("</p>\n<p>")
                    .append(esc(messages.get(i))).append("</p>\n</li>\n");
        }
        return h.append("</ul>\n").toString();
    }

    private static String analytic(JsonNode analytic) {
        StringBuilder h = new StringBuilder("<dl class=\"facts\">\n");
        for (String key : List.of("solution", "source")) {
            if (analytic.hasNonNull(key)) {
                h.append("<dt>").append(key.equals("solution") ? "Closed-form solution" : "Source").append("</dt><dd>")
                        .append(esc(analytic.get(key).asText())).append("</dd>\n");
            }
        }
        h.append("</dl>\n");
        List<SummaryRows.Row> rows = SummaryRows.rows(analytic, Set.of("solution", "source"));
        if (!rows.isEmpty()) {
            tableHead(h, "Key in summary.json (analytic)");
            h.append("<tbody>\n");
            rows.forEach(r -> row(h, r));
            h.append("</tbody>\n</table>\n</div>\n");
        }
        return h.toString();
    }

    private static String plots(List<Figure> figures) {
        if (figures.isEmpty()) {
            return "<p class=\"quiet\">No plots in this folder; <code>plots = true</code> under <code>[output]</code> "
                    + "in the case draws them.</p>\n";
        }
        StringBuilder h = new StringBuilder();
        for (int i = 0; i < figures.size(); i++) {
            Figure f = figures.get(i);
            h.append("<figure>\n<img src=\"").append(f.dataUri()).append("\" alt=\"").append(esc(f.caption()))
                    .append("\"/>\n<figcaption><span class=\"figno\">Figure ").append(i + 1).append(".</span> ")
                    .append(esc(f.caption())).append(" <code>").append(esc(f.fileName()))
                    .append("</code></figcaption>\n</figure>\n");
        }
        return h.toString();
    }

    /** Each {@code <pre>} opens with a line break, which HTML drops, so a text that starts with one keeps it. */
    private static String caseSection(String caseFile, CaseText caseText) {
        StringBuilder h = new StringBuilder();
        if (!caseFile.isBlank()) {
            h.append("<p>Case file <code>").append(esc(caseFile)).append("</code>.</p>\n");
        }
        if (caseText == null) {
            return h.append("<p class=\"quiet\">The case text was not recorded with this result.</p>\n").toString();
        }
        h.append("<h3 id=\"case-si\">Resolved, in SI units</h3>\n")
                .append("<p class=\"quiet\">As <code>filmshear check</code> reads it, with its derived numbers.</p>\n")
                .append("<pre class=\"case-si\">\n").append(esc(caseText.resolved().stripTrailing())).append("</pre>\n")
                .append("<h3 id=\"case-written\">As written</h3>\n")
                .append("<pre class=\"case-written\">\n").append(esc(caseText.asWritten())).append("</pre>\n");
        return h.toString();
    }

    private static List<String> strings(JsonNode array) {
        List<String> out = new ArrayList<>();
        for (JsonNode element : array) {
            if (!element.isNull()) {
                out.add(element.asText());
            }
        }
        return out;
    }

    private static String esc(String text) {
        return Html.escape(text);
    }
}
