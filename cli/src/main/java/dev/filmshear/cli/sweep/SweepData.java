package dev.filmshear.cli.sweep;

import java.io.BufferedReader;
import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.BitSet;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.TreeMap;

/**
 * What the maps and the report need from a finished results.csv, gathered in one pass over the file:
 * counts, the warnings' frequencies, the first failures, and, when the plan has one or two axes and at
 * most {@value #MAX_CELLS} combinations, one value per case for each mapped column and the flags whose
 * boundaries the maps draw.
 *
 * <p>Flags per case: each warning code of the case; {@value #NOT_SETTLED} when the film had not settled
 * by the end time ({@code steady} false); {@value #OVER_LIMIT} when {@code max_temperature_K} exceeds the
 * plan's {@code temperature_limit}. Failed cases carry no flags.
 */
final class SweepData {
    /** The largest grid drawn: 200 by 200 cells, still legible; larger plans get no maps. */
    static final int MAX_CELLS = 40_000;
    /** Failures listed in the report. */
    static final int LISTED_FAILURES = 20;
    /** Flag of a transient case that had not settled by its end time. */
    static final String NOT_SETTLED = "not_settled_by_end_time";
    /** Flag of a case whose highest temperature exceeds the plan's limit. */
    static final String OVER_LIMIT = "temperature_limit_exceeded";
    /** Columns mapped when the plan chooses none; empty ones are left out when drawing. */
    static final List<String> DEFAULT_MAPS = List.of("peak_temperature_K", "wall_shear_stress_upper_Pa",
            "dissipation_W_per_m2", "friction_power_W", "settle_time_s");

    /**
     * A failed case for the report.
     *
     * @param index case index
     * @param values axis values as written in the plan
     * @param message the failure
     */
    record Failure(long index, List<String> values, String message) {
    }

    final long ok;
    final long failed;
    final Map<String, Long> warningCounts;
    final List<Failure> failures;
    /** Whether per-case values were kept (one or two axes, few enough cases). */
    final boolean gridded;
    /** Per mapped column, one value per case index (NaN when missing or failed). */
    final Map<String, double[]> values;
    final BitSet okCases;
    final BitSet failedCases;
    /** Per flag, the ok cases that carry it. */
    final Map<String, BitSet> flags;
    /** The plan's temperature limit (K), NaN when none. */
    final double temperatureLimit;

    private SweepData(long ok, long failed, Map<String, Long> warningCounts, List<Failure> failures, boolean gridded,
                      Map<String, double[]> values, BitSet okCases, BitSet failedCases, Map<String, BitSet> flags,
                      double temperatureLimit) {
        this.ok = ok;
        this.failed = failed;
        this.warningCounts = warningCounts;
        this.failures = failures;
        this.gridded = gridded;
        this.values = values;
        this.okCases = okCases;
        this.failedCases = failedCases;
        this.flags = flags;
        this.temperatureLimit = temperatureLimit;
    }

    /** True when a plan of this shape gets maps. */
    static boolean griddable(SweepPlan plan) {
        return plan.axes().size() <= 2 && plan.caseCount() <= MAX_CELLS;
    }

    /** The columns to map: the plan's choice, or the defaults. */
    static List<String> mapColumns(SweepPlan plan) {
        if (!plan.maps().isEmpty()) {
            return plan.maps();
        }
        List<String> columns = new ArrayList<>(DEFAULT_MAPS);
        columns.add("wall_shear_stress_lower_Pa");
        return columns;
    }

    /** Reads a sorted or unsorted results.csv of the plan. */
    static SweepData read(Path results, SweepPlan plan) throws IOException {
        ResultColumns columns = plan.columns();
        boolean gridded = griddable(plan);
        int cells = gridded ? (int) plan.caseCount() : 0;
        Map<String, double[]> values = new LinkedHashMap<>();
        Map<String, Integer> positions = new LinkedHashMap<>();
        if (gridded) {
            for (String column : mapColumns(plan)) {
                double[] v = new double[cells];
                java.util.Arrays.fill(v, Double.NaN);
                values.put(column, v);
                positions.put(column, columns.indexOf(column));
            }
        }
        int maxTemperature = columns.indexOf("max_temperature_K");
        int steady = columns.indexOf(ResultColumns.STEADY);
        long ok = 0;
        long failed = 0;
        Map<String, Long> warningCounts = new TreeMap<>();
        List<Failure> failures = new ArrayList<>();
        BitSet okCases = new BitSet();
        BitSet failedCases = new BitSet();
        Map<String, BitSet> flags = new TreeMap<>();
        try (BufferedReader in = Files.newBufferedReader(results, StandardCharsets.UTF_8)) {
            in.readLine();
            for (String line = in.readLine(); line != null; line = in.readLine()) {
                List<String> f = CsvLine.split(line).orElseThrow();
                int index = Integer.parseInt(f.get(columns.indexColumn()));
                if (f.get(columns.statusColumn()).equals(ResultColumns.FAILED)) {
                    failed++;
                    if (failures.size() < LISTED_FAILURES) {
                        failures.add(new Failure(index, written(plan, index), f.get(columns.messageColumn())));
                    }
                    if (gridded) {
                        failedCases.set(index);
                    }
                    continue;
                }
                ok++;
                List<String> codes = new ArrayList<>();
                for (String code : f.get(columns.warningColumn()).split(";")) {
                    if (!code.isEmpty()) {
                        codes.add(code);
                        warningCounts.merge(code, 1L, Long::sum);
                    }
                }
                if (!gridded) {
                    continue;
                }
                okCases.set(index);
                if (f.get(steady).equals("false")) {
                    codes.add(NOT_SETTLED);
                }
                double t = parse(f.get(maxTemperature));
                if (t > plan.temperatureLimit()) {
                    codes.add(OVER_LIMIT);
                }
                for (String code : codes) {
                    flags.computeIfAbsent(code, c -> new BitSet()).set(index);
                }
                for (Map.Entry<String, double[]> column : values.entrySet()) {
                    column.getValue()[index] = parse(f.get(positions.get(column.getKey())));
                }
            }
        }
        return new SweepData(ok, failed, warningCounts, failures, gridded, values, okCases, failedCases, flags,
                plan.temperatureLimit());
    }

    private static List<String> written(SweepPlan plan, long index) {
        int[] digits = plan.digits(index);
        List<String> out = new ArrayList<>();
        for (int a = 0; a < digits.length; a++) {
            out.add(plan.axes().get(a).written(digits[a]));
        }
        return out;
    }

    private static double parse(String field) {
        if (field.isEmpty()) {
            return Double.NaN;
        }
        try {
            return Double.parseDouble(field);
        } catch (NumberFormatException e) {
            return Double.NaN;
        }
    }
}
