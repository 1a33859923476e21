package org.nullpath.scenario;

import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;
import org.nullpath.testkit.ScenarioText;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

/**
 * Link terms beyond what a budget in double precision can carry are refused at their key by check, so that
 * plan never meets an infinite value (largest real antennas: about 80 dBi for radio dishes and 140 dBi for
 * optical telescopes, from memory; the bound of 300 dB is far beyond both).
 */
class BudgetBoundsTest {
    private static final ScenarioText LINK = ScenarioText.homeAndCraft("dart", "burn: {acceleration: 1 g0, duration: 1 yr}")
            .link("down", "dart", "home", """
                    carrier: 8.4 GHz
                    transmitter: {power: POWER, antenna: {gain: 40 dBi}, losses: LOSS}
                    receiver: {antenna: {gain: GAIN}, noise-temperature: 20 K}
                    data-rate: 1 kbit/s
                    required-eb-n0: REQ
                    """);

    @ParameterizedTest(name = "{0}")
    @CsvSource(delimiter = '|', textBlock = """
            4000 dBi gain      | GAIN=4000 dBi | receiver:       | links.down.receiver.antenna.gain
            -400 dBi gain      | GAIN=-400 dBi | receiver:       | links.down.receiver.antenna.gain
            1e40 W             | POWER=1e40 W  | transmitter:    | links.down.transmitter.power
            500 dB loss        | LOSS=500 dB   | transmitter:    | links.down.transmitter.losses
            400 dB requirement | REQ=400 dB    | required-eb-n0: | links.down.required-eb-n0
            """)
    void aTermBeyondTheBudgetsRangeIsRefusedAtItsKey(String what, String setting, String lineText, String key) {
        String yaml = LINK.yaml().replace("POWER", "20 W").replace("LOSS", "1 dB").replace("GAIN", "70 dBi")
                .replace("REQ", "2 dB");
        String[] kv = setting.split("=");
        String original = switch (kv[0]) {
            case "GAIN" -> "gain: 70 dBi";
            case "POWER" -> "power: 20 W";
            case "LOSS" -> "losses: 1 dB";
            default -> "required-eb-n0: 2 dB";
        };
        String replaced = original.substring(0, original.indexOf(':') + 2) + kv[1];
        ScenarioException e = assertThrows(ScenarioException.class,
                () -> ScenarioLoader.load(yaml.replace(original, replaced), "dart.yaml"));
        assertEquals(1, e.problems().size(), e.problems().toString());
        Problem p = e.problems().get(0);
        assertEquals(LINK.lineOf(lineText), p.line());
        assertEquals(key, p.key());
        assertTrue(p.message().contains("beyond what nullpath budgets"), p.message());
    }
}
