/**
 * The lowest layer of the solver: the failure types every other layer may throw.
 *
 * <p>Three kinds of failure are kept apart throughout filmshear: a bad parameter
 * ({@link dev.filmshear.solver.base.InvalidParameterException}, the user's input is wrong), a numerical
 * breakdown ({@link dev.filmshear.solver.base.NumericalFailureException}, the physics or the numerics
 * failed for a valid input) and a programming error (any other exception: a bug).
 */
package dev.filmshear.solver.base;
