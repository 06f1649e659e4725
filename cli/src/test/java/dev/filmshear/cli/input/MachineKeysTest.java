package dev.filmshear.cli.input;

import dev.filmshear.solver.model.FilmCase;
import dev.filmshear.solver.physics.Drive;
import dev.filmshear.solver.physics.WallMotion;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertInstanceOf;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

/** The keys of the engineer's case: driven walls and shafts, journal geometry, limits, a steady start. */
class MachineKeysTest {
    /** Relative tolerance for unit conversions: exact up to a few ulps. */
    private static final double EXACT = 1e-14;

    private static final String JOURNAL = String.join("\n",
            "[journal]",
            "diameter = \"50 mm\"",
            "length = \"40 mm\"",
            "radial_clearance = \"40 um\"",
            "speed = { kind = \"driven\", inertia = \"0.02 kg*m^2\", initial = \"3000 rpm\", torque = { kind = \"curve\", "
                    + "speeds = [\"0 rpm\", \"3600 rpm\"], values = [\"2 N*m\", \"0 N*m\"] } }",
            "[fluid]",
            "density = \"870 kg/m^3\"",
            "[fluid.viscosity]",
            "law = \"constant\"",
            "value = \"40 mPa*s\"",
            "[initial]",
            "temperature = \"40 degC\"",
            "[limits]",
            "max_temperature = \"194 degF\"",
            "[time]",
            "end = \"1 s\"",
            "");

    private static CaseFile read(String text) {
        return new CaseReader().read(text, "case.toml");
    }

    @Test
    void drivenJournalIsTurnedIntoTheFilmsMassAndForcePerArea() {
        FilmCase c = read(JOURNAL).filmCase();
        double r = 0.025;
        double area = Math.PI * 0.05 * 0.04;
        WallMotion.Driven shaft = assertInstanceOf(WallMotion.Driven.class, c.physics().upper().motion());
        assertEquals(0.02 / (r * r * area), shaft.massPerArea(), EXACT * shaft.massPerArea());
        assertEquals(Math.PI * 0.05 * 50, shaft.initialVelocity(), EXACT * 10);
        Drive.SpeedCurve curve = assertInstanceOf(Drive.SpeedCurve.class, shaft.drive());
        assertEquals(Math.PI * 0.05 * 60, curve.speeds()[1], EXACT * 10, "3600 rpm = 60 rev/s at the surface");
        assertEquals(2 / (r * area), curve.forces()[0], EXACT * curve.forces()[0], "torque / (R A)");
        assertEquals(0.05, c.journal().diameter(), 0);
        // 194 degF = (194 + 459.67) * 5/9 K = 363.15 K (NIST SP 811, conversion from memory)
        assertEquals(363.15, c.limits().maxTemperature(), 1e-12);
    }

    @Test
    void drivenPlaneWallAndSteadyStart() {
        String text = String.join("\n",
                "[geometry]", "gap = \"25 um\"",
                "[fluid]", "density = \"870 kg/m^3\"",
                "[fluid.viscosity]", "law = \"constant\"", "value = \"40 mPa*s\"",
                "[upper_wall]",
                "velocity = { kind = \"driven\", mass = \"3 kg/m^2\", initial = \"5 m/s\", force = { kind = \"table\", "
                        + "times = [\"0 s\", \"1 s\"], values = [\"2 kPa\", \"0 Pa\"] } }",
                "[initial]", "steady = true",
                "[time]", "end = \"2 s\"", "");
        FilmCase c = read(text).filmCase();
        WallMotion.Driven wall = assertInstanceOf(WallMotion.Driven.class, c.physics().upper().motion());
        assertEquals(3, wall.massPerArea());
        assertInstanceOf(Drive.TimeTable.class, wall.drive());
        assertTrue(c.startSteady());
    }

    @ParameterizedTest(name = "{0}")
    @CsvSource(delimiter = '|', value = {
        "inertia in the wrong unit | speed = { kind = \"driven\", inertia = \"0.02 kg\", torque = \"1 N*m\" } | journal.speed.inertia",
        "torque in newtons | speed = { kind = \"driven\", inertia = \"0.02 kg*m^2\", torque = \"1 N\" } | journal.speed.torque",
        "no torque | speed = { kind = \"driven\", inertia = \"0.02 kg*m^2\" } | journal.speed.torque",
        "mass instead of inertia | speed = { kind = \"driven\", mass = \"2 kg/m^2\", torque = \"1 N*m\" } | journal.speed.mass",
        "curve speeds falling | speed = { kind = \"driven\", inertia = \"0.02 kg*m^2\", torque = { kind = \"curve\", speeds = [\"3000 rpm\", \"0 rpm\"], values = [\"0 N*m\", \"2 N*m\"] } } | journal.speed.torque.speeds",
        "unknown drive kind | speed = { kind = \"driven\", inertia = \"0.02 kg*m^2\", torque = { kind = \"ramp\" } } | journal.speed.torque.kind",
        "negative inertia | speed = { kind = \"driven\", inertia = \"-0.02 kg*m^2\", torque = \"1 N*m\" } | journal.speed.inertia",
        "coast-down fraction above one | speed = { kind = \"driven\", inertia = \"0.02 kg*m^2\", torque = \"0 N*m\", coast_down_fraction = 1.5 } | journal.speed.coast_down_fraction",
    })
    void badDrivenShaftsAreOneLineErrorsAtTheirKey(String name, String speedLine, String key) {
        String text = JOURNAL.replaceFirst("speed = \\{ kind = \"driven\".*\n", speedLine.replace("\\", "\\\\") + "\n");
        InputException e = assertThrows(InputException.class, () -> read(text), name);
        assertEquals(key, e.key(), e.oneLine());
        assertEquals(5, e.line(), e.oneLine());
        assertTrue(e.oneLine().startsWith("error: case.toml:5: " + key + ": "), e.oneLine());
    }

    @Test
    void steadyStartExcludesAnInitialVelocityAndASteadyCase() {
        String withVelocity = JOURNAL.replace("[initial]\n", "[initial]\nsteady = true\nvelocity = \"1 m/s\"\n");
        assertEquals("initial.velocity", assertThrows(InputException.class, () -> read(withVelocity)).key());
        String steadyCase = JOURNAL.replace("[initial]\n", "[initial]\nsteady = true\n").replace("end = \"1 s\"",
                "end = \"steady\"");
        assertEquals("initial.steady", assertThrows(InputException.class, () -> read(steadyCase)).key());
        String badLimit = JOURNAL.replace("max_temperature = \"194 degF\"", "max_temperature = \"90 Pa\"");
        assertEquals("limits.max_temperature", assertThrows(InputException.class, () -> read(badLimit)).key());
    }
}
