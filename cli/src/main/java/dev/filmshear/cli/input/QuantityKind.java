package dev.filmshear.cli.input;

import java.util.List;

/**
 * What a key of a case file expects: the dimension (or dimensions) it accepts, the SI unit in which its
 * value is used, how a bare number is read, and an example for messages.
 *
 * <p>Several kinds share a dimension and differ in how a value is converted:
 * <ul>
 *   <li>{@link #ABSOLUTE_TEMPERATURE} applies the zero offset of a lone {@code degC} or {@code degF}
 *       (104 degF = (104 + 459.67) * 5/9 K = 313.15 K); {@link #TEMPERATURE_DIFFERENCE} does not
 *       (10 degF = 50/9 K).</li>
 *   <li>{@link #ROTATIONAL_SPEED} and {@link #FREQUENCY} are both 1/s; with the convention 1 rev = 1 of
 *       {@link Units} a rotational speed comes out in rev/s ("3000 rpm" = 50 rev/s, "50 Hz" = 50 rev/s).</li>
 *   <li>{@link #ANGLE} needs an angular unit (rad, deg, rev) and is used in radians; a bare number is
 *       radians. {@link #DIMENSIONLESS} refuses angular units.</li>
 *   <li>{@link #DYNAMIC_OR_KINEMATIC_VISCOSITY} accepts Pa*s or m^2/s; the caller converts a kinematic
 *       value with the density. A bare number is a dynamic viscosity in Pa*s.</li>
 * </ul>
 */
public enum QuantityKind {
    LENGTH("a length", "m", Dimension.LENGTH, "25 um"),
    VELOCITY("a velocity", "m/s", Dimension.VELOCITY, "20 m/s"),
    ABSOLUTE_TEMPERATURE("a temperature", "K", Dimension.TEMPERATURE, "40 degC"),
    TEMPERATURE_DIFFERENCE("a temperature difference", "K", Dimension.TEMPERATURE, "10 K"),
    TIME("a time", "s", Dimension.TIME, "2 ms"),
    FREQUENCY("a frequency", "Hz", Dimension.FREQUENCY, "50 Hz"),
    ROTATIONAL_SPEED("a rotational speed", "rev/s", Dimension.FREQUENCY, "3000 rpm"),
    ANGLE("an angle", "rad", Dimension.NONE, "90 deg"),
    DIMENSIONLESS("a plain number", "", Dimension.NONE, null),
    DYNAMIC_OR_KINEMATIC_VISCOSITY("a dynamic or kinematic viscosity", "Pa*s",
            List.of(Dimension.DYNAMIC_VISCOSITY, Dimension.KINEMATIC_VISCOSITY), "30 mPa*s", "32 cSt"),
    DYNAMIC_VISCOSITY("a dynamic viscosity", "Pa*s", Dimension.DYNAMIC_VISCOSITY, "30 mPa*s"),
    KINEMATIC_VISCOSITY("a kinematic viscosity", "m^2/s", Dimension.KINEMATIC_VISCOSITY, "32 cSt"),
    DENSITY("a density", "kg/m^3", Dimension.DENSITY, "860 kg/m^3"),
    SPECIFIC_HEAT("a specific heat", "J/(kg*K)", Dimension.SPECIFIC_HEAT, "1950 J/(kg*K)"),
    CONDUCTIVITY("a thermal conductivity", "W/(m*K)", Dimension.CONDUCTIVITY, "0.13 W/(m*K)"),
    EXPANSION("a coefficient per kelvin", "1/K", Dimension.PER_KELVIN, "6.5e-4 1/K"),
    HEAT_FLUX("a heat flux", "W/m^2", Dimension.HEAT_FLUX, "0 W/m^2"),
    HEAT_TRANSFER_COEFFICIENT("a heat-transfer coefficient", "W/(m^2*K)", Dimension.HEAT_TRANSFER_COEFFICIENT,
            "800 W/(m^2*K)"),
    PRESSURE_GRADIENT("a pressure gradient", "Pa/m", Dimension.PRESSURE_GRADIENT, "-2e6 Pa/m"),
    PRESSURE("a pressure", "Pa", Dimension.PRESSURE, "0.101325 MPa"),
    FORCE_PER_AREA("a force per unit wall area", "Pa", Dimension.PRESSURE, "2 kPa"),
    AREAL_MASS("a mass per unit wall area", "kg/m^2", Dimension.AREAL_MASS, "3 kg/m^2"),
    MOMENT_OF_INERTIA("a moment of inertia", "kg*m^2", Dimension.MOMENT_OF_INERTIA, "0.02 kg*m^2"),
    TORQUE("a torque", "N*m", Dimension.ENERGY, "1.5 N*m");

    private final String noun;
    private final String siUnit;
    private final List<Dimension> dimensions;
    private final List<String> examples;

    QuantityKind(String noun, String siUnit, Dimension dimension, String example) {
        this(noun, siUnit, List.of(dimension), example == null ? new String[0] : new String[] {example});
    }

    QuantityKind(String noun, String siUnit, List<Dimension> dimensions, String... examples) {
        this.noun = noun;
        this.siUnit = siUnit;
        this.dimensions = dimensions;
        this.examples = List.of(examples);
    }

    /** In words, for example "a velocity". */
    public String noun() {
        return noun;
    }

    /** The SI unit in which the value is used and in which a bare number is read (empty when none). */
    public String siUnit() {
        return siUnit;
    }

    /** The dimensions this kind accepts. */
    public List<Dimension> dimensions() {
        return dimensions;
    }

    /** What a key of this kind accepts, for messages: {@code a velocity such as "20 m/s"}. */
    public String expectation() {
        if (examples.isEmpty()) {
            return noun + " such as 0.5";
        }
        StringBuilder text = new StringBuilder(noun).append(" such as ");
        for (int i = 0; i < examples.size(); i++) {
            text.append(i > 0 ? " or " : "").append('"').append(examples.get(i)).append('"');
        }
        return text.toString();
    }

    /**
     * The SI value of a quantity for a key of this kind.
     *
     * @throws UnitException when the unit's dimension does not fit, or an absolute temperature lies below
     *     absolute zero
     */
    public double toSi(Quantity quantity) {
        Unit unit = quantity.unit();
        if (unit.isNone()) {
            return checked(quantity.number());
        }
        if (!dimensions.contains(quantity.dimension())) {
            throw new UnitException("unit \"" + unit.symbol() + "\" is " + quantity.dimension().describe()
                    + ", not " + noun, expectation());
        }
        if (this == ANGLE && !unit.angular()) {
            throw new UnitException("unit \"" + unit.symbol() + "\" is not an angle", expectation());
        }
        if (this == DIMENSIONLESS && unit.angular()) {
            throw new UnitException("unit \"" + unit.symbol() + "\" is an angle, not a plain number", expectation());
        }
        return checked(switch (this) {
            case ABSOLUTE_TEMPERATURE -> quantity.absolute();
            // Angular units are in revolutions (1 rev = 1); an angle is used in radians.
            case ANGLE -> quantity.interval() * 2 * Math.PI;
            default -> quantity.interval();
        });
    }

    private double checked(double si) {
        if (this == ABSOLUTE_TEMPERATURE && si < 0) {
            throw new UnitException("temperature below absolute zero",
                    "a temperature of 0 K or more such as \"40 degC\"");
        }
        return si;
    }
}
