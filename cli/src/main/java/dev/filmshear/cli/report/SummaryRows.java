package dev.filmshear.cli.report;

import com.fasterxml.jackson.databind.JsonNode;

import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;
import java.util.Map;
import java.util.Set;

/**
 * The summary tree as labelled rows, read generically: a row's label comes from its key (underscores to spaces,
 * the unit suffix dropped, names of published numbers capitalized), its unit from the key's suffix
 * ({@link ValueFormat}), its group from words in the key. A key added to {@code summary.json} later therefore
 * appears in the report without a change here; a key no rule places lands under "Other results".
 */
final class SummaryRows {

    /** The groups of the key results table, in the order the page shows them. */
    enum Group {
        SHEAR("Wall shear stress"),
        JOURNAL("Journal bearing"),
        TEMPERATURE("Temperatures and dissipation"),
        FLOW("Film, fluid and flow"),
        TIME("Time scales"),
        HEATING("Heating numbers"),
        ENERGY("Energy balance"),
        RUN("Run"),
        OTHER("Other results");

        private final String title;

        Group(String title) {
            this.title = title;
        }

        String title() {
            return title;
        }
    }

    /**
     * One line of a results table.
     *
     * @param group where it belongs
     * @param key the summary key (dotted for a key inside a nested object)
     * @param label the quantity in words
     * @param value the value with its unit, as plain text (not yet escaped)
     */
    record Row(Group group, String key, String label, String value) {
    }

    /** Keys the page shows in their own places (title block, warnings, comparison, caution), not in the table. */
    static final Set<String> SHOWN_ELSEWHERE = Set.of("title", "case_file", "complete", "failure", "warnings",
            "warning_codes", "analytic", "filmshear_version", "caution");

    /** Words in keys that are the names of people (published dimensionless numbers and laws). */
    private static final Map<String, String> NAMES = Map.of("reynolds", "Reynolds", "nahme", "Nahme",
            "brinkman", "Brinkman", "prandtl", "Prandtl", "petroff", "Petroff", "sommerfeld", "Sommerfeld",
            "nusselt", "Nusselt", "peclet", "Péclet", "newton", "Newton");

    private SummaryRows() {
    }

    /** The tree's values in its own order, without null values or the top-level keys in {@code skip}. */
    static List<Row> rows(JsonNode tree, Set<String> skip) {
        List<Row> rows = new ArrayList<>();
        collect(tree, "", "", skip, rows);
        return rows;
    }

    /** The summary's results for the key results table: {@link #SHOWN_ELSEWHERE} left out, in page order. */
    static List<Row> keyResults(JsonNode summary) {
        List<Row> rows = rows(summary, SHOWN_ELSEWHERE);
        // a stable sort: inside a group the summary's own order stays
        rows.sort(Comparator.comparing(Row::group));
        return rows;
    }

    private static void collect(JsonNode node, String keyPrefix, String labelPrefix, Set<String> skip,
                                List<Row> rows) {
        for (Map.Entry<String, JsonNode> field : node.properties()) {
            String key = field.getKey();
            JsonNode value = field.getValue();
            if (skip.contains(key) || value == null || value.isNull() || value.isMissingNode()) {
                continue;
            }
            if (value.isObject()) {
                collect(value, keyPrefix + key + ".", labelPrefix + label(key) + ": ", Set.of(), rows);
            } else {
                String lowered = labelPrefix.isEmpty() ? label(key) : labelPrefix + decapitalize(label(key));
                rows.add(new Row(groupOf(key), keyPrefix + key, lowered, value(key, value)));
            }
        }
    }

    /** The group a key belongs to, by the words in it. */
    static Group groupOf(String key) {
        if (key.startsWith("journal_") || key.startsWith("friction_") || key.startsWith("petroff_")
                || key.startsWith("time_to_") || key.startsWith("coast_down_")) {
            return Group.JOURNAL;
        }
        if (key.contains("shear_stress")) {
            return Group.SHEAR;
        }
        if (key.contains("nahme") || key.contains("brinkman") || key.contains("prandtl")
                || key.contains("shear_heating") || key.startsWith("viscosity_temperature_coefficient")) {
            return Group.HEATING;
        }
        if (key.contains("energy") || key.startsWith("heat_flux")) {
            return Group.ENERGY;
        }
        if (key.contains("time_scale")) {
            return Group.TIME;
        }
        if (key.endsWith("_K") || key.startsWith("dissipation")) {
            return Group.TEMPERATURE;
        }
        if (key.contains("reynolds") || key.startsWith("density") || key.contains("viscosity")
                || key.contains("speed") || key.startsWith("gap") || key.contains("depth")) {
            return Group.FLOW;
        }
        if (key.contains("steps") || key.contains("iterations") || key.equals("grid_points")
                || key.equals("tolerance") || key.equals("steady") || key.equals("end_time_s")) {
            return Group.RUN;
        }
        return Group.OTHER;
    }

    /** The quantity a key names, in words. */
    static String label(String key) {
        List<String> words = new ArrayList<>(List.of(ValueFormat.stem(key).split("_")));
        words.removeIf(String::isEmpty);
        if (words.isEmpty()) {
            return key;
        }
        // "wall_shear_stress_lower_Pa": the trailing word says which wall
        String last = words.get(words.size() - 1);
        String which = "";
        if ((last.equals("lower") || last.equals("upper")) && words.size() > 1) {
            words.remove(words.size() - 1);
            which = ", " + last + " wall";
        }
        StringBuilder label = new StringBuilder();
        for (String w : words) {
            if (label.length() > 0) {
                label.append(' ');
            }
            label.append(NAMES.getOrDefault(w, w));
        }
        label.setCharAt(0, Character.toUpperCase(label.charAt(0)));
        return label + which;
    }

    private static String decapitalize(String label) {
        // keep a name's capital ("Reynolds number") but lower an ordinary first word
        String first = label.split(" ", 2)[0];
        return NAMES.containsValue(first) ? label : Character.toLowerCase(label.charAt(0)) + label.substring(1);
    }

    /** A value as plain text with its unit. */
    static String value(String key, JsonNode value) {
        if (value.isBoolean()) {
            return value.booleanValue() ? "yes" : "no";
        }
        ValueFormat.Unit unit = ValueFormat.unitOf(key);
        if (value.isIntegralNumber()) {
            // counts (steps, grid points) are exact; rounding them to five figures would hide information
            return unit.symbol().isEmpty() ? value.asText() : value.asText() + "\u00a0" + unit.symbol();
        }
        if (value.isNumber()) {
            double x = value.doubleValue();
            return unit.suffix().equals("_K") && key.contains("temperature") && !key.contains("rise")
                    ? ValueFormat.temperature(x) : ValueFormat.quantity(x, unit);
        }
        if (value.isArray()) {
            List<String> parts = new ArrayList<>();
            for (JsonNode element : value) {
                if (!element.isNull()) {
                    parts.add(value(key, element));
                }
            }
            return parts.isEmpty() ? "none" : String.join("; ", parts);
        }
        return value.asText();
    }
}
