package dev.filmshear.cli.verify;

import dev.filmshear.validation.suite.Level;
import dev.filmshear.validation.suite.Rule;
import dev.filmshear.validation.suite.VerificationCase;
import dev.filmshear.validation.suite.VerificationRun;

import java.io.IOException;
import java.nio.file.Path;
import java.util.List;

/**
 * The log-log plot of one verification case: for every check with an order to observe, its error divided by the
 * error on the coarsest grid, against the grid spacing divided by the coarsest spacing (h/h0 = (n0 - 1)/(n - 1)),
 * with a reference line of slope 2 from (1, {@value #SLOPE_TWO_START}) (below the points, so that a second-order
 * error runs visibly parallel to it instead of hiding it) and one of slope 1 through (1, 1), which a first-order
 * error would follow.
 * Normalising puts quantities of different units on one chart; the table beside it has the errors themselves.
 */
final class VerificationPlots {
    /** Where the slope-2 line starts, below the points' common start (1, 1). */
    static final double SLOPE_TWO_START = 0.3;

    private VerificationPlots() {
    }

    /**
     * Writes the case's plot to {@code png}.
     *
     * @return false (and writes nothing) when the case has no check with an order, or no usable errors
     */
    static boolean write(Path png, VerificationRun run) throws IOException {
        VerificationCase c = run.verificationCase();
        List<Level> levels = c.levels();
        double[] spacing = new double[levels.size()];
        for (int k = 0; k < levels.size(); k++) {
            spacing[k] = (levels.get(0).points() - 1.0) / (levels.get(k).points() - 1.0);
        }
        LogLogChart chart = new LogLogChart(c.name(), "grid spacing h / h0", "error / error on the coarsest grid");
        boolean any = false;
        for (int k = 0; k < c.checks().size(); k++) {
            if (!(c.checks().get(k).rule() instanceof Rule.Order)) {
                continue;
            }
            double[] errors = run.errors(k);
            if (!(errors[0] > 0) || !usable(errors)) {
                continue;
            }
            double[] relative = new double[errors.length];
            for (int i = 0; i < errors.length; i++) {
                relative[i] = errors[i] / errors[0];
            }
            chart.points(c.checks().get(k).quantity(), spacing, relative);
            any = true;
        }
        if (!any) {
            return false;
        }
        double finest = spacing[spacing.length - 1];
        chart.reference("slope 2", 1, SLOPE_TWO_START, finest, 2);
        chart.reference("slope 1", 1, 1, finest, 1);
        chart.save(png);
        return true;
    }

    private static boolean usable(double[] errors) {
        for (double e : errors) {
            if (!(e > 0 && Double.isFinite(e))) {
                return false;
            }
        }
        return true;
    }
}
