package dev.filmshear.cli.input;

import com.fasterxml.jackson.core.JsonProcessingException;
import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.node.ObjectNode;
import com.fasterxml.jackson.dataformat.toml.TomlMapper;

import java.util.Map;
import java.util.Objects;

/**
 * A built-in fluid: the keys of a {@code [fluid]} table, written in TOML with units exactly as a user
 * would write them, so that a preset is read, converted and validated by the same code as a case file.
 *
 * <p>How a preset combines with a case: the case's own {@code [fluid]} keys replace the preset's, a
 * {@code [fluid.viscosity]} table in the case replaces the preset's viscosity table as a whole, and the
 * preset's {@code specific_heat} and {@code thermal_conductivity} are used only when the case is thermal
 * (they never turn an isothermal case into a thermal one).
 *
 * @param name the value of {@code preset} in a case file
 * @param description one line for listings
 * @param fluidToml the body of a {@code [fluid]} table (may contain a {@code [viscosity]} sub-table)
 */
public record FluidPreset(String name, String description, String fluidToml) {

    private static final TomlMapper MAPPER = new TomlMapper();

    public FluidPreset {
        Objects.requireNonNull(name, "name");
        Objects.requireNonNull(description, "description");
        Objects.requireNonNull(fluidToml, "fluidToml");
        parse(name, fluidToml);
    }

    /**
     * The built-in presets, by name, in the solver's order: each of
     * {@link dev.filmshear.solver.physics.FluidPresets} written out as a {@code [fluid]} table, so the
     * solver's records stay the one source of every preset's numbers.
     */
    public static Map<String, FluidPreset> standard() {
        Map<String, FluidPreset> presets = new java.util.LinkedHashMap<>();
        for (dev.filmshear.solver.physics.FluidPreset p : dev.filmshear.solver.physics.FluidPresets.all()) {
            presets.put(p.name(), new FluidPreset(p.name(), p.description(), render(p)));
        }
        return presets;
    }

    /** A solver preset as the body of a {@code [fluid]} table, every value with its SI unit. */
    static String render(dev.filmshear.solver.physics.FluidPreset p) {
        StringBuilder toml = new StringBuilder();
        dev.filmshear.solver.physics.DensityLaw density = p.density();
        toml.append("density = \"").append(density.reference()).append(" kg/m^3\"\n");
        if (!density.isConstant()) {
            toml.append("density_temperature = \"").append(density.referenceTemperature()).append(" K\"\n");
            toml.append("thermal_expansion = \"").append(density.expansion()).append(" 1/K\"\n");
        }
        toml.append("specific_heat = \"").append(p.specificHeat().reference()).append(" J/(kg*K)\"\n");
        toml.append("thermal_conductivity = \"").append(p.conductivity().reference()).append(" W/(m*K)\"\n");
        toml.append("[viscosity]\n");
        dev.filmshear.solver.physics.ViscosityLaw law = p.viscosity();
        toml.append("law = \"").append(law.name()).append("\"\n");
        if (law instanceof dev.filmshear.solver.physics.SutherlandViscosity s) {
            toml.append("reference = \"").append(s.reference()).append(" Pa*s\"\n");
            toml.append("reference_temperature = \"").append(s.referenceTemperature()).append(" K\"\n");
            toml.append("constant = \"").append(s.constant()).append(" K\"\n");
        } else if (law instanceof dev.filmshear.solver.physics.WaterViscosity w) {
            toml.append("pressure = \"").append(w.pressure()).append(" Pa\"\n");
            return toml.toString();
        } else if (law instanceof dev.filmshear.solver.physics.WaltherViscosity w) {
            double t1 = 313.15;
            double t2 = 373.15;
            toml.append("temperatures = [\"").append(t1).append(" K\", \"").append(t2).append(" K\"]\n");
            toml.append("values = [\"").append(w.kinematicViscosity(t1)).append(" m^2/s\", \"")
                    .append(w.kinematicViscosity(t2)).append(" m^2/s\"]\n");
        } else {
            throw new IllegalStateException("no TOML form for the preset law " + law.name());
        }
        toml.append("valid_from = \"").append(law.validFrom()).append(" K\"\n");
        toml.append("valid_to = \"").append(law.validTo()).append(" K\"\n");
        return toml.toString();
    }

    /** The preset's {@code [fluid]} table as a fresh tree. */
    public ObjectNode fluidTable() {
        return parse(name, fluidToml);
    }

    private static ObjectNode parse(String name, String toml) {
        JsonNode tree;
        try {
            tree = MAPPER.readTree(toml);
        } catch (JsonProcessingException e) {
            throw new IllegalArgumentException("fluid preset " + name + " is not valid TOML", e);
        }
        return tree instanceof ObjectNode o ? o : MAPPER.createObjectNode();
    }
}
