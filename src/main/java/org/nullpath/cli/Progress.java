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
final class Progress implements AutoCloseable {
    private final ProgressBar bar;
    private final PrintWriter lines;
    private final long total;
    private long done;
    private int tenths;

    private Progress(ProgressBar bar, PrintWriter lines, long total) {
        this.bar = bar;
        this.lines = lines;
        this.total = total;
    }

    static Progress start(PrintWriter err, boolean quiet, long total) {
        if (quiet) {
            return new Progress(null, null, total);
        }
        if (System.console() != null) {
            ProgressBar bar = new ProgressBarBuilder().setTaskName("points").setInitialMax(total)
                    .setStyle(ProgressBarStyle.ASCII).setUpdateIntervalMillis(200)
                    .setConsumer(new ConsoleProgressBarConsumer(System.err)).build();
            return new Progress(bar, null, total);
        }
        return new Progress(null, err, total);
    }

    /** One more unit of work done. */
    void step() {
        done++;
        if (bar != null) {
            bar.step();
        } else if (lines != null) {
            int t = (int) (10 * done / total);
            if (t > tenths) {
                tenths = t;
                lines.printf(Locale.ROOT, "nullpath: %d%% (%d of %d points)%n", 10 * t, done, total);
                lines.flush();
            }
        }
    }

    @Override
    public void close() {
        if (bar != null) {
            bar.close();
        }
    }
}
