package dev.filmshear.cli;

/**
 * A failure a command has already put into the one-line form, with the exit code it maps to (for
 * example a run that failed in the solver after its partial results were written).
 */
final class CommandFailure extends RuntimeException {
    private static final long serialVersionUID = 1L;

    private final ExitCode exitCode;

    CommandFailure(ExitCode exitCode, String oneLine, Throwable cause) {
        super(oneLine, cause);
        this.exitCode = exitCode;
    }

    ExitCode exitCode() {
        return exitCode;
    }
}
