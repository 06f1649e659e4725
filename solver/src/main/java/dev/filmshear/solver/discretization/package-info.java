/**
 * The film equations in space: conservative finite volumes on a {@link dev.filmshear.solver.grid.FilmGrid},
 * assembled in flux form, with the Newton matrices of the implicit stages (tridiagonal for momentum alone,
 * 2x2 block tridiagonal for momentum and energy together) and the derived quantities at the walls.
 */
package dev.filmshear.solver.discretization;
