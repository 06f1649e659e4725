package dev.filmshear.cli.report;

import java.util.Objects;

/**
 * The case behind a result folder, as text for the report.
 *
 * @param resolved the case resolved to SI units with its derived numbers, as {@code filmshear check} prints it
 * @param asWritten the case file as the user wrote it
 */
public record CaseText(String resolved, String asWritten) {

    public CaseText {
        Objects.requireNonNull(resolved, "resolved");
        Objects.requireNonNull(asWritten, "asWritten");
    }
}
