package dev.filmshear.cli.sweep;

import dev.filmshear.cli.FilmshearCommand;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

import java.io.IOException;
import java.io.InputStream;
import java.io.PrintWriter;
import java.io.StringWriter;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.concurrent.TimeUnit;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

/**
 * The sweep and merge commands end to end, in-process (and once in a child JVM that is killed): a
 * hundred-case plan runs; results are the same byte for byte whatever the thread count, after a kill
 * and resume, after a torn last line, and when three shards are merged; a changed plan is refused; a
 * failing combination does not stop the others.
 *
 * <p>The reference for the comparisons is one uninterrupted two-thread run of {@code gap-speed.toml}
 * (10 gaps by 10 speeds of a small isothermal start-up), made once for the class.
 */
class SweepCommandTest {
    /** Cases of gap-speed.toml. */
    private static final int CASES = 100;
    /** Rows the child JVM must have written before it is killed: well inside the plan. */
    private static final int ROWS_BEFORE_KILL = 10;
    /** How long the child may take to start and write those rows. */
    private static final long CHILD_TIMEOUT_S = 60;

    @TempDir
    static Path shared;
    private static Path referenceResults;

    record Outcome(int code, String out, String err) {
    }

    static Outcome run(String... args) {
        StringWriter out = new StringWriter();
        StringWriter err = new StringWriter();
        int code = FilmshearCommand.run(new PrintWriter(out, true), new PrintWriter(err, true), args);
        return new Outcome(code, out.toString(), err.toString());
    }

    /** Copies test resources into {@code dir}; returns the path of the first. */
    static Path copy(Path dir, String... names) throws IOException {
        Files.createDirectories(dir);
        Path first = null;
        for (String name : names) {
            try (InputStream in = SweepCommandTest.class.getResourceAsStream("/sweep/" + name)) {
                Path target = dir.resolve(name);
                Files.write(target, in.readAllBytes());
                first = first == null ? target : first;
            }
        }
        return first;
    }

    static Path plan(Path dir) throws IOException {
        return copy(dir, "gap-speed.toml", "startup.toml");
    }

    @BeforeAll
    static void referenceRun() throws IOException {
        Path out = shared.resolve("reference");
        Outcome o = run("sweep", plan(shared.resolve("plan")).toString(), "--out", out.toString(), "--threads", "2");
        assertEquals(0, o.code(), o.err());
        referenceResults = out.resolve("results.csv");
    }

    static byte[] reference() throws IOException {
        return Files.readAllBytes(referenceResults);
    }

    @Test
    void aHundredCasePlanRunsToOneSortedRowPerCase() throws IOException {
        List<String> lines = Files.readAllLines(referenceResults);
        assertEquals(CASES + 1, lines.size());
        assertTrue(lines.get(0).startsWith("geometry.gap,upper_wall.velocity.to,status,message,"), lines.get(0));
        assertTrue(lines.get(0).endsWith(",case_index"));
        for (int i = 1; i <= CASES; i++) {
            assertTrue(lines.get(i).endsWith("," + (i - 1)), "sorted by case index: " + lines.get(i));
            assertTrue(lines.get(i).contains(",ok,"), lines.get(i));
        }
        // mixed radix, last axis fastest: case 12 is gap number 1 (15.56 um), speed number 2
        List<String> row12 = CsvLine.split(lines.get(13)).orElseThrow();
        assertEquals("1.55555555556E-5", row12.get(0), "15.5555555556 um: 12 significant digits, in SI");
        assertEquals(2 * Math.pow(15, 2.0 / 9), Double.parseDouble(row12.get(1)), 1e-9);
        Path folder = referenceResults.getParent();
        assertTrue(Files.readString(folder.resolve("sweep.json")).contains("\"complete\" : true"));
        String report = Files.readString(folder.resolve("report.html"));
        assertTrue(report.contains("data:image/png;base64,"), "maps embedded in the report");
        assertTrue(report.contains("Caution"), "the report carries the caution");
        assertTrue(Files.size(folder.resolve("map_wall_shear_stress_upper_Pa.png")) > 0);
        assertFalse(Files.exists(folder.resolve("map_max_temperature_K.png")),
                "an isothermal sweep has no temperature map by default: the same value everywhere");
    }

    @Test
    void oneThreadGivesTheSameFileAsTwo(@TempDir Path dir) throws IOException {
        Path out = dir.resolve("one");
        Outcome o = run("sweep", plan(dir).toString(), "--out", out.toString(), "--threads", "1");
        assertEquals(0, o.code(), o.err());
        assertArrayEquals(reference(), Files.readAllBytes(out.resolve("results.csv")));
    }

    /**
     * A child JVM runs the plan and is killed (SIGKILL) once some rows are on disk; the same command in
     * this JVM then finishes it, and the file equals the uninterrupted run's.
     */
    @Test
    void aKilledSweepResumesToTheSameFile(@TempDir Path dir) throws IOException, InterruptedException {
        Path planFile = plan(dir);
        Path out = dir.resolve("killed");
        Path results = out.resolve("results.csv");
        List<String> command = new ArrayList<>(List.of(Path.of(System.getProperty("java.home"), "bin", "java").toString(),
                "-cp", System.getProperty("java.class.path"), "-Djava.awt.headless=true",
                FilmshearCommand.class.getName(), "sweep", planFile.toString(), "--out", out.toString(),
                "--threads", "1"));
        Process child = new ProcessBuilder(command).redirectErrorStream(true)
                .redirectOutput(dir.resolve("child.log").toFile()).start();
        long deadline = System.nanoTime() + TimeUnit.SECONDS.toNanos(CHILD_TIMEOUT_S);
        long rows = 0;
        while (rows < ROWS_BEFORE_KILL && child.isAlive() && System.nanoTime() < deadline) {
            Thread.sleep(5);
            rows = Files.exists(results) ? Files.readAllLines(results).size() - 1 : 0;
        }
        child.destroyForcibly();
        assertTrue(child.waitFor(CHILD_TIMEOUT_S, TimeUnit.SECONDS));
        long left = Files.readAllLines(results).size() - 1;
        assertTrue(left >= ROWS_BEFORE_KILL && left < CASES, "killed mid-way, with " + left + " rows on disk; "
                + Files.readString(dir.resolve("child.log")));

        Outcome resumed = run("sweep", planFile.toString(), "--out", out.toString(), "--threads", "2");
        assertEquals(0, resumed.code(), resumed.err());
        assertTrue(resumed.out().contains("were done before"), resumed.out());
        assertArrayEquals(reference(), Files.readAllBytes(results));
    }

    @Test
    void aTornLastLineIsDroppedAndRedone(@TempDir Path dir) throws IOException {
        Path planFile = plan(dir);
        Path out = dir.resolve("torn");
        Files.createDirectories(out);
        Files.copy(referenceResults.resolveSibling("sweep.json"), out.resolve("sweep.json"));
        // the first 60 rows, in a shuffled order as threads would leave them, then half of a row
        List<String> lines = Files.readAllLines(referenceResults);
        StringBuilder text = new StringBuilder(lines.get(0)).append('\n');
        for (int r = 0; r < 60; r++) {
            text.append(lines.get(1 + (r * 7) % 60)).append('\n');
        }
        String next = lines.get(61);
        text.append(next, 0, next.length() / 2);
        Files.writeString(out.resolve("results.csv"), text, StandardCharsets.UTF_8);

        Outcome o = run("sweep", planFile.toString(), "--out", out.toString());
        assertEquals(0, o.code(), o.err());
        assertTrue(o.out().contains("ran 40 "), o.out());
        assertTrue(o.out().contains("1 incomplete or repeated line(s)"), o.out());
        assertArrayEquals(reference(), Files.readAllBytes(out.resolve("results.csv")));
    }

    @Test
    void threeShardsMergedEqualTheWholeRun(@TempDir Path dir) throws IOException {
        Path planFile = plan(dir);
        List<String> folders = new ArrayList<>();
        for (int k = 1; k <= 3; k++) {
            Path out = dir.resolve("shard" + k);
            Outcome o = run("sweep", planFile.toString(), "--out", out.toString(), "--shard", k + "/3");
            assertEquals(0, o.code(), o.err());
            // cases i with i mod 3 == k - 1: 34, 33, 33 of them
            assertEquals(k == 1 ? 34 : 33, Files.readAllLines(out.resolve("results.csv")).size() - 1);
            folders.add(out.toString());
        }
        Path merged = dir.resolve("merged");
        List<String> args = new ArrayList<>(List.of("merge"));
        args.addAll(folders);
        args.addAll(List.of("--out", merged.toString()));
        Outcome o = run(args.toArray(String[]::new));
        assertEquals(0, o.code(), o.err());
        assertArrayEquals(reference(), Files.readAllBytes(merged.resolve("results.csv")));
        assertTrue(Files.exists(merged.resolve("map_wall_shear_stress_upper_Pa.png")), "maps after merge");

        Outcome missing = run("merge", folders.get(0), folders.get(2), "--out", dir.resolve("m2").toString());
        assertEquals(2, missing.code());
        assertTrue(missing.err().contains("33 of 100 cases missing (the first: case 1, shard 2/3)"), missing.err());
        Outcome doubled = run("merge", folders.get(0), folders.get(1), folders.get(2), folders.get(1),
                "--out", dir.resolve("m3").toString());
        assertEquals(2, doubled.code());
        assertTrue(doubled.err().contains("33 cases doubled"), doubled.err());
        assertEquals(1, doubled.err().strip().split("\n").length, "one line: " + doubled.err());
    }

    @Test
    void aChangedPlanIsRefusedOnResume(@TempDir Path dir) throws IOException {
        Path planFile = plan(dir);
        Path out = dir.resolve("out");
        Files.createDirectories(out);
        Files.copy(referenceResults.resolveSibling("sweep.json"), out.resolve("sweep.json"));
        Files.copy(referenceResults, out.resolve("results.csv"));
        Files.writeString(planFile, Files.readString(planFile).replace("count = 10 }", "count = 11 }"));
        Outcome o = run("sweep", planFile.toString(), "--out", out.toString());
        assertEquals(2, o.code());
        String[] lines = o.err().strip().split("\n");
        assertEquals(1, lines.length, o.err());
        assertTrue(lines[0].startsWith("error: " + planFile + ":0: (plan): the plan changed since the results in "),
                lines[0]);
        assertArrayEquals(reference(), Files.readAllBytes(out.resolve("results.csv")), "the results are untouched");

        Outcome otherShard = run("sweep", plan(dir.resolve("again")).toString(), "--out", out.toString(),
                "--shard", "2/4");
        assertEquals(2, otherShard.code());
        assertTrue(otherShard.err().contains("holds shard 1/1 of this plan"), otherShard.err());
    }

    @Test
    void aFailingCombinationDoesNotStopTheOthers(@TempDir Path dir) throws IOException {
        copy(dir, "startup.toml");
        Path planFile = dir.resolve("bad-gaps.toml");
        Files.writeString(planFile, """
                base = "startup.toml"
                [axes]
                "geometry.gap" = ["20 um", "-5 um", "30 um"]
                "upper_wall.velocity.to" = ["5 m/s", "10 m/s"]
                """);
        Path out = dir.resolve("out");
        Outcome o = run("sweep", planFile.toString(), "--out", out.toString());
        assertEquals(0, o.code(), o.err());
        assertTrue(o.out().contains("ok 4, failed 2"), o.out());
        List<String> lines = Files.readAllLines(out.resolve("results.csv"));
        for (int i = 1; i <= 6; i++) {
            List<String> f = CsvLine.split(lines.get(i)).orElseThrow();
            boolean bad = i == 3 || i == 4;
            assertEquals(bad ? "failed" : "ok", f.get(2), lines.get(i));
            if (bad) {
                assertTrue(f.get(3).startsWith("bad-gaps.toml:3: geometry.gap: "), f.get(3));
                assertEquals("-5.0E-6", f.get(0), "the axis value in SI even when the case failed");
            }
        }
        assertTrue(Files.readString(out.resolve("report.html")).contains("Failed cases"));
    }

    /**
     * A solver failure is a failed row too: a steady heated channel flow whose viscosity falls
     * exponentially with temperature has no steady solution at a steep pressure gradient (thermal
     * runaway), while a gentle one settles.
     */
    @Test
    void aCaseWithoutSteadySolutionIsAFailedRow(@TempDir Path dir) throws IOException {
        copy(dir, "heated-channel.toml");
        Path planFile = dir.resolve("gradients.toml");
        Files.writeString(planFile, """
                base = "heated-channel.toml"
                [axes]
                "pressure.gradient" = ["-1e7 Pa/m", "-1e11 Pa/m"]
                """);
        Path out = dir.resolve("out");
        Outcome o = run("sweep", planFile.toString(), "--out", out.toString());
        assertEquals(0, o.code(), o.err());
        List<String> lines = Files.readAllLines(out.resolve("results.csv"));
        assertEquals("ok", CsvLine.split(lines.get(1)).orElseThrow().get(1));
        List<String> failed = CsvLine.split(lines.get(2)).orElseThrow();
        assertEquals("failed", failed.get(1));
        assertTrue(failed.get(2).startsWith("no steady solution"), failed.get(2));
    }

    @Test
    void everyCaseFailedIsExitCodeThree(@TempDir Path dir) throws IOException {
        copy(dir, "startup.toml");
        Path planFile = dir.resolve("all-bad.toml");
        Files.writeString(planFile, """
                base = "startup.toml"
                [axes]
                "geometry.gap" = ["-1 um", "-2 um"]
                """);
        Outcome o = run("sweep", planFile.toString(), "--out", dir.resolve("out").toString());
        assertEquals(3, o.code(), o.out() + o.err());
        assertTrue(o.err().startsWith("error: " + planFile + ":1: base: every one of the 2 cases failed; the first: "
                + "all-bad.toml:3: geometry.gap: "), o.err());
    }

    @Test
    void aKeyTheCaseDoesNotAllowIsABadPlan(@TempDir Path dir) throws IOException {
        copy(dir, "startup.toml");
        Path planFile = dir.resolve("misspelt.toml");
        Files.writeString(planFile, """
                base = "startup.toml"
                [axes]
                "upper_wall.velocity.to" = ["5 m/s", "10 m/s"]
                "geometry.gpa" = ["20 um", "30 um"]
                """);
        Outcome o = run("sweep", planFile.toString(), "--out", dir.resolve("out").toString());
        assertEquals(2, o.code());
        assertTrue(o.err().startsWith("error: " + planFile + ":4: geometry.gpa: unknown key \"gpa\""), o.err());
        assertFalse(Files.exists(dir.resolve("out")), "nothing runs and nothing is written");
    }
}
