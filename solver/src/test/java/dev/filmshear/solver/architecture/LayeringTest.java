package dev.filmshear.solver.architecture;

import org.junit.jupiter.api.Test;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import java.util.stream.Stream;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

/**
 * The solver's packages depend only downward: base, grid, physics, linalg, time, discretization, model.
 * The time layer is generic (it integrates any {@code ImplicitSystem}) and sits below the film
 * discretization, which implements that interface. The solver never imports the command line or the
 * validation module, and never touches files, consoles or plots.
 */
class LayeringTest {
    private static final Map<String, Integer> LAYER = Map.of(
            "base", 0, "grid", 1, "physics", 2, "linalg", 3, "time", 4, "discretization", 5, "model", 6);
    private static final Pattern IMPORT = Pattern.compile("^import (static )?([\\w.]+)", Pattern.MULTILINE);
    private static final Path SOURCES = Path.of("src/main/java/dev/filmshear/solver");

    @Test
    void packagesDependOnlyDownward() throws IOException {
        List<String> violations = new ArrayList<>();
        List<Path> files;
        try (Stream<Path> walk = Files.walk(SOURCES)) {
            files = walk.filter(p -> p.toString().endsWith(".java")).toList();
        }
        assertTrue(files.size() > 20, "found the solver sources");
        for (Path file : files) {
            String layer = SOURCES.relativize(file).getName(0).toString();
            Integer own = LAYER.get(layer);
            assertTrue(own != null, "unknown solver package " + layer + " (add it to the layer table)");
            String text = Files.readString(file);
            Matcher m = IMPORT.matcher(text);
            while (m.find()) {
                String imported = m.group(2);
                if (imported.startsWith("dev.filmshear.solver.")) {
                    String target = imported.substring("dev.filmshear.solver.".length()).split("\\.")[0];
                    Integer other = LAYER.get(target);
                    if (other == null || other > own) {
                        violations.add(file.getFileName() + " (" + layer + ") imports " + imported);
                    }
                } else if (imported.startsWith("dev.filmshear.")) {
                    violations.add(file.getFileName() + " imports outside the solver: " + imported);
                } else if (imported.startsWith("java.io") || imported.startsWith("java.nio.file")
                        || imported.startsWith("java.awt") || imported.startsWith("org.knowm")) {
                    violations.add(file.getFileName() + " does I/O or plotting: " + imported);
                }
            }
            if (text.contains("System.out") || text.contains("System.err")) {
                violations.add(file.getFileName() + " prints to the console");
            }
        }
        assertEquals(List.of(), violations);
    }
}
