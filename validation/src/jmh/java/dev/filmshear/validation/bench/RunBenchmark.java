package dev.filmshear.validation.bench;

import dev.filmshear.solver.model.FilmCase;
import dev.filmshear.solver.model.FilmResult;
import dev.filmshear.solver.model.FilmSolver;
import dev.filmshear.solver.model.SolverOptions;
import org.openjdk.jmh.annotations.AuxCounters;
import org.openjdk.jmh.annotations.Benchmark;
import org.openjdk.jmh.annotations.BenchmarkMode;
import org.openjdk.jmh.annotations.Fork;
import org.openjdk.jmh.annotations.Level;
import org.openjdk.jmh.annotations.Measurement;
import org.openjdk.jmh.annotations.Mode;
import org.openjdk.jmh.annotations.OutputTimeUnit;
import org.openjdk.jmh.annotations.Scope;
import org.openjdk.jmh.annotations.Setup;
import org.openjdk.jmh.annotations.State;
import org.openjdk.jmh.annotations.Warmup;

import java.util.concurrent.TimeUnit;

/**
 * (c) A complete heated start-up and (d) a steady coupled solve of the speed issue's case, through the
 * solver's facade as a caller uses it (case in, result out, every output time recorded, derived numbers
 * included). The step count is reported beside the time as an auxiliary counter.
 */
@BenchmarkMode(Mode.AverageTime)
@OutputTimeUnit(TimeUnit.MICROSECONDS)
@Warmup(iterations = 3, time = 2)
@Measurement(iterations = 5, time = 2)
@Fork(1)
public class RunBenchmark {

    /** The cases, built once. */
    @State(Scope.Benchmark)
    public static class Cases {
        FilmCase startUp;
        FilmCase steady;
        SolverOptions options;

        @Setup(Level.Trial)
        public void setUp() {
            startUp = BenchmarkCases.heatedStartUp(BenchmarkCases.GAP, 20);
            steady = BenchmarkCases.steady();
            options = SolverOptions.defaults().outputTimesOnly();
        }
    }

    /** Steps of the last run, reported per invocation. */
    @State(Scope.Thread)
    @AuxCounters(AuxCounters.Type.EVENTS)
    public static class Steps {
        public long steps;
        public long newtonIterations;
    }

    @Benchmark
    public FilmResult heatedStartUp(Cases cases, Steps steps) {
        FilmResult result = FilmSolver.solve(cases.startUp, cases.options);
        steps.steps = result.summary().steps();
        steps.newtonIterations = result.summary().newtonIterations();
        return result;
    }

    @Benchmark
    public FilmResult steadyCoupledSolve(Cases cases, Steps steps) {
        FilmResult result = FilmSolver.solve(cases.steady, cases.options);
        steps.steps = result.summary().steps();
        steps.newtonIterations = result.summary().newtonIterations();
        return result;
    }
}
