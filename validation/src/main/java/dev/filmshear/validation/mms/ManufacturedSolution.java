package dev.filmshear.validation.mms;

import dev.filmshear.solver.base.InvalidParameterException;
import dev.filmshear.solver.physics.DensityLaw;
import dev.filmshear.solver.physics.Domain;
import dev.filmshear.solver.physics.ExponentialViscosity;
import dev.filmshear.solver.physics.FilmPhysics;
import dev.filmshear.solver.physics.Fluid;
import dev.filmshear.solver.physics.ThermalCondition;
import dev.filmshear.solver.physics.VolumeSource;
import dev.filmshear.solver.physics.Wall;
import dev.filmshear.solver.physics.WallMotion;

import java.util.Objects;

/**
 * A manufactured solution of the full coupled film equations (method of manufactured solutions:
 * K. Salari and P. Knupp, <i>Code Verification by the Method of Manufactured Solutions</i>, Sandia report
 * SAND2000-1444, 2000; P. J. Roache, <i>J. Fluids Eng.</i> 124, 4-10, 2002, from memory). Chosen smooth fields
 * u_m(y, t) and T_m(y, t) are made exact solutions of
 * <pre>
 *   rho(T) du/dt       = d/dy( mu(T) du/dy ) - dp/dx + f(y, t)
 *   rho(T) cp dT/dt    = d/dy( k dT/dy ) + mu(T) (du/dy)^2 + q(y, t)
 * </pre>
 * by the source terms f = S_u and q = S_T that substituting them leaves over.
 *
 * <p><b>Properties.</b> mu(T) = mu0 exp(-beta (T - T_mu)) (an {@link ExponentialViscosity}); rho(T) =
 * rho0 (1 - alpha (T - T_rho)) (a {@link DensityLaw}, alpha = 0 for constant density); cp and k constant.
 * Each is evaluated here from the law's parameters, not through the solver's own methods, so that a slip
 * there shows.
 *
 * <p><b>Derivation.</b> With eta = y/L (L the gap, or the truncation depth of a semi-infinite film) and the
 * fields written as {@link Field}s, u_m = u(eta, t) and T_m = T(eta, t), the chain rule gives
 * <pre>
 *   du/dy = u_eta / L,   d2u/dy2 = u_etaeta / L^2,   dT/dy = T_eta / L,   d2T/dy2 = T_etaeta / L^2,
 *   d mu/dy = (d mu/dT) dT/dy = -beta mu dT/dy,
 * </pre>
 * so d/dy(mu du/dy) = mu d2u/dy2 + (d mu/dy) du/dy = mu (d2u/dy2 - beta dT/dy du/dy), and
 * <pre>
 *   S_u = rho(T_m) du_m/dt - mu(T_m) ( d2u_m/dy2 - beta dT_m/dy du_m/dy ) + dp/dx
 *   S_T = rho(T_m) cp dT_m/dt - k d2T_m/dy2 - mu(T_m) (du_m/dy)^2
 * </pre>
 * For the fields of references.md 10.1 (u_m = U [eta + a sin(pi eta) cos(omega t)],
 * T_m = T0 + dT sin(pi eta) (1 + b sin(omega t)), constant density, no pressure gradient) these are its
 * formulas; the tests check its spot values.
 *
 * <p>The walls follow from the fields: a wall's velocity is u_m at the wall, which must be one
 * {@link Harmonic} in time (a steady or sine {@link WallMotion}); the thermal conditions are the case's
 * choice, and {@link ManufacturedCase} checks that the fields meet them.
 *
 * @param domain a gap, or a semi-infinite film with a given truncation depth
 * @param fluid exponential viscosity, linear or constant density, constant cp and k
 * @param velocity u_m (m/s) as a field of eta = y/L and t
 * @param temperature T_m (K) as a field of eta = y/L and t
 * @param pressureGradient dp/dx (Pa/m)
 */
public record ManufacturedSolution(Domain domain, Fluid fluid, Field velocity, Field temperature,
                                   double pressureGradient) {

    public ManufacturedSolution {
        Objects.requireNonNull(domain, "domain");
        Objects.requireNonNull(fluid, "fluid");
        Objects.requireNonNull(velocity, "velocity");
        Objects.requireNonNull(temperature, "temperature");
        InvalidParameterException.requireFinite("gradient", pressureGradient, "Pa/m");
        if (domain instanceof Domain.SemiInfinite s && Double.isNaN(s.depth())) {
            throw new InvalidParameterException("depth", "automatic",
                    "a given truncation depth (the far-field conditions are part of the manufactured fields)");
        }
        if (!(fluid.viscosity() instanceof ExponentialViscosity)) {
            throw new InvalidParameterException("viscosity", fluid.viscosity().name(), "an exponential law");
        }
        if (!fluid.hasThermalProperties() || !fluid.specificHeat().isConstant()
                || !fluid.conductivity().isConstant()) {
            throw new InvalidParameterException("thermal", fluid.hasThermalProperties()
                    ? "temperature-dependent specific heat or conductivity" : "no thermal properties",
                    "constant specific heat and conductivity");
        }
    }

    /** L (m): the gap, or the truncation depth of a semi-infinite film. */
    public double extent() {
        return domain instanceof Domain.Gap g ? g.gap() : ((Domain.SemiInfinite) domain).depth();
    }

    /** True for one wall and a truncated far field. */
    public boolean isSemiInfinite() {
        return domain instanceof Domain.SemiInfinite;
    }

    /** u_m (m/s) at height {@code y} (m) and time {@code t} (s). */
    public double velocity(double y, double t) {
        return velocity.value(y / extent(), t);
    }

    /** T_m (K) at height {@code y} (m) and time {@code t} (s). */
    public double temperature(double y, double t) {
        return temperature.value(y / extent(), t);
    }

    /** du_m/dy (1/s). */
    public double velocityGradient(double y, double t) {
        return velocity.slope(y / extent(), t) / extent();
    }

    /** dT_m/dy (K/m). */
    public double temperatureGradient(double y, double t) {
        return temperature.slope(y / extent(), t) / extent();
    }

    /** mu(T_m) (Pa s), from the exponential law's parameters. */
    public double viscosity(double y, double t) {
        ExponentialViscosity law = (ExponentialViscosity) fluid.viscosity();
        return law.reference() * Math.exp(-law.coefficient() * (temperature(y, t) - law.referenceTemperature()));
    }

    /** rho(T_m) (kg/m^3), from the density law's parameters. */
    public double density(double y, double t) {
        DensityLaw law = fluid.density();
        return law.expansion() == 0 ? law.reference()
                : law.reference() * (1 - law.expansion() * (temperature(y, t) - law.referenceTemperature()));
    }

    /** S_u (N/m^3) at height {@code y} (m) and time {@code t} (s); see the class comment. */
    public double momentumSource(double y, double t) {
        double l = extent();
        double eta = y / l;
        double beta = ((ExponentialViscosity) fluid.viscosity()).coefficient();
        double uyy = velocity.curvature(eta, t) / (l * l);
        return density(y, t) * velocity.rate(eta, t)
                - viscosity(y, t) * (uyy - beta * temperatureGradient(y, t) * velocityGradient(y, t))
                + pressureGradient;
    }

    /** S_T (W/m^3) at height {@code y} (m) and time {@code t} (s); see the class comment. */
    public double heatSource(double y, double t) {
        double l = extent();
        double eta = y / l;
        double cp = fluid.specificHeat().reference();
        double k = fluid.conductivity().reference();
        double uy = velocityGradient(y, t);
        return density(y, t) * cp * temperature.rate(eta, t) - k * temperature.curvature(eta, t) / (l * l)
                - viscosity(y, t) * uy * uy;
    }

    /** S_u as the solver's momentum source. */
    public VolumeSource momentumSource() {
        return this::momentumSource;
    }

    /** S_T as the solver's heat source. */
    public VolumeSource heatSource() {
        return this::heatSource;
    }

    /** The lower wall's motion: u_m at y = 0. */
    public WallMotion lowerWallMotion() {
        return motion(velocity.historyAt(0));
    }

    /**
     * The upper wall's motion: u_m at y = L.
     *
     * @throws IllegalStateException for a semi-infinite film, which has no upper wall
     */
    public WallMotion upperWallMotion() {
        if (isSemiInfinite()) {
            throw new IllegalStateException("a semi-infinite film has no upper wall");
        }
        return motion(velocity.historyAt(1));
    }

    /**
     * The solver's physics for these fields: walls moving as u_m at the walls, the given thermal conditions,
     * both sources, and the uniform initial state u_m, T_m at mid-film and t = 0 (a {@link ManufacturedCase}
     * checks that the fields are uniform then).
     *
     * @param lower thermal condition of the lower wall
     * @param upper thermal condition of the upper wall; null for a semi-infinite film
     */
    public FilmPhysics physics(ThermalCondition lower, ThermalCondition upper) {
        Wall upperWall = isSemiInfinite() ? null : new Wall(upperWallMotion(), upper);
        return new FilmPhysics(domain, fluid, new Wall(lowerWallMotion(), lower), upperWall, pressureGradient,
                velocity.value(0.5, 0), temperature.value(0.5, 0), momentumSource(), heatSource());
    }

    /** A harmonic wall velocity as the solver's wall motion: g = m + R sin(omega t + phase). */
    private static WallMotion motion(Harmonic g) {
        if (g.isConstant()) {
            return new WallMotion.Steady(g.mean());
        }
        // m + S sin + C cos = m + R sin(omega t + phase) with R cos(phase) = S, R sin(phase) = C
        double amplitude = Math.hypot(g.sine(), g.cosine());
        double phase = Math.atan2(g.cosine(), g.sine());
        return new WallMotion.Sine(g.mean(), amplitude, g.angularFrequency() / (2 * Math.PI), phase);
    }
}
