package org.nullpath.cli;

import org.nullpath.testkit.PlanRun;
import org.nullpath.testkit.ScenarioText;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;

import net.jqwik.api.Arbitraries;
import net.jqwik.api.Arbitrary;
import net.jqwik.api.Combinators;
import net.jqwik.api.ForAll;
import net.jqwik.api.Property;
import net.jqwik.api.Provide;
import net.jqwik.api.ShrinkingMode;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

/**
 * Mutated scenarios: whatever is written, check and plan answer with exit 0 or 2 (never a failure of
 * their own, never a stack trace), and a scenario check calls usable is planned.
 */
class MutatedScenariosFuzzTest {
    /** An invented mission touching every section. */
    private static final String BASE = ScenarioText.titled("Fuzz base").epoch("2070-01-01T00:00:00Z")
            .station("pier", "{position: [0 ly, 0 ly, 0 ly]}")
            .station("buoy", "{position: [0 ly, 0.01 ly, 0 ly], velocity: [0 c, 0.1 c, 0 c], clock-offset: 1 d}")
            .craft("skiff", "heading: [1, 0, 0]\nstart-speed: 0.1 c", "burn: {acceleration: 1 g0, duration: 30 d}",
                    "coast: {duration: 10 d}", "burn: {acceleration: -1 g0, until-speed: 0 c}")
            .link("up", "pier", "skiff", """
                    carrier: 8.4 GHz
                    transmitter: {power: 20 kW, antenna: {gain: 70 dBi}, losses: 1 dB}
                    receiver: {antenna: {diameter: 2 m, efficiency: 0.6}, noise-temperature: 300 K}
                    data-rate: 1 kbit/s
                    required-eb-n0: 2 dB
                    """)
            .link("down", "skiff", "pier").link("side", "skiff", "buoy")
            .message("{link: up, first: 0 d, last: 60 d, every: 10 d}").message("{link: down, at: [1 d, 20 d]}")
            .message("{link: side, at: [2 d]}")
            .cutoff("{name: trim, link: up, arrive-by: 40 d}")
            .exchange("{name: ping, query: up, reply: down, turnaround: 1 h, first: 0 d, last: 30 d, every: 15 d}")
            .then("windows:\n  - {link: up, from: 0 d, to: 60 d}")
            .yaml();

    /** Values people and fuzzers write in place of a number. */
    private static final List<String> VALUES = List.of("0", "-1", "1e308", "-1e308", "1e-320", "nan", ".inf", "1e30",
            "0 s", "1e300 yr", "-1e300 s", "1e30 g0", "1e-30 g0", "0.9999999999 c", "1 c", "2 c", "1e40 W", "4000 dBi",
            "1e200 m", "\"\"", "[]", "{}", "~", "true", "2099-01-01T00:00:00Z", "9999999999-01-01T00:00:00Z", "forever",
            "\"\\u001b[31m\"", "=cmd|x", "1e9 yr", "3 days");

    private record Mutation(int at, int kind, String value) {
    }

    @Provide
    Arbitrary<Mutation> mutations() {
        return Combinators.combine(Arbitraries.integers().between(0, BASE.length() - 1), Arbitraries.integers().between(0, 3),
                Arbitraries.of(VALUES)).as(Mutation::new);
    }

    /** Replaces the value after the colon nearest {@code at}, deletes a character, or repeats a line. */
    private static String mutate(Mutation m) {
        String s = BASE;
        return switch (m.kind()) {
            case 0, 1 -> {
                int colon = s.indexOf(": ", m.at());
                if (colon < 0) {
                    yield s;
                }
                int end = colon + 2;
                while (end < s.length() && ",}]\n".indexOf(s.charAt(end)) < 0) {
                    end++;
                }
                yield s.substring(0, colon + 2) + m.value() + s.substring(end);
            }
            case 2 -> s.substring(0, m.at()) + s.substring(m.at() + 1);
            default -> {
                int start = s.lastIndexOf('\n', m.at()) + 1;
                int end = s.indexOf('\n', m.at());
                yield s.substring(0, end + 1) + s.substring(start, end + 1) + s.substring(end + 1);
            }
        };
    }

    private static String[] run(String... args) {
        PlanRun.Outcome o = PlanRun.run(args);
        return new String[] {Integer.toString(o.exitCode()), o.out(), o.err()};
    }

    @Property(tries = 150, shrinking = ShrinkingMode.OFF, seed = "20261202")
    void checkAndPlanAnswerEveryMutatedScenario(@ForAll("mutations") Mutation m) throws IOException {
        Path dir = Files.createTempDirectory("nullpath-fuzz");
        try {
            Path file = dir.resolve("fuzz.yaml");
            String text = mutate(m);
            Files.writeString(file, text);
            String[] check = run("check", file.toString());
            assertTrue(check[0].equals("0") || check[0].equals("2"), "check exit " + check[0] + " for\n" + text
                    + "\n" + check[2]);
            assertFalse(check[2].contains("\tat org.") || check[2].contains("Exception"), check[2]);
            if (check[0].equals("0")) {
                String[] plan = run("plan", file.toString(), "--out", dir.resolve("out").toString(), "--no-report");
                assertEquals("0", plan[0], "check said usable, plan said otherwise, for\n" + text + "\n" + plan[2]);
            }
        } finally {
            try (var walk = Files.walk(dir)) {
                walk.sorted(java.util.Comparator.reverseOrder()).forEach(p -> p.toFile().delete());
            }
        }
    }
}
