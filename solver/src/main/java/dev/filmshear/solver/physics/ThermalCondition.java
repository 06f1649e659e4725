package dev.filmshear.solver.physics;

import dev.filmshear.solver.base.InvalidParameterException;

/**
 * The thermal condition at a wall: a fixed temperature, a heat flux into the fluid, or convective
 * exchange with an ambient through a heat-transfer coefficient.
 */
public sealed interface ThermalCondition
        permits ThermalCondition.FixedTemperature, ThermalCondition.HeatFlux, ThermalCondition.HeatTransfer {

    /**
     * An isothermal wall.
     *
     * @param temperature K
     */
    record FixedTemperature(double temperature) implements ThermalCondition {
        public FixedTemperature {
            InvalidParameterException.requirePositive("temperature", temperature, "K");
        }
    }

    /**
     * A prescribed heat flux into the fluid; zero for an adiabatic (insulated) wall.
     *
     * @param flux W/m^2, positive into the fluid
     */
    record HeatFlux(double flux) implements ThermalCondition {
        public static final HeatFlux ADIABATIC = new HeatFlux(0);

        public HeatFlux {
            InvalidParameterException.requireFinite("heat_flux", flux, "W/m^2");
        }
    }

    /**
     * Heat exchange with an ambient: flux into the fluid = coefficient * (ambient - T_wall).
     *
     * @param coefficient heat-transfer coefficient (W/(m^2 K)), above zero
     * @param ambient ambient temperature (K)
     */
    record HeatTransfer(double coefficient, double ambient) implements ThermalCondition {
        public HeatTransfer {
            InvalidParameterException.requirePositive("coefficient", coefficient, "W/(m^2*K)");
            InvalidParameterException.requirePositive("ambient", ambient, "K");
        }
    }
}
