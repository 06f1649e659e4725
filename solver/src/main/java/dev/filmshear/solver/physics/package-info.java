/**
 * Physical laws and conditions as small immutable values: viscosity laws, density and other
 * temperature-dependent properties, wall motions and thermal wall conditions.
 *
 * <p>Every value is in SI base units (Pa s, kg/m^3, K, m/s, W/m^2). Compact constructors reject
 * parameters outside the law's domain with {@link dev.filmshear.solver.base.InvalidParameterException}.
 */
package dev.filmshear.solver.physics;
