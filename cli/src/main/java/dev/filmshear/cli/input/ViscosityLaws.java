package dev.filmshear.cli.input;

import dev.filmshear.solver.physics.ConstantViscosity;
import dev.filmshear.solver.physics.ExponentialViscosity;
import dev.filmshear.solver.physics.PowerLawViscosity;
import dev.filmshear.solver.physics.SutherlandViscosity;
import dev.filmshear.solver.physics.TabulatedViscosity;
import dev.filmshear.solver.physics.VogelViscosity;
import dev.filmshear.solver.physics.WaltherViscosity;
import dev.filmshear.solver.physics.WaterViscosity;

import java.util.LinkedHashMap;
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

    /** The laws available in this version, in the order of {@link #CONTRACT_LAWS}. */
    public static Map<String, LawReader> standard() {
        Map<String, LawReader> laws = new LinkedHashMap<>();
        laws.put("constant", constant());
        laws.put("exponential", exponential());
        laws.put("vogel", vogel());
        laws.put("power", power());
        laws.put("sutherland", sutherland());
        laws.put("walther", walther());
        laws.put("table", table());
        laws.put("water", water());
        return laws;
    }

    /**
     * {@code law = "exponential"}: mu = reference exp(-coefficient (T - reference_temperature)); reference
     * dynamic or kinematic (converted at the reference temperature), coefficient in 1/K.
     */
    public static LawReader exponential() {
        return new LawReader(List.of("reference", "reference_temperature", "coefficient"), in -> {
            double tr = in.quantity("reference_temperature", QuantityKind.ABSOLUTE_TEMPERATURE);
            double mu = in.dynamicViscosity("reference", tr);
            double beta = in.quantity("coefficient", QuantityKind.EXPANSION);
            ExponentialViscosity defaults = in.build(() -> ExponentialViscosity.of(mu, tr, beta));
            return in.build(() -> new ExponentialViscosity(mu, tr, beta, in.validFrom(defaults.validFrom()),
                    in.validTo(defaults.validTo())));
        });
    }

    /** {@code law = "vogel"}: mu = a exp(b / (T - c)); a dynamic viscosity, b and c in kelvin. */
    public static LawReader vogel() {
        return new LawReader(List.of("a", "b", "c"), in -> {
            double a = in.quantity("a", QuantityKind.DYNAMIC_VISCOSITY);
            double b = in.quantity("b", QuantityKind.TEMPERATURE_DIFFERENCE);
            double c = in.quantity("c", QuantityKind.ABSOLUTE_TEMPERATURE);
            double lowest = Math.max(c + VogelViscosity.DEFAULT_MARGIN_ABOVE_C, VogelViscosity.DEFAULT_VALID_FROM);
            if (!in.has("valid_from") && !in.has("valid_to") && !(lowest < VogelViscosity.DEFAULT_VALID_TO)) {
                throw in.error("c", "c leaves no default validity range (c + " + VogelViscosity.DEFAULT_MARGIN_ABOVE_C
                        + " K to " + VogelViscosity.DEFAULT_VALID_TO + " K)", c + " K",
                        "c below " + (VogelViscosity.DEFAULT_VALID_TO - VogelViscosity.DEFAULT_MARGIN_ABOVE_C)
                                + " K, or valid_from and valid_to given");
            }
            VogelViscosity defaults = in.build(() -> VogelViscosity.of(a, b, c));
            return in.build(() -> new VogelViscosity(a, b, c, in.validFrom(defaults.validFrom()),
                    in.validTo(defaults.validTo())));
        });
    }

    /** {@code law = "power"}: mu = reference (T / reference_temperature)^exponent. */
    public static LawReader power() {
        return new LawReader(List.of("reference", "reference_temperature", "exponent"), in -> {
            double tr = in.quantity("reference_temperature", QuantityKind.ABSOLUTE_TEMPERATURE);
            double mu = in.dynamicViscosity("reference", tr);
            double n = in.quantity("exponent", QuantityKind.DIMENSIONLESS);
            PowerLawViscosity defaults = in.build(() -> PowerLawViscosity.of(mu, tr, n));
            return in.build(() -> new PowerLawViscosity(mu, tr, n, in.validFrom(defaults.validFrom()),
                    in.validTo(defaults.validTo())));
        });
    }

    /** {@code law = "sutherland"}: mu = reference (T/Tr)^1.5 (Tr + S) / (T + S), S = constant in kelvin. */
    public static LawReader sutherland() {
        return new LawReader(List.of("reference", "reference_temperature", "constant"), in -> {
            double tr = in.quantity("reference_temperature", QuantityKind.ABSOLUTE_TEMPERATURE);
            double mu = in.dynamicViscosity("reference", tr);
            double s = in.quantity("constant", QuantityKind.TEMPERATURE_DIFFERENCE);
            SutherlandViscosity defaults = in.build(() -> SutherlandViscosity.of(mu, tr, s));
            return in.build(() -> new SutherlandViscosity(mu, tr, s, in.validFrom(defaults.validFrom()),
                    in.validTo(defaults.validTo())));
        });
    }

    /**
     * {@code law = "walther"}: the ASTM D341 line through two viscosities at two temperatures (an oil
     * sheet's 40 and 100 degC values); values kinematic ("46 cSt") or dynamic (turned into kinematic with
     * the density at each temperature).
     */
    public static LawReader walther() {
        return new LawReader(List.of("temperatures", "values"), in -> {
            double[] t = twoTemperatures(in);
            double[] mu = in.dynamicViscosities("values", t);
            double nu1 = mu[0] / in.density().density(t[0]);
            double nu2 = mu[1] / in.density().density(t[1]);
            WaltherViscosity defaults = in.build(() -> WaltherViscosity.throughPoints(t[0], nu1, t[1], nu2,
                    in.density()));
            return in.build(() -> new WaltherViscosity(defaults.a(), defaults.b(), in.density(),
                    in.validFrom(defaults.validFrom()), in.validTo(defaults.validTo())));
        });
    }

    private static double[] twoTemperatures(LawInput in) {
        double[] t = in.quantities("temperatures", QuantityKind.ABSOLUTE_TEMPERATURE);
        if (t.length != 2) {
            throw in.error("temperatures", t.length + " temperatures", t.length + " temperatures",
                    "exactly two temperatures, such as [\"40 degC\", \"100 degC\"]");
        }
        return t;
    }

    /**
     * {@code law = "table"}: measured viscosities at increasing temperatures, interpolated monotonically
     * in ln mu; values dynamic or kinematic by their unit.
     */
    public static LawReader table() {
        return new LawReader(List.of("temperatures", "values"), in -> {
            double[] t = in.quantities("temperatures", QuantityKind.ABSOLUTE_TEMPERATURE);
            double[] mu = in.dynamicViscosities("values", t);
            double from = in.validFrom(t.length > 0 ? t[0] : Double.NaN);
            double to = in.validTo(t.length > 0 ? t[t.length - 1] : Double.NaN);
            return in.build(() -> new TabulatedViscosity(t, mu, from, to));
        });
    }

    /** {@code law = "water"}: IAPWS 2008 viscosity with IAPWS-IF97 density at {@code pressure} (default 1 atm). */
    public static LawReader water() {
        return new LawReader(List.of("pressure"), in -> {
            double p = in.quantity("pressure", QuantityKind.PRESSURE, WaterViscosity.STANDARD_ATMOSPHERE);
            return in.build(() -> new WaterViscosity(p));
        });
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
