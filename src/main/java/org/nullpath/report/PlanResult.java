package org.nullpath.report;

import java.util.List;

import org.nullpath.schedule.CrossingRow;
import org.nullpath.schedule.CutoffRow;
import org.nullpath.schedule.ExchangeTally;
import org.nullpath.schedule.HorizonRow;
import org.nullpath.schedule.LinkTally;
import org.nullpath.schedule.WindowFigures;

/**
 * What a plan came to, for summary.json, the report and the terminal summary.
 *
 * @param links     per-link tallies in file order
 * @param exchanges per-exchange counts of completed round trips, in file order
 * @param cutoffs   cut-off rows
 * @param horizons  horizon rows
 * @param windows   link windows of every scanned range, with their durations and volumes
 * @param crossings every limit's crossings in every scanned range, scans in file order
 */
public record PlanResult(List<LinkTally> links, List<ExchangeTally> exchanges, List<CutoffRow> cutoffs,
                         List<HorizonRow> horizons, List<WindowFigures> windows, List<CrossingRow> crossings) {
    /** A result without crossings. */
    public PlanResult(List<LinkTally> links, List<ExchangeTally> exchanges, List<CutoffRow> cutoffs,
                      List<HorizonRow> horizons, List<WindowFigures> windows) {
        this(links, exchanges, cutoffs, horizons, windows, List.of());
    }

    public PlanResult {
        links = List.copyOf(links);
        exchanges = List.copyOf(exchanges);
        cutoffs = List.copyOf(cutoffs);
        horizons = List.copyOf(horizons);
        windows = List.copyOf(windows);
        crossings = List.copyOf(crossings);
    }
}
