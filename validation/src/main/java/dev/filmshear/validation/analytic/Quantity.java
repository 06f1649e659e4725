package dev.filmshear.validation.analytic;

/**
 * Which quantity of a film response a kernel returns, for a dimensionless position xi = y/h across the gap:
 * the value itself, its slope d/dxi, or its mean over the gap (integral over xi from 0 to 1, which gives
 * the flow rate per unit width divided by h).
 */
enum Quantity {
    /** The response at xi. */
    VALUE,
    /** The derivative of the response with respect to xi at xi. */
    SLOPE,
    /** The integral of the response over 0 &lt;= xi &lt;= 1 (xi is ignored). */
    MEAN
}
