package org.nullpath.cli;

import java.io.PrintWriter;
import java.nio.file.Path;

import org.nullpath.mission.Mission;
import org.nullpath.scenario.Problem;
import org.nullpath.scenario.ScenarioException;
import org.nullpath.scenario.ScenarioLoader;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;

/** What every command that reads a scenario takes: the file and the cap on planned messages (a picocli mixin). */
final class ScenarioInput {
    /** Default cap on the messages one plan may compute. */
    static final long DEFAULT_MAX_MESSAGES = 50_000_000L;

    @Parameters(index = "0", paramLabel = "SCENARIO", description = "the scenario file (YAML)")
    Path scenario;

    @Option(names = "--max-messages", paramLabel = "N", description = "cap on messages per plan (default: ${DEFAULT-VALUE})")
    long maxMessages = DEFAULT_MAX_MESSAGES;

    /** Loads and validates; on problems prints them, one per line, and returns null. */
    Mission load(PrintWriter err) {
        Mission s;
        try {
            s = ScenarioLoader.load(scenario);
        } catch (ScenarioException e) {
            for (Problem p : e.problems()) {
                err.println(p.render());
            }
            return null;
        }
        long planned = s.plannedMessages();
        if (planned > maxMessages) {
            err.println(new Problem(scenario.toString(), 0, 0, "messages", planned + " messages planned, more than the"
                    + " cap of " + maxMessages + " per plan (raise it with --max-messages)").render());
            return null;
        }
        return s;
    }
}
