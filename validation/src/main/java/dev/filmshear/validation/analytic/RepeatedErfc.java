package dev.filmshear.validation.analytic;

import org.apache.commons.math3.special.Erf;

/**
 * Repeated integrals of the complementary error function,
 * <pre>
 *   i^(-1)erfc(z) = (2/sqrt(pi)) exp(-z^2),   i^0 erfc(z) = erfc(z),
 *   i^n erfc(z)   = integral from z to infinity of i^(n-1)erfc(s) ds,
 * </pre>
 * evaluated from erfc by the recurrence 2n i^n erfc(z) = i^(n-2)erfc(z) - 2z i^(n-1)erfc(z)
 * (M. Abramowitz and I. A. Stegun, <i>Handbook of Mathematical Functions</i>, 1964, Eqs. 7.2.1 and 7.2.5;
 * H. S. Carslaw and J. C. Jaeger, <i>Conduction of Heat in Solids</i>, 2nd ed., 1959, Appendix II).
 *
 * <p>Commons Math provides erfc ({@link Erf#erfc(double)}) but not its repeated integrals, so the
 * recurrence is written here. For large z the recurrence subtracts nearly equal numbers; the result then
 * keeps an absolute accuracy of a few ulps of erfc(z)-sized quantities, which is what the series that use
 * it need (each term is added to a sum of order one).
 */
final class RepeatedErfc {
    private static final double TWO_OVER_ROOT_PI = 2 / Math.sqrt(Math.PI);

    private RepeatedErfc() {
    }

    /**
     * i^n erfc(z) for n = -1, 0, 1, 2 or 3.
     *
     * @param order n, from -1 to 3
     * @param z argument
     */
    static double of(int order, double z) {
        switch (order) {
            case -1:
                return TWO_OVER_ROOT_PI * Math.exp(-z * z);
            case 0:
                return Erf.erfc(z);
            case 1:
                return i1(z);
            case 2:
                return i2(z);
            case 3:
                return (i1(z) - 2 * z * i2(z)) / 6;
            default:
                throw new IllegalArgumentException("order " + order + " of i^n erfc is not implemented (-1 to 3)");
        }
    }

    private static double i1(double z) {
        return Math.exp(-z * z) / Math.sqrt(Math.PI) - z * Erf.erfc(z);
    }

    private static double i2(double z) {
        return (Erf.erfc(z) - 2 * z * i1(z)) / 4;
    }
}
