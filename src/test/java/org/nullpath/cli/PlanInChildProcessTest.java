package org.nullpath.cli;

import java.io.File;
import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.security.MessageDigest;
import java.security.NoSuchAlgorithmException;
import java.util.HexFormat;
import java.util.Map;
import java.util.TreeMap;
import java.util.concurrent.TimeUnit;
import java.util.stream.Stream;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.condition.DisabledOnOs;
import org.junit.jupiter.api.condition.OS;
import org.junit.jupiter.api.io.TempDir;
import org.nullpath.testkit.PlanRun;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.junit.jupiter.api.Assertions.fail;

/**
 * A real {@code nullpath plan} in a child Java process, stopped with SIGTERM ({@link Process#destroy()})
 * or SIGKILL ({@link Process#destroyForcibly()}) while it writes its files: the folder is then the earlier
 * plan's, or (when the signal came during the commit) wholly the stopped plan's, and no staging is left:
 * at once after SIGTERM, after the next plan into the folder after SIGKILL. Exit statuses 143 and 137 are
 * the shell's 128 + signal number convention (SIGTERM 15, SIGKILL 9, POSIX signal numbers). A plan into
 * the folder while the child writes there waits for it (the operating system's file lock, between processes).
 */
@DisabledOnOs(value = OS.WINDOWS, disabledReason = "Process.destroy() sends no SIGTERM there")
class PlanInChildProcessTest {
    @TempDir
    Path tmp;

    /** An invented craft and dock; {@code every} sets how many messages (and so how long the plan writes). */
    private static String scenario(String every) {
        return """
                title: Heron signal trial
                stations:
                  quay: {}
                craft:
                  heron:
                    heading: [1, 0, 0]
                    legs:
                      - burn: {acceleration: 0.1 g0, duration: 300 d}
                links:
                  up: {from: quay, to: heron}
                  down: {from: heron, to: quay}
                messages:
                  - {link: up, first: 0 d, last: 200 d, every: %1$s}
                  - {link: down, first: 0 d, last: 200 d, every: %1$s}
                """.formatted(every);
    }

    private static String sha256(byte[] b) {
        try {
            return HexFormat.of().formatHex(MessageDigest.getInstance("SHA-256").digest(b));
        } catch (NoSuchAlgorithmException e) {
            throw new IllegalStateException(e);
        }
    }

    private static Map<String, String> listing(Path dir) throws IOException {
        Map<String, String> out = new TreeMap<>();
        try (Stream<Path> s = Files.list(dir)) {
            for (Path p : s.toList()) {
                out.put(p.getFileName().toString(), Files.isRegularFile(p) ? sha256(Files.readAllBytes(p)) : "<folder>");
            }
        }
        return out;
    }

    /** Whether the folder holds exactly one plan's files: those its summary.json lists, with those digests. */
    private static boolean onePlansFiles(Map<String, String> listing, Path dir) throws IOException {
        JsonNode digests = new ObjectMapper().readTree(dir.resolve("summary.json").toFile()).get("file_sha256");
        Map<String, String> expected = new TreeMap<>();
        digests.fields().forEachRemaining(e -> expected.put(e.getKey(), e.getValue().asText()));
        expected.put("summary.json", listing.get("summary.json"));
        return expected.equals(listing);
    }

    private static boolean hidden(Map<String, String> listing) {
        return listing.keySet().stream().anyMatch(n -> n.startsWith("."));
    }

    /** A long plan into {@code dir} in a child process, returned once it has begun writing its staged files. */
    private Process longPlanWriting(Path dir) throws IOException, InterruptedException {
        Process p = startLongPlan(dir);
        awaitStaging(p, dir);
        return p;
    }

    /** A long plan into {@code dir} stopped while writing: SIGTERM, or SIGKILL when {@code hard}; it has ended. */
    private Process longPlanStopped(Path dir, boolean hard) throws IOException, InterruptedException {
        Process p = longPlanWriting(dir);
        if (hard) {
            p.destroyForcibly();
        } else {
            p.destroy();
        }
        assertTrue(p.waitFor(60, TimeUnit.SECONDS));
        return p;
    }

    private Process startLongPlan(Path dir) throws IOException {
        Path big = tmp.resolve("heron-long.yaml");
        Files.writeString(big, scenario("200 s")); // 172 802 messages, about 30 MB of CSV
        String java = Path.of(System.getProperty("java.home"), "bin", "java").toString();
        ProcessBuilder pb = new ProcessBuilder(java, "-Xmx256m", "-cp", System.getProperty("java.class.path"),
                Main.class.getName(), "plan", big.toString(), "--out", dir.toString(), "--no-report");
        pb.redirectOutput(tmp.resolve("child.out").toFile());
        pb.redirectError(tmp.resolve("child.err").toFile());
        return pb.start();
    }

    /** Waits until the child has begun writing its staged files (and has not yet begun to commit). */
    private void awaitStaging(Process p, Path dir) throws IOException, InterruptedException {
        long deadline = System.nanoTime() + TimeUnit.SECONDS.toNanos(60);
        while (System.nanoTime() < deadline) {
            if (!p.isAlive()) {
                fail("the plan ended before it could be stopped: " + Files.readString(tmp.resolve("child.err")));
            }
            try (Stream<Path> s = Files.list(dir)) {
                for (Path stage : s.filter(x -> x.getFileName().toString().startsWith(".nullpath-stage-")).toList()) {
                    File up = stage.resolve("up.csv").toFile();
                    if (up.length() > 1_000_000) {
                        return;
                    }
                }
            } catch (java.nio.file.NoSuchFileException e) {
                // the staging folder went between listing and looking
            }
            Thread.sleep(20);
        }
        fail("the child plan never began writing");
    }

    private Path earlierPlan() throws IOException {
        Path small = tmp.resolve("heron.yaml");
        Files.writeString(small, scenario("10 d"));
        Path dir = tmp.resolve("out");
        PlanRun.Outcome o = PlanRun.run("plan", small.toString(), "--out", dir.toString(), "--no-report");
        assertEquals(0, o.exitCode(), o.err());
        return dir;
    }

    @Test
    void sigtermWhileWritingLeavesTheEarlierPlanAndNoStaging() throws Exception {
        Path dir = earlierPlan();
        Map<String, String> before = listing(dir);
        Process p = longPlanStopped(dir, false);
        Map<String, String> after = listing(dir);
        assertFalse(hidden(after), "left after SIGTERM: " + after.keySet());
        if (p.exitValue() == 0) {
            assertTrue(onePlansFiles(after, dir), "finished before the signal, yet not one plan's files: " + after);
        } else {
            assertEquals(143, p.exitValue());
            assertTrue(after.equals(before) || onePlansFiles(after, dir), "neither the earlier plan nor the new one: " + after);
        }
    }

    @Test
    void sigkillWhileWritingLeavesStagingThatTheNextPlanClears() throws Exception {
        Path dir = earlierPlan();
        Map<String, String> before = listing(dir);
        Process p = longPlanStopped(dir, true);
        assertEquals(137, p.exitValue());
        Map<String, String> killed = listing(dir);
        Map<String, String> visible = new TreeMap<>(killed);
        visible.keySet().removeIf(n -> n.startsWith("."));
        assertEquals(before, visible, "a plan killed while writing changed the earlier plan's files");
        assertTrue(hidden(killed), "a hard kill leaves its staging: " + killed.keySet());

        earlierPlan(); // the same small plan again: byte for byte the same files
        assertEquals(before, listing(dir), "the next plan left staging, lock or journal behind, or changed files");
    }

    @Test
    void aPlanIntoAFolderAnotherProcessWritesWaitsForIt() throws Exception {
        Path dir = earlierPlan();
        Map<String, String> small = listing(dir);
        Process p = longPlanWriting(dir);
        Path again = tmp.resolve("heron.yaml");
        PlanRun.Outcome o = PlanRun.run("plan", again.toString(), "--out", dir.toString(), "--no-report");
        assertTrue(p.waitFor(60, TimeUnit.SECONDS));
        assertEquals(0, p.exitValue(), Files.readString(tmp.resolve("child.err")));
        assertEquals(0, o.exitCode(), o.err());
        assertEquals("nullpath: another plan is writing into " + dir + "; waiting until it is done\n", o.err());
        assertTrue(o.out().contains("(replacing 5 files already there)"), o.out());
        // it found the folder held, and its files are the folder's: it committed after the child had
        assertTrue(Files.readString(tmp.resolve("child.out")).contains("written to " + dir + " (replacing 5 files"));
        assertEquals(small, listing(dir), "the second plan's files, alone, are the folder's");
    }
}
