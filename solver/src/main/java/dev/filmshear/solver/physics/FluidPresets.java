package dev.filmshear.solver.physics;

import java.util.List;
import java.util.Optional;

/**
 * The built-in fluids, in a fixed order: {@code air}, {@code water}, {@code iso-vg-32},
 * {@code iso-vg-46}, {@code iso-vg-68}, {@code iso-vg-100}.
 *
 * <ul>
 *   <li>Air: Sutherland's law with the U.S. Standard Atmosphere 1976 constants (Eq. 51); density,
 *       specific heat and conductivity at 20 degC and 1 atm from Y. A. Cengel and A. J. Ghajar,
 *       <i>Heat and Mass Transfer</i>, "Properties of air at 1 atm pressure" (Table A-15 in the edition
 *       seen), held constant.</li>
 *   <li>Water: IAPWS 2008 viscosity at 0.101325 MPa with IF97 density; density from IAPWS-IF97 at
 *       20 degC, specific heat and conductivity at 20 degC from Cengel and Ghajar, "Properties of
 *       saturated water" (Table A-9 in the edition seen), held constant.</li>
 *   <li>ISO VG 32, 46, 68, 100 mineral oils: ASTM D341 (Walther) lines through the grade's 40 degC
 *       mid-point kinematic viscosity (ISO 3448) and a typical 100 degC viscosity invented for
 *       demonstration; density 870 kg/m^3 at 15 degC with expansion 7e-4 1/K, c_p = 1950 J/(kg K),
 *       k = 0.13 W/(m K), the common-practice single-value set for mineral oils (see the project's
 *       reference sheet, section 6.1).</li>
 * </ul>
 */
public final class FluidPresets {

    private static final double CELSIUS_ZERO = 273.15;

    /** Cengel and Ghajar, properties of air at 1 atm, 20 degC. */
    private static final double AIR_DENSITY = 1.204;
    private static final double AIR_SPECIFIC_HEAT = 1007;
    private static final double AIR_CONDUCTIVITY = 0.02514;

    /** Cengel and Ghajar, properties of saturated water, 20 degC. */
    private static final double WATER_SPECIFIC_HEAT = 4182;
    private static final double WATER_CONDUCTIVITY = 0.598;

    /** Common-practice single-value set for a mineral lubricating oil (typical, not from one source). */
    private static final double OIL_DENSITY = 870;
    private static final double OIL_DENSITY_TEMPERATURE = CELSIUS_ZERO + 15;
    private static final double OIL_EXPANSION = 7e-4;
    private static final double OIL_SPECIFIC_HEAT = 1950;
    private static final double OIL_CONDUCTIVITY = 0.13;

    private static final List<FluidPreset> PRESETS = List.of(
            air(),
            water(),
            isoGradeOil(32, 32, 5.4),
            isoGradeOil(46, 46, 6.8),
            isoGradeOil(68, 68, 8.7),
            isoGradeOil(100, 100, 11.2));

    private static final List<String> NAMES = PRESETS.stream().map(FluidPreset::name).toList();

    private FluidPresets() {
    }

    /** The preset names, in the fixed order of the class javadoc. */
    public static List<String> names() {
        return NAMES;
    }

    /** Every preset, in the order of {@link #names()}. */
    public static List<FluidPreset> all() {
        return PRESETS;
    }

    /** The preset with exactly this name, if there is one. */
    public static Optional<FluidPreset> find(String name) {
        return PRESETS.stream().filter(preset -> preset.name().equals(name)).findFirst();
    }

    private static FluidPreset air() {
        return new FluidPreset("air",
                "air at 1 atm: Sutherland viscosity after the U.S. Standard Atmosphere 1976 (Eq. 51, "
                        + "C1 = 1.458e-6 kg/(m s K^0.5), S = 110.4 K); density, specific heat and conductivity at "
                        + "20 degC from Cengel and Ghajar, properties of air at 1 atm",
                DensityLaw.constant(AIR_DENSITY),
                SutherlandViscosity.AIR_USSA_1976,
                PropertyLaw.constant(AIR_SPECIFIC_HEAT),
                PropertyLaw.constant(AIR_CONDUCTIVITY),
                "viscosity valid 170-1900 K; density, c_p and k are 20 degC values held constant (at constant "
                        + "pressure the density of air falls by about 0.34 % per kelvin and k rises by about "
                        + "0.3 % per kelvin), so keep temperature rises small");
    }

    private static FluidPreset water() {
        double roomTemperature = CELSIUS_ZERO + 20;
        WaterViscosity viscosity = new WaterViscosity(WaterViscosity.STANDARD_ATMOSPHERE);
        return new FluidPreset("water",
                "liquid water at 0.101325 MPa: IAPWS 2008 viscosity (industrial, mu2 = 1) with IAPWS-IF97 density; "
                        + "density from IAPWS-IF97 at 20 degC; specific heat and conductivity at 20 degC from "
                        + "Cengel and Ghajar, properties of saturated water",
                DensityLaw.constant(viscosity.density(roomTemperature)),
                viscosity,
                PropertyLaw.constant(WATER_SPECIFIC_HEAT),
                PropertyLaw.constant(WATER_CONDUCTIVITY),
                "viscosity valid 273.15 K to boiling (373.12 K); density, c_p and k are 20 degC values held "
                        + "constant (from 20 to 40 degC the density falls 0.6 % and k rises 5.5 %)");
    }

    /**
     * A mineral oil of an ISO 3448 grade.
     *
     * @param grade ISO VG number
     * @param midPoint40 the grade's mid-point kinematic viscosity at 40 degC (mm^2/s), ISO 3448
     * @param typical100 kinematic viscosity at 100 degC (mm^2/s): typical of a paraffinic mineral oil of
     *     the grade, invented for demonstration and not taken from any product
     */
    private static FluidPreset isoGradeOil(int grade, double midPoint40, double typical100) {
        DensityLaw density = new DensityLaw(OIL_DENSITY, OIL_DENSITY_TEMPERATURE, OIL_EXPANSION);
        WaltherViscosity viscosity = WaltherViscosity.throughPoints(
                CELSIUS_ZERO + 40, midPoint40 * 1e-6, CELSIUS_ZERO + 100, typical100 * 1e-6, density);
        return new FluidPreset("iso-vg-" + grade,
                "mineral oil ISO VG " + grade + ": ASTM D341 line through " + midPoint40
                        + " mm^2/s at 40 degC (ISO 3448 mid-point) and " + typical100
                        + " mm^2/s at 100 degC (typical, invented for demonstration); density 870 kg/m^3 at "
                        + "15 degC, expansion 7e-4 1/K, c_p 1950 J/(kg K), k 0.13 W/(m K) (typical values)",
                density,
                viscosity,
                PropertyLaw.constant(OIL_SPECIFIC_HEAT),
                PropertyLaw.constant(OIL_CONDUCTIVITY),
                "viscosity valid " + viscosity.validFrom() + " K to " + viscosity.validTo()
                        + " K (20 K below the 40 degC point to 50 K above the 100 degC point); c_p and k held "
                        + "constant, a real oil's c_p rises and its k falls slowly with temperature");
    }
}
