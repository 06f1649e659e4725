package dev.filmshear.cli;

import dev.filmshear.cli.input.CaseFile;
import dev.filmshear.cli.input.CaseReader;
import dev.filmshear.cli.verify.ConvergenceRun;
import picocli.CommandLine.Command;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;
import picocli.CommandLine.Spec;
import picocli.CommandLine.Model.CommandSpec;

import java.nio.file.Path;
import java.util.concurrent.Callable;

/** {@code run CASE.toml [--out DIR]}: solves one case and writes its result folder. */
@Command(mixinStandardHelpOptions = true, name = "run", description = "Solve one case and write its results (summary.json, history.csv, "
        + "profiles.csv, plots).")
final class RunCommand implements Callable<Integer> {

    @Parameters(index = "0", paramLabel = "CASE.toml", description = "the case file")
    Path caseFile;

    @Option(names = "--out", paramLabel = "DIR", description = "result folder (default: ./out/<case name>)")
    Path out;

    @Option(names = "--convergence", description = "solution verification: solve on three grids and report the "
            + "observed order and grid convergence index of the wall shear stresses and highest temperature")
    boolean convergence;

    @Spec
    CommandSpec spec;

    @Override
    public Integer call() {
        CaseFile file = new CaseReader().read(caseFile);
        Path dir = out != null ? out : Path.of("out", baseName(caseFile));
        if (convergence) {
            return ConvergenceRun.run(file, dir, spec.commandLine().getOut(), CaseRunner::run, CaseRunner::caseText);
        }
        return CaseRunner.run(file, dir, spec.commandLine().getOut());
    }

    /** The file name without its .toml extension. */
    static String baseName(Path file) {
        String name = file.getFileName().toString();
        return name.endsWith(".toml") ? name.substring(0, name.length() - 5) : name;
    }
}
