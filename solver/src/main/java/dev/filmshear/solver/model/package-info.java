/**
 * Running a film case: the {@link dev.filmshear.solver.model.FilmCase} (what to solve, in SI units), the
 * {@link dev.filmshear.solver.model.FilmModel} that advances one step, the
 * {@link dev.filmshear.solver.model.Simulation} that owns the end, the output times, the observers and
 * the guards, the steady solver, and the facade {@link dev.filmshear.solver.model.FilmSolver} that turns
 * a case into an immutable {@link dev.filmshear.solver.model.FilmResult}.
 */
package dev.filmshear.solver.model;
