package dev.filmshear.validation.analytic;

/**
 * An exact solution of the film equations that a solver run can be compared with.
 *
 * <p>Positions y (m) are measured from the lower wall; times t (s) from the start of the case, with
 * t = +infinity meaning the steady state (the time stamp of a steady solver's snapshot). Wall shear
 * stresses are mu du/dy at the wall (Pa), with the same sign convention at both walls, as in the solver's
 * results.
 */
public interface AnalyticSolution {

    /** A short physical name of the problem, for tables and plot legends. */
    String name();

    /** The published source of the formula, as a citation. */
    String source();

    /**
     * True when the solution is defined at time {@code t} (s): times above zero for a transient solution,
     * +infinity for a steady one (and for a transient one that settles).
     */
    boolean appliesAt(double t);

    /** Velocity (m/s) at height {@code y} (m) and time {@code t} (s). */
    double velocity(double y, double t);

    /** True when the solution includes a temperature field. */
    default boolean hasTemperature() {
        return false;
    }

    /**
     * Temperature (K) at height {@code y} (m) and time {@code t} (s).
     *
     * @throws UnsupportedOperationException when {@link #hasTemperature()} is false
     */
    default double temperature(double y, double t) {
        throw new UnsupportedOperationException(name() + " has no temperature field");
    }

    /** mu du/dy (Pa) at the lower wall at time {@code t} (s). */
    double wallShearStressLower(double t);

    /** True when the film has an upper wall (false for a semi-infinite fluid). */
    default boolean hasUpperWall() {
        return true;
    }

    /** mu du/dy (Pa) at the upper wall at time {@code t} (s); NaN when {@link #hasUpperWall()} is false. */
    double wallShearStressUpper(double t);
}
