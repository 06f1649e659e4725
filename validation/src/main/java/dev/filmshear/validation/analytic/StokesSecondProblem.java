package dev.filmshear.validation.analytic;

import dev.filmshear.solver.base.InvalidParameterException;
import dev.filmshear.solver.physics.WallMotion;
import org.apache.commons.math3.special.Erf;

import java.util.Objects;
import java.util.function.DoubleUnaryOperator;

/**
 * Stokes' second problem: fluid of constant density rho and viscosity mu (nu = mu/rho) above a wall y = 0,
 * without bound, the wall moving at a(t) = m + A sin(omega t + phase).
 *
 * <p><b>Periodic solution</b> (L. D. Landau and E. M. Lifshitz, <i>Fluid Mechanics</i>, 2nd ed., 1987, §24),
 * with the penetration depth delta = sqrt(2 nu / omega):
 * <pre>
 *   u = m + A exp(-y/delta) sin(omega t + phase - y/delta)
 *   mu du/dy (0) = -mu A sqrt(omega/nu) sin(omega t + phase + pi/4)
 * </pre>
 * The amplitude falls to 1 % at ln(100) delta; the force the fluid exerts on the plate, +mu du/dy (0), opposes
 * the plate and its negative leads the plate velocity by 45 degrees; the mean power per unit area the plate
 * supplies is mu A^2 sqrt(omega/nu) / (2 sqrt 2).
 *
 * <p><b>Started solution</b>: the plate starts at t = 0 in fluid at a uniform velocity u0. By Duhamel's
 * principle on the step response erfc(y / (2 sqrt(nu sigma))) (Stokes' first problem),
 * <pre>
 *   u - u0 = (m - u0) erfc(y/(2 sqrt(nu t))) + A sin(phase) erfc(y/(2 sqrt(nu t)))
 *            + A omega integral_0^t cos(omega (t - sigma) + phase) erfc(y/(2 sqrt(nu sigma))) d sigma
 *   mu du/dy (0) = -mu (m - u0 + A sin(phase)) / sqrt(pi nu t)
 *            - (2 mu A omega / sqrt(pi nu)) integral_0^sqrt(t) cos(omega (t - rho^2) + phase) d rho
 * </pre>
 * (the wall-stress kernel's singularity sigma^(-1/2) is removed by sigma = rho^2), integrated with Commons Math
 * quadrature ({@code SineDuhamel}). Its cost grows with the number of periods, so from omega t = 2 pi on the
 * same solution is taken as the periodic one plus the transient written as a Fourier sine integral over the
 * wavenumber k (from the sine transform of the diffusion equation, U_t = nu (k a(t) - k^2 U)), with
 * Y = y / sqrt(nu t) and Omega = omega t:
 * <pre>
 *   transient         = -(2A/pi) integral_0^inf q sin(qY) exp(-q^2) F(q) dq
 *   d transient/dy(0) = -(2A/(pi sqrt(nu t))) integral_0^inf q^2 exp(-q^2) F(q) dq
 *   F(q)              = (q^2 sin(phase) - Omega cos(phase)) / (q^4 + Omega^2)
 * </pre>
 * whose integrands are smooth and cut off by exp(-q^2), so the cost does not grow with t. The two forms are
 * compared in the tests where both apply. The started solution tends to the periodic one as t grows; the
 * oscillating part of the difference decays like t^(-3/2), the mean's like t^(-1/2).
 */
public final class StokesSecondProblem implements SemiInfiniteSolution {
    /** From this wall phase omega t (one period) on, the started oscillation uses the spectral transient. */
    static final double SPECTRAL_FROM_PHASE = 2 * Math.PI;
    /** The spectral integrands carry exp(-q^2); beyond q = 9 they are below 1e-35 of their peak. */
    private static final double WAVENUMBER_CUTOFF = 9;
    /** Widest piece of the wavenumber integral, and at most a quarter wave of sin(qY). */
    private static final double WAVENUMBER_PIECE = 0.5;
    /** Accuracy of the wavenumber integral relative to the integral of its magnitude. */
    private static final double SPECTRAL_ACCURACY = 1e-13;

    /** How the started oscillation is evaluated. */
    enum Form {
        /** Duhamel's integral over time, for the first period. */
        DUHAMEL,
        /** Periodic solution plus the wavenumber integral of the transient, after it. */
        SPECTRAL
    }

    private final double density;
    private final double viscosity;
    private final WallMotion.Sine wallMotion;
    private final double initialVelocity;
    private final double nu;
    private final double omega;

    /**
     * @param density rho (kg/m^3)
     * @param viscosity mu (Pa s)
     * @param wallMotion the plate's oscillation
     * @param initialVelocity u0 (m/s) of the fluid when the plate starts, also the velocity far from it
     */
    public StokesSecondProblem(double density, double viscosity, WallMotion.Sine wallMotion, double initialVelocity) {
        this.density = InvalidParameterException.requirePositive("density", density, "kg/m^3");
        this.viscosity = InvalidParameterException.requirePositive("viscosity", viscosity, "Pa*s");
        this.wallMotion = Objects.requireNonNull(wallMotion, "wallMotion");
        this.initialVelocity = InvalidParameterException.requireFinite("velocity", initialVelocity, "m/s");
        this.nu = viscosity / density;
        this.omega = wallMotion.angularFrequency();
    }

    /** The penetration depth delta = sqrt(2 nu / omega) (m). */
    public double penetrationDepth() {
        return Math.sqrt(2 * nu / omega);
    }

    /** The depth (m) at which the oscillation's amplitude has fallen to 1 %: ln(100) delta. */
    public double onePercentDepth() {
        return Math.log(100) * penetrationDepth();
    }

    /** sqrt(omega / nu) (1/m): the wall-stress amplitude is mu A sqrt(omega/nu). */
    public double stressWavenumber() {
        return Math.sqrt(omega / nu);
    }

    /** Amplitude (Pa) of the periodic wall shear stress: mu |A| sqrt(omega/nu) = rho |A| sqrt(nu omega). */
    public double wallShearStressAmplitude() {
        return viscosity * Math.abs(wallMotion.amplitude()) * stressWavenumber();
    }

    /** Mean power per unit area (W/m^2) the plate supplies in the periodic state: mu A^2 sqrt(omega/nu)/(2 sqrt 2). */
    public double meanPowerPerArea() {
        double a = wallMotion.amplitude();
        return viscosity * a * a * stressWavenumber() / (2 * Math.sqrt(2));
    }

    /** Velocity (m/s) of the periodic solution at depth {@code y} (m) and time {@code t} (s). */
    public double periodicVelocity(double y, double t) {
        Checks.aboveWall(y);
        double delta = penetrationDepth();
        return wallMotion.mean()
                + wallMotion.amplitude() * Math.exp(-y / delta) * Math.sin(omega * t + wallMotion.phase() - y / delta);
    }

    /** mu du/dy (Pa) at the wall in the periodic solution at time {@code t} (s). */
    public double periodicWallShearStress(double t) {
        return -viscosity * wallMotion.amplitude() * stressWavenumber()
                * Math.sin(omega * t + wallMotion.phase() + Math.PI / 4);
    }

    /** Velocity (m/s) of the started solution at depth {@code y} (m) and time {@code t} (s). */
    @Override
    public double velocity(double y, double t) {
        checkTime(t);
        Checks.aboveWall(y);
        return velocity(y, t, formAt(t));
    }

    /** mu du/dy (Pa) at the wall in the started solution at time {@code t} (s). */
    public double wallShearStress(double t) {
        checkTime(t);
        return wallShearStress(t, formAt(t));
    }

    private Form formAt(double t) {
        return omega * t < SPECTRAL_FROM_PHASE ? Form.DUHAMEL : Form.SPECTRAL;
    }

    /** The started velocity evaluated in the given form. */
    double velocity(double y, double t, Form form) {
        double step = (wallMotion.mean() - initialVelocity) * Erf.erfc(y / (2 * Math.sqrt(nu * t)));
        double amplitude = wallMotion.amplitude();
        double phase = wallMotion.phase();
        double oscillation;
        if (form == Form.DUHAMEL) {
            // the step response at depth y starts to rise near sigma = y^2 / (4 nu)
            oscillation = SineDuhamel.response(sigma -> Erf.erfc(y / (2 * Math.sqrt(nu * sigma))), y * y / (4 * nu),
                    amplitude, omega, phase, t);
        } else {
            double depth = y / Math.sqrt(nu * t);
            oscillation = periodicVelocity(y, t) - wallMotion.mean()
                    - 2 * amplitude / Math.PI * spectralTransient(q -> q * Math.sin(q * depth), depth, t);
        }
        return initialVelocity + step + oscillation;
    }

    /** The started wall shear stress evaluated in the given form. */
    double wallShearStress(double t, Form form) {
        double step = -(wallMotion.mean() - initialVelocity) / Math.sqrt(Math.PI * nu * t);
        double amplitude = wallMotion.amplitude();
        double oscillation;
        if (form == Form.DUHAMEL) {
            oscillation = SineDuhamel.response(sigma -> -1 / Math.sqrt(Math.PI * nu * sigma), 0,
                    amplitude, omega, wallMotion.phase(), t);
        } else {
            oscillation = periodicWallShearStress(t) / viscosity
                    - 2 * amplitude / (Math.PI * Math.sqrt(nu * t)) * spectralTransient(q -> q * q, 0, t);
        }
        return viscosity * (step + oscillation);
    }

    /**
     * integral_0^inf g(q) exp(-q^2) (q^2 sin(phase) - Omega cos(phase)) / (q^4 + Omega^2) dq, Omega = omega t,
     * for g(q) = q sin(qY) (velocity at Y = y/sqrt(nu t)) or q^2 (wall slope).
     */
    private double spectralTransient(DoubleUnaryOperator g, double depth, double t) {
        double bigOmega = omega * t;
        double sin = Math.sin(wallMotion.phase());
        double cos = Math.cos(wallMotion.phase());
        double width = depth > 0 ? Math.min(WAVENUMBER_PIECE, Math.PI / (2 * depth)) : WAVENUMBER_PIECE;
        int pieces = (int) Math.ceil(WAVENUMBER_CUTOFF / width);
        double[] breaks = new double[pieces + 1];
        for (int i = 0; i <= pieces; i++) {
            breaks[i] = WAVENUMBER_CUTOFF * i / pieces;
        }
        return PiecewiseQuadrature.integrate(q -> {
            double q2 = q * q;
            return g.applyAsDouble(q) * Math.exp(-q2) * (q2 * sin - bigOmega * cos) / (q2 * q2 + bigOmega * bigOmega);
        }, breaks, SPECTRAL_ACCURACY);
    }

    @Override
    public String name() {
        return "Stokes' second problem (plate started oscillating in semi-infinite fluid)";
    }

    @Override
    public String source() {
        return "L. D. Landau, E. M. Lifshitz, Fluid Mechanics, 2nd ed., 1987, section 24; started from rest by "
                + "Duhamel's principle on Stokes' first problem (Bird, Stewart, Lightfoot, Transport Phenomena, "
                + "2nd ed., 2002, Example 4.1-1)";
    }

    private void checkTime(double t) {
        Checks.time(appliesAt(t), t, "above 0 s and finite (an oscillating plate never settles)");
    }

    /** The kinematic viscosity nu = mu/rho (m^2/s). */
    public double kinematicViscosity() {
        return nu;
    }

    /** The density rho (kg/m^3). */
    public double density() {
        return density;
    }

    /** The plate's oscillation. */
    public WallMotion.Sine wallMotion() {
        return wallMotion;
    }
}
