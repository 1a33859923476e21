package org.nullpath.schedule;

import java.util.Optional;
import java.util.function.Consumer;

import org.nullpath.lightcone.Conditioning;
import org.nullpath.lightcone.LightCone;
import org.nullpath.lightcone.MotionFactor;
import org.nullpath.lightcone.SignalPath;
import org.nullpath.link.Budget;
import org.nullpath.link.Doppler;
import org.nullpath.link.DopplerRate;
import org.nullpath.link.LinkBudget;
import org.nullpath.mission.Link;
import org.nullpath.mission.Mission;
import org.nullpath.spacetime.Vec3;
import org.nullpath.worldline.State;
import org.nullpath.worldline.Worldline;

import static org.nullpath.schedule.Extremes.max;
import static org.nullpath.schedule.Extremes.min;

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
     * One message fully evaluated: its light path and, when it arrives, what the arrival carries.
     *
     * @param path    the signal's path (its send event always; its receive event when it arrives)
     * @param arrival the bodies' motion factors, the Doppler factor and the budget; empty when it never arrives
     */
    public record Evaluated(SignalPath path, Optional<Arrival> arrival) {
    }

    /**
     * What an arriving message carries.
     *
     * @param sendFactor    the sender's motion factor gamma (1 - beta . k) for the photon direction
     * @param receiveFactor the receiver's motion factor
     * @param doppler       the Doppler factor
     * @param budget        the frequency plan and link budget, when the link has terms
     */
    public record Arrival(MotionFactor sendFactor, MotionFactor receiveFactor, Doppler.Factor doppler,
                          Optional<Budget> budget) {
    }

    /** Evaluates the message sent on {@code link} at sender clock {@code sendClock}. */
    public static Evaluated evaluate(Link link, double sendClock) {
        Worldline sender = link.sender();
        Worldline receiver = link.receiver();
        SignalPath p = signal(sender, receiver, sendClock);
        if (!p.delivered()) {
            return new Evaluated(p, Optional.empty());
        }
        Vec3 k = Doppler.photonDirection(p);
        MotionFactor fs = MotionFactor.of(p.send(), k);
        MotionFactor fr = MotionFactor.of(p.receive(), k);
        Doppler.Factor d = Doppler.of(fs, fr);
        Optional<Budget> b = link.terms().map(t -> LinkBudget.evaluate(t, p, d, DopplerRate.of(sender, receiver, p, d)));
        return new Evaluated(p, Optional.of(new Arrival(fs, fr, d, b)));
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
        Optional<BudgetTally> budgets = link.terms().map(t -> new BudgetTally(t.carrierHz()));
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
                ev = evaluate(link, clock);
            } catch (ArithmeticException e) {
                throw new RangeException("links." + link.name(), "message " + index + " (send clock " + clock
                        + " s): " + e.getMessage(), e);
            }
            SignalPath p = ev.path();
            Optional<MessageRow.Delivery> delivery = Optional.empty();
            if (ev.arrival().isPresent()) {
                Arrival a = ev.arrival().get();
                delivered++;
                Doppler.Factor d = a.doppler();
                double rxClock = p.receive().clock();
                Optional<Budget> budget = a.budget();
                double interval = previous == null ? Double.NaN : arrivalInterval(sender, receiver, previous, p);
                double condition = Conditioning.ofLightTime(p, a.sendFactor(), a.receiveFactor());
                MessageRow.Delivery arrived = new MessageRow.Delivery(p.receive().timeSeconds(), rxClock,
                        p.lightTimeSeconds(), d.doppler(), d.offset(), interval, condition, budget);
                Optional<String> beyond = arrived.beyondDoubleRange();
                if (beyond.isPresent()) {
                    throw new RangeException("links." + link.name(), "message " + index + " (send clock " + clock
                            + " s): its " + beyond.get() + " is beyond what a double holds (about 1.8e308)",
                            RangeException.EXTREME_VALUES, null);
                }
                budget.ifPresent(b -> budgets.orElseThrow().add(b));
                delivery = Optional.of(arrived);
                if (condition * Conditioning.EPSILON > ILL_CONDITIONED) {
                    illConditioned++;
                }
                previous = p;
                lastArrivalClock = rxClock;
                minD = min(minD, d.doppler());
                maxD = max(maxD, d.doppler());
                minT = min(minT, p.lightTimeSeconds());
                maxT = max(maxT, p.lightTimeSeconds());
            } else {
                previous = null;
            }
            sink.accept(new MessageRow(index, clock, p.send().timeSeconds(), delivery));
        }
        return new LinkTally(link, index, delivered, index - delivered, minD, maxD, minT, maxT,
                lastArrivalClock, budgets.map(BudgetTally::snapshot), illConditioned);
    }
}
