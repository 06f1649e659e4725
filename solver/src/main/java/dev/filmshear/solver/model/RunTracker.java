package dev.filmshear.solver.model;

import dev.filmshear.solver.physics.FilmPhysics;
import dev.filmshear.solver.physics.WallMotion;

import java.util.Arrays;

/**
 * Follows a run at every accepted step for the numbers that need the whole history whether or not every
 * step is recorded: the hottest and coldest film temperatures reached, the fastest wall speed, and a driven
 * wall's speed over time (for its rise and coast-down times).
 */
final class RunTracker implements FilmObserver {
    private final int drivenWall;
    private double maxTemperature = Double.NEGATIVE_INFINITY;
    private double minTemperature = Double.POSITIVE_INFINITY;
    private double maxSpeed;
    private double[] times = new double[256];
    private double[] speeds = new double[256];
    private int samples;
    private double[] shearTimes = new double[256];
    private double[] shears = new double[256];
    private int shearSamples;

    /** @param physics the case's physics, to know which wall (if any) is driven */
    RunTracker(FilmPhysics physics) {
        if (physics.lower().motion() instanceof WallMotion.Driven) {
            drivenWall = 0;
        } else if (physics.upper() != null && physics.upper().motion() instanceof WallMotion.Driven) {
            drivenWall = 1;
        } else {
            drivenWall = -1;
        }
    }

    @Override
    public void onStep(FilmState s) {
        for (int i = 0; i < s.points(); i++) {
            double t = s.temperature(i);
            maxTemperature = Math.max(maxTemperature, t);
            minTemperature = Math.min(minTemperature, t);
        }
        maxSpeed = Math.max(maxSpeed, Math.max(Math.abs(s.lowerWallVelocity()), Math.abs(s.upperWallVelocity())));
        if (s.steps() > 0) {
            if (shearSamples == shearTimes.length) {
                shearTimes = Arrays.copyOf(shearTimes, 2 * shearSamples);
                shears = Arrays.copyOf(shears, 2 * shearSamples);
            }
            double upper = s.wallShearStressUpper();
            shearTimes[shearSamples] = s.time();
            shears[shearSamples] = Double.isNaN(upper) ? s.wallShearStressLower() : upper;
            shearSamples++;
        }
        if (drivenWall >= 0) {
            if (samples == times.length) {
                times = Arrays.copyOf(times, 2 * samples);
                speeds = Arrays.copyOf(speeds, 2 * samples);
            }
            times[samples] = s.time();
            speeds[samples] = drivenWall == 0 ? s.lowerWallVelocity() : s.upperWallVelocity();
            samples++;
        }
    }

    double maxTemperature() {
        return maxTemperature;
    }

    double minTemperature() {
        return minTemperature;
    }

    double maxSpeed() {
        return maxSpeed;
    }

    /** The time the driven wall's speed first reached 99 % of its final speed, NaN when it did not rise. */
    double speedRiseTime() {
        if (samples < 2) {
            return Double.NaN;
        }
        double initial = speeds[0];
        double last = speeds[samples - 1];
        if (!(Math.abs(last) > Math.abs(initial))) {
            return Double.NaN;
        }
        return crossing(0.99 * last);
    }

    /** The time the driven wall's speed first fell to {@code fraction} of its initial speed, NaN when it did not. */
    double coastDownTime(double fraction) {
        if (samples < 2 || !(Math.abs(speeds[samples - 1]) < Math.abs(speeds[0]))) {
            return Double.NaN;
        }
        return crossing(fraction * speeds[0]);
    }

    /**
     * The time after which the wall shear stress (at the upper wall, or the lower of a semi-infinite film)
     * stays within {@code fraction} of its final value: the last step at which it was farther away. NaN
     * before any step; 0 when it never left the band.
     */
    double settleTime(double fraction) {
        if (shearSamples == 0) {
            return Double.NaN;
        }
        double last = shears[shearSamples - 1];
        double band = fraction * Math.abs(last);
        for (int k = shearSamples - 1; k >= 0; k--) {
            if (Math.abs(shears[k] - last) > band) {
                return k + 1 < shearSamples ? shearTimes[k + 1] : shearTimes[k];
            }
        }
        return shearTimes[0];
    }

    /** First time the speed passes {@code level}, interpolated linearly between steps; NaN when it never does. */
    private double crossing(double level) {
        double sign = Math.signum(speeds[0] - level);
        for (int k = 1; k < samples; k++) {
            if (Math.signum(speeds[k] - level) != sign || speeds[k] == level) {
                double w = (level - speeds[k - 1]) / (speeds[k] - speeds[k - 1]);
                return times[k - 1] + w * (times[k] - times[k - 1]);
            }
        }
        return Double.NaN;
    }
}
