package org.nullpath.report;

import java.io.IOException;
import java.util.ArrayList;
import java.util.List;

import org.nullpath.mission.Exchange;
import org.nullpath.mission.Link;
import org.nullpath.mission.Mission;
import org.nullpath.mission.WindowScan;
import org.nullpath.schedule.CutoffRow;
import org.nullpath.schedule.Deadlines;
import org.nullpath.schedule.HorizonRow;
import org.nullpath.schedule.LinkSchedule;
import org.nullpath.schedule.LinkTally;
import org.nullpath.schedule.WindowRow;
import org.nullpath.schedule.Windows;

/**
 * Runs a scenario's schedules and writes every output file into an {@link OutputFolder}: one CSV per
 * link (streamed row by row), cutoffs.csv, horizons.csv, one CSV per exchange plan, summary.json and
 * (unless asked not to) report.html.
 */
public final class PlanOutput {
    private PlanOutput() {
    }

    /**
     * What a plan came to, for the terminal summary.
     *
     * @param links     per-link tallies in file order
     * @param exchanges per-exchange counts of completed round trips, in file order
     * @param cutoffs   cut-off rows
     * @param horizons  horizon rows
     * @param windows   link windows of every scanned range
     */
    public record Result(List<LinkTally> links, List<ExchangeTally> exchanges, List<CutoffRow> cutoffs,
                         List<HorizonRow> horizons, List<WindowRow> windows) {
    }

    /** @param name exchange name; @param roundTrips planned; @param complete completed */
    public record ExchangeTally(String name, long roundTrips, long complete) {
    }

    /** Computes and writes everything, report.html included; the caller commits or discards the folder. */
    public static Result write(Mission s, OutputFolder out) throws IOException {
        return write(s, out, true);
    }

    /**
     * Computes and writes everything; report.html only when {@code report} is true. The caller commits or
     * discards the folder.
     */
    public static Result write(Mission s, OutputFolder out, boolean report) throws IOException {
        List<LinkTally> tallies = new ArrayList<>();
        for (Link link : s.links().values()) {
            try (CsvTables.MessageWriter w = new CsvTables.MessageWriter(out.file(link.name() + ".csv"),
                    link.terms().orElse(null), s.epoch().orElse(null))) {
                tallies.add(LinkSchedule.run(s, link, w::write));
            }
        }
        List<CutoffRow> cutoffs = Deadlines.cutoffs(s);
        CsvTables.writeCutoffs(out.file("cutoffs.csv"), cutoffs, s.epoch().orElse(null));
        List<HorizonRow> horizons = Deadlines.horizons(s);
        CsvTables.writeHorizons(out.file("horizons.csv"), horizons, s.epoch().orElse(null));
        List<ExchangeTally> exchanges = new ArrayList<>();
        for (Exchange e : s.exchanges()) {
            try (CsvTables.ExchangeWriter w = new CsvTables.ExchangeWriter(out.file("exchanges-" + e.name() + ".csv"))) {
                long complete = Deadlines.exchange(e, w::write);
                exchanges.add(new ExchangeTally(e.name(), e.count(), complete));
            }
        }
        List<WindowRow> windows = new ArrayList<>();
        for (WindowScan w : s.windows()) {
            windows.addAll(Windows.scan(w));
        }
        if (!s.windows().isEmpty()) {
            CsvTables.writeWindows(out.file("windows.csv"), windows);
        }
        Result result = new Result(tallies, exchanges, cutoffs, horizons, windows);
        if (report) {
            try {
                HtmlReport.write(out.file("report.html"), s, result);
            } catch (java.awt.AWTError | UnsatisfiedLinkError | NoClassDefFoundError e) {
                // charts need AWT font metrics; on a Java installation without any fonts, the data files are
                // still the product: leave the report out and say why on standard error
                java.nio.file.Files.deleteIfExists(out.file("report.html"));
                System.err.println("nullpath: report.html left out: this Java has no usable fonts for charts ("
                        + e.getClass().getSimpleName() + "); install a font package such as fonts-dejavu-core");
            }
        }
        // last, so that it can list every file of this plan (a later plan into the same folder removes the
        // ones it no longer writes)
        SummaryJson.write(out.file("summary.json"), s, result, out.stagedNames());
        return result;
    }
}
