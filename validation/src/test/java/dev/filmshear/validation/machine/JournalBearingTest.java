package dev.filmshear.validation.machine;

import dev.filmshear.solver.model.FilmCase;
import dev.filmshear.solver.model.FilmResult;
import dev.filmshear.solver.model.FilmSolver;
import dev.filmshear.solver.model.GridSpec;
import dev.filmshear.solver.model.Limits;
import dev.filmshear.solver.model.Warning;
import dev.filmshear.solver.physics.ConstantViscosity;
import dev.filmshear.solver.physics.Domain;
import dev.filmshear.solver.physics.FilmPhysics;
import dev.filmshear.solver.physics.Fluid;
import dev.filmshear.solver.physics.JournalGeometry;
import dev.filmshear.solver.physics.Wall;
import dev.filmshear.solver.physics.WallMotion;
import dev.filmshear.validation.analytic.PetroffBearing;
import org.junit.jupiter.api.Test;

import java.util.List;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

/**
 * A concentric journal bearing as an unwrapped film: Petroff's torque, and the warnings that say where the
 * unwrapped laminar film stops being a fair model (Taylor vortices, turbulence, curvature, a temperature limit).
 */
class JournalBearingTest {
    /**
     * The check values of Petroff's equation (R. G. Budynas and J. K. Nisbett, <i>Shigley's Mechanical
     * Engineering Design</i>, ch. 12, section 12-4, equation number from memory; values recomputed in the
     * project's reference sheet, section 9): r = 25 mm, L = 50 mm, c = 25 um, mu = 0.030 Pa s, N = 50 rev/s
     * give T_f = 1.850551 N m and P = 581.368 W.
     */
    @Test
    void steadyFrictionTorqueIsPetroffs() {
        JournalGeometry journal = new JournalGeometry(0.050, 0.050);
        double speed = journal.surfaceSpeed(50);
        FilmPhysics physics = FilmPhysics.isothermalCouette(25e-6, 870, 0.030, new WallMotion.Steady(0),
                new WallMotion.Steady(speed));
        FilmResult r = FilmSolver.solve(FilmCase.steady(physics).withJournal(journal, Limits.NONE)
                .withGrid(new GridSpec(41, 0)));
        assertEquals(1.850551, r.summary().frictionTorque(), 1e-6);
        assertEquals(581.368, r.summary().frictionPower(), 1e-3);
        assertEquals(new PetroffBearing(0.025, 0.050, 25e-6, 0.030, 50).frictionTorque(),
                r.summary().petroffTorque(), 1e-9);
        assertTrue(r.warnings().isEmpty(), r.warnings().toString());
    }

    private static List<String> warningCodes(double diameter, double clearance, double rps, double nu) {
        JournalGeometry journal = new JournalGeometry(diameter, 0.04);
        double rho = 870;
        FilmPhysics physics = new FilmPhysics(new Domain.Gap(clearance),
                Fluid.isothermal(rho, new ConstantViscosity(nu * rho)), Wall.atRest(),
                Wall.isothermal(new WallMotion.Steady(journal.surfaceSpeed(rps))), 0, 0, Double.NaN, null, null);
        FilmResult r = FilmSolver.solve(FilmCase.steady(physics).withJournal(journal, Limits.NONE)
                .withGrid(new GridSpec(21, 0)));
        return r.warnings().stream().map(Warning::code).toList();
    }

    /**
     * The Taylor number Ta = Re^2 c / R (Re = U c / nu) trips at 1708 (narrow-gap critical value, G. I. Taylor,
     * Phil. Trans. R. Soc. A 223 (1923) 289-343): speeds are chosen for Ta = 0.98 x 1708 and 1.02 x 1708 at
     * c / R = 0.004, where Re stays below the journal's turbulence onset of 1000 (Harnoy 2002, 5.5).
     */
    @Test
    void taylorWarningTripsAtTheCriticalNumberAndNotBelow() {
        double d = 0.05;
        double c = 1e-4;
        double nu = 1e-6;
        double ratio = c / (d / 2);
        for (double factor : new double[] {0.98, 1.02}) {
            double re = Math.sqrt(factor * 1708 / ratio);
            double rps = re * nu / c / (Math.PI * d);
            List<String> codes = warningCodes(d, c, rps, nu);
            assertEquals(factor > 1, codes.contains("taylor_vortices"), "factor " + factor + ": " + codes);
            assertFalse(codes.contains("laminar_flow_doubtful"), "Re = " + re);
        }
    }

    /** The journal Reynolds warning trips at U c / nu = 1000 and not below (Harnoy 2002, section 5.5). */
    @Test
    void journalReynoldsWarningTripsAtOnsetAndNotBelow() {
        double d = 2.0; // a large radius keeps Ta = Re^2 c / R = 100 below 1708: only the Reynolds warning is in play
        double c = 1e-4;
        double nu = 1e-6;
        for (double factor : new double[] {0.98, 1.02}) {
            double rps = factor * 1000 * nu / c / (Math.PI * d);
            List<String> codes = warningCodes(d, c, rps, nu);
            assertEquals(factor > 1, codes.contains("laminar_flow_doubtful"), "factor " + factor + ": " + codes);
        }
    }

    /** Clearance over radius above 0.01 warns (flat-film torque low by about 1.5 c/R, see FilmSolver). */
    @Test
    void curvatureWarningTripsAtOnePercent() {
        assertTrue(warningCodes(0.02, 1.02e-4, 1, 1e-4).contains("curvature_too_large"));
        assertFalse(warningCodes(0.02, 0.98e-4, 1, 1e-4).contains("curvature_too_large"));
    }
}
