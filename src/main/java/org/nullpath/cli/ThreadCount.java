package org.nullpath.cli;

import java.io.PrintWriter;

import org.nullpath.schedule.Workers;
import picocli.CommandLine.Option;

/** {@code --threads N}, shared by every command that computes (a picocli mixin). */
final class ThreadCount {
    @Option(names = "--threads", paramLabel = "N", description = "threads that compute (a plan's messages, a sweep's"
            + " points; default: the machine's processors, ${DEFAULT-VALUE} here); the files are the same for any"
            + " number")
    int threads = Runtime.getRuntime().availableProcessors();

    /** True when the count is usable; otherwise says why on {@code err}. */
    boolean valid(PrintWriter err) {
        if (threads < 1) {
            err.println("nullpath: --threads must be at least 1 (got " + threads + ")");
            return false;
        }
        return true;
    }

    /** The threads to compute on; close them when done. */
    Workers workers() {
        return Workers.of(threads);
    }
}
