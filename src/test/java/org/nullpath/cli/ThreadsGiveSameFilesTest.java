package org.nullpath.cli;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.stream.Stream;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.nullpath.testkit.PlanRun;
import org.nullpath.testkit.ScenarioText;

/**
 * A plan's files are the same, byte for byte, whatever the number of threads: messages are computed in chunks
 * of 1024 on several threads and written in send order, and the tallies are merged in order. The mission
 * (invented) crosses chunk boundaries with arrivals and non-arrivals mixed: an uplink to a craft on an
 * open-ended burn passes the craft's horizon (c / g0 after launch, about 354 d, Rindler) in the middle of its
 * 10 001 messages, and the downlink carries a link budget.
 */
class ThreadsGiveSameFilesTest {
    @TempDir
    Path tmp;

    private static final String SCENARIO = ScenarioText.titled("Threads").epoch("2071-03-01T00:00:00Z")
            .station("pier", "{}")
            .station("mast", "{position: [0 ly, 0.05 ly, 0 ly], velocity: [0 c, 0.01 c, 0 c]}")
            .craft("gull", "heading: [1, 0, 0]", "burn: {acceleration: 1 g0, duration: forever}")
            .link("up", "pier", "gull").link("back", "gull", "pier")
            .link("down", "gull", "mast", ScenarioText.radioTerms("100 W"))
            .message("{link: up, first: 0 d, last: 400 d, every: 0.04 d}")
            .message("{link: up, at: [0.5 d, 353 d]}")
            .message("{link: down, first: 0 d, last: 300 d, every: 0.05 d}")
            .cutoff("{name: trim, link: up, arrive-by: 2 yr}")
            .exchange("{name: ping, query: up, reply: back, turnaround: 1 h, first: 0 d, last: 300 d, every: 30 d}")
            .yaml();

    private Path plan(String threads) throws IOException {
        Path file = tmp.resolve("threads.yaml");
        Files.writeString(file, SCENARIO);
        Path out = tmp.resolve("out-" + threads);
        PlanRun.Outcome o = PlanRun.run("plan", file.toString(), "--out", out.toString(), "--no-report", "--threads",
                threads);
        assertEquals(0, o.exitCode(), o.err());
        return out;
    }

    private static List<String> names(Path dir) throws IOException {
        try (Stream<Path> s = Files.list(dir)) {
            return s.map(p -> p.getFileName().toString()).sorted().toList();
        }
    }

    @Test
    void oneTwoAndThreeThreadsWriteTheSameBytes() throws IOException {
        Path one = plan("1");
        List<String> files = names(one);
        assertEquals(List.of("back.csv", "cutoffs.csv", "down.csv", "exchanges-ping.csv", "horizons.csv", "summary.json", "up.csv"),
                files);
        // 10 001 + 2 uplink messages and 6 001 downlink messages, with the header line
        assertEquals(10_004, Files.readAllLines(one.resolve("up.csv")).size());
        assertEquals(6_002, Files.readAllLines(one.resolve("down.csv")).size());
        for (String threads : List.of("2", "3")) {
            Path other = plan(threads);
            assertEquals(files, names(other));
            for (String f : files) {
                assertArrayEquals(Files.readAllBytes(one.resolve(f)), Files.readAllBytes(other.resolve(f)),
                        f + " with " + threads + " threads");
            }
        }
        // both kinds of row are present on the uplink: arrivals before the horizon, none after
        String up = Files.readString(one.resolve("up.csv"));
        assertEquals(true, up.contains(",delivered,") && up.contains(",never,"));
    }

    @Test
    void aThreadCountBelowOneIsAUsageError() throws IOException {
        Path file = tmp.resolve("threads.yaml");
        Files.writeString(file, SCENARIO);
        PlanRun.Outcome o = PlanRun.run("check", file.toString(), "--threads", "0");
        assertEquals(2, o.exitCode());
        assertEquals("nullpath: --threads must be at least 1 (got 0)\n", o.err());
    }
}
