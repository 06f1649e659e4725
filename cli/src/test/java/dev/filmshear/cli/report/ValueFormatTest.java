package dev.filmshear.cli.report;

import org.junit.jupiter.api.Test;

import static org.junit.jupiter.api.Assertions.assertEquals;

/**
 * Numbers and units as the report writes them. Prefixes and the writing of numbers follow the SI Brochure
 * (BIPM, The International System of Units, 9th ed., 2019: table 7 for the prefixes, section 5.4 for a space
 * between number and unit and for the multiplication sign; table and section numbers from memory).
 */
class ValueFormatTest {
    private static final String NBSP = "\u00a0";

    private static String q(double value, String key) {
        return ValueFormat.quantity(value, ValueFormat.unitOf(key)).replace(NBSP, " ");
    }

    @Test
    void fiveSignificantFiguresWithAPrefixWhereTheUnitTakesOne() {
        assertEquals("20.64 kPa", q(20639.99999912848, "wall_shear_stress_lower_Pa"));
        assertEquals("-20.64 kPa", q(-20639.99999912848, "wall_shear_stress_upper_Pa"));
        assertEquals("60 µs", q(6.0e-5, "end_time_s"));
        assertEquals("1.2665 µs", q(1.2665408375164797e-6, "momentum_time_scale_s"));
        assertEquals("25 µm", q(2.5e-5, "gap_m"));
        assertEquals("449.18 kW/m²", q(449183.614904584, "dissipation_W_per_m2"));
        assertEquals("27.52 mPa·s", q(0.02752, "viscosity_Pa_s"));
        assertEquals("0 Pa", q(0, "wall_shear_stress_lower_Pa"));
    }

    @Test
    void roundingThatCarriesMovesToTheNextPrefix() {
        // 999.9996 us rounds to 1000.0 us, which is written 1 ms
        assertEquals("1 ms", q(999.9996e-6, "thermal_time_scale_s"));
    }

    @Test
    void unitsWithoutPrefixesAndPureNumbersTurnScientificOutsideTheirPlainRange() {
        assertEquals("324.81 K", q(324.81235252830777, "max_temperature_K"));
        assertEquals("1.1922 × 10⁻⁵", q(1.1922040494350954e-5, "energy_imbalance"));
        assertEquals("1.2346 × 10⁶", q(1234567, "reynolds_number"));
        assertEquals("0.0080625", q(0.0080625, "prandtl_number"));
        assertEquals("4.6015 × 10⁻⁵ m²/s", q(4.601502292540015e-5, "kinematic_viscosity_m2_per_s"));
        assertEquals("0.046262 1/K", q(0.046262130846922746, "viscosity_temperature_coefficient_per_K"));
    }

    @Test
    void temperaturesAlsoInCelsius() {
        // the Celsius temperature is T - 273.15 K by definition (BIPM, SI Brochure, 9th ed., 2019)
        assertEquals("313.15 K (40 °C)", ValueFormat.temperature(313.15).replace(NBSP, " "));
    }

    @Test
    void theLongestSuffixNamesTheUnit() {
        assertEquals("Pa·s", ValueFormat.unitOf("viscosity_Pa_s").symbol());
        assertEquals("N·m", ValueFormat.unitOf("friction_torque_N_m").symbol());
        assertEquals("m/s", ValueFormat.unitOf("relative_wall_speed_m_per_s").symbol());
        assertEquals("W", ValueFormat.unitOf("friction_power_W").symbol());
        assertEquals("", ValueFormat.unitOf("rejected_steps").symbol(), "a plural is not seconds");
        assertEquals("friction_torque", ValueFormat.stem("friction_torque_N_m"));
    }
}
