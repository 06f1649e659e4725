package dev.filmshear.validation.analytic;

import dev.filmshear.solver.base.InvalidParameterException;
import dev.filmshear.solver.physics.WallMotion;
import org.junit.jupiter.api.Test;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

/** Steady Couette–Poiseuille flow and the pressure-driven start-up that leads to it. */
class CouettePoiseuilleFlowTest {
    /** Closed-form polynomials: a few ulps. */
    private static final double EXACT = 1e-14;
    /** references.md 7(f) extra start-up values are printed to seven decimals. */
    private static final double SEVEN_DECIMALS = 5e-8;

    private static final double GAP = 40e-6;
    private static final double MU = 0.04;
    private static final double U = 5;

    /** Lower wall fixed, upper at U, pressure parameter P = -(h^2/(2 mu U)) dp/dx. */
    private static CouettePoiseuilleFlow withParameter(double p) {
        double gradient = -p * 2 * MU * U / (GAP * GAP);
        return new CouettePoiseuilleFlow(GAP, MU, 0, U, gradient);
    }

    @Test
    void profileAndFlowRateFollowThePressureParameter() {
        // White, Viscous Fluid Flow, 3rd ed., 2006, §3-2 (section number from memory): u/U = eta + P eta (1 - eta),
        // Q/(U h) = 1/2 + P/6, tau = mu U/h + (h/2)(-dp/dx)(1 - 2 eta); references.md 7(e).
        for (double p : new double[] {-3, -1.5, -1, 0, 1, 3}) {
            CouettePoiseuilleFlow flow = withParameter(p);
            assertEquals(p, flow.pressureParameter(), EXACT * Math.max(1, Math.abs(p)));
            for (double eta : new double[] {0, 0.2, 0.5, 0.9, 1}) {
                assertEquals(eta + p * eta * (1 - eta), flow.velocity(eta * GAP) / U, EXACT, "P " + p + " eta " + eta);
                double tau = MU * U / GAP + GAP / 2 * (-flow.pressureGradient()) * (1 - 2 * eta);
                assertEquals(tau, flow.shearStress(eta * GAP), EXACT * Math.abs(MU * U / GAP) * 10);
            }
            assertEquals(0.5 + p / 6, flow.flowRate() / (U * GAP), EXACT, "Q at P " + p);
        }
        assertEquals(0, withParameter(-3).flowRate(), EXACT * U * GAP, "zero net flow at P = -3");
    }

    @Test
    void peakVelocityAndReverseFlow() {
        // White §3-2 / references.md 7(e): for P > 1 the largest u/U is (1 + P)^2/(4P), 4/3 at P = 3; the flow
        // reverses at the fixed wall when P < -1.
        assertEquals(4.0 / 3, withParameter(3).maxVelocity() / U, EXACT);
        assertEquals(Math.pow(1 + 1.5, 2) / (4 * 1.5), withParameter(1.5).maxVelocity() / U, EXACT);
        assertEquals(1, withParameter(0.5).maxVelocity() / U, EXACT, "no interior peak for P <= 1");
        assertTrue(withParameter(-1.5).minVelocity() < 0, "reverse flow at P = -1.5");
        assertEquals(0, withParameter(-1).minVelocity(), 0, "no reverse flow at P = -1");
        assertEquals(0, withParameter(-0.5).minVelocity(), 0, "no reverse flow at P = -0.5");
        assertThrows(IllegalStateException.class, () -> new CouettePoiseuilleFlow(GAP, MU, 1, 1,
                3).pressureParameter());
    }

    @Test
    void steadyAnswerOnlyAtInfiniteTime() {
        CouettePoiseuilleFlow flow = withParameter(2);
        assertEquals(flow.velocity(GAP / 3), flow.velocity(GAP / 3, Double.POSITIVE_INFINITY), 0);
        assertThrows(InvalidParameterException.class, () -> flow.velocity(GAP / 3, 1));
        assertThrows(InvalidParameterException.class, () -> flow.velocity(2 * GAP));
    }

    @Test
    void pressureDrivenStartUpFollowsTheHeatedFilmSeries() {
        // The start-up from rest under a pressure gradient solves rho u_t = mu u_yy - dp/dx, the same problem as the
        // thermal start-up with a uniform source (references.md 7(f) extra check, DERIVED+CHECKED):
        // u mu / ((-dp/dx) h^2) = eta (1 - eta)/2 - sum_{n odd} 4/(n^3 pi^3) exp(-n^2 pi^2 tau) sin(n pi eta).
        double gradient = -2e7;
        ConstantPropertyFilm film = new ConstantPropertyFilm(GAP, 870, MU, new WallMotion.Steady(0),
                new WallMotion.Steady(0), gradient, 0);
        double unit = -gradient * GAP * GAP / MU;
        double[] taus = {0.01, 0.05, 0.1, 0.2, 0.5};
        double[] mid = {0.0099990, 0.0462983, 0.0769191, 0.1070796, 0.1240722};
        double[] quarter = {0.0097761, 0.0380199, 0.0597507, 0.0810784, 0.0930939};
        for (int i = 0; i < taus.length; i++) {
            double t = taus[i] * film.diffusionTime();
            assertEquals(mid[i], film.velocity(GAP / 2, t) / unit, SEVEN_DECIMALS, "mid-plane at tau " + taus[i]);
            assertEquals(quarter[i], film.velocity(GAP / 4, t) / unit, SEVEN_DECIMALS, "eta 0.25 at tau " + taus[i]);
        }
        CouettePoiseuilleFlow steady = film.steadyLimit().orElseThrow();
        assertEquals(0.125, steady.velocity(GAP / 2) / unit, EXACT);
        assertEquals(steady.velocity(GAP / 2), film.velocity(GAP / 2, 40 * film.diffusionTime()), EXACT * unit);
    }
}
