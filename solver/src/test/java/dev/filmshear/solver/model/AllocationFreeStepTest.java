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
import org.junit.jupiter.api.Test;

import java.lang.management.ManagementFactory;

import static org.junit.jupiter.api.Assertions.assertTrue;

/**
 * The per-step work (stage solves, Newton, tridiagonal and block-tridiagonal solves, error control) reuses
 * its arrays: after warm-up, a thousand steps allocate (almost) nothing. Measured with the JVM's per-thread
 * allocation counter.
 */
class AllocationFreeStepTest {
    /** Bytes a thousand steps may allocate: room for a stray boxed value, not for an array per step. */
    private static final long BUDGET = 16 * 1024;

    private static long allocatedBytes() {
        com.sun.management.ThreadMXBean bean = (com.sun.management.ThreadMXBean) ManagementFactory.getThreadMXBean();
        return bean.getThreadAllocatedBytes(Thread.currentThread().getId());
    }

    private static long bytesPerThousandSteps(FilmModel model) {
        for (int i = 0; i < 2000; i++) { // warm-up, lets the JIT compile and escape-analyse
            model.advance(1e9);
        }
        long before = allocatedBytes();
        for (int i = 0; i < 1000; i++) {
            model.advance(1e9);
        }
        return allocatedBytes() - before;
    }

    @Test
    void momentumStepsDoNotAllocate() {
        FilmPhysics physics = FilmPhysics.isothermalCouette(25e-6, 860, 0.03, new WallMotion.Steady(0),
                new WallMotion.Sine(0, 1, 50, 0));
        FilmModel model = new FilmModel(FilmCase.until(physics, 1e9), SolverOptions.defaults());
        long bytes = bytesPerThousandSteps(model);
        assertTrue(bytes < BUDGET, "allocated " + bytes + " bytes in 1000 momentum steps");
    }

    @Test
    void coupledStepsDoNotAllocate() {
        Fluid oil = new Fluid(new DensityLaw(860, 313.15, 7e-4), new ConstantViscosity(0.03),
                PropertyLaw.constant(1950), PropertyLaw.constant(0.13));
        FilmPhysics physics = new FilmPhysics(new Domain.Gap(25e-6), oil,
                new Wall(new WallMotion.Steady(0), new ThermalCondition.FixedTemperature(313.15)),
                new Wall(new WallMotion.Sine(5, 2, 50, 0), new ThermalCondition.HeatTransfer(800, 303.15)),
                0, 0, 313.15, null, null);
        FilmModel model = new FilmModel(FilmCase.until(physics, 1e9), SolverOptions.defaults());
        long bytes = bytesPerThousandSteps(model);
        assertTrue(bytes < BUDGET, "allocated " + bytes + " bytes in 1000 coupled steps");
    }
}
