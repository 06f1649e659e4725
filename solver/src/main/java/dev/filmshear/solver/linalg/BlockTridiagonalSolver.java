package dev.filmshear.solver.linalg;

import dev.filmshear.solver.base.NumericalFailureException;

/**
 * Solves block-tridiagonal systems with 2x2 blocks by block Gaussian elimination (the block Thomas
 * algorithm), keeping the factorization for several right-hand sides.
 *
 * <p>Indexing convention, for block rows {@code i = 0..n-1} and two unknowns per block
 * ({@code x[2i]}, {@code x[2i+1]}):
 * <pre>
 *   A_i x_(i-1) + B_i x_i + C_i x_(i+1) = r_i
 * </pre>
 * Each 2x2 block is stored row-major as four consecutive doubles: block {@code i} of {@code a} is
 * {@code a[4i..4i+3] = {a00, a01, a10, a11}}. {@code A_0} and {@code C_(n-1)} are not read.
 *
 * <p>Elimination: D_0 = B_0; D_i = B_i - A_i G_(i-1) with G_i = D_i^-1 C_i; forward y_i = D_i^-1 (r_i - A_i
 * y_(i-1)); back x_i = y_i - G_i x_(i+1). Stable without pivoting between blocks for block diagonally
 * dominant matrices (Golub and Van Loan, <i>Matrix Computations</i>, 4th ed., 2013, section 4.5.1);
 * each 2x2 block is inverted exactly. A singular block is reported with its row.
 *
 * <p>Scratch is sized once; {@link #factor} and {@link #solve} allocate nothing. Not thread-safe.
 */
public final class BlockTridiagonalSolver {
    private final int capacity;
    private final double[] inverseD;
    private final double[] g;
    private double[] aRef;
    private int n;

    /** A solver for up to {@code capacity} block rows (2 capacity unknowns). */
    public BlockTridiagonalSolver(int capacity) {
        this.capacity = capacity;
        inverseD = new double[4 * capacity];
        g = new double[4 * capacity];
    }

    /**
     * Factors the matrix. {@code a} is read again by {@link #solve} and must not change until the last
     * solve; {@code b} and {@code c} are read only here.
     *
     * @param n number of block rows
     * @throws NumericalFailureException naming the block row whose pivot block is singular
     */
    public void factor(double[] a, double[] b, double[] c, int n) {
        if (n > capacity || n < 1) {
            throw new IllegalArgumentException("block rows " + n + " outside 1.." + capacity);
        }
        this.n = n;
        this.aRef = a;
        for (int i = 0; i < n; i++) {
            int k = 4 * i;
            double d00 = b[k];
            double d01 = b[k + 1];
            double d10 = b[k + 2];
            double d11 = b[k + 3];
            if (i > 0) {
                int p = k - 4;
                double a00 = a[k];
                double a01 = a[k + 1];
                double a10 = a[k + 2];
                double a11 = a[k + 3];
                d00 -= a00 * g[p] + a01 * g[p + 2];
                d01 -= a00 * g[p + 1] + a01 * g[p + 3];
                d10 -= a10 * g[p] + a11 * g[p + 2];
                d11 -= a10 * g[p + 1] + a11 * g[p + 3];
            }
            double det = d00 * d11 - d01 * d10;
            double scale = Math.abs(d00 * d11) + Math.abs(d01 * d10);
            if (!(Math.abs(det) > 1e-300 + 1e-14 * scale) || !Double.isFinite(det)) {
                throw new NumericalFailureException("block tridiagonal solve: singular pivot block in row " + i
                        + " (determinant " + det + ")", Double.NaN, -1, i, null);
            }
            double inv = 1 / det;
            double i00 = d11 * inv;
            double i01 = -d01 * inv;
            double i10 = -d10 * inv;
            double i11 = d00 * inv;
            inverseD[k] = i00;
            inverseD[k + 1] = i01;
            inverseD[k + 2] = i10;
            inverseD[k + 3] = i11;
            if (i < n - 1) {
                double c00 = c[k];
                double c01 = c[k + 1];
                double c10 = c[k + 2];
                double c11 = c[k + 3];
                g[k] = i00 * c00 + i01 * c10;
                g[k + 1] = i00 * c01 + i01 * c11;
                g[k + 2] = i10 * c00 + i11 * c10;
                g[k + 3] = i10 * c01 + i11 * c11;
            }
        }
    }

    /**
     * Solves against the last factorization. {@code r} (length 2n) is read only; {@code x} is
     * overwritten; they may be the same array.
     */
    public void solve(double[] r, double[] x) {
        // locals and running offsets keep both sweeps free of field loads and index arithmetic
        final double[] a = aRef;
        final double[] inv = inverseD;
        final double[] gg = g;
        final int m = n;
        double s0 = r[0];
        double s1 = r[1];
        double y0 = inv[0] * s0 + inv[1] * s1;
        double y1 = inv[2] * s0 + inv[3] * s1;
        x[0] = y0;
        x[1] = y1;
        for (int k = 4, v = 2; v < 2 * m; k += 4, v += 2) {
            s0 = r[v] - (a[k] * y0 + a[k + 1] * y1);
            s1 = r[v + 1] - (a[k + 2] * y0 + a[k + 3] * y1);
            y0 = inv[k] * s0 + inv[k + 1] * s1;
            y1 = inv[k + 2] * s0 + inv[k + 3] * s1;
            x[v] = y0;
            x[v + 1] = y1;
        }
        double n0 = y0;
        double n1 = y1;
        for (int k = 4 * (m - 2), v = 2 * (m - 2); v >= 0; k -= 4, v -= 2) {
            double c0 = x[v] - (gg[k] * n0 + gg[k + 1] * n1);
            double c1 = x[v + 1] - (gg[k + 2] * n0 + gg[k + 3] * n1);
            x[v] = c0;
            x[v + 1] = c1;
            n0 = c0;
            n1 = c1;
        }
    }

}
