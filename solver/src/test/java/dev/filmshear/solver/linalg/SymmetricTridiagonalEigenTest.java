package dev.filmshear.solver.linalg;

import org.junit.jupiter.api.Test;

import java.util.Arrays;

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
}
