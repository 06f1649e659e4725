package dev.filmshear.cli.input;

import java.util.Map;

/**
 * The physical dimension of a quantity as integer exponents of the SI base units it can involve here:
 * metre, kilogram, second and kelvin. A velocity is m^1 s^-1, a dynamic viscosity kg m^-1 s^-1.
 *
 * <p>Angles and revolutions are dimensionless (see {@link Units} for the convention 1 rev = 1).
 *
 * @param m exponent of the metre
 * @param kg exponent of the kilogram
 * @param s exponent of the second
 * @param k exponent of the kelvin
 */
public record Dimension(int m, int kg, int s, int k) {
    public static final Dimension NONE = new Dimension(0, 0, 0, 0);
    public static final Dimension LENGTH = new Dimension(1, 0, 0, 0);
    public static final Dimension MASS = new Dimension(0, 1, 0, 0);
    public static final Dimension TIME = new Dimension(0, 0, 1, 0);
    public static final Dimension TEMPERATURE = new Dimension(0, 0, 0, 1);
    public static final Dimension FREQUENCY = new Dimension(0, 0, -1, 0);
    public static final Dimension VELOCITY = new Dimension(1, 0, -1, 0);
    public static final Dimension DYNAMIC_VISCOSITY = new Dimension(-1, 1, -1, 0);
    public static final Dimension KINEMATIC_VISCOSITY = new Dimension(2, 0, -1, 0);
    public static final Dimension DENSITY = new Dimension(-3, 1, 0, 0);
    public static final Dimension SPECIFIC_HEAT = new Dimension(2, 0, -2, -1);
    public static final Dimension CONDUCTIVITY = new Dimension(1, 1, -3, -1);
    public static final Dimension PER_KELVIN = new Dimension(0, 0, 0, -1);
    public static final Dimension HEAT_FLUX = new Dimension(0, 1, -3, 0);
    public static final Dimension HEAT_TRANSFER_COEFFICIENT = new Dimension(0, 1, -3, -1);
    public static final Dimension PRESSURE = new Dimension(-1, 1, -2, 0);
    public static final Dimension PRESSURE_GRADIENT = new Dimension(-2, 1, -2, 0);
    public static final Dimension FORCE = new Dimension(1, 1, -2, 0);
    public static final Dimension ENERGY = new Dimension(2, 1, -2, 0);
    public static final Dimension POWER = new Dimension(2, 1, -3, 0);
    public static final Dimension AREAL_MASS = new Dimension(-2, 1, 0, 0);
    public static final Dimension MOMENT_OF_INERTIA = new Dimension(2, 1, 0, 0);

    /** Words for the dimensions a user meets, for messages ("m is a length"). */
    private static final Map<Dimension, String> NOUNS = Map.ofEntries(
            Map.entry(NONE, "a plain number"),
            Map.entry(LENGTH, "a length"),
            Map.entry(MASS, "a mass"),
            Map.entry(TIME, "a time"),
            Map.entry(TEMPERATURE, "a temperature"),
            Map.entry(FREQUENCY, "a frequency"),
            Map.entry(VELOCITY, "a velocity"),
            Map.entry(DYNAMIC_VISCOSITY, "a dynamic viscosity"),
            Map.entry(KINEMATIC_VISCOSITY, "a kinematic viscosity"),
            Map.entry(DENSITY, "a density"),
            Map.entry(SPECIFIC_HEAT, "a specific heat"),
            Map.entry(CONDUCTIVITY, "a thermal conductivity"),
            Map.entry(PER_KELVIN, "a coefficient per kelvin"),
            Map.entry(HEAT_FLUX, "a heat flux"),
            Map.entry(HEAT_TRANSFER_COEFFICIENT, "a heat-transfer coefficient"),
            Map.entry(PRESSURE, "a pressure"),
            Map.entry(PRESSURE_GRADIENT, "a pressure gradient"),
            Map.entry(FORCE, "a force"),
            Map.entry(ENERGY, "an energy"),
            Map.entry(POWER, "a power"),
            Map.entry(new Dimension(2, 0, 0, 0), "an area"),
            Map.entry(new Dimension(3, 0, 0, 0), "a volume"),
            Map.entry(new Dimension(1, 0, -2, 0), "an acceleration"));

    /** The product of two dimensions (exponents add). */
    public Dimension times(Dimension other) {
        return new Dimension(m + other.m, kg + other.kg, s + other.s, k + other.k);
    }

    /** The quotient of two dimensions (exponents subtract). */
    public Dimension over(Dimension other) {
        return new Dimension(m - other.m, kg - other.kg, s - other.s, k - other.k);
    }

    /** This dimension raised to an integer power. */
    public Dimension pow(int n) {
        return new Dimension(m * n, kg * n, s * n, k * n);
    }

    /** True for a plain number. */
    public boolean isNone() {
        return equals(NONE);
    }

    /** In words, for messages: "a velocity", or "of dimension kg*m/s^2" when it has no common name. */
    public String describe() {
        String noun = NOUNS.get(this);
        return noun != null ? noun : "of dimension " + this;
    }

    /** The dimension written with SI base units, for example {@code kg/(m*s)} or {@code 1/K}. */
    @Override
    public String toString() {
        StringBuilder num = new StringBuilder();
        StringBuilder den = new StringBuilder();
        int denFactors = 0;
        String[] symbols = {"kg", "m", "s", "K"};
        int[] exponents = {kg, m, s, k};
        for (int i = 0; i < symbols.length; i++) {
            int e = exponents[i];
            if (e == 0) {
                continue;
            }
            StringBuilder target = e > 0 ? num : den;
            if (target.length() > 0) {
                target.append('*');
            }
            target.append(symbols[i]);
            if (Math.abs(e) != 1) {
                target.append('^').append(Math.abs(e));
            }
            if (e < 0) {
                denFactors++;
            }
        }
        if (den.length() == 0) {
            return num.length() == 0 ? "1" : num.toString();
        }
        String denominator = denFactors > 1 ? "(" + den + ")" : den.toString();
        return (num.length() == 0 ? "1" : num.toString()) + "/" + denominator;
    }
}
