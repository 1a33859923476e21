package org.nullpath.schedule;

import java.util.List;

import org.apache.commons.math3.analysis.solvers.BrentSolver;
import org.junit.jupiter.api.Test;
import org.nullpath.mission.Mission;
import org.nullpath.scenario.ScenarioException;
import org.nullpath.scenario.ScenarioLoader;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.nullpath.testkit.Si.C;
import static org.nullpath.testkit.Si.G0;
import static org.nullpath.testkit.Si.K_B;

/**
 * Window edges against independent closed forms and independent root finding (Apache Commons Math's
 * own Brent solver on a closed-form budget). The set-up throughout: a station at rest at the origin
 * sends to a craft that burns at a from rest at the origin. Then (Rindler 2006, hyperbolic motion;
 * U = c t - s is constant on the ray) the Doppler factor of a send at t is exactly D = 1 - a t / c,
 * the craft's rapidity at arrival is -ln D, the arrival time is (c / 2a)(1/D - D), and the Doppler
 * rate on the craft's clock is dD/d(tau) = -D a / c.
 */
class WindowsTest {
    static final double A = 0.5 * G0;
    static final double F = 7.2e9;

    private static String scenario(String receiverExtras, String transmitterPower, String window) {
        return WindowMission.yaml("windows check", "{}", "home", "probe", transmitterPower, "40 dBi", receiverExtras,
                window);
    }

    private static List<WindowRow> windows(String yaml) throws ScenarioException {
        Mission s = ScenarioLoader.load(yaml, "windows.yaml");
        return Windows.scan(s.windows().get(0));
    }

    private static void assertRelative(double expected, double actual, double tol) {
        assertEquals(expected, actual, tol * Math.abs(expected), () -> "expected " + expected + ", got " + actual);
    }

    /** The closed-form margin of a send at t, dB (fixed gains, no losses). */
    static double closedFormMargin(double t, double powerWatts) {
        double d = 1 - A * t / C;
        double tr = C / (2 * A) * (1 / d - d);
        double distance = C * (tr - t); // sender at rest: R_tx = c T
        double lambda = C / F;
        double rxPowerDb = 10 * Math.log10(powerWatts) + 70 + 40 + 20 * Math.log10(lambda / (4 * Math.PI * distance));
        double cn0 = rxPowerDb - 10 * Math.log10(K_B * 300);
        double ebn0 = cn0 - 10 * Math.log10(d * 1000);
        return ebn0 - 2.5;
    }

    @Test
    void aWindowClosedByTheTuningRangeClosesWhereTheReceivedFrequencyLeavesIt() throws ScenarioException {
        List<WindowRow> w = windows(scenario("      tuning-range: [7.1 GHz, 7.3 GHz]", "1 GW",
                "{link: up, from: 0 d, to: 60 d}"));
        assertEquals(1, w.size());
        assertEquals(0.0, w.get(0).opensClock());
        // D = 7.1/7.2 = 1 - a t / c
        double expected = (1 - 7.1 / 7.2) * C / A;
        assertRelative(expected, w.get(0).closesClock(), 1e-9);
        assertEquals("tuning", w.get(0).closedBy());
    }

    @Test
    void aWindowThatOpensLateOpensWhereTheDopplerRateFallsWithinTheLimit() throws ScenarioException {
        // |rate| = F D a / c, largest at the start (D = 1): 117.8 Hz/s; limit 100 Hz/s
        List<WindowRow> w = windows(scenario("      max-doppler-rate: 100 Hz/s", "1 GW",
                "{link: up, from: 0 d, to: 200 d}"));
        assertEquals(1, w.size());
        double dStar = 100 * C / (F * A);
        assertRelative((1 - dStar) * C / A, w.get(0).opensClock(), 1e-9);
        assertEquals("end", w.get(0).closedBy());
        assertEquals(200 * 86400.0, w.get(0).closesClock());
    }

    @Test
    void aWindowClosedByMarginClosesAtTheIndependentRootOfTheClosedFormBudget() throws ScenarioException {
        List<WindowRow> w = windows(scenario("", "20 kW", "{link: up, from: 1 h, to: 2 yr}"));
        assertEquals(1, w.size());
        assertEquals("margin", w.get(0).closedBy());
        BrentSolver brent = new BrentSolver(1e-15, 1e-6);
        double root = brent.solve(500, t -> closedFormMargin(t, 20e3), 3600, C / A * (1 - 1e-9));
        assertRelative(root, w.get(0).closesClock(), 1e-9);
        assertEquals(3600.0, w.get(0).opensClock());
    }

    @Test
    void aWindowWithAnEnormousMarginIsClosedByTheHorizon() throws ScenarioException {
        // 1e20 W is no transmitter anyone could build: it keeps the margin positive until within 1e-9
        // (relative) of the horizon, where the margin collapses as D -> 0
        List<WindowRow> w = windows(scenario("", "1e20 W", "{link: up, from: 0 d, to: 3 yr}"));
        assertEquals(1, w.size());
        assertEquals("horizon", w.get(0).closedBy());
        // physics.md: from rest at the origin the last send that ever arrives is t = c/a
        assertRelative(C / A, w.get(0).closesClock(), 1e-12);
    }

    @Test
    void aWindowClosedByTheDopplerRateClosesWhereTheBurnStartsAsSeenByTheReceiver() throws ScenarioException {
        // the craft waits at rest 1e12 m downrange until mission time 30 d, then burns: sends arriving after
        // the burn starts see |rate| = F a / c = 117.8 Hz/s > 100 Hz/s; the edge is the send at 30 d - X / c
        String yaml = scenario("      max-doppler-rate: 100 Hz/s", "1 GW", "{link: up, from: 0 d, to: 40 d}")
                .replace("    heading: [1, 0, 0]", "    heading: [1, 0, 0]\n    start-position: [1e12 m, 0 m, 0 m]\n"
                        + "    start-time: 30 d");
        List<WindowRow> w = windows(yaml);
        assertEquals(1, w.size());
        assertEquals("doppler-rate", w.get(0).closedBy());
        assertRelative(30 * 86400.0 - 1e12 / C, w.get(0).closesClock(), 1e-9);
    }

    @Test
    void aWindowOpensWhereTheReceivedFrequencyFallsBelowTheTopOfTheTuningRange() throws ScenarioException {
        // D = 1 - a t / c (closed form above): in [7.0, 7.15] GHz for D in [7.0 / 7.2, 7.15 / 7.2]
        List<WindowRow> w = windows(scenario("      tuning-range: [7.0 GHz, 7.15 GHz]", "1 GW",
                "{link: up, from: 0 d, to: 60 d}"));
        assertEquals(1, w.size());
        assertRelative((1 - 7.15 / 7.2) * C / A, w.get(0).opensClock(), 1e-9);
        assertRelative((1 - 7.0 / 7.2) * C / A, w.get(0).closesClock(), 1e-9);
        assertEquals("tuning", w.get(0).closedBy());
        assertEquals("up", w.get(0).link());
    }

    @Test
    void aRangeThatEndsBeforeTheHorizonEndsItsWindowAtTheRangeEnd() throws ScenarioException {
        // the horizon is at c / a = 707.5 d (physics.md), after the scanned range; 1e20 W keeps the margin up
        List<WindowRow> w = windows(scenario("", "1e20 W", "{link: up, from: 10 d, to: 700 d}"));
        assertEquals(List.of(new WindowRow("up", 10 * 86400.0, 700 * 86400.0, "end")), w);
        // a range wholly beyond the horizon has no window at all
        assertEquals(List.of(), windows(scenario("", "1e20 W", "{link: up, from: 710 d, to: 800 d}")));
        // a range that starts open and straddles the horizon closes there
        List<WindowRow> h = windows(scenario("", "1e20 W", "{link: up, from: 700 d, to: 800 d}"));
        assertEquals(1, h.size());
        assertEquals("horizon", h.get(0).closedBy());
        assertRelative(C / A, h.get(0).closesClock(), 1e-12);
    }
}
