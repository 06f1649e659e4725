package dev.filmshear.solver.model;

import java.util.List;

/**
 * Everything a run produced: the case, its derived numbers, the end state, the histories, the profiles at
 * the output times, and the warnings. Immutable.
 *
 * @param filmCase the case solved
 * @param numbers derived numbers of the case
 * @param summary end state and run statistics
 * @param history wall quantities over time
 * @param snapshots profiles at the output times and at the end
 * @param warnings where the model is out of its depth
 * @param complete false for the partial result of a failed run
 */
public record FilmResult(FilmCase filmCase, CaseNumbers numbers, FilmSummary summary, History history,
                         List<Snapshot> snapshots, List<Warning> warnings, boolean complete) {

    public FilmResult {
        snapshots = List.copyOf(snapshots);
        warnings = List.copyOf(warnings);
    }

    /** The last snapshot (the end state). */
    public Snapshot finalSnapshot() {
        return snapshots.get(snapshots.size() - 1);
    }

    /** The snapshot at time {@code t} exactly, or null. */
    public Snapshot snapshotAt(double t) {
        for (Snapshot s : snapshots) {
            if (s.time() == t) {
                return s;
            }
        }
        return null;
    }
}
