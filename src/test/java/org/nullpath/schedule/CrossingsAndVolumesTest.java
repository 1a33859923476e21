package org.nullpath.schedule;

import java.math.BigDecimal;
import java.math.MathContext;
import java.util.List;

import org.apache.commons.math3.analysis.solvers.BrentSolver;
import org.junit.jupiter.api.Test;
import org.nullpath.mission.Mission;
import org.nullpath.reference.RefCraft;
import org.nullpath.reference.RefSignal;
import org.nullpath.reference.RefSolver;
import org.nullpath.reference.RefStation;
import org.nullpath.scenario.ScenarioException;
import org.nullpath.scenario.ScenarioLoader;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.nullpath.testkit.Si.C;
import static org.nullpath.testkit.Si.DAY;
import static org.nullpath.testkit.Si.G0;
import static org.nullpath.testkit.Si.K_B;
import static org.nullpath.testkit.Si.LY;

/**
 * Limit crossings, open durations and window volumes against closed forms of hyperbolic motion and the
 * 50-digit reference.
 *
 * <p>The uplink set-up: a station at rest at the origin sends to a craft that burns at a from rest at the
 * origin (Rindler, <i>Relativity: Special, General, and Cosmological</i>, 2006, ch. 3: x = c^2/a (cosh eta - 1),
 * c t = c^2/a sinh eta). A photon sent at station time t runs x = c (t_c - t), so c t = c^2/a (1 - e^-eta):
 * it meets the craft at rapidity eta with e^-eta = u = 1 - a t / c, the Doppler factor of the receding
 * craft is D = e^-eta = u, the craft's clock at arrival is tau = (c/a) eta = -(c/a) ln u, the horizon is
 * t = c/a, and the path length is c (t_c - t) = (c^2/a) (1 - u)^2 / (2 u). With fixed gains the highest
 * closing rate (docs/link-budget.md: (C/N0) / (D (Eb/N0)_req), Friis for C) is then K u / (1 - u)^4 with
 * K = 4 P G_t G_r lambda^2 a^2 / ((4 pi)^2 c^4 k_B T (Eb/N0)_req), whose integral over t is
 * (c/a) K [F(u)] with F(u) = 1/(3 w^3) - 1/(2 w^2), w = 1 - u (d F / du = u / w^4, checked by hand).
 */
class CrossingsAndVolumesTest {
    static final double A = 0.5 * G0;
    static final double F = 7.2e9;
    static final double POWER = 1e9;
    static final double EB_N0_REQUIRED = Math.pow(10, 0.25);
    static final double RATE = 1000;

    private static String uplink(String receiverExtras, String window) {
        return scenario("{}", "home", "probe", "40 dBi", receiverExtras, window);
    }

    /**
     * Station {@code home} at {@code stationBody} and the craft {@code probe} burning from rest at the origin,
     * one link {@code up} between them (1 GW, 70 dBi sending, 300 K receiving 1 kbit/s, 2.5 dB required), one scan.
     */
    private static String scenario(String stationBody, String from, String to, String rxGain, String receiverExtras,
                                   String window) {
        return WindowMission.yaml("crossings check", stationBody, from, to, "1 GW", rxGain, receiverExtras, window);
    }

    private static WindowSurvey survey(String yaml) throws ScenarioException {
        Mission s = ScenarioLoader.load(yaml, "crossings.yaml");
        return Windows.survey(s.windows().get(0));
    }

    private static void assertRelative(double expected, double actual, double tol) {
        assertEquals(expected, actual, tol * Math.abs(expected), () -> "expected " + expected + ", got " + actual);
    }

    /** The send at which the received frequency is ratio times the carrier: D = 1 - a t / c (closed form above). */
    private static double sendAtDoppler(double ratio) {
        return C / A * (1 - ratio);
    }

    /** The craft's clock at the arrival of the send at t: -(c/a) ln(1 - a t / c). */
    private static double arrivalClock(double t) {
        return -C / A * Math.log1p(-A * t / C);
    }

    /** K of the closed-form highest closing rate K u / (1 - u)^4, bit/s. */
    private static double rateConstant() {
        double lambda = C / F;
        double gains = Math.pow(10, 7.0) * Math.pow(10, 4.0);
        return 4 * POWER * gains * lambda * lambda * A * A
                / (Math.pow(4 * Math.PI, 2) * Math.pow(C, 4) * K_B * 300 * EB_N0_REQUIRED);
    }

    private static double closedFormMaxRate(double t) {
        double u = 1 - A * t / C;
        double w = A * t / C;
        return rateConstant() * u / Math.pow(w, 4);
    }

    private static void assertCrossing(CrossingRow row, String limit, String direction, double sendClock) {
        assertEquals("up", row.link());
        assertEquals(limit, row.limit());
        assertEquals(direction, row.direction());
        assertRelative(sendClock, row.sendClock(), 1e-9);
        assertRelative(sendClock, row.sendTime(), 1e-9); // the station's clock is mission time
        if (limit.equals("horizon")) {
            assertTrue(Double.isNaN(row.receiveClock()), "the last send never arrives");
        } else {
            assertRelative(arrivalClock(sendClock), row.receiveClock(), 1e-9);
        }
    }

    @Test
    void everyLimitCrossesWhereTheClosedFormsOfHyperbolicMotionSayEvenWithoutAnyWindow() throws ScenarioException {
        // tuning [7.0, 7.15] GHz holds from D = 7.15/7.2 to D = 7.0/7.2; |Doppler rate| = F D a / c (WindowsTest's
        // closed form) falls within 100 Hz/s only at D = 100 c / (F a) = 0.85, after the tuning range is left:
        // no window at all, yet every limit's crossings are listed
        WindowSurvey s = survey(uplink("      tuning-range: [7.0 GHz, 7.15 GHz]\n      max-doppler-rate: 100 Hz/s",
                "{link: up, from: 1 h, to: 800 d}"));
        assertEquals(List.of(), s.windows());
        List<CrossingRow> x = s.crossings();
        assertEquals(5, x.size(), x::toString);
        assertCrossing(x.get(0), "tuning-high", "enters", sendAtDoppler(7.15 / 7.2));
        assertCrossing(x.get(1), "tuning-low", "leaves", sendAtDoppler(7.0 / 7.2));
        assertCrossing(x.get(2), "doppler-rate", "enters", sendAtDoppler(100 * C / (F * A)));
        // margin: where the closed-form highest rate falls to the planned 1 kbit/s; root by Commons Math's Brent
        BrentSolver brent = new BrentSolver(1e-15, 1e-6);
        double marginRoot = brent.solve(500, t -> closedFormMaxRate(t) / RATE - 1, DAY, C / A * (1 - 1e-9));
        assertCrossing(x.get(3), "margin", "leaves", marginRoot);
        // the horizon of a burn from rest at the origin: t = c/a (Rindler 2006, ch. 3)
        assertCrossing(x.get(4), "horizon", "leaves", C / A);
        assertEquals(C / A, x.get(4).sendClock(), 1e-12 * C / A);
    }

    @Test
    void aLinkWithoutTuningRangeOrDopplerRateLimitHasOnlyMarginAndHorizonCrossings() throws ScenarioException {
        List<CrossingRow> x = survey(uplink("", "{link: up, from: 1 h, to: 800 d}")).crossings();
        assertEquals(List.of("margin", "horizon"), x.stream().map(CrossingRow::limit).toList());
        // a range that ends before the horizon lists no horizon crossing
        List<CrossingRow> early = survey(uplink("", "{link: up, from: 1 h, to: 500 d}")).crossings();
        assertEquals(List.of(), early);
    }

    @Test
    void aTuningWindowIsOpenForItsClosedFormDurationsAndCarriesTheIntegralOfItsRate() throws ScenarioException {
        WindowSurvey s = survey(uplink("      tuning-range: [7.0 GHz, 7.15 GHz]", "{link: up, from: 1 h, to: 60 d}"));
        assertEquals(1, s.windows().size());
        WindowFigures w = s.windows().get(0);
        assertEquals("tuning", w.window().closedBy());
        // send side: (c/a)(0.15 / 7.2); receive side: -(c/a) ln(D) at each end, so (c/a) ln(7.15 / 7.0):
        // the receding craft's clock sees the window stretched by about 1/D
        assertRelative(C / A * (0.15 / 7.2), w.sendOpenSeconds(), 1e-9);
        assertRelative(C / A * Math.log(7.15 / 7.0), w.receiveOpenSeconds(), 1e-9);
        assertRelative(RATE * C / A * (0.15 / 7.2), w.volumeBits(), 1e-9);
        // the closed-form integral (class comment) of a rate that falls by (0.2 / 0.05)^4 = 256 across the window
        double w1 = 0.05 / 7.2;
        double w2 = 0.2 / 7.2;
        double integral = C / A * rateConstant()
                * ((1 / (3 * w1 * w1 * w1) - 1 / (2 * w1 * w1)) - (1 / (3 * w2 * w2 * w2) - 1 / (2 * w2 * w2)));
        assertRelative(integral, w.adaptiveVolumeBits(), 1e-6);
        // the crossings in the range are the window's edges, found by the same solve
        assertEquals(List.of("tuning-high", "tuning-low"), s.crossings().stream().map(CrossingRow::limit).toList());
        assertEquals(w.window().opensClock(), s.crossings().get(0).sendClock());
        assertEquals(w.window().closesClock(), s.crossings().get(1).sendClock());
    }

    @Test
    void aWindowThatOpensWhereTheBodiesMeetHasNoFiniteAdaptiveVolume() throws ScenarioException {
        // the far-field rate grows as 1 / distance^2 towards the send at 0, where they are at one place: the
        // integral diverges (F(u) above grows as 1 / (3 w^3) as w -> 0)
        WindowFigures w = survey(uplink("      tuning-range: [7.0 GHz, 7.3 GHz]", "{link: up, from: 0 d, to: 60 d}"))
                .windows().get(0);
        assertEquals(0.0, w.window().opensClock());
        assertTrue(Double.isNaN(w.adaptiveVolumeBits()));
        assertRelative(RATE * w.sendOpenSeconds(), w.volumeBits(), 1e-15);
    }

    @Test
    void anOffLineDownlinkWindowIsOpenOnTheReceiverClockForTheReferenceArrivalsInterval() throws ScenarioException {
        // the station off the flight line receives from the craft
        String yaml = scenario("{position: [0.3 ly, 0.2 ly, 0 ly]}", "probe", "home", "70 dBi",
                "      tuning-range: [6.5 GHz, 7.1 GHz]", "{link: up, from: 1 d, to: 400 d}");
        WindowSurvey s = survey(yaml);
        assertEquals(1, s.windows().size(), s.windows()::toString);
        WindowFigures w = s.windows().get(0);
        // the 50-digit reference (docs/testing.md) sends at the same two clocks and gives the station's clock
        // at each arrival; their difference, formed at 50 digits
        RefStation aside = RefStation.of(new double[] {0.3 * LY, 0.2 * LY, 0}, null, 0);
        RefCraft probe = RefCraft.start(null, new double[] {1, 0, 0}, 0, 0, 0).burnForever(A);
        RefSignal first = RefSolver.send(probe, w.window().opensClock(), aside);
        RefSignal last = RefSolver.send(probe, w.window().closesClock(), aside);
        double receiveOpen = last.arrival().clock().subtract(first.arrival().clock(), MathContext.DECIMAL128)
                .doubleValue();
        assertRelative(receiveOpen, w.receiveOpenSeconds(), 1e-9);
        assertEquals(new BigDecimal(w.window().closesClock()).subtract(new BigDecimal(w.window().opensClock())).doubleValue(),
                w.sendOpenSeconds());
        // the reference's Doppler factors at the edges are the tuning range's ends over the carrier
        assertRelative(7.1 / 7.2, first.dopplerDouble(), 1e-9);
        assertRelative(6.5 / 7.2, last.dopplerDouble(), 1e-9);
        // the crossings at those edges carry the reference's arrival clocks
        CrossingRow enters = s.crossings().get(0);
        assertEquals("tuning-high", enters.limit());
        assertRelative(first.arrival().clockDouble(), enters.receiveClock(), 1e-12);
    }
}
