package dev.filmshear.validation.agreement;

import dev.filmshear.solver.model.FilmResult;
import dev.filmshear.solver.model.History;
import dev.filmshear.solver.model.Snapshot;
import dev.filmshear.validation.analytic.AnalyticSolution;

/** Shared measures of agreement between a solver run and a closed-form solution. */
final class Films {
    /** An oil film used throughout: gap 100 um, rho = 870 kg/m^3, mu = 0.04 Pa s (typical VG 46 at 40 degC). */
    static final double GAP = 1e-4;
    static final double DENSITY = 870;
    static final double VISCOSITY = 0.04;
    static final double NU = VISCOSITY / DENSITY;
    /** Viscous diffusion time gap^2 / nu (s). */
    static final double DIFFUSION_TIME = GAP * GAP / NU;

    private Films() {
    }

    /** Largest |u_numerical - u_exact| over the nodes of a snapshot (m/s). */
    static double maxVelocityError(Snapshot s, AnalyticSolution exact) {
        double[] y = s.y();
        double[] u = s.velocity();
        double max = 0;
        for (int i = 0; i < y.length; i++) {
            max = Math.max(max, Math.abs(u[i] - exact.velocity(y[i], s.time())));
        }
        return max;
    }

    /** |tau_numerical - tau_exact| at the lower wall at the history row of time t (Pa). */
    static double lowerShearError(FilmResult r, AnalyticSolution exact, double t) {
        int row = r.history().rowAt(t);
        return Math.abs(r.history().get(History.Column.WALL_SHEAR_STRESS_LOWER, row) - exact.wallShearStressLower(t));
    }

    /** |tau_numerical - tau_exact| at the upper wall at the history row of time t (Pa). */
    static double upperShearError(FilmResult r, AnalyticSolution exact, double t) {
        int row = r.history().rowAt(t);
        return Math.abs(r.history().get(History.Column.WALL_SHEAR_STRESS_UPPER, row) - exact.wallShearStressUpper(t));
    }

    /** Observed order of accuracy from errors on grids refined by a factor 2: log2(e_coarse / e_fine). */
    static double order(double coarse, double fine) {
        return Math.log(coarse / fine) / Math.log(2);
    }
}
