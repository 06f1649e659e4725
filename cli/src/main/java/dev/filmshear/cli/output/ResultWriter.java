package dev.filmshear.cli.output;

import com.fasterxml.jackson.databind.ObjectMapper;
import com.fasterxml.jackson.databind.SerializationFeature;
import com.fasterxml.jackson.databind.node.ArrayNode;
import com.fasterxml.jackson.databind.node.ObjectNode;
import dev.filmshear.cli.report.CaseText;
import dev.filmshear.cli.report.HtmlReport;
import dev.filmshear.solver.model.CaseNumbers;
import dev.filmshear.solver.model.FilmResult;
import dev.filmshear.solver.model.FilmSummary;
import dev.filmshear.solver.model.History;
import dev.filmshear.solver.model.Snapshot;
import dev.filmshear.solver.model.Warning;

import java.io.BufferedWriter;
import java.io.IOException;
import java.io.UncheckedIOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;

/**
 * Writes a run's result folder: summary.json, history.csv, profiles.csv, when asked the plots, and last
 * report.html. The file names, keys and column headers are the outside contract (contract.md, "Result folder
 * of run"); columns and keys beyond it are appended, never renamed.
 */
public final class ResultWriter {
    /** The contract's history header, then this tool's extra columns. */
    static final String HISTORY_HEADER = "time_s,upper_wall_velocity_m_per_s,wall_shear_stress_lower_Pa,"
            + "wall_shear_stress_upper_Pa,max_temperature_K,dissipation_W_per_m2,lower_wall_velocity_m_per_s,"
            + "mean_temperature_K,heat_flux_into_lower_wall_W_per_m2,heat_flux_into_upper_wall_W_per_m2";
    /** The contract's profiles header. */
    static final String PROFILES_HEADER = "time_s,y_m,velocity_m_per_s,temperature_K,viscosity_Pa_s";

    private static final ObjectMapper JSON = new ObjectMapper().enable(SerializationFeature.INDENT_OUTPUT);

    private ResultWriter() {
    }

    /**
     * What the writer is given about a run besides the solver's result.
     *
     * @param title the case's title
     * @param caseFileName the case file as named on the command line
     * @param analytic the comparison with a closed-form solution, or null
     * @param failure the failure message of a run that did not finish, or null
     * @param plots whether to draw the PNG plots
     */
    public record RunInfo(String title, String caseFileName, AnalyticComparison analytic,
                          String failure, boolean plots) {
    }

    /**
     * Writes every result file into {@code dir}, creating it; the report carries no case text.
     *
     * @throws UncheckedIOException when a file cannot be written
     */
    public static void write(Path dir, FilmResult result, RunInfo info) {
        write(dir, result, info, null);
    }

    /**
     * Writes every result file into {@code dir}, creating it, and last report.html, which embeds the plots.
     *
     * @param caseText the case in SI units and as written, for the report; null leaves it out
     * @throws UncheckedIOException when a file cannot be written
     */
    public static void write(Path dir, FilmResult result, RunInfo info, CaseText caseText) {
        try {
            Files.createDirectories(dir);
            ObjectNode summary = summary(result, info);
            Files.writeString(dir.resolve("summary.json"), JSON.writeValueAsString(summary) + "\n",
                    StandardCharsets.UTF_8);
            writeHistory(dir.resolve("history.csv"), result.history());
            writeProfiles(dir.resolve("profiles.csv"), result);
            if (info.plots()) {
                Plots.write(dir, result, info.analytic());
            }
            HtmlReport.write(dir, summary, caseText);
        } catch (IOException e) {
            throw new UncheckedIOException("cannot write results to " + dir + ": " + e.getMessage(), e);
        }
    }

    /** The summary as a JSON tree; NaN values become null. */
    public static ObjectNode summary(FilmResult result, RunInfo info) {
        FilmSummary s = result.summary();
        CaseNumbers n = result.numbers();
        ObjectNode root = JSON.createObjectNode();
        root.put("title", info.title());
        root.put("case_file", info.caseFileName());
        root.put("complete", result.complete());
        if (info.failure() != null) {
            root.put("failure", info.failure());
        }
        root.put("steady", s.steady());
        number(root, "end_time_s", Double.isFinite(s.endTime()) ? s.endTime() : Double.NaN);
        number(root, "wall_shear_stress_lower_Pa", s.wallShearStressLower());
        number(root, "wall_shear_stress_upper_Pa", s.wallShearStressUpper());
        number(root, "lower_wall_temperature_K", s.lowerWallTemperature());
        number(root, "upper_wall_temperature_K", s.upperWallTemperature());
        number(root, "max_temperature_K", s.maxTemperature());
        number(root, "mean_temperature_K", s.meanTemperature());
        number(root, "peak_temperature_K", s.peakTemperature());
        number(root, "settle_time_s", s.settleTime());
        number(root, "dissipation_W_per_m2", s.dissipation());
        number(root, "reynolds_number", n.reynoldsNumber());
        ArrayNode warnings = root.putArray("warnings");
        for (Warning w : result.warnings()) {
            warnings.add(w.message());
        }
        ArrayNode codes = root.putArray("warning_codes");
        for (Warning w : result.warnings()) {
            codes.add(w.code());
        }
        if (result.filmCase().isJournal()) {
            number(root, "friction_torque_N_m", s.frictionTorque());
            number(root, "friction_power_W", s.frictionPower());
            number(root, "petroff_torque_N_m", s.petroffTorque());
        }
        root.put("steps", s.steps());
        root.put("rejected_steps", s.rejectedSteps());
        root.put("newton_iterations", s.newtonIterations());
        number(root, "heat_flux_into_lower_wall_W_per_m2", s.heatFluxIntoLowerWall());
        number(root, "heat_flux_into_upper_wall_W_per_m2", s.heatFluxIntoUpperWall());
        number(root, "dissipated_energy_J_per_m2", s.dissipatedEnergy());
        number(root, "conducted_energy_J_per_m2", s.conductedEnergy());
        number(root, "stored_energy_change_J_per_m2", s.storedEnergyChange());
        number(root, "energy_imbalance", s.energyImbalance());
        number(root, "gap_m", n.gap());
        number(root, "depth_m", n.depth());
        root.put("grid_points", result.filmCase().grid().points());
        number(root, "tolerance", result.filmCase().tolerance());
        number(root, "reference_temperature_K", n.referenceTemperature());
        number(root, "density_kg_per_m3", n.density());
        number(root, "viscosity_Pa_s", n.viscosity());
        number(root, "kinematic_viscosity_m2_per_s", n.kinematicViscosity());
        number(root, "relative_wall_speed_m_per_s", n.relativeSpeed());
        number(root, "momentum_time_scale_s", n.momentumTimeScale());
        number(root, "momentum_time_scale_analytic_s", n.momentumTimeScaleAnalytic());
        number(root, "thermal_time_scale_s", n.thermalTimeScale());
        number(root, "prandtl_number", n.prandtlNumber());
        number(root, "penetration_depth_m", n.penetrationDepth());
        number(root, "viscosity_temperature_coefficient_per_K", n.viscosityTemperatureCoefficient());
        number(root, "nahme_number", n.nahmeNumber());
        number(root, "brinkman_number", n.brinkmanNumber());
        number(root, "shear_heating_rise_K", n.shearHeatingRise());
        number(root, "driven_wall_time_scale_s", n.drivenWallTimeScale());
        number(root, "time_to_99_percent_speed_s", s.speedRiseTime());
        number(root, "coast_down_time_s", s.coastDownTime());
        number(root, "max_temperature_limit_K", result.filmCase().limits().maxTemperature());
        if (info.analytic() != null) {
            info.analytic().addTo(root.putObject("analytic"));
        }
        root.put("filmshear_version", Version.get());
        root.put("caution", Caution.TEXT);
        return root;
    }

    static void number(ObjectNode node, String key, double value) {
        if (Double.isFinite(value)) {
            node.put(key, value);
        } else {
            node.putNull(key);
        }
    }

    private static void writeHistory(Path file, History h) throws IOException {
        History.Column[] order = {History.Column.TIME, History.Column.UPPER_WALL_VELOCITY,
                History.Column.WALL_SHEAR_STRESS_LOWER, History.Column.WALL_SHEAR_STRESS_UPPER,
                History.Column.MAX_TEMPERATURE, History.Column.DISSIPATION, History.Column.LOWER_WALL_VELOCITY,
                History.Column.MEAN_TEMPERATURE, History.Column.HEAT_FLUX_LOWER, History.Column.HEAT_FLUX_UPPER};
        try (BufferedWriter out = Files.newBufferedWriter(file, StandardCharsets.UTF_8)) {
            out.write(HISTORY_HEADER);
            out.write('\n');
            StringBuilder line = new StringBuilder(256);
            for (int r = 0; r < h.size(); r++) {
                line.setLength(0);
                for (int c = 0; c < order.length; c++) {
                    if (c > 0) {
                        line.append(',');
                    }
                    line.append(Csv.number(h.get(order[c], r)));
                }
                out.write(line.append('\n').toString());
            }
        }
    }

    private static void writeProfiles(Path file, FilmResult result) throws IOException {
        try (BufferedWriter out = Files.newBufferedWriter(file, StandardCharsets.UTF_8)) {
            out.write(PROFILES_HEADER);
            out.write('\n');
            StringBuilder line = new StringBuilder(128);
            for (Snapshot s : result.snapshots()) {
                double[] y = s.y();
                double[] u = s.velocity();
                double[] t = s.temperature();
                double[] mu = s.viscosity();
                for (int i = 0; i < y.length; i++) {
                    line.setLength(0);
                    line.append(Csv.number(s.time())).append(',').append(Csv.number(y[i])).append(',')
                            .append(Csv.number(u[i])).append(',').append(Csv.number(t[i])).append(',')
                            .append(Csv.number(mu[i])).append('\n');
                    out.write(line.toString());
                }
            }
        }
    }
}
