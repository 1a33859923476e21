package org.nullpath.cli;

import java.io.PrintWriter;
import java.nio.file.Path;

import org.nullpath.scenario.Problem;
import org.nullpath.mission.Mission;
import org.nullpath.scenario.ScenarioException;
import org.nullpath.scenario.ScenarioLoader;

/** Loading and checking a scenario for the commands, with errors printed one per line. */
final class Inputs {
    private Inputs() {
    }

    /** Default cap on the messages one plan may compute. */
    static final long DEFAULT_MAX_MESSAGES = 50_000_000L;

    /** Loads and validates; on problems prints them and returns null. */
    static Mission load(Path file, long maxMessages, PrintWriter err) {
        Mission s;
        try {
            s = ScenarioLoader.load(file);
        } catch (ScenarioException e) {
            for (Problem p : e.problems()) {
                err.println(p.render());
            }
            return null;
        }
        long planned = s.plannedMessages();
        if (planned > maxMessages) {
            err.println(new Problem(file.toString(), 0, 0, "messages", planned + " messages planned, more than the cap of "
                    + maxMessages + " per plan (raise it with --max-messages)").render());
            return null;
        }
        return s;
    }
}
