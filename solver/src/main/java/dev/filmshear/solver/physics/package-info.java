/**
 * Physical laws and conditions as small immutable values: viscosity laws, density and other
 * temperature-dependent properties, wall motions and thermal wall conditions.
 *
 * <p>Every value is in SI base units (Pa s, kg/m^3, K, m/s, W/m^2). Compact constructors reject
 * parameters outside the law's domain with {@link dev.filmshear.solver.base.InvalidParameterException}.
 *
 * <p>Viscosity laws ({@link dev.filmshear.solver.physics.ViscosityLaw}), keyed by their case-file name:
 * {@code constant}, {@code exponential}, {@code vogel} (oils), {@code power} and {@code sutherland}
 * (gases), {@code walther} (ASTM D341, oils), {@code table} (monotone interpolation of measured values)
 * and {@code water} (IAPWS 2008 with IAPWS-IF97 density, in {@code Iapws2008Viscosity},
 * {@code Iapws97Region1} and {@code Iapws97Region4}). Each states its validity range; all pass one
 * shared contract test. {@code FluidPresets} holds the built-in fluids.
 */
package dev.filmshear.solver.physics;
