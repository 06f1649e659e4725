package dev.filmshear.cli.sweep;

import dev.filmshear.cli.ExitCode;
import picocli.CommandLine.Command;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;
import picocli.CommandLine.Spec;
import picocli.CommandLine.Model.CommandSpec;

import java.io.PrintWriter;
import java.nio.file.Path;
import java.util.List;
import java.util.concurrent.Callable;

/**
 * {@code merge DIR... --out DIR}: joins the folders of a plan's shards into one, checking that they belong
 * to the same plan and that every case is there exactly once. Exit codes: 0 merged; 2 when the folders do
 * not make up one finished plan (the message says which case is missing or doubled); 1 otherwise.
 */
@Command(name = "merge", description = "Join the result folders of a plan's shards (sweep --shard K/N) into one "
        + "folder, with maps and report.html, as if the plan had run in one piece.")
public final class MergeCommand implements Callable<Integer> {

    @Parameters(arity = "1..*", paramLabel = "DIR", description = "the shards' result folders")
    List<Path> folders;

    @Option(names = "--out", paramLabel = "DIR", required = true, description = "the merged result folder")
    Path out;

    @Option(names = {"-h", "--help"}, usageHelp = true, description = "show this help and exit")
    boolean help;

    @Spec
    CommandSpec spec;

    @Override
    public Integer call() {
        SweepMerge.Outcome o = SweepMerge.merge(folders, out);
        PrintWriter console = spec.commandLine().getOut();
        console.printf("merged %d folders: %d cases, ok %d, failed %d%n", folders.size(), o.cases(), o.ok(),
                o.failed());
        console.printf("  results in %s, report in %s%n", out.resolve(ResultsFile.NAME), out.resolve(SweepReport.NAME));
        return ExitCode.DONE.code();
    }
}
