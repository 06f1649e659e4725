package dev.filmshear.cli.input;

import com.fasterxml.jackson.databind.node.JsonNodeFactory;
import com.fasterxml.jackson.databind.node.TextNode;
import org.junit.jupiter.api.Test;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

class TomlDocumentTest {

    private static final String TEXT = String.join("\n",
            "title = \"lines\"                      # 1",
            "notes = \"\"\"",                         // 2: a multi-line string whose content looks like TOML
            "fake = 1",                               // 3
            "[fake_table]",                           // 4
            "\"\"\"",                                 // 5
            "[geometry]   # a comment",               // 6
            "gap = \"25 um\"",                        // 7
            "",                                       // 8
            "[upper_wall]",                           // 9
            "velocity = { kind = \"ramp\", to = \"20 m/s\", duration = \"2 us\" }", // 10
            "heat_transfer.coefficient = \"800 W/(m^2*K)\"", // 11
            "heat_transfer.ambient = '30 degC'",      // 12
            "[output]",                               // 13
            "times = [",                              // 14
            "  \"5 us\",  # first",                   // 15
            "  \"20 us\",",                           // 16
            "  \"1 ms\",",                            // 17
            "]",                                      // 18
            "[fluid.viscosity]",                      // 19
            "law = \"constant\"",                     // 20
            "[[rows]]",                               // 21
            "x = 1",                                  // 22
            "[[rows]]",                               // 23
            "x = 2",                                  // 24
            "");

    @Test
    void everyKindOfKeyHasItsLine() {
        TomlDocument doc = TomlDocument.parse(TEXT, "lines.toml");
        assertEquals(1, doc.line("title"));
        assertEquals(2, doc.line("notes"));
        assertEquals(6, doc.line("geometry"));
        assertEquals(7, doc.line("geometry.gap"));
        assertEquals(9, doc.line("upper_wall"));
        assertEquals(10, doc.line("upper_wall.velocity"));
        assertEquals(10, doc.line("upper_wall.velocity.duration"));
        assertEquals(11, doc.line("upper_wall.heat_transfer"));
        assertEquals(11, doc.line("upper_wall.heat_transfer.coefficient"));
        assertEquals(12, doc.line("upper_wall.heat_transfer.ambient"));
        assertEquals(14, doc.line("output.times"));
        assertEquals(15, doc.line("output.times[0]"));
        assertEquals(16, doc.line("output.times[1]"));
        assertEquals(17, doc.line("output.times[2]"));
        assertEquals(19, doc.line("fluid"));
        assertEquals(20, doc.line("fluid.viscosity.law"));
        assertEquals(22, doc.line("rows[0].x"));
        assertEquals(24, doc.line("rows[1].x"));
    }

    @Test
    void stringsAndCommentsAreNotKeys() {
        TomlDocument doc = TomlDocument.parse(TEXT, "lines.toml");
        assertEquals(0, doc.line("fake"));
        assertEquals(0, doc.line("fake_table"));
        assertFalse(doc.has("fake"));
    }

    @Test
    void aKeyNotWrittenFallsBackToItsTable() {
        TomlDocument doc = TomlDocument.parse(TEXT, "lines.toml");
        assertEquals(10, doc.line("upper_wall.velocity.from"));
        assertEquals(6, doc.line("geometry.depth"));
        assertEquals(19, doc.line("fluid.viscosity.value"));
        assertEquals(0, doc.line("time.end"));
    }

    @Test
    void valuesAreRenderedAsWritten() {
        TomlDocument doc = TomlDocument.parse(TEXT, "lines.toml");
        assertEquals("\"25 um\"", doc.written("geometry.gap").orElseThrow());
        assertEquals("{ kind = \"ramp\", to = \"20 m/s\", duration = \"2 us\" }",
                doc.written("upper_wall.velocity").orElseThrow());
        assertEquals("[\"5 us\", \"20 us\", \"1 ms\"]", doc.written("output.times").orElseThrow());
        assertEquals("\"20 us\"", doc.written("output.times[1]").orElseThrow());
        assertTrue(doc.written("geometry.depth").isEmpty());
    }

    @Test
    void syntaxErrorsCarryJacksonsLine() {
        String text = "title = \"x\"\n[geometry]\ngap = \"25 um\n[time]\nend = 1\n";
        InputException e = assertThrows(InputException.class, () -> TomlDocument.parse(text, "s.toml"));
        assertEquals(3, e.line());
        assertEquals(TomlDocument.SYNTAX_KEY, e.key());
        assertTrue(e.oneLine().startsWith("error: s.toml:3: (syntax): TOML syntax error"), e.oneLine());
        assertTrue(e.given().contains("gap = \\\"25 um"), e.given());
    }

    @Test
    void aDuplicateKeyIsReportedAtItsSecondDefinition() {
        // Jackson reports the position after the second definition's line; the index knows the line itself.
        String text = "[geometry]\ngap = \"25 um\"\ngap = \"30 um\"\n\n[time]\n";
        InputException e = assertThrows(InputException.class, () -> TomlDocument.parse(text, "d.toml"));
        assertEquals(3, e.line());
    }

    @Test
    void overridesReplaceValuesAndPointAtTheirSource() {
        TomlDocument doc = TomlDocument.parse(TEXT, "base.toml");
        TomlDocument swept = doc.withOverride("upper_wall.velocity.to", TextNode.valueOf("30 m/s"), "plan.toml", 7);
        assertEquals("\"30 m/s\"", swept.written("upper_wall.velocity.to").orElseThrow());
        assertEquals(new TomlDocument.Location("plan.toml", 7), swept.location("upper_wall.velocity.to"));
        assertEquals(new TomlDocument.Location("base.toml", 10), swept.location("upper_wall.velocity.kind"));
        // the original is untouched
        assertEquals("\"20 m/s\"", doc.written("upper_wall.velocity.to").orElseThrow());
        assertTrue(doc.overrides().isEmpty());
        assertEquals(1, swept.overrides().size());

        TomlDocument created = doc.withOverride("pressure.gradient", TextNode.valueOf("1 Pa/m"), "plan.toml", 8);
        assertEquals("\"1 Pa/m\"", created.written("pressure.gradient").orElseThrow());
        assertEquals(8, created.line("pressure.gradient"));

        TomlDocument whole = doc.withOverride("upper_wall.velocity", TextNode.valueOf("3 m/s"), "plan.toml", 9);
        assertEquals(9, whole.line("upper_wall.velocity.kind"), "keys under an overridden key belong to it");
    }

    @Test
    void anOverrideThroughAValueIsAnErrorAtThePlan() {
        TomlDocument doc = TomlDocument.parse(TEXT, "base.toml");
        InputException e = assertThrows(InputException.class,
                () -> doc.withOverride("geometry.gap.to", JsonNodeFactory.instance.numberNode(1), "plan.toml", 4));
        assertEquals("plan.toml", e.file());
        assertEquals(4, e.line());
        assertEquals("geometry.gap.to", e.key());
        assertThrows(InputException.class,
                () -> doc.withOverride("geometry..gap", TextNode.valueOf("1 m"), "plan.toml", 5));
    }

    @Test
    void rootIsACopy() {
        TomlDocument doc = TomlDocument.parse(TEXT, "base.toml");
        doc.root().put("title", "changed");
        assertEquals("\"lines\"", doc.written("title").orElseThrow());
    }

    @Test
    void aMissingFileIsAnInputError() {
        InputException e = assertThrows(InputException.class,
                () -> TomlDocument.read(java.nio.file.Path.of("no/such/case.toml")));
        assertEquals(TomlDocument.FILE_KEY, e.key());
        assertEquals(0, e.line());
    }
}
