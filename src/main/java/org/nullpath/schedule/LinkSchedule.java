package org.nullpath.schedule;

import java.util.ArrayList;
import java.util.List;
import java.util.Optional;
import java.util.function.Consumer;
import java.util.function.Function;

import org.nullpath.lightcone.Conditioning;
import org.nullpath.lightcone.LightCone;
import org.nullpath.lightcone.MotionFactor;
import org.nullpath.lightcone.SignalPath;
import org.nullpath.link.Budget;
import org.nullpath.link.Directions;
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
 * Computes every planned message of one link, in send order, handing the rows on a chunk at a time as
 * they are computed: memory does not grow with the number of messages.
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
     * @param directions    the pointing directions, when the link has terms or asks for them
     */
    public record Arrival(MotionFactor sendFactor, MotionFactor receiveFactor, Doppler.Factor doppler,
                          Optional<Budget> budget, Optional<Directions> directions) {
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
        Optional<Directions> dir = link.pointing() ? Optional.of(Directions.of(p, receiver)) : Optional.empty();
        Optional<Budget> b = link.terms().map(t -> LinkBudget.evaluate(t, p, d, DopplerRate.of(sender, receiver, p, d),
                dir.orElseThrow()));
        return new Evaluated(p, Optional.of(new Arrival(fs, fr, d, b, dir)));
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
        double sendStep = sender.timeChange(first.send(), second.send().clock() - first.send().clock());
        double arrivalStep = sendStep + (second.lightTimeSeconds() - first.lightTimeSeconds());
        return receiver.clockChange(first.receive(), arrivalStep);
    }

    /**
     * Messages computed as one piece of work (and handed on together). A chunk's rows as text (about 160 KB
     * for a plain link) stay in a core's cache while they are written; with 4096 the million-message plan
     * took about 10 % longer (docs/performance.md).
     */
    static final int CHUNK = 1024;

    /** Runs the schedule of {@code link} on the calling thread, giving each row to {@code sink}; returns the tally. */
    public static LinkTally run(Mission mission, Link link, Consumer<MessageRow> sink) {
        return run(mission, link, Workers.ONE, rows -> rows, rows -> rows.forEach(sink));
    }

    /**
     * Runs the schedule of {@code link} in chunks of {@value #CHUNK} messages on {@code workers}: each chunk's
     * rows are computed and turned into {@code T} by {@code encode} on a worker, then given to {@code write} on
     * the calling thread in send order. Rows, files and tallies are the same for any number of threads: a
     * chunk recomputes the message before its first (for the arrival interval) and the tallies are merged in
     * order. Returns the tally.
     *
     * @throws RangeException at the first message, in send order, that nullpath cannot compute
     */
    public static <T> LinkTally run(Mission mission, Link link, Workers workers, Function<List<MessageRow>, T> encode,
                                    Consumer<T> write) {
        SendOrder order = new SendOrder(mission.plansOn(link));
        Part total = new Part(link);
        long[] index = {0};
        double[] lastClock = {Double.NaN};
        workers.inOrder(() -> {
            if (!order.hasNext()) {
                return null;
            }
            double[] clocks = new double[CHUNK];
            int n = 0;
            while (n < CHUNK && order.hasNext()) {
                clocks[n++] = order.next();
            }
            long first = index[0] + 1;
            double before = lastClock[0];
            int count = n;
            index[0] += n;
            lastClock[0] = clocks[n - 1];
            return () -> chunk(link, first, clocks, count, before, encode);
        }, (Done<T> done) -> {
            write.accept(done.encoded());
            total.merge(done.part());
        });
        long messages = index[0];
        return new LinkTally(link, messages, total.delivered, messages - total.delivered, total.minD, total.maxD,
                total.minT, total.maxT, total.lastArrivalClock, total.budgets.map(BudgetTally::snapshot),
                total.illConditioned);
    }

    /** A chunk's rows, encoded, and what they came to. */
    private record Done<T>(T encoded, Part part) {
    }

    /** What a run of consecutive messages came to; merged in send order. */
    private static final class Part {
        long delivered;
        long illConditioned;
        double lastArrivalClock = Double.NaN;
        double minD = Double.NaN;
        double maxD = Double.NaN;
        double minT = Double.NaN;
        double maxT = Double.NaN;
        final Optional<BudgetTally> budgets;

        Part(Link link) {
            budgets = link.terms().map(t -> new BudgetTally(t.carrierHz()));
        }

        void merge(Part later) {
            delivered += later.delivered;
            illConditioned += later.illConditioned;
            if (!Double.isNaN(later.lastArrivalClock)) {
                lastArrivalClock = later.lastArrivalClock;
            }
            minD = min(minD, later.minD);
            maxD = max(maxD, later.maxD);
            minT = min(minT, later.minT);
            maxT = max(maxT, later.maxT);
            budgets.ifPresent(b -> b.merge(later.budgets.orElseThrow()));
        }
    }

    /** The message sent at {@code clock}, numbered {@code index}; a state beyond double precision is a {@link RangeException}. */
    private static Evaluated evaluateAt(Link link, long index, double clock) {
        try {
            return evaluate(link, clock);
        } catch (ArithmeticException e) {
            throw new RangeException("links." + link.name(), "message " + index + " (send clock " + clock
                    + " s): " + e.getMessage(), e);
        }
    }

    /**
     * Messages {@code first}, {@code first + 1}, ... sent at {@code clocks[0..n)}; {@code before} is the send
     * clock of message {@code first - 1} (NaN for the first message of the link).
     */
    private static <T> Done<T> chunk(Link link, long first, double[] clocks, int n, double before,
                                     Function<List<MessageRow>, T> encode) {
        Worldline sender = link.sender();
        Worldline receiver = link.receiver();
        Part part = new Part(link);
        SignalPath previous = null;
        if (first > 1) {
            Evaluated e = evaluateAt(link, first - 1, before);
            previous = e.arrival().isPresent() ? e.path() : null;
        }
        List<MessageRow> rows = new ArrayList<>(n);
        for (int i = 0; i < n; i++) {
            long index = first + i;
            double clock = clocks[i];
            Evaluated ev = evaluateAt(link, index, clock);
            SignalPath p = ev.path();
            Optional<MessageRow.Delivery> delivery = Optional.empty();
            if (ev.arrival().isPresent()) {
                Arrival a = ev.arrival().get();
                part.delivered++;
                Doppler.Factor d = a.doppler();
                double rxClock = p.receive().clock();
                Optional<Budget> budget = a.budget();
                double interval = previous == null ? Double.NaN : arrivalInterval(sender, receiver, previous, p);
                double condition = Conditioning.ofLightTime(p, a.sendFactor(), a.receiveFactor());
                MessageRow.Delivery arrived = new MessageRow.Delivery(p.receive().timeSeconds(), rxClock,
                        p.lightTimeSeconds(), d.doppler(), d.offset(), interval, condition, budget, a.directions());
                Optional<String> beyond = arrived.beyondDoubleRange();
                if (beyond.isPresent()) {
                    throw new RangeException("links." + link.name(), "message " + index + " (send clock " + clock
                            + " s): its " + beyond.get() + " is beyond what a double holds (about 1.8e308)",
                            RangeException.EXTREME_VALUES, null);
                }
                budget.ifPresent(b -> part.budgets.orElseThrow().add(b));
                delivery = Optional.of(arrived);
                if (condition * Conditioning.EPSILON > ILL_CONDITIONED) {
                    part.illConditioned++;
                }
                previous = p;
                part.lastArrivalClock = rxClock;
                part.minD = min(part.minD, d.doppler());
                part.maxD = max(part.maxD, d.doppler());
                part.minT = min(part.minT, p.lightTimeSeconds());
                part.maxT = max(part.maxT, p.lightTimeSeconds());
            } else {
                previous = null;
            }
            rows.add(new MessageRow(index, clock, p.send().timeSeconds(), delivery));
        }
        return new Done<>(encode.apply(rows), part);
    }
}
