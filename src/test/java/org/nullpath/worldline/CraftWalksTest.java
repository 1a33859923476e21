package org.nullpath.worldline;

import java.math.BigDecimal;
import java.math.MathContext;
import java.util.List;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;
import org.nullpath.reference.RefCraft;
import org.nullpath.reference.RefMath;
import org.nullpath.reference.RefProfiledCraft;
import org.nullpath.reference.RefState;
import org.nullpath.reference.RefWorldline;
import org.nullpath.spacetime.Vec3;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertNotEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.nullpath.testkit.Si.C;
import static org.nullpath.testkit.Si.G0;
import static org.nullpath.testkit.Si.LY;
import static org.nullpath.testkit.Si.YR;

/**
 * Moves along a craft's worldline (by mission time, by clock, by the null coordinates U = c t - along and
 * V = c t + along), across leg boundaries in both directions, against the independent 50-digit reference
 * ({@code RefCraft} for closed-form legs, {@code RefProfiledCraft} for a profiled leg); the asymptote and the
 * last representable clock of open-ended burns against Rindler's hyperbolic motion (Rindler 2006: from rest,
 * rapidity a tau / c, c t - x = (c^2 / a)(1 - e^(-a tau / c)) -> c^2 / a); stations in uniform motion
 * against time dilation (dt = gamma d tau). The craft are invented.
 */
class CraftWalksTest {
    /** The product's tolerance on closed-form legs (docs/physics.md). */
    static final double CLOSED_TOL = 1e-12;
    /** The product's tolerance on integrated (profiled) legs (docs/physics.md). */
    static final double INTEGRATED_TOL = 1e-10;

    static final double[] START = {2e12, -1e12, 5e11};
    static final double[] HEADING = {1, 2, 2};
    static final double T0 = 0.1 * YR;
    static final double TAU0 = 0.05 * YR;
    /** Coasts at 0.1 c before its first leg; burns 0.8 g0 for 0.4 yr, coasts 0.3 yr, brakes at 0.5 g0 for 0.2 yr. */
    static final StraightLineCraft KITE = StraightLineCraft.of(Vec3.of(START[0], START[1], START[2]),
            Vec3.of(HEADING[0], HEADING[1], HEADING[2]), T0, TAU0, 0.1 * C, List.of(
                    new LegSpec.Burn(0.8 * G0, new LegSpec.ClockDuration(0.4 * YR)),
                    new LegSpec.Coast(new LegSpec.ClockDuration(0.3 * YR)),
                    new LegSpec.Burn(-0.5 * G0, new LegSpec.ClockDuration(0.2 * YR))));
    static final RefCraft KITE_REF = RefCraft.start(START, HEADING, T0, TAU0, 0.1 * C)
            .burnForClock(0.8 * G0, 0.4 * YR).coastForClock(0.3 * YR).burnForClock(-0.5 * G0, 0.2 * YR);

    static final double[] PROFILE_CLOCKS = {0, 0.2 * YR, 0.5 * YR};
    static final double[] PROFILE_ACCELERATIONS = {0.2 * G0, 1.5 * G0, -0.4 * G0};
    /** One profiled leg from rest at the origin along +x, then a coast. */
    static final StraightLineCraft LARK = StraightLineCraft.of(Vec3.ZERO, Vec3.of(1, 0, 0), 0, 0, 0,
            List.of(new LegSpec.Profile(PROFILE_CLOCKS, PROFILE_ACCELERATIONS)));
    static final RefProfiledCraft LARK_REF = RefProfiledCraft.profile(null, new double[] {1, 0, 0}, 0, 0, 0,
            PROFILE_CLOCKS, PROFILE_ACCELERATIONS);

    static double[] unitHeading() {
        double n = Math.sqrt(HEADING[0] * HEADING[0] + HEADING[1] * HEADING[1] + HEADING[2] * HEADING[2]);
        return new double[] {HEADING[0] / n, HEADING[1] / n, HEADING[2] / n};
    }

    /** {dt, along, U, V} from the reference state at clock {@code from} to that at {@code to}, at 50 digits. */
    static BigDecimal[] differences(RefWorldline ref, double[] heading, double from, double to) {
        MathContext mc = RefMath.mc();
        RefState a = ref.atClock(RefMath.bd(from));
        RefState b = ref.atClock(RefMath.bd(to));
        BigDecimal dt = b.t().subtract(a.t(), mc);
        BigDecimal along = BigDecimal.ZERO;
        for (int i = 0; i < 3; i++) {
            along = along.add(b.position()[i].subtract(a.position()[i], mc).multiply(RefMath.bd(heading[i]), mc), mc);
        }
        BigDecimal cdt = dt.multiply(RefMath.C, mc);
        return new BigDecimal[] {dt, along, cdt.subtract(along, mc), cdt.add(along, mc)};
    }

    static void close(String what, double actual, BigDecimal expected, double tol) {
        double rel = new BigDecimal(actual).subtract(expected).abs()
                .divide(expected.abs(), MathContext.DECIMAL64).doubleValue();
        assertTrue(rel <= tol, () -> what + ": got " + actual + ", reference " + expected.round(new MathContext(18))
                + " (relative error " + rel + " > " + tol + ")");
    }

    static void close(String what, double actual, double expected, double tol) {
        close(what, actual, new BigDecimal(expected), tol);
    }

    /** Walks from {@code from} to {@code to} (clocks) by each measure and compares every difference. */
    static void assertWalks(StraightLineCraft craft, RefWorldline ref, double[] heading, double from, double to,
                            double tol) {
        BigDecimal[] d = differences(ref, heading, from, to);
        BigDecimal dClock = RefMath.bd(to).subtract(RefMath.bd(from));
        LineState start = craft.lineAtClock(from);
        String at = from / YR + " yr -> " + to / YR + " yr";
        StraightLineCraft.LineWalk byClock = craft.walkClock(start, to - from);
        assertEnd(at + " by clock", craft, ref, heading, byClock.end(), to, tol);
        close(at + " clock by clock", byClock.dClock(), dClock, tol);
        close(at + " dt by clock", byClock.dt(), d[0], tol);
        close(at + " along by clock", byClock.dAlong(), d[1], tol);
        close(at + " U by clock", byClock.dU(), d[2], tol);
        close(at + " V by clock", byClock.dV(), d[3], tol);
        StraightLineCraft.LineWalk[] others = {craft.walkTime(start, d[0].doubleValue()),
            craft.walkU(start, d[2].doubleValue()), craft.walkV(start, d[3].doubleValue())};
        String[] names = {"time", "U", "V"};
        for (int k = 0; k < others.length; k++) {
            StraightLineCraft.LineWalk w = others[k];
            assertFalse(w.never(), at + " by " + names[k]);
            close(at + " clock by " + names[k], w.dClock(), dClock, tol);
            close(at + " dt by " + names[k], w.dt(), d[0], tol);
            close(at + " along by " + names[k], w.dAlong(), d[1], tol);
            assertEnd(at + " by " + names[k], craft, ref, heading, w.end(), to, tol);
            assertTrue(Double.isNaN(w.dU()) && Double.isNaN(w.dV()), "only a walk by clock sums U and V");
        }
        // the Worldline interface's own moves
        State s = craft.atClock(from);
        Step byTime = craft.advance(s, d[0].doubleValue());
        close(at + " advance: clock", byTime.dClockSeconds(), dClock, tol);
        close(at + " advance: end clock", byTime.end().clock(), RefMath.bd(to), tol);
        close(at + " advance: end time", byTime.end().timeSeconds(), ref.atClock(RefMath.bd(to)).t(), tol);
        close(at + " advance: end x", byTime.end().position().x(), ref.atClock(RefMath.bd(to)).position()[0], tol);
        Step clockStep = craft.advanceClock(s, to - from);
        close(at + " advanceClock: dt", clockStep.dtSeconds(), d[0], tol);
        close(at + " advanceClock: end time", clockStep.end().timeSeconds(), ref.atClock(RefMath.bd(to)).t(), tol);
        close(at + " advanceClock: along", heading[0] * clockStep.displacement().x() + heading[1]
                * clockStep.displacement().y() + heading[2] * clockStep.displacement().z(), d[1], tol);
        assertEquals(to - from, clockStep.dClockSeconds());
        close(at + " advanceClock: end clock", clockStep.end().clock(), RefMath.bd(to), tol);
        close(at + " advanceClock: end x", clockStep.end().position().x(), ref.atClock(RefMath.bd(to)).position()[0], tol);
    }

    /** A walk's end state against the reference state at clock {@code to}: clock, time, along, speed. */
    static void assertEnd(String at, StraightLineCraft craft, RefWorldline ref, double[] heading, LineState end,
                          double to, double tol) {
        RefState r = ref.atClock(RefMath.bd(to));
        close(at + ": end clock", end.clock(), RefMath.bd(to), tol);
        close(at + ": end time", end.timeSeconds(), r.t(), tol);
        double[] origin = {craft.origin().x(), craft.origin().y(), craft.origin().z()};
        double along = 0;
        double beta = 0;
        for (int i = 0; i < 3; i++) {
            along += heading[i] * (r.position()[i].doubleValue() - origin[i]);
            beta += heading[i] * r.velocity()[i].doubleValue() / C;
        }
        assertEquals(along, end.along(), tol * Math.abs(along) + 1e-3, at + ": end along");
        assertEquals(beta, Math.tanh(end.rapidity()), 1e-12, at + ": end speed");
    }

    @ParameterizedTest(name = "kite {0} yr -> {1} yr")
    @CsvSource({
        // from, to (craft clock, yr): the legs start at 0.05, 0.45, 0.75 and end at 0.95 (coast after)
        "0.10, 0.30",   // inside the first burn
        "0.00, 0.20",   // from the coast before the first leg into the burn
        "0.30, 0.90",   // burn, coast, brake
        "0.90, 1.40",   // brake into the final coast
        "1.40, 0.02",   // backwards across every leg
        "0.80, 0.50",   // backwards inside the brake and the coast
        "-0.5, -0.1",   // before the first leg
    })
    void walksAcrossClosedFormLegsMatchTheReference(double fromYears, double toYears) {
        assertWalks(KITE, KITE_REF, unitHeading(), fromYears * YR, toYears * YR, CLOSED_TOL);
    }

    @ParameterizedTest(name = "lark {0} yr -> {1} yr")
    @CsvSource({
        // the profiled leg runs from clock 0 to 0.5 yr; a coast follows
        "0.05, 0.30",
        "0.30, 0.10",
        "0.10, 0.80",
        "0.80, 0.20",
        "-0.2, 0.25",
    })
    void walksAcrossAProfiledLegMatchTheReference(double fromYears, double toYears) {
        assertWalks(LARK, LARK_REF, new double[] {1, 0, 0}, fromYears * YR, toYears * YR, INTEGRATED_TOL);
    }

    /**
     * The clock-only and time-only moves (the schedule's arrival intervals) are the full moves' own numbers,
     * bit for bit, across closed-form and profiled legs in both directions and for a moving station; the full
     * moves are held to the 50-digit reference above, and one of these again here.
     */
    @ParameterizedTest(name = "from {0} yr by {1} yr")
    @CsvSource({
        "0.10, 0.2", "0.00, 0.9", "0.30, 0.6", "0.90, 0.5", "1.40, -1.38", "0.80, -0.3", "-0.5, 0.4", "0.2, 1e-9",
        "0.2, -3e-8", "0.2, 0",
    })
    void clockAndTimeChangesAreTheFullMovesNumbers(double fromYears, double byYears) {
        List<Worldline> lines = List.of(KITE, LARK, InertialWorldline.of(Vec3.of(1e12, 0, -1e12),
                Vec3.of(0.36 * C, 0.48 * C, 0), 500), InertialWorldline.atRest(Vec3.of(3e11, 1e11, 0)));
        for (Worldline w : lines) {
            State s = w.atClock(fromYears * YR);
            double by = byYears * YR;
            assertEquals(w.advance(s, by).dClockSeconds(), w.clockChange(s, by), () -> w + " clock change");
            assertEquals(w.advanceClock(s, by).dtSeconds(), w.timeChange(s, by), () -> w + " time change");
        }
        if (byYears != 0) {
            // the step as the difference of the two clocks the reference is given (exact when they are close: Sterbenz)
            double from = fromYears * YR;
            double to = from + byYears * YR;
            double dt = KITE.timeChange(KITE.atClock(from), to - from);
            close("kite time change", dt, differences(KITE_REF, unitHeading(), from, to)[0], CLOSED_TOL);
        }
    }

    /**
     * The off-line cone's Newton steps walk by clock summing only the null offsets: dU, dV, the clock step and the
     * end rapidity are walkClock's own bits (the answer is then walked whole), and what is skipped is NaN.
     */
    @ParameterizedTest(name = "from {0} yr by {1} yr")
    @CsvSource({"0.10, 0.2", "0.00, 0.9", "0.90, 0.5", "1.40, -1.38", "-0.5, 0.4", "0.2, 1e-9", "0.2, -3e-8"})
    void aNullsOnlyClockWalkGivesTheClockWalksNullOffsets(double fromYears, double byYears) {
        for (StraightLineCraft craft : List.of(KITE, LARK)) {
            LineState start = craft.lineAtClock(fromYears * YR);
            StraightLineCraft.LineWalk whole = craft.walkClock(start, byYears * YR);
            StraightLineCraft.LineWalk nulls = craft.walkClockNulls(start, byYears * YR);
            assertEquals(whole.dU(), nulls.dU(), "dU");
            assertEquals(whole.dV(), nulls.dV(), "dV");
            assertEquals(whole.dClock(), nulls.dClock(), "clock step");
            assertEquals(whole.end().rapidity(), nulls.end().rapidity(), "end rapidity");
            assertEquals(whole.end().clock(), nulls.end().clock(), "end clock");
            assertTrue(Double.isNaN(nulls.dt()) && Double.isNaN(nulls.dAlong()) && Double.isNaN(nulls.end().timeSeconds())
                    && Double.isNaN(nulls.end().along()), "what is not summed is NaN");
        }
    }

    @Test
    void aSignalChasingAnOpenEndedBurnMeetsItOnlyBelowTheAsymptote() {
        double a = 2 * G0;
        StraightLineCraft c = StraightLineCraft.of(Vec3.ZERO, Vec3.of(1, 0, 0), 0, 0, 0,
                List.of(new LegSpec.Burn(a, new LegSpec.Forever())));
        double limit = C * C / a;
        // Rindler: U(tau) = (c^2 / a)(1 - e^(-a tau / c)), so U = 0.6 c^2 / a at tau = (c / a) ln 2.5
        StraightLineCraft.LineWalk w = c.walkU(c.lineAtClock(0), 0.6 * limit);
        close("clock at U = 0.6 c^2 / a", w.end().clock(), C / a * Math.log(2.5), CLOSED_TOL);
        close("rapidity there", w.end().rapidity(), Math.log(2.5), CLOSED_TOL);
        StraightLineCraft.LineWalk back = c.walkU(w.end(), -0.3 * limit);
        close("back to U = 0.3 c^2 / a", back.end().clock(), C / a * Math.log(1 / 0.7), CLOSED_TOL);
        StraightLineCraft.LineWalk never = c.walkU(c.lineAtClock(0), 1.01 * limit);
        assertTrue(never.never());
        assertEquals(Double.POSITIVE_INFINITY, never.dt());
        assertEquals(Double.POSITIVE_INFINITY, never.dClock());
        assertTrue(Double.isNaN(never.dAlong()));
        // V = c t + x = (c^2 / a)(e^(a tau / c) - 1) grows without bound: always reached
        StraightLineCraft.LineWalk v = c.walkV(c.lineAtClock(0), 3 * limit);
        close("clock at V = 3 c^2 / a", v.end().clock(), C / a * Math.log(4), CLOSED_TOL);
        StraightLineCraft.LineWalk none = c.walkU(c.lineAtClock(YR), 0);
        assertEquals(YR, none.end().clock());
        assertEquals(0.0, none.dt());
    }

    @ParameterizedTest(name = "a = {0} g0 from {1}")
    @CsvSource({
        // acceleration (g0), start position x, y (ly), start clock (yr), rapidity gained on a first leg (1 yr at a1)
        "2.0,   0.5, 0.2, 0.5, 0",
        "-1.5,  0.5, 0.2, 0.5, 0",
        "1.0,  -1.0, 3.0, 0.0, 0.3",
        "-0.7,  0.0, 0.0, 2.0, -0.4",
    })
    void anOpenEndedBurnHasRindlersAsymptoteAndALastRepresentableClock(double aG0, double xLy, double yLy,
                                                                      double clockYears, double a1G0) {
        double a = aG0 * G0;
        double a1 = a1G0 * G0;
        Vec3 start = Vec3.of(xLy * LY, yLy * LY, 0);
        List<LegSpec> legs = a1 == 0 ? List.of(new LegSpec.Burn(a, new LegSpec.Forever()))
                : List.of(new LegSpec.Burn(a1, new LegSpec.ClockDuration(YR)), new LegSpec.Burn(a, new LegSpec.Forever()));
        StraightLineCraft c = StraightLineCraft.of(start, Vec3.of(0, 1, 0), 0, clockYears * YR, 0, legs);
        Asymptote as = c.asymptote().orElseThrow();
        // runs off along +heading for a > 0, -heading for a < 0
        assertEquals(Math.signum(a), as.direction().y());
        // rapidity at the open burn's start: a1 (1 yr) / c (Rindler: rapidity adds along a line)
        double eta = a1 * YR / C;
        close("last representable clock", c.maxClock(),
                clockYears * YR + (a1 == 0 ? 0 : YR) + (Math.signum(a) * StraightLineCraft.MAX_RAPIDITY - eta) * C / a,
                CLOSED_TOL);
        if (a1 == 0) {
            // from rest at P: c t - d . r -> c^2 / |a| - d . P
            close("limit", as.limitMetres(), C * C / Math.abs(a) - Math.signum(a) * yLy * LY, CLOSED_TOL);
        }
        // along the worldline the null coordinate stays below the limit and approaches it: at rapidity 10 the
        // gap is (c^2 / |a|) e^-10, 4.5e-5 of c^2 / |a| (Rindler)
        double openStart = clockYears * YR + (a1 == 0 ? 0 : YR);
        State late = c.atClock(openStart + (Math.signum(a) * 10 - eta) * C / a);
        double q = as.nullCoordinate(late.timeSeconds(), late.position());
        assertTrue(q < as.limitMetres(), "below the limit");
        close("gap to the limit", as.limitMetres() - q, C * C / Math.abs(a) * Math.exp(-10), 1e-6);
        assertEquals(a, c.properAccelerationAt(late.timeSeconds()));
    }

    @Test
    void aCraftEndingOnACoastHasNoAsymptoteAndNoLastClock() {
        assertEquals(Double.POSITIVE_INFINITY, KITE.maxClock());
        assertTrue(KITE.asymptote().isEmpty());
        assertEquals(Double.POSITIVE_INFINITY, LARK.maxClock());
        double[] n = unitHeading();
        assertEquals(n[0], KITE.heading().x(), 1e-16);
        assertEquals(n[2], KITE.heading().z(), 1e-16);
        assertEquals(START[1], KITE.origin().y());
        // proper acceleration of each piece: 0.1 c coast, 0.8 g0, coast, -0.5 g0, coast
        double[] clocks = {0.0, 0.2, 0.6, 0.8, 2.0};
        double[] accelerations = {0, 0.8 * G0, 0, -0.5 * G0, 0};
        for (int i = 0; i < clocks.length; i++) {
            State s = KITE.atClock(clocks[i] * YR);
            assertEquals(accelerations[i], KITE.properAccelerationAt(s.timeSeconds()), "at " + clocks[i] + " yr");
        }
        // linear between the profile's samples (0.2 g0 at 0, 1.5 g0 at 0.2 yr): 0.85 g0 at 0.1 yr
        close("profiled acceleration", LARK.properAccelerationAt(LARK.atClock(0.1 * YR).timeSeconds()), 0.85 * G0, 1e-12);
    }

    @Test
    void distancesAlongAndOffTheLineAreTheProjectionsOfTheOffset() {
        Vec3 p = Vec3.of(START[0] + 3e11, START[1] + 6e11, START[2] + 6e11 + 4e11);
        // offset (3, 6, 10) x 1e11 m; heading (1, 2, 2) / 3: along = (3 + 12 + 20) / 3 = 35 / 3 x 1e11 m
        close("along", KITE.alongOf(p), 35e11 / 3, 1e-15);
        Vec3 perp = KITE.perpendicularOf(p);
        // (3, 6, 10) - 35/9 (1, 2, 2) = (-8/9, -16/9, 20/9) x 1e11 m
        close("perpendicular x", perp.x(), -8e11 / 9, 1e-14);
        close("perpendicular y", perp.y(), -16e11 / 9, 1e-14);
        close("perpendicular z", perp.z(), 20e11 / 9, 1e-14);
    }

    @Test
    void aMovingStationsClockRunsSlowByGamma() {
        // |v| = 0.6 c: gamma = 1.25 exactly (Einstein 1905)
        Vec3 v = Vec3.of(0.36 * C, 0.48 * C, 0);
        Vec3 p0 = Vec3.of(1e12, 0, -1e12);
        InertialWorldline w = InertialWorldline.of(p0, v, 500);
        assertEquals(p0, w.positionAtZero());
        assertEquals(v, w.velocity());
        assertEquals(500, w.clockOffset());
        assertFalse(w.atRest());
        assertTrue(InertialWorldline.atRest(p0).atRest());
        assertEquals(0, w.properAccelerationAt(1e9));
        assertTrue(w.asymptote().isEmpty());
        State s = w.atTime(1e8);
        Step byTime = w.advance(s, 2e7);
        close("dClock = dt / gamma", byTime.dClockSeconds(), 2e7 / 1.25, 1e-15);
        close("displacement", byTime.displacement().y(), 0.48 * C * 2e7, 1e-15);
        close("end clock", byTime.end().clock(), 1e8 / 1.25 + 500 + 2e7 / 1.25, 1e-15);
        close("end time", byTime.end().timeSeconds(), 1.2e8, 1e-15);
        Step byClock = w.advanceClock(s, 4e6);
        close("dt = gamma dClock", byClock.dtSeconds(), 5e6, 1e-15);
        close("clock step", byClock.dClockSeconds(), 4e6, 1e-15);
        close("end x", byClock.end().position().x(), 1e12 + 0.36 * C * (1e8 + 5e6), 1e-15);
        close("state gamma", byClock.end().gamma(), 1.25, 1e-15);
    }

    @Test
    void profilesAreEqualByTheirSamplesAndEnd() {
        LegSpec.Profile p = new LegSpec.Profile(new double[] {0, 10}, new double[] {1, 2});
        LegSpec.Profile same = new LegSpec.Profile(new double[] {0, 10}, new double[] {1, 2},
                new LegSpec.ClockDuration(10));
        assertEquals(p, same);
        assertEquals(p.hashCode(), same.hashCode());
        assertNotEquals(p, new LegSpec.Profile(new double[] {0, 11}, new double[] {1, 2}, new LegSpec.ClockDuration(10)));
        assertNotEquals(p, new LegSpec.Profile(new double[] {0, 10}, new double[] {1, 3}));
        assertNotEquals(p, new LegSpec.Profile(new double[] {0, 10}, new double[] {1, 2}, new LegSpec.ClockDuration(5)));
        assertNotEquals(p, null);
        assertNotEquals(p, (Object) "Profile");
        assertNotEquals(p.hashCode(), new LegSpec.Profile(new double[] {0, 10}, new double[] {2, 1}).hashCode());
        assertEquals("Profile[2 samples over 10.0 s, ClockDuration[seconds=10.0]]", p.toString());
        assertEquals(1.0, p.accelerationMetresPerSecond2(), "the acceleration at the leg start");
        double[] clocks = p.clockSeconds();
        clocks[1] = 99;
        assertEquals(10.0, p.clockSeconds()[1], "a copy is handed out");
        double[] acc = p.accelerationsMetresPerSecond2();
        acc[0] = 99;
        assertEquals(1.0, p.accelerationsMetresPerSecond2()[0], "a copy is handed out");
    }

    @ParameterizedTest(name = "profile {0}: start {1}, end {2}, largest {3} (g0)")
    @CsvSource({
        // accelerations at clocks 0, 0.2, 0.5, 0.8 yr (g0); expected at start, at end, of largest size
        "'0.2 1.5 -2.0 0.1', 0.2, 0.1, -2.0",   // largest at an inner knot
        "'0.5 0.1 0.2 -0.7', 0.5, -0.7, -0.7",  // largest at the end
        "'0.9 0.3 -0.2 0.4', 0.9, 0.4, 0.9",    // largest at the start
    })
    void aProfiledLegsAccelerationRangeIsReadAtItsKnotsAndEnds(String accelerations, double start, double end,
                                                             double largest) {
        double[] a = java.util.Arrays.stream(accelerations.split(" ")).mapToDouble(x -> Double.parseDouble(x) * G0)
                .toArray();
        StraightLineCraft c = StraightLineCraft.of(Vec3.ZERO, Vec3.of(1, 0, 0), 0, 0, 0, List.of(
                new LegSpec.Burn(-0.3 * G0, new LegSpec.ClockDuration(0.1 * YR)),
                new LegSpec.Profile(new double[] {0, 0.2 * YR, 0.5 * YR, 0.8 * YR}, a),
                new LegSpec.Coast(new LegSpec.ClockDuration(YR))));
        // linear between samples, so the values at the samples are the law's own (LegSpec.Profile)
        assertEquals(new AccelerationRange(start * G0, end * G0, largest * G0), c.legs().get(1).acceleration());
        assertEquals(new AccelerationRange(-0.3 * G0, -0.3 * G0, -0.3 * G0), c.legs().get(0).acceleration());
        assertEquals(new AccelerationRange(0, 0, 0), c.legs().get(2).acceleration());
    }

    @ParameterizedTest(name = "linear at {0} = {1}")
    @CsvSource({
        // samples (0, 1), (2, 5), (6, -3): held outside, the sample's own value at a sample, linear between
        "-1,  1",
        "0,   1",
        "1,   3",
        "2,   5",
        "4,   1",
        "6,  -3",
        "7,  -3",
    })
    void tabulatedValuesAreInterpolatedLinearly(double x, double expected) {
        assertEquals(expected, Samples.linear(new double[] {0, 2, 6}, new double[] {1, 5, -3}, x));
    }
}
