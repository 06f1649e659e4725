package dev.filmshear.cli.sweep;

import dev.filmshear.solver.base.InvalidParameterException;
import picocli.CommandLine;

import java.util.Map;
import java.util.Optional;

/**
 * The K-th of N deterministic slices of a plan: the cases whose index i satisfies {@code i mod N == K - 1}.
 *
 * <p>Taking every N-th case, rather than N consecutive blocks, spreads the cost evenly: neighbouring
 * indices differ only in the last axis, so each shard gets the same mix of cheap and expensive corners of
 * the plan. {@code 1/1} is the whole plan.
 *
 * @param k the slice, 1 to {@code n}
 * @param n the number of slices, 1 or more
 */
public record Shard(int k, int n) {
    /** The whole plan. */
    public static final Shard WHOLE = new Shard(1, 1);

    /** Slurm's variables for a job array's task (see sbatch(1), "OUTPUT ENVIRONMENT VARIABLES"). */
    static final String TASK_ID = "SLURM_ARRAY_TASK_ID";
    static final String TASK_COUNT = "SLURM_ARRAY_TASK_COUNT";
    static final String TASK_MIN = "SLURM_ARRAY_TASK_MIN";

    public Shard {
        if (n < 1) {
            throw new InvalidParameterException("shard count N", Integer.toString(n), "1 or more");
        }
        if (k < 1 || k > n) {
            throw new InvalidParameterException("shard K", k + "/" + n, "K from 1 to " + n);
        }
    }

    /**
     * Reads {@code "K/N"}.
     *
     * @throws InvalidParameterException when the text is not two integers with 1 <= K <= N
     */
    public static Shard parse(String text) {
        String[] parts = text.strip().split("/", -1);
        if (parts.length != 2) {
            throw new InvalidParameterException("--shard", "\"" + text + "\"", "K/N such as 2/8");
        }
        try {
            return new Shard(Integer.parseInt(parts[0].strip()), Integer.parseInt(parts[1].strip()));
        } catch (NumberFormatException e) {
            throw new InvalidParameterException("--shard", "\"" + text + "\"", "K/N with whole numbers, such as 2/8");
        }
    }

    /**
     * The shard of a Slurm job-array task, when the environment has one: K is the task's position in the
     * array counted from 1 ({@code SLURM_ARRAY_TASK_ID - SLURM_ARRAY_TASK_MIN + 1}, so that
     * {@code --array=0-7} and {@code --array=1-8} both give 1/8 to 8/8) and N is
     * {@code SLURM_ARRAY_TASK_COUNT}. Arrays with gaps ({@code --array=1,5}) give no consistent slicing and
     * are refused through the range check of K.
     */
    public static Optional<Shard> fromEnvironment(Map<String, String> environment) {
        String id = environment.get(TASK_ID);
        String count = environment.get(TASK_COUNT);
        if (id == null || count == null) {
            return Optional.empty();
        }
        String min = environment.getOrDefault(TASK_MIN, "1");
        try {
            int k = Integer.parseInt(id.strip()) - Integer.parseInt(min.strip()) + 1;
            return Optional.of(new Shard(k, Integer.parseInt(count.strip())));
        } catch (NumberFormatException e) {
            throw new InvalidParameterException(TASK_ID + "/" + TASK_COUNT, id + "/" + count,
                    "whole numbers set by Slurm for a job array");
        }
    }

    /** True when case {@code index} belongs to this shard. */
    public boolean contains(long index) {
        return index % n == k - 1;
    }

    /** The first case index of this shard. */
    public long first() {
        return k - 1;
    }

    /** How many of {@code total} cases fall in this shard. */
    public long size(long total) {
        return total <= k - 1 ? 0 : (total - k) / n + 1;
    }

    /** True for the whole plan (1/1). */
    public boolean isWhole() {
        return n == 1;
    }

    /** {@code K/N}. */
    @Override
    public String toString() {
        return k + "/" + n;
    }

    /** For picocli: {@code --shard K/N}. */
    static final class Converter implements CommandLine.ITypeConverter<Shard> {
        @Override
        public Shard convert(String value) {
            try {
                return parse(value);
            } catch (InvalidParameterException e) {
                throw new CommandLine.TypeConversionException(e.getMessage());
            }
        }
    }
}
