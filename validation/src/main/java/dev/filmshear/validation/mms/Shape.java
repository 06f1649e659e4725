package dev.filmshear.validation.mms;

import dev.filmshear.solver.base.InvalidParameterException;

/**
 * A smooth shape across the film, written in eta = y/L (L the gap, or the truncation depth of a
 * semi-infinite film), with its first and second derivatives in eta. Manufactured fields are sums of such
 * shapes times functions of time ({@link Field}).
 *
 * <p>The trigonometric shapes evaluate sin(pi x) and cos(pi x) with the argument reduced exactly, so that
 * they vanish exactly where they should (sin(pi) is 0 here, not 1.2e-16); the walls of a manufactured case
 * then meet their conditions to the last bit.
 */
public sealed interface Shape permits Shape.Constant, Shape.Linear, Shape.Sine, Shape.Cosine {

    /** The shape at {@code eta}. */
    double value(double eta);

    /** d/d eta of the shape at {@code eta}. */
    double slope(double eta);

    /** d^2/d eta^2 of the shape at {@code eta}. */
    double curvature(double eta);

    /** The shape 1. */
    record Constant() implements Shape {
        @Override
        public double value(double eta) {
            return 1;
        }

        @Override
        public double slope(double eta) {
            return 0;
        }

        @Override
        public double curvature(double eta) {
            return 0;
        }
    }

    /** The shape eta. */
    record Linear() implements Shape {
        @Override
        public double value(double eta) {
            return eta;
        }

        @Override
        public double slope(double eta) {
            return 1;
        }

        @Override
        public double curvature(double eta) {
            return 0;
        }
    }

    /**
     * The shape sin(waves pi eta).
     *
     * @param waves half-waves across the film (any finite non-zero number)
     */
    record Sine(double waves) implements Shape {
        public Sine {
            requireWaves(waves);
        }

        @Override
        public double value(double eta) {
            return sinPi(waves * eta);
        }

        @Override
        public double slope(double eta) {
            return waves * Math.PI * cosPi(waves * eta);
        }

        @Override
        public double curvature(double eta) {
            double k = waves * Math.PI;
            return -k * k * sinPi(waves * eta);
        }
    }

    /**
     * The shape cos(waves pi eta).
     *
     * @param waves half-waves across the film (any finite non-zero number)
     */
    record Cosine(double waves) implements Shape {
        public Cosine {
            requireWaves(waves);
        }

        @Override
        public double value(double eta) {
            return cosPi(waves * eta);
        }

        @Override
        public double slope(double eta) {
            return -waves * Math.PI * sinPi(waves * eta);
        }

        @Override
        public double curvature(double eta) {
            double k = waves * Math.PI;
            return -k * k * cosPi(waves * eta);
        }
    }

    private static void requireWaves(double waves) {
        if (!(waves != 0 && Double.isFinite(waves))) {
            throw new InvalidParameterException("waves", Double.toString(waves), "a finite number other than 0");
        }
    }

    /**
     * sin(pi x), exactly 0 at integers and exactly +-1 at half-integers: the argument is reduced to
     * r in [-1, 1] (exact, IEEE remainder) and folded into [-1/2, 1/2] (exact for |r| &gt; 1/2) before
     * Math.sin. Written here because Commons Math 3.6.1 has no sin(pi x).
     */
    static double sinPi(double x) {
        double r = Math.IEEEremainder(x, 2);
        if (r > 0.5) {
            r = 1 - r;
        } else if (r < -0.5) {
            r = -1 - r;
        }
        return r == 0.5 ? 1 : r == -0.5 ? -1 : Math.sin(Math.PI * r);
    }

    /** cos(pi x) = sin(pi (x + 1/2)), with the same exact zeros and ones. */
    static double cosPi(double x) {
        return sinPi(x + 0.5);
    }
}
