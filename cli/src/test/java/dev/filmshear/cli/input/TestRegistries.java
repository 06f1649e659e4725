package dev.filmshear.cli.input;

import dev.filmshear.solver.base.InvalidParameterException;
import dev.filmshear.solver.physics.ViscosityLaw;

import java.util.HashMap;
import java.util.List;
import java.util.Map;

/**
 * Registries for tests: the standard laws plus a stand-in Vogel law, and a stand-in "water" preset, to
 * show that laws and presets plug into the reader through its registries alone (the real ones are
 * another part of the project).
 */
final class TestRegistries {

    private TestRegistries() {
    }

    /** mu = a exp(b / (T - c)), the contract's "vogel" law, for reading tests only. */
    record VogelForTest(double a, double b, double c, double validFrom, double validTo) implements ViscosityLaw {
        VogelForTest {
            InvalidParameterException.requirePositive("a", a, "Pa*s");
            InvalidParameterException.requirePositive("b", b, "K");
            InvalidParameterException.requireNonNegative("c", c, "K");
        }

        @Override
        public String name() {
            return "vogel";
        }

        @Override
        public double mu(double t) {
            return a * Math.exp(b / (t - c));
        }

        @Override
        public double dMuDT(double t) {
            return -mu(t) * b / ((t - c) * (t - c));
        }

        @Override
        public String describe() {
            return "vogel a=" + a + " b=" + b + " c=" + c;
        }
    }

    static Map<String, LawReader> laws() {
        Map<String, LawReader> laws = new HashMap<>(ViscosityLaws.standard());
        laws.put("vogel", new LawReader(List.of("a", "b", "c"), in -> {
            double a = in.dynamicViscosity("a", in.conversionTemperature());
            double b = in.quantity("b", QuantityKind.TEMPERATURE_DIFFERENCE);
            double c = in.quantity("c", QuantityKind.ABSOLUTE_TEMPERATURE);
            double from = in.validFrom(c + 1);
            double to = in.validTo(Double.POSITIVE_INFINITY);
            return in.build(() -> new VogelForTest(a, b, c, from, to));
        }));
        return laws;
    }

    /** A stand-in "water" preset: density and a constant viscosity, and thermal properties. */
    static final FluidPreset WATER = new FluidPreset("water", "stand-in for tests", String.join("\n",
            "density = \"998 kg/m^3\"",
            "specific_heat = \"4182 J/(kg*K)\"",
            "thermal_conductivity = \"0.6 W/(m*K)\"",
            "[viscosity]",
            "law = \"constant\"",
            "value = \"1 mPa*s\""));

    static Map<String, FluidPreset> presets() {
        return Map.of("water", WATER);
    }

    static CaseReader reader() {
        return new CaseReader(laws(), presets());
    }
}
