package dev.filmshear.validation.analytic;

/**
 * An exact solution of the steady film equations: it holds only at t = +infinity (the time stamp of a steady
 * solver's snapshot), and its time-dependent accessors answer with the steady profile and wall stresses.
 */
interface SteadySolution extends AnalyticSolution {
    /** The phrase of the time check's message: what times the solution holds at. */
    String STEADY_TIME = "+infinity (a steady solution)";

    /** Velocity (m/s) at height {@code y} (m). */
    double velocity(double y);

    /** mu du/dy (Pa) at the lower wall. */
    double wallShearStressLower();

    /** mu du/dy (Pa) at the upper wall. */
    double wallShearStressUpper();

    /** Temperature (K) at height {@code y} (m); solutions with a temperature field override this. */
    default double temperature(double y) {
        throw new UnsupportedOperationException(name() + " has no temperature field");
    }

    /** Only the steady state, t = +infinity. */
    @Override
    default boolean appliesAt(double t) {
        return t == Double.POSITIVE_INFINITY;
    }

    @Override
    default double velocity(double y, double t) {
        Checks.time(appliesAt(t), t, STEADY_TIME);
        return velocity(y);
    }

    @Override
    default double temperature(double y, double t) {
        Checks.time(appliesAt(t), t, STEADY_TIME);
        return temperature(y);
    }

    @Override
    default double wallShearStressLower(double t) {
        Checks.time(appliesAt(t), t, STEADY_TIME);
        return wallShearStressLower();
    }

    @Override
    default double wallShearStressUpper(double t) {
        Checks.time(appliesAt(t), t, STEADY_TIME);
        return wallShearStressUpper();
    }
}
