package dev.filmshear.solver.model;

import dev.filmshear.solver.base.InvalidParameterException;

/**
 * Limits the case sets for its results, beyond which a run carries a warning.
 *
 * @param maxTemperature the highest film temperature the design allows (K), for example the oil's flash
 *     point less a margin or the bearing metal's limit; NaN for none
 */
public record Limits(double maxTemperature) {
    /** No limits. */
    public static final Limits NONE = new Limits(Double.NaN);

    public Limits {
        if (!Double.isNaN(maxTemperature)) {
            InvalidParameterException.requirePositive("max_temperature", maxTemperature, "K");
        }
    }
}
