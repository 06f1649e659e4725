package dev.filmshear.cli.sweep;

import dev.filmshear.cli.ExitCode;
import dev.filmshear.cli.input.CaseReader;
import dev.filmshear.cli.input.InputException;

import java.io.IOException;
import java.io.UncheckedIOException;
import java.nio.channels.FileChannel;
import java.nio.channels.FileLock;
import java.nio.channels.OverlappingFileLockException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.StandardOpenOption;
import java.util.ArrayList;
import java.util.BitSet;
import java.util.List;
import java.util.Optional;
import java.util.concurrent.BlockingQueue;
import java.util.concurrent.ExecutorService;
import java.util.concurrent.Executors;
import java.util.concurrent.LinkedBlockingQueue;
import java.util.concurrent.Semaphore;
import java.util.concurrent.ThreadFactory;
import java.util.concurrent.TimeUnit;
import java.util.concurrent.atomic.AtomicInteger;
import java.util.concurrent.atomic.AtomicReference;

/**
 * Runs the missing cases of a plan's slice into a sweep folder, then sorts results.csv and writes the
 * maps and the report.
 *
 * <p><b>Threads.</b> The calling thread walks the slice's case indices in increasing order and hands each
 * case not yet done to a fixed pool of worker threads; a worker solves it ({@link CaseSolver}) and queues
 * its row; one writer thread appends queued rows to results.csv and forces them to the disk
 * ({@link ResultsFile.Appender}). A semaphore of {@value #QUEUED_PER_THREAD} permits per worker bounds the
 * cases that are submitted, running or queued but not yet on disk, so memory stays bounded whatever the
 * size of the plan, and a kill loses at most those cases.
 *
 * <p><b>Exclusion.</b> A lock on {@code .lock} in the folder keeps two sweeps from appending to the same
 * results.csv (an interrupted job restarted while the first still runs, say).
 */
final class SweepRunner {
    /**
     * Cases in flight per worker. A force to the disk takes milliseconds, in which a worker can finish
     * dozens of small cases: the window must hold them, or the workers wait on the writer (four per
     * worker gave 1 500 cases/s on the 100 000-case steady sweep of the issue note, 64 give 5 000).
     */
    static final int QUEUED_PER_THREAD = 64;
    private static final String LOCK = ".lock";

    private SweepRunner() {
    }

    /**
     * How a run went.
     *
     * @param sliceCases cases in the slice
     * @param doneBefore cases that had a row when the run started
     * @param ran cases run now
     * @param ok rows with status ok in the finished file
     * @param failed rows with status failed in the finished file
     * @param dropped torn or malformed lines removed on resume
     * @param seconds wall-clock time of the cases run now
     */
    record Outcome(long sliceCases, long doneBefore, long ran, long ok, long failed, long dropped, double seconds) {
        /** Cases run per second of wall-clock time, NaN when none ran. */
        double rate() {
            return ran > 0 && seconds > 0 ? ran / seconds : Double.NaN;
        }
    }

    /**
     * Runs every case of the slice that has no row in {@code dir} yet.
     *
     * @param showProgress true to show a progress bar when on a terminal
     * @throws InputException when the folder belongs to another plan or slice
     * @throws SweepFailure when another sweep holds the folder, or a worker or the writer broke down
     */
    static Outcome run(SweepPlan plan, Path dir, int threads, Shard shard, boolean showProgress) {
        try {
            Files.createDirectories(dir);
            try (FileChannel lockChannel = FileChannel.open(dir.resolve(LOCK), StandardOpenOption.CREATE,
                    StandardOpenOption.WRITE)) {
                FileLock lock = tryLock(lockChannel, dir);
                try {
                    return runLocked(plan, dir, threads, shard, showProgress);
                } finally {
                    lock.release();
                }
            }
        } catch (IOException e) {
            throw new UncheckedIOException("cannot write the sweep folder " + dir + ": " + e.getMessage(), e);
        }
    }

    private static FileLock tryLock(FileChannel channel, Path dir) throws IOException {
        FileLock lock;
        try {
            lock = channel.tryLock();
        } catch (OverlappingFileLockException e) {
            lock = null;
        }
        if (lock == null) {
            throw new SweepFailure(ExitCode.OTHER, "error: " + dir + ": another filmshear sweep is writing to this "
                    + "folder; wait for it to end, or give another --out", null);
        }
        return lock;
    }

    private static Outcome runLocked(SweepPlan plan, Path dir, int threads, Shard shard, boolean showProgress)
            throws IOException {
        Path results = dir.resolve(ResultsFile.NAME);
        SweepManifest manifest = checkedManifest(plan, dir, shard, results);
        ResultsFile.removeLeftovers(dir);
        ResultColumns columns = plan.columns();
        ResultsFile.Scan scan = ResultsFile.prepare(results, columns, plan.caseCount(), shard);
        long slice = shard.size(plan.caseCount());
        long doneBefore = scan.done().cardinality();
        long pending = slice - doneBefore;
        long start = System.nanoTime();
        if (pending > 0) {
            manifest.finished(false, scan.ok(), scan.failed()).write(dir);
            try (SweepProgress progress = showProgress ? SweepProgress.forConsole(slice, doneBefore, scan.failed())
                    : SweepProgress.NONE) {
                runPending(plan, results, threads, shard, scan.done(), progress);
            }
        }
        double seconds = (System.nanoTime() - start) * 1e-9;
        ResultsFile.sortByIndex(results);
        long[] counts = ResultsFile.countStatuses(results, columns);
        SweepManifest finished = manifest.finished(true, counts[0], counts[1]);
        finished.write(dir);
        SweepOutputs.write(dir, plan, finished);
        return new Outcome(slice, doneBefore, pending, counts[0], counts[1], scan.dropped(), seconds);
    }

    /** The folder's manifest, checked against the plan and slice, or a new one for a new folder. */
    private static SweepManifest checkedManifest(SweepPlan plan, Path dir, Shard shard, Path results)
            throws IOException {
        Optional<SweepManifest> existing = SweepManifest.read(dir);
        if (existing.isEmpty()) {
            if (Files.exists(results) && Files.size(results) > 0) {
                throw new InputException(results.toString(), 0, "(file)",
                        "results.csv without sweep.json beside it: not a folder a sweep of this version wrote",
                        InputException.quote(dir.toString()), "an empty or new --out folder, or a sweep's folder");
            }
            SweepManifest fresh = SweepManifest.of(plan, shard);
            fresh.write(dir);
            return fresh;
        }
        SweepManifest m = existing.get();
        if (!m.hash().equals(plan.hash())) {
            throw new InputException(plan.planPath(), 0, "(plan)", "the plan changed since the results in " + dir
                    + " were written (plan " + m.planFile() + " of " + m.cases() + " cases); resuming would mix "
                    + "two plans", "plan hash " + shortHash(plan.hash()) + ", folder's " + shortHash(m.hash()),
                    "the unchanged plan to resume, or a new --out folder for the changed one");
        }
        if (!m.shard().equals(shard)) {
            throw new InputException(plan.planPath(), 0, "--shard", "the folder " + dir + " holds shard "
                    + m.shard() + " of this plan", "shard " + shard, "--shard " + m.shard()
                    + " for this folder, or another --out folder");
        }
        return m;
    }

    static String shortHash(String hash) {
        return hash.substring(0, Math.min(12, hash.length()));
    }

    private static void runPending(SweepPlan plan, Path results, int threads, Shard shard, BitSet done,
                                   SweepProgress progress) throws IOException {
        CaseSolver solver = new CaseSolver(plan, new CaseReader());
        AtomicReference<Throwable> broken = new AtomicReference<>();
        Semaphore inFlight = new Semaphore(threads * QUEUED_PER_THREAD);
        BlockingQueue<CaseSolver.Row> finished = new LinkedBlockingQueue<>();
        CaseSolver.Row end = new CaseSolver.Row(-1, true, "");
        ExecutorService workers = Executors.newFixedThreadPool(threads, threads("sweep-worker", broken));
        try (ResultsFile.Appender appender = new ResultsFile.Appender(results)) {
            Thread writer = threads("sweep-writer", broken).newThread(() -> write(finished, end, appender, inFlight,
                    progress, broken));
            writer.start();
            try {
                submit:
                for (long i = shard.first(); i < plan.caseCount(); i += shard.n()) {
                    if (done.get((int) i)) {
                        continue;
                    }
                    while (!inFlight.tryAcquire(100, TimeUnit.MILLISECONDS)) {
                        if (broken.get() != null) {
                            break submit;
                        }
                    }
                    if (broken.get() != null) {
                        break;
                    }
                    long index = i;
                    workers.execute(() -> finished.add(solver.solve(index)));
                }
                workers.shutdown();
                while (!workers.awaitTermination(1, TimeUnit.SECONDS)) {
                    // the remaining cases are still running
                }
                finished.add(end);
                writer.join();
            } catch (InterruptedException e) {
                workers.shutdownNow();
                writer.interrupt();
                Thread.currentThread().interrupt();
                throw new SweepFailure(ExitCode.OTHER, "error: the sweep was interrupted; the rows written are kept "
                        + "and the same command resumes it", e);
            }
        } finally {
            workers.shutdownNow();
        }
        Throwable failure = broken.get();
        if (failure instanceof IOException io) {
            throw io;
        }
        if (failure != null) {
            throw new SweepFailure(ExitCode.OTHER, "error: internal error while solving: " + failure
                    + " (the rows written are kept; rerun with --debug and report it)", failure);
        }
    }

    /** The writer thread's loop: append what is queued, force it, count it, free its permits. */
    private static void write(BlockingQueue<CaseSolver.Row> finished, CaseSolver.Row end,
                              ResultsFile.Appender appender, Semaphore inFlight, SweepProgress progress,
                              AtomicReference<Throwable> broken) {
        List<CaseSolver.Row> batch = new ArrayList<>();
        boolean last = false;
        try {
            while (!last) {
                batch.clear();
                batch.add(finished.take());
                finished.drainTo(batch);
                last = batch.remove(end);
                if (batch.isEmpty()) {
                    continue;
                }
                appender.append(batch);
                long ok = batch.stream().filter(CaseSolver.Row::ok).count();
                progress.advance(ok, batch.size() - ok);
                inFlight.release(batch.size());
            }
        } catch (IOException e) {
            broken.compareAndSet(null, e);
        } catch (InterruptedException e) {
            Thread.currentThread().interrupt();
        }
    }

    private static ThreadFactory threads(String name, AtomicReference<Throwable> broken) {
        AtomicInteger count = new AtomicInteger();
        return task -> {
            Thread t = new Thread(task, name + "-" + count.incrementAndGet());
            // a worker that dies of an Error (a bug) stops the submission; its case simply has no row
            t.setUncaughtExceptionHandler((thread, error) -> broken.compareAndSet(null, error));
            return t;
        };
    }
}
