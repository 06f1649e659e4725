package dev.filmshear.validation.analytic;

import dev.filmshear.solver.base.InvalidParameterException;
import org.junit.jupiter.api.Test;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;

/** Petroff's friction torque, power and coefficient of a lightly loaded journal bearing. */
class PetroffBearingTest {
    /** references.md §9 prints T_f and f to six or seven significant digits. */
    private static final double SIX_DIGITS = 1e-6;

    // references.md §9: r = 25 mm, L = 50 mm, c = 25 um, mu = 0.030 Pa s, N = 50 rev/s, W = 2000 N
    private final PetroffBearing bearing = new PetroffBearing(0.025, 0.050, 25e-6, 0.030, 50);

    @Test
    void torquePowerLoadAndFrictionCoefficient() {
        // Budynas & Nisbett, Shigley's Mechanical Engineering Design, ch. 12, §12-4, Eq. (12-6) (equation number
        // from memory): T_f = 4 pi^2 mu N L r^3 / c, P_loss = 2 pi N T_f, f = 2 pi^2 (mu N / P)(r / c).
        assertEquals(1.850551, bearing.frictionTorque(), SIX_DIGITS * 1.85);
        assertEquals(581.368, bearing.powerLoss(), 5e-4);
        assertEquals(0.800e6, bearing.unitLoad(2000), 1e-9 * 0.8e6);
        assertEquals(0.037011, bearing.frictionCoefficient(2000), 5e-7);
        double p = bearing.unitLoad(2000);
        assertEquals(2 * Math.PI * Math.PI * 0.030 * 50 / p * (0.025 / 25e-6), bearing.frictionCoefficient(2000),
                1e-15);
    }

    @Test
    void refusesAClearanceLargerThanTheJournal() {
        assertThrows(InvalidParameterException.class, () -> new PetroffBearing(0.01, 0.05, 0.02, 0.03, 50));
        assertThrows(InvalidParameterException.class, () -> bearing.frictionCoefficient(0));
    }
}
