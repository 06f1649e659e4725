package dev.filmshear.solver.time;

/**
 * A semi-discrete system M(y) dy/dt = F(y, t), where some rows are algebraic and prescribed
 * (y_i = b_i(t), such as a wall velocity), as seen by an implicit Runge–Kutta integrator.
 *
 * <p>The integrator only ever asks the system to solve one stage equation
 * <pre>
 *   M(Y) (Y - Z) - g F(Y, t) = 0        in the differential rows,
 *   Y_i = b_i(t)                        in the prescribed rows,
 * </pre>
 * with g = a_ii h, so the system keeps its own Jacobian structure (tridiagonal, block-tridiagonal) and
 * its own Newton iteration. All arrays have {@link #size()} entries; the system allocates nothing per call.
 */
public interface ImplicitSystem {

    /** Number of unknowns. */
    int size();

    /** Sets the accuracy target used by {@link #errorNorm} and by the Newton convergence test. */
    void setTolerance(double tolerance);

    /**
     * Rates k = M(y)^-1 F(y, t) in the differential rows, 0 in the prescribed rows.
     *
     * @param y state (read only)
     * @param k overwritten
     */
    void rate(double t, double[] y, double[] k);

    /**
     * Solves the stage equation for Y.
     *
     * @param t stage time (s)
     * @param g a_ii h (s)
     * @param z the stage's known part (read only)
     * @param y on entry the initial guess, on exit the solution (prescribed rows set to their values at t)
     * @return Newton iterations used (at least 1), or a negative number when Newton did not converge
     */
    int solveStage(double t, double g, double[] z, double[] y);

    /**
     * Replaces e by (M - g J)^-1 M e with the matrix of the last stage solve (g of that stage), after
     * zeroing the prescribed rows; the standard filter of an embedded error estimate for stiff systems
     * (M. E. Hosea and L. F. Shampine, Appl. Numer. Math. 20 (1996) 21-37, section 4).
     */
    void filterError(double[] e);

    /**
     * Weighted root-mean-square norm of an error vector over the differential rows, scaled so that 1 means
     * "at the tolerance".
     *
     * @param e error estimate (read only)
     * @param yOld state at the start of the step (read only)
     * @param yNew proposed state at the end of the step (read only)
     */
    double errorNorm(double[] e, double[] yOld, double[] yNew);

    /** True when F is linear in y and M constant, so one Newton iteration solves a stage exactly. */
    boolean isLinear();
}
