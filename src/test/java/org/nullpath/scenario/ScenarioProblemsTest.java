package org.nullpath.scenario;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.nullpath.scenario.ProblemAssertions.assertProblem;
import static org.nullpath.scenario.ProblemAssertions.onlyProblemOf;
import static org.nullpath.scenario.ProblemAssertions.problemsOf;

import java.util.List;

import org.junit.jupiter.api.Test;

/**
 * Bad values, keys, names and legs each give one clear problem at the offending text. Lines and columns
 * are 1-based; the column is that of the value (or of the key, for key problems).
 */
class ScenarioProblemsTest {

    /** Lines 1-6 of most cases here; a leg follows on line 7. */
    private static final String CRAFT = """
            stations:
              home: {}
            craft:
              lark:
                heading: [1, 0, 0]
                legs:
            """;

    @Test
    void aProblemRendersAsFileLineColumnKeyAndMessage() {
        Problem p = onlyProblemOf(CRAFT + "      - burn: {acceleration: 4 ly, duration: 1 yr}\n");
        assertEquals("scenario.yaml:7:30: craft.lark.legs[0].burn.acceleration: expected an acceleration, got a"
                + " length ('4 ly')", p.render());
    }

    @Test
    void wrongUnitDimensionSaysWhatWasExpectedAndWhatWasGot() {
        Problem p = onlyProblemOf(CRAFT + "      - burn: {acceleration: 4 ly, duration: 1 yr}\n");
        assertProblem(p, 7, 30, "craft.lark.legs[0].burn.acceleration", "expected an acceleration",
                "got a length ('4 ly')");
    }

    @Test
    void aPlainNumberWhereAQuantityIsExpectedAsksForAUnit() {
        Problem p = onlyProblemOf(CRAFT + "      - coast: {duration: 5}\n");
        // "      - coast: {" is 16 characters; "duration: " 10 more.
        assertProblem(p, 7, 27, "craft.lark.legs[0].coast.duration", "expected a time with a unit", "'5'");
    }

    @Test
    void anUnknownUnitIsReportedWithTheClosestKnownOne() {
        Problem p = onlyProblemOf(CRAFT + "      - coast: {duration: 2 yrs}\n");
        assertProblem(p, 7, 27, "craft.lark.legs[0].coast.duration", "unknown unit 'yrs'", "did you mean 'yr'?");
    }

    @Test
    void unknownKeyIsReportedWithDidYouMean() {
        Problem p = onlyProblemOf("""
                stations:
                  home:
                    positon: [0 ly, 0 ly, 0 ly]
                """);
        assertProblem(p, 3, 5, "stations.home.positon", "unknown key 'positon'", "did you mean 'position'?");
    }

    @Test
    void aMisspeltRequiredKeyIsReportedOnceNotAlsoAsMissing() {
        Problem p = onlyProblemOf(CRAFT + "      - burn: {acceleraton: 1 g0, duration: 1 yr}\n");
        assertProblem(p, 7, 16, "craft.lark.legs[0].burn.acceleraton", "did you mean 'acceleration'?");
    }

    @Test
    void unknownKeyFarFromAnyListsTheKeysAllowedThere() {
        Problem p = onlyProblemOf("""
                stations:
                  home: {}
                colour: green
                """);
        assertProblem(p, 3, 1, "colour", "unknown key 'colour'", "allowed here: title, epoch, stations, craft");
    }

    @Test
    void aMissingRequiredKeyIsReportedAtItsMapping() {
        Problem p = onlyProblemOf("""
                stations:
                  home: {}
                  away: {}
                links:
                  out: {from: home}
                """);
        assertProblem(p, 5, 8, "links.out.to", "missing required key 'to'");
    }

    @Test
    void aRepeatedKeyIsReportedWhereItIsRepeated() {
        Problem p = onlyProblemOf("""
                stations:
                  home: {}
                  home: {position: [1 au, 0 au, 0 au]}
                """);
        assertProblem(p, 3, 3, "stations.home", "key 'home' is repeated", "first given at line 2, column 3");
    }

    @Test
    void nanNumbersAreRejected() {
        List<Problem> all = problemsOf("""
                stations:
                  home:
                    clock-offset: NaN s
                craft:
                  lark:
                    heading: [.nan, 0, 0]
                """);
        assertEquals(2, all.size(), () -> ProblemAssertions.rendered(all));
        assertProblem(all.get(0), 3, 19, "stations.home.clock-offset", "non-finite number 'NaN s'");
        assertProblem(all.get(1), 6, 15, "craft.lark.heading[0]", "non-finite number '.nan'");
    }

    @Test
    void infiniteNumbersAreRejected() {
        List<Problem> all = problemsOf("""
                stations:
                  home:
                    clock-offset: .inf
                    position: [1e400 km, 0 km, 0 km]
                """);
        assertEquals(2, all.size(), () -> ProblemAssertions.rendered(all));
        assertProblem(all.get(0), 3, 19, "stations.home.clock-offset", "non-finite number '.inf'");
        assertProblem(all.get(1), 4, 16, "stations.home.position[0]", "too large to hold", "'1e400 km'");
    }

    @Test
    void aVectorMustHaveThreeComponents() {
        Problem p = onlyProblemOf("""
                stations:
                  home:
                    position: [1 au, 0 au]
                """);
        assertProblem(p, 3, 15, "stations.home.position", "expected a list of three lengths", "got a list of 2");
    }

    @Test
    void aStationMovingAtOrAboveTheSpeedOfLightIsRejected() {
        Problem p = onlyProblemOf("""
                stations:
                  home:
                    velocity: [0.8 c, 0.8 c, 0 c]
                """);
        // |v| = sqrt(0.8^2 + 0.8^2) c = 1.131 370 85 c.
        assertProblem(p, 3, 15, "stations.home.velocity", "must be below c", "got 1.13137085 c");
    }

    @Test
    void aStartSpeedOfCIsRejected() {
        Problem p = onlyProblemOf("""
                stations:
                  home: {}
                craft:
                  lark:
                    heading: [1, 0, 0]
                    start-speed: -1 c
                """);
        assertProblem(p, 6, 18, "craft.lark.start-speed", "must be below c in magnitude", "got -1 c");
    }

    @Test
    void anUntilSpeedBeyondCIsRejected() {
        Problem p = onlyProblemOf(CRAFT + "      - burn: {acceleration: -1 g0, until-speed: -1.5 c}\n");
        assertProblem(p, 7, 50, "craft.lark.legs[0].burn.until-speed", "must be below c in magnitude", "got -1.5 c");
    }

    @Test
    void anUntilSpeedTheAccelerationNeverReachesIsReportedAtThatLeg() {
        // After a year at 1 g0 the craft moves at 0.77 c; speeding up further never brings it to 0.5 c.
        Problem p = onlyProblemOf(CRAFT
                + "      - burn: {acceleration: 1 g0, duration: 1 yr}\n"
                + "      - burn: {acceleration: 1 g0, until-speed: 0.5 c}\n");
        assertProblem(p, 8, 49, "craft.lark.legs[1].burn.until-speed", "never reached",
                "points away from it");
    }

    @Test
    void aCoastAtRestNeverCoversADistance() {
        Problem p = onlyProblemOf(CRAFT + "      - coast: {until-distance: 1 ly}\n");
        assertProblem(p, 7, 33, "craft.lark.legs[0].coast.until-distance", "never reached", "at rest");
    }

    @Test
    void anOpenEndedBurnThatIsNotTheLastLegIsRejected() {
        Problem p = onlyProblemOf(CRAFT
                + "      - burn: {acceleration: 1 g0, duration: forever}\n"
                + "      - coast: {duration: 1 yr}\n");
        assertProblem(p, 7, 46, "craft.lark.legs[0].burn.duration", "open-ended leg", "must be the last leg",
                "1 more leg follows");
    }

    @Test
    void aZeroHeadingIsRejected() {
        Problem p = onlyProblemOf("""
                stations:
                  home: {}
                craft:
                  lark:
                    heading: [0, 0, 0]
                """);
        assertProblem(p, 5, 14, "craft.lark.heading", "must not be zero");
    }

    @Test
    void aMissingHeadingIsRequired() {
        Problem p = onlyProblemOf("""
                craft:
                  lark:
                    start-speed: 0.1 c
                """);
        assertProblem(p, 3, 5, "craft.lark.heading", "missing required key 'heading'");
    }

    @Test
    void aHeadingOfQuantitiesIsRejected() {
        Problem p = onlyProblemOf("""
                craft:
                  lark:
                    heading: [1 m, 0, 0]
                """);
        assertProblem(p, 3, 15, "craft.lark.heading[0]", "expected a plain number", "got a length ('1 m')");
    }

    @Test
    void aBurnWithZeroAccelerationIsRejected() {
        Problem p = onlyProblemOf(CRAFT + "      - burn: {acceleration: 0 g0, duration: 1 yr}\n");
        assertProblem(p, 7, 30, "craft.lark.legs[0].burn.acceleration", "non-zero acceleration", "coast");
    }

    @Test
    void aLegWithNoEndIsRejected() {
        Problem p = onlyProblemOf(CRAFT + "      - burn: {acceleration: 1 g0}\n");
        assertProblem(p, 7, 15, "craft.lark.legs[0].burn", "missing the leg's end",
                "duration, duration-mission, until-speed, until-distance");
    }

    @Test
    void aLegWithTwoEndsIsRejected() {
        Problem p = onlyProblemOf(CRAFT + "      - burn: {acceleration: 1 g0, duration: 1 yr, until-speed: 0.5 c}\n");
        assertProblem(p, 7, 52, "craft.lark.legs[0].burn.until-speed", "given twice", "'duration' and 'until-speed'");
    }

    @Test
    void aNegativeDurationIsRejected() {
        Problem p = onlyProblemOf(CRAFT + "      - coast: {duration-mission: -1 d}\n");
        assertProblem(p, 7, 35, "craft.lark.legs[0].coast.duration-mission", "must not be negative");
    }

    @Test
    void aCoastCannotEndOnASpeed() {
        Problem p = onlyProblemOf(CRAFT + "      - coast: {until-speed: 0.5 c}\n");
        assertProblem(p, 7, 17, "craft.lark.legs[0].coast.until-speed", "a coast keeps its speed", "use a burn");
    }

    @Test
    void anUnknownLegTypeIsReportedWithDidYouMean() {
        Problem p = onlyProblemOf(CRAFT + "      - brun: {acceleration: 1 g0, duration: 1 yr}\n");
        assertProblem(p, 7, 9, "craft.lark.legs[0].brun", "unknown leg type 'brun'", "did you mean 'burn'?");
    }

    @Test
    void aLegWithTwoTypesIsRejected() {
        Problem p = onlyProblemOf(CRAFT + "      - {burn: {acceleration: 1 g0, duration: 1 yr}, coast: {duration: 1 yr}}\n");
        assertProblem(p, 7, 54, "craft.lark.legs[0].coast", "a leg has one type", "'burn' and 'coast'");
    }

    @Test
    void anInvalidEpochIsRejected() {
        Problem p = onlyProblemOf("""
                epoch: 2061-03-01
                stations:
                  home: {}
                """);
        assertProblem(p, 1, 8, "epoch", "ISO-8601 instant", "'2061-03-01'");
    }

    @Test
    void aScenarioWithoutStationsOrCraftIsRejected() {
        Problem p = onlyProblemOf("title: nothing here\n");
        assertProblem(p, 1, 1, "", "at least one station or craft");
    }

    @Test
    void aScenarioThatIsNotAMappingIsRejected() {
        Problem p = onlyProblemOf("- home\n- lark\n");
        assertProblem(p, 1, 1, "", "expected a scenario", "got a list of 2");
    }

    @Test
    void aFloodOfProblemsIsListedUpToOneHundredAndThenCounted() {
        StringBuilder b = new StringBuilder("stations:\n");
        for (int i = 0; i < 150; i++) {
            b.append("  s").append(i).append(": {clock-offset: 1 m}\n");
        }
        List<Problem> all = problemsOf(b.toString());
        assertEquals(101, all.size());
        assertProblem(all.get(0), 2, 22, "stations.s0.clock-offset", "expected a time, got a length ('1 m')");
        assertProblem(all.get(100), 0, 0, "", "... and 50 more problems not listed");
    }

    @Test
    void manyProblemsAreCollectedInOnePassInFileOrder() {
        List<Problem> all = problemsOf("""
                stations:
                  home:
                    velocity: [2 c, 0 c, 0 c]
                craft:
                  lark:
                    heading: [1, 0, 0]
                    start-time: 3 parsecs
                    legs:
                      - burn: {acceleration: 1 ly, duration: 1 yr}
                links:
                  up: {from: home, to: lark, extra: 1}
                """);
        assertEquals(4, all.size(), () -> ProblemAssertions.rendered(all));
        assertProblem(all.get(0), 3, 15, "stations.home.velocity", "below c");
        assertProblem(all.get(1), 7, 17, "craft.lark.start-time", "unknown unit 'parsecs'");
        assertProblem(all.get(2), 9, 30, "craft.lark.legs[0].burn.acceleration", "got a length");
        assertProblem(all.get(3), 11, 30, "links.up.extra", "unknown key 'extra'");
    }
}
