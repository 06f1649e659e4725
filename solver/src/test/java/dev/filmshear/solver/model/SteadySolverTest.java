package dev.filmshear.solver.model;

import dev.filmshear.solver.physics.ConstantViscosity;
import dev.filmshear.solver.physics.DensityLaw;
import dev.filmshear.solver.physics.Domain;
import dev.filmshear.solver.physics.FilmPhysics;
import dev.filmshear.solver.physics.Fluid;
import dev.filmshear.solver.physics.PropertyLaw;
import dev.filmshear.solver.physics.ThermalCondition;
import dev.filmshear.solver.physics.Wall;
import dev.filmshear.solver.physics.WallMotion;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

/**
 * The steady solver on fine and clustered grids with an insulated wall, where Newton's second update is
 * larger than its first (the temperature learns of the velocity field only in the second iteration): it must
 * converge in a handful of continuation steps to the exact rise mu U^2 / (2 k) at the insulated wall (R. B.
 * Bird, W. E. Stewart, E. N. Lightfoot, <i>Transport Phenomena</i>, 2nd ed., 2002, section 10.4; the quadratic
 * profile is reproduced by the flux-form scheme on any grid).
 */
class SteadySolverTest {
    /** Continuation steps a linear-in-temperature problem may take. */
    private static final int MAX_STEPS = 50;

    @ParameterizedTest(name = "{0} nodes, clustering {1}")
    @CsvSource({"41, 0", "641, 0", "321, 0.6", "641, 0.6"})
    void insulatedWallCouetteHeatingConvergesQuicklyToTheExactRise(int points, double clustering) {
        double mu = 0.04;
        double k = 0.13;
        double speed = 10;
        Fluid oil = new Fluid(DensityLaw.constant(870), new ConstantViscosity(mu), PropertyLaw.constant(1950),
                PropertyLaw.constant(k));
        FilmPhysics physics = new FilmPhysics(new Domain.Gap(1e-4), oil,
                new Wall(new WallMotion.Steady(0), new ThermalCondition.FixedTemperature(313.15)),
                new Wall(new WallMotion.Steady(speed), ThermalCondition.HeatFlux.ADIABATIC), 0, 0, 313.15, null, null);
        FilmResult r = FilmSolver.solve(FilmCase.steady(physics).withGrid(new GridSpec(points, clustering)));
        assertEquals(313.15 + mu * speed * speed / (2 * k), r.summary().maxTemperature(), 1e-9);
        assertTrue(r.summary().steps() <= MAX_STEPS, "continuation steps " + r.summary().steps());
    }
}
