/**
 * Linear algebra the film equations need: a scalar and a 2x2 block tridiagonal solver (written here:
 * neither EJML nor Commons Math offers a banded or block-tridiagonal solver that works on reused
 * primitive arrays), and the smallest eigenvalue of a symmetric tridiagonal matrix through EJML.
 */
package dev.filmshear.solver.linalg;
