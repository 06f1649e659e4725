package dev.filmshear.cli;

/** Numbers and times for the console, to four significant figures. */
final class Format {
    private Format() {
    }

    static String number(double value) {
        if (Double.isNaN(value)) {
            return "-";
        }
        return String.format("%.4g", value);
    }

    static String time(double t) {
        if (Double.isInfinite(t)) {
            return "steady";
        }
        double a = Math.abs(t);
        if (a >= 1) {
            return String.format("%.4g s", t);
        }
        if (a >= 1e-3) {
            return String.format("%.4g ms", t * 1e3);
        }
        if (a >= 1e-6) {
            return String.format("%.4g us", t * 1e6);
        }
        return String.format("%.4g ns", t * 1e9);
    }
}
