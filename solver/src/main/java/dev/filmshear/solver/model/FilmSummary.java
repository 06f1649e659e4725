package dev.filmshear.solver.model;

/**
 * The film's state at the end of a run and how the run went.
 *
 * @param steady true when the film had settled (or was solved steady)
 * @param endTime s; +infinity for a steady solve
 * @param wallShearStressLower mu dU/dy at the lower wall (Pa)
 * @param wallShearStressUpper mu dU/dy at the upper wall (Pa); NaN when semi-infinite
 * @param lowerWallTemperature K
 * @param upperWallTemperature K (far-field temperature when semi-infinite)
 * @param maxTemperature K
 * @param meanTemperature K
 * @param dissipation power dissipated per unit wall area (W/m^2)
 * @param heatFluxIntoLowerWall W/m^2
 * @param heatFluxIntoUpperWall W/m^2
 * @param dissipatedEnergy heat dissipated over the run (J/m^2)
 * @param conductedEnergy heat conducted into the walls over the run (J/m^2)
 * @param storedEnergyChange change of heat stored in the film (J/m^2)
 * @param energyImbalance |dissipated - conducted - stored| relative to the largest of the three; NaN when
 *     isothermal or steady
 * @param steps accepted time steps (continuation steps for a steady solve)
 * @param rejectedSteps rejected step attempts
 * @param newtonIterations Newton iterations over all stages
 * @param frictionTorque journal only: wall shear stress on the shaft times film area times radius (N m); NaN
 *     for a plane film
 * @param frictionPower journal only: friction torque times shaft angular speed (W); NaN for a plane film
 * @param petroffTorque journal only: Petroff's torque 2 pi mu Omega R^3 L / c at the viscosity of the film's
 *     mean temperature (N m); NaN for a plane film
 * @param speedRiseTime driven wall only: the time its speed first reached 99 % of its final speed (s), NaN
 *     when it did not rise
 * @param coastDownTime driven wall only: the time its speed first fell to the coast-down fraction of its
 *     initial speed (s), NaN when it did not
 * @param peakTemperature the highest film temperature reached at any step of the run (K)
 * @param settleTime the time after which the wall shear stress stayed within 1 % of its value at the end of
 *     the run (s); meaningful when the run ended steady, NaN for a steady solve
 */
public record FilmSummary(boolean steady, double endTime, double wallShearStressLower, double wallShearStressUpper,
                          double lowerWallTemperature, double upperWallTemperature, double maxTemperature,
                          double meanTemperature, double dissipation, double heatFluxIntoLowerWall,
                          double heatFluxIntoUpperWall, double dissipatedEnergy, double conductedEnergy,
                          double storedEnergyChange, double energyImbalance, long steps, long rejectedSteps,
                          long newtonIterations, double frictionTorque, double frictionPower, double petroffTorque,
                          double speedRiseTime, double coastDownTime, double peakTemperature,
                          double settleTime) {
}
