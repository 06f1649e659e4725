package dev.filmshear.cli;

import dev.filmshear.cli.input.InputException;
import dev.filmshear.cli.sweep.MergeCommand;
import dev.filmshear.cli.sweep.SweepCommand;
import dev.filmshear.solver.base.InvalidParameterException;
import dev.filmshear.solver.base.NumericalFailureException;
import picocli.CommandLine;
import picocli.CommandLine.Command;
import picocli.CommandLine.Option;

import java.io.PrintWriter;
import java.io.UncheckedIOException;

/**
 * The {@code filmshear} command: reads case files, solves the film equations, writes results. Each
 * subcommand validates its input, converts it into the solver's own records and hands over; no
 * numerics here.
 */
@Command(name = "filmshear", mixinStandardHelpOptions = true, versionProvider = FilmshearCommand.VersionProvider.class,
        description = "Transient and steady shear flow and shear heating of thin viscous films between moving walls.",
        subcommands = {RunCommand.class, CheckCommand.class, DemoCommand.class, FluidsCommand.class,
                dev.filmshear.cli.fit.FitCommand.class, dev.filmshear.cli.sweep.SweepCommand.class,
                dev.filmshear.cli.sweep.MergeCommand.class, dev.filmshear.cli.verify.VerifyCommand.class,
                CommandLine.HelpCommand.class},
        exitCodeListHeading = "%nExit codes:%n", exitCodeList = {}, footer = "")
public final class FilmshearCommand implements Runnable {

    @Option(names = "--debug", scope = CommandLine.ScopeType.INHERIT,
            description = "print the full stack trace of any error")
    boolean debug;

    @CommandLine.Spec
    CommandLine.Model.CommandSpec spec;

    @Override
    public void run() {
        throw new CommandLine.ParameterException(spec.commandLine(), "a command is required (run, check, demo, ...)");
    }

    /** Runs the command line in-process and returns the exit code (tests call this). */
    public static int run(String... args) {
        return run(new PrintWriter(System.out, true), new PrintWriter(System.err, true), args);
    }

    /** Runs the command line with the given output and error streams. */
    public static int run(PrintWriter out, PrintWriter err, String... args) {
        System.setProperty("java.awt.headless", "true");
        FilmshearCommand root = new FilmshearCommand();
        CommandLine line = new CommandLine(root);
        line.setOut(out);
        line.setErr(err);
        line.getCommandSpec().usageMessage().exitCodeList(exitCodeMap());
        line.setExecutionExceptionHandler((e, cmd, parseResult) -> handle(e, err, root.debug || debugRequested(args)));
        line.getCommandSpec().usageMessage().footer("%n");
        line.setParameterExceptionHandler((ex, a) -> {
            err.println("error: " + oneLine(ex.getMessage()) + " (see: filmshear " + commandPath(ex.getCommandLine())
                    + "--help)");
            return ExitCode.BAD_INPUT.code();
        });
        return line.execute(args);
    }

    private static String commandPath(CommandLine line) {
        String path = "";
        for (CommandLine c = line; c.getParent() != null; c = c.getParent()) {
            path = c.getCommandName() + " " + path;
        }
        return path;
    }

    private static boolean debugRequested(String[] args) {
        for (String a : args) {
            if ("--debug".equals(a)) {
                return true;
            }
        }
        return false;
    }

    private static java.util.Map<String, String> exitCodeMap() {
        java.util.Map<String, String> map = new java.util.LinkedHashMap<>();
        for (ExitCode code : ExitCode.values()) {
            map.put(Integer.toString(code.code()), code.meaning());
        }
        return map;
    }

    /** Maps the three kinds of failure to their exit codes, printing one line (and the trace with --debug). */
    static int handle(Exception e, PrintWriter err, boolean debug) {
        if (debug) {
            e.printStackTrace(err);
        }
        if (e instanceof InputException input) {
            err.println(input.oneLine());
            return ExitCode.BAD_INPUT.code();
        }
        if (e instanceof CommandFailure failure) {
            err.println(oneLine(failure.getMessage()));
            return failure.exitCode().code();
        }
        if (e instanceof NumericalFailureException numerical) {
            err.println("error: " + oneLine(numerical.getMessage()));
            return ExitCode.FAILED.code();
        }
        if (e instanceof InvalidParameterException invalid) {
            err.println("error: " + oneLine(invalid.getMessage()));
            return ExitCode.BAD_INPUT.code();
        }
        if (e instanceof UncheckedIOException io) {
            err.println("error: " + oneLine(io.getMessage()));
            return ExitCode.OTHER.code();
        }
        err.println("error: internal error: " + oneLine(String.valueOf(e)) + " (rerun with --debug and report it)");
        return ExitCode.OTHER.code();
    }

    /** A message on one line. */
    static String oneLine(String message) {
        return message == null ? "" : message.replaceAll("\\s*[\\r\\n]+\\s*", "; ");
    }

    /** The entry point of the runnable jar. */
    public static void main(String[] args) {
        System.exit(run(args));
    }

    /** The version from the jar manifest. */
    static final class VersionProvider implements CommandLine.IVersionProvider {
        @Override
        public String[] getVersion() {
            return new String[] {"filmshear " + dev.filmshear.cli.output.Version.get()};
        }
    }
}
