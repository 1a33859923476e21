package org.nullpath.cli;

import java.util.Comparator;
import java.util.Locale;
import java.io.PrintWriter;
import java.nio.file.Path;

import org.nullpath.report.PlanOutput;
import org.nullpath.report.OutputFolder;
import org.nullpath.report.PlanResult;
import org.nullpath.report.Readable;
import org.nullpath.mission.Craft;
import org.nullpath.mission.Link;
import org.nullpath.mission.Printable;
import org.nullpath.mission.Mission;
import org.nullpath.schedule.CrossingRow;
import org.nullpath.schedule.ExchangeTally;
import org.nullpath.schedule.BudgetTally;
import org.nullpath.schedule.CutoffRow;
import org.nullpath.schedule.HorizonRow;
import org.nullpath.schedule.LinkTally;
import org.nullpath.schedule.WindowFigures;
import org.nullpath.schedule.WindowRow;

/** The few lines {@code plan} prints when it is done. */
final class TerminalSummary {
    /**
     * A crossing's send clock for reading, rounded in the safe direction like a cut-off: a limit that is left
     * (the last send that still meets it) toward earlier, one that is entered toward later.
     */
    private static String shown(CrossingRow x) {
        return x.direction().equals("leaves") ? Readable.notAfter(x.sendClock()) : Readable.notBefore(x.sendClock());
    }

    /** The limits of crossings.csv, in the order their first crossings are named. */
    private static final String[] LIMITS = {"margin", "tuning-low", "tuning-high", "doppler-rate", "horizon"};

    private TerminalSummary() {
    }

    static void print(PrintWriter out, Mission s, PlanResult r, Path dir, OutputFolder.Commit commit) {
        long messages = r.links().stream().mapToLong(LinkTally::messages).sum();
        long never = r.links().stream().mapToLong(LinkTally::never).sum();
        out.printf(Locale.ROOT, "%s%n", Printable.of(s.title()));
        out.printf(Locale.ROOT, "  %s; %s%n", Readable.bodies(s), Readable.planned(s, " (" + (messages - never) + " delivered, " + never
                + " never arrive)"));
        for (LinkTally t : r.links()) {
            Link l = t.link();
            out.printf(Locale.ROOT, "  link %-12s %s -> %s: %d sent, %d arrive; light time %s to %s; Doppler %s to %s%n",
                    l.name(), l.from().name(), l.to().name(), t.messages(), t.delivered(), Readable.time(t.minLightTime()),
                    Readable.time(t.maxLightTime()), Readable.number(t.minDoppler()), Readable.number(t.maxDoppler()));
        }
        for (Craft c : s.craft()) {
            out.printf(Locale.ROOT, "  craft %-11s %s%n", c.name(), Readable.flightEnd(c, s.epoch()));
        }
        for (LinkTally t : r.links()) {
            if (t.illConditioned() > 0) {
                out.printf(Locale.ROOT, "  NOTE %s: %d light times are ill-conditioned (known to worse than 1e-12 relative; see the"
                        + " light_time_condition column)%n", t.link().name(), t.illConditioned());
            }
        }
        for (CutoffRow c : r.cutoffs()) {
            out.printf(Locale.ROOT, "  cut-off %-12s on %s: %s%n", c.name(), c.link(), !c.reachable() ? "unreachable"
                    : "send by " + Readable.notAfter(c.latestSendClock()) + " on the sender's clock"
                    + s.epoch().map(e -> " (" + Readable.instantNotAfter(e, c.latestSendTime()) + ")").orElse("")
                    + (c.beforeStart() ? " (before the mission starts: already too late for a plan made at mission"
                    + " time 0)" : ""));
        }
        for (HorizonRow h : r.horizons()) {
            if (h.hasHorizon()) {
                out.printf(Locale.ROOT, "  horizon on %-10s send before %s on the sender's clock%s, or the message never"
                        + " arrives%n", h.link(), Readable.notAfter(h.lastSendClock()),
                        s.epoch().map(e -> " (" + Readable.instantNotAfter(e, h.lastSendTime()) + ")").orElse(""));
            }
        }
        for (ExchangeTally e : r.exchanges()) {
            out.printf(Locale.ROOT, "  exchange %-10s %d of %d round trips complete%s%n", e.name(), e.complete(), e.roundTrips(),
                    e.complete() == 0 ? "" : "; round trip " + Readable.time(e.minRoundTrip()) + " to "
                    + Readable.time(e.maxRoundTrip()) + (Double.isNaN(e.medianRoundTrip()) ? ""
                    : ", median " + Readable.time(e.medianRoundTrip())) + " on the querier's clock");
        }
        double worst = Double.NaN;
        String worstLink = null;
        for (LinkTally t : r.links()) {
            if (t.budget().isEmpty()) {
                continue;
            }
            BudgetTally.Figures b = t.budget().get();
            out.printf(Locale.ROOT, "  budget %-12s margin %s to %s dB; %d of %d delivered close (%d outside the tuning range, %d over"
                            + " the Doppler-rate limit); received %s to %s; Doppler rate up to %s Hz/s; rate that closes"
                            + " for all: %s bit/s%n",
                    t.link().name(), Readable.number(b.worstMarginDb()), Readable.number(b.bestMarginDb()), b.closing(),
                    t.delivered(), b.outOfTuning(), b.overDopplerRate(), Readable.frequency(b.minRxFrequencyHz()),
                    Readable.frequency(b.maxRxFrequencyHz()), Readable.number(b.maxAbsDopplerRateHzPerS()),
                    Readable.number(b.minMaxDataRateBps()));
            if (b.extremeShift()) {
                out.printf(Locale.ROOT, "  NOTE %s: the received frequency leaves [carrier/2, 2 x carrier] (%s to %s):"
                        + " another band entirely%n", t.link().name(), Readable.frequency(b.minRxFrequencyHz()),
                        Readable.frequency(b.maxRxFrequencyHz()));
            }
            if (!Double.isNaN(b.worstMarginDb()) && (Double.isNaN(worst) || b.worstMarginDb() < worst)) {
                worst = b.worstMarginDb();
                worstLink = t.link().name();
            }
        }
        for (WindowFigures w : r.windows()) {
            WindowRow edges = w.window();
            out.printf(Locale.ROOT, "  window on %-10s sends from %s to %s (sender's clock), closed by %s%n", edges.link(),
                    Readable.notBefore(edges.opensClock()), Readable.notAfter(edges.closesClock()), edges.closedBy());
        }
        for (Link link : s.links().values()) {
            for (String limit : LIMITS) {
                r.crossings().stream()
                        .filter(x -> x.link().equals(link.name()) && x.limit().equals(limit))
                        .min(Comparator.comparingDouble(CrossingRow::sendClock))
                        .ifPresent(x -> out.printf(Locale.ROOT, "  first %s crossing on %s: %s at send %s (sender's"
                                + " clock)%n", x.limit(), x.link(), x.direction(), shown(x)));
            }
        }
        if (worstLink == null) {
            out.printf(Locale.ROOT, "  worst margin: no link budget terms in this scenario%n");
        } else {
            out.printf(Locale.ROOT, "  worst margin: %s dB on %s%n", Readable.number(worst), worstLink);
        }
        out.printf(Locale.ROOT, "  written to %s%s%n", dir, commit.replaced().isEmpty() ? ""
                : " (replacing " + Readable.count(commit.replaced().size(), "file") + " already there)");
        if (!commit.removed().isEmpty()) {
            out.printf(Locale.ROOT, "  removed what an earlier plan wrote there and this one does not: %s%n",
                    String.join(", ", commit.removed()));
        }
        if (!commit.kept().isEmpty()) {
            out.printf(Locale.ROOT, "  left alone (an earlier plan wrote them, but they have changed since): %s%n",
                    String.join(", ", commit.kept()));
        }
        if (!commit.inputs().isEmpty()) {
            out.printf("  left alone (an earlier plan wrote them, but this plan reads them): %s%n",
                    String.join(", ", commit.inputs()));
        }
    }
}
