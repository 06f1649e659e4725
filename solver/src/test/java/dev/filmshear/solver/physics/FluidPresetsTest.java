package dev.filmshear.solver.physics;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

/** The built-in fluids. */
class FluidPresetsTest {

    /** The 40 degC point is one of the two D341 input points, so it comes back to rounding. */
    private static final double GRADE_TOLERANCE = 1e-9;
    private static final double CELSIUS_ZERO = 273.15;

    @Test
    void namesInStableOrder() {
        assertEquals(List.of("air", "water", "iso-vg-32", "iso-vg-46", "iso-vg-68", "iso-vg-100"),
                FluidPresets.names());
        assertEquals(FluidPresets.names(), FluidPresets.all().stream().map(FluidPreset::name).toList());
        assertTrue(FluidPresets.find("iso-vg-46").isPresent());
        assertTrue(FluidPresets.find("iso-vg-47").isEmpty());
        assertTrue(FluidPresets.all().stream().allMatch(preset -> preset.fluid().hasThermalProperties()));
    }

    /**
     * ISO 3448 (ASTM D2422): the grade's mid-point kinematic viscosity at 40 degC, limits +/-10 %.
     * The 100 degC values are typical, invented for demonstration, so only their label is checked.
     */
    @ParameterizedTest(name = "ISO VG {0}")
    @CsvSource({"32, 32, 28.8, 35.2", "46, 46, 41.4, 50.6", "68, 68, 61.2, 74.8", "100, 100, 90.0, 110"})
    void isoGradesHitTheirMidPoint(int grade, double midPoint, double min, double max) {
        FluidPreset oil = FluidPresets.find("iso-vg-" + grade).orElseThrow();
        WaltherViscosity law = (WaltherViscosity) oil.viscosity();
        double nu40 = law.kinematicViscosity(CELSIUS_ZERO + 40) * 1e6;
        assertEquals(midPoint, nu40, GRADE_TOLERANCE * midPoint);
        assertTrue(nu40 >= min && nu40 <= max, "inside the ISO 3448 band");
        assertEquals(oil.fluid().kinematicViscosity(CELSIUS_ZERO + 40), nu40 * 1e-6, GRADE_TOLERANCE * nu40 * 1e-6);
        assertTrue(oil.description().contains("typical, invented for demonstration"), oil.description());
        // Typical single-value set for mineral oil (reference sheet, section 6.1; common practice).
        assertEquals(870, oil.density().density(CELSIUS_ZERO + 15), 1e-12);
        assertEquals(1950, oil.specificHeat().value(CELSIUS_ZERO + 40), 0);
        assertEquals(0.13, oil.conductivity().value(CELSIUS_ZERO + 40), 0);
    }

    /**
     * Air: Cengel and Ghajar, properties of air at 1 atm, 20 degC: rho 1.204 kg/m^3, c_p 1007 J/(kg K),
     * k 0.02514 W/(m K). Water: Cengel and Ghajar, properties of saturated water, 20 degC: c_p 4182, k 0.598;
     * density from IF97 at 20 degC, 998.206 kg/m^3 (reference sheet, section 1.5).
     */
    @Test
    void airAndWaterCarryTheirHandbookValues() {
        FluidPreset air = FluidPresets.find("air").orElseThrow();
        assertEquals(1.204, air.density().density(300), 0);
        assertEquals(1007, air.specificHeat().value(300), 0);
        assertEquals(0.02514, air.conductivity().value(300), 0);
        assertEquals(SutherlandViscosity.AIR_USSA_1976, air.viscosity());

        FluidPreset water = FluidPresets.find("water").orElseThrow();
        assertEquals(998.206, water.density().density(300), 0.0005);
        assertEquals(4182, water.specificHeat().value(300), 0);
        assertEquals(0.598, water.conductivity().value(300), 0);
        assertEquals(new WaterViscosity(101_325), water.viscosity());
    }
}
