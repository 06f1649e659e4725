package dev.filmshear.cli.output;

/** Number formatting shared by the CSV and JSON writers: shortest round-trip decimal, empty for NaN. */
final class Csv {
    private Csv() {
    }

    /** The value as the shortest decimal that reads back to the same double; empty when not a number. */
    static String number(double value) {
        if (Double.isNaN(value)) {
            return "";
        }
        if (Double.isInfinite(value)) {
            return value > 0 ? "inf" : "-inf";
        }
        return Double.toString(value);
    }
}
