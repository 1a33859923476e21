package org.nullpath.schedule;

import org.nullpath.mission.Exchange;
import org.nullpath.mission.Link;
import org.nullpath.mission.Mission;
import org.nullpath.mission.WindowScan;

/**
 * Computes everything a plan computes, in the plan's order, and keeps nothing: every message of every link,
 * the cut-offs, horizons, exchanges and window scans. {@code check} runs it, so that a scenario it accepts
 * is one that {@code plan} computes: a send too far out on a flight, or a figure beyond the double range, is
 * found by both, at the same key.
 */
public final class Rehearsal {
    private Rehearsal() {
    }

    /**
     * Runs the mission's whole computation, its messages on {@code workers}.
     *
     * @throws RangeException at the first message, deadline or scan nullpath cannot compute
     */
    public static void run(Mission mission, Workers workers) {
        for (Link link : mission.links().values()) {
            LinkSchedule.run(mission, link, workers, rows -> rows.size(), rows -> { });
        }
        Deadlines.cutoffs(mission);
        Deadlines.horizons(mission);
        for (Exchange e : mission.exchanges()) {
            Deadlines.exchange(e, row -> { });
        }
        for (WindowScan w : mission.windows()) {
            Windows.scan(w);
        }
    }
}
