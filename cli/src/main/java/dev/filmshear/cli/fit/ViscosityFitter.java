package dev.filmshear.cli.fit;

import dev.filmshear.solver.base.NumericalFailureException;
import dev.filmshear.solver.physics.DensityLaw;
import dev.filmshear.solver.physics.ViscosityLaw;
import dev.filmshear.solver.physics.WaltherViscosity;
import org.apache.commons.math3.exception.MathIllegalStateException;
import org.apache.commons.math3.fitting.leastsquares.LeastSquaresBuilder;
import org.apache.commons.math3.fitting.leastsquares.LeastSquaresOptimizer;
import org.apache.commons.math3.fitting.leastsquares.LeastSquaresProblem;
import org.apache.commons.math3.fitting.leastsquares.LevenbergMarquardtOptimizer;
import org.apache.commons.math3.fitting.leastsquares.MultivariateJacobianFunction;
import org.apache.commons.math3.linear.Array2DRowRealMatrix;
import org.apache.commons.math3.linear.ArrayRealVector;
import org.apache.commons.math3.linear.RealMatrix;
import org.apache.commons.math3.linear.RealVector;
import org.apache.commons.math3.linear.SingularMatrixException;
import org.apache.commons.math3.stat.regression.SimpleRegression;
import org.apache.commons.math3.util.Pair;

import java.util.ArrayList;
import java.util.List;

/**
 * Fits a viscosity-temperature law to measured points. Numerics only: arrays in SI units in, a
 * {@link FitResult} out; no files, no units.
 *
 * <p><b>Dynamic laws</b> (exponential, vogel, power, sutherland). With y_i = ln mu_i the measured and
 * f(T; p) = ln mu(T; p) the law ({@link LogModel}), the fit minimises
 * <pre>
 *   S(p) = sum_i [y_i - f(T_i; p)]^2,
 * </pre>
 * the sum of squared relative errors to first order (ln(mu_fit / mu) = mu_fit/mu - 1 + O(2)). Relative
 * error is the usual measure for viscosity data, which span decades over an oil's temperature range and
 * whose measurement uncertainty is a fixed percentage; absolute residuals would let the coldest points
 * decide the fit alone. The minimiser is Levenberg-Marquardt from Apache Commons Math 3.6.1
 * ({@link LevenbergMarquardtOptimizer}, More's MINPACK form) with the analytic Jacobian J_ik = df(T_i)/dp_k,
 * started from linear-regression start values and kept in the law's domain by a box on the fit
 * coordinates (a {@link org.apache.commons.math3.fitting.leastsquares.ParameterValidator}); a parameter
 * that ends on the box is reported in the notes, never silently.
 *
 * <p><b>Standard errors.</b> With n points and m adjusted parameters, the residual variance is
 * s^2 = S(p*) / (n - m) and the covariance of the fit coordinates C = s^2 (J^T J)^-1 at the optimum
 * (Commons Math {@code Optimum.getCovariances}, scaled here by s^2: Commons Math returns the unscaled
 * (J^T J)^-1). The law's own parameters follow by the delta method (see {@link LogModel}); a standard
 * error is the square root of a diagonal entry, and the correlation matrix is C_jk / sqrt(C_jj C_kk).
 *
 * <p><b>Walther</b> (ASTM D341): with Y_i = log10 log10 Z(nu_i) and X_i = log10 T_i, the law
 * Y = A - B X is a straight line; through two points it is the standard's exact line, through more the
 * ordinary least-squares line (Commons Math {@link SimpleRegression}, which gives the standard errors of
 * intercept and slope from the same s^2 with n - 2 degrees of freedom). Z(nu) is the D341 form with the
 * low-viscosity term, as in the solver's {@link WaltherViscosity}.
 */
public final class ViscosityFitter {

    /**
     * Tolerances of the Levenberg-Marquardt stopping tests (relative cost reduction, relative step,
     * orthogonality of residuals to the Jacobian's columns). Tighter than Commons Math's 1e-10 defaults
     * so that on exact data the iteration runs on to round-off (the tests see 1e-15 relative), yet clear of
     * the 2.2e-16 at which the optimizer stops with an error instead.
     */
    static final double TOLERANCE = 1e-12;
    /** Bound on iterations and evaluations: the fits here take 3 to 30; more means the data do not fit the law. */
    static final int MAX_ITERATIONS = 1000;
    /** Threshold below which Commons Math treats J^T J as singular when inverting it for the covariance. */
    static final double SINGULARITY_THRESHOLD = 1e-14;
    /** 1 mm^2/s in m^2/s (the D341 unit). */
    static final double MM2_PER_S = 1e-6;
    /** ASTM D341 low-viscosity term exp(C0 + C1 nu + C2 nu^2), nu in mm^2/s (references.md section 4). */
    private static final double C0 = -1.47;
    private static final double C1 = -1.84;
    private static final double C2 = -0.51;
    /**
     * A constant density for the walther record, whose constructor needs one: only the record's kinematic
     * viscosity is used by the fit, so the value never shows in a result.
     */
    private static final DensityLaw NOMINAL_DENSITY = DensityLaw.constant(1000);

    private ViscosityFitter() {
    }

    /**
     * ASTM D341 Z for a kinematic viscosity {@code nu} (m^2/s): Z = nu + 0.7 + exp(-1.47 - 1.84 nu - 0.51 nu^2)
     * with nu in mm^2/s. The fit needs log10 log10 Z, so Z must exceed 1 (nu above about 1.15e-7 m^2/s).
     * The solver's copy of this line is package-private, hence this one.
     */
    public static double d341Z(double nu) {
        double v = nu / MM2_PER_S;
        return v + 0.7 + Math.exp(C0 + v * (C1 + C2 * v));
    }

    /**
     * Fits {@code law} to the points.
     *
     * @param law the law
     * @param temperatures K, positive and all different (read-only)
     * @param values measured viscosities, positive: dynamic (Pa s), or kinematic (m^2/s) for walther (read-only)
     * @return the fit
     * @throws IllegalArgumentException when the arrays break the rules above, or hold fewer than
     *     {@link FitLaw#minimumPoints()} points (the data reader checks all of this first, with messages)
     * @throws NumericalFailureException when the optimizer does not converge
     * @throws dev.filmshear.solver.base.InvalidParameterException when the fitted parameters lie outside
     *     the law's domain (a liquid law fitted to viscosities that rise with temperature)
     */
    public static FitResult fit(FitLaw law, double[] temperatures, double[] values) {
        check(law, temperatures, values);
        if (law == FitLaw.WALTHER) {
            return walther(temperatures, values);
        }
        LogModel model = switch (law) {
            case EXPONENTIAL -> new LogModel.Exponential(referenceTemperature(temperatures));
            case VOGEL -> new LogModel.Vogel(min(temperatures));
            case POWER -> new LogModel.Power(referenceTemperature(temperatures));
            case SUTHERLAND -> new LogModel.Sutherland(referenceTemperature(temperatures), max(temperatures));
            case WALTHER -> throw new IllegalStateException("walther is fitted as a line");
        };
        return levenbergMarquardt(law, model, temperatures, values);
    }

    private static void check(FitLaw law, double[] temperatures, double[] values) {
        if (temperatures.length != values.length) {
            throw new IllegalArgumentException(temperatures.length + " temperatures for " + values.length + " values");
        }
        if (temperatures.length < law.minimumPoints()) {
            throw new IllegalArgumentException(temperatures.length + " points for the " + law.key() + " law, which "
                    + "needs at least " + law.minimumPoints());
        }
        for (int i = 0; i < temperatures.length; i++) {
            if (!(temperatures[i] > 0) || !(values[i] > 0) || !Double.isFinite(temperatures[i])
                    || !Double.isFinite(values[i])) {
                throw new IllegalArgumentException("point " + i + ": " + values[i] + " at " + temperatures[i] + " K");
            }
            for (int j = 0; j < i; j++) {
                if (temperatures[j] == temperatures[i]) {
                    throw new IllegalArgumentException("temperature " + temperatures[i] + " K given twice");
                }
            }
        }
    }

    /**
     * The reference temperature of the exponential, power and Sutherland laws: the measured temperature
     * nearest the mean of the measured temperatures. A measured point, so that the fitted reference
     * viscosity can be set beside a measured one; near the centre, so that the reference viscosity and the
     * slope parameter are nearly uncorrelated.
     */
    static double referenceTemperature(double[] temperatures) {
        double mean = 0;
        for (double t : temperatures) {
            mean += t / temperatures.length;
        }
        double best = temperatures[0];
        for (double t : temperatures) {
            if (Math.abs(t - mean) < Math.abs(best - mean)) {
                best = t;
            }
        }
        return best;
    }

    private static FitResult levenbergMarquardt(FitLaw law, LogModel model, double[] temperatures, double[] values) {
        int n = temperatures.length;
        int m = model.size();
        double[] lnMu = new double[n];
        for (int i = 0; i < n; i++) {
            lnMu[i] = Math.log(values[i]);
        }
        double[] lower = model.lower();
        double[] upper = model.upper();
        MultivariateJacobianFunction function = point -> {
            double[] p = point.toArray();
            double[] f = new double[n];
            double[][] jacobian = new double[n][m];
            for (int i = 0; i < n; i++) {
                f[i] = model.value(p, temperatures[i]);
                model.gradient(p, temperatures[i], jacobian[i]);
            }
            return new Pair<RealVector, RealMatrix>(new ArrayRealVector(f, false),
                    new Array2DRowRealMatrix(jacobian, false));
        };
        LeastSquaresProblem problem = new LeastSquaresBuilder()
                .start(model.start(temperatures, lnMu))
                .model(function)
                .target(lnMu)
                .parameterValidator(point -> {
                    double[] p = point.toArray();
                    for (int k = 0; k < m; k++) {
                        p[k] = Math.min(upper[k], Math.max(lower[k], p[k]));
                    }
                    return new ArrayRealVector(p, false);
                })
                .lazyEvaluation(false)
                .maxIterations(MAX_ITERATIONS)
                .maxEvaluations(MAX_ITERATIONS)
                .build();
        LeastSquaresOptimizer.Optimum optimum;
        try {
            optimum = new LevenbergMarquardtOptimizer()
                    .withCostRelativeTolerance(TOLERANCE)
                    .withParameterRelativeTolerance(TOLERANCE)
                    .withOrthoTolerance(TOLERANCE)
                    .optimize(problem);
        } catch (MathIllegalStateException e) {
            throw new NumericalFailureException("the " + law.key() + " fit did not converge (Levenberg-Marquardt: "
                    + e.getMessage() + ")");
        }
        double[] p = optimum.getPoint().toArray();
        List<String> notes = new ArrayList<>();
        for (int k = 0; k < m; k++) {
            if (p[k] <= lower[k] || p[k] >= upper[k]) {
                notes.add(model.boundNote(k, p[k] >= upper[k]));
            }
        }

        int dof = n - m;
        double[] residuals = optimum.getResiduals().toArray();
        double variance = 0;
        for (double r : residuals) {
            variance += r * r / dof;
        }
        double[] natural = model.natural(p);
        double[] scale = model.naturalDerivative(p);
        double[][] covariance = new double[m][m];
        try {
            RealMatrix unscaled = optimum.getCovariances(SINGULARITY_THRESHOLD);
            for (int j = 0; j < m; j++) {
                for (int k = 0; k < m; k++) {
                    covariance[j][k] = variance * scale[j] * unscaled.getEntry(j, k) * scale[k];
                }
            }
        } catch (SingularMatrixException e) {
            for (double[] row : covariance) {
                java.util.Arrays.fill(row, Double.NaN);
            }
            notes.add("the data do not determine every parameter (J^T J is singular): no standard errors");
        }

        ViscosityLaw fitted = model.law(natural, min(temperatures), max(temperatures));
        List<FittedParameter> parameters = new ArrayList<>();
        for (int k = 0; k < m; k++) {
            parameters.add(new FittedParameter(model.names().get(k), natural[k], Math.sqrt(covariance[k][k]),
                    model.units().get(k), false));
        }
        if (!Double.isNaN(model.referenceTemperature())) {
            // every law with a reference temperature writes it second, after its reference viscosity
            parameters.add(1, new FittedParameter("reference_temperature", model.referenceTemperature(), Double.NaN,
                    "K", true));
        }
        double[] fittedValues = new double[n];
        for (int i = 0; i < n; i++) {
            fittedValues[i] = fitted.mu(temperatures[i]);
        }
        return new FitResult(law, parameters, correlation(covariance), temperatures, values, fittedValues, dof,
                optimum.getIterations(), notes, fitted);
    }

    /** The ASTM D341 line through the points (exact through two, least squares through more). */
    private static FitResult walther(double[] temperatures, double[] nu) {
        int n = temperatures.length;
        SimpleRegression line = new SimpleRegression();
        for (int i = 0; i < n; i++) {
            double z = d341Z(nu[i]);
            if (!(z > 1)) {
                throw new IllegalArgumentException("kinematic viscosity " + nu[i] + " m^2/s gives ASTM D341 Z = " + z
                        + ", not above 1");
            }
            line.addData(Math.log10(temperatures[i]), Math.log10(Math.log10(z)));
        }
        double a = line.getIntercept();
        double b = -line.getSlope();
        double seA = n > 2 ? line.getInterceptStdErr() : Double.NaN;
        double seB = n > 2 ? line.getSlopeStdErr() : Double.NaN;
        // cov(intercept, slope) = -mean(X) s^2 / Sxx; the slope is -B, so cov(A, B) = mean(X) s^2 / Sxx
        double covAB = n > 2 ? meanLog10(temperatures) * line.getMeanSquareError() / line.getXSumSquares() : Double.NaN;
        double[][] covariance = {{seA * seA, covAB}, {covAB, seB * seB}};
        WaltherViscosity fitted = new WaltherViscosity(a, b, NOMINAL_DENSITY, min(temperatures), max(temperatures));
        double[] fittedValues = new double[n];
        for (int i = 0; i < n; i++) {
            fittedValues[i] = fitted.kinematicViscosity(temperatures[i]);
        }
        List<FittedParameter> parameters = List.of(new FittedParameter("A", a, seA, "", false),
                new FittedParameter("B", b, seB, "", false));
        List<String> notes = n == 2
                ? List.of("two points: the ASTM D341 line through them is exact, with no standard errors")
                : List.of();
        return new FitResult(FitLaw.WALTHER, parameters, correlation(covariance), temperatures, nu, fittedValues,
                n - 2, 0, notes, fitted);
    }

    private static double meanLog10(double[] temperatures) {
        double sum = 0;
        for (double t : temperatures) {
            sum += Math.log10(t);
        }
        return sum / temperatures.length;
    }

    private static double[][] correlation(double[][] covariance) {
        int m = covariance.length;
        double[][] r = new double[m][m];
        for (int j = 0; j < m; j++) {
            for (int k = 0; k < m; k++) {
                r[j][k] = covariance[j][k] / Math.sqrt(covariance[j][j] * covariance[k][k]);
            }
        }
        return r;
    }

    private static double min(double[] values) {
        double low = Double.POSITIVE_INFINITY;
        for (double v : values) {
            low = Math.min(low, v);
        }
        return low;
    }

    private static double max(double[] values) {
        double high = Double.NEGATIVE_INFINITY;
        for (double v : values) {
            high = Math.max(high, v);
        }
        return high;
    }
}
