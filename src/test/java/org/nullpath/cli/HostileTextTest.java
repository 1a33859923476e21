package org.nullpath.cli;

import org.nullpath.testkit.PlanRun;
import org.nullpath.testkit.ScenarioText;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Locale;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

/** Text from a scenario never drives the terminal, splits a problem over lines or becomes a formula. */
class HostileTextTest {
    @TempDir
    Path tmp;

    private static String mission(String title, String cutoffName) {
        return ScenarioText.titled("\"" + title + "\"").station("pier", "{}")
                .craft("gull", "heading: [1, 0, 0]", "burn: {acceleration: 1 g0, duration: 10 d}")
                .link("up", "pier", "gull").message("{link: up, at: [0 s, 1 d]}")
                .cutoff("{name: \"" + cutoffName + "\", link: up, arrive-by: 5 d}").yaml();
    }

    private String[] run(String yaml, String... extra) throws Exception {
        Path file = tmp.resolve("gull.yaml");
        Files.writeString(file, yaml);
        String[] args = new String[extra.length + 2];
        args[0] = extra.length == 0 ? "check" : "plan";
        args[1] = file.toString();
        System.arraycopy(extra, 0, args, 2, extra.length);
        PlanRun.Outcome o = PlanRun.run(args);
        return new String[] {Integer.toString(o.exitCode()), o.out(), o.err()};
    }

    @Test
    void anEscapeSequenceInATitleIsPrintedEscaped() throws Exception {
        String[] r = run(mission("\\u001b[2J\\u001b[31mGull trial", "trim"), "--out", tmp.resolve("o").toString(),
                "--no-report");
        assertEquals("0", r[0], r[2]);
        assertFalse(r[1].contains("\u001b"), "no raw escape character reaches the terminal");
        assertTrue(r[1].startsWith("\\u001B[2J\\u001B[31mGull trial\n"), r[1]);
    }

    @Test
    void aNewlineInACutOffNameIsRefusedOnOneLine() throws Exception {
        String[] r = run(mission("Gull", "late\\nsecond line"));
        assertEquals("2", r[0]);
        assertEquals(1, r[2].lines().count(), r[2]);
        assertTrue(r[2].contains("cutoffs[0].name: a cut-off name may use only letters"), r[2]);
        assertTrue(r[2].contains("late\\u000Asecond line"), r[2]);
    }

    @Test
    void aFormulaCannotBeACutOffName() throws Exception {
        String[] r = run(mission("Gull", "=HYPERLINK(1)"));
        assertEquals("2", r[0]);
        assertTrue(r[2].contains("cutoffs[0].name: a cut-off name may use only letters"), r[2]);
    }

    @Test
    void theTerminalWritesAsciiDigitsWhateverTheLocale() throws Exception {
        Locale before = Locale.getDefault();
        try {
            Locale.setDefault(Locale.forLanguageTag("ar-EG"));
            String[] r = run(mission("Gull", "trim"), "--out", tmp.resolve("o").toString(), "--no-report");
            assertEquals("0", r[0], r[2]);
            assertTrue(r[1].contains("2 messages planned (2 delivered, 0 never arrive)"), r[1]);
            // Arabic-Indic digits U+0660..U+0669 nowhere
            assertTrue(r[1].chars().noneMatch(c -> c >= 0x660 && c <= 0x669), r[1]);
        } finally {
            Locale.setDefault(before);
        }
    }
}
