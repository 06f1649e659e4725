/**
 * The {@code fit} command: a viscosity-temperature law fitted to measured points.
 *
 * <p>{@link dev.filmshear.cli.fit.ViscosityCsv} reads the data file (a header naming both columns with
 * their units, one row per point) into {@link dev.filmshear.cli.fit.ViscosityData} in SI units, every
 * bad datum an {@link dev.filmshear.cli.input.InputException} at its file, line and column.
 * {@link dev.filmshear.cli.fit.ViscosityFitter} does the numerics on plain arrays (no files, no units):
 * Levenberg-Marquardt on ln mu for the exponential, Vogel, power and Sutherland laws
 * ({@link dev.filmshear.cli.fit.LogModel}), a straight line in (log T, log log Z) for the ASTM D341
 * (Walther) law. {@link dev.filmshear.cli.fit.FitReport} and {@link dev.filmshear.cli.fit.FitPlot} turn a
 * {@link dev.filmshear.cli.fit.FitResult} into the console text, the case-file lines, fit.json and fit.png.
 */
package dev.filmshear.cli.fit;
