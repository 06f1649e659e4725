/**
 * Time integration of stiff semi-discrete systems M(y) dy/dt = F(y, t) with algebraic (prescribed) rows:
 * diagonally implicit Runge–Kutta schemes held as data ({@link dev.filmshear.solver.time.DirkScheme}),
 * an integrator with embedded error estimates and a PI step-size controller, landing exactly on
 * requested times. Knows nothing of films: the film equations implement
 * {@link dev.filmshear.solver.time.ImplicitSystem} one layer up.
 */
package dev.filmshear.solver.time;
