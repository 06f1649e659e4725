package dev.filmshear.cli.sweep;

import dev.filmshear.cli.ExitCode;

/**
 * A sweep or merge that cannot go on, already put into the one-line form, with its exit code (bad input
 * goes through {@link dev.filmshear.cli.input.InputException} instead).
 */
final class SweepFailure extends RuntimeException {
    private static final long serialVersionUID = 1L;

    private final ExitCode exitCode;

    SweepFailure(ExitCode exitCode, String oneLine, Throwable cause) {
        super(oneLine, cause);
        this.exitCode = exitCode;
    }

    ExitCode exitCode() {
        return exitCode;
    }
}
