package dev.filmshear.validation.analytic;

import dev.filmshear.solver.base.InvalidParameterException;
import dev.filmshear.solver.physics.WallMotion;
import dev.filmshear.validation.analytic.GapResponses.Form;
import org.junit.jupiter.api.Test;

import java.util.function.DoubleUnaryOperator;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

/**
 * Oscillating plane Couette flow in a finite gap: the lower wall at U cos(omega t), the upper wall fixed.
 */
class OscillatingGapCouetteTest {
    /** references.md 7(d) prints magnitudes to six decimals. */
    private static final double MAGNITUDE_ROUNDING = 5e-7;
    /** ... and phases to four decimals of a degree. */
    private static final double PHASE_ROUNDING_DEG = 5e-5;
    /** Periodic closed form and Fourier transient against Duhamel quadrature (1e-13 of the integrand scale). */
    private static final double FORMS_AGREE = 1e-10;

    private static final double RHO = 1000;
    private static final double MU = 1e-3;
    private static final double FREQUENCY = 50;
    private static final double SPEED = 0.1;
    private static final double OMEGA = 2 * Math.PI * FREQUENCY;
    private static final double DELTA = Math.sqrt(2 * MU / RHO / OMEGA);

    /** A gap of H Stokes depths, H = h sqrt(omega/(2 nu)), lower wall at U cos(omega t) = U sin(omega t + pi/2). */
    private static ConstantPropertyFilm gapOf(double depths) {
        return new ConstantPropertyFilm(depths * DELTA, RHO, MU, new WallMotion.Sine(0, SPEED, FREQUENCY, Math.PI / 2),
                new WallMotion.Steady(0), 0, 0);
    }

    /** The complex amplitude, in units of mu U/h, of a stress history Re{T e^{i omega t}}: T = s(0) - i s(T/4). */
    private static double[] amplitude(ConstantPropertyFilm film, boolean lowerWall) {
        double quarter = 0.25 / FREQUENCY;
        double unit = MU * SPEED / film.gap();
        DoubleUnaryOperator stress = lowerWall
                ? film::periodicWallShearStressLower : film::periodicWallShearStressUpper;
        double re = stress.applyAsDouble(0) / unit;
        double im = -stress.applyAsDouble(quarter) / unit;
        return new double[] {Math.hypot(re, im), Math.toDegrees(Math.atan2(im, re))};
    }

    @Test
    void wallStressesMatchThePeriodicTable() {
        // Landau & Lifshitz, Fluid Mechanics, §24 (worked problem, number from memory): T0 = -lambda h coth(lambda h),
        // Th = -lambda h / sinh(lambda h); check values DERIVED+CHECKED in references.md 7(d).
        double[][] table = {
            // H, |T0|, arg T0 (deg), |Th|, arg Th (deg)
            {0.1, 1.000031, -179.6180, 0.999998, 179.8090},
            {0.5, 1.019218, -170.6035, 0.998614, 175.2279},
            {1.0, 1.265549, -149.0746, 0.978426, 161.0593},
            {2.0, 2.761518, -133.4115, 0.756444, 111.1932},
            {3.0, 4.262884, -134.9206, 0.423465, 53.1524},
            {5.0, 7.070529, -134.9972, 0.095285, -61.4775},
        };
        for (double[] row : table) {
            ConstantPropertyFilm film = gapOf(row[0]);
            double[] moving = amplitude(film, true);
            double[] fixed = amplitude(film, false);
            assertEquals(row[1], moving[0], MAGNITUDE_ROUNDING, "|T0| at H = " + row[0]);
            assertEquals(row[2], moving[1], PHASE_ROUNDING_DEG, "arg T0 at H = " + row[0]);
            assertEquals(row[3], fixed[0], MAGNITUDE_ROUNDING, "|Th| at H = " + row[0]);
            assertEquals(row[4], fixed[1], PHASE_ROUNDING_DEG, "arg Th at H = " + row[0]);
        }
    }

    @Test
    void thickGapTendsToTheStokesLayerAndThinGapToQuasiSteadyCouette() {
        // references.md 7(d) limits: H -> infinity gives |T0| -> sqrt(2) H at -135 degrees (Stokes layer, Landau &
        // Lifshitz §24); H -> 0 gives T0 -> -1 (quasi-steady Couette). H = 20 and 800 also test that the sinh ratio
        // is evaluated without overflow.
        for (double depths : new double[] {20, 800}) {
            double[] moving = amplitude(gapOf(depths), true);
            assertEquals(1, moving[0] / (Math.sqrt(2) * depths), 1e-13, "H = " + depths);
            assertEquals(-135, moving[1], 1e-9, "H = " + depths);
            assertTrue(amplitude(gapOf(depths), false)[0] < 1e-6, "the fixed wall feels nothing");
        }
        double[] thin = amplitude(gapOf(1e-4), true);
        assertEquals(1, thin[0], 1e-12);
        assertEquals(180, Math.abs(thin[1]), 1e-5);
    }

    @Test
    void startedGapSettlesOntoThePeriodicState() {
        // After a few diffusion times the transient (slowest mode exp(-pi^2 tau)) has died out: the started
        // solution equals the periodic one (Landau & Lifshitz §24) to rounding.
        ConstantPropertyFilm film = gapOf(2);
        double t = 5 * film.diffusionTime();
        for (double eta : new double[] {0, 0.3, 0.7, 1}) {
            assertEquals(film.periodicVelocity(eta * film.gap(), t), film.velocity(eta * film.gap(), t), 1e-15);
        }
        assertEquals(film.periodicWallShearStressLower(t), film.wallShearStressLower(t), 1e-12);
        assertEquals(film.periodicWallShearStressUpper(t), film.wallShearStressUpper(t), 1e-12);
        assertFalse(film.appliesAt(Double.POSITIVE_INFINITY));
        assertTrue(film.steadyLimit().isEmpty());
        assertThrows(InvalidParameterException.class, () -> film.velocity(0, Double.POSITIVE_INFINITY));
    }

    @Test
    void startedOscillationByDuhamelAndByFourierSeriesAgree() {
        // Two forms of the same started solution: Duhamel's integral of the image-series step response, used for
        // tau < 1e-3, and periodic solution + closed-form Fourier transient, used after (Bird, Stewart & Lightfoot
        // §4.1 series; coefficients b_n = 2 n pi / (n^2 pi^2 + i kappa)).
        for (double depths : new double[] {1, 5}) {
            double kappa = 2 * depths * depths;
            double omega = 1;
            double phase = 0.8;
            for (double tau : new double[] {2e-4, 1e-3, 5e-3, 3e-2}) {
                for (Quantity q : Quantity.values()) {
                    for (double xi : new double[] {0, 0.05, 0.3, 1}) {
                        double fourier = GapResponses.oscillationPeriodic(q, xi, kappa, tau, phase)
                                + GapResponses.oscillationTransient(q, xi, kappa, tau, phase);
                        double duhamel = SineDuhamel.response(
                                s -> GapResponses.step(q, xi, s / kappa, Form.at(s / kappa)), xi * xi * kappa / 4,
                                1, omega, phase, tau * kappa);
                        double scale = q == Quantity.SLOPE ? Math.max(1, 1 / Math.sqrt(tau)) : 1;
                        assertEquals(fourier, duhamel, FORMS_AGREE * scale,
                                q + " at xi " + xi + ", tau " + tau + ", H " + depths);
                    }
                }
            }
        }
    }
}
