package org.nullpath.schedule;

import java.math.BigDecimal;
import java.util.List;

import org.junit.jupiter.api.Test;
import org.nullpath.mission.Mission;
import org.nullpath.reference.RefCraft;
import org.nullpath.reference.RefArrival;
import org.nullpath.reference.RefEvent;
import org.nullpath.reference.RefSolver;
import org.nullpath.reference.RefState;
import org.nullpath.reference.RefStation;
import org.nullpath.reference.RefWorldline;
import org.nullpath.scenario.ScenarioException;
import org.nullpath.scenario.ScenarioLoader;
import org.nullpath.testkit.ScenarioText;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.nullpath.testkit.Si.AU;
import static org.nullpath.testkit.Si.C;
import static org.nullpath.testkit.Si.DAY;
import static org.nullpath.testkit.Si.G0;

/**
 * The spacetime diagram's content against the rules its documentation states (DiagramTraces: the time
 * range from mission time 0, the planned sends and the leg boundaries, reaching at most twice as far again
 * for arrivals, padded 4 % above and 2 % below; the distance range over the bodies and the drawn rays,
 * padded 4 % each side; equal lengths for c t and distance) with every event taken from the independent
 * reference: ray ends by RefSolver, craft positions and leg ends by RefCraft, the horizon's null line from
 * Rindler's closed form (a craft from rest at the origin at a approaches c t - x = c^2 / a). Craft and
 * stations are invented.
 */
class DiagramLayoutTest {
    static final double TIME_TOL = 1e-12;
    static final double A = G0;

    static final RefStation HOME = RefStation.of(new double[] {0, 0, 0}, null, 0);
    static final RefStation POST = RefStation.of(new double[] {0, AU, 0}, null, 0);
    static final RefCraft PROBE = RefCraft.start(null, new double[] {1, 0, 0}, 0, 0, 0).burnForever(A);
    static final RefCraft WISP = RefCraft.start(null, new double[] {-1, 0, 0}, -20 * DAY, 0, 0)
            .burnForClock(0.5 * G0, 30 * DAY);
    static final RefCraft SIDE = RefCraft.start(null, new double[] {0, 1, 0}, 0, 0, 0).burnForClock(A, 10 * DAY);

    static Mission mission() throws ScenarioException {
        return ScenarioLoader.load(ScenarioText.homeAndCraft("probe", "burn: {acceleration: 1 g0, duration: forever}")
                .station("post", "{position: [0 au, 1 au, 0 au]}")
                .craft("wisp", "heading: [-2, 0, 0]\nstart-time: -20 d", "burn: {acceleration: 0.5 g0, duration: 30 d}")
                .craft("side", "heading: [0, 1, 0]", "burn: {acceleration: 1 g0, duration: 10 d}")
                .link("up", "home", "probe")
                .link("down", "probe", "home")
                .link("ground", "home", "post")
                .then("""
                        messages:
                          - {link: up, first: 0 d, last: 500 d, every: 10 d}
                          - {link: down, first: 1 d, last: 100 d, every: 10 d}
                          - {link: ground, at: [-30 d]}
                        """)
                .yaml(), "diagram.yaml");
    }

    static void close(String what, double actual, double expected, double tol) {
        assertEquals(expected, actual, tol * Math.abs(expected), what);
    }

    static double alongX(RefWorldline w, double t) {
        return w.atTime(new BigDecimal(t)).position()[0].doubleValue();
    }

    /** The first line's diagram for width over height {@code w}, with its rays and range checked. */
    static DiagramTraces.Diagram assertFirstLine(Mission m, List<SampledSeries.LinkSeries> series, double w) {
        DiagramTraces.FlightLine line = DiagramTraces.flightLines(m).get(0);
        DiagramTraces.Diagram d = DiagramTraces.of(line, true, series, w);
        assertEquals(List.of("probe", "wisp"), d.axisCraft());
        assertArrayEquals(new double[] {1, 0, 0}, d.axis());
        assertEquals(w, d.widthOverHeight());
        // time range: the earliest send (ground at -30 d) to the latest (up at 500 d); the arrivals reach
        // further than twice that, so the top is capped at first + 2 (base - first); then the pads
        double first = -30 * DAY;
        double last = first + DiagramTraces.ARRIVAL_REACH * (500 * DAY - first);
        double span = last - first;
        double top = last + 0.04 * span;
        double bottom = first - 0.02 * span;
        close("bottom", d.firstTime(), bottom, TIME_TOL);
        // distance range: the wisp runs off backwards, the probe forwards; both furthest at the top
        double lo = alongX(WISP, top);
        double hi = alongX(PROBE, top);
        double width = hi - lo;
        lo -= 0.04 * width;
        hi += 0.04 * width;
        double ctSpan = C * (top - bottom);
        if (ctSpan * w > hi - lo) {
            // widened about its middle to match c t
            double mid = 0.5 * (lo + hi);
            close("top", d.lastTime(), top, TIME_TOL);
            close("left", d.firstAlong(), mid - 0.5 * ctSpan * w, 1e-9);
            close("right", d.lastAlong(), mid + 0.5 * ctSpan * w, 1e-9);
        } else {
            // the time range grows to match the distance
            close("top", d.lastTime(), bottom + (hi - lo) / w / C, 1e-9);
            close("left", d.firstAlong(), lo, 1e-9);
            close("right", d.lastAlong(), hi, 1e-9);
        }
        assertRays(d);
        return d;
    }

    /** Every ray against the reference, links in file order, lost rays last within their link. */
    static void assertRays(DiagramTraces.Diagram d) {
        // up: 8 send clocks 0 + 500 d i / (7 + 2/3); down (second link: a third of a spacing in):
        // 1 d + 90 d (i + 1/3) / (7 + 2/3); ground: its one send
        double[] up = new double[8];
        double[] down = new double[8];
        for (int i = 0; i < 8; i++) {
            up[i] = 500 * DAY * i / (7 + 2 / 3.0);
            down[i] = DAY + 90 * DAY * (i + 1 / 3.0) / (7 + 2 / 3.0);
        }
        Object[][] links = {{"up", HOME, PROBE, up}, {"down", PROBE, HOME, down}, {"ground", HOME, POST, new double[] {-30 * DAY}}};
        int r = 0;
        double beyond = d.lastTime() + (d.lastTime() - d.firstTime());
        for (Object[] l : links) {
            double[] clocks = (double[]) l[3];
            // delivered first, then the lost ones (sent after the horizon at c / a = 353.8 d)
            for (boolean delivered : new boolean[] {true, false}) {
                for (double clock : clocks) {
                    RefState tx = ((RefWorldline) l[1]).atClock(clock);
                    RefArrival s = RefSolver.futureCone(RefEvent.of(tx), (RefWorldline) l[2]);
                    if (s.never() == delivered) {
                        continue;
                    }
                    DiagramTraces.Ray ray = d.rays().get(r++);
                    String at = l[0] + " ray sent at clock " + clock;
                    assertEquals(l[0], ray.link(), at);
                    assertEquals(delivered, ray.delivered(), at);
                    double sendTime = tx.t().doubleValue();
                    double sendAlong = tx.position()[0].doubleValue();
                    assertEquals(sendTime, ray.sendTime(), TIME_TOL * Math.max(DAY, Math.abs(sendTime)), at);
                    assertEquals(sendAlong, ray.sendAlong(), TIME_TOL * Math.abs(sendAlong) + 1e-3, at);
                    if (delivered) {
                        close(at + " end time", ray.endTime(), s.tDouble(), TIME_TOL);
                        assertEquals(s.positionDouble()[0], ray.endAlong(),
                                TIME_TOL * Math.abs(s.positionDouble()[0]) + 1e-3, at);
                    } else {
                        // runs off the top along +x at c: to twice the drawn time range
                        close(at + " far time", ray.endTime(), beyond, TIME_TOL);
                        close(at + " far along", ray.endAlong(), sendAlong + C * (beyond - sendTime), TIME_TOL);
                    }
                }
            }
        }
        assertEquals(r, d.rays().size());
        assertEquals(17, r, "8 + 8 + 1 rays");
    }

    @Test
    void theFirstLineShowsItsCraftRaysHorizonAndLegBoundariesWhereTheReferencePutsThem() throws ScenarioException {
        Mission m = mission();
        List<SampledSeries.LinkSeries> series = SampledSeries.of(m);
        DiagramTraces.Diagram d = assertFirstLine(m, series, 0.5);
        // bodies: the stations, then the line's craft, each sampled over the whole range plus its leg boundaries
        assertEquals(List.of("home", "post", "probe", "wisp"), d.bodies().stream().map(DiagramTraces.Trace::body).toList());
        int[] extra = {0, 0, 1, 2}; // the probe's burn start; the wisp's burn start and end
        for (int b = 0; b < 4; b++) {
            DiagramTraces.Trace t = d.bodies().get(b);
            assertEquals(b >= 2, t.craft());
            assertEquals(DiagramTraces.TRACE_POINTS + extra[b], t.timeSeconds().length, t.body());
            assertEquals(d.firstTime(), t.timeSeconds()[0]);
            assertEquals(d.lastTime(), t.timeSeconds()[t.timeSeconds().length - 1], 1e-6);
            for (int i = 1; i < t.timeSeconds().length; i++) {
                assertTrue(t.timeSeconds()[i] > t.timeSeconds()[i - 1], t.body() + " ascending");
            }
        }
        DiagramTraces.Trace wisp = d.bodies().get(3);
        for (int i = 0; i < wisp.timeSeconds().length; i += 37) {
            close("wisp along", wisp.alongMetres()[i], alongX(WISP, wisp.timeSeconds()[i]), 1e-9);
        }
        // leg marks: the probe's open burn; the wisp's burn and the coast after it
        List<DiagramTraces.LegMark> marks = d.legMarks();
        assertEquals(3, marks.size());
        BigDecimal[] wispEnd = WISP.legEnd(0); // {t, clock, s, eta}
        Object[][] expected = {
            {"probe", 1, "burn", G0, 0.0, 0.0},
            {"wisp", 1, "burn", 0.5 * G0, -20 * DAY, 0.0},
            {"wisp", 2, "coast", 0.0, wispEnd[0].doubleValue(), -wispEnd[2].doubleValue()},
        };
        for (int i = 0; i < 3; i++) {
            DiagramTraces.LegMark k = marks.get(i);
            assertEquals(expected[i][0], k.craft());
            assertEquals(expected[i][1], k.leg());
            assertEquals(expected[i][2], k.kind());
            assertEquals((double) expected[i][3], k.accelerationMetresPerSecond2());
            assertEquals((double) expected[i][4], k.timeSeconds(), TIME_TOL * DAY * 40);
            assertEquals((double) expected[i][5], k.alongMetres(), 1e-9 * Math.abs((double) expected[i][5]) + 1e-3);
        }
        // the horizon of home -> probe: c t - x = c^2 / a (Rindler); no other link has one
        assertEquals(1, d.horizons().size());
        DiagramTraces.NullLine h = d.horizons().get(0);
        assertEquals("up", h.link());
        assertEquals("probe", h.body());
        assertEquals(1.0, h.k());
        close("limit", h.limitMetres(), C * C / A, TIME_TOL);
        close("time on the null line 1 au along", h.timeAt(AU), (C * C / A + AU) / C, TIME_TOL);
    }

    @Test
    void theRangesWidenTheOtherWayWhenTheDrawingIsNarrowOrWide() throws ScenarioException {
        Mission m = mission();
        List<SampledSeries.LinkSeries> series = SampledSeries.of(m);
        DiagramTraces.Diagram narrow = assertFirstLine(m, series, 0.2);
        // the traces were sampled again over the grown range
        DiagramTraces.Trace home = narrow.bodies().get(0);
        assertEquals(narrow.lastTime(), home.timeSeconds()[home.timeSeconds().length - 1], 1e-6);
        assertFirstLine(m, series, 3.0);
        // between bounds, the content's own proportions are taken
        DiagramTraces.Diagram free = DiagramTraces.of(DiagramTraces.flightLines(m).get(0), true, series, 0.1, 10);
        double own = (free.lastAlong() - free.firstAlong()) / (C * (free.lastTime() - free.firstTime()));
        close("own proportions", free.widthOverHeight(), own, 1e-12);
        assertTrue(free.widthOverHeight() > 0.1 && free.widthOverHeight() < 10);
    }

    @Test
    void aSecondFlightLineDrawsOnlyItsOwnCraftAndLinks() throws ScenarioException {
        Mission m = mission();
        List<DiagramTraces.FlightLine> lines = DiagramTraces.flightLines(m);
        assertEquals(2, lines.size(), "the wisp flies the probe's line backwards; the side craft has its own");
        assertEquals(List.of("probe", "wisp"), lines.get(0).craft().stream().map(c -> c.name()).toList());
        assertEquals(List.of("home", "post", "side"), lines.get(1).bodies().stream().map(b -> b.name()).toList());
        DiagramTraces.Diagram d = DiagramTraces.of(lines.get(1), false, SampledSeries.of(m), 1.0);
        assertArrayEquals(new double[] {0, 1, 0}, d.axis());
        assertTrue(d.rays().isEmpty(), "no link of the side craft; the station link is drawn on the first line only");
        assertTrue(d.horizons().isEmpty());
        // the range runs from mission time 0 to the side craft's burn end, padded
        double end = SIDE.legEnd(0)[0].doubleValue();
        close("bottom", d.firstTime(), -0.02 * end, 1e-12);
        assertEquals(2, d.legMarks().size());
        assertEquals("coast", d.legMarks().get(1).kind());
        close("coast mark along y", d.legMarks().get(1).alongMetres(), SIDE.legEnd(0)[2].doubleValue(), 1e-12);
    }

    @Test
    void aMissionWithoutCraftIsDrawnAlongXOverOneDay() throws ScenarioException {
        Mission m = ScenarioLoader.load(ScenarioText.titled("stations only (invented)")
                .station("home", "{}")
                .station("post", "{position: [0 au, 1 au, 0 au]}")
                .link("ground", "home", "post")
                .yaml(), "stations.yaml");
        List<DiagramTraces.FlightLine> lines = DiagramTraces.flightLines(m);
        assertEquals(1, lines.size());
        assertTrue(lines.get(0).craft().isEmpty());
        DiagramTraces.Diagram d = DiagramTraces.of(lines.get(0), true, SampledSeries.of(m), 1.0);
        assertArrayEquals(new double[] {1, 0, 0}, d.axis());
        assertTrue(d.axisCraft().isEmpty());
        assertFalse(SampledSeries.of(m).get(0).hasPlannedSends());
        // nothing planned: one day from mission time 0, padded; both stations sit at 0 on the x axis, so the
        // distance range is a tenth of c t, then widened to c t about 0
        close("bottom", d.firstTime(), -0.02 * DAY, 1e-12);
        close("top", d.lastTime(), 1.04 * DAY, 1e-12);
        close("left", d.firstAlong(), -0.5 * C * 1.06 * DAY, 1e-12);
        close("right", d.lastAlong(), 0.5 * C * 1.06 * DAY, 1e-12);
        // a drawing far wider than high: the distance range stays 0.1 c t padded 4 % each side (0.08 x 0.106 c d)
        // and the time range grows to match it
        DiagramTraces.Diagram wide = DiagramTraces.of(lines.get(0), true, SampledSeries.of(m), 0.001);
        double width = 0.1 * C * 1.06 * DAY;
        close("wide left", wide.firstAlong(), -0.04 * width, 1e-12);
        close("wide right", wide.lastAlong(), 0.04 * width, 1e-12);
        close("wide top", wide.lastTime(), -0.02 * DAY + 0.08 * width / 0.001 / C, 1e-12);
        for (double bad : new double[] {0, -1, Double.NaN, Double.POSITIVE_INFINITY}) {
            assertThrows(IllegalArgumentException.class, () -> DiagramTraces.of(lines.get(0), true, SampledSeries.of(m), bad));
        }
        assertThrows(IllegalArgumentException.class, () -> DiagramTraces.of(lines.get(0), true, SampledSeries.of(m), 2, 1));
    }

    @Test
    void aCraftWhoseOnlyBoundaryIsAtMissionTimeZeroIsDrawnOverOneDay() throws ScenarioException {
        Mission m = ScenarioLoader.load(ScenarioText.homeAndCraft("probe", "burn: {acceleration: 1 g0, duration: forever}")
                .yaml(), "one-day.yaml");
        DiagramTraces.Diagram d = DiagramTraces.of(DiagramTraces.flightLines(m).get(0), true, SampledSeries.of(m), 1.0);
        close("bottom", d.firstTime(), -0.02 * DAY, 1e-12);
        // the distance range (the probe's 1.04 d of hyperbolic motion) is far below c t: the time range stays
        close("top", d.lastTime(), 1.04 * DAY, 1e-12);
    }
}
