package dev.filmshear.solver.physics;

/**
 * A volumetric source term added to one of the film equations: a body force per unit volume (N/m^3)
 * in the momentum equation or a heat release per unit volume (W/m^3) in the energy equation.
 *
 * <p>Physical films rarely need one beyond the pressure gradient; its main use is the method of
 * manufactured solutions, which adds the source that makes a chosen field an exact solution.
 */
@FunctionalInterface
public interface VolumeSource {

    /** Source per unit volume at position {@code y} (m) and time {@code t} (s). */
    double value(double y, double t);
}
