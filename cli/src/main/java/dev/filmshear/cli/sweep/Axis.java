package dev.filmshear.cli.sweep;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.node.DoubleNode;
import com.fasterxml.jackson.databind.node.LongNode;
import com.fasterxml.jackson.databind.node.TextNode;
import dev.filmshear.cli.input.Quantity;
import dev.filmshear.cli.input.TomlDocument;
import dev.filmshear.cli.input.UnitException;
import dev.filmshear.cli.input.Units;

import java.math.BigDecimal;
import java.math.MathContext;
import java.math.RoundingMode;
import java.util.List;
import java.util.Objects;

/**
 * One axis of a sweep plan: a dotted case key and the values it takes, in plan order.
 *
 * <p>Values are produced on demand from their index, so that a range of a million values costs no
 * memory. Each value is the TOML value written into the case as an override ({@link #value(int)}); its
 * column in results.csv is its SI value ({@link #csv(int)}, see {@link #csv(JsonNode)} for the rule).
 */
public sealed interface Axis permits Axis.Listed, Axis.Range {

    /** How the values were given: listed one by one, or generated from a range. */
    enum Spacing {
        /** Written out in a list. */
        LIST,
        /** {@code from + (to - from) * i / (count - 1)}. */
        LINEAR,
        /** {@code from * (to / from)^(i / (count - 1))}: equal ratios between neighbours. */
        LOG
    }

    /** The dotted case key the axis sets. */
    String key();

    /** The plan's line where the axis is written. */
    int line();

    /** How many values. */
    int size();

    /** How the values were given. */
    Spacing spacing();

    /** The override written into the case for value {@code i} (a fresh node). */
    JsonNode value(int i);

    /** Value {@code i} as written in TOML, for the plan hash and the report. */
    default String written(int i) {
        return TomlDocument.render(value(i));
    }

    /** Value {@code i} in SI units for results.csv. */
    default String csv(int i) {
        return csv(value(i));
    }

    /** Value {@code i} in SI units as a number, NaN when it is not a number (a string such as a law name). */
    default double si(int i) {
        return si(value(i));
    }

    /**
     * The column text of a value: a bare number as written (it is SI already); a {@code "NUMBER UNIT"}
     * string in SI, where a lone {@code degC} or {@code degF} is read as an absolute temperature, an angle
     * ({@code deg}, {@code rad}, {@code rev}) in radians and a rotational speed ({@code rpm}) in rev/s, as
     * the case reader uses them; anything else (a law name, a boolean, an inline table) as written.
     */
    static String csv(JsonNode value) {
        if (value.isIntegralNumber()) {
            return value.asText();
        }
        double si = si(value);
        return Double.isNaN(si) ? (value.isTextual() ? value.textValue() : TomlDocument.render(value))
                : Double.toString(si);
    }

    /** The SI value of a number or quantity string (rule of {@link #csv(JsonNode)}), NaN otherwise. */
    static double si(JsonNode value) {
        if (value.isNumber()) {
            return value.doubleValue();
        }
        if (!value.isTextual()) {
            return Double.NaN;
        }
        Quantity q;
        try {
            q = Units.parse(value.textValue());
        } catch (UnitException notAQuantity) {
            // a word such as a law name or "steady": a category, not a number
            return Double.NaN;
        }
        return siOf(q);
    }

    /** SI value of a quantity: absolute for a shifted temperature scale, radians for an angle. */
    static double siOf(Quantity q) {
        if (q.unit().offset() != 0) {
            return q.absolute();
        }
        if (q.unit().angular() && q.dimension().isNone()) {
            return q.interval() * 2 * Math.PI;
        }
        return q.interval();
    }

    /**
     * Values listed in the plan, used as written.
     *
     * @param key dotted case key
     * @param line plan line
     * @param values the values (copied)
     */
    record Listed(String key, int line, List<JsonNode> values) implements Axis {
        public Listed {
            Objects.requireNonNull(key, "key");
            values = values.stream().<JsonNode>map(JsonNode::deepCopy).toList();
        }

        @Override
        public int size() {
            return values.size();
        }

        @Override
        public Spacing spacing() {
            return Spacing.LIST;
        }

        @Override
        public JsonNode value(int i) {
            return values.get(i).deepCopy();
        }

        @Override
        public List<JsonNode> values() {
            return values.stream().<JsonNode>map(JsonNode::deepCopy).toList();
        }
    }

    /**
     * Values generated between two quantities, written in the unit of {@code from}. Generated numbers are
     * rounded to {@value #DIGITS} significant digits so that the case file gets readable values such as
     * {@code "15 um"}; the ends are exactly {@code from} and {@code to}.
     *
     * @param key dotted case key
     * @param line plan line
     * @param from first value as written
     * @param to last value, converted to the unit of {@code from}
     * @param count number of values, 1 or more ({@code from} alone when 1)
     * @param spacing {@link Spacing#LINEAR} or {@link Spacing#LOG}
     * @param integral true to write whole numbers (both ends bare integers and every step whole)
     */
    record Range(String key, int line, Quantity from, double to, int count, Spacing spacing, boolean integral)
            implements Axis {
        /** Significant digits kept in generated values: far below any tolerance a case can ask for. */
        static final int DIGITS = 12;

        public Range {
            Objects.requireNonNull(key, "key");
            Objects.requireNonNull(from, "from");
            Objects.requireNonNull(spacing, "spacing");
        }

        @Override
        public int size() {
            return count;
        }

        /** The number (in the unit of {@code from}) of value {@code i}. */
        double number(int i) {
            double a = from.number();
            if (i == 0 || count == 1) {
                return a;
            }
            if (i == count - 1) {
                return to;
            }
            double fraction = (double) i / (count - 1);
            double v = spacing == Spacing.LOG
                    ? Math.signum(a) * Math.exp(Math.log(Math.abs(a)) + fraction * Math.log(to / a))
                    : a + (to - a) * fraction;
            return new BigDecimal(v).round(new MathContext(DIGITS, RoundingMode.HALF_EVEN)).doubleValue();
        }

        @Override
        public JsonNode value(int i) {
            double v = number(i);
            if (integral) {
                return LongNode.valueOf(Math.round(v));
            }
            if (from.unit().isNone()) {
                return DoubleNode.valueOf(v);
            }
            return TextNode.valueOf(plain(v) + " " + from.unit().symbol());
        }

        /** A short decimal that reads back to the same double. */
        static String plain(double v) {
            BigDecimal d = new BigDecimal(Double.toString(v)).stripTrailingZeros();
            double a = Math.abs(v);
            return a == 0 ? "0" : a >= 1e-4 && a < 1e15 ? d.toPlainString() : d.toString();
        }
    }
}
