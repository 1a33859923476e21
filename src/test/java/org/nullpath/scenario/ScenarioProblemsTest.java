package org.nullpath.scenario;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.nullpath.scenario.ProblemAssertions.LEGS;
import static org.nullpath.scenario.ProblemAssertions.assertOnlyProblem;
import static org.nullpath.scenario.ProblemAssertions.assertProblem;
import static org.nullpath.scenario.ProblemAssertions.assertProblems;
import static org.nullpath.scenario.ProblemAssertions.at;
import static org.nullpath.scenario.ProblemAssertions.onlyProblemOf;
import static org.nullpath.scenario.ProblemAssertions.problemsOf;
import static org.nullpath.scenario.ProblemAssertions.scenario;

import java.util.List;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

/**
 * Bad values, keys, names and legs each give one clear problem at the offending text. Lines and columns
 * are 1-based; the column is that of the value (or of the key, for key problems).
 */
class ScenarioProblemsTest {

    /**
     * One thing wrong, one problem at its place. {@code base}: {@code legs} puts each line of the text as a leg
     * of craft lark from line 7 on (ProblemAssertions.LEGS), {@code file} takes the text as the whole file. The
     * station moving at [0.8 c, 0.8 c, 0 c] has |v| = sqrt(0.8^2 + 0.8^2) c = 1.131 370 85 c; after a year at 1 g0
     * the craft moves at 0.77 c, so speeding up further never brings it to 0.5 c.
     */
    @ParameterizedTest(name = "{0}")
    @CsvSource(delimiter = '|', quoteCharacter = '"', textBlock = """
        wrong unit dimension          | legs | "burn: {acceleration: 4 ly, duration: 1 yr}" | 7 | 30 | craft.lark.legs[0].burn.acceleration | expected an acceleration ~ got a length ('4 ly')
        plain number for a quantity   | legs | "coast: {duration: 5}" | 7 | 27 | craft.lark.legs[0].coast.duration | expected a time with a unit ~ '5'
        unknown unit                  | legs | "coast: {duration: 2 yrs}" | 7 | 27 | craft.lark.legs[0].coast.duration | unknown unit 'yrs' ~ did you mean 'yr'?
        unknown key                   | file | "stations:\n  home:\n    positon: [0 ly, 0 ly, 0 ly]" | 3 | 5 | stations.home.positon | unknown key 'positon' ~ did you mean 'position'?
        misspelt required key once    | legs | "burn: {acceleraton: 1 g0, duration: 1 yr}" | 7 | 16 | craft.lark.legs[0].burn.acceleraton | did you mean 'acceleration'?
        unknown key far from any      | file | "stations:\n  home: {}\ncolour: green" | 3 | 1 | colour | unknown key 'colour' ~ allowed here: title, epoch, stations, craft
        missing required key          | file | "stations:\n  home: {}\n  away: {}\nlinks:\n  out: {from: home}" | 5 | 8 | links.out.to | missing required key 'to'
        repeated key                  | file | "stations:\n  home: {}\n  home: {position: [1 au, 0 au, 0 au]}" | 3 | 3 | stations.home | key 'home' is repeated ~ first given at line 2, column 3
        vector of two components      | file | "stations:\n  home:\n    position: [1 au, 0 au]" | 3 | 15 | stations.home.position | expected a list of three lengths ~ got a list of 2
        station at or above c         | file | "stations:\n  home:\n    velocity: [0.8 c, 0.8 c, 0 c]" | 3 | 15 | stations.home.velocity | must be below c ~ got 1.13137085 c
        start speed of c              | file | "stations:\n  home: {}\ncraft:\n  lark:\n    heading: [1, 0, 0]\n    start-speed: -1 c" | 6 | 18 | craft.lark.start-speed | must be below c in magnitude ~ got -1 c
        until-speed beyond c          | legs | "burn: {acceleration: -1 g0, until-speed: -1.5 c}" | 7 | 50 | craft.lark.legs[0].burn.until-speed | must be below c in magnitude ~ got -1.5 c
        until-speed never reached     | legs | "burn: {acceleration: 1 g0, duration: 1 yr}\nburn: {acceleration: 1 g0, until-speed: 0.5 c}" | 8 | 49 | craft.lark.legs[1].burn.until-speed | never reached ~ points away from it
        coast at rest covers nothing  | legs | "coast: {until-distance: 1 ly}" | 7 | 33 | craft.lark.legs[0].coast.until-distance | never reached ~ at rest
        open-ended leg not the last   | legs | "burn: {acceleration: 1 g0, duration: forever}\ncoast: {duration: 1 yr}" | 7 | 46 | craft.lark.legs[0].burn.duration | open-ended leg ~ must be the last leg ~ 1 more leg follows
        zero heading                  | file | "stations:\n  home: {}\ncraft:\n  lark:\n    heading: [0, 0, 0]" | 5 | 14 | craft.lark.heading | must not be zero
        missing heading               | file | "craft:\n  lark:\n    start-speed: 0.1 c" | 3 | 5 | craft.lark.heading | missing required key 'heading'
        heading of quantities         | file | "craft:\n  lark:\n    heading: [1 m, 0, 0]" | 3 | 15 | craft.lark.heading[0] | expected a plain number ~ got a length ('1 m')
        burn with zero acceleration   | legs | "burn: {acceleration: 0 g0, duration: 1 yr}" | 7 | 30 | craft.lark.legs[0].burn.acceleration | non-zero acceleration ~ coast
        leg with no end               | legs | "burn: {acceleration: 1 g0}" | 7 | 15 | craft.lark.legs[0].burn | missing the leg's end ~ duration, duration-mission, until-speed, until-distance
        leg with two ends             | legs | "burn: {acceleration: 1 g0, duration: 1 yr, until-speed: 0.5 c}" | 7 | 52 | craft.lark.legs[0].burn.until-speed | given twice ~ 'duration' and 'until-speed'
        negative duration             | legs | "coast: {duration-mission: -1 d}" | 7 | 35 | craft.lark.legs[0].coast.duration-mission | must not be negative
        coast ending on a speed       | legs | "coast: {until-speed: 0.5 c}" | 7 | 17 | craft.lark.legs[0].coast.until-speed | a coast keeps its speed ~ use a burn
        unknown leg type              | legs | "brun: {acceleration: 1 g0, duration: 1 yr}" | 7 | 9 | craft.lark.legs[0].brun | unknown leg type 'brun' ~ did you mean 'burn'?
        leg with two types            | legs | "{burn: {acceleration: 1 g0, duration: 1 yr}, coast: {duration: 1 yr}}" | 7 | 54 | craft.lark.legs[0].coast | a leg has one type ~ 'burn' and 'coast'
        invalid epoch                 | file | "epoch: 2061-03-01\nstations:\n  home: {}" | 1 | 8 | epoch | ISO-8601 instant ~ '2061-03-01'
        no stations or craft          | file | "title: nothing here" | 1 | 1 | "" | at least one station or craft
        not a mapping                 | file | "- home\n- lark" | 1 | 1 | "" | expected a scenario ~ got a list of 2
        """)
    void oneMistakeGivesOneProblemAtItsPlace(String mistake, String base, String text, int line, int column,
                                             String key, String gists) {
        assertOnlyProblem(scenario(base, text), line, column, key, gists);
    }

    @Test
    void aProblemRendersAsFileLineColumnKeyAndMessage() {
        Problem p = onlyProblemOf(LEGS + "      - burn: {acceleration: 4 ly, duration: 1 yr}\n");
        assertEquals("scenario.yaml:7:30: craft.lark.legs[0].burn.acceleration: expected an acceleration, got a"
                + " length ('4 ly')", p.render());
    }

    /** Non-finite numbers: each refused at its value. */
    @ParameterizedTest(name = "{0}")
    @CsvSource(delimiter = '|', quoteCharacter = '"', textBlock = """
        NaN numbers      | "stations:\n  home:\n    clock-offset: NaN s\ncraft:\n  lark:\n    heading: [.nan, 0, 0]" | 3 | 19 | stations.home.clock-offset | non-finite number 'NaN s' | 6 | 15 | craft.lark.heading[0] | non-finite number '.nan'
        infinite numbers | "stations:\n  home:\n    clock-offset: .inf\n    position: [1e400 km, 0 km, 0 km]" | 3 | 19 | stations.home.clock-offset | non-finite number '.inf' | 4 | 16 | stations.home.position[0] | too large to hold ~ '1e400 km'
        """)
    void nonFiniteNumbersAreRejected(String numbers, String text, int line1, int column1, String key1, String gists1,
                                     int line2, int column2, String key2, String gists2) {
        assertProblems(scenario("file", text), at(line1, column1, key1, gists1.split(" ~ ")),
                at(line2, column2, key2, gists2.split(" ~ ")));
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
        assertProblems("""
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
                """,
                at(3, 15, "stations.home.velocity", "below c"),
                at(7, 17, "craft.lark.start-time", "unknown unit 'parsecs'"),
                at(9, 30, "craft.lark.legs[0].burn.acceleration", "got a length"),
                at(11, 30, "links.up.extra", "unknown key 'extra'"));
    }
}
