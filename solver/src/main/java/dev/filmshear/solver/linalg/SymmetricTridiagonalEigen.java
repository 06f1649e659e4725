package dev.filmshear.solver.linalg;

import dev.filmshear.solver.base.NumericalFailureException;
import org.ejml.dense.row.decomposition.eig.symm.SymmetricQrAlgorithm_DDRM;

/**
 * Eigenvalues of a symmetric tridiagonal matrix, through EJML's implicit symmetric QR algorithm, which
 * works on the diagonal and off-diagonal directly (O(n^2) for eigenvalues only, no dense matrix).
 */
public final class SymmetricTridiagonalEigen {

    private SymmetricTridiagonalEigen() {
    }

    /**
     * The smallest eigenvalue.
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
