package dev.filmshear.cli.input;

import java.util.ArrayList;
import java.util.HashMap;
import java.util.HashSet;
import java.util.List;
import java.util.Map;
import java.util.Set;

/**
 * The line on which each dotted key of a TOML text is written.
 *
 * <p><b>Why this is written by hand.</b> Jackson's TOML reader builds a tree without source positions,
 * and no maintained TOML library for Java both feeds Jackson and keeps per-key lines. This scanner walks
 * the text once and records, for every key path, the line where it first appears:
 * <ul>
 *   <li>table headers {@code [a.b]} give {@code a.b} (and {@code a} if not seen before);</li>
 *   <li>arrays of tables {@code [[a]]} give {@code a} and {@code a[0]}, {@code a[1]}, ...;</li>
 *   <li>{@code key = value} and dotted keys {@code x.y = value} give {@code table.x.y} and its parents;</li>
 *   <li>keys inside inline tables give {@code table.key.inner} on the line where they stand;</li>
 *   <li>elements of arrays give {@code table.key[i]} on the line where each element starts, so an
 *       array written over several lines points at the right line.</li>
 * </ul>
 * Strings (basic, literal, and their multi-line forms) and comments are skipped, so text inside them is
 * never mistaken for a key. Quoted keys are joined with dots like bare ones, so a quoted key containing
 * a dot may map ambiguously; no key of a case or plan file needs one. The scanner runs only on text that
 * Jackson has accepted, or to locate a duplicate key Jackson refused; if it meets something it does not
 * understand it stops and keeps what it found, and callers fall back to the enclosing key's line.
 */
final class LineIndex {

    private final Map<String, Integer> lines;
    private final int duplicateLine;

    private LineIndex(Map<String, Integer> lines, int duplicateLine) {
        this.lines = Map.copyOf(lines);
        this.duplicateLine = duplicateLine;
    }

    /** Scans a TOML text. */
    static LineIndex scan(String text) {
        Scanner scanner = new Scanner(text);
        try {
            scanner.document();
        } catch (GiveUp stop) {
            // Keep what was indexed before the construct the scanner does not follow.
        }
        return new LineIndex(scanner.lines, scanner.duplicateLine);
    }

    /** The line of a key path, or 0 when not indexed. */
    int line(String path) {
        return lines.getOrDefault(path, 0);
    }

    /** The line of the first key or table defined twice, or 0. */
    int duplicateLine() {
        return duplicateLine;
    }

    /** Thrown inside the scanner to stop at a construct it does not follow. */
    private static final class GiveUp extends RuntimeException {
        private static final long serialVersionUID = 1L;

        GiveUp() {
            super(null, null, false, false);
        }
    }

    private static final class Scanner {
        private final String text;
        private final Map<String, Integer> lines = new HashMap<>();
        private final Set<String> defined = new HashSet<>();
        private final Map<String, Integer> tableArrayCounts = new HashMap<>();
        private int duplicateLine;
        private int pos;
        private int line = 1;

        Scanner(String text) {
            this.text = text;
        }

        void document() {
            String table = "";
            while (true) {
                skipBlankLinesAndComments();
                if (pos >= text.length()) {
                    return;
                }
                int keyLine = line;
                if (peek() == '[') {
                    boolean arrayOfTables = pos + 1 < text.length() && text.charAt(pos + 1) == '[';
                    pos += arrayOfTables ? 2 : 1;
                    String path = join("", readKey());
                    expect(']');
                    if (arrayOfTables) {
                        expect(']');
                        int index = tableArrayCounts.merge(path, 1, Integer::sum) - 1;
                        record(path, keyLine);
                        table = path + "[" + index + "]";
                        record(table, keyLine);
                    } else {
                        define(path, keyLine);
                        record(path, keyLine);
                        table = path;
                    }
                } else {
                    String path = join(table, readKey());
                    expect('=');
                    define(path, keyLine);
                    record(path, keyLine);
                    value(path);
                }
            }
        }

        private void value(String path) {
            skipBlank();
            if (pos >= text.length()) {
                throw new GiveUp();
            }
            char c = peek();
            if (c == '{') {
                pos++;
                inlineTable(path);
            } else if (c == '[') {
                pos++;
                array(path);
            } else if (text.startsWith("\"\"\"", pos)) {
                multiLineString("\"\"\"", true);
            } else if (text.startsWith("'''", pos)) {
                multiLineString("'''", false);
            } else if (c == '"') {
                pos++;
                singleLineString('"', true);
            } else if (c == '\'') {
                pos++;
                singleLineString('\'', false);
            } else {
                int start = pos;
                while (pos < text.length() && " \t\r\n,]}#".indexOf(peek()) < 0) {
                    pos++;
                }
                if (pos == start) {
                    throw new GiveUp();
                }
            }
        }

        private void inlineTable(String path) {
            while (true) {
                skipBlankLinesAndComments();
                if (pos >= text.length()) {
                    throw new GiveUp();
                }
                if (peek() == '}') {
                    pos++;
                    return;
                }
                int keyLine = line;
                String inner = join(path, readKey());
                expect('=');
                define(inner, keyLine);
                record(inner, keyLine);
                value(inner);
                skipBlankLinesAndComments();
                if (pos < text.length() && peek() == ',') {
                    pos++;
                }
            }
        }

        private void array(String path) {
            int index = 0;
            while (true) {
                skipBlankLinesAndComments();
                if (pos >= text.length()) {
                    throw new GiveUp();
                }
                if (peek() == ']') {
                    pos++;
                    return;
                }
                String element = path + "[" + index + "]";
                record(element, line);
                value(element);
                skipBlankLinesAndComments();
                if (pos < text.length() && peek() == ',') {
                    pos++;
                    index++;
                } else if (pos < text.length() && peek() == ']') {
                    pos++;
                    return;
                } else {
                    throw new GiveUp();
                }
            }
        }

        private List<String> readKey() {
            List<String> segments = new ArrayList<>();
            while (true) {
                skipBlank();
                if (pos >= text.length()) {
                    throw new GiveUp();
                }
                char c = peek();
                if (c == '"') {
                    pos++;
                    segments.add(singleLineString('"', true));
                } else if (c == '\'') {
                    pos++;
                    segments.add(singleLineString('\'', false));
                } else {
                    int start = pos;
                    while (pos < text.length() && isBareKeyChar(peek())) {
                        pos++;
                    }
                    if (pos == start) {
                        throw new GiveUp();
                    }
                    segments.add(text.substring(start, pos));
                }
                skipBlank();
                if (pos < text.length() && peek() == '.') {
                    pos++;
                } else {
                    return segments;
                }
            }
        }

        /** Reads a one-line string after its opening quote; returns its raw content. */
        private String singleLineString(char quote, boolean escapes) {
            int start = pos;
            while (pos < text.length()) {
                char c = peek();
                if (c == '\n') {
                    throw new GiveUp();
                }
                if (escapes && c == '\\') {
                    pos += 2;
                    continue;
                }
                pos++;
                if (c == quote) {
                    return text.substring(start, pos - 1);
                }
            }
            throw new GiveUp();
        }

        private void multiLineString(String delimiter, boolean escapes) {
            pos += 3;
            while (pos < text.length()) {
                char c = peek();
                if (escapes && c == '\\') {
                    if (pos + 1 < text.length() && text.charAt(pos + 1) == '\n') {
                        line++;
                    }
                    pos += 2;
                    continue;
                }
                if (text.startsWith(delimiter, pos)) {
                    pos += 3;
                    // Up to two quotes may stand right before the closing delimiter (TOML 1.0).
                    for (int extra = 0; extra < 2 && pos < text.length() && peek() == delimiter.charAt(0); extra++) {
                        pos++;
                    }
                    return;
                }
                if (c == '\n') {
                    line++;
                }
                pos++;
            }
            throw new GiveUp();
        }

        private void expect(char c) {
            skipBlank();
            if (pos >= text.length() || peek() != c) {
                throw new GiveUp();
            }
            pos++;
        }

        private void skipBlank() {
            while (pos < text.length() && (peek() == ' ' || peek() == '\t')) {
                pos++;
            }
        }

        private void skipBlankLinesAndComments() {
            while (pos < text.length()) {
                char c = peek();
                if (c == '\n') {
                    line++;
                    pos++;
                } else if (c == ' ' || c == '\t' || c == '\r') {
                    pos++;
                } else if (c == '#') {
                    while (pos < text.length() && peek() != '\n') {
                        pos++;
                    }
                } else {
                    return;
                }
            }
        }

        private char peek() {
            return text.charAt(pos);
        }

        private void record(String path, int at) {
            int cut = path.length();
            while (cut > 0) {
                lines.putIfAbsent(path.substring(0, cut), at);
                cut = parentEnd(path, cut);
            }
        }

        private void define(String path, int at) {
            if (!defined.add(path) && duplicateLine == 0) {
                duplicateLine = at;
            }
        }

        private static int parentEnd(String path, int end) {
            for (int i = end - 1; i > 0; i--) {
                char c = path.charAt(i);
                if (c == '.' || c == '[') {
                    return i;
                }
            }
            return 0;
        }

        private static String join(String prefix, List<String> segments) {
            String joined = String.join(".", segments);
            return prefix.isEmpty() ? joined : prefix + "." + joined;
        }

        private static boolean isBareKeyChar(char c) {
            return (c >= 'A' && c <= 'Z') || (c >= 'a' && c <= 'z') || (c >= '0' && c <= '9') || c == '_' || c == '-';
        }
    }
}
