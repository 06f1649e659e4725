package dev.filmshear.cli.fit;

import dev.filmshear.cli.input.InputException;
import dev.filmshear.cli.input.Quantity;
import dev.filmshear.cli.input.QuantityKind;
import dev.filmshear.cli.input.Unit;
import dev.filmshear.cli.input.UnitException;
import dev.filmshear.cli.input.Units;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import java.util.regex.Pattern;

/**
 * Reads a file of measured viscosities.
 *
 * <p><b>Format.</b> Comma-separated UTF-8 text. {@code #} starts a comment that runs to the end of the
 * line; blank lines are skipped. The first other line is the header, naming two columns, each with its
 * unit in parentheses or square brackets after the name: first the temperature, then the viscosity.
 * <pre>
 *   # SAE 30 sample, rotational viscometer
 *   temperature (degC), viscosity (mPa*s)
 *   20, 290
 *   40, 97.2
 * </pre>
 * or {@code T [K], nu [cSt]}. The units are the case file's ({@link Units}): the temperature in
 * {@code K}, {@code degC} or {@code degF} (absolute temperatures), the viscosity dynamic ({@code Pa*s},
 * {@code mPa*s}, {@code cP}) or kinematic ({@code cSt}, {@code mm^2/s}, {@code m^2/s}). Each following
 * line is one point: two plain numbers in those units. A cell may be wrapped in double quotes (as
 * spreadsheets export it); a comma inside a cell is not supported.
 *
 * <p><b>Errors.</b> Every problem is an {@link InputException} naming the file, the line, the column
 * (its name as the key) and the value: a header without two named columns with units, an unknown unit
 * or one of the wrong dimension, a row without exactly two cells, a cell that is not a plain number,
 * a temperature at or below absolute zero, a viscosity not above zero, a temperature given twice.
 * Whether there are enough points depends on the law and is checked by the command.
 *
 * <p>Written by hand rather than with a CSV library: splitting two columns on a comma is one line, and the
 * work here is in the checks and their messages (line, column, value), which a library would leave to us
 * anyway; quoted cells with commas inside, the one thing a library adds, do not occur in this format.
 */
public final class ViscosityCsv {
    /** Key of messages about the header as a whole. */
    public static final String HEADER_KEY = "(header)";
    /** Key of messages about a row as a whole. */
    public static final String ROW_KEY = "(row)";
    /** Key of messages about the file as a whole. */
    public static final String FILE_KEY = "(file)";

    private static final String HEADER_EXAMPLE = "a header such as \"temperature (degC), viscosity (cSt)\" or "
            + "\"T [K], mu [mPa*s]\"";
    /** A plain decimal number, as in the case file's quantities (no NaN, Infinity, hex or digit separators). */
    private static final Pattern NUMBER = Pattern.compile("[+-]?(?:\\d+(?:\\.\\d*)?|\\.\\d+)(?:[eE][+-]?\\d+)?");

    private ViscosityCsv() {
    }

    /**
     * Reads a data file (UTF-8); messages name the path as given.
     *
     * @throws InputException for a missing or unreadable file and every bad datum
     */
    public static ViscosityData read(Path file) {
        return parse(InputException.readText(file, FILE_KEY, "CSV file"), file.toString());
    }

    /**
     * Reads data from text; messages name {@code fileName}.
     *
     * @throws InputException for every bad datum
     */
    public static ViscosityData parse(String text, String fileName) {
        String[] lines = text.split("\r\n|\r|\n", -1);
        ViscosityData.Column temperature = null;
        ViscosityData.Column viscosity = null;
        int headerLine = 0;
        List<ViscosityData.Point> points = new ArrayList<>();
        Map<Double, Integer> seen = new HashMap<>();
        for (int index = 0; index < lines.length; index++) {
            int lineNumber = index + 1;
            String raw = index == 0 && lines[0].startsWith("\uFEFF") ? lines[0].substring(1) : lines[index];
            int hash = raw.indexOf('#');
            String content = (hash >= 0 ? raw.substring(0, hash) : raw).strip();
            if (content.isEmpty()) {
                continue;
            }
            List<String> cells = cells(content);
            if (temperature == null) {
                headerLine = lineNumber;
                if (cells.size() != 2) {
                    throw new InputException(fileName, lineNumber, HEADER_KEY,
                            "the header must name two columns, the temperature and then the viscosity",
                            cells.size() + (cells.size() == 1 ? " column: " : " columns: ")
                                    + InputException.quote(content),
                            HEADER_EXAMPLE);
                }
                temperature = column(fileName, lineNumber, cells.get(0), 1, QuantityKind.ABSOLUTE_TEMPERATURE);
                viscosity = column(fileName, lineNumber, cells.get(1), 2, QuantityKind.DYNAMIC_OR_KINEMATIC_VISCOSITY);
                continue;
            }
            if (cells.size() > 2) {
                throw new InputException(fileName, lineNumber, ROW_KEY, "a row holds two values, the temperature "
                        + "and the viscosity", cells.size() + " cells: " + InputException.quote(content),
                        "two numbers separated by a comma, in the header's units");
            }
            String temperatureCell = cells.get(0);
            String viscosityCell = cells.size() > 1 ? cells.get(1) : "";
            double writtenT = number(fileName, lineNumber, temperature, temperatureCell);
            double writtenMu = number(fileName, lineNumber, viscosity, viscosityCell);
            double t = temperatureSi(fileName, lineNumber, temperature, temperatureCell, writtenT);
            if (!(writtenMu > 0)) {
                throw new InputException(fileName, lineNumber, viscosity.key(), "a viscosity must be above zero",
                        InputException.quote(viscosityCell), "a positive number in " + viscosity.unit().symbol());
            }
            double value = new Quantity(writtenMu, viscosity.unit()).interval();
            if (!(value > 0) || !Double.isFinite(value)) {
                throw new InputException(fileName, lineNumber, viscosity.key(), "number out of range in SI units",
                        InputException.quote(viscosityCell), "a viscosity between about 1e-300 and 1e300 in SI units");
            }
            Integer first = seen.putIfAbsent(t, lineNumber);
            if (first != null) {
                throw new InputException(fileName, lineNumber, temperature.key(), "temperature given twice (first at "
                        + "line " + first + ")", InputException.quote(temperatureCell),
                        "each temperature once; average repeated measurements at one temperature before fitting");
            }
            points.add(new ViscosityData.Point(lineNumber, t, value, writtenT, writtenMu));
        }
        if (temperature == null) {
            throw new InputException(fileName, 0, HEADER_KEY, "no header line: the file holds only comments and "
                    + "blank lines", "no header", HEADER_EXAMPLE + " followed by one row per point");
        }
        return new ViscosityData(fileName, headerLine, temperature, viscosity, points);
    }

    /** The comma-separated cells of a line, stripped, with one pair of enclosing double quotes removed. */
    private static List<String> cells(String content) {
        List<String> cells = new ArrayList<>();
        for (String cell : content.split(",", -1)) {
            String c = cell.strip();
            if (c.length() >= 2 && c.startsWith("\"") && c.endsWith("\"")) {
                c = c.substring(1, c.length() - 1).strip();
            }
            cells.add(c);
        }
        return cells;
    }

    /** A header cell {@code name (unit)} or {@code name [unit]}: the unit is the last bracketed group. */
    private static ViscosityData.Column column(String fileName, int line, String cell, int position, QuantityKind kind) {
        String fallbackKey = "column " + position;
        char last = cell.isEmpty() ? ' ' : cell.charAt(cell.length() - 1);
        char open = last == ')' ? '(' : last == ']' ? '[' : 0;
        int start = -1;
        if (open != 0) {
            int depth = 0;
            for (int i = cell.length() - 1; i >= 0; i--) {
                char c = cell.charAt(i);
                if (c == last) {
                    depth++;
                } else if (c == open && --depth == 0) {
                    start = i;
                    break;
                }
            }
        }
        String what = position == 1 ? "temperature" : "viscosity";
        String example = position == 1 ? "\"temperature (degC)\" or \"T [K]\"" : "\"viscosity (cSt)\" or \"mu [mPa*s]\"";
        if (start < 0) {
            String key = cell.isEmpty() ? fallbackKey : cell;
            throw new InputException(fileName, line, key, "no unit in the header of the " + what + " column",
                    InputException.quote(cell), "the name followed by its unit in parentheses or brackets, such as "
                            + example);
        }
        String name = cell.substring(0, start).strip();
        String key = name.isEmpty() ? fallbackKey : name;
        String unitText = cell.substring(start + 1, cell.length() - 1).strip();
        Unit unit;
        try {
            unit = Units.unit(unitText);
        } catch (UnitException e) {
            throw new InputException(fileName, line, key, e.problem(), InputException.quote(unitText), e.allowed(), e);
        }
        if (!kind.dimensions().contains(unit.dimension())) {
            throw new InputException(fileName, line, key, "the " + what + " column's unit \"" + unitText + "\" is "
                    + unit.dimension().describe() + ", not " + kind.noun(), InputException.quote(unitText),
                    position == 1 ? "a temperature unit: K, degC or degF (the first column is the temperature)"
                            : "a dynamic viscosity unit (Pa*s, mPa*s, cP) or a kinematic one (cSt, mm^2/s, m^2/s)");
        }
        return new ViscosityData.Column(key, unit);
    }

    private static double number(String fileName, int line, ViscosityData.Column column, String cell) {
        if (cell.isEmpty()) {
            throw new InputException(fileName, line, column.key(), "missing value", "nothing",
                    "a number in " + column.unit().symbol());
        }
        if (!NUMBER.matcher(cell).matches()) {
            throw new InputException(fileName, line, column.key(), "not a number", InputException.quote(cell),
                    "a plain number in the header's unit " + column.unit().symbol() + ", such as 40 or 1.25e-3");
        }
        double value = Double.parseDouble(cell);
        if (!Double.isFinite(value)) {
            throw new InputException(fileName, line, column.key(), "number out of range", InputException.quote(cell),
                    "a finite number");
        }
        return value;
    }

    private static double temperatureSi(String fileName, int line, ViscosityData.Column column, String cell,
                                        double written) {
        double t;
        try {
            t = QuantityKind.ABSOLUTE_TEMPERATURE.toSi(new Quantity(written, column.unit()));
        } catch (UnitException e) {
            throw new InputException(fileName, line, column.key(), e.problem(), InputException.quote(cell),
                    e.allowed(), e);
        }
        if (!(t > 0)) {
            throw new InputException(fileName, line, column.key(), "a temperature must lie above absolute zero",
                    InputException.quote(cell), "a temperature above 0 K (-273.15 degC, -459.67 degF)");
        }
        return t;
    }
}
