package org.nullpath.scenario;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;

import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.ValueSource;
import org.nullpath.mission.Mission;

/**
 * Profile tables read from a scenario others may have written: only regular files, by default only inside
 * the scenario's folder tree (symbolic links resolved), plain decimal cells only, a located problem for
 * broken quoting (RFC 4180, section 2: a quoted field ends at its closing double quote; rule numbers
 * from memory), and
 * problems that echo at most the offending cell, sanitised. Every problem sits at the profile's file key
 * (line 8, column 25 of the scenario). All files here are invented for the tests.
 */
class ProfileTableSafetyTest {
    private static final String CRAFT = ProblemAssertions.LEGS.replace("  home: {}\n",
            "  home: {}\n  aside: {position: [0 m, 1e9 m, 0 m]}\n");
    private static final String HEADER = "clock_s,acceleration_m_s2\n";

    @TempDir
    Path tmp;
    Path folder;

    @BeforeEach
    void folder() throws IOException {
        folder = Files.createDirectories(tmp.resolve("scenario"));
        Files.writeString(tmp.resolve("outside.csv"), HEADER + "0,1\n100,2\n");
    }

    private Path scenario(String file) throws IOException {
        Path s = folder.resolve("s.yaml");
        Files.writeString(s, CRAFT + "      - profile: {file: " + file + "}\n");
        return s;
    }

    private Problem problem(String file, boolean anywhere) throws IOException {
        Path s = scenario(file);
        return ProblemAssertions.onlyProblemAt(() -> ScenarioLoader.load(s, anywhere), 8, 25,
                "craft.lark.legs[0].profile.file");
    }

    private Problem table(String text) throws IOException {
        Files.writeString(folder.resolve("t.csv"), text);
        return problem("t.csv", false);
    }

    @Test
    void tablesOutsideTheScenarioFolderAreRefusedByDefault() throws IOException {
        for (String name : List.of(tmp.resolve("outside.csv").toString(), "../outside.csv")) {
            Problem p = problem(name, false);
            assertTrue(p.message().contains("lies outside the scenario's folder") && p.message().contains("--tables-anywhere"),
                    p.render());
        }
    }

    @Test
    void aSymbolicLinkOutOfTheFolderIsRefused() throws IOException {
        Files.createSymbolicLink(folder.resolve("link.csv"), tmp.resolve("outside.csv"));
        Problem p = problem("link.csv", false);
        assertTrue(p.message().contains("lies outside the scenario's folder"), p.render());
    }

    @Test
    void tablesAnywhereAllowsThemAndTablesBelowTheFolderNeedNoPermission() throws IOException, ScenarioException {
        Mission m = ScenarioLoader.load(scenario("../outside.csv"), true);
        assertEquals(1, m.craft("lark").orElseThrow().legs().size());
        Files.createDirectories(folder.resolve("tables"));
        Files.writeString(folder.resolve("tables/ramp.csv"), HEADER + "0,0\n100,2\n");
        assertEquals(1, ScenarioLoader.load(scenario("tables/ramp.csv"), false).craft("lark").orElseThrow().legs().size());
    }

    @Test
    void aFolderIsNotATable() throws IOException {
        Files.createDirectories(folder.resolve("ramp.csv"));
        assertTrue(problem("ramp.csv", false).message().contains("'ramp.csv' is a folder, not a table"));
    }

    @Test
    void aPipeOrADeviceIsNotATable() throws IOException, InterruptedException {
        assertTrue(problem("/dev/null", true).message().contains("'/dev/null' is not a regular file"));
        Process mk = new ProcessBuilder("mkfifo", folder.resolve("pipe.csv").toString()).start();
        assertEquals(0, mk.waitFor());
        assertTrue(problem("pipe.csv", false).message().contains("'pipe.csv' is not a regular file"));
    }

    @Test
    void aMissingTableIsNotFound() throws IOException {
        assertTrue(problem("absent.csv", false).message().contains("'absent.csv' not found"));
    }

    @Test
    void anUnterminatedQuoteNamesTheFileRowAndColumn() throws IOException {
        Problem p = table(HEADER + "0,1\n10,\"2\n20,3\n");
        assertTrue(p.message().contains("t.csv: row 3, column acceleration_m_s2: a quoted cell is never closed"),
                p.render());
        assertFalse(p.message().contains("CSVException") || p.message().contains("Exception"), p.render());
        Problem h = table("\"clock_s,acceleration_m_s2\n0,1\n");
        assertTrue(h.message().contains("t.csv: row 1 (the header), column number 1: a quoted cell is never closed"),
                h.render());
    }

    /** Java's own number forms (hexadecimal, type suffixes, named non-numbers) are not plain decimals. */
    @ParameterizedTest
    @ValueSource(strings = {"0x1p7", "1d", "2f", "NaN", "Infinity", "1_000", "+.e3"})
    void cellsArePlainDecimalNumbersOnly(String cell) throws IOException {
        Problem p = table(HEADER + "0,1\n10," + cell + "\n");
        assertTrue(p.message().contains("t.csv: row 3, column acceleration_m_s2: expected a number, got '" + cell
                + "' (plain decimals only"), p.render());
    }

    @Test
    void plainDecimalFormsAreRead() throws IOException, ScenarioException {
        Files.writeString(folder.resolve("t.csv"), HEADER + "0,+1\n1.5,-.5\n2.,2e-3\n3,1E+1\n");
        assertEquals(1, ScenarioLoader.load(scenario("t.csv"), false).craft("lark").orElseThrow().legs().size());
    }

    @Test
    void aProblemEchoesOnlyTheOffendingCellEscapedAndCut() throws IOException {
        String cell = "x\u0007\u001b]0;title\u202e" + "y".repeat(500);
        Problem p = table(HEADER + "0,1\n10," + cell + ",secret-neighbour\n");
        String m = p.message();
        assertTrue(m.contains("got 'x\\u0007\\u001b]0;title\\u202eyyyy"), m);
        assertTrue(m.contains("...'"), m);
        assertFalse(m.contains("y".repeat(ProfileTable.MAX_ECHO)), m);
        assertFalse(m.contains("secret-neighbour"), m);
        assertTrue(m.chars().noneMatch(ch -> ch < 0x20 || ch == 0x202e), m);
    }

    @Test
    void aHeaderWithoutTheColumnsEchoesNothingOfTheFile() throws IOException {
        Problem p = table("root:x:0:0:root:/root:/bin/bash\nHOME=/home/someone\n");
        assertTrue(p.message().contains("needs the columns clock_s and acceleration_m_s2"), p.render());
        assertFalse(p.message().contains("root:x") || p.message().contains("HOME="), p.render());
    }

    @Test
    void aTableOfMoreThanTheRowLimitIsRefusedAtTheFirstRowBeyondIt() throws IOException {
        StringBuilder b = new StringBuilder(HEADER);
        for (int i = 0; i <= ProfileTable.MAX_ROWS; i++) {
            b.append(i).append(",1\n");
        }
        Problem p = table(b.toString());
        assertTrue(p.message().contains("t.csv: row " + (ProfileTable.MAX_ROWS + 2) + ": a profile table holds at most "
                + ProfileTable.MAX_ROWS + " samples"), p.render());
    }
}
