package dev.filmshear.cli.fit;

import com.fasterxml.jackson.databind.JsonNode;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.MethodSource;

import java.nio.file.Path;
import java.util.LinkedHashMap;
import java.util.Map;
import java.util.Random;
import java.util.function.DoubleUnaryOperator;
import java.util.stream.Stream;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

/**
 * Data generated from a known law come back as that law: exactly for exact data, within the reported
 * standard errors for data with 0.5 % scatter; and the standard errors mean what they say (a seeded
 * Monte Carlo count of how often the true value lies within one of them).
 */
class SyntheticRecoveryTest {

    /**
     * Exact data must give the law's parameters to this relative accuracy (the task's requirement). The
     * data carry 17 significant digits and the optimizer runs to round-off, so about 1e-15 comes out; the
     * margin covers the Vogel parameters, whose correlation (|r| about 0.99) amplifies round-off.
     */
    private static final double EXACT_RECOVERY = 1e-6;
    /** Relative scatter of the noisy data: 0.5 %, a good capillary viscometer's repeatability. */
    private static final double NOISE = 0.005;
    /**
     * Noisy data must give each parameter within this many reported standard errors of the truth: a
     * normal deviate exceeds 3 with probability 0.3 %, so with fixed seeds this fails only when the
     * estimates or their standard errors are wrong.
     */
    private static final double STANDARD_ERRORS = 3;
    /**
     * A standard error must stay below this fraction of its parameter at 0.5 % scatter: the data determine
     * every parameter (a standard error that blew up would make the previous check empty).
     */
    private static final double DETERMINED = 0.25;

    /**
     * A synthetic data set.
     *
     * @param name for the test's display name
     * @param law the law to fit
     * @param header the data file's header
     * @param kelvin the temperatures
     * @param truth the generating law, value in the header's SI unit
     * @param parameters the generating law's parameters by case-file key, SI
     */
    record Synthetic(String name, String law, String header, double[] kelvin, DoubleUnaryOperator truth,
                     Map<String, Double> parameters) {
        @Override
        public String toString() {
            return name;
        }
    }

    /** The contract's example oil: a = 5.264e-5 Pa s, b = 948 K, c = 170 K (invented demonstration numbers). */
    static Synthetic vogelOil() {
        double a = 5.264e-5;
        double b = 948;
        double c = 170;
        return new Synthetic("vogel, contract example oil, 0-150 degC", "vogel", "T (K), mu (Pa*s)",
                FitTesting.temperatures(273.15, 423.15, 11), t -> a * Math.exp(b / (t - c)),
                Map.of("a", a, "b", b, "c", c));
    }

    /** An exponential law for an oil near 40 degC: 0.040 Pa s at 313.15 K, 0.030 1/K (invented demonstration numbers). */
    static Synthetic exponentialOil() {
        double mu0 = 0.040;
        double t0 = 313.15;
        double beta = 0.030;
        double[] kelvin = FitTesting.temperatures(293.15, 353.15, 13);
        // the fit quotes its reference at the measured temperature nearest the data's mean, 323.15 K
        double tr = 323.15;
        return new Synthetic("exponential, oil near 40 degC, 20-80 degC", "exponential", "T (K), mu (Pa*s)", kelvin,
                t -> mu0 * Math.exp(-beta * (t - t0)),
                Map.of("reference", mu0 * Math.exp(-beta * (tr - t0)), "reference_temperature", tr,
                        "coefficient", beta));
    }

    /**
     * Air by Sutherland's law with the U.S. Standard Atmosphere 1976 constants, Eq. 51: C1 = 1.458e-6
     * kg/(m s K^0.5), S = 110.4 K (NOAA/NASA/USAF 1976; references.md 3.1, verified).
     */
    static Synthetic sutherlandAir() {
        double c1 = 1.458e-6;
        double s = 110.4;
        double tr = 600; // the measured temperature nearest the mean of 200..1000 K
        return new Synthetic("sutherland, air USSA 1976, 200-1000 K", "sutherland", "T (K), mu (Pa*s)",
                FitTesting.temperatures(200, 1000, 9), t -> c1 * t * Math.sqrt(t) / (t + s),
                Map.of("reference", c1 * tr * Math.sqrt(tr) / (tr + s), "reference_temperature", tr, "constant", s));
    }

    /** A power law for a gas: 1.8e-5 Pa s at 300 K, exponent 0.7 (invented demonstration numbers). */
    static Synthetic powerGas() {
        double mu0 = 1.8e-5;
        double n = 0.7;
        double tr = 375; // the measured temperature nearest the mean of 250..500 K
        return new Synthetic("power, gas, 250-500 K", "power", "T (K), mu (Pa*s)",
                FitTesting.temperatures(250, 500, 11), t -> mu0 * Math.pow(t / 300, n),
                Map.of("reference", mu0 * Math.pow(tr / 300, n), "reference_temperature", tr, "exponent", n));
    }

    static Stream<Synthetic> laws() {
        return Stream.of(vogelOil(), exponentialOil(), sutherlandAir(), powerGas());
    }

    @ParameterizedTest(name = "{0}")
    @MethodSource("laws")
    void exactDataGiveTheLawBack(Synthetic s, @TempDir Path dir) {
        Path data = FitTesting.writeData(dir.resolve("exact.csv"), s.header(), s.kelvin(), s.truth(), 0, 1);
        FitTesting.Outcome o = FitTesting.run("fit", data.toString(), "--law", s.law(), "--out",
                dir.resolve("out").toString());
        assertEquals(0, o.code(), o.err());
        JsonNode fit = FitTesting.json(dir.resolve("out"));
        for (Map.Entry<String, Double> p : s.parameters().entrySet()) {
            double fitted = FitTesting.parameter(fit, p.getKey(), "value");
            assertEquals(p.getValue(), fitted, EXACT_RECOVERY * Math.abs(p.getValue()), p.getKey());
        }
        assertTrue(fit.get("max_relative_residual").asDouble() < EXACT_RECOVERY, "residuals of exact data");
    }

    @ParameterizedTest(name = "{0}")
    @MethodSource("laws")
    void noisyDataGiveTheLawWithinItsStandardErrors(Synthetic s, @TempDir Path dir) {
        Path data = FitTesting.writeData(dir.resolve("noisy.csv"), s.header(), s.kelvin(), s.truth(), NOISE,
                20261202L);
        FitTesting.Outcome o = FitTesting.run("fit", data.toString(), "--law", s.law(), "--out",
                dir.resolve("out").toString());
        assertEquals(0, o.code(), o.err());
        JsonNode fit = FitTesting.json(dir.resolve("out"));
        for (Map.Entry<String, Double> p : s.parameters().entrySet()) {
            if (p.getKey().equals("reference_temperature")) {
                assertEquals(p.getValue(), FitTesting.parameter(fit, p.getKey(), "value"), 0, "held fixed");
                continue;
            }
            double fitted = FitTesting.parameter(fit, p.getKey(), "value");
            double se = FitTesting.parameter(fit, p.getKey(), "standard_error");
            assertTrue(se > 0 && se < DETERMINED * Math.abs(p.getValue()), p.getKey() + " standard error " + se);
            assertEquals(p.getValue(), fitted, STANDARD_ERRORS * se,
                    p.getKey() + ": " + fitted + " +/- " + se + ", true " + p.getValue());
        }
        // the residuals' RMS estimates the scatter put in: sqrt((n - m)/n) * 0.5 %, within sampling spread
        double rms = fit.get("rms_relative_residual").asDouble();
        assertTrue(rms > 0.4 * NOISE && rms < 1.6 * NOISE, "RMS relative residual " + rms);
    }

    /**
     * One standard error must cover the truth about as often as a Student t with n - m degrees of freedom
     * says: P(|t_9| &lt; 1) = 0.657 for 12 points and 3 parameters. Counted over seeded repetitions; the band
     * is four binomial standard deviations (0.024 at 400 trials) wide each side. Standard errors not scaled
     * by the residual variance would cover every time (the unscaled (J^T J)^-1 assumes unit scatter in ln mu,
     * 200 times the truth); standard errors of the wrong parameter map (delta method) would miss c often.
     */
    @Test
    void oneStandardErrorCoversTheTruthTwoTimesInThree() {
        Synthetic s = vogelOil();
        double[] kelvin = FitTesting.temperatures(273.15, 423.15, 12);
        Random random = new Random(7);
        int trials = 400;
        Map<String, Integer> covered = new LinkedHashMap<>(Map.of("a", 0, "b", 0, "c", 0));
        for (int trial = 0; trial < trials; trial++) {
            double[] mu = new double[kelvin.length];
            for (int i = 0; i < mu.length; i++) {
                mu[i] = s.truth().applyAsDouble(kelvin[i]) * (1 + NOISE * random.nextGaussian());
            }
            FitResult fit = ViscosityFitter.fit(FitLaw.VOGEL, kelvin, mu);
            for (String name : covered.keySet()) {
                FittedParameter p = fit.parameter(name);
                if (Math.abs(p.value() - s.parameters().get(name)) <= p.standardError()) {
                    covered.merge(name, 1, Integer::sum);
                }
            }
        }
        for (Map.Entry<String, Integer> e : covered.entrySet()) {
            double fraction = e.getValue() / (double) trials;
            assertTrue(fraction > 0.657 - 0.1 && fraction < 0.657 + 0.1, e.getKey() + " covered " + fraction);
        }
    }
}
