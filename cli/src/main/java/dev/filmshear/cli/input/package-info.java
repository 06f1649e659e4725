/**
 * Case files in, solver input out: quantities with units ({@link dev.filmshear.cli.input.Units},
 * {@link dev.filmshear.cli.input.QuantityKind}), TOML text with a line for every key
 * ({@link dev.filmshear.cli.input.TomlDocument}), and the {@link dev.filmshear.cli.input.CaseReader} that
 * validates a case and builds the solver's immutable {@link dev.filmshear.solver.model.FilmCase}.
 *
 * <p>Every bad input ends as one {@link dev.filmshear.cli.input.InputException}, printed as
 * {@code error: FILE:LINE: KEY: what is wrong (given ..., allowed ...)} and mapped to exit code 2.
 * Nothing here computes physics; values leave this package in SI units.
 */
package dev.filmshear.cli.input;
