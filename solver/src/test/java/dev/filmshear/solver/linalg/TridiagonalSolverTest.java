package dev.filmshear.solver.linalg;

import dev.filmshear.solver.base.NumericalFailureException;
import org.ejml.data.DMatrixRMaj;
import org.ejml.dense.row.CommonOps_DDRM;
import org.junit.jupiter.api.Test;

import java.util.Random;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

/** The hand-written tridiagonal solver against EJML's dense LU solve on seeded random systems. */
class TridiagonalSolverTest {
    /** Diagonally dominant systems of this size are solved to near machine precision by both methods. */
    private static final double TOLERANCE = 1e-12;

    @Test
    void agreesWithDenseLuOnRandomDiagonallyDominantSystems() {
        Random random = new Random(20261202L);
        for (int trial = 0; trial < 50; trial++) {
            int n = 1 + random.nextInt(60);
            double[] lower = new double[n];
            double[] diag = new double[n];
            double[] upper = new double[n];
            double[] rhs = new double[n];
            DMatrixRMaj dense = new DMatrixRMaj(n, n);
            for (int i = 0; i < n; i++) {
                lower[i] = i > 0 ? random.nextGaussian() : 0;
                upper[i] = i < n - 1 ? random.nextGaussian() : 0;
                diag[i] = Math.abs(lower[i]) + Math.abs(upper[i]) + 0.1 + random.nextDouble();
                if (random.nextBoolean()) {
                    diag[i] = -diag[i];
                }
                rhs[i] = random.nextGaussian();
                dense.set(i, i, diag[i]);
                if (i > 0) {
                    dense.set(i, i - 1, lower[i]);
                }
                if (i < n - 1) {
                    dense.set(i, i + 1, upper[i]);
                }
            }
            DMatrixRMaj b = new DMatrixRMaj(n, 1, true, rhs);
            DMatrixRMaj expected = new DMatrixRMaj(n, 1);
            assertTrue(CommonOps_DDRM.solve(dense, b, expected));

            TridiagonalSolver solver = new TridiagonalSolver(n);
            double[] x = new double[n];
            solver.solve(lower, diag, upper, rhs, x, n);
            for (int i = 0; i < n; i++) {
                assertEquals(expected.get(i), x[i], TOLERANCE * (1 + Math.abs(expected.get(i))), "row " + i);
            }
            // a second right-hand side against the same factorization, solved in place
            double[] second = rhs.clone();
            for (int i = 0; i < n; i++) {
                second[i] = 2 * rhs[i];
            }
            solver.solve(second, second);
            for (int i = 0; i < n; i++) {
                assertEquals(2 * expected.get(i), second[i], TOLERANCE * (1 + Math.abs(expected.get(i))));
            }
        }
    }

    @Test
    void zeroPivotIsReportedWithItsRow() {
        // second pivot d1 - l1 u0 / d0 = 1 - 1 * 1 / 1 = 0
        double[] lower = {0, 1, 1};
        double[] diag = {1, 1, 3};
        double[] upper = {1, 1, 0};
        TridiagonalSolver solver = new TridiagonalSolver(3);
        NumericalFailureException e = assertThrows(NumericalFailureException.class,
                () -> solver.factor(lower, diag, upper, 3));
        assertEquals(1, e.node());
        assertTrue(e.getMessage().contains("row 1"), e.getMessage());
    }
}
