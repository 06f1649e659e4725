package dev.filmshear.validation.analytic;

import dev.filmshear.solver.base.InvalidParameterException;
import dev.filmshear.solver.physics.ThermalCondition;

import java.util.Objects;

/**
 * Steady plane Couette flow with viscous heating and constant properties: gap h, viscosity mu, conductivity
 * k, walls moving at u_a (lower) and u_b (upper), no pressure gradient. The velocity is linear, the shear
 * stress mu U/h uniform (U = u_b - u_a), and the dissipation mu (U/h)^2 uniform, so k T'' = -mu (U/h)^2 and,
 * with eta = y/h and Q = mu U^2 / (2k),
 * <pre>
 *   T(eta) = A + B eta + Q eta (1 - eta)
 * </pre>
 * with A and B from the walls:
 * <ul>
 *   <li>both at fixed temperatures T_a, T_b: A = T_a, B = T_b - T_a. In the form of R. B. Bird, W. E. Stewart and
 *       E. N. Lightfoot, <i>Transport Phenomena</i>, 2nd ed., 2002, §10.4, Eq. 10.4-9, with the Brinkman number
 *       Br = mu U^2 / (k (T_b - T_a)): Theta = (T - T_a)/(T_b - T_a) = eta + (Br/2) eta (1 - eta); an interior
 *       maximum exists only for Br &gt; 2, at eta = 1/2 + 1/Br. With T_a = T_b the rise is Q eta (1 - eta),
 *       largest mu U^2/(8k) at mid-gap.</li>
 *   <li>one wall adiabatic, the other at T_w: T - T_w = Q (1 - eta_a^2) with eta_a measured from the adiabatic
 *       wall, largest mu U^2/(2k) at the adiabatic wall (whichever wall moves).</li>
 * </ul>
 * Heat flows from the fluid into the walls at q_lower = k T_y(0) = (k/h)(B + Q) and
 * q_upper = -k T_y(h) = -(k/h)(B - Q); q_lower + q_upper = mu U^2 / h, the dissipation per unit wall area.
 *
 * @param gap h (m)
 * @param viscosity mu (Pa s)
 * @param conductivity k (W/(m K))
 * @param lowerVelocity u_a (m/s)
 * @param upperVelocity u_b (m/s)
 * @param lower thermal condition of the lower wall: a fixed temperature or adiabatic (zero heat flux)
 * @param upper thermal condition of the upper wall: a fixed temperature or adiabatic; not both adiabatic
 */
public record CouetteViscousHeating(double gap, double viscosity, double conductivity, double lowerVelocity,
                                    double upperVelocity, ThermalCondition lower, ThermalCondition upper)
        implements SteadySolution {

    public CouetteViscousHeating {
        InvalidParameterException.requirePositive("gap", gap, "m");
        InvalidParameterException.requirePositive("viscosity", viscosity, "Pa*s");
        InvalidParameterException.requirePositive("conductivity", conductivity, "W/(m*K)");
        InvalidParameterException.requireFinite("lower_velocity", lowerVelocity, "m/s");
        InvalidParameterException.requireFinite("upper_velocity", upperVelocity, "m/s");
        requireFixedOrAdiabatic("lower_wall", lower);
        requireFixedOrAdiabatic("upper_wall", upper);
        if (!(lower instanceof ThermalCondition.FixedTemperature)
                && !(upper instanceof ThermalCondition.FixedTemperature)) {
            throw new InvalidParameterException("thermal", "both walls adiabatic",
                    "at least one wall at a fixed temperature (the dissipated heat must leave the film)");
        }
    }

    private static void requireFixedOrAdiabatic(String wall, ThermalCondition condition) {
        Objects.requireNonNull(condition, wall);
        boolean adiabatic = condition instanceof ThermalCondition.HeatFlux flux && flux.flux() == 0;
        if (!(condition instanceof ThermalCondition.FixedTemperature) && !adiabatic) {
            throw new InvalidParameterException(wall, condition.toString(), "a fixed temperature or an adiabatic wall");
        }
    }

    /** Both walls at fixed temperatures. */
    public static CouetteViscousHeating fixedTemperatures(double gap, double viscosity, double conductivity,
                                                          double lowerVelocity, double upperVelocity,
                                                          double lowerTemperature, double upperTemperature) {
        return new CouetteViscousHeating(gap, viscosity, conductivity, lowerVelocity, upperVelocity,
                new ThermalCondition.FixedTemperature(lowerTemperature),
                new ThermalCondition.FixedTemperature(upperTemperature));
    }

    /** Relative wall speed U = u_b - u_a (m/s). */
    public double relativeSpeed() {
        return upperVelocity - lowerVelocity;
    }

    /** Q = mu U^2 / (2k) (K): the rise scale of the temperature. */
    private double rise() {
        double u = relativeSpeed();
        return viscosity * u * u / (2 * conductivity);
    }

    /** A of T = A + B eta + Q eta (1 - eta). */
    private double offset() {
        if (lower instanceof ThermalCondition.FixedTemperature fixed) {
            return fixed.temperature();
        }
        return ((ThermalCondition.FixedTemperature) upper).temperature() + rise();
    }

    /** B of T = A + B eta + Q eta (1 - eta). */
    private double slope() {
        if (lower instanceof ThermalCondition.FixedTemperature a) {
            if (upper instanceof ThermalCondition.FixedTemperature b) {
                return b.temperature() - a.temperature();
            }
            return rise();
        }
        return -rise();
    }

    /** Velocity (m/s) at height {@code y} (m): linear between the walls. */
    public double velocity(double y) {
        Checks.inGap(y, gap);
        return lowerVelocity + relativeSpeed() * y / gap;
    }

    /** The uniform shear stress mu du/dy (Pa). */
    public double shearStress() {
        return viscosity * relativeSpeed() / gap;
    }

    /** Heat dissipated per unit wall area (W/m^2): mu U^2 / h. */
    public double dissipation() {
        return shearStress() * relativeSpeed();
    }

    /** Temperature (K) at height {@code y} (m). */
    public double temperature(double y) {
        Checks.inGap(y, gap);
        double eta = y / gap;
        return offset() + slope() * eta + rise() * eta * (1 - eta);
    }

    /** Height (m) of the highest temperature (a wall when the maximum is not inside the film). */
    public double maxTemperaturePosition() {
        double q = rise();
        double b = slope();
        double candidate = b >= 0 ? 1 : 0;
        if (q > 0) {
            // dT/deta = B + Q (1 - 2 eta) = 0
            double vertex = (b + q) / (2 * q);
            if (vertex > 0 && vertex < 1) {
                candidate = vertex;
            }
        }
        return candidate * gap;
    }

    /** The highest temperature (K) in the film. */
    public double maxTemperature() {
        return temperature(maxTemperaturePosition());
    }

    /** Heat flux (W/m^2) from the fluid into the lower wall: k dT/dy at y = 0. */
    public double heatFluxIntoLowerWall() {
        return conductivity / gap * (slope() + rise());
    }

    /** Heat flux (W/m^2) from the fluid into the upper wall: -k dT/dy at y = h. */
    public double heatFluxIntoUpperWall() {
        return -conductivity / gap * (slope() - rise());
    }

    /**
     * The Brinkman number mu U^2 / (k (T_b - T_a)) of two walls at different fixed temperatures.
     *
     * @throws IllegalStateException when a wall is adiabatic or both are at one temperature
     */
    public double brinkmanNumber() {
        if (!(lower instanceof ThermalCondition.FixedTemperature a)
                || !(upper instanceof ThermalCondition.FixedTemperature b)
                || a.temperature() == b.temperature()) {
            throw new IllegalStateException("the Brinkman number needs two walls at different fixed temperatures");
        }
        return 2 * rise() / (b.temperature() - a.temperature());
    }

    /** mu du/dy (Pa) at the lower wall: the stress is uniform across the film. */
    @Override
    public double wallShearStressLower() {
        return shearStress();
    }

    /** mu du/dy (Pa) at the upper wall: the stress is uniform across the film. */
    @Override
    public double wallShearStressUpper() {
        return shearStress();
    }

    @Override
    public String name() {
        return "steady Couette flow with viscous heating (constant properties)";
    }

    @Override
    public String source() {
        return "R. B. Bird, W. E. Stewart, E. N. Lightfoot, Transport Phenomena, 2nd ed., Wiley, 2002, section 10.4, "
                + "Eq. 10.4-9";
    }

    @Override
    public boolean hasTemperature() {
        return true;
    }

}
