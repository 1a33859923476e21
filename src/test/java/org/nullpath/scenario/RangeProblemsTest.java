package org.nullpath.scenario;

import org.junit.jupiter.api.Test;

import static org.nullpath.scenario.ProblemAssertions.assertProblem;
import static org.nullpath.scenario.ProblemAssertions.onlyProblemOf;

/**
 * Requests beyond what double precision can hold: a craft on an open-ended burn at 1 g0 from rest passes
 * rapidity 700 at craft clock 700 c / g0 = 2.14e10 s (about 678 yr), where cosh and sinh overflow; sends,
 * deadlines, queries and scans past that are refused at their place in the file.
 */
class RangeProblemsTest {
    private static final String BASE = """
            stations:
              home: {}
            craft:
              kite:
                heading: [1, 0, 0]
                legs:
                  - burn: {acceleration: 1 g0, duration: forever}
            links:
              down: {from: kite, to: home}
              up: {from: home, to: kite}
            """;

    @Test
    void aSendBeyondTheRangeOfDoublesIsRefusedAtItsValue() {
        Problem p = onlyProblemOf(BASE + "messages:\n  - {link: down, at: [1 yr, 800 yr]}\n");
        assertProblem(p, 12, 22, "messages[0].at", "beyond the last clock reading double precision can hold",
                "rapidity 700");
    }

    @Test
    void aSeriesWhoseLastSendIsBeyondTheRangeIsRefusedAtLast() {
        Problem p = onlyProblemOf(BASE + "messages:\n  - {link: down, first: 0 yr, last: 700 yr, every: 100 yr}\n");
        assertProblem(p, 12, 37, "messages[0].last", "the last send");
    }

    @Test
    void aDeadlineBeyondTheRangeIsRefused() {
        Problem p = onlyProblemOf(BASE + "cutoffs:\n  - {name: late, link: up, arrive-by: 700 yr}\n");
        assertProblem(p, 12, 39, "cutoffs[0].arrive-by", "the deadline");
    }

    @Test
    void sendsWellInsideTheRangeAreFine() throws ScenarioException {
        ScenarioLoader.load(BASE + "messages:\n  - {link: down, at: [1 yr, 600 yr]}\n", "ok.yaml");
    }
}
