package dev.filmshear.cli.report;

import com.fasterxml.jackson.databind.ObjectMapper;
import com.fasterxml.jackson.databind.node.ObjectNode;
import org.junit.jupiter.api.Test;

import java.io.IOException;
import java.util.List;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

/** The summary tree read generically: keys the writer adds later reach the page without a code change. */
class SummaryRowsTest {

    @Test
    void labelsComeFromTheKey() {
        assertEquals("Wall shear stress, lower wall", SummaryRows.label("wall_shear_stress_lower_Pa"));
        assertEquals("Reynolds number", SummaryRows.label("reynolds_number"));
        assertEquals("Petroff torque", SummaryRows.label("petroff_torque_N_m"));
        assertEquals("Coast down time", SummaryRows.label("coast_down_time_s"));
    }

    @Test
    void journalKeysAndUnknownKeysAppearGroupedAndFormatted() throws IOException {
        ObjectNode summary = (ObjectNode) new ObjectMapper().readTree("""
                {"title": "journal", "complete": true, "steady": true, "wall_shear_stress_lower_Pa": 1200.5,
                 "friction_torque_N_m": 0.123456, "friction_power_W": 38.787, "petroff_torque_N_m": 0.12,
                 "journal_eccentricity_ratio": 0.0, "time_to_speed_s": 0.25, "coast_down_time_s": 3.5,
                 "seal_leakage_m3_per_s": 1.5e-7, "some_future_flag": "laminar", "nothing_K": null,
                 "warnings": [], "caution": "x"}
                """);
        List<SummaryRows.Row> rows = SummaryRows.keyResults(summary);
        List<String> keys = rows.stream().map(SummaryRows.Row::key).toList();
        assertEquals(List.of("wall_shear_stress_lower_Pa", "friction_torque_N_m", "friction_power_W",
                "petroff_torque_N_m", "journal_eccentricity_ratio", "time_to_speed_s", "coast_down_time_s",
                "steady", "seal_leakage_m3_per_s", "some_future_flag"), keys,
                "shear first, then the journal, run, other; nulls and title, warnings, caution left out");
        String page = HtmlReport.render(summary, List.of(), null);
        assertTrue(page.contains("0.12346\u00a0N·m"), "torque to five figures");
        assertTrue(page.contains("38.787\u00a0W"));
        assertTrue(page.contains("250\u00a0ms"));
        assertTrue(page.contains("<code>seal_leakage_m3_per_s</code>"), "a key no rule knows still appears");
        assertTrue(page.contains("1.5\u00a0×\u00a010⁻⁷"), "as a plain number when its unit is unknown");
        assertTrue(page.contains(">Journal bearing<"));
        assertFalse(page.contains("nothing_K"), "null values are skipped");
        assertTrue(page.contains("The case text was not recorded"), "no case text given");
    }

    @Test
    void escapingCoversEveryCharacterWithAMeaning() {
        assertEquals("&lt;a href=&quot;x&quot;&gt;&amp;&#39;&lt;/a&gt;", Html.escape("<a href=\"x\">&'</a>"));
        assertEquals("bell\uFFFD tab\t", Html.escape("bell\u0007 tab\t"), "controls XML forbids are replaced");
    }
}
