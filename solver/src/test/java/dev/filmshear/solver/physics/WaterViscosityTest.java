package dev.filmshear.solver.physics;

import static org.junit.jupiter.api.Assertions.assertEquals;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

/** Water's viscosity law at a fixed pressure. */
class WaterViscosityTest {

    /**
     * IAPWS R12-08 with IF97 density at 0.101325 MPa, tabulated in the project's reference sheet
     * (section 1.5, derived there from the two verified formulations) to 0.01 uPa s. The computed values
     * lie within 5e-6 of the printed ones, so 1e-5 holds with margin while a wrong coefficient would not.
     */
    private static final double DERIVED_TABLE_TOLERANCE = 1e-5;
    /** Handbook table against a reference correlation: agreement to about 1 %. */
    private static final double HANDBOOK_TOLERANCE = 0.01;
    private static final double CELSIUS_ZERO = 273.15;

    private final WaterViscosity water = new WaterViscosity(WaterViscosity.STANDARD_ATMOSPHERE);

    @ParameterizedTest(name = "{0} degC")
    @CsvSource({"20, 998.206, 1001.60", "40, 992.224, 652.73", "80, 971.803, 354.06"})
    void matchesIapwsValuesAtOneAtmosphere(double celsius, String printedDensity, double micropascalSeconds) {
        double t = CELSIUS_ZERO + celsius;
        double expected = micropascalSeconds * 1e-6;
        assertEquals(expected, water.mu(t), DERIVED_TABLE_TOLERANCE * expected);
        assertEquals(PrintedDigits.value(printedDensity), water.density(t), PrintedDigits.halfUnit(printedDensity));
    }

    /**
     * Y. A. Cengel and A. J. Ghajar, Heat and Mass Transfer, "Properties of saturated water" (Table A-9 in
     * the edition seen): 1.002e-3 Pa s at 20 degC, 0.653e-3 Pa s at 40 degC.
     */
    @ParameterizedTest(name = "{0} degC")
    @CsvSource({"20, 1.002e-3", "40, 0.653e-3"})
    void agreesWithHandbook(double celsius, double expected) {
        assertEquals(expected, water.mu(CELSIUS_ZERO + celsius), HANDBOOK_TOLERANCE * expected);
    }

    /**
     * Validity ends at the saturation temperature; at 10 MPa that is IF97 Table 36's 584.149488 K (values
     * quoted by independent public IF97 test files), and above 16.53 MPa it is region 1's 623.15 K.
     */
    @Test
    void validityEndsAtBoiling() {
        assertEquals(273.15, water.validFrom(), 0);
        assertEquals(Iapws97Region4.saturationTemperature(WaterViscosity.STANDARD_ATMOSPHERE), water.validTo(), 0);
        assertEquals(584.149488, new WaterViscosity(10e6).validTo(), 1e-6);
        assertEquals(623.15, new WaterViscosity(50e6).validTo(), 0);
    }
}
