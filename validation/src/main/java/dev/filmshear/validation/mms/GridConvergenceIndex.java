package dev.filmshear.validation.mms;

import dev.filmshear.solver.base.InvalidParameterException;
import org.apache.commons.math3.analysis.solvers.BrentSolver;
import org.apache.commons.math3.exception.NoBracketingException;

/**
 * Richardson extrapolation and Roache's Grid Convergence Index for a scalar result f computed on grids of
 * spacing h1 &lt; h2 &lt; h3 (f1 on the finest), with refinement ratios r21 = h2/h1 and r32 = h3/h2.
 *
 * <p>Sources: P. J. Roache, <i>Verification and Validation in Computational Science and Engineering</i>,
 * Hermosa, 1998; ASME V&amp;V 20-2009; I. B. Celik, U. Ghia, P. J. Roache, C. J. Freitas, H. Coleman,
 * P. E. Raad, "Procedure for estimation and reporting of uncertainty due to discretization in CFD
 * applications", <i>J. Fluids Eng.</i> 130(7), 078001, 2008 (formulas and table values from memory;
 * references.md 10.2). With eps_ij = f_i - f_j:
 * <pre>
 *   observed order   p = | ln|eps32/eps21| + q(p) | / ln r21,   q(p) = ln[(r21^p - s) / (r32^p - s)],
 *                    s = sign(eps32/eps21)                                  (Celik et al. 2008)
 *   (constant ratio r: q = 0 and p = |ln|eps32/eps21|| / ln r)
 *   extrapolated     f_ext = (r21^p f1 - f2) / (r21^p - 1)                 (Richardson)
 *   relative errors  e_a = |(f1 - f2)/f1|,   e_ext = |(f_ext - f1)/f_ext|
 *   GCI_fine         = Fs e_a / (r21^p - 1)
 *   asymptotic check GCI_32 / (r21^p GCI_21) = 1 in the asymptotic range,
 *                    GCI_32 = Fs |(f3 - f2)/f2| / (r32^p - 1)
 * </pre>
 * with the factor of safety Fs = 1.25 for three or more grids and Fs = 3 for two grids, where the formal
 * order stands in for p (Roache 1998; P. J. Roache, Discussion, <i>J. Fluids Eng.</i> 133, 115501, 2011).
 * For a non-constant ratio the order equation is solved with Commons Math's Brent solver rather than by
 * Celik's fixed-point iteration; the root is the same. The formulas themselves are written here: no
 * well-kept Java library implements the GCI.
 */
public final class GridConvergenceIndex {
    /** Factor of safety with three or more grids and an observed order (Roache 1998). */
    public static final double SAFETY_FACTOR_THREE_GRIDS = 1.25;
    /** Factor of safety with two grids and the formal order (Roache 1998). */
    public static final double SAFETY_FACTOR_TWO_GRIDS = 3.0;
    /** Bracket of the order equation: orders above this are not found on real grids. */
    private static final double MAX_ORDER = 20;
    /** Lower end of the bracket (q(p) is finite as p tends to 0, but r^p - 1 vanishes there). */
    private static final double MIN_ORDER = 1e-6;
    /** Absolute accuracy of the order from the root solver. */
    private static final double ORDER_ACCURACY = 1e-12;
    private static final int MAX_EVALUATIONS = 200;

    private GridConvergenceIndex() {
    }

    /**
     * A discretization-error estimate.
     *
     * @param order observed order p (the formal order for two grids)
     * @param extrapolated Richardson's f_ext
     * @param approximateRelativeError e_a = |(f1 - f2)/f1|
     * @param extrapolatedRelativeError e_ext = |(f_ext - f1)/f_ext|
     * @param gciFine GCI of the finest grid, as a fraction of f1
     * @param safetyFactor Fs used
     * @param asymptoticRatio GCI_32 / (r21^p GCI_21), near 1 in the asymptotic range; NaN for two grids
     */
    public record Estimate(double order, double extrapolated, double approximateRelativeError,
                           double extrapolatedRelativeError, double gciFine, double safetyFactor,
                           double asymptoticRatio) {
    }

    /**
     * The observed order from three grids (Celik et al. 2008).
     *
     * @param f1 finest-grid value
     * @param f2 middle-grid value
     * @param f3 coarsest-grid value
     * @param r21 h2/h1, above 1
     * @param r32 h3/h2, above 1
     * @throws InvalidParameterException when two neighbouring grids give the same value (no order exists)
     * @throws IllegalStateException when the order equation has no root between 1e-6 and 20
     */
    public static double observedOrder(double f1, double f2, double f3, double r21, double r32) {
        requireRatio("r21", r21);
        requireRatio("r32", r32);
        double eps21 = f2 - f1;
        double eps32 = f3 - f2;
        if (eps21 == 0 || eps32 == 0) {
            throw new InvalidParameterException("values", f1 + ", " + f2 + ", " + f3,
                    "values that change between neighbouring grids");
        }
        double logRatio = Math.log(Math.abs(eps32 / eps21));
        if (r21 == r32) {
            return Math.abs(logRatio) / Math.log(r21);
        }
        double s = Math.signum(eps32 / eps21);
        double lnR21 = Math.log(r21);
        try {
            return new BrentSolver(ORDER_ACCURACY).solve(MAX_EVALUATIONS, p -> {
                double q = Math.log((Math.pow(r21, p) - s) / (Math.pow(r32, p) - s));
                return p * lnR21 - Math.abs(logRatio + q);
            }, MIN_ORDER, MAX_ORDER);
        } catch (NoBracketingException e) {
            throw new IllegalStateException("the order equation of Celik et al. (2008) has no root between "
                    + MIN_ORDER + " and " + MAX_ORDER + " for f = " + f1 + ", " + f2 + ", " + f3, e);
        }
    }

    /** Richardson's extrapolation (r21^p f1 - f2) / (r21^p - 1). */
    public static double extrapolate(double f1, double f2, double r21, double order) {
        requireRatio("r21", r21);
        double rp = Math.pow(r21, order);
        return (rp * f1 - f2) / (rp - 1);
    }

    /** GCI of the finer grid, Fs |(f1 - f2)/f1| / (r21^p - 1), as a fraction of f1. */
    public static double gciFine(double f1, double f2, double r21, double order, double safetyFactor) {
        requireRatio("r21", r21);
        return safetyFactor * Math.abs((f1 - f2) / f1) / (Math.pow(r21, order) - 1);
    }

    /** The estimate from three grids: observed order, Fs = {@value #SAFETY_FACTOR_THREE_GRIDS}. */
    public static Estimate threeGrids(double f1, double f2, double f3, double r21, double r32) {
        double p = observedOrder(f1, f2, f3, r21, r32);
        double extrapolated = extrapolate(f1, f2, r21, p);
        double gci21 = gciFine(f1, f2, r21, p, SAFETY_FACTOR_THREE_GRIDS);
        double gci32 = gciFine(f2, f3, r32, p, SAFETY_FACTOR_THREE_GRIDS);
        return new Estimate(p, extrapolated, Math.abs((f1 - f2) / f1), Math.abs((extrapolated - f1) / extrapolated),
                gci21, SAFETY_FACTOR_THREE_GRIDS, gci32 / (Math.pow(r21, p) * gci21));
    }

    /** The estimate from two grids with the formal order, Fs = {@value #SAFETY_FACTOR_TWO_GRIDS}. */
    public static Estimate twoGrids(double f1, double f2, double r21, double formalOrder) {
        InvalidParameterException.requirePositive("order", formalOrder, "");
        double extrapolated = extrapolate(f1, f2, r21, formalOrder);
        return new Estimate(formalOrder, extrapolated, Math.abs((f1 - f2) / f1),
                Math.abs((extrapolated - f1) / extrapolated),
                gciFine(f1, f2, r21, formalOrder, SAFETY_FACTOR_TWO_GRIDS), SAFETY_FACTOR_TWO_GRIDS, Double.NaN);
    }

    private static void requireRatio(String name, double r) {
        if (!(r > 1) || Double.isInfinite(r)) {
            throw new InvalidParameterException(name, Double.toString(r), "a refinement ratio above 1");
        }
    }
}
