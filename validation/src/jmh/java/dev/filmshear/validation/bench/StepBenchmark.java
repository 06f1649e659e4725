package dev.filmshear.validation.bench;

import dev.filmshear.solver.model.FilmModel;
import dev.filmshear.solver.model.SolverOptions;
import org.openjdk.jmh.annotations.Benchmark;
import org.openjdk.jmh.annotations.BenchmarkMode;
import org.openjdk.jmh.annotations.Fork;
import org.openjdk.jmh.annotations.Level;
import org.openjdk.jmh.annotations.Measurement;
import org.openjdk.jmh.annotations.Mode;
import org.openjdk.jmh.annotations.OperationsPerInvocation;
import org.openjdk.jmh.annotations.OutputTimeUnit;
import org.openjdk.jmh.annotations.Scope;
import org.openjdk.jmh.annotations.Setup;
import org.openjdk.jmh.annotations.State;
import org.openjdk.jmh.annotations.Warmup;

import java.util.concurrent.TimeUnit;

/**
 * (a) One implicit momentum step and (b) one coupled momentum-energy step with a Vogel law, on 201 nodes,
 * reported per node per step (each invocation is one accepted adaptive step, counted as 201 operations).
 * The walls oscillate so that every step has real work; the film runs on indefinitely (end 1e9 s).
 */
@BenchmarkMode(Mode.AverageTime)
@OutputTimeUnit(TimeUnit.NANOSECONDS)
@Warmup(iterations = 3, time = 2)
@Measurement(iterations = 5, time = 2)
@Fork(1)
public class StepBenchmark {

    /** A momentum-only film, stepped on from one benchmark invocation to the next. */
    @State(Scope.Thread)
    public static class Momentum {
        FilmModel model;

        @Setup(Level.Trial)
        public void setUp() {
            model = new FilmModel(BenchmarkCases.isothermalOscillation(), SolverOptions.defaults());
            for (int i = 0; i < 1000; i++) {
                model.advance(1e9);
            }
        }
    }

    /** A heated film with a Vogel oil. */
    @State(Scope.Thread)
    public static class Coupled {
        FilmModel model;

        @Setup(Level.Trial)
        public void setUp() {
            model = new FilmModel(BenchmarkCases.coupledOscillation(), SolverOptions.defaults());
            for (int i = 0; i < 1000; i++) {
                model.advance(1e9);
            }
        }
    }

    @Benchmark
    @OperationsPerInvocation(BenchmarkCases.POINTS)
    public boolean momentumStepPerNode(Momentum state) {
        return state.model.advance(1e9);
    }

    @Benchmark
    @OperationsPerInvocation(BenchmarkCases.POINTS)
    public boolean coupledStepPerNode(Coupled state) {
        return state.model.advance(1e9);
    }
}
