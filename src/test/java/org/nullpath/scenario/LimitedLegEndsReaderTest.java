package org.nullpath.scenario;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.nullpath.scenario.ProblemAssertions.assertProblem;
import static org.nullpath.scenario.ProblemAssertions.onlyProblemOf;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.nullpath.worldline.LegSpec;

/**
 * until-speed and until-distance on rocket, sail and profile legs, as read from a scenario file: the
 * values land in the leg types, and an end the leg cannot meet before its own limit (or can never
 * meet) is one problem at the end key's file:line:column. Invented craft and stations.
 */
class LimitedLegEndsReaderTest {
    private static final double C = 299_792_458.0;
    private static final double G0 = 9.80665; // standard gravity, CGPM 1901
    private static final double AU = 149_597_870_700.0; // IAU 2012 Resolution B2

    /** Lines 1-7; a leg follows on line 8. */
    private static final String CRAFT = """
            stations:
              home: {}
              aside: {position: [0 m, 1e9 m, 0 m]}
            craft:
              lark:
                heading: [1, 0, 0]
                legs:
            """;

    @TempDir
    Path tmp;

    private static List<LegSpec> legsOf(String leg) throws ScenarioException {
        return ScenarioLoader.load(CRAFT + leg, ProblemAssertions.FILE).craft("lark").orElseThrow().legs();
    }

    @Test
    void rocketsTakeUntilSpeedAndUntilDistance() throws ScenarioException {
        assertEquals(List.of(new LegSpec.Rocket(G0, 0.5 * C, 10, new LegSpec.UntilSpeed(0.6 * C))),
                legsOf("      - rocket: {acceleration: 1 g0, exhaust-speed: 0.5 c, mass-ratio: 10, until-speed: 0.6 c}\n"));
        assertEquals(List.of(new LegSpec.ThrustRocket(2e6, 1e5, 2e4, 0.1 * C, new LegSpec.UntilDistance(AU))),
                legsOf("      - rocket: {thrust: 2 MN, initial-mass: 100 t, burnout-mass: 20 t, exhaust-speed: 0.1 c,"
                        + " until-distance: 1 au}\n"));
    }

    @Test
    void withoutAnEndKeyARocketStillBurnsItsPropellant() throws ScenarioException {
        assertEquals(List.of(new LegSpec.Rocket(G0, 0.5 * C, 10)),
                legsOf("      - rocket: {acceleration: 1 g0, exhaust-speed: 0.5 c, mass-ratio: 10}\n"));
    }

    @Test
    void aRocketSpeedBeyondThePropellantIsRefusedAtItsKey() {
        Problem p = onlyProblemOf(CRAFT
                + "      - rocket: {acceleration: 1 g0, exhaust-speed: 0.5 c, mass-ratio: 10, until-speed: 0.875 c}\n");
        assertProblem(p, 8, 89, "craft.lark.legs[0].rocket.until-speed", "until-speed 0.875 c",
                "not reached before the propellant is spent");
    }

    @Test
    void aThrustRocketDistanceTheWrongWayIsRefusedAtItsKey() {
        Problem p = onlyProblemOf(CRAFT + "      - rocket: {thrust: 2 MN, initial-mass: 100 t, burnout-mass: 20 t,"
                + " exhaust-speed: 0.1 c, until-distance: -1 au}\n");
        assertProblem(p, 8, 111, "craft.lark.legs[0].rocket.until-distance", "until-distance",
                "not reached before the propellant is spent");
    }

    @Test
    void aSailSpeedTheWrongWayIsRefusedAtItsKey() {
        // the station stands behind the craft's start
        Problem p = onlyProblemOf(CRAFT.replace("home: {}", "home: {position: [-1e6 m, 0 m, 0 m]}")
                + "      - sail: {beam-from: home, beam-power: 100 GW, mass: 10 kg, beam-off: 1 d, until-speed: -0.01 c}\n");
        assertProblem(p, 8, 94, "craft.lark.legs[0].sail.until-speed", "until-speed -0.01 c",
                "not reached before the beam's switch-off reaches the sail");
    }

    @Test
    void aSailWithAnEndKeyStillNamesABadBeamStationAtBeamFrom() {
        Problem p = onlyProblemOf(CRAFT
                + "      - sail: {beam-from: aside, beam-power: 100 GW, mass: 10 kg, beam-off: 1 d, until-speed: 0.001 c}\n");
        assertProblem(p, 8, 27, "craft.lark.legs[0].sail.beam-from", "flight line");
    }

    @Test
    void aProfileSpeedNeverReachedIsRefusedAtItsKey() throws IOException {
        Path scenario = tmp.resolve("s.yaml");
        Files.writeString(scenario, CRAFT + "      - profile: {file: ramp.csv, until-speed: 0.5 c}\n");
        Files.writeString(tmp.resolve("ramp.csv"), "clock_s,acceleration_m_s2\n0,0\n100,2\n200,0\n");
        ScenarioException e = assertThrows(ScenarioException.class, () -> ScenarioLoader.load(scenario));
        assertEquals(1, e.problems().size(), () -> ProblemAssertions.rendered(e.problems()));
        Problem p = e.problems().get(0);
        assertEquals(8, p.line(), p.render());
        assertEquals(48, p.column(), p.render());
        assertEquals("craft.lark.legs[0].profile.until-speed", p.key(), p.render());
        assertEquals(true, p.message().contains("not reached before the profile's last sample"), p.render());
    }

    @Test
    void aProfileTakesUntilDistance() throws IOException, ScenarioException {
        Path scenario = tmp.resolve("s.yaml");
        Files.writeString(scenario, CRAFT + "      - profile: {file: ramp.csv, until-distance: 1 km}\n");
        Files.writeString(tmp.resolve("ramp.csv"), "clock_s,acceleration_m_s2\n0,0\n100,2\n200,0\n");
        List<LegSpec> legs = ScenarioLoader.load(scenario).craft("lark").orElseThrow().legs();
        assertEquals(List.of(new LegSpec.Profile(new double[] {0, 100, 200}, new double[] {0, 2, 0},
                new LegSpec.UntilDistance(1000))), legs);
    }

    @Test
    void twoEndsOnOneRocketAreRefused() {
        Problem p = onlyProblemOf(CRAFT + "      - rocket: {acceleration: 1 g0, exhaust-speed: 0.5 c, mass-ratio: 10,"
                + " until-speed: 0.6 c, until-distance: 1 ly}\n");
        assertProblem(p, 8, 96, "craft.lark.legs[0].rocket.until-distance", "given twice");
    }

    @Test
    void aRocketIsNotOfferedADuration() {
        // a rocket ends when its propellant is spent or at until-speed / until-distance; a burn takes durations
        Problem p = onlyProblemOf(CRAFT
                + "      - rocket: {acceleration: 1 g0, exhaust-speed: 0.5 c, mass-ratio: 10, duration: 1 yr}\n");
        assertProblem(p, 8, 76, "craft.lark.legs[0].rocket.duration", "unknown key 'duration'");
    }
}
