package org.nullpath.cli;

import org.nullpath.testkit.ScenarioText;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.Map;
import java.util.TreeMap;
import java.util.stream.Stream;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;
import org.junit.jupiter.params.provider.ValueSource;
import org.nullpath.testkit.PlanRun;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

/** Where a plan may not write: refused as a usage error (exit 2), with nothing written anywhere. */
class OutputTargetTest {
    @TempDir
    Path tmp;

    /** A small invented scenario: one dock, one craft, one link. */
    private static final String SCENARIO = ScenarioText.titled("Plover target trial").station("pier", "{}")
            .craft("plover", "heading: [1, 0, 0]", "burn: {acceleration: 0.1 g0, duration: 30 d}")
            .link("up", "pier", "plover").message("{link: up, first: 0 d, last: 20 d, every: 10 d}").yaml();

    private Path scenario() throws IOException {
        Path f = tmp.resolve("plover.yaml");
        Files.writeString(f, SCENARIO);
        return f;
    }

    private static Map<String, String> listing(Path dir) throws IOException {
        Map<String, String> out = new TreeMap<>();
        try (Stream<Path> s = Files.walk(dir)) {
            for (Path p : s.toList()) {
                out.put(dir.relativize(p).toString(), Files.isRegularFile(p) ? Files.readString(p) : "<folder>");
            }
        }
        return out;
    }

    @Test
    void anEmptyOutputNameIsAUsageErrorAndWritesNothingHere() throws IOException {
        Path cwd = Path.of("").toAbsolutePath();
        List<String> before;
        try (Stream<Path> s = Files.list(cwd)) {
            before = s.map(Path::toString).sorted().toList();
        }
        PlanRun.Outcome o = PlanRun.run("plan", scenario().toString(), "--out", "");
        assertEquals(2, o.exitCode(), o.err());
        assertEquals("nullpath: --out: the output folder's name is empty\n", o.err());
        try (Stream<Path> s = Files.list(cwd)) {
            assertEquals(before, s.map(Path::toString).sorted().toList());
        }
    }

    @ParameterizedTest
    @CsvSource(delimiter = '|', value = {
        "/| is the root folder; give a folder of its own for the plan's files",
        "/dev/null| exists and is not a folder"})
    void theRootFolderOrADeviceIsAUsageError(String target, String why) throws IOException {
        PlanRun.Outcome o = PlanRun.run("plan", scenario().toString(), "--out", target);
        assertEquals(2, o.exitCode(), o.err());
        assertEquals("nullpath: --out: " + target + " " + why + "\n", o.err());
        assertEquals("", o.out());
    }

    @Test
    void aRegularFileAsTheFolderIsAUsageErrorAndStaysAsItWas() throws IOException {
        Path file = tmp.resolve("notes.txt");
        Files.writeString(file, "mine\n");
        PlanRun.Outcome o = PlanRun.run("plan", scenario().toString(), "--out", file.toString());
        assertEquals(2, o.exitCode(), o.err());
        assertEquals("nullpath: --out: " + file + " exists and is not a folder\n", o.err());
        assertEquals("mine\n", Files.readString(file));
        assertEquals(Map.of("", "<folder>", "notes.txt", "mine\n", "plover.yaml", SCENARIO), listing(tmp));
    }

    @Test
    void aFolderUnderARegularFileIsAUsageError() throws IOException {
        Path file = tmp.resolve("notes.txt");
        Files.writeString(file, "mine\n");
        Path target = file.resolve("out");
        PlanRun.Outcome o = PlanRun.run("plan", scenario().toString(), "--out", target.toString());
        assertEquals(2, o.exitCode(), o.err());
        assertEquals("nullpath: --out: " + target + " lies under " + file + ", which is not a folder\n", o.err());
        assertEquals(Map.of("", "<folder>", "notes.txt", "mine\n", "plover.yaml", SCENARIO), listing(tmp));
    }

    @ParameterizedTest
    @ValueSource(strings = {"0", "-1", "-50000000"})
    void aCapOfNoMessagesIsAUsageError(String cap) throws IOException {
        Path out = tmp.resolve("out");
        PlanRun.Outcome o = PlanRun.run("plan", scenario().toString(), "--out", out.toString(), "--max-messages", cap);
        assertEquals(2, o.exitCode(), o.err());
        assertEquals("nullpath: --max-messages must be at least 1 (got " + cap + ")\n", o.err());
        assertEquals(2, PlanRun.run("check", scenario().toString(), "--max-messages", cap).exitCode());
        assertTrue(Files.notExists(out));
    }

    @Test
    void aFolderWhereAnOutputFileGoesIsRefusedWithTheFolderUntouched() throws IOException {
        Path out = tmp.resolve("out");
        Files.createDirectories(out.resolve("up.csv"));
        Files.writeString(out.resolve("up.csv/inside.txt"), "kept\n");
        Map<String, String> before = listing(out);
        PlanRun.Outcome o = PlanRun.run("plan", scenario().toString(), "--out", out.toString());
        assertEquals(2, o.exitCode(), o.err());
        assertTrue(o.err().contains("stands up.csv (a folder); nothing was changed"), o.err());
        assertEquals(before, listing(out));
    }

    @Test
    void aPlanBesideItsScenarioNeverWritesOverTheScenario() throws IOException {
        // JSON is YAML: a scenario saved as summary.json is read, and the plan's summary.json would replace it
        Path s = tmp.resolve("summary.json");
        Files.writeString(s, SCENARIO);
        PlanRun.Outcome o = PlanRun.run("plan", s.toString(), "--out", tmp.toString(), "--no-report");
        assertEquals(2, o.exitCode(), o.err());
        assertTrue(o.err().contains("summary.json (an input of this plan)"), o.err());
        assertEquals(Map.of("", "<folder>", "summary.json", SCENARIO), listing(tmp));
    }

    @Test
    void aPlanBesideItsProfileTableNeverWritesOverTheTable() throws IOException {
        // the profile table is named like the link's output file, up.csv
        String table = "clock_s,acceleration_m_s2\n0,1\n86400,1\n";
        Files.writeString(tmp.resolve("up.csv"), table);
        String yaml = SCENARIO.replace("- burn: {acceleration: 0.1 g0, duration: 30 d}", "- profile: {file: up.csv}");
        Path s = tmp.resolve("plover.yaml");
        Files.writeString(s, yaml);
        PlanRun.Outcome o = PlanRun.run("plan", s.toString(),
                "--out", tmp.toString(), "--no-report");
        assertEquals(2, o.exitCode(), o.err());
        assertTrue(o.err().contains("up.csv (an input of this plan)"), o.err());
        assertEquals(Map.of("", "<folder>", "up.csv", table, "plover.yaml", yaml), listing(tmp));
    }
}
