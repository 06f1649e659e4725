package dev.filmshear.validation.analytic;

import dev.filmshear.solver.physics.WallMotion;

import java.util.function.DoubleUnaryOperator;

/**
 * A wall's velocity, less the fluid's uniform initial velocity u0, split into the pieces whose responses
 * are known in closed form (Duhamel's principle):
 * <pre>
 *   w(t) = jump + sum_k slopeChange_k max(0, t - corner_k) + amplitude sin(omega t + phase)
 * </pre>
 * A steady wall is a jump at t = 0; a ramp or a table adds a change of slope at each corner, so that each
 * piece of a piecewise-linear history is exactly a sum of steps and ramps; a sine wall is a jump to its mean
 * plus a started oscillation.
 *
 * @param jump velocity step at t = 0 (m/s): the wall's mean or initial value less u0
 * @param corners times (s) where the slope changes, increasing
 * @param slopeChanges change of slope (m/s^2) at each corner
 * @param amplitude amplitude of the oscillation (m/s); 0 for none
 * @param angularFrequency omega (rad/s) of the oscillation; 0 for none
 * @param phase phase (rad) of the oscillation
 */
record WallHistory(double jump, double[] corners, double[] slopeChanges, double amplitude, double angularFrequency,
                   double phase) {

    WallHistory {
        corners = corners.clone();
        slopeChanges = slopeChanges.clone();
    }

    /** Splits {@code motion} relative to the initial fluid velocity {@code initialVelocity} (m/s). */
    static WallHistory of(WallMotion motion, double initialVelocity) {
        if (motion instanceof WallMotion.Steady s) {
            return new WallHistory(s.velocity() - initialVelocity, new double[0], new double[0], 0, 0, 0);
        }
        if (motion instanceof WallMotion.Ramp r) {
            double slope = (r.to() - r.from()) / r.duration();
            return new WallHistory(r.from() - initialVelocity, new double[] {r.start(), r.start() + r.duration()},
                    new double[] {slope, -slope}, 0, 0, 0);
        }
        if (motion instanceof WallMotion.Table table) {
            double[] times = table.times();
            double[] values = table.values();
            int n = times.length;
            double[] changes = new double[n];
            double before = 0;
            for (int i = 0; i < n; i++) {
                double after = i < n - 1 ? (values[i + 1] - values[i]) / (times[i + 1] - times[i]) : 0;
                changes[i] = after - before;
                before = after;
            }
            return new WallHistory(values[0] - initialVelocity, times, changes, 0, 0, 0);
        }
        WallMotion.Sine sine = (WallMotion.Sine) motion;
        return new WallHistory(sine.mean() - initialVelocity, new double[0], new double[0], sine.amplitude(),
                sine.angularFrequency(), sine.phase());
    }

    /** True when the history has an oscillating part. */
    boolean oscillates() {
        return amplitude != 0;
    }

    /** The piecewise-linear part without the jump: sum_k slopeChange_k max(0, t - corner_k) (m/s). */
    double rampPart(double t) {
        return sumOverCorners(t, elapsed -> elapsed);
    }

    /**
     * sum_k slopeChange_k response(t - corner_k) over the corners passed by time {@code t}: the response to
     * the piecewise-linear part, given the response to a unit ramp started at 0.
     */
    double sumOverCorners(double t, DoubleUnaryOperator rampResponse) {
        double sum = 0;
        for (int k = 0; k < corners.length && corners[k] < t; k++) {
            sum += slopeChanges[k] * rampResponse.applyAsDouble(t - corners[k]);
        }
        return sum;
    }

    @Override
    public double[] corners() {
        return corners.clone();
    }

    @Override
    public double[] slopeChanges() {
        return slopeChanges.clone();
    }
}
