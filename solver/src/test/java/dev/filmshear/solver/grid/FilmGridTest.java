package dev.filmshear.solver.grid;

import dev.filmshear.solver.base.InvalidParameterException;
import org.junit.jupiter.api.Test;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

class FilmGridTest {

    @Test
    void uniformGridHasEqualSpacingAndHalfVolumesAtTheWalls() {
        FilmGrid grid = FilmGrid.betweenWalls(25e-6, 11, 0);
        assertEquals(0, grid.yAt(0));
        assertEquals(25e-6, grid.yAt(10));
        for (int j = 0; j < 10; j++) {
            assertEquals(2.5e-6, grid.spacingAt(j), 1e-18);
        }
        assertEquals(1.25e-6, grid.volumeAt(0), 1e-18);
        assertEquals(2.5e-6, grid.volumeAt(5), 1e-18);
        assertEquals(1.25e-6, grid.volumeAt(10), 1e-18);
    }

    @Test
    void controlVolumesTileTheFilmExactly() {
        for (double clustering : new double[] {0, 0.3, 1}) {
            FilmGrid grid = FilmGrid.betweenWalls(1e-4, 37, clustering);
            double sum = 0;
            for (int i = 0; i < grid.points(); i++) {
                sum += grid.volumeAt(i);
            }
            assertEquals(1e-4, sum, 1e-18, "clustering " + clustering);
        }
    }

    @Test
    void clusteringRefinesAtBothWallsSymmetrically() {
        FilmGrid grid = FilmGrid.betweenWalls(1.0, 101, 1);
        double wall = grid.spacingAt(0);
        double middle = grid.spacingAt(50);
        // at clustering 1 the wall spacing is about sech^2(3) ~ 1/100 of the widest
        assertTrue(wall / middle < 0.02 && wall / middle > 0.005, "ratio " + wall / middle);
        assertEquals(grid.spacingAt(0), grid.spacingAt(99), 1e-15);
        for (int j = 1; j < 50; j++) {
            assertTrue(grid.spacingAt(j) > grid.spacingAt(j - 1), "spacing grows away from the lower wall");
        }
    }

    @Test
    void oneWallGridClustersOnlyAtTheWall() {
        FilmGrid grid = FilmGrid.fromWall(2.0, 41, 0.5);
        assertTrue(grid.spacingAt(0) < grid.spacingAt(39));
        assertEquals(2.0, grid.depth());
        assertTrue(!grid.betweenWalls());
    }

    @Test
    void rejectsTooFewPointsAndBadClustering() {
        assertEquals("points", assertThrows(InvalidParameterException.class,
                () -> FilmGrid.betweenWalls(1, 2, 0)).parameter());
        assertEquals("clustering", assertThrows(InvalidParameterException.class,
                () -> FilmGrid.betweenWalls(1, 10, 1.5)).parameter());
        assertEquals("gap", assertThrows(InvalidParameterException.class,
                () -> FilmGrid.betweenWalls(-1, 10, 0)).parameter());
    }
}
