package dev.filmshear.cli.verify;

import dev.filmshear.cli.ExitCode;
import dev.filmshear.solver.base.InvalidParameterException;
import dev.filmshear.validation.suite.VerificationRun;
import dev.filmshear.validation.suite.VerificationSuite;
import picocli.CommandLine.Command;
import picocli.CommandLine.Option;
import picocli.CommandLine.Spec;
import picocli.CommandLine.Model.CommandSpec;

import java.io.PrintWriter;
import java.nio.file.Path;
import java.util.Locale;
import java.util.concurrent.Callable;

/**
 * {@code verify [--quick] [--out DIR] [--threads N]}: runs the verification suite (every closed-form case of the
 * validation module and the manufactured solutions of the coupled system, each over grid and time-step
 * refinements), prints its table and writes the report (report.html, verification.csv, verification.json, one PNG per
 * case) into DIR.
 *
 * <p>Exit code {@code 0} when every check passes; {@code 3} ("the physics or numerics failed", contract.md) when
 * any observed order lies outside its band, an error exceeds its round-off floor, or the solver fails on a case: a
 * failed verification is a failure of the numerics. The report is written in either case. Numerics stay in
 * {@link VerificationSuite}; this class converts options and writes.
 */
@Command(name = "verify", description = "Run the verification suite against closed-form and manufactured solutions, "
        + "print the table of errors and observed orders, and write a report (exit 3 when any check fails).")
public final class VerifyCommand implements Callable<Integer> {
    /** Default result folder. */
    static final String DEFAULT_OUT = "filmshear-verify";

    @Option(names = "--quick", description = "run the quick suite (three grids per case, a few seconds) instead of "
            + "the full one (up to six grids, under a minute)")
    boolean quick;

    @Option(names = "--out", paramLabel = "DIR", description = "report folder (default: ./" + DEFAULT_OUT + ")")
    Path out;

    @Option(names = "--threads", paramLabel = "N", description = "cases run in parallel (default: the number of "
            + "processors)")
    Integer threads;

    @Spec
    CommandSpec spec;

    @Override
    public Integer call() {
        PrintWriter console = spec.commandLine().getOut();
        int n = threads != null ? threads : Runtime.getRuntime().availableProcessors();
        if (n < 1) {
            throw new InvalidParameterException("threads", Integer.toString(n), "1 or more");
        }
        VerificationSuite suite = quick ? VerificationSuite.quick() : VerificationSuite.full();
        Path dir = out != null ? out : Path.of(DEFAULT_OUT);
        console.printf("Running the %s verification suite: %d cases on %d thread%s%n", suite.name(),
                suite.cases().size(), n, n == 1 ? "" : "s");
        console.flush();
        VerificationSuite.Result result = suite.run(n, run -> progress(console, run));
        console.println();
        console.print(result.table());
        VerificationReport.write(dir, result);
        console.printf("report in %s%n", dir.resolve(VerificationReport.HTML));
        console.flush();
        int code = exitCode(result);
        if (code != ExitCode.DONE.code()) {
            spec.commandLine().getErr().printf("error: verification failed: %d of %d checks outside their expected "
                    + "bands (%s); see %s%n", result.failedChecks(), result.checks(), failedCases(result),
                    dir.resolve(VerificationReport.HTML));
        }
        return code;
    }

    /** 0 when every check passed, else 3: a verification that fails is a failure of the numerics. */
    static int exitCode(VerificationSuite.Result result) {
        return result.passed() ? ExitCode.DONE.code() : ExitCode.FAILED.code();
    }

    /** One line per finished case; called from the suite's threads. */
    private static void progress(PrintWriter console, VerificationRun run) {
        synchronized (console) {
            console.printf(Locale.ROOT, "  %-4s %s (%.1f s)%n", run.passed() ? "ok" : "FAIL",
                    run.verificationCase().name(), run.seconds());
            console.flush();
        }
    }

    private static String failedCases(VerificationSuite.Result result) {
        StringBuilder b = new StringBuilder();
        for (VerificationRun run : result.runs()) {
            if (!run.passed()) {
                b.append(b.length() == 0 ? "" : "; ").append(run.verificationCase().name());
            }
        }
        return b.toString();
    }
}
