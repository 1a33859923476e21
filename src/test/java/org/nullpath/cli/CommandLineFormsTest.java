package org.nullpath.cli;

import org.nullpath.testkit.PlanRun;
import org.nullpath.testkit.ScenarioText;

import java.nio.file.Files;
import java.nio.file.Path;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

/** Short options and every problem of a scenario reported in one pass. */
class CommandLineFormsTest {
    @TempDir
    Path tmp;

    private static String[] run(String... args) {
        PlanRun.Outcome o = PlanRun.run(args);
        return new String[] {Integer.toString(o.exitCode()), o.out(), o.err()};
    }

    @Test
    void dashOIsTheShortFormOfOut() throws Exception {
        Path file = tmp.resolve("plover.yaml");
        Files.writeString(file, ScenarioText.homeAndCraft("plover", "burn: {acceleration: 1 g0, duration: 1 d}")
                .link("up", "home", "plover").message("{link: up, at: [0 s, 1 h]}").yaml());
        String[] r = run("plan", file.toString(), "-o", tmp.resolve("out").toString(), "--no-report");
        assertEquals("0", r[0], r[2]);
        assertTrue(Files.exists(tmp.resolve("out").resolve("up.csv")));
    }

    @Test
    void anOpenEndedLegThatIsNotLastIsReportedBesideTheProblemsOfLaterLegs() throws Exception {
        Path file = tmp.resolve("lark.yaml");
        ScenarioText lark = ScenarioText.homeAndCraft("lark", "burn: {acceleration: 1 g0, duration: forever}",
                "coast: {duration: 1 yr}", "burn: {acceleration: 3 ly, duration: 1 yr}");
        Files.writeString(file, lark.yaml());
        String[] r = run("check", file.toString());
        assertEquals("2", r[0]);
        // "      - burn: {acceleration: 1 g0, duration: forever}": the value of duration starts at column 46
        assertTrue(r[2].contains(":" + lark.lineOf("forever") + ":46: craft.lark.legs[0].burn.duration: an open-ended"
                + " leg (duration: forever) must be the last leg"), r[2]);
        assertTrue(r[2].contains(":" + lark.lineOf("3 ly") + ":30: craft.lark.legs[2].burn.acceleration: expected an"
                + " acceleration, got a length"), r[2]);
    }
}
