package org.nullpath.report;

import java.util.HashSet;
import java.util.List;
import java.util.Map;
import java.util.Set;

import org.junit.jupiter.api.Test;
import org.nullpath.mission.Mission;
import org.nullpath.scenario.ScenarioLoader;
import org.nullpath.schedule.DiagramTraces;
import org.nullpath.schedule.SampledSeries;
import org.nullpath.testkit.ScenarioText;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

/**
 * Craft flying along different lines are each drawn on their own line, never projected onto another's;
 * no craft and no link's signals share a colour in one drawing.
 */
class FlightLinePanelsTest {
    /** Invented mission: two craft leave one station along x and along y, a third flies back along -x. */
    private static final String MISSION = ScenarioText.titled("Crossed lines").station("hub", "{}")
            .craft("east", "heading: [1, 0, 0]", "burn: {acceleration: 1 g0, duration: 30 d}")
            .craft("north", "heading: [0, 1, 0]", "burn: {acceleration: 2 g0, duration: 30 d}")
            .craft("west", "heading: [-1, 0, 0]", "burn: {acceleration: 1 g0, duration: 30 d}")
            .link("e-down", "east", "hub").link("n-down", "north", "hub").link("w-down", "west", "hub")
            .link("n-up", "hub", "north")
            .message("{link: e-down, first: 0 d, last: 30 d, every: 5 d}")
            .message("{link: n-down, first: 0 d, last: 30 d, every: 5 d}")
            .message("{link: w-down, first: 0 d, last: 30 d, every: 5 d}")
            .message("{link: n-up, first: 0 d, last: 30 d, every: 5 d}")
            .yaml();

    @Test
    void eachFlightLineHasItsOwnPanelWithItsOwnCraft() throws Exception {
        Mission m = ScenarioLoader.load(MISSION, "crossed.yaml");
        List<DiagramTraces.FlightLine> lines = DiagramTraces.flightLines(m);
        assertEquals(2, lines.size());
        assertEquals(List.of("east", "west"), lines.get(0).craft().stream().map(c -> c.name()).toList());
        assertEquals(List.of("north"), lines.get(1).craft().stream().map(c -> c.name()).toList());
        List<SampledSeries.LinkSeries> series = SampledSeries.of(m);
        DiagramTraces.Diagram north = SpacetimeChart.layout(lines.get(1), false, series);
        assertEquals(List.of("north"), north.axisCraft());
        assertEquals(Set.of("n-down", "n-up"), rayLinks(north));
        assertEquals(Set.of("e-down", "w-down"), rayLinks(SpacetimeChart.layout(lines.get(0), true, series)));
        // north is drawn at its own distance along y: (c^2 / a)(cosh(a tau / c) - 1) at the end of its burn,
        // tau = 30 d at a = 2 g0 (hyperbolic motion, Rindler 2006)
        DiagramTraces.Trace trace = north.bodies().stream().filter(t -> t.body().equals("north")).findFirst().orElseThrow();
        double a = 2 * 9.80665;
        double c = 299_792_458.0;
        double tauEnd = 30 * 86_400.0;
        double tEnd = c / a * Math.sinh(a * tauEnd / c);
        double[] t = trace.timeSeconds();
        double[] x = trace.alongMetres();
        for (int i = 0; i < t.length; i++) {
            if (t[i] > 0 && t[i] <= tEnd) {
                double expected = c * c / a * (Math.sqrt(1 + (a * t[i] / c) * (a * t[i] / c)) - 1);
                assertEquals(expected, x[i], 1e-9 * expected + 1e-6, "north at mission time " + t[i]);
            }
        }
    }

    @Test
    void noCraftAndNoLinkShareAColourInOneDrawing() throws Exception {
        Mission m = ScenarioLoader.load(MISSION, "crossed.yaml");
        List<SampledSeries.LinkSeries> series = SampledSeries.of(m);
        Map<String, String> ends = Map.of("e-down", "east to hub", "n-down", "north to hub", "w-down", "west to hub",
                "n-up", "hub to north");
        List<String> links = List.of("e-down", "n-down", "w-down", "n-up");
        for (DiagramTraces.FlightLine line : DiagramTraces.flightLines(m)) {
            DiagramTraces.Diagram d = SpacetimeChart.layout(line, line == DiagramTraces.flightLines(m).get(0), series);
            Charts.Figure f = SpacetimeChart.of(d, links, ends, "svg-test", "test");
            Set<java.awt.Color> seen = new HashSet<>();
            for (Charts.Key k : f.key()) {
                boolean thing = k.label().startsWith("craft ") || k.label().startsWith("signals on ");
                if (thing) {
                    assertTrue(seen.add(k.colour()), "colour of '" + k.label() + "' already used in " + f.key());
                }
            }
        }
    }

    private static Set<String> rayLinks(DiagramTraces.Diagram d) {
        Set<String> out = new HashSet<>();
        d.rays().forEach(r -> out.add(r.link()));
        return out;
    }
}
