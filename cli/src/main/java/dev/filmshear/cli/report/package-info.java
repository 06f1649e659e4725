/**
 * The result folder's {@code report.html}: one self-contained page for the engineer who reads a run, built
 * from the summary tree that {@code summary.json} holds, the PNG plots in the folder and the case text.
 *
 * <p>{@link dev.filmshear.cli.report.HtmlReport} writes the page; {@link dev.filmshear.cli.report.SummaryRows}
 * turns the summary tree into labelled rows generically, so a new summary key appears without a code change;
 * {@link dev.filmshear.cli.report.ValueFormat} gives every number four to five significant figures and the unit
 * its key's suffix names ({@code _Pa}, {@code _K}, {@code _s}, ...). Nothing here computes physics.
 */
package dev.filmshear.cli.report;
