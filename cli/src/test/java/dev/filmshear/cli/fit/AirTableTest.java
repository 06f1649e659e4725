package dev.filmshear.cli.fit;

import com.fasterxml.jackson.databind.JsonNode;
import dev.filmshear.solver.physics.SutherlandViscosity;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

/**
 * Sutherland's law fitted to handbook values for air: CRC Handbook of Chemistry and Physics, "Viscosity of
 * Gases" (M. L. Huber and A. H. Harvey), air at 100 kPa, 200-600 K (references.md section 3.2, verified;
 * 100 K left out, below the law's stated range). The sheet states that Sutherland's law with the U.S.
 * Standard Atmosphere 1976 constants keeps within 2.5 % of these values; a law fitted to them must do at
 * least as well.
 */
class AirTableTest {

    /** references.md 3.2: "a test tolerance of 2.5 % is appropriate against handbook data". */
    private static final double HANDBOOK_BAND = 0.025;
    /** U.S. Standard Atmosphere 1976, Eq. 51: S = 110.4 K (references.md 3.1, verified). */
    private static final double USSA_S = 110.4;
    /**
     * The fitted S may differ from the USSA value by this fraction: the handbook values run up to 2 % above
     * the USSA law at 600 K (references.md 3.2), which over 200-600 K moves a fitted S by about ten kelvin.
     * A wrong Jacobian or a fit stopped at its bound would land near 0 K or beyond 1000 K.
     */
    private static final double S_BAND = 0.15;

    @Test
    void sutherlandFitsTheHandbookWithinItsBandAndFindsAirsConstant(@TempDir Path dir) throws IOException {
        FitTesting.Outcome o = FitTesting.run("fit", FitTesting.resource("air-crc.csv").toString(), "--law",
                "sutherland", "--out", dir.toString());
        assertEquals(0, o.code(), o.err());
        JsonNode fit = FitTesting.json(dir);
        double s = FitTesting.parameter(fit, "constant", "value");
        assertEquals(USSA_S, s, S_BAND * USSA_S, "fitted Sutherland constant");
        double worst = fit.get("max_relative_residual").asDouble();
        assertTrue(worst < HANDBOOK_BAND, "largest residual " + worst);
        // the fitted law and the USSA 1976 law describe the same gas: within the band of each other too
        double reference = FitTesting.parameter(fit, "reference", "value");
        double tr = FitTesting.parameter(fit, "reference_temperature", "value");
        SutherlandViscosity fitted = SutherlandViscosity.of(reference, tr, s);
        for (double t = 200; t <= 600; t += 50) {
            double ussa = SutherlandViscosity.AIR_USSA_1976.mu(t);
            assertEquals(ussa, fitted.mu(t), HANDBOOK_BAND * ussa, "at " + t + " K");
        }
        assertTrue(Files.size(dir.resolve("fit.png")) > 0, "fit.png written");
    }
}
