package dev.filmshear.validation.analytic;

import dev.filmshear.solver.base.InvalidParameterException;
import org.apache.commons.math3.util.FastMath;

import java.util.Objects;

/**
 * Steady plane Couette flow with viscous heating and an exponential viscosity law
 * mu = mu0 exp(-beta (T - T0)), T0 being the wall temperature (the Nahme problem): gap h, conductivity k,
 * walls moving at u_a (lower) and u_b (upper), U = u_b - u_a, no pressure gradient, so the shear stress tau is
 * uniform. With theta = beta (T - T0) and eta = y/h the energy equation is theta'' + Lambda exp(theta) = 0,
 * Lambda = beta tau^2 h^2 / (k mu0), and the Nahme number is
 * <pre>
 *   Na = beta mu0 U^2 / k.
 * </pre>
 * <b>Both walls at T0</b>, b = 2 arsinh(sqrt(Na/8)):
 * <pre>
 *   theta = 2 ln[cosh(b/2) / cosh(b (eta - 1/2))],   beta (T_max - T0) = ln(1 + Na/8) at mid-gap,
 *   tau h/(mu0 U) = b / sinh b,   (u - u_a)/U = [tanh(b (eta - 1/2)) + tanh(b/2)] / (2 tanh(b/2)).
 * </pre>
 * <b>One wall adiabatic, the other at T0</b>, c = arsinh(sqrt(Na/2)), eta_a measured from the adiabatic wall:
 * <pre>
 *   theta = 2 ln[cosh c / cosh(c eta_a)],   beta (T_max - T0) = ln(1 + Na/2) at the adiabatic wall,
 *   tau h/(mu0 U) = 2c / sinh(2c),   velocity relative to the adiabatic wall: +-U tanh(c eta_a) / tanh c.
 * </pre>
 * The adiabatic case at Na equals the isothermal one at 4 Na (the film is half of a symmetric one of twice
 * the gap). For small Na both tend to constant-property heating ({@link CouetteViscousHeating}). With U
 * prescribed the solution exists and is unique for every Na.
 *
 * <p>Sources: R. Nahme, <i>Ing.-Arch.</i> 11, 191 (1940); J. Gavis and R. L. Laurence, "Viscous heating in plane
 * and circular flow between moving surfaces", <i>Ind. Eng. Chem. Fundam.</i> 7, 232–239 (1968) (citations
 * from memory). The closed forms above were derived for this project and checked against an independent
 * boundary-value solution (references.md 7(g), DERIVED+CHECKED).
 *
 * @param gap h (m)
 * @param lowerVelocity u_a (m/s)
 * @param upperVelocity u_b (m/s)
 * @param referenceViscosity mu0 (Pa s), the viscosity at the wall temperature T0
 * @param coefficient beta (1/K), above zero
 * @param conductivity k (W/(m K))
 * @param wallTemperature T0 (K)
 * @param walls which walls are held at T0
 */
public record NahmeCouette(double gap, double lowerVelocity, double upperVelocity, double referenceViscosity,
                           double coefficient, double conductivity, double wallTemperature, Walls walls)
        implements SteadySolution {

    /** Thermal conditions of the Nahme problem. */
    public enum Walls {
        /** Both walls at T0 (Case 1). */
        BOTH_AT_WALL_TEMPERATURE,
        /** Lower wall adiabatic, upper at T0 (Case 2). */
        LOWER_ADIABATIC,
        /** Upper wall adiabatic, lower at T0 (Case 2). */
        UPPER_ADIABATIC
    }

    public NahmeCouette {
        InvalidParameterException.requirePositive("gap", gap, "m");
        InvalidParameterException.requireFinite("lower_velocity", lowerVelocity, "m/s");
        InvalidParameterException.requireFinite("upper_velocity", upperVelocity, "m/s");
        InvalidParameterException.requirePositive("reference", referenceViscosity, "Pa*s");
        InvalidParameterException.requirePositive("coefficient", coefficient, "1/K");
        InvalidParameterException.requirePositive("conductivity", conductivity, "W/(m*K)");
        InvalidParameterException.requirePositive("temperature", wallTemperature, "K");
        Objects.requireNonNull(walls, "walls");
    }

    /** tau h / (mu0 U) at Nahme number {@code na}. */
    public static double shearStressRatio(Walls walls, double na) {
        requireNahme(na);
        if (walls == Walls.BOTH_AT_WALL_TEMPERATURE) {
            double b = isothermalParameter(na);
            return b == 0 ? 1 : b / Math.sinh(b);
        }
        double c = adiabaticParameter(na);
        return c == 0 ? 1 : 2 * c / Math.sinh(2 * c);
    }

    /** beta (T_max - T0) at Nahme number {@code na}. */
    public static double maxTemperatureRise(Walls walls, double na) {
        requireNahme(na);
        return Math.log1p(walls == Walls.BOTH_AT_WALL_TEMPERATURE ? na / 8 : na / 2);
    }

    /** theta = beta (T - T0) at {@code eta} = y/h and Nahme number {@code na}. */
    public static double dimensionlessTemperature(Walls walls, double na, double eta) {
        requireNahme(na);
        switch (walls) {
            case BOTH_AT_WALL_TEMPERATURE: {
                double b = isothermalParameter(na);
                return 2 * Math.log(Math.cosh(b / 2) / Math.cosh(b * (eta - 0.5)));
            }
            case LOWER_ADIABATIC: {
                double c = adiabaticParameter(na);
                return 2 * Math.log(Math.cosh(c) / Math.cosh(c * eta));
            }
            default: {
                double c = adiabaticParameter(na);
                return 2 * Math.log(Math.cosh(c) / Math.cosh(c * (1 - eta)));
            }
        }
    }

    /** (u - u_a)/U at {@code eta} = y/h and Nahme number {@code na}. */
    public static double velocityShape(Walls walls, double na, double eta) {
        requireNahme(na);
        switch (walls) {
            case BOTH_AT_WALL_TEMPERATURE: {
                double b = isothermalParameter(na);
                return b == 0 ? eta : (Math.tanh(b * (eta - 0.5)) + Math.tanh(b / 2)) / (2 * Math.tanh(b / 2));
            }
            case LOWER_ADIABATIC: {
                double c = adiabaticParameter(na);
                return c == 0 ? eta : Math.tanh(c * eta) / Math.tanh(c);
            }
            default: {
                double c = adiabaticParameter(na);
                return c == 0 ? eta : 1 - Math.tanh(c * (1 - eta)) / Math.tanh(c);
            }
        }
    }

    /** b = 2 arsinh(sqrt(Na/8)). */
    private static double isothermalParameter(double na) {
        return 2 * asinh(Math.sqrt(na / 8));
    }

    /** c = arsinh(sqrt(Na/2)). */
    private static double adiabaticParameter(double na) {
        return asinh(Math.sqrt(na / 2));
    }

    private static double asinh(double x) {
        return FastMath.asinh(x);
    }

    private static void requireNahme(double na) {
        if (!(na >= 0) || Double.isInfinite(na)) {
            throw new InvalidParameterException("nahme_number", Double.toString(na), "a finite value of zero or more");
        }
    }

    /** Relative wall speed U = u_b - u_a (m/s). */
    public double relativeSpeed() {
        return upperVelocity - lowerVelocity;
    }

    /** The Nahme number Na = beta mu0 U^2 / k. */
    public double nahmeNumber() {
        double u = relativeSpeed();
        return coefficient * referenceViscosity * u * u / conductivity;
    }

    /** The uniform shear stress mu du/dy (Pa). */
    public double shearStress() {
        return referenceViscosity * relativeSpeed() / gap * shearStressRatio(walls, nahmeNumber());
    }

    /** Temperature (K) at height {@code y} (m). */
    public double temperature(double y) {
        Checks.inGap(y, gap);
        return wallTemperature + dimensionlessTemperature(walls, nahmeNumber(), y / gap) / coefficient;
    }

    /** Viscosity (Pa s) at height {@code y} (m). */
    public double viscosity(double y) {
        Checks.inGap(y, gap);
        return referenceViscosity * Math.exp(-dimensionlessTemperature(walls, nahmeNumber(), y / gap));
    }

    /** Velocity (m/s) at height {@code y} (m). */
    public double velocity(double y) {
        Checks.inGap(y, gap);
        return lowerVelocity + relativeSpeed() * velocityShape(walls, nahmeNumber(), y / gap);
    }

    /** The highest temperature (K): mid-gap with both walls at T0, at the adiabatic wall otherwise. */
    public double maxTemperature() {
        return wallTemperature + maxTemperatureRise(walls, nahmeNumber()) / coefficient;
    }

    /** Height (m) of the highest temperature. */
    public double maxTemperaturePosition() {
        switch (walls) {
            case BOTH_AT_WALL_TEMPERATURE:
                return gap / 2;
            case LOWER_ADIABATIC:
                return 0;
            default:
                return gap;
        }
    }

    /** Heat flux (W/m^2) from the fluid into the lower wall: k dT/dy at y = 0. */
    public double heatFluxIntoLowerWall() {
        return walls == Walls.LOWER_ADIABATIC ? 0 : wallHeatFlux();
    }

    /** Heat flux (W/m^2) from the fluid into the upper wall: -k dT/dy at y = h. */
    public double heatFluxIntoUpperWall() {
        return walls == Walls.UPPER_ADIABATIC ? 0 : wallHeatFlux();
    }

    /** (k/(beta h)) |theta'| at a wall held at T0: 2b tanh(b/2) (both walls) or 2c tanh c (one adiabatic). */
    private double wallHeatFlux() {
        double na = nahmeNumber();
        double slope;
        if (walls == Walls.BOTH_AT_WALL_TEMPERATURE) {
            double b = isothermalParameter(na);
            slope = 2 * b * Math.tanh(b / 2);
        } else {
            double c = adiabaticParameter(na);
            slope = 2 * c * Math.tanh(c);
        }
        return conductivity / (coefficient * gap) * slope;
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
        return "steady Couette flow with viscous heating, exponential viscosity (Nahme problem)";
    }

    @Override
    public String source() {
        return "R. Nahme, Ing.-Arch. 11, 191 (1940); J. Gavis, R. L. Laurence, Ind. Eng. Chem. Fundam. 7, 232-239 "
                + "(1968) (citations from memory); closed forms derived and checked for filmshear";
    }

    @Override
    public boolean hasTemperature() {
        return true;
    }

}
