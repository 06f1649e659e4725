package dev.filmshear.cli.input;

import dev.filmshear.solver.base.InvalidParameterException;
import dev.filmshear.solver.physics.WallMotion;

import java.util.Objects;

/**
 * A concentric journal bearing seen as a film: the shaft surface is the upper wall, the bearing bore the
 * lower wall, and the radial clearance the gap. The unrolled film is valid while the clearance is small
 * against the radius (the curvature terms are of order clearance / radius).
 *
 * <p>The shaft surface moves at U(t) = pi * diameter * n(t) with n the rotational speed in rev/s; the
 * friction torque of the report is then tau_wall * (pi * diameter * length) * diameter / 2.
 *
 * @param diameter shaft diameter (m)
 * @param length bearing length (m)
 * @param radialClearance radial clearance (m), the film thickness; below the radius
 * @param speed rotational speed history in rev/s (the values of the motion are rev/s, not m/s)
 */
public record JournalSpec(double diameter, double length, double radialClearance, WallMotion speed) {

    public JournalSpec {
        InvalidParameterException.requirePositive("diameter", diameter, "m");
        InvalidParameterException.requirePositive("length", length, "m");
        InvalidParameterException.requirePositive("radial_clearance", radialClearance, "m");
        if (!(radialClearance < diameter / 2)) {
            throw new InvalidParameterException("radial_clearance", radialClearance + " m",
                    "less than the radius " + diameter / 2 + " m (and much less for a thin film)");
        }
        Objects.requireNonNull(speed, "speed");
    }

    /** Shaft radius (m). */
    public double radius() {
        return diameter / 2;
    }

    /** Distance the shaft surface travels per revolution, pi * diameter (m). */
    public double circumference() {
        return Math.PI * diameter;
    }

    /** The shaft surface's velocity history (m/s): every velocity of {@link #speed()} times pi * diameter. */
    public WallMotion shaftMotion() {
        return scale(speed, circumference());
    }

    /** A motion with every velocity multiplied by {@code factor} and its times unchanged. */
    static WallMotion scale(WallMotion motion, double factor) {
        if (motion instanceof WallMotion.Driven d) {
            return d; // a driven shaft is built in surface units already (CaseReader.drivenJournal)
        }
        if (motion instanceof WallMotion.Steady s) {
            return new WallMotion.Steady(s.velocity() * factor);
        }
        if (motion instanceof WallMotion.Ramp r) {
            return new WallMotion.Ramp(r.from() * factor, r.to() * factor, r.start(), r.duration());
        }
        if (motion instanceof WallMotion.Sine s) {
            return new WallMotion.Sine(s.mean() * factor, s.amplitude() * factor, s.frequency(), s.phase());
        }
        WallMotion.Table t = (WallMotion.Table) motion;
        double[] values = t.values();
        for (int i = 0; i < values.length; i++) {
            values[i] *= factor;
        }
        return new WallMotion.Table(t.times(), values);
    }
}
