package dev.filmshear.validation.mms;

import dev.filmshear.solver.base.InvalidParameterException;
import dev.filmshear.solver.physics.DensityLaw;
import dev.filmshear.solver.physics.Domain;
import dev.filmshear.solver.physics.FilmPhysics;
import dev.filmshear.solver.physics.Fluid;
import dev.filmshear.solver.physics.ThermalCondition;
import dev.filmshear.solver.physics.WallMotion;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.MethodSource;

import java.util.List;

import static dev.filmshear.validation.mms.ManufacturedCases.BUMP;
import static dev.filmshear.validation.mms.ManufacturedCases.DENSITY;
import static dev.filmshear.validation.mms.ManufacturedCases.END;
import static dev.filmshear.validation.mms.ManufacturedCases.GAP;
import static dev.filmshear.validation.mms.ManufacturedCases.OMEGA;
import static dev.filmshear.validation.mms.ManufacturedCases.SPEED;
import static dev.filmshear.validation.mms.ManufacturedCases.TEMPERATURE_RISE;
import static dev.filmshear.validation.mms.ManufacturedCases.TEMPERATURE_SWING;
import static dev.filmshear.validation.mms.ManufacturedCases.WALL_TEMPERATURE;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;

/**
 * The manufactured fields and their source terms (method of manufactured solutions: K. Salari and P. Knupp,
 * SAND2000-1444, 2000), and the checks that make a manufactured case a fair test of the solver.
 */
class ManufacturedSolutionTest {
    /** references.md 10.1 prints S_u = 6.0607e6 N/m^3: half a unit of its last digit. */
    private static final double MOMENTUM_SPOT_TOLERANCE = 50;
    /** references.md 10.1 prints S_T = 9.1707e8 W/m^3: half a unit of its last digit. */
    private static final double HEAT_SPOT_TOLERANCE = 5e3;
    /** Central differences with steps 1e-3 of the scales leave O(1e-6) of the source's terms; round-off is 1e-10. */
    private static final double RESIDUAL_TOLERANCE = 1e-5;
    private static final double Y_STEP = 1e-3 * GAP;
    private static final double T_STEP = 1e-3 / OMEGA;

    /** The fields of references.md 10.1 exactly as written there (not uniform at t = 0). */
    private static ManufacturedSolution referenceSolution() {
        Field u = Field.of(0, new Field.Term(SPEED, Harmonic.constant(1), new Shape.Linear()),
                new Field.Term(SPEED * BUMP, Harmonic.cosine(OMEGA), new Shape.Sine(1)));
        Field t = Field.of(WALL_TEMPERATURE, new Field.Term(TEMPERATURE_RISE,
                new Harmonic(1, TEMPERATURE_SWING, 0, OMEGA), new Shape.Sine(1)));
        return new ManufacturedSolution(new Domain.Gap(GAP), ManufacturedCases.oil(DensityLaw.constant(DENSITY)),
                u, t, 0);
    }

    @Test
    void sourcesReproduceTheSpotValuesOfTheReferenceSolution() {
        // references.md 10.1 (derived, symbolic check with sympy): h = 1e-4 m, U = 1 m/s, a = 0.3, omega = 100 1/s,
        // T0 = 313.15 K, dT = 5 K, b = 0.5, rho = 870, cp = 1950, k = 0.13, mu0 = 0.04, beta = 0.03, at y = 3e-5 m
        // and t = 0.01 s: S_u = 6.0607e6 N/m^3, S_T = 9.1707e8 W/m^3
        ManufacturedSolution s = referenceSolution();
        assertEquals(6.0607e6, s.momentumSource(3e-5, 0.01), MOMENTUM_SPOT_TOLERANCE);
        assertEquals(9.1707e8, s.heatSource(3e-5, 0.01), HEAT_SPOT_TOLERANCE);
        assertEquals(6.0607e6, s.momentumSource().value(3e-5, 0.01), MOMENTUM_SPOT_TOLERANCE);
        assertEquals(9.1707e8, s.heatSource().value(3e-5, 0.01), HEAT_SPOT_TOLERANCE);
    }

    static List<ManufacturedCase> cases() {
        return ManufacturedCases.all();
    }

    /**
     * The derivation, checked independently: with the sources added, the residual of the film equations at
     * the manufactured fields, formed by central differences (flux form for d/dy(mu du/dy), mu from the solver's
     * own viscosity law), vanishes to the differences' truncation error.
     */
    @ParameterizedTest(name = "{0}")
    @MethodSource("cases")
    void sourcesCancelTheResidualOfTheEquations(ManufacturedCase c) {
        ManufacturedSolution s = c.solution();
        Fluid fluid = s.fluid();
        double l = s.extent();
        double cp = fluid.specificHeat().value(WALL_TEMPERATURE);
        double k = fluid.conductivity().value(WALL_TEMPERATURE);
        for (double eta : new double[] {0.1, 0.37, 0.5, 0.83}) {
            for (double t : new double[] {0.2 * END, 0.65 * END, END}) {
                double y = eta * l;
                double temperature = s.temperature(y, t);
                double rho = fluid.density().density(temperature);
                double muPlus = fluid.viscosity().mu(s.temperature(y + Y_STEP / 2, t));
                double muMinus = fluid.viscosity().mu(s.temperature(y - Y_STEP / 2, t));
                double u = s.velocity(y, t);
                double shearPlus = muPlus * (s.velocity(y + Y_STEP, t) - u) / Y_STEP;
                double shearMinus = muMinus * (u - s.velocity(y - Y_STEP, t)) / Y_STEP;
                double ut = (s.velocity(y, t + T_STEP) - s.velocity(y, t - T_STEP)) / (2 * T_STEP);
                double momentumInertia = rho * ut;
                double momentumDiffusion = (shearPlus - shearMinus) / Y_STEP;
                double momentumResidual = momentumInertia - momentumDiffusion + s.pressureGradient()
                        - s.momentumSource(y, t);
                double momentumScale = Math.abs(momentumInertia) + Math.abs(momentumDiffusion)
                        + Math.abs(s.pressureGradient());
                assertEquals(0, momentumResidual / momentumScale, RESIDUAL_TOLERANCE,
                        c.name() + ": momentum at eta = " + eta + ", t = " + t);

                double tt = (s.temperature(y, t + T_STEP) - s.temperature(y, t - T_STEP)) / (2 * T_STEP);
                double conduction = k * (s.temperature(y + Y_STEP, t) - 2 * temperature + s.temperature(y - Y_STEP, t))
                        / (Y_STEP * Y_STEP);
                double uy = (s.velocity(y + Y_STEP, t) - s.velocity(y - Y_STEP, t)) / (2 * Y_STEP);
                double dissipation = fluid.viscosity().mu(temperature) * uy * uy;
                double storage = rho * cp * tt;
                double heatResidual = storage - conduction - dissipation - s.heatSource(y, t);
                double heatScale = Math.abs(storage) + Math.abs(conduction) + Math.abs(dissipation);
                assertEquals(0, heatResidual / heatScale, RESIDUAL_TOLERANCE,
                        c.name() + ": energy at eta = " + eta + ", t = " + t);
            }
        }
    }

    @Test
    void wallsMoveAsTheFieldsSay() {
        ManufacturedCase c = ManufacturedCases.fixedWalls();
        FilmPhysics physics = c.filmCase(21).physics();
        assertEquals(new WallMotion.Steady(0), physics.lower().motion());
        assertEquals(new WallMotion.Sine(0, SPEED, OMEGA / (2 * Math.PI), 0), physics.upper().motion());
        assertEquals(0, physics.initialVelocity());
        assertEquals(WALL_TEMPERATURE, physics.initialTemperature());
        ManufacturedCase semi = ManufacturedCases.semiInfinite();
        FilmPhysics semiPhysics = semi.filmCase(21).physics();
        assertEquals(new WallMotion.Sine(0, SPEED, OMEGA / (2 * Math.PI), 0), semiPhysics.lower().motion());
        assertEquals(new Domain.SemiInfinite(GAP), semiPhysics.domain());
        // the phase of a wall history with a cosine part: 1 - cos(omega t) = 1 + sin(omega t - pi/2)
        ManufacturedSolution shifted = new ManufacturedSolution(new Domain.Gap(GAP),
                ManufacturedCases.oil(DensityLaw.constant(DENSITY)),
                Field.of(0, new Field.Term(2, Harmonic.oneMinusCosine(OMEGA), new Shape.Linear())),
                Field.of(WALL_TEMPERATURE), 0);
        WallMotion.Sine upper = (WallMotion.Sine) shifted.upperWallMotion();
        for (double t : new double[] {0, 0.003, 0.0071}) {
            assertEquals(2 * (1 - Math.cos(OMEGA * t)), upper.velocity(t), 1e-14);
        }
    }

    @Test
    void unfairCasesAreRejected() {
        ThermalCondition atT0 = new ThermalCondition.FixedTemperature(WALL_TEMPERATURE);
        // the reference fields are not uniform at t = 0, where the solver starts uniform
        assertThrows(InvalidParameterException.class,
                () -> new ManufacturedCase("10.1", referenceSolution(), atT0, atT0, END, 0, 1));
        Fluid oil = ManufacturedCases.oil(DensityLaw.constant(DENSITY));
        Field u = ManufacturedCases.velocity(new Shape.Linear(), new Shape.Sine(1));
        // sin(pi eta) has a slope at eta = 0: not an adiabatic wall
        ManufacturedSolution sine = new ManufacturedSolution(new Domain.Gap(GAP), oil, u,
                ManufacturedCases.temperature(new double[] {1}, new Shape.Sine(1)), 0);
        assertThrows(InvalidParameterException.class,
                () -> new ManufacturedCase("slope", sine, ThermalCondition.HeatFlux.ADIABATIC, atT0, END, 0, 1));
        // a heat-transfer coefficient the shape does not meet (Biot 2 against a shape built for Biot 1)
        ManufacturedCase transfer = ManufacturedCases.heatTransferWall();
        assertThrows(InvalidParameterException.class, () -> new ManufacturedCase("biot", transfer.solution(), atT0,
                new ThermalCondition.HeatTransfer(2 * 0.13 / GAP, WALL_TEMPERATURE), END, 0, 1));
        // shear at the truncation depth of a semi-infinite film
        ManufacturedSolution sheared = new ManufacturedSolution(new Domain.SemiInfinite(GAP), oil,
                ManufacturedCases.velocity(new Shape.Constant(), new Shape.Sine(1)),
                ManufacturedCases.temperature(new double[] {1}, new Shape.Sine(0.5)), 0);
        assertThrows(InvalidParameterException.class,
                () -> new ManufacturedCase("far field", sheared, atT0, null, END, 0, 1));
        // 50 K above T0 leaves the exponential law's +-30 K range
        ManufacturedSolution hot = new ManufacturedSolution(new Domain.Gap(GAP), oil, u,
                ManufacturedCases.temperature(new double[] {10}, new Shape.Sine(1)), 0);
        assertThrows(InvalidParameterException.class, () -> new ManufacturedCase("hot", hot, atT0, atT0, END, 0, 1));
        // an automatic truncation depth is not a manufactured far field
        assertThrows(InvalidParameterException.class, () -> new ManufacturedSolution(
                Domain.SemiInfinite.automatic(), oil, u, Field.of(WALL_TEMPERATURE), 0));
    }
}
