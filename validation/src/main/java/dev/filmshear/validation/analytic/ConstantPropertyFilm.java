package dev.filmshear.validation.analytic;

import dev.filmshear.solver.base.InvalidParameterException;
import dev.filmshear.solver.physics.WallMotion;
import dev.filmshear.validation.analytic.GapResponses.Form;

import java.util.Objects;
import java.util.Optional;

/**
 * The general linear film: constant density rho and viscosity mu (nu = mu/rho) in a gap 0 &lt;= y &lt;= h,
 * <pre>
 *   rho du/dt = mu d2u/dy2 - dp/dx,   u(0, t) = a(t),   u(h, t) = b(t),   u(y, 0) = u0,
 * </pre>
 * with each wall velocity a {@link WallMotion} (steady: an impulsive start from u0; ramp; table: piecewise
 * linear; sine: mean + amplitude sin(omega t + phase)).
 *
 * <p><b>Superposition.</b> With eta = y/h, tau = nu t/h^2 and F = -(dp/dx)/rho,
 * <pre>
 *   u = u0 + W_a(eta, t) + W_b(1 - eta, t) + F (h^2/nu) forcing(eta, tau)
 * </pre>
 * where W is the response to one wall's velocity less u0, the other wall held still, written with the
 * dimensionless responses of {@code GapResponses}: for w(t) = jump + sum_k s_k max(0, t - t_k)
 * (piecewise linear, by Duhamel's principle, one closed form per linear piece)
 * <pre>
 *   W(xi, t) = jump step(xi, tau) + (1 - xi)(w(t) - jump) + (h^2/nu) sum_k s_k rampDeviation(xi, tau - tau_k)
 * </pre>
 * and for an oscillating wall the jump to its mean plus A times the started oscillation: the periodic
 * solution Im{e^{i(omega t + phase)} sinh(lambda (h - y)) / sinh(lambda h)}, lambda = (1 + i) sqrt(omega / (2 nu))
 * (L. D. Landau and E. M. Lifshitz, <i>Fluid Mechanics</i>, 2nd ed., 1987, §24, problem; generalised to any
 * phase), plus the decaying transient with closed-form sine coefficients
 * b_n = 2 n pi / (n^2 pi^2 + i omega h^2 / nu). For tau &lt; 1e-3 the oscillation is
 * instead Duhamel's integral of the image-series step response ({@code SineDuhamel}). The steady part is
 * {@link CouettePoiseuilleFlow}; the transient series decay as exp(-n^2 pi^2 tau) (R. B. Bird, W. E. Stewart
 * and E. N. Lightfoot, <i>Transport Phenomena</i>, 2nd ed., 2002, §4.1).
 *
 * <p>Every series switches to its image (erfc) form for tau &lt; 0.1 (where each form needs fewer than ten terms).
 */
public final class ConstantPropertyFilm implements AnalyticSolution {
    /** From this tau on an oscillating wall uses the periodic solution and its Fourier transient (a few
     * dozen terms at most); below it, Duhamel's integral of the image series. */
    static final double OSCILLATION_FOURIER_FROM = 1e-3;

    private final double gap;
    private final double density;
    private final double viscosity;
    private final WallMotion lowerMotion;
    private final WallMotion upperMotion;
    private final double pressureGradient;
    private final double initialVelocity;
    private final WallHistory lower;
    private final WallHistory upper;
    private final double diffusionTime;
    private final double acceleration;

    /**
     * @param gap h (m)
     * @param density rho (kg/m^3)
     * @param viscosity mu (Pa s)
     * @param lowerMotion velocity history of the wall y = 0
     * @param upperMotion velocity history of the wall y = h
     * @param pressureGradient dp/dx (Pa/m), constant
     * @param initialVelocity uniform velocity u0 (m/s) at t = 0
     */
    public ConstantPropertyFilm(double gap, double density, double viscosity, WallMotion lowerMotion,
                                WallMotion upperMotion, double pressureGradient, double initialVelocity) {
        this.gap = InvalidParameterException.requirePositive("gap", gap, "m");
        this.density = InvalidParameterException.requirePositive("density", density, "kg/m^3");
        this.viscosity = InvalidParameterException.requirePositive("viscosity", viscosity, "Pa*s");
        this.lowerMotion = Objects.requireNonNull(lowerMotion, "lowerMotion");
        this.upperMotion = Objects.requireNonNull(upperMotion, "upperMotion");
        this.pressureGradient = InvalidParameterException.requireFinite("gradient", pressureGradient, "Pa/m");
        this.initialVelocity = InvalidParameterException.requireFinite("velocity", initialVelocity, "m/s");
        this.lower = WallHistory.of(lowerMotion, initialVelocity);
        this.upper = WallHistory.of(upperMotion, initialVelocity);
        this.diffusionTime = gap * gap * density / viscosity;
        this.acceleration = -pressureGradient / density;
    }

    /** The gap h (m). */
    public double gap() {
        return gap;
    }

    /** The kinematic viscosity nu = mu/rho (m^2/s). */
    public double kinematicViscosity() {
        return viscosity / density;
    }

    /** The viscous diffusion time h^2/nu (s); tau = t / diffusionTime. */
    public double diffusionTime() {
        return diffusionTime;
    }

    /** Velocity (m/s) at height {@code y} (m) and time {@code t} (s); t = +infinity gives the steady limit. */
    @Override
    public double velocity(double y, double t) {
        checkTime(t);
        Checks.inGap(y, gap);
        if (t == Double.POSITIVE_INFINITY) {
            return steadyPart().velocity(y);
        }
        double eta = y / gap;
        return initialVelocity + wall(lower, Quantity.VALUE, eta, t) + wall(upper, Quantity.VALUE, 1 - eta, t)
                + acceleration * diffusionTime * GapResponses.forcing(Quantity.VALUE, eta, tau(t), Form.at(tau(t)));
    }

    /** mu du/dy (Pa) at the lower wall at time {@code t} (s). */
    @Override
    public double wallShearStressLower(double t) {
        checkTime(t);
        if (t == Double.POSITIVE_INFINITY) {
            return steadyPart().wallShearStressLower();
        }
        return slopeAt(0, t);
    }

    /** mu du/dy (Pa) at the upper wall at time {@code t} (s). */
    @Override
    public double wallShearStressUpper(double t) {
        checkTime(t);
        if (t == Double.POSITIVE_INFINITY) {
            return steadyPart().wallShearStressUpper();
        }
        return slopeAt(1, t);
    }

    /** Flow rate per unit width (m^2/s), the integral of u over the gap, at time {@code t} (s). */
    public double flowRate(double t) {
        checkTime(t);
        if (t == Double.POSITIVE_INFINITY) {
            return steadyPart().flowRate();
        }
        double mean = initialVelocity + wall(lower, Quantity.MEAN, 0, t) + wall(upper, Quantity.MEAN, 0, t)
                + acceleration * diffusionTime * GapResponses.forcing(Quantity.MEAN, 0, tau(t), Form.at(tau(t)));
        return gap * mean;
    }

    /**
     * Velocity (m/s) of the periodic state the film tends to, at height {@code y} (m) and time {@code t} (s):
     * the steady state when no wall oscillates. Walls oscillate about their means.
     */
    public double periodicVelocity(double y, double t) {
        Checks.inGap(y, gap);
        double eta = y / gap;
        return steadyPart().velocity(y) + periodic(lower, Quantity.VALUE, eta, t)
                + periodic(upper, Quantity.VALUE, 1 - eta, t);
    }

    /** mu du/dy (Pa) at the lower wall in the periodic state, at time {@code t} (s). */
    public double periodicWallShearStressLower(double t) {
        return steadyPart().wallShearStressLower()
                + viscosity / gap * (periodic(lower, Quantity.SLOPE, 0, t) - periodic(upper, Quantity.SLOPE, 1, t));
    }

    /** mu du/dy (Pa) at the upper wall in the periodic state, at time {@code t} (s). */
    public double periodicWallShearStressUpper(double t) {
        return steadyPart().wallShearStressUpper()
                + viscosity / gap * (periodic(lower, Quantity.SLOPE, 1, t) - periodic(upper, Quantity.SLOPE, 0, t));
    }

    /** The steady Couette–Poiseuille flow the film settles into, or empty when a wall oscillates. */
    public Optional<CouettePoiseuilleFlow> steadyLimit() {
        return lower.oscillates() || upper.oscillates() ? Optional.empty() : Optional.of(steadyPart());
    }

    @Override
    public String name() {
        return "constant-property film (Couette-Poiseuille start-up)";
    }

    @Override
    public String source() {
        return "R. B. Bird, W. E. Stewart, E. N. Lightfoot, Transport Phenomena, 2nd ed., Wiley, 2002, section 4.1; "
                + "L. D. Landau, E. M. Lifshitz, Fluid Mechanics, 2nd ed., 1987, section 24; superposition by "
                + "Duhamel's principle";
    }

    /** Times above zero; +infinity too when no wall oscillates. */
    @Override
    public boolean appliesAt(double t) {
        return (t > 0 && t < Double.POSITIVE_INFINITY) || (t == Double.POSITIVE_INFINITY && steadyLimit().isPresent());
    }

    private void checkTime(double t) {
        Checks.time(appliesAt(t), t, steadyLimit().isPresent() ? "above 0 s, or +infinity for the steady state"
                : "above 0 s and finite (an oscillating wall never settles)");
    }

    private double tau(double t) {
        return t / diffusionTime;
    }

    /** mu du/dy at xi = 0 (lower wall) or 1 (upper wall). */
    private double slopeAt(double eta, double t) {
        double slope = wall(lower, Quantity.SLOPE, eta, t) - wall(upper, Quantity.SLOPE, 1 - eta, t)
                + acceleration * diffusionTime * GapResponses.forcing(Quantity.SLOPE, eta, tau(t), Form.at(tau(t)));
        return viscosity / gap * slope;
    }

    /** The steady part: walls at their settled velocities (oscillating walls at their means). */
    private CouettePoiseuilleFlow steadyPart() {
        return new CouettePoiseuilleFlow(gap, viscosity, meanVelocity(lowerMotion), meanVelocity(upperMotion),
                pressureGradient);
    }

    private static double meanVelocity(WallMotion motion) {
        return motion instanceof WallMotion.Sine sine ? sine.mean() : motion.settledVelocity().getAsDouble();
    }

    /** The response W(xi, t) of one wall's history, quantity q, in the wall's own coordinate xi. */
    private double wall(WallHistory w, Quantity q, double xi, double t) {
        double tau = tau(t);
        double sum = w.jump() * GapResponses.step(q, xi, tau, Form.at(tau))
                + GapResponses.oneMinusXi(q, xi) * w.rampPart(t)
                + diffusionTime * w.sumOverCorners(t, elapsed ->
                        GapResponses.rampDeviation(q, xi, tau(elapsed), Form.at(tau(elapsed))));
        if (w.oscillates()) {
            sum += oscillation(w, q, xi, t);
        }
        return sum;
    }

    private double oscillation(WallHistory w, Quantity q, double xi, double t) {
        double tau = tau(t);
        double kappa = w.angularFrequency() * diffusionTime;
        if (tau >= OSCILLATION_FOURIER_FROM) {
            return w.amplitude() * (GapResponses.oscillationPeriodic(q, xi, kappa, tau, w.phase())
                    + GapResponses.oscillationTransient(q, xi, kappa, tau, w.phase()));
        }
        // the kernel at xi starts to rise when the step has diffused there, near sigma = (xi h)^2 / (4 nu)
        double featureTime = q == Quantity.MEAN ? 0 : xi * xi * diffusionTime / 4;
        return SineDuhamel.response(sigma -> GapResponses.step(q, xi, tau(sigma), Form.at(tau(sigma))), featureTime,
                w.amplitude(), w.angularFrequency(), w.phase(), t);
    }

    /** The periodic part of an oscillating history (0 for one that does not oscillate). */
    private double periodic(WallHistory w, Quantity q, double xi, double t) {
        if (!w.oscillates()) {
            return 0;
        }
        double kappa = w.angularFrequency() * diffusionTime;
        return w.amplitude() * GapResponses.oscillationPeriodic(q, xi, kappa, tau(t), w.phase());
    }
}
