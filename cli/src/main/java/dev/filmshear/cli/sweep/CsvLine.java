package dev.filmshear.cli.sweep;

import java.util.ArrayList;
import java.util.List;
import java.util.Optional;

/**
 * Fields of one line of results.csv, written and read back as RFC 4180 describes: a field holding a comma,
 * a double quote or a line break is enclosed in double quotes, with its double quotes doubled.
 *
 * <p><b>Why this is written by hand.</b> The project's dependencies hold no CSV library, and the sweep
 * only reads back lines it wrote itself, one record per line (messages are kept on one line), to find
 * the case index and count the fields; twenty lines do that. Reading users' own CSV files (the fit
 * command) is a different job for a library.
 */
final class CsvLine {
    private CsvLine() {
    }

    /** A field as written in a line: quoted when it needs to be. */
    static String field(String value) {
        boolean quote = false;
        for (int i = 0; i < value.length() && !quote; i++) {
            char c = value.charAt(i);
            quote = c == ',' || c == '"' || c == '\n' || c == '\r';
        }
        return quote ? "\"" + value.replace("\"", "\"\"") + "\"" : value;
    }

    /** The fields of one line (without its line break), or empty when a quoted field is left open. */
    static Optional<List<String>> split(String line) {
        List<String> fields = new ArrayList<>();
        StringBuilder field = new StringBuilder();
        int i = 0;
        while (true) {
            if (i < line.length() && line.charAt(i) == '"') {
                i++;
                while (true) {
                    if (i >= line.length()) {
                        return Optional.empty();
                    }
                    char c = line.charAt(i++);
                    if (c == '"') {
                        if (i < line.length() && line.charAt(i) == '"') {
                            field.append('"');
                            i++;
                        } else {
                            break;
                        }
                    } else {
                        field.append(c);
                    }
                }
                if (i < line.length() && line.charAt(i) != ',') {
                    return Optional.empty();
                }
            } else {
                while (i < line.length() && line.charAt(i) != ',') {
                    field.append(line.charAt(i++));
                }
            }
            fields.add(field.toString());
            field.setLength(0);
            if (i >= line.length()) {
                return Optional.of(fields);
            }
            i++;
        }
    }

    /** The last field of a line (the case index), read from the end without splitting the rest. */
    static String lastField(String line) {
        return line.substring(line.lastIndexOf(',') + 1);
    }
}
