package dev.filmshear.cli.verify;

import dev.filmshear.validation.suite.SolutionVerification.Estimate;
import dev.filmshear.validation.suite.SolutionVerification.Quantity;

import java.io.IOException;
import java.nio.file.Path;
import java.util.Map;

/**
 * The plot of a run's grid-convergence study: for each key result, its estimated relative error
 * |f_k - f_ext| / |f_ext| on each grid (f_ext Richardson's extrapolate) against the grid spacing divided by the
 * finest spacing, on log-log axes, with a slope-2 reference line drawn below the points (from
 * {@value #REFERENCE_OFFSET} times the largest finest-grid error), so that a result in the asymptotic range of a
 * second-order scheme runs visibly parallel to it.
 */
final class ConvergencePlot {
    /** The reference line starts this far below the points. */
    static final double REFERENCE_OFFSET = 0.3;

    private ConvergencePlot() {
    }

    /** Writes the plot; writes nothing when no result has a non-zero estimated error on every grid. */
    static void write(Path png, Map<Quantity, Estimate> estimates, int[] points) throws IOException {
        double[] spacing = new double[points.length];
        for (int k = 0; k < points.length; k++) {
            spacing[k] = (points[points.length - 1] - 1.0) / (points[k] - 1.0);
        }
        LogLogChart chart = new LogLogChart("Grid convergence of the key results", "grid spacing h / h_finest",
                "estimated relative error |f - f_ext| / |f_ext|");
        double anchor = Double.NaN;
        for (Map.Entry<Quantity, Estimate> entry : estimates.entrySet()) {
            Estimate e = entry.getValue();
            double[] values = e.values();
            double[] error = new double[values.length];
            boolean usable = e.extrapolated() != 0 && Double.isFinite(e.extrapolated());
            for (int k = 0; k < values.length && usable; k++) {
                error[k] = Math.abs(values[k] - e.extrapolated()) / Math.abs(e.extrapolated());
                usable = error[k] > 0 && Double.isFinite(error[k]);
            }
            if (usable) {
                chart.points(entry.getKey().label(), spacing, error);
                anchor = Double.isNaN(anchor) ? error[error.length - 1] : Math.max(anchor, error[error.length - 1]);
            }
        }
        if (Double.isNaN(anchor)) {
            return;
        }
        chart.reference("slope 2", 1, REFERENCE_OFFSET * anchor, spacing[0], 2);
        chart.save(png);
    }
}
