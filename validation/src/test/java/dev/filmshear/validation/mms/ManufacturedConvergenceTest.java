package dev.filmshear.validation.mms;

import dev.filmshear.solver.model.FilmCase;
import dev.filmshear.solver.model.FilmResult;
import dev.filmshear.solver.model.SolverOptions;
import dev.filmshear.solver.physics.DensityLaw;
import dev.filmshear.solver.physics.ExponentialViscosity;
import dev.filmshear.solver.physics.FilmPhysics;
import dev.filmshear.solver.physics.Fluid;
import dev.filmshear.solver.physics.VolumeSource;
import dev.filmshear.solver.time.DirkScheme;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.MethodSource;

import java.util.Arrays;
import java.util.List;

import static dev.filmshear.validation.mms.ManufacturedCase.TEMPERATURE_ERROR;
import static dev.filmshear.validation.mms.ManufacturedCase.VELOCITY_ERROR;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

/**
 * Order of accuracy of the coupled solver by the method of manufactured solutions (K. Salari and P. Knupp,
 * <i>Code Verification by the Method of Manufactured Solutions</i>, SAND2000-1444, 2000; procedure as in
 * references.md 10.1): every case of {@link ManufacturedCases} on 21, 41, 81 and 161 nodes with TR-BDF2 and the
 * time step refined with the grid must show order 2 in the velocity and the temperature, max norm, over all
 * three refinements. Three deliberately broken runs show the test can fail: a momentum source without the
 * d mu/dy du/dy term, a density law the source ignores, and the first-order backward Euler scheme (expected
 * order 1 with dt proportional to dy; references.md 10.1).
 */
class ManufacturedConvergenceTest {
    /** Observed orders must lie in [2 - BAND, 2 + BAND]: the band of the task, and of SpatialConvergenceTest. */
    private static final double BAND = 0.2;
    /**
     * The finest error must stay above this (m/s or K) so that the orders measure truncation, not round-off
     * or the Newton tolerance (1e-10 of the scales).
     */
    private static final double ERROR_FLOOR = 1e-8;

    static List<ManufacturedCase> cases() {
        return ManufacturedCases.all();
    }

    private static void assertSecondOrder(String name, ConvergenceStudy.Result r) {
        for (String measure : List.of(VELOCITY_ERROR, TEMPERATURE_ERROR)) {
            double[] orders = r.observedOrders(measure);
            double[] errors = r.values(measure);
            assertEquals(3, orders.length, "three refinements");
            for (double order : orders) {
                assertTrue(Math.abs(order - 2) <= BAND, name + ", " + measure + ": observed orders "
                        + Arrays.toString(orders) + "\n" + r);
            }
            assertTrue(errors[errors.length - 1] > ERROR_FLOOR, name + ", " + measure + " at round-off\n" + r);
        }
    }

    @ParameterizedTest(name = "{0}")
    @MethodSource("cases")
    void observedOrderIsTwoInVelocityAndTemperature(ManufacturedCase c) {
        assertSecondOrder(c.name(), c.study());
    }

    /** Runs {@code c} with its own fields and case but other source terms. */
    private static ConvergenceStudy.Result studyWithSources(ManufacturedCase c, VolumeSource momentum,
                                                            VolumeSource heat, DensityLaw density) {
        FilmCase base = c.filmCase(ConvergenceStudy.DEFAULT_POINTS[0]);
        FilmPhysics physics = base.physics();
        FilmPhysics wrong = new FilmPhysics(physics.domain(), density == null ? physics.fluid()
                : new Fluid(density, physics.fluid().viscosity(),
                physics.fluid().specificHeat(), physics.fluid().conductivity()),
                physics.lower(), physics.upper(), physics.pressureGradient(), physics.initialVelocity(),
                physics.initialTemperature(), momentum, heat);
        return ConvergenceStudy.run(base.withPhysics(wrong), c.measures(), ConvergenceStudy.DEFAULT_POINTS,
                c.stepsPerInterval(), SolverOptions.defaults());
    }

    private static boolean outsideBand(double[] orders) {
        return Arrays.stream(orders).anyMatch(p -> Math.abs(p - 2) > BAND);
    }

    @Test
    void aSourceWithoutTheViscositySlopeTermIsCaught() {
        // S_u without d mu/dy du/dy = -beta mu dT/dy du/dy: the slip of forgetting the chain rule on mu(T)
        ManufacturedCase c = ManufacturedCases.fixedWalls();
        ManufacturedSolution s = c.solution();
        double beta = ((ExponentialViscosity) s.fluid().viscosity()).coefficient();
        VolumeSource withoutSlope = (y, t) -> s.momentumSource(y, t)
                - beta * s.viscosity(y, t) * s.temperatureGradient(y, t) * s.velocityGradient(y, t);
        ConvergenceStudy.Result r = studyWithSources(c, withoutSlope, s.heatSource(), null);
        assertTrue(outsideBand(r.observedOrders(VELOCITY_ERROR)), "wrong momentum source not caught:\n" + r);
        // the error stalls at the size the missing term drives instead of falling fourfold per refinement
        double[] e = r.values(VELOCITY_ERROR);
        assertTrue(e[e.length - 1] > 0.5 * e[e.length - 2], "error still falling:\n" + r);
    }

    @Test
    void aSourceThatIgnoresTheDensityLawIsCaught() {
        // sources of the constant-density fields, while the solver's fluid expands: rho(T) dU/dt and rho(T) cp dT/dt
        // differ from rho0 by 7e-4/K x 5 K; the manufactured case must be sensitive to it
        ManufacturedCase constant = ManufacturedCases.fixedWalls();
        ManufacturedCase expanding = ManufacturedCases.expandingFluid();
        ConvergenceStudy.Result r = studyWithSources(constant, constant.solution().momentumSource(),
                constant.solution().heatSource(), expanding.solution().fluid().density());
        assertTrue(outsideBand(r.observedOrders(TEMPERATURE_ERROR)), "ignored density law not caught:\n" + r);
    }

    @Test
    void backwardEulerIsCaughtAsFirstOrder() {
        // backward Euler is first order in time; with dt proportional to dy the combined error falls like dy
        // (references.md 10.1: refine dt like dy^2 for BE to see order 2). The temperature shows order 1 at
        // once; the quasi-steady velocity (its diffusion time is 1/50 of a coarse step) carries a smaller time
        // error, so its order falls from the space error's 2 towards 1 as the grids are refined.
        ManufacturedCase c = ManufacturedCases.fixedWalls();
        ConvergenceStudy.Result r = c.study(ConvergenceStudy.DEFAULT_POINTS,
                SolverOptions.defaults().withScheme(DirkScheme.BACKWARD_EULER));
        for (String measure : List.of(VELOCITY_ERROR, TEMPERATURE_ERROR)) {
            for (double order : r.observedOrders(measure)) {
                assertTrue(order < 2 - BAND, measure + " of backward Euler passed as second order:\n" + r);
            }
        }
        double[] temperatureOrders = r.observedOrders(TEMPERATURE_ERROR);
        for (double order : temperatureOrders) {
            assertTrue(Math.abs(order - 1) <= BAND, "temperature: observed order " + order + "\n" + r);
        }
        double[] velocityOrders = r.observedOrders(VELOCITY_ERROR);
        for (int k = 1; k < velocityOrders.length; k++) {
            assertTrue(velocityOrders[k] < velocityOrders[k - 1], "velocity order not falling towards 1:\n" + r);
        }
    }

    @Test
    void richardsonExtrapolationAndGciBracketTheExactMidGapTemperature() {
        // Richardson extrapolation and the GCI (P. J. Roache, Verification and Validation in Computational Science
        // and Engineering, 1998; Celik et al., J. Fluids Eng. 130, 078001, 2008, from memory) applied to a result
        // whose exact value the manufactured solution knows: the mid-gap temperature rise at the end time
        ManufacturedCase c = ManufacturedCases.fixedWalls();
        ManufacturedSolution s = c.solution();
        double mid = ManufacturedCases.GAP / 2;
        ConvergenceStudy.Measure rise = new ConvergenceStudy.Measure("mid-gap rise", (FilmResult r) -> {
            double[] temperature = r.finalSnapshot().temperature();
            return temperature[(temperature.length - 1) / 2] - ManufacturedCases.WALL_TEMPERATURE;
        });
        ConvergenceStudy.Result r = ConvergenceStudy.run(c.filmCase(21), List.of(rise), ConvergenceStudy.DEFAULT_POINTS,
                c.stepsPerInterval(), SolverOptions.defaults());
        double exact = s.temperature(mid, c.endTime()) - ManufacturedCases.WALL_TEMPERATURE;
        double[] f = r.values("mid-gap rise");
        double fine = f[f.length - 1];
        GridConvergenceIndex.Estimate estimate = r.gci("mid-gap rise");
        assertTrue(Math.abs(estimate.order() - 2) <= BAND, "observed order " + estimate.order());
        assertTrue(Math.abs(estimate.extrapolated() - exact) < 0.1 * Math.abs(fine - exact),
                "extrapolation " + estimate.extrapolated() + " not ten times closer to " + exact + " than " + fine);
        assertTrue(Math.abs(fine - exact) <= estimate.gciFine() * Math.abs(fine),
                "exact value outside the GCI band: error " + Math.abs(fine - exact) + ", GCI "
                        + estimate.gciFine() * Math.abs(fine));
        // Roache's asymptotic-range check: GCI_32 / (r^p GCI_21) = 1 within a few per cent on these grids
        assertEquals(1, estimate.asymptoticRatio(), 0.05);
    }
}
