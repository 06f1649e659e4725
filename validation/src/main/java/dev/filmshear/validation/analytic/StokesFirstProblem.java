package dev.filmshear.validation.analytic;

import dev.filmshear.solver.base.InvalidParameterException;
import dev.filmshear.solver.physics.WallMotion;
import org.apache.commons.math3.special.Erf;

import java.util.Objects;

/**
 * Stokes' first problem, generalised: fluid of constant density rho and viscosity mu (nu = mu/rho) above a
 * wall y = 0, without bound, uniform initial velocity u0, the wall moving with a piecewise-linear history
 * a(t) (steady: an impulsive start; ramp; table):
 * <pre>
 *   du/dt = nu d2u/dy2,   u(0, t) = a(t),   u(y, 0) = u0,   u -&gt; u0 as y -&gt; infinity.
 * </pre>
 * For an impulsive start by U (R. B. Bird, W. E. Stewart and E. N. Lightfoot, <i>Transport Phenomena</i>,
 * 2nd ed., 2002, Example 4.1-1; H. Schlichting and K. Gersten, <i>Boundary-Layer Theory</i>, ch. 5), with
 * z = y / (2 sqrt(nu t)),
 * <pre>
 *   u - u0 = U erfc(z),            mu du/dy (0) = -mu U / sqrt(pi nu t).
 * </pre>
 * For a wall whose velocity rises at s (m/s^2) from t = 0, the time integral of the step response
 * (integral_0^t erfc(y / (2 sqrt(nu sigma))) d sigma = 4 t i2erfc(z); H. S. Carslaw and J. C. Jaeger,
 * <i>Conduction of Heat in Solids</i>, 2nd ed., 1959, §2.5):
 * <pre>
 *   u - u0 = 4 s t i2erfc(z),      mu du/dy (0) = -2 mu s sqrt(t / (pi nu)),
 *   i2erfc(z) = [(1 + 2 z^2) erfc(z) - (2/sqrt(pi)) z exp(-z^2)] / 4.
 * </pre>
 * A piecewise-linear history w(t) = a(t) - u0 = jump + sum_k s_k max(0, t - t_k) is the sum of one step and
 * one ramp per change of slope (Duhamel's principle).
 */
public final class StokesFirstProblem implements SemiInfiniteSolution {
    private final double density;
    private final double viscosity;
    private final WallMotion wallMotion;
    private final double initialVelocity;
    private final WallHistory wall;
    private final double nu;

    /**
     * @param density rho (kg/m^3)
     * @param viscosity mu (Pa s)
     * @param wallMotion a steady, ramp or table history of the wall (an oscillation is {@link StokesSecondProblem})
     * @param initialVelocity u0 (m/s), also the velocity far from the wall
     */
    public StokesFirstProblem(double density, double viscosity, WallMotion wallMotion, double initialVelocity) {
        this.density = InvalidParameterException.requirePositive("density", density, "kg/m^3");
        this.viscosity = InvalidParameterException.requirePositive("viscosity", viscosity, "Pa*s");
        this.wallMotion = Objects.requireNonNull(wallMotion, "wallMotion");
        if (wallMotion instanceof WallMotion.Sine) {
            throw new InvalidParameterException("velocity", "sine", "a steady, ramp or table wall velocity "
                    + "(an oscillating wall is Stokes' second problem)");
        }
        this.initialVelocity = InvalidParameterException.requireFinite("velocity", initialVelocity, "m/s");
        this.wall = WallHistory.of(wallMotion, initialVelocity);
        this.nu = viscosity / density;
    }

    /**
     * The similarity variable z = y / (2 sqrt(nu t)) at which an impulsive start has reached the fraction
     * {@code fraction} of the wall velocity: erfc(z) = fraction.
     */
    public static double similarityDepth(double fraction) {
        if (!(fraction > 0 && fraction < 1)) {
            throw new InvalidParameterException("fraction", Double.toString(fraction), "between 0 and 1");
        }
        return Erf.erfcInv(fraction);
    }

    /**
     * The depth (m) at which an impulsive start has reached {@code fraction} of the wall velocity at time
     * {@code t} (s): 2 sqrt(nu t) erfcinv(fraction); fraction 0.01 gives delta99 = 3.6428 sqrt(nu t).
     */
    public static double depthOfFraction(double kinematicViscosity, double t, double fraction) {
        InvalidParameterException.requirePositive("kinematic_viscosity", kinematicViscosity, "m^2/s");
        InvalidParameterException.requirePositive("time", t, "s");
        return 2 * Math.sqrt(kinematicViscosity * t) * similarityDepth(fraction);
    }

    /** The kinematic viscosity nu = mu/rho (m^2/s). */
    public double kinematicViscosity() {
        return nu;
    }

    @Override
    public double velocity(double y, double t) {
        checkTime(t);
        Checks.aboveWall(y);
        return initialVelocity + wall.jump() * Erf.erfc(z(y, t))
                + wall.sumOverCorners(t, elapsed -> 4 * elapsed * RepeatedErfc.of(2, z(y, elapsed)));
    }

    /** mu du/dy (Pa) at the wall at time {@code t} (s). */
    public double wallShearStress(double t) {
        checkTime(t);
        double slope = -wall.jump() / Math.sqrt(Math.PI * nu * t)
                - wall.sumOverCorners(t, elapsed -> 2 * Math.sqrt(elapsed / (Math.PI * nu)));
        return viscosity * slope;
    }

    @Override
    public String name() {
        return "Stokes' first problem (wall started in semi-infinite fluid)";
    }

    @Override
    public String source() {
        return "R. B. Bird, W. E. Stewart, E. N. Lightfoot, Transport Phenomena, 2nd ed., Wiley, 2002, Example 4.1-1; "
                + "ramps by Duhamel's principle (H. S. Carslaw, J. C. Jaeger, Conduction of Heat in Solids, 2nd ed., "
                + "1959, section 2.5)";
    }

    private void checkTime(double t) {
        Checks.time(appliesAt(t), t, "above 0 s and finite (a semi-infinite layer never settles)");
    }

    private double z(double y, double elapsed) {
        return y / (2 * Math.sqrt(nu * elapsed));
    }

    /** The wall's velocity history. */
    public WallMotion wallMotion() {
        return wallMotion;
    }

    /** The density rho (kg/m^3). */
    public double density() {
        return density;
    }
}
