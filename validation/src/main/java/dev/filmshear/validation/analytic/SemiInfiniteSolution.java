package dev.filmshear.validation.analytic;

/**
 * An exact solution for one wall under a semi-infinite fluid: it holds at every finite time after the start
 * (the layer never settles), and its only wall is the lower one.
 */
interface SemiInfiniteSolution extends AnalyticSolution {

    /** mu du/dy (Pa) at the wall at time {@code t} (s). */
    double wallShearStress(double t);

    /** Finite times above zero: the layer never settles. */
    @Override
    default boolean appliesAt(double t) {
        return t > 0 && t < Double.POSITIVE_INFINITY;
    }

    @Override
    default double wallShearStressLower(double t) {
        return wallShearStress(t);
    }

    @Override
    default boolean hasUpperWall() {
        return false;
    }

    /** NaN: a semi-infinite fluid has no upper wall. */
    @Override
    default double wallShearStressUpper(double t) {
        return Double.NaN;
    }
}
