package dev.filmshear.cli.fit;

import dev.filmshear.cli.input.Dimension;
import dev.filmshear.cli.input.Unit;
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
 * fit.png: the measured points and the fitted law over the data's temperature range, viscosity on a
 * logarithmic axis, drawn with XChart in the style of the run plots (output/Plots.java). Temperatures are
 * shown in the data file's unit; viscosities in the file's unit when it measures the law's quantity, else
 * in Pa s (dynamic laws) or mm^2/s (walther).
 */
final class FitPlot {
    /** The tool's palette (output/Plots): dark teal for the law, burnt orange for the points. */
    private static final Color[] PALETTE = dev.filmshear.cli.output.Plots.palette();
    private static final int WIDTH = 900;
    private static final int HEIGHT = 560;
    /** Points along the fitted curve: smooth at this width. */
    private static final int CURVE_POINTS = 200;

    private FitPlot() {
    }

    /** Writes the chart to {@code file} (a .png path). */
    static void write(Path file, ViscosityData data, FitResult result) throws IOException {
        Unit tUnit = data.temperature().unit();
        Unit vUnit = data.viscosity().unit();
        Dimension lawDimension = result.law().kinematic() ? Dimension.KINEMATIC_VISCOSITY : Dimension.DYNAMIC_VISCOSITY;
        boolean fileUnit = vUnit.dimension().equals(lawDimension);
        double vFactor = fileUnit ? vUnit.factor() : result.law().kinematic() ? 1e-6 : 1;
        String vLabel = fileUnit ? vUnit.symbol() : result.law().kinematic() ? "mm^2/s" : "Pa*s";

        XYChart chart = new XYChartBuilder().width(WIDTH).height(HEIGHT)
                .title(result.law().key() + " law fitted to " + Path.of(data.fileName()).getFileName()
                        + String.format(" (RMS relative residual %.3g %%)", 100 * result.rmsRelativeResidual()))
                .xAxisTitle("temperature (" + tUnit.symbol() + ")")
                .yAxisTitle((result.law().kinematic() ? "kinematic viscosity (" : "viscosity (") + vLabel + ")")
                .build();
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
        styler.setYAxisLogarithmic(true);
        styler.setXAxisMaxLabelCount(8);
        styler.setXAxisTickMarkSpacingHint(90);

        double from = result.validFrom();
        double to = result.validTo();
        double[] curveT = new double[CURVE_POINTS];
        double[] curveV = new double[CURVE_POINTS];
        for (int i = 0; i < CURVE_POINTS; i++) {
            double t = from + (to - from) * i / (CURVE_POINTS - 1);
            curveT[i] = shown(t, tUnit);
            curveV[i] = result.value(t) / vFactor;
        }
        XYSeries curve = chart.addSeries(result.law().key() + " law", curveT, curveV);
        curve.setMarker(SeriesMarkers.NONE);
        curve.setLineColor(PALETTE[0]);
        curve.setLineStyle(new BasicStroke(2f));

        double[] t = result.temperatures();
        double[] measured = result.measured();
        double[] pointT = new double[t.length];
        double[] pointV = new double[t.length];
        for (int i = 0; i < t.length; i++) {
            pointT[i] = shown(t[i], tUnit);
            pointV[i] = measured[i] / vFactor;
        }
        XYSeries points = chart.addSeries("measured", pointT, pointV);
        points.setXYSeriesRenderStyle(XYSeries.XYSeriesRenderStyle.Scatter);
        points.setMarker(SeriesMarkers.CIRCLE);
        points.setMarkerColor(PALETTE[1]);

        String name = file.toString();
        BitmapEncoder.saveBitmap(chart, name.substring(0, name.length() - ".png".length()),
                BitmapEncoder.BitmapFormat.PNG);
    }

    /** A temperature (K) in the file's unit: the inverse of SI = (number + offset) * factor. */
    private static double shown(double kelvin, Unit unit) {
        return kelvin / unit.factor() - unit.offset();
    }
}
