/**
 * The command line's verification: {@link dev.filmshear.cli.verify.VerifyCommand} ({@code verify [--quick]
 * [--out DIR]}) runs the code-verification suite of {@code dev.filmshear.validation.suite} and writes its report
 * ({@link dev.filmshear.cli.verify.VerificationReport}: report.html, verification.csv, verification.json and the
 * log-log plots of {@link dev.filmshear.cli.verify.VerificationPlots}); {@link dev.filmshear.cli.verify.ConvergenceRun}
 * is {@code run CASE.toml --convergence}, the solution verification of a user's case by Richardson extrapolation and
 * Roache's Grid Convergence Index (P. J. Roache, 1998; ASME V&amp;V 20-2009), added to the run's summary.json and
 * report.html. No numerics here: the suite, the three-grid plan and the estimates live in the validation module.
 */
package dev.filmshear.cli.verify;
