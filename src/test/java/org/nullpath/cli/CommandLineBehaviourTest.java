package org.nullpath.cli;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.stream.Stream;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.Arguments;
import org.junit.jupiter.params.provider.MethodSource;
import org.nullpath.testkit.PlanRun;
import org.nullpath.testkit.ScenarioText;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

/** The command line as a user meets it: exit codes, messages, and what is (not) written. */
class CommandLineBehaviourTest {
    @TempDir
    Path tmp;

    static final String GOOD = ScenarioText.titled("command line check")
            .station("home", "{}")
            .craft("probe", "heading: [1, 0, 0]", "burn: {acceleration: 1 g0, duration: forever}")
            .link("up", "home", "probe")
            .link("down", "probe", "home")
            .message("{link: up, first: 0 d, last: 1.5 yr, every: 10 d}")
            .message("{link: down, at: [1 d, 1 yr, 5 yr]}")
            .cutoff("{name: early, link: up, arrive-by: 0.5 yr}")
            .exchange("{name: ping, query: up, reply: down, turnaround: 1 h, first: 0 d, last: 1 yr, every: 30 d}")
            .yaml();

    private Path write(String name, String text) throws IOException {
        Path f = tmp.resolve(name);
        Files.writeString(f, text);
        return f;
    }

    private static List<String> listing(Path dir) throws IOException {
        List<String> out = new ArrayList<>();
        if (!Files.exists(dir)) {
            return out;
        }
        try (Stream<Path> s = Files.walk(dir)) {
            for (Path p : s.sorted().toList()) {
                out.add(dir.relativize(p) + (Files.isRegularFile(p) ? ":" + Files.size(p) + ":" + Files.readString(p).hashCode() : ""));
            }
        }
        return out;
    }

    @Test
    void planWritesEveryContractFileAndASummary() throws IOException {
        Path out = tmp.resolve("out");
        PlanRun.Outcome o = PlanRun.run("plan", write("s.yaml", GOOD).toString(), "--out", out.toString());
        assertEquals(0, o.exitCode(), o.err());
        for (String f : List.of("up.csv", "down.csv", "cutoffs.csv", "horizons.csv", "exchanges-ping.csv", "summary.json")) {
            assertTrue(Files.isRegularFile(out.resolve(f)), f);
        }
        assertTrue(o.out().contains("command line check"), o.out());
        assertTrue(o.out().contains("horizon"), o.out());
        String json = Files.readString(out.resolve("summary.json"));
        assertTrue(json.contains("\"title\" : \"command line check\""), json);
        assertTrue(json.contains("\"has_horizon\" : true"), json);
    }

    @Test
    void anEpochAddsCalendarColumnsAndCutOffsFlagSendsBeforeTheMissionStarts() throws IOException {
        String yaml = GOOD.replace("title: command line check", "title: command line check\nepoch: 2061-03-01T00:00:00Z")
                .replace("  - {name: early, link: up, arrive-by: 0.5 yr}",
                        "  - {name: early, link: up, arrive-by: 0.5 yr}\n  - {name: late, link: up, arrive-by: -1 d}");
        Path out = tmp.resolve("out");
        assertEquals(0, PlanRun.run("plan", write("s.yaml", yaml).toString(), "--out", out.toString()).exitCode());
        List<org.apache.commons.csv.CSVRecord> up = PlanRun.csv(out.resolve("up.csv"));
        // message 2 is sent at 10 d = 864 000 s after the epoch (ISO-8601 instants, java.time)
        assertEquals("2061-03-11T00:00:00Z", up.get(1).get("send_time_utc"));
        assertEquals("", up.get(up.size() - 1).get("receive_time_utc"), "a message that never arrives has no arrival");
        List<org.apache.commons.csv.CSVRecord> cut = PlanRun.csv(out.resolve("cutoffs.csv"));
        assertEquals("ok", cut.get(0).get("status"));
        assertEquals("false", cut.get(0).get("before_mission_start"));
        assertEquals("ok", cut.get(1).get("status"), "every worldline is defined for all times: the deadline is reachable");
        assertEquals("true", cut.get(1).get("before_mission_start"));
        assertTrue(Double.parseDouble(cut.get(1).get("latest_send_time_s")) < 0);
    }

    @Test
    void aLaterPlanIntoTheSameFolderRemovesTheFilesItNoLongerWritesButKeepsOthers() throws IOException {
        Path out = tmp.resolve("shared");
        assertEquals(0, PlanRun.run("plan", write("s.yaml", GOOD).toString(), "--out", out.toString()).exitCode());
        assertTrue(Files.isRegularFile(out.resolve("down.csv")));
        Files.writeString(out.resolve("notes.txt"), "mine");
        String fewer = GOOD.replace("  down: {from: probe, to: home}\n", "")
                .replace("  - {link: down, at: [1 d, 1 yr, 5 yr]}\n", "")
                .replace("  - {name: ping, query: up, reply: down, turnaround: 1 h, first: 0 d, last: 1 yr, every: 30 d}\n", "")
                .replace("exchanges:\n", "");
        PlanRun.Outcome o = PlanRun.run("plan", write("t.yaml", fewer).toString(), "--out", out.toString());
        assertEquals(0, o.exitCode(), o.err());
        assertFalse(Files.exists(out.resolve("down.csv")), "the earlier plan's link file is gone");
        assertFalse(Files.exists(out.resolve("exchanges-ping.csv")), "and its round trips");
        assertTrue(Files.isRegularFile(out.resolve("up.csv")));
        assertEquals("mine", Files.readString(out.resolve("notes.txt")), "files nullpath did not write stay");
        String json = Files.readString(out.resolve("summary.json"));
        assertTrue(json.contains("\"files\" : [ \"cutoffs.csv\""), json);
    }

    @Test
    void twoRunsGiveByteIdenticalFiles() throws IOException {
        Path s = write("s.yaml", GOOD);
        Path a = tmp.resolve("a");
        Path b = tmp.resolve("b");
        assertEquals(0, PlanRun.run("plan", s.toString(), "--out", a.toString()).exitCode());
        assertEquals(0, PlanRun.run("plan", s.toString(), "--out", b.toString()).exitCode());
        try (Stream<Path> files = Files.list(a)) {
            for (Path f : files.toList()) {
                assertArrayEquals(Files.readAllBytes(f), Files.readAllBytes(b.resolve(f.getFileName())), f.toString());
            }
        }
    }

    @Test
    void anExistingOutputFolderIsUntouchedAfterABadScenario() throws IOException {
        Path out = tmp.resolve("keep");
        Files.createDirectories(out);
        Files.writeString(out.resolve("notes.txt"), "mine");
        Files.writeString(out.resolve("up.csv"), "an older plan");
        List<String> before = listing(tmp);
        PlanRun.Outcome o = PlanRun.run("plan", write("bad.yaml", GOOD.replace("1 g0", "1 ly")).toString(),
                "--out", out.toString());
        assertEquals(2, o.exitCode());
        List<String> after = listing(tmp);
        assertEquals(before.size() + 1, after.size(), "only the scenario file itself was added");
        assertEquals("an older plan", Files.readString(out.resolve("up.csv")));
        assertFalse(o.err().contains("Exception"), o.err());
    }

    @Test
    void aMissingOutputFolderIsNotCreatedAfterABadScenario() throws IOException {
        Path out = tmp.resolve("never-made");
        PlanRun.Outcome o = PlanRun.run("plan", write("bad.yaml", "title: [").toString(), "--out", out.toString());
        assertEquals(2, o.exitCode());
        assertFalse(Files.exists(out));
        try (Stream<Path> s = Files.list(tmp)) {
            assertEquals(1, s.count(), "nothing left beside the output folder");
        }
    }

    @Test
    void anExistingOutputFolderKeepsItsOtherFilesAfterASuccessfulPlan() throws IOException {
        Path out = tmp.resolve("shared");
        Files.createDirectories(out);
        Files.writeString(out.resolve("notes.txt"), "mine");
        assertEquals(0, PlanRun.run("plan", write("s.yaml", GOOD).toString(), "--out", out.toString()).exitCode());
        assertEquals("mine", Files.readString(out.resolve("notes.txt")));
        assertTrue(Files.isRegularFile(out.resolve("up.csv")));
        try (Stream<Path> s = Files.list(tmp)) {
            assertEquals(2, s.count(), "no staging folder left behind");
        }
    }

    static Stream<Arguments> badScenarios() {
        return Stream.of(
                Arguments.of("yaml syntax", GOOD.replace("title: command line check", "title: [unclosed"), "s.yaml:"),
                Arguments.of("unknown key", GOOD.replace("heading:", "headin:"), "did you mean 'heading'"),
                Arguments.of("wrong dimension", GOOD.replace("acceleration: 1 g0", "acceleration: 4 ly"),
                        "craft.probe.legs[0].burn.acceleration: expected an acceleration, got a length"),
                Arguments.of("nan", GOOD.replace("acceleration: 1 g0", "acceleration: NaN g0"), "acceleration"),
                Arguments.of("speed of light", GOOD.replace("heading: [1, 0, 0]", "heading: [1, 0, 0]\n    start-speed: 1 c"),
                        "start-speed"),
                Arguments.of("unreachable until-speed", GOOD.replace("duration: forever", "until-speed: -0.5 c"),
                        "until-speed"),
                Arguments.of("open-ended not last", GOOD.replace("      - burn: {acceleration: 1 g0, duration: forever}",
                        "      - burn: {acceleration: 1 g0, duration: forever}\n      - coast: {duration: 1 d}"), "last"),
                Arguments.of("zero heading", GOOD.replace("heading: [1, 0, 0]", "heading: [0, 0, 0]"), "heading"),
                Arguments.of("unknown node", GOOD.replace("to: probe}", "to: prob}"), "links.up.to"),
                Arguments.of("non-positive every", GOOD.replace("every: 10 d", "every: 0 d"), "every"),
                Arguments.of("alias bomb", "a: &a [x, x, x, x, x, x, x, x, x]\n"
                        + "b: &b [*a, *a, *a, *a, *a, *a, *a, *a, *a]\n"
                        + "c: &c [*b, *b, *b, *b, *b, *b, *b, *b, *b]\n"
                        + "d: &d [*c, *c, *c, *c, *c, *c, *c, *c, *c]\n"
                        + "e: &e [*d, *d, *d, *d, *d, *d, *d, *d, *d]\n"
                        + "f: &f [*e, *e, *e, *e, *e, *e, *e, *e, *e]\n"
                        + "g: &g [*f, *f, *f, *f, *f, *f, *f, *f, *f]\n", "alias"));
    }

    @ParameterizedTest(name = "{0}")
    @MethodSource("badScenarios")
    void badInputExitsWithTwoAndOneLinePerProblemWithoutAStackTrace(String what, String yaml, String expected)
            throws IOException {
        Path out = tmp.resolve("out");
        PlanRun.Outcome o = PlanRun.run("plan", write("s.yaml", yaml).toString(), "--out", out.toString());
        assertEquals(2, o.exitCode(), what + ": " + o.err());
        assertTrue(o.err().contains(expected), what + ": " + o.err());
        assertTrue(o.err().contains("s.yaml"), "names the file: " + o.err());
        assertFalse(o.err().contains("\tat "), "no stack trace: " + o.err());
        assertFalse(Files.exists(out), what);
        PlanRun.Outcome c = PlanRun.run("check", tmp.resolve("s.yaml").toString());
        assertEquals(2, c.exitCode(), what);
    }

    @Test
    void errorsNameLineAndColumnOfTheOffendingValue() throws IOException {
        String yaml = GOOD.replace("acceleration: 1 g0", "acceleration: 4 ly");
        PlanRun.Outcome o = PlanRun.run("check", write("s.yaml", yaml).toString());
        // the value '4 ly' stands on line 8, at column 39 of "      - burn: {acceleration: 4 ly, duration: forever}"
        assertTrue(o.err().contains("s.yaml:8:"), o.err());
        String line = yaml.lines().toList().get(7);
        int column = line.indexOf("4 ly") + 1;
        assertTrue(o.err().contains("s.yaml:8:" + column + ": craft.probe.legs[0].burn.acceleration"), o.err());
    }

    @Test
    void aMessageFloodOverTheCapIsRefusedBeforeComputing() throws IOException {
        Path s = write("s.yaml", GOOD.replace("every: 10 d", "every: 1 ms"));
        Path out = tmp.resolve("out");
        PlanRun.Outcome o = PlanRun.run("plan", s.toString(), "--out", out.toString());
        assertEquals(2, o.exitCode());
        assertTrue(o.err().contains("more than the cap of 50000000"), o.err());
        assertTrue(o.err().contains("--max-messages"), o.err());
        assertFalse(Files.exists(out));
        PlanRun.Outcome lower = PlanRun.run("plan", write("t.yaml", GOOD).toString(), "--out", out.toString(),
                "--max-messages", "10");
        assertEquals(2, lower.exitCode());
    }

    @Test
    void aMissingScenarioFileIsAnInputError() {
        PlanRun.Outcome o = PlanRun.run("plan", tmp.resolve("nope.yaml").toString(), "--out", tmp.resolve("o").toString());
        assertEquals(2, o.exitCode());
        assertTrue(o.err().contains("nope.yaml"), o.err());
    }

    @Test
    void aBadOptionIsAnInputError() throws IOException {
        PlanRun.Outcome o = PlanRun.run("plan", write("s.yaml", GOOD).toString());
        assertEquals(2, o.exitCode(), "--out is required");
        assertEquals(2, PlanRun.run("plan", "--frobnicate").exitCode());
    }

    @Test
    void checkPrintsOneLineForAUsableScenario() throws IOException {
        PlanRun.Outcome o = PlanRun.run("check", write("s.yaml", GOOD).toString());
        assertEquals(0, o.exitCode(), o.err());
        assertEquals(1, o.out().lines().count(), o.out());
        assertTrue(o.out().contains("usable"), o.out());
    }

    @Test
    void helpListsPlanAndCheckAndVersionPrintsTheVersion() {
        PlanRun.Outcome h = PlanRun.run("--help");
        assertEquals(0, h.exitCode());
        assertTrue(h.out().contains("plan") && h.out().contains("check") && h.out().contains("sweep"), h.out());
        PlanRun.Outcome v = PlanRun.run("--version");
        assertEquals(0, v.exitCode());
        assertTrue(v.out().startsWith("nullpath "), v.out());
    }

    @Test
    void everyDemoScenarioChecksAndPlansCleanly() throws IOException {
        try (Stream<Path> demos = Files.list(Path.of("link-scenarios"))) {
            List<Path> files = demos.filter(p -> p.toString().endsWith(".yaml")).sorted().toList();
            assertTrue(files.size() >= 3, "at least three demos");
            for (Path demo : files) {
                if (demo.getFileName().toString().endsWith("-sweep.yaml")) {
                    // a demo trade study over one of the demo scenarios
                    PlanRun.Outcome o = PlanRun.run("sweep", demo.toString(), "--out",
                            tmp.resolve("sweep-" + demo.getFileName()).toString(), "--quiet");
                    assertEquals(0, o.exitCode(), demo + ": " + o.err());
                    assertTrue(o.out().contains(" 0 invalid)"), o.out());
                    continue;
                }
                assertEquals(0, PlanRun.run("check", demo.toString()).exitCode(), demo.toString());
                Path out = tmp.resolve("demo-" + demo.getFileName());
                PlanRun.Outcome o = PlanRun.run("plan", demo.toString(), "--out", out.toString());
                assertEquals(0, o.exitCode(), demo + ": " + o.err());
            }
        }
    }
}
