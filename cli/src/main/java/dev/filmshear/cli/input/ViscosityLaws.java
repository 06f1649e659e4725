package dev.filmshear.cli.input;

import dev.filmshear.solver.physics.ConstantViscosity;

import java.util.List;
import java.util.Map;

/**
 * The viscosity laws a case file can name, as a registry from law name to {@link LawReader}.
 *
 * <p>To add a law: write its record in the solver (implementing
 * {@link dev.filmshear.solver.physics.ViscosityLaw}) and add one entry to {@link #standard()}.
 */
public final class ViscosityLaws {

    /** Every law name the case-file contract defines, registered in this version or not. */
    public static final List<String> CONTRACT_LAWS =
            List.of("constant", "exponential", "vogel", "power", "sutherland", "walther", "table", "water");

    private ViscosityLaws() {
    }

    /** The laws available in this version. */
    public static Map<String, LawReader> standard() {
        return Map.of("constant", constant());
    }

    /**
     * {@code law = "constant"}, key {@code value}: mu = value. A kinematic value ({@code "32 cSt"}) is
     * turned into mu with the density at the initial temperature ({@link LawInput#conversionTemperature()}).
     * The law is the same at every temperature, so {@code valid_from}/{@code valid_to} are checked but
     * have nothing to limit.
     */
    public static LawReader constant() {
        return new LawReader(List.of("value"), in -> {
            double mu = in.dynamicViscosity("value", in.conversionTemperature());
            return in.build(() -> new ConstantViscosity(mu));
        });
    }
}
