package dev.filmshear.cli.verify;

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

/**
 * A log-log convergence chart drawn with XChart in the style of the run plots (output/Plots.java): measured
 * points joined by lines, and dashed reference lines of a given slope through the first point, against which
 * the observed order is read by eye. Both axes span at least one whole decade so that the logarithmic axes
 * carry labelled ticks.
 */
final class LogLogChart {
    private static final Color REFERENCE = new Color(0x8a8a8a);
    private static final int WIDTH = 820;
    private static final int HEIGHT = 500;

    private final XYChart chart;
    private double xMin = Double.POSITIVE_INFINITY;
    private double xMax = Double.NEGATIVE_INFINITY;
    private double yMin = Double.POSITIVE_INFINITY;
    private double yMax = Double.NEGATIVE_INFINITY;
    private int series;

    LogLogChart(String title, String xTitle, String yTitle) {
        chart = new XYChartBuilder().width(WIDTH).height(HEIGHT).title(title).xAxisTitle(xTitle).yAxisTitle(yTitle)
                .build();
        XYStyler styler = chart.getStyler();
        styler.setChartBackgroundColor(Color.WHITE);
        styler.setPlotBackgroundColor(Color.WHITE);
        styler.setPlotBorderVisible(false);
        styler.setLegendPosition(Styler.LegendPosition.OutsideE);
        styler.setLegendBorderColor(Color.WHITE);
        styler.setChartTitleFont(new Font(Font.SANS_SERIF, Font.BOLD, 15));
        styler.setPlotGridLinesColor(new Color(0xe4e4e4));
        styler.setAntiAlias(true);
        styler.setXAxisLogarithmic(true);
        styler.setYAxisLogarithmic(true);
        styler.setXAxisDecimalPattern("0.###");
        styler.setYAxisDecimalPattern("0.#E0");
    }

    /** Adds measured points (x, y all above zero) as markers joined by a line. */
    void points(String name, double[] x, double[] y) {
        XYSeries s = chart.addSeries(name, x, y);
        Color color = dev.filmshear.cli.output.Plots.color(series);
        s.setLineColor(color);
        s.setMarkerColor(color);
        s.setMarker(SeriesMarkers.CIRCLE);
        s.setLineStyle(new BasicStroke(2f));
        series++;
        extend(x, y);
    }

    /** Adds a dashed line y = y0 (x / x0)^slope from x0 to x1. */
    void reference(String name, double x0, double y0, double x1, double slope) {
        double[] x = {x0, x1};
        double[] y = {y0, y0 * Math.pow(x1 / x0, slope)};
        XYSeries s = chart.addSeries(name, x, y);
        s.setLineColor(REFERENCE);
        s.setMarker(SeriesMarkers.NONE);
        s.setLineStyle(new BasicStroke(1.2f, BasicStroke.CAP_BUTT, BasicStroke.JOIN_MITER, 10f,
                slope == 2 ? new float[] {7f, 5f} : new float[] {2f, 4f}, 0f));
        extend(x, y);
    }

    private void extend(double[] x, double[] y) {
        for (double v : x) {
            xMin = Math.min(xMin, v);
            xMax = Math.max(xMax, v);
        }
        for (double v : y) {
            yMin = Math.min(yMin, v);
            yMax = Math.max(yMax, v);
        }
    }

    /** Writes the chart as a PNG ({@code file} ends in .png), the axes widened to whole decades. */
    void save(Path file) throws IOException {
        XYStyler styler = chart.getStyler();
        styler.setXAxisMin(Math.pow(10, Math.floor(Math.log10(xMin))));
        styler.setXAxisMax(Math.pow(10, Math.ceil(Math.log10(xMax))));
        styler.setYAxisMin(Math.pow(10, Math.floor(Math.log10(yMin))));
        styler.setYAxisMax(Math.pow(10, Math.ceil(Math.log10(yMax))));
        // XChart appends the format's extension itself
        String name = file.toString();
        BitmapEncoder.saveBitmap(chart, name.substring(0, name.length() - ".png".length()),
                BitmapEncoder.BitmapFormat.PNG);
    }
}
