package org.nullpath.cli;

import java.util.Locale;
import java.util.Optional;
import java.util.concurrent.Callable;

import org.nullpath.mission.Mission;
import org.nullpath.report.Readable;
import org.nullpath.schedule.RangeException;
import org.nullpath.schedule.Rehearsal;
import org.nullpath.schedule.Workers;
import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;

/**
 * {@code nullpath check SCENARIO}: validates, then computes the whole plan without writing it, so that a
 * scenario check accepts is one that plan computes.
 */
@Command(name = "check", mixinStandardHelpOptions = true,
        description = "Validate a scenario and work out every message, deadline and scan without writing anything:"
                + " prints each problem with file:line:column, or one line saying the scenario is usable.")
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
        try (Workers workers = input.workers()) {
            Rehearsal.run(s, workers);
        } catch (RangeException e) {
            input.err().println(input.located(e));
            return Main.INPUT_ERROR;
        }
        input.out().printf(Locale.ROOT, "%s: usable (%s; %s)%n", input.scenario, Readable.bodies(s),
                Readable.planned(s, ""));
        return 0;
    }
}
