package dev.filmshear.cli.input;

import java.util.Objects;

/**
 * Bad input in a case or plan file: where (file, line, dotted key), what is wrong, what was given and
 * what is allowed. The command line maps it to exit code 2 and prints {@link #oneLine()}.
 *
 * <p>{@code given} and {@code allowed} are text for a person; a value taken from the file should be
 * passed through {@link #quote(String)} so that it shows as written and stays on one line.
 */
public final class InputException extends RuntimeException {
    private static final long serialVersionUID = 1L;

    private final String file;
    private final int line;
    private final String key;
    private final String problem;
    private final String given;
    private final String allowed;

    /**
     * @param file the file as the user named it
     * @param line 1-based line, or 0 when unknown
     * @param key the dotted key ({@code "upper_wall.velocity.to"}), or a word in parentheses such as
     *     {@code "(syntax)"} when no key applies
     * @param problem what is wrong, in words
     * @param given what was given (a quoted value, or words such as "nothing")
     * @param allowed what is allowed, in words
     */
    public InputException(String file, int line, String key, String problem, String given, String allowed) {
        super(problem);
        this.file = Objects.requireNonNull(file, "file");
        this.line = Math.max(0, line);
        this.key = Objects.requireNonNull(key, "key");
        this.problem = Objects.requireNonNull(problem, "problem");
        this.given = Objects.requireNonNull(given, "given");
        this.allowed = Objects.requireNonNull(allowed, "allowed");
    }

    /** As above, with the cause kept for {@code --debug}. */
    public InputException(String file, int line, String key, String problem, String given, String allowed,
                          Throwable cause) {
        this(file, line, key, problem, given, allowed);
        initCause(cause);
    }

    public String file() {
        return file;
    }

    /** 1-based line, 0 when unknown. */
    public int line() {
        return line;
    }

    public String key() {
        return key;
    }

    public String problem() {
        return problem;
    }

    public String given() {
        return given;
    }

    public String allowed() {
        return allowed;
    }

    /**
     * {@code error: FILE:LINE: KEY: what is wrong (given ..., allowed ...)}, always one line: control
     * characters in any part are written as escapes.
     */
    public String oneLine() {
        return "error: " + escape(file) + ":" + line + ": " + escape(key) + ": " + escape(problem)
                + " (given " + escape(given) + ", allowed " + escape(allowed) + ")";
    }

    /** The same as {@link #oneLine()} without the leading {@code "error: "}. */
    @Override
    public String getMessage() {
        return oneLine().substring("error: ".length());
    }

    /** A value in double quotes with quotes, backslashes and control characters escaped. */
    /**
     * Reads a UTF-8 text file, turning every way it can fail into a one-line error at the file.
     *
     * @param file the file, named in messages as given
     * @param key the key messages name for the file as a whole
     * @param kind what the file should be, for the allowed part of messages (for example "TOML file")
     */
    public static String readText(java.nio.file.Path file, String key, String kind) {
        String name = file.toString();
        try {
            return java.nio.file.Files.readString(file, java.nio.charset.StandardCharsets.UTF_8);
        } catch (java.nio.file.NoSuchFileException e) {
            throw new InputException(name, 0, key, "no such file", quote(name), "the path of an existing " + kind, e);
        } catch (java.nio.charset.CharacterCodingException e) {
            throw new InputException(name, 0, key, "not UTF-8 text", quote(name), "a " + kind + " saved as UTF-8", e);
        } catch (java.io.IOException e) {
            throw new InputException(name, 0, key, "cannot be read: " + e.getMessage(), quote(name),
                    "a readable " + kind, e);
        }
    }

    public static String quote(String value) {
        return "\"" + escape(value.replace("\\", "\\\\").replace("\"", "\\\"")) + "\"";
    }

    /**
     * Backslash escapes for line breaks, tabs and other control characters, so a message stays on one
     * line. A lone backslash is doubled only when quoting, since paths on Windows contain them.
     */
    static String escape(String text) {
        StringBuilder out = new StringBuilder(text.length());
        for (int i = 0; i < text.length(); i++) {
            char c = text.charAt(i);
            switch (c) {
                case '\n' -> out.append("\\n");
                case '\r' -> out.append("\\r");
                case '\t' -> out.append("\\t");
                case '\u2028', '\u2029', '\u0085' -> out.append(String.format("\\u%04x", (int) c));
                default -> {
                    if (Character.isISOControl(c)) {
                        out.append(String.format("\\u%04x", (int) c));
                    } else {
                        out.append(c);
                    }
                }
            }
        }
        return out.toString();
    }
}
