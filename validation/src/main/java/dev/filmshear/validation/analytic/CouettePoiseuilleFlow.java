package dev.filmshear.validation.analytic;

import dev.filmshear.solver.base.InvalidParameterException;

/**
 * Steady Couette–Poiseuille flow: constant viscosity mu in a gap 0 &lt;= y &lt;= h, walls moving at u_a (lower)
 * and u_b (upper), constant pressure gradient dp/dx. With eta = y/h and G = dp/dx,
 * <pre>
 *   u(y)   = u_a + (u_b - u_a) eta + (h^2 / (2 mu)) (-G) eta (1 - eta)
 *   tau(y) = mu (u_b - u_a)/h + (h/2) (-G) (1 - 2 eta)
 *   Q      = h (u_a + u_b)/2 + (h^3 / (12 mu)) (-G)          (flow rate per unit width)
 * </pre>
 * With the lower wall fixed and P = -(h^2 / (2 mu U)) G this is u/U = eta + P eta (1 - eta) and
 * Q/(U h) = 1/2 + P/6; the flow reverses at the fixed wall when P &lt; -1, and for P &gt; 1 the largest
 * velocity is U (1 + P)^2 / (4P).
 *
 * <p>Source: F. M. White, <i>Viscous Fluid Flow</i>, 3rd ed., McGraw-Hill, 2006, ch. 3, §3-2 (section number
 * from memory). It is the steady limit of {@link ConstantPropertyFilm}.
 *
 * @param gap h (m)
 * @param viscosity mu (Pa s)
 * @param lowerVelocity u_a (m/s)
 * @param upperVelocity u_b (m/s)
 * @param pressureGradient dp/dx (Pa/m)
 */
public record CouettePoiseuilleFlow(double gap, double viscosity, double lowerVelocity, double upperVelocity,
                                    double pressureGradient) implements SteadySolution {

    public CouettePoiseuilleFlow {
        InvalidParameterException.requirePositive("gap", gap, "m");
        InvalidParameterException.requirePositive("viscosity", viscosity, "Pa*s");
        InvalidParameterException.requireFinite("lower_velocity", lowerVelocity, "m/s");
        InvalidParameterException.requireFinite("upper_velocity", upperVelocity, "m/s");
        InvalidParameterException.requireFinite("gradient", pressureGradient, "Pa/m");
    }

    /** Velocity (m/s) scale of the pressure-driven part: (h^2 / (2 mu)) (-dp/dx). */
    private double poiseuilleScale() {
        return -pressureGradient * gap * gap / (2 * viscosity);
    }

    /** Velocity (m/s) at height {@code y} (m). */
    public double velocity(double y) {
        Checks.inGap(y, gap);
        double eta = y / gap;
        return lowerVelocity + (upperVelocity - lowerVelocity) * eta + poiseuilleScale() * eta * (1 - eta);
    }

    /** Shear stress mu du/dy (Pa) at height {@code y} (m). */
    public double shearStress(double y) {
        Checks.inGap(y, gap);
        double eta = y / gap;
        return viscosity * (upperVelocity - lowerVelocity) / gap - pressureGradient * gap / 2 * (1 - 2 * eta);
    }

    /** mu du/dy (Pa) at the lower wall. */
    public double wallShearStressLower() {
        return shearStress(0);
    }

    /** mu du/dy (Pa) at the upper wall. */
    public double wallShearStressUpper() {
        return shearStress(gap);
    }

    /** Flow rate per unit width (m^2/s). */
    public double flowRate() {
        return gap * (lowerVelocity + upperVelocity) / 2 - pressureGradient * gap * gap * gap / (12 * viscosity);
    }

    /**
     * White's pressure parameter P = -(h^2 / (2 mu (u_b - u_a))) dp/dx.
     *
     * @throws IllegalStateException when the walls move at the same speed (P is then not defined)
     */
    public double pressureParameter() {
        if (upperVelocity == lowerVelocity) {
            throw new IllegalStateException("the pressure parameter needs walls moving at different speeds");
        }
        return poiseuilleScale() / (upperVelocity - lowerVelocity);
    }

    /** The largest velocity (m/s) across the gap. */
    public double maxVelocity() {
        return extreme(true);
    }

    /** The smallest velocity (m/s) across the gap (below the slower wall's when the flow reverses). */
    public double minVelocity() {
        return extreme(false);
    }

    private double extreme(boolean max) {
        double best = max ? Math.max(lowerVelocity, upperVelocity) : Math.min(lowerVelocity, upperVelocity);
        double curvature = poiseuilleScale();
        // u(eta) = u_a + (u_b - u_a) eta + c eta (1 - eta) has its vertex at eta = 1/2 + (u_b - u_a)/(2c)
        if (curvature != 0 && (curvature > 0) == max) {
            double vertex = 0.5 + (upperVelocity - lowerVelocity) / (2 * curvature);
            if (vertex > 0 && vertex < 1) {
                double u = velocity(vertex * gap);
                best = max ? Math.max(best, u) : Math.min(best, u);
            }
        }
        return best;
    }

    @Override
    public String name() {
        return "steady Couette-Poiseuille flow";
    }

    @Override
    public String source() {
        return "F. M. White, Viscous Fluid Flow, 3rd ed., McGraw-Hill, 2006, ch. 3, section 3-2 "
                + "(section number from memory)";
    }

}
