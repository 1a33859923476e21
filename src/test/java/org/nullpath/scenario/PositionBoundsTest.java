package org.nullpath.scenario;

import org.junit.jupiter.api.Test;
import org.nullpath.testkit.ScenarioText;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

/**
 * Positions beyond 1e30 m (about 1e14 ly; the observable universe's radius is about 4.4e26 m, from memory)
 * are refused at their key by check, so that plan's light-cone solve (which squares distances) never
 * overflows.
 */
class PositionBoundsTest {
    @Test
    void aStationFartherThanNullpathComputesIsRefusedAtItsPosition() {
        ScenarioText far = ScenarioText.home().station("aside", "{position: [0 m, 1e200 m, 0 m]}");
        ScenarioException e = assertThrows(ScenarioException.class, () -> ScenarioLoader.load(far.yaml(), "far.yaml"));
        assertEquals(1, e.problems().size());
        Problem p = e.problems().get(0);
        assertEquals(far.lineOf("1e200 m"), p.line());
        assertEquals("stations.aside.position", p.key());
        assertTrue(p.message().contains("farther than nullpath computes"), p.message());
    }

    @Test
    void aCraftStartingFartherThanNullpathComputesIsRefusedAtItsStartPosition() {
        ScenarioException e = assertThrows(ScenarioException.class, () -> ScenarioLoader.load(ScenarioText.home()
                .craft("lark", "start-position: [2e30 m, 0 m, 0 m]\nheading: [1, 0, 0]").yaml(), "far.yaml"));
        assertEquals("craft.lark.start-position", e.problems().get(0).key());
    }
}
