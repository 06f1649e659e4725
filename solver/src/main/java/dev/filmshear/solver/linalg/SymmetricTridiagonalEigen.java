package dev.filmshear.solver.linalg;

import dev.filmshear.solver.base.NumericalFailureException;
import org.ejml.dense.row.decomposition.eig.symm.SymmetricQrAlgorithm_DDRM;

/**
 * The smallest eigenvalue of a symmetric tridiagonal matrix, two ways:
 * <ul>
 *   <li>{@link #smallest}: every eigenvalue through EJML's implicit symmetric QR algorithm, which works on
 *       the diagonal and off-diagonal directly (O(n^2), no dense matrix); the reference.</li>
 *   <li>{@link #smallestPositiveDefinite}: inverse iteration with the Rayleigh quotient on the tridiagonal
 *       solver (O(n) per iteration), for a positive definite matrix whose smallest eigenvalue is well
 *       separated, as the film's diffusion operator is (lambda_2 / lambda_1 is about 4). Written here because
 *       EJML's QR computes the whole spectrum: at 201 nodes it took 1.1 ms, most of a steady solve, where
 *       inverse iteration takes microseconds. Tests hold the two to 1e-10 of each other.</li>
 * </ul>
 * (G. H. Golub and C. F. Van Loan, <i>Matrix Computations</i>, 4th ed., 2013, sections 8.3 and 8.2.2.)
 */
public final class SymmetricTridiagonalEigen {

    private SymmetricTridiagonalEigen() {
    }

    /** Relative change of the Rayleigh quotient at which inverse iteration stops. */
    private static final double INVERSE_ITERATION_TOLERANCE = 1e-14;
    /** Inverse iterations allowed before falling back to EJML's QR. */
    private static final int INVERSE_ITERATION_LIMIT = 200;

    /**
     * The smallest eigenvalue of a symmetric positive definite tridiagonal matrix by inverse iteration,
     * falling back to {@link #smallest} when the iteration does not settle.
     *
     * @param diagonal the n diagonal entries (read only)
     * @param offDiagonal the n-1 entries beside the diagonal (read only)
     */
    public static double smallestPositiveDefinite(double[] diagonal, double[] offDiagonal) {
        int n = diagonal.length;
        if (n == 1) {
            return diagonal[0];
        }
        double[] lower = new double[n];
        double[] upper = new double[n];
        for (int i = 0; i < n - 1; i++) {
            upper[i] = offDiagonal[i];
            lower[i + 1] = offDiagonal[i];
        }
        TridiagonalSolver solver = new TridiagonalSolver(n);
        solver.factor(lower, diagonal, upper, n);
        double[] x = new double[n];
        java.util.Arrays.fill(x, 1 / Math.sqrt(n)); // the slowest mode has one sign: a good start
        double lambda = Double.NaN;
        for (int k = 0; k < INVERSE_ITERATION_LIMIT; k++) {
            solver.solve(x, x);
            double norm = 0;
            for (double v : x) {
                norm += v * v;
            }
            norm = Math.sqrt(norm);
            for (int i = 0; i < n; i++) {
                x[i] /= norm;
            }
            // Rayleigh quotient x^T A x of the unit vector
            double q = 0;
            for (int i = 0; i < n; i++) {
                double ax = diagonal[i] * x[i];
                if (i > 0) {
                    ax += offDiagonal[i - 1] * x[i - 1];
                }
                if (i < n - 1) {
                    ax += offDiagonal[i] * x[i + 1];
                }
                q += x[i] * ax;
            }
            if (Math.abs(q - lambda) <= INVERSE_ITERATION_TOLERANCE * Math.abs(q)) {
                return q;
            }
            lambda = q;
        }
        return smallest(diagonal, offDiagonal);
    }

    /**
     * The smallest eigenvalue, through EJML.
     *
     * @param diagonal the n diagonal entries (read only)
     * @param offDiagonal the n-1 entries beside the diagonal (read only)
     */
    public static double smallest(double[] diagonal, double[] offDiagonal) {
        int n = diagonal.length;
        if (n == 1) {
            return diagonal[0];
        }
        SymmetricQrAlgorithm_DDRM qr = new SymmetricQrAlgorithm_DDRM();
        qr.setMaxIterations(100 * n);
        // EJML overwrites its arguments: hand it copies.
        if (!qr.process(n, diagonal.clone(), offDiagonal.clone())) {
            throw new NumericalFailureException("eigenvalues of the diffusion operator did not converge");
        }
        double min = Double.POSITIVE_INFINITY;
        for (int i = 0; i < qr.getNumberOfEigenvalues(); i++) {
            min = Math.min(min, qr.getEigenvalue(i));
        }
        return min;
    }
}
