package dev.filmshear.solver.physics;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.junit.jupiter.api.Assumptions.assumeTrue;

import dev.filmshear.solver.base.InvalidParameterException;
import java.lang.management.ManagementFactory;
import java.util.Map;
import java.util.Set;
import java.util.stream.Stream;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.function.Executable;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.MethodSource;

/**
 * The contract every {@link ViscosityLaw} must meet, run over every law and every preset's law: positive
 * and finite over its validity range, monotone where it claims to be, a derivative equal to a central
 * finite difference, the known-mu derivative equal to the plain one, a description that names the law,
 * no allocation on the hot path, and constructors that reject bad parameters naming the parameter.
 */
class ViscosityLawContractTest {

    /** Sample points across the validity range for positivity and monotonicity. */
    private static final int RANGE_SAMPLES = 101;
    /** Points at which the derivative is checked; offset by an irrational fraction to miss table nodes. */
    private static final int DERIVATIVE_SAMPLES = 17;
    private static final double DERIVATIVE_OFFSET = 0.381966;
    /**
     * Central-difference step (K): truncation (h d ln mu/dT)^2 / 6 is below 1e-9 for |d ln mu/dT| &lt; 0.1 /K
     * and rounding (1e-15 / (h d ln mu/dT)) below 1e-9 for |d ln mu/dT| &gt; 1e-3 /K.
     */
    private static final double DIFFERENCE_STEP = 1e-3;
    /** The brief's bound for the analytic derivative against the central difference. */
    private static final double DERIVATIVE_TOLERANCE = 1e-6;
    /** dMuDT(T, mu(T)) and dMuDT(T) take different arithmetic paths; they agree to rounding. */
    private static final double KNOWN_MU_TOLERANCE = 1e-12;
    /** Laws with an unbounded range (a constant) are sampled over this span (K). */
    private static final double SAMPLE_FLOOR = 200;
    private static final double SAMPLE_CEILING = 600;
    /** Allocation check: calls per law, and bytes allowed in total (noise of the measurement itself). */
    private static final int ALLOCATION_CALLS = 200_000;
    private static final long ALLOCATION_ALLOWANCE = 4096;

    enum Trend { DECREASING, INCREASING, NONE }

    record LawCase(String label, ViscosityLaw law, Trend trend) {
        @Override
        public String toString() {
            return label;
        }
    }

    /** The trend each preset's law claims; every preset must appear here. */
    private static final Map<String, Trend> PRESET_TRENDS = Map.of(
            "air", Trend.INCREASING,
            "water", Trend.DECREASING,
            "iso-vg-32", Trend.DECREASING,
            "iso-vg-46", Trend.DECREASING,
            "iso-vg-68", Trend.DECREASING,
            "iso-vg-100", Trend.DECREASING);

    private static final DensityLaw OIL_DENSITY = new DensityLaw(870, 288.15, 7e-4);

    static Stream<LawCase> laws() {
        Stream<LawCase> direct = Stream.of(
                new LawCase("constant", new ConstantViscosity(0.04), Trend.NONE),
                new LawCase("exponential", ExponentialViscosity.of(0.04, 313.15, 0.03), Trend.DECREASING),
                new LawCase("exponential, zero coefficient",
                        new ExponentialViscosity(0.04, 313.15, 0, 283.15, 343.15), Trend.NONE),
                new LawCase("vogel", VogelViscosity.of(5.264e-5, 948, 170), Trend.DECREASING),
                new LawCase("power, air-like", PowerLawViscosity.of(1.716e-5, 273.15, 0.666), Trend.INCREASING),
                new LawCase("sutherland, USSA 1976 air", SutherlandViscosity.AIR_USSA_1976, Trend.INCREASING),
                new LawCase("sutherland, S = 0", SutherlandViscosity.of(1.7e-5, 273.15, 0), Trend.INCREASING),
                new LawCase("walther, VG 46-like",
                        WaltherViscosity.throughPoints(313.15, 46e-6, 373.15, 6.8e-6, OIL_DENSITY), Trend.DECREASING),
                // Light oil running below 7 mm^2/s, where the D341 low-viscosity term and Newton are active.
                new LawCase("walther, light oil",
                        WaltherViscosity.throughPoints(313.15, 4.6e-6, 373.15, 1.7e-6, OIL_DENSITY), Trend.DECREASING),
                new LawCase("table", new TabulatedViscosity(
                        new double[] {293.15, 313.15, 333.15, 353.15, 373.15},
                        new double[] {0.110, 0.0400, 0.0180, 0.0098, 0.0059},
                        283.15, 383.15), Trend.DECREASING),
                new LawCase("table, kinematic", TabulatedViscosity.kinematic(
                        new double[] {273.15, 313.15, 373.15},
                        new double[] {336e-6, 32e-6, 5.4e-6}, OIL_DENSITY), Trend.DECREASING),
                new LawCase("table, two points", new TabulatedViscosity(
                        new double[] {300, 400}, new double[] {1.8e-5, 2.3e-5}), Trend.INCREASING),
                new LawCase("water, 0.101325 MPa", new WaterViscosity(WaterViscosity.STANDARD_ATMOSPHERE),
                        Trend.DECREASING),
                new LawCase("water, 10 MPa", new WaterViscosity(10e6), Trend.DECREASING));
        Stream<LawCase> presets = FluidPresets.all().stream()
                .map(preset -> new LawCase("preset " + preset.name(), preset.viscosity(),
                        PRESET_TRENDS.get(preset.name())));
        return Stream.concat(direct, presets);
    }

    @Test
    void everyPresetDeclaresItsTrend() {
        assertEquals(PRESET_TRENDS.keySet(), Set.copyOf(FluidPresets.names()));
    }

    @ParameterizedTest
    @MethodSource("laws")
    void positiveAndFiniteOverTheValidityRange(LawCase c) {
        for (double t : samples(c.law())) {
            double mu = c.law().mu(t);
            assertTrue(mu > 0 && Double.isFinite(mu), () -> c + ": mu(" + t + " K) = " + mu);
            double slope = c.law().dMuDT(t);
            assertTrue(Double.isFinite(slope), () -> c + ": dMuDT(" + t + " K) = " + slope);
        }
    }

    @ParameterizedTest
    @MethodSource("laws")
    void monotoneAsClaimed(LawCase c) {
        double[] t = samples(c.law());
        for (int k = 1; k < t.length; k++) {
            double previous = c.law().mu(t[k - 1]);
            double current = c.law().mu(t[k]);
            String where = c + " between " + t[k - 1] + " K and " + t[k] + " K";
            switch (c.trend()) {
                case DECREASING -> assertTrue(current < previous, where);
                case INCREASING -> assertTrue(current > previous, where);
                case NONE -> assertEquals(previous, current, 0, where);
            }
        }
        assertEquals(c.trend() == Trend.NONE, c.law().isConstant(), c + ": isConstant()");
    }

    @ParameterizedTest
    @MethodSource("laws")
    void derivativeMatchesCentralDifference(LawCase c) {
        double from = sampleFrom(c.law());
        double to = sampleTo(c.law());
        for (int k = 0; k < DERIVATIVE_SAMPLES; k++) {
            double t = from + (k + DERIVATIVE_OFFSET) / DERIVATIVE_SAMPLES * (to - from);
            double difference = (c.law().mu(t + DIFFERENCE_STEP) - c.law().mu(t - DIFFERENCE_STEP))
                    / (2 * DIFFERENCE_STEP);
            double analytic = c.law().dMuDT(t);
            assertEquals(difference, analytic, DERIVATIVE_TOLERANCE * Math.abs(difference),
                    c + ": dMuDT at " + t + " K");
        }
    }

    @ParameterizedTest
    @MethodSource("laws")
    void derivativeFromKnownMuEqualsPlainDerivative(LawCase c) {
        for (double t : samples(c.law())) {
            double plain = c.law().dMuDT(t);
            double fromMu = c.law().dMuDT(t, c.law().mu(t));
            assertEquals(plain, fromMu, KNOWN_MU_TOLERANCE * Math.abs(plain), c + ": at " + t + " K");
        }
    }

    @ParameterizedTest
    @MethodSource("laws")
    void describeNamesTheLaw(LawCase c) {
        assertTrue(c.law().describe().startsWith(c.law().name() + ":"), c.law().describe());
        assertTrue(c.law().validFrom() < c.law().validTo(), c + ": validity range");
    }

    @ParameterizedTest
    @MethodSource("laws")
    void hotPathAllocatesNothing(LawCase c) {
        java.lang.management.ThreadMXBean plain = ManagementFactory.getThreadMXBean();
        assumeTrue(plain instanceof com.sun.management.ThreadMXBean, "JVM cannot count allocated bytes");
        com.sun.management.ThreadMXBean bean = (com.sun.management.ThreadMXBean) plain;
        assumeTrue(bean.isThreadAllocatedMemorySupported() && bean.isThreadAllocatedMemoryEnabled());
        ViscosityLaw law = c.law();
        double from = sampleFrom(law);
        double span = sampleTo(law) - from;
        long thread = Thread.currentThread().getId();
        double sum = exercise(law, from, span, 1000);
        long before = bean.getThreadAllocatedBytes(thread);
        sum += exercise(law, from, span, ALLOCATION_CALLS);
        long allocated = bean.getThreadAllocatedBytes(thread) - before;
        assertTrue(Double.isFinite(sum), c + ": finite results");
        assertTrue(allocated < ALLOCATION_ALLOWANCE, c + ": " + allocated + " bytes allocated in "
                + ALLOCATION_CALLS + " calls of mu, dMuDT(T) and dMuDT(T, mu)");
    }

    private static double exercise(ViscosityLaw law, double from, double span, int calls) {
        double sum = 0;
        for (int k = 0; k < calls; k++) {
            double t = from + span * ((k * 0.618034) % 1);
            double mu = law.mu(t);
            sum += mu + law.dMuDT(t) + law.dMuDT(t, mu);
        }
        return sum;
    }

    record Rejection(String label, Executable construction, String parameter) {
        @Override
        public String toString() {
            return label;
        }
    }

    static Stream<Rejection> rejections() {
        return Stream.of(
                new Rejection("exponential, negative reference",
                        () -> new ExponentialViscosity(-0.04, 313.15, 0.03, 283.15, 343.15), "reference"),
                new Rejection("exponential, NaN reference temperature",
                        () -> new ExponentialViscosity(0.04, Double.NaN, 0.03, 283.15, 343.15),
                        "reference_temperature"),
                new Rejection("exponential, negative coefficient",
                        () -> new ExponentialViscosity(0.04, 313.15, -0.03, 283.15, 343.15), "coefficient"),
                new Rejection("exponential, validFrom = validTo",
                        () -> new ExponentialViscosity(0.04, 313.15, 0.03, 343.15, 343.15), "valid_to"),
                new Rejection("exponential, overflows at valid_from",
                        () -> new ExponentialViscosity(0.04, 1000, 5, 100, 1000), "valid_from"),
                new Rejection("exponential, reference temperature below 30 K",
                        () -> ExponentialViscosity.of(0.04, 20, 0.03), "valid_from"),
                new Rejection("vogel, zero a", () -> new VogelViscosity(0, 948, 170, 253.15, 423.15), "a"),
                new Rejection("vogel, negative b", () -> new VogelViscosity(5e-5, -948, 170, 253.15, 423.15), "b"),
                new Rejection("vogel, infinite c",
                        () -> new VogelViscosity(5e-5, 948, Double.POSITIVE_INFINITY, 253.15, 423.15), "c"),
                new Rejection("vogel, valid_from at c", () -> new VogelViscosity(5e-5, 948, 253.15, 253.15, 423.15),
                        "valid_from"),
                new Rejection("vogel, valid_from after valid_to",
                        () -> new VogelViscosity(5e-5, 948, 170, 423.15, 253.15), "valid_to"),
                new Rejection("power, zero reference", () -> PowerLawViscosity.of(0, 273.15, 0.7), "reference"),
                new Rejection("power, infinite exponent",
                        () -> PowerLawViscosity.of(1.7e-5, 273.15, Double.POSITIVE_INFINITY), "exponent"),
                new Rejection("power, valid_from at 0 K",
                        () -> new PowerLawViscosity(1.7e-5, 273.15, 0.7, 0, 500), "valid_from"),
                new Rejection("sutherland, negative constant",
                        () -> SutherlandViscosity.of(1.7e-5, 273.15, -110), "constant"),
                new Rejection("sutherland, zero reference temperature",
                        () -> SutherlandViscosity.of(1.7e-5, 0, 110), "reference_temperature"),
                new Rejection("sutherland, infinite valid_to",
                        () -> new SutherlandViscosity(1.7e-5, 273.15, 110, 170, Double.POSITIVE_INFINITY), "valid_to"),
                new Rejection("walther, NaN a",
                        () -> new WaltherViscosity(Double.NaN, 3.7, OIL_DENSITY, 293, 423), "a"),
                new Rejection("walther, zero b", () -> new WaltherViscosity(9.5, 0, OIL_DENSITY, 293, 423), "b"),
                new Rejection("walther, density negative at valid_to",
                        () -> new WaltherViscosity(9.5, 3.7, new DensityLaw(870, 288.15, 9e-3), 293, 423), "valid_to"),
                new Rejection("walther, equal temperatures",
                        () -> WaltherViscosity.throughPoints(313.15, 46e-6, 313.15, 6.8e-6, OIL_DENSITY),
                        "temperatures"),
                new Rejection("walther, viscosity rising with temperature",
                        () -> WaltherViscosity.throughPoints(313.15, 6.8e-6, 373.15, 46e-6, OIL_DENSITY), "values"),
                new Rejection("walther, viscosity below D341's reach",
                        () -> WaltherViscosity.throughPoints(313.15, 46e-6, 373.15, 1e-7, OIL_DENSITY), "values"),
                new Rejection("table, one point",
                        () -> new TabulatedViscosity(new double[] {300}, new double[] {0.01}), "temperatures"),
                new Rejection("table, lengths differ",
                        () -> new TabulatedViscosity(new double[] {300, 310}, new double[] {0.01}), "values"),
                new Rejection("table, temperatures not increasing at index 2",
                        () -> new TabulatedViscosity(new double[] {300, 320, 320}, new double[] {0.03, 0.02, 0.01}),
                        "temperatures[2]"),
                new Rejection("table, negative viscosity at index 1",
                        () -> new TabulatedViscosity(new double[] {300, 320, 340}, new double[] {0.03, -0.02, 0.01}),
                        "values[1]"),
                new Rejection("table, valid_from after valid_to",
                        () -> new TabulatedViscosity(new double[] {300, 320}, new double[] {0.03, 0.02}, 330, 310),
                        "valid_to"),
                new Rejection("table, kinematic, zero value at index 0",
                        () -> TabulatedViscosity.kinematic(
                                new double[] {300, 320}, new double[] {0, 2e-5}, OIL_DENSITY),
                        "values[0]"),
                new Rejection("water, pressure below the triple-point line", () -> new WaterViscosity(100), "pressure"),
                new Rejection("water, pressure above IF97 region 1", () -> new WaterViscosity(2e8), "pressure"));
    }

    @ParameterizedTest
    @MethodSource("rejections")
    void constructorsRejectBadParameters(Rejection r) {
        InvalidParameterException e = assertThrows(InvalidParameterException.class, r.construction(), r.label());
        assertEquals(r.parameter(), e.parameter(), e.getMessage());
    }

    private static double sampleFrom(ViscosityLaw law) {
        return Double.isFinite(law.validTo()) ? law.validFrom() : Math.max(law.validFrom(), SAMPLE_FLOOR);
    }

    private static double sampleTo(ViscosityLaw law) {
        return Double.isFinite(law.validTo()) ? law.validTo() : SAMPLE_CEILING;
    }

    private static double[] samples(ViscosityLaw law) {
        double from = sampleFrom(law);
        double to = sampleTo(law);
        double[] t = new double[RANGE_SAMPLES];
        for (int k = 0; k < RANGE_SAMPLES; k++) {
            t[k] = from + (to - from) * k / (RANGE_SAMPLES - 1);
        }
        return t;
    }
}
