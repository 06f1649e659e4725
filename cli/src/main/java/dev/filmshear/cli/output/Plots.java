package dev.filmshear.cli.output;

import dev.filmshear.solver.model.FilmResult;
import dev.filmshear.solver.model.History;
import dev.filmshear.solver.model.Snapshot;
import org.knowm.xchart.BitmapEncoder;
import org.knowm.xchart.XYChart;
import org.knowm.xchart.XYChartBuilder;
import org.knowm.xchart.XYSeries;
import org.knowm.xchart.style.Styler;
import org.knowm.xchart.style.XYStyler;
import org.knowm.xchart.style.markers.SeriesMarkers;

import java.awt.BasicStroke;
import java.awt.Color;
import java.awt.Font;
import java.io.IOException;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;

/**
 * The PNG plots of a run, drawn with XChart: velocity profiles at the output times (with the closed-form
 * solution beside them, dashed, wherever the case has one), wall shear stress over time, and for a heated
 * film the temperature and viscosity profiles and the highest temperature over time.
 */
public final class Plots {
    /**
     * Our own palette: dark teal, burnt orange, slate blue, olive, plum, sand, charcoal. Every chart of the tool
     * draws from it (use {@link #color(int)}).
     */
    private static final Color[] PALETTE = {
            new Color(0x1b6f6a), new Color(0xc0612b), new Color(0x4a5c8c), new Color(0x7a8a2e),
            new Color(0x8c4a7a), new Color(0xb59a4a), new Color(0x3a3a3a)};
    private static final int WIDTH = 900;
    private static final int HEIGHT = 560;
    /** Profiles drawn at most; more output times are thinned evenly. */
    private static final int MAX_PROFILES = 7;

    private Plots() {
    }

    /** Colour {@code k} of the palette, cycling. */
    public static Color color(int k) {
        return PALETTE[Math.floorMod(k, PALETTE.length)];
    }

    /** The palette as a fresh array, for XChart's series colours. */
    public static Color[] palette() {
        return PALETTE.clone();
    }

    /** Writes every plot of the run into {@code dir}. */
    public static void write(Path dir, FilmResult result, AnalyticComparison analytic) throws IOException {
        List<Snapshot> profiles = thin(result.snapshots());
        boolean thermal = result.filmCase().physics().isThermal();
        save(profileChart("Velocity across the film", "velocity (m/s)", profiles, Field.VELOCITY, analytic),
                dir.resolve("velocity_profiles.png"));
        if (result.history().size() > 1) {
            save(historyChart(result), dir.resolve("wall_shear_stress.png"));
            if (result.filmCase().isJournal()) {
                save(journalChart(result), dir.resolve("shaft_speed_and_torque.png"));
            } else if (hasDrivenWall(result)) {
                save(wallVelocityChart(result), dir.resolve("wall_velocity.png"));
            }
        }
        if (thermal) {
            save(profileChart("Temperature across the film", "temperature (K)", profiles, Field.TEMPERATURE, null),
                    dir.resolve("temperature_profiles.png"));
            save(profileChart("Viscosity across the film", "viscosity (Pa s)", profiles, Field.VISCOSITY, null),
                    dir.resolve("viscosity_profiles.png"));
            if (result.history().size() > 1) {
                save(temperatureHistoryChart(result), dir.resolve("max_temperature.png"));
            }
        }
    }

    private enum Field { VELOCITY, TEMPERATURE, VISCOSITY }

    private static List<Snapshot> thin(List<Snapshot> all) {
        if (all.size() <= MAX_PROFILES) {
            return all;
        }
        List<Snapshot> kept = new ArrayList<>();
        for (int k = 0; k < MAX_PROFILES; k++) {
            kept.add(all.get((int) Math.round(k * (all.size() - 1.0) / (MAX_PROFILES - 1))));
        }
        return kept;
    }

    private static XYChart base(String title, String xTitle, String yTitle) {
        XYChart chart = new XYChartBuilder().width(WIDTH).height(HEIGHT).title(title).xAxisTitle(xTitle)
                .yAxisTitle(yTitle).build();
        XYStyler styler = chart.getStyler();
        styler.setChartBackgroundColor(Color.WHITE);
        styler.setPlotBackgroundColor(Color.WHITE);
        styler.setPlotBorderVisible(false);
        styler.setLegendPosition(Styler.LegendPosition.OutsideE);
        styler.setLegendBorderColor(Color.WHITE);
        styler.setChartTitleFont(new Font(Font.SANS_SERIF, Font.BOLD, 16));
        styler.setSeriesColors(PALETTE);
        styler.setPlotGridLinesColor(new Color(0xe4e4e4));
        styler.setAntiAlias(true);
        styler.setXAxisDecimalPattern("#,##0.###");
        styler.setYAxisDecimalPattern("#,##0.###");
        styler.setXAxisMaxLabelCount(8);
        styler.setYAxisTickMarkSpacingHint(60);
        styler.setXAxisTickMarkSpacingHint(90);
        return chart;
    }

    private static XYChart profileChart(String title, String valueTitle, List<Snapshot> profiles, Field field,
                                        AnalyticComparison analytic) {
        XYChart chart = base(title, valueTitle, "y (um)");
        // XChart 3.8.8 puts a y tick at nearly every node of an evenly spaced profile; label only round values
        // and leave the horizontal grid out so the axis stays readable
        double depth = profiles.get(0).y()[profiles.get(0).points() - 1] * 1e6;
        double step = niceStep(depth / 5);
        chart.getStyler().setPlotGridHorizontalLinesVisible(false);
        chart.getStyler().setyAxisTickLabelsFormattingFunction(v -> {
            double k = Math.rint(v / step);
            return Math.abs(v - k * step) < 1e-6 * step ? new java.text.DecimalFormat("#,##0.###").format(k * step) : "";
        });
        int k = 0;
        boolean anyExact = false;
        for (Snapshot s : profiles) {
            double[] y = s.y();
            double[] yMicro = new double[y.length];
            for (int i = 0; i < y.length; i++) {
                yMicro[i] = y[i] * 1e6;
            }
            double[] values = switch (field) {
                case VELOCITY -> s.velocity();
                case TEMPERATURE -> s.temperature();
                case VISCOSITY -> s.viscosity();
            };
            Color color = PALETTE[k % PALETTE.length];
            String label = timeLabel(s.time());
            boolean exact = analytic != null && field == Field.VELOCITY && analytic.appliesAt(s.time());
            if (exact) {
                // computed values as symbols on a thinned set of nodes, the closed form as a thin line
                anyExact = true;
                XYSeries line = chart.addSeries(label + " (exact)", analytic.velocityProfile(s.time(), y), yMicro);
                line.setMarker(SeriesMarkers.NONE);
                line.setLineColor(color);
                line.setLineStyle(new BasicStroke(1.2f));
                line.setShowInLegend(false);
                int stride = Math.max(1, y.length / 24);
                int m = (y.length - 1) / stride + 1;
                double[] xs = new double[m];
                double[] ys = new double[m];
                for (int j = 0; j < m; j++) {
                    xs[j] = values[j * stride];
                    ys[j] = yMicro[j * stride];
                }
                XYSeries symbols = chart.addSeries(label, xs, ys);
                symbols.setXYSeriesRenderStyle(XYSeries.XYSeriesRenderStyle.Scatter);
                symbols.setMarker(SeriesMarkers.CIRCLE);
                symbols.setMarkerColor(color);
            } else {
                XYSeries series = chart.addSeries(label, values, yMicro);
                series.setMarker(SeriesMarkers.NONE);
                series.setLineColor(color);
                series.setLineStyle(new BasicStroke(2f));
            }
            k++;
        }
        if (anyExact) {
            chart.setTitle(title + " (symbols: computed, lines: closed-form solution)");
        }
        return chart;
    }

    /** A time unit that suits a span: its name and its size in seconds. */
    private record TimeUnit(String name, double seconds) {
        static TimeUnit forSpan(double end) {
            if (end >= 1) {
                return new TimeUnit("s", 1);
            }
            if (end >= 1e-3) {
                return new TimeUnit("ms", 1e-3);
            }
            if (end >= 1e-6) {
                return new TimeUnit("us", 1e-6);
            }
            return new TimeUnit("ns", 1e-9);
        }

        double[] scale(double[] times) {
            double[] out = new double[times.length];
            for (int i = 0; i < times.length; i++) {
                out[i] = times[i] / seconds;
            }
            return out;
        }
    }

    /** 1, 2 or 5 times a power of ten, at least {@code raw}. */
    static double niceStep(double raw) {
        double power = Math.pow(10, Math.floor(Math.log10(raw)));
        for (double m : new double[] {1, 2, 5, 10}) {
            if (m * power >= raw) {
                return m * power;
            }
        }
        return 10 * power;
    }

    private static XYChart historyChart(FilmResult result) {
        History h = result.history();
        double[] seconds = h.column(History.Column.TIME);
        TimeUnit unit = TimeUnit.forSpan(seconds[seconds.length - 1]);
        double[] t = unit.scale(seconds);
        boolean logTime = t.length > 1 && t[0] > 0 && t[t.length - 1] / t[0] > 100;
        XYChart chart = base("Wall shear stress", "time (" + unit.name() + ")", "mu dU/dy at the wall (Pa)");
        chart.getStyler().setXAxisLogarithmic(logTime);
        addLine(chart, "lower wall", t, h.column(History.Column.WALL_SHEAR_STRESS_LOWER), PALETTE[0]);
        if (!result.filmCase().physics().isSemiInfinite()) {
            addLine(chart, "upper wall", t, h.column(History.Column.WALL_SHEAR_STRESS_UPPER), PALETTE[1]);
        }
        return chart;
    }

    private static boolean hasDrivenWall(FilmResult result) {
        var physics = result.filmCase().physics();
        return !physics.lower().motion().isPrescribed()
                || (physics.upper() != null && !physics.upper().motion().isPrescribed());
    }

    /** Shaft speed (rpm) and friction torque (N m) over time, on two y axes. */
    private static XYChart journalChart(FilmResult result) {
        History h = result.history();
        double[] seconds = h.column(History.Column.TIME);
        TimeUnit unit = TimeUnit.forSpan(seconds[seconds.length - 1]);
        double[] t = unit.scale(seconds);
        var journal = result.filmCase().journal();
        double[] surface = h.column(History.Column.UPPER_WALL_VELOCITY);
        double[] shear = h.column(History.Column.WALL_SHEAR_STRESS_UPPER);
        double[] rpm = new double[t.length];
        double[] torque = new double[t.length];
        for (int i = 0; i < t.length; i++) {
            rpm[i] = surface[i] / (Math.PI * journal.diameter()) * 60;
            torque[i] = shear[i] * journal.area() * journal.radius();
        }
        XYChart chart = base("Shaft speed and friction torque", "time (" + unit.name() + ")", "speed (rpm)");
        addLine(chart, "shaft speed (rpm)", t, rpm, PALETTE[0]);
        XYSeries torqueSeries = chart.addSeries("friction torque (N m)", t, torque);
        torqueSeries.setMarker(SeriesMarkers.NONE);
        torqueSeries.setLineColor(PALETTE[1]);
        torqueSeries.setLineStyle(new BasicStroke(2f));
        torqueSeries.setYAxisGroup(1);
        chart.setYAxisGroupTitle(1, "friction torque (N m)");
        chart.getStyler().setYAxisGroupPosition(1, Styler.YAxisPosition.Right);
        chart.getStyler().setyAxisTickLabelsFormattingFunction(null);
        return chart;
    }

    /** The walls' velocities over time (for a driven wall). */
    private static XYChart wallVelocityChart(FilmResult result) {
        History h = result.history();
        double[] seconds = h.column(History.Column.TIME);
        TimeUnit unit = TimeUnit.forSpan(seconds[seconds.length - 1]);
        double[] t = unit.scale(seconds);
        XYChart chart = base("Wall velocity", "time (" + unit.name() + ")", "velocity (m/s)");
        addLine(chart, "lower wall", t, h.column(History.Column.LOWER_WALL_VELOCITY), PALETTE[0]);
        if (result.filmCase().physics().upper() != null) {
            addLine(chart, "upper wall", t, h.column(History.Column.UPPER_WALL_VELOCITY), PALETTE[1]);
        }
        return chart;
    }

    private static XYChart temperatureHistoryChart(FilmResult result) {
        History h = result.history();
        double[] seconds = h.column(History.Column.TIME);
        TimeUnit unit = TimeUnit.forSpan(seconds[seconds.length - 1]);
        double[] t = unit.scale(seconds);
        boolean logTime = t.length > 1 && t[0] > 0 && t[t.length - 1] / t[0] > 100;
        XYChart chart = base("Film temperature", "time (" + unit.name() + ")", "temperature (K)");
        chart.getStyler().setXAxisLogarithmic(logTime);
        addLine(chart, "highest", t, h.column(History.Column.MAX_TEMPERATURE), PALETTE[1]);
        addLine(chart, "mean", t, h.column(History.Column.MEAN_TEMPERATURE), PALETTE[2]);
        return chart;
    }

    private static void addLine(XYChart chart, String name, double[] x, double[] y, Color color) {
        XYSeries series = chart.addSeries(name, x, y);
        series.setMarker(SeriesMarkers.NONE);
        series.setLineColor(color);
        series.setLineStyle(new BasicStroke(2f));
    }

    /** A time with a unit a reader takes in at a glance. */
    static String timeLabel(double t) {
        if (Double.isInfinite(t)) {
            return "steady";
        }
        double a = Math.abs(t);
        if (a >= 1) {
            return String.format("t = %.4g s", t);
        }
        if (a >= 1e-3) {
            return String.format("t = %.4g ms", t * 1e3);
        }
        if (a >= 1e-6) {
            return String.format("t = %.4g us", t * 1e6);
        }
        return String.format("t = %.4g ns", t * 1e9);
    }

    private static void save(XYChart chart, Path file) throws IOException {
        String name = file.toString();
        BitmapEncoder.saveBitmap(chart, name.substring(0, name.length() - 4), BitmapEncoder.BitmapFormat.PNG);
    }
}
