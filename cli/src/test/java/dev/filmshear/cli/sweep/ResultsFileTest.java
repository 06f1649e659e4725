package dev.filmshear.cli.sweep;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Random;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

/** results.csv handling: CSV fields, the resume scan, and the external sort. */
class ResultsFileTest {
    private static final ResultColumns COLUMNS = new ResultColumns(List.of("geometry.gap"));
    /** Seed of the shuffled rows, fixed so that a failure repeats. */
    private static final long SEED = 20240611L;

    static String row(long index, String status, String message) {
        List<String> f = new ArrayList<>();
        f.add(Long.toString(index));
        f.add(status);
        f.add(message);
        while (f.size() < COLUMNS.size() - 1) {
            f.add("");
        }
        f.add(Long.toString(index));
        return String.join(",", f.stream().map(CsvLine::field).toList()) + "\n";
    }

    @Test
    void fieldsWithCommasAndQuotesRoundTrip() {
        String message = "plan.toml:3: geometry.gap: -5.0E-6 m is not allowed (a gap \"above\" 0, say 25 um)";
        String line = CsvLine.field("a") + "," + CsvLine.field(message) + "," + CsvLine.field("");
        assertEquals(List.of("a", message, ""), CsvLine.split(line).orElseThrow());
        assertFalse(CsvLine.split("a,\"open").isPresent(), "a quoted field left open is a torn line");
    }

    @Test
    void theScanKeepsGoodRowsAndCutsATornOne(@TempDir Path dir) throws IOException {
        Path file = dir.resolve("results.csv");
        String good = row(0, "ok", "") + row(2, "failed", "bad, really") + row(4, "ok", "");
        Files.writeString(file, COLUMNS.header() + "\n" + good + row(6, "ok", "").substring(0, 20),
                StandardCharsets.UTF_8);
        ResultsFile.Scan scan = ResultsFile.prepare(file, COLUMNS, 10, new Shard(1, 2));
        assertEquals("{0, 2, 4}", scan.done().toString());
        assertEquals(2, scan.ok());
        assertEquals(1, scan.failed());
        assertEquals(1, scan.dropped());
        assertEquals(COLUMNS.header() + "\n" + good, Files.readString(file));
    }

    @Test
    void aBadLineBetweenGoodOnesAndARepeatAreRemoved(@TempDir Path dir) throws IOException {
        Path file = dir.resolve("results.csv");
        Files.writeString(file, COLUMNS.header() + "\n" + row(0, "ok", "") + "0,ok\n" + row(1, "ok", "")
                + row(0, "ok", "") + row(12, "ok", ""), StandardCharsets.UTF_8);
        ResultsFile.Scan scan = ResultsFile.prepare(file, COLUMNS, 10, Shard.WHOLE);
        assertEquals("{0, 1}", scan.done().toString());
        assertEquals(3, scan.dropped(), "a short line, a repeated case and a case outside the plan");
        assertEquals(COLUMNS.header() + "\n" + row(0, "ok", "") + row(1, "ok", ""), Files.readString(file));
    }

    /** Many runs, merged in several passes, give the rows in case order. */
    @Test
    void theExternalSortOrdersRowsInSeveralPasses(@TempDir Path dir) throws IOException {
        int n = 5000;
        List<Integer> order = new ArrayList<>();
        for (int i = 0; i < n; i++) {
            order.add(i);
        }
        java.util.Collections.shuffle(order, new Random(SEED));
        StringBuilder text = new StringBuilder(COLUMNS.header()).append('\n');
        for (int i : order) {
            text.append(row(i, "ok", "m" + i));
        }
        text.append(row(17, "ok", "m17"));
        Path file = dir.resolve("results.csv");
        Files.writeString(file, text, StandardCharsets.UTF_8);
        // 100-row runs: 51 of them, merged 4 at a time over three passes
        ResultsFile.sortByIndex(file, 100, 4);
        List<String> lines = Files.readAllLines(file);
        assertEquals(n + 1, lines.size(), "the repeated case is kept once");
        for (int i = 0; i < n; i++) {
            assertEquals(row(i, "ok", "m" + i), lines.get(i + 1) + "\n");
        }
        try (var left = Files.list(dir)) {
            assertEquals(List.of(file), left.toList(), "no scratch files are left");
        }
        assertTrue(Files.getLastModifiedTime(file).toMillis() > 0);
    }
}
