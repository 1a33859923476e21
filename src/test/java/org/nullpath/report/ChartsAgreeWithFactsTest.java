package org.nullpath.report;

import java.nio.file.Path;
import java.util.List;

import org.junit.jupiter.api.Test;
import org.nullpath.mission.Mission;
import org.nullpath.scenario.ScenarioLoader;
import org.nullpath.schedule.LinkSchedule;
import org.nullpath.schedule.LinkTally;
import org.nullpath.schedule.SampledSeries;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

/**
 * Where a link's samples run on towards its horizon past the planned messages, the light-time chart marks
 * the longest planned light time and says so, and the facts say they count planned messages only.
 */
class ChartsAgreeWithFactsTest {
    @Test
    void theLightTimeChartMarksTheLongestPlannedMessage() throws Exception {
        Mission m = ScenarioLoader.load(Path.of("link-scenarios", "open-burn-horizon.yaml"));
        SampledSeries.LinkSeries up = SampledSeries.of(m).get(0);
        assertTrue(up.horizonCutsRange(), "the demo's uplink plans sends past its horizon");
        LinkTally t = LinkSchedule.run(m, up.route(), row -> { });
        double sampledLongest = up.samples().stream().mapToDouble(SampledSeries.Sample::lightTime).max().orElseThrow();
        assertTrue(sampledLongest > t.maxLightTime(), "the samples reach past the planned messages");
        List<LinkCharts.Plot> plots = LinkCharts.of(up, t.maxLightTime(), List.of());
        LinkCharts.Plot light = plots.get(0);
        assertEquals("light-time", light.name());
        assertTrue(light.caption().contains("past the last planned message"), light.caption());
        assertTrue(light.figure().key().stream().anyMatch(k -> k.label().startsWith("longest light time of a planned"
                + " message (" + Readable.time(t.maxLightTime()) + ")")), light.figure().key().toString());
    }
}
