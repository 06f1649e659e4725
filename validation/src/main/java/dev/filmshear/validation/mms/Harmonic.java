package dev.filmshear.validation.mms;

import dev.filmshear.solver.base.InvalidParameterException;

/**
 * A function of time of the form
 * <pre>
 *   g(t) = mean + sine sin(omega t) + cosine cos(omega t),     g'(t) = omega (sine cos(omega t) - cosine sin(omega t))
 * </pre>
 * the time factor of a manufactured field. The solver starts every run from a uniform state, so the factors
 * of non-uniform shapes must vanish at t = 0: {@link #sine(double)} (sin omega t) and
 * {@link #oneMinusCosine(double)} (1 - cos omega t) do.
 *
 * @param mean constant part
 * @param sine coefficient of sin(omega t)
 * @param cosine coefficient of cos(omega t)
 * @param angularFrequency omega (rad/s), above zero unless both coefficients are zero
 */
public record Harmonic(double mean, double sine, double cosine, double angularFrequency) {

    public Harmonic {
        InvalidParameterException.requireFinite("mean", mean, "");
        InvalidParameterException.requireFinite("sine", sine, "");
        InvalidParameterException.requireFinite("cosine", cosine, "");
        if (sine != 0 || cosine != 0) {
            InvalidParameterException.requirePositive("angular_frequency", angularFrequency, "rad/s");
        } else {
            InvalidParameterException.requireNonNegative("angular_frequency", angularFrequency, "rad/s");
        }
    }

    /** The constant {@code value}. */
    public static Harmonic constant(double value) {
        return new Harmonic(value, 0, 0, 0);
    }

    /** sin(omega t), zero at t = 0. */
    public static Harmonic sine(double angularFrequency) {
        return new Harmonic(0, 1, 0, angularFrequency);
    }

    /** cos(omega t). */
    public static Harmonic cosine(double angularFrequency) {
        return new Harmonic(0, 0, 1, angularFrequency);
    }

    /** 1 - cos(omega t), zero with zero slope at t = 0. */
    public static Harmonic oneMinusCosine(double angularFrequency) {
        return new Harmonic(1, 0, -1, angularFrequency);
    }

    /** True when the function does not change with time. */
    public boolean isConstant() {
        return sine == 0 && cosine == 0;
    }

    /** g(t). */
    public double value(double t) {
        if (isConstant()) {
            return mean;
        }
        double phase = angularFrequency * t;
        return mean + sine * Math.sin(phase) + cosine * Math.cos(phase);
    }

    /** dg/dt at {@code t}. */
    public double rate(double t) {
        if (isConstant()) {
            return 0;
        }
        double phase = angularFrequency * t;
        return angularFrequency * (sine * Math.cos(phase) - cosine * Math.sin(phase));
    }

    /** This function times {@code factor}. */
    public Harmonic times(double factor) {
        return new Harmonic(factor * mean, factor * sine, factor * cosine, angularFrequency);
    }
}
