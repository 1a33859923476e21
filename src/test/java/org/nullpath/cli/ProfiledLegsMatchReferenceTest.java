package org.nullpath.cli;

import java.io.IOException;
import java.math.BigDecimal;
import java.math.MathContext;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;

import org.apache.commons.csv.CSVRecord;
import org.junit.jupiter.api.AfterAll;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.nullpath.reference.RefCraft;
import org.nullpath.reference.RefMath;
import org.nullpath.reference.RefProfiledCraft;
import org.nullpath.reference.RefSignal;
import org.nullpath.reference.RefSolver;
import org.nullpath.reference.RefStation;
import org.nullpath.reference.RefWorldline;
import org.nullpath.testkit.PlanRun;
import org.nullpath.testkit.ScenarioText;
import org.nullpath.testkit.SendClocks;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.nullpath.testkit.SendClocks.series;
import static org.nullpath.testkit.Si.C;
import static org.nullpath.testkit.Si.DAY;
import static org.nullpath.testkit.Si.G0;
import static org.nullpath.testkit.Si.YR;

/**
 * End to end: {@code plan} on one scenario per profiled leg kind (docs/legs.md), every
 * message of a downlink sent during and after the leg (and a few uplinks received during and after it)
 * compared with the independent high-precision reference in {@code org.nullpath.reference}, which shares no
 * code with src/main:
 * <ul>
 *   <li>the propellant-limited {@code rocket} (constant proper acceleration until the propellant is spent) is a
 *       constant-acceleration burn of craft-clock length v_ex ln(MR) / |a| (Ackeret's rocket equation, Helv.
 *       Phys. Acta 19, 1946), flown by {@link RefCraft} in the closed forms of hyperbolic motion (Rindler 2006);
 *       the tolerance is the product's closed-form one, 1e-12 relative;</li>
 *   <li>constant thrust, the beam-pushed sail (Kulkarni, Lubin &amp; Zhang, AJ 155:155, 2018) and the tabulated
 *       profile are flown by {@link RefProfiledCraft}, Gauss–Legendre quadrature of dt/du = cosh eta,
 *       ds/du = c sinh eta at 100 digits, good to 45+ digits (RefProfiledSelfTest); nullpath integrates these
 *       legs numerically and promises 1e-10 relative.</li>
 * </ul>
 * Frequency offsets are held to 1e-9 relative in every case (the product's offset tolerance). Inputs reach the
 * reference as the very doubles the scenario's quantities convert to: number times unit factor (c from the SI
 * Brochure 2019, g0 from the 3rd CGPM 1901, d = 86 400 s, Julian year from the IAU; t = 1e3 kg, g = 1e-3 kg,
 * MN = 1e6 N, GW = 1e9 W, km = 1e3 m). Craft and station names are invented.
 */
class ProfiledLegsMatchReferenceTest {
    static final double[] ORIGIN = {0, 0, 0};
    static final double[] X = {1, 0, 0};
    /** Closed-form legs: the product's tolerance for times, clocks, light times, intervals, Doppler factors. */
    static final double CLOSED_TOL = 1e-12;
    /** Integrated legs (thrust, sail, profile): the tolerance the product promises for them (docs/testing.md, docs/legs.md). */
    static final double INTEGRATED_TOL = 1e-10;
    /** Frequency offsets, every leg kind. */
    static final double OFFSET_TOL = 1e-9;
    /** Doppler rates: the product's tolerance (as in LinkBudgetMatchesReferenceTest). */
    static final double RATE_REL = 1e-6;
    static final List<String> COLUMNS = List.of("send_time_s", "receive_time_s", "receive_clock_s", "light_time_s",
            "doppler", "frequency_offset", "receive_interval_s");

    /** Worst relative error seen per leg kind and column (printed after the run for the record). */
    private static final Map<String, Map<String, Double>> WORST = new LinkedHashMap<>();

    @TempDir
    Path tmp;

    @AfterAll
    static void printWorst() {
        StringBuilder b = new StringBuilder("worst relative error per leg kind and column:\n");
        WORST.forEach((kind, cols) -> {
            b.append(String.format("  %-22s", kind));
            cols.forEach((c, v) -> b.append(String.format(" %s=%.2e", c, v)));
            b.append('\n');
        });
        System.out.print(b);
    }

    // ---------------------------------------------------------------- helpers

    private static double num(CSVRecord r, String column) {
        return Double.parseDouble(r.get(column));
    }

    private static void close(String kind, String what, long row, double actual, BigDecimal expected, double tol) {
        BigDecimal diff = new BigDecimal(actual).subtract(expected).abs();
        double rel = expected.signum() == 0 ? diff.doubleValue()
                : diff.divide(expected.abs(), MathContext.DECIMAL64).doubleValue();
        WORST.computeIfAbsent(kind, k -> new LinkedHashMap<>()).merge(what, rel, Math::max);
        assertTrue(rel <= tol, () -> kind + " " + what + " row " + row + ": got " + actual + ", reference "
                + expected.round(new MathContext(20)) + " (relative error " + rel + " > " + tol + ")");
    }

    /**
     * Compares every row of a link CSV with the reference, fed the send clocks computed from the scenario's plans
     * ({@link SendClocks}); every message must be delivered (no horizons here); returns the send clocks.
     */
    private static double[] assertLinkMatches(String kind, List<CSVRecord> rows, double[] clocks, RefWorldline sender,
                                              RefWorldline receiver, double tol) {
        assertTrue(clocks.length >= 2, kind + ": planned sends");
        assertEquals(clocks.length, rows.size(), kind + ": one row per planned send");
        BigDecimal previousArrival = null;
        for (int i = 0; i < rows.size(); i++) {
            CSVRecord r = rows.get(i);
            long row = i + 1;
            assertEquals(Long.toString(row), r.get("message"), kind + " message number");
            double clock = clocks[i];
            assertEquals(clock, num(r, "send_clock_s"), 0.0, kind + " send_clock_s row " + row);
            RefSignal ref = RefSolver.send(sender, clock, receiver);
            assertEquals(false, ref.never(), kind + " row " + row + " arrives");
            assertEquals("delivered", r.get("status"), kind + " status row " + row);
            close(kind, "send_time_s", row, num(r, "send_time_s"), ref.sender().t(), tol);
            close(kind, "receive_time_s", row, num(r, "receive_time_s"), ref.arrival().t(), tol);
            close(kind, "receive_clock_s", row, num(r, "receive_clock_s"), ref.arrival().clock(), tol);
            close(kind, "light_time_s", row, num(r, "light_time_s"), ref.arrival().lightTime(), tol);
            close(kind, "doppler", row, num(r, "doppler"), ref.doppler(), tol);
            close(kind, "frequency_offset", row, num(r, "frequency_offset"), ref.frequencyOffset(), OFFSET_TOL);
            if (previousArrival == null) {
                assertEquals("", r.get("receive_interval_s"), kind + " receive_interval_s row " + row);
            } else {
                close(kind, "receive_interval_s", row, num(r, "receive_interval_s"),
                        ref.arrival().clock().subtract(previousArrival), tol);
            }
            previousArrival = ref.arrival().clock();
        }
        return clocks;
    }

    /** The messages really straddle the leg: some sent (or received) before its end, some after. */
    private static void assertStraddles(String kind, double[] clocks, double legEndClock) {
        long during = java.util.Arrays.stream(clocks).filter(c -> c < legEndClock).count();
        long after = java.util.Arrays.stream(clocks).filter(c -> c > legEndClock).count();
        assertTrue(during >= 2 && after >= 2, kind + ": " + during + " sends during the leg, " + after + " after");
    }

    private static RefStation home() {
        return RefStation.of(ORIGIN, null, 0);
    }

    // ---------------------------------------------------------------- 1. propellant-limited rocket

    @Test
    void propellantLimitedRocketMatchesHyperbolicMotionToTheClosedFormTolerance() throws IOException {
        Path out = PlanRun.plan(tmp, "rocket", ScenarioText.titled("propellant-limited rocket check")
                .station("home", "{}")
                .craft("kite", "heading: [1, 0, 0]", "rocket: {acceleration: 1 g0, exhaust-speed: 0.5 c, mass-ratio: 10}")
                .link("down", "kite", "home")
                .link("up", "home", "kite")
                .message("{link: down, first: 10 d, last: 3 yr, every: 50 d}")
                .message("{link: up, first: 1 d, last: 2 yr, every: 60 d}")
                .yaml());
        // Ackeret: the rapidity budget (v_ex / c) ln(MR) at constant proper acceleration a lasts v_ex ln(MR) / |a|
        // of craft clock. nullpath computes that duration in double; the reference is handed the very same double
        // (v_ex * Math.log(MR) / |a|, evaluated in that order), so both fly identical inputs. (The exact duration
        // differs from this double by < 2e-16 relative, far inside the tolerance either way; checked below.)
        double vex = 0.5 * C;
        double a = 1 * G0;
        double duration = vex * Math.log(10.0) / Math.abs(a);
        BigDecimal exact = RefMath.bd(vex).multiply(RefMath.ln(BigDecimal.TEN), RefMath.mc())
                .divide(RefMath.bd(a), RefMath.mc());
        assertTrue(exact.subtract(RefMath.bd(duration)).abs().compareTo(exact.multiply(new BigDecimal("2e-16"))) < 0);
        RefCraft kite = RefCraft.start(ORIGIN, X, 0, 0, 0).burnForClock(a, duration);
        double[] down = assertLinkMatches("rocket (propellant) down", PlanRun.csv(out.resolve("down.csv")),
                series(10 * DAY, 3 * YR, 50 * DAY), kite, home(),
                CLOSED_TOL);
        assertStraddles("rocket (propellant) down", down, duration);
        List<CSVRecord> up = PlanRun.csv(out.resolve("up.csv"));
        assertLinkMatches("rocket (propellant) up", up, series(1 * DAY, 2 * YR, 60 * DAY), home(), kite, CLOSED_TOL);
        assertStraddles("rocket (propellant) up", up.stream().mapToDouble(r -> num(r, "receive_clock_s")).toArray(),
                duration);
        // the burn reaches the budgeted speed (Ackeret, from rest): v/c = (MR^(2 v_ex/c) - 1) / (MR^(2 v_ex/c) + 1),
        // here (10 - 1) / (10 + 1) = 9/11
        assertEquals(9.0 / 11.0, Math.tanh(kite.rapidityAtClock(RefMath.bd(2 * YR)).doubleValue()), 1e-15);
    }

    // ---------------------------------------------------------------- 2. constant thrust

    /** Mule (tests 2 and 5): from 1 d at 0.01 c, 2 MN on 100 t down to 20 t at an exhaust speed of 0.1 c. */
    static final String MULE_KEYS = "heading: [1, 0, 0]\nstart-time: 1 d\nstart-clock: 100 s\nstart-speed: 0.01 c";
    static final String MULE_LEG = "rocket: {thrust: 2 MN, initial-mass: 100 t, burnout-mass: 20 t, exhaust-speed: 0.1 c}";

    @Test
    void constantThrustRocketMatchesQuadratureReference() throws IOException {
        Path out = PlanRun.plan(tmp, "thrust", ScenarioText.titled("constant-thrust rocket check")
                .station("home", "{}")
                .craft("mule", MULE_KEYS, MULE_LEG)
                .link("down", "mule", "home")
                .link("up", "home", "mule")
                .message("{link: down, first: 0 d, last: 40 d, every: 2 d}")
                .message("{link: up, at: [2 d, 11 d, 20 d, 32 d]}")
                .yaml());
        RefProfiledCraft mule = RefProfiledCraft.thrust(ORIGIN, X, 1 * DAY, 100, 0.01 * C, 2 * 1e6, 100 * 1e3,
                20 * 1e3, 0.1 * C);
        double end = mule.legEndClockDouble();
        double[] down = assertLinkMatches("rocket (thrust) down", PlanRun.csv(out.resolve("down.csv")),
                series(0 * DAY, 40 * DAY, 2 * DAY), mule, home(),
                INTEGRATED_TOL);
        assertStraddles("rocket (thrust) down", down, end);
        List<CSVRecord> up = PlanRun.csv(out.resolve("up.csv"));
        assertLinkMatches("rocket (thrust) up", up, new double[] {2 * DAY, 11 * DAY, 20 * DAY, 32 * DAY}, home(), mule,
                INTEGRATED_TOL);
        assertStraddles("rocket (thrust) up", up.stream().mapToDouble(r -> num(r, "receive_clock_s")).toArray(), end);
    }

    // ---------------------------------------------------------------- 3. beam-pushed sail

    @Test
    void beamPushedSailMatchesQuadratureReference() throws IOException {
        Path out = PlanRun.plan(tmp, "sail", ScenarioText.titled("beam-pushed sail check")
                .station("home", "{}")
                .craft("wisp", "start-position: [1000 km, 0 km, 0 km]\nheading: [1, 0, 0]",
                        "sail: {beam-from: home, beam-power: 100 GW, mass: 10 g, reflectivity: 1, beam-off: 600 s}")
                .link("down", "wisp", "home")
                .link("up", "home", "wisp")
                .message("{link: down, first: 0 s, last: 1200 s, every: 40 s}")
                .message("{link: up, at: [100 s, 500 s, 700 s, 900 s]}")
                .yaml());
        // the station sits at the origin, 1000 km behind the start: along-track coordinate b = -1000 km
        RefProfiledCraft wisp = RefProfiledCraft.sail(new double[] {1000 * 1e3, 0, 0}, X, 0, 0, 0, -1000 * 1e3,
                100 * 1e9, 10 * 1e-3, 1, 600);
        double end = wisp.legEndClockDouble();
        double[] down = assertLinkMatches("sail down", PlanRun.csv(out.resolve("down.csv")), series(0, 1200, 40), wisp,
                home(), INTEGRATED_TOL);
        assertStraddles("sail down", down, end);
        List<CSVRecord> up = PlanRun.csv(out.resolve("up.csv"));
        assertLinkMatches("sail up", up, new double[] {100, 500, 700, 900}, home(), wisp, INTEGRATED_TOL);
        assertStraddles("sail up", up.stream().mapToDouble(r -> num(r, "receive_clock_s")).toArray(), end);
    }

    // ---------------------------------------------------------------- 4. tabulated profile

    @Test
    void tabulatedProfileMatchesQuadratureReference() throws IOException {
        // invented table: ramp up to 50 m/s^2, hold, ramp down through zero to -20 m/s^2, hold (peak ~0.59 c)
        Files.writeString(tmp.resolve("ramp.csv"), """
                clock_s,acceleration_m_s2
                0,0
                1e6,50
                4e6,50
                5e6,-20
                6e6,-20
                """);
        Path out = PlanRun.plan(tmp, "profile", ScenarioText.titled("tabulated profile check")
                .station("home", "{}")
                .craft("reed", "heading: [3, 4, 0]\nstart-clock: 50 s", "profile: {file: ramp.csv}")
                .link("down", "reed", "home")
                .link("up", "home", "reed")
                .message("{link: down, first: 1 d, last: 120 d, every: 4 d}")
                .message("{link: up, at: [5 d, 20 d, 150 d, 400 d]}")
                .yaml());
        RefProfiledCraft reed = RefProfiledCraft.profile(ORIGIN, new double[] {3, 4, 0}, 0, 50, 0,
                new double[] {0, 1e6, 4e6, 5e6, 6e6}, new double[] {0, 50, 50, -20, -20});
        double end = reed.legEndClockDouble();
        double[] down = assertLinkMatches("profile down", PlanRun.csv(out.resolve("down.csv")),
                series(1 * DAY, 120 * DAY, 4 * DAY), reed, home(),
                INTEGRATED_TOL);
        assertStraddles("profile down", down, end);
        List<CSVRecord> up = PlanRun.csv(out.resolve("up.csv"));
        assertLinkMatches("profile up", up, new double[] {5 * DAY, 20 * DAY, 150 * DAY, 400 * DAY}, home(), reed,
                INTEGRATED_TOL);
        assertStraddles("profile up", up.stream().mapToDouble(r -> num(r, "receive_clock_s")).toArray(), end);
    }

    // ---------------------------------------------------------------- 5. seen from ahead and from off the line

    /**
     * The thrust leg of test 2 seen by stations AHEAD of the craft on its line (signals against the heading,
     * which the solver follows in the null coordinate V = c t + s across the leg's end) and OFF the line (the
     * general cone, which sums the null offsets over the legs it crosses); uplinks from both carry link terms,
     * so their Doppler rates are compared mid-leg with the reference's central difference of full solutions
     * (RefSolver.dopplerRate, times the carrier).
     */
    @Test
    void aProfiledLegSeenFromAheadAndFromOffTheLineMatchesQuadratureReference() throws IOException {
        String terms = """
                carrier: 8.4 GHz
                transmitter: {power: 20 kW, antenna: {gain: 60 dBi}}
                receiver: {antenna: {gain: 40 dBi}, noise-temperature: 100 K}
                data-rate: 1 kbit/s
                required-eb-n0: 3 dB
                """;
        Path out = PlanRun.plan(tmp, "thrust-ahead", ScenarioText.titled("constant-thrust rocket seen from ahead and aside")
                .station("ahead", "{position: [1e14 m, 0 m, 0 m]}")
                .station("aside", "{position: [5e13 m, 2e13 m, 0 m]}")
                .craft("mule", MULE_KEYS, MULE_LEG)
                .link("toward", "ahead", "mule", terms)
                .link("across", "aside", "mule", terms)
                .link("forward", "mule", "ahead")
                .message("{link: toward, first: 0 d, last: 30 d, every: 1 d}")
                .message("{link: across, first: 0 d, last: 30 d, every: 1 d}")
                .message("{link: forward, first: 0 d, last: 30 d, every: 2 d}")
                .yaml());
        RefStation ahead = RefStation.of(new double[] {1e14, 0, 0}, null, 0);
        RefStation aside = RefStation.of(new double[] {5e13, 2e13, 0}, null, 0);
        RefProfiledCraft mule = RefProfiledCraft.thrust(ORIGIN, X, 1 * DAY, 100, 0.01 * C, 2 * 1e6, 100 * 1e3,
                20 * 1e3, 0.1 * C);
        double end = mule.legEndClockDouble();
        double legStartTime = mule.legStart()[0].doubleValue();
        double legEndTime = mule.legEnd()[0].doubleValue();
        for (String[] l : new String[][] {{"toward", "ahead"}, {"across", "aside"}}) {
            RefStation from = l[1].equals("ahead") ? ahead : aside;
            List<CSVRecord> rows = PlanRun.csv(out.resolve(l[0] + ".csv"));
            assertLinkMatches("rocket (thrust) " + l[0], rows, series(0, 30 * DAY, 1 * DAY), from, mule, INTEGRATED_TOL);
            double[] received = rows.stream().mapToDouble(r -> num(r, "receive_clock_s")).toArray();
            assertStraddles("rocket (thrust) " + l[0], received, end);
            // some sends leave while the leg is flown and arrive after its end: the walk crosses the boundary
            long crossing = rows.stream().filter(r -> {
                double sent = num(r, "send_time_s");
                return sent > legStartTime && sent < legEndTime && num(r, "receive_time_s") > legEndTime;
            }).count();
            assertTrue(crossing >= 1, l[0] + ": sends that cross the leg's end in flight: " + crossing);
            int rates = 0;
            for (CSVRecord r : rows) {
                double arrival = num(r, "receive_time_s");
                if (arrival < legStartTime + DAY || arrival > legEndTime - DAY) {
                    continue; // mid-leg only: the rate jumps at the leg's ends
                }
                BigDecimal expected = RefSolver.dopplerRate(from, RefMath.bd(num(r, "send_clock_s")), mule)
                        .multiply(RefMath.bd(8.4e9), RefMath.mc());
                close("rocket (thrust) " + l[0], "doppler_rate_hz_per_s", Long.parseLong(r.get("message")),
                        num(r, "doppler_rate_hz_per_s"), expected, RATE_REL);
                rates++;
            }
            assertTrue(rates >= 5, l[0] + ": Doppler rates compared mid-leg: " + rates);
        }
        double[] forward = assertLinkMatches("rocket (thrust) forward", PlanRun.csv(out.resolve("forward.csv")),
                series(0, 30 * DAY, 2 * DAY), mule, ahead, INTEGRATED_TOL);
        assertStraddles("rocket (thrust) forward", forward, end);
    }

    // ---------------------------------------------------------------- 6. a sail that is not the first leg

    @Test
    void aSailAfterACoastMatchesQuadratureReference() throws IOException {
        // the craft coasts 100 s of mission time at 0.001 c from 1000 km out, then sails; the reference flies one
        // profiled leg from the coast's end (it coasts at its start speed before that), which is the same craft
        Path out = PlanRun.plan(tmp, "late-sail", ScenarioText.titled("sail as a second leg")
                .station("home", "{}")
                .craft("gust", "start-position: [1000 km, 0 km, 0 km]\nheading: [1, 0, 0]\nstart-speed: 0.001 c",
                        "coast: {duration-mission: 100 s}",
                        "sail: {beam-from: home, beam-power: 100 GW, mass: 10 g, reflectivity: 0.9, beam-off: 700 s}")
                .link("down", "gust", "home")
                .link("up", "home", "gust")
                .message("{link: down, first: 10 s, last: 1410 s, every: 50 s}")
                .message("{link: up, at: [150 s, 500 s, 800 s, 1000 s]}")
                .yaml());
        double v = 0.001 * C;
        double startAlong = 1000 * 1e3 + v * 100;
        double startClock = 100 * Math.sqrt(1 - 1e-6);
        RefProfiledCraft gust = RefProfiledCraft.sail(new double[] {startAlong, 0, 0}, X, 100, startClock, v,
                -startAlong, 100 * 1e9, 10 * 1e-3, 0.9, 700);
        double end = gust.legEndClockDouble();
        List<CSVRecord> down = PlanRun.csv(out.resolve("down.csv"));
        double[] clocks = assertLinkMatches("sail (second leg) down", down, series(10, 1410, 50), gust, home(),
                INTEGRATED_TOL);
        assertStraddles("sail (second leg) down", clocks, end);
        long beforeSail = java.util.Arrays.stream(clocks).filter(c -> c < startClock).count();
        assertTrue(beforeSail >= 2, "some sends during the coast: " + beforeSail);
        List<CSVRecord> up = PlanRun.csv(out.resolve("up.csv"));
        assertLinkMatches("sail (second leg) up", up, new double[] {150, 500, 800, 1000}, home(), gust, INTEGRATED_TOL);
    }
}
