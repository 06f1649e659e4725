package dev.filmshear.cli.sweep;

import dev.filmshear.cli.ExitCode;
import dev.filmshear.cli.input.CaseReader;
import dev.filmshear.cli.output.Caution;
import picocli.CommandLine;
import picocli.CommandLine.Command;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;
import picocli.CommandLine.Spec;
import picocli.CommandLine.Model.CommandSpec;

import java.io.BufferedReader;
import java.io.IOException;
import java.io.PrintWriter;
import java.io.UncheckedIOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.concurrent.Callable;

/**
 * {@code sweep PLAN.toml [--out DIR] [--threads N] [--shard K/N]}: runs every combination of a plan's
 * axes (or one slice of them) into a folder, resuming what an earlier start left unfinished.
 *
 * <p>Exit codes: 0 when every case of the slice has its row, failed cases included (their count is
 * printed); 2 for a bad plan or a folder of another plan or slice; 3 when every case of the slice failed
 * (the base case itself is then almost surely at fault, and a batch job should notice); 1 otherwise.
 */
@Command(name = "sweep", description = {"Run every combination of a plan's axes and write one row per case to "
        + "results.csv, with maps and report.html. Re-running the same command on the same folder resumes: "
        + "only the missing cases run.",
        "A plan names a base case and its axes:",
        "  base = \"startup.toml\"",
        "  [axes]",
        "  \"geometry.gap\" = { from = \"10 um\", to = \"60 um\", count = 6 }",
        "  \"upper_wall.velocity.to\" = [\"2 m/s\", \"10 m/s\", \"30 m/s\"]",
        "A range may add spacing = \"log\". Optional: [sweep] maps = [\"max_temperature_K\", ...] and "
                + "temperature_limit = \"120 degC\"."})
public final class SweepCommand implements Callable<Integer> {

    @Parameters(index = "0", paramLabel = "PLAN.toml", description = "the sweep plan")
    Path planFile;

    @Option(names = "--out", paramLabel = "DIR",
            description = "result folder (default: ./out/<plan name>, or ./out/<plan name>-shard-K-of-N)")
    Path out;

    @Option(names = "--threads", paramLabel = "N", description = "worker threads (default: every core)")
    Integer threads;

    @Option(names = "--shard", paramLabel = "K/N", converter = Shard.Converter.class,
            description = "run only the K-th of N slices (cases i with i mod N = K-1); default from "
                    + "SLURM_ARRAY_TASK_ID and SLURM_ARRAY_TASK_COUNT in a Slurm job array, else 1/1")
    Shard shard;

    @Option(names = {"-h", "--help"}, usageHelp = true, description = "show this help and exit")
    boolean help;

    @Spec
    CommandSpec spec;

    @Override
    public Integer call() {
        int workers = threads != null ? threads : Runtime.getRuntime().availableProcessors();
        if (workers < 1) {
            throw new CommandLine.ParameterException(spec.commandLine(), "--threads must be 1 or more (given "
                    + workers + ")");
        }
        Shard slice = shard != null ? shard : Shard.fromEnvironment(System.getenv()).orElse(Shard.WHOLE);
        SweepPlan plan = SweepPlan.read(planFile);
        plan.checkKeys(new CaseReader());
        Path dir = out != null ? out : defaultFolder(planFile, slice);
        PrintWriter console = spec.commandLine().getOut();
        PrintWriter err = spec.commandLine().getErr();
        SweepRunner.Outcome o;
        try {
            o = SweepRunner.run(plan, dir, workers, slice, true);
        } catch (SweepFailure failure) {
            err.println(failure.getMessage());
            return failure.exitCode().code();
        }
        console.printf("sweep %s: %d cases%s%n", plan.planName(), plan.caseCount(),
                slice.isWhole() ? "" : ", shard " + slice + " holds " + o.sliceCases());
        if (o.ran() > 0) {
            console.printf("  ran %d in %.1f s (%.3g cases/s, %d threads)%s%n", o.ran(), o.seconds(), o.rate(),
                    workers, o.doneBefore() > 0 ? "; " + o.doneBefore() + " were done before" : "");
        } else {
            console.printf("  nothing to run: all %d cases have their row%n", o.sliceCases());
        }
        if (o.dropped() > 0) {
            console.printf("  %d incomplete or repeated line(s) of an interrupted start were dropped and redone%n",
                    o.dropped());
        }
        console.printf("  ok %d, failed %d%s%n", o.ok(), o.failed(),
                o.failed() > 0 ? " (status failed; the messages are in results.csv and report.html)" : "");
        console.printf("  results in %s, report in %s%n", dir.resolve(ResultsFile.NAME), dir.resolve(SweepReport.NAME));
        console.printf("%s%n", Caution.TEXT);
        if (o.sliceCases() > 0 && o.failed() == o.sliceCases()) {
            err.printf("error: %s:%d: base: every one of the %d cases failed; the first: %s%n", plan.planPath(),
                    plan.baseLine(), o.sliceCases(), firstMessage(dir.resolve(ResultsFile.NAME), plan));
            return ExitCode.FAILED.code();
        }
        return ExitCode.DONE.code();
    }

    /** The default folder: ./out/<plan name>, with the slice in the name when sharded. */
    static Path defaultFolder(Path planFile, Shard shard) {
        String name = planFile.getFileName().toString();
        name = name.endsWith(".toml") ? name.substring(0, name.length() - 5) : name;
        return Path.of("out", shard.isWhole() ? name : name + "-shard-" + shard.k() + "-of-" + shard.n());
    }

    private static String firstMessage(Path results, SweepPlan plan) {
        try (BufferedReader in = Files.newBufferedReader(results, StandardCharsets.UTF_8)) {
            in.readLine();
            String row = in.readLine();
            List<String> fields = CsvLine.split(row == null ? "" : row).orElse(List.of());
            int column = plan.columns().messageColumn();
            return fields.size() > column ? fields.get(column) : "(no message)";
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
    }
}
