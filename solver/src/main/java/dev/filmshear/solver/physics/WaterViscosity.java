package dev.filmshear.solver.physics;

import dev.filmshear.solver.base.InvalidParameterException;

/**
 * Viscosity of liquid water at a fixed pressure: the IAPWS 2008 formulation for industrial use
 * ({@link Iapws2008Viscosity}, critical enhancement mu2 = 1) evaluated at the density that IAPWS-IF97
 * region 1 gives at (T, p) ({@link Iapws97Region1}).
 *
 * <p>mu(T) = mu_IAPWS2008(T, rho_IF97(T, p)). Validity: from 273.15 K to the saturation temperature at
 * the pressure ({@link Iapws97Region4}; 373.12 K at 0.101325 MPa), or to 623.15 K, the upper end of
 * IF97 region 1, above 16.53 MPa where saturation lies higher.
 *
 * <p>The derivative is a central finite difference with a step of {@value #DERIVATIVE_STEP} K, not an
 * analytic one (which would need the derivatives of both formulations): its truncation error is about
 * (h d ln mu / dT)^2 / 6, near 1e-8 relative for water, and its rounding error near 1e-11. Each
 * derivative costs two viscosity evaluations, acceptable because water is not the usual film fluid of
 * the hot path.
 *
 * @param pressure absolute pressure (Pa), from the saturation pressure at 273.15 K (about 611 Pa) to 100 MPa
 */
public record WaterViscosity(double pressure) implements ViscosityLaw {

    /** Standard atmospheric pressure (Pa), the usual pressure of a water film's law. */
    public static final double STANDARD_ATMOSPHERE = 101_325;
    /** Step of the central finite difference for dmu/dT (K). */
    public static final double DERIVATIVE_STEP = 0.01;

    /** Lowest temperature of IF97 region 1 (K). */
    private static final double MIN_TEMPERATURE = 273.15;
    /** Highest temperature of IF97 region 1 (K). */
    private static final double MAX_TEMPERATURE = 623.15;
    /** Highest pressure of IF97 region 1 (Pa). */
    private static final double MAX_PRESSURE = 100e6;

    public WaterViscosity {
        InvalidParameterException.requireFinite("pressure", pressure, "Pa");
        double lowest = Iapws97Region4.saturationPressure(MIN_TEMPERATURE);
        if (!(pressure >= lowest && pressure <= MAX_PRESSURE)) {
            throw new InvalidParameterException("pressure", InvalidParameterException.format(pressure, "Pa"),
                    "from " + lowest + " Pa (saturation at 273.15 K) to 1e8 Pa (IAPWS-IF97 region 1)");
        }
    }

    @Override
    public String name() {
        return "water";
    }

    /** Density of liquid water (kg/m^3) at this pressure and temperature {@code temperature} (K), IF97 region 1. */
    public double density(double temperature) {
        return Iapws97Region1.density(temperature, pressure);
    }

    @Override
    public double mu(double temperature) {
        return Iapws2008Viscosity.viscosity(temperature, Iapws97Region1.density(temperature, pressure));
    }

    @Override
    public double dMuDT(double temperature) {
        return (mu(temperature + DERIVATIVE_STEP) - mu(temperature - DERIVATIVE_STEP)) / (2 * DERIVATIVE_STEP);
    }

    @Override
    public double validFrom() {
        return MIN_TEMPERATURE;
    }

    @Override
    public double validTo() {
        return pressure < Iapws97Region4.saturationPressure(MAX_TEMPERATURE)
                ? Iapws97Region4.saturationTemperature(pressure)
                : MAX_TEMPERATURE;
    }

    @Override
    public String describe() {
        return "water: IAPWS 2008 viscosity (industrial, mu2 = 1) at IAPWS-IF97 region-1 density, p = " + pressure
                + " Pa, valid " + validFrom() + " K to " + validTo() + " K";
    }
}
