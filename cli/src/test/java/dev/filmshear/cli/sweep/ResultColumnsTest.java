package dev.filmshear.cli.sweep;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.node.JsonNodeFactory;
import com.fasterxml.jackson.databind.node.ObjectNode;
import dev.filmshear.cli.input.CaseFile;
import dev.filmshear.cli.input.CaseReader;
import dev.filmshear.cli.input.TomlDocument;
import dev.filmshear.cli.output.ResultWriter;
import dev.filmshear.solver.model.FilmSolver;
import dev.filmshear.solver.model.SolverOptions;
import org.junit.jupiter.api.Test;

import java.io.IOException;
import java.io.InputStream;
import java.nio.charset.StandardCharsets;
import java.util.Map;
import java.util.Set;
import java.util.TreeSet;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

/**
 * results.csv carries every numeric key of summary.json: a key added to the summary later fails this test
 * until {@link ResultColumns#SUMMARY_KEYS} lists it.
 */
class ResultColumnsTest {

    static String resource(String name) throws IOException {
        try (InputStream in = ResultColumnsTest.class.getResourceAsStream(name)) {
            return new String(in.readAllBytes(), StandardCharsets.UTF_8);
        }
    }

    static ObjectNode summaryOf(String resource, Map<String, JsonNode> overrides) throws IOException {
        TomlDocument doc = TomlDocument.parse(resource(resource), resource);
        for (Map.Entry<String, JsonNode> o : overrides.entrySet()) {
            doc = doc.withOverride(o.getKey(), o.getValue());
        }
        CaseFile c = new CaseReader().read(doc);
        return ResultWriter.summary(FilmSolver.solve(c.filmCase(), SolverOptions.defaults().outputTimesOnly()),
                new ResultWriter.RunInfo(c.title(), c.fileName(), null, null, false));
    }

    @Test
    void everyNumericSummaryKeyHasAColumn() throws IOException {
        JsonNodeFactory f = JsonNodeFactory.instance;
        Map<String, ObjectNode> summaries = Map.of(
                "isothermal start-up", summaryOf("/sweep/startup.toml", Map.of()),
                "heated steady film", summaryOf("/sweep/steady-heated.toml", Map.of()),
                "heated journal bearing", summaryOf("/input/contract-example-journal.toml",
                        Map.of("time.end", f.textNode("100 us"), "output.times", f.arrayNode(),
                                "grid.points", f.numberNode(41))));
        Set<String> missing = new TreeSet<>();
        int numeric = 0;
        for (ObjectNode summary : summaries.values()) {
            for (Map.Entry<String, JsonNode> field : summary.properties()) {
                if (field.getValue().isNumber() || field.getValue().isNull()) {
                    numeric++;
                    if (!ResultColumns.SUMMARY_KEYS.contains(field.getKey())) {
                        missing.add(field.getKey());
                    }
                }
            }
        }
        assertTrue(numeric > 3 * 25, "the summaries were read: " + numeric + " numeric values");
        assertEquals(Set.of(), missing, "summary keys without a results.csv column");
    }

    @Test
    void theColumnsKeepTheContractsPlaces() {
        ResultColumns c = new ResultColumns(java.util.List.of("geometry.gap", "upper_wall.velocity.to"));
        assertEquals(java.util.List.of("geometry.gap", "upper_wall.velocity.to", "status", "message"),
                c.names().subList(0, 4));
        assertEquals("case_index", c.names().get(c.size() - 1));
        assertEquals(2, c.statusColumn());
        assertEquals(c.size() - 1, c.indexColumn());
        assertEquals(c.size(), new TreeSet<>(c.names()).size(), "no column twice");
    }
}
