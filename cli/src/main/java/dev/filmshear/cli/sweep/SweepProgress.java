package dev.filmshear.cli.sweep;

import me.tongfei.progressbar.ProgressBar;
import me.tongfei.progressbar.ProgressBarBuilder;
import me.tongfei.progressbar.ProgressBarStyle;

import java.time.Duration;
import java.time.temporal.ChronoUnit;

/**
 * What a sweep shows while it runs: on a terminal, a progress bar (the me.tongfei progressbar library)
 * with the cases done of the slice, the failed count, the rate in cases per second and the time left;
 * elsewhere (a batch job's log, a test) nothing, so that logs hold only the final lines.
 */
interface SweepProgress extends AutoCloseable {

    /** Cases finished since the last call: {@code ok} with status ok, {@code failed} with status failed. */
    void advance(long ok, long failed);

    @Override
    void close();

    /** Shows nothing. */
    SweepProgress NONE = new SweepProgress() {
        @Override
        public void advance(long ok, long failed) {
            // nothing is shown off a terminal
        }

        @Override
        public void close() {
            // nothing to close
        }
    };

    /**
     * A bar on the terminal when there is one, else {@link #NONE}.
     *
     * @param total cases of the slice
     * @param done cases with a row before this start
     * @param failedBefore of those, the failed ones
     */
    static SweepProgress forConsole(long total, long done, long failedBefore) {
        if (System.console() == null) {
            return NONE;
        }
        ProgressBar bar = new ProgressBarBuilder().setTaskName("cases").setInitialMax(total)
                .setStyle(ProgressBarStyle.ASCII).showSpeed().setSpeedUnit(ChronoUnit.SECONDS)
                .setUpdateIntervalMillis(500).startsFrom(done, Duration.ZERO).build();
        bar.setExtraMessage(failedMessage(failedBefore));
        return new SweepProgress() {
            private long failed = failedBefore;

            @Override
            public void advance(long ok, long newlyFailed) {
                failed += newlyFailed;
                bar.stepBy(ok + newlyFailed);
                bar.setExtraMessage(failedMessage(failed));
            }

            @Override
            public void close() {
                bar.close();
            }
        };
    }

    private static String failedMessage(long failed) {
        return failed == 0 ? "" : failed + " failed";
    }
}
