package org.nullpath.schedule;

import java.util.ArrayList;
import java.util.List;
import java.util.function.Consumer;

import org.nullpath.lightcone.Horizon;
import org.nullpath.lightcone.LightCone;
import org.nullpath.lightcone.SignalPath;
import org.nullpath.scenario.Scenario;
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
    public static List<CutoffRow> cutoffs(Scenario s) {
        List<CutoffRow> rows = new ArrayList<>();
        for (int i = 0; i < s.cutoffs().size(); i++) {
            Scenario.Cutoff c = s.cutoffs().get(i);
            Scenario.Link link = s.links().get(c.link());
            Worldline sender = s.nodes().get(link.from()).worldline();
            Worldline receiver = s.nodes().get(link.to()).worldline();
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
            rows.add(new CutoffRow(c.name(), c.link(), c.arriveBy(), send.clock(), send.timeSeconds(), true,
                    send.timeSeconds() < 0));
        }
        return rows;
    }

    /** One horizon row per link, in file order. */
    public static List<HorizonRow> horizons(Scenario s) {
        List<HorizonRow> rows = new ArrayList<>();
        for (Scenario.Link link : s.links().values()) {
            rows.add(horizonRow(link.name(), s.nodes().get(link.from()).worldline(), s.nodes().get(link.to()).worldline()));
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

    /** Runs one exchange plan, giving each round trip to {@code sink}; returns how many completed. */
    public static long exchange(Scenario s, Scenario.Exchange e, Consumer<ExchangeRow> sink) {
        Scenario.Link query = s.links().get(e.query());
        Scenario.Link reply = s.links().get(e.reply());
        Worldline querier = s.nodes().get(query.from()).worldline();
        Worldline responder = s.nodes().get(query.to()).worldline();
        long n = e.count();
        long complete = 0;
        for (long k = 0; k < n; k++) {
            double sendClock = e.sendClock(k);
            try {
                complete += roundTrip(querier, responder, e, k, sendClock, sink) ? 1 : 0;
            } catch (ArithmeticException x) {
                throw new RangeException("exchanges." + e.name(), "round trip " + (k + 1) + " (query clock " + sendClock
                        + " s): " + x.getMessage(), x);
            }
        }
        return complete;
    }

    private static boolean roundTrip(Worldline querier, Worldline responder, Scenario.Exchange e, long k,
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
        double turnaroundSpan = responder.advanceClock(q.receive(), e.turnaround()).dtSeconds();
        double span = q.lightTimeSeconds() + turnaroundSpan + r.lightTimeSeconds();
        double roundTrip = querier.advance(qs, span).dClockSeconds();
        sink.accept(new ExchangeRow(k + 1, sendClock, q.receive().clock(), replyClock, r.receive().clock(),
                roundTrip, true));
        return true;
    }
}
