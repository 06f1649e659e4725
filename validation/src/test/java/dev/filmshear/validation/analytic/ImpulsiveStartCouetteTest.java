package dev.filmshear.validation.analytic;

import dev.filmshear.solver.physics.WallMotion;
import dev.filmshear.validation.analytic.GapResponses.Form;
import org.apache.commons.math3.analysis.solvers.BrentSolver;
import org.junit.jupiter.api.Test;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

/**
 * Start-up of plane Couette flow: the lower wall starts impulsively at U, the upper wall is fixed, the
 * fluid is at rest at t = 0.
 */
class ImpulsiveStartCouetteTest {
    /** The check values of references.md 7(a) are printed to six decimals: half a unit in the last place. */
    private static final double TABLE_ROUNDING = 5e-7;
    /** The 99 % times are printed to four decimals. */
    private static final double TIME_ROUNDING = 5e-5;
    /** Image and Fourier series are both summed to 1e-15 of their value; a few hundred ulps of difference is
     * rounding, anything larger is a wrong term. */
    private static final double FORMS_AGREE = 1e-13;

    private static final double GAP = 25e-6;
    private static final double DENSITY = 870;
    private static final double VISCOSITY = 0.04;
    private static final double SPEED = 2.5;

    private final ConstantPropertyFilm film = new ConstantPropertyFilm(GAP, DENSITY, VISCOSITY,
            new WallMotion.Steady(SPEED), new WallMotion.Steady(0), 0, 0);

    private double time(double tau) {
        return tau * film.diffusionTime();
    }

    /** Wall shear magnitude in units of mu U / h. */
    private double shearUnits(double stress) {
        return Math.abs(stress) * GAP / (VISCOSITY * SPEED);
    }

    @Test
    void reproducesTheStartUpTable() {
        // Bird, Stewart & Lightfoot, Transport Phenomena, 2nd ed., 2002, §4.1 (finite-slab Example 4.1-2, number
        // from memory); check values DERIVED+CHECKED in references.md 7(a) (image series and Crank–Nicolson).
        double[][] table = {
            // tau, u/U at eta = 0.25, u/U at eta = 0.5, moving-wall shear, fixed-wall shear (units mu U / h)
            {0.01, 0.077100, 0.000407, 5.641896, Double.NaN},
            {0.05, 0.429195, 0.113844, 2.523133, 0.034001},
            {0.10, 0.576059, 0.262756, 1.784286, 0.292900},
            {0.20, 0.687349, 0.411566, 1.278567, 0.722922},
            {0.50, 0.746763, 0.495422, 1.014384, 0.985616},
            {1.00, 0.749977, 0.499967, 1.000103, 0.999897},
        };
        for (double[] row : table) {
            double t = time(row[0]);
            assertEquals(row[1], film.velocity(0.25 * GAP, t) / SPEED, TABLE_ROUNDING, "u/U at eta 0.25, tau "
                    + row[0]);
            assertEquals(row[2], film.velocity(0.5 * GAP, t) / SPEED, TABLE_ROUNDING, "u/U at eta 0.5, tau " + row[0]);
            assertEquals(row[3], shearUnits(film.wallShearStressLower(t)), TABLE_ROUNDING, "moving wall, tau "
                    + row[0]);
            if (!Double.isNaN(row[4])) {
                assertEquals(row[4], shearUnits(film.wallShearStressUpper(t)), TABLE_ROUNDING, "fixed wall, tau "
                        + row[0]);
            }
        }
    }

    @Test
    void fixedWallBarelyFeelsTheStartAtTheEarliestTime() {
        // references.md 7(a): fixed-wall shear about 1.6e-10 mu U / h at tau = 0.01; from the image series it is
        // 2 exp(-1/(4 tau)) / sqrt(pi tau) to leading order.
        double tau = 0.01;
        double leading = 2 * Math.exp(-1 / (4 * tau)) / Math.sqrt(Math.PI * tau);
        assertEquals(1.6e-10, shearUnits(film.wallShearStressUpper(time(tau))), 0.05e-10);
        assertEquals(leading, shearUnits(film.wallShearStressUpper(time(tau))), 1e-12 * leading);
    }

    @Test
    void movingWallShearTendsToTheStokesLayerValueAtEarlyTimes() {
        // references.md 7(a): moving-wall shear -> 1/sqrt(pi tau) for small tau (Stokes' first problem,
        // BSL Example 4.1-1); the next image is exp(-1/tau) smaller.
        double tau = 1e-4;
        assertEquals(1 / Math.sqrt(Math.PI * tau), shearUnits(film.wallShearStressLower(time(tau))), 1e-12);
    }

    @Test
    void reachesNinetyNinePercentAtTheTabulatedTimes() {
        // references.md 7(a): mid-plane velocity at 99 % of its steady value at tau = 0.4911; fixed-wall shear at
        // 99 % at tau = 0.5368 (DERIVED+CHECKED).
        BrentSolver solver = new BrentSolver(1e-12);
        double midPlane = solver.solve(200, tau -> film.velocity(0.5 * GAP, time(tau)) / SPEED - 0.99 * 0.5, 0.2, 1);
        double fixedWall = solver.solve(200, tau -> shearUnits(film.wallShearStressUpper(time(tau))) - 0.99, 0.2, 1);
        assertEquals(0.4911, midPlane, TIME_ROUNDING);
        assertEquals(0.5368, fixedWall, TIME_ROUNDING);
    }

    @Test
    void imageAndFourierSeriesAgreeAtIntermediateTimes() {
        // Carslaw & Jaeger, Conduction of Heat in Solids, 2nd ed., 1959, §3.3: the image (erfc) and Fourier forms
        // are the same function; compared where both converge quickly.
        for (double tau : new double[] {0.02, 0.05, 0.1, 0.2, 0.4}) {
            for (double xi : new double[] {0, 0.1, 0.25, 0.5, 0.9, 1}) {
                for (Quantity q : Quantity.values()) {
                    double images = GapResponses.step(q, xi, tau, Form.IMAGES);
                    double fourier = GapResponses.step(q, xi, tau, Form.FOURIER);
                    assertEquals(fourier, images, FORMS_AGREE * Math.max(1, Math.abs(fourier)),
                            "step " + q + " xi " + xi + " tau " + tau);
                    double rampImages = GapResponses.rampDeviation(q, xi, tau, Form.IMAGES);
                    double rampFourier = GapResponses.rampDeviation(q, xi, tau, Form.FOURIER);
                    assertEquals(rampFourier, rampImages, FORMS_AGREE, "ramp " + q + " xi " + xi + " tau " + tau);
                    double forcingImages = GapResponses.forcing(q, xi, tau, Form.IMAGES);
                    double forcingFourier = GapResponses.forcing(q, xi, tau, Form.FOURIER);
                    assertEquals(forcingFourier, forcingImages, FORMS_AGREE, "forcing " + q + " xi " + xi
                            + " tau " + tau);
                }
            }
        }
    }

    @Test
    void settlesToPlaneCouetteFlow() {
        // BSL §4.1: the start-up tends to the linear Couette profile u = U (1 - eta), shear mu U / h at both walls.
        assertTrue(film.appliesAt(Double.POSITIVE_INFINITY));
        assertEquals(0.75 * SPEED, film.velocity(0.25 * GAP, Double.POSITIVE_INFINITY), 1e-15);
        assertEquals(0.75 * SPEED, film.velocity(0.25 * GAP, time(30)), 1e-14);
        assertEquals(-VISCOSITY * SPEED / GAP, film.wallShearStressUpper(time(30)), 1e-12 * VISCOSITY * SPEED / GAP);
        assertEquals(SPEED * GAP / 2, film.flowRate(time(30)), 1e-14 * SPEED * GAP);
    }
}
