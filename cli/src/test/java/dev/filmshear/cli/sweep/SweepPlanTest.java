package dev.filmshear.cli.sweep;

import dev.filmshear.cli.input.InputException;
import org.junit.jupiter.api.Test;

import java.util.List;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNotEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

/** Reading plans: axes from lists and ranges, the case index, the hash, and one-line errors at the plan's line. */
class SweepPlanTest {
    private static final String BASE = """
            [geometry]
            gap = "20 um"
            [fluid]
            density = "860 kg/m^3"
            viscosity = "0.03 Pa*s"
            [upper_wall]
            velocity = { kind = "ramp", to = "10 m/s", duration = "2 us" }
            [initial]
            temperature = "40 degC"
            [time]
            end = "steady"
            """;

    static SweepPlan plan(String text) {
        return SweepPlan.parse(text, "plan.toml", BASE);
    }

    static InputException bad(String text) {
        return assertThrows(InputException.class, () -> plan(text));
    }

    @Test
    void aLinearRangeIsWrittenInTheUnitOfFrom() {
        Axis gap = plan("""
                base = "b.toml"
                [axes]
                "geometry.gap" = { from = "10 um", to = "0.06 mm", count = 6 }
                """).axes().get(0);
        assertEquals(List.of("\"10 um\"", "\"20 um\"", "\"30 um\"", "\"40 um\"", "\"50 um\"", "\"60 um\""),
                List.of(gap.written(0), gap.written(1), gap.written(2), gap.written(3), gap.written(4), gap.written(5)));
        assertEquals("3.0E-5", gap.csv(2), "SI in results.csv");
    }

    @Test
    void aLogRangeHasEqualRatiosAndExactEnds() {
        Axis speed = plan("""
                base = "b.toml"
                [axes]
                "upper_wall.velocity.to" = { from = "1 m/s", to = "1000 m/s", count = 4, spacing = "log" }
                """).axes().get(0);
        assertEquals("\"1 m/s\"", speed.written(0));
        assertEquals("\"10 m/s\"", speed.written(1));
        assertEquals("\"100 m/s\"", speed.written(2));
        assertEquals("\"1000 m/s\"", speed.written(3));
    }

    @Test
    void whole_numbersStayWholeAndTemperaturesAreAbsoluteInTheColumn() {
        SweepPlan p = plan("""
                base = "b.toml"
                [axes]
                "grid.points" = { from = 21, to = 41, count = 3 }
                "initial.temperature" = ["40 degC", "104 degF", 313.15]
                """);
        assertEquals("31", p.axes().get(0).written(1));
        assertTrue(p.axes().get(0).value(1).isIntegralNumber());
        // 40 degC and 104 degF are both 313.15 K (NIST SP 811, 2008, Appendix B)
        assertEquals(313.15, p.axes().get(1).si(0), 1e-12);
        assertEquals(313.15, p.axes().get(1).si(1), 1e-12);
        assertEquals("313.15", p.axes().get(1).csv(2));
    }

    @Test
    void theCaseIndexIsMixedRadixWithTheLastAxisFastest() {
        SweepPlan p = plan("""
                base = "b.toml"
                [axes]
                "geometry.gap" = ["10 um", "20 um"]
                "upper_wall.velocity.to" = ["1 m/s", "2 m/s", "3 m/s"]
                "grid.points" = [21, 31, 41, 51]
                """);
        assertEquals(24, p.caseCount());
        assertArrayEquals(new int[] {0, 0, 0}, p.digits(0));
        assertArrayEquals(new int[] {0, 0, 3}, p.digits(3));
        assertArrayEquals(new int[] {0, 1, 0}, p.digits(4));
        assertArrayEquals(new int[] {1, 2, 3}, p.digits(23));
        assertEquals("\"2 m/s\"", p.caseDocument(17).written("upper_wall.velocity.to").orElseThrow());
        assertEquals("\"20 um\"", p.caseDocument(17).written("geometry.gap").orElseThrow());
    }

    @Test
    void aBillionCasePlanIsNeverExpanded() {
        SweepPlan p = plan("""
                base = "b.toml"
                [axes]
                "geometry.gap" = { from = "1 um", to = "1000 um", count = 1000 }
                "upper_wall.velocity.to" = { from = "1 m/s", to = "1000 m/s", count = 1000 }
                "grid.points" = { from = 1000, to = 1999, count = 1000 }
                """);
        assertEquals(1_000_000_000L, p.caseCount());
        assertArrayEquals(new int[] {999, 999, 999}, p.digits(999_999_999L));
        assertEquals("1999", p.caseDocument(999_999_999L).written("grid.points").orElseThrow());
    }

    @Test
    void theHashFollowsValuesButNotLayoutOrMaps() {
        String a = """
                base = "b.toml"
                [axes]
                "geometry.gap" = { from = "10 um", to = "60 um", count = 6 }
                """;
        String sameValues = """
                # comments and map options do not change any row
                base = "b.toml"
                [axes]
                "geometry.gap" = ["10 um", "20 um", "30 um", "40 um", "50 um", "60 um"]
                [sweep]
                maps = ["max_temperature_K"]
                """;
        String other = a.replace("count = 6", "count = 7");
        assertEquals(plan(a).hash(), plan(sameValues).hash());
        assertNotEquals(plan(a).hash(), plan(other).hash());
        assertNotEquals(plan(a).hash(), SweepPlan.parse(a, "plan.toml", BASE.replace("20 um", "21 um")).hash());
    }

    @Test
    void badPlansAreOneLineErrorsAtTheirLine() {
        InputException count = bad("""
                base = "b.toml"
                [axes]
                "geometry.gap" = { from = "10 um", to = "60 um", count = 0 }
                """);
        assertEquals("plan.toml:3: axes.geometry.gap.count: not a count of values (given 0, allowed a whole number, 1 or more)",
                count.getMessage());
        InputException log = bad("""
                base = "b.toml"
                [axes]
                "upper_wall.velocity.to" = { from = "-1 m/s", to = "5 m/s", count = 3, spacing = "log" }
                """);
        assertEquals(3, log.line());
        assertTrue(log.problem().contains("log spacing needs both ends on the same side of zero"), log.problem());
        InputException empty = bad("""
                base = "b.toml"
                [axes]
                "geometry.gap" = []
                """);
        assertEquals("an axis without values", empty.problem());
        InputException unknown = bad("""
                base = "b.toml"
                [axes]
                "geometry.gap" = { from = "10 um", to = "60 um", count = 3, step = "1 um" }
                """);
        assertEquals("axes.geometry.gap.step", unknown.key());
        InputException dimension = bad("""
                base = "b.toml"
                [axes]
                "geometry.gap" = { from = "10 um", to = "60 m/s", count = 3 }
                """);
        assertTrue(dimension.problem().contains("is a velocity, not a length"), dimension.problem());
        InputException overlap = bad("""
                base = "b.toml"
                [axes]
                "upper_wall.velocity" = ["1 m/s"]
                "upper_wall.velocity.to" = ["2 m/s"]
                """);
        assertEquals(4, overlap.line());
        InputException top = bad("""
                base = "b.toml"
                threads = 4
                [axes]
                "geometry.gap" = ["1 um"]
                """);
        assertEquals("threads", top.key());
        InputException map = bad("""
                base = "b.toml"
                [axes]
                "geometry.gap" = ["1 um"]
                [sweep]
                maps = ["hottest"]
                """);
        assertEquals("sweep.maps[0]", map.key());
        assertEquals(5, map.line());
        for (InputException e : List.of(count, log, empty, unknown, dimension, overlap, top, map)) {
            assertEquals(1, e.oneLine().lines().count(), e.oneLine());
        }
    }

    @Test
    void aKeyThroughAValueThatIsNotATableIsABadPlan() {
        SweepPlan p = plan("""
                base = "b.toml"
                [axes]
                "geometry.gap.inner" = ["1 um"]
                """);
        InputException e = assertThrows(InputException.class,
                () -> p.checkKeys(new dev.filmshear.cli.input.CaseReader()));
        assertEquals(3, e.line());
        assertTrue(e.problem().contains("geometry.gap is not a table"), e.problem());
    }

    @Test
    void aValueProblemIsLeftToItsCombination() {
        SweepPlan p = plan("""
                base = "b.toml"
                [axes]
                "geometry.gap" = ["-1 um", "20 um"]
                """);
        p.checkKeys(new dev.filmshear.cli.input.CaseReader());
        assertEquals(2, p.caseCount());
    }
}
