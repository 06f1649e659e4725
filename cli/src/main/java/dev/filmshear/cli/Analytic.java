package dev.filmshear.cli;

import com.fasterxml.jackson.databind.node.ObjectNode;
import dev.filmshear.cli.output.AnalyticComparison;
import dev.filmshear.solver.model.FilmResult;
import dev.filmshear.solver.model.Snapshot;
import dev.filmshear.validation.analytic.AnalyticFamilies;
import dev.filmshear.validation.analytic.AnalyticSolution;

import java.util.Optional;

/**
 * Finds the closed-form solution of a run's family, when it has one, and measures the run against it: the
 * largest velocity error over the nodes of every profile where the closed form holds, and the wall shear
 * stresses of the last profile.
 */
final class Analytic {
    private Analytic() {
    }

    /** The comparison, or null when the case belongs to no family with a closed-form solution. */
    static AnalyticComparison compare(FilmResult result) {
        Optional<AnalyticSolution> match = AnalyticFamilies.match(result.filmCase());
        return match.map(solution -> measure(result, solution)).orElse(null);
    }

    private static AnalyticComparison measure(FilmResult result, AnalyticSolution exact) {
        double maxError = 0;
        double velocityScale = 0;
        int compared = 0;
        Snapshot last = null;
        for (Snapshot s : result.snapshots()) {
            if (!exact.appliesAt(s.time())) {
                continue;
            }
            double[] y = s.y();
            double[] u = s.velocity();
            for (int i = 0; i < y.length; i++) {
                double reference = exact.velocity(y[i], s.time());
                maxError = Math.max(maxError, Math.abs(u[i] - reference));
                velocityScale = Math.max(velocityScale, Math.abs(reference));
            }
            compared++;
            last = s;
        }
        double lowerError = Double.NaN;
        double upperError = Double.NaN;
        double at = Double.NaN;
        if (last != null && last.time() == result.summary().endTime()) {
            at = last.time();
            lowerError = relative(result.summary().wallShearStressLower(), exact.wallShearStressLower(at));
            if (exact.hasUpperWall()) {
                upperError = relative(result.summary().wallShearStressUpper(), exact.wallShearStressUpper(at));
            }
        }
        return new Comparison(exact, compared, maxError, velocityScale > 0 ? maxError / velocityScale : Double.NaN,
                at, lowerError, upperError);
    }

    private static double relative(double numerical, double reference) {
        return reference == 0 ? Math.abs(numerical) : Math.abs(numerical - reference) / Math.abs(reference);
    }

    /** The measured comparison. */
    private record Comparison(AnalyticSolution exact, int profilesCompared, double velocityMaxError,
                              double velocityRelativeError, double shearTime, double lowerShearRelativeError,
                              double upperShearRelativeError) implements AnalyticComparison {

        @Override
        public boolean appliesAt(double t) {
            return exact.appliesAt(t);
        }

        @Override
        public double[] velocityProfile(double t, double[] y) {
            double[] u = new double[y.length];
            for (int i = 0; i < y.length; i++) {
                u[i] = exact.velocity(y[i], t);
            }
            return u;
        }

        @Override
        public void addTo(ObjectNode node) {
            node.put("solution", exact.name());
            node.put("source", exact.source());
            node.put("profiles_compared", profilesCompared);
            put(node, "velocity_max_error_m_per_s", velocityMaxError);
            put(node, "velocity_max_relative_error", velocityRelativeError);
            put(node, "wall_shear_stress_time_s", Double.isFinite(shearTime) ? shearTime : Double.NaN);
            put(node, "wall_shear_stress_lower_relative_error", lowerShearRelativeError);
            put(node, "wall_shear_stress_upper_relative_error", upperShearRelativeError);
        }

        private static void put(ObjectNode node, String key, double value) {
            if (Double.isFinite(value)) {
                node.put(key, value);
            } else {
                node.putNull(key);
            }
        }
    }
}
