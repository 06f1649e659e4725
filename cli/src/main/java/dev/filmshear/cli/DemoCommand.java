package dev.filmshear.cli;

import dev.filmshear.cli.input.CaseFile;
import dev.filmshear.cli.input.CaseReader;
import dev.filmshear.cli.input.InputException;
import picocli.CommandLine.Command;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;
import picocli.CommandLine.Spec;
import picocli.CommandLine.Model.CommandSpec;

import java.io.IOException;
import java.io.InputStream;
import java.io.UncheckedIOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.concurrent.Callable;

/**
 * {@code demo [NAME] [--out DIR]}: runs an example case bundled in the jar (by default the journal bearing
 * start-up); {@code demo --list} names them; {@code demo NAME --save DIR} copies a case file out to edit.
 */
@Command(mixinStandardHelpOptions = true, name = "demo", description = "Run a bundled example case (default: the journal bearing start-up) and "
        + "write its results to ./filmshear-demo/.")
final class DemoCommand implements Callable<Integer> {
    /** The bundled example the README's main command runs. */
    static final String DEMO_CASE = "journal-startup";
    /** Every bundled example, in the order {@code --list} shows them. */
    static final List<String> EXAMPLES = List.of("journal-startup", "shaft-coast-down", "oscillating-plate-water",
            "spindle-quill-startup");

    @Parameters(index = "0", arity = "0..1", paramLabel = "NAME", description = "the example to run")
    String name = DEMO_CASE;

    @Option(names = "--out", paramLabel = "DIR", description = "result folder (default: ./filmshear-demo)")
    Path out;

    @Option(names = "--list", description = "list the bundled examples and exit")
    boolean list;

    @Option(names = "--save", paramLabel = "DIR", description = "copy the example's case file into DIR and exit")
    Path save;

    @Spec
    CommandSpec spec;

    @Override
    public Integer call() throws IOException {
        if (list) {
            for (String example : EXAMPLES) {
                CaseFile file = new CaseReader().read(Examples.read(example), example + ".toml");
                spec.commandLine().getOut().printf("%-24s %s%n", example, file.title());
            }
            return ExitCode.DONE.code();
        }
        if (!EXAMPLES.contains(name)) {
            throw new InputException("(command line)", 0, "NAME", "no bundled example named \"" + name + "\"",
                    name, String.join(", ", EXAMPLES));
        }
        String text = Examples.read(name);
        if (save != null) {
            Files.createDirectories(save);
            Path target = save.resolve(name + ".toml");
            Files.writeString(target, text, StandardCharsets.UTF_8);
            spec.commandLine().getOut().printf("wrote %s%n", target);
            return ExitCode.DONE.code();
        }
        CaseFile file = new CaseReader().read(text, name + ".toml");
        Path dir = out != null ? out : Path.of("filmshear-demo");
        spec.commandLine().getOut().printf("Running the bundled example %s.toml%n", name);
        return CaseRunner.run(file, dir, spec.commandLine().getOut());
    }

    /** The example case files bundled in the jar. */
    static final class Examples {
        private Examples() {
        }

        static String read(String name) {
            try (InputStream in = DemoCommand.class.getResourceAsStream("examples/" + name + ".toml")) {
                if (in == null) {
                    throw new IllegalStateException("bundled example " + name + " is missing from the jar");
                }
                return new String(in.readAllBytes(), StandardCharsets.UTF_8);
            } catch (IOException e) {
                throw new UncheckedIOException(e);
            }
        }
    }
}
