package org.nullpath.report;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.file.Path;
import java.util.List;

import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;
import org.nullpath.mission.Mission;
import org.nullpath.scenario.ScenarioException;
import org.nullpath.scenario.ScenarioLoader;
import org.nullpath.schedule.DiagramTraces;
import org.nullpath.schedule.SampledSeries;
import static org.nullpath.testkit.Si.C;
import static org.nullpath.testkit.Si.G0;

/**
 * The spacetime diagram's worldlines and light rays for the open-burn demo (station cinder at rest at the
 * origin, craft wren from rest at 1 g0 for ever along +x), against hyperbolic motion in closed form (Rindler,
 * <i>Relativity: Special, General, and Cosmological</i>, 2nd ed. 2006): x(t) = (c^2/a) (sqrt(1 + (a t / c)^2)
 * - 1) for t &gt;= 0, at rest at the origin before; and the light cone (Einstein 1905): a ray along the line
 * covers c dt of distance, and an uplink from the origin sent at t_e = e c/a arrives after (c/a) e^2 / (2 (1 -
 * e)) (derived from the two, as in HtmlReportTest); nothing sent at e &gt;= 1 arrives.
 */
class SpacetimeDiagramTracesTest {
    private static final double T = C / G0;

    static DiagramTraces.Diagram d;

    /** Laid out afresh for every test, so that a mutation tool running one test at a time sees its use of it. */
    @BeforeEach
    void layout() throws IOException, ScenarioException {
        Mission s = ScenarioLoader.load(Path.of("link-scenarios", "open-burn-horizon.yaml"));
        d = SpacetimeChart.layout(s, SampledSeries.of(s));
    }

    static double wrenAlong(double t) {
        return t <= 0 ? 0 : C * T * (Math.sqrt(1 + (t / T) * (t / T)) - 1);
    }

    @Test
    void everyBodyHasAWorldlineSampledOverTheWholeTimeRange() {
        List<DiagramTraces.Trace> bodies = d.bodies();
        assertEquals(2, bodies.size(), "one trace per station and craft");
        assertEquals("cinder", bodies.get(0).body());
        assertEquals(false, bodies.get(0).craft());
        assertEquals("wren", bodies.get(1).body());
        assertEquals(true, bodies.get(1).craft());
        for (DiagramTraces.Trace t : bodies) {
            double[] times = t.timeSeconds();
            assertEquals(times.length, t.alongMetres().length, t.body());
            assertTrue(times.length >= DiagramTraces.TRACE_POINTS, t.body() + ": " + times.length + " points");
            assertEquals(d.firstTime(), times[0], 0.0, t.body() + " starts at the bottom of the diagram");
            assertEquals(d.lastTime(), times[times.length - 1], 1e-9 * d.lastTime(), t.body() + " ends at the top");
            for (int i = 1; i < times.length; i++) {
                assertTrue(times[i] > times[i - 1], t.body() + ": times ascend at " + i);
            }
        }
        for (double x : bodies.get(0).alongMetres()) {
            assertEquals(0.0, x, 0.0, "the station stays at the origin");
        }
        DiagramTraces.Trace wren = bodies.get(1);
        for (int i = 0; i < wren.timeSeconds().length; i++) {
            double t = wren.timeSeconds()[i];
            double expected = wrenAlong(t);
            assertEquals(expected, wren.alongMetres()[i], 1e-9 * expected + 1e-6, "wren at t = " + t);
        }
        assertTrue(wren.alongMetres()[wren.alongMetres().length - 1] > C * T / 2, "the trace reaches far out");
    }

    @Test
    void raysRunAtTheSpeedOfLightFromSendToArrivalAndThoseAfterTheHorizonRunOff() {
        int uplinkDelivered = 0;
        int uplinkLost = 0;
        int downlink = 0;
        for (DiagramTraces.Ray r : d.rays()) {
            String at = r.link() + " ray sent at " + r.sendTime();
            if (r.link().equals("uplink")) {
                assertEquals(0.0, r.sendAlong(), 0.0, at + " leaves the station");
                double e = r.sendTime() / T;
                if (r.delivered()) {
                    uplinkDelivered++;
                    assertTrue(e < 1, at + " is sent before the horizon");
                    double light = T * e * e / (2 * (1 - e));
                    assertEquals(light, r.endTime() - r.sendTime(), 1e-9 * light + 1e-6, at + ": light time");
                    assertEquals(wrenAlong(r.endTime()), r.endAlong(), 1e-9 * r.endAlong() + 1e-6, at + ": meets wren");
                } else {
                    uplinkLost++;
                    assertTrue(e >= 1, at + " is sent at or after the horizon");
                    assertTrue(r.endTime() > d.lastTime(), at + " runs off the top");
                }
            } else {
                assertEquals("downlink", r.link());
                assertTrue(r.delivered(), at + ": every downlink arrives");
                downlink++;
                assertEquals(wrenAlong(r.sendTime()), r.sendAlong(), 1e-9 * r.sendAlong() + 1e-6, at + ": leaves wren");
                assertEquals(0.0, r.endAlong(), 1e-6, at + ": reaches the station");
            }
            // light along the line: |ds| = c dt
            double ds = Math.abs(r.endAlong() - r.sendAlong());
            assertEquals(C * (r.endTime() - r.sendTime()), ds, 1e-9 * ds + 1e-6, at + ": at the speed of light");
        }
        assertEquals(DiagramTraces.RAYS_PER_LINK, uplinkDelivered + uplinkLost, "uplink rays");
        assertTrue(uplinkDelivered > 0 && uplinkLost > 0, uplinkDelivered + " delivered, " + uplinkLost + " lost");
        assertEquals(DiagramTraces.RAYS_PER_LINK, downlink, "downlink rays");
    }

    @Test
    void theLegMarksAreTheBurnStart() {
        assertEquals(1, d.legMarks().size(), "an open-ended burn: one mark, no final coast");
        DiagramTraces.LegMark m = d.legMarks().get(0);
        assertEquals("wren", m.craft());
        assertEquals(1, m.leg());
        assertEquals("burn", m.kind());
        assertEquals(G0, m.accelerationMetresPerSecond2(), 0.0);
        assertEquals(0.0, m.timeSeconds(), 0.0);
        assertEquals(0.0, m.alongMetres(), 0.0);
    }
}
