package dev.filmshear.validation.suite;

import dev.filmshear.solver.base.InvalidParameterException;
import dev.filmshear.solver.base.NumericalFailureException;
import dev.filmshear.solver.model.SolverOptions;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import java.util.Objects;
import java.util.concurrent.ExecutionException;
import java.util.concurrent.ExecutorService;
import java.util.concurrent.Executors;
import java.util.concurrent.Future;
import java.util.function.Consumer;

/**
 * The verification suite: code verification of the solver against every closed-form solution the validation
 * module holds ({@link AnalyticCases}) and manufactured solutions of the full coupled system
 * ({@link ManufacturedVerification}), each over a sequence of grid (and time-step) refinements, with the observed
 * order of every error checked against its band (or, where the scheme is exact, against a round-off floor).
 *
 * <p>Two registered suites with the same cases: {@link #quick()} on {@value #QUICK_LEVELS} levels (21, 41, 81
 * nodes for most cases; a few seconds; what the tests and {@code verify --quick} run) and {@link #full()} on up to
 * {@value #FULL_LEVELS} (to 641 nodes; well under a minute on two cores). Any list of cases may be run instead,
 * which is how the tests show the suite can fail: a deliberately wrong discretization passed in as cases of its
 * own.
 *
 * <p>Cases run in parallel on a fixed pool of threads; each case's levels run in order on one thread. The solver
 * keeps no shared state between runs, so the results do not depend on the number of threads.
 */
public final class VerificationSuite {
    /** Levels of the quick suite: three, the least that gives two observed orders. */
    public static final int QUICK_LEVELS = 3;
    /** Levels of the full suite: six (21 to 641 nodes for most cases), five observed orders. */
    public static final int FULL_LEVELS = 6;

    private final String name;
    private final List<VerificationCase> cases;

    /**
     * A suite of the given cases.
     *
     * @param name a name for the table's heading ("quick", "full")
     * @param cases the cases, in the order of the table
     */
    public VerificationSuite(String name, List<VerificationCase> cases) {
        this.name = Objects.requireNonNull(name, "name");
        this.cases = List.copyOf(cases);
        if (this.cases.isEmpty()) {
            throw new InvalidParameterException("cases", "none", "at least one case");
        }
    }

    /** The quick suite: every case on {@value #QUICK_LEVELS} levels. */
    public static VerificationSuite quick() {
        return new VerificationSuite("quick", cases(QUICK_LEVELS));
    }

    /** The full suite: every case on up to {@value #FULL_LEVELS} levels. */
    public static VerificationSuite full() {
        return new VerificationSuite("full", cases(FULL_LEVELS));
    }

    private static List<VerificationCase> cases(int levels) {
        SolverOptions trBdf2 = SolverOptions.defaults();
        List<VerificationCase> all = new ArrayList<>(AnalyticCases.all(levels, trBdf2));
        all.addAll(ManufacturedVerification.all(AnalyticCases.doubling(AnalyticCases.COARSEST, levels), trBdf2));
        return all;
    }

    /** The suite's name. */
    public String name() {
        return name;
    }

    /** The cases, in table order. */
    public List<VerificationCase> cases() {
        return cases;
    }

    /**
     * The outcome of a suite.
     *
     * @param suite the suite's name
     * @param runs one per case, in the suite's order
     * @param seconds wall-clock time of the whole suite
     * @param threads threads it ran on
     */
    public record Result(String suite, List<VerificationRun> runs, double seconds, int threads) {
        public Result {
            runs = List.copyOf(runs);
        }

        /** True when every check of every case passed: the condition for exit code 0. */
        public boolean passed() {
            return runs.stream().allMatch(VerificationRun::passed);
        }

        /** Number of checks. */
        public int checks() {
            return runs.stream().mapToInt(r -> r.verificationCase().checks().size()).sum();
        }

        /** Number of checks that failed. */
        public int failedChecks() {
            return runs.stream().mapToInt(VerificationRun::failedChecks).sum();
        }

        /** The plain-text table ({@link VerificationTable}). */
        public String table() {
            return VerificationTable.format(this);
        }
    }

    /** Runs every case on as many threads as the machine has processors. */
    public Result run() {
        return run(Runtime.getRuntime().availableProcessors(), r -> { });
    }

    /**
     * Runs every case.
     *
     * @param threads threads to run cases on, at least 1
     * @param onFinish told of each case as it finishes (from the thread that ran it), for progress lines
     */
    public Result run(int threads, Consumer<VerificationRun> onFinish) {
        if (threads < 1) {
            throw new InvalidParameterException("threads", Integer.toString(threads), "at least 1");
        }
        Objects.requireNonNull(onFinish, "onFinish");
        long start = System.nanoTime();
        ExecutorService pool = Executors.newFixedThreadPool(Math.min(threads, cases.size()));
        try {
            List<Future<VerificationRun>> futures = new ArrayList<>();
            for (VerificationCase c : cases) {
                futures.add(pool.submit(() -> {
                    VerificationRun run = runCase(c);
                    onFinish.accept(run);
                    return run;
                }));
            }
            List<VerificationRun> runs = new ArrayList<>();
            for (Future<VerificationRun> f : futures) {
                runs.add(f.get());
            }
            return new Result(name, runs, (System.nanoTime() - start) * 1e-9, threads);
        } catch (InterruptedException e) {
            Thread.currentThread().interrupt();
            throw new IllegalStateException("verification suite interrupted", e);
        } catch (ExecutionException e) {
            // a bug in a case (the solver's own failures are recorded in the run): rethrow it as it was
            if (e.getCause() instanceof RuntimeException runtime) {
                throw runtime;
            }
            if (e.getCause() instanceof Error error) {
                throw error;
            }
            throw new IllegalStateException(e.getCause());
        } finally {
            pool.shutdownNow();
        }
    }

    /**
     * Runs one case's levels in order. A solver failure is recorded in the run (its remaining errors NaN), so
     * the suite reports it as a failed case instead of stopping.
     */
    public static VerificationRun runCase(VerificationCase c) {
        long start = System.nanoTime();
        int levels = c.levels().size();
        int checks = c.checks().size();
        double[][] errors = new double[levels][checks];
        for (double[] row : errors) {
            Arrays.fill(row, Double.NaN);
        }
        String failure = null;
        for (int k = 0; k < levels; k++) {
            Level level = c.levels().get(k);
            try {
                double[] e = c.measurement().errors(level);
                if (e.length != checks) {
                    throw new IllegalStateException(c.name() + ": " + e.length + " errors for " + checks + " checks");
                }
                errors[k] = e.clone();
            } catch (NumericalFailureException e) {
                failure = "the solver failed on " + level.points() + " nodes: " + e.getMessage();
                break;
            }
        }
        return new VerificationRun(c, errors, (System.nanoTime() - start) * 1e-9, failure);
    }
}
