package dev.filmshear.solver.model;

/**
 * A read-only view of the film at the current time, handed to observers after every accepted step.
 * Valid only during the observer call.
 */
public interface FilmState {

    /** Current time (s). */
    double time();

    /** Accepted steps so far. */
    long steps();

    /** Number of nodes. */
    int points();

    /** Position of node {@code i} (m). */
    double y(int i);

    /** Velocity at node {@code i} (m/s). */
    double velocity(int i);

    /** Temperature at node {@code i} (K); the constant property temperature for an isothermal film. */
    double temperature(int i);

    /** Viscosity at node {@code i} (Pa s). */
    double viscosity(int i);

    /** Velocity of the lower wall (m/s). */
    double lowerWallVelocity();

    /** Velocity of the upper wall (m/s), or of the far field for a semi-infinite film. */
    double upperWallVelocity();

    /** mu dU/dy at the lower wall (Pa). */
    double wallShearStressLower();

    /** mu dU/dy at the upper wall (Pa); NaN for a semi-infinite film. */
    double wallShearStressUpper();

    /** Power dissipated per unit wall area (W/m^2). */
    double dissipation();

    /** Highest temperature across the film (K). */
    double maxTemperature();

    /** Volume-weighted mean temperature (K). */
    double meanTemperature();

    /** Heat flux from the fluid into the lower wall (W/m^2); 0 for an isothermal film. */
    double heatFluxIntoLowerWall();

    /** Heat flux from the fluid into the upper wall (W/m^2); 0 for an isothermal or semi-infinite film. */
    double heatFluxIntoUpperWall();

    /** Heat stored in the film relative to the initial temperature (J/m^2); 0 for an isothermal film. */
    double storedHeat();
}
