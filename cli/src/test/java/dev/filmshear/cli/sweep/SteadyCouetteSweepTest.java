package dev.filmshear.cli.sweep;

import dev.filmshear.cli.FilmshearCommand;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

import java.io.IOException;
import java.io.PrintWriter;
import java.io.StringWriter;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

/**
 * A sweep of steady heated plane Couette films over gap and wall speed, each row checked against the
 * closed forms for its own axis values: so every row holds the case its columns name.
 *
 * <ul>
 *   <li>Wall shear stress tau = mu U / h (F. M. White, Viscous Fluid Flow, 3rd ed., 2006, ch. 3, section
 *       3-2; section number from memory).</li>
 *   <li>Both walls at T0, constant properties: T - T0 = (mu U^2 / (2 k)) eta (1 - eta), highest
 *       mu U^2 / (8 k) at mid-gap (R. B. Bird, W. E. Stewart, E. N. Lightfoot, Transport Phenomena, 2nd
 *       ed., 2002, section 10.4, Eq. 10.4-9 with both walls at T0).</li>
 * </ul>
 */
class SteadyCouetteSweepTest {
    /** Linear velocity and parabolic temperature are exact on the grid; this covers the Newton tolerance. */
    private static final double RELATIVE_TOLERANCE = 1e-6;
    private static final double MU = 0.03;
    private static final double K = 0.13;
    private static final double T0 = 313.15;

    @Test
    void everyRowMatchesTheClosedFormsOfItsAxisValues(@TempDir Path dir) throws IOException {
        Path plan = SweepCommandTest.copy(dir, "steady-gap-speed.toml", "steady-heated.toml");
        Path out = dir.resolve("out");
        StringWriter err = new StringWriter();
        int code = FilmshearCommand.run(new PrintWriter(new StringWriter()), new PrintWriter(err), "sweep",
                plan.toString(), "--out", out.toString());
        assertEquals(0, code, err.toString());
        List<String> lines = Files.readAllLines(out.resolve("results.csv"));
        assertEquals(1 + 4 * 5, lines.size());
        ResultColumns columns = new ResultColumns(List.of("geometry.gap", "upper_wall.velocity"));
        int tau = columns.indexOf("wall_shear_stress_upper_Pa");
        int tMax = columns.indexOf("max_temperature_K");
        double[] gaps = {10e-6, 25e-6, 40e-6, 2.5 * 25.4e-6};
        for (int r = 1; r < lines.size(); r++) {
            List<String> f = CsvLine.split(lines.get(r)).orElseThrow();
            double h = Double.parseDouble(f.get(0));
            double u = Double.parseDouble(f.get(1));
            assertEquals(gaps[(r - 1) / 5], h, 1e-18, "gap of row " + r);
            assertEquals(MU * u / h, Double.parseDouble(f.get(tau)), RELATIVE_TOLERANCE * MU * u / h, "tau, row " + r);
            double rise = MU * u * u / (8 * K);
            assertEquals(T0 + rise, Double.parseDouble(f.get(tMax)), RELATIVE_TOLERANCE * rise, "T max, row " + r);
        }
        assertTrue(Files.exists(out.resolve("map_max_temperature_K.png")));
        assertTrue(Files.exists(out.resolve("map_wall_shear_stress_upper_Pa.png")));
        assertFalse(Files.exists(out.resolve("map_dissipation_W_per_m2.png")), "only the maps the plan chose");

        // the limit of 50 degC (10 K above the walls) is passed only at 30 m/s: 25.9 K there, 4.7 K at 12.8 m/s
        SweepData data = SweepData.read(out.resolve("results.csv"), SweepManifest.read(out).orElseThrow().plan());
        assertEquals("{4, 9, 14, 19}", data.flags.get(SweepData.OVER_LIMIT).toString());
    }
}
