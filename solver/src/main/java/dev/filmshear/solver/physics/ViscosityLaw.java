package dev.filmshear.solver.physics;

/**
 * Dynamic viscosity as a function of temperature, mu(T) in Pa s with T in K.
 *
 * <p>A law is a small immutable value. It knows its derivative (for Newton's method), the temperature
 * range over which its parameters were fitted or published (outside it, results carry a warning), and
 * how to describe itself. Every implementation must pass the shared viscosity-law contract test:
 * positive and finite over its range, monotone where it claims to be, derivative equal to a finite
 * difference of the value.
 *
 * <p>To add a law: write one record implementing this interface, whose compact constructor rejects bad
 * parameters; register it in the case reader's law table; add it to the contract test.
 */
public interface ViscosityLaw {

    /** The law's key as written in a case file (for example {@code "vogel"}). */
    String name();

    /** Dynamic viscosity (Pa s) at temperature {@code temperature} (K). */
    double mu(double temperature);

    /** Derivative d mu / dT (Pa s / K) at temperature {@code temperature} (K). */
    double dMuDT(double temperature);

    /**
     * Derivative d mu / dT (Pa s / K) when mu at this temperature is already known. Laws of exponential
     * form override this to avoid a second exponential; the result must equal {@link #dMuDT(double)}.
     */
    default double dMuDT(double temperature, double mu) {
        return dMuDT(temperature);
    }

    /** Lowest temperature (K) of the law's stated validity range. */
    double validFrom();

    /** Highest temperature (K) of the law's stated validity range. */
    double validTo();

    /** True when mu does not change with temperature (the energy equation then does not feed back). */
    default boolean isConstant() {
        return false;
    }

    /** The law with its parameters, in SI units, on one line. */
    String describe();

    /** True when {@code temperature} lies inside the validity range. */
    default boolean isValidAt(double temperature) {
        return temperature >= validFrom() && temperature <= validTo();
    }
}
