package dev.filmshear.cli.input;

import com.fasterxml.jackson.core.JsonLocation;
import com.fasterxml.jackson.core.JsonProcessingException;
import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.node.JsonNodeFactory;
import com.fasterxml.jackson.databind.node.ObjectNode;
import com.fasterxml.jackson.dataformat.toml.TomlMapper;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.Objects;
import java.util.Optional;

/**
 * A TOML text read into a tree, with the line of every key and, for parameter sweeps, values overridden
 * from elsewhere (a plan file) together with where each override came from.
 *
 * <p>The text is parsed by Jackson's {@link TomlMapper}; its syntax errors become an
 * {@link InputException} at the line Jackson reports (for a key defined twice, at the line of the second
 * definition). Jackson's tree carries no positions, so {@link LineIndex} scans the text once to map each
 * dotted key ({@code fluid.viscosity.law}, {@code upper_wall.velocity.to}, {@code output.times[2]}) to its
 * line. An overridden key, and everything under it, is located at the override's source instead.
 *
 * <p>Immutable: the tree is never handed out without copying, and {@link #withOverride} returns a new
 * document.
 */
public final class TomlDocument {

    /** Key used in messages for TOML syntax errors. */
    public static final String SYNTAX_KEY = "(syntax)";
    /** Key used in messages when the file itself cannot be read. */
    public static final String FILE_KEY = "(file)";

    /** Jackson's mapper is thread-safe once configured; it is only ever read from. */
    private static final TomlMapper MAPPER = new TomlMapper();

    /**
     * Where a value was written.
     *
     * @param file the file as the user named it
     * @param line 1-based line, 0 when unknown
     */
    public record Location(String file, int line) {
        public Location {
            Objects.requireNonNull(file, "file");
        }

        @Override
        public String toString() {
            return file + ":" + line;
        }
    }

    /**
     * One value set from outside the file.
     *
     * @param key the dotted key set
     * @param value the value (copied in and out)
     * @param source where the override was written (a plan file and its line)
     */
    public record KeyOverride(String key, JsonNode value, Location source) {
        public KeyOverride {
            Objects.requireNonNull(key, "key");
            Objects.requireNonNull(source, "source");
            value = value.deepCopy();
        }

        @Override
        public JsonNode value() {
            return value.deepCopy();
        }
    }

    private final String fileName;
    private final String text;
    private final ObjectNode tree;
    private final LineIndex index;
    private final List<KeyOverride> overrides;

    private TomlDocument(String fileName, String text, ObjectNode tree, LineIndex index, List<KeyOverride> overrides) {
        this.fileName = fileName;
        this.text = text;
        this.tree = tree;
        this.index = index;
        this.overrides = List.copyOf(overrides);
    }

    /**
     * Parses TOML text.
     *
     * @param text the file's content
     * @param fileName the file as the user named it, for messages
     * @throws InputException on a TOML syntax error
     */
    public static TomlDocument parse(String text, String fileName) {
        Objects.requireNonNull(text, "text");
        Objects.requireNonNull(fileName, "fileName");
        LineIndex index = LineIndex.scan(text);
        JsonNode root;
        try {
            root = MAPPER.readTree(text);
        } catch (JsonProcessingException e) {
            JsonLocation where = e.getLocation();
            int line = where == null ? 0 : where.getLineNr();
            String message = e.getOriginalMessage();
            boolean duplicate = message != null && (message.contains("Duplicate") || message.contains("redefined"));
            if (duplicate && index.duplicateLine() > 0) {
                line = index.duplicateLine();
            }
            throw new InputException(fileName, line, SYNTAX_KEY, "TOML syntax error: " + message,
                    lineText(text, line), "TOML 1.0 syntax (https://toml.io)", e);
        }
        ObjectNode tree = root instanceof ObjectNode o ? o : JsonNodeFactory.instance.objectNode();
        return new TomlDocument(fileName, text, tree, index, List.of());
    }

    /**
     * Reads and parses a TOML file (UTF-8).
     *
     * @throws InputException when the file cannot be read or is not valid TOML
     */
    public static TomlDocument read(Path file) {
        return parse(InputException.readText(file, FILE_KEY, "TOML file"), file.toString());
    }

    /** The file as the user named it. */
    public String fileName() {
        return fileName;
    }

    /** The text as read (without overrides). */
    public String text() {
        return text;
    }

    /** A copy of the whole tree, overrides applied. */
    public ObjectNode root() {
        return tree.deepCopy();
    }

    /** The tree itself, for readers in this package that only read it. */
    ObjectNode tree() {
        return tree;
    }

    /** The overrides applied, in order. */
    public List<KeyOverride> overrides() {
        return overrides;
    }

    /** True when the dotted key (array elements as {@code key[i]}) has a value. */
    public boolean has(String key) {
        return find(key) != null;
    }

    /** A copy of the value at a dotted key (array elements as {@code key[i]}), if present. */
    public Optional<JsonNode> get(String key) {
        JsonNode node = find(key);
        return node == null ? Optional.empty() : Optional.of(node.deepCopy());
    }

    /** The value at a dotted key rendered as TOML on one line ({@code "25 um"}, {@code { kind = "ramp" }}). */
    public Optional<String> written(String key) {
        JsonNode node = find(key);
        return node == null ? Optional.empty() : Optional.of(render(node));
    }

    /**
     * Where a key was written: the source of the override that set it (or a key above it), otherwise this
     * file at the key's line, or at the line of the nearest enclosing key that is written, or line 0.
     */
    public Location location(String key) {
        for (int i = overrides.size() - 1; i >= 0; i--) {
            KeyOverride o = overrides.get(i);
            if (key.equals(o.key()) || key.startsWith(o.key() + ".") || key.startsWith(o.key() + "[")) {
                return o.source();
            }
        }
        String path = key;
        while (!path.isEmpty()) {
            int line = index.line(path);
            if (line > 0) {
                return new Location(fileName, line);
            }
            path = parent(path);
        }
        return new Location(fileName, 0);
    }

    /** The line where a key was written (see {@link #location(String)}); 0 when unknown. */
    public int line(String key) {
        return location(key).line();
    }

    /**
     * A copy with one dotted key set to a new value, for parameter sweeps. Missing tables on the way are
     * created; messages about the key, or keys under it, will point at {@code sourceFile:sourceLine}.
     *
     * @param key dotted key such as {@code "upper_wall.velocity.to"}
     * @param value the new value
     * @param sourceFile where the override is written (the plan file)
     * @param sourceLine its line there
     * @throws InputException when the key is malformed or passes through a value that is not a table
     */
    public TomlDocument withOverride(String key, JsonNode value, String sourceFile, int sourceLine) {
        Objects.requireNonNull(value, "value");
        Location source = new Location(sourceFile, sourceLine);
        String[] segments = key.split("\\.", -1);
        for (String segment : segments) {
            if (segment.isBlank() || segment.contains("[")) {
                throw new InputException(sourceFile, sourceLine, key, "not a dotted key into the case",
                        InputException.quote(key), "keys such as \"geometry.gap\" or \"upper_wall.velocity.to\"");
            }
        }
        ObjectNode copy = tree.deepCopy();
        ObjectNode table = copy;
        StringBuilder path = new StringBuilder();
        for (int i = 0; i < segments.length - 1; i++) {
            path.append(i > 0 ? "." : "").append(segments[i]);
            JsonNode next = table.get(segments[i]);
            if (next == null) {
                table = table.putObject(segments[i]);
            } else if (next instanceof ObjectNode o) {
                table = o;
            } else {
                throw new InputException(sourceFile, sourceLine, key,
                        "cannot be set: " + path + " is not a table in " + fileName,
                        path + " = " + render(next), "a key whose enclosing keys are tables");
            }
        }
        table.set(segments[segments.length - 1], value.deepCopy());
        List<KeyOverride> all = new ArrayList<>(overrides);
        all.add(new KeyOverride(key, value, source));
        return new TomlDocument(fileName, text, copy, index, all);
    }

    /** As {@link #withOverride(String, JsonNode, String, int)}, noting this file at an unknown line as source. */
    public TomlDocument withOverride(String key, JsonNode value) {
        return withOverride(key, value, fileName, 0);
    }

    /** A value as TOML on one line: strings quoted, arrays in brackets, tables inline. */
    public static String render(JsonNode node) {
        if (node.isTextual()) {
            return InputException.quote(node.textValue());
        }
        if (node.isArray()) {
            List<String> items = new ArrayList<>();
            node.forEach(item -> items.add(render(item)));
            return "[" + String.join(", ", items) + "]";
        }
        if (node.isObject()) {
            List<String> items = new ArrayList<>();
            for (Map.Entry<String, JsonNode> field : node.properties()) {
                items.add(field.getKey() + " = " + render(field.getValue()));
            }
            return items.isEmpty() ? "{}" : "{ " + String.join(", ", items) + " }";
        }
        return node.asText();
    }

    /** The dotted key one level up: {@code a.b[2]} -> {@code a.b}, {@code a.b} -> {@code a}, {@code a} -> "". */
    static String parent(String key) {
        int cut = Math.max(key.lastIndexOf('.'), key.lastIndexOf('['));
        return cut < 0 ? "" : key.substring(0, cut);
    }

    private JsonNode find(String key) {
        JsonNode node = tree;
        for (String segment : key.split("\\.", -1)) {
            int bracket = segment.indexOf('[');
            String name = bracket < 0 ? segment : segment.substring(0, bracket);
            node = node.get(name);
            while (node != null && bracket >= 0) {
                int close = segment.indexOf(']', bracket);
                if (close < 0) {
                    return null;
                }
                int index;
                try {
                    index = Integer.parseInt(segment.substring(bracket + 1, close));
                } catch (NumberFormatException e) {
                    return null;
                }
                node = node.isArray() ? node.get(index) : null;
                bracket = segment.indexOf('[', close);
            }
            if (node == null) {
                return null;
            }
        }
        return node;
    }

    private static String lineText(String text, int line) {
        if (line <= 0) {
            return "the text";
        }
        String[] lines = text.split("\n", -1);
        if (line > lines.length) {
            return "the end of the file";
        }
        String shown = lines[line - 1].strip();
        return shown.length() > 80 ? InputException.quote(shown.substring(0, 77) + "...") : InputException.quote(shown);
    }
}
