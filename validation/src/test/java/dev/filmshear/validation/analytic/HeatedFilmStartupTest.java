package dev.filmshear.validation.analytic;

import org.junit.jupiter.api.Test;

import static org.junit.jupiter.api.Assertions.assertEquals;

/** Thermal start-up of a film with a uniform heat source and both walls at T0. */
class HeatedFilmStartupTest {
    /** references.md 7(f) extra values are printed to seven decimals. */
    private static final double SEVEN_DECIMALS = 5e-8;

    private static final double[] TAUS = {0.01, 0.05, 0.1, 0.2, 0.5};

    @Test
    void midPlaneAndQuarterPlaneRises() {
        // references.md 7(f), "Extra thermal start-up check" (DERIVED+CHECKED; no published table):
        // (T - T0) k/(S h^2) = eta (1 - eta)/2 - sum_{n odd} 4/(n^3 pi^3) exp(-n^2 pi^2 tau_T) sin(n pi eta).
        double[] mid = {0.0099990, 0.0462983, 0.0769191, 0.1070796, 0.1240722};
        double[] quarter = {0.0097761, 0.0380199, 0.0597507, 0.0810784, 0.0930939};
        for (int i = 0; i < TAUS.length; i++) {
            assertEquals(mid[i], HeatedFilmStartup.dimensionlessRise(0.5, TAUS[i]), SEVEN_DECIMALS, "mid, tau "
                    + TAUS[i]);
            assertEquals(quarter[i], HeatedFilmStartup.dimensionlessRise(0.25, TAUS[i]), SEVEN_DECIMALS,
                    "eta 0.25, tau " + TAUS[i]);
        }
        assertEquals(0.125, HeatedFilmStartup.dimensionlessRise(0.5, Double.POSITIVE_INFINITY), 0);
    }

    @Test
    void dimensionalFilmReachesTheSteadyViscousHeatingProfile() {
        // Oil film sheared at U = 10 m/s across h = 50 um: S = mu (U/h)^2; steady rise mu U^2/(8k) at mid-gap
        // (Bird, Stewart & Lightfoot, Transport Phenomena, 2nd ed., 2002, §10.4, walls at one temperature).
        double gap = 50e-6;
        double source = 0.04 * Math.pow(10 / gap, 2);
        double diffusivity = 0.13 / (870 * 1950);
        HeatedFilmStartup film = new HeatedFilmStartup(gap, 0.13, diffusivity, source, 313.15);
        CouetteViscousHeating steady = CouetteViscousHeating.fixedTemperatures(gap, 0.04, 0.13, 0, 10, 313.15, 313.15);
        double late = 10 * film.diffusionTime();
        for (double eta : new double[] {0.1, 0.5, 0.8}) {
            assertEquals(steady.temperature(eta * gap), film.temperature(eta * gap, late), 1e-10);
        }
        assertEquals(steady.heatFluxIntoLowerWall(), film.heatFluxIntoEachWall(Double.POSITIVE_INFINITY),
                1e-12 * steady.heatFluxIntoLowerWall());
    }

    @Test
    void storedHeatGrowsByWhatTheSourceAddsLessWhatTheWallsTakeAway() {
        // energy balance of the film: d(stored)/dt = S h - 2 q_wall, checked by centred differences in time
        double gap = 50e-6;
        double diffusivity = 7.7e-8;
        HeatedFilmStartup film = new HeatedFilmStartup(gap, 0.13, diffusivity, 6.4e9, 313.15);
        for (double tau : new double[] {0.003, 0.05, 0.09, 0.12, 0.6}) {
            double t = tau * film.diffusionTime();
            double dt = 1e-4 * t;
            double rate = (film.storedHeat(t + dt) - film.storedHeat(t - dt)) / (2 * dt);
            double balance = 6.4e9 * gap - 2 * film.heatFluxIntoEachWall(t);
            assertEquals(balance, rate, 1e-6 * 6.4e9 * gap, "tau " + tau);
        }
    }
}
