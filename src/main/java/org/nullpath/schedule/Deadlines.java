package org.nullpath.schedule;

import java.util.ArrayList;
import java.util.List;
import java.util.function.Consumer;

import org.nullpath.lightcone.Horizon;
import org.nullpath.lightcone.LightCone;
import org.nullpath.lightcone.SignalPath;
import org.nullpath.mission.Cutoff;
import org.nullpath.mission.Exchange;
import org.nullpath.mission.Link;
import org.nullpath.mission.Mission;
import org.nullpath.worldline.State;
import org.nullpath.worldline.Worldline;

/** Cut-offs, horizons and round trips of a scenario. */
public final class Deadlines {
    private Deadlines() {
    }

    /**
     * The latest send for each cut-off: the past light cone of the deadline event on the receiver meets
     * the sender's worldline at the latest send. Worldlines are defined for all times, so every deadline is
     * reachable; a latest send before mission time 0 is flagged.
     */
    public static List<CutoffRow> cutoffs(Mission mission) {
        List<CutoffRow> rows = new ArrayList<>();
        for (int i = 0; i < mission.cutoffs().size(); i++) {
            Cutoff c = mission.cutoffs().get(i);
            Worldline sender = c.link().sender();
            Worldline receiver = c.link().receiver();
            SignalPath p;
            try {
                p = LightCone.past(receiver.atClock(c.arriveBy()), sender);
            } catch (ArithmeticException e) {
                throw new RangeException("cutoffs[" + i + "].arrive-by", e.getMessage(), e);
            }
            State send = p.send();
            // every worldline here is defined for all times (stations always, craft coasting before their
            // first leg), so the past cone always meets the sender: the deadline is reachable, though the
            // latest send may lie before the mission starts (flagged in its own column)
            rows.add(new CutoffRow(c.name(), c.link().name(), c.arriveBy(), send.clock(), send.timeSeconds(), true,
                    send.timeSeconds() < 0));
        }
        return rows;
    }

    /** One horizon row per link, in file order. */
    public static List<HorizonRow> horizons(Mission mission) {
        List<HorizonRow> rows = new ArrayList<>();
        for (Link link : mission.links().values()) {
            rows.add(horizonRow(link.name(), link.sender(), link.receiver()));
        }
        return rows;
    }

    /** The horizon row of one link. */
    static HorizonRow horizonRow(String link, Worldline sender, Worldline receiver) {
        Horizon h = LightCone.horizon(sender, receiver);
        return h.exists()
                ? new HorizonRow(link, true, h.lastSend().clock(), h.lastSend().timeSeconds())
                : new HorizonRow(link, false, Double.NaN, Double.NaN);
    }

    /** Runs one exchange plan, giving each round trip to {@code sink}; returns its tally. */
    public static ExchangeTally exchange(Exchange e, Consumer<ExchangeRow> sink) {
        Worldline querier = e.query().sender();
        Worldline responder = e.query().receiver();
        long n = e.count();
        long complete = 0;
        RoundTrips trips = new RoundTrips();
        Consumer<ExchangeRow> tally = row -> {
            if (row.complete()) {
                trips.add(row.roundTripClock());
            }
            sink.accept(row);
        };
        for (long k = 0; k < n; k++) {
            double sendClock = e.sendClock(k);
            try {
                complete += roundTrip(querier, responder, e, k, sendClock, tally) ? 1 : 0;
            } catch (ArithmeticException x) {
                throw new RangeException("exchanges." + e.name(), "round trip " + (k + 1) + " (query clock " + sendClock
                        + " s): " + x.getMessage(), x);
            }
        }
        return new ExchangeTally(e.name(), n, complete, trips.min(), trips.median(), trips.max());
    }

    private static boolean roundTrip(Worldline querier, Worldline responder, Exchange e, long k,
                                     double sendClock, Consumer<ExchangeRow> sink) {
        State qs = querier.atClock(sendClock);
        SignalPath q = LightCone.future(qs, responder);
        if (!q.delivered()) {
            sink.accept(new ExchangeRow(k + 1, sendClock, Double.NaN, Double.NaN, Double.NaN, Double.NaN, false));
            return false;
        }
        double replyClock = q.receive().clock() + e.turnaround();
        SignalPath r = LightCone.future(responder.atClock(replyClock), querier);
        if (!r.delivered()) {
            sink.accept(new ExchangeRow(k + 1, sendClock, q.receive().clock(), replyClock, Double.NaN, Double.NaN,
                    false));
            return false;
        }
        // round trip on the querier's clock, as an offset from the query's send state
        double turnaroundSpan = responder.timeChange(q.receive(), e.turnaround());
        double span = q.lightTimeSeconds() + turnaroundSpan + r.lightTimeSeconds();
        double roundTrip = querier.clockChange(qs, span);
        sink.accept(new ExchangeRow(k + 1, sendClock, q.receive().clock(), replyClock, r.receive().clock(),
                roundTrip, true));
        return true;
    }
}
