package org.nullpath.cli;

import java.io.IOException;
import java.math.BigDecimal;
import java.math.MathContext;
import java.nio.file.Path;
import java.util.List;

import org.apache.commons.csv.CSVRecord;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.nullpath.reference.RefCraft;
import org.nullpath.reference.RefHorizon;
import org.nullpath.reference.RefSignal;
import org.nullpath.reference.RefSolver;
import org.nullpath.reference.RefStation;
import org.nullpath.reference.RefWorldline;
import org.nullpath.reference.RefEvent;
import org.nullpath.testkit.PlanRun;
import org.nullpath.testkit.SendClocks;
import org.nullpath.testkit.ScenarioText;

import static org.junit.jupiter.api.Assertions.assertEquals;
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
 * End to end: {@code plan} on scenarios of four kinds, every CSV value compared with the independent
 * 50-digit reference in {@code org.nullpath.reference} (BigDecimal, root finding in mission time; it
 * shares no code with src/main). Inputs reach the reference as the very doubles the scenario's
 * quantities convert to (number times unit factor: c from the SI Brochure 2019, g0 from the 3rd CGPM
 * 1901, Julian year and light year from the IAU), and send clocks as the scenario's plans define them
 * ({@link SendClocks}), never read back from the tool's output.
 *
 * <p>Tolerances are the product's: 1e-12 relative for times, clocks, light times, intervals and
 * Doppler factors; 1e-9 relative for frequency offsets (even when they are ~1e-13).
 */
class PlanMatchesReferenceTest {
    static final double TIME_TOL = 1e-12;
    static final double OFFSET_TOL = 1e-9;

    @TempDir
    Path tmp;

    // ---------------------------------------------------------------- helpers

    private static void close(String what, long row, double actual, BigDecimal expected, double tol) {
        double e = expected.doubleValue();
        if (e == 0) {
            assertTrue(Math.abs(actual) <= 1e-300, () -> what + " row " + row + ": expected 0, got " + actual);
            return;
        }
        BigDecimal diff = new BigDecimal(actual).subtract(expected).abs();
        double rel = diff.divide(expected.abs(), MathContext.DECIMAL64).doubleValue();
        assertTrue(rel <= tol, () -> what + " row " + row + ": got " + actual + ", reference " + expected.round(
                new MathContext(20)) + " (relative error " + rel + " > " + tol + ")");
    }

    private static double num(CSVRecord r, String column) {
        return Double.parseDouble(r.get(column));
    }

    /**
     * Compares every row of a link CSV with the reference, which is fed the send clocks computed from the
     * scenario's plans ({@link SendClocks}); one row per planned send; returns the number of never rows.
     */
    private static int assertLinkMatches(List<CSVRecord> rows, double[] clocks, RefWorldline sender,
                                         RefWorldline receiver) {
        assertEquals(clocks.length, rows.size(), "one row per planned send");
        BigDecimal previousArrival = null;
        int never = 0;
        for (int i = 0; i < rows.size(); i++) {
            CSVRecord r = rows.get(i);
            long row = i + 1;
            assertEquals(Long.toString(row), r.get("message"), "message number");
            double clock = clocks[i];
            assertEquals(clock, num(r, "send_clock_s"), 0.0, "send_clock_s row " + row);
            RefSignal ref = RefSolver.send(sender, clock, receiver);
            close("send_time_s", row, num(r, "send_time_s"), ref.sender().t(), TIME_TOL);
            if (ref.never()) {
                assertEquals("never", r.get("status"), "status row " + row);
                assertEquals("", r.get("receive_time_s"));
                assertEquals("", r.get("light_time_s"));
                assertEquals("", r.get("receive_interval_s"));
                previousArrival = null;
                never++;
                continue;
            }
            assertEquals("delivered", r.get("status"), "status row " + row);
            close("receive_time_s", row, num(r, "receive_time_s"), ref.arrival().t(), TIME_TOL);
            close("receive_clock_s", row, num(r, "receive_clock_s"), ref.arrival().clock(), TIME_TOL);
            close("light_time_s", row, num(r, "light_time_s"), ref.arrival().lightTime(), TIME_TOL);
            close("doppler", row, num(r, "doppler"), ref.doppler(), TIME_TOL);
            close("frequency_offset", row, num(r, "frequency_offset"), ref.frequencyOffset(), OFFSET_TOL);
            if (previousArrival == null) {
                assertEquals("", r.get("receive_interval_s"), "receive_interval_s row " + row);
            } else {
                close("receive_interval_s", row, num(r, "receive_interval_s"),
                        ref.arrival().clock().subtract(previousArrival), TIME_TOL);
            }
            previousArrival = ref.arrival().clock();
        }
        return never;
    }

    // ---------------------------------------------------------------- 1. open-ended burn

    @Test
    void openEndedBurnMatchesReferenceIncludingTheHorizon() throws IOException {
        Path out = PlanRun.plan(tmp, "open", ScenarioText.titled("open-ended burn check")
                .station("home", "{}")
                .station("aside", "{position: [0.3 ly, 0.2 ly, 0 ly]}")
                .craft("probe", "heading: [1, 0, 0]", "burn: {acceleration: 1 g0, duration: forever}")
                .link("up", "home", "probe")
                .link("down", "probe", "home")
                .link("side", "aside", "probe")
                .message("{link: up, first: 1 d, last: 1.2 yr, every: 20 d}")
                .message("{link: down, first: 1 h, last: 4 yr, every: 60 d}")
                .message("{link: side, first: 0 d, last: 1.6 yr, every: 40 d}")
                .cutoff("{name: mid, link: up, arrive-by: 2 yr}")
                .yaml());
        RefStation home = RefStation.of(new double[] {0, 0, 0}, null, 0);
        RefStation aside = RefStation.of(new double[] {0.3 * LY, 0.2 * LY, 0}, null, 0);
        RefCraft probe = RefCraft.start(new double[] {0, 0, 0}, new double[] {1, 0, 0}, 0, 0, 0).burnForever(1 * G0);
        int neverUp = assertLinkMatches(PlanRun.csv(out.resolve("up.csv")), series(1 * DAY, 1.2 * YR, 20 * DAY), home, probe);
        assertLinkMatches(PlanRun.csv(out.resolve("down.csv")), series(1 * HOUR, 4 * YR, 60 * DAY), probe, home);
        int neverSide = assertLinkMatches(PlanRun.csv(out.resolve("side.csv")), series(0 * DAY, 1.6 * YR, 40 * DAY), aside, probe);
        assertTrue(neverUp > 0 && neverSide > 0, "the scenario reaches past the horizon");

        List<CSVRecord> horizons = PlanRun.csv(out.resolve("horizons.csv"));
        RefHorizon h = RefSolver.horizon(home, probe);
        assertEquals("true", horizons.get(0).get("has_horizon"));
        close("horizon last_send_time_s", 1, num(horizons.get(0), "last_send_time_s"), h.t(), TIME_TOL);
        close("horizon last_send_clock_s", 1, num(horizons.get(0), "last_send_clock_s"), h.clock(), TIME_TOL);
        // physics.md: from rest at the origin the last send that ever arrives is t = c/a
        assertEquals(C / G0, num(horizons.get(0), "last_send_time_s"), 1e-12 * C / G0);
        assertEquals("false", horizons.get(1).get("has_horizon"));
        RefHorizon hs = RefSolver.horizon(aside, probe);
        close("side horizon", 3, num(horizons.get(2), "last_send_time_s"), hs.t(), TIME_TOL);

        CSVRecord cut = PlanRun.csv(out.resolve("cutoffs.csv")).get(0);
        RefEvent latest = RefSolver.latestSendArrivingBy(home, probe, new BigDecimal(2 * YR));
        assertEquals("ok", cut.get("status"));
        close("cutoff latest_send_time_s", 1, num(cut, "latest_send_time_s"), latest.t(), TIME_TOL);
        close("cutoff latest_send_clock_s", 1, num(cut, "latest_send_clock_s"), latest.clock(), TIME_TOL);
    }

    // ---------------------------------------------------------------- 2. launch and landing with offsets

    @Test
    void launchAndLandingWithStartOffsetsMatchesReference() throws IOException {
        Path out = PlanRun.plan(tmp, "landing", ScenarioText.titled("launch-landing check")
                .station("port", "{clock-offset: 500 s}")
                .station("haven", "{position: [5 ly, 0 ly, 0 ly], clock-offset: -2 d}")
                .craft("ferry", """
                        start-position: [0.01 ly, 0 ly, 0 ly]
                        heading: [1, 0, 0]
                        start-time: 30 d
                        start-clock: 1000 s
                        start-speed: 0.001 c""",
                        "burn: {acceleration: 1.5 g0, until-distance: 2 ly}",
                        "coast: {duration-mission: 0.5 yr}",
                        "burn: {acceleration: -1.5 g0, until-speed: 0 c}")
                .link("up", "port", "ferry")
                .link("down", "ferry", "port")
                .link("ahead", "ferry", "haven")
                .link("greet", "haven", "ferry")
                .message("{link: up, first: 0 d, last: 8 yr, every: 73 d}")
                .message("{link: down, first: 0 d, last: 5 yr, every: 61 d}")
                .message("{link: ahead, first: 0 d, last: 5 yr, every: 97 d}")
                .message("{link: greet, first: 0 d, last: 6 yr, every: 83 d}")
                .cutoff("{name: before-braking, link: up, arrive-by: 2.5 yr}")
                .exchange("{name: ping, query: up, reply: down, turnaround: 1 h, first: 0 d, last: 3 yr, every: 150 d}")
                .yaml());
        RefStation port = RefStation.of(new double[] {0, 0, 0}, null, 500);
        RefStation haven = RefStation.of(new double[] {5 * LY, 0, 0}, null, -2 * DAY);
        RefCraft ferry = RefCraft.start(new double[] {0.01 * LY, 0, 0}, new double[] {1, 0, 0}, 30 * DAY, 1000,
                        0.001 * C)
                .burnUntilDistance(1.5 * G0, 2 * LY)
                .coastForMissionTime(0.5 * YR)
                .burnUntilSpeed(-1.5 * G0, 0 * C);
        assertLinkMatches(PlanRun.csv(out.resolve("up.csv")), series(0 * DAY, 8 * YR, 73 * DAY), port, ferry);
        assertLinkMatches(PlanRun.csv(out.resolve("down.csv")), series(0 * DAY, 5 * YR, 61 * DAY), ferry, port);
        assertLinkMatches(PlanRun.csv(out.resolve("ahead.csv")), series(0 * DAY, 5 * YR, 97 * DAY), ferry, haven);
        assertLinkMatches(PlanRun.csv(out.resolve("greet.csv")), series(0 * DAY, 6 * YR, 83 * DAY), haven, ferry);

        CSVRecord cut = PlanRun.csv(out.resolve("cutoffs.csv")).get(0);
        RefEvent latest = RefSolver.latestSendArrivingBy(port, ferry, new BigDecimal(2.5 * YR));
        close("cutoff latest_send_clock_s", 1, num(cut, "latest_send_clock_s"), latest.clock(), TIME_TOL);

        List<CSVRecord> trips = PlanRun.csv(out.resolve("exchanges-ping.csv"));
        double[] queries = series(0 * DAY, 3 * YR, 150 * DAY);
        assertEquals(8, queries.length);
        assertEquals(queries.length, trips.size(), "one row per query");
        for (int i = 0; i < trips.size(); i++) {
            CSVRecord r = trips.get(i);
            long row = i + 1;
            assertEquals(Long.toString(row), r.get("exchange"));
            assertEquals(queries[i], num(r, "query_send_clock_s"), 0.0, "query_send_clock_s row " + row);
            BigDecimal[] ref = RefSolver.exchange(port, ferry, new BigDecimal(queries[i]), new BigDecimal(3600.0));
            assertEquals("complete", r.get("status"));
            close("query_receive_clock_s", row, num(r, "query_receive_clock_s"), ref[0], TIME_TOL);
            close("reply_receive_clock_s", row, num(r, "reply_receive_clock_s"), ref[2], TIME_TOL);
            close("round_trip_clock_s", row, num(r, "round_trip_clock_s"), ref[3], TIME_TOL);
        }
    }

    // ---------------------------------------------------------------- 3. stations off the flight line

    @Test
    void stationsOffTheFlightLineMatchReference() throws IOException {
        Path out = PlanRun.plan(tmp, "offline", ScenarioText.titled("off-line check")
                .station("relay", "{position: [0.4 ly, 0.03 ly, -0.01 ly], velocity: [0 c, 0.001 c, 0.002 c],"
                        + " clock-offset: 3600 s}")
                .station("base", "{position: [0 ly, -0.2 ly, 0 ly]}")
                .craft("dart", "start-position: [0 ly, 0 ly, 0 ly]\nheading: [2, 1, 0]\nstart-speed: 0.2 c",
                        "coast: {duration: 1 yr}", "burn: {acceleration: 0.3 g0, duration: 2 yr}")
                .link("to-relay", "dart", "relay")
                .link("from-relay", "relay", "dart")
                .link("home", "dart", "base")
                .link("base-up", "base", "dart")
                .link("relay-base", "relay", "base")
                .message("{link: to-relay, first: 0 d, last: 3 yr, every: 37 d}")
                .message("{link: from-relay, first: 0 d, last: 3 yr, every: 41 d}")
                .message("{link: home, first: 0 d, last: 3 yr, every: 53 d}")
                .message("{link: base-up, first: 0 d, last: 3 yr, every: 59 d}")
                .message("{link: relay-base, at: [0 s, 1 yr, 2 yr]}")
                .yaml());
        double[] n = {2, 1, 0};
        RefStation relay = RefStation.of(new double[] {0.4 * LY, 0.03 * LY, -0.01 * LY},
                new double[] {0, 0.001 * C, 0.002 * C}, 3600);
        RefStation base = RefStation.of(new double[] {0, -0.2 * LY, 0}, null, 0);
        RefCraft dart = RefCraft.start(new double[] {0, 0, 0}, n, 0, 0, 0.2 * C)
                .coastForClock(1 * YR)
                .burnForClock(0.3 * G0, 2 * YR);
        assertLinkMatches(PlanRun.csv(out.resolve("to-relay.csv")), series(0 * DAY, 3 * YR, 37 * DAY), dart, relay);
        assertLinkMatches(PlanRun.csv(out.resolve("from-relay.csv")), series(0 * DAY, 3 * YR, 41 * DAY), relay, dart);
        assertLinkMatches(PlanRun.csv(out.resolve("home.csv")), series(0 * DAY, 3 * YR, 53 * DAY), dart, base);
        assertLinkMatches(PlanRun.csv(out.resolve("base-up.csv")), series(0 * DAY, 3 * YR, 59 * DAY), base, dart);
        assertLinkMatches(PlanRun.csv(out.resolve("relay-base.csv")), new double[] {0, 1 * YR, 2 * YR}, relay, base);
    }

    // ---------------------------------------------------------------- 4. the precise regime

    @Test
    void tinyAccelerationFarIntoTheMissionKeepsFullPrecision() throws IOException {
        Path out = PlanRun.plan(tmp, "precise", ScenarioText.titled("precise regime check")
                .station("home", "{}")
                .station("side", "{position: [0 m, 3e8 m, 0 m]}")
                .craft("drifter", "heading: [1, 0, 0]", "burn: {acceleration: 1e-9 m/s^2, duration: 40 yr}")
                .link("up", "home", "drifter")
                .link("down", "drifter", "home")
                .link("side-up", "side", "drifter")
                .message("{link: up, first: 1 h, last: 12 h, every: 1 h}")
                .message("{link: up, first: 29.9 yr, last: 30 yr, every: 5 d}")
                .message("{link: down, first: 1 h, last: 6 h, every: 1 h}")
                .message("{link: down, first: 30 yr, last: 30.05 yr, every: 3 d}")
                .message("{link: side-up, first: 30 yr, last: 30.02 yr, every: 2 d}")
                .yaml());
        RefStation home = RefStation.of(new double[] {0, 0, 0}, null, 0);
        RefStation side = RefStation.of(new double[] {0, 3e8, 0}, null, 0);
        RefCraft drifter = RefCraft.start(new double[] {0, 0, 0}, new double[] {1, 0, 0}, 0, 0, 0)
                .burnForClock(1e-9, 40 * YR);
        List<CSVRecord> up = PlanRun.csv(out.resolve("up.csv"));
        assertLinkMatches(up, merged(series(1 * HOUR, 12 * HOUR, 1 * HOUR), series(29.9 * YR, 30 * YR, 5 * DAY)), home,
                drifter);
        assertLinkMatches(PlanRun.csv(out.resolve("down.csv")),
                merged(series(1 * HOUR, 6 * HOUR, 1 * HOUR), series(30 * YR, 30.05 * YR, 3 * DAY)), drifter, home);
        assertLinkMatches(PlanRun.csv(out.resolve("side-up.csv")), series(30 * YR, 30.02 * YR, 2 * DAY), side,
                drifter);
        // the regime really is the precise one: offsets ~1e-13 early, light times of a second 30 years in
        double earlyOffset = num(up.get(0), "frequency_offset");
        assertTrue(Math.abs(earlyOffset) < 1e-12 && Math.abs(earlyOffset) > 1e-14, "offset " + earlyOffset);
        double lateLight = num(up.get(up.size() - 1), "light_time_s");
        assertTrue(lateLight > 0.5 && lateLight < 5, "light time " + lateLight);
    }
}
