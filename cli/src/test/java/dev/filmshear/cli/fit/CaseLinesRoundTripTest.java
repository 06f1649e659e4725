package dev.filmshear.cli.fit;

import com.fasterxml.jackson.databind.JsonNode;
import dev.filmshear.cli.input.CaseFile;
import dev.filmshear.cli.input.CaseReader;
import dev.filmshear.solver.physics.DensityLaw;
import dev.filmshear.solver.physics.ViscosityLaw;
import org.junit.jupiter.api.io.TempDir;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.MethodSource;

import java.nio.file.Path;
import java.util.Locale;
import java.util.function.DoubleUnaryOperator;
import java.util.stream.Stream;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

/**
 * The lines {@code fit} prints for a case file, pasted into one, are read by the case reader into the
 * law that was fitted: its viscosity at three measured temperatures equals the fitted value in fit.json.
 */
class CaseLinesRoundTripTest {

    /**
     * The lines carry 10 significant digits: each parameter is rounded by at most 5e-10 relative, which the
     * Vogel law amplifies by b/(T - c) + c b/(T - c)^2, about 25 at 0 degC for the example oil (the largest
     * of these data), so ln mu moves by at most about 1.3e-8.
     */
    private static final double TEN_DIGITS = 1e-7;
    private static final double CASE_DENSITY = 870;

    /**
     * A data set to fit and a temperature inside it for the case's initial state.
     *
     * @param law the law
     * @param header the data file's header
     * @param kelvin temperatures
     * @param values generating function (the header's unit, SI)
     */
    record Data(String law, String header, double[] kelvin, DoubleUnaryOperator values) {
        @Override
        public String toString() {
            return law;
        }
    }

    static Stream<Data> laws() {
        DoubleUnaryOperator oil = t -> 5.264e-5 * Math.exp(948 / (t - 170));
        DoubleUnaryOperator air = t -> 1.458e-6 * t * Math.sqrt(t) / (t + 110.4);
        double[] oilRange = FitTesting.temperatures(273.15, 423.15, 9);
        double[] gasRange = FitTesting.temperatures(250, 650, 9);
        return Stream.of(
                new Data("vogel", "T (K), mu (Pa*s)", oilRange, oil),
                new Data("exponential", "T (K), mu (Pa*s)", FitTesting.temperatures(293.15, 353.15, 7), oil),
                new Data("power", "T (K), mu (Pa*s)", gasRange, air),
                new Data("sutherland", "T (K), mu (Pa*s)", gasRange, air),
                // kinematic data (the oil at 870 kg/m^3) for the kinematic law
                new Data("walther", "T (K), nu (m^2/s)", oilRange, t -> oil.applyAsDouble(t) / CASE_DENSITY));
    }

    @ParameterizedTest(name = "{0}")
    @MethodSource("laws")
    void printedLinesReadBackToTheFittedLaw(Data d, @TempDir Path dir) {
        // scatter so that the fitted law is not the generating one: the check is on what was printed
        Path data = FitTesting.writeData(dir.resolve(d.law() + ".csv"), d.header(), d.kelvin(), d.values(), 0.01, 3);
        FitTesting.Outcome o = FitTesting.run("fit", data.toString(), "--law", d.law(), "--out",
                dir.resolve("out").toString());
        assertEquals(0, o.code(), o.err());
        String lines = FitTesting.printedToml(o.out());
        assertTrue(lines.contains("law = \"" + d.law() + "\""), lines);
        assertTrue(lines.contains("valid_from") && lines.contains("valid_to"), lines);

        double[] t = d.kelvin();
        String caseText = String.join("\n",
                "[geometry]",
                "gap = \"25 um\"",
                "[fluid]",
                "density = \"" + CASE_DENSITY + " kg/m^3\"",
                lines,
                "[upper_wall]",
                "velocity = \"1 m/s\"",
                "[initial]",
                String.format(Locale.ROOT, "temperature = \"%s K\"", t[t.length / 2]),
                "[time]",
                "end = \"1 ms\"",
                "");
        CaseFile c = new CaseReader().read(caseText, "pasted.toml");
        ViscosityLaw law = c.filmCase().physics().fluid().viscosity();
        assertEquals(d.law(), law.name());
        assertEquals(t[0], law.validFrom(), 1e-9, "valid_from: the data's lowest temperature");
        assertEquals(t[t.length - 1], law.validTo(), 1e-9, "valid_to: the data's highest temperature");

        JsonNode residuals = FitTesting.json(dir.resolve("out")).get("residuals");
        DensityLaw density = DensityLaw.constant(CASE_DENSITY);
        for (int i : new int[] {0, t.length / 2, t.length - 1}) {
            JsonNode point = residuals.get(i);
            double temperature = point.get("temperature_K").asDouble();
            double fitted = point.get("fitted").asDouble();
            // walther's fitted values are kinematic: the case's law gives mu = nu * rho
            double read = d.law().equals("walther") ? law.mu(temperature) / density.density(temperature)
                    : law.mu(temperature);
            assertEquals(fitted, read, TEN_DIGITS * fitted, "at " + temperature + " K");
        }
    }
}
