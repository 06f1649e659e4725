package dev.filmshear.cli.input;

import org.junit.jupiter.api.Test;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;

class InputExceptionTest {

    @Test
    void oneLineHasTheContractForm() {
        InputException e = new InputException("case.toml", 12, "upper_wall.velocity",
                "unit \"m\" is a length, not a velocity", InputException.quote("20 m"), "a velocity such as \"20 m/s\"");
        // contract.md, "Commands": error: FILE:LINE: KEY: what is wrong (what was given, what is allowed)
        assertEquals("error: case.toml:12: upper_wall.velocity: unit \"m\" is a length, not a velocity "
                + "(given \"20 m\", allowed a velocity such as \"20 m/s\")", e.oneLine());
        assertEquals(e.oneLine().substring("error: ".length()), e.getMessage());
    }

    @Test
    void lineBreaksAndControlCharactersNeverLeaveOneLine() {
        InputException e = new InputException("a\nb.toml", 3, "k\r", "bad\u2028thing", "x\ty\u0007", "z\n");
        String line = e.oneLine();
        assertFalse(line.contains("\n") || line.contains("\r") || line.contains("\u2028") || line.contains("\u0007"));
        assertEquals("error: a\\nb.toml:3: k\\r: bad\\u2028thing (given x\\ty\\u0007, allowed z\\n)", line);
    }

    @Test
    void quoteEscapesQuotesAndBackslashes() {
        assertEquals("\"say \\\"hi\\\" \\\\ bye\\n\"", InputException.quote("say \"hi\" \\ bye\n"));
    }

    @Test
    void unknownLineIsZero() {
        assertEquals(0, new InputException("f", -4, "k", "p", "g", "a").line());
    }
}
