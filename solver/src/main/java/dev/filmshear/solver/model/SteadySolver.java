package dev.filmshear.solver.model;

import dev.filmshear.solver.base.NumericalFailureException;
import dev.filmshear.solver.discretization.FilmDiscretization;
import dev.filmshear.solver.physics.FilmPhysics;
import dev.filmshear.solver.physics.ThermalCondition;
import dev.filmshear.solver.physics.Wall;
import dev.filmshear.solver.physics.WallMotion;

/**
 * Solves the steady film equations directly: Newton's method on F(U, T) = 0, with continuation in the
 * wall speed. The continuation parameter lambda scales the walls' settled speeds and the pressure
 * gradient from 0 (fluid at rest, pure conduction) to 1 (the case); each converged solution is the
 * starting guess of the next, and the increment grows while Newton converges quickly and shrinks when
 * it fails. When the increment collapses, no steady solution was found: the failure names the speed
 * fraction reached.
 *
 * <p>Cases with no steady state are refused before any iteration: a semi-infinite film (the layer grows
 * for ever), an oscillating wall, and a heated film where no wall can take heat away (both walls carry a
 * fixed heat flux, so the dissipated heat has nowhere to go).
 */
public final class SteadySolver {
    /** Smallest continuation increment before giving up. */
    static final double MIN_INCREMENT = 1e-4;

    private SteadySolver() {
    }

    /** Refuses cases that cannot have a steady state; returns normally otherwise. */
    static void checkSteadyExists(FilmPhysics physics) {
        if (physics.isSemiInfinite()) {
            throw new NumericalFailureException("no steady state: a semi-infinite film keeps spreading; give an end time");
        }
        int driven = 0;
        for (Wall wall : new Wall[] {physics.lower(), physics.upper()}) {
            if (wall.motion() instanceof WallMotion.Driven) {
                driven++;
            } else if (wall.motion().settledVelocity().isEmpty()) {
                throw new NumericalFailureException(
                        "no steady state: an oscillating wall never settles; give an end time");
            }
        }
        if (driven == 2) {
            throw new NumericalFailureException("no steady state: with both walls driven the film's speed has no "
                    + "reference; prescribe one wall's velocity or give an end time");
        }
        if (physics.momentumSource() != null || physics.heatSource() != null) {
            throw new NumericalFailureException("no steady state: volume sources depend on time");
        }
        if (physics.isThermal()) {
            boolean heatSink = false;
            for (Wall wall : new Wall[] {physics.lower(), physics.upper()}) {
                heatSink |= !(wall.thermal() instanceof ThermalCondition.HeatFlux);
            }
            if (!heatSink) {
                throw new NumericalFailureException("no steady state: both walls carry a fixed heat flux, so the heat "
                        + "dissipated in the film has nowhere to go (give one wall a temperature or a heat-transfer "
                        + "coefficient, or an end time)");
            }
        }
    }

    /**
     * Solves the model's case steady and leaves the solution in the model's state.
     *
     * @return continuation steps taken
     */
    static long solve(FilmModel model, double[] stateOut) {
        checkSteadyExists(model.filmCase().physics());
        FilmDiscretization equations = model.discretization();
        double[] state = new double[equations.size()];
        double[] trial = new double[equations.size()];
        equations.initialState(state);
        if (!equations.isThermal()) {
            if (equations.solveSteady(1, state) < 0) {
                throw new NumericalFailureException("no steady solution found: the drive and the film's friction "
                        + "do not balance at any speed Newton could reach");
            }
            System.arraycopy(state, 0, stateOut, 0, state.length);
            return 1;
        }
        if (equations.solveSteady(0, state) < 0) {
            throw new NumericalFailureException("no steady state: the heat conduction problem at rest did not converge");
        }
        double lambda = 0;
        double increment = 1;
        long steps = 0;
        while (lambda < 1) {
            double next = Math.min(1, lambda + increment);
            System.arraycopy(state, 0, trial, 0, state.length);
            int iterations = equations.solveSteady(next, trial);
            if (iterations > 0) {
                lambda = next;
                System.arraycopy(trial, 0, state, 0, state.length);
                steps++;
                if (iterations <= 4) {
                    increment *= 2;
                }
            } else {
                increment *= 0.25;
                if (increment < MIN_INCREMENT) {
                    throw new NumericalFailureException(String.format(
                            "no steady solution found: Newton continuation in wall speed stalled at %.4g of the "
                                    + "case's speed (possible thermal runaway)", lambda));
                }
            }
        }
        System.arraycopy(state, 0, stateOut, 0, state.length);
        return steps;
    }
}
