package org.nullpath.cli;

import java.io.PrintWriter;
import java.nio.file.Path;

import org.nullpath.report.OutputFolder;

/** How plan and sweep say that their output folder could not be written. */
final class WriteFailure {
    private WriteFailure() {
    }

    /**
     * Says that {@code out} could not be written and gives the exit code: a refused folder is wrong input, any
     * other I/O failure a failure (its trace with {@code debug}).
     */
    static int report(PrintWriter err, Path out, Exception e, boolean debug) {
        err.println("nullpath: cannot write " + out + ": " + e.getMessage());
        if (e instanceof OutputFolder.Refused) {
            return Main.INPUT_ERROR;
        }
        if (debug) {
            e.printStackTrace(err);
        }
        return Main.FAILURE;
    }
}
