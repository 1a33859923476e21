package org.nullpath.schedule;

import java.util.ArrayList;
import java.util.List;

import org.nullpath.mission.Cutoff;
import org.nullpath.mission.Exchange;
import org.nullpath.mission.Link;
import org.nullpath.mission.Mission;
import org.nullpath.mission.WindowScan;

/**
 * The figures a trade study keeps of one point's mission (docs/sweeps.md), each the same number that
 * {@code plan} writes for that mission: per link its delivered and never-arriving messages, the last send
 * before a horizon, the extremes of light time and Doppler factor; with link terms the worst margin, the
 * messages that close and the highest rate that closes for all; with window scans the total open send time;
 * per cut-off the latest send; per exchange the longest round trip. Nothing is written: per-message rows are
 * dropped as they are computed.
 */
public final class StudyFigures {
    private StudyFigures() {
    }

    /** The figure names of {@code mission}'s links, cut-offs and exchanges, in column order. */
    public static List<String> names(Mission mission) {
        List<String> names = new ArrayList<>();
        for (Link link : mission.links().values()) {
            String l = link.name() + ".";
            for (String n : List.of("delivered", "never", "last_send_clock_s", "min_light_time_s", "max_light_time_s",
                    "min_doppler", "max_doppler")) {
                names.add(l + n);
            }
            if (link.terms().isPresent()) {
                names.add(l + "worst_margin_db");
                names.add(l + "messages_closing");
                names.add(l + "max_data_rate_closing_all_bps");
            }
            if (scans(mission, link)) {
                names.add(l + "window_send_s");
            }
        }
        for (Cutoff c : mission.cutoffs()) {
            names.add(c.name() + ".latest_send_clock_s");
        }
        for (Exchange e : mission.exchanges()) {
            names.add(e.name() + ".max_round_trip_clock_s");
        }
        return names;
    }

    private static boolean scans(Mission mission, Link link) {
        return mission.windows().stream().anyMatch(w -> w.link() == link);
    }

    /**
     * The figures of {@code mission}, in the order of {@link #names}; NaN where a figure has no value (no
     * horizon, nothing delivered).
     *
     * @throws RangeException when the mission asks for something nullpath cannot compute
     */
    public static double[] of(Mission mission) {
        List<Double> v = new ArrayList<>();
        List<HorizonRow> horizons = Deadlines.horizons(mission);
        int i = 0;
        for (Link link : mission.links().values()) {
            LinkTally t = LinkSchedule.run(mission, link, Workers.ONE, rows -> null, none -> { });
            HorizonRow h = horizons.get(i++);
            v.add((double) t.delivered());
            v.add((double) t.never());
            v.add(h.hasHorizon() ? h.lastSendClock() : Double.NaN);
            v.add(t.minLightTime());
            v.add(t.maxLightTime());
            v.add(t.minDoppler());
            v.add(t.maxDoppler());
            if (link.terms().isPresent()) {
                BudgetTally.Figures b = t.budget().orElseThrow();
                v.add(b.worstMarginDb());
                v.add((double) b.closing());
                v.add(b.minMaxDataRateBps());
            }
            if (scans(mission, link)) {
                double open = 0;
                for (WindowScan w : mission.windows()) {
                    if (w.link() == link) {
                        for (WindowRow r : Windows.scan(w)) {
                            open += r.closesClock() - r.opensClock();
                        }
                    }
                }
                v.add(open);
            }
        }
        for (CutoffRow c : Deadlines.cutoffs(mission)) {
            v.add(c.latestSendClock());
        }
        for (Exchange e : mission.exchanges()) {
            v.add(Deadlines.exchange(e, row -> { }).maxRoundTrip());
        }
        double[] out = new double[v.size()];
        for (int k = 0; k < out.length; k++) {
            out[k] = v.get(k);
        }
        return out;
    }
}
