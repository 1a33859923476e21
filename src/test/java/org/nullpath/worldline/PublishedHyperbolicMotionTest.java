package org.nullpath.worldline;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.nullpath.spacetime.Decimal.*;

import java.math.BigDecimal;
import java.util.List;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;
import org.nullpath.spacetime.Vec3;
import static org.nullpath.testkit.Si.C;
import static org.nullpath.testkit.Si.G0;
import static org.nullpath.testkit.Si.LY;
import static org.nullpath.testkit.Si.YR;

/**
 * The check values of docs/physics.md ("Check values") for hyperbolic motion from rest, computed there at 50
 * digits from the formulas of
 * Rindler, <i>Relativity: Special, General, and Cosmological</i> (2nd ed., 2006), hyperbolic motion, and
 * Misner, Thorne &amp; Wheeler, <i>Gravitation</i> (1973), ch. 6, with g0 = 9.806 65 m/s^2 (3rd CGPM,
 * 1901), c = 299 792 458 m/s (SI Brochure, 9th ed.) and the Julian year of 31 557 600 s (IAU). Each is
 * checked to the digits given (half a unit in the last quoted digit).
 */
class PublishedHyperbolicMotionTest {
    private static StraightLineCraft fromRest(LegSpec... legs) {
        return StraightLineCraft.of(Vec3.ZERO, Vec3.of(1, 0, 0), 0, 0, 0, List.of(legs));
    }

    /** |actual - quoted| within half a unit of the last quoted digit. */
    private static void assertToQuotedDigits(double quoted, double halfUnit, double actual, String what) {
        assertEquals(quoted, actual, halfUnit, what);
    }

    @Test
    void oneYearAtOneGeeOnTheCraftClockReaches0_774827c() {
        // Rindler 2006 / MTW ch. 6: v = c tanh(a tau / c); docs/physics.md check value 0.774 827 c
        StraightLineCraft craft = fromRest(new LegSpec.Burn(G0, new LegSpec.ClockDuration(YR)));
        LineState end = craft.legs().get(0).end();
        assertToQuotedDigits(0.774827, 5e-7, Math.tanh(end.rapidity()), "v/c after 1 yr craft clock");
        assertEquals(YR, end.clock(), 0.0);
    }

    @Test
    void oneYearOfMissionTimeAtOneGeeReaches0_718253c() {
        // Rindler 2006: v(t) = a t / sqrt(1 + (a t / c)^2); docs/physics.md check value 0.718 253 c
        StraightLineCraft craft = fromRest(new LegSpec.Burn(G0, new LegSpec.MissionDuration(YR)));
        LineState end = craft.legs().get(0).end();
        assertToQuotedDigits(0.718253, 5e-7, Math.tanh(end.rapidity()), "v/c after 1 yr mission time");
        assertEquals(YR, end.timeSeconds(), 1e-12 * YR);
    }

    @Test
    void cSquaredOverStandardGravityIs0_968715LightYears() {
        // docs/physics.md check value c^2/g0 = 0.968 715 ly; it is also the distance from the origin to the
        // asymptote of a craft that starts at rest there (Rindler 2006: the hyperbola's null asymptote)
        assertToQuotedDigits(0.968715, 5e-7, C * C / G0 / LY, "c^2/g0 in ly");
        StraightLineCraft craft = fromRest(new LegSpec.Burn(G0, new LegSpec.Forever()));
        Asymptote asymptote = craft.asymptote().orElseThrow();
        assertToQuotedDigits(0.968715, 5e-7, asymptote.limitMetres() / LY, "asymptote c t - x in ly");
        assertEquals(C * C / G0, asymptote.limitMetres(), 1e-15 * C * C / G0);
    }

    @Test
    void aThousandLightYearsFromRestTakes1000_968YearsOfMissionTimeAnd7_39484YearsOfCraftClock() {
        // docs/physics.md check values: 1000.968 yr mission time, 7.394 84 yr craft clock (until-distance leg)
        StraightLineCraft craft = fromRest(new LegSpec.Burn(G0, new LegSpec.UntilDistance(1000 * LY)));
        LineState end = craft.legs().get(0).end();
        assertToQuotedDigits(1000.968, 5e-4, end.timeSeconds() / YR, "mission time in yr");
        assertToQuotedDigits(7.39484, 5e-6, end.clock() / YR, "craft clock in yr");
        assertEquals(1000 * LY, end.along(), 1e-12 * 1000 * LY);
    }

    /** Textbook from-rest forms of Rindler (2006), in 70-digit decimals. */
    private static BigDecimal textbookSpeedOverC(BigDecimal a, BigDecimal t) {
        BigDecimal x = div(mul(a, t), C_DEC);
        return div(x, sqrt(add(BigDecimal.ONE, mul(x, x))));
    }

    private static BigDecimal textbookDistance(BigDecimal a, BigDecimal t) {
        BigDecimal x = div(mul(a, t), C_DEC);
        return mul(div(mul(C_DEC, C_DEC), a), sub(sqrt(add(BigDecimal.ONE, mul(x, x))), BigDecimal.ONE));
    }

    private static final BigDecimal C_DEC = org.nullpath.spacetime.Decimal.C;

    @ParameterizedTest(name = "a = {0} m/s^2, t = {1} s")
    @CsvSource({
            "9.80665, 1",          // 1 s at 1 g0
            "9.80665, 86400",      // 1 day
            "9.80665, 2592000",    // 30 days
            "9.80665, 31557600",   // 1 yr: v = 0.718 253 c
            "9.80665, 157788000",  // 5 yr
            "9.80665, 631152000",  // 20 yr
            "1e-9, 3600",          // a faint push: v ~ a t
            "98066.5, 600",        // 1e4 g0 for 10 min
            "9806650, 3600",       // 1e6 g0 for 1 h
    })
    void speedAndDistanceFromRestFollowTheTextbookFormsInMissionTime(double a, double t) {
        // Rindler 2006, hyperbolic motion: v(t) = a t / sqrt(1 + (a t/c)^2), s = (c^2/a)(sqrt(1 + (a t/c)^2) - 1)
        StraightLineCraft craft = fromRest(new LegSpec.Burn(a, new LegSpec.Forever()));
        LineState s = craft.lineAtTime(t);
        BigDecimal beta = textbookSpeedOverC(of(a), of(t));
        BigDecimal dist = textbookDistance(of(a), of(t));
        assertTrue(relativeError(Math.tanh(s.rapidity()), beta) < 1e-12,
                () -> "v/c = " + Math.tanh(s.rapidity()) + " expected " + beta);
        assertTrue(relativeError(s.along(), dist) < 1e-12, () -> "s = " + s.along() + " expected " + dist);
        assertEquals(t, s.timeSeconds(), 0.0);
    }
}
