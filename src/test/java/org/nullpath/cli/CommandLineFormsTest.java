package org.nullpath.cli;

import java.io.ByteArrayOutputStream;
import java.io.PrintStream;
import java.nio.charset.StandardCharsets;
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
        PrintStream oldOut = System.out;
        PrintStream oldErr = System.err;
        ByteArrayOutputStream out = new ByteArrayOutputStream();
        ByteArrayOutputStream err = new ByteArrayOutputStream();
        try {
            System.setOut(new PrintStream(out, true, StandardCharsets.UTF_8));
            System.setErr(new PrintStream(err, true, StandardCharsets.UTF_8));
            int code = Main.run(args);
            return new String[] {Integer.toString(code), out.toString(StandardCharsets.UTF_8),
                err.toString(StandardCharsets.UTF_8)};
        } finally {
            System.setOut(oldOut);
            System.setErr(oldErr);
        }
    }

    @Test
    void dashOIsTheShortFormOfOut() throws Exception {
        Path file = tmp.resolve("plover.yaml");
        Files.writeString(file, """
                stations:
                  cape: {}
                craft:
                  plover:
                    heading: [1, 0, 0]
                    legs:
                      - burn: {acceleration: 1 g0, duration: 1 d}
                links:
                  up: {from: cape, to: plover}
                messages:
                  - {link: up, at: [0 s, 1 h]}
                """);
        String[] r = run("plan", file.toString(), "-o", tmp.resolve("out").toString(), "--no-report");
        assertEquals("0", r[0], r[2]);
        assertTrue(Files.exists(tmp.resolve("out").resolve("up.csv")));
    }

    @Test
    void anOpenEndedLegThatIsNotLastIsReportedBesideTheProblemsOfLaterLegs() throws Exception {
        Path file = tmp.resolve("lark.yaml");
        Files.writeString(file, """
                stations:
                  home: {}
                craft:
                  lark:
                    heading: [1, 0, 0]
                    legs:
                      - burn: {acceleration: 1 g0, duration: forever}
                      - coast: {duration: 1 yr}
                      - burn: {acceleration: 3 ly, duration: 1 yr}
                """);
        String[] r = run("check", file.toString());
        assertEquals("2", r[0]);
        assertTrue(r[2].contains(":7:46: craft.lark.legs[0].burn.duration: an open-ended leg (duration: forever) must be"
                + " the last leg"), r[2]);
        assertTrue(r[2].contains(":9:30: craft.lark.legs[2].burn.acceleration: expected an acceleration, got a length"),
                r[2]);
    }
}
