package dev.filmshear.cli.input;

import java.util.Objects;

/**
 * A number with its unit, as written in a case file ({@code "25 um"}), before the key it belongs to has
 * said what it expects. {@link QuantityKind#toSi(Quantity)} turns it into the SI value for that key.
 *
 * @param number the number as written
 * @param unit the unit as written ({@link Unit#NONE} for a bare number, which is already SI)
 */
public record Quantity(double number, Unit unit) {

    public Quantity {
        Objects.requireNonNull(unit, "unit");
    }

    /** A bare number, already in SI units. */
    public static Quantity bare(double number) {
        return new Quantity(number, Unit.NONE);
    }

    /** The dimension of the unit written (none for a bare number). */
    public Dimension dimension() {
        return unit.dimension();
    }

    /**
     * number * factor: the SI value of an interval (a difference, or any non-temperature quantity). The
     * product is formed in decimal and rounded once, so that "60 us" gives exactly the double nearest
     * 6e-5 s, as a user who typed 6e-5 would get, rather than 60 * 1e-6 rounded twice.
     */
    public double interval() {
        return decimalProduct(number, unit.factor());
    }

    /** (number + offset) * factor: the SI value read as an absolute temperature on a shifted scale. */
    public double absolute() {
        if (unit.offset() == 0) {
            return decimalProduct(number, unit.factor());
        }
        java.math.BigDecimal sum = new java.math.BigDecimal(Double.toString(number))
                .add(new java.math.BigDecimal(Double.toString(unit.offset())));
        return sum.multiply(new java.math.BigDecimal(Double.toString(unit.factor()))).doubleValue();
    }

    private static double decimalProduct(double a, double b) {
        if (!Double.isFinite(a) || !Double.isFinite(b)) {
            return a * b;
        }
        return new java.math.BigDecimal(Double.toString(a)).multiply(new java.math.BigDecimal(Double.toString(b)))
                .doubleValue();
    }

    /** As written, for example {@code 25 um}. */
    @Override
    public String toString() {
        return unit.isNone() ? Double.toString(number) : number + " " + unit.symbol();
    }
}
