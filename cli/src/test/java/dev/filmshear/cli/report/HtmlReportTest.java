package dev.filmshear.cli.report;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import dev.filmshear.cli.FilmshearCommand;
import dev.filmshear.cli.output.Caution;
import dev.filmshear.cli.output.Version;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.w3c.dom.Element;

import java.io.IOException;
import java.io.PrintWriter;
import java.io.StringWriter;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Arrays;
import java.util.Base64;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.stream.Stream;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

/**
 * report.html end to end: the demo and a heated case run in-process, then their pages read with an XML parser
 * (see {@link ReportPage}) and held against the folder's own files: summary.json and the PNG plots.
 */
class HtmlReportTest {
    /** The first eight bytes of every PNG file (PNG specification, 2nd ed., W3C 2003, section 5.2). */
    private static final byte[] PNG_SIGNATURE = {(byte) 0x89, 'P', 'N', 'G', '\r', '\n', 0x1a, '\n'};
    private static final String DATA_URI_PREFIX = "data:image/png;base64,";

    /** A title with every character HTML gives a meaning to. */
    private static final String AWKWARD_TITLE = "Vogel oil <start-up> & \"hot\" 'case', 25 um";

    /**
     * A heated start-up whose viscosity law is declared valid only to 320 K while the film reaches about 325 K, so
     * the run carries a warning; its title holds {@code < > & " '}.
     */
    private static final String HEATED_CASE = """
            title = "Vogel oil <start-up> & \\"hot\\" 'case', 25 um"
            # comment with markup: <b>not bold</b> & co.
            [geometry]
            gap = "25 um"
            [fluid]
            density = "860 kg/m^3"
            specific_heat = "1950 J/(kg*K)"
            thermal_conductivity = "0.13 W/(m*K)"
            [fluid.viscosity]
            law = "vogel"
            a = "5.264e-5 Pa*s"
            b = "948 K"
            c = "170 K"
            valid_to = "320 K"
            [lower_wall]
            velocity = "0 m/s"
            temperature = "313.15 K"
            [upper_wall]
            velocity = { kind = "ramp", to = "20 m/s", duration = "2 us" }
            temperature = "313.15 K"
            [initial]
            temperature = "313.15 K"
            [time]
            end = "40 ms"
            [output]
            times = ["5 us", "100 us", "5 ms"]
            plots = true
            """;

    @TempDir
    static Path work;
    private static Path demo;
    private static Path heated;
    private static Path heatedCase;

    @BeforeAll
    static void runTheDemoAndAHeatedCase() throws IOException {
        demo = work.resolve("demo");
        assertEquals(0, run("demo", "spindle-quill-startup", "--out", demo.toString()));
        heatedCase = work.resolve("heated.toml");
        Files.writeString(heatedCase, HEATED_CASE);
        heated = work.resolve("heated");
        assertEquals(0, run("run", heatedCase.toString(), "--out", heated.toString()));
    }

    private static int run(String... args) {
        return FilmshearCommand.run(new PrintWriter(new StringWriter()), new PrintWriter(new StringWriter()), args);
    }

    private static JsonNode summary(Path dir) throws IOException {
        return new ObjectMapper().readTree(dir.resolve("summary.json").toFile());
    }

    @Test
    void everyPlotInTheFolderIsEmbeddedAsItsOwnPng() throws IOException {
        for (Path dir : List.of(demo, heated)) {
            ReportPage page = ReportPage.read(dir.resolve(HtmlReport.FILE_NAME));
            List<Path> pngs;
            try (Stream<Path> files = Files.list(dir)) {
                pngs = files.filter(f -> f.toString().toLowerCase(Locale.ROOT).endsWith(".png")).sorted().toList();
            }
            List<Element> images = page.all("img");
            assertEquals(pngs.size(), images.size(), "one <img> per PNG file in " + dir);
            assertTrue(images.size() >= 2, "the demo draws velocity profiles and wall shear stress");
            List<byte[]> embedded = images.stream().map(img -> {
                String src = img.getAttribute("src");
                assertTrue(src.startsWith(DATA_URI_PREFIX), "a PNG data URI: " + src.substring(0, 40));
                byte[] bytes = Base64.getDecoder().decode(src.substring(DATA_URI_PREFIX.length()));
                assertArrayEquals(PNG_SIGNATURE, Arrays.copyOf(bytes, PNG_SIGNATURE.length), "PNG signature");
                assertFalse(img.getAttribute("alt").isBlank(), "every image has a text alternative");
                return bytes;
            }).toList();
            for (Path png : pngs) {
                byte[] file = Files.readAllBytes(png);
                assertTrue(embedded.stream().anyMatch(b -> Arrays.equals(b, file)), png + " is embedded byte for byte");
            }
        }
        assertEquals(5, ReportPage.read(heated.resolve(HtmlReport.FILE_NAME)).all("img").size(),
                "a heated film adds temperature, viscosity and highest-temperature plots");
    }

    @Test
    void thePageNeedsNothingFromOutside() throws IOException {
        for (Path dir : List.of(demo, heated)) {
            String raw = Files.readString(dir.resolve(HtmlReport.FILE_NAME));
            for (String outside : List.of("http://", "https://", "<script", "<link", "@import", "url(", "@font-face")) {
                assertFalse(raw.contains(outside), dir + " report holds " + outside);
            }
            ReportPage page = ReportPage.parse(raw);
            for (Element a : page.all("a")) {
                String href = a.getAttribute("href");
                assertTrue(href.startsWith("#"), "only links inside the page: " + href);
            }
            assertTrue(page.all("style").get(0).getTextContent().contains("@media print"), "a print stylesheet");
            assertTrue(raw.contains("name=\"viewport\""), "sized for phones");
        }
    }

    @Test
    void titleCautionVersionAndStatusStandInTheTitleBlock() throws IOException {
        ReportPage page = ReportPage.read(demo.resolve(HtmlReport.FILE_NAME));
        JsonNode summary = summary(demo);
        assertEquals(summary.get("title").asText(), page.all("h1").get(0).getTextContent());
        assertEquals(Caution.TEXT, page.one("aside", "caution").getElementsByTagName("p").item(1).getTextContent());
        String titleBlock = page.one("header", "title-block").getTextContent();
        assertTrue(titleBlock.contains("filmshear " + Version.get()), titleBlock);
        assertTrue(titleBlock.contains("spindle-quill-startup.toml"), titleBlock);
        assertTrue(titleBlock.contains("Complete: solved to t = 60\u00a0µs"), titleBlock);
        assertFalse(page.bodyText().contains("stopped early"), "a finished run does not say it stopped");
    }

    @Test
    void everyKeyResultAppearsFormattedWithItsUnit() throws IOException {
        for (Path dir : List.of(demo, heated)) {
            JsonNode summary = summary(dir);
            ReportPage page = ReportPage.read(dir.resolve(HtmlReport.FILE_NAME));
            String table = page.byId("results").getTextContent();
            int numeric = 0;
            for (Map.Entry<String, JsonNode> field : summary.properties()) {
                String key = field.getKey();
                String keyCell = "<td class=\"key\"><code>" + key + "</code></td>";
                if (SummaryRows.SHOWN_ELSEWHERE.contains(key) || field.getValue().isNull()) {
                    assertFalse(page.raw().contains(keyCell), key + " is not a row of the key results table");
                    continue;
                }
                assertTrue(page.raw().contains(keyCell), key + " has a row");
                assertTrue(table.contains(SummaryRows.value(key, field.getValue())), key + " shown formatted");
                numeric += field.getValue().isNumber() ? 1 : 0;
            }
            assertTrue(numeric > 20, "the summary's numbers reach the table");
        }
        // the wall shear stresses as a reader sees them: 22459.198... Pa to five figures in kilopascals
        String table = ReportPage.read(heated.resolve(HtmlReport.FILE_NAME)).byId("results").getTextContent();
        assertTrue(table.contains("Wall shear stress, lower wall22.459\u00a0kPa"), table);
        assertTrue(table.contains("Wall shear stress, upper wall22.459\u00a0kPa"), table);
        assertTrue(table.contains("Nahme number5.633"), table);
    }

    @Test
    void theHeatedCaseShowsItsWarningAndItsTitleEscaped() throws IOException {
        JsonNode summary = summary(heated);
        ReportPage page = ReportPage.read(heated.resolve(HtmlReport.FILE_NAME));
        assertEquals(AWKWARD_TITLE, summary.get("title").asText());
        assertEquals(AWKWARD_TITLE, page.all("h1").get(0).getTextContent());
        assertTrue(page.raw().contains(Html.escape(AWKWARD_TITLE)), "the title escaped in the markup");
        assertFalse(page.raw().contains("<start-up>"), "no markup from the title");

        List<Element> boxes = page.all("li").stream().filter(li -> li.getAttribute("class").contains("warning"))
                .toList();
        assertTrue(summary.get("warnings").size() >= 1, "the 320 K validity limit is passed");
        assertEquals(summary.get("warnings").size(), boxes.size(), "one box per warning");
        for (int i = 0; i < boxes.size(); i++) {
            String box = boxes.get(i).getTextContent();
            assertTrue(box.contains(summary.get("warnings").get(i).asText()), box);
            assertTrue(box.contains(summary.get("warning_codes").get(i).asText()), box);
        }
        assertTrue(page.one("header", "title-block").getTextContent().contains("Warnings1"), "the count up top");
    }

    @Test
    void theComparisonWithTheClosedFormIsShownWhenTheSummaryHasOne() throws IOException {
        JsonNode analytic = summary(demo).get("analytic");
        String section = ReportPage.read(demo.resolve(HtmlReport.FILE_NAME)).byId("analytic").getTextContent();
        assertTrue(section.contains(analytic.get("solution").asText()), section);
        assertTrue(section.contains(analytic.get("source").asText()), section);
        assertTrue(section.contains(SummaryRows.value("velocity_max_relative_error",
                analytic.get("velocity_max_relative_error"))), section);
        assertFalse(summary(heated).has("analytic"), "a heated Vogel film has no closed form");
        assertTrue(ReportPage.read(heated.resolve(HtmlReport.FILE_NAME)).all("section").stream()
                .noneMatch(s -> s.getAttribute("id").equals("analytic")));
    }

    @Test
    void theCaseAppearsResolvedAndAsWrittenEscaped() throws IOException {
        // what CaseRunner hands the report: check's lines and the file as written
        StringWriter checked = new StringWriter();
        assertEquals(0, FilmshearCommand.run(new PrintWriter(checked), new PrintWriter(new StringWriter()), "check",
                heatedCase.toString()));
        String written = Files.readString(heatedCase);
        Path dir = work.resolve("with-case");
        Files.createDirectories(dir);
        HtmlReport.write(dir, summary(heated), new CaseText(checked.toString(), written));

        ReportPage page = ReportPage.read(dir.resolve(HtmlReport.FILE_NAME));
        // each <pre> opens with a line break that HTML drops and XML keeps
        assertEquals("\n" + written, page.one("pre", "case-written").getTextContent());
        assertEquals("\n" + checked.toString().stripTrailing(), page.one("pre", "case-si").getTextContent());
        assertTrue(page.raw().contains("# comment with markup: &lt;b&gt;not bold&lt;/b&gt; &amp; co."));
        assertTrue(page.one("pre", "case-si").getTextContent().contains("viscosity law"), "check's lines");
    }

    @Test
    void aFailedRunsReportSaysItStoppedEarlyAndWhy() throws IOException {
        // the same overheating case as CommandLineTest: the density law breaks down within the 10 ms asked for
        Path caseFile = work.resolve("overheat.toml");
        Files.writeString(caseFile, dev.filmshear.cli.CommandLineTest.OVERHEATING_CASE);
        Path out = work.resolve("overheat");
        assertEquals(3, run("run", caseFile.toString(), "--out", out.toString()));
        JsonNode summary = summary(out);
        ReportPage page = ReportPage.read(out.resolve(HtmlReport.FILE_NAME));
        Element stopped = page.one("div", "stopped");
        assertTrue(stopped.getTextContent().strip().startsWith("Run stopped early"), stopped.getTextContent());
        assertTrue(stopped.getTextContent().contains(summary.get("failure").asText()), stopped.getTextContent());
        assertTrue(page.one("header", "title-block").getTextContent().contains("Stopped early"));
        assertFalse(page.bodyText().contains("Complete"), "a failed run is never called complete");
        assertEquals(Caution.TEXT, page.one("aside", "caution").getElementsByTagName("p").item(1).getTextContent());
    }
}
