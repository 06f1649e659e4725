package dev.filmshear.cli.output;

/** The standing safety caution every report and the README carry. */
public final class Caution {
    /** One paragraph, plain text. */
    public static final String TEXT = "Caution: filmshear models an idealized one-dimensional laminar film between "
            + "parallel walls. Its results support, but do not replace, design to the applicable standards and "
            + "review by a qualified engineer; local codes and licensed engineering practice govern. A bearing "
            + "that overheats can seize and fail violently.";

    private Caution() {
    }
}
