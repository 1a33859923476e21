package org.nullpath.scenario;

import org.nullpath.mission.Mission;
import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.nullpath.scenario.ProblemAssertions.assertProblem;
import static org.nullpath.scenario.ProblemAssertions.onlyProblemOf;

/** Bad profiled legs (rocket, sail, profile) each give one located problem. */
class ProfiledLegProblemsTest {
    /** Lines 1-7 (home, a station off lark's line, lark's legs); a leg follows on line 8. */
    private static final String CRAFT = ProblemAssertions.LEGS.replace("  home: {}\n",
            "  home: {}\n  aside: {position: [0 m, 1e9 m, 0 m]}\n");

    @TempDir
    Path tmp;

    /** One thing wrong in a rocket or sail leg (line 8), one problem at its value. */
    @ParameterizedTest(name = "{0}")
    @CsvSource(delimiter = '|', quoteCharacter = '"', textBlock = """
        mass ratio of one           | "rocket: {acceleration: 1 g0, exhaust-speed: 0.5 c, mass-ratio: 1}" | 72 | rocket.mass-ratio | greater than 1
        burnout mass not below      | "rocket: {thrust: 2 MN, initial-mass: 20 t, burnout-mass: 20 t, exhaust-speed: 0.1 c}" | 66 | rocket.burnout-mass | below the initial mass
        exhaust speed above light   | "rocket: {acceleration: 1 g0, exhaust-speed: 1.5 c, mass-ratio: 4}" | 53 | rocket.exhaust-speed | ""
        two rocket forms mixed      | "rocket: {acceleration: 1 g0, thrust: 2 MN, exhaust-speed: 0.1 c}" | 46 | rocket.thrust | ""
        beam station off the line   | "sail: {beam-from: aside, beam-power: 100 GW, mass: 10 g, beam-off: 600 s}" | 27 | sail.beam-from | flight line
        unknown beam station        | "sail: {beam-from: hme, beam-power: 100 GW, mass: 10 g, beam-off: 600 s}" | 27 | sail.beam-from | not a station ~ did you mean 'home'?
        reflectivity above one      | "sail: {beam-from: home, beam-power: 1 GW, mass: 1 g, reflectivity: 1.5, beam-off: 60 s}" | 76 | sail.reflectivity | ""
        """)
    void oneMistakeInAProfiledLegGivesOneProblemAtItsValue(String mistake, String leg, int column, String key,
                                                          String gists) {
        ProblemAssertions.assertOnlyProblem(CRAFT + "      - " + leg + "\n", 8, column, "craft.lark.legs[0]." + key, gists);
    }

    @Test
    void aBeamStationAheadOfTheSailIsRejected() {
        String yaml = CRAFT.replace("aside: {position: [0 m, 1e9 m, 0 m]}", "ahead: {position: [1e9 m, 0 m, 0 m]}")
                + "      - sail: {beam-from: ahead, beam-power: 100 GW, mass: 10 g, beam-off: 600 s}\n";
        Problem p = onlyProblemOf(yaml);
        assertProblem(p, 8, 27, "craft.lark.legs[0].sail.beam-from", "behind the craft");
    }


    private Problem profileProblem(String table) throws IOException {
        Path scenario = tmp.resolve("s.yaml");
        Files.writeString(scenario, CRAFT + "      - profile: {file: ramp.csv}\n");
        if (table != null) {
            Files.writeString(tmp.resolve("ramp.csv"), table);
        }
        return ProblemAssertions.onlyProblemAt(() -> ScenarioLoader.load(scenario), 8, 25,
                "craft.lark.legs[0].profile.file");
    }

    @Test
    void aMissingProfileFileIsRejected() throws IOException {
        Problem p = profileProblem(null);
        assertTrue(p.message().contains("'ramp.csv' not found"), p.render());
    }

    @Test
    void anUnsortedProfileNamesTheFileRowAndColumn() throws IOException {
        Problem p = profileProblem("clock_s,acceleration_m_s2\n0,1\n100,2\n50,3\n");
        assertTrue(p.message().contains("ramp.csv: row 4, column clock_s"), p.render());
        assertTrue(p.message().contains("increase strictly"), p.render());
    }

    @Test
    void aNonNumericProfileCellNamesTheFileRowAndColumn() throws IOException {
        Problem p = profileProblem("clock_s,acceleration_m_s2\n0,1\n100,fast\n");
        assertTrue(p.message().contains("ramp.csv: row 3, column acceleration_m_s2: expected a number, got 'fast'"),
                p.render());
    }

    @Test
    void aProfileWithoutItsColumnsIsRejected() throws IOException {
        Problem p = profileProblem("time,accel\n0,1\n100,2\n");
        assertTrue(p.message().contains("clock_s and acceleration_m_s2"), p.render());
    }

    @Test
    void aProfileMustStartAtTheLegStart() throws IOException {
        Problem p = profileProblem("clock_s,acceleration_m_s2\n10,1\n100,2\n");
        assertTrue(p.message().contains("row 2, column clock_s: the first sample must be at clock 0"), p.render());
    }

    @Test
    void aValidProfileLoadsRelativeToTheScenarioFile() throws IOException, ScenarioException {
        Path scenario = tmp.resolve("s.yaml");
        Files.writeString(scenario, CRAFT + "      - profile: {file: ramp.csv}\n");
        Files.writeString(tmp.resolve("ramp.csv"), "clock_s,acceleration_m_s2\n0,0\n100,2\n200,0\n");
        Mission s = ScenarioLoader.load(scenario);
        assertEquals(1, s.craft("lark").orElseThrow().legs().size());
    }
}
