package dev.filmshear.solver.linalg;

import dev.filmshear.solver.base.NumericalFailureException;
import org.ejml.data.DMatrixRMaj;
import org.ejml.dense.row.CommonOps_DDRM;
import org.junit.jupiter.api.Test;

import java.util.Random;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

/** The 2x2 block tridiagonal solver against EJML's dense LU solve on seeded random systems. */
class BlockTridiagonalSolverTest {
    private static final double TOLERANCE = 1e-11;

    @Test
    void agreesWithDenseLuOnRandomBlockDiagonallyDominantSystems() {
        Random random = new Random(7L);
        for (int trial = 0; trial < 40; trial++) {
            int n = 1 + random.nextInt(40);
            double[] a = new double[4 * n];
            double[] b = new double[4 * n];
            double[] c = new double[4 * n];
            double[] r = new double[2 * n];
            DMatrixRMaj dense = new DMatrixRMaj(2 * n, 2 * n);
            for (int i = 0; i < n; i++) {
                for (int e = 0; e < 4; e++) {
                    a[4 * i + e] = i > 0 ? random.nextGaussian() : 0;
                    c[4 * i + e] = i < n - 1 ? random.nextGaussian() : 0;
                    b[4 * i + e] = random.nextGaussian() * 0.3;
                }
                // make each block row diagonally dominant
                for (int row = 0; row < 2; row++) {
                    double off = 0;
                    for (int col = 0; col < 2; col++) {
                        off += Math.abs(a[4 * i + 2 * row + col]) + Math.abs(c[4 * i + 2 * row + col]);
                    }
                    off += Math.abs(b[4 * i + 2 * row + (1 - row)]);
                    b[4 * i + 3 * row] = off + 0.5 + random.nextDouble();
                }
                r[2 * i] = random.nextGaussian();
                r[2 * i + 1] = random.nextGaussian();
                for (int row = 0; row < 2; row++) {
                    for (int col = 0; col < 2; col++) {
                        dense.set(2 * i + row, 2 * i + col, b[4 * i + 2 * row + col]);
                        if (i > 0) {
                            dense.set(2 * i + row, 2 * (i - 1) + col, a[4 * i + 2 * row + col]);
                        }
                        if (i < n - 1) {
                            dense.set(2 * i + row, 2 * (i + 1) + col, c[4 * i + 2 * row + col]);
                        }
                    }
                }
            }
            DMatrixRMaj expected = new DMatrixRMaj(2 * n, 1);
            assertTrue(CommonOps_DDRM.solve(dense, new DMatrixRMaj(2 * n, 1, true, r), expected));
            BlockTridiagonalSolver solver = new BlockTridiagonalSolver(n);
            solver.factor(a, b, c, n);
            double[] x = new double[2 * n];
            solver.solve(r, x);
            for (int i = 0; i < 2 * n; i++) {
                assertEquals(expected.get(i), x[i], TOLERANCE * (1 + Math.abs(expected.get(i))), "unknown " + i);
            }
        }
    }

    @Test
    void singularPivotBlockIsReportedWithItsRow() {
        double[] a = new double[8];
        double[] b = {1, 0, 0, 1, 1, 2, 2, 4};
        double[] c = new double[8];
        BlockTridiagonalSolver solver = new BlockTridiagonalSolver(2);
        NumericalFailureException e = assertThrows(NumericalFailureException.class, () -> solver.factor(a, b, c, 2));
        assertEquals(1, e.node());
    }
}
