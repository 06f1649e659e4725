package dev.filmshear.cli.input;

/**
 * A quantity's text cannot be read, or its unit does not fit the key. Carries no file or key: the case
 * reader, which knows them, turns it into an {@link InputException}.
 */
public final class UnitException extends IllegalArgumentException {
    private static final long serialVersionUID = 1L;

    private final String problem;
    private final String allowed;

    /**
     * @param problem what is wrong, in words
     * @param allowed what would be accepted, in words
     */
    public UnitException(String problem, String allowed) {
        super(problem + " (allowed " + allowed + ")");
        this.problem = problem;
        this.allowed = allowed;
    }

    /** What is wrong. */
    public String problem() {
        return problem;
    }

    /** What would be accepted. */
    public String allowed() {
        return allowed;
    }
}
