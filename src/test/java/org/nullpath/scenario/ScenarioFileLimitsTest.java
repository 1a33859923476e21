package org.nullpath.scenario;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTimeoutPreemptively;
import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.nullpath.scenario.ProblemAssertions.assertProblem;
import static org.nullpath.scenario.ProblemAssertions.onlyProblemOf;

import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.Duration;
import java.util.Arrays;
import java.util.List;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * The file itself: missing, unreadable, too large, not UTF-8, not YAML, or built to exhaust the reader
 * (alias expansion, deep nesting).
 */
class ScenarioFileLimitsTest {

    private static Problem onlyProblemOfFile(Path file) {
        ScenarioException e = assertThrows(ScenarioException.class, () -> ScenarioLoader.load(file));
        assertEquals(1, e.problems().size(), () -> ProblemAssertions.rendered(e.problems()));
        Problem p = e.problems().get(0);
        assertEquals(file.toString(), p.file());
        return p;
    }

    @Test
    void aMissingFileIsReportedByName(@TempDir Path dir) {
        Problem p = onlyProblemOfFile(dir.resolve("absent.yaml"));
        assertEquals(0, p.line());
        assertEquals("", p.key());
        assertTrue(p.message().contains("no such file"), p.message());
    }

    @Test
    void aDirectoryIsNotReadableAsAScenario(@TempDir Path dir) {
        Problem p = onlyProblemOfFile(dir);
        assertTrue(p.message().contains("it is a directory"), p.message());
    }

    @Test
    void aFileOverFourMebibytesIsRefusedBeforeParsing(@TempDir Path dir) throws Exception {
        Path file = dir.resolve("huge.yaml");
        // A comment line repeated past 4 MiB: valid YAML, so only the size check can refuse it.
        byte[] body = new byte[4 * 1024 * 1024 + 1];
        Arrays.fill(body, (byte) '#');
        body[body.length - 1] = '\n';
        Files.write(file, body);
        Problem p = onlyProblemOfFile(file);
        assertTrue(p.message().contains("4194305 bytes"), p.message());
        assertTrue(p.message().contains("at most 4 MiB"), p.message());
    }

    @Test
    void aFileOfExactlyFourMebibytesIsRead(@TempDir Path dir) throws Exception {
        Path file = dir.resolve("full.yaml");
        byte[] head = "stations:\n  home: {}\n".getBytes(StandardCharsets.US_ASCII);
        byte[] body = new byte[4 * 1024 * 1024];
        // Comment lines of 64 bytes fill the rest.
        for (int i = head.length; i < body.length; i++) {
            int inLine = (i - head.length) % 64;
            body[i] = (byte) (inLine == 0 ? '#' : inLine == 63 ? '\n' : 'x');
        }
        System.arraycopy(head, 0, body, 0, head.length);
        body[body.length - 1] = '\n';
        Files.write(file, body);
        assertEquals(List.of("home"), List.copyOf(ScenarioLoader.load(file).nodes().keySet()));
    }

    @Test
    void textOverFourMebibytesIsRefusedToo() {
        String text = "#".repeat(4 * 1024 * 1024) + "\n";
        ScenarioException e = assertThrows(ScenarioException.class, () -> ScenarioLoader.load(text, "big.yaml"));
        assertTrue(e.problems().get(0).message().contains("at most 4 MiB"));
    }

    @Test
    void aFileThatIsNotUtf8IsReportedAtTheBadByte(@TempDir Path dir) throws Exception {
        Path file = dir.resolve("latin1.yaml");
        Files.write(file, "title: caf\u00e9\nstations:\n  home: {}\n".getBytes(StandardCharsets.ISO_8859_1));
        Problem p = onlyProblemOfFile(file);
        assertEquals(1, p.line());
        assertEquals(11, p.column());
        assertTrue(p.message().contains("not UTF-8") && p.message().contains("0xE9"), p.message());
    }

    @Test
    void yamlSyntaxErrorsGiveLineAndColumn() {
        Problem p = onlyProblemOf("""
                stations:
                  home: {position: [0 au, 0 au, 0 au]
                craft: {}
                """);
        assertProblem(p, 3, 1, "", "YAML syntax error", "expected ',' or '}'",
                "while parsing a flow mapping that starts at line 2, column 9");
    }

    @Test
    void tabIndentationIsASyntaxError() {
        Problem p = onlyProblemOf("stations:\n\thome: {}\n");
        assertProblem(p, 2, 1, "", "YAML syntax error", "TAB");
    }

    @Test
    void anEmptyFileIsReported() {
        Problem p = onlyProblemOf("# nothing but a comment\n");
        assertProblem(p, 0, 0, "", "holds no YAML document");
    }

    @Test
    void aSecondDocumentIsReported() {
        Problem p = onlyProblemOf("stations:\n  home: {}\n---\nstations:\n  away: {}\n");
        assertProblem(p, 4, 1, "", "more than one YAML document");
    }

    @Test
    void anAliasBombIsRefusedQuickly() {
        // The classic exponential document: each level holds nine aliases of the one before, so nine levels
        // would expand to about 10^9 values. Level f already holds 597 871; two aliases of it exceed 10^6.
        StringBuilder b = new StringBuilder("a: &a [\"lol\",\"lol\",\"lol\",\"lol\",\"lol\",\"lol\",\"lol\",\"lol\",\"lol\"]\n");
        for (char c = 'b'; c <= 'i'; c++) {
            char prev = (char) (c - 1);
            b.append(c).append(": &").append(c).append(" [");
            for (int k = 0; k < 9; k++) {
                b.append(k == 0 ? "" : ",").append('*').append(prev);
            }
            b.append("]\n");
        }
        String bomb = b.toString();
        Problem p = assertTimeoutPreemptively(Duration.ofSeconds(10), () -> onlyProblemOf(bomb));
        // The list of line 7 is "&g [...]": a YAML node starts with its anchor, at column 4.
        assertProblem(p, 7, 4, "g", "expands to more than 1000000 values");
    }

    @Test
    void moreThanFiftyAliasesOfCollectionsAreRefused() {
        StringBuilder b = new StringBuilder("a: &a [1]\nb: [*a");
        for (int k = 1; k < 60; k++) {
            b.append(", *a");
        }
        b.append("]\n");
        String many = b.toString();
        Problem p = onlyProblemOf(many);
        // "b: [" is 4 characters, then "*a, " of 4 each: the 51st alias (index 50) starts at column 205.
        assertProblem(p, 2, 205, "b[50]", "more than 50 aliases refer to mappings or lists");
    }

    @Test
    void aDoublingAliasChainIsRefusedByItsExpandedSize() {
        // Within 50 aliases, level i holds 2^(i+2) - 1 values; the top-level mapping holding levels 0..17
        // sums to 2^20 - 22 > 10^6 values, so the whole document (line 1, column 1) is refused.
        StringBuilder b = new StringBuilder("l0: &l0 [x, x]\n");
        for (int i = 1; i <= 24; i++) {
            b.append('l').append(i).append(": &l").append(i).append(" [*l").append(i - 1).append(", *l")
                    .append(i - 1).append("]\n");
        }
        String chain = b.toString();
        Problem p = assertTimeoutPreemptively(Duration.ofSeconds(10), () -> onlyProblemOf(chain));
        assertProblem(p, 1, 1, "", "expands to more than 1000000 values");
    }

    @Test
    void aRecursiveAliasIsRefused() {
        Problem p = onlyProblemOf("stations: &s {home: *s}\n");
        assertProblem(p, 1, 21, "stations.home", "refers to the node that contains it");
    }

    @Test
    void anUndefinedAliasIsRefused() {
        Problem p = onlyProblemOf("stations:\n  home: *nowhere\n");
        assertProblem(p, 2, 9, "stations.home", "alias '*nowhere' refers to no mapping or list anchored");
    }

    @Test
    void nestingDeeperThanSixtyFourLevelsIsRefused() {
        String deep = "stations: " + "[".repeat(100) + "]".repeat(100) + "\n";
        Problem p = assertTimeoutPreemptively(Duration.ofSeconds(10), () -> onlyProblemOf(deep));
        assertEquals(1, p.line());
        assertTrue(p.message().contains("nested more than 64 levels"), p.message());
    }
}
