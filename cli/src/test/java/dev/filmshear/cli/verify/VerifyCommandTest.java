package dev.filmshear.cli.verify;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import dev.filmshear.cli.FilmshearCommand;
import dev.filmshear.cli.output.Version;
import dev.filmshear.solver.model.SolverOptions;
import dev.filmshear.solver.time.DirkScheme;
import dev.filmshear.validation.mms.ManufacturedCases;
import dev.filmshear.validation.suite.ManufacturedVerification;
import dev.filmshear.validation.suite.VerificationCase;
import dev.filmshear.validation.suite.VerificationSuite;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.w3c.dom.Element;

import java.io.IOException;
import java.io.PrintWriter;
import java.io.StringWriter;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Base64;
import java.util.List;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

/** {@code verify} end to end, in-process: exit codes, the table, and the report a reviewer receives. */
class VerifyCommandTest {
    /** The first eight bytes of every PNG file (PNG specification, ISO/IEC 15948:2004, section 5.2). */
    private static final byte[] PNG_SIGNATURE = {(byte) 0x89, 'P', 'N', 'G', '\r', '\n', 0x1a, '\n'};
    private static final String DATA_URI = "data:image/png;base64,";

    record Outcome(int code, String out, String err) {
    }

    static Outcome run(String... args) {
        StringWriter out = new StringWriter();
        StringWriter err = new StringWriter();
        int code = FilmshearCommand.run(new PrintWriter(out, true), new PrintWriter(err, true), args);
        return new Outcome(code, out.toString(), err.toString());
    }

    @Test
    void quickSuitePassesAndWritesASelfContainedReport(@TempDir Path dir) throws IOException {
        Outcome o = run("verify", "--quick", "--out", dir.toString());
        assertEquals(0, o.code(), o.out() + o.err());
        assertTrue(o.out().contains("PASSED: 46 of 46 checks passed"), o.out());
        assertTrue(o.err().isEmpty(), o.err());

        Page page = Page.read(dir.resolve(VerificationReport.HTML));
        String text = page.text();
        List<VerificationCase> cases = VerificationSuite.quick().cases();
        for (VerificationCase c : cases) {
            assertTrue(text.contains(c.name()), "report names " + c.name());
            assertTrue(text.contains(c.source()), "report cites the source of " + c.name());
        }
        assertTrue(text.contains("filmshear " + Version.get()), "the build's version");
        assertTrue(text.contains("Salari") && text.contains("Roache") && text.contains("ASME V&V 20-2009"), text);
        assertTrue(text.contains("u_m = 1 m/s sin(100 t) eta + 0.3 m/s (1 - cos(100 t)) sin(pi eta)"),
                "the manufactured fields written out");
        assertTrue(text.contains("S_T = rho(T_m) cp dT_m/dt - k d2T_m/dy2 - mu(T_m) (du_m/dy)^2"), "the sources");
        assertTrue(text.contains("Caution:"), "the standing caution");

        List<Element> images = page.all("img");
        assertEquals(cases.size() - 3, images.size(), "a plot for every case with an order (three are round-off only)");
        for (Element img : images) {
            String src = img.getAttribute("src");
            assertTrue(src.startsWith(DATA_URI), "embedded, not linked");
            byte[] png = Base64.getDecoder().decode(src.substring(DATA_URI.length()));
            byte[] head = new byte[PNG_SIGNATURE.length];
            System.arraycopy(png, 0, head, 0, head.length);
            assertArrayEquals(PNG_SIGNATURE, head);
        }
        assertFalse(page.raw().contains("http://") || page.raw().contains("https://") || page.raw().contains("<script"),
                "nothing fetched, nothing run");

        List<String> csv = Files.readAllLines(dir.resolve(VerificationReport.CSV));
        assertEquals(VerificationReport.CSV_HEADER, csv.get(0));
        int rows = cases.stream().mapToInt(c -> c.checks().size() * c.levels().size()).sum();
        assertEquals(rows + 1, csv.size());
        JsonNode json = new ObjectMapper().readTree(dir.resolve(VerificationReport.JSON).toFile());
        assertTrue(json.get("passed").asBoolean());
        assertEquals(46, json.get("checks").asInt());
        assertEquals(cases.size(), json.get("cases").size());
        assertEquals(Version.get(), json.get("filmshear_version").asText());
    }

    @Test
    void aFailingSuiteMapsToExitCodeThreeAndAReportThatSaysFail(@TempDir Path dir) throws IOException {
        // backward Euler, first order in time (references.md 10.1), through a manufactured case refined dt ~ dy
        VerificationSuite.Result result = new VerificationSuite("perturbed", List.of(ManufacturedVerification.of(
                ManufacturedCases.fixedWalls(), new int[] {21, 41, 81},
                SolverOptions.defaults().withScheme(DirkScheme.BACKWARD_EULER)))).run();
        assertFalse(result.passed());
        assertEquals(3, VerifyCommand.exitCode(result));
        VerificationReport.write(dir, result);
        String text = Page.read(dir.resolve(VerificationReport.HTML)).text();
        assertTrue(text.contains("Failed: 0 of 2 checks passed"), text);
        assertTrue(text.contains("FAIL"));
        assertTrue(text.contains("BACKWARD-EULER"), "the scheme is named in the refinement");
    }

    @Test
    void badThreadCountIsBadInput() {
        Outcome o = run("verify", "--quick", "--threads", "0");
        assertEquals(2, o.code());
        assertTrue(o.err().startsWith("error: threads: 0"), o.err());
    }

    @Test
    void helpListsTheCommand() {
        Outcome o = run("--help");
        assertTrue(o.out().contains("verify"), o.out());
        Outcome v = run("help", "verify");
        assertTrue(v.out().contains("--quick") && v.out().contains("--out"), v.out());
    }
}
