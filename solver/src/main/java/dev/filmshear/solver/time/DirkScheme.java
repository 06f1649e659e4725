package dev.filmshear.solver.time;

/**
 * Diagonally implicit Runge–Kutta schemes with an explicit first stage (ESDIRK), held as data: the
 * Butcher tableau (c, A, b) and an embedded weight vector b-hat for the error estimate. Every scheme here
 * is stiffly accurate (b equals the last row of A), so the last stage value is the new solution and
 * its rate is the first rate of the next step.
 *
 * <p>One parameterized test runs every scheme against an exact solution and checks its declared order.
 */
public enum DirkScheme {

    /**
     * TR-BDF2: a trapezoidal stage to t + gamma h, then a BDF2 stage to t + h, gamma = 2 - sqrt 2 so both
     * stages share one matrix. Second order, L-stable, so an impulsive start does not ring. Embedded
     * third-order weights for the error estimate. R. E. Bank, W. M. Coughran, W. Fichtner, E. H. Grosse,
     * D. J. Rose, R. K. Smith, "Transient simulation of silicon devices and circuits", IEEE Trans.
     * Electron Devices 32 (1985) 1992-2007; tableau and b-hat from M. E. Hosea and L. F. Shampine,
     * "Analysis and implementation of TR-BDF2", Appl. Numer. Math. 20 (1996) 21-37, eqs. (2)-(4).
     */
    TR_BDF2(2, 3, true,
            new double[] {0, Constants.GAMMA, 1},
            new double[][] {
                    {0, 0, 0},
                    {Constants.D, Constants.D, 0},
                    {Constants.W, Constants.W, Constants.D}},
            new double[] {(1 - Constants.W) / 3, (3 * Constants.W + 1) / 3, Constants.D / 3}),

    /**
     * Crank–Nicolson (the trapezoidal rule) with a backward-Euler embedded estimate. Second order but only
     * A-stable: stiff modes are not damped, so an impulsive start rings. Kept to show that ringing and as
     * a reference. J. Crank and P. Nicolson, Proc. Camb. Phil. Soc. 43 (1947) 50-67.
     */
    CRANK_NICOLSON(2, 1, false,
            new double[] {0, 1},
            new double[][] {{0, 0}, {0.5, 0.5}},
            new double[] {0, 1}),

    /**
     * Backward (implicit) Euler, first order and L-stable, with a trapezoidal embedded estimate. Kept as
     * the deliberately low-order scheme the convergence tests must catch. E. Hairer and G. Wanner,
     * <i>Solving Ordinary Differential Equations II</i>, 2nd ed., Springer 1996, section IV.3.
     */
    BACKWARD_EULER(1, 2, true,
            new double[] {0, 1},
            new double[][] {{0, 0}, {0, 1}},
            new double[] {0.5, 0.5});

    private final int order;
    private final int embeddedOrder;
    private final boolean lStable;
    private final double[] c;
    private final double[][] a;
    private final double[] bHat;

    DirkScheme(int order, int embeddedOrder, boolean lStable, double[] c, double[][] a, double[] bHat) {
        this.order = order;
        this.embeddedOrder = embeddedOrder;
        this.lStable = lStable;
        this.c = c;
        this.a = a;
        this.bHat = bHat;
    }

    /** Order of accuracy of the solution. */
    public int order() {
        return order;
    }

    /** Order of the embedded solution used for the error estimate. */
    public int embeddedOrder() {
        return embeddedOrder;
    }

    /** True when the scheme damps infinitely stiff modes completely in one step. */
    public boolean isLStable() {
        return lStable;
    }

    /** Number of stages, the explicit first stage included. */
    public int stages() {
        return c.length;
    }

    /** Stage abscissa c_i. */
    public double c(int i) {
        return c[i];
    }

    /** Tableau entry a_ij. */
    public double a(int i, int j) {
        return a[i][j];
    }

    /** Weight b_j of the solution (equal to the last row of A). */
    public double b(int j) {
        return a[c.length - 1][j];
    }

    /** Embedded weight b-hat_j. */
    public double bHat(int j) {
        return bHat[j];
    }

    /** Exponent of the step-size controller: 1 / (q + 1) with q the lower of the two orders. */
    public double controllerExponent() {
        return 1.0 / (Math.min(order, embeddedOrder) + 1);
    }

    private static final class Constants {
        /** gamma = 2 - sqrt 2, the TR stage's end. */
        static final double GAMMA = 2 - Math.sqrt(2);
        /** d = gamma / 2, the diagonal of both implicit stages. */
        static final double D = GAMMA / 2;
        /** w = sqrt 2 / 4. */
        static final double W = Math.sqrt(2) / 4;
    }
}
