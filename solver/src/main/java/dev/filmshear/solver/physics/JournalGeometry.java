package dev.filmshear.solver.physics;

import dev.filmshear.solver.base.InvalidParameterException;

/**
 * A concentric journal bearing seen as an unwrapped film: the gap is the radial clearance, the upper wall
 * is the shaft surface moving at pi D N, and the film's area is pi D L. Used to turn the film's wall shear
 * stress into a friction torque and power, and to judge whether the unwrapped-film model holds (curvature,
 * Taylor vortices).
 *
 * @param diameter journal diameter D (m)
 * @param length bearing length L (m)
 */
public record JournalGeometry(double diameter, double length) {

    public JournalGeometry {
        InvalidParameterException.requirePositive("diameter", diameter, "m");
        InvalidParameterException.requirePositive("length", length, "m");
    }

    /** Journal radius R = D / 2 (m). */
    public double radius() {
        return diameter / 2;
    }

    /** Film area pi D L (m^2). */
    public double area() {
        return Math.PI * diameter * length;
    }

    /** Shaft surface speed (m/s) at rotational speed {@code revolutionsPerSecond}. */
    public double surfaceSpeed(double revolutionsPerSecond) {
        return Math.PI * diameter * revolutionsPerSecond;
    }
}
