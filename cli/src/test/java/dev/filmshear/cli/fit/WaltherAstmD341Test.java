package dev.filmshear.cli.fit;

import com.fasterxml.jackson.databind.JsonNode;
import dev.filmshear.solver.physics.DensityLaw;
import dev.filmshear.solver.physics.WaltherViscosity;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

import java.nio.file.Path;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

/**
 * The walther fit against the ASTM D341 check values of references.md section 4 (ASTM D341-09(2015) and
 * D341-17/-20, "Standard Practice for Viscosity-Temperature Equations and Charts for Liquid Petroleum or
 * Hydrocarbon Products", equations quoted through two secondary summaries; the table is labelled
 * DERIVED there, its first row agreeing with a public spreadsheet). T = t + 273.15 throughout.
 */
class WaltherAstmD341Test {

    /** A and B are tabulated to 5 decimals: half a unit in the last place. */
    private static final double FIVE_DECIMALS = 5e-6;
    private static final double MM2_PER_S = 1e-6;
    /**
     * Standard error of A from points exactly on a line: Commons Math's SimpleRegression forms the residual
     * sum of squares as a difference of sums, good to about 1e-17 absolute, and A's standard error carries
     * the factor sqrt(mean(log T)^2 / Sxx), about 20 here, so about 5e-8 comes out instead of zero. Real data
     * scatter by 1e-3 and more.
     */
    private static final double ROUND_OFF_STANDARD_ERROR = 1e-6;

    @Test
    void twoPointsGiveTheStandardsLineAndItsViscosityAt20DegC(@TempDir Path dir) {
        FitTesting.Outcome o = FitTesting.run("fit", FitTesting.resource("astm-d341-32cst.csv").toString(),
                "--law", "walther", "--out", dir.toString());
        assertEquals(0, o.code(), o.err());
        JsonNode fit = FitTesting.json(dir);
        double a = FitTesting.parameter(fit, "A", "value");
        double b = FitTesting.parameter(fit, "B", "value");
        // references.md section 4, row "32 mm^2/s @ 40 degC, 5.4 @ 100 degC, T = t + 273.15"
        assertEquals(9.53082, a, FIVE_DECIMALS);
        assertEquals(3.74658, b, FIVE_DECIMALS);
        WaltherViscosity line = new WaltherViscosity(a, b, DensityLaw.constant(870), 273.15, 373.15);
        // same row: nu(20 degC) = 86.278, nu(0 degC) = 336.00, nu(60 degC) = 15.1859, nu(80 degC) = 8.5332 mm^2/s,
        // each to half a unit in its last tabulated place
        assertEquals(86.278, line.kinematicViscosity(293.15) / MM2_PER_S, 5e-4);
        assertEquals(336.00, line.kinematicViscosity(273.15) / MM2_PER_S, 5e-3);
        assertEquals(15.1859, line.kinematicViscosity(333.15) / MM2_PER_S, 5e-5);
        assertEquals(8.5332, line.kinematicViscosity(353.15) / MM2_PER_S, 5e-5);
        // an exact line through two points: no degree of freedom, no standard errors, and it says so
        assertEquals(0, fit.get("degrees_of_freedom").asInt());
        assertTrue(fit.get("parameters").get(0).get("standard_error").isNull());
        assertTrue(o.out().contains("no standard errors"), o.out());
    }

    @Test
    void theIso46RowOfTheTableAsWell(@TempDir Path dir) {
        FitTesting.Outcome o = FitTesting.run("fit", FitTesting.resource("astm-d341-46cst.csv").toString(),
                "--law", "walther", "--out", dir.toString());
        assertEquals(0, o.code(), o.err());
        JsonNode fit = FitTesting.json(dir);
        double a = FitTesting.parameter(fit, "A", "value");
        double b = FitTesting.parameter(fit, "B", "value");
        // references.md section 4, row "46 @ 40 degC, 6.8 @ 100 degC, T = t + 273.15": A, B, nu(20 degC) = 133.84
        assertEquals(9.41799, a, FIVE_DECIMALS);
        assertEquals(3.68444, b, FIVE_DECIMALS);
        WaltherViscosity line = new WaltherViscosity(a, b, DensityLaw.constant(870), 273.15, 373.15);
        assertEquals(133.84, line.kinematicViscosity(293.15) / MM2_PER_S, 5e-3);
        assertEquals(20.623, line.kinematicViscosity(333.15) / MM2_PER_S, 5e-4);
    }

    /**
     * Through more than two points the fit is the least-squares line in (log T, log log Z): points on the
     * ASTM line of the first table row give that line back, with standard errors at round-off level, and
     * the two-point fit agrees with the solver's own construction (WaltherViscosity.throughPoints).
     */
    @Test
    void pointsOnTheLineGiveItBackByLeastSquares() {
        WaltherViscosity truth = WaltherViscosity.throughPoints(313.15, 32e-6, 373.15, 5.4e-6, DensityLaw.constant(870));
        double[] kelvin = FitTesting.temperatures(283.15, 393.15, 7);
        double[] nu = new double[kelvin.length];
        for (int i = 0; i < nu.length; i++) {
            nu[i] = truth.kinematicViscosity(kelvin[i]);
        }
        FitResult fit = ViscosityFitter.fit(FitLaw.WALTHER, kelvin, nu);
        // round-off: log log Z carries about 1e-15, the line's A about 1e-13 after the fit's sums
        assertEquals(truth.a(), fit.parameter("A").value(), 1e-11);
        assertEquals(truth.b(), fit.parameter("B").value(), 1e-11);
        assertTrue(fit.parameter("A").standardError() < ROUND_OFF_STANDARD_ERROR,
                "standard error of A " + fit.parameter("A").standardError());
        assertTrue(fit.maxRelativeResidual() < 1e-12);

        FitResult two = ViscosityFitter.fit(FitLaw.WALTHER, new double[] {313.15, 373.15}, new double[] {32e-6, 5.4e-6});
        assertEquals(truth.a(), two.parameter("A").value(), 1e-12);
        assertEquals(truth.b(), two.parameter("B").value(), 1e-12);
    }

    /**
     * Dynamic data for walther go through the density: 32 cSt and 5.4 cSt at 870 kg/m^3 written as
     * 27.84 and 4.698 mPa*s give the same line as the kinematic values.
     */
    @Test
    void dynamicDataAreTurnedKinematicWithTheDensity(@TempDir Path dir) throws Exception {
        Path data = dir.resolve("dynamic.csv");
        java.nio.file.Files.writeString(data, "T (degC), mu (mPa*s)\n40, 27.84\n100, 4.698\n");
        FitTesting.Outcome o = FitTesting.run("fit", data.toString(), "--law", "walther", "--density", "870 kg/m^3",
                "--out", dir.resolve("out").toString());
        assertEquals(0, o.code(), o.err());
        JsonNode fit = FitTesting.json(dir.resolve("out"));
        assertEquals(9.53082, FitTesting.parameter(fit, "A", "value"), FIVE_DECIMALS);
        assertEquals(3.74658, FitTesting.parameter(fit, "B", "value"), FIVE_DECIMALS);
        assertTrue(o.out().contains("converted"), o.out());
    }
}
