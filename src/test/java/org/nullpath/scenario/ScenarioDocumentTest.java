package org.nullpath.scenario;

import org.junit.jupiter.api.Test;
import org.nullpath.mission.Mission;
import org.nullpath.units.Constants;
import org.nullpath.worldline.LegSpec;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

/** One loaded scenario resolved again with one value replaced, as a trade study does. */
class ScenarioDocumentTest {
    private static final String TEXT = """
            title: Wren replacement trials
            stations:
              base: {}
            craft:
              wren.2:
                heading: [1, 0, 0]
                legs:
                  - burn: {acceleration: 1 g0, duration: 1 yr}
            links:
              down: {from: wren.2, to: base}
            messages:
              - {link: down, first: 0 d, last: 10 d, every: 1 d}
            """;

    @Test
    void aProblemFoundWhileComputingIsPlacedAtTheDeepestValueOfItsKeyPath() throws Exception {
        ScenarioDocument doc = ScenarioDocument.of(TEXT, "wren.yaml");
        // lines and columns counted in TEXT above (1-based): "  down:" is line 10, its key at column 3
        assertEquals(new Problem("wren.yaml", 10, 3, "links.down", "m"), doc.problemAt("links.down", "m"));
        // "  - {link: down, ...}": the list item is the flow mapping at line 12, column 5
        assertEquals(new Problem("wren.yaml", 12, 5, "messages[0]", "m"), doc.problemAt("messages[0]", "m"));
        // a path that goes on past the document stops at the deepest key written: "legs:" at line 7, column 5
        assertEquals(new Problem("wren.yaml", 7, 5, "craft.wren.2.legs[3]", "m"), doc.problemAt("craft.wren.2.legs[3]", "m"));
        // nothing of the path in the document: no line
        assertEquals(new Problem("wren.yaml", 0, 0, "windows", "m"), doc.problemAt("windows", "m"));
    }

    @Test
    void aReplacedValueIsResolvedInSiAndTheOriginalIsUnchanged() throws Exception {
        ScenarioDocument doc = ScenarioDocument.of(TEXT, "wren.yaml");
        ScenarioDocument half = doc.with("craft.wren.2.legs[0].burn.acceleration", "0.5 g0");
        // 0.5 g0 = 4.903325 m/s^2 (g0 = 9.806 65 m/s^2, 3rd CGPM 1901)
        assertEquals(new LegSpec.Burn(4.903325, new LegSpec.ClockDuration(Constants.JULIAN_YEAR)),
                half.resolve().craft("wren.2").orElseThrow().legs().get(0));
        assertEquals(9.80665, doc.resolve().craft("wren.2").orElseThrow().legs().get(0)
                .accelerationMetresPerSecond2());
        // 11 messages, 1 d apart, from 0 d to 10 d inclusive
        assertEquals(11, doc.resolve().plannedMessages());
        assertEquals(21, doc.with("messages[0].last", "20 d").resolve().plannedMessages());
    }

    @Test
    void theMissionSaysWhichValuesWereReplaced() throws Exception {
        ScenarioDocument doc = ScenarioDocument.of(TEXT, "wren.yaml");
        Mission m = doc.with("messages[0].last", "20 d").with("craft.wren.2.start-speed", "0.1 c")
                .with("messages[0].last", "30 d").resolve();
        assertEquals(java.util.List.of("messages[0].last", "craft.wren.2.start-speed"),
                java.util.List.copyOf(m.source().replaced().keySet()));
        assertEquals("30 d", m.source().replaced().get("messages[0].last"));
        assertTrue(doc.resolve().source().replaced().isEmpty());
        assertEquals(TEXT, m.source().text());
    }

    @Test
    void aKeyMissingFromAnExistingMappingIsAdded() throws Exception {
        ScenarioDocument doc = ScenarioDocument.of(TEXT, "wren.yaml");
        assertFalse(doc.has("craft.wren.2.start-speed"));
        Mission m = doc.with("craft.wren.2.start-speed", "0.25 c").resolve();
        // speed 0.25 c: rapidity atanh(0.25) = 0.255412811882995...
        assertEquals(0.2554128118829953, m.craft("wren.2").orElseThrow().worldline().lineAtClock(-1).rapidity(),
                1e-15);
    }

    @Test
    void aProblemInAReplacedValueIsReportedAtThePlaceOfTheValueItReplaces() throws Exception {
        ScenarioDocument doc = ScenarioDocument.of(TEXT, "wren.yaml");
        ScenarioException e = assertThrows(ScenarioException.class,
                () -> doc.with("craft.wren.2.legs[0].burn.acceleration", "3 ly").resolve());
        assertEquals(1, e.problems().size());
        Problem p = e.problems().get(0);
        // "      - burn: {acceleration: 1 g0, ..." is line 8; its value starts at column 30
        assertEquals(8, p.line());
        assertEquals(30, p.column());
        assertEquals("craft.wren.2.legs[0].burn.acceleration", p.key());
        // the same problem, at the same place, as when the value is written there in the file
        ScenarioException written = assertThrows(ScenarioException.class,
                () -> ScenarioLoader.load(TEXT.replace("acceleration: 1 g0", "acceleration: 3 ly"), "wren.yaml"));
        assertEquals(written.problems(), e.problems());
    }

    @Test
    void aKeyPathThatLeadsNowhereIsRefused() throws Exception {
        ScenarioDocument doc = ScenarioDocument.of(TEXT, "wren.yaml");
        assertTrue(doc.has("links.down.from"));
        assertFalse(doc.has("links.up.from"));
        assertThrows(ScenarioException.class, () -> doc.with("links.up.from", "base"));
        assertThrows(ScenarioException.class, () -> doc.with("craft.wren.2.legs[3].burn.acceleration", "1 g0"));
        assertThrows(ScenarioException.class, () -> doc.with("title", "[a, b]"));
    }
}
