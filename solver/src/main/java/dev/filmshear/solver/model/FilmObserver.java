package dev.filmshear.solver.model;

/** Sees the film after every accepted step and at every output time. */
public interface FilmObserver {

    /** Called after every accepted step (and once for the initial state). */
    default void onStep(FilmState state) {
    }

    /** Called when the simulation lands on a requested output time (the end time included). */
    default void onOutput(FilmState state) {
    }
}
