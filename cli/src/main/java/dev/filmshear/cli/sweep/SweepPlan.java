package dev.filmshear.cli.sweep;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.node.ObjectNode;
import dev.filmshear.cli.input.CaseReader;
import dev.filmshear.cli.input.InputException;
import dev.filmshear.cli.input.Quantity;
import dev.filmshear.cli.input.QuantityKind;
import dev.filmshear.cli.input.TomlDocument;
import dev.filmshear.cli.input.UnitException;
import dev.filmshear.cli.input.Units;

import java.math.BigDecimal;
import java.math.MathContext;
import java.nio.charset.StandardCharsets;
import java.nio.file.Path;
import java.security.MessageDigest;
import java.security.NoSuchAlgorithmException;
import java.util.ArrayList;
import java.util.HexFormat;
import java.util.List;
import java.util.Map;
import java.util.Objects;

/**
 * A sweep plan read and checked: the base case, the axes, and the options of the maps.
 *
 * <p><b>File.</b>
 * <pre>
 * base = "startup.toml"                 # the case file, relative to the plan
 * [axes]                                # quoted dotted keys into the case, in the order of the columns
 * "geometry.gap" = { from = "10 um", to = "60 um", count = 6 }      # spacing = "linear" (default) | "log"
 * "upper_wall.velocity.to" = ["2 m/s", "10 m/s", "30 m/s"]          # listed values, used as written
 * [sweep]                               # optional
 * maps = ["max_temperature_K", "dissipation_W_per_m2"]              # results.csv columns to map
 * temperature_limit = "120 degC"        # draws where max_temperature_K exceeds it on the maps
 * </pre>
 * Any key of the case can be an axis, keys inside inline tables too ({@code upper_wall.velocity.to}); to
 * sweep over whole inline tables, list them. A range's values are written in the unit of {@code from}.
 *
 * <p><b>Case index.</b> The N = n_1 * n_2 * ... * n_m combinations are numbered in mixed radix with the
 * last axis fastest: index = sum_a d_a * prod_{b > a} n_b, where d_a is the position of the value on
 * axis a. The combination of an index is computed by division, so the plan is never expanded into a
 * list: a plan of a hundred million cases costs no more memory than one of ten.
 *
 * <p><b>Hash.</b> SHA-256 over a version tag, the base case's text, and for each axis its key and every
 * value as written (generated values included). The shard, the map options and the plan's comments and
 * layout are not part of it: they do not change any row of results.csv.
 *
 * <p><b>Names in rows.</b> Case messages name the plan by its file name and the base case as written in
 * {@code base}, so that a row never depends on the folder a sweep was started from.
 */
public final class SweepPlan {
    static final List<String> ROOT_KEYS = List.of("base", "axes", "sweep");
    static final List<String> RANGE_KEYS = List.of("from", "to", "count", "spacing");
    static final List<String> SWEEP_KEYS = List.of("maps", "temperature_limit");
    /** The largest plan: case indices are kept in a {@link java.util.BitSet}, indexed by int. */
    static final long MAX_CASES = Integer.MAX_VALUE;
    private static final String HASH_TAG = "filmshear sweep plan 1\n";

    private final String planPath;
    private final String planName;
    private final String planText;
    private final String base;
    private final int baseLine;
    private final TomlDocument baseDocument;
    private final List<Axis> axes;
    private final List<String> maps;
    private final double temperatureLimit;
    private final long caseCount;
    private final String hash;

    private SweepPlan(String planPath, String planName, String planText, String base, int baseLine,
                      TomlDocument baseDocument, List<Axis> axes, List<String> maps, double temperatureLimit) {
        this.planPath = planPath;
        this.planName = planName;
        this.planText = planText;
        this.base = base;
        this.baseLine = baseLine;
        this.baseDocument = baseDocument;
        this.axes = List.copyOf(axes);
        this.maps = List.copyOf(maps);
        this.temperatureLimit = temperatureLimit;
        long n = 1;
        for (Axis a : axes) {
            n *= a.size();
        }
        this.caseCount = n;
        this.hash = computeHash();
    }

    /**
     * Reads a plan file and its base case.
     *
     * @throws InputException when either is unreadable or the plan is malformed
     */
    public static SweepPlan read(Path planFile) {
        TomlDocument plan = TomlDocument.read(planFile);
        String planName = planFile.getFileName().toString();
        String base = baseOf(plan);
        Path baseFile = planFile.toAbsolutePath().getParent().resolve(base);
        TomlDocument baseRead;
        try {
            baseRead = TomlDocument.read(baseFile);
        } catch (InputException e) {
            if (!e.key().equals(TomlDocument.FILE_KEY)) {
                throw e;
            }
            throw new InputException(plan.fileName(), plan.line("base"), "base", "the base case cannot be read: "
                    + e.problem(), InputException.quote(base) + " (" + baseFile + ")",
                    "a case file, relative to the plan's folder", e);
        }
        // named as written in the plan, so that rows do not depend on the working directory
        return build(plan, planName, TomlDocument.parse(baseRead.text(), base));
    }

    /** A plan from its text and its base case's text (to rebuild a plan stored beside its results). */
    public static SweepPlan parse(String planText, String planName, String baseText) {
        TomlDocument plan = TomlDocument.parse(planText, planName);
        String base = baseOf(plan);
        return build(plan, planName, TomlDocument.parse(baseText, base));
    }

    private static String baseOf(TomlDocument plan) {
        ObjectNode root = plan.root();
        allowOnly(plan, "", root, ROOT_KEYS);
        JsonNode base = root.get("base");
        if (base == null) {
            throw new InputException(plan.fileName(), 0, "base", "missing key base at the top level", "nothing",
                    "the case file to start from, relative to the plan, such as base = \"startup.toml\"");
        }
        if (!base.isTextual() || base.textValue().isBlank()) {
            throw new InputException(plan.fileName(), plan.line("base"), "base", "not a file name",
                    TomlDocument.render(base), "a case file name in double quotes, such as \"startup.toml\"");
        }
        return base.textValue();
    }

    private static SweepPlan build(TomlDocument plan, String planName, TomlDocument baseDocument) {
        ObjectNode root = plan.root();
        JsonNode axesNode = root.get("axes");
        if (axesNode == null || !axesNode.isObject() || axesNode.isEmpty()) {
            throw new InputException(plan.fileName(), plan.line("axes"), "axes",
                    axesNode == null ? "missing table [axes]" : "[axes] has no axis",
                    axesNode == null ? "nothing" : TomlDocument.render(axesNode),
                    "an [axes] table of quoted dotted case keys, such as \"geometry.gap\" = [\"10 um\", \"20 um\"]");
        }
        List<Axis> axes = new ArrayList<>();
        for (Map.Entry<String, JsonNode> entry : axesNode.properties()) {
            axes.add(axis(plan, planName, entry.getKey(), entry.getValue()));
        }
        checkDistinct(plan, axes);
        long total = 1;
        for (Axis a : axes) {
            total *= a.size();
            if (total > MAX_CASES) {
                throw new InputException(plan.fileName(), plan.line("axes"), "axes", "too many combinations",
                        "more than " + MAX_CASES + " cases", "at most " + MAX_CASES + " cases per plan; split it");
            }
        }
        List<String> maps = List.of();
        double limit = Double.NaN;
        JsonNode sweep = root.get("sweep");
        if (sweep != null) {
            if (!sweep.isObject()) {
                throw new InputException(plan.fileName(), plan.line("sweep"), "sweep", "not a table",
                        TomlDocument.render(sweep), "a [sweep] table with keys " + String.join(", ", SWEEP_KEYS));
            }
            allowOnly(plan, "sweep", (ObjectNode) sweep, SWEEP_KEYS);
            maps = maps(plan, sweep.get("maps"));
            limit = temperatureLimit(plan, sweep.get("temperature_limit"));
        }
        return new SweepPlan(plan.fileName(), planName, plan.text(), baseDocument.fileName(), plan.line("base"),
                baseDocument, axes, maps, limit);
    }

    private static Axis axis(TomlDocument plan, String planName, String key, JsonNode spec) {
        String where = "axes." + key;
        int line = plan.line(where);
        if (key.isBlank() || key.contains("[") || key.startsWith(".") || key.endsWith(".") || key.contains("..")) {
            throw new InputException(plan.fileName(), line, where, "not a dotted key into the case",
                    InputException.quote(key), "keys such as \"geometry.gap\" or \"upper_wall.velocity.to\"");
        }
        if (spec.isArray()) {
            if (spec.isEmpty()) {
                throw new InputException(plan.fileName(), line, where, "an axis without values", "[]",
                        "one value or more, such as [\"10 um\", \"20 um\"]");
            }
            List<JsonNode> values = new ArrayList<>();
            spec.forEach(values::add);
            return new Axis.Listed(key, line, values);
        }
        if (spec.isObject()) {
            return range(plan, key, line, (ObjectNode) spec);
        }
        throw new InputException(plan.fileName(), line, where, "an axis needs several values",
                TomlDocument.render(spec), "a list such as [\"10 um\", \"20 um\"] or a range such as "
                + "{ from = \"10 um\", to = \"60 um\", count = 6 }");
    }

    private static Axis range(TomlDocument plan, String key, int line, ObjectNode spec) {
        String where = "axes." + key;
        for (Map.Entry<String, JsonNode> field : spec.properties()) {
            if (!RANGE_KEYS.contains(field.getKey())) {
                throw new InputException(plan.fileName(), plan.line(where + "." + field.getKey()),
                        where + "." + field.getKey(), "unknown key \"" + field.getKey() + "\" in a range",
                        field.getKey() + " = " + TomlDocument.render(field.getValue()),
                        "keys " + String.join(", ", RANGE_KEYS) + " (to sweep over inline tables, list them: "
                                + "[{ ... }, { ... }])");
            }
        }
        JsonNode countNode = spec.get("count");
        if (countNode == null) {
            throw new InputException(plan.fileName(), line, where + ".count", "missing key count in a range",
                    "nothing", "a whole number of values, 1 or more");
        }
        if (!countNode.isIntegralNumber() || !countNode.canConvertToInt() || countNode.intValue() < 1) {
            throw new InputException(plan.fileName(), plan.line(where + ".count"), where + ".count",
                    "not a count of values", TomlDocument.render(countNode), "a whole number, 1 or more");
        }
        int count = countNode.intValue();
        Axis.Spacing spacing = Axis.Spacing.LINEAR;
        JsonNode spacingNode = spec.get("spacing");
        if (spacingNode != null) {
            String s = spacingNode.isTextual() ? spacingNode.textValue() : "";
            if (s.equals("log")) {
                spacing = Axis.Spacing.LOG;
            } else if (!s.equals("linear")) {
                throw new InputException(plan.fileName(), plan.line(where + ".spacing"), where + ".spacing",
                        "unknown spacing", TomlDocument.render(spacingNode), "\"linear\" or \"log\"");
            }
        }
        Quantity from = quantity(plan, where, "from", spec.get("from"));
        Quantity to = quantity(plan, where, "to", spec.get("to"));
        double toNumber = inUnitOf(plan, where, from, to, spec.get("to"));
        if (spacing == Axis.Spacing.LOG && (from.number() == 0 || toNumber == 0
                || Math.signum(from.number()) != Math.signum(toNumber))) {
            throw new InputException(plan.fileName(), plan.line(where + ".spacing"), where + ".spacing",
                    "log spacing needs both ends on the same side of zero",
                    "from = " + TomlDocument.render(spec.get("from")) + ", to = " + TomlDocument.render(spec.get("to")),
                    "from and to both above zero or both below, or spacing = \"linear\"");
        }
        boolean integral = spacing == Axis.Spacing.LINEAR && spec.get("from").isIntegralNumber()
                && spec.get("to").isIntegralNumber()
                && (count == 1 || (spec.get("to").longValue() - spec.get("from").longValue()) % (count - 1) == 0);
        return new Axis.Range(key, line, from, toNumber, count, spacing, integral);
    }

    private static Quantity quantity(TomlDocument plan, String where, String name, JsonNode node) {
        String key = where + "." + name;
        String allowed = "a number in SI units or a quantity such as \"10 um\"";
        if (node == null) {
            throw new InputException(plan.fileName(), plan.line(where), key, "missing key " + name + " in a range",
                    "nothing", allowed);
        }
        if (node.isNumber()) {
            return Quantity.bare(node.doubleValue());
        }
        if (node.isTextual()) {
            try {
                return Units.parse(node.textValue());
            } catch (UnitException e) {
                throw new InputException(plan.fileName(), plan.line(key), key, e.problem(),
                        TomlDocument.render(node), e.allowed());
            }
        }
        throw new InputException(plan.fileName(), plan.line(key), key, "not a quantity", TomlDocument.render(node),
                allowed);
    }

    /** {@code to} as a number in the unit of {@code from} (SI when {@code from} is bare). */
    private static double inUnitOf(TomlDocument plan, String where, Quantity from, Quantity to, JsonNode written) {
        if (!from.unit().isNone() && !to.unit().isNone() && !from.dimension().equals(to.dimension())) {
            throw new InputException(plan.fileName(), plan.line(where + ".to"), where + ".to",
                    "unit \"" + to.unit().symbol() + "\" is " + to.dimension().describe() + ", not "
                            + from.dimension().describe() + " as from",
                    TomlDocument.render(written), "a quantity of the same dimension as from");
        }
        if (from.unit().isNone()) {
            return to.unit().isNone() ? to.number() : Axis.siOf(to);
        }
        // in decimal, so that "0.06 mm" in um is 60 and not 60.00000000000001
        BigDecimal number = decimal(to.number());
        BigDecimal toFactor = decimal(to.unit().factor());
        BigDecimal toOffset = decimal(to.unit().offset());
        if (to.unit().isNone()) {
            toFactor = BigDecimal.ONE;
            toOffset = BigDecimal.ZERO;
        } else if (to.unit().angular() && to.dimension().isNone()) {
            // an angle in SI is in radians (see Axis.siOf), so revolutions are no common ground here
            toFactor = toFactor.multiply(decimal(2 * Math.PI));
        }
        BigDecimal fromFactor = decimal(from.unit().factor());
        if (from.unit().angular() && from.dimension().isNone()) {
            fromFactor = fromFactor.multiply(decimal(2 * Math.PI));
        }
        return number.add(toOffset).multiply(toFactor).divide(fromFactor, MathContext.DECIMAL64)
                .subtract(decimal(from.unit().offset())).doubleValue();
    }

    private static BigDecimal decimal(double v) {
        return new BigDecimal(Double.toString(v));
    }

    private static void checkDistinct(TomlDocument plan, List<Axis> axes) {
        for (int i = 0; i < axes.size(); i++) {
            for (int j = 0; j < i; j++) {
                String a = axes.get(j).key();
                String b = axes.get(i).key();
                if (a.equals(b) || b.startsWith(a + ".") || a.startsWith(b + ".")) {
                    throw new InputException(plan.fileName(), axes.get(i).line(), "axes." + b,
                            "axis overlaps the axis " + a + " of line " + axes.get(j).line(), InputException.quote(b),
                            "axes that set different keys, none inside another");
                }
            }
        }
    }

    private static List<String> maps(TomlDocument plan, JsonNode node) {
        if (node == null) {
            return List.of();
        }
        String allowed = "a list of numeric columns of results.csv: " + String.join(", ", ResultColumns.SUMMARY_KEYS);
        if (!node.isArray()) {
            throw new InputException(plan.fileName(), plan.line("sweep.maps"), "sweep.maps", "not a list",
                    TomlDocument.render(node), allowed);
        }
        List<String> maps = new ArrayList<>();
        for (int i = 0; i < node.size(); i++) {
            JsonNode item = node.get(i);
            if (!item.isTextual() || !ResultColumns.SUMMARY_KEYS.contains(item.textValue())) {
                throw new InputException(plan.fileName(), plan.line("sweep.maps[" + i + "]"), "sweep.maps[" + i + "]",
                        "not a numeric column of results.csv", TomlDocument.render(item), allowed);
            }
            maps.add(item.textValue());
        }
        return maps;
    }

    private static double temperatureLimit(TomlDocument plan, JsonNode node) {
        if (node == null) {
            return Double.NaN;
        }
        QuantityKind kind = QuantityKind.ABSOLUTE_TEMPERATURE;
        try {
            Quantity q = node.isNumber() ? Quantity.bare(node.doubleValue())
                    : node.isTextual() ? Units.parse(node.textValue()) : null;
            if (q == null) {
                throw new UnitException("not a temperature", kind.expectation());
            }
            return kind.toSi(q);
        } catch (UnitException e) {
            throw new InputException(plan.fileName(), plan.line("sweep.temperature_limit"), "sweep.temperature_limit",
                    e.problem(), TomlDocument.render(node), e.allowed());
        }
    }

    private static void allowOnly(TomlDocument plan, String path, ObjectNode node, List<String> allowed) {
        for (Map.Entry<String, JsonNode> field : node.properties()) {
            if (!allowed.contains(field.getKey())) {
                String key = path.isEmpty() ? field.getKey() : path + "." + field.getKey();
                throw new InputException(plan.fileName(), plan.line(key), key, "unknown key \"" + field.getKey() + "\"",
                        field.getKey() + " = " + TomlDocument.render(field.getValue()),
                        "keys " + (path.isEmpty() ? "at the top level" : "in [" + path + "]") + ": "
                                + String.join(", ", allowed));
            }
        }
    }

    /**
     * Checks, on the first combination, that every axis key is one the base case allows and can hold:
     * a misspelt key or one that runs through a value that is not a table fails every case alike, so it is
     * refused before anything runs. Problems with values (a negative gap) belong to their combinations and
     * are left to them.
     *
     * @throws InputException at the plan's axis line
     */
    public void checkKeys(CaseReader reader) {
        TomlDocument first;
        try {
            first = caseDocument(0);
        } catch (InputException e) {
            throw atPlanPath(e);
        }
        try {
            reader.read(first);
        } catch (InputException e) {
            boolean unknownKey = e.problem().startsWith("unknown key");
            for (Axis a : axes) {
                if (unknownKey && (a.key().equals(e.key()) || a.key().startsWith(e.key() + "."))) {
                    throw atPlanPath(e);
                }
            }
        }
    }

    private InputException atPlanPath(InputException e) {
        String file = e.file().equals(planName) ? planPath : e.file();
        return new InputException(file, e.line(), e.key(), e.problem(), e.given(), e.allowed(), e);
    }

    /** The case file of combination {@code index}: the base with every axis's value as an override. */
    public TomlDocument caseDocument(long index) {
        int[] digits = digits(index);
        TomlDocument doc = baseDocument;
        for (int a = 0; a < axes.size(); a++) {
            Axis axis = axes.get(a);
            doc = doc.withOverride(axis.key(), axis.value(digits[a]), planName, axis.line());
        }
        return doc;
    }

    /** The position on each axis of combination {@code index} (mixed radix, last axis fastest). */
    public int[] digits(long index) {
        Objects.checkIndex(index, caseCount);
        int[] digits = new int[axes.size()];
        long rest = index;
        for (int a = axes.size() - 1; a >= 0; a--) {
            int n = axes.get(a).size();
            digits[a] = (int) (rest % n);
            rest /= n;
        }
        return digits;
    }

    private String computeHash() {
        MessageDigest digest;
        try {
            digest = MessageDigest.getInstance("SHA-256");
        } catch (NoSuchAlgorithmException e) {
            throw new IllegalStateException("every Java platform has SHA-256", e);
        }
        update(digest, HASH_TAG);
        update(digest, "base\n" + baseDocument.text() + "\n");
        for (Axis a : axes) {
            update(digest, "axis " + a.key() + "\n");
            for (int i = 0; i < a.size(); i++) {
                update(digest, a.written(i) + "\n");
            }
        }
        return HexFormat.of().formatHex(digest.digest());
    }

    private static void update(MessageDigest digest, String text) {
        digest.update(text.getBytes(StandardCharsets.UTF_8));
    }

    /** The plan as named on the command line (for messages). */
    public String planPath() {
        return planPath;
    }

    /** The plan's file name. */
    public String planName() {
        return planName;
    }

    /** The plan's text as read. */
    public String planText() {
        return planText;
    }

    /** The base case as written in the plan. */
    public String base() {
        return base;
    }

    /** The plan's line where the base case is named. */
    public int baseLine() {
        return baseLine;
    }

    /** The base case's text. */
    public String baseText() {
        return baseDocument.text();
    }

    /** The axes in plan order. */
    public List<Axis> axes() {
        return axes;
    }

    /** The axis keys in plan order. */
    public List<String> axisKeys() {
        return axes.stream().map(Axis::key).toList();
    }

    /** The columns of results.csv for this plan. */
    public ResultColumns columns() {
        return new ResultColumns(axisKeys());
    }

    /** The columns chosen for maps, empty for the default choice. */
    public List<String> maps() {
        return maps;
    }

    /** The temperature limit drawn on the maps (K), NaN when none. */
    public double temperatureLimit() {
        return temperatureLimit;
    }

    /** The number of combinations. */
    public long caseCount() {
        return caseCount;
    }

    /** The plan's SHA-256 (hexadecimal). */
    public String hash() {
        return hash;
    }
}
