package dev.filmshear.cli;

import dev.filmshear.cli.output.AnalyticComparison;
import dev.filmshear.solver.model.FilmResult;

/** Finds the closed-form solution of a run's family, if it has one, and compares. */
final class Analytic {
    private Analytic() {
    }

    static AnalyticComparison compare(FilmResult result) {
        return null;
    }
}
