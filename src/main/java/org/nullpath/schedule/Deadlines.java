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
     * the sender's worldline at the latest send. Sends are possible from mission time 0 on; a deadline
     * whose latest send falls before that is unreachable.
     */
    public static List<CutoffRow> cutoffs(Scenario s) {
        List<CutoffRow> rows = new ArrayList<>();
        for (Scenario.Cutoff c : s.cutoffs()) {
            Scenario.Link link = s.links().get(c.link());
            Worldline sender = s.nodes().get(link.from()).worldline();
            Worldline receiver = s.nodes().get(link.to()).worldline();
            State deadline = receiver.atClock(c.arriveBy());
            SignalPath p = LightCone.past(deadline, sender);
            State send = p.send();
            boolean reachable = send.timeSeconds() >= 0;
            rows.add(new CutoffRow(c.name(), c.link(), c.arriveBy(), reachable ? send.clock() : Double.NaN,
                    reachable ? send.timeSeconds() : Double.NaN, reachable));
        }
        return rows;
    }

    /** One horizon row per link, in file order. */
    public static List<HorizonRow> horizons(Scenario s) {
        List<HorizonRow> rows = new ArrayList<>();
        for (Scenario.Link link : s.links().values()) {
            Horizon h = LightCone.horizon(s.nodes().get(link.from()).worldline(), s.nodes().get(link.to()).worldline());
            rows.add(h.exists()
                    ? new HorizonRow(link.name(), true, h.lastSend().clock(), h.lastSend().timeSeconds())
                    : new HorizonRow(link.name(), false, Double.NaN, Double.NaN));
        }
        return rows;
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
            double sendClock = e.first() + k * e.every();
            State qs = querier.atClock(sendClock);
            SignalPath q = LightCone.future(qs, responder);
            if (!q.delivered()) {
                sink.accept(new ExchangeRow(k + 1, sendClock, Double.NaN, Double.NaN, Double.NaN, Double.NaN, false));
                continue;
            }
            double replyClock = q.receive().clock() + e.turnaround();
            SignalPath r = LightCone.future(responder.atClock(replyClock), querier);
            if (!r.delivered()) {
                sink.accept(new ExchangeRow(k + 1, sendClock, q.receive().clock(), replyClock, Double.NaN, Double.NaN,
                        false));
                continue;
            }
            // round trip on the querier's clock, as an offset from the query's send state
            double span = q.lightTimeSeconds() + (r.send().timeSeconds() - q.receive().timeSeconds())
                    + r.lightTimeSeconds();
            double roundTrip = querier.advance(qs, span).dClockSeconds();
            complete++;
            sink.accept(new ExchangeRow(k + 1, sendClock, q.receive().clock(), replyClock, r.receive().clock(),
                    roundTrip, true));
        }
        return complete;
    }
}
