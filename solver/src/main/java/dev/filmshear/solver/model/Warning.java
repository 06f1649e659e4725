package dev.filmshear.solver.model;

/**
 * A note that the model is out of its depth, with the number that tripped it.
 *
 * @param code a short stable key (for example {@code "laminar_flow_doubtful"})
 * @param message one sentence for the engineer, with the value and the threshold
 */
public record Warning(String code, String message) {

    @Override
    public String toString() {
        return code + ": " + message;
    }
}
