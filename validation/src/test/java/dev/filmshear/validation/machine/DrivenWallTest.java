package dev.filmshear.validation.machine;

import dev.filmshear.solver.base.NumericalFailureException;
import dev.filmshear.solver.model.FilmCase;
import dev.filmshear.solver.model.FilmResult;
import dev.filmshear.solver.model.FilmSolver;
import dev.filmshear.solver.model.GridSpec;
import dev.filmshear.solver.model.History;
import dev.filmshear.solver.model.Limits;
import dev.filmshear.solver.physics.ConstantViscosity;
import dev.filmshear.solver.physics.DensityLaw;
import dev.filmshear.solver.physics.Domain;
import dev.filmshear.solver.physics.Drive;
import dev.filmshear.solver.physics.ExponentialViscosity;
import dev.filmshear.solver.physics.FilmPhysics;
import dev.filmshear.solver.physics.Fluid;
import dev.filmshear.solver.physics.JournalGeometry;
import dev.filmshear.solver.physics.PropertyLaw;
import dev.filmshear.solver.physics.ThermalCondition;
import dev.filmshear.solver.physics.Wall;
import dev.filmshear.solver.physics.WallMotion;
import dev.filmshear.validation.analytic.NahmeCouette;
import org.junit.jupiter.api.Test;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

/**
 * A wall (or shaft) with inertia, driven by a force (or torque) and braked by the film. With constant
 * viscosity and a film whose own inertia is negligible (its momentum time gap^2 / nu is microseconds, the
 * shaft's seconds), the film is quasi-steady Couette flow, tau = mu U / c, and the shaft obeys
 * I dOmega/dt = Q - mu (Omega R / c) A R: exponential approach with time constant I c / (mu A R^2), the
 * closed form of a first-order linear ODE (common practice, derived here; the Petroff torque of the film is
 * R. G. Budynas and J. K. Nisbett, <i>Shigley's Mechanical Engineering Design</i>, ch. 12).
 */
class DrivenWallTest {
    private static final JournalGeometry JOURNAL = new JournalGeometry(0.05, 0.04);
    private static final double C = 40e-6;
    private static final double MU = 0.04;
    private static final double INERTIA = 0.02;
    /** mass per unit film area of the rotor: I / (R^2 A) */
    private static final double MASS = INERTIA / (JOURNAL.radius() * JOURNAL.radius() * JOURNAL.area());
    private static final double TAU = INERTIA * C / (MU * JOURNAL.area() * JOURNAL.radius() * JOURNAL.radius());
    /** Relative error allowed: the time integration at tolerance 1e-7, and the film's own inertia (rho c / 2 m ~ 3e-6). */
    private static final double TOLERANCE = 2e-5;

    private static FilmCase journalCase(WallMotion.Driven shaft, double end) {
        FilmPhysics physics = new FilmPhysics(new Domain.Gap(C), Fluid.isothermal(870, new ConstantViscosity(MU)),
                Wall.atRest(), Wall.isothermal(shaft), 0, 0, Double.NaN, null, null);
        return FilmCase.until(physics, end).withGrid(new GridSpec(41, 0)).withTolerance(1e-7)
                .withJournal(JOURNAL, Limits.NONE);
    }

    @Test
    void coastDownDecaysExponentiallyWithTheClosedFormTimeConstant() {
        double u0 = JOURNAL.surfaceSpeed(50);
        FilmResult r = FilmSolver.solve(journalCase(new WallMotion.Driven(MASS, new Drive.Constant(0), u0, u0, 0.1),
                3 * TAU));
        History h = r.history();
        for (int row = 0; row < h.size(); row += Math.max(1, h.size() / 20)) {
            double t = h.get(History.Column.TIME, row);
            if (t < 1e-3 * TAU) {
                continue; // the film's own start-up, microseconds
            }
            double expected = u0 * Math.exp(-t / TAU);
            assertEquals(expected, h.get(History.Column.UPPER_WALL_VELOCITY, row), TOLERANCE * u0, "t = " + t);
        }
        assertEquals(TAU * Math.log(10), r.summary().coastDownTime(), TOLERANCE * TAU * Math.log(10));
        assertTrue(Double.isNaN(r.summary().speedRiseTime()));
    }

    @Test
    void startUpUnderConstantTorqueReachesTheBalanceSpeed() {
        double torque = 0.5;
        double force = torque / (JOURNAL.radius() * JOURNAL.area());
        double finalSpeed = force * C / MU;
        FilmResult r = FilmSolver.solve(journalCase(new WallMotion.Driven(MASS, new Drive.Constant(force), 0,
                finalSpeed, 0.1), 8 * TAU));
        assertEquals(finalSpeed * (1 - Math.exp(-8)), r.history().get(History.Column.UPPER_WALL_VELOCITY,
                r.history().size() - 1), TOLERANCE * finalSpeed);
        // 99 % of the speed reached at the end, U_f (1 - e^-8): 1 - e^(-t / tau) = 0.99 (1 - e^-8)
        assertEquals(TAU * Math.log(1 / (0.01 + 0.99 * Math.exp(-8))), r.summary().speedRiseTime(), 1e-4 * TAU);
        // the friction torque balances the drive at the end (to the remaining e^-8 of acceleration)
        assertEquals(torque, r.summary().frictionTorque(), 1e-3 * torque);
    }

    /**
     * A motor curve falling linearly from stall force F0 at rest to zero at U_max meets the film's line mu U / c
     * at U = F0 / (F0 / U_max + mu / c): the steady solver must find it.
     */
    @Test
    void steadySpeedOnAMotorCurveIsWhereTheCurveMeetsTheFilmsFriction() {
        double stall = 2e5;
        double top = 40;
        FilmCase filmCase = journalCase(new WallMotion.Driven(MASS,
                new Drive.SpeedCurve(new double[] {0, top}, new double[] {stall, 0}), 0, top, 0.1), 1);
        FilmResult r = FilmSolver.solve(filmCase.withHorizon(new dev.filmshear.solver.model.Horizon.Steady()));
        double expected = stall / (stall / top + MU / C);
        double[] u = r.finalSnapshot().velocity();
        assertEquals(expected, u[u.length - 1], 1e-9 * expected);
    }

    /**
     * Stress-driven shear heating (references section 7(g)): a wall pulled by a constant force over a film
     * whose viscosity falls exponentially with temperature, both walls at T0, has a steady state only while
     * Lambda = beta tau^2 h^2 / (k mu0) is below 3.513830719 (the Gelfand–Bratu critical value); above it the
     * film runs away thermally and the steady solver must say so. Below it, the steady state must match the
     * closed form (tau h / (mu0 U) = b / sinh b, Nahme–Griffith, citation from memory).
     */
    @Test
    void forceDrivenHeatingHasNoSteadyStateAboveTheCriticalLambda() {
        double h = 25e-6;
        double mu0 = 0.04;
        double beta = 0.03;
        double k = 0.13;
        double t0 = 313.15;
        double critical = 3.513830719;
        double tauCritical = Math.sqrt(critical * k * mu0 / (beta * h * h));
        Fluid oil = new Fluid(DensityLaw.constant(870), new ExponentialViscosity(mu0, t0, beta, 200, 700),
                PropertyLaw.constant(1950), PropertyLaw.constant(k));
        for (double fraction : new double[] {0.8, 1.05}) {
            double force = fraction * tauCritical;
            WallMotion.Driven wall = new WallMotion.Driven(10, new Drive.Constant(force), 0, force * h / mu0, 0.1);
            FilmPhysics physics = new FilmPhysics(new Domain.Gap(h), oil,
                    new Wall(new WallMotion.Steady(0), new ThermalCondition.FixedTemperature(t0)),
                    new Wall(wall, new ThermalCondition.FixedTemperature(t0)), 0, 0, t0, null, null);
            FilmCase steady = FilmCase.steady(physics).withGrid(new GridSpec(81, 0));
            if (fraction > 1) {
                assertThrows(NumericalFailureException.class, () -> FilmSolver.solve(steady));
            } else {
                FilmResult r = FilmSolver.solve(steady);
                double[] u = r.finalSnapshot().velocity();
                double speed = u[u.length - 1];
                double na = beta * mu0 * speed * speed / k;
                double ratio = NahmeCouette.shearStressRatio(NahmeCouette.Walls.BOTH_AT_WALL_TEMPERATURE, na);
                assertEquals(ratio, force * h / (mu0 * speed), 2e-3 * ratio, "Na = " + na);
            }
        }
    }
}
