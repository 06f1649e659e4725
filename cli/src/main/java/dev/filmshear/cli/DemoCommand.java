package dev.filmshear.cli;

import dev.filmshear.cli.input.CaseFile;
import dev.filmshear.cli.input.CaseReader;
import picocli.CommandLine.Command;
import picocli.CommandLine.Option;
import picocli.CommandLine.Spec;
import picocli.CommandLine.Model.CommandSpec;

import java.io.IOException;
import java.io.InputStream;
import java.io.UncheckedIOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Path;
import java.util.concurrent.Callable;

/** {@code demo [--out DIR]}: runs the example case bundled in the jar. */
@Command(name = "demo", description = "Run the bundled example case and write its results to ./filmshear-demo/.")
final class DemoCommand implements Callable<Integer> {
    /** The bundled case, a resource of this jar. */
    static final String DEMO_CASE = "spindle-quill-startup.toml";

    @Option(names = "--out", paramLabel = "DIR", description = "result folder (default: ./filmshear-demo)")
    Path out;

    @Spec
    CommandSpec spec;

    @Override
    public Integer call() {
        String text = Examples.read(DEMO_CASE);
        CaseFile file = new CaseReader().read(text, DEMO_CASE);
        Path dir = out != null ? out : Path.of("filmshear-demo");
        spec.commandLine().getOut().printf("Running the bundled example %s%n", DEMO_CASE);
        return CaseRunner.run(file, dir, spec.commandLine().getOut());
    }

    /** The example case files bundled in the jar. */
    static final class Examples {
        private Examples() {
        }

        static String read(String name) {
            try (InputStream in = DemoCommand.class.getResourceAsStream("examples/" + name)) {
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
