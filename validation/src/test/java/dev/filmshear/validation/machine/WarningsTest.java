package dev.filmshear.validation.machine;

import dev.filmshear.solver.model.FilmCase;
import dev.filmshear.solver.model.FilmResult;
import dev.filmshear.solver.model.FilmSolver;
import dev.filmshear.solver.model.GridSpec;
import dev.filmshear.solver.model.Limits;
import dev.filmshear.solver.model.Warning;
import dev.filmshear.solver.physics.ConstantViscosity;
import dev.filmshear.solver.physics.DensityLaw;
import dev.filmshear.solver.physics.Domain;
import dev.filmshear.solver.physics.FilmPhysics;
import dev.filmshear.solver.physics.Fluid;
import dev.filmshear.solver.physics.PropertyLaw;
import dev.filmshear.solver.physics.ThermalCondition;
import dev.filmshear.solver.physics.VogelViscosity;
import dev.filmshear.solver.physics.Wall;
import dev.filmshear.solver.physics.WallMotion;
import org.junit.jupiter.api.Test;

import java.util.List;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

/**
 * The warnings a run carries where the model is out of its depth, each tripped by its own number and quiet
 * below it.
 */
class WarningsTest {

    private static List<String> codes(FilmResult r) {
        return r.warnings().stream().map(Warning::code).toList();
    }

    /** A heated plane film: oil of the contract's example (Vogel a = 5.264e-5 Pa s, b = 948 K, c = 170 K). */
    private static FilmCase heated(double validTo, double speed) {
        Fluid oil = new Fluid(DensityLaw.constant(860), new VogelViscosity(5.264e-5, 948, 170, 253.15, validTo),
                PropertyLaw.constant(1950), PropertyLaw.constant(0.13));
        FilmPhysics physics = new FilmPhysics(new Domain.Gap(25e-6), oil,
                new Wall(new WallMotion.Steady(0), new ThermalCondition.FixedTemperature(313.15)),
                new Wall(new WallMotion.Steady(speed), ThermalCondition.HeatFlux.ADIABATIC), 0, 0, 313.15, null, null);
        return FilmCase.steady(physics).withGrid(new GridSpec(81, 0));
    }

    @Test
    void temperatureLimitTripsWhenTheFilmGetsHotterThanTheCaseAllows() {
        FilmResult free = FilmSolver.solve(heated(423.15, 20));
        double peak = free.summary().peakTemperature();
        assertTrue(peak > 320, "the film heats: " + peak);
        FilmCase below = heated(423.15, 20).withJournal(null, new Limits(peak + 0.5));
        FilmCase above = heated(423.15, 20).withJournal(null, new Limits(peak - 0.5));
        assertFalse(codes(FilmSolver.solve(below)).contains("temperature_limit_exceeded"));
        List<Warning> warnings = FilmSolver.solve(above).warnings();
        assertTrue(warnings.stream().anyMatch(w -> w.code().equals("temperature_limit_exceeded")
                && w.message().contains(String.format("%.2f K", peak))), warnings.toString());
    }

    @Test
    void viscosityLawUsedBeyondItsRangeIsFlagged() {
        FilmResult inside = FilmSolver.solve(heated(423.15, 20));
        double peak = inside.summary().peakTemperature();
        assertFalse(codes(inside).contains("viscosity_law_extrapolated"));
        assertTrue(codes(FilmSolver.solve(heated(peak - 1, 20))).contains("viscosity_law_extrapolated"));
    }

    /**
     * A semi-infinite film truncated by hand at about one penetration depth sqrt(nu t): the erfc profile
     * (Bird, Stewart and Lightfoot 2002, Example 4.1-1) is still about erfc(0.5) = 0.48 of the wall speed there,
     * so the far field has moved and the run must say its depth was too small; at the automatic depth it does not.
     */
    @Test
    void semiInfiniteDepthReachedIsFlagged() {
        double nu = 1e-6;
        double end = 0.01;
        FilmPhysics shallow = new FilmPhysics(new Domain.SemiInfinite(Math.sqrt(nu * end)),
                Fluid.isothermal(1000, new ConstantViscosity(1e-3)), Wall.moving(0.1), null, 0, 0, Double.NaN,
                null, null);
        assertTrue(codes(FilmSolver.solve(FilmCase.until(shallow, end))).contains("semi_infinite_depth_reached"));
        FilmPhysics automatic = shallow.withDomain(Domain.SemiInfinite.automatic(), null);
        assertFalse(codes(FilmSolver.solve(FilmCase.until(automatic, end))).contains("semi_infinite_depth_reached"));
    }

    /**
     * Plane Couette flow warns above U h / nu = 1300 (Re_c = 324 on half-gap and half-speed, Duguet,
     * Schlatter and Henningson, J. Fluid Mech. 650, 2010) and not below.
     */
    @Test
    void planeReynoldsWarningTripsAtTheThreshold() {
        double gap = 1e-3;
        double nu = 1e-6;
        for (double factor : new double[] {0.98, 1.02}) {
            double speed = factor * 1300 * nu / gap;
            FilmPhysics physics = FilmPhysics.isothermalCouette(gap, 1000, 1e-3, new WallMotion.Steady(0),
                    new WallMotion.Steady(speed));
            List<String> codes = codes(FilmSolver.solve(FilmCase.steady(physics).withGrid(new GridSpec(21, 0))));
            assertEquals(factor > 1, codes.contains("laminar_flow_doubtful"), "factor " + factor);
        }
    }
}
