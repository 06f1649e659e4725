package dev.filmshear.cli;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

import java.io.IOException;
import java.io.PrintWriter;
import java.io.StringWriter;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

/** The command line end to end, in-process: exit codes, result files and their contract headers and keys. */
public class CommandLineTest {

    /**
     * A heated film whose walls pour in heat until its density law (thermal expansion 0.0099 1/K) would give no
     * positive density, about 101 K above the reference, well within the 10 ms asked for: a run that must fail
     * part-way. Line 20 holds [time] end.
     */
    public static final String OVERHEATING_CASE = """
                title = "heat poured in until the density law breaks down"
                [geometry]
                gap = "25 um"
                [fluid]
                density = "860 kg/m^3"
                thermal_expansion = "0.0099 1/K"
                specific_heat = "1950 J/(kg*K)"
                thermal_conductivity = "0.13 W/(m*K)"
                [fluid.viscosity]
                law = "constant"
                value = "30 mPa*s"
                [lower_wall]
                heat_flux = "5e7 W/m^2"
                [upper_wall]
                velocity = "1 m/s"
                heat_flux = "5e7 W/m^2"
                [initial]
                temperature = "40 degC"
                [time]
                end = "10 ms"
                """;

    /** Output of one in-process run. */
    record Outcome(int code, String out, String err) {
    }

    static Outcome run(String... args) {
        StringWriter out = new StringWriter();
        StringWriter err = new StringWriter();
        int code = FilmshearCommand.run(new PrintWriter(out, true), new PrintWriter(err, true), args);
        return new Outcome(code, out.toString(), err.toString());
    }

    @Test
    void demoRunsTheHeatedJournalStartUpWithItsJournalKeys(@TempDir Path dir) throws IOException {
        Outcome o = run("demo", "--out", dir.toString());
        assertEquals(0, o.code(), o.err());
        JsonNode summary = new ObjectMapper().readTree(dir.resolve("summary.json").toFile());
        for (String key : List.of("friction_torque_N_m", "friction_power_W", "petroff_torque_N_m")) {
            assertTrue(summary.get(key).isNumber(), "journal key " + key);
        }
        assertTrue(summary.get("max_temperature_K").asDouble() > 313.15, "the film heats up");
        for (String file : List.of("temperature_profiles.png", "viscosity_profiles.png", "max_temperature.png",
                "shaft_speed_and_torque.png")) {
            assertTrue(Files.size(dir.resolve(file)) > 0, file);
        }
    }

    @Test
    void everyBundledExampleIsListedAndReads(@TempDir Path dir) throws IOException {
        Outcome list = run("demo", "--list");
        assertEquals(0, list.code(), list.err());
        for (String example : DemoCommand.EXAMPLES) {
            assertTrue(list.out().contains(example), example);
            Outcome saved = run("demo", example, "--save", dir.toString());
            assertEquals(0, saved.code(), saved.err());
            assertEquals(0, run("check", dir.resolve(example + ".toml").toString()).code(), example);
        }
        assertEquals(2, run("demo", "no-such-example").code());
    }

    @Test
    void quillExampleWritesEveryResultFileWithTheContractsNames(@TempDir Path dir) throws IOException {
        Outcome o = run("demo", "spindle-quill-startup", "--out", dir.toString());
        assertEquals(0, o.code(), o.err());
        for (String file : List.of("summary.json", "history.csv", "profiles.csv", "velocity_profiles.png",
                "wall_shear_stress.png")) {
            assertTrue(Files.size(dir.resolve(file)) > 0, file);
        }
        JsonNode summary = new ObjectMapper().readTree(dir.resolve("summary.json").toFile());
        for (String key : List.of("title", "steady", "end_time_s", "wall_shear_stress_lower_Pa",
                "wall_shear_stress_upper_Pa", "lower_wall_temperature_K", "upper_wall_temperature_K",
                "max_temperature_K", "mean_temperature_K", "dissipation_W_per_m2", "reynolds_number", "warnings",
                "steps", "caution")) {
            assertTrue(summary.has(key), "summary.json has " + key);
        }
        assertEquals(6e-5, summary.get("end_time_s").asDouble(), 0, "the end time as written: 60 us");
        // the demo belongs to the constant-property family: compared with its closed form
        assertTrue(summary.get("analytic").get("velocity_max_relative_error").asDouble() < 1e-4);

        List<String> history = Files.readAllLines(dir.resolve("history.csv"));
        assertTrue(history.get(0).startsWith("time_s,upper_wall_velocity_m_per_s,wall_shear_stress_lower_Pa,"
                + "wall_shear_stress_upper_Pa,max_temperature_K,dissipation_W_per_m2"));
        // one row exactly at each requested output time
        for (double t : new double[] {1e-6, 2e-6, 5e-6, 1e-5, 2e-5, 6e-5}) {
            assertTrue(history.stream().anyMatch(line -> line.startsWith(Double.toString(t) + ",")),
                    "history row at " + t);
        }
        List<String> profiles = Files.readAllLines(dir.resolve("profiles.csv"));
        assertEquals("time_s,y_m,velocity_m_per_s,temperature_K,viscosity_Pa_s", profiles.get(0));
        assertEquals(1 + 6 * 201, profiles.size(), "six profiles of 201 nodes");
        assertTrue(o.out().contains("Caution"), "the console carries the caution");
    }

    @Test
    void runWritesToTheDefaultFolderNamedAfterTheCase(@TempDir Path dir) throws IOException {
        Path caseFile = dir.resolve("quill.toml");
        Files.writeString(caseFile, DemoCommand.Examples.read("spindle-quill-startup"));
        Path out = dir.resolve("results");
        Outcome o = run("run", caseFile.toString(), "--out", out.toString());
        assertEquals(0, o.code(), o.err());
        assertTrue(Files.exists(out.resolve("summary.json")));
        assertEquals("out/quill", Path.of("out", RunCommand.baseName(caseFile)).toString());
    }

    @Test
    void checkPrintsTheResolvedCaseAndItsNumbersWithoutSolving(@TempDir Path dir) throws IOException {
        Path caseFile = dir.resolve("quill.toml");
        Files.writeString(caseFile, DemoCommand.Examples.read("spindle-quill-startup"));
        Outcome o = run("check", caseFile.toString());
        assertEquals(0, o.code(), o.err());
        assertTrue(o.out().contains("gap                 2.0E-5 m"), o.out());
        assertTrue(o.out().contains("momentum time scale"), o.out());
        assertTrue(o.out().contains("Reynolds number"), o.out());
        assertFalse(Files.exists(dir.resolve("out")), "check solves nothing and writes nothing");
    }

    @Test
    void badInputIsOneLineWithExitCodeTwo(@TempDir Path dir) throws IOException {
        Path caseFile = dir.resolve("bad.toml");
        Files.writeString(caseFile, "[geometry]\ngap = \"25 m/s\"\n");
        Outcome o = run("run", caseFile.toString());
        assertEquals(2, o.code());
        String[] lines = o.err().strip().split("\n");
        assertEquals(1, lines.length, o.err());
        assertTrue(lines[0].startsWith("error: " + caseFile + ":2: geometry.gap: "), lines[0]);
        assertFalse(o.err().contains("at dev.filmshear"), "no stack trace");

        Outcome usage = run("frobnicate");
        assertEquals(2, usage.code());
        assertEquals(1, usage.err().strip().split("\n").length, usage.err());
    }

    /**
     * A run that fails part-way keeps what it computed: a heated film whose walls pour in heat until its
     * density law (thermal expansion 0.0099 1/K) would give no positive density, about 101 K above the
     * reference. The solver stops with exit code 3, a one-line message, and the result folder holds the
     * history up to the failure.
     */
    @Test
    void aFailedRunKeepsWhatItComputedWithExitCodeThree(@TempDir Path dir) throws IOException {
        Path caseFile = dir.resolve("overheat.toml");
        Files.writeString(caseFile, OVERHEATING_CASE);
        Path out = dir.resolve("out");
        Outcome o = run("run", caseFile.toString(), "--out", out.toString());
        assertEquals(3, o.code(), o.err());
        String[] lines = o.err().strip().split("\n");
        assertEquals(1, lines.length, o.err());
        assertTrue(lines[0].startsWith("error: " + caseFile + ":20: time.end: "), lines[0]);
        assertTrue(lines[0].contains("density"), "names what broke: " + lines[0]);
        JsonNode summary = new ObjectMapper().readTree(out.resolve("summary.json").toFile());
        assertFalse(summary.get("complete").asBoolean());
        assertTrue(summary.get("max_temperature_K").asDouble() > 313.15 + 50, "heated before failing");
        assertTrue(Files.readAllLines(out.resolve("history.csv")).size() > 10, "history up to the failure");
    }
}
