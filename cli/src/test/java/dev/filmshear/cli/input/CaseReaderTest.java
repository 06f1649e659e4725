package dev.filmshear.cli.input;

import com.fasterxml.jackson.databind.node.TextNode;
import dev.filmshear.solver.model.FilmCase;
import dev.filmshear.solver.model.GridSpec;
import dev.filmshear.solver.model.Horizon;
import dev.filmshear.solver.physics.ConstantViscosity;
import dev.filmshear.solver.physics.DensityLaw;
import dev.filmshear.solver.physics.Domain;
import dev.filmshear.solver.physics.FilmPhysics;
import dev.filmshear.solver.physics.PropertyLaw;
import dev.filmshear.solver.physics.ThermalCondition;
import dev.filmshear.solver.physics.WallMotion;
import org.junit.jupiter.api.Test;

import java.net.URISyntaxException;
import java.nio.file.Path;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertInstanceOf;
import static org.junit.jupiter.api.Assertions.assertNull;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

/**
 * Reading whole case files. The expected SI values follow from the file's own numbers and the unit
 * definitions of NIST SP 811 (2008), Appendix B, checked one by one in {@link UnitsTest}.
 */
class CaseReaderTest {
    /** A value is the written number times one or two table factors, each rounded once in double precision. */
    private static final double ROUNDING = 1e-15;

    private static final String MINIMAL = String.join("\n",
            "[geometry]",
            "gap = \"25 um\"",
            "[fluid]",
            "density = \"860 kg/m^3\"",
            "[fluid.viscosity]",
            "law = \"constant\"",
            "value = \"30 mPa*s\"",
            "[upper_wall]",
            "velocity = \"1 m/s\"",
            "[time]",
            "end = \"1 ms\"",
            "");

    private static final String THERMAL = String.join("\n",
            "[geometry]",
            "gap = \"25 um\"",
            "[fluid]",
            "density = \"860 kg/m^3\"",
            "specific_heat = \"1950 J/(kg*K)\"",
            "thermal_conductivity = \"0.13 W/(m*K)\"",
            "viscosity = \"30 mPa*s\"",
            "[lower_wall]",
            "temperature = \"40 degC\"",
            "[upper_wall]",
            "velocity = \"1 m/s\"",
            "heat_transfer = { coefficient = \"800 W/(m^2*K)\", ambient = \"30 degC\" }",
            "[initial]",
            "temperature = \"104 degF\"",
            "[time]",
            "end = \"steady\"",
            "");

    private static void assertClose(double expected, double actual) {
        assertEquals(expected, actual, Math.abs(expected) * ROUNDING);
    }

    private static Path resource(String name) throws URISyntaxException {
        return Path.of(CaseReaderTest.class.getResource("/input/" + name).toURI());
    }

    private static CaseFile read(String text) {
        return new CaseReader().read(text, "case.toml");
    }

    @Test
    void theContractExampleReadsToSi() throws URISyntaxException {
        Path file = resource("contract-example.toml");
        CaseFile caseFile = TestRegistries.reader().read(file);
        FilmCase c = caseFile.filmCase();
        FilmPhysics p = c.physics();

        assertEquals("free text", caseFile.title());
        assertEquals(file.toString(), caseFile.fileName());
        assertTrue(caseFile.plots());
        assertNull(caseFile.journal());
        assertClose(25e-6, p.gap());
        // fluid: density law referred to the initial temperature 40 degC = 313.15 K
        DensityLaw rho = p.fluid().density();
        assertClose(860, rho.reference());
        assertClose(313.15, rho.referenceTemperature());
        assertClose(6.5e-4, rho.expansion());
        assertEquals(PropertyLaw.constant(1950), p.fluid().specificHeat());
        assertEquals(PropertyLaw.constant(0.13), p.fluid().conductivity());
        TestRegistries.VogelForTest vogel = assertInstanceOf(TestRegistries.VogelForTest.class, p.fluid().viscosity());
        assertClose(5.264e-5, vogel.a());
        assertClose(948, vogel.b());
        assertClose(170, vogel.c());
        // walls
        assertEquals(new WallMotion.Steady(0), p.lower().motion());
        ThermalCondition.FixedTemperature lowerT =
                assertInstanceOf(ThermalCondition.FixedTemperature.class, p.lower().thermal());
        assertClose(313.15, lowerT.temperature());
        WallMotion.Ramp ramp = assertInstanceOf(WallMotion.Ramp.class, p.upper().motion());
        assertEquals(0, ramp.from());
        assertClose(20, ramp.to());
        assertEquals(0, ramp.start());
        assertClose(2e-6, ramp.duration());
        assertEquals(new ThermalCondition.HeatFlux(0), p.upper().thermal());
        // the rest
        assertEquals(0, p.pressureGradient());
        assertEquals(0, p.initialVelocity());
        assertClose(313.15, p.initialTemperature());
        assertTrue(p.isThermal());
        assertEquals(new Horizon.Until(0.04), c.horizon());
        assertEquals(1e-6, c.tolerance());
        assertEquals(new GridSpec(201, 0), c.grid());
        double[] times = c.outputTimes();
        assertEquals(3, times.length);
        assertClose(5e-6, times[0]);
        assertClose(20e-6, times[1]);
        assertClose(1e-3, times[2]);
        assertEquals(file.toString(), caseFile.document().fileName());
    }

    @Test
    void theJournalVariantSetsGapAndShaftSpeed() throws URISyntaxException {
        CaseFile caseFile = TestRegistries.reader().read(resource("contract-example-journal.toml"));
        JournalSpec journal = caseFile.journal();
        assertClose(0.05, journal.diameter());
        assertClose(0.04, journal.length());
        assertClose(40e-6, journal.radialClearance());
        assertEquals(new WallMotion.Steady(50), journal.speed());
        FilmPhysics p = caseFile.filmCase().physics();
        assertClose(40e-6, p.gap());
        // U = pi * D * n = pi * 0.05 m * 50 rev/s
        WallMotion.Steady shaft = assertInstanceOf(WallMotion.Steady.class, p.upper().motion());
        assertClose(Math.PI * 0.05 * 50, shaft.velocity());
        assertEquals(new ThermalCondition.HeatFlux(0), p.upper().thermal());
    }

    @Test
    void theVerbatimContractExampleHasBothGapAndJournal() throws URISyntaxException {
        InputException e = assertThrows(InputException.class,
                () -> TestRegistries.reader().read(resource("contract-example-verbatim.toml")));
        assertEquals("geometry.gap", e.key());
        assertEquals(4, e.line());
    }

    @Test
    void theStandardRegistriesReadTheContractExampleWithTheRealVogelLawAndWaterPreset() throws URISyntaxException {
        CaseFile c = new CaseReader().read(resource("contract-example.toml"));
        dev.filmshear.solver.physics.VogelViscosity vogel = assertInstanceOf(
                dev.filmshear.solver.physics.VogelViscosity.class, c.filmCase().physics().fluid().viscosity());
        assertClose(5.264e-5, vogel.a());
        assertClose(948, vogel.b());
        assertClose(170, vogel.c());
        // the case's own keys replace the water preset's
        assertClose(860, c.filmCase().physics().fluid().density().reference());
    }

    @Test
    void everyPresetIsReadBackToTheSolversOwnLaw() {
        for (dev.filmshear.solver.physics.FluidPreset preset : dev.filmshear.solver.physics.FluidPresets.all()) {
            CaseFile c = read(MINIMAL.replace("[fluid]", "[fluid]\npreset = \"" + preset.name() + "\"")
                    .replace("density = \"860 kg/m^3\"\n", "")
                    .replaceAll("\\[fluid\\.viscosity\\][^\\[]*", "")
                    + "[initial]\ntemperature = \"40 degC\"\n");
            double t = 313.15;
            assertEquals(preset.viscosity().mu(t), c.filmCase().physics().fluid().viscosity().mu(t),
                    1e-12 * preset.viscosity().mu(t), preset.name());
            assertEquals(preset.density().density(t), c.filmCase().physics().fluid().density().density(t),
                    1e-12 * preset.density().density(t), preset.name());
        }
    }

    @Test
    void aMinimalCaseIsIsothermal() {
        CaseFile caseFile = read(MINIMAL);
        FilmPhysics p = caseFile.filmCase().physics();
        assertFalse(p.isThermal());
        assertNull(p.lower().thermal());
        assertNull(p.upper().thermal());
        assertNull(p.fluid().specificHeat());
        assertTrue(Double.isNaN(p.initialTemperature()));
        assertEquals(new ConstantViscosity(0.03), p.fluid().viscosity());
        assertEquals(new WallMotion.Steady(0), p.lower().motion());
        assertEquals(new WallMotion.Steady(1), p.upper().motion());
        assertEquals("case", caseFile.title());
        assertFalse(caseFile.plots());
        assertEquals(GridSpec.defaults(), caseFile.filmCase().grid());
        assertEquals(FilmCase.DEFAULT_TOLERANCE, caseFile.filmCase().tolerance());
    }

    @Test
    void aKinematicViscosityUsesTheDensityAtTheInitialTemperature() {
        String text = MINIMAL.replace("value = \"30 mPa*s\"", "value = \"32 cSt\"");
        assertClose(32e-6 * 860, read(text).filmCase().physics().fluid().viscosity().mu(300));

        // rho(40 degC) = 860 kg/m^3 * (1 - 6.5e-4 1/K * 20 K) = 848.82 kg/m^3
        String expanding = text.replace("density = \"860 kg/m^3\"", String.join("\n",
                "density = \"860 kg/m^3\"", "thermal_expansion = \"6.5e-4 1/K\"", "density_temperature = \"20 degC\""))
                + "[initial]\ntemperature = \"40 degC\"\n";
        assertEquals(32e-6 * 848.82, read(expanding).filmCase().physics().fluid().viscosity().mu(300), 1e-12);
    }

    @Test
    void aThermalCaseWithHeatTransferAndFahrenheit() {
        FilmCase c = read(THERMAL).filmCase();
        FilmPhysics p = c.physics();
        assertTrue(p.isThermal());
        assertTrue(c.isSteady());
        // 104 degF = 313.15 K (NIST SP 811, 2008, Appendix B)
        assertClose(313.15, p.initialTemperature());
        ThermalCondition.HeatTransfer h = assertInstanceOf(ThermalCondition.HeatTransfer.class, p.upper().thermal());
        assertClose(800, h.coefficient());
        assertClose(303.15, h.ambient());
        assertEquals(new ConstantViscosity(0.03), p.fluid().viscosity());
    }

    @Test
    void propertiesMayVaryLinearlyWithTemperature() {
        String text = THERMAL.replace("specific_heat = \"1950 J/(kg*K)\"",
                "specific_heat = { value = \"1950 J/(kg*K)\", temperature = \"20 degC\", slope = \"2e-3 1/K\" }")
                .replace("thermal_conductivity = \"0.13 W/(m*K)\"",
                        "thermal_conductivity = { value = \"0.13 W/(m*K)\", slope = \"-5e-4 1/K\" }");
        FilmPhysics p = read(text).filmCase().physics();
        PropertyLaw cp = p.fluid().specificHeat();
        assertClose(1950, cp.reference());
        assertClose(293.15, cp.referenceTemperature());
        assertClose(2e-3, cp.slope());
        // the conductivity's reference temperature defaults to the initial temperature
        assertClose(313.15, p.fluid().conductivity().referenceTemperature());
    }

    @Test
    void wallMotionsOfEveryKind() {
        String ramp = MINIMAL.replace("velocity = \"1 m/s\"",
                "velocity = { kind = \"ramp\", to = \"20 m/s\", duration = \"2 us\", start = \"1 ms\" }")
                + "[initial]\nvelocity = \"2 m/s\"\n";
        // from defaults to the initial velocity
        assertEquals(new WallMotion.Ramp(2, 20, 1e-3, 2e-6), read(ramp).filmCase().physics().upper().motion());

        String sine = MINIMAL.replace("velocity = \"1 m/s\"",
                "velocity = { kind = \"sine\", amplitude = \"1 m/s\", frequency = \"50 Hz\", mean = \"0.5 m/s\", phase = \"90 deg\" }");
        WallMotion.Sine s = assertInstanceOf(WallMotion.Sine.class, read(sine).filmCase().physics().upper().motion());
        assertEquals(0.5, s.mean());
        assertEquals(1, s.amplitude());
        assertEquals(50, s.frequency());
        assertClose(Math.PI / 2, s.phase());

        String table = MINIMAL.replace("velocity = \"1 m/s\"",
                "velocity = { kind = \"table\", times = [\"0 s\", \"1 ms\"], values = [\"0 m/s\", \"5 m/s\"] }");
        assertEquals(new WallMotion.Table(new double[] {0, 1e-3}, new double[] {0, 5}),
                read(table).filmCase().physics().upper().motion());

        String constant = MINIMAL.replace("velocity = \"1 m/s\"", "velocity = { kind = \"constant\", value = \"3 m/s\" }");
        assertEquals(new WallMotion.Steady(3), read(constant).filmCase().physics().upper().motion());

        String subTable = MINIMAL.replace("velocity = \"1 m/s\"", "[upper_wall.velocity]\nkind = \"constant\"\nvalue = 4");
        assertEquals(new WallMotion.Steady(4), read(subTable).filmCase().physics().upper().motion());
    }

    @Test
    void aJournalSpeedRampIsScaledToTheShaftSurface() {
        String text = MINIMAL.replace("[geometry]\ngap = \"25 um\"\n", "")
                .replace("[upper_wall]\nvelocity = \"1 m/s\"\n", "")
                + "[journal]\ndiameter = \"2 in\"\nlength = \"1 in\"\nradial_clearance = \"2 mil\"\n"
                + "speed = { kind = \"ramp\", to = \"3000 rpm\", duration = \"0.5 s\" }\n";
        CaseFile caseFile = read(text);
        assertEquals(new WallMotion.Ramp(0, 50, 0, 0.5), caseFile.journal().speed());
        WallMotion.Ramp shaft = assertInstanceOf(WallMotion.Ramp.class, caseFile.filmCase().physics().upper().motion());
        assertClose(Math.PI * 0.0508 * 50, shaft.to());
        assertEquals(0.5, shaft.duration());
        assertClose(50.8e-6, caseFile.filmCase().physics().gap());
    }

    @Test
    void aSemiInfiniteFilmHasNoUpperWall() {
        String text = MINIMAL.replace("gap = \"25 um\"", "semi_infinite = true\ndepth = \"1 mm\"")
                .replace("[upper_wall]\nvelocity = \"1 m/s\"\n", "[lower_wall]\nvelocity = \"1 m/s\"\n");
        FilmPhysics p = read(text).filmCase().physics();
        assertEquals(new Domain.SemiInfinite(1e-3), p.domain());
        assertNull(p.upper());
        assertEquals(new WallMotion.Steady(1), p.lower().motion());
    }

    @Test
    void aPresetFillsInAndTheCaseOverridesIt() {
        CaseReader reader = TestRegistries.reader();
        String isothermal = String.join("\n", "[geometry]", "gap = \"25 um\"", "[fluid]", "preset = \"water\"",
                "density = \"900 kg/m^3\"", "[upper_wall]", "velocity = \"1 m/s\"", "[time]", "end = \"1 ms\"", "");
        FilmPhysics p = reader.read(isothermal, "p.toml").filmCase().physics();
        assertEquals(DensityLaw.constant(900), p.fluid().density());
        assertEquals(new ConstantViscosity(1e-3), p.fluid().viscosity());
        assertFalse(p.isThermal(), "a preset's thermal properties do not make a case thermal");

        String thermal = isothermal.replace("velocity = \"1 m/s\"", "velocity = \"1 m/s\"\nheat_flux = 0")
                + "[lower_wall]\ntemperature = \"20 degC\"\n[initial]\ntemperature = \"20 degC\"\n";
        FilmPhysics q = reader.read(thermal, "q.toml").filmCase().physics();
        assertTrue(q.isThermal());
        assertEquals(PropertyLaw.constant(4182), q.fluid().specificHeat());
        assertEquals(PropertyLaw.constant(0.6), q.fluid().conductivity());
    }

    @Test
    void anOverrideFromAPlanIsReadAndItsErrorsNameThePlan() {
        TomlDocument base = TomlDocument.parse(MINIMAL.replace("velocity = \"1 m/s\"",
                "velocity = { kind = \"ramp\", to = \"20 m/s\", duration = \"2 us\" }"), "base.toml");
        TomlDocument swept = base.withOverride("upper_wall.velocity.to", TextNode.valueOf("30 m/s"), "plan.toml", 6);
        CaseReader reader = new CaseReader();
        assertEquals(new WallMotion.Ramp(0, 30, 0, 2e-6), reader.read(swept).filmCase().physics().upper().motion());

        TomlDocument bad = base.withOverride("geometry.gap", TextNode.valueOf("-5 um"), "plan.toml", 7);
        InputException e = assertThrows(InputException.class, () -> reader.read(bad));
        assertEquals("error: plan.toml:7: geometry.gap: value not allowed (given \"-5 um\", "
                + "allowed a finite value above zero)", e.oneLine());

        TomlDocument wrongUnit = base.withOverride("upper_wall.velocity.duration", TextNode.valueOf("2 m"), "plan.toml", 9);
        InputException u = assertThrows(InputException.class, () -> reader.read(wrongUnit));
        assertEquals("plan.toml", u.file());
        assertEquals(9, u.line());
        assertEquals("upper_wall.velocity.duration", u.key());
    }

    @Test
    void theTitleDefaultsToTheFileName() {
        assertEquals("startup", new CaseReader().read(MINIMAL, "runs/startup.toml").title());
        assertEquals("given", new CaseReader().read("title = \"given\"\n" + MINIMAL, "x.toml").title());
    }

    @Test
    void outputTimesAreKeptInSi() {
        CaseFile c = read(MINIMAL + "[output]\ntimes = [\"0.1 ms\", 5e-4, \"1 ms\"]\nplots = true\n");
        assertArrayEquals(new double[] {1e-4, 5e-4, 1e-3}, c.filmCase().outputTimes(), 1e-18);
        assertTrue(c.plots());
    }

    @Test
    void theLawRegistryIsOpen() {
        CaseReader reader = new CaseReader();
        assertEquals(java.util.Set.copyOf(ViscosityLaws.CONTRACT_LAWS), reader.laws().keySet(),
                "every law of the contract is registered");
        assertEquals(dev.filmshear.solver.physics.FluidPresets.names(), java.util.List.copyOf(reader.presets().keySet()));
    }
}
