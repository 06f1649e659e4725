package dev.filmshear.solver.linalg;

import dev.filmshear.solver.base.NumericalFailureException;

/**
 * Solves tridiagonal systems by the Thomas algorithm (Gaussian elimination without pivoting), with the
 * factorization kept so that several right-hand sides can be solved against one matrix.
 *
 * <p>Indexing convention, for rows {@code i = 0..n-1}:
 * <pre>
 *   lower[i] * x[i-1] + diag[i] * x[i] + upper[i] * x[i+1] = rhs[i]
 *
 *   | d0 u0          |
 *   | l1 d1 u1       |      lower[0] and upper[n-1] are not read
 *   |    l2 d2 u2    |
 *   |       l3 d3    |
 * </pre>
 * No pivoting: the solver is meant for the diagonally dominant matrices of implicit diffusion, for which
 * elimination without pivoting is stable (G. H. Golub and C. F. Van Loan, <i>Matrix Computations</i>,
 * 4th ed., 2013, section 4.3). A zero pivot is reported with its row, never skipped.
 *
 * <p>Scratch arrays are sized once at construction; {@link #factor} and {@link #solve} allocate nothing.
 * Not thread-safe: one instance per simulation.
 */
public final class TridiagonalSolver {
    private final int capacity;
    private final double[] upperPrime;
    private final double[] inversePivot;
    private double[] lowerRef;
    private int n;

    /** A solver for systems of up to {@code capacity} rows. */
    public TridiagonalSolver(int capacity) {
        this.capacity = capacity;
        upperPrime = new double[capacity];
        inversePivot = new double[capacity];
    }

    /**
     * Factors the matrix. The {@code lower} array is read again by {@link #solve}, so it must not change
     * until the last solve against this factorization; {@code diag} and {@code upper} are read only here.
     *
     * @param n number of rows
     * @throws NumericalFailureException naming the row where a pivot is zero or not finite
     */
    public void factor(double[] lower, double[] diag, double[] upper, int n) {
        if (n > capacity || n < 1) {
            throw new IllegalArgumentException("rows " + n + " outside 1.." + capacity);
        }
        this.n = n;
        this.lowerRef = lower;
        double pivot = diag[0];
        checkPivot(pivot, 0, Math.abs(diag[0]) + (n > 1 ? Math.abs(upper[0]) : 0));
        inversePivot[0] = 1 / pivot;
        upperPrime[0] = n > 1 ? upper[0] * inversePivot[0] : 0;
        for (int i = 1; i < n; i++) {
            pivot = diag[i] - lower[i] * upperPrime[i - 1];
            checkPivot(pivot, i, Math.abs(diag[i]) + Math.abs(lower[i]));
            inversePivot[i] = 1 / pivot;
            upperPrime[i] = i < n - 1 ? upper[i] * inversePivot[i] : 0;
        }
    }

    /**
     * Solves against the last factorization. {@code rhs} is read only; {@code x} is overwritten.
     * They may be the same array.
     */
    public void solve(double[] rhs, double[] x) {
        x[0] = rhs[0] * inversePivot[0];
        for (int i = 1; i < n; i++) {
            x[i] = (rhs[i] - lowerRef[i] * x[i - 1]) * inversePivot[i];
        }
        for (int i = n - 2; i >= 0; i--) {
            x[i] -= upperPrime[i] * x[i + 1];
        }
    }

    /** Factors and solves in one call. */
    public void solve(double[] lower, double[] diag, double[] upper, double[] rhs, double[] x, int n) {
        factor(lower, diag, upper, n);
        solve(rhs, x);
    }

    private static void checkPivot(double pivot, int row, double scale) {
        if (!(Math.abs(pivot) > 1e-300 + 1e-15 * scale) || !Double.isFinite(pivot)) {
            throw new NumericalFailureException("tridiagonal solve: zero or non-finite pivot in row " + row
                    + " (pivot " + pivot + ")", Double.NaN, -1, row, null);
        }
    }
}
