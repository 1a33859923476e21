package org.nullpath.cli;

import java.io.IOException;
import java.io.PrintWriter;
import java.io.UncheckedIOException;
import java.nio.file.Path;
import java.util.Optional;
import java.util.concurrent.Callable;

import org.nullpath.report.OutputFolder;
import org.nullpath.report.PlanOutput;
import org.nullpath.report.PlanResult;
import org.nullpath.mission.Mission;
import org.nullpath.schedule.RangeException;
import org.nullpath.schedule.Workers;
import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Option;

/** {@code nullpath plan SCENARIO --out DIR}: the main job. */
@Command(name = "plan", mixinStandardHelpOptions = true,
        description = "Compute every planned message, cut-off, horizon and round trip of a scenario and write "
                + "them as CSV and JSON, with an HTML report, into a folder (all files appear together, or none on "
                + "failure).")
final class PlanCommand implements Callable<Integer> {
    @Mixin
    ScenarioInput input;

    @Option(names = {"-o", "--out"}, required = true, paramLabel = "DIR", description = "folder to write into (created if missing; one plan at a time: a second waits)")
    Path out;

    @Option(names = "--no-report", description = "do not write report.html")
    boolean noReport;

    @Option(names = "--debug", description = "show stack traces for unexpected failures")
    boolean debug;

    @Override
    public Integer call() {
        PrintWriter err = input.err();
        try {
            OutputFolder.checkTarget(out);
        } catch (OutputFolder.Refused e) {
            err.println("nullpath: --out: " + e.getMessage());
            return Main.INPUT_ERROR;
        }
        Optional<Mission> loaded = input.load();
        if (loaded.isEmpty()) {
            return Main.INPUT_ERROR;
        }
        Mission s = loaded.get();
        PlanResult result;
        OutputFolder.Commit commit;
        Runnable waiting = () -> err.println("nullpath: another plan is writing into " + out
                + "; waiting until it is done");
        try (OutputFolder folder = OutputFolder.begin(out, s.source().inputs(), waiting);
             Workers workers = input.workers()) {
            result = PlanOutput.write(s, folder, !noReport, err, workers);
            commit = folder.commit();
        } catch (IOException | UncheckedIOException e) {
            return WriteFailure.report(err, out, e, debug);
        } catch (RangeException e) {
            err.println(input.located(e));
            return Main.INPUT_ERROR;
        } catch (RuntimeException e) {
            err.println("nullpath: plan failed: " + e.getMessage());
            if (debug) {
                e.printStackTrace(err);
            }
            return Main.FAILURE;
        }
        TerminalSummary.print(input.out(), s, result, out, commit);
        return 0;
    }
}
