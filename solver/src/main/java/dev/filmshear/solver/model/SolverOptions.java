package dev.filmshear.solver.model;

import dev.filmshear.solver.time.DirkScheme;
import dev.filmshear.solver.time.StepControl;

import java.util.Objects;

/**
 * Numerical choices that are not part of a case: the time scheme and, for studies, a step control that
 * replaces the case's tolerance.
 *
 * @param scheme the Runge–Kutta scheme
 * @param stepControl the step control, or null to use adaptive steps at the case's tolerance
 * @param recordSteps true to keep one history row per accepted step; false keeps only the output times
 */
public record SolverOptions(DirkScheme scheme, StepControl stepControl, boolean recordSteps) {

    public SolverOptions {
        Objects.requireNonNull(scheme, "scheme");
    }

    /** TR-BDF2, adaptive at the case's tolerance, every step recorded. */
    public static SolverOptions defaults() {
        return new SolverOptions(DirkScheme.TR_BDF2, null, true);
    }

    /** A copy with another scheme. */
    public SolverOptions withScheme(DirkScheme newScheme) {
        return new SolverOptions(newScheme, stepControl, recordSteps);
    }

    /** A copy with another step control. */
    public SolverOptions withStepControl(StepControl newControl) {
        return new SolverOptions(scheme, newControl, recordSteps);
    }

    /** A copy that records only the output times (for sweeps and benchmarks). */
    public SolverOptions outputTimesOnly() {
        return new SolverOptions(scheme, stepControl, false);
    }
}
