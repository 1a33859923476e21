package org.nullpath.scenario;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.nullpath.scenario.ProblemAssertions.assertProblem;
import static org.nullpath.scenario.ProblemAssertions.onlyProblemOf;
import static org.nullpath.scenario.ProblemAssertions.problemsOf;

import java.util.List;

import org.junit.jupiter.api.Test;

/** Names and references between parts of a scenario: nodes, links, plans, exchanges, windows. */
class ScenarioReferencesTest {

    /** Lines 1-7: two nodes and one link 'up' from home to lark. */
    private static final String BASE = """
            stations:
              home: {}
            craft:
              lark:
                heading: [1, 0, 0]
            links:
              up: {from: home, to: lark}
            """;

    @Test
    void anUnknownNodeInALinkIsReportedWithDidYouMean() {
        Problem p = onlyProblemOf("""
                stations:
                  home: {}
                craft:
                  lark:
                    heading: [1, 0, 0]
                links:
                  up: {from: hme, to: lark}
                """);
        assertProblem(p, 7, 14, "links.up.from", "unknown node 'hme'", "did you mean 'home'?");
    }

    @Test
    void aLinkFromANodeToItselfIsRejected() {
        Problem p = onlyProblemOf("""
                stations:
                  home: {}
                links:
                  loop: {from: home, to: home}
                """);
        assertProblem(p, 4, 26, "links.loop.to", "two different nodes");
    }

    @Test
    void anUnknownLinkInAMessagePlanIsReported() {
        Problem p = onlyProblemOf(BASE + "messages:\n  - {link: upp, at: [1 d]}\n");
        assertProblem(p, 9, 12, "messages[0].link", "unknown link 'upp'", "did you mean 'up'?");
    }

    @Test
    void anUnknownLinkInACutoffIsReported() {
        Problem p = onlyProblemOf(BASE + "cutoffs:\n  - {name: c1, link: dwn, arrive-by: 1 yr}\n");
        assertProblem(p, 9, 22, "cutoffs[0].link", "unknown link 'dwn'", "links defined: up");
    }

    @Test
    void anUnknownLinkInAnExchangeIsReported() {
        Problem p = onlyProblemOf(BASE
                + "exchanges:\n  - {name: ping, query: up, reply: back, turnaround: 1 h, first: 0 d, last: 1 yr,"
                + " every: 30 d}\n");
        assertProblem(p, 9, 36, "exchanges[0].reply", "unknown link 'back'");
    }

    @Test
    void anUnknownLinkInAWindowScanIsReported() {
        Problem p = onlyProblemOf(BASE + "windows:\n  - {link: dn, from: 0 d, to: 1 yr}\n");
        assertProblem(p, 9, 12, "windows[0].link", "unknown link 'dn'");
    }

    @Test
    void aWindowScanNeedsALinkWithLinkTerms() {
        Problem p = onlyProblemOf(BASE + "windows:\n  - {link: up, from: 0 d, to: 1 yr}\n");
        assertProblem(p, 9, 12, "windows[0].link", "no radio or optical terms");
    }

    @Test
    void aWindowScanThatEndsBeforeItStartsIsRejected() {
        List<Problem> all = problemsOf(BASE + "windows:\n  - {link: up, from: 2 yr, to: 1 yr}\n");
        // 'up' has no link terms either: that is the first problem on the line.
        assertEquals(2, all.size(), () -> ProblemAssertions.rendered(all));
        assertProblem(all.get(0), 9, 12, "windows[0].link", "no radio or optical terms");
        assertProblem(all.get(1), 9, 32, "windows[0].to", "ends before it starts");
    }

    @Test
    void anExchangeWhoseReplyDoesNotGoBackIsRejected() {
        Problem p = onlyProblemOf(BASE
                + "  up2: {from: home, to: lark}\n"
                + "exchanges:\n  - {name: ping, query: up, reply: up2, turnaround: 1 h, first: 0 d, last: 1 yr,"
                + " every: 30 d}\n");
        assertProblem(p, 10, 36, "exchanges[0].reply", "must go back from the query's receiver 'lark' to its sender"
                + " 'home'", "link 'up2' goes from 'home' to 'lark'");
    }

    @Test
    void aNegativeTurnaroundIsRejected() {
        Problem p = onlyProblemOf(BASE
                + "  down: {from: lark, to: home}\n"
                + "exchanges:\n  - {name: ping, query: up, reply: down, turnaround: -1 h, first: 0 d, last: 1 yr,"
                + " every: 30 d}\n");
        assertProblem(p, 10, 54, "exchanges[0].turnaround", "must not be negative");
    }

    @Test
    void aZeroEveryIsRejected() {
        Problem p = onlyProblemOf(BASE + "messages:\n  - {link: up, first: 0 d, last: 1 yr, every: 0 d}\n");
        assertProblem(p, 9, 47, "messages[0].every", "every must be a positive time");
    }

    @Test
    void aNegativeEveryInAnExchangeIsRejected() {
        Problem p = onlyProblemOf(BASE
                + "  down: {from: lark, to: home}\n"
                + "exchanges:\n  - {name: ping, query: up, reply: down, turnaround: 1 h, first: 0 d, last: 1 yr,"
                + " every: -30 d}\n");
        assertProblem(p, 10, 90, "exchanges[0].every", "every must be a positive time");
    }

    @Test
    void atMustBeAListOfTimes() {
        Problem p = onlyProblemOf(BASE + "messages:\n  - {link: up, at: 1 d}\n");
        assertProblem(p, 9, 20, "messages[0].at", "expected a list of send times", "got '1 d'");
    }

    @Test
    void atAndASeriesTogetherAreRejected() {
        Problem p = onlyProblemOf(BASE + "messages:\n  - {link: up, at: [1 d], every: 1 d}\n");
        assertProblem(p, 9, 27, "messages[0].every", "either 'at: [times]' or 'first', 'last' and 'every'");
    }

    @Test
    void aSeriesNeedsFirstLastAndEvery() {
        Problem p = onlyProblemOf(BASE + "messages:\n  - {link: up, first: 0 d, every: 1 d}\n");
        assertProblem(p, 9, 5, "messages[0].last", "missing required key 'last'");
    }

    @Test
    void nodeNamesThatAreUnsafeInFileNamesAreRejected() {
        List<Problem> all = problemsOf("""
                stations:
                  home base: {}
                  .hidden: {}
                """);
        assertEquals(2, all.size(), () -> ProblemAssertions.rendered(all));
        assertProblem(all.get(0), 2, 3, "stations.home base", "may use only letters", "'home base'");
        assertProblem(all.get(1), 3, 3, "stations..hidden", "must start with a letter or digit");
    }

    @Test
    void linkNamesThatAreUnsafeInFileNamesAreRejected() {
        List<Problem> all = problemsOf(BASE + "  ../up: {from: home, to: lark}\n  CON: {from: lark, to: home}\n");
        assertEquals(2, all.size(), () -> ProblemAssertions.rendered(all));
        assertProblem(all.get(0), 8, 3, "links.../up", "may use only letters");
        assertProblem(all.get(1), 9, 3, "links.CON", "reserved device name");
    }

    @Test
    void linkNamesThatClashWithOutputFilesAreRejected() {
        List<Problem> all = problemsOf(BASE + "  horizons: {from: home, to: lark}\n  UP: {from: lark, to: home}\n");
        assertEquals(2, all.size(), () -> ProblemAssertions.rendered(all));
        assertProblem(all.get(0), 8, 3, "links.horizons", "taken by nullpath's own output file horizons.csv");
        assertProblem(all.get(1), 9, 3, "links.UP", "'up' and 'UP' differ only in upper and lower case");
    }

    @Test
    void aStationAndACraftWithTheSameNameAreRejected() {
        Problem p = onlyProblemOf("""
                stations:
                  lark: {}
                craft:
                  lark:
                    heading: [1, 0, 0]
                """);
        assertProblem(p, 4, 3, "craft.lark", "'lark' is already a station");
    }

    @Test
    void duplicateCutoffNamesAreRejected() {
        Problem p = onlyProblemOf(BASE + """
                cutoffs:
                  - {name: c1, link: up, arrive-by: 1 yr}
                  - {name: c1, link: up, arrive-by: 2 yr}
                """);
        assertProblem(p, 10, 12, "cutoffs[1].name", "duplicate cut-off name 'c1'", "line 9, column 12");
    }

    @Test
    void duplicateExchangeNamesAreRejectedIgnoringCase() {
        Problem p = onlyProblemOf(BASE + """
                  down: {from: lark, to: home}
                exchanges:
                  - {name: ping, query: up, reply: down, turnaround: 1 h, first: 0 d, last: 1 yr, every: 30 d}
                  - {name: Ping, query: up, reply: down, turnaround: 1 h, first: 0 d, last: 1 yr, every: 30 d}
                """);
        assertProblem(p, 11, 12, "exchanges[1].name", "duplicate exchange name 'Ping'", "ignoring case",
                "line 10, column 12");
    }

    @Test
    void aNodeWithProblemsIsStillKnownToLinksSoOneMistakeGivesOneProblem() {
        Problem p = onlyProblemOf("""
                stations:
                  home:
                    velocity: [1.5 c, 0 c, 0 c]
                craft:
                  lark:
                    heading: [1, 0, 0]
                links:
                  up: {from: home, to: lark}
                """);
        assertProblem(p, 3, 15, "stations.home.velocity", "below c");
    }
}
