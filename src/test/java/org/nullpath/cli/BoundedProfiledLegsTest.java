package org.nullpath.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTimeoutPreemptively;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.BufferedWriter;
import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.Duration;
import java.util.List;
import java.util.concurrent.TimeUnit;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.nullpath.testkit.PlanRun;

/**
 * Profiled legs at the edges the reader accepts: a leg past the rapidity limit is a located problem
 * (exit 2) for both {@code check} and {@code plan}, and a profile table at the documented limits (100 000
 * samples, 16 MiB) is checked and planned within a 256 MiB heap in a child JVM. The timeouts bound a hang;
 * they are not a measurement. The scenario and its craft are invented for the tests.
 */
class BoundedProfiledLegsTest {
    private static final String SCENARIO = """
            title: Bounded profiled legs
            stations:
              quay: {position: [0 km, 0 km, 0 km]}
            craft:
              skiff:
                heading: [1, 0, 0]
                legs:
                  - profile: {file: table.csv}
            links:
              skiff-down: {from: skiff, to: quay}
            messages:
              - {link: skiff-down, first: 0 s, last: 10 d, every: 1 d}
            """;

    @TempDir
    Path tmp;

    private Path scenario(String table) throws IOException {
        Files.writeString(tmp.resolve("table.csv"), table);
        Path s = tmp.resolve("s.yaml");
        Files.writeString(s, SCENARIO);
        return s;
    }

    @Test
    void aProfilePastTheRapidityLimitIsALocatedProblemForCheckAndPlan() throws IOException {
        Path s = scenario("clock_s,acceleration_m_s2\n0,1e30\n288,1e30\n");
        for (String command : List.of("check", "plan")) {
            String[] args = command.equals("plan") ? new String[] {command, s.toString(), "--out", tmp.resolve("out").toString()}
                    : new String[] {command, s.toString()};
            PlanRun.Outcome o = assertTimeoutPreemptively(Duration.ofSeconds(20), () -> PlanRun.run(args));
            assertEquals(2, o.exitCode(), o.err());
            assertTrue(o.err().contains("s.yaml:8:25: ") && o.err().contains("craft.skiff.legs[0].profile.file: the leg"
                    + " reaches rapidity 700"), o.err());
            assertFalse(o.err().contains("Exception"), o.err());
        }
        assertFalse(Files.exists(tmp.resolve("out")));
    }

    /**
     * 100 000 samples every 10 s of a smooth acceleration (up to 1 g0), each cell padded with zeros to
     * fill the 16 MiB limit; planned in a child JVM at -Xmx256m after {@code check} accepts it in this one.
     */
    @Test
    void aTableAtTheDocumentedLimitsIsCheckedAndPlannedInA256MiBHeap() throws IOException, InterruptedException {
        Path s = scenario("");
        Path table = tmp.resolve("table.csv");
        String zeros = "0".repeat(70);
        try (BufferedWriter w = Files.newBufferedWriter(table, StandardCharsets.UTF_8)) {
            w.write("clock_s,acceleration_m_s2\n");
            for (int i = 0; i < 100_000; i++) {
                double a = 9.80665 * Math.sin(i * 1e-3);
                w.write(i * 10 + "." + zeros + "," + String.format("%.6f", a) + zeros + "\n");
            }
        }
        long size = Files.size(table);
        assertTrue(size > 15L * 1024 * 1024 && size <= 16L * 1024 * 1024, "table size " + size);
        PlanRun.Outcome check = assertTimeoutPreemptively(Duration.ofSeconds(120),
                () -> PlanRun.run("check", s.toString()));
        assertEquals(0, check.exitCode(), check.err());
        String java = Path.of(System.getProperty("java.home"), "bin", "java").toString();
        Process p = new ProcessBuilder(java, "-Xmx256m", "-cp", System.getProperty("java.class.path"),
                Main.class.getName(), "plan", s.toString(), "--out", tmp.resolve("out").toString())
                .redirectErrorStream(true).redirectOutput(tmp.resolve("child.log").toFile()).start();
        assertTrue(p.waitFor(120, TimeUnit.SECONDS), "the child plan did not finish within 120 s");
        String log = Files.readString(tmp.resolve("child.log"));
        assertEquals(0, p.exitValue(), log);
        assertFalse(log.contains("OutOfMemoryError"), log);
        assertTrue(Files.exists(tmp.resolve("out").resolve("summary.json")), log);
    }
}
