package dev.filmshear.validation.suite;

import org.junit.jupiter.api.Test;

import java.util.List;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

/** The plain-text table: every case and check, errors, orders, the expectation and the verdict. */
class VerificationTableTest {

    @Test
    void tableShowsEveryCheckAndTheVerdict() {
        List<Level> levels = List.of(Level.grid(21), Level.grid(41), Level.grid(81));
        VerificationCase c = new VerificationCase("made-up case", VerificationCase.Kind.MANUFACTURED, "none", "none",
                "grid only", levels, List.of(Check.secondOrder("velocity, max over nodes", "m/s"),
                        Check.roundOff("heat flux into the lower wall", "W/m^2", 1e-5)), level -> new double[2]);
        VerificationRun run = new VerificationRun(c, new double[][] {{4e-2, 1e-9}, {1e-2, 2e-9}, {5e-3, 3e-9}}, 0.5,
                null);
        String table = VerificationTable.format(new VerificationSuite.Result("test", List.of(run), 0.5, 1));
        assertTrue(table.contains("made-up case [manufactured; 21, 41, 81 nodes; grid only]"), table);
        assertTrue(table.contains("4.000e-02  1.000e-02  5.000e-03"), table);
        assertTrue(table.contains("2.00   1.00"), table);
        assertTrue(table.contains("exact to round-off (< 1e-05 W/m^2)"), table);
        assertEquals(1, table.lines().filter(l -> l.endsWith("FAIL")).count(), table);
        assertEquals(1, table.lines().filter(l -> l.endsWith("PASS")).count(), table);
        assertTrue(table.contains("FAILED: 1 of 2 checks passed"), table);
    }
}
