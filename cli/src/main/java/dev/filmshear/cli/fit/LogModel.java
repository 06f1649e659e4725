package dev.filmshear.cli.fit;

import dev.filmshear.solver.physics.ExponentialViscosity;
import dev.filmshear.solver.physics.PowerLawViscosity;
import dev.filmshear.solver.physics.SutherlandViscosity;
import dev.filmshear.solver.physics.ViscosityLaw;
import dev.filmshear.solver.physics.VogelViscosity;
import org.apache.commons.math3.stat.regression.SimpleRegression;

import java.util.List;

/**
 * The logarithm of one dynamic viscosity law, y(T; p) = ln mu(T; p), in the coordinates p the
 * Levenberg-Marquardt iteration moves, with its analytic gradient dy/dp, robust start values, the box
 * that keeps p in the law's domain, and the map back to the law's own parameters.
 *
 * <p>Fit coordinates. Every viscosity scale enters as its logarithm (ln a, ln reference), which keeps it
 * positive and puts all coordinates on comparable scales. Vogel's c enters as s with
 * c = Tmin - exp(s), so that c stays below the lowest measured temperature, where the law diverges,
 * whatever step the iteration tries. The other parameters enter as they are. The map p -> natural
 * parameters is one-to-one and acts on each coordinate alone, so the covariance of the natural
 * parameters follows from that of p by the first-order (delta-method) rule
 * C_nat = D C D with D = diag(d natural_k / d p_k).
 *
 * <p>Start values come from linear least squares (Commons Math {@link SimpleRegression}): the
 * exponential and power laws are straight lines in (T, ln mu) and (ln T, ln mu), so the regression is
 * already their optimum; for Vogel's c and Sutherland's S, which enter non-linearly, the regression of
 * the remaining, linear parameters is repeated over a logarithmic grid of the non-linear one and the
 * best grid point is the start. This avoids the local minima and the divergence at T = c that a fixed
 * guess runs into.
 */
sealed interface LogModel permits LogModel.Straight, LogModel.Vogel, LogModel.Sutherland {

    /** Points of the grid over the non-linear parameter for the start values. */
    int START_GRID = 161;

    /** Number of fit coordinates. */
    int size();

    /** Start values in fit coordinates. */
    double[] start(double[] temperatures, double[] lnMu);

    /** y = ln mu at temperature {@code t} (K). */
    double value(double[] p, double t);

    /** dy/dp at temperature {@code t}, written into {@code out} (overwritten, length {@link #size()}). */
    void gradient(double[] p, double t, double[] out);

    /** Lower ends of the box in fit coordinates (-infinity where none). */
    double[] lower();

    /** Upper ends of the box in fit coordinates (+infinity where none). */
    double[] upper();

    /** What reaching the lower (index 0) or upper (index 1) end of coordinate k means, for the notes. */
    String boundNote(int k, boolean upperEnd);

    /** The law's fitted parameters, in the order of {@link #names()}, from fit coordinates. */
    double[] natural(double[] p);

    /** d natural_k / d p_k, the diagonal of the coordinate map's Jacobian. */
    double[] naturalDerivative(double[] p);

    /** Case-file keys of the fitted parameters, in the order of {@link #natural}. */
    List<String> names();

    /** SI units of the fitted parameters as a case file writes them. */
    List<String> units();

    /** The fixed reference temperature (K) the law is written with, NaN when it has none. */
    double referenceTemperature();

    /** The solver's law record from the natural parameters, valid over [validFrom, validTo]. */
    ViscosityLaw law(double[] natural, double validFrom, double validTo);

    /** n points from {@code from} to {@code to}, evenly spaced in ln. */
    static double[] logGrid(double from, double to, int n) {
        double[] grid = new double[n];
        double ratio = Math.log(to / from);
        for (int i = 0; i < n; i++) {
            grid[i] = from * Math.exp(ratio * i / (n - 1));
        }
        return grid;
    }

    /** The straight line y = intercept + slope x by least squares. */
    static SimpleRegression line(double[] x, double[] y) {
        SimpleRegression regression = new SimpleRegression();
        for (int i = 0; i < x.length; i++) {
            regression.addData(x[i], y[i]);
        }
        return regression;
    }

    /**
     * A law that is a straight line in fit coordinates, ln mu = ln R + k x(T), with p = (ln R, k) unbounded:
     * the exponential and power laws. Linear regression of ln mu on x already gives the least-squares
     * optimum, which is the start.
     */
    sealed interface Straight extends LogModel permits Exponential, Power {

        /** The abscissa x(T) the law is straight in. */
        double abscissa(double t);

        /** What the fit calls the law in messages. */
        String label();

        @Override
        default int size() {
            return 2;
        }

        @Override
        default double[] start(double[] temperatures, double[] lnMu) {
            double[] x = new double[temperatures.length];
            for (int i = 0; i < x.length; i++) {
                x[i] = abscissa(temperatures[i]);
            }
            SimpleRegression r = line(x, lnMu);
            return new double[] {r.getIntercept(), r.getSlope()};
        }

        @Override
        default double value(double[] p, double t) {
            return p[0] + p[1] * abscissa(t);
        }

        @Override
        default void gradient(double[] p, double t, double[] out) {
            out[0] = 1;
            out[1] = abscissa(t);
        }

        @Override
        default double[] lower() {
            return new double[] {Double.NEGATIVE_INFINITY, Double.NEGATIVE_INFINITY};
        }

        @Override
        default double[] upper() {
            return new double[] {Double.POSITIVE_INFINITY, Double.POSITIVE_INFINITY};
        }

        @Override
        default String boundNote(int k, boolean upperEnd) {
            throw new IllegalStateException("the " + label() + " fit has no bounds");
        }

        @Override
        default double[] natural(double[] p) {
            return new double[] {Math.exp(p[0]), p[1]};
        }

        @Override
        default double[] naturalDerivative(double[] p) {
            return new double[] {Math.exp(p[0]), 1};
        }
    }

    /**
     * Exponential law, ln mu = ln R - beta (T - Tr); p = (ln R, beta), straight in x = -(T - Tr).
     *
     * @param referenceTemperature Tr (K), held fixed
     */
    record Exponential(double referenceTemperature) implements Straight {
        @Override
        public double abscissa(double t) {
            return -(t - referenceTemperature);
        }

        @Override
        public String label() {
            return "exponential";
        }

        @Override
        public List<String> names() {
            return List.of("reference", "coefficient");
        }

        @Override
        public List<String> units() {
            return List.of("Pa*s", "1/K");
        }

        @Override
        public ViscosityLaw law(double[] natural, double validFrom, double validTo) {
            return new ExponentialViscosity(natural[0], referenceTemperature, natural[1], validFrom, validTo);
        }
    }

    /**
     * Vogel law, ln mu = ln a + b / (T - c) with c = Tmin - exp(s); p = (ln a, b, s).
     *
     * <p>dy/d ln a = 1, dy/db = 1/(T - c), dy/ds = (dy/dc)(dc/ds) = [b/(T - c)^2] * (-exp(s)).
     *
     * @param lowestTemperature Tmin (K), the lowest measured temperature
     */
    record Vogel(double lowestTemperature) implements LogModel {
        /** Closest approach of c to the lowest temperature (K): closer, ln mu at Tmin is a spike no data ask for. */
        static final double MIN_GAP = 0.1;
        /**
         * Farthest distance of c below the lowest temperature, in units of that temperature: beyond it
         * b/(T - c) is a straight line in T to within the scatter of any real data (the Arrhenius limit),
         * and c, b and a are no longer separately determined.
         */
        static final double MAX_GAP_RATIO = 10;

        @Override
        public int size() {
            return 3;
        }

        @Override
        public double[] start(double[] temperatures, double[] lnMu) {
            double best = Double.POSITIVE_INFINITY;
            double[] start = null;
            double[] x = new double[temperatures.length];
            for (double gap : logGrid(MIN_GAP, MAX_GAP_RATIO * lowestTemperature, START_GRID)) {
                double c = lowestTemperature - gap;
                for (int i = 0; i < x.length; i++) {
                    x[i] = 1 / (temperatures[i] - c);
                }
                SimpleRegression r = line(x, lnMu);
                double sse = r.getSumSquaredErrors();
                if (sse < best) {
                    best = sse;
                    start = new double[] {r.getIntercept(), r.getSlope(), Math.log(gap)};
                }
            }
            return start;
        }

        private double c(double[] p) {
            return lowestTemperature - Math.exp(p[2]);
        }

        @Override
        public double value(double[] p, double t) {
            return p[0] + p[1] / (t - c(p));
        }

        @Override
        public void gradient(double[] p, double t, double[] out) {
            double excess = t - c(p);
            out[0] = 1;
            out[1] = 1 / excess;
            out[2] = -p[1] / (excess * excess) * Math.exp(p[2]);
        }

        @Override
        public double[] lower() {
            return new double[] {Double.NEGATIVE_INFINITY, Double.NEGATIVE_INFINITY, Math.log(MIN_GAP)};
        }

        @Override
        public double[] upper() {
            return new double[] {Double.POSITIVE_INFINITY, Double.POSITIVE_INFINITY,
                    Math.log(MAX_GAP_RATIO * lowestTemperature)};
        }

        @Override
        public String boundNote(int k, boolean upperEnd) {
            return upperEnd
                    ? "c reached the end of its range, " + MAX_GAP_RATIO + " times the lowest temperature below it: "
                            + "the data follow an Arrhenius line, and a, b, c are not separately determined "
                            + "(the exponential law may serve)"
                    : "c reached " + MIN_GAP + " K below the lowest temperature: the data bend more sharply "
                            + "than a Vogel law can follow";
        }

        @Override
        public double[] natural(double[] p) {
            return new double[] {Math.exp(p[0]), p[1], c(p)};
        }

        @Override
        public double[] naturalDerivative(double[] p) {
            return new double[] {Math.exp(p[0]), 1, -Math.exp(p[2])};
        }

        @Override
        public List<String> names() {
            return List.of("a", "b", "c");
        }

        @Override
        public List<String> units() {
            return List.of("Pa*s", "K", "K");
        }

        @Override
        public double referenceTemperature() {
            return Double.NaN;
        }

        @Override
        public ViscosityLaw law(double[] natural, double validFrom, double validTo) {
            return new VogelViscosity(natural[0], natural[1], natural[2], validFrom, validTo);
        }
    }

    /**
     * Power law, ln mu = ln R + n ln(T / Tr); p = (ln R, n).
     *
     * @param referenceTemperature Tr (K), held fixed
     */
    record Power(double referenceTemperature) implements Straight {
        @Override
        public double abscissa(double t) {
            return Math.log(t / referenceTemperature);
        }

        @Override
        public String label() {
            return "power-law";
        }

        @Override
        public List<String> names() {
            return List.of("reference", "exponent");
        }

        @Override
        public List<String> units() {
            return List.of("Pa*s", "");
        }

        @Override
        public ViscosityLaw law(double[] natural, double validFrom, double validTo) {
            return new PowerLawViscosity(natural[0], referenceTemperature, natural[1], validFrom, validTo);
        }
    }

    /**
     * Sutherland's law, ln mu = ln R + 1.5 ln(T/Tr) + ln(Tr + S) - ln(T + S); p = (ln R, S).
     *
     * <p>dy/d ln R = 1, dy/dS = 1/(Tr + S) - 1/(T + S). S is kept in [0, 10 Tmax]: below 0 the law's record
     * refuses it, and above 10 Tmax the factor (Tr + S)/(T + S) is 1 to within the scatter of any data
     * (mu proportional to T^1.5), so S is no longer determined.
     *
     * @param referenceTemperature Tr (K), held fixed
     * @param highestTemperature Tmax (K), the highest measured temperature
     */
    record Sutherland(double referenceTemperature, double highestTemperature) implements LogModel {
        /** Upper end of S in units of the highest temperature (see the record's comment). */
        static final double MAX_S_RATIO = 10;
        /** Smallest positive S of the start grid (K); S = 0 is tried as well. */
        static final double MIN_GRID_S = 1;

        @Override
        public int size() {
            return 2;
        }

        private double shape(double s, double t) {
            return 1.5 * Math.log(t / referenceTemperature) + Math.log(referenceTemperature + s) - Math.log(t + s);
        }

        @Override
        public double[] start(double[] temperatures, double[] lnMu) {
            double[] grid = logGrid(MIN_GRID_S, MAX_S_RATIO * highestTemperature, START_GRID);
            double best = Double.POSITIVE_INFINITY;
            double[] start = null;
            for (int g = -1; g < grid.length; g++) {
                double s = g < 0 ? 0 : grid[g];
                // for fixed S, ln R is the mean of ln mu - shape: the least-squares intercept of slope 1
                double lnR = 0;
                for (int i = 0; i < temperatures.length; i++) {
                    lnR += lnMu[i] - shape(s, temperatures[i]);
                }
                lnR /= temperatures.length;
                double sse = 0;
                for (int i = 0; i < temperatures.length; i++) {
                    double r = lnMu[i] - lnR - shape(s, temperatures[i]);
                    sse += r * r;
                }
                if (sse < best) {
                    best = sse;
                    start = new double[] {lnR, s};
                }
            }
            return start;
        }

        @Override
        public double value(double[] p, double t) {
            return p[0] + shape(p[1], t);
        }

        @Override
        public void gradient(double[] p, double t, double[] out) {
            out[0] = 1;
            out[1] = 1 / (referenceTemperature + p[1]) - 1 / (t + p[1]);
        }

        @Override
        public double[] lower() {
            return new double[] {Double.NEGATIVE_INFINITY, 0};
        }

        @Override
        public double[] upper() {
            return new double[] {Double.POSITIVE_INFINITY, MAX_S_RATIO * highestTemperature};
        }

        @Override
        public String boundNote(int k, boolean upperEnd) {
            return upperEnd
                    ? "the Sutherland constant reached " + MAX_S_RATIO + " times the highest temperature: the data "
                            + "rise like T^1.5 and S is not determined"
                    : "the Sutherland constant reached 0, the lowest the law allows: the data rise more slowly "
                            + "than T^0.5, or fall (a gas law does not suit them)";
        }

        @Override
        public double[] natural(double[] p) {
            return new double[] {Math.exp(p[0]), p[1]};
        }

        @Override
        public double[] naturalDerivative(double[] p) {
            return new double[] {Math.exp(p[0]), 1};
        }

        @Override
        public List<String> names() {
            return List.of("reference", "constant");
        }

        @Override
        public List<String> units() {
            return List.of("Pa*s", "K");
        }

        @Override
        public ViscosityLaw law(double[] natural, double validFrom, double validTo) {
            return new SutherlandViscosity(natural[0], referenceTemperature, natural[1], validFrom, validTo);
        }
    }
}
