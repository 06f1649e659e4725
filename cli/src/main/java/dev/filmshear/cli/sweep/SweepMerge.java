package dev.filmshear.cli.sweep;

import dev.filmshear.cli.input.InputException;

import java.io.BufferedReader;
import java.io.BufferedWriter;
import java.io.IOException;
import java.io.UncheckedIOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;
import java.util.Optional;
import java.util.PriorityQueue;

/**
 * Joins the folders of a plan's shards into one folder, as if the plan had run in one piece.
 *
 * <p>Every folder must hold a finished slice (sweep.json {@code complete}) of the same plan (same hash
 * and header). Their results.csv files are each sorted by case index, so they are merged as sorted
 * streams, holding one line per folder in memory: case indices must then come out as 0, 1, 2, ... N - 1,
 * each once. A gap is a missing case, a repeat a doubled one (the same shard given twice, or overlapping
 * slices); either refuses the merge and writes nothing. The merged folder gets its own sweep.json (shard
 * 1/1), and its maps and report.
 */
final class SweepMerge {
    private SweepMerge() {
    }

    /**
     * How a merge went.
     *
     * @param cases cases in the plan
     * @param ok rows with status ok
     * @param failed rows with status failed
     * @param maps the maps drawn
     */
    record Outcome(long cases, long ok, long failed, List<SweepMaps.Drawn> maps) {
    }

    /** The head line of one folder while merging. */
    private record Head(long index, String line, int input) {
    }

    static Outcome merge(List<Path> dirs, Path out) {
        List<SweepManifest> manifests = new ArrayList<>();
        for (Path dir : dirs) {
            Optional<SweepManifest> m = SweepManifest.read(dir);
            if (m.isEmpty() || !Files.exists(dir.resolve(ResultsFile.NAME))) {
                throw new InputException(dir.toString(), 0, "(folder)", "not a sweep folder: no sweep.json and "
                        + "results.csv in it", InputException.quote(dir.toString()),
                        "folders written by filmshear sweep --shard K/N");
            }
            manifests.add(m.get());
        }
        SweepManifest first = manifests.get(0);
        for (int i = 0; i < dirs.size(); i++) {
            SweepManifest m = manifests.get(i);
            Path file = dirs.get(i).resolve(SweepManifest.NAME);
            if (!m.hash().equals(first.hash()) || !m.header().equals(first.header())) {
                throw new InputException(file.toString(), 0, "plan_sha256", "the folder belongs to another plan than "
                        + dirs.get(0) + " (" + first.planFile() + ")", "plan " + m.planFile() + ", hash "
                        + SweepRunner.shortHash(m.hash()), "folders of one plan, hash " + SweepRunner.shortHash(first.hash()));
            }
            if (!m.complete()) {
                throw new InputException(file.toString(), 0, "complete", "the sweep in " + dirs.get(i)
                        + " is not finished (shard " + m.shard() + ")", "complete = false",
                        "finished folders: run the same sweep command there again to finish it");
            }
            if (dirs.get(i).toAbsolutePath().normalize().equals(out.toAbsolutePath().normalize())) {
                throw new InputException(out.toString(), 0, "--out", "the output folder is one of the folders merged",
                        InputException.quote(out.toString()), "a folder other than the shards' folders");
            }
        }
        Optional<SweepManifest> existing = SweepManifest.read(out);
        if (existing.isPresent() && !existing.get().hash().equals(first.hash())) {
            throw new InputException(out.resolve(SweepManifest.NAME).toString(), 0, "--out",
                    "the output folder holds the results of another plan (" + existing.get().planFile() + ")",
                    InputException.quote(out.toString()), "a new folder, or one of the same plan");
        }
        try {
            Files.createDirectories(out);
            Path results = out.resolve(ResultsFile.NAME);
            Path tmp = ResultsFile.temporary(results);
            try {
                mergeInto(dirs, first, tmp);
            } catch (IOException | RuntimeException e) {
                Files.deleteIfExists(tmp);
                throw e;
            }
            ResultsFile.replace(tmp, results);
            SweepPlan plan = first.plan();
            long[] counts = ResultsFile.countStatuses(results, plan.columns());
            SweepManifest merged = first.whole().finished(true, counts[0], counts[1]);
            merged.write(out);
            List<SweepMaps.Drawn> maps = SweepOutputs.write(out, plan, merged);
            return new Outcome(first.cases(), counts[0], counts[1], maps);
        } catch (IOException e) {
            throw new UncheckedIOException("cannot merge into " + out + ": " + e.getMessage(), e);
        }
    }

    private static void mergeInto(List<Path> dirs, SweepManifest first, Path tmp) throws IOException {
        List<BufferedReader> inputs = new ArrayList<>();
        long[] last = new long[dirs.size()];
        long missing = 0;
        long firstMissing = -1;
        long doubled = 0;
        String firstDoubled = null;
        long expected = 0;
        int lastInput = -1;
        try (BufferedWriter writer = Files.newBufferedWriter(tmp, StandardCharsets.UTF_8)) {
            PriorityQueue<Head> heads = new PriorityQueue<>(
                    Comparator.comparingLong(Head::index).thenComparingInt(Head::input));
            for (int i = 0; i < dirs.size(); i++) {
                BufferedReader in = Files.newBufferedReader(dirs.get(i).resolve(ResultsFile.NAME),
                        StandardCharsets.UTF_8);
                inputs.add(in);
                String header = in.readLine();
                if (!first.header().equals(header)) {
                    throw new InputException(dirs.get(i).resolve(ResultsFile.NAME).toString(), 1, "(header)",
                            "results.csv does not have the header its sweep.json names", "another header",
                            "the results.csv written by filmshear sweep");
                }
                last[i] = -1;
                advance(dirs, inputs, i, last, heads);
            }
            writer.write(first.header());
            writer.write('\n');
            while (!heads.isEmpty()) {
                Head h = heads.poll();
                if (h.index() < expected) {
                    doubled++;
                    if (firstDoubled == null) {
                        firstDoubled = "case " + h.index() + " in " + dirs.get(lastInput) + " and " + dirs.get(h.input());
                    }
                } else {
                    if (h.index() > expected) {
                        missing += h.index() - expected;
                        firstMissing = firstMissing < 0 ? expected : firstMissing;
                    }
                    writer.write(h.line());
                    writer.write('\n');
                    expected = h.index() + 1;
                    lastInput = h.input();
                }
                advance(dirs, inputs, h.input(), last, heads);
            }
        } finally {
            for (BufferedReader in : inputs) {
                in.close();
            }
        }
        if (expected < first.cases()) {
            missing += first.cases() - expected;
            firstMissing = firstMissing < 0 ? expected : firstMissing;
        }
        if (missing > 0 || doubled > 0) {
            List<String> problems = new ArrayList<>();
            if (missing > 0) {
                problems.add(missing + " of " + first.cases() + " cases missing (the first: case " + firstMissing
                        + ", shard " + (firstMissing % first.shard().n() + 1) + "/" + first.shard().n() + ")");
            }
            if (doubled > 0) {
                problems.add(doubled + " cases doubled (the first: " + firstDoubled + ")");
            }
            throw new InputException(dirs.get(0).toString(), 0, "(merge)", String.join("; ", problems),
                    dirs.size() + " folders", "the folders of every shard 1/N to N/N of one plan, each once");
        }
    }

    private static void advance(List<Path> dirs, List<BufferedReader> inputs, int i, long[] last,
                                PriorityQueue<Head> heads) throws IOException {
        String line = inputs.get(i).readLine();
        if (line == null) {
            return;
        }
        long index = Long.parseLong(CsvLine.lastField(line));
        if (index <= last[i]) {
            throw new InputException(dirs.get(i).resolve(ResultsFile.NAME).toString(), 0, "case_index",
                    "rows are not in case order (case " + index + " after case " + last[i] + ")",
                    "an unsorted results.csv", "the finished results.csv of a sweep");
        }
        last[i] = index;
        heads.add(new Head(index, line, i));
    }
}
