package org.nullpath.cli;

import java.io.PrintWriter;
import java.util.concurrent.Callable;

import org.nullpath.mission.Mission;
import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Spec;

/** {@code nullpath check SCENARIO}: validates only. */
@Command(name = "check", mixinStandardHelpOptions = true,
        description = "Validate a scenario without computing anything: prints each problem with file:line:column, "
                + "or one line saying the scenario is usable.")
final class CheckCommand implements Callable<Integer> {
    @Spec
    CommandSpec spec;

    @Mixin
    ScenarioInput input;

    @Override
    public Integer call() {
        PrintWriter err = spec.commandLine().getErr();
        Mission s = input.load(err);
        if (s == null) {
            return Main.INPUT_ERROR;
        }
        spec.commandLine().getOut().printf("%s: usable (%s, %d craft, %s, %s planned)%n", input.scenario,
                TerminalSummary.count(s.stations().size(), "station"), s.craft().size(),
                TerminalSummary.count(s.links().size(), "link"),
                TerminalSummary.count(s.plannedMessages(), "message"));
        return 0;
    }
}
