package org.nullpath.worldline;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.nullpath.spacetime.Decimal.*;

import java.math.BigDecimal;
import java.util.List;

import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;
import org.nullpath.spacetime.Vec3;

/**
 * A straight-line craft on one open-ended burn against the closed forms of hyperbolic motion (Rindler,
 * <i>Relativity: Special, General, and Cosmological</i>, 2nd ed., 2006; Misner, Thorne &amp; Wheeler,
 * <i>Gravitation</i>, 1973, ch. 6) evaluated in 70-digit decimals:
 * <pre>
 *   eta = eta0 + a u / c,  t - t0 = (c/a)(sinh eta - sinh eta0),  s = (c^2/a)(cosh eta - cosh eta0)
 * </pre>
 * with eta0 = atanh(v0 / c). Required agreement 1e-12 relative over accelerations 1e-9 m/s^2 to
 * 1e6 g0, craft-clock durations 1 s to 100 yr, rapidities up to 50, including a u / c ~ 1e-15.
 */
class CraftAgainstClosedFormsTest {
    private static final double C_MS = 299_792_458.0;
    private static final BigDecimal C = org.nullpath.spacetime.Decimal.C;
    private static final double TOL = 1e-12;

    private static StraightLineCraft craft(double a, double startSpeed, double startTime, double startClock) {
        return StraightLineCraft.of(Vec3.of(1e15, -2e14, 0), Vec3.of(0, 3, 4), startTime, startClock, startSpeed,
                List.of(new LegSpec.Burn(a, new LegSpec.Forever())));
    }

    private record Reference(BigDecimal dt, BigDecimal s, BigDecimal eta) {
    }

    private static Reference reference(double a, double u, double startSpeed) {
        BigDecimal eta0 = atanh(div(of(startSpeed), C));
        BigDecimal x = div(mul(of(a), of(u)), C);
        BigDecimal eta = add(eta0, x);
        BigDecimal dt = mul(div(C, of(a)), sub(sinh(eta), sinh(eta0)));
        BigDecimal s = mul(div(mul(C, C), of(a)), sub(coshMinusOne(eta), coshMinusOne(eta0)));
        return new Reference(dt, s, eta);
    }

    /**
     * Rows: acceleration (m/s^2), craft-clock time into the burn (s), start speed (m/s). Start speeds stay
     * at or below 0.999 c: above that the rapidity of a speed given in m/s is ill-conditioned in doubles
     * (one rounding of v/c moves eta0 by 1e-16 / (1 - beta^2)), which no implementation can undo.
     */
    private static final String ROWS = """
            1e-9,       1,            0
            1e-9,       3155760000,   0
            3e-7,       1,            0
            9.80665,    1,            0
            9.80665,    86400,        0
            9.80665,    31557600,     0
            9.80665,    315576000,    0
            9.80665,    1500000000,   0
            9806650,    1,            0
            9806650,    1500,         0
            -9.80665,   31557600,     0
            -9806650,   1000,         0
            9.80665,    31557600,     149896229
            -9.80665,   31557600,     269813212.2
            1e-9,       3600,         89937737.4
            1e-9,       10000,        -296794533.42
            3e-7,       1,            -149896229
            9806650,    1,            299492665.542
            98066.5,    100000,       -284802835.1
            """;

    @ParameterizedTest(name = "a = {0} m/s^2, u = {1} s, v0 = {2} m/s")
    @CsvSource(textBlock = ROWS)
    void stateAtACraftClockReadingMatchesTheClosedFormsTo1e12(double a, double u, double v0) {
        double t0 = 2.5e8;
        double clock0 = -1e6;
        StraightLineCraft craft = craft(a, v0, t0, clock0);
        // the clock reading is exact in doubles for these rows (clock0 + u, both integers below 2^53)
        LineState s = craft.lineAtClock(clock0 + u);
        Reference ref = reference(a, u, v0);
        BigDecimal t = add(of(t0), ref.dt());
        assertTrue(relativeError(s.timeSeconds(), t) < TOL, () -> "t = " + s.timeSeconds() + " expected " + t);
        assertTrue(relativeError(s.along(), ref.s()) < TOL, () -> "s = " + s.along() + " expected " + ref.s());
        assertTrue(relativeError(s.rapidity(), ref.eta()) < TOL, () -> "eta = " + s.rapidity() + " expected " + ref.eta());
    }

    @ParameterizedTest(name = "a = {0} m/s^2, u = {1} s, v0 = {2} m/s")
    @CsvSource(textBlock = ROWS)
    void offsetsFromTheStartStayExactWhenTheBurnIsFaint(double a, double u, double v0) {
        // with the start at t0 = 0 the mission time is the offset itself, so a u / c ~ 1e-18 must
        // still give t, s to 1e-12 (the difference forms would cancel to zero in doubles)
        StraightLineCraft craft = craft(a, v0, 0, 0);
        LineState s = craft.lineAtClock(u);
        Reference ref = reference(a, u, v0);
        assertTrue(relativeError(s.timeSeconds(), ref.dt()) < TOL, () -> "t = " + s.timeSeconds() + " expected " + ref.dt());
        assertTrue(relativeError(s.along(), ref.s()) < TOL, () -> "s = " + s.along() + " expected " + ref.s());
    }

    @ParameterizedTest(name = "a = {0} m/s^2, u = {1} s, v0 = {2} m/s")
    @CsvSource(textBlock = ROWS)
    void stateAtAMissionTimeMatchesTheClosedFormsTo1e12(double a, double u, double v0) {
        // from t: u = (c/a)(asinh(sinh eta0 + a t / c) - eta0) (Rindler 2006), the mission time given as the
        // double nearest the reference t, and the reference clock re-derived from that double
        StraightLineCraft craft = craft(a, v0, 0, 0);
        double t = reference(a, u, v0).dt().doubleValue();
        BigDecimal eta0 = atanh(div(of(v0), C));
        BigDecimal eta = asinh(add(sinh(eta0), div(mul(of(a), of(t)), C)));
        BigDecimal clock = mul(div(C, of(a)), sub(eta, eta0));
        BigDecimal s = mul(div(mul(C, C), of(a)), sub(coshMinusOne(eta), coshMinusOne(eta0)));
        LineState got = craft.lineAtTime(t);
        assertEquals(t, got.timeSeconds(), 0.0);
        assertTrue(relativeError(got.clock(), clock) < TOL, () -> "clock = " + got.clock() + " expected " + clock);
        assertTrue(relativeError(got.along(), s) < TOL, () -> "s = " + got.along() + " expected " + s);
    }

    @ParameterizedTest(name = "a = {0} m/s^2, u = {1} s, v0 = {2} m/s")
    @CsvSource(textBlock = ROWS)
    void theMissionFramePositionLiesOnTheNormalisedHeading(double a, double u, double v0) {
        // heading (0, 3, 4) normalises to (0, 0.6, 0.8); position = start + s n
        StraightLineCraft craft = craft(a, v0, 0, 0);
        State st = craft.atClock(u);
        double s = reference(a, u, v0).s().doubleValue();
        assertEquals(1e15, st.position().x(), 0.0);
        assertEquals(-2e14 + 0.6 * s, st.position().y(), 1e-12 * Math.max(2e14, Math.abs(s)));
        assertEquals(0.8 * s, st.position().z(), 1e-12 * Math.abs(s));
        assertEquals(0.6, st.direction().y(), 1e-16);
        assertEquals(0.8, st.direction().z(), 1e-16);
        assertEquals(C_MS * Math.abs(Math.tanh(st.rapidity())), st.velocity().norm(), 1e-15 * C_MS);
    }
}
