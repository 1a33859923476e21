package org.nullpath.cli;

import java.io.IOException;
import java.math.BigDecimal;
import java.math.MathContext;
import java.nio.file.Path;
import java.util.List;

import org.apache.commons.csv.CSVRecord;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.nullpath.reference.RefAberration;
import org.nullpath.reference.RefCraft;
import org.nullpath.reference.RefEvent;
import org.nullpath.reference.RefMath;
import org.nullpath.reference.RefSignal;
import org.nullpath.reference.RefSolver;
import org.nullpath.reference.RefState;
import org.nullpath.reference.RefStation;
import org.nullpath.reference.RefWorldline;
import org.nullpath.testkit.PlanRun;
import org.nullpath.testkit.ScenarioText;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.nullpath.testkit.SendClocks.series;
import static org.nullpath.testkit.Si.C;
import static org.nullpath.testkit.Si.DAY;
import static org.nullpath.testkit.Si.G0;
import static org.nullpath.testkit.Si.LY;
import static org.nullpath.testkit.Si.YR;

/**
 * End to end: the pointing columns of {@code plan} (aim, look, point-ahead) against the independent 50-digit
 * reference: the light cones of {@link RefSolver} and the aberration of {@link RefAberration} (Einstein 1905,
 * sec. 7; Rindler 2006), sharing no code with src/main; the Doppler factor from the same boosts; the classical
 * point-ahead 2 v_perp / c; and the flight line, where the point-ahead is exactly 0. Missions invented.
 *
 * <p>Tolerance on directions: 1e-12 per component (and on the point-ahead angle, in radians), the product's
 * tolerance for times: each direction comes from a light-cone solve good to about 1e-15 relative, and at
 * these speeds (gamma below 2.2) aberration magnifies an error by at most 2 gamma.
 */
class PointingMatchesReferenceTest {
    static final double DIRECTION_TOL = 1e-12;

    @TempDir
    Path tmp;

    /** One link with {@code directions: true} and its series of sends, in seconds on the sender's clock. */
    record Sends(String link, String from, String to, double first, double last, double every) {
        double[] clocks() {
            return series(first, last, every);
        }
    }

    /** The scenario with each of {@code sends}' links and message series added. */
    private static String withSends(ScenarioText s, Sends... sends) {
        for (Sends x : sends) {
            s.link(x.link, x.from, x.to, "directions: true");
        }
        for (Sends x : sends) {
            s.message("{link: " + x.link + ", first: " + x.first + " s, last: " + x.last + " s, every: " + x.every + " s}");
        }
        return s.yaml();
    }

    private static double num(CSVRecord r, String column) {
        return Double.parseDouble(r.get(column));
    }

    private static double[] vector(CSVRecord r, String prefix) {
        return new double[] {num(r, prefix + "_x"), num(r, prefix + "_y"), num(r, prefix + "_z")};
    }

    private static BigDecimal[] negated(BigDecimal[] v) {
        return new BigDecimal[] {v[0].negate(), v[1].negate(), v[2].negate()};
    }

    private static void assertVector(String what, double[] got, BigDecimal[] expected) {
        for (int i = 0; i < 3; i++) {
            assertEquals(expected[i].doubleValue(), got[i], DIRECTION_TOL, what + " component " + i);
        }
    }

    /** Every delivered row of a link CSV against the reference; the sends at {@code clocks}. */
    private static void assertPointingMatches(List<CSVRecord> rows, double[] clocks, RefWorldline sender,
                                              RefWorldline receiver) {
        assertEquals(clocks.length, rows.size(), "one row per planned send");
        for (int i = 0; i < rows.size(); i++) {
            CSVRecord r = rows.get(i);
            String row = "row " + (i + 1);
            RefSignal ref = RefSolver.send(sender, clocks[i], receiver);
            RefState tx = ref.sender();
            RefState rx = ref.arrival().state();
            BigDecimal[] k = RefAberration.direction(tx.position(), rx.position());
            BigDecimal[] aim = RefAberration.toRestFrame(tx, k);
            BigDecimal[] look = negated(RefAberration.toRestFrame(rx, k));
            double[] gotAim = vector(r, "aim");
            double[] gotLook = vector(r, "look");
            assertVector("aim " + row, gotAim, aim);
            assertVector("look " + row, gotLook, look);

            // where the sender sees the receiver: the receiver's emission on the send event's past cone
            RefEvent seenFrom = RefSolver.pastCone(RefEvent.of(tx), receiver);
            BigDecimal[] q = RefAberration.direction(seenFrom.position(), tx.position());
            BigDecimal[] seen = negated(RefAberration.toRestFrame(tx, q));
            double pointAhead = RefAberration.angle(aim, seen).doubleValue();
            assertEquals(pointAhead, num(r, "point_ahead_urad") / 1e6, DIRECTION_TOL, "point-ahead " + row);

            // the same boosts give the photon energy ratio: D = gamma_s (1 + beta_s . aim) / (gamma_r (1 - beta_r . look)),
            // from the plan's own aim and look, against the plan's light-cone Doppler factor
            BigDecimal d = RefAberration.energyFactor(tx, negated(RefMath.bd(gotAim)))
                    .divide(RefAberration.energyFactor(rx, RefMath.bd(gotLook)), MathContext.DECIMAL128);
            assertEquals(1.0, num(r, "doppler") / d.doubleValue(), 1e-11, "Doppler factor from the boosts " + row);
        }
    }

    /** Moving stations and a craft on a heading along no axis: every link between them, in both directions. */
    @Test
    void movingStationsAndACraftOnASlantedHeadingMatchTheReference() throws IOException {
        Sends up = new Sends("up", "home", "kite", 0, 2 * YR, 50 * DAY);
        Sends down = new Sends("down", "kite", "home", 0, 1.5 * YR, 50 * DAY);
        Sends ahead = new Sends("ahead", "kite", "far", 0, 1.5 * YR, 50 * DAY);
        Sends across = new Sends("across", "far", "home", 0, 1 * YR, 100 * DAY);
        Path out = PlanRun.plan(tmp, "slant", withSends(ScenarioText.titled("slanted pointing check")
                .station("home", "{velocity: [0.01 c, -0.02 c, 0.005 c]}")
                .station("far", "{position: [0.2 ly, 0.1 ly, -0.05 ly], velocity: [-0.05 c, 0 c, 0.03 c]}")
                .craft("kite", "heading: [1, 2, -2]\nstart-position: [0.01 ly, 0 ly, 0 ly]",
                        "burn: {acceleration: 1 g0, duration: 1 yr}", "coast: {duration: 1 yr}"),
                up, down, ahead, across));
        RefStation home = RefStation.of(new double[] {0, 0, 0}, new double[] {0.01 * C, -0.02 * C, 0.005 * C}, 0);
        RefStation far = RefStation.of(new double[] {0.2 * LY, 0.1 * LY, -0.05 * LY},
                new double[] {-0.05 * C, 0 * C, 0.03 * C}, 0);
        RefCraft kite = RefCraft.start(new double[] {0.01 * LY, 0, 0}, new double[] {1, 2, -2}, 0, 0, 0)
                .burnForClock(1 * G0, 1 * YR).coastForClock(1 * YR);
        RefMath.withDigits(50, () -> {
            try {
                assertPointingMatches(PlanRun.csv(out.resolve("up.csv")), up.clocks(), home, kite);
                assertPointingMatches(PlanRun.csv(out.resolve("down.csv")), down.clocks(), kite, home);
                assertPointingMatches(PlanRun.csv(out.resolve("ahead.csv")), ahead.clocks(), kite, far);
                assertPointingMatches(PlanRun.csv(out.resolve("across.csv")), across.clocks(), far, home);
            } catch (IOException e) {
                throw new java.io.UncheckedIOException(e);
            }
            return null;
        });
    }

    /**
     * A craft crossing the line of sight at v = 1e-4 c, 0.001 ly from a station at rest, nearest at the send
     * event: the classical point-ahead is 2 v / c (any optical-communication text; the geometry of light time
     * alone); the exact value of this geometry is 2 atan(beta gamma), since both the arrival and the seen
     * emission lie beta gamma d off the line of sight at distance d (c^2 T^2 = d^2 + v^2 T^2).
     */
    @Test
    void transversePointAheadIsTwiceVOverC() throws IOException {
        double beta = 1e-4;
        Path out = PlanRun.plan(tmp, "cross", ScenarioText.home()
                .craft("moth", "heading: [0, 1, 0]\nstart-position: [0.001 ly, 0 ly, 0 ly]\nstart-speed: 0.0001 c")
                .link("up", "home", "moth", "directions: true")
                .message("{link: up, at: [0 s]}")
                .yaml());
        CSVRecord r = PlanRun.csv(out.resolve("up.csv")).get(0);
        double pointAhead = num(r, "point_ahead_urad") / 1e6;
        assertEquals(2 * beta, pointAhead, 1e-8 * 2 * beta, "classical 2 v / c (to its O(beta^2) accuracy)");
        double gammaBeta = beta / Math.sqrt((1 - beta) * (1 + beta));
        assertEquals(2 * Math.atan(gammaBeta), pointAhead, 1e-12 * pointAhead, "exact 2 atan(beta gamma)");
        // the station at rest aims ahead of the line of sight by atan(beta gamma), towards +y
        assertEquals(Math.sin(Math.atan(gammaBeta)), num(r, "aim_y"), 1e-15);
    }

    /**
     * On the flight line the signal runs along it: a photon along the velocity keeps its direction (aberration
     * formula at theta = 0 or pi), so aim and look are exactly plus or minus the heading and the point-ahead is
     * exactly 0; at the launch, where sender and receiver are at one place, there is no direction.
     */
    @Test
    void onTheFlightLineThePointAheadIsExactlyZero() throws IOException {
        Path out = PlanRun.plan(tmp, "line", withSends(ScenarioText.home()
                .station("beacon", "{position: [20 ly, 30 ly, 60 ly]}")
                .craft("lance", "heading: [2, 3, 6]", "burn: {acceleration: 2 g0, duration: 2 yr}",
                        "burn: {acceleration: -2 g0, duration: 1 yr}"),
                new Sends("up", "home", "lance", 0, 3 * YR, 90 * DAY),
                new Sends("down", "lance", "home", 0, 3 * YR, 90 * DAY),
                new Sends("ahead", "lance", "beacon", 10 * DAY, 3 * YR, 90 * DAY)));
        double[] h = {2.0 / 7, 3.0 / 7, 6.0 / 7};
        for (String[] link : new String[][] {{"up", "1", "-1"}, {"down", "-1", "1"}, {"ahead", "1", "-1"}}) {
            List<CSVRecord> rows = PlanRun.csv(out.resolve(link[0] + ".csv"));
            int first = 0;
            if (!link[0].equals("ahead")) {
                CSVRecord launch = rows.get(0);
                for (String c : new String[] {"aim_x", "aim_y", "aim_z", "look_x", "look_y", "look_z", "point_ahead_urad"}) {
                    assertEquals("", launch.get(c), link[0] + " at the launch: no direction, " + c);
                }
                first = 1;
            }
            double aimSign = Double.parseDouble(link[1]);
            double lookSign = Double.parseDouble(link[2]);
            for (CSVRecord r : rows.subList(first, rows.size())) {
                assertEquals("0", r.get("point_ahead_urad"), link[0] + " row " + r.get("message"));
                double[] aim = vector(r, "aim");
                double[] look = vector(r, "look");
                for (int i = 0; i < 3; i++) {
                    assertEquals(aimSign * h[i], aim[i], 2 * Math.ulp(h[i]), link[0] + " aim along the heading");
                    assertEquals(lookSign * h[i], look[i], 2 * Math.ulp(h[i]), link[0] + " look along the heading");
                }
            }
            assertTrue(rows.size() > first + 5);
        }
    }
}
