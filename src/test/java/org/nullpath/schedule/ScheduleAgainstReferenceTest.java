package org.nullpath.schedule;

import java.math.BigDecimal;
import java.math.MathContext;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import java.util.Map;
import java.util.Optional;

import org.junit.jupiter.api.Test;
import org.nullpath.link.Budget;
import org.nullpath.mission.Exchange;
import org.nullpath.mission.Mission;
import org.nullpath.reference.RefCraft;
import org.nullpath.reference.RefSignal;
import org.nullpath.reference.RefSolver;
import org.nullpath.reference.RefStation;
import org.nullpath.reference.RefWorldline;
import org.nullpath.scenario.ScenarioException;
import org.nullpath.scenario.ScenarioLoader;
import org.nullpath.testkit.ScenarioText;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.nullpath.testkit.SendClocks.merged;
import static org.nullpath.testkit.SendClocks.series;
import static org.nullpath.testkit.Si.C;
import static org.nullpath.testkit.Si.DAY;
import static org.nullpath.testkit.Si.G0;
import static org.nullpath.testkit.Si.HOUR;
import static org.nullpath.testkit.Si.LY;
import static org.nullpath.testkit.Si.YR;

/**
 * The schedule package called directly (no files), row by row against the independent 50-digit reference
 * ({@code org.nullpath.reference}, which shares no code with src/main): message numbering and send order,
 * every arrival figure, receive intervals, the light time's condition number, each link's tally (delivered,
 * never, least and greatest Doppler factor and light time, last arrival, ill-conditioned count), the budget
 * tally, cut-offs, horizons and round trips, complete and incomplete.
 *
 * <p>Closed forms used beside the reference (Rindler 2006, hyperbolic motion; derived here for a station at
 * rest at the origin sending to a craft that burns at a from rest at the origin): the Doppler factor of a send
 * at t is D = 1 - a t / c, the last send that arrives is at t = c / a, the craft's speed at arrival is
 * beta = (1 - D^2) / (1 + D^2), and the light time T = (c / 2a) (1 - D)^2 / D. The condition number of
 * lightcone.Conditioning (|t_e| |q - 1| / T with q = 1 / (1 - beta) for a sender at the origin) is then
 * exactly 1 + 1 / D. Unit factors as the scenario converts them (testkit/Si). Craft and stations are invented.
 */
class ScheduleAgainstReferenceTest {
    /** The product's tolerance for times, clocks, light times and Doppler factors on closed-form legs. */
    static final double TIME_TOL = 1e-12;
    /**
     * The condition number is a first-order estimate evaluated in double; near the horizon it is formed from
     * 1 - beta ~ 1e-9, so 1e-6 relative is our own choice (no published source), far inside the factor 2 that a
     * slip in the formula makes.
     */
    static final double CONDITION_TOL = 1e-6;
    /** Unit roundoff of double precision, 2^-53. */
    static final double EPS = 0x1.0p-53;

    static final double A = G0;
    /** The horizon of home -> probe (Rindler): the last send that arrives, at t = c / a. */
    static final double HORIZON = C / A;

    static final RefStation HOME = RefStation.of(new double[] {0, 0, 0}, null, 0);
    static final RefStation ASIDE = RefStation.of(new double[] {0.3 * LY, 0.2 * LY, 0}, null, 0);
    static final RefCraft PROBE = RefCraft.start(null, new double[] {1, 0, 0}, 0, 0, 0).burnForever(A);
    static final RefCraft COMER = RefCraft.start(new double[] {2 * LY, 0, 0}, new double[] {-1, 0, 0}, 0, 0, 0.8 * C);

    static final String TERMS = """
            carrier: 8.4 GHz
            transmitter: {power: 20 kW, antenna: {gain: 70 dBi}}
            receiver: {antenna: {gain: 45 dBi}, noise-temperature: 40 K, tuning-range: [4 GHz, 9 GHz], \
            max-doppler-rate: 150 Hz/s}
            data-rate: 10 bit/s
            required-eb-n0: 2 dB
            """;

    /** Two sends just short of the horizon: 1 + 1/D = 20001 (ill-conditioned) and 5001 (not). */
    static final double[] NEAR_HORIZON = {HORIZON * (1 - 5e-5), HORIZON * (1 - 2e-4)};

    static String scenario() {
        return ScenarioText.titled("schedule check (invented craft and stations)")
                .station("home", "{}")
                .station("aside", "{position: [0.3 ly, 0.2 ly, 0 ly]}")
                .craft("probe", "heading: [1, 0, 0]", "burn: {acceleration: 1 g0, duration: forever}")
                .craft("comer", "heading: [-1, 0, 0]\nstart-position: [2 ly, 0 ly, 0 ly]\nstart-speed: 0.8 c")
                .link("up", "home", "probe", TERMS)
                .link("down", "probe", "home")
                .link("in", "home", "comer", TERMS)
                .link("side", "aside", "probe")
                .link("idle", "aside", "home")
                .then("""
                        messages:
                          - {link: up, first: 5 d, last: 500 d, every: 45 d}
                          - {link: up, at: [%s s, %s s, 12 d]}
                          - {link: down, first: 1 d, last: 1 yr, every: 60 d}
                          - {link: in, at: [0 d, 10 d]}
                        cutoffs:
                          - {name: late, link: up, arrive-by: 2 yr}
                          - {name: early, link: side, arrive-by: 0.1 yr}
                        exchanges:
                          - {name: ping, query: up, reply: down, turnaround: 1 h, first: 1 d, last: 500 d, every: 50 d}
                          - {name: back, query: down, reply: up, turnaround: 1 d, first: 1 d, last: 730 d, every: 100 d}
                        """.formatted(Double.toString(NEAR_HORIZON[0]), Double.toString(NEAR_HORIZON[1])))
                .yaml();
    }

    static Mission mission(String yaml) throws ScenarioException {
        return ScenarioLoader.load(yaml, "schedule.yaml");
    }

    record Run(List<MessageRow> rows, LinkTally tally) {
    }

    static Run run(Mission m, String link) {
        List<MessageRow> rows = new ArrayList<>();
        LinkTally tally = LinkSchedule.run(m, m.links().get(link), rows::add);
        return new Run(rows, tally);
    }

    static void close(String what, double actual, BigDecimal expected, double tol) {
        BigDecimal diff = new BigDecimal(actual).subtract(expected).abs();
        double rel = diff.divide(expected.abs(), MathContext.DECIMAL64).doubleValue();
        assertTrue(rel <= tol, () -> what + ": got " + actual + ", reference " + expected.round(new MathContext(20))
                + " (relative error " + rel + " > " + tol + ")");
    }

    static void close(String what, double actual, double expected, double tol) {
        close(what, actual, new BigDecimal(expected), tol);
    }

    /**
     * Every row of one link against the reference, in send order; returns the reference signals.
     * {@code condition} gives the expected condition number kappa from the reference signal, or null to skip it.
     * Where kappa x 2^-53 exceeds the product's 1e-12 the light time (and with it the arrival and, near a
     * horizon, the Doppler factor) is known only to kappa x 2^-53 relative, whatever the method (docs/physics.md,
     * "How well a light time is known"): that is the tolerance there, and the tally counts the row.
     */
    static List<RefSignal> assertRows(Run run, double[] clocks, RefWorldline sender, RefWorldline receiver,
                                      java.util.function.Function<RefSignal, Double> condition) {
        assertEquals(clocks.length, run.rows().size(), "rows");
        List<RefSignal> refs = new ArrayList<>();
        BigDecimal previousArrival = null;
        for (int i = 0; i < clocks.length; i++) {
            MessageRow r = run.rows().get(i);
            String at = "message " + (i + 1);
            assertEquals(i + 1, r.message(), "message number");
            assertEquals(clocks[i], r.sendClock(), 0.0, at);
            RefSignal ref = RefSolver.send(sender, clocks[i], receiver);
            refs.add(ref);
            if (ref.sender().t().signum() == 0) {
                assertEquals(0.0, r.sendTime(), at + " send time");
            } else {
                close(at + " send time", r.sendTime(), ref.sender().t(), TIME_TOL);
            }
            assertEquals(!ref.never(), r.delivered(), at + " delivered");
            if (ref.never()) {
                previousArrival = null;
                continue;
            }
            MessageRow.Delivery d = r.delivery().orElseThrow();
            double kappa = condition == null ? 1.0 : condition.apply(ref);
            double tol = Math.max(TIME_TOL, kappa * EPS);
            close(at + " receive time", d.receiveTime(), ref.arrival().t(), tol);
            close(at + " receive clock", d.receiveClock(), ref.arrival().clock(), tol);
            close(at + " light time", d.lightTime(), ref.arrival().lightTime(), tol);
            close(at + " doppler", d.doppler(), ref.doppler(), tol);
            close(at + " frequency offset", d.frequencyOffset(), ref.frequencyOffset(), 1e-9);
            if (previousArrival == null) {
                assertEquals(Double.NaN, d.receiveInterval(), at + " receive interval");
            } else {
                close(at + " receive interval", d.receiveInterval(), ref.arrival().clock().subtract(previousArrival),
                        tol);
            }
            previousArrival = ref.arrival().clock();
            if (condition != null) {
                close(at + " light-time condition", d.lightTimeCondition(), kappa, CONDITION_TOL);
            }
        }
        return refs;
    }

    /** The tally's per-link figures against the reference signals, to {@code tol} relative. */
    static void assertTally(LinkTally t, List<RefSignal> refs, long illConditioned, double tol) {
        List<RefSignal> arrived = refs.stream().filter(s -> !s.never()).toList();
        assertEquals(refs.size(), t.messages(), "messages");
        assertEquals(arrived.size(), t.delivered(), "delivered");
        assertEquals(refs.size() - arrived.size(), t.never(), "never");
        assertEquals(illConditioned, t.illConditioned(), "ill-conditioned light times");
        close("least Doppler factor", t.minDoppler(), arrived.stream().map(RefSignal::doppler)
                .min(BigDecimal::compareTo).orElseThrow(), tol);
        close("greatest Doppler factor", t.maxDoppler(), arrived.stream().map(RefSignal::doppler)
                .max(BigDecimal::compareTo).orElseThrow(), tol);
        close("least light time", t.minLightTime(), arrived.stream().map(s -> s.arrival().lightTime())
                .min(BigDecimal::compareTo).orElseThrow(), tol);
        close("greatest light time", t.maxLightTime(), arrived.stream().map(s -> s.arrival().lightTime())
                .max(BigDecimal::compareTo).orElseThrow(), tol);
        close("last arrival clock", t.lastArrivalClock(), arrived.get(arrived.size() - 1).arrival().clock(), tol);
    }

    static double[] upClocks() {
        return merged(series(5 * DAY, 500 * DAY, 45 * DAY), new double[] {NEAR_HORIZON[0], NEAR_HORIZON[1], 12 * DAY});
    }

    @Test
    void stationToRunawayCraftMatchesTheReferenceUpToItsHorizonAndNeverAfter() throws ScenarioException {
        Mission m = mission(scenario());
        Run up = run(m, "up");
        // Conditioning for a sender at rest at the origin and a receding receiver: 1 + 1 / D (closed form above)
        List<RefSignal> refs = assertRows(up, upClocks(), HOME, PROBE, s -> 1 + 1 / s.dopplerDouble());
        // closed forms (Rindler): D = 1 - a t / c for every delivered send
        for (int i = 0; i < refs.size(); i++) {
            double t = upClocks()[i];
            assertEquals(t < HORIZON, up.rows().get(i).delivered(), "delivered iff sent before c / a");
            up.rows().get(i).delivery().ifPresent(d -> close("closed-form D", d.doppler(), 1 - A * t / C, 1e-9));
        }
        // 1 + 1/D exceeds 1e-12 / 2^-53 = 9007.2 only for the first of the two sends near the horizon
        // the least Doppler factor and the longest light time are those of the ill-conditioned send (assertRows)
        assertTally(up.tally(), refs, 1, (1 + 1 / 5e-5) * EPS);
        assertEquals(15, up.tally().messages());
        assertEquals(11, up.tally().delivered(), "5, 12, 50, ..., 320 d and the two near the horizon");
        assertEquals(4, up.tally().never());
    }

    @Test
    void craftToStationAndStationToApproachingCraftMatchTheReference() throws ScenarioException {
        Mission m = mission(scenario());
        Run down = run(m, "down");
        assertTally(down.tally(), assertRows(down, series(1 * DAY, YR, 60 * DAY), PROBE, HOME, null), 0, TIME_TOL);
        assertEquals(0, down.tally().never());
        Run in = run(m, "in");
        // a sender at the origin with t_e |q - 1| / T far below 1: the condition number's floor of 1
        assertTally(in.tally(), assertRows(in, new double[] {0, 10 * DAY}, HOME, COMER, s -> 1.0), 0, TIME_TOL);
        // Doppler factor of an approach at 0.8 c: sqrt((1 + 0.8) / (1 - 0.8)) = 3 (Einstein 1905)
        close("approach Doppler", in.tally().maxDoppler(), 3.0, TIME_TOL);
        assertTrue(in.tally().budget().orElseThrow().extremeShift(), "received at 3 x the carrier");
        assertTrue(down.tally().budget().isEmpty(), "a link without terms has no budget tally");
        assertTrue(down.rows().get(0).delivery().orElseThrow().budget().isEmpty());
    }

    @Test
    void theBudgetTallyAgreesWithTheRowsAndTheirReceivedFrequencies() throws ScenarioException {
        Mission m = mission(scenario());
        Run up = run(m, "up");
        List<Budget> budgets = up.rows().stream().flatMap(r -> r.delivery().stream())
                .map(d -> d.budget().orElseThrow()).toList();
        double[] rates = budgets.stream().mapToDouble(b -> Math.abs(b.frequency().dopplerRateHzPerS())).toArray();
        List<RefSignal> refs = Arrays.stream(upClocks()).mapToObj(t -> RefSolver.send(HOME, t, PROBE))
                .filter(s -> !s.never()).toList();
        assertEquals(refs.size(), budgets.size());
        for (int i = 0; i < refs.size(); i++) {
            // received frequency = carrier x D (the definition of the Doppler factor), to D's own tolerance:
            // 1e-12, or kappa x 2^-53 with kappa = 1 + 1/D where that is larger (assertRows)
            double tol = Math.max(TIME_TOL, (1 + 1 / refs.get(i).dopplerDouble()) * EPS);
            close("received frequency " + i, budgets.get(i).frequency().rxFrequencyHz(),
                    refs.get(i).doppler().multiply(new BigDecimal("8.4e9")), tol);
            // dD/d(tau) = -D a / c on the craft's clock (WindowsTest's closed form): the rate is -f D a / c
            close("Doppler rate " + i, budgets.get(i).frequency().dopplerRateHzPerS(),
                    -8.4e9 * refs.get(i).dopplerDouble() * A / C, 1e-6);
        }
        BudgetTally.Figures f = up.tally().budget().orElseThrow();
        assertEquals(budgets.stream().mapToDouble(b -> b.reception().marginDb()).min().orElseThrow(), f.worstMarginDb());
        assertEquals(budgets.stream().mapToDouble(b -> b.reception().marginDb()).max().orElseThrow(), f.bestMarginDb());
        assertEquals(budgets.stream().mapToDouble(b -> b.frequency().rxFrequencyHz()).min().orElseThrow(), f.minRxFrequencyHz());
        assertEquals(budgets.stream().mapToDouble(b -> b.frequency().rxFrequencyHz()).max().orElseThrow(), f.maxRxFrequencyHz());
        assertEquals(Arrays.stream(rates).max().orElseThrow(), f.maxAbsDopplerRateHzPerS());
        assertEquals(budgets.stream().mapToDouble(b -> b.reception().maxDataRateBps()).min().orElseThrow(), f.minMaxDataRateBps());
        assertEquals(budgets.stream().mapToDouble(b -> b.reception().maxDataRateBps()).max().orElseThrow(), f.maxMaxDataRateBps());
        assertEquals(budgets.stream().filter(Budget::closes).count(), f.closing());
        // tuning range [4, 9] GHz: D < 4 / 8.4; rate limit 150 Hz/s: 8.4e9 D a / c > 150, i.e. D > 0.546
        long outOfTuning = refs.stream().filter(s -> s.dopplerDouble() < 4 / 8.4).count();
        long overRate = refs.stream().filter(s -> 8.4e9 * s.dopplerDouble() * A / C > 150).count();
        assertEquals(outOfTuning, f.outOfTuning());
        assertEquals(overRate, f.overDopplerRate());
        assertTrue(outOfTuning > 0 && outOfTuning < refs.size(), "some in, some out of tuning: " + outOfTuning);
        assertTrue(overRate > 0 && overRate < refs.size(), "some within, some over the rate: " + overRate);
        assertTrue(f.extremeShift(), "received below half the carrier near the horizon");
    }

    @Test
    void cutoffsAreTheLatestSendsOfThePastConeAndSayWhenTheyLieBeforeTheStart() throws ScenarioException {
        List<CutoffRow> rows = Deadlines.cutoffs(mission(scenario()));
        assertEquals(2, rows.size());
        Object[][] expected = {
            // name, link, sender, receiver, arrive-by clock, before the start
            {"late", "up", HOME, PROBE, 2 * YR, false},
            {"early", "side", ASIDE, PROBE, 0.1 * YR, true},
        };
        for (int i = 0; i < expected.length; i++) {
            Object[] e = expected[i];
            CutoffRow r = rows.get(i);
            assertEquals(e[0], r.name());
            assertEquals(e[1], r.link());
            assertEquals((double) e[4], r.arriveByClock());
            var ref = RefSolver.latestSendArrivingBy((RefWorldline) e[2], (RefWorldline) e[3],
                    new BigDecimal((double) e[4]));
            close(r.name() + " latest send clock", r.latestSendClock(), ref.clock(), TIME_TOL);
            close(r.name() + " latest send time", r.latestSendTime(), ref.t(), TIME_TOL);
            assertTrue(r.reachable());
            assertEquals(e[5], r.beforeStart(), r.name() + " before the start");
        }
    }

    @Test
    void horizonsComeOnePerLinkInFileOrder() throws ScenarioException {
        List<HorizonRow> rows = Deadlines.horizons(mission(scenario()));
        assertEquals(List.of("up", "down", "in", "side", "idle"), rows.stream().map(HorizonRow::link).toList());
        Map<String, RefWorldline> senders = Map.of("up", HOME, "side", ASIDE);
        for (HorizonRow r : rows) {
            boolean has = senders.containsKey(r.link());
            assertEquals(has, r.hasHorizon(), r.link());
            if (has) {
                var ref = RefSolver.horizon(senders.get(r.link()), PROBE);
                close(r.link() + " horizon clock", r.lastSendClock(), ref.clock(), TIME_TOL);
                close(r.link() + " horizon time", r.lastSendTime(), ref.t(), TIME_TOL);
            } else {
                assertEquals(Double.NaN, r.lastSendClock(), r.link());
                assertEquals(Double.NaN, r.lastSendTime(), r.link());
            }
        }
        // Rindler: from the origin the last send that reaches the craft is at t = c / a
        close("closed-form horizon", rows.get(0).lastSendClock(), HORIZON, TIME_TOL);
    }

    @Test
    void roundTripsAreNumberedAndTheIncompleteOnesKeepWhatArrived() throws ScenarioException {
        Mission m = mission(scenario());
        Object[][] plans = {
            // exchange, querier, responder, turnaround, query clocks, complete
            {"ping", HOME, PROBE, HOUR, series(1 * DAY, 500 * DAY, 50 * DAY), 8L},
            // from the probe, the reply from home arrives only for queries before (c/a) ln(2 - 1 d a / c) = 244.7 d
            {"back", PROBE, HOME, DAY, series(1 * DAY, 730 * DAY, 100 * DAY), 3L},
        };
        for (int p = 0; p < plans.length; p++) {
            Object[] e = plans[p];
            Exchange x = m.exchanges().get(p);
            assertEquals(e[0], x.name());
            List<ExchangeRow> rows = new ArrayList<>();
            ExchangeTally tally = Deadlines.exchange(x, rows::add);
            double[] clocks = (double[]) e[4];
            assertEquals(clocks.length, rows.size());
            List<BigDecimal> trips = new ArrayList<>();
            for (int k = 0; k < clocks.length; k++) {
                ExchangeRow r = rows.get(k);
                String at = e[0] + " round trip " + (k + 1);
                assertEquals(k + 1, r.exchange(), at);
                assertEquals(clocks[k], r.querySendClock(), at);
                BigDecimal[] ref = RefSolver.exchange((RefWorldline) e[1], (RefWorldline) e[2],
                        new BigDecimal(clocks[k]), new BigDecimal((double) e[3]));
                assertEquals(ref != null, r.complete(), at + " complete");
                if (ref != null) {
                    double[] got = {r.queryReceiveClock(), r.replySendClock(), r.replyReceiveClock(), r.roundTripClock()};
                    for (int j = 0; j < got.length; j++) {
                        close(at + " figure " + j, got[j], ref[j], TIME_TOL);
                    }
                    trips.add(ref[3]);
                    continue;
                }
                assertEquals(Double.NaN, r.replyReceiveClock(), at);
                assertEquals(Double.NaN, r.roundTripClock(), at);
                RefSignal q = RefSolver.send((RefWorldline) e[1], clocks[k], (RefWorldline) e[2]);
                if (q.never()) {
                    assertEquals(Double.NaN, r.queryReceiveClock(), at);
                    assertEquals(Double.NaN, r.replySendClock(), at);
                } else {
                    close(at + " query receive clock", r.queryReceiveClock(), q.arrival().clock(), TIME_TOL);
                    close(at + " reply send clock", r.replySendClock(), q.arrival().clock()
                            .add(new BigDecimal((double) e[3])), TIME_TOL);
                }
            }
            assertEquals(e[0], tally.name());
            assertEquals(clocks.length, tally.roundTrips());
            assertEquals((long) e[5], tally.complete(), e[0] + " complete");
            assertEquals(trips.size(), tally.complete());
            trips.sort(BigDecimal::compareTo);
            int n = trips.size();
            BigDecimal median = n % 2 == 1 ? trips.get(n / 2)
                    : trips.get(n / 2 - 1).add(trips.get(n / 2)).divide(BigDecimal.valueOf(2), MathContext.DECIMAL128);
            close(e[0] + " least round trip", tally.minRoundTrip(), trips.get(0), TIME_TOL);
            close(e[0] + " median round trip", tally.medianRoundTrip(), median, TIME_TOL);
            close(e[0] + " greatest round trip", tally.maxRoundTrip(), trips.get(n - 1), TIME_TOL);
        }
    }

    @Test
    void evaluatingOneMessageGivesItsFactorsAndNothingBeyondTheHorizon() throws ScenarioException {
        Mission m = mission(scenario());
        LinkSchedule.Evaluated late = LinkSchedule.evaluate(m.links().get("up"), 1.01 * HORIZON);
        assertFalse(late.path().delivered());
        assertEquals(Optional.empty(), late.arrival());
        LinkSchedule.Evaluated ev = LinkSchedule.evaluate(m.links().get("up"), 0.5 * HORIZON);
        LinkSchedule.Arrival a = ev.arrival().orElseThrow();
        // D = 1 - a t / c = 0.5 (Rindler); the sender at rest has motion factor 1
        close("Doppler", a.doppler().doppler(), 0.5, TIME_TOL);
        close("sender factor", a.sendFactor().value(), 1.0, TIME_TOL);
        close("receiver factor", a.receiveFactor().value(), 0.5, TIME_TOL);
        assertTrue(a.budget().isPresent());
    }
}
