package dev.filmshear.cli.input;

import com.fasterxml.jackson.databind.JsonNode;
import dev.filmshear.solver.base.InvalidParameterException;
import dev.filmshear.solver.physics.DensityLaw;
import dev.filmshear.solver.physics.ViscosityLaw;

import java.util.function.Supplier;

/**
 * What a {@link LawReader} sees of its {@code [fluid.viscosity]} table: unit-aware reads of its keys,
 * the fluid's density law (to turn a kinematic viscosity into a dynamic one), the initial temperature,
 * and a {@link #build(Supplier)} that reports the law record's rejected parameters at the right key.
 *
 * <p>Every read fails with an {@link InputException} naming {@code fluid.viscosity.KEY} and its line.
 */
public final class LawInput {
    /** Temperature at which a kinematic value is converted when nothing else fixes one (20 degC). */
    static final double ROOM_TEMPERATURE = 293.15;

    private final Section table;
    private final DensityLaw density;
    private final double initialTemperature;

    LawInput(Section table, DensityLaw density, double initialTemperature) {
        this.table = table;
        this.density = density;
        this.initialTemperature = initialTemperature;
    }

    /** The full dotted key of one of the law's keys, for messages. */
    public String key(String name) {
        return table.key(name);
    }

    /** True when the table gives {@code name}. */
    public boolean has(String name) {
        return table.has(name);
    }

    /** A required quantity, in SI. */
    public double quantity(String name, QuantityKind kind) {
        return table.quantity(name, kind);
    }

    /** An optional quantity, in SI, or {@code fallback}. */
    public double quantity(String name, QuantityKind kind, double fallback) {
        return table.quantity(name, kind, fallback);
    }

    /** A required array of quantities, in SI. */
    public double[] quantities(String name, QuantityKind kind) {
        return table.quantities(name, kind);
    }

    /**
     * A required viscosity as a dynamic viscosity (Pa s): a kinematic value (m^2/s, cSt) is multiplied by
     * the density at {@code temperature}; a bare number is taken as Pa s.
     */
    public double dynamicViscosity(String name, double temperature) {
        return toDynamic(table.key(name), table.raw(name), name, temperature);
    }

    /** A required array of viscosities as dynamic viscosities (Pa s), each kinematic one converted at its temperature. */
    public double[] dynamicViscosities(String name, double[] temperatures) {
        JsonNode values = table.raw(name);
        if (values == null) {
            throw table.missing(name, "an array of viscosities such as [\"30 mPa*s\", \"12 mPa*s\"]");
        }
        if (!values.isArray()) {
            throw table.wrongType(name, "an array", "an array of viscosities such as [\"30 mPa*s\", \"12 mPa*s\"]");
        }
        if (values.size() != temperatures.length) {
            throw table.error(name, values.size() + (values.size() == 1 ? " value" : " values") + " for "
                            + temperatures.length + " temperatures",
                    table.written(name), "one value per temperature");
        }
        double[] mu = new double[temperatures.length];
        for (int i = 0; i < mu.length; i++) {
            mu[i] = toDynamic(table.key(name) + "[" + i + "]", values.get(i), name, temperatures[i]);
        }
        return mu;
    }

    private double toDynamic(String fullKey, JsonNode value, String name, double temperature) {
        if (value == null) {
            throw table.missing(name, QuantityKind.DYNAMIC_OR_KINEMATIC_VISCOSITY.expectation());
        }
        Quantity q = table.parse(fullKey, value, QuantityKind.DYNAMIC_OR_KINEMATIC_VISCOSITY);
        double si = table.toSi(fullKey, value, QuantityKind.DYNAMIC_OR_KINEMATIC_VISCOSITY);
        return q.dimension().equals(Dimension.KINEMATIC_VISCOSITY) ? si * density.density(temperature) : si;
    }

    /** The uniform initial temperature (K), NaN when the case gives none. */
    public double initialTemperature() {
        return initialTemperature;
    }

    /**
     * The temperature (K) at which a temperature-free law converts a kinematic value: the initial
     * temperature, else the density's reference temperature when the density varies, else 293.15 K
     * (then the density is constant and the choice does not matter).
     */
    public double conversionTemperature() {
        if (!Double.isNaN(initialTemperature)) {
            return initialTemperature;
        }
        return density.isConstant() ? ROOM_TEMPERATURE : density.referenceTemperature();
    }

    /** The fluid's density law. */
    public DensityLaw density() {
        return density;
    }

    /** {@code valid_from} (K) if given, else {@code fallback}. */
    public double validFrom(double fallback) {
        return table.quantity("valid_from", QuantityKind.ABSOLUTE_TEMPERATURE, fallback);
    }

    /** {@code valid_to} (K) if given, else {@code fallback}. */
    public double validTo(double fallback) {
        return table.quantity("valid_to", QuantityKind.ABSOLUTE_TEMPERATURE, fallback);
    }

    /**
     * Calls a law record's constructor; a rejected parameter {@code p} is reported at
     * {@code fluid.viscosity.p} when the table has that key, else at the table.
     */
    public <T extends ViscosityLaw> T build(Supplier<T> constructor) {
        try {
            return constructor.get();
        } catch (InvalidParameterException e) {
            String name = e.parameter();
            int bracket = name.indexOf('[');
            String base = bracket > 0 ? name.substring(0, bracket) : name;
            String key = table.has(base) ? table.key(base) + name.substring(base.length()) : table.path();
            String given = table.has(name) ? table.written(name) : e.given();
            TomlDocument.Location where = table.doc().location(table.has(base) ? table.key(base) : key);
            throw new InputException(where.file(), where.line(), key, "value not allowed", given, e.allowed(), e);
        }
    }

    /** An input error at one of the law's keys. */
    public InputException error(String name, String problem, String given, String allowed) {
        return table.error(name, problem, given, allowed);
    }
}
