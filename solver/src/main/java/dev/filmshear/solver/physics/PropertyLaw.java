package dev.filmshear.solver.physics;

import dev.filmshear.solver.base.InvalidParameterException;

/**
 * A material property that may vary linearly with temperature:
 * value(T) = reference * (1 + slope * (T - referenceTemperature)).
 *
 * <p>Used for the specific heat and the thermal conductivity of the fluid. A mineral oil's
 * conductivity falls by roughly 0.05 % per kelvin and its specific heat rises by about 0.2 % per kelvin
 * (C. S. Cragoe, <i>Thermal Properties of Petroleum Products</i>, NBS Misc. Publ. 97, 1929; coefficients
 * from memory), which a linear law captures over a film's temperature range.
 *
 * @param reference value at the reference temperature (SI unit of the property)
 * @param referenceTemperature K
 * @param slope relative change per kelvin (1/K); 0 for a constant property
 */
public record PropertyLaw(double reference, double referenceTemperature, double slope) {

    public PropertyLaw {
        InvalidParameterException.requirePositive("reference", reference, "");
        InvalidParameterException.requireFinite("reference_temperature", referenceTemperature, "K");
        InvalidParameterException.requireFinite("slope", slope, "1/K");
    }

    /** A property that does not change with temperature. */
    public static PropertyLaw constant(double value) {
        return new PropertyLaw(value, 0, 0);
    }

    /** True when the value does not change with temperature. */
    public boolean isConstant() {
        return slope == 0;
    }

    /** Value at temperature {@code t} (K). */
    public double value(double t) {
        return slope == 0 ? reference : reference * (1 + slope * (t - referenceTemperature));
    }

    /** Derivative with respect to temperature. */
    public double derivative(double t) {
        return reference * slope;
    }

    /** Integral of value(T) dT from {@code from} to {@code to}. */
    public double integral(double from, double to) {
        double mid = 0.5 * (from + to);
        return value(mid) * (to - from);
    }
}
