package dev.filmshear.cli.input;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.Arguments;
import org.junit.jupiter.params.provider.MethodSource;
import org.junit.jupiter.params.provider.ValueSource;

import java.util.stream.Stream;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

/**
 * Every unit of the table against its definition. Unless noted the definitions are from NIST Special
 * Publication 811, "Guide for the Use of the International System of Units (SI)", 2008 edition
 * (A. Thompson, B. N. Taylor), Appendix B (conversion factors, the exact ones marked as such,
 * and the temperature formulas), and SI prefixes from the SI Brochure (BIPM, 9th edition, 2019). The
 * definitions are cited from memory; each is also a legal definition that the other sources repeat
 * (international yard and pound of 1959: 1 yd = 0.9144 m, 1 lb = 0.45359237 kg; standard gravity
 * 9.80665 m/s^2 from the 3rd CGPM, 1901).
 */
class UnitsTest {
    /**
     * Relative tolerance: a conversion is a product of the number and one factor, and a compound factor
     * a product or quotient of a few table factors; each rounds once in double precision (2^-53 ~ 1.1e-16).
     */
    private static final double ROUNDING = 1e-15;

    private static final double POUND_KG = 0.45359237;      // NIST SP 811 Appendix B, exact
    private static final double STANDARD_GRAVITY = 9.80665; // NIST SP 811 Appendix B (lbf), exact
    private static final double INCH_M = 0.0254;            // NIST SP 811 Appendix B, exact

    static Stream<Arguments> definitions() {
        double psi = POUND_KG * STANDARD_GRAVITY / (INCH_M * INCH_M);
        return Stream.of(
                // length
                Arguments.of("1 m", QuantityKind.LENGTH, 1.0),
                Arguments.of("1 km", QuantityKind.LENGTH, 1e3),
                Arguments.of("1 cm", QuantityKind.LENGTH, 1e-2),
                Arguments.of("1 mm", QuantityKind.LENGTH, 1e-3),
                Arguments.of("1 um", QuantityKind.LENGTH, 1e-6),
                Arguments.of("1 µm", QuantityKind.LENGTH, 1e-6),   // micro sign U+00B5
                Arguments.of("1 μm", QuantityKind.LENGTH, 1e-6),   // Greek mu U+03BC
                Arguments.of("1 nm", QuantityKind.LENGTH, 1e-9),
                Arguments.of("1 in", QuantityKind.LENGTH, 0.0254),
                Arguments.of("1 inch", QuantityKind.LENGTH, 0.0254),
                Arguments.of("1 ft", QuantityKind.LENGTH, 0.3048),
                Arguments.of("1 mil", QuantityKind.LENGTH, 25.4e-6),
                Arguments.of("0.025 mm", QuantityKind.LENGTH, 25e-6),
                // time
                Arguments.of("1 s", QuantityKind.TIME, 1.0),
                Arguments.of("1 ms", QuantityKind.TIME, 1e-3),
                Arguments.of("1 us", QuantityKind.TIME, 1e-6),
                Arguments.of("1 µs", QuantityKind.TIME, 1e-6),
                Arguments.of("1 min", QuantityKind.TIME, 60.0),
                Arguments.of("1 h", QuantityKind.TIME, 3600.0),
                // frequency and rotation, with 1 rev = 1
                Arguments.of("1 Hz", QuantityKind.FREQUENCY, 1.0),
                Arguments.of("1 kHz", QuantityKind.FREQUENCY, 1e3),
                Arguments.of("3000 rpm", QuantityKind.ROTATIONAL_SPEED, 50.0),
                Arguments.of("1 rev/s", QuantityKind.ROTATIONAL_SPEED, 1.0),
                Arguments.of("50 Hz", QuantityKind.ROTATIONAL_SPEED, 50.0),
                Arguments.of("1 rad/s", QuantityKind.ROTATIONAL_SPEED, 1 / (2 * Math.PI)),
                Arguments.of("314.1592653589793 rad/s", QuantityKind.FREQUENCY, 50.0),
                // angles, used in radians
                Arguments.of("180 deg", QuantityKind.ANGLE, Math.PI),
                Arguments.of("90 °", QuantityKind.ANGLE, Math.PI / 2),
                Arguments.of("1 rad", QuantityKind.ANGLE, 1.0),
                Arguments.of("0.25 rev", QuantityKind.ANGLE, Math.PI / 2),
                // mass through density
                Arguments.of("1 kg/m^3", QuantityKind.DENSITY, 1.0),
                Arguments.of("1 g/cm^3", QuantityKind.DENSITY, 1000.0),
                // absolute temperatures: T/K = t/degC + 273.15, T/K = (t/degF + 459.67) / 1.8 (Appendix B)
                Arguments.of("313.15 K", QuantityKind.ABSOLUTE_TEMPERATURE, 313.15),
                Arguments.of("40 degC", QuantityKind.ABSOLUTE_TEMPERATURE, 313.15),
                Arguments.of("40 °C", QuantityKind.ABSOLUTE_TEMPERATURE, 313.15),
                Arguments.of("104 degF", QuantityKind.ABSOLUTE_TEMPERATURE, 313.15),
                Arguments.of("104 °F", QuantityKind.ABSOLUTE_TEMPERATURE, 313.15),
                Arguments.of("32 degF", QuantityKind.ABSOLUTE_TEMPERATURE, 273.15),
                Arguments.of("-40 degF", QuantityKind.ABSOLUTE_TEMPERATURE, 233.15),
                Arguments.of("-40 degC", QuantityKind.ABSOLUTE_TEMPERATURE, 233.15),
                Arguments.of("-459.67 degF", QuantityKind.ABSOLUTE_TEMPERATURE, 0.0),
                // temperature differences: intervals, 1 degF = 5/9 K
                Arguments.of("10 K", QuantityKind.TEMPERATURE_DIFFERENCE, 10.0),
                Arguments.of("10 degC", QuantityKind.TEMPERATURE_DIFFERENCE, 10.0),
                Arguments.of("9 degF", QuantityKind.TEMPERATURE_DIFFERENCE, 5.0),
                // pressure, force, energy, power
                Arguments.of("1 Pa", QuantityKind.PRESSURE, 1.0),
                Arguments.of("1 kPa", QuantityKind.PRESSURE, 1e3),
                Arguments.of("1 MPa", QuantityKind.PRESSURE, 1e6),
                Arguments.of("1 GPa", QuantityKind.PRESSURE, 1e9),
                Arguments.of("1 bar", QuantityKind.PRESSURE, 1e5),
                Arguments.of("1 psi", QuantityKind.PRESSURE, psi),
                Arguments.of("1 N/m^2", QuantityKind.PRESSURE, 1.0),
                Arguments.of("1 J/m^3", QuantityKind.PRESSURE, 1.0),
                Arguments.of("1 W/m^2", QuantityKind.HEAT_FLUX, 1.0),
                Arguments.of("1 kW/m^2", QuantityKind.HEAT_FLUX, 1e3),
                Arguments.of("-2e6 Pa/m", QuantityKind.PRESSURE_GRADIENT, -2e6),
                Arguments.of("1 psi/in", QuantityKind.PRESSURE_GRADIENT, psi / INCH_M),
                // thermal properties, with interval degrees inside compounds
                Arguments.of("1950 J/(kg*K)", QuantityKind.SPECIFIC_HEAT, 1950.0),
                Arguments.of("1 kJ/(kg*K)", QuantityKind.SPECIFIC_HEAT, 1e3),
                Arguments.of("1 J/(kg*degC)", QuantityKind.SPECIFIC_HEAT, 1.0),
                Arguments.of("1 J/(kg*degF)", QuantityKind.SPECIFIC_HEAT, 1.8),
                Arguments.of("0.13 W/(m*K)", QuantityKind.CONDUCTIVITY, 0.13),
                Arguments.of("800 W/(m^2*K)", QuantityKind.HEAT_TRANSFER_COEFFICIENT, 800.0),
                Arguments.of("6.5e-4 1/K", QuantityKind.EXPANSION, 6.5e-4),
                Arguments.of("1 1/degF", QuantityKind.EXPANSION, 1.8),
                Arguments.of("1 1/degC", QuantityKind.EXPANSION, 1.0),
                // viscosity: 1 P = 0.1 Pa*s, 1 St = 1e-4 m^2/s (Appendix B)
                Arguments.of("1 Pa*s", QuantityKind.DYNAMIC_VISCOSITY, 1.0),
                Arguments.of("30 mPa*s", QuantityKind.DYNAMIC_VISCOSITY, 0.03),
                Arguments.of("1 P", QuantityKind.DYNAMIC_VISCOSITY, 0.1),
                Arguments.of("30 cP", QuantityKind.DYNAMIC_VISCOSITY, 0.03),
                Arguments.of("1 N*s/m^2", QuantityKind.DYNAMIC_VISCOSITY, 1.0),
                Arguments.of("1 St", QuantityKind.KINEMATIC_VISCOSITY, 1e-4),
                Arguments.of("32 cSt", QuantityKind.KINEMATIC_VISCOSITY, 32e-6),
                Arguments.of("1 mm^2/s", QuantityKind.KINEMATIC_VISCOSITY, 1e-6),
                Arguments.of("32 cSt", QuantityKind.DYNAMIC_OR_KINEMATIC_VISCOSITY, 32e-6),
                Arguments.of("30 cP", QuantityKind.DYNAMIC_OR_KINEMATIC_VISCOSITY, 0.03),
                // velocity and the example spellings of the contract
                Arguments.of("20 m/s", QuantityKind.VELOCITY, 20.0),
                Arguments.of("1 mm/ms", QuantityKind.VELOCITY, 1.0),
                Arguments.of("1 ft/min", QuantityKind.VELOCITY, 0.3048 / 60),
                Arguments.of("25um", QuantityKind.LENGTH, 25e-6),
                Arguments.of("  +2.5E+1   um ", QuantityKind.LENGTH, 25e-6),
                Arguments.of("0.5", QuantityKind.DIMENSIONLESS, 0.5));
    }

    @ParameterizedTest(name = "{0} as {1}")
    @MethodSource("definitions")
    void eachUnitMatchesItsDefinition(String text, QuantityKind kind, double expected) {
        assertEquals(expected, Units.toSi(text, kind), Math.abs(expected) * ROUNDING + Double.MIN_VALUE);
    }

    @Test
    void exactFactorsAreExactlyTheirDefinitions() {
        // NIST SP 811 Appendix B: inch, foot and mil are exact; the table holds the defining decimal itself.
        assertEquals(0.0254, Units.unit("in").factor());
        assertEquals(0.3048, Units.unit("ft").factor());
        assertEquals(25.4e-6, Units.unit("mil").factor());
        assertEquals(273.15, Units.unit("degC").offset());
        assertEquals(459.67, Units.unit("degF").offset());
    }

    static Stream<Arguments> compounds() {
        return Stream.of(
                Arguments.of("W/(m*K)", 1.0, Dimension.CONDUCTIVITY),
                Arguments.of("J/(kg*K)", 1.0, Dimension.SPECIFIC_HEAT),
                Arguments.of("kg/m^3", 1.0, Dimension.DENSITY),
                Arguments.of("Pa*s", 1.0, Dimension.DYNAMIC_VISCOSITY),
                Arguments.of("mm^2/s", 1e-6, Dimension.KINEMATIC_VISCOSITY),
                Arguments.of("1/K", 1.0, Dimension.PER_KELVIN),
                Arguments.of("N*m", 1.0, Dimension.ENERGY),
                Arguments.of("kg*m^2", 1.0, new Dimension(2, 1, 0, 0)),
                Arguments.of("m^-1", 1.0, new Dimension(-1, 0, 0, 0)),
                Arguments.of("m^(-2)", 1.0, new Dimension(-2, 0, 0, 0)),
                Arguments.of("m/s/s", 1.0, new Dimension(1, 0, -2, 0)),
                Arguments.of("m²", 1.0, new Dimension(2, 0, 0, 0)),
                Arguments.of("m³", 1.0, new Dimension(3, 0, 0, 0)),
                Arguments.of("W / ( m^2 * K )", 1.0, Dimension.HEAT_TRANSFER_COEFFICIENT),
                Arguments.of("Pa·s", 1.0, Dimension.DYNAMIC_VISCOSITY),
                Arguments.of("in^2", 0.0254 * 0.0254, new Dimension(2, 0, 0, 0)),
                Arguments.of("((m))", 1.0, Dimension.LENGTH));
    }

    @ParameterizedTest(name = "{0}")
    @MethodSource("compounds")
    void grammarBuildsProductsQuotientsPowersAndParentheses(String text, double factor, Dimension dimension) {
        Unit unit = Units.unit(text);
        assertEquals(dimension, unit.dimension());
        assertEquals(factor, unit.factor(), factor * ROUNDING);
        assertEquals(0, unit.offset(), "a compound unit is never affine");
    }

    @Test
    void aDegreeInsideACompoundIsAnInterval() {
        assertEquals(0, Units.unit("degF*m/m").offset());
        assertEquals(0, Units.unit("degC^1").offset());
        // Parentheses around a lone scale keep its zero: "(degF)" is still the Fahrenheit scale.
        assertEquals(313.15, Units.toSi("104 (degF)", QuantityKind.ABSOLUTE_TEMPERATURE), 313.15 * ROUNDING);
    }

    @Test
    void bareNumbersAreSi() {
        assertEquals(313.15, QuantityKind.ABSOLUTE_TEMPERATURE.toSi(Quantity.bare(313.15)));
        assertEquals(1.5, QuantityKind.ANGLE.toSi(Quantity.bare(1.5)), "a bare angle is in radians");
        assertEquals(50, QuantityKind.ROTATIONAL_SPEED.toSi(Quantity.bare(50)), "a bare speed is in rev/s");
        assertEquals(2.5e-5, Units.toSi("2.5e-5", QuantityKind.LENGTH), "a number-only string is SI too");
    }

    @Test
    void wrongDimensionNamesTheUnitAndWhatIsExpected() {
        UnitException e = assertThrows(UnitException.class, () -> Units.toSi("20 m", QuantityKind.VELOCITY));
        assertEquals("unit \"m\" is a length, not a velocity", e.problem());
        assertEquals("a velocity such as \"20 m/s\"", e.allowed());

        UnitException t = assertThrows(UnitException.class, () -> Units.toSi("40 degC", QuantityKind.LENGTH));
        assertTrue(t.problem().contains("a temperature"), t.problem());
        assertTrue(t.allowed().contains("\"25 um\""), t.allowed());

        UnitException v = assertThrows(UnitException.class,
                () -> Units.toSi("2 m/s", QuantityKind.DYNAMIC_OR_KINEMATIC_VISCOSITY));
        assertTrue(v.allowed().contains("\"30 mPa*s\" or \"32 cSt\""), v.allowed());
    }

    @Test
    void anglesAndPlainNumbersAreKeptApart() {
        assertThrows(UnitException.class, () -> Units.toSi("0.5 rad", QuantityKind.DIMENSIONLESS));
        assertThrows(UnitException.class, () -> Units.toSi("0.5 1", QuantityKind.ANGLE));
        assertThrows(UnitException.class, () -> Units.toSi("2 m", QuantityKind.ANGLE));
    }

    @Test
    void absoluteTemperatureBelowAbsoluteZeroIsRefused() {
        UnitException e = assertThrows(UnitException.class,
                () -> Units.toSi("-300 degC", QuantityKind.ABSOLUTE_TEMPERATURE));
        assertTrue(e.problem().contains("absolute zero"), e.problem());
        // the same number is a fine temperature difference
        assertEquals(-300, Units.toSi("-300 degC", QuantityKind.TEMPERATURE_DIFFERENCE));
    }

    @ParameterizedTest
    @ValueSource(strings = {"", "m/s", "abc", "20 furlong", "20 Pa s", "20 m/", "20 m^", "20 m^x", "20 (m",
            "20 m)", "20 1e3", "20 m**2", "20 m^1234", "1e999 m", "20 2m", "20 m^-", "- 5 m"})
    void malformedQuantitiesAreRefused(String text) {
        UnitException e = assertThrows(UnitException.class, () -> Units.parse(text));
        assertFalse(e.problem().isBlank());
        assertFalse(e.allowed().isBlank());
    }

    @Test
    void misspeltUnitsGetASuggestion() {
        UnitException c = assertThrows(UnitException.class, () -> Units.unit("C"));
        assertTrue(c.problem().contains("did you mean \"degC\""), c.problem());
        UnitException cst = assertThrows(UnitException.class, () -> Units.unit("CST"));
        assertTrue(cst.problem().contains("\"cSt\""), cst.problem());
        UnitException pas = assertThrows(UnitException.class, () -> Units.unit("Pa s"));
        assertTrue(pas.problem().contains("\"*\""), pas.problem());
    }

    @Test
    void dimensionsPrintInBaseUnits() {
        assertEquals("kg/(m*s)", Dimension.DYNAMIC_VISCOSITY.toString());
        assertEquals("1/K", Dimension.PER_KELVIN.toString());
        assertEquals("kg*m/(s^3*K)", Dimension.CONDUCTIVITY.toString());
        assertEquals("1", Dimension.NONE.toString());
        assertEquals("a velocity", Dimension.VELOCITY.describe());
        assertEquals("of dimension kg*m^5", new Dimension(5, 1, 0, 0).describe());
    }
}
