package org.nullpath.cli;

import java.io.PrintWriter;
import java.nio.file.Path;
import java.util.concurrent.Callable;

import org.nullpath.mission.Mission;
import picocli.CommandLine.Command;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;
import picocli.CommandLine.Spec;

/** {@code nullpath check SCENARIO}: validates only. */
@Command(name = "check", mixinStandardHelpOptions = true,
        description = "Validate a scenario without computing anything: prints each problem with file:line:column, "
                + "or one line saying the scenario is usable.")
final class CheckCommand implements Callable<Integer> {
    @Spec
    CommandSpec spec;

    @Parameters(index = "0", paramLabel = "SCENARIO", description = "the scenario file (YAML)")
    Path scenario;

    @Option(names = "--max-messages", paramLabel = "N", description = "cap on messages per plan (default: ${DEFAULT-VALUE})")
    long maxMessages = Inputs.DEFAULT_MAX_MESSAGES;

    @Override
    public Integer call() {
        PrintWriter err = spec.commandLine().getErr();
        Mission s = Inputs.load(scenario, maxMessages, err);
        if (s == null) {
            return Main.INPUT_ERROR;
        }
        spec.commandLine().getOut().printf("%s: usable (%s, %d craft, %s, %s planned)%n", scenario,
                TerminalSummary.count(s.stations().size(), "station"), s.craft().size(),
                TerminalSummary.count(s.links().size(), "link"),
                TerminalSummary.count(s.plannedMessages(), "message"));
        return 0;
    }
}
