package dev.filmshear.cli.input;

import java.util.Objects;

/**
 * A unit as parsed from a quantity's text: an interval converts as SI = number * factor, an absolute
 * temperature as SI = (number + offset) * factor.
 *
 * <p>The offset is non-zero only for a temperature scale with a shifted zero ({@code degC}, {@code degF})
 * written alone; it applies when the key asks for an absolute temperature. Inside a compound unit
 * ({@code J/(kg*degF)}) and for temperature differences a degree is an interval and only the factor counts.
 * Keeping the offset in the scale's own degrees makes the conversion the defining formula itself,
 * T/K = (t/degF + 459.67) * 5/9 (NIST SP 811, 2008, Appendix B).
 *
 * @param symbol the unit as written (empty for a bare number)
 * @param factor SI value of one unit (for a temperature scale: of one degree of interval)
 * @param offset the scale's distance from absolute zero in its own degrees (273.15 for degC, 459.67 for
 *     degF), 0 for every other unit
 * @param dimension the unit's dimension
 * @param angular true when the unit names an angle or revolutions (rad, deg, rev, rpm, rad/s)
 */
public record Unit(String symbol, double factor, double offset, Dimension dimension, boolean angular) {

    /** The "unit" of a bare number: SI in whatever the key expects. */
    public static final Unit NONE = new Unit("", 1, 0, Dimension.NONE, false);

    public Unit {
        Objects.requireNonNull(symbol, "symbol");
        Objects.requireNonNull(dimension, "dimension");
    }

    /** True for a bare number (no unit written). */
    public boolean isNone() {
        return symbol.isEmpty();
    }

    /** The product of two units; a product is always an interval unit (no offset). */
    Unit times(Unit other, String newSymbol) {
        return new Unit(newSymbol, factor * other.factor, 0, dimension.times(other.dimension),
                angular || other.angular);
    }

    /** The quotient of two units, an interval unit. */
    Unit over(Unit other, String newSymbol) {
        return new Unit(newSymbol, factor / other.factor, 0, dimension.over(other.dimension),
                angular || other.angular);
    }

    /** This unit to an integer power, an interval unit. */
    Unit pow(int n, String newSymbol) {
        return new Unit(newSymbol, Math.pow(factor, n), 0, dimension.pow(n), angular && n != 0);
    }

    /** The same unit under another spelling (parentheses), keeping a lone scale's offset. */
    Unit renamed(String newSymbol) {
        return new Unit(newSymbol, factor, offset, dimension, angular);
    }
}
