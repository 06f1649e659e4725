package dev.filmshear.validation.suite;

import dev.filmshear.solver.base.InvalidParameterException;
import org.junit.jupiter.api.Test;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

/** The pass rules and the observed-order arithmetic of a run, on made-up errors whose orders are known exactly. */
class RuleTest {

    private static VerificationRun run(Rule rule, double... errors) {
        java.util.List<Level> levels = new java.util.ArrayList<>();
        double[][] table = new double[errors.length][1];
        for (int k = 0; k < errors.length; k++) {
            levels.add(Level.grid(20 * (1 << k) + 1));
            table[k][0] = errors[k];
        }
        VerificationCase c = new VerificationCase("made up", VerificationCase.Kind.ANALYTIC, "none", "none", "none",
                levels, java.util.List.of(new Check("q", "m/s", rule)), level -> new double[] {0});
        return new VerificationRun(c, table, 0, null);
    }

    @Test
    void observedOrderIsTheLogOfTheErrorRatioOverTheLogOfTheRefinement() {
        // e = C h^p exactly with p = 2 and 1 on grids of 21, 41, 81 nodes (r = 2)
        VerificationRun second = run(Check.SECOND_ORDER, 4e-2, 1e-2, 2.5e-3);
        assertEquals(2, second.observedOrders(0)[0], 1e-12);
        assertEquals(2, second.observedOrders(0)[1], 1e-12);
        assertTrue(second.passed());
        VerificationRun first = run(Check.SECOND_ORDER, 4e-2, 2e-2, 1e-2);
        assertEquals(1, first.observedOrders(0)[1], 1e-12);
        assertFalse(first.passed());
    }

    @Test
    void theBandIsInclusiveAndEveryOrderMustBeInside() {
        double r18 = Math.pow(2, 1.8);
        assertTrue(run(Check.SECOND_ORDER, 1, 1 / r18, 1 / (r18 * 4)).passed(), "1.8 is inside");
        assertFalse(run(Check.SECOND_ORDER, 1, 1 / 4.0, 1 / 12.0).passed(), "2, then 1.58: the second pair fails");
        assertFalse(run(Check.SECOND_ORDER, 1, 0, 0).passed(), "zero errors have no order");
        assertFalse(run(Check.SECOND_ORDER, 1, Double.NaN, 0.1).passed(), "a missing level fails");
        assertThrows(InvalidParameterException.class, () -> new Rule.Order(2, 2.1, 2.2));
    }

    @Test
    void roundOffPassesOnlyBelowItsFloorOnEveryLevel() {
        assertTrue(run(new Rule.RoundOff(1e-9), 1e-14, 3e-13, 1e-12).passed());
        assertFalse(run(new Rule.RoundOff(1e-9), 1e-14, 2e-9, 1e-12).passed());
        assertFalse(run(new Rule.RoundOff(1e-9), 1e-14, Double.NaN, 1e-12).passed());
        assertEquals("exact to round-off (< 1e-09 K)", new Rule.RoundOff(1e-9).describe("K"));
        assertEquals("2 in [1.8, 2.2]", Check.SECOND_ORDER.describe("K"));
    }

    @Test
    void aFailedSolverFailsEveryCheckOfItsCase() {
        VerificationRun ok = run(Check.SECOND_ORDER, 4e-2, 1e-2, 2.5e-3);
        VerificationRun failed = new VerificationRun(ok.verificationCase(), ok.errors(), 0, "no steady solution");
        assertFalse(failed.passed());
        assertEquals(1, failed.failedChecks());
    }
}
