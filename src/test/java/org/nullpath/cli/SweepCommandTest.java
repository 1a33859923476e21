package org.nullpath.cli;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.Map;
import java.util.stream.Stream;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import org.apache.commons.csv.CSVRecord;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.Arguments;
import org.junit.jupiter.params.provider.MethodSource;
import org.nullpath.testkit.PlanRun;
import org.nullpath.testkit.ScenarioText;

/**
 * {@code nullpath sweep}: every figure of a point equals what {@code plan} writes for that point's scenario
 * (the scenario written out with the point's values, planned, and its summary.json, horizons.csv, cutoffs.csv
 * and windows.csv read back: the reference is the tool's own plan command, which the rest of the suite holds
 * to the 100-digit reference); the same bytes for any number of threads; an invalid point is a row and the
 * sweep goes on; a wrong sweep file is refused at its line and column before anything is computed. Invented
 * mission: two links (one with a budget), about fifty messages, a cut-off, an exchange and a window scan.
 */
class SweepCommandTest {
    @TempDir
    Path tmp;

    /** The mission with the first burn's acceleration and the downlink's power as given. */
    private static String mission(String acceleration, String power) {
        return ScenarioText.titled("Sweep base").station("yard", "{}")
                .craft("skua", "heading: [1, 0, 0]", "burn: {acceleration: " + acceleration + ", duration: 60 d}",
                        "coast: {duration: forever}")
                .link("up", "yard", "skua")
                .link("down", "skua", "yard", ScenarioText.radioTerms(power))
                .message("{link: up, first: 0 d, last: 100 d, every: 4 d}")
                .message("{link: down, first: 0 d, last: 100 d, every: 4 d}")
                .cutoff("{name: trim, link: up, arrive-by: 80 d}")
                .exchange("{name: ping, query: up, reply: down, turnaround: 1 h, first: 0 d, last: 60 d, every: 20 d}")
                .then("windows:\n  - {link: down, from: 0 d, to: 100 d}")
                .yaml();
    }

    private static final String GRID = """
            scenario: base.yaml
            vary:
              - {key: "craft.skua.legs[0].burn.acceleration", from: 0.5 g0, to: 1.5 g0, steps: 3}
              - {key: links.down.transmitter.power, values: [1 kW, 10 kW]}
            """;

    private Path write(String name, String text) throws IOException {
        Path f = tmp.resolve(name);
        Files.writeString(f, text);
        return f;
    }

    private PlanRun.Outcome sweep(String sweep, String out, String... more) throws IOException {
        write("base.yaml", mission("1 g0", "10 kW"));
        Path file = write("study.yaml", sweep);
        String[] args = Stream.concat(Stream.of("sweep", file.toString(), "--out", tmp.resolve(out).toString(), "--quiet"),
                Stream.of(more)).toArray(String[]::new);
        return PlanRun.run(args);
    }

    private static double num(String cell) {
        return cell.isEmpty() ? Double.NaN : Double.parseDouble(cell);
    }

    private static double num(JsonNode n) {
        return n == null || n.isNull() ? Double.NaN : n.asDouble();
    }

    @Test
    void everyFigureEqualsWhatPlanWritesForThatPoint() throws IOException {
        PlanRun.Outcome o = sweep(GRID, "out");
        assertEquals(0, o.exitCode(), o.err());
        List<CSVRecord> rows = PlanRun.csv(tmp.resolve("out/sweep.csv"));
        assertEquals(6, rows.size());
        // the grid in order, the first key slowest, values in SI (0.5 g0 = 4.903325 m/s^2, g0 from the 3rd CGPM)
        assertEquals(List.of("4.903325", "4.903325", "9.80665", "9.80665", "14.709975", "14.709975"),
                rows.stream().map(r -> r.get("craft.skua.legs[0].burn.acceleration")).toList());
        assertEquals(List.of("1000", "10000", "1000", "10000", "1000", "10000"),
                rows.stream().map(r -> r.get("links.down.transmitter.power")).toList());
        for (int point : new int[] {1, 4, 6}) {
            CSVRecord row = rows.get(point - 1);
            assertEquals("valid", row.get("status"));
            String accel = row.get("craft.skua.legs[0].burn.acceleration") + " m/s^2";
            String power = row.get("links.down.transmitter.power") + " W";
            Path out = PlanRun.plan(tmp, "point" + point, mission(accel, power));
            JsonNode summary = new ObjectMapper().readTree(out.resolve("summary.json").toFile());
            Map<String, CSVRecord> horizons = new java.util.HashMap<>();
            for (CSVRecord h : PlanRun.csv(out.resolve("horizons.csv"))) {
                horizons.put(h.get("link"), h);
            }
            for (JsonNode link : summary.get("links")) {
                String l = link.get("name").asText() + ".";
                for (String f : List.of("delivered", "never", "min_light_time_s", "max_light_time_s", "min_doppler",
                        "max_doppler")) {
                    assertEquals(num(link.get(f)), num(row.get(l + f)), l + f + " of point " + point);
                }
                assertEquals(num(horizons.get(link.get("name").asText()).get("last_send_clock_s")),
                        num(row.get(l + "last_send_clock_s")), l + "last_send_clock_s");
                if (link.has("budget")) {
                    JsonNode b = link.get("budget");
                    for (String f : List.of("worst_margin_db", "messages_closing", "max_data_rate_closing_all_bps")) {
                        assertEquals(num(b.get(f)), num(row.get(l + f)), l + f + " of point " + point);
                    }
                }
            }
            double open = 0;
            for (CSVRecord w : PlanRun.csv(out.resolve("windows.csv"))) {
                open += num(w.get("closes_send_clock_s")) - num(w.get("opens_send_clock_s"));
            }
            assertEquals(open, num(row.get("down.window_send_s")));
            assertEquals(num(PlanRun.csv(out.resolve("cutoffs.csv")).get(0).get("latest_send_clock_s")),
                    num(row.get("trim.latest_send_clock_s")));
            assertEquals(num(summary.get("exchanges").get(0).get("max_round_trip_clock_s")),
                    num(row.get("ping.max_round_trip_clock_s")));
        }
        JsonNode spread = new ObjectMapper().readTree(tmp.resolve("out/sweep-summary.json").toFile());
        assertEquals(6, spread.get("valid").asInt());
        // over six points: min and max of the column, the median between the 3rd and 4th order statistics
        double[] margins = rows.stream().mapToDouble(r -> num(r.get("down.worst_margin_db"))).sorted().toArray();
        JsonNode m = spread.get("figures").get("down.worst_margin_db");
        assertEquals(margins[0], m.get("min").asDouble());
        assertEquals(margins[5], m.get("max").asDouble());
        assertEquals(margins[2] + 0.5 * (margins[3] - margins[2]), m.get("p50").asDouble(), 1e-12 * Math.abs(margins[3]));
        assertEquals(margins[0] + 0.25 * (margins[1] - margins[0]), m.get("p5").asDouble(), 1e-12 * Math.abs(margins[1]));
    }

    @Test
    void theFilesAreTheSameForAnyNumberOfThreads() throws IOException {
        String draws = GRID + """
                draws: 4
                seed: 11
                random:
                  - {key: links.down.receiver.noise-temperature, uniform: [20 K, 40 K]}
                """;
        assertEquals(0, sweep(draws, "one", "--threads", "1").exitCode());
        assertEquals(0, sweep(draws, "three", "--threads", "3").exitCode());
        for (String f : List.of("sweep.csv", "sweep-summary.json")) {
            assertArrayEquals(Files.readAllBytes(tmp.resolve("one/" + f)), Files.readAllBytes(tmp.resolve("three/" + f)), f);
        }
        assertEquals(24, PlanRun.csv(tmp.resolve("one/sweep.csv")).size());
        assertArrayEquals(Files.readAllBytes(tmp.resolve("one/sweep.html")), Files.readAllBytes(tmp.resolve("three/sweep.html")));
    }

    @Test
    void thePageShowsEveryFigureTheGridAndTheDraws() throws IOException {
        String draws = GRID + """
                draws: 3
                random:
                  - {key: links.down.receiver.noise-temperature, uniform: [20 K, 40 K]}
                """;
        assertEquals(0, sweep(draws, "out").exitCode());
        String page = Files.readString(tmp.resolve("out/sweep.html"));
        List<String> header = PlanRun.csv(tmp.resolve("out/sweep.csv")).get(0).getParser().getHeaderNames();
        // every figure has its row in the table of spreads (the columns after point, status, problem and 3 keys)
        for (String figure : header.subList(6, header.size())) {
            assertTrue(page.contains("<tr><td><code>" + figure + "</code></td>"), figure);
        }
        // two numeric grid keys: heat maps; draws: histograms; the caution; self-contained
        assertTrue(page.contains("<figure id=\"heat-"), "heat maps");
        assertTrue(page.contains("<figure id=\"hist-"), "histograms");
        assertTrue(page.contains("licensed practice"), "the caution");
        assertFalse(page.contains("<script") || page.contains("http://") && !page.contains("http://www.w3.org"), "offline");
        assertTrue(page.contains("18 points (18 valid, 0 invalid)"));
    }

    @Test
    void anInvalidPointIsARowAndTheSweepGoesOn() throws IOException {
        String sweep = """
                scenario: base.yaml
                vary:
                  - {key: "craft.skua.legs[0].burn.acceleration", values: [1 g0, 0 g0, 2 g0]}
                """;
        PlanRun.Outcome o = sweep(sweep, "out");
        assertEquals(0, o.exitCode(), o.err());
        List<CSVRecord> rows = PlanRun.csv(tmp.resolve("out/sweep.csv"));
        assertEquals(List.of("valid", "invalid", "valid"), rows.stream().map(r -> r.get("status")).toList());
        assertTrue(rows.get(1).get("problem").startsWith("craft.skua.legs[0].burn.acceleration: "), rows.get(1).get("problem"));
        assertEquals("", rows.get(1).get("up.delivered"));
        assertTrue(o.out().contains("3 points (2 valid, 1 invalid)"), o.out());
    }

    static Stream<Arguments> wrongSweepFiles() {
        return Stream.of(
                Arguments.of("scenario: base.yaml\nvary:\n  - {key: links.down.transmitter.wattage, values: [1 W]}\n", 3, 11,
                        "vary[0].key", "the scenario has no value at 'links.down.transmitter.wattage'"),
                Arguments.of("scenario: base.yaml\nvary:\n  - {key: links.down.transmitter.power, from: 1 W, to: 1 m, steps: 2}\n",
                        3, 56, "vary[0].to", "is a power in the scenario, got a length"),
                Arguments.of("scenario: base.yaml\nvary:\n  - {key: links.down.transmitter.power, from: 1 W, to: 2 W, steps: 0}\n",
                        3, 68, "vary[0].steps", "expected a whole number of values from 1"),
                Arguments.of("scenario: base.yaml\nrandom:\n  - {key: links.down.transmitter.power, normal: [1 W, 1 W]}\n",
                        2, 1, "random", "random keys need a number of draws"),
                Arguments.of("scenario: base.yaml\nvary:\n  - {key: links.down, values: [1 W]}\n", 3, 11, "vary[0].key",
                        "is a mapping or a list in the scenario"),
                Arguments.of("scenario: base.yaml\nvary:\n  - {key: links.down.transmitter.power, values: [1 W, 2 K]}\n",
                        3, 55, "vary[0].values[1]", "is a power in the scenario, got a temperature ('2 K')"),
                Arguments.of("scenario: base.yaml\ndraws: 2\nrandom:\n  - {key: links.down.transmitter.power, uniform: [1 W, 2 s]}\n",
                        4, 56, "random[0].uniform[1]", "is a power in the scenario, got a time ('2 s')"),
                Arguments.of("scenario: missing.yaml\nvary:\n  - {key: a, values: [1 W]}\n", 0, 0, "", "missing.yaml"));
    }

    @ParameterizedTest
    @MethodSource("wrongSweepFiles")
    void aWrongSweepFileIsRefusedAtItsPlaceBeforeAnythingRuns(String sweep, int line, int column, String key,
                                                             String words) throws IOException {
        PlanRun.Outcome o = sweep(sweep, "out");
        assertEquals(2, o.exitCode(), o.err());
        String first = o.err().lines().findFirst().orElseThrow();
        if (line > 0) {
            assertTrue(first.startsWith(tmp.resolve("study.yaml") + ":" + line + ":" + column + ": " + key + ": "), first);
        }
        assertTrue(first.contains(words), first);
        assertFalse(Files.exists(tmp.resolve("out")), "nothing written");
    }
}
