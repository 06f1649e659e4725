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
     * The built-in presets, by name. Empty in this version; a preset is added here as one entry written
     * in TOML.
     */
    public static Map<String, FluidPreset> standard() {
        return Map.of();
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
