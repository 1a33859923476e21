package org.nullpath.scenario;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Arrays;
import java.util.List;
import java.util.Set;
import java.util.TreeSet;
import java.util.stream.Collectors;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.nullpath.worldline.LegSpec;

import static org.junit.jupiter.api.Assertions.assertEquals;

/** The leg table and the leg kinds name each other: every key read gives a leg of that key, and every kind is read. */
class LegTableTest {
    @TempDir
    Path tmp;

    @Test
    void everyLegKindIsReadUnderItsOwnKey() throws Exception {
        Files.writeString(tmp.resolve("ramp.csv"), "clock_s,acceleration_m_s2\n0,1\n100,2\n");
        // invented mission: one leg of every kind, each read under the key it names
        String yaml = """
                stations:
                  yard: {}
                craft:
                  skiff:
                    heading: [1, 0, 0]
                    start-position: [1 km, 0 km, 0 km]
                    legs:
                      - sail: {beam-from: yard, beam-power: 1 GW, mass: 1 kg, beam-off: 10 s}
                      - burn: {acceleration: 1 g0, duration: 1 d}
                      - coast: {duration: 1 d}
                      - rocket: {acceleration: 1 g0, exhaust-speed: 0.1 c, mass-ratio: 2}
                      - rocket: {thrust: 1 MN, initial-mass: 100 t, burnout-mass: 50 t, exhaust-speed: 0.05 c}
                      - profile: {file: ramp.csv}
                """;
        Path file = tmp.resolve("skiff.yaml");
        Files.writeString(file, yaml);
        List<LegSpec> legs = ScenarioLoader.load(file).craft("skiff").orElseThrow().legs();
        assertEquals(List.of("sail", "burn", "coast", "rocket", "rocket", "profile"),
                legs.stream().map(LegSpec::key).toList());
        Set<String> kinds = legs.stream().map(l -> l.getClass().getSimpleName()).collect(Collectors.toCollection(TreeSet::new));
        Set<String> permitted = Arrays.stream(LegSpec.class.getPermittedSubclasses()).map(Class::getSimpleName)
                .filter(n -> !n.equals("LegEnd")).collect(Collectors.toCollection(TreeSet::new));
        assertEquals(permitted, kinds, "one leg of every kind was read");
        assertEquals(new TreeSet<>(LegTable.KEYS), legs.stream().map(LegSpec::key).collect(Collectors.toCollection(TreeSet::new)));
    }
}
