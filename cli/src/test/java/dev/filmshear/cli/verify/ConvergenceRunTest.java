package dev.filmshear.cli.verify;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import dev.filmshear.solver.physics.WallMotion;
import dev.filmshear.validation.analytic.ConstantPropertyFilm;
import dev.filmshear.validation.analytic.NahmeCouette;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

/**
 * {@code run CASE.toml --convergence} end to end: the convergence object in summary.json and its rows in report.html,
 * and, on cases whose exact answer is known, the Grid Convergence Index band (P. J. Roache, Verification and
 * Validation in Computational Science and Engineering, 1998; ASME V&amp;V 20-2009) around the finest value contains
 * it.
 */
class ConvergenceRunTest {
    private static final double GAP = 1e-4;
    private static final double VISCOSITY = 0.04;
    private static final double DENSITY = 870;
    private static final double CONDUCTIVITY = 0.13;
    private static final double BETA = 0.03;
    private static final double WALL_TEMPERATURE = 313.15;
    /** Observed orders of a second-order scheme: the suite's band. */
    private static final double ORDER_BAND = 0.2;

    /** The Nahme problem at Nahme number beta mu0 U^2 / k = 10, both walls at T0, steady, 51 nodes. */
    private static String nahmeCase(double speed) {
        return String.join("\n",
                "title = \"Nahme film\"",
                "[geometry]", "gap = \"100 um\"",
                "[fluid]", "density = \"870 kg/m^3\"", "specific_heat = \"1950 J/(kg*K)\"",
                "thermal_conductivity = \"0.13 W/(m*K)\"",
                "[fluid.viscosity]", "law = \"exponential\"", "reference = \"0.04 Pa*s\"",
                "reference_temperature = \"313.15 K\"", "coefficient = \"0.03 1/K\"", "valid_from = \"300 K\"",
                "valid_to = \"450 K\"",
                "[lower_wall]", "velocity = \"0 m/s\"", "temperature = \"313.15 K\"",
                "[upper_wall]", "velocity = \"" + speed + " m/s\"", "temperature = \"313.15 K\"",
                "[initial]", "temperature = \"313.15 K\"",
                "[time]", "end = \"steady\"",
                "[grid]", "points = 51",
                "[output]", "plots = true", "");
    }

    @Test
    void nahmeCaseGetsOrdersAndGciBandsThatContainTheExactValues(@TempDir Path dir) throws IOException {
        double speed = Math.sqrt(10 * CONDUCTIVITY / (BETA * VISCOSITY));
        Path file = dir.resolve("nahme.toml");
        Files.writeString(file, nahmeCase(speed));
        Path out = dir.resolve("out");
        VerifyCommandTest.Outcome o = VerifyCommandTest.run("run", file.toString(), "--convergence", "--out",
                out.toString());
        assertEquals(0, o.code(), o.out() + o.err());
        assertTrue(o.out().contains("Grid convergence (Roache's GCI, ASME V&V 20-2009) on 51, 101, 201 nodes"), o.out());

        JsonNode summary = new ObjectMapper().readTree(out.resolve("summary.json").toFile());
        assertEquals(201, summary.get("grid_points").asInt(), "the run's results are the finest grid's");
        JsonNode c = summary.get("convergence");
        assertEquals(List.of(51, 101, 201), List.of(c.get("grid_nodes").get(0).asInt(), c.get("grid_nodes").get(1).asInt(),
                c.get("grid_nodes").get(2).asInt()));
        // closed form of references.md 7(g) (NahmeCouette; R. Nahme 1940, J. Gavis and R. L. Laurence 1968, citations
        // from memory): tau h / (mu0 U) = 0.57387859 and beta (T_max - T0) = ln(1 + Na/8) at Na = 10
        NahmeCouette exact = new NahmeCouette(GAP, 0, speed, VISCOSITY, BETA, CONDUCTIVITY, WALL_TEMPERATURE,
                NahmeCouette.Walls.BOTH_AT_WALL_TEMPERATURE);
        assertEquals(0.57387859, exact.shearStress() * GAP / (VISCOSITY * speed), 5e-9);
        assertBracketed(c.get("wall_shear_stress_lower_Pa"), "Pa", exact.shearStress(), summary);
        assertBracketed(c.get("wall_shear_stress_upper_Pa"), "Pa", exact.shearStress(), summary);
        assertBracketed(c.get("max_temperature_K"), "K", exact.maxTemperature(), summary);

        Page page = Page.read(out.resolve("report.html"));
        String text = page.text();
        assertTrue(text.contains("Convergence: Wall shear stress, lower wall: observed order"), "generic rows");
        assertTrue(text.contains("convergence.max_temperature_K.error_band_K"), "keys shown beside the rows");
        assertTrue(page.raw().contains(ConvergenceRun.PLOT), "the study's plot is embedded");
        assertTrue(Files.size(out.resolve(ConvergenceRun.PLOT)) > 0);
    }

    @Test
    void isothermalStartUpEstimatesOnlyTheWallStressesAndBracketsTheSeries(@TempDir Path dir) throws IOException {
        // Couette start-up compared at nu t / h^2 = 0.1: exact by Fourier series (R. B. Bird, W. E. Stewart,
        // E. N. Lightfoot, Transport Phenomena, 2nd ed., 2002, section 4.1, through ConstantPropertyFilm)
        double end = 0.1 * GAP * GAP * DENSITY / VISCOSITY;
        Path file = dir.resolve("startup.toml");
        Files.writeString(file, String.join("\n", "[geometry]", "gap = \"100 um\"",
                "[fluid]", "density = \"870 kg/m^3\"",
                "[fluid.viscosity]", "law = \"constant\"", "value = \"0.04 Pa*s\"",
                "[lower_wall]", "velocity = \"0 m/s\"", "[upper_wall]", "velocity = \"1 m/s\"",
                "[time]", "end = \"" + end + " s\"", "[grid]", "points = 41", ""));
        Path out = dir.resolve("out");
        VerifyCommandTest.Outcome o = VerifyCommandTest.run("run", file.toString(), "--convergence", "--out",
                out.toString());
        assertEquals(0, o.code(), o.out() + o.err());
        JsonNode summary = new ObjectMapper().readTree(out.resolve("summary.json").toFile());
        JsonNode c = summary.get("convergence");
        assertFalse(c.has("max_temperature_K"), "an isothermal run has no temperature to estimate");
        assertEquals(1e-6 / 64, c.get("tolerances").get(2).asDouble(), 1e-20, "tolerance cut by r^3 per level");
        ConstantPropertyFilm exact = new ConstantPropertyFilm(GAP, DENSITY, VISCOSITY, new WallMotion.Steady(0),
                new WallMotion.Steady(1), 0, 0);
        assertBracketed(c.get("wall_shear_stress_lower_Pa"), "Pa", exact.wallShearStressLower(end), summary);
        assertBracketed(c.get("wall_shear_stress_upper_Pa"), "Pa", exact.wallShearStressUpper(end), summary);
        assertFalse(Files.exists(out.resolve(ConvergenceRun.PLOT)), "no plots asked for");
    }

    private static void assertBracketed(JsonNode q, String unit, double exact, JsonNode summary) {
        String text = q.toString() + ", exact " + exact;
        double fine = q.get("values_" + unit).get(2).asDouble();
        assertEquals(summary.get(keyOf(q, summary)).asDouble(), fine, 0, "the finest value is the run's result");
        assertEquals(2, q.get("observed_order").asDouble(), ORDER_BAND, text);
        assertTrue(q.get("order_reasonable").asBoolean(), text);
        assertEquals(1.25, q.get("safety_factor").asDouble(), 0, text);
        double band = q.get("error_band_" + unit).asDouble();
        assertTrue(band > 0, text);
        assertTrue(Math.abs(fine - exact) <= band, "exact value outside the GCI band: " + text);
        assertEquals(band, q.get("gci_fine").asDouble() * Math.abs(fine), 1e-12 * band, text);
    }

    /** The summary key whose convergence object this is. */
    private static String keyOf(JsonNode q, JsonNode summary) {
        for (var it = summary.get("convergence").fields(); it.hasNext(); ) {
            var e = it.next();
            if (e.getValue() == q) {
                return e.getKey();
            }
        }
        throw new AssertionError("not in the summary");
    }
}
