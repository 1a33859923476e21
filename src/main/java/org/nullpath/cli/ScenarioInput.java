package org.nullpath.cli;

import java.io.PrintWriter;
import java.nio.file.Path;
import java.util.Optional;

import org.nullpath.mission.Mission;
import org.nullpath.scenario.Problem;
import org.nullpath.scenario.ScenarioDocument;
import org.nullpath.scenario.ScenarioException;
import org.nullpath.schedule.RangeException;
import org.nullpath.schedule.Workers;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;
import picocli.CommandLine.Spec;

/** What every command that reads a scenario takes: the file and the cap on planned messages (a picocli mixin). */
final class ScenarioInput {
    /** Default cap on the messages one plan may compute. */
    static final long DEFAULT_MAX_MESSAGES = 50_000_000L;

    @Parameters(index = "0", paramLabel = "SCENARIO", description = "the scenario file (YAML)")
    Path scenario;

    @Spec(Spec.Target.MIXEE)
    CommandSpec command;

    @Option(names = "--max-messages", paramLabel = "N", description = "cap on messages per plan (default: ${DEFAULT-VALUE})")
    long maxMessages = DEFAULT_MAX_MESSAGES;

    @Mixin
    ThreadCount threads;

    @Option(names = "--tables-anywhere", description = "let profile tables lie outside the scenario's folder and"
            + " the folders below it (by default they must lie inside, symbolic links resolved)")
    boolean tablesAnywhere;

    /** The scenario as read, once {@link #load()} has succeeded. */
    private ScenarioDocument document;

    /** The command's standard error. */
    PrintWriter err() {
        return command.commandLine().getErr();
    }

    /** The command's standard output. */
    PrintWriter out() {
        return command.commandLine().getOut();
    }

    /** Loads and validates; on problems prints them on standard error, one per line, and returns empty. */
    Optional<Mission> load() {
        PrintWriter err = err();
        if (!threads.valid(err)) {
            return Optional.empty();
        }
        if (maxMessages < 1) {
            err.println("nullpath: --max-messages must be at least 1 (got " + maxMessages + ")");
            return Optional.empty();
        }
        Mission s;
        try {
            ScenarioDocument read = ScenarioDocument.read(scenario);
            s = read.resolve(tablesAnywhere);
            document = read;
        } catch (ScenarioException e) {
            for (Problem p : e.problems()) {
                err.println(p.render());
            }
            return Optional.empty();
        }
        long planned = s.plannedMessages();
        if (planned > maxMessages) {
            err.println(new Problem(scenario.toString(), 0, 0, "messages", planned + " messages planned, more than the"
                    + " cap of " + maxMessages + " per plan (raise it with --max-messages)").render());
            return Optional.empty();
        }
        return Optional.of(s);
    }

    /**
     * A computation that nullpath cannot carry out, as one line at the scenario key at fault (its file, line
     * and column) with what to do.
     */
    String located(RangeException e) {
        return document.problemAt(e.key(), e.getMessage() + " (" + e.hint() + ")").render();
    }

    /** The threads to compute on, as asked for; close them when done. */
    Workers workers() {
        return threads.workers();
    }
}
