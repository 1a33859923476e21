package org.nullpath.cli;

import java.util.Locale;
import java.util.Optional;
import java.util.concurrent.Callable;

import org.nullpath.mission.Mission;
import org.nullpath.report.Readable;
import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;

/** {@code nullpath check SCENARIO}: validates only. */
@Command(name = "check", mixinStandardHelpOptions = true,
        description = "Validate a scenario without computing anything: prints each problem with file:line:column, "
                + "or one line saying the scenario is usable.")
final class CheckCommand implements Callable<Integer> {
    @Mixin
    ScenarioInput input;

    @Override
    public Integer call() {
        Optional<Mission> loaded = input.load();
        if (loaded.isEmpty()) {
            return Main.INPUT_ERROR;
        }
        Mission s = loaded.get();
        input.out().printf(Locale.ROOT, "%s: usable (%s; %s)%n", input.scenario, Readable.bodies(s),
                Readable.planned(s, ""));
        return 0;
    }
}
