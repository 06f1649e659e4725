package dev.filmshear.cli.fit;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

/** The command's options, its console report and its result folder. */
class FitCommandTest {

    private static final String OIL_CST = "temperature (degC), viscosity (cSt)\n20, 333\n40, 111.7\n60, 47.5\n80, 24.3\n";

    private static Path oilCst(Path dir) throws IOException {
        return Files.writeString(dir.resolve("oil.csv"), OIL_CST);
    }

    /** The one line an option error prints: the data file at line 0, the option as the key. */
    private static void assertOptionError(FitTesting.Outcome o, Path data, String option, String given) {
        assertEquals(2, o.code(), o.err());
        String err = o.err().strip();
        assertTrue(err.startsWith("error: " + data + ":0: " + option + ": "), err);
        assertTrue(err.contains("(given " + given), err);
        assertTrue(!err.contains("\n"), err);
    }

    @Test
    void anUnknownLawIsRefusedWithTheLawsAllowed(@TempDir Path dir) throws IOException {
        Path data = oilCst(dir);
        FitTesting.Outcome o = FitTesting.run("fit", data.toString(), "--law", "vogle", "--out", dir.toString());
        assertOptionError(o, data, "--law", "\"vogle\"");
        assertTrue(o.err().contains("allowed one of exponential, vogel, power, sutherland, walther"), o.err());
    }

    @Test
    void densityOptionsAreCheckedAndNamed(@TempDir Path dir) throws IOException {
        Path data = oilCst(dir);
        String out = dir.resolve("out").toString();
        assertOptionError(FitTesting.run("fit", data.toString(), "--law", "vogel", "--density", "870 K", "--out", out),
                data, "--density", "\"870 K\"");
        assertOptionError(FitTesting.run("fit", data.toString(), "--law", "vogel", "--density", "870 kg/m^3",
                "--expansion", "7e-4 1/K", "--out", out), data, "--density-temperature", "nothing");
        assertOptionError(FitTesting.run("fit", data.toString(), "--law", "vogel", "--expansion", "7e-4 1/K",
                "--density-temperature", "15 degC", "--out", out), data, "--density", "nothing");
        assertOptionError(FitTesting.run("fit", data.toString(), "--law", "vogel", "--density", "870 kg/m^3",
                "--expansion", "0.5 1/K", "--density-temperature", "15 degC", "--out", out), data, "--expansion",
                "\"0.5 1/K\"");
    }

    @Test
    void aMissingFileIsNamed(@TempDir Path dir) {
        Path data = dir.resolve("nowhere.csv");
        FitTesting.Outcome o = FitTesting.run("fit", data.toString(), "--law", "vogel", "--out", dir.toString());
        assertEquals(2, o.code());
        assertTrue(o.err().strip().startsWith("error: " + data + ":0: (file): no such file"), o.err());
    }

    /**
     * Kinematic data fitted with a dynamic law go through the density law: 333 cSt at 20 degC with
     * 870 kg/m^3 at 15 degC and 7e-4 1/K is 333e-6 * 870 * (1 - 7e-4 * 5) Pa s (references.md 6.1: the
     * expansion of lubricating oils, 6.5-7.5e-4 1/K).
     */
    @Test
    void kinematicDataAreFittedAsDynamicWithTheDensity(@TempDir Path dir) throws IOException {
        Path data = oilCst(dir);
        Path out = dir.resolve("out");
        FitTesting.Outcome o = FitTesting.run("fit", data.toString(), "--law", "vogel", "--density", "870 kg/m^3",
                "--density-temperature", "15 degC", "--expansion", "7e-4 1/K", "--out", out.toString());
        assertEquals(0, o.code(), o.err());
        var fit = FitTesting.json(out);
        double measured = fit.get("residuals").get(0).get("measured").asDouble();
        assertEquals(333e-6 * 870 * (1 - 7e-4 * 5), measured, 1e-12 * measured);
        assertTrue(fit.get("density").get("used").asBoolean());
        assertTrue(FitTesting.printedToml(o.out()).contains("# converted with density 870 kg/m^3 at 288.15 K"),
                o.out());
    }

    @Test
    void theConsoleShowsParametersWithErrorsAndOneResidualRowPerPoint(@TempDir Path dir) throws IOException {
        Path data = Files.writeString(dir.resolve("oil.csv"), "# sample\nT (degC), mu (mPa*s)\n"
                + "0, 519.382\n15, 161.845\n30, 65.0946\n45, 31.5259\n60, 17.4764\n75, 10.7751\n90, 7.0901\n");
        Path out = dir.resolve("out");
        FitTesting.Outcome o = FitTesting.run("fit", data.toString(), "--law", "vogel", "--out", out.toString());
        assertEquals(0, o.code(), o.err());
        String console = o.out();
        for (String parameter : new String[] {"a", "b", "c"}) {
            assertTrue(console.lines().anyMatch(l -> l.matches("  " + parameter + " +\\S+ (Pa\\*s|K) +\\+/- .*")),
                    parameter + " with unit and standard error:\n" + console);
        }
        for (int line = 3; line <= 9; line++) {
            int l = line;
            assertTrue(console.lines().anyMatch(row -> row.matches(" +" + l + " +\\S+ +\\S+ +\\S+ +-?\\d+\\.\\d+ %")),
                    "residual row for line " + line + ":\n" + console);
        }
        assertTrue(console.contains("RMS "), console);
        assertTrue(Files.size(out.resolve("fit.png")) > 0);
        assertTrue(Files.size(out.resolve("fit.json")) > 0);
        assertTrue(FitTesting.json(out).get("toml").asText().equals(FitTesting.printedToml(console)),
                "fit.json holds the printed lines");
    }

    @Test
    void theDefaultFolderIsNamedAfterTheDataFile() {
        assertEquals("oil", FitCommand.baseName(Path.of("data", "oil.csv")));
        assertEquals("run.2", FitCommand.baseName(Path.of("run.2.csv")));
        assertEquals("oil", FitCommand.baseName(Path.of("oil")));
    }
}
