package org.nullpath.report;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.junit.jupiter.api.Assertions.fail;
import static org.junit.jupiter.api.Assumptions.assumeTrue;

import java.awt.image.BufferedImage;
import java.io.ByteArrayInputStream;
import java.io.ByteArrayOutputStream;
import java.io.PrintStream;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Base64;
import java.util.HashSet;
import java.util.List;
import java.util.Map;
import java.util.Set;

import javax.imageio.ImageIO;

import com.fasterxml.jackson.databind.JsonNode;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.nullpath.cli.Main;

/**
 * report.html in a real browser (Debian's Chromium, headless): it loads without a console error, an
 * exception or a failed load, fetches nothing but itself, lays out every chart at a usable size, its
 * print stylesheet applies, and a screenshot of it is not blank. Without Chromium the test is skipped,
 * unless the environment variable CI is set: then a missing browser is a failure (.ci/run installs it).
 */
class ReportBrowserTest {
    private static final int WIDTH = 1200;

    private static Path chromium;

    @TempDir
    Path tmp;

    @BeforeEach
    void needChromium() {
        chromium = HeadlessChromium.find();
        if (chromium == null) {
            if (System.getenv("CI") != null) {
                fail("CI is set but chromium is not installed (.ci/run installs it with apt-get)");
            }
            assumeTrue(false, "chromium is not installed: browser test skipped (set CI to make this a failure)");
        }
    }

    private Path report(String scenario) {
        Path out = tmp.resolve("out");
        PrintStream oldOut = System.out;
        PrintStream oldErr = System.err;
        int code;
        try {
            System.setOut(new PrintStream(new ByteArrayOutputStream(), true, StandardCharsets.UTF_8));
            System.setErr(new PrintStream(new ByteArrayOutputStream(), true, StandardCharsets.UTF_8));
            code = Main.run("plan", "link-scenarios/" + scenario, "--out", out.toString());
        } finally {
            System.setOut(oldOut);
            System.setErr(oldErr);
        }
        assertEquals(0, code);
        return out.resolve("report.html");
    }

    @Test
    void theReportLoadsCleanlyDrawsEveryChartAndIsNotBlank() throws Exception {
        Path report = report("probe-link-budget.yaml");
        try (HeadlessChromium browser = HeadlessChromium.start(chromium, WIDTH, 900)) {
            HeadlessChromium.Load load = browser.load(report.toUri().toString());
            assertEquals(List.of(), load.problems(), "console errors, exceptions or failed loads");
            assertTrue(load.requested().contains(report.toUri().toString()), load.requested().toString());
            for (String url : load.requested()) {
                assertTrue(url.startsWith("file:") || url.startsWith("data:") || url.startsWith("about:"),
                        "the page fetched " + url);
            }

            assertEquals("Heron link budgets from Marrow Deep \u2014 nullpath plan report",
                    browser.evaluate("document.title").asText());
            JsonNode charts = browser.evaluate("Array.from(document.querySelectorAll('svg.chart')).map(e => {"
                    + " const r = e.getBoundingClientRect(); return [e.id, r.width, r.height]; })");
            // the spacetime diagram plus, for each of the 4 links with link terms, 7 charts (light time, Doppler,
            // point-ahead, frequency, margin, data rate, clock image; their antennas all track exactly, so no
            // boresight chart)
            assertEquals(29, charts.size(), charts.toString());
            Set<String> ids = new HashSet<>();
            for (JsonNode c : charts) {
                ids.add(c.get(0).asText());
                assertTrue(c.get(1).asDouble() >= 400 && c.get(2).asDouble() >= 150, "laid out at a usable size: " + c);
            }
            assertTrue(ids.contains("svg-spacetime"));
            assertEquals(charts.size(), ids.size(), "ids are unique");
            // each chart drew its data: at least one path or polyline with many points inside every SVG
            JsonNode drawn = browser.evaluate("Array.from(document.querySelectorAll('svg.chart')).filter(e =>"
                    + " Array.from(e.querySelectorAll('path')).some(p => (p.getAttribute('d') || '').length > 200))"
                    + ".length");
            assertEquals(charts.size(), drawn.asInt(), "every chart has a drawn series");

            byte[] png = browser.screenshot(WIDTH, 24000);
            Path target = Path.of("target");
            if (Files.isDirectory(target)) {
                Files.write(target.resolve("report-screenshot.png"), png); // for a person to look at
            }
            BufferedImage img = ImageIO.read(new ByteArrayInputStream(png));
            assertEquals(WIDTH, img.getWidth());
            assertTrue(img.getHeight() > 3000, "the whole page, several screens long: " + img.getHeight());
            long inked = 0;
            long blue = 0;
            for (int y = 0; y < img.getHeight(); y++) {
                for (int x = 0; x < img.getWidth(); x++) {
                    int rgb = img.getRGB(x, y);
                    int r = (rgb >> 16) & 0xff;
                    int g = (rgb >> 8) & 0xff;
                    int b = rgb & 0xff;
                    if (r < 235 || g < 235 || b < 235) {
                        inked++;
                    }
                    // Okabe-Ito blue #0072B2 (Okabe and Ito 2008), the colour of every chart's main series
                    if (Math.abs(r - 0x00) < 40 && Math.abs(g - 0x72) < 40 && Math.abs(b - 0xB2) < 40) {
                        blue++;
                    }
                }
            }
            double share = (double) inked / ((long) img.getWidth() * img.getHeight());
            assertTrue(share > 0.02, "the screenshot is not blank: " + share + " of pixels inked");
            assertTrue(blue > 5000, "the charts' series are drawn: " + blue + " blue pixels");

            // the print stylesheet applies: the contents list is dropped and the PDF comes out
            browser.call("Emulation.setEmulatedMedia", Map.of("media", "print"));
            assertEquals("none", browser.evaluate(
                    "getComputedStyle(document.querySelector('nav.contents')).display").asText());
            JsonNode pdf = browser.call("Page.printToPDF", Map.of("printBackground", false));
            byte[] bytes = Base64.getDecoder().decode(pdf.path("data").asText());
            assertTrue(bytes.length > 10_000 && new String(bytes, 0, 5, StandardCharsets.US_ASCII).equals("%PDF-"),
                    "the page prints to PDF");
        }
    }

    @Test
    void theBrowserCheckCatchesAPageThatFails() throws Exception {
        // the same harness on a page made to fail, so a clean load above means something
        Path bad = tmp.resolve("bad.html");
        Files.writeString(bad, "<!DOCTYPE html><html><head><title>bad</title></head><body><p>x</p>"
                + "<img src=\"missing.png\" alt=\"\"><script>console.error('made to fail');"
                + "throw new Error('thrown on purpose');</script></body></html>");
        try (HeadlessChromium browser = HeadlessChromium.start(chromium, 800, 600)) {
            List<String> problems = browser.load(bad.toUri().toString()).problems();
            assertTrue(problems.stream().anyMatch(p -> p.startsWith("console.error") && p.contains("made to fail")),
                    problems.toString());
            assertTrue(problems.stream().anyMatch(p -> p.startsWith("exception") && p.contains("thrown on purpose")),
                    problems.toString());
            assertTrue(problems.stream().anyMatch(p -> p.contains("missing.png") || p.startsWith("load failed")),
                    problems.toString());
        }
    }
}
