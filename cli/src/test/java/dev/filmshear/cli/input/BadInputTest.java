package dev.filmshear.cli.input;

import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.MethodSource;

import java.util.List;
import java.util.stream.Stream;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

/**
 * Malformed case files, one fault each. Every case is a valid file with one edit; the line the error
 * must point at carries the comment {@code # <-} (no marker: line 0, the key's table is not written).
 */
class BadInputTest {

    private static final String MARKER = "# <-";

    private static final String BASE = String.join("\n",
            "title = \"bad input\"",
            "[geometry]",
            "gap = \"25 um\"",
            "[fluid]",
            "density = \"860 kg/m^3\"",
            "[fluid.viscosity]",
            "law = \"constant\"",
            "value = \"30 mPa*s\"",
            "[upper_wall]",
            "velocity = \"1 m/s\"",
            "[time]",
            "end = \"1 ms\"",
            "");

    private static final String JOURNAL = "[journal]\ndiameter = \"50 mm\"\nlength = \"40 mm\"\n"
            + "radial_clearance = \"40 um\"\nspeed = \"3000 rpm\"\n";

    private static final String THERMAL_FLUID = "density = \"860 kg/m^3\"\nspecific_heat = \"1950 J/(kg*K)\"\n"
            + "thermal_conductivity = \"0.13 W/(m*K)\"";

    /** One malformed file: what it shows, the key the error must name, and the text. */
    record Bad(String name, String key, String text) {
        int expectedLine() {
            List<String> lines = text.lines().toList();
            for (int i = 0; i < lines.size(); i++) {
                if (lines.get(i).contains(MARKER)) {
                    return i + 1;
                }
            }
            return 0;
        }

        @Override
        public String toString() {
            return name;
        }
    }

    /** BASE with one line replaced (the line must exist exactly once). */
    private static String edit(String text, String line, String replacement) {
        String target = line + "\n";
        int at = text.indexOf(target);
        if (at < 0 || text.indexOf(target, at + 1) >= 0) {
            throw new IllegalArgumentException("not one line: " + line);
        }
        return text.substring(0, at) + replacement + (replacement.isEmpty() ? "" : "\n") + text.substring(at + target.length());
    }

    private static String edit(String line, String replacement) {
        return edit(BASE, line, replacement);
    }

    private static Bad bad(String name, String key, String text) {
        return new Bad(name, key, text);
    }

    static Stream<Bad> cases() {
        String thermalBase = edit("density = \"860 kg/m^3\"", THERMAL_FLUID);
        return Stream.of(
                // geometry
                bad("negative gap", "geometry.gap", edit("gap = \"25 um\"", "gap = \"-25 um\" # <-")),
                bad("zero gap", "geometry.gap", edit("gap = \"25 um\"", "gap = 0 # <-")),
                bad("gap in m/s", "geometry.gap", edit("gap = \"25 um\"", "gap = \"25 m/s\" # <-")),
                bad("unknown unit", "geometry.gap", edit("gap = \"25 um\"", "gap = \"25 furlong\" # <-")),
                bad("unit syntax", "geometry.gap", edit("gap = \"25 um\"", "gap = \"25 um)\" # <-")),
                bad("gap is a boolean", "geometry.gap", edit("gap = \"25 um\"", "gap = true # <-")),
                bad("gap is infinite", "geometry.gap", edit("gap = \"25 um\"", "gap = inf # <-")),
                bad("gap and semi_infinite", "geometry.semi_infinite",
                        edit("gap = \"25 um\"", "gap = \"25 um\"\nsemi_infinite = true # <-")),
                bad("semi_infinite is a string", "geometry.semi_infinite",
                        edit("gap = \"25 um\"", "semi_infinite = \"yes\" # <-")),
                bad("missing gap", "geometry.gap", edit(edit("gap = \"25 um\"", ""), "[geometry]", "[geometry] # <-")),
                bad("depth without semi_infinite", "geometry.depth",
                        edit("gap = \"25 um\"", "gap = \"25 um\"\ndepth = \"1 mm\" # <-")),
                bad("semi-infinite with an upper wall", "upper_wall",
                        edit(edit("gap = \"25 um\"", "semi_infinite = true"), "[upper_wall]", "[upper_wall] # <-")),
                bad("geometry is not a table", "geometry",
                        edit(edit("[geometry]", "geometry = \"25 um\" # <-"), "gap = \"25 um\"", "")),
                // misspelt keys at every level
                bad("misspelt top-level key", "titel", edit("title = \"bad input\"", "titel = \"x\" # <-")),
                bad("misspelt table", "geometri", edit("[geometry]", "[geometri] # <-")),
                bad("misspelt geometry key", "geometry.gapp", edit("gap = \"25 um\"", "gapp = \"25 um\" # <-")),
                bad("misspelt fluid key", "fluid.densty",
                        edit("density = \"860 kg/m^3\"", "densty = \"860 kg/m^3\" # <-")),
                bad("misspelt viscosity key", "fluid.viscosity.vaule",
                        edit("value = \"30 mPa*s\"", "vaule = \"30 mPa*s\" # <-")),
                bad("misspelt key in a velocity table", "upper_wall.velocity.duraton", edit("velocity = \"1 m/s\"",
                        "velocity = { kind = \"ramp\", to = \"1 m/s\", duraton = \"1 ms\" } # <-")),
                bad("misspelt kind", "upper_wall.velocity.knid",
                        edit("velocity = \"1 m/s\"", "velocity = { knid = \"ramp\", to = \"1 m/s\" } # <-")),
                bad("misspelt key in heat_transfer", "upper_wall.heat_transfer.coeficient", edit("velocity = \"1 m/s\"",
                        "velocity = \"1 m/s\"\nheat_transfer = { coeficient = \"800 W/(m^2*K)\", ambient = \"30 degC\" } # <-")),
                bad("misspelt time key", "time.ends", edit("end = \"1 ms\"", "ends = \"1 ms\" # <-")),
                bad("misspelt grid key", "grid.point", BASE + "[grid]\npoint = 101 # <-\n"),
                bad("misspelt output key", "output.plot", BASE + "[output]\nplot = true # <-\n"),
                bad("misspelt initial key", "initial.temprature", BASE + "[initial]\ntemprature = \"40 degC\" # <-\n"),
                bad("misspelt key in a property table", "fluid.specific_heat.slop", edit(edit(thermalBase,
                        "specific_heat = \"1950 J/(kg*K)\"",
                        "specific_heat = { value = \"1950 J/(kg*K)\", slop = \"1e-3 1/K\" } # <-"),
                        "velocity = \"1 m/s\"", "velocity = \"1 m/s\"\nheat_flux = 0")
                        + "[lower_wall]\ntemperature = \"40 degC\"\n[initial]\ntemperature = \"40 degC\"\n"),
                // fluid and viscosity
                bad("unknown law", "fluid.viscosity.law", edit("law = \"constant\"", "law = \"vogle\" # <-")),
                bad("key of another law (walther takes temperatures and values)", "fluid.viscosity.value",
                        edit(edit("law = \"constant\"", "law = \"walther\""), "value = \"30 mPa*s\"",
                                "value = \"30 mPa*s\" # <-")),
                bad("walther through three points", "fluid.viscosity.temperatures",
                        edit(edit(edit("law = \"constant\"", "law = \"walther\""), "value = \"30 mPa*s\"",
                                "temperatures = [\"40 degC\", \"70 degC\", \"100 degC\"] # <-"),
                                "[fluid.viscosity]", "[fluid.viscosity]\nvalues = [\"46 cSt\", \"15 cSt\", \"6.8 cSt\"]")),
                bad("vogel with T below c in range", "fluid.viscosity.c",
                        edit(edit("law = \"constant\"", "law = \"vogel\"\na = \"5e-5 Pa*s\"\nb = \"948 K\""),
                                "value = \"30 mPa*s\"", "c = \"400 K\" # <-")),
                bad("table with falling temperatures", "fluid.viscosity.temperatures[1]",
                        edit(edit("law = \"constant\"", "law = \"table\"\nvalues = [\"40 mPa*s\", \"20 mPa*s\"]"),
                                "value = \"30 mPa*s\"", "temperatures = [\"60 degC\", \"40 degC\"] # <-")),
                bad("missing law", "fluid.viscosity.law",
                        edit(edit("law = \"constant\"", ""), "[fluid.viscosity]", "[fluid.viscosity] # <-")),
                bad("missing viscosity", "fluid.viscosity", edit(edit(edit(
                        "[fluid.viscosity]", ""), "law = \"constant\"", ""), "value = \"30 mPa*s\"", "")
                        .replace("[fluid]\n", "[fluid] # <-\n")),
                bad("missing density", "fluid.density",
                        edit(edit("density = \"860 kg/m^3\"", ""), "[fluid]", "[fluid] # <-")),
                bad("density per area", "fluid.density",
                        edit("density = \"860 kg/m^3\"", "density = \"860 kg/m^2\" # <-")),
                bad("viscosity in m/s", "fluid.viscosity.value", edit("value = \"30 mPa*s\"", "value = \"30 m/s\" # <-")),
                bad("negative viscosity", "fluid.viscosity.value",
                        edit("value = \"30 mPa*s\"", "value = \"-30 mPa*s\" # <-")),
                bad("zero kinematic viscosity", "fluid.viscosity.value",
                        edit("value = \"30 mPa*s\"", "value = \"0 cSt\" # <-")),
                bad("valid_to below valid_from", "fluid.viscosity.valid_to", edit("value = \"30 mPa*s\"",
                        "value = \"30 mPa*s\"\nvalid_from = \"80 degC\"\nvalid_to = \"20 degC\" # <-")),
                bad("unknown preset", "fluid.preset",
                        edit("density = \"860 kg/m^3\"", "preset = \"seawater\" # <-\ndensity = \"860 kg/m^3\"")),
                bad("expansion without a temperature", "fluid.density_temperature",
                        edit(edit("density = \"860 kg/m^3\"", "density = \"860 kg/m^3\"\nthermal_expansion = \"6.5e-4 1/K\""),
                                "[fluid]", "[fluid] # <-")),
                bad("temperature-dependent density without an initial temperature", "initial.temperature",
                        edit("density = \"860 kg/m^3\"", "density = \"860 kg/m^3\"\nthermal_expansion = \"6.5e-4 1/K\"\n"
                                + "density_temperature = \"20 degC\"")),
                // journal
                bad("gap and journal", "geometry.gap", edit("gap = \"25 um\"", "gap = \"25 um\" # <-") + JOURNAL),
                bad("journal and semi_infinite", "geometry.semi_infinite",
                        edit("gap = \"25 um\"", "semi_infinite = true # <-") + JOURNAL),
                bad("journal and upper wall velocity", "upper_wall.velocity",
                        edit(edit("gap = \"25 um\"", ""), "velocity = \"1 m/s\"", "velocity = \"1 m/s\" # <-") + JOURNAL),
                bad("clearance above the radius", "journal.radial_clearance", edit(edit("gap = \"25 um\"", ""),
                        "velocity = \"1 m/s\"", "") + JOURNAL.replace("radial_clearance = \"40 um\"",
                        "radial_clearance = \"30 mm\" # <-")),
                bad("journal without diameter", "journal.diameter", edit(edit("gap = \"25 um\"", ""),
                        "velocity = \"1 m/s\"", "") + JOURNAL.replace("[journal]\ndiameter = \"50 mm\"\n", "[journal] # <-\n")),
                bad("journal speed in m/s", "journal.speed", edit(edit("gap = \"25 um\"", ""),
                        "velocity = \"1 m/s\"", "") + JOURNAL.replace("speed = \"3000 rpm\"", "speed = \"3000 m/s\" # <-")),
                // wall motions
                bad("non-monotone table times", "upper_wall.velocity.times[2]", edit("velocity = \"1 m/s\"",
                        "velocity = { kind = \"table\", times = [\"0 s\", \"2 ms\", \"1 ms\"], values = [0, 1, 2] } # <-")),
                bad("non-monotone times over several lines", "upper_wall.velocity.times[2]", edit("velocity = \"1 m/s\"",
                        "[upper_wall.velocity]\nkind = \"table\"\ntimes = [\n  \"0 s\",\n  \"2 ms\",\n  \"1 ms\", # <-\n]\n"
                                + "values = [\"0 m/s\", \"1 m/s\", \"2 m/s\"]")),
                bad("fewer values than times", "upper_wall.velocity.values", edit("velocity = \"1 m/s\"",
                        "[upper_wall.velocity]\nkind = \"table\"\ntimes = [\"0 s\", \"1 ms\"]\nvalues = [\"0 m/s\"] # <-")),
                bad("ramp without duration", "upper_wall.velocity.duration",
                        edit("velocity = \"1 m/s\"", "velocity = { kind = \"ramp\", to = \"1 m/s\" } # <-")),
                bad("negative ramp duration", "upper_wall.velocity.duration", edit("velocity = \"1 m/s\"",
                        "velocity = { kind = \"ramp\", to = \"1 m/s\", duration = \"-1 ms\" } # <-")),
                bad("unknown kind of motion", "upper_wall.velocity.kind",
                        edit("velocity = \"1 m/s\"", "velocity = { kind = \"step\", to = \"1 m/s\" } # <-")),
                bad("zero sine frequency", "upper_wall.velocity.frequency", edit("velocity = \"1 m/s\"",
                        "velocity = { kind = \"sine\", amplitude = \"1 m/s\", frequency = \"0 Hz\" } # <-")),
                bad("sine phase in metres", "upper_wall.velocity.phase", edit("velocity = \"1 m/s\"",
                        "velocity = { kind = \"sine\", amplitude = \"1 m/s\", frequency = \"50 Hz\", phase = \"1 m\" } # <-")),
                bad("velocity is an array", "upper_wall.velocity",
                        edit("velocity = \"1 m/s\"", "velocity = [\"1 m/s\"] # <-")),
                bad("velocity in rpm", "upper_wall.velocity", edit("velocity = \"1 m/s\"", "velocity = \"1 rpm\" # <-")),
                // thermal keys
                bad("a wall temperature alone", "fluid.specific_heat",
                        edit("[fluid]", "[fluid] # <-") + "[lower_wall]\ntemperature = \"40 degC\"\n"),
                bad("no thermal condition on the upper wall", "upper_wall",
                        edit(thermalBase, "[upper_wall]", "[upper_wall] # <-")
                                + "[lower_wall]\ntemperature = \"40 degC\"\n[initial]\ntemperature = \"40 degC\"\n"),
                bad("no initial temperature for the energy equation", "initial.temperature",
                        edit(thermalBase, "velocity = \"1 m/s\"", "velocity = \"1 m/s\"\nheat_flux = 0")
                                + "[lower_wall]\ntemperature = \"40 degC\"\n[initial] # <-\nvelocity = 0\n"),
                bad("two thermal conditions on one wall", "upper_wall.heat_flux", edit("velocity = \"1 m/s\"",
                        "velocity = \"1 m/s\"\ntemperature = \"40 degC\"\nheat_flux = \"0 W/m^2\" # <-")),
                bad("heat_transfer without ambient", "upper_wall.heat_transfer.ambient", edit("velocity = \"1 m/s\"",
                        "velocity = \"1 m/s\"\nheat_transfer = { coefficient = \"800 W/(m^2*K)\" } # <-")),
                bad("heat_transfer is a string", "upper_wall.heat_transfer", edit("velocity = \"1 m/s\"",
                        "velocity = \"1 m/s\"\nheat_transfer = \"800 W/(m^2*K)\" # <-")),
                bad("heat flux in watts", "upper_wall.heat_flux", edit("velocity = \"1 m/s\"",
                        "velocity = \"1 m/s\"\nheat_flux = \"5 W\" # <-")),
                bad("below absolute zero", "initial.temperature", BASE + "[initial]\ntemperature = \"-300 degC\" # <-\n"),
                // pressure, time, grid, output
                bad("pressure gradient in Pa", "pressure.gradient", BASE + "[pressure]\ngradient = \"2 Pa\" # <-\n"),
                bad("negative end", "time.end", edit("end = \"1 ms\"", "end = \"-1 ms\" # <-")),
                bad("end is a word", "time.end", edit("end = \"1 ms\"", "end = \"forever\" # <-")),
                bad("missing time table", "time.end", edit(edit("[time]", ""), "end = \"1 ms\"", "")),
                bad("tolerance too loose", "time.tolerance",
                        edit("end = \"1 ms\"", "end = \"1 ms\"\ntolerance = 1 # <-")),
                bad("too few points", "grid.points", BASE + "[grid]\npoints = 2 # <-\n"),
                bad("fractional points", "grid.points", BASE + "[grid]\npoints = 201.5 # <-\n"),
                bad("points as a string", "grid.points", BASE + "[grid]\npoints = \"201\" # <-\n"),
                bad("huge points", "grid.points", BASE + "[grid]\npoints = 99999999999 # <-\n"),
                bad("clustering above one", "grid.clustering", BASE + "[grid]\nclustering = 1.5 # <-\n"),
                bad("output time after the end", "output.times[1]",
                        BASE + "[output]\ntimes = [\n  \"0.5 ms\",\n  \"2 ms\", # <-\n]\n"),
                bad("output times not increasing", "output.times[1]",
                        BASE + "[output]\ntimes = [\"0.5 ms\", \"0.2 ms\"] # <-\n"),
                bad("output times of a steady case", "output.times",
                        edit("end = \"1 ms\"", "end = \"steady\"") + "[output]\ntimes = [\"1 ms\"] # <-\n"),
                bad("output times not an array", "output.times", BASE + "[output]\ntimes = \"1 ms\" # <-\n"),
                bad("plots as a string", "output.plots", BASE + "[output]\nplots = \"yes\" # <-\n"),
                bad("title is a number", "title", edit("title = \"bad input\"", "title = 5 # <-")),
                // TOML syntax
                bad("unterminated string", TomlDocument.SYNTAX_KEY, edit("gap = \"25 um\"", "gap = \"25 um # <-")),
                bad("missing value", TomlDocument.SYNTAX_KEY, edit("end = \"1 ms\"", "end = # <-")),
                bad("duplicate key", TomlDocument.SYNTAX_KEY, edit("gap = \"25 um\"", "gap = \"25 um\"\ngap = \"30 um\" # <-")),
                bad("unclosed table header", TomlDocument.SYNTAX_KEY, edit("[time]", "[time # <-")));
    }

    @ParameterizedTest(name = "{0}")
    @MethodSource("cases")
    void badInputIsOneLineAtTheRightKeyAndLine(Bad bad) {
        InputException e = assertThrows(InputException.class, () -> new CaseReader().read(bad.text(), "bad.toml"));
        String line = e.oneLine();
        assertEquals(bad.key(), e.key(), line);
        assertEquals(bad.expectedLine(), e.line(), line);
        assertTrue(line.startsWith("error: bad.toml:" + bad.expectedLine() + ": " + bad.key() + ": "), line);
        assertFalse(line.contains("\n") || line.contains("\r"), line);
        assertTrue(line.contains(" (given ") && line.contains(", allowed ") && line.endsWith(")"), line);
    }
}
