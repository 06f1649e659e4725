package dev.filmshear.cli;

/** The command's exit codes; the help text's list is generated from this enum. */
public enum ExitCode {
    /** Done. */
    DONE(0, "done"),
    /** Anything else: a bug in filmshear. */
    OTHER(1, "anything else (an internal error: rerun with --debug and report it)"),
    /** Bad input. */
    BAD_INPUT(2, "bad input (usage, case file, plan, data file), as one line: error: FILE:LINE: KEY: ..."),
    /** The physics or the numerics failed. */
    FAILED(3, "the physics or numerics failed (no steady solution, thermal runaway, step size collapse); "
            + "what was computed up to then is kept on disk");

    private final int code;
    private final String meaning;

    ExitCode(int code, String meaning) {
        this.code = code;
        this.meaning = meaning;
    }

    /** The process exit code. */
    public int code() {
        return code;
    }

    /** What it means, for the help text. */
    public String meaning() {
        return meaning;
    }

    /** The help text's list of exit codes. */
    public static String[] helpLines() {
        ExitCode[] all = values();
        String[] lines = new String[all.length];
        for (int i = 0; i < all.length; i++) {
            lines[i] = all[i].code + ":" + all[i].meaning;
        }
        return lines;
    }
}
