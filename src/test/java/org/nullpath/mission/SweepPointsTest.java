package org.nullpath.mission;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNotEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.Arrays;
import java.util.List;
import java.util.Map;

import org.junit.jupiter.api.Test;

/**
 * The points of a trade study: the grid in order (every combination, the first key varying slowest), random
 * draws that depend only on the seed and the point number, and their distributions (checked by the sample
 * moments against the laws' own: normal mean and standard deviation, uniform mean (a + b) / 2 and variance
 * (b - a)^2 / 12; textbook facts). Invented keys and values.
 */
class SweepPointsTest {
    private static Sweep.Axis axis(String key, double... xs) {
        return new Sweep.Axis(key, Arrays.stream(xs).mapToObj(x -> Sweep.number(x, "W")).toList());
    }

    private static final List<Sweep.Draw> RANDOM = List.of(new Sweep.Draw("x", Sweep.Law.NORMAL, 5, 2, "K"),
            new Sweep.Draw("y", Sweep.Law.UNIFORM, -1, 3, ""));

    @Test
    void theGridRunsThroughEveryCombinationWithTheFirstKeySlowest() {
        Sweep s = new Sweep("s.yaml", List.of(axis("a", 1, 2), axis("b", 10, 20, 30)), 0, 0, List.of());
        assertEquals(6, s.points());
        StringBuilder seen = new StringBuilder();
        for (long p = 1; p <= 6; p++) {
            Map<String, Sweep.Value> v = s.point(p);
            seen.append(v.get("a").number()).append('/').append(v.get("b").number()).append(' ');
        }
        assertEquals("1.0/10.0 1.0/20.0 1.0/30.0 2.0/10.0 2.0/20.0 2.0/30.0 ", seen.toString());
        assertEquals("2.0 W", s.point(4).get("a").scenarioText());
        assertEquals(List.of("a", "b"), s.keys());
    }

    @Test
    void drawsDependOnlyOnTheSeedAndThePointNumber() {
        Sweep s = new Sweep("s.yaml", List.of(axis("a", 1, 2)), 100, 7, RANDOM);
        assertEquals(200, s.points());
        Map<String, Sweep.Value> later = s.point(150);
        Map<String, Sweep.Value> first = s.point(3);
        assertEquals(first, new Sweep("s.yaml", List.of(axis("a", 1, 2)), 100, 7, RANDOM).point(3));
        assertEquals(later, s.point(150));
        assertNotEquals(first.get("x"), s.point(4).get("x"), "points differ");
        assertNotEquals(first.get("x"), new Sweep("s.yaml", List.of(axis("a", 1, 2)), 100, 8, RANDOM).point(3).get("x"),
                "seeds differ");
        // the grid's first value for points 1..100, its second for 101..200
        assertEquals(1.0, s.point(100).get("a").number());
        assertEquals(2.0, s.point(101).get("a").number());
        assertEquals(List.of("a", "x", "y"), s.keys());
    }

    @Test
    void drawsFollowTheirLaws() {
        int n = 40_000;
        Sweep s = new Sweep("s.yaml", List.of(), n, 20261202, RANDOM);
        double sx = 0;
        double sxx = 0;
        double sy = 0;
        double syy = 0;
        for (long p = 1; p <= n; p++) {
            Map<String, Sweep.Value> v = s.point(p);
            double x = v.get("x").number();
            double y = v.get("y").number();
            assertTrue(y >= -1 && y < 3, "uniform within [low, high)");
            sx += x;
            sxx += x * x;
            sy += y;
            syy += y * y;
        }
        double mx = sx / n;
        double vx = sxx / n - mx * mx;
        double my = sy / n;
        double vy = syy / n - my * my;
        // within 5 standard errors: sd / sqrt(n) for a mean, about var sqrt(2 / n) for a normal variance
        // and var sqrt(0.8 / n) for a uniform one (fourth central moment 9/5 var^2)
        assertEquals(5, mx, 5 * 2 / Math.sqrt(n));
        assertEquals(4, vx, 5 * 4 * Math.sqrt(2.0 / n));
        assertEquals(1, my, 5 * Math.sqrt(16 / 12.0 / n));
        assertEquals(16 / 12.0, vy, 5 * 16 / 12.0 * Math.sqrt(0.8 / n));
        assertTrue(s.point(1).get("x").scenarioText().endsWith(" K"));
        assertEquals(Double.toString(s.point(1).get("y").number()), s.point(1).get("y").scenarioText());
    }
}
