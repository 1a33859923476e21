package org.nullpath.report;

import java.util.List;
import java.util.regex.Matcher;
import java.util.regex.Pattern;

import org.junit.jupiter.api.Test;
import org.nullpath.mission.Mission;
import org.nullpath.scenario.ScenarioLoader;
import org.nullpath.schedule.LinkSchedule;
import org.nullpath.schedule.LinkTally;
import org.nullpath.testkit.ScenarioText;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

/** A scenario with many links keeps every link's facts and draws charts for the first ones only. */
class ManyLinksReportTest {
    @Test
    void everyLinkHasItsFactsAndTheFirstFortyTheirCharts() throws Exception {
        int links = HtmlReport.CHARTED_LINKS + 5;
        ScenarioText m = ScenarioText.homeAndCraft("skua", "burn: {acceleration: 1 g0, duration: 30 d}");
        for (int i = 0; i < links; i++) {
            m.link("l" + i, "skua", "home").message("{link: l" + i + ", at: [1 d, 10 d]}");
        }
        Mission s = ScenarioLoader.load(m.yaml(), "skua.yaml");
        List<LinkTally> tallies = s.links().values().stream().map(l -> LinkSchedule.run(s, l, row -> { })).toList();
        String html = HtmlReport.render(s, new PlanResult(tallies, List.of(), List.of(), List.of(), List.of()));
        assertEquals(links, count(html, "<section class=\"link\" id=\"link-"));
        // each charted link has its light-time figure; the others say where their values are
        assertEquals(HtmlReport.CHARTED_LINKS, count(html, "-light-time\">"));
        assertEquals(links - HtmlReport.CHARTED_LINKS, count(html, "Charts are drawn for the first "
                + HtmlReport.CHARTED_LINKS + " links"));
        assertTrue(html.contains("id=\"link-l" + (links - 1) + "\""));
    }

    private static int count(String text, String what) {
        Matcher matcher = Pattern.compile(Pattern.quote(what)).matcher(text);
        int n = 0;
        while (matcher.find()) {
            n++;
        }
        return n;
    }
}
