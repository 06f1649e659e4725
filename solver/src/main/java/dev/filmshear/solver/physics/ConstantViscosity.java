package dev.filmshear.solver.physics;

import dev.filmshear.solver.base.InvalidParameterException;

/**
 * A viscosity that does not depend on temperature: mu = value.
 *
 * @param value dynamic viscosity (Pa s)
 */
public record ConstantViscosity(double value) implements ViscosityLaw {

    public ConstantViscosity {
        InvalidParameterException.requirePositive("value", value, "Pa*s");
    }

    @Override
    public String name() {
        return "constant";
    }

    @Override
    public double mu(double temperature) {
        return value;
    }

    @Override
    public double dMuDT(double temperature) {
        return 0;
    }

    @Override
    public double validFrom() {
        return 0;
    }

    @Override
    public double validTo() {
        return Double.POSITIVE_INFINITY;
    }

    @Override
    public boolean isConstant() {
        return true;
    }

    @Override
    public String describe() {
        return "constant: mu = " + value + " Pa*s";
    }
}
