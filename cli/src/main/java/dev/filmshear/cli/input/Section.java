package dev.filmshear.cli.input;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.node.JsonNodeFactory;
import com.fasterxml.jackson.databind.node.ObjectNode;

import java.util.ArrayList;
import java.util.Collection;
import java.util.List;
import java.util.Locale;
import java.util.Map;

/**
 * One table of a case file (a {@code [table]} or an inline table) with typed, unit-aware reads. Every
 * failure is an {@link InputException} at the full dotted key and its line.
 */
final class Section {
    private final TomlDocument doc;
    private final String path;
    private final ObjectNode node;
    private final boolean present;

    Section(TomlDocument doc, String path, ObjectNode node, boolean present) {
        this.doc = doc;
        this.path = path;
        this.node = node;
        this.present = present;
    }

    /** The whole document as a section. */
    static Section root(TomlDocument doc) {
        return new Section(doc, "", doc.tree(), true);
    }

    TomlDocument doc() {
        return doc;
    }

    String path() {
        return path;
    }

    ObjectNode node() {
        return node;
    }

    /** False for a table the file leaves out (every read then sees no keys). */
    boolean present() {
        return present;
    }

    /** The full dotted key of {@code name} in this table. */
    String key(String name) {
        return path.isEmpty() ? name : path + "." + name;
    }

    boolean has(String name) {
        return node.has(name);
    }

    JsonNode raw(String name) {
        return node.get(name);
    }

    /** The value of {@code name} as written, on one line. */
    String written(String name) {
        JsonNode value = node.get(name);
        return value == null ? "nothing" : TomlDocument.render(value);
    }

    /** Rejects every key not in {@code allowed}, listing the keys allowed here. */
    void allowOnly(Collection<String> allowed) {
        for (Map.Entry<String, JsonNode> field : node.properties()) {
            String name = field.getKey();
            if (!allowed.contains(name)) {
                throw error(name, "unknown key \"" + name + "\"" + closest(name, allowed),
                        name + " = " + TomlDocument.render(field.getValue()),
                        "keys " + (path.isEmpty() ? "at the top level" : "in " + path) + ": "
                                + String.join(", ", allowed));
            }
        }
    }

    /**
     * A sub-table (a {@code [path.name]} table or an inline table); an empty, absent section when the key
     * is missing.
     *
     * @param allowed the keys allowed inside it; none given = not checked here
     */
    Section table(String name, String... allowed) {
        JsonNode value = node.get(name);
        if (value == null) {
            return new Section(doc, key(name), JsonNodeFactory.instance.objectNode(), false);
        }
        if (!(value instanceof ObjectNode table)) {
            throw wrongType(name, "a table",
                    allowed.length == 0 ? "a table" : "a table with keys " + String.join(", ", allowed));
        }
        Section section = new Section(doc, key(name), table, true);
        if (allowed.length > 0) {
            section.allowOnly(List.of(allowed));
        }
        return section;
    }

    /** A required quantity of the given kind, in SI. */
    double quantity(String name, QuantityKind kind) {
        JsonNode value = node.get(name);
        if (value == null) {
            throw missing(name, kind.expectation());
        }
        return toSi(key(name), value, kind);
    }

    /** An optional quantity of the given kind, in SI, or {@code fallback}. */
    double quantity(String name, QuantityKind kind, double fallback) {
        JsonNode value = node.get(name);
        return value == null ? fallback : toSi(key(name), value, kind);
    }

    /** A required array of quantities of one kind, in SI; element errors name {@code key[i]}. */
    double[] quantities(String name, QuantityKind kind) {
        JsonNode value = node.get(name);
        if (value == null) {
            throw missing(name, "an array of " + kind.expectation().replaceFirst("^an? ", ""));
        }
        if (!value.isArray()) {
            throw wrongType(name, "an array", "an array such as [" + exampleOf(kind) + ", ...]");
        }
        double[] out = new double[value.size()];
        for (int i = 0; i < out.length; i++) {
            out[i] = toSi(key(name) + "[" + i + "]", value.get(i), kind);
        }
        return out;
    }

    /** The quantity written at {@code name} before conversion (bare numbers as {@link Quantity#bare}). */
    Quantity parsed(String name, QuantityKind kind) {
        JsonNode value = node.get(name);
        if (value == null) {
            throw missing(name, kind.expectation());
        }
        return parse(key(name), value, kind);
    }

    /** Converts a value written at the full key {@code key}. */
    double toSi(String key, JsonNode value, QuantityKind kind) {
        Quantity quantity = parse(key, value, kind);
        try {
            return kind.toSi(quantity);
        } catch (UnitException e) {
            throw errorAt(key, e.problem(), TomlDocument.render(value), e.allowed());
        }
    }

    Quantity parse(String key, JsonNode value, QuantityKind kind) {
        if (value.isNumber()) {
            double number = value.asDouble();
            if (!Double.isFinite(number)) {
                throw errorAt(key, "not a finite number", TomlDocument.render(value), withBare(kind));
            }
            return Quantity.bare(number);
        }
        if (value.isTextual()) {
            try {
                return Units.parse(value.textValue());
            } catch (UnitException e) {
                throw errorAt(key, e.problem(), TomlDocument.render(value), e.allowed());
            }
        }
        throw errorAt(key, "wrong type: expected " + kind.noun() + ", found " + typeOf(value),
                TomlDocument.render(value), withBare(kind));
    }

    /** An optional string, or {@code fallback}. */
    String string(String name, String fallback) {
        JsonNode value = node.get(name);
        if (value == null) {
            return fallback;
        }
        if (!value.isTextual()) {
            throw wrongType(name, "a string", "a string in double quotes");
        }
        return value.textValue();
    }

    /** An optional boolean, or {@code fallback}. */
    boolean bool(String name, boolean fallback) {
        JsonNode value = node.get(name);
        if (value == null) {
            return fallback;
        }
        if (!value.isBoolean()) {
            throw wrongType(name, "true or false", "true or false, without quotes");
        }
        return value.booleanValue();
    }

    /** An optional whole number, or {@code fallback}. */
    int integer(String name, int fallback, String allowed) {
        JsonNode value = node.get(name);
        if (value == null) {
            return fallback;
        }
        if (!value.isNumber()) {
            throw wrongType(name, "a whole number", allowed);
        }
        if (!value.isIntegralNumber()) {
            throw error(name, "not a whole number", written(name), allowed);
        }
        if (!value.canConvertToInt()) {
            throw error(name, "number out of range", written(name), allowed);
        }
        return value.intValue();
    }

    InputException error(String name, String problem, String given, String allowed) {
        return errorAt(key(name), problem, given, allowed);
    }

    InputException errorAt(String fullKey, String problem, String given, String allowed) {
        TomlDocument.Location where = doc.location(fullKey);
        return new InputException(where.file(), where.line(), fullKey, problem, given, allowed);
    }

    InputException missing(String name, String allowed) {
        String where = path.isEmpty() ? "at the top level" : present ? "in " + tableName() : "(no " + tableName() + " table)";
        return error(name, "missing key " + name + " " + where, "nothing", allowed);
    }

    InputException wrongType(String name, String expected, String allowed) {
        JsonNode value = node.get(name);
        return error(name, "wrong type: expected " + expected + ", found " + typeOf(value), written(name), allowed);
    }

    private String tableName() {
        return "[" + path + "]";
    }

    private static String withBare(QuantityKind kind) {
        return kind.siUnit().isEmpty() ? kind.expectation()
                : kind.expectation() + ", or a bare number in " + kind.siUnit();
    }

    private static String exampleOf(QuantityKind kind) {
        String expectation = kind.expectation();
        int quote = expectation.indexOf('"');
        return quote < 0 ? "0.5" : expectation.substring(quote, expectation.indexOf('"', quote + 1) + 1);
    }

    static String typeOf(JsonNode value) {
        if (value == null) {
            return "nothing";
        }
        if (value.isTextual()) {
            return "a string";
        }
        if (value.isBoolean()) {
            return "a boolean";
        }
        if (value.isNumber()) {
            return "a number";
        }
        if (value.isArray()) {
            return "an array";
        }
        return value.isObject() ? "a table" : "a " + value.getNodeType().name().toLowerCase(Locale.ROOT);
    }

    /** "; did you mean "gap"?" when an allowed key is within two edits (fewer for short keys) of {@code name}. */
    static String closest(String name, Collection<String> allowed) {
        List<String> near = new ArrayList<>();
        for (String candidate : allowed) {
            if (editDistance(name.toLowerCase(Locale.ROOT), candidate) <= Math.min(2, candidate.length() / 2)) {
                near.add("\"" + candidate + "\"");
            }
        }
        return near.isEmpty() ? "" : "; did you mean " + String.join(" or ", near) + "?";
    }

    /** Levenshtein distance, for suggestions only. */
    private static int editDistance(String a, String b) {
        int[] previous = new int[b.length() + 1];
        int[] current = new int[b.length() + 1];
        for (int j = 0; j <= b.length(); j++) {
            previous[j] = j;
        }
        for (int i = 1; i <= a.length(); i++) {
            current[0] = i;
            for (int j = 1; j <= b.length(); j++) {
                int substitution = previous[j - 1] + (a.charAt(i - 1) == b.charAt(j - 1) ? 0 : 1);
                current[j] = Math.min(substitution, Math.min(previous[j], current[j - 1]) + 1);
            }
            int[] swap = previous;
            previous = current;
            current = swap;
        }
        return previous[b.length()];
    }
}
