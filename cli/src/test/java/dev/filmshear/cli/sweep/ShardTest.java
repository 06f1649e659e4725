package dev.filmshear.cli.sweep;

import dev.filmshear.solver.base.InvalidParameterException;
import org.junit.jupiter.api.Test;

import java.util.Map;
import java.util.Optional;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

/** Shards: K/N parsing, the slices they take, and the defaults of a Slurm job array. */
class ShardTest {

    @Test
    void slicesCoverEveryCaseOnce() {
        long total = 100;
        long[] counts = new long[3];
        for (long i = 0; i < total; i++) {
            int owners = 0;
            for (int k = 1; k <= 3; k++) {
                if (new Shard(k, 3).contains(i)) {
                    owners++;
                    counts[k - 1]++;
                }
            }
            assertEquals(1, owners, "case " + i);
        }
        for (int k = 1; k <= 3; k++) {
            assertEquals(counts[k - 1], new Shard(k, 3).size(total));
        }
        assertEquals(0, new Shard(5, 8).size(4), "more shards than cases: some are empty");
    }

    @Test
    void parsesKOverN() {
        assertEquals(new Shard(2, 8), Shard.parse(" 2/8 "));
        assertThrows(InvalidParameterException.class, () -> Shard.parse("0/8"));
        assertThrows(InvalidParameterException.class, () -> Shard.parse("9/8"));
        assertThrows(InvalidParameterException.class, () -> Shard.parse("2-8"));
        assertThrows(InvalidParameterException.class, () -> Shard.parse("a/b"));
    }

    /** Slurm numbers array tasks as given to --array (sbatch(1), "OUTPUT ENVIRONMENT VARIABLES"). */
    @Test
    void aJobArrayTaskGivesItsShard() {
        assertEquals(Optional.of(new Shard(1, 8)), Shard.fromEnvironment(Map.of("SLURM_ARRAY_TASK_ID", "0",
                "SLURM_ARRAY_TASK_COUNT", "8", "SLURM_ARRAY_TASK_MIN", "0")));
        assertEquals(Optional.of(new Shard(8, 8)), Shard.fromEnvironment(Map.of("SLURM_ARRAY_TASK_ID", "8",
                "SLURM_ARRAY_TASK_COUNT", "8", "SLURM_ARRAY_TASK_MIN", "1")));
        assertEquals(Optional.of(new Shard(3, 4)), Shard.fromEnvironment(Map.of("SLURM_ARRAY_TASK_ID", "3",
                "SLURM_ARRAY_TASK_COUNT", "4")));
        assertFalse(Shard.fromEnvironment(Map.of("SLURM_JOB_ID", "12")).isPresent());
        assertThrows(InvalidParameterException.class, () -> Shard.fromEnvironment(Map.of("SLURM_ARRAY_TASK_ID", "5",
                "SLURM_ARRAY_TASK_COUNT", "2", "SLURM_ARRAY_TASK_MIN", "1")), "an array with gaps");
        assertTrue(Shard.WHOLE.isWhole());
    }
}
