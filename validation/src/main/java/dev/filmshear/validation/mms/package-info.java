/**
 * Code verification by the method of manufactured solutions (K. Salari and P. Knupp, SAND2000-1444, 2000)
 * and grid-convergence studies (P. J. Roache, 1998; I. B. Celik et al., J. Fluids Eng. 130, 2008).
 *
 * <p>A {@link dev.filmshear.validation.mms.ManufacturedSolution} holds chosen fields u_m, T_m (sums of
 * {@link dev.filmshear.validation.mms.Shape}s in eta = y/L times {@link dev.filmshear.validation.mms.Harmonic}s in
 * t, see {@link dev.filmshear.validation.mms.Field}) and derives the momentum and heat sources that make them exact.
 * A {@link dev.filmshear.validation.mms.ManufacturedCase} adds the walls' thermal conditions, end time and grid,
 * checks that the fields start uniform and meet the walls, builds the solver's case and measures its errors;
 * {@link dev.filmshear.validation.mms.ManufacturedCases} lists the cases that together exercise every boundary
 * kind. {@link dev.filmshear.validation.mms.ConvergenceStudy} runs a case on refined grids (time step refined with
 * the grid) and gives observed orders; {@link dev.filmshear.validation.mms.GridConvergenceIndex} gives
 * Richardson extrapolation and the GCI.
 */
package dev.filmshear.validation.mms;
