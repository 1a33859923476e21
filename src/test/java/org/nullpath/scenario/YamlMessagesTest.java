package org.nullpath.scenario;

import org.junit.jupiter.api.Test;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

/** YAML the reader cannot take is explained in the scenario's words, not the parser's. */
class YamlMessagesTest {
    @Test
    void anAliasToASingleValueSaysWhatIsTakenInstead() {
        ScenarioException e = assertThrows(ScenarioException.class, () -> ScenarioLoader.load(
                "stations:\n  home: {clock-offset: &off 1 d}\n  away: {clock-offset: *off}\n", "alias.yaml"));
        Problem p = e.problems().get(0);
        assertEquals(3, p.line());
        assertEquals("stations.away.clock-offset", p.key());
        assertTrue(p.message().contains("anchors on mappings and lists, not on single values"), p.message());
    }

    @Test
    void aListAsAMappingKeyIsExplainedWithoutParserInternals() {
        ScenarioException e = assertThrows(ScenarioException.class,
                () -> ScenarioLoader.load("stations:\n  ? [a, b]\n  : {}\n", "key.yaml"));
        Problem p = e.problems().get(0);
        assertEquals(2, p.line());
        assertEquals("a mapping key must be a plain name, not a list or a mapping", p.message());
        assertFalse(p.render().contains("org.yaml"), p.render());
    }
}
