package org.nullpath.report;

import java.io.IOException;
import java.io.PrintWriter;
import java.util.ArrayList;
import java.util.List;

import org.nullpath.mission.Exchange;
import org.nullpath.mission.Link;
import org.nullpath.mission.Mission;
import org.nullpath.mission.OutputNames;
import org.nullpath.mission.WindowScan;
import org.nullpath.schedule.CrossingRow;
import org.nullpath.schedule.CutoffRow;
import org.nullpath.schedule.Deadlines;
import org.nullpath.schedule.ExchangeTally;
import org.nullpath.schedule.HorizonRow;
import org.nullpath.schedule.LinkSchedule;
import org.nullpath.schedule.LinkTally;
import org.nullpath.schedule.MessageRow;
import org.nullpath.schedule.WindowFigures;
import org.nullpath.schedule.WindowSurvey;
import org.nullpath.schedule.Windows;
import org.nullpath.schedule.Workers;

/**
 * Runs a mission's schedules and writes every output file into an {@link OutputFolder}, walking
 * {@link #FILES}: one CSV per link (streamed row by row), cutoffs.csv, horizons.csv, one CSV per exchange
 * plan, windows.csv and crossings.csv, report.html (unless asked not to) and summary.json, last, listing them all.
 */
public final class PlanOutput {
    private PlanOutput() {
    }

    /**
     * One kind of output file.
     *
     * @param name    its name, with {@code <link>} or {@code <name>} where a scenario name goes
     * @param meaning one line for the docs
     * @param step    computes and writes it (possibly several files) into the run's folder
     */
    public record OutputFile(String name, String meaning, Step step) {
    }

    /** Computes and writes one kind of file. */
    @FunctionalInterface
    public interface Step {
        void write(Run run) throws IOException;
    }

    /** Every kind of file a plan writes, in the order written (docs/output-files.md lists them). */
    public static final List<OutputFile> FILES = List.of(
            new OutputFile(OutputNames.ofLink("<link>"), "one row per planned message on that link",
                    PlanOutput::linkFiles),
            new OutputFile(OutputNames.CUTOFFS, "the latest send that meets each arrive-by deadline",
                    PlanOutput::cutoffs),
            new OutputFile(OutputNames.HORIZONS, "one row per link: the last send that still arrives, if any",
                    PlanOutput::horizons),
            new OutputFile(OutputNames.ofExchange("<name>"), "one row per query and reply round trip of that"
                    + " exchange", PlanOutput::exchanges),
            new OutputFile(OutputNames.WINDOWS, "the send-clock intervals in which a link closes (when the"
                    + " scenario scans for windows)", PlanOutput::windows),
            new OutputFile(OutputNames.CROSSINGS, "every limit's own crossings in each scanned window range (with"
                    + " windows.csv)", PlanOutput::crossings),
            new OutputFile(OutputNames.REPORT, "a self-contained page for reading: spacetime diagram, charts,"
                    + " tables, the scenario as read (unless --no-report)", PlanOutput::report),
            new OutputFile(OutputNames.SUMMARY, "counts, extremes, horizons, cut-offs, windows and the list of"
                    + " files written", PlanOutput::summary));

    /** One plan being written: the mission, the folder and what the files so far came to. */
    public static final class Run {
        private final Mission mission;
        private final OutputFolder out;
        private final boolean report;
        private final PrintWriter warnings;
        private final Workers workers;
        private final List<LinkTally> links = new ArrayList<>();
        private final List<ExchangeTally> exchanges = new ArrayList<>();
        private final List<CutoffRow> cutoffs = new ArrayList<>();
        private final List<HorizonRow> horizons = new ArrayList<>();
        private final List<WindowFigures> windows = new ArrayList<>();
        private final List<CrossingRow> crossings = new ArrayList<>();

        Run(Mission mission, OutputFolder out, boolean report, PrintWriter warnings, Workers workers) {
            this.mission = mission;
            this.out = out;
            this.report = report;
            this.warnings = warnings;
            this.workers = workers;
        }

        PlanResult result() {
            return new PlanResult(links, exchanges, cutoffs, horizons, windows, crossings);
        }
    }

    /**
     * Computes and writes everything on the calling thread; report.html only when {@code report} is true; a
     * file left out is said on {@code warnings}. The caller commits or discards the folder.
     */
    public static PlanResult write(Mission s, OutputFolder out, boolean report, PrintWriter warnings)
            throws IOException {
        return write(s, out, report, warnings, Workers.ONE);
    }

    /**
     * As {@link #write(Mission, OutputFolder, boolean, PrintWriter)}, the messages computed and written on
     * {@code workers}: the files are the same for any number of threads.
     */
    public static PlanResult write(Mission s, OutputFolder out, boolean report, PrintWriter warnings, Workers workers)
            throws IOException {
        Run run = new Run(s, out, report, warnings, workers);
        for (OutputFile f : FILES) {
            f.step().write(run);
        }
        return run.result();
    }

    private static void linkFiles(Run run) throws IOException {
        for (Link link : run.mission.links().values()) {
            Table<MessageRow> table = Tables.messages(link.terms(), link.pointing(), run.mission.epoch());
            try (Table.Writer<MessageRow> w = table.open(run.out.create(OutputNames.ofLink(link.name())))) {
                run.links.add(LinkSchedule.run(run.mission, link, run.workers, w::encodeInPlace, w::append));
            }
        }
    }

    private static void cutoffs(Run run) throws IOException {
        run.cutoffs.addAll(Deadlines.cutoffs(run.mission));
        Tables.cutoffs(run.mission.epoch()).write(run.out.file(OutputNames.CUTOFFS), run.cutoffs);
    }

    private static void horizons(Run run) throws IOException {
        run.horizons.addAll(Deadlines.horizons(run.mission));
        Tables.horizons(run.mission.epoch()).write(run.out.file(OutputNames.HORIZONS), run.horizons);
    }

    private static void exchanges(Run run) throws IOException {
        for (Exchange e : run.mission.exchanges()) {
            try (Table.Writer<org.nullpath.schedule.ExchangeRow> w =
                         Tables.EXCHANGES.open(run.out.file(OutputNames.ofExchange(e.name())))) {
                run.exchanges.add(Deadlines.exchange(e, w::write));
            }
        }
    }

    private static void windows(Run run) throws IOException {
        for (WindowScan w : run.mission.windows()) {
            WindowSurvey survey = Windows.survey(w);
            run.windows.addAll(survey.windows());
            run.crossings.addAll(survey.crossings());
        }
        if (!run.mission.windows().isEmpty()) {
            Tables.WINDOWS.write(run.out.file(OutputNames.WINDOWS), run.windows);
        }
    }

    /** The crossings found by the window scans (computed with them, in {@link #windows(Run)}). */
    private static void crossings(Run run) throws IOException {
        if (!run.mission.windows().isEmpty()) {
            Tables.CROSSINGS.write(run.out.file(OutputNames.CROSSINGS), run.crossings);
        }
    }

    private static void report(Run run) throws IOException {
        if (!run.report) {
            return;
        }
        try {
            HtmlReport.write(run.out.file(OutputNames.REPORT), run.mission, run.result());
        } catch (java.awt.AWTError | UnsatisfiedLinkError | NoClassDefFoundError e) {
            // charts need AWT font metrics; on a Java installation without any fonts, the data files are
            // still the product: leave the report out and say why among the warnings
            java.nio.file.Files.deleteIfExists(run.out.file(OutputNames.REPORT));
            run.warnings.println("nullpath: report.html left out: this Java has no usable fonts for charts ("
                    + e.getClass().getSimpleName() + "); install a font package such as fonts-dejavu-core");
        }
    }

    /** Last, so that it can list every file of this plan (a later plan into the same folder removes the ones it no longer writes). */
    private static void summary(Run run) throws IOException {
        SummaryJson.write(run.out.file(OutputNames.SUMMARY), run.mission, run.result(), run.out.stagedDigests());
    }
}
