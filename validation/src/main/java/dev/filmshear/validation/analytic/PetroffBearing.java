package dev.filmshear.validation.analytic;

import dev.filmshear.solver.base.InvalidParameterException;

/**
 * Petroff's equation for a lightly loaded, concentric journal bearing: a full film of viscosity mu in the
 * radial clearance c, sheared in laminar Couette flow by a journal of radius r and length L turning at N rev/s
 * (omega = 2 pi N), with no pressure contribution to the torque:
 * <pre>
 *   tau = mu (2 pi r N) / c                       (on the area 2 pi r L)
 *   T_f = 4 pi^2 mu N L r^3 / c = 2 pi mu omega r^3 L / c
 *   P_loss = 2 pi N T_f = 8 pi^3 mu N^2 L r^3 / c
 *   f = T_f / (W r) = 2 pi^2 (mu N / P) (r / c),   P = W / (2 r L)
 * </pre>
 * Sources: N. P. Petrov (Petroff), 1883; R. G. Budynas and J. K. Nisbett, <i>Shigley's Mechanical Engineering
 * Design</i>, ch. 12, §12-4 "Petroff's Equation", Eq. (12-6) (equation number from memory).
 *
 * @param radius r (m)
 * @param length L (m)
 * @param clearance radial clearance c (m)
 * @param viscosity mu (Pa s)
 * @param speed N (rev/s)
 */
public record PetroffBearing(double radius, double length, double clearance, double viscosity, double speed) {

    public PetroffBearing {
        InvalidParameterException.requirePositive("radius", radius, "m");
        InvalidParameterException.requirePositive("length", length, "m");
        InvalidParameterException.requirePositive("radial_clearance", clearance, "m");
        InvalidParameterException.requirePositive("viscosity", viscosity, "Pa*s");
        InvalidParameterException.requireFinite("speed", speed, "rev/s");
        if (!(clearance < radius)) {
            throw new InvalidParameterException("radial_clearance", clearance + " m", "less than the radius "
                    + radius + " m");
        }
    }

    /** omega = 2 pi N (rad/s). */
    public double angularSpeed() {
        return 2 * Math.PI * speed;
    }

    /** Journal surface speed 2 pi r N (m/s). */
    public double surfaceSpeed() {
        return angularSpeed() * radius;
    }

    /** Film shear stress mu (2 pi r N)/c (Pa). */
    public double shearStress() {
        return viscosity * surfaceSpeed() / clearance;
    }

    /** Friction torque T_f = 4 pi^2 mu N L r^3 / c (N m). */
    public double frictionTorque() {
        return shearStress() * 2 * Math.PI * radius * length * radius;
    }

    /** Power lost in the film, 2 pi N T_f (W). */
    public double powerLoss() {
        return angularSpeed() * frictionTorque();
    }

    /** Load per unit projected area P = W / (2 r L) (Pa) for the radial load {@code load} (N). */
    public double unitLoad(double load) {
        InvalidParameterException.requirePositive("load", load, "N");
        return load / (2 * radius * length);
    }

    /** Friction coefficient f = T_f / (W r) = 2 pi^2 (mu N / P)(r / c) under the radial load {@code load} (N). */
    public double frictionCoefficient(double load) {
        InvalidParameterException.requirePositive("load", load, "N");
        return frictionTorque() / (load * radius);
    }
}
