package org.nullpath.scenario;

import java.time.Duration;
import java.time.Instant;
import java.util.List;

import org.junit.jupiter.api.Test;
import org.nullpath.mission.MessagePlan;
import org.nullpath.mission.Mission;
import org.nullpath.testkit.ScenarioText;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

/**
 * With an epoch, deadlines and send times may be written as calendar instants: each is the reading of that
 * node's clock at the mission time of the instant. For a craft at constant proper acceleration a from rest
 * at mission time 0, its clock then reads (c / a) asinh(a t / c) (hyperbolic motion, Rindler 2006).
 */
class CalendarTimesTest {
    private static final ScenarioText OSPREY = ScenarioText.untitled().station("quay", "{}")
            .craft("osprey", "heading: [1, 0, 0]", "burn: {acceleration: 1 g0, duration: 2 yr}")
            .link("up", "quay", "osprey").link("down", "osprey", "quay")
            .message("{link: up, at: [2071-05-02T00:00:00Z, 3 d]}")
            .message("{link: down, first: 2071-06-01T00:00:00Z, last: 2071-07-01T00:00:00Z, every: 10 d}")
            .cutoff("{name: trim, link: up, arrive-by: 2072-01-01T00:00:00Z}");
    private static final String SCENARIO = "epoch: 2071-05-01T00:00:00Z\n" + OSPREY.yaml();

    private static double craftClock(double t) {
        double a = 9.80665; // g0 (3rd CGPM 1901)
        double c = 299_792_458.0; // SI 2019
        return c / a * Math.log(a * t / c + Math.sqrt(1 + (a * t / c) * (a * t / c))); // asinh
    }

    private static double seconds(String from, String to) {
        Duration d = Duration.between(Instant.parse(from), Instant.parse(to));
        return d.getSeconds() + d.getNano() * 1e-9;
    }

    @Test
    void aCalendarInstantIsTheNodesClockReadingThen() throws Exception {
        Mission m = ScenarioLoader.load(SCENARIO, "osprey.yaml");
        // the station's clock is its proper time: one day after the epoch reads 86 400 s
        assertEquals(List.of(86_400.0, 3 * 86_400.0), ((MessagePlan.At) m.messages().get(0)).clocks());
        MessagePlan.Series down = (MessagePlan.Series) m.messages().get(1);
        double t1 = seconds("2071-05-01T00:00:00Z", "2071-06-01T00:00:00Z");
        double t2 = seconds("2071-05-01T00:00:00Z", "2071-07-01T00:00:00Z");
        assertEquals(craftClock(t1), down.first(), 1e-9 * craftClock(t1));
        assertEquals(craftClock(t2), down.last(), 1e-9 * craftClock(t2));
        double t3 = seconds("2071-05-01T00:00:00Z", "2072-01-01T00:00:00Z");
        assertEquals(craftClock(t3), m.cutoffs().get(0).arriveBy(), 1e-9 * craftClock(t3));
    }

    @Test
    void aCalendarInstantWithoutAnEpochIsRefusedAtItsPlace() {
        ScenarioException e = assertThrows(ScenarioException.class,
                () -> ScenarioLoader.load(SCENARIO.replace("epoch: 2071-05-01T00:00:00Z\n", ""), "osprey.yaml"));
        Problem p = e.problems().stream().filter(x -> x.key().equals("cutoffs[0].arrive-by")).findFirst().orElseThrow();
        assertEquals(OSPREY.lineOf("arrive-by"), p.line());
        assertTrue(p.message().contains("needs an 'epoch'"), p.message());
        assertEquals(4, e.problems().size(), e.problems().toString()); // one per instant written
    }
}
