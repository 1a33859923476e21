package org.nullpath.cli;

import java.io.PrintWriter;
import java.util.Locale;

import me.tongfei.progressbar.ConsoleProgressBarConsumer;
import me.tongfei.progressbar.ProgressBar;
import me.tongfei.progressbar.ProgressBarBuilder;
import me.tongfei.progressbar.ProgressBarStyle;

/**
 * Progress of a long run on standard error: a bar (me.tongfei:progressbar) when standard error is a terminal,
 * otherwise one line at every tenth of the work, nothing when asked to be quiet.
 */
interface Progress extends AutoCloseable {
    /** One more unit of work done. */
    void step();

    @Override
    void close();

    static Progress start(PrintWriter err, boolean quiet, long total) {
        if (quiet) {
            return new Quiet();
        }
        if (System.console() != null) {
            return new Bar(new ProgressBarBuilder().setTaskName("points").setInitialMax(total)
                    .setStyle(ProgressBarStyle.ASCII).setUpdateIntervalMillis(200)
                    .setConsumer(new ConsoleProgressBarConsumer(System.err)).build());
        }
        return new Lines(err, total);
    }

    /** Nothing shown. */
    record Quiet() implements Progress {
        @Override
        public void step() {
        }

        @Override
        public void close() {
        }
    }

    /** A bar on the terminal. */
    record Bar(ProgressBar bar) implements Progress {
        @Override
        public void step() {
            bar.step();
        }

        @Override
        public void close() {
            bar.close();
        }
    }

    /** One line at every tenth of the work. */
    final class Lines implements Progress {
        private final PrintWriter lines;
        private final long total;
        private long done;
        private int tenths;

        Lines(PrintWriter lines, long total) {
            this.lines = lines;
            this.total = total;
        }

        @Override
        public void step() {
            done++;
            int t = (int) (10 * done / total);
            if (t > tenths) {
                tenths = t;
                lines.printf(Locale.ROOT, "nullpath: %d%% (%d of %d points)%n", 10 * t, done, total);
                lines.flush();
            }
        }

        @Override
        public void close() {
        }
    }
}
