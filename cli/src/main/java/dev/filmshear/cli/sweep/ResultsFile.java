package dev.filmshear.cli.sweep;

import dev.filmshear.cli.input.InputException;

import java.io.BufferedInputStream;
import java.io.BufferedReader;
import java.io.BufferedWriter;
import java.io.ByteArrayOutputStream;
import java.io.Closeable;
import java.io.IOException;
import java.io.InputStream;
import java.nio.ByteBuffer;
import java.nio.channels.FileChannel;
import java.nio.charset.StandardCharsets;
import java.nio.file.AtomicMoveNotSupportedException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.StandardCopyOption;
import java.nio.file.StandardOpenOption;
import java.util.ArrayList;
import java.util.BitSet;
import java.util.Comparator;
import java.util.List;
import java.util.Optional;
import java.util.PriorityQueue;
import java.util.UUID;
import java.util.stream.Stream;

/**
 * results.csv on disk: made ready for appending (resume), appended to as cases finish, and rewritten in
 * case-index order at the end, all in memory bounded independently of the number of cases.
 *
 * <p><b>Appending.</b> One writer thread appends the rows of finished cases, then flushes and forces
 * them to the disk ({@link FileChannel#force}) before counting them as done. A process killed at any
 * moment therefore leaves complete rows plus at most one torn last line.
 *
 * <p><b>Resume.</b> {@link #prepare} reads the file once: a row counts as done when it ends with a line
 * break, has the header's number of fields, a status of {@code ok} or {@code failed}, and a case index of
 * this plan and shard not seen before. A torn or malformed last line is cut off; should a malformed
 * line ever stand between good rows, the good rows are copied into a new file that replaces the old one.
 * The done cases are kept as one bit per case.
 *
 * <p><b>Final order.</b> Rows arrive in the order cases finish, which depends on threads and
 * interruptions; {@link #sortByIndex} rewrites the file in case-index order so that the finished file is
 * the same byte for byte however it was produced. It is an external merge sort: runs of
 * {@value #RUN_ROWS} rows are sorted in memory and written to scratch files, then merged
 * {@value #FAN_IN} at a time. Every rewrite goes to a temporary file in the same folder, forced to disk
 * and moved over the old file atomically, so that a reader (or a kill) sees either the old file or the
 * new one.
 */
final class ResultsFile {
    /** The file's name in a sweep folder (the contract's name). */
    static final String NAME = "results.csv";
    /** Rows sorted in memory at a time: a few megabytes. */
    static final int RUN_ROWS = 4096;
    /** Scratch files merged at a time, well below any limit on open files. */
    static final int FAN_IN = 32;
    private static final String TMP = ".tmp";
    private static final String SORT_SCRATCH = ".sort-";

    private ResultsFile() {
    }

    /**
     * What {@link #prepare} found.
     *
     * @param done the case indices with a row
     * @param ok rows with status ok
     * @param failed rows with status failed
     * @param dropped torn, malformed or repeated lines removed
     */
    record Scan(BitSet done, long ok, long failed, long dropped) {
    }

    /**
     * Makes results.csv ready for appending: writes the header when the file is new (or holds only a torn
     * header), otherwise keeps its good rows as described in the class comment.
     *
     * @throws InputException when the file's header is not the one this plan and version write
     */
    static Scan prepare(Path file, ResultColumns columns, long total, Shard shard) throws IOException {
        BitSet done = new BitSet();
        if (!Files.exists(file) || Files.size(file) == 0) {
            writeHeader(file, columns);
            return new Scan(done, 0, 0, 0);
        }
        long ok = 0;
        long failed = 0;
        long dropped = 0;
        long firstBad = -1;
        boolean badBetweenGood = false;
        try (LineInput in = new LineInput(Files.newInputStream(file))) {
            Optional<String> header = in.next();
            if (header.isEmpty() || !in.terminated()) {
                writeHeader(file, columns);
                return new Scan(done, 0, 0, 0);
            }
            checkHeader(file, columns, header.get());
            long offset = in.offset();
            for (Optional<String> line = in.next(); line.isPresent(); line = in.next()) {
                long start = offset;
                offset = in.offset();
                long index = in.terminated() ? caseIndex(line.get(), columns, total) : -1;
                String status = index < 0 ? "" : CsvLine.split(line.get()).orElseThrow().get(columns.statusColumn());
                if (index < 0 || !shard.contains(index) || done.get((int) index)) {
                    dropped++;
                    firstBad = firstBad < 0 ? start : firstBad;
                    continue;
                }
                badBetweenGood |= firstBad >= 0;
                done.set((int) index);
                if (status.equals(ResultColumns.OK)) {
                    ok++;
                } else {
                    failed++;
                }
            }
        }
        if (badBetweenGood) {
            keepOnly(file, columns, done, total);
        } else if (firstBad >= 0) {
            try (FileChannel channel = FileChannel.open(file, StandardOpenOption.WRITE)) {
                channel.truncate(firstBad);
                channel.force(true);
            }
        }
        return new Scan(done, ok, failed, dropped);
    }

    /** The case index of a good row, or -1 when the line is not one (see {@link #prepare}). */
    static long caseIndex(String line, ResultColumns columns, long total) {
        Optional<List<String>> fields = CsvLine.split(line);
        if (fields.isEmpty() || fields.get().size() != columns.size()) {
            return -1;
        }
        String status = fields.get().get(columns.statusColumn());
        if (!status.equals(ResultColumns.OK) && !status.equals(ResultColumns.FAILED)) {
            return -1;
        }
        try {
            long index = Long.parseLong(fields.get().get(columns.indexColumn()));
            return index >= 0 && index < total ? index : -1;
        } catch (NumberFormatException e) {
            return -1;
        }
    }

    private static void checkHeader(Path file, ResultColumns columns, String header) {
        if (!header.equals(columns.header())) {
            String shown = header.length() > 80 ? header.substring(0, 77) + "..." : header;
            throw new InputException(file.toString(), 1, "(header)",
                    "results.csv has other columns than this plan and version of filmshear write",
                    InputException.quote(shown), "the folder of this plan's sweep, or a new --out folder");
        }
    }

    private static void writeHeader(Path file, ResultColumns columns) throws IOException {
        Path tmp = temporary(file);
        Files.writeString(tmp, columns.header() + "\n", StandardCharsets.UTF_8);
        replace(tmp, file);
    }

    /** Copies the first row of every done case into a new file that replaces {@code file}. */
    private static void keepOnly(Path file, ResultColumns columns, BitSet done, long total) throws IOException {
        Path tmp = temporary(file);
        BitSet written = new BitSet();
        try (LineInput in = new LineInput(Files.newInputStream(file));
             BufferedWriter out = Files.newBufferedWriter(tmp, StandardCharsets.UTF_8)) {
            out.write(in.next().orElseThrow() + "\n");
            for (Optional<String> line = in.next(); line.isPresent(); line = in.next()) {
                long index = in.terminated() ? caseIndex(line.get(), columns, total) : -1;
                if (index >= 0 && done.get((int) index) && !written.get((int) index)) {
                    written.set((int) index);
                    out.write(line.get() + "\n");
                }
            }
        }
        replace(tmp, file);
    }

    /** Appends rows and forces them to the disk; used by one thread. */
    static final class Appender implements Closeable {
        private final FileChannel channel;

        Appender(Path file) throws IOException {
            channel = FileChannel.open(file, StandardOpenOption.WRITE, StandardOpenOption.APPEND);
        }

        void append(List<CaseSolver.Row> rows) throws IOException {
            StringBuilder text = new StringBuilder(rows.size() * 512);
            for (CaseSolver.Row row : rows) {
                text.append(row.line());
            }
            ByteBuffer bytes = ByteBuffer.wrap(text.toString().getBytes(StandardCharsets.UTF_8));
            while (bytes.hasRemaining()) {
                channel.write(bytes);
            }
            channel.force(false);
        }

        @Override
        public void close() throws IOException {
            channel.close();
        }
    }

    /** One row and its case index, while sorting. */
    private record Keyed(long index, String line) {
    }

    /**
     * Rewrites the file in case-index order (nothing is written when it is in order already), keeping the
     * first row of a case that appears twice.
     */
    static void sortByIndex(Path file) throws IOException {
        sortByIndex(file, RUN_ROWS, FAN_IN);
    }

    /** As {@link #sortByIndex(Path)} with the run length and merge width given (tests use small ones). */
    static void sortByIndex(Path file, int runRows, int fanIn) throws IOException {
        if (inOrder(file)) {
            return;
        }
        Path scratch = Files.createTempDirectory(file.toAbsolutePath().getParent(), SORT_SCRATCH);
        try {
            String header;
            List<Path> runs = new ArrayList<>();
            try (BufferedReader in = Files.newBufferedReader(file, StandardCharsets.UTF_8)) {
                header = in.readLine();
                List<Keyed> chunk = new ArrayList<>(runRows);
                for (String line = in.readLine(); line != null; line = in.readLine()) {
                    chunk.add(new Keyed(Long.parseLong(CsvLine.lastField(line)), line));
                    if (chunk.size() == runRows) {
                        runs.add(writeRun(scratch, runs.size(), chunk));
                        chunk.clear();
                    }
                }
                if (!chunk.isEmpty() || runs.isEmpty()) {
                    runs.add(writeRun(scratch, runs.size(), chunk));
                }
            }
            int pass = 0;
            while (runs.size() > fanIn) {
                List<Path> merged = new ArrayList<>();
                for (int from = 0; from < runs.size(); from += fanIn) {
                    Path out = scratch.resolve("pass" + pass + "-" + merged.size());
                    merge(runs.subList(from, Math.min(runs.size(), from + fanIn)), null, out);
                    merged.add(out);
                }
                runs = merged;
                pass++;
            }
            Path tmp = temporary(file);
            merge(runs, header, tmp);
            replace(tmp, file);
        } finally {
            try (Stream<Path> left = Files.list(scratch)) {
                for (Path p : (Iterable<Path>) left::iterator) {
                    Files.deleteIfExists(p);
                }
            }
            Files.deleteIfExists(scratch);
        }
    }

    private static boolean inOrder(Path file) throws IOException {
        try (BufferedReader in = Files.newBufferedReader(file, StandardCharsets.UTF_8)) {
            in.readLine();
            long last = -1;
            for (String line = in.readLine(); line != null; line = in.readLine()) {
                long index = Long.parseLong(CsvLine.lastField(line));
                if (index <= last) {
                    return false;
                }
                last = index;
            }
            return true;
        }
    }

    private static Path writeRun(Path scratch, int number, List<Keyed> chunk) throws IOException {
        chunk.sort(Comparator.comparingLong(Keyed::index));
        Path run = scratch.resolve("run" + number);
        try (BufferedWriter out = Files.newBufferedWriter(run, StandardCharsets.UTF_8)) {
            for (Keyed k : chunk) {
                out.write(k.line());
                out.write('\n');
            }
        }
        return run;
    }

    /** The head of one sorted input while merging; ties go to the earlier input. */
    private record Head(long index, String line, int input) {
    }

    /** Merges sorted runs into {@code out}, with {@code header} first when not null, dropping repeats. */
    private static void merge(List<Path> runs, String header, Path out) throws IOException {
        List<BufferedReader> inputs = new ArrayList<>();
        try (BufferedWriter writer = Files.newBufferedWriter(out, StandardCharsets.UTF_8)) {
            PriorityQueue<Head> heads = new PriorityQueue<>(
                    Comparator.comparingLong(Head::index).thenComparingInt(Head::input));
            for (Path run : runs) {
                BufferedReader in = Files.newBufferedReader(run, StandardCharsets.UTF_8);
                inputs.add(in);
                advance(in, inputs.size() - 1, heads);
            }
            if (header != null) {
                writer.write(header);
                writer.write('\n');
            }
            long last = -1;
            while (!heads.isEmpty()) {
                Head h = heads.poll();
                if (h.index() != last) {
                    writer.write(h.line());
                    writer.write('\n');
                    last = h.index();
                }
                advance(inputs.get(h.input()), h.input(), heads);
            }
        } finally {
            for (BufferedReader in : inputs) {
                in.close();
            }
        }
    }

    private static void advance(BufferedReader in, int input, PriorityQueue<Head> heads) throws IOException {
        String line = in.readLine();
        if (line != null) {
            heads.add(new Head(Long.parseLong(CsvLine.lastField(line)), line, input));
        }
    }

    /** Counts the rows of each status: {ok, failed}. */
    static long[] countStatuses(Path file, ResultColumns columns) throws IOException {
        long[] counts = new long[2];
        try (BufferedReader in = Files.newBufferedReader(file, StandardCharsets.UTF_8)) {
            in.readLine();
            for (String line = in.readLine(); line != null; line = in.readLine()) {
                String status = CsvLine.split(line).orElseThrow().get(columns.statusColumn());
                counts[status.equals(ResultColumns.OK) ? 0 : 1]++;
            }
        }
        return counts;
    }

    /**
     * A new empty file beside {@code file}, in the same folder so that the final move is atomic, with the
     * folder's usual permissions (not the owner-only ones of {@link Files#createTempFile}, which the
     * results would keep after the move).
     */
    static Path temporary(Path file) throws IOException {
        Path dir = file.toAbsolutePath().getParent();
        return Files.createFile(dir.resolve("." + file.getFileName() + "-" + UUID.randomUUID() + TMP));
    }

    /** Removes temporary files and sort scratch folders that a killed process left in {@code dir}. */
    static void removeLeftovers(Path dir) throws IOException {
        try (Stream<Path> entries = Files.list(dir)) {
            for (Path p : (Iterable<Path>) entries::iterator) {
                String name = p.getFileName().toString();
                if (name.startsWith(".") && name.endsWith(TMP) && Files.isRegularFile(p)) {
                    Files.deleteIfExists(p);
                } else if (name.startsWith(SORT_SCRATCH) && Files.isDirectory(p)) {
                    try (Stream<Path> inside = Files.list(p)) {
                        for (Path q : (Iterable<Path>) inside::iterator) {
                            Files.deleteIfExists(q);
                        }
                    }
                    Files.deleteIfExists(p);
                }
            }
        }
    }

    /**
     * Forces {@code tmp} to the disk and moves it over {@code target} atomically, then forces the folder
     * so that the new name survives a crash.
     */
    static void replace(Path tmp, Path target) throws IOException {
        try (FileChannel channel = FileChannel.open(tmp, StandardOpenOption.WRITE)) {
            channel.force(true);
        }
        try {
            Files.move(tmp, target, StandardCopyOption.ATOMIC_MOVE, StandardCopyOption.REPLACE_EXISTING);
        } catch (AtomicMoveNotSupportedException e) {
            // same folder, so only a file system without atomic renames lands here: replace plainly
            Files.move(tmp, target, StandardCopyOption.REPLACE_EXISTING);
        }
        forceFolder(target.toAbsolutePath().getParent());
    }

    private static void forceFolder(Path dir) {
        try (FileChannel channel = FileChannel.open(dir, StandardOpenOption.READ)) {
            channel.force(true);
        } catch (IOException e) {
            // some platforms (Windows) cannot open a folder as a channel; the rename is then as durable as
            // the file system makes it by itself
        }
    }

    /**
     * Lines of a file read as bytes, so that the offset of each line is known and a last line without a
     * line break can be told from a complete one.
     */
    static final class LineInput implements Closeable {
        private final InputStream in;
        private final ByteArrayOutputStream line = new ByteArrayOutputStream(1024);
        private long offset;
        private boolean terminated;

        LineInput(InputStream in) {
            this.in = new BufferedInputStream(in, 1 << 16);
        }

        /** The next line without its line break, or empty at the end. */
        Optional<String> next() throws IOException {
            line.reset();
            terminated = false;
            int b;
            while ((b = in.read()) >= 0) {
                offset++;
                if (b == '\n') {
                    terminated = true;
                    break;
                }
                line.write(b);
            }
            if (!terminated && line.size() == 0) {
                return Optional.empty();
            }
            return Optional.of(line.toString(StandardCharsets.UTF_8));
        }

        /** True when the last line read ended with a line break. */
        boolean terminated() {
            return terminated;
        }

        /** Bytes read so far: the offset just after the last line read. */
        long offset() {
            return offset;
        }

        @Override
        public void close() throws IOException {
            in.close();
        }
    }
}
