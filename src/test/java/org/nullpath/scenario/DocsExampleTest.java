package org.nullpath.scenario;

import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;

import org.junit.jupiter.api.Test;
import org.nullpath.mission.Mission;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

/** The complete example at the top of docs/scenario-format.md is a valid scenario, read as it says. */
class DocsExampleTest {
    @Test
    void theFormatsCompleteExampleReads() throws Exception {
        String doc = Files.readString(Path.of("docs", "scenario-format.md"), StandardCharsets.UTF_8);
        int start = doc.indexOf("```yaml\n");
        assertTrue(start >= 0, "docs/scenario-format.md has a yaml example");
        String yaml = doc.substring(start + "```yaml\n".length(), doc.indexOf("```", start + 8));
        Mission m = ScenarioLoader.load(yaml, "example.yaml");
        assertEquals("Sandpiper survey, Gannet Station", m.title());
        assertEquals(1, m.stations().size());
        assertEquals(3, m.craft().get(0).legs().size());
        assertTrue(m.links().get("up").terms().isPresent());
        // 2 yr every 20 d: floor(730.5 / 20) + 1 = 37 sends; 2 at; 7 round trips (0 to 360 d every 60 d)
        assertEquals(37 + 2 + 2 * 7, m.plannedMessages());
    }
}
