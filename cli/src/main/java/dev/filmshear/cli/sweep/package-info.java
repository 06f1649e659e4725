/**
 * Parameter sweeps: {@code sweep PLAN.toml [--out DIR] [--threads N] [--shard K/N]} runs every
 * combination of a plan's axes, and {@code merge DIR... --out DIR} joins the folders of a plan's shards.
 *
 * <p><b>Plan</b> ({@link dev.filmshear.cli.sweep.SweepPlan}): a base case and axes of dotted case keys,
 * each a list of values (used as written) or a range {@code { from, to, count, spacing }}. Combinations
 * are numbered in mixed radix, last axis fastest, and computed from their index, never listed. Shard
 * K of N ({@link dev.filmshear.cli.sweep.Shard}) takes the indices i with i mod N = K - 1.
 *
 * <p><b>Folder</b>: {@code results.csv} (one row per case, columns in
 * {@link dev.filmshear.cli.sweep.ResultColumns}), {@code sweep.json} (plan hash, case count, header,
 * completion; see {@code SweepManifest}), {@code map_<column>.png} and {@code report.html}.
 *
 * <p><b>Running</b> ({@code SweepRunner}): worker threads solve cases ({@code CaseSolver}); one writer
 * appends each finished row and forces it to the disk; a bounded window of cases in flight keeps memory
 * independent of the plan's size. Re-running the same command resumes: good rows are kept, a torn last
 * line is cut, only missing cases run ({@code ResultsFile}). At the end the file is rewritten in
 * case-index order by an external merge sort, so it is the same byte for byte whatever the threads, shards
 * and interruptions. A changed plan (another hash) is refused.
 *
 * <p><b>Failures</b>: a case that cannot be read or solved is a row with status {@code failed} and its
 * message; the sweep goes on. Exit codes: 0 done (failed cases included), 2 bad plan or a folder of
 * another plan or shard, 3 every case of the slice failed, 1 anything else.
 *
 * <p><b>Maps</b> ({@code SweepMaps}, {@code SweepData}, {@code SweepReport}): for one or two axes and at
 * most 40 000 cases, a heat map (two axes) or line plot (one axis) per chosen column, failed cases marked,
 * and boundaries where a warning code, an unsettled film or the plan's temperature limit switches between
 * neighbours; all embedded in a self-contained report.html with the standing caution.
 */
package dev.filmshear.cli.sweep;
