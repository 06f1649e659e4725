package dev.filmshear.cli;

import dev.filmshear.cli.input.ViscosityLaws;
import dev.filmshear.solver.physics.FluidPresets;
import org.junit.jupiter.api.Test;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

class FluidsCommandTest {

    @Test
    void listsEveryPresetWithItsRangeAndEveryLawWithItsKeys() {
        CommandLineTest.Outcome o = CommandLineTest.run("fluids");
        assertEquals(0, o.code(), o.err());
        for (String name : FluidPresets.names()) {
            assertTrue(o.out().contains("\n  " + name + "\n"), name);
        }
        for (var law : ViscosityLaws.standard().entrySet()) {
            assertTrue(o.out().contains("  " + law.getKey()), law.getKey());
            for (String key : law.getValue().keys()) {
                assertTrue(o.out().contains(key), law.getKey() + " key " + key);
            }
            assertTrue(FluidsCommand.FORMULAS.containsKey(law.getKey()), "a formula for " + law.getKey());
        }
        // ISO 3448: the VG 46 preset's 40 degC kinematic viscosity is the grade's mid-point, 46 mm^2/s
        assertTrue(o.out().contains("nu = 46.000 mm^2/s"), o.out());
    }
}
