package org.nullpath.schedule;

import java.util.ArrayList;
import java.util.Collections;
import java.util.List;
import java.util.Optional;

import org.nullpath.lightcone.SignalPath;
import org.nullpath.link.Budget;
import org.nullpath.link.Directions;
import org.nullpath.link.Doppler;
import org.nullpath.link.LinkTerms;
import org.nullpath.mission.Exchange;
import org.nullpath.mission.Link;
import org.nullpath.mission.MessagePlan;
import org.nullpath.mission.Mission;
import org.nullpath.worldline.Worldline;

/**
 * A bounded sample of a link's signals for plotting: at most {@value #MAX_SAMPLES} send clocks, evenly
 * spaced over the link's planned send range, each solved exactly as a planned message is
 * ({@link LinkSchedule#evaluate}: the same per-message evaluation as the schedule itself).
 * The planned messages themselves are never held: memory does not depend on how many there are.
 *
 * <p>The planned send range runs from the earliest to the latest send clock of the link's message
 * plans (or, for a link that only carries exchange queries, of those queries). When the link has a
 * horizon inside that range, only the part before it is sampled ({@link #towardsHorizon}), stopping
 * 1/{@value #MAX_SAMPLES} of the way short of the horizon (where the light time grows without bound);
 * the horizon itself is carried along.
 */
public final class SampledSeries {
    /** Most send clocks sampled per link. */
    public static final int MAX_SAMPLES = 400;

    private SampledSeries() {
    }

    /**
     * One sampled signal that arrives.
     *
     * @param sendClock    sender's clock at sending, s
     * @param sendTime     mission time of sending, s
     * @param receiveTime  mission time of arrival, s
     * @param receiveClock receiver's clock at arrival, s
     * @param lightTime    receiveTime - sendTime, solved for directly, s
     * @param doppler      f_rx / f_tx
     * @param frequencyOffset doppler - 1, computed without cancellation
     * @param budget       frequency plan and link budget, when the link has terms
     * @param directions   aim, look and point-ahead, when the link has terms or asks for directions
     */
    public record Sample(double sendClock, double sendTime, double receiveTime, double receiveClock,
                         double lightTime, double doppler, double frequencyOffset, Optional<Budget> budget,
                         Optional<Directions> directions) {
    }

    /**
     * The sampled signals of one link.
     *
     * @param link             link name
     * @param from             sending node
     * @param to               receiving node
     * @param terms            the link's radio or optical terms; null when it has none
     * @param hasPlannedSends  false when no plan sends on this link (nothing is sampled)
     * @param firstSendClock   earliest planned send clock, s (NaN without planned sends)
     * @param lastSendClock    latest planned send clock, s (NaN without planned sends)
     * @param horizon          the link's horizon (last send that still arrives), whether or not it falls in the range
     * @param skipped          sampled send clocks whose signal could not be computed in double precision
     * @param samples          delivered samples in send order, at most {@value #MAX_SAMPLES}
     */
    public record LinkSeries(Link route, boolean hasPlannedSends, double firstSendClock, double lastSendClock,
                             HorizonRow horizon, int skipped, List<Sample> samples) {
        /** The link's name. */
        public String link() {
            return route.name();
        }

        /** The sender's name. */
        public String from() {
            return route.from().name();
        }

        /** The receiver's name. */
        public String to() {
            return route.to().name();
        }

        /** The link's terms, when it has them. */
        public Optional<LinkTerms> terms() {
            return route.terms();
        }

        /** True when sends late in the planned range never arrive (the horizon falls inside it). */
        public boolean horizonCutsRange() {
            return hasPlannedSends && horizon.hasHorizon() && horizon.lastSendClock() <= lastSendClock;
        }
    }

    /** The sampled series of every link, in file order. */
    public static List<LinkSeries> of(Mission mission) {
        List<LinkSeries> out = new ArrayList<>();
        for (Link link : mission.links().values()) {
            out.add(of(mission, link, MAX_SAMPLES));
        }
        return Collections.unmodifiableList(out);
    }

    /** The sampled series of one link with at most {@code maxSamples} (at least 2) send clocks. */
    public static LinkSeries of(Mission mission, Link link, int maxSamples) {
        if (maxSamples < 2) {
            throw new IllegalArgumentException("at least two samples are needed, got " + maxSamples);
        }
        Worldline sender = link.sender();
        Worldline receiver = link.receiver();
        HorizonRow horizon = Deadlines.horizonRow(link.name(), sender, receiver);
        Optional<double[]> range = plannedRange(mission, link);
        if (range.isEmpty()) {
            return new LinkSeries(link, false, Double.NaN, Double.NaN, horizon, 0, List.of());
        }
        double lo = range.get()[0];
        double hi = range.get()[1];
        double[] clocks;
        if (horizon.hasHorizon() && horizon.lastSendClock() <= hi) {
            double end = horizon.lastSendClock();
            clocks = lo < end ? towardsHorizon(lo, end, maxSamples) : new double[0];
        } else if (hi == lo) {
            clocks = new double[] {lo};
        } else {
            clocks = new double[maxSamples];
            for (int i = 0; i < maxSamples; i++) {
                clocks[i] = i == maxSamples - 1 ? hi : lo + (hi - lo) * i / (maxSamples - 1);
            }
        }
        List<Sample> samples = new ArrayList<>(clocks.length);
        int skipped = 0;
        for (double clock : clocks) {
            try {
                LinkSchedule.Evaluated ev = LinkSchedule.evaluate(link, clock);
                SignalPath p = ev.path();
                if (ev.arrival().isEmpty()) {
                    continue;
                }
                Doppler.Factor d = ev.arrival().get().doppler();
                Optional<Budget> b = ev.arrival().get().budget();
                samples.add(new Sample(clock, p.send().timeSeconds(), p.receive().timeSeconds(), p.receive().clock(),
                        p.lightTimeSeconds(), d.doppler(), d.offset(), b, ev.arrival().get().directions()));
            } catch (ArithmeticException e) {
                // a state beyond what doubles can hold (the worldline says so): leave the point out, count it
                skipped++;
            }
        }
        return new LinkSeries(link, true, lo, hi, horizon, skipped, Collections.unmodifiableList(samples));
    }

    /**
     * {@code n} send clocks in [lo, end) for a range that ends at a horizon: three quarters evenly spaced
     * up to a tenth of the range short of the horizon, the rest closing in on it with geometrically
     * shrinking gaps down to (end - lo) / n. Approaching a horizon the arrival clock grows like the log of
     * the gap, so geometric gaps keep the arrival-clock plots smooth where an even grid would jump.
     */
    static double[] towardsHorizon(double lo, double end, int n) {
        int geometric = n / 4;
        int even = n - geometric;
        double range = end - lo;
        double widest = 0.1 * range;
        double narrowest = range / n;
        double[] out = new double[n];
        for (int i = 0; i < even; i++) {
            out[i] = lo + (range - widest) * i / (even - 1);
        }
        for (int k = 1; k <= geometric; k++) {
            out[even + k - 1] = end - widest * Math.pow(narrowest / widest, (double) k / geometric);
        }
        return out;
    }

    /**
     * Earliest and latest planned send clock on {@code link}: its message plans, or else the exchange
     * queries it carries ({lo, hi}); empty when nothing is planned on it.
     */
    static Optional<double[]> plannedRange(Mission mission, Link link) {
        double lo = Double.POSITIVE_INFINITY;
        double hi = Double.NEGATIVE_INFINITY;
        for (MessagePlan p : mission.plansOn(link)) {
            long n = p.count();
            if (n == 0) {
                continue;
            }
            // each plan yields its send clocks in ascending order
            lo = Math.min(lo, p.sendClock(0));
            hi = Math.max(hi, p.sendClock(n - 1));
        }
        if (lo <= hi) {
            return Optional.of(new double[] {lo, hi});
        }
        for (Exchange e : mission.exchanges()) {
            long n = e.count();
            if (e.query() == link && n > 0) {
                lo = Math.min(lo, e.first());
                hi = Math.max(hi, e.sendClock(n - 1));
            }
        }
        return lo <= hi ? Optional.of(new double[] {lo, hi}) : Optional.empty();
    }
}
