package dev.filmshear.cli.sweep;

import dev.filmshear.cli.output.Caution;
import dev.filmshear.cli.output.Version;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Base64;
import java.util.List;
import java.util.Map;

/**
 * report.html of a sweep folder: one self-contained page (the maps embedded as base64 data URIs, no
 * scripts, no outside files) with the plan, the counts, the warnings, the maps, the first failures and
 * the standing caution.
 */
final class SweepReport {
    static final String NAME = "report.html";
    /** Values of an axis shown in full; longer axes show their ends. */
    private static final int SHOWN_VALUES = 12;

    private SweepReport() {
    }

    static void write(Path dir, SweepPlan plan, SweepManifest manifest, SweepData data, List<SweepMaps.Drawn> maps)
            throws IOException {
        StringBuilder h = new StringBuilder(1 << 16);
        h.append("<!DOCTYPE html>\n<html lang=\"en\">\n<head>\n<meta charset=\"utf-8\">\n<title>Sweep ")
                .append(esc(plan.planName())).append("</title>\n<style>\n")
                .append("body{font-family:sans-serif;max-width:1020px;margin:2em auto;color:#222;line-height:1.4}\n")
                .append("table{border-collapse:collapse;margin:0.5em 0}td,th{border:1px solid #ccc;padding:3px 8px;")
                .append("text-align:left;vertical-align:top}th{background:#f3f0e6}code{font-size:0.95em}\n")
                .append("img{max-width:100%;border:1px solid #ddd;margin:0.5em 0}")
                .append(".caution{border-left:4px solid #c0612b;padding:0.5em 1em;background:#fbf4ec}\n")
                .append("</style>\n</head>\n<body>\n");
        h.append("<h1>Sweep of ").append(esc(plan.planName())).append("</h1>\n");
        long slice = manifest.shard().size(plan.caseCount());
        h.append("<p>Base case <code>").append(esc(plan.base())).append("</code>; ").append(plan.caseCount())
                .append(" cases");
        if (!manifest.shard().isWhole()) {
            h.append(", of which shard ").append(manifest.shard()).append(" holds ").append(slice);
        }
        h.append(". Plan SHA-256 <code>").append(plan.hash()).append("</code>; filmshear ")
                .append(esc(Version.get())).append(".</p>\n");

        h.append("<h2>Axes</h2>\n<table>\n<tr><th>case key</th><th>values (as written)</th><th>count</th>")
                .append("<th>spacing</th></tr>\n");
        for (Axis a : plan.axes()) {
            h.append("<tr><td><code>").append(esc(a.key())).append("</code></td><td>").append(esc(values(a)))
                    .append("</td><td>").append(a.size()).append("</td><td>")
                    .append(a.spacing().name().toLowerCase(java.util.Locale.ROOT)).append("</td></tr>\n");
        }
        h.append("</table>\n");

        h.append("<h2>Outcome</h2>\n<p>").append(data.ok).append(" ok, ").append(data.failed).append(" failed");
        long missing = slice - data.ok - data.failed;
        if (missing > 0) {
            h.append(", ").append(missing).append(" not run yet");
        }
        h.append(" (results.csv has one row per case).</p>\n");
        if (!data.warningCounts.isEmpty()) {
            h.append("<table>\n<tr><th>warning</th><th>cases</th></tr>\n");
            for (Map.Entry<String, Long> w : data.warningCounts.entrySet()) {
                h.append("<tr><td><code>").append(esc(w.getKey())).append("</code></td><td>").append(w.getValue())
                        .append("</td></tr>\n");
            }
            h.append("</table>\n");
        }

        h.append("<h2>Maps</h2>\n");
        if (maps.isEmpty()) {
            h.append("<p>").append(esc(noMapsReason(plan, manifest, data))).append("</p>\n");
        } else {
            h.append("<p>Grey cells with a cross: failed cases. Lines: boundaries where a warning or flag switches ")
                    .append("between neighbouring cases (").append(esc(flagNames(data))).append(").</p>\n");
            for (SweepMaps.Drawn m : maps) {
                byte[] png = Files.readAllBytes(dir.resolve(m.file()));
                h.append("<h3>").append(esc(SweepMaps.describe(m.column()))).append("</h3>\n<img alt=\"")
                        .append(esc(m.title())).append("\" src=\"data:image/png;base64,")
                        .append(Base64.getEncoder().encodeToString(png)).append("\">\n");
            }
        }

        if (!data.failures.isEmpty()) {
            h.append("<h2>Failed cases</h2>\n");
            if (data.failed > data.failures.size()) {
                h.append("<p>The first ").append(data.failures.size()).append(" of ").append(data.failed)
                        .append("; results.csv lists all.</p>\n");
            }
            h.append("<table>\n<tr><th>case</th>");
            for (Axis a : plan.axes()) {
                h.append("<th><code>").append(esc(a.key())).append("</code></th>");
            }
            h.append("<th>message</th></tr>\n");
            for (SweepData.Failure f : data.failures) {
                h.append("<tr><td>").append(f.index()).append("</td>");
                for (String v : f.values()) {
                    h.append("<td>").append(esc(v)).append("</td>");
                }
                h.append("<td>").append(esc(f.message())).append("</td></tr>\n");
            }
            h.append("</table>\n");
        }
        h.append("<p class=\"caution\">").append(esc(Caution.TEXT)).append("</p>\n</body>\n</html>\n");
        Path tmp = ResultsFile.temporary(dir.resolve(NAME));
        Files.writeString(tmp, h, StandardCharsets.UTF_8);
        ResultsFile.replace(tmp, dir.resolve(NAME));
    }

    private static String values(Axis a) {
        List<String> shown = new ArrayList<>();
        if (a.size() <= SHOWN_VALUES) {
            for (int i = 0; i < a.size(); i++) {
                shown.add(a.written(i));
            }
        } else {
            for (int i = 0; i < 5; i++) {
                shown.add(a.written(i));
            }
            shown.add("...");
            shown.add(a.written(a.size() - 2));
            shown.add(a.written(a.size() - 1));
        }
        return String.join(", ", shown);
    }

    private static String flagNames(SweepData data) {
        return data.flags.isEmpty() ? "none in this sweep" : String.join(", ", data.flags.keySet());
    }

    static String noMapsReason(SweepPlan plan, SweepManifest manifest, SweepData data) {
        if (!manifest.shard().isWhole()) {
            return "This folder holds one shard; merge the shards (filmshear merge) for the maps.";
        }
        if (plan.axes().size() > 2) {
            return "Maps are drawn for plans of one or two axes; this plan has " + plan.axes().size() + ".";
        }
        if (!data.gridded) {
            return "Maps are drawn for plans of at most " + SweepData.MAX_CELLS + " cases; this plan has "
                    + plan.caseCount() + ".";
        }
        return "None of the mapped columns (" + String.join(", ", SweepData.mapColumns(plan))
                + ") has a value in any case that finished.";
    }

    /** Text for HTML, through the run report's escaper. */
    static String esc(String text) {
        return dev.filmshear.cli.report.Html.escape(text);
    }
}
