/**
 * Exact (closed-form) solutions that the solver is checked against, as immutable values.
 *
 * <p>Isothermal, constant properties: {@link dev.filmshear.validation.analytic.ConstantPropertyFilm} (any wall
 * histories and pressure gradient in a gap, by superposition) with its steady limit
 * {@link dev.filmshear.validation.analytic.CouettePoiseuilleFlow}; the semi-infinite
 * {@link dev.filmshear.validation.analytic.StokesFirstProblem} and
 * {@link dev.filmshear.validation.analytic.StokesSecondProblem}. Heated, steady:
 * {@link dev.filmshear.validation.analytic.CouetteViscousHeating} (constant properties) and
 * {@link dev.filmshear.validation.analytic.NahmeCouette} (exponential viscosity); transient heat conduction:
 * {@link dev.filmshear.validation.analytic.HeatedFilmStartup}. Bearing friction:
 * {@link dev.filmshear.validation.analytic.PetroffBearing}.
 *
 * <p>{@link dev.filmshear.validation.analytic.AnalyticFamilies#match} finds the solution of a case, as an
 * {@link dev.filmshear.validation.analytic.AnalyticSolution}. Every series is summed until its terms fall below
 * 1e-15 of its value, in the form that converges fast at the time asked (images of erfc for short times,
 * Fourier series for long ones); integrals use Commons Math quadrature.
 */
package dev.filmshear.validation.analytic;
