package dev.filmshear.cli.fit;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import dev.filmshear.cli.FilmshearCommand;

import java.io.IOException;
import java.io.PrintWriter;
import java.io.StringWriter;
import java.io.UncheckedIOException;
import java.net.URISyntaxException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.Random;
import java.util.function.DoubleUnaryOperator;

/** Shared helpers of the fit tests: in-process runs, data files, fit.json. */
final class FitTesting {

    private FitTesting() {
    }

    /** Output of one in-process run. */
    record Outcome(int code, String out, String err) {
    }

    static Outcome run(String... args) {
        StringWriter out = new StringWriter();
        StringWriter err = new StringWriter();
        int code = FilmshearCommand.run(new PrintWriter(out, true), new PrintWriter(err, true), args);
        return new Outcome(code, out.toString(), err.toString());
    }

    /** A test resource under fit/ as a path. */
    static Path resource(String name) {
        try {
            return Path.of(FitTesting.class.getResource("/fit/" + name).toURI());
        } catch (URISyntaxException | NullPointerException e) {
            throw new IllegalStateException("missing test resource fit/" + name, e);
        }
    }

    /** fit.json of a result folder. */
    static JsonNode json(Path dir) {
        try {
            return new ObjectMapper().readTree(dir.resolve("fit.json").toFile());
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
    }

    /** The value of parameter {@code name} in fit.json. */
    static double parameter(JsonNode fit, String name, String field) {
        for (JsonNode p : fit.get("parameters")) {
            if (p.get("name").asText().equals(name)) {
                return p.get(field).asDouble();
            }
        }
        throw new AssertionError("fit.json has no parameter " + name);
    }

    /** The case-file lines printed on the console: from the line "[fluid.viscosity]" to the first blank line. */
    static String printedToml(String console) {
        String text = console.replace("\r\n", "\n");
        int at = text.indexOf("\n[fluid.viscosity]\n");
        if (at < 0) {
            throw new AssertionError("no [fluid.viscosity] lines printed:\n" + console);
        }
        int start = at + 1;
        int end = text.indexOf("\n\n", start);
        return text.substring(start, end < 0 ? text.length() : end + 1);
    }

    /**
     * Writes a data file of {@code law} at the temperatures (K), each value multiplied by
     * (1 + noise * g) with g a seeded standard normal deviate; values in SI written in full precision.
     */
    static Path writeData(Path file, String header, double[] kelvin, DoubleUnaryOperator law, double noise,
                          long seed) {
        Random random = new Random(seed);
        List<String> lines = new ArrayList<>();
        lines.add("# synthetic data, invented demonstration law, seed " + seed);
        lines.add(header);
        for (double t : kelvin) {
            double value = law.applyAsDouble(t) * (1 + noise * random.nextGaussian());
            lines.add(String.format(Locale.ROOT, "%s, %s", t, value));
        }
        try {
            Files.write(file, lines);
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
        return file;
    }

    /** n temperatures evenly from {@code from} to {@code to} (K). */
    static double[] temperatures(double from, double to, int n) {
        double[] t = new double[n];
        for (int i = 0; i < n; i++) {
            t[i] = from + (to - from) * i / (n - 1);
        }
        return t;
    }
}
