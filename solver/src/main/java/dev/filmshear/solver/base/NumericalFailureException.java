package dev.filmshear.solver.base;

/**
 * The physics or the numerics failed for a valid input: no steady solution, thermal runaway, a step
 * size that collapsed, a value that became NaN.
 *
 * <p>Names where it happened (time, step, node, field) when those are known, following the practice
 * of naming the failing time in ODE integrators. Higher layers attach what was computed up to the
 * failure (see {@code dev.filmshear.solver.model.SimulationFailure}).
 */
public class NumericalFailureException extends RuntimeException {
    private static final long serialVersionUID = 1L;

    private final double time;
    private final long step;
    private final int node;
    private final String field;

    /**
     * @param message what failed, in words
     * @param time the time (s) at which it failed, or NaN when not in time
     * @param step the step number, or -1
     * @param node the node index, or -1
     * @param field the field ({@code "velocity"}, {@code "temperature"}) or null
     */
    public NumericalFailureException(String message, double time, long step, int node, String field) {
        super(message);
        this.time = time;
        this.step = step;
        this.node = node;
        this.field = field;
    }

    /** A failure with only a message. */
    public NumericalFailureException(String message) {
        this(message, Double.NaN, -1, -1, null);
    }

    /** Copies where an earlier failure happened, with a new message. */
    protected NumericalFailureException(String message, NumericalFailureException cause) {
        super(message, cause);
        this.time = cause.time;
        this.step = cause.step;
        this.node = cause.node;
        this.field = cause.field;
    }

    public double time() {
        return time;
    }

    public long step() {
        return step;
    }

    public int node() {
        return node;
    }

    public String field() {
        return field;
    }
}
