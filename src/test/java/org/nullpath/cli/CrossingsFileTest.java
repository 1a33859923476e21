package org.nullpath.cli;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;

import org.apache.commons.csv.CSVRecord;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.nullpath.report.Readable;
import org.nullpath.testkit.PlanRun;
import org.nullpath.testkit.ScenarioText;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.nullpath.testkit.Si.C;
import static org.nullpath.testkit.Si.G0;

/**
 * End to end: crossings.csv and the new windows.csv columns as a plan writes them. A station at rest at
 * the origin sends to a craft burning at a = 0.5 g0 from rest at the origin (invented); the Doppler factor
 * of a send at t is D = 1 - a t / c and the craft's clock at its arrival -(c/a) ln D (Rindler,
 * <i>Relativity: Special, General, and Cosmological</i>, 2006, ch. 3; worked in schedule.CrossingsAndVolumesTest).
 */
class CrossingsFileTest {
    static final double A = 0.5 * G0;

    @TempDir
    Path tmp;

    private static String scenario(boolean windows) {
        ScenarioText s = ScenarioText.homeAndCraft("probe", "burn: {acceleration: 0.5 g0, duration: forever}")
                .link("up", "home", "probe", """
                        carrier: 7.2 GHz
                        transmitter: {power: 1 GW, antenna: {gain: 70 dBi}}
                        receiver: {antenna: {gain: 40 dBi}, noise-temperature: 300 K, tuning-range: [7.0 GHz, 7.15 GHz]}
                        data-rate: 1 kbit/s
                        required-eb-n0: 2.5 dB
                        """)
                .message("{link: up, first: 1 d, last: 30 d, every: 1 d}");
        if (windows) {
            s.then("windows:\n  - {link: up, from: 1 h, to: 60 d}\n  - {link: up, from: 10 d, to: 800 d}");
        }
        return s.yaml();
    }

    private static void assertRelative(double expected, String actual, double tol) {
        assertEquals(expected, Double.parseDouble(actual), tol * Math.abs(expected), actual);
    }

    @Test
    void crossingsAreWrittenBesideWindowsScanByScanInSendOrder() throws IOException {
        Path out = PlanRun.plan(tmp, "cross", scenario(true));
        List<CSVRecord> x = PlanRun.csv(out.resolve("crossings.csv"));
        assertEquals(List.of("link", "limit", "direction", "send_clock_s", "send_time_s", "receive_clock_s"),
                x.get(0).getParser().getHeaderNames());
        // first scan: the tuning range's top entered at D = 7.15/7.2, its bottom left at D = 7.0/7.2; the second
        // scan starts inside the range, so it lists the bottom edge again, then the margin and the horizon (c/a)
        assertEquals(List.of("tuning-high enters", "tuning-low leaves", "tuning-low leaves", "margin leaves",
                "horizon leaves"), x.stream().map(r -> r.get("limit") + " " + r.get("direction")).toList());
        double high = C / A * (1 - 7.15 / 7.2);
        double low = C / A * (1 - 7.0 / 7.2);
        assertRelative(high, x.get(0).get("send_clock_s"), 1e-9);
        assertRelative(high, x.get(0).get("send_time_s"), 1e-9);
        assertRelative(-C / A * Math.log(7.15 / 7.2), x.get(0).get("receive_clock_s"), 1e-9);
        assertRelative(low, x.get(1).get("send_clock_s"), 1e-9);
        assertRelative(-C / A * Math.log(7.0 / 7.2), x.get(2).get("receive_clock_s"), 1e-9);
        assertRelative(C / A, x.get(4).get("send_clock_s"), 1e-12);
        assertEquals("", x.get(4).get("receive_clock_s"));

        List<CSVRecord> w = PlanRun.csv(out.resolve("windows.csv"));
        assertEquals(2, w.size());
        assertEquals(List.of("link", "opens_send_clock_s", "closes_send_clock_s", "closed_by", "send_open_s",
                "receive_open_s", "volume_bits", "adaptive_volume_bits"), w.get(0).getParser().getHeaderNames());
        assertRelative(low - high, w.get(0).get("send_open_s"), 1e-9);
        assertRelative(C / A * Math.log(7.15 / 7.0), w.get(0).get("receive_open_s"), 1e-9);
        assertRelative(1000 * (low - high), w.get(0).get("volume_bits"), 1e-9);
        assertFalse(w.get(0).get("adaptive_volume_bits").isEmpty());
    }

    @Test
    void theTerminalNamesTheFirstCrossingOfEachLimitOnceInTheOrderOfCrossingsCsv() throws IOException {
        Path file = tmp.resolve("said.yaml");
        Files.writeString(file, scenario(true));
        PlanRun.Outcome o = PlanRun.run("plan", file.toString(), "--out", tmp.resolve("said").toString());
        assertEquals(0, o.exitCode(), o.err());
        List<String> lines = o.out().lines().filter(l -> l.contains("crossing on")).map(String::strip).toList();
        // tuning-low is crossed in both scans: only the first (19.68 d, D = 7.0/7.2) is named; the margin's
        // crossing (checked against the closed-form budget in schedule.CrossingsAndVolumesTest) as in the file
        double margin = PlanRun.csv(tmp.resolve("said").resolve("crossings.csv")).stream()
                .filter(r -> r.get("limit").equals("margin")).mapToDouble(r -> Double.parseDouble(r.get("send_clock_s")))
                .findFirst().orElseThrow();
        // shown rounded in the safe direction, as cut-offs are: a limit left toward earlier, one entered toward later
        assertEquals(List.of("first margin crossing on up: leaves at send " + Readable.notAfter(margin)
                        + " (sender's clock)",
                "first tuning-low crossing on up: leaves at send " + Readable.notAfter(C / A * (1 - 7.0 / 7.2))
                        + " (sender's clock)",
                "first tuning-high crossing on up: enters at send " + Readable.notBefore(C / A * (1 - 7.15 / 7.2))
                        + " (sender's clock)",
                "first horizon crossing on up: leaves at send " + Readable.notAfter(C / A) + " (sender's clock)"),
                lines);
    }

    @Test
    void aPlanWithoutWindowScansWritesNoCrossingsFile() throws IOException {
        Path out = PlanRun.plan(tmp, "none", scenario(false));
        assertFalse(Files.exists(out.resolve("crossings.csv")));
        assertFalse(Files.exists(out.resolve("windows.csv")));
    }
}
