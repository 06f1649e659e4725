package dev.filmshear.solver.time;

import dev.filmshear.solver.base.InvalidParameterException;

/** How the integrator chooses its step sizes. */
public sealed interface StepControl permits StepControl.Adaptive, StepControl.Fixed {

    /**
     * Steps chosen from the embedded error estimate so that the local error stays at the tolerance.
     *
     * @param tolerance relative accuracy target of each step, above zero
     * @param initialStep first step to try (s), or NaN to let the integrator choose
     * @param maxStep largest step (s)
     */
    record Adaptive(double tolerance, double initialStep, double maxStep) implements StepControl {
        public Adaptive {
            if (!(tolerance > 0 && tolerance < 1)) {
                throw new InvalidParameterException("tolerance", Double.toString(tolerance), "between 0 and 1");
            }
            if (!(maxStep > 0)) {
                throw new InvalidParameterException("max_step", Double.toString(maxStep), "above zero");
            }
        }

        /** Adaptive steps at a tolerance, first step and largest step chosen by the integrator. */
        public static Adaptive of(double tolerance) {
            return new Adaptive(tolerance, Double.NaN, Double.POSITIVE_INFINITY);
        }
    }

    /**
     * Equal steps (shortened only to land on a requested time); for convergence studies.
     *
     * @param step s
     * @param newtonTolerance accuracy target of the Newton iterations
     */
    record Fixed(double step, double newtonTolerance) implements StepControl {
        public Fixed {
            InvalidParameterException.requirePositive("step", step, "s");
            InvalidParameterException.requirePositive("newton_tolerance", newtonTolerance, "");
        }

        /** Equal steps with Newton iterations converged to 1e-10. */
        public static Fixed of(double step) {
            return new Fixed(step, 1e-10);
        }
    }
}
