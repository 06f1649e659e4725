package dev.filmshear.solver.linalg;

import org.junit.jupiter.api.Test;

import java.util.Arrays;
import java.util.Random;

import static org.junit.jupiter.api.Assertions.assertEquals;

class SymmetricTridiagonalEigenTest {

    /**
     * The second-difference matrix tridiag(-1, 2, -1) of size n has eigenvalues
     * 2 - 2 cos(k pi / (n + 1)), k = 1..n (a standard result, e.g. G. Strang, <i>Computational Science and
     * Engineering</i>, 2007, section 1.5).
     */
    @Test
    void smallestEigenvalueOfSecondDifferenceMatrix() {
        for (int n : new int[] {1, 2, 5, 50, 400}) {
            double[] diagonal = new double[n];
            double[] off = new double[n - 1];
            Arrays.fill(diagonal, 2);
            Arrays.fill(off, -1);
            double expected = 2 - 2 * Math.cos(Math.PI / (n + 1));
            assertEquals(expected, SymmetricTridiagonalEigen.smallest(diagonal, off), 1e-12 * Math.max(1, expected) + 1e-14,
                    "n = " + n);
            assertEquals(2.0, diagonal[0], 0, "input left unchanged");
        }
    }

    /** Inverse iteration agrees with EJML's QR on seeded random positive definite tridiagonal matrices. */
    @Test
    void inverseIterationAgreesWithEjmlsQr() {
        Random random = new Random(42);
        for (int trial = 0; trial < 30; trial++) {
            int n = 2 + random.nextInt(300);
            double[] diagonal = new double[n];
            double[] off = new double[n - 1];
            for (int i = 0; i < n - 1; i++) {
                off[i] = -(0.1 + random.nextDouble());
            }
            for (int i = 0; i < n; i++) {
                // diagonally dominant: positive definite, like a diffusion operator
                diagonal[i] = (i > 0 ? -off[i - 1] : 0) + (i < n - 1 ? -off[i] : 0) + 1e-3 + random.nextDouble();
            }
            double reference = SymmetricTridiagonalEigen.smallest(diagonal, off);
            assertEquals(reference, SymmetricTridiagonalEigen.smallestPositiveDefinite(diagonal, off),
                    1e-10 * reference, "n = " + n);
        }
    }
}
