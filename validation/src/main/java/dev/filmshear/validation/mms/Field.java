package dev.filmshear.validation.mms;

import dev.filmshear.solver.base.InvalidParameterException;

import java.util.List;
import java.util.Objects;

/**
 * A manufactured field across the film, a sum of separable terms:
 * <pre>
 *   f(eta, t) = base + sum_i A_i g_i(t) X_i(eta),     eta = y / L,
 * </pre>
 * with A_i an amplitude (in the field's unit), g_i a {@link Harmonic} time factor and X_i a {@link Shape}.
 * Every derivative the source terms need is exact: d/d eta sums A_i g_i X_i', d^2/d eta^2 sums
 * A_i g_i X_i'', and d/dt sums A_i g_i' X_i.
 *
 * @param base constant part (m/s for a velocity, K for a temperature)
 * @param terms the terms; may be empty
 */
public record Field(double base, List<Term> terms) {

    /**
     * One term A g(t) X(eta).
     *
     * @param amplitude A
     * @param time g(t)
     * @param shape X(eta)
     */
    public record Term(double amplitude, Harmonic time, Shape shape) {
        public Term {
            InvalidParameterException.requireFinite("amplitude", amplitude, "");
            Objects.requireNonNull(time, "time");
            Objects.requireNonNull(shape, "shape");
        }
    }

    public Field {
        InvalidParameterException.requireFinite("base", base, "");
        terms = List.copyOf(terms);
    }

    /** A field of {@code base} plus the given terms. */
    public static Field of(double base, Term... terms) {
        return new Field(base, List.of(terms));
    }

    /** f(eta, t). */
    public double value(double eta, double t) {
        double sum = base;
        for (Term term : terms) {
            sum += term.amplitude() * term.time().value(t) * term.shape().value(eta);
        }
        return sum;
    }

    /** df/d eta at (eta, t). */
    public double slope(double eta, double t) {
        double sum = 0;
        for (Term term : terms) {
            sum += term.amplitude() * term.time().value(t) * term.shape().slope(eta);
        }
        return sum;
    }

    /** d^2 f / d eta^2 at (eta, t). */
    public double curvature(double eta, double t) {
        double sum = 0;
        for (Term term : terms) {
            sum += term.amplitude() * term.time().value(t) * term.shape().curvature(eta);
        }
        return sum;
    }

    /** df/dt at (eta, t). */
    public double rate(double eta, double t) {
        double sum = 0;
        for (Term term : terms) {
            sum += term.amplitude() * term.time().rate(t) * term.shape().value(eta);
        }
        return sum;
    }

    /**
     * The history f(eta, t) at one fixed {@code eta} as a single harmonic (for a wall's motion).
     *
     * @throws InvalidParameterException when terms that do not vanish at eta change with different frequencies
     */
    public Harmonic historyAt(double eta) {
        double mean = base;
        double sine = 0;
        double cosine = 0;
        double omega = 0;
        for (Term term : terms) {
            double weight = term.amplitude() * term.shape().value(eta);
            if (weight == 0) {
                continue;
            }
            Harmonic g = term.time();
            mean += weight * g.mean();
            if (g.isConstant()) {
                continue;
            }
            if (omega != 0 && g.angularFrequency() != omega) {
                throw new InvalidParameterException("angular_frequency", g.angularFrequency() + " rad/s and "
                        + omega + " rad/s at eta = " + eta, "one frequency among the terms that do not vanish there");
            }
            omega = g.angularFrequency();
            sine += weight * g.sine();
            cosine += weight * g.cosine();
        }
        return new Harmonic(mean, sine, cosine, omega);
    }
}
