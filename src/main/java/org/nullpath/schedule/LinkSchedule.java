package org.nullpath.schedule;

import java.util.function.Consumer;

import org.nullpath.lightcone.Conditioning;
import org.nullpath.lightcone.LightCone;
import org.nullpath.lightcone.MotionFactor;
import org.nullpath.lightcone.SignalPath;
import org.nullpath.link.Budget;
import org.nullpath.link.Doppler;
import org.nullpath.link.DopplerRate;
import org.nullpath.link.LinkBudget;
import org.nullpath.link.LinkTerms;
import org.nullpath.mission.Link;
import org.nullpath.mission.Mission;
import org.nullpath.spacetime.Vec3;
import org.nullpath.worldline.State;
import org.nullpath.worldline.Worldline;

/**
 * Computes every planned message of one link, in send order, handing each row to a sink as soon as it
 * is computed: memory does not grow with the number of messages.
 */
public final class LinkSchedule {
    private LinkSchedule() {
    }

    /** Light times whose condition number times the unit roundoff exceeds this are counted as ill-conditioned. */
    public static final double ILL_CONDITIONED = 1e-12;

    /**
     * One message fully evaluated: its light path, the bodies' motion factors for its photon direction,
     * the Doppler factor and (with link terms) the budget; all but the path are null when it never arrives.
     */
    public record Evaluated(SignalPath path, MotionFactor sendFactor, MotionFactor receiveFactor,
                            Doppler.Factor doppler, Budget budget) {
    }

    /** Evaluates the message sent at {@code sendClock}; {@code terms} may be null (no budget). */
    public static Evaluated evaluate(Worldline sender, Worldline receiver, LinkTerms terms, double sendClock) {
        SignalPath p = signal(sender, receiver, sendClock);
        if (!p.delivered()) {
            return new Evaluated(p, null, null, null, null);
        }
        Vec3 k = Doppler.photonDirection(p);
        MotionFactor fs = MotionFactor.of(p.send(), k);
        MotionFactor fr = MotionFactor.of(p.receive(), k);
        Doppler.Factor d = Doppler.of(fs, fr);
        Budget b = terms == null ? null : LinkBudget.evaluate(terms, p, d, DopplerRate.of(sender, receiver, p, d));
        return new Evaluated(p, fs, fr, d, b);
    }

    /** One signal on a link from a send clock: the path, or never. */
    public static SignalPath signal(Worldline sender, Worldline receiver, double sendClock) {
        State send = sender.atClock(sendClock);
        return LightCone.future(send, receiver);
    }

    /**
     * Receiver-clock time between two arrivals, as an offset: the senders' mission-time step (from the
     * clock step, walked along the sender) plus the change of light time, walked along the receiver.
     * Differencing two large clock readings instead would lose ~1e-12 relative 30 years in.
     */
    static double arrivalInterval(Worldline sender, Worldline receiver, SignalPath first, SignalPath second) {
        double sendStep = sender.advanceClock(first.send(), second.send().clock() - first.send().clock()).dtSeconds();
        double arrivalStep = sendStep + (second.lightTimeSeconds() - first.lightTimeSeconds());
        return receiver.advance(first.receive(), arrivalStep).dClockSeconds();
    }

    /** Runs the schedule of {@code link}, giving each row to {@code sink}; returns the tally. */
    public static LinkTally run(Mission mission, Link link, Consumer<MessageRow> sink) {
        Worldline sender = link.sender();
        Worldline receiver = link.receiver();
        LinkTerms terms = link.terms().orElse(null);
        BudgetTally budgets = terms == null ? null : new BudgetTally(terms.carrierHz());
        SendOrder order = new SendOrder(mission.plansOn(link));
        long index = 0;
        long delivered = 0;
        long illConditioned = 0;
        SignalPath previous = null;
        double lastArrivalClock = Double.NaN;
        double minD = Double.NaN;
        double maxD = Double.NaN;
        double minT = Double.NaN;
        double maxT = Double.NaN;
        while (order.hasNext()) {
            double clock = order.next();
            index++;
            Evaluated ev;
            try {
                ev = evaluate(sender, receiver, terms, clock);
            } catch (ArithmeticException e) {
                throw new RangeException("links." + link.name(), "message " + index + " (send clock " + clock
                        + " s): " + e.getMessage(), e);
            }
            SignalPath p = ev.path();
            MessageRow row;
            if (p.delivered()) {
                delivered++;
                Doppler.Factor d = ev.doppler();
                double rxClock = p.receive().clock();
                Budget budget = ev.budget();
                if (budget != null) {
                    budgets.add(budget);
                }
                double interval = previous == null ? Double.NaN : arrivalInterval(sender, receiver, previous, p);
                row = new MessageRow(index, clock, p.send().timeSeconds(), true, p.receive().timeSeconds(), rxClock,
                        p.lightTimeSeconds(), d.doppler(), d.offset(), interval, budget,
                        Conditioning.ofLightTime(p, ev.sendFactor(), ev.receiveFactor()));
                if (row.lightTimeCondition() * Conditioning.EPSILON > ILL_CONDITIONED) {
                    illConditioned++;
                }
                previous = p;
                lastArrivalClock = rxClock;
                minD = Double.isNaN(minD) ? d.doppler() : Math.min(minD, d.doppler());
                maxD = Double.isNaN(maxD) ? d.doppler() : Math.max(maxD, d.doppler());
                minT = Double.isNaN(minT) ? p.lightTimeSeconds() : Math.min(minT, p.lightTimeSeconds());
                maxT = Double.isNaN(maxT) ? p.lightTimeSeconds() : Math.max(maxT, p.lightTimeSeconds());
            } else {
                row = new MessageRow(index, clock, p.send().timeSeconds(), false, Double.NaN, Double.NaN, Double.NaN,
                        Double.NaN, Double.NaN, Double.NaN, null, Double.NaN);
                previous = null;
            }
            sink.accept(row);
        }
        return new LinkTally(link.name(), index, delivered, index - delivered, minD, maxD, minT, maxT,
                lastArrivalClock, budgets == null ? null : budgets.snapshot(), illConditioned);
    }
}
