package dev.filmshear.cli.sweep;

import java.util.ArrayList;
import java.util.List;

/**
 * The columns of results.csv, in their fixed order:
 * <ol>
 *   <li>one column per axis, named by its dotted case key, holding the axis value in SI units;</li>
 *   <li>{@code status} ({@code ok} or {@code failed}) and {@code message} (empty when ok; otherwise the
 *       failure on one line) as the contract fixes them;</li>
 *   <li>every numeric key of summary.json, in the order of {@link #SUMMARY_KEYS}, as the contract fixes
 *       them;</li>
 *   <li>three extensions, after the contract's columns so those keep their places: {@code warning_codes}
 *       (the codes of the case's warnings joined by {@code ;}), {@code steady} ({@code true} when the film
 *       had settled) and {@code case_index}, the case's position in the plan, last.</li>
 * </ol>
 * Numbers are written as the shortest decimal that reads back to the same double; a value that is not
 * defined for a case (the upper wall of a semi-infinite film, temperatures of an isothermal one) is an
 * empty field.
 */
public final class ResultColumns {

    /**
     * Every numeric key of summary.json ({@code ResultWriter.summary}), in column order: the contract's
     * keys first, then the run statistics and derived numbers. The journal-mode keys of the contract are
     * listed ahead of the writer providing them, so that their columns exist (empty) from the start. A
     * test fails when the summary gains a numeric key that is missing here.
     */
    public static final List<String> SUMMARY_KEYS = List.of(
            "end_time_s",
            "wall_shear_stress_lower_Pa",
            "wall_shear_stress_upper_Pa",
            "lower_wall_temperature_K",
            "upper_wall_temperature_K",
            "max_temperature_K",
            "mean_temperature_K",
            "dissipation_W_per_m2",
            "reynolds_number",
            "peak_temperature_K",
            "settle_time_s",
            "friction_torque_N_m",
            "friction_power_W",
            "petroff_torque_N_m",
            "steps",
            "rejected_steps",
            "newton_iterations",
            "heat_flux_into_lower_wall_W_per_m2",
            "heat_flux_into_upper_wall_W_per_m2",
            "dissipated_energy_J_per_m2",
            "conducted_energy_J_per_m2",
            "stored_energy_change_J_per_m2",
            "energy_imbalance",
            "gap_m",
            "depth_m",
            "grid_points",
            "tolerance",
            "reference_temperature_K",
            "density_kg_per_m3",
            "viscosity_Pa_s",
            "viscosity_temperature_coefficient_per_K",
            "nahme_number",
            "brinkman_number",
            "shear_heating_rise_K",
            "driven_wall_time_scale_s",
            "time_to_99_percent_speed_s",
            "coast_down_time_s",
            "max_temperature_limit_K",
            "kinematic_viscosity_m2_per_s",
            "relative_wall_speed_m_per_s",
            "momentum_time_scale_s",
            "momentum_time_scale_analytic_s",
            "thermal_time_scale_s",
            "prandtl_number",
            "penetration_depth_m");

    /** The status of a case that finished. */
    public static final String OK = "ok";
    /** The status of a case that did not. */
    public static final String FAILED = "failed";

    static final String STATUS = "status";
    static final String MESSAGE = "message";
    static final String WARNING_CODES = "warning_codes";
    static final String STEADY = "steady";
    static final String CASE_INDEX = "case_index";

    private final List<String> names;
    private final int axes;

    /** The columns for a plan with these axis keys. */
    public ResultColumns(List<String> axisKeys) {
        this.axes = axisKeys.size();
        List<String> all = new ArrayList<>(axisKeys);
        all.add(STATUS);
        all.add(MESSAGE);
        all.addAll(SUMMARY_KEYS);
        all.add(WARNING_CODES);
        all.add(STEADY);
        all.add(CASE_INDEX);
        this.names = List.copyOf(all);
    }

    /** Every column name in order. */
    public List<String> names() {
        return names;
    }

    /** The number of columns. */
    public int size() {
        return names.size();
    }

    /** The header line (without its newline). */
    public String header() {
        return String.join(",", names);
    }

    /** The position of the status column. */
    public int statusColumn() {
        return axes;
    }

    /** The position of the message column. */
    public int messageColumn() {
        return axes + 1;
    }

    /** The position of the warning codes column. */
    public int warningColumn() {
        return names.size() - 3;
    }

    /** The position of the case index column (the last). */
    public int indexColumn() {
        return names.size() - 1;
    }

    /** The position of a column, or -1. */
    public int indexOf(String name) {
        return names.indexOf(name);
    }
}
