package dev.filmshear.validation.heating;

import dev.filmshear.solver.model.FilmCase;
import dev.filmshear.solver.model.FilmResult;
import dev.filmshear.solver.model.FilmSolver;
import dev.filmshear.solver.model.GridSpec;
import dev.filmshear.solver.physics.ConstantViscosity;
import dev.filmshear.solver.physics.FilmPhysics;
import org.junit.jupiter.api.Test;

import static dev.filmshear.validation.heating.HeatedFilms.AT_WALL_TEMPERATURE;
import static dev.filmshear.validation.heating.HeatedFilms.THERMAL_TIME;
import static dev.filmshear.validation.heating.HeatedFilms.VISCOSITY;
import static org.junit.jupiter.api.Assertions.assertTrue;

/**
 * The energy account of a heated start-up run: the heat dissipated in the film equals the heat conducted into
 * the walls plus the change of heat stored, the energy equation rho cp dT/dt = d/dy(k dT/dy) + mu (dU/dy)^2
 * integrated across the film and over time (conservation of energy; R. B. Bird, W. E. Stewart, E. N. Lightfoot,
 * <i>Transport Phenomena</i>, 2nd ed., 2002, ch. 11, the equation of change for energy, chapter from memory).
 * The oil film (typical values, references.md 6.1), constant viscosity, both walls at T0, the upper wall started
 * impulsively at 10 m/s, run for 0.4 thermal diffusion times (heat still being stored): the solver's relative
 * imbalance must be below 1e-3 on 201 nodes and fall as the grid is refined.
 */
class EnergyBalanceTest {
    /** The limit of the task on 201 nodes; the solver warns above 1e-2 (FilmSolver.ENERGY_IMBALANCE_LIMIT). */
    private static final double IMBALANCE_LIMIT = 1e-3;
    private static final double END = 0.4 * THERMAL_TIME;

    private static double imbalance(int points) {
        FilmPhysics physics = HeatedFilms.couette(new ConstantViscosity(VISCOSITY), 10, AT_WALL_TEMPERATURE,
                AT_WALL_TEMPERATURE);
        FilmResult r = FilmSolver.solve(FilmCase.until(physics, END).withGrid(new GridSpec(points, 0)));
        double stored = r.summary().storedEnergyChange();
        assertTrue(stored > 0.1 * r.summary().dissipatedEnergy(), "the film is still storing heat: " + stored);
        return r.summary().energyImbalance();
    }

    @Test
    void imbalanceIsSmallAndFallsWithRefinement() {
        double coarse = imbalance(51);
        double middle = imbalance(101);
        double fine = imbalance(201);
        assertTrue(fine < IMBALANCE_LIMIT, "imbalance on 201 nodes " + fine);
        assertTrue(middle < coarse && fine < middle,
                "imbalance does not fall with refinement: " + coarse + ", " + middle + ", " + fine);
    }
}
