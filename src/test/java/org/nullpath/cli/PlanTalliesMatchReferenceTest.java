package org.nullpath.cli;

import java.io.IOException;
import java.math.BigDecimal;
import java.math.MathContext;
import java.nio.file.Path;
import java.util.Arrays;
import java.util.List;
import java.util.Locale;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import org.apache.commons.csv.CSVRecord;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.nullpath.reference.RefCraft;
import org.nullpath.reference.RefHorizon;
import org.nullpath.reference.RefMath;
import org.nullpath.reference.RefSignal;
import org.nullpath.reference.RefSolver;
import org.nullpath.reference.RefState;
import org.nullpath.reference.RefStation;
import org.nullpath.reference.RefWorldline;
import org.nullpath.testkit.ScenarioText;
import org.nullpath.testkit.PlanRun;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.nullpath.testkit.SendClocks.merged;
import static org.nullpath.testkit.SendClocks.series;
import static org.nullpath.testkit.Si.C;
import static org.nullpath.testkit.Si.DAY;
import static org.nullpath.testkit.Si.G0;
import static org.nullpath.testkit.Si.LY;
import static org.nullpath.testkit.Si.YR;

/**
 * End to end: what a plan counts and numbers, against the independent 50-digit reference in
 * {@code org.nullpath.reference} (it shares no code with src/main). Send clocks are computed from the
 * scenario's plans by their definition ({@link org.nullpath.testkit.SendClocks}), never read from the tool's
 * output, and each file's row count is asserted against them.
 *
 * <p>Covered: message numbers 1..n in every link file; summary.json's per-link tallies (messages, delivered,
 * never, least and greatest Doppler factor and light time); round trips numbered 1..n, the incomplete ones
 * marked {@code never}, and the complete count in summary.json; the light time's condition number (its
 * definition in docs/physics.md, "How well a light time is known", evaluated here at 50 digits on the
 * reference's states); the horizon of an accelerating craft sender with leg boundaries (RefSolver.horizon);
 * and the Doppler rate of a message sent just before an off-line horizon (the one-sided difference), against
 * the reference's own central difference.
 *
 * <p>Unit factors as the scenario converts them: d = 86 400 s, Julian year 31 557 600 s (IAU), c exact (SI
 * Brochure 2019), g0 = 9.806 65 m/s^2 (3rd CGPM 1901). Craft and stations are invented.
 */
class PlanTalliesMatchReferenceTest {
    /** The product's tolerance for times, light times and Doppler factors. */
    static final double TIME_TOL = 1e-12;
    /** The product's tolerance for Doppler rates (as in LinkBudgetMatchesReferenceTest). */
    static final double RATE_REL = 1e-6;
    /**
     * The condition number is a first-order estimate evaluated in double from double states; 1e-9 relative
     * leaves room for the rounding of (q - 1) where q is near 1, and is far inside the 20 %..100 % change that
     * any slip in the formula makes (our choice of tolerance, no published source).
     */
    static final double CONDITION_TOL = 1e-9;

    static final RefStation HOME = RefStation.of(new double[] {0, 0, 0}, null, 0);
    static final RefStation ASIDE = RefStation.of(new double[] {0.3 * LY, 0.2 * LY, 0}, null, 0);
    /** Runs off for ever at 1 g0 from rest at the origin: a horizon at t = c / g0 for home. */
    static final RefCraft PROBE = RefCraft.start(new double[] {0, 0, 0}, new double[] {1, 0, 0}, 0, 0, 0)
            .burnForever(1 * G0);
    /** Follows at 0.5 g0 for half a year of its clock, coasts half a year, then coasts on. */
    static final RefCraft CHASER = RefCraft.start(new double[] {0, 0, 0}, new double[] {1, 0, 0}, 0, 0, 0)
            .burnForClock(0.5 * G0, 0.5 * YR)
            .coastForClock(0.5 * YR);

    static final double CARRIER = 8.4e9;

    @TempDir
    Path tmp;
    static Path out;
    static JsonNode summary;
    /** The off-line horizon of aside -> probe: the last send clock that still arrives. */
    static double asideHorizonClock;
    static double[] rateClocks;

    /**
     * Plans afresh for every test (not once for the class): a mutation tool that runs one test at a time then
     * sees each test's own use of the product.
     */
    @BeforeEach
    void plan() throws IOException {
        if (asideHorizonClock == 0) {
            asideHorizonClock = RefSolver.horizon(ASIDE, PROBE).clock().doubleValue();
        }
        // 1500 s before the horizon (within two steps of the rate's stencil, 1e-4 c / g0 = 3057 s: one-sided)
        // and a third of a year (central difference)
        rateClocks = new double[] {asideHorizonClock - 1500, 0.3 * YR};
        String yaml = ScenarioText.titled("tallies and numbering check (invented craft and stations)")
                .station("home", "{}")
                .station("aside", "{position: [0.3 ly, 0.2 ly, 0 ly]}")
                .craft("probe", "heading: [1, 0, 0]", "burn: {acceleration: 1 g0, duration: forever}")
                .craft("chaser", "heading: [1, 0, 0]", "burn: {acceleration: 0.5 g0, duration: 0.5 yr}",
                        "coast: {duration: 0.5 yr}")
                .link("up", "home", "probe")
                .link("down", "probe", "home")
                .link("chase", "chaser", "probe")
                .link("rate", "aside", "probe", ScenarioText.radioTerms("200 W")) // its carrier is CARRIER
                .message("{link: up, first: 1 d, last: 1.3 yr, every: 30 d}")
                .message("{link: up, at: [10 d, 0.5 yr]}")
                .message("{link: down, first: 2 d, last: 2 yr, every: 90 d}")
                .message("{link: chase, first: 5 d, last: 1.5 yr, every: 45 d}")
                .message("{link: chase, at: [0.5 yr, 1 yr]}")
                .message(String.format(Locale.ROOT, "{link: rate, at: [%s s, %s s]}",
                        Double.toString(rateClocks[0]), Double.toString(rateClocks[1])))
                .exchange("{name: ping, query: up, reply: down, turnaround: 1 h, first: 1 d, last: 1.2 yr, every: 60 d}")
                .cutoff("{name: relay-late, link: chase, arrive-by: 1 yr}")
                .cutoff("{name: too-late, link: rate, arrive-by: 0.1 yr}")
                .yaml();
        out = PlanRun.plan(tmp, "tallies", yaml);
        summary = new ObjectMapper().readTree(out.resolve("summary.json").toFile());
    }

    // ---------------------------------------------------------------- independent send clocks

    static double[] upClocks() {
        return merged(series(1 * DAY, 1.3 * YR, 30 * DAY), new double[] {10 * DAY, 0.5 * YR});
    }

    static double[] downClocks() {
        return merged(series(2 * DAY, 2 * YR, 90 * DAY));
    }

    static double[] chaseClocks() {
        return merged(series(5 * DAY, 1.5 * YR, 45 * DAY), new double[] {0.5 * YR, 1 * YR});
    }

    // ---------------------------------------------------------------- message numbers and tallies

    @Test
    void messagesAreNumberedOneToNInSendOrderOnEveryLink() throws IOException {
        assertNumbered("up", upClocks());
        assertNumbered("down", downClocks());
        assertNumbered("chase", chaseClocks());
        assertNumbered("rate", rateClocks.clone());
    }

    private static void assertNumbered(String link, double[] clocks) throws IOException {
        Arrays.sort(clocks);
        List<CSVRecord> rows = PlanRun.csv(out.resolve(link + ".csv"));
        assertEquals(clocks.length, rows.size(), link + ": one row per planned message");
        for (int i = 0; i < rows.size(); i++) {
            assertEquals(Integer.toString(i + 1), rows.get(i).get("message"), link + ": message number of row " + i);
            assertEquals(clocks[i], Double.parseDouble(rows.get(i).get("send_clock_s")), 0.0,
                    link + ": send clock of message " + (i + 1));
        }
    }

    @Test
    void summaryTalliesOfEachLinkMatchTheReference() {
        Tally up = assertTally("up", HOME, PROBE, upClocks());
        assertTrue(up.never > 0 && up.delivered > 0, "up reaches past the horizon: " + up.never);
        Tally down = assertTally("down", PROBE, HOME, downClocks());
        assertEquals(0, down.never, "every downlink arrives");
        Tally chase = assertTally("chase", CHASER, PROBE, chaseClocks());
        assertTrue(chase.never > 0 && chase.delivered > 0, "the chaser's sends reach past its horizon too");
    }

    @Test
    void illConditionedLightTimesAreCountedFromTheirConditionNumbers() throws IOException {
        // docs/physics.md, "How well a light time is known": values with kappa x 2^-53 > 1e-12 are counted as
        // ill-conditioned in the summary
        long total = 0;
        for (String link : new String[] {"up", "down", "chase", "rate"}) {
            long ill = PlanRun.csv(out.resolve(link + ".csv")).stream()
                    .filter(r -> !r.get("light_time_condition").isEmpty())
                    .filter(r -> num(r, "light_time_condition") * 0x1.0p-53 > 1e-12).count();
            assertEquals(ill, linkNode(link).get("ill_conditioned_light_times").asLong(), link);
            total += ill;
        }
        assertTrue(total > 0, "some sends near the horizons are ill-conditioned");
    }

    record Tally(long delivered, long never) {
    }

    private static Tally assertTally(String link, RefWorldline sender, RefWorldline receiver, double[] clocks) {
        BigDecimal minD = null;
        BigDecimal maxD = null;
        BigDecimal minT = null;
        BigDecimal maxT = null;
        long delivered = 0;
        for (double clock : clocks) {
            RefSignal s = RefSolver.send(sender, clock, receiver);
            if (s.never()) {
                continue;
            }
            delivered++;
            minD = minD == null || s.doppler().compareTo(minD) < 0 ? s.doppler() : minD;
            maxD = maxD == null || s.doppler().compareTo(maxD) > 0 ? s.doppler() : maxD;
            BigDecimal t = s.arrival().lightTime();
            minT = minT == null || t.compareTo(minT) < 0 ? t : minT;
            maxT = maxT == null || t.compareTo(maxT) > 0 ? t : maxT;
        }
        JsonNode l = linkNode(link);
        assertEquals(clocks.length, l.get("messages").asLong(), link + " messages");
        assertEquals(delivered, l.get("delivered").asLong(), link + " delivered");
        assertEquals(clocks.length - delivered, l.get("never").asLong(), link + " never");
        close(link + " min_doppler", l.get("min_doppler").asDouble(), minD, TIME_TOL);
        close(link + " max_doppler", l.get("max_doppler").asDouble(), maxD, TIME_TOL);
        close(link + " min_light_time_s", l.get("min_light_time_s").asDouble(), minT, TIME_TOL);
        close(link + " max_light_time_s", l.get("max_light_time_s").asDouble(), maxT, TIME_TOL);
        return new Tally(delivered, clocks.length - delivered);
    }

    // ---------------------------------------------------------------- round trips

    @Test
    void roundTripsAreNumberedAndThoseThatNeverCompleteAreMarkedNever() throws IOException {
        double[] queries = series(1 * DAY, 1.2 * YR, 60 * DAY);
        List<CSVRecord> rows = PlanRun.csv(out.resolve("exchanges-ping.csv"));
        assertEquals(queries.length, rows.size(), "one row per query");
        int complete = 0;
        int never = 0;
        for (int i = 0; i < rows.size(); i++) {
            CSVRecord r = rows.get(i);
            String at = "round trip " + (i + 1);
            assertEquals(Integer.toString(i + 1), r.get("exchange"), at + ": number");
            assertEquals(queries[i], Double.parseDouble(r.get("query_send_clock_s")), 0.0, at + ": query clock");
            BigDecimal[] ref = RefSolver.exchange(HOME, PROBE, RefMath.bd(queries[i]), new BigDecimal(3600));
            if (ref == null) {
                never++;
                assertEquals("never", r.get("status"), at);
                assertEquals("", r.get("query_receive_clock_s"), at + ": the query never arrives");
                assertEquals("", r.get("reply_receive_clock_s"), at);
                assertEquals("", r.get("round_trip_clock_s"), at);
            } else {
                complete++;
                assertEquals("complete", r.get("status"), at);
                close(at + " query_receive_clock_s", num(r, "query_receive_clock_s"), ref[0], TIME_TOL);
                close(at + " reply_send_clock_s", num(r, "reply_send_clock_s"), ref[1], TIME_TOL);
                close(at + " reply_receive_clock_s", num(r, "reply_receive_clock_s"), ref[2], TIME_TOL);
                close(at + " round_trip_clock_s", num(r, "round_trip_clock_s"), ref[3], TIME_TOL);
            }
        }
        assertTrue(complete > 0 && never > 0, "both kinds of round trip: " + complete + " complete, " + never + " never");
        JsonNode ping = summary.get("exchanges").get(0);
        assertEquals("ping", ping.get("name").asText());
        assertEquals(queries.length, ping.get("round_trips").asLong());
        assertEquals(complete, ping.get("complete").asLong());
    }

    // ---------------------------------------------------------------- condition numbers

    @Test
    void lightTimeConditionNumbersMatchTheirDefinitionOnReferenceStates() throws IOException {
        int above1 = 0;
        above1 += assertConditions("up", HOME, PROBE);
        above1 += assertConditions("down", PROBE, HOME);
        above1 += assertConditions("chase", CHASER, PROBE);
        assertTrue(above1 >= 10, "most condition numbers exceed 1 (else the floor of 1 hides the formula): " + above1);
    }

    /** Compares every delivered row's light_time_condition; returns how many exceed 1. */
    private static int assertConditions(String link, RefWorldline sender, RefWorldline receiver) throws IOException {
        int above1 = 0;
        for (CSVRecord r : PlanRun.csv(out.resolve(link + ".csv"))) {
            if (!"delivered".equals(r.get("status"))) {
                assertEquals("", r.get("light_time_condition"), link + " message " + r.get("message"));
                continue;
            }
            RefSignal s = RefSolver.send(sender, num(r, "send_clock_s"), receiver);
            BigDecimal kappa = condition(s);
            if (kappa.compareTo(BigDecimal.ONE) > 0) {
                above1++;
            }
            close(link + " light_time_condition of message " + r.get("message"), num(r, "light_time_condition"),
                    kappa.max(BigDecimal.ONE), CONDITION_TOL);
        }
        return above1;
    }

    /**
     * kappa = (|t_e| |q - 1| + |r_e| / (c (1 - beta_r . k))) / T with q = (1 - beta_s . k) / (1 - beta_r . k),
     * k the photon's unit direction (docs/physics.md, "How well a light time is known").
     */
    static BigDecimal condition(RefSignal s) {
        MathContext mc = RefMath.mc();
        RefState send = s.sender();
        RefState receive = s.arrival().state();
        BigDecimal[] d = new BigDecimal[3];
        for (int i = 0; i < 3; i++) {
            d[i] = s.arrival().position()[i].subtract(send.position()[i], mc);
        }
        BigDecimal len = RefMath.sqrt(dot(d, d));
        BigDecimal oneMinusS = BigDecimal.ONE.subtract(dot(send.velocity(), d).divide(RefMath.C.multiply(len), mc));
        BigDecimal oneMinusR = BigDecimal.ONE.subtract(dot(receive.velocity(), d).divide(RefMath.C.multiply(len), mc));
        BigDecimal q = oneMinusS.divide(oneMinusR, mc);
        BigDecimal re = RefMath.sqrt(dot(send.position(), send.position()));
        return send.t().abs().multiply(q.subtract(BigDecimal.ONE).abs(), mc)
                .add(re.divide(RefMath.C.multiply(oneMinusR, mc), mc), mc)
                .divide(s.arrival().lightTime(), mc);
    }

    private static BigDecimal dot(BigDecimal[] a, BigDecimal[] b) {
        MathContext mc = RefMath.mc();
        return a[0].multiply(b[0], mc).add(a[1].multiply(b[1], mc), mc).add(a[2].multiply(b[2], mc), mc);
    }

    // ---------------------------------------------------------------- horizons of craft senders

    @Test
    void theHorizonOfAnAcceleratingCraftSenderMatchesTheReference() throws IOException {
        RefHorizon h = RefSolver.horizon(CHASER, PROBE);
        assertTrue(h.exists());
        CSVRecord row = horizonRow("chase");
        assertEquals("true", row.get("has_horizon"));
        close("chase last_send_time_s", num(row, "last_send_time_s"), h.t(), TIME_TOL);
        close("chase last_send_clock_s", num(row, "last_send_clock_s"), h.clock(), TIME_TOL);
        // the chaser's horizon falls after its burn and its coast (both end at 0.5 yr and 1 yr of its clock)
        assertTrue(num(row, "last_send_clock_s") > 1 * YR, "horizon clock " + num(row, "last_send_clock_s"));
        JsonNode json = horizonNode("chase");
        assertEquals(num(row, "last_send_clock_s"), json.get("last_send_clock_s").asDouble(), 0.0);
        assertEquals(num(row, "last_send_time_s"), json.get("last_send_time_s").asDouble(), 0.0);
        // the downlink from a craft on an open-ended burn always arrives: no horizon
        assertEquals("false", horizonRow("down").get("has_horizon"));
        assertEquals(false, horizonNode("down").get("has_horizon").asBoolean());
    }

    @Test
    void messagesSentAtTheSendersLegBoundariesMatchTheReference() throws IOException {
        for (CSVRecord r : PlanRun.csv(out.resolve("chase.csv"))) {
            double clock = num(r, "send_clock_s");
            if (clock != 0.5 * YR && clock != 1 * YR) {
                continue;
            }
            RefSignal s = RefSolver.send(CHASER, clock, PROBE);
            String at = "chase message at clock " + clock;
            assertEquals("delivered", r.get("status"), at);
            close(at + " send_time_s", num(r, "send_time_s"), s.sender().t(), TIME_TOL);
            close(at + " light_time_s", num(r, "light_time_s"), s.arrival().lightTime(), TIME_TOL);
            close(at + " doppler", num(r, "doppler"), s.doppler(), TIME_TOL);
        }
    }

    // ---------------------------------------------------------------- cut-offs

    @Test
    void cutoffsMatchTheReferenceAndFlagALatestSendBeforeTheMissionStarts() throws IOException {
        // relay-late: the chaser's last send that reaches the probe by its clock 1 yr; too-late: aside is 0.36 ly
        // from the probe's start, so its last send arriving by 0.1 yr was sent before mission time 0
        List<CSVRecord> rows = PlanRun.csv(out.resolve("cutoffs.csv"));
        assertEquals(2, rows.size());
        RefWorldline[][] ends = {{CHASER, PROBE}, {ASIDE, PROBE}};
        double[] arriveBy = {1 * YR, 0.1 * YR};
        String[] before = {"false", "true"};
        for (int i = 0; i < 2; i++) {
            CSVRecord r = rows.get(i);
            String at = "cut-off " + r.get("name");
            org.nullpath.reference.RefEvent latest = RefSolver.latestSendArrivingBy(ends[i][0], ends[i][1],
                    RefMath.bd(arriveBy[i]));
            assertEquals("ok", r.get("status"), at);
            assertEquals(arriveBy[i], num(r, "arrive_by_clock_s"), 0.0, at);
            close(at + " latest_send_clock_s", num(r, "latest_send_clock_s"), latest.clock(), TIME_TOL);
            close(at + " latest_send_time_s", num(r, "latest_send_time_s"), latest.t(), TIME_TOL);
            assertEquals(before[i], r.get("before_mission_start"), at);
            JsonNode json = summary.get("cutoffs").get(i);
            assertEquals(r.get("name"), json.get("name").asText());
            assertEquals(num(r, "latest_send_clock_s"), json.get("latest_send_clock_s").asDouble(), 0.0, at);
            assertEquals(Boolean.parseBoolean(before[i]), json.get("before_mission_start").asBoolean(), at);
        }
    }

    // ---------------------------------------------------------------- Doppler rate next to a horizon

    @Test
    void dopplerRateJustBeforeAnOffLineHorizonMatchesTheReference() throws IOException {
        List<CSVRecord> rows = PlanRun.csv(out.resolve("rate.csv"));
        assertEquals(2, rows.size());
        for (CSVRecord r : rows) {
            double clock = num(r, "send_clock_s");
            String at = "rate message at clock " + clock;
            assertEquals("delivered", r.get("status"), at);
            BigDecimal expected = RefSolver.dopplerRate(ASIDE, RefMath.bd(clock), PROBE)
                    .multiply(RefMath.bd(CARRIER), RefMath.mc());
            close(at + " doppler_rate_hz_per_s", num(r, "doppler_rate_hz_per_s"), expected, RATE_REL);
        }
        // the first really is next to the horizon: the stencil's later points (3057 s on) never arrive
        assertTrue(RefSolver.send(ASIDE, rateClocks[0] + 3057, PROBE).never());
        assertNotNull(RefSolver.send(ASIDE, rateClocks[0], PROBE).arrival());
    }

    // ---------------------------------------------------------------- helpers

    private static JsonNode linkNode(String name) {
        for (JsonNode l : summary.get("links")) {
            if (l.get("name").asText().equals(name)) {
                return l;
            }
        }
        throw new AssertionError("no link " + name + " in summary.json");
    }

    private static JsonNode horizonNode(String link) {
        for (JsonNode h : summary.get("horizons")) {
            if (h.get("link").asText().equals(link)) {
                return h;
            }
        }
        throw new AssertionError("no horizon of " + link + " in summary.json");
    }

    private static CSVRecord horizonRow(String link) throws IOException {
        for (CSVRecord r : PlanRun.csv(out.resolve("horizons.csv"))) {
            if (r.get("link").equals(link)) {
                return r;
            }
        }
        throw new AssertionError("no horizon row for " + link);
    }

    private static double num(CSVRecord r, String column) {
        return Double.parseDouble(r.get(column));
    }

    private static void close(String what, double actual, BigDecimal expected, double tol) {
        assertNotNull(expected, what + ": the reference has a value");
        BigDecimal diff = new BigDecimal(actual).subtract(expected).abs();
        double rel = diff.divide(expected.abs(), MathContext.DECIMAL64).doubleValue();
        assertTrue(rel <= tol, () -> what + ": got " + actual + ", reference " + expected.round(new MathContext(20))
                + " (relative error " + rel + " > " + tol + ")");
    }
}
