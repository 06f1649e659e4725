package dev.filmshear.cli.fit;

import org.junit.jupiter.api.io.TempDir;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.MethodSource;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.regex.Pattern;
import java.util.stream.Stream;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

/**
 * Malformed data files (src/test/resources/fit/bad): each ends the command with exit code 2 and one line
 * {@code error: FILE:LINE: COLUMN: what is wrong (given ..., allowed ...)} naming the line, the column
 * and the value, with nothing written.
 */
class BadDataTest {

    /**
     * One malformed file and what its message must name.
     *
     * @param file under fit/bad
     * @param law the law asked for
     * @param line the line the message must name
     * @param key the column (or word in parentheses) the message must name
     * @param given text the message's "given" part must hold
     */
    record Bad(String file, String law, int line, String key, String given) {
        @Override
        public String toString() {
            return file;
        }
    }

    static Stream<Bad> files() {
        return Stream.of(
                new Bad("only-comments.csv", "vogel", 0, "(header)", "no header"),
                new Bad("one-column-header.csv", "vogel", 1, "(header)", "1 column: \"temperature (degC)\""),
                new Bad("header-without-unit.csv", "vogel", 1, "viscosity", "\"viscosity\""),
                new Bad("unknown-unit.csv", "vogel", 1, "viscosity", "\"cst\""),
                new Bad("wrong-dimension.csv", "vogel", 1, "viscosity", "\"kg/m^3\""),
                new Bad("columns-swapped.csv", "vogel", 1, "viscosity", "\"cSt\""),
                new Bad("not-a-number.csv", "vogel", 5, "viscosity", "\"41.3x\""),
                new Bad("decimal-comma.csv", "vogel", 3, "(row)", "3 cells: \"40, 97,2\""),
                new Bad("missing-value.csv", "vogel", 4, "viscosity", "nothing"),
                new Bad("negative-viscosity.csv", "vogel", 3, "viscosity", "\"-97.2\""),
                new Bad("below-absolute-zero.csv", "vogel", 2, "temperature", "\"-300\""),
                new Bad("zero-kelvin.csv", "vogel", 2, "T", "\"0\""),
                new Bad("duplicate-temperature.csv", "vogel", 6, "temperature", "\"40\""),
                new Bad("number-out-of-range.csv", "vogel", 3, "viscosity", "\"1e400\""),
                new Bad("too-few-points.csv", "vogel", 4, "(points)", "3 points"),
                new Bad("kinematic-without-density.csv", "vogel", 1, "viscosity", "no --density"),
                new Bad("walther-below-d341.csv", "walther", 2, "viscosity", "\"0.05\""),
                // well-formed, but a gas's viscosity rises with temperature: the Vogel fit's b comes out negative
                new Bad("gas-for-a-liquid-law.csv", "vogel", 0, "--law", "\"vogel\""));
    }

    @ParameterizedTest(name = "{0}")
    @MethodSource("files")
    void exitCodeTwoAndOneLineNamingLineColumnAndValue(Bad bad, @TempDir Path dir) {
        String file = FitTesting.resource("bad/" + bad.file()).toString();
        Path out = dir.resolve("out");
        FitTesting.Outcome o = FitTesting.run("fit", file, "--law", bad.law(), "--out", out.toString());
        assertEquals(2, o.code(), o.err());
        String err = o.err().strip();
        assertFalse(err.contains("\n"), "one line: " + err);
        Pattern form = Pattern.compile("error: " + Pattern.quote(file) + ":" + bad.line() + ": " + Pattern.quote(bad.key())
                + ": .+ \\(given .*" + Pattern.quote(bad.given()) + ".*, allowed .+\\)");
        assertTrue(form.matcher(err).matches(), err);
        assertEquals("", o.out(), "nothing printed before the error");
        assertFalse(Files.exists(out), "nothing written");
    }
}
