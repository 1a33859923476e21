package org.nullpath.schedule;

import java.math.BigDecimal;
import java.util.List;

import org.junit.jupiter.api.Test;
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
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.nullpath.testkit.Si.C;
import static org.nullpath.testkit.Si.DAY;
import static org.nullpath.testkit.Si.G0;

/**
 * The plotted sample of each link: which send clocks are sampled (SampledSeries' documented grid: evenly
 * over the planned range, or three quarters evenly and a quarter geometrically closing in on a horizon inside
 * it) and what each sample holds, against the independent 50-digit reference; the horizon of home -> probe at
 * c / a (Rindler 2006, a craft from rest at the origin at proper acceleration a). Craft and stations are invented.
 */
class SampledSeriesTest {
    static final double TIME_TOL = 1e-12;
    static final double HORIZON = C / G0;
    static final RefStation HOME = RefStation.of(new double[] {0, 0, 0}, null, 0);
    static final RefCraft PROBE = RefCraft.start(null, new double[] {1, 0, 0}, 0, 0, 0).burnForever(G0);

    static Mission mission() throws ScenarioException {
        return ScenarioLoader.load(ScenarioText.homeAndCraft("probe", "burn: {acceleration: 1 g0, duration: forever}")
                .then("""
                        links:
                          up: {from: home, to: probe}
                          down: {from: probe, to: home}
                          lone: {from: home, to: probe}
                          single: {from: probe, to: home}
                          late: {from: home, to: probe}
                          none: {from: probe, to: home}
                          both: {from: home, to: probe}
                          once: {from: home, to: probe}
                        messages:
                          - {link: up, first: 10 d, last: 400 d, every: 5 d}
                          - {link: down, first: 1 d, last: 50 d, every: 7 d}
                          - {link: single, at: [40 d]}
                          - {link: late, at: [380 d, 360 d]}
                          - {link: both, at: [100 d]}
                        exchanges:
                          - {name: ask, query: lone, reply: down, turnaround: 1 h, first: 2 d, last: 300 d, every: 7 d}
                          - {name: also, query: both, reply: down, turnaround: 1 h, first: 2 d, last: 300 d, every: 7 d}
                          - {name: one, query: once, reply: down, turnaround: 1 h, first: 20 d, last: 20 d, every: 7 d}
                        """)
                .yaml(), "series.yaml");
    }

    static SampledSeries.LinkSeries series(Mission m, String link, int n) {
        return SampledSeries.of(m, m.links().get(link), n);
    }

    /** The documented grid towards a horizon: 3n/4 evenly to 0.9 of the range, then geometric gaps down to range / n. */
    static double[] towardsHorizon(double lo, double end, int n) {
        int geometric = n / 4;
        int even = n - geometric;
        double range = end - lo;
        double[] out = new double[n];
        for (int i = 0; i < even; i++) {
            out[i] = lo + 0.9 * range * i / (even - 1);
        }
        for (int k = 1; k <= geometric; k++) {
            out[even - 1 + k] = end - 0.1 * range * Math.pow((range / n) / (0.1 * range), (double) k / geometric);
        }
        return out;
    }

    static void assertSamples(SampledSeries.LinkSeries s, double[] clocks, RefWorldline sender, RefWorldline receiver) {
        assertEquals(clocks.length, s.samples().size(), s.link());
        for (int i = 0; i < clocks.length; i++) {
            SampledSeries.Sample x = s.samples().get(i);
            String at = s.link() + " sample " + i;
            assertEquals(clocks[i], x.sendClock(), 1e-15 * clocks[i], at);
            if (i % 7 != 0 && i != clocks.length - 1) {
                continue; // every seventh and the last against the reference
            }
            RefSignal r = RefSolver.send(sender, x.sendClock(), receiver);
            close(at + " send time", x.sendTime(), r.sender().t());
            close(at + " receive time", x.receiveTime(), r.arrival().t());
            close(at + " receive clock", x.receiveClock(), r.arrival().clock());
            close(at + " light time", x.lightTime(), r.arrival().lightTime());
            close(at + " doppler", x.doppler(), r.doppler());
            assertEquals(r.frequencyOffsetDouble(), x.frequencyOffset(), 1e-9 * Math.abs(r.frequencyOffsetDouble()), at);
            assertTrue(x.budget().isEmpty(), "no terms, no budget");
        }
    }

    static void assertPlanned(SampledSeries.LinkSeries s, double first, double last) {
        assertTrue(s.hasPlannedSends(), s.link());
        assertEquals(first, s.firstSendClock(), s.link());
        assertEquals(last, s.lastSendClock(), s.link());
    }

    static void close(String what, double actual, BigDecimal expected) {
        double e = expected.doubleValue();
        assertEquals(e, actual, TIME_TOL * Math.abs(e), what);
    }

    @Test
    void aHorizonInsideThePlannedRangeIsApproachedGeometrically() throws ScenarioException {
        Mission m = mission();
        SampledSeries.LinkSeries up = series(m, "up", 40);
        assertPlanned(up, 10 * DAY, 400 * DAY);
        assertTrue(up.horizon().hasHorizon());
        assertEquals(HORIZON, up.horizon().lastSendClock(), TIME_TOL * HORIZON, "Rindler: c / a");
        assertTrue(up.horizonCutsRange());
        double end = up.horizon().lastSendClock();
        double[] expected = towardsHorizon(10 * DAY, end, 40);
        assertEquals(end - (end - 10 * DAY) / 40, expected[39], 1e-6, "the last gap is range / n");
        assertSamples(up, expected, HOME, PROBE);
        double[] direct = SampledSeries.towardsHorizon(10 * DAY, end, 40);
        for (int i = 0; i < 40; i++) {
            assertEquals(expected[i], direct[i], 1e-15 * expected[i], "grid point " + i);
        }
        assertEquals(0, up.skipped());
        assertEquals("home", up.from());
        assertEquals("probe", up.to());
        assertTrue(up.terms().isEmpty());
    }

    @Test
    void withoutAHorizonInTheRangeTheSamplesAreEven() throws ScenarioException {
        Mission m = mission();
        SampledSeries.LinkSeries down = series(m, "down", 9);
        assertFalse(down.horizon().hasHorizon(), "every signal from the probe reaches home");
        assertFalse(down.horizonCutsRange());
        double[] even = new double[9];
        for (int i = 0; i < 9; i++) {
            even[i] = DAY + 49 * DAY * i / 8; // 1 d .. 50 d (1 + 7 k)
        }
        assertSamples(down, even, PROBE, HOME);
        assertEquals(50 * DAY, down.samples().get(8).sendClock(), "the last sample is the last planned send");
        // a link that only carries exchange queries samples their range: 2 d .. 296 d
        SampledSeries.LinkSeries lone = series(m, "lone", 2);
        assertSamples(lone, new double[] {2 * DAY, 296 * DAY}, HOME, PROBE);
        assertFalse(lone.horizonCutsRange(), "the horizon at 353.8 d lies after the range");
        // one planned send: one sample
        assertSamples(series(m, "single", 50), new double[] {40 * DAY}, PROBE, HOME);
        // planned messages set the range even where exchange queries go on the same link
        assertSamples(series(m, "both", 5), new double[] {100 * DAY}, HOME, PROBE);
        // one exchange query: one sample
        assertSamples(series(m, "once", 5), new double[] {20 * DAY}, HOME, PROBE);
    }

    @Test
    void aRangeWhollyBeyondTheHorizonOrWithNothingPlannedHasNoSamples() throws ScenarioException {
        Mission m = mission();
        SampledSeries.LinkSeries late = series(m, "late", 10);
        assertPlanned(late, 360 * DAY, 380 * DAY);
        assertTrue(late.horizonCutsRange());
        assertTrue(late.samples().isEmpty());
        SampledSeries.LinkSeries none = series(m, "none", 10);
        assertFalse(none.hasPlannedSends());
        assertTrue(Double.isNaN(none.firstSendClock()) && Double.isNaN(none.lastSendClock()));
        assertFalse(none.horizonCutsRange());
        assertTrue(none.samples().isEmpty());
        assertThrows(IllegalArgumentException.class, () -> series(m, "down", 1));
        List<SampledSeries.LinkSeries> all = SampledSeries.of(m);
        assertEquals(List.of("up", "down", "lone", "single", "late", "none", "both", "once"),
                all.stream().map(SampledSeries.LinkSeries::link).toList());
        assertEquals(SampledSeries.MAX_SAMPLES, all.get(1).samples().size());
    }

    @Test
    void aLinkWithTermsCarriesThemAndABudgetInEverySample() throws ScenarioException {
        Mission m = ScenarioLoader.load(ScheduleAgainstReferenceTest.scenario(), "schedule.yaml");
        SampledSeries.LinkSeries up = series(m, "up", 4);
        assertEquals(8.4e9, up.terms().orElseThrow().carrierHz());
        assertEquals(4, up.samples().size());
        for (SampledSeries.Sample x : up.samples()) {
            // received frequency = carrier x D (the definition of the Doppler factor)
            assertEquals(8.4e9 * x.doppler(), x.budget().orElseThrow().frequency().rxFrequencyHz(), 1e-6);
        }
    }
}
