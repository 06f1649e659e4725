package dev.filmshear.cli.fit;

import org.junit.jupiter.api.Test;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

/** The documented forms of a data file are read as documented. */
class ViscosityCsvTest {

    /** Unit conversions here are exact decimal products (NIST SP 811, 2008, Appendix B): no rounding beyond one ulp. */
    private static final double ULP = 1e-15;

    @Test
    void bracketsQuotesCommentsAndSpreadsheetLineEnds() {
        // a UTF-8 byte-order mark, CRLF line ends, quoted header cells, trailing comments, degF and cP
        String text = "\uFEFF# exported from a spreadsheet\r\n\"T [degF]\", \"mu [cP]\"  # header\r\n\r\n"
                + "104, 30\r\n212, 5   # hot\r\n";
        ViscosityData d = ViscosityCsv.parse(text, "sheet.csv");
        assertEquals(2, d.headerLine());
        assertEquals("T", d.temperature().key());
        assertEquals("mu", d.viscosity().key());
        assertFalse(d.kinematic());
        assertEquals(2, d.points().size());
        // 104 degF = (104 + 459.67) * 5/9 K = 313.15 K; 212 degF = 373.15 K; 1 cP = 1e-3 Pa s
        assertEquals(313.15, d.points().get(0).temperature(), ULP * 313.15);
        assertEquals(373.15, d.points().get(1).temperature(), ULP * 373.15);
        assertEquals(0.030, d.points().get(0).value(), ULP * 0.030);
        assertEquals(5, d.points().get(1).line());
        assertEquals(104, d.points().get(0).writtenTemperature());
    }

    @Test
    void theUnitIsTheLastBracketedGroupAndMayHoldParentheses() {
        ViscosityData d = ViscosityCsv.parse("temperature (K), viscosity (dynamic) (kg/(m*s))\n300, 1.8e-5\n", "x.csv");
        assertEquals("viscosity (dynamic)", d.viscosity().key());
        assertEquals(1.8e-5, d.points().get(0).value(), 0);
    }

    @Test
    void kinematicByItsUnit() {
        ViscosityData d = ViscosityCsv.parse("t (degC), nu (mm^2/s)\n40, 32\n", "x.csv");
        assertTrue(d.kinematic());
        assertEquals(32e-6, d.points().get(0).value(), ULP * 32e-6);
        ViscosityData unnamed = ViscosityCsv.parse("(degC), (cSt)\n40, 32\n", "x.csv");
        assertEquals("column 1", unnamed.temperature().key());
        assertEquals("column 2", unnamed.viscosity().key());
    }
}
