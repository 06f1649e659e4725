package dev.filmshear.cli.fit;

import java.util.Objects;

/**
 * One parameter of a fitted law, under its case-file key, in SI units.
 *
 * @param name the case-file key ({@code "a"}, {@code "reference_temperature"}); {@code "A"}, {@code "B"} for walther
 * @param value the fitted value (SI)
 * @param standardError one standard error (SI), from the covariance scaled by the residual variance; NaN when
 *     the data leave no degree of freedom or the parameter was held fixed
 * @param unit the SI unit as the case file writes it ({@code "Pa*s"}, {@code "K"}, {@code "1/K"}; empty for a
 *     pure number)
 * @param fixed true for a parameter chosen from the data and not adjusted (a reference temperature)
 */
public record FittedParameter(String name, double value, double standardError, String unit, boolean fixed) {

    public FittedParameter {
        Objects.requireNonNull(name, "name");
        Objects.requireNonNull(unit, "unit");
    }

    /** The standard error relative to the value's magnitude (NaN when either is missing). */
    public double relativeStandardError() {
        return standardError / Math.abs(value);
    }
}
