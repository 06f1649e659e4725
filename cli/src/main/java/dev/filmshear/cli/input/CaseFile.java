package dev.filmshear.cli.input;

import dev.filmshear.solver.model.FilmCase;

import java.util.Objects;

/**
 * A case file read and validated: the solver's case in SI units, with what the command line needs
 * beside it.
 *
 * @param fileName the file as the user named it
 * @param title the case's title (the file name without {@code .toml} when the file gives none)
 * @param filmCase what to solve, in SI units
 * @param plots whether PNG plots are wanted ({@code output.plots}, default false)
 * @param document the file as read, for reports of the case "as written" and for sweeps
 * @param journal the journal bearing when the case has a {@code [journal]} table, else null
 */
public record CaseFile(String fileName, String title, FilmCase filmCase, boolean plots, TomlDocument document,
                       JournalSpec journal) {

    public CaseFile {
        Objects.requireNonNull(fileName, "fileName");
        Objects.requireNonNull(title, "title");
        Objects.requireNonNull(filmCase, "filmCase");
        Objects.requireNonNull(document, "document");
    }

    /** True in journal-bearing mode. */
    public boolean isJournal() {
        return journal != null;
    }
}
