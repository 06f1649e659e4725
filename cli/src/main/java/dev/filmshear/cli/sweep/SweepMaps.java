package dev.filmshear.cli.sweep;

import dev.filmshear.cli.input.Quantity;
import dev.filmshear.cli.input.UnitException;
import dev.filmshear.cli.input.Units;
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
import java.math.BigDecimal;
import java.math.MathContext;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.BitSet;
import java.util.List;
import java.util.Map;
import java.util.function.Function;

/**
 * The maps of a sweep, drawn with XChart.
 *
 * <p><b>Two axes</b>: a heat map per mapped column over the plane of the two axes (first axis across,
 * second up). Each case is one cell, at the rank of its values along the axes and labelled with them,
 * filled with the colour of its value's band ({@link Bands}: round edges, listed in the legend). XChart's
 * own heat map has no way to mark cells or draw lines over them, so the cells are drawn as filled
 * polygons of an XY chart, one series per band. A failed case is a grey cell with a cross. Where a flag
 * switches between neighbouring cells (a warning code such as {@code laminar_flow_doubtful}, a film not
 * settled by the end time, the
 * temperature limit exceeded) a line is drawn on the edge between them: the boundary of the region where
 * the flag holds, so the safe operating envelope reads at a glance.
 *
 * <p><b>One axis</b>: the column over the axis as a line with a point per case, failed cases as crosses
 * on the lower edge, and a flag's boundary as a vertical line halfway between the neighbours where it
 * switches.
 *
 * <p>Axis values are drawn in the unit they were written in when an axis uses one unit throughout (a gap
 * in um), otherwise in SI; an axis of words (law names) is drawn as categories in plan order. Of the
 * default columns, one without values or with the same value in every case (the temperature of an
 * isothermal sweep) is left out.
 */
final class SweepMaps {
    /** Our own sequential ramp for values, light to dark: straw, sand, apricot, burnt orange, brick, plum. */
    private static final Color[] RAMP = {new Color(0xf3e3a0), new Color(0xeec36a), new Color(0xe39a4b),
            new Color(0xc9602e), new Color(0x933a3a), new Color(0x4e2640)};
    /** Boundary colours, chosen to stand out against the warm ramp: teal, slate blue, charcoal, olive. */
    private static final Color[] BOUNDARY = {new Color(0x1b6f6a), new Color(0x3c5fa8), new Color(0x222222),
            new Color(0x6f7f1e), new Color(0x8c4a7a)};
    private static final Color FAILED_FILL = new Color(0xcfcfcf);
    private static final Color FAILED_MARK = new Color(0x222222);
    private static final int WIDTH = 960;
    private static final int HEIGHT = 640;
    /** Bands aimed at: between about 4 and 10 once rounded to 1-2-5 steps. */
    private static final int TARGET_BANDS = 8;

    private SweepMaps() {
    }

    /**
     * One picture written.
     *
     * @param column the results.csv column drawn
     * @param file the PNG's file name in the sweep folder
     * @param title what it shows
     */
    record Drawn(String column, String file, String title) {
    }

    /** Draws the maps (two axes) or plots (one axis) of every mapped column that has values. */
    static List<Drawn> write(Path dir, SweepPlan plan, SweepData data) throws IOException {
        List<Drawn> drawn = new ArrayList<>();
        if (!data.gridded) {
            return drawn;
        }
        boolean heat = plan.axes().size() == 2;
        List<AxisScale> scales = plan.axes().stream().map(a -> AxisScale.of(a, heat)).toList();
        for (Map.Entry<String, double[]> column : data.values.entrySet()) {
            boolean chosen = !plan.maps().isEmpty();
            Bands bands = Bands.of(column.getValue(), data.okCases);
            if (!anyFinite(column.getValue(), data.okCases) || (!chosen && bands.count() == 1 && bands.edges().length == 1)
                    || (!chosen && column.getKey().equals("wall_shear_stress_lower_Pa")
                    && drawn.stream().anyMatch(d -> d.column().equals("wall_shear_stress_upper_Pa")))) {
                continue;
            }
            String name = describe(column.getKey());
            XYChart chart = scales.size() == 2
                    ? heatMap(name, scales.get(0), scales.get(1), column.getValue(), data)
                    : linePlot(name, scales.get(0), column.getValue(), data);
            String file = "map_" + column.getKey() + ".png";
            String path = dir.resolve(file).toString();
            BitmapEncoder.saveBitmap(chart, path.substring(0, path.length() - 4), BitmapEncoder.BitmapFormat.PNG);
            drawn.add(new Drawn(column.getKey(), file, chart.getTitle()));
        }
        return drawn;
    }

    private static boolean anyFinite(double[] values, BitSet ok) {
        for (int i = ok.nextSetBit(0); i >= 0; i = ok.nextSetBit(i + 1)) {
            if (Double.isFinite(values[i])) {
                return true;
            }
        }
        return false;
    }

    /** A column in words for titles. */
    static String describe(String column) {
        return switch (column) {
            case "max_temperature_K" -> "Highest film temperature (K)";
            case "wall_shear_stress_upper_Pa" -> "Wall shear stress at the upper wall (Pa)";
            case "wall_shear_stress_lower_Pa" -> "Wall shear stress at the lower wall (Pa)";
            case "dissipation_W_per_m2" -> "Friction power per unit wall area (W/m^2)";
            case "friction_power_W" -> "Friction power (W)";
            case "friction_torque_N_m" -> "Friction torque (N m)";
            case "mean_temperature_K" -> "Mean film temperature (K)";
            case "peak_temperature_K" -> "Highest film temperature during the run (K)";
            case "settle_time_s" -> "Time for the wall shear stress to settle within 1 % (s)";
            default -> column;
        };
    }

    private static XYChart heatMap(String name, AxisScale x, AxisScale y, double[] values, SweepData data) {
        XYChart chart = base(name + " over " + x.key + " and " + y.key, x, y);
        int ny = y.size();
        Bands bands = Bands.of(values, data.okCases);
        List<List<double[]>> perBand = new ArrayList<>();
        for (int b = 0; b < bands.count(); b++) {
            perBand.add(new ArrayList<>());
        }
        List<double[]> failed = new ArrayList<>();
        List<double[]> crosses = new ArrayList<>();
        for (int i = 0; i < x.size(); i++) {
            for (int j = 0; j < ny; j++) {
                int cell = i * ny + j;
                double[] box = {x.lower[i], x.upper[i], y.lower[j], y.upper[j]};
                if (data.failedCases.get(cell)) {
                    failed.add(box);
                    crosses.add(new double[] {x.centre(i), y.centre(j)});
                } else if (data.okCases.get(cell) && Double.isFinite(values[cell])) {
                    perBand.get(bands.band(values[cell])).add(box);
                }
            }
        }
        for (int b = bands.count() - 1; b >= 0; b--) {
            if (!perBand.get(b).isEmpty()) {
                addCells(chart, bands.label(b), perBand.get(b), bands.color(b), true);
            }
        }
        if (!failed.isEmpty()) {
            addCells(chart, "failed (cell)", failed, FAILED_FILL, false);
            addPoints(chart, "failed case", crosses);
        }
        int k = 0;
        for (Map.Entry<String, BitSet> flag : data.flags.entrySet()) {
            List<double[]> segments = new ArrayList<>();
            BitSet on = flag.getValue();
            for (int i = 0; i < x.size(); i++) {
                for (int j = 0; j < ny; j++) {
                    int cell = i * ny + j;
                    // right-hand neighbour in the drawing (next larger x), then the one above
                    int ri = x.next(i);
                    if (ri >= 0 && switches(data.okCases, on, cell, ri * ny + j)) {
                        double edge = x.upper[i];
                        segments.add(new double[] {edge, edge, y.lower[j], y.upper[j]});
                    }
                    int uj = y.next(j);
                    if (uj >= 0 && switches(data.okCases, on, cell, i * ny + uj)) {
                        double edge = y.upper[j];
                        segments.add(new double[] {x.lower[i], x.upper[i], edge, edge});
                    }
                }
            }
            if (!segments.isEmpty()) {
                addSegments(chart, boundaryName(flag.getKey(), data), segments, k++);
            }
        }
        XYStyler styler = chart.getStyler();
        styler.setXAxisMin(x.min());
        styler.setXAxisMax(x.max());
        styler.setYAxisMin(y.min());
        styler.setYAxisMax(y.max());
        return chart;
    }

    /** The legend's name of a flag's boundary. */
    private static String boundaryName(String flag, SweepData data) {
        return switch (flag) {
            case SweepData.OVER_LIMIT -> "boundary: max_temperature_K above "
                    + Axis.Range.plain(data.temperatureLimit) + " K";
            case SweepData.NOT_SETTLED -> "boundary: not settled by the end time";
            default -> "boundary: " + flag;
        };
    }

    private static boolean switches(BitSet ok, BitSet on, int a, int b) {
        return ok.get(a) && ok.get(b) && on.get(a) != on.get(b);
    }

    private static XYChart linePlot(String name, AxisScale x, double[] values, SweepData data) {
        XYChart chart = base(name + " over " + x.key, x, null);
        chart.setYAxisTitle(name);
        int n = x.size();
        List<Double> xs = new ArrayList<>();
        List<Double> ys = new ArrayList<>();
        double lo = Double.POSITIVE_INFINITY;
        double hi = Double.NEGATIVE_INFINITY;
        for (int r = 0; r < n; r++) {
            int i = x.order[r];
            if (data.okCases.get(i) && Double.isFinite(values[i])) {
                xs.add(x.centre(i));
                ys.add(values[i]);
                lo = Math.min(lo, values[i]);
                hi = Math.max(hi, values[i]);
            } else if (!xs.isEmpty() && !Double.isNaN(ys.get(ys.size() - 1))) {
                // a gap in the line where a case failed
                xs.add(x.centre(i));
                ys.add(Double.NaN);
            }
        }
        XYSeries line = chart.addSeries(name, toArray(xs), toArray(ys));
        line.setMarker(SeriesMarkers.CIRCLE);
        line.setLineColor(RAMP[4]);
        line.setMarkerColor(RAMP[4]);
        line.setLineStyle(new BasicStroke(2f));
        List<double[]> crosses = new ArrayList<>();
        for (int i = data.failedCases.nextSetBit(0); i >= 0; i = data.failedCases.nextSetBit(i + 1)) {
            crosses.add(new double[] {x.centre(i), lo});
        }
        if (!crosses.isEmpty()) {
            addPoints(chart, "failed case", crosses);
        }
        int k = 0;
        for (Map.Entry<String, BitSet> flag : data.flags.entrySet()) {
            List<double[]> segments = new ArrayList<>();
            for (int i = 0; i < n; i++) {
                int ri = x.next(i);
                if (ri >= 0 && switches(data.okCases, flag.getValue(), i, ri)) {
                    segments.add(new double[] {x.upper[i], x.upper[i], lo, hi});
                }
            }
            if (!segments.isEmpty()) {
                addSegments(chart, boundaryName(flag.getKey(), data), segments, k++);
            }
        }
        chart.getStyler().setXAxisMin(x.min());
        chart.getStyler().setXAxisMax(x.max());
        return chart;
    }

    private static XYChart base(String title, AxisScale x, AxisScale y) {
        XYChart chart = new XYChartBuilder().width(WIDTH).height(HEIGHT).title(title).xAxisTitle(x.title)
                .yAxisTitle(y == null ? "" : y.title).build();
        XYStyler styler = chart.getStyler();
        styler.setChartBackgroundColor(Color.WHITE);
        styler.setPlotBackgroundColor(Color.WHITE);
        styler.setPlotBorderVisible(true);
        styler.setPlotGridLinesVisible(y == null);
        if (y != null) {
            // the cells fill the plot; ticks beyond the outer cells fall outside it (see rankLabel)
            styler.setPlotContentSize(1.0);
        }
        styler.setPlotGridLinesColor(new Color(0xe4e4e4));
        styler.setLegendPosition(Styler.LegendPosition.OutsideE);
        styler.setLegendBorderColor(Color.WHITE);
        styler.setChartTitleFont(new Font(Font.SANS_SERIF, Font.BOLD, 15));
        styler.setAntiAlias(true);
        styler.setxAxisTickLabelsFormattingFunction(x.labels());
        if (y != null) {
            styler.setyAxisTickLabelsFormattingFunction(y.labels());
        } else {
            styler.setyAxisTickLabelsFormattingFunction(SweepMaps::format);
        }
        return chart;
    }

    /** Filled rectangles {x0, x1, y0, y1} as one polygon series, separated by NaN. */
    private static void addCells(XYChart chart, String name, List<double[]> boxes, Color color, boolean legend) {
        double[] xs = new double[boxes.size() * 6];
        double[] ys = new double[boxes.size() * 6];
        int p = 0;
        for (double[] b : boxes) {
            double[] cx = {b[0], b[1], b[1], b[0], b[0], Double.NaN};
            double[] cy = {b[2], b[2], b[3], b[3], b[2], Double.NaN};
            System.arraycopy(cx, 0, xs, p, 6);
            System.arraycopy(cy, 0, ys, p, 6);
            p += 6;
        }
        XYSeries s = chart.addSeries(name, Arrays.copyOf(xs, p - 1), Arrays.copyOf(ys, p - 1));
        s.setXYSeriesRenderStyle(XYSeries.XYSeriesRenderStyle.PolygonArea);
        s.setMarker(SeriesMarkers.NONE);
        s.setFillColor(color);
        s.setLineColor(color);
        s.setLineStyle(new BasicStroke(0.5f));
        s.setShowInLegend(legend);
    }

    private static void addPoints(XYChart chart, String name, List<double[]> points) {
        double[] xs = new double[points.size()];
        double[] ys = new double[points.size()];
        for (int i = 0; i < xs.length; i++) {
            xs[i] = points.get(i)[0];
            ys[i] = points.get(i)[1];
        }
        XYSeries s = chart.addSeries(name, xs, ys);
        s.setXYSeriesRenderStyle(XYSeries.XYSeriesRenderStyle.Scatter);
        s.setMarker(SeriesMarkers.CROSS);
        s.setMarkerColor(FAILED_MARK);
    }

    /** Line segments {x0, x1, y0, y1} as one line series, separated by NaN. */
    private static void addSegments(XYChart chart, String name, List<double[]> segments, int k) {
        double[] xs = new double[segments.size() * 3 - 1];
        double[] ys = new double[xs.length];
        int p = 0;
        for (double[] s : segments) {
            if (p > 0) {
                xs[p] = Double.NaN;
                ys[p++] = Double.NaN;
            }
            xs[p] = s[0];
            ys[p++] = s[2];
            xs[p] = s[1];
            ys[p++] = s[3];
        }
        XYSeries s = chart.addSeries(name, xs, ys);
        s.setXYSeriesRenderStyle(XYSeries.XYSeriesRenderStyle.Line);
        s.setMarker(SeriesMarkers.NONE);
        s.setLineColor(BOUNDARY[k % BOUNDARY.length]);
        float[] dash = k % 2 == 0 ? null : new float[] {8f, 5f};
        s.setLineStyle(new BasicStroke(3f, BasicStroke.CAP_BUTT, BasicStroke.JOIN_MITER, 10f, dash, 0f));
    }

    private static double[] toArray(List<Double> values) {
        return values.stream().mapToDouble(Double::doubleValue).toArray();
    }

    /** A number for a label, to four significant digits. */
    static String format(double v) {
        if (!Double.isFinite(v)) {
            return "";
        }
        double a = Math.abs(v);
        if (a != 0 && (a >= 1e6 || a < 1e-3)) {
            String[] parts = String.format(java.util.Locale.ROOT, "%.3e", v).split("e");
            String mantissa = parts[0].contains(".") ? parts[0].replaceAll("0+$", "").replaceAll("\\.$", "") : parts[0];
            return mantissa + "e" + Integer.parseInt(parts[1]);
        }
        BigDecimal d = new BigDecimal(v).round(new MathContext(4)).stripTrailingZeros();
        return d.scale() < 0 ? d.toBigInteger().toString() : d.toPlainString();
    }

    /**
     * The colour bands of a column, as increasing edges. Linear bands are round steps of 1, 2 or 5 times
     * a power of ten, about {@value #TARGET_BANDS} of them. Values spanning a factor of ten or more get
     * bands of equal ratio instead, with round edges: 1-2-5 per decade, or finer (1, 1.5, 2, 3, 5, 7) when
     * that gives fewer than five bands, or whole decades when 1-2-5 would give more than fourteen.
     *
     * @param edges band b holds values from edges[b] to edges[b + 1]; a single edge for a constant column
     */
    record Bands(double[] edges) {
        private static final double[][] PER_DECADE = {{1}, {1, 2, 5}, {1, 1.5, 2, 3, 5, 7}};

        static Bands of(double[] values, BitSet ok) {
            double min = Double.POSITIVE_INFINITY;
            double max = Double.NEGATIVE_INFINITY;
            for (int i = ok.nextSetBit(0); i >= 0; i = ok.nextSetBit(i + 1)) {
                if (Double.isFinite(values[i])) {
                    min = Math.min(min, values[i]);
                    max = Math.max(max, values[i]);
                }
            }
            if (!(max > min)) {
                return new Bands(new double[] {min});
            }
            if (min > 0 && max / min >= 10) {
                double[] coarse = ratioEdges(min, max, PER_DECADE[1]);
                if (coarse.length - 1 > 14) {
                    return new Bands(ratioEdges(min, max, PER_DECADE[0]));
                }
                return new Bands(coarse.length - 1 < 5 ? ratioEdges(min, max, PER_DECADE[2]) : coarse);
            }
            double step = niceStep((max - min) / TARGET_BANDS);
            double first = Math.floor(min / step) * step;
            int count = Math.max(1, (int) Math.ceil((max - first) / step - 1e-9));
            double[] edges = new double[count + 1];
            for (int b = 0; b <= count; b++) {
                // rounded so that labels read 0.3, not 0.30000000000000004
                edges[b] = new BigDecimal(first + b * step).round(new MathContext(12)).doubleValue();
            }
            return new Bands(edges);
        }

        /** Round edges from the largest at or below {@code min} to the smallest at or above {@code max}. */
        private static double[] ratioEdges(double min, double max, double[] mantissas) {
            List<Double> edges = new ArrayList<>();
            for (int decade = (int) Math.floor(Math.log10(min)); ; decade++) {
                for (double m : mantissas) {
                    double e = new BigDecimal(m).scaleByPowerOfTen(decade).doubleValue();
                    if (e <= min) {
                        edges.clear();
                    }
                    edges.add(e);
                    if (e >= max) {
                        return edges.stream().mapToDouble(Double::doubleValue).toArray();
                    }
                }
            }
        }

        int count() {
            return Math.max(1, edges.length - 1);
        }

        int band(double v) {
            int b = 0;
            while (b + 1 < count() && v >= edges[b + 1]) {
                b++;
            }
            return b;
        }

        String label(int b) {
            return edges.length == 1 ? format(edges[0]) : format(edges[b]) + " to " + format(edges[b + 1]);
        }

        Color color(int b) {
            return ramp(count() == 1 ? 0.5 : (double) b / (count() - 1));
        }
    }

    /** 1, 2 or 5 times a power of ten, at least {@code raw}. */
    static double niceStep(double raw) {
        double power = Math.pow(10, Math.floor(Math.log10(raw)));
        for (double m : new double[] {1, 2, 5}) {
            if (m * power >= raw * (1 - 1e-12)) {
                return m * power;
            }
        }
        return 10 * power;
    }

    /** The ramp's colour at {@code t} in [0, 1], interpolated between its anchors. */
    static Color ramp(double t) {
        double s = Math.max(0, Math.min(1, t)) * (RAMP.length - 1);
        int i = Math.min(RAMP.length - 2, (int) Math.floor(s));
        double f = s - i;
        Color a = RAMP[i];
        Color b = RAMP[i + 1];
        return new Color((int) Math.round(a.getRed() + f * (b.getRed() - a.getRed())),
                (int) Math.round(a.getGreen() + f * (b.getGreen() - a.getGreen())),
                (int) Math.round(a.getBlue() + f * (b.getBlue() - a.getBlue())));
    }

    /**
     * Where an axis's values are drawn: a position per value (in plan order), the cell edges halfway to
     * the neighbours, and the order of the values along the axis.
     *
     * <p>On a heat map every value gets one cell of equal width at its rank along the axis, labelled with
     * its value, as in a table of cases: log-spaced and uneven lists then read as easily as even ones. A
     * line plot places values at their number instead, in log10 for a log-spaced axis (XChart's own log
     * axis labels only whole decades, and none of its ticks once a label format is given).
     */
    static final class AxisScale {
        final String key;
        final String title;
        final double[] position;
        final double[] lower;
        final double[] upper;
        /** Value indices in increasing position. */
        final int[] order;
        /** Rank of each value index in {@link #order}. */
        final int[] rank;
        private final Function<Double, String> labels;

        private AxisScale(String key, String title, double[] position, Function<double[], Function<Double, String>> labels) {
            this.key = key;
            this.title = title;
            this.position = position;
            int n = position.length;
            Integer[] sorted = new Integer[n];
            for (int i = 0; i < n; i++) {
                sorted[i] = i;
            }
            Arrays.sort(sorted, (a, b) -> Double.compare(position[a], position[b]));
            order = new int[n];
            rank = new int[n];
            for (int r = 0; r < n; r++) {
                order[r] = sorted[r];
                rank[sorted[r]] = r;
            }
            lower = new double[n];
            upper = new double[n];
            for (int r = 0; r < n; r++) {
                double t = position[order[r]];
                double below = r > 0 ? (t + position[order[r - 1]]) / 2 : Double.NaN;
                double above = r < n - 1 ? (t + position[order[r + 1]]) / 2 : Double.NaN;
                double half = n == 1 ? (Math.abs(t) > 0 ? 0.05 * Math.abs(t) : 0.5)
                        : Double.isNaN(below) ? above - t : t - below;
                lower[order[r]] = Double.isNaN(below) ? t - half : below;
                upper[order[r]] = Double.isNaN(above) ? t + half : above;
            }
            this.labels = labels.apply(position);
        }

        /**
         * The scale of an axis.
         *
         * @param byRank true for a heat map (one equal cell per value), false for a line plot
         */
        static AxisScale of(Axis axis, boolean byRank) {
            int n = axis.size();
            String unit = commonUnit(axis);
            double[] number = new double[n];
            boolean numeric = true;
            for (int i = 0; i < n; i++) {
                number[i] = unit != null ? Units.parse(axis.value(i).textValue()).number() : axis.si(i);
                numeric &= Double.isFinite(number[i]);
            }
            double[] sorted = number.clone();
            Arrays.sort(sorted);
            for (int i = 1; i < n && numeric; i++) {
                numeric = sorted[i] > sorted[i - 1];
            }
            String title = axis.key() + (numeric && unit != null ? " (" + unit + ")" : "");
            if (!numeric || byRank) {
                // ranks: by value when numeric, else plan order; each labelled with its value
                String[] names = new String[n];
                double[] position = new double[n];
                for (int i = 0; i < n; i++) {
                    position[i] = numeric ? Arrays.binarySearch(sorted, number[i]) : i;
                    names[(int) position[i]] = numeric ? format(number[i]) : axis.written(i);
                }
                if (Arrays.stream(names).distinct().count() < n) {
                    for (int i = 0; i < n; i++) {
                        names[(int) position[i]] = numeric ? Double.toString(number[i]) : i + ": " + axis.written(i);
                    }
                }
                return new AxisScale(axis.key(), title, position, p -> v -> rankLabel(names, v));
            }
            double sign = Math.signum(sorted[0]);
            if (axis.spacing() == Axis.Spacing.LOG && sign != 0 && sign == Math.signum(sorted[n - 1])) {
                // log10 of the magnitude; values below zero keep their sign in the labels
                double[] position = new double[n];
                for (int i = 0; i < n; i++) {
                    position[i] = Math.log10(Math.abs(number[i]));
                }
                return new AxisScale(axis.key(), title + ", log scale", position,
                        p -> v -> format(sign * Math.pow(10, v)));
            }
            return new AxisScale(axis.key(), title, number, p -> SweepMaps::format);
        }

        /**
         * The label of a tick on a rank axis. XChart 3.8.8 widens its tick step until every label it
         * computes is distinct, including ticks beyond the axis's ends, and draws no tick at all when the
         * labels of the two ends are equal, and fails on an empty label: so a tick on a value gets the
         * value's name, a tick between two values a single space (two of them make XChart take a wider
         * step), and a tick beyond the ends, which a plot filling its whole area never shows, its own
         * number.
         */
        private static String rankLabel(String[] names, double v) {
            long k = Math.round(v);
            if (v < -1e-6 || v > names.length - 1 + 1e-6) {
                return "(" + v + ")";
            }
            return Math.abs(v - k) < 1e-6 ? names[(int) k] : " ";
        }

        /** The unit every value is written in, or null (bare numbers, mixed units, words). */
        private static String commonUnit(Axis axis) {
            String unit = null;
            for (int i = 0; i < axis.size(); i++) {
                var v = axis.value(i);
                if (!v.isTextual()) {
                    return null;
                }
                Quantity q;
                try {
                    q = Units.parse(v.textValue());
                } catch (UnitException e) {
                    return null;
                }
                String symbol = q.unit().symbol();
                if (symbol.isEmpty() || (unit != null && !unit.equals(symbol))) {
                    return null;
                }
                unit = symbol;
            }
            return unit;
        }

        int size() {
            return position.length;
        }

        double centre(int i) {
            return position[i];
        }

        /** The value index next along the axis after {@code i}, or -1 at the end. */
        int next(int i) {
            return rank[i] + 1 < order.length ? order[rank[i] + 1] : -1;
        }

        double min() {
            return lower[order[0]];
        }

        double max() {
            return upper[order[order.length - 1]];
        }

        Function<Double, String> labels() {
            return labels;
        }
    }
}
