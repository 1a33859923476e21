package org.nullpath.scenario;

import java.io.IOException;
import java.nio.file.Path;
import java.util.List;

import org.apache.commons.csv.CSVRecord;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.nullpath.testkit.PlanRun;
import org.nullpath.testkit.ScenarioText;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.nullpath.scenario.ProblemAssertions.assertProblem;
import static org.nullpath.scenario.ProblemAssertions.onlyProblemOf;
import static org.nullpath.testkit.Si.C;
import static org.nullpath.testkit.Si.G0;

/**
 * Requests beyond what double precision can hold: a craft on an open-ended burn at 1 g0 from rest passes
 * rapidity 700 at craft clock 700 c / g0 = 2.14e10 s (about 678 yr), where cosh and sinh overflow; sends,
 * deadlines, queries and scans past that are refused at their place in the file.
 */
class RangeProblemsTest {
    /** Lines 1-10: home, kite on an open-ended burn at 1 g0, links down and up; line 11 on follows. */
    private static final String BASE = ScenarioText.homeAndCraft("kite", "burn: {acceleration: 1 g0, duration: forever}")
            .link("down", "kite", "home")
            .link("up", "home", "kite")
            .yaml();

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
    void sendsWellInsideTheRangeArePlannedAndKeepTheirDigits(@TempDir Path tmp) throws IOException {
        // 300 yr of craft clock at 1 g0 is rapidity eta = g0 tau / c = 309.7: the downlink to a station at rest on
        // the line behind is received with D = exp(-eta) (Einstein 1905 for a receding source, eta = a tau / c in
        // hyperbolic motion, Rindler 2006), about 3e-135, and a frequency offset D - 1 = -1 to double precision
        assertDownlinkDopplerIsExpOfMinusRapidity(tmp, 300);
    }

    @Test
    void sendsNearTheEndOfTheAcceptedRangeArePlannedToo(@TempDir Path tmp) throws IOException {
        assertDownlinkDopplerIsExpOfMinusRapidity(tmp, 600);
    }

    private static void assertDownlinkDopplerIsExpOfMinusRapidity(Path tmp, int years) throws IOException {
        Path out = PlanRun.plan(tmp, "ok", BASE + "messages:\n  - {link: down, at: [1 yr, " + years + " yr]}\n");
        List<CSVRecord> rows = PlanRun.csv(out.resolve("down.csv"));
        assertEquals(2, rows.size());
        for (CSVRecord r : rows) {
            double tau = Double.parseDouble(r.get("send_clock_s"));
            double expected = Math.exp(-G0 * tau / C);
            assertEquals("delivered", r.get("status"));
            assertEquals(expected, Double.parseDouble(r.get("doppler")), 1e-12 * expected, "D at clock " + tau);
            assertEquals(Math.expm1(-G0 * tau / C), Double.parseDouble(r.get("frequency_offset")),
                    1e-12 * -Math.expm1(-G0 * tau / C), "D - 1 at clock " + tau);
        }
        assertEquals(years * 31_557_600.0, Double.parseDouble(rows.get(1).get("send_clock_s")), 0.0);
    }
}
