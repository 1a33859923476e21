package org.nullpath.report;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.awt.geom.Rectangle2D;
import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.regex.Matcher;
import java.util.regex.Pattern;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.ValueSource;
import org.nullpath.mission.Link;
import org.nullpath.mission.Mission;
import org.nullpath.testkit.PlanRun;
import org.nullpath.scenario.ScenarioException;
import org.nullpath.scenario.ScenarioLoader;
import org.nullpath.schedule.DiagramTraces;
import org.nullpath.schedule.SampledSeries;
import org.nullpath.testkit.ScenarioText;
import static org.nullpath.testkit.Si.C;
import static org.nullpath.testkit.Si.G0;

/**
 * report.html as a reader gets it: one self-contained page with the title, the caution, the spacetime
 * diagram and every expected chart, the tables and the scenario, nothing fetched from anywhere, the same
 * bytes on every run; and the plotted series carry the same physics as the schedule (checked against
 * closed forms of hyperbolic motion, not against nullpath itself).
 */
class HtmlReportTest {
    @TempDir
    Path tmp;

    /** Runs {@code nullpath plan} in-process with its output captured; returns the exit code. */
    private static int plan(String... args) {
        return PlanRun.run(args).exitCode();
    }

    private String report(String scenario, String outName) throws IOException, ScenarioException {
        Path out = tmp.resolve(outName);
        assertEquals(0, plan("plan", "link-scenarios/" + scenario, "--out", out.toString()));
        Path file = out.resolve("report.html");
        assertTrue(Files.isRegularFile(file), "report.html is written by default");
        return Files.readString(file, StandardCharsets.UTF_8);
    }

    private static List<String> matches(String text, String regex) {
        List<String> out = new ArrayList<>();
        Matcher m = Pattern.compile(regex).matcher(text);
        while (m.find()) {
            out.add(m.group(m.groupCount() > 0 ? 1 : 0));
        }
        return out;
    }

    /** The text of the {@code <figure>} with this id, up to its closing tag. */
    private static String figure(String html, String id) {
        int start = html.indexOf("<figure id=\"" + id + "\"");
        assertTrue(start >= 0, "figure " + id + " is present");
        int end = html.indexOf("</figure>", start);
        return html.substring(start, end);
    }

    @Test
    void pointingChartsShowThePointAheadAndAntennasThatDoNotTrack() throws IOException, ScenarioException {
        String html = report("aberration-relay.yaml", "aberration");
        // every link has directions: a point-ahead chart each
        for (String link : List.of("relay-radio", "relay-laser", "home")) {
            assertTrue(figure(html, "fig-" + link + "-point-ahead").contains("<svg id='svg-" + link + "-point-ahead'"));
        }
        // a receiver fixed off the heading, and a laser with a pointing error: their angles are drawn
        assertTrue(figure(html, "fig-relay-radio-boresight").contains("pointing loss"));
        assertTrue(figure(html, "fig-relay-laser-boresight").contains("<svg id='svg-relay-laser-boresight'"));
        // an aft antenna with the station on the line behind is always on boresight, and the station tracks
        // exactly: nothing to draw
        assertFalse(html.contains("fig-home-boresight"));
    }

    @ParameterizedTest(name = "{0}")
    @ValueSource(strings = {"probe-link-budget.yaml", "open-burn-horizon.yaml"})
    void theReportIsOneSelfContainedPageWithEveryExpectedPart(String name) throws IOException, ScenarioException {
        String html = report(name, "out");
        Mission s = ScenarioLoader.load(Path.of("link-scenarios", name));

        assertTrue(html.startsWith("<!DOCTYPE html>"), "an HTML5 document");
        assertTrue(html.contains("<title>" + Html.escape(s.title()) + " \u2014 nullpath plan report</title>"));
        assertTrue(html.contains("<h1 id=\"title\">" + Html.escape(s.title()) + "</h1>"));
        // the caution, word for word, with the parts the project rules ask for
        assertTrue(html.contains(Html.escape(HtmlReport.CAUTION)));
        for (String must : List.of("planning estimates", "independent verification", "margin", "eye-safety",
                "applicable safety rules and licensed practice")) {
            assertTrue(HtmlReport.CAUTION.contains(must), must);
        }
        assertTrue(html.contains("@media print"), "a print stylesheet");

        // every figure: the spacetime diagram and each link's charts, each holding its own inline SVG
        List<String> expected = new ArrayList<>(List.of("spacetime"));
        for (Link l : s.links().values()) {
            List<String> names = new ArrayList<>(List.of("light-time", "doppler", "clock-image"));
            if (l.terms().isPresent()) {
                names.addAll(List.of("frequency", "margin", "data-rate"));
            }
            if (l.pointing()) {
                names.add("point-ahead"); // every link with terms has directions; these demos' antennas all track
            }
            for (String n : names) {
                expected.add(l.name() + "-" + n);
            }
        }
        for (String id : expected) {
            String fig = figure(html, "fig-" + id);
            assertTrue(fig.contains("<svg id='svg-" + id + "'"), "fig-" + id + " holds svg-" + id);
            assertTrue(fig.contains("<title id=\"svg-" + id + "-title\">"), "svg-" + id + " has a title");
            assertTrue(fig.contains("<ul class=\"key\">"), "fig-" + id + " has a key");
        }
        List<String> svgIds = matches(html, "<svg id='([^']+)'");
        assertTrue(svgIds.size() >= 4, "at least four inline SVG plots");
        assertEquals(expected.size(), svgIds.size(), "one SVG per expected figure, no more");
        assertFalse(html.contains("Infinity") || html.contains("NaN"), "every drawn coordinate is a number");
        List<String> allIds = matches(html, "\\sid=[\"']([^\"']+)[\"']");
        assertEquals(allIds.size(), allIds.stream().distinct().count(), "ids (clip paths included) are unique");

        // nothing outside the file: no remote or local src/href, no scripts, no linked stylesheets, no imports
        assertEquals(List.of(), matches(html, "(?i)(?:src|href)\\s*=\\s*[\"']?\\s*((?:https?:|//|file:)[^\"'\\s>]*)"));
        assertEquals(List.of(), matches(html, "(?i)(?:src|href)\\s*=\\s*[\"']((?!#)[^\"']*)[\"']"),
                "the only links are to places in the page");
        assertFalse(html.toLowerCase().contains("<script"), "no scripts");
        assertFalse(html.toLowerCase().contains("<link"), "no linked stylesheets or icons");
        assertFalse(html.contains("@import"), "no imported styles");
        assertFalse(html.contains("url(http") || html.contains("url(//"), "no remote fonts or images in CSS");
        assertFalse(html.contains("http://") || html.contains("https://"), "no address at all in these demos");

        // tables and the scenario echoed back, escaped
        for (String t : List.of("table-cutoffs", "table-horizons", "table-windows", "table-round-trips")) {
            assertTrue(html.contains("id=\"" + t + "\""), t);
        }
        String text = Files.readString(Path.of("link-scenarios", name), StandardCharsets.UTF_8);
        assertTrue(html.contains("<pre class=\"scenario\">" + Html.escape(text) + "</pre>"), "scenario echoed");

        // the same bytes on a second run
        String again = report(name, "again");
        assertEquals(html, again, "two runs give byte-identical reports");
    }

    @Test
    void theLinkBudgetDemoDrawsItsTuningRangesAndWindows() throws IOException, ScenarioException {
        String html = report("probe-link-budget.yaml", "out");
        // uplink and uplink-comp have tuning ranges (scenario file), the downlink has none
        assertTrue(figure(html, "fig-uplink-frequency").contains("receiver tuning range"));
        assertTrue(figure(html, "fig-uplink-comp-frequency").contains("carrier / D (pre-compensated)"));
        assertTrue(figure(html, "fig-downlink-frequency").contains("no tuning range is given"));
        assertTrue(figure(html, "fig-laser-margin").contains("photons per bit"), "photon-counting margin wording");
        int windows = html.indexOf("id=\"table-windows\"");
        assertTrue(html.indexOf("closed by", windows) > windows, "the windows table is filled in");
        // the demo's crossings.csv: the downlink's and the laser's margins leave 0 dB, the uplink leaves its
        // tuning range at the low end; each is marked on its chart
        assertTrue(figure(html, "fig-downlink-margin").contains("margin leaves"));
        assertTrue(figure(html, "fig-laser-margin").contains("margin leaves"));
        assertTrue(figure(html, "fig-uplink-frequency").contains("tuning-low leaves"));
        assertFalse(figure(html, "fig-uplink-comp-frequency").contains("tuning-low leaves"),
                "the pre-compensated uplink stays in its tuning range");
        String table = html.substring(windows, html.indexOf("</table>", windows));
        assertTrue(table.contains("<th>data at the planned rate</th>"), table);
        // the downlink's window, scanned from 1 d: 2 kbit/s (the scenario's data-rate) x 6041924.206 s open
        // = 12.08 Gbit
        assertTrue(table.contains("<td title=\"1.2083848412482763E10 bit\">12.08 Gbit</td>"), table);
    }

    @Test
    void theOpenBurnDemoDrawsTheHorizonAndTheSignalsThatNeverArrive() throws IOException, ScenarioException {
        String html = report("open-burn-horizon.yaml", "out");
        String diagram = figure(html, "fig-spacetime");
        assertTrue(diagram.contains("horizon of uplink"), "the uplink's horizon line is drawn and keyed");
        assertTrue(diagram.contains("after its horizon: never arrive"), "lost signals are drawn");
        assertFalse(diagram.contains("horizon of downlink"), "the downlink has no horizon");
        assertTrue(figure(html, "fig-uplink-light-time").contains("sends from here on never arrive"));
    }

    @Test
    void noReportSkipsTheReportAndWritesEverythingElse() throws IOException, ScenarioException {
        Path out = tmp.resolve("quiet");
        assertEquals(0, plan("plan", "link-scenarios/open-burn-horizon.yaml", "--out", out.toString(), "--no-report"));
        assertFalse(Files.exists(out.resolve("report.html")));
        for (String f : List.of("uplink.csv", "downlink.csv", "cutoffs.csv", "horizons.csv", "exchanges-status.csv",
                "summary.json")) {
            assertTrue(Files.isRegularFile(out.resolve(f)), f);
        }
    }

    @Test
    void theOpenBurnHorizonLineIsTheRindlerAsymptote() throws IOException, ScenarioException {
        // Rindler, Relativity: Special, General, and Cosmological (2nd ed., 2006), hyperbolic motion: from rest
        // at the origin at constant proper acceleration a, the craft approaches c t - x = c^2 / a
        Mission s = ScenarioLoader.load(Path.of("link-scenarios", "open-burn-horizon.yaml"));
        DiagramTraces.Diagram d = SpacetimeChart.layout(s, SampledSeries.of(s));
        assertEquals(1, d.horizons().size());
        DiagramTraces.NullLine line = d.horizons().get(0);
        assertEquals("uplink", line.link());
        assertEquals(1.0, line.k(), 1e-15, "the craft runs away along the axis");
        assertEquals(C * C / G0, line.limitMetres(), 1e-12 * C * C / G0);
        assertEquals(C / G0, line.timeAt(0), 1e-12 * C / G0, "it meets the station's worldline at t = c / a");
    }

    @ParameterizedTest(name = "{0}")
    @ValueSource(strings = {"probe-link-budget.yaml", "open-burn-horizon.yaml", "crewed-flip.yaml", "relay-flyby.yaml"})
    void lightAlongTheFlightLineRunsAt45DegreesOnTheDiagram(String name) throws IOException, ScenarioException {
        // a null ray along the line has ds = c dt (definition of the light cone): the diagram is at 45 degrees
        // when one unit of c t and one of s take the same length, i.e. c (t1 - t0) / (s1 - s0) = H / W
        Mission s = ScenarioLoader.load(Path.of("link-scenarios", name));
        DiagramTraces.Diagram d = SpacetimeChart.layout(s, SampledSeries.of(s));
        Rectangle2D area = SpacetimeChart.dataArea(SpacetimeChart.width(d));
        double ctOverS = C * (d.lastTime() - d.firstTime()) / (d.lastAlong() - d.firstAlong());
        assertEquals(area.getHeight() / area.getWidth(), ctOverS, 1e-12 * ctOverS);
        int width = SpacetimeChart.width(d);
        assertTrue(width >= SpacetimeChart.MIN_WIDTH && width <= SpacetimeChart.WIDTH, "width " + width);
    }

    @Test
    void thePlottedUplinkLightTimesMatchTheClosedFormUpToTheHorizon() throws IOException, ScenarioException {
        // From rest at the origin at proper acceleration a (T = c / a), x(t) = c T (sqrt(1 + (t/T)^2) - 1)
        // (Rindler 2006, hyperbolic motion). Light sent from the origin at t_e = e T meets it where
        // c (t - t_e) = x(t), which solves to a light time T e^2 / (2 (1 - e)): derived here by hand from
        // (u - e + 1)^2 = 1 + u^2 with u = t / T. No send at or after e = 1 arrives (the horizon).
        Mission s = ScenarioLoader.load(Path.of("link-scenarios", "open-burn-horizon.yaml"));
        SampledSeries.LinkSeries up = SampledSeries.of(s).get(0);
        assertEquals("uplink", up.link());
        double t = C / G0;
        assertTrue(up.horizonCutsRange(), "the plan (to 1.5 yr) reaches past the horizon at c/g0 = 0.969 yr");
        assertEquals(t, up.horizon().lastSendClock(), 1e-12 * t);
        assertEquals(SampledSeries.MAX_SAMPLES, up.samples().size());
        for (SampledSeries.Sample p : up.samples()) {
            double e = p.sendClock() / t;
            assertTrue(e < 1, "every sample is before the horizon");
            double expected = t * e * e / (2 * (1 - e));
            assertEquals(expected, p.lightTime(), 1e-9 * expected + 1e-9, "light time at e = " + e);
        }
        SampledSeries.Sample last = up.samples().get(up.samples().size() - 1);
        assertEquals(1.0 / SampledSeries.MAX_SAMPLES, 1 - last.sendClock() / t, 1e-9,
                "sampling stops 1/MAX_SAMPLES of the range short of the horizon");
    }

    @Test
    void thePlottedDownlinkDopplerIsExpOfMinusTheRapidity() throws IOException, ScenarioException {
        // A source receding along the line of sight at rapidity eta is received at rest with D = e^-eta
        // (Einstein 1905, D = sqrt((1 - beta) / (1 + beta))); in hyperbolic motion eta = a tau / c with tau the
        // craft's clock (Rindler 2006). Sent from the craft at clock tau to the station at the origin.
        Mission s = ScenarioLoader.load(Path.of("link-scenarios", "open-burn-horizon.yaml"));
        SampledSeries.LinkSeries down = SampledSeries.of(s).get(1);
        assertEquals("downlink", down.link());
        assertFalse(down.horizon().hasHorizon(), "a station at rest has no horizon: every downlink arrives");
        assertEquals(SampledSeries.MAX_SAMPLES, down.samples().size());
        for (SampledSeries.Sample p : down.samples()) {
            double expected = Math.exp(-G0 * p.sendClock() / C);
            assertEquals(expected, p.doppler(), 1e-12 * expected, "D at tau = " + p.sendClock());
            assertEquals(Math.expm1(-G0 * p.sendClock() / C), p.frequencyOffset(),
                    1e-12 * Math.abs(Math.expm1(-G0 * p.sendClock() / C)) + 1e-300);
        }
    }

    @Test
    void aMillionPlannedMessagesStillGiveAtMostFourHundredPlottedSamples() throws IOException, ScenarioException {
        // memory must not grow with the plan: the plotted series is a fixed-size sample of the send range
        Path file = tmp.resolve("many.yaml");
        Files.writeString(file, ScenarioText.titled("many messages")
                .station("home", "{}")
                .craft("probe", "heading: [1, 0, 0]", "burn: {acceleration: 1 g0, duration: 1 yr}")
                .link("down", "probe", "home")
                .message("{link: down, first: 0 s, last: 999999 s, every: 1 s}")
                .yaml());
        Mission s = ScenarioLoader.load(file);
        assertEquals(1_000_000L, s.messages().get(0).count());
        SampledSeries.LinkSeries down = SampledSeries.of(s).get(0);
        assertEquals(SampledSeries.MAX_SAMPLES, down.samples().size());
        assertEquals(0.0, down.samples().get(0).sendClock());
        assertEquals(999_999.0, down.samples().get(down.samples().size() - 1).sendClock());
        double[] clocks = down.samples().stream().mapToDouble(SampledSeries.Sample::sendClock).toArray();
        double[] sorted = clocks.clone();
        java.util.Arrays.sort(sorted);
        assertArrayEquals(sorted, clocks, "samples in send order");
    }
}
