package org.nullpath.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.stream.Stream;

import org.junit.jupiter.api.io.TempDir;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.Arguments;
import org.junit.jupiter.params.provider.MethodSource;
import org.nullpath.testkit.PlanRun;
import org.nullpath.testkit.ScenarioText;

/**
 * Scenarios whose every value reads well but whose computation nullpath cannot carry out: a send or deadline
 * too far out on an open-ended burn (past rapidity 700, where cosh overflows a double) or a figure past the
 * double range (about 1.8e308; IEEE 754 binary64). check computes the whole plan without writing it, so it
 * refuses them as plan does: the same one line, at the file, line, column and key at fault, exit 2, and no
 * output folder. Invented missions.
 */
class CheckAgreesWithPlanTest {
    @TempDir
    Path tmp;

    /** A station ahead on the line and a craft flying at it under a (physically absurd) 1e290 m/s^2 for 1e-280 s. */
    private static ScenarioText headlong() {
        return ScenarioText.titled("Headlong").station("ahead", "{position: [1e29 m, 0 m, 0 m]}")
                .craft("dart", "heading: [1, 0, 0]", "burn: {acceleration: 1e290 m/s^2, duration: 1e-280 s}")
                .link("down", "dart", "ahead", """
                        carrier: 1e15 Hz
                        transmitter: {power: 1 W, antenna: {gain: 10 dBi}}
                        receiver: {antenna: {gain: 10 dBi}, noise-temperature: 300 K}
                        data-rate: 1 kbit/s
                        required-eb-n0: 2 dB
                        """)
                .message("{link: down, first: 0 s, last: 1e-280 s, every: 1e-281 s}");
    }

    /** Station home and craft gull on an open-ended 1 g0 burn. */
    private static ScenarioText openBurn() {
        return ScenarioText.homeAndCraft("gull", "burn: {acceleration: 1 g0, duration: forever}")
                .link("down", "gull", "home").link("up", "home", "gull");
    }

    static Stream<Arguments> cases() {
        return Stream.of(
                // d(f_rx)/d(tau_rx) = f_tx dD/dtau_rx grows as f a / c: 1e15 Hz x 1e290 m/s^2 / c ~ 3e296 Hz/s before
                // the Doppler factor (e^33 at the first messages) multiplies it past 1.8e308
                Arguments.of("doppler-rate", headlong(), "  down:", "links.down", "its Doppler rate is beyond what a"
                        + " double holds"),
                // a send at 1000 yr of craft clock: rapidity g0 tau / c ~ 1032, beyond the 700 nullpath holds
                // (found while reading: the burn's rapidity is known in closed form)
                Arguments.of("far-send", openBurn().message("{link: down, at: [1 d, 1000 yr]}"), "at: [1 d, 1000 yr]",
                        "messages[0].at", "passes rapidity 700"),
                // a deadline at 1000 yr of craft clock (found while reading, as the send above)
                Arguments.of("far-deadline", openBurn().message("{link: down, at: [1 d]}")
                        .cutoff("{name: trim, link: up, arrive-by: 1000 yr}"), "arrive-by: 1000 yr", "cutoffs[0].arrive-by",
                        "passes rapidity 700"));
    }

    @ParameterizedTest(name = "{0}")
    @MethodSource("cases")
    void checkRefusesWhatPlanCannotCompute(String name, ScenarioText scenario, String lineText, String key, String words)
            throws IOException {
        Path file = tmp.resolve(name + ".yaml");
        Files.writeString(file, scenario.yaml());
        Path out = tmp.resolve("out-" + name);
        PlanRun.Outcome check = PlanRun.run("check", file.toString());
        PlanRun.Outcome plan = PlanRun.run("plan", file.toString(), "--out", out.toString(), "--no-report");
        assertEquals(2, check.exitCode(), check.err());
        assertEquals(2, plan.exitCode(), plan.err());
        assertEquals("", check.out());
        List<String> lines = check.err().lines().toList();
        assertEquals(1, lines.size(), check.err());
        assertEquals(check.err(), plan.err(), "check and plan say the same");
        int line = scenario.lineOf(lineText);
        assertTrue(lines.get(0).startsWith(file + ":" + line + ":"), lines.get(0));
        assertTrue(lines.get(0).contains(": " + key + ": "), lines.get(0));
        assertTrue(lines.get(0).contains(words), lines.get(0));
        assertFalse(lines.get(0).contains("Exception"), lines.get(0));
        assertFalse(Files.exists(out), "nothing written");
    }
}
