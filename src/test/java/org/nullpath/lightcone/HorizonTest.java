package org.nullpath.lightcone;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.Arguments;
import org.junit.jupiter.params.provider.CsvSource;
import org.junit.jupiter.params.provider.MethodSource;
import org.junit.jupiter.params.provider.ValueSource;
import org.nullpath.reference.RefHorizon;
import org.nullpath.reference.RefSolver;
import org.nullpath.reference.RefStation;
import org.nullpath.spacetime.Decimal;
import org.nullpath.spacetime.Vec3;
import org.nullpath.worldline.InertialWorldline;
import org.nullpath.worldline.LegSpec;
import org.nullpath.worldline.State;
import org.nullpath.worldline.StraightLineCraft;
import static org.nullpath.testkit.Si.C;
import static org.nullpath.testkit.Si.G0;
import static org.nullpath.testkit.Si.LY;
import static org.nullpath.testkit.Si.YR;

/**
 * Horizons of craft on open-ended burns. Source: Rindler, <i>Relativity: Special, General, and
 * Cosmological</i> (2nd ed., 2006), hyperbolic motion: a body at constant proper acceleration a from rest
 * at the origin at t = 0 approaches the null line c t - x = c^2/a, so a signal sent from the origin at
 * t >= c/a never reaches it (docs/physics.md, check values). The sign of a flips the direction of escape.
 */
class HorizonTest {
    private static StraightLineCraft openBurnFromRest(double a) {
        return StraightLineCraft.of(Vec3.ZERO, Vec3.of(1, 0, 0), 0, 0, 0,
                List.of(new LegSpec.Burn(a, new LegSpec.Forever())));
    }

    @ParameterizedTest(name = "a = {0} m/s^2")
    @ValueSource(doubles = {1e-9, 3e-7, 9.80665, -9.80665, 98.0665, 9806650})
    void theLastSendFromTheOriginThatEverArrivesIsAtCOverA(double a) {
        // Rindler 2006 / physics.md: t = c/|a|; for a = 1 g0 that is 0.968 715 yr
        Horizon h = LightCone.horizon(InertialWorldline.atRest(Vec3.ZERO), openBurnFromRest(a));
        assertTrue(h.exists());
        double expected = C / Math.abs(a);
        assertEquals(expected, h.lastSend().timeSeconds(), 1e-12 * expected);
        assertEquals(expected, h.lastSend().clock(), 1e-12 * expected);
    }

    @Test
    void atOneGeeTheHorizonFromHomeIs0_968715YearsAfterDeparture() {
        // docs/physics.md check value c/g0 = 0.968 715 yr (same digits as c^2/g0 in ly)
        Horizon h = LightCone.horizon(InertialWorldline.atRest(Vec3.ZERO), openBurnFromRest(G0));
        assertEquals(0.968715, h.lastSend().timeSeconds() / YR, 5e-7);
    }

    @Test
    void aSenderThatIsACraftAtRestFindsTheSameHorizonAsAStation() {
        // a craft with no legs coasts at its start speed for ever: here at rest at the origin, like a station,
        // but its horizon is found by the bracketed solve rather than the station formula
        StraightLineCraft still = StraightLineCraft.of(Vec3.ZERO, Vec3.of(0, 1, 0), 0, 0, 0, List.of());
        Horizon h = LightCone.horizon(still, openBurnFromRest(G0));
        assertTrue(h.exists());
        assertEquals(C / G0, h.lastSend().timeSeconds(), 1e-12 * C / G0);
    }

    @ParameterizedTest(name = "just before by {0} of the horizon time")
    @ValueSource(doubles = {1e-3, 1e-6, 1e-9})
    void sendsJustBeforeTheHorizonArriveAndSendsAtOrAfterItNever(double fraction) {
        // a station off the line, moving: horizon time from the asymptote; sends before it arrive (late),
        // sends at it or after never arrive
        StraightLineCraft craft = StraightLineCraft.of(Vec3.of(LY, 0, 0), Vec3.of(1, 1, 0), 0.5 * YR, 0, 0.3 * C,
                List.of(new LegSpec.Burn(0.2 * G0, new LegSpec.ClockDuration(YR)),
                        new LegSpec.Burn(G0, new LegSpec.Forever())));
        InertialWorldline station = InertialWorldline.of(Vec3.of(0, -LY, 0.5 * LY), Vec3.of(0.1 * C, 0, -0.2 * C), 0);
        Horizon h = LightCone.horizon(station, craft);
        assertTrue(h.exists());
        double th = h.lastSend().timeSeconds();
        SignalPath before = LightCone.future(station.atTime(th - fraction * th), craft);
        assertTrue(before.delivered(), "a send before the horizon arrives");
        assertTrue(before.lightTimeSeconds() > 0 && Double.isFinite(before.lightTimeSeconds()));
        assertFalse(LightCone.future(h.lastSend(), craft).delivered(), "a send at the horizon never arrives");
        assertFalse(LightCone.future(station.atTime(th + fraction * th), craft).delivered());
        assertFalse(LightCone.future(station.atTime(th + 100 * YR), craft).delivered());
        assertEquals(Double.POSITIVE_INFINITY, LightCone.future(station.atTime(th + YR), craft).lightTimeSeconds());
    }

    @ParameterizedTest(name = "a = {0} m/s^2")
    @ValueSource(doubles = {0.9041, 1.4889, 4.1936, 9.80665})
    void aSendAtTheComputedHorizonItselfNeverArrives(double a) {
        StraightLineCraft craft = openBurnFromRest(a);
        Horizon h = LightCone.horizon(InertialWorldline.atRest(Vec3.ZERO), craft);
        assertFalse(LightCone.future(h.lastSend(), craft).delivered());
    }

    @Test
    void laterSendsBeforeTheHorizonTakeLongerAndLonger() {
        // Rindler 2006: as t_e -> c/a the craft-clock arrival tau = -(c/a) ln(1 - a t_e / c) grows without
        // bound. Reference in 70 digits at the send time as given (a double); checked to 1e-12 while the
        // problem is well conditioned (f <= 0.99: d ln tau / d ln t_e = 1/((1-f) ln(1/(1-f))) <= 22), and
        // for growth only closer in, where one rounding of t_e already moves tau by more than 1e-12.
        StraightLineCraft craft = openBurnFromRest(G0);
        InertialWorldline home = InertialWorldline.atRest(Vec3.ZERO);
        double previous = 0;
        for (double f : new double[] {0.5, 0.9, 0.99, 0.999999, 0.999999999}) {
            double te = f * C / G0;
            State rx = LightCone.future(home.atTime(te), craft).receive();
            java.math.BigDecimal tau = Decimal.mul(Decimal.div(Decimal.C, Decimal.of(G0)),
                    Decimal.ln(Decimal.sub(java.math.BigDecimal.ONE,
                            Decimal.div(Decimal.mul(Decimal.of(G0), Decimal.of(te)), Decimal.C)))).negate();
            if (f <= 0.99) {
                assertTrue(Decimal.relativeError(rx.clock(), tau) < 1e-12, "clock " + rx.clock() + " expected " + tau);
            }
            assertTrue(rx.clock() > previous);
            previous = rx.clock();
        }
        assertTrue(previous > 20 * C / G0, "the last arrival is more than 20 c/a of craft clock out");
    }

    @Test
    void aReceiverWithoutAnOpenBurnHasNoHorizon() {
        InertialWorldline home = InertialWorldline.atRest(Vec3.ZERO);
        StraightLineCraft finite = StraightLineCraft.of(Vec3.ZERO, Vec3.of(1, 0, 0), 0, 0, 0,
                List.of(new LegSpec.Burn(G0, new LegSpec.ClockDuration(10 * YR))));
        assertFalse(LightCone.horizon(home, finite).exists());
        assertFalse(LightCone.horizon(home, InertialWorldline.of(Vec3.ZERO, Vec3.of(0.99 * C, 0, 0), 0)).exists());
        assertFalse(LightCone.horizon(openBurnFromRest(G0), home).exists());
    }

    @Test
    void aSenderRunningAheadOnTheSameAsymptoteReachesTheReceiverForEver() {
        // the same open burn started 1 ly further ahead has c t - x limit c^2/a - 1 ly, below the receiver's
        StraightLineCraft receiver = openBurnFromRest(G0);
        StraightLineCraft ahead = StraightLineCraft.of(Vec3.of(LY, 0, 0), Vec3.of(1, 0, 0), 0, 0, 0,
                List.of(new LegSpec.Burn(G0, new LegSpec.Forever())));
        assertFalse(LightCone.horizon(ahead, receiver).exists());
        assertTrue(LightCone.future(ahead.atClock(3 * YR), receiver).delivered());
    }

    @ParameterizedTest(name = "sender from {0} ly at {1} yr, {2} c, burning {3} g0 for {4} yr; receiver leaves at {5} yr")
    @CsvSource({
        "0, 0, 0, 0.5, 2, 0",          // a craft chasing the receiver: the last send comes later than c/a
        "0, 0, 0, -0.5, 2, 0",         // a craft flying away from the receiver's escape: sooner
        "-1, -3, 0.2, 0.3, 1, -2",     // the receiver left 2 yr before mission time 0: the horizon lies before 0
        "-1, -3, -0.6, -0.3, 1, -2",
        "-1, -1, 0.4, 1.5, 0.5, 1",
        "2, 0.5, -0.3, 0, 0, -0.5",    // a coasting craft (no legs)
        "0, 0, 0, -1, -1, 0",          // running off for ever the other way (a clock duration of -1: open-ended)
        "-0.967746, 0, 0.99, 0, 0, 0",     // a fast chaser 1e-3 of the limit short of it: c t - x grows at only 0.01 c
        "-0.967746, 0, 0.999, 0, 0, 0",
        "-0.9687, 0, 0.9, 0.1, 1, 0",
    })
    void theHorizonOfACraftSenderMatchesTheReference(double x0Ly, double t0Years, double beta, double aG0,
                                                     double burnYears, double leaveYears) {
        LegSpec.LegEnd end = burnYears < 0 ? new LegSpec.Forever() : new LegSpec.ClockDuration(burnYears * YR);
        LegSpec[] legs = aG0 == 0 ? new LegSpec[0] : new LegSpec[] {new LegSpec.Burn(aG0 * G0, end)};
        TwinCraft sender = TwinCraft.of(new double[] {x0Ly * LY, 0.1 * LY, 0}, new double[] {1, 0, 0}, t0Years * YR,
                0, beta * C, legs);
        TwinCraft receiver = TwinCraft.of(new double[] {0, 0, 0}, new double[] {1, 0, 0}, leaveYears * YR, 0, 0,
                new LegSpec.Burn(G0, new LegSpec.Forever()));
        assertHorizon(sender, receiver);
    }

    @Test
    void aHorizonWithinASecondOfMissionTimeZeroMatchesTheReference() {
        // a coasting sender at -0.5 c whose null coordinate at t = 0 is 0.4 light seconds short of the receiver's
        // limit c^2/g0: the last send is about 0.27 s after mission time 0
        double x0 = 0.4 * C - C * C / G0;
        TwinCraft sender = TwinCraft.of(new double[] {x0, 0, 0}, new double[] {1, 0, 0}, 0, 0, -0.5 * C);
        assertHorizon(sender, TwinCraft.of(new double[] {0, 0, 0}, new double[] {1, 0, 0}, 0, 0, 0,
                new LegSpec.Burn(G0, new LegSpec.Forever())));
    }

    /**
     * Against the 50-digit reference: the last send's mission time and the sender's clock there, to 1e-12 of the
     * receiver's time scale (c t - x = L fixes the time to about an ulp of L / c, whatever the time itself), and a
     * send at it never arrives.
     */
    private static void assertHorizon(TwinCraft sender, TwinCraft receiver) {
        Horizon h = LightCone.horizon(sender.craft(), receiver.craft());
        RefHorizon ref = RefSolver.horizon(sender.ref(), receiver.ref());
        assertTrue(h.exists() && ref.exists());
        double scale = Math.max(Math.abs(ref.tDouble()), Math.abs(ref.limit().doubleValue()) / C);
        assertEquals(ref.tDouble(), h.lastSend().timeSeconds(), 1e-12 * scale, "last send, mission time");
        assertEquals(ref.clockDouble(), h.lastSend().clock(), 1e-12 * scale, "last send, sender's clock");
        assertFalse(LightCone.future(h.lastSend(), receiver.craft()).delivered(), "a send at the horizon never arrives");
    }

    /**
     * Stations beside, behind and ahead of a receiver that leaves on an open-ended burn, at rest and moving: the
     * station formula t = (L + k.r0) / (c - k.v) (Rindler 2006, the asymptote c t - k.r = L of hyperbolic motion)
     * lands a few ulps either side of the supremum, and the last send is then moved up until the future cone
     * itself classes it as never arriving. Each case against the 50-digit reference, and the send at the horizon
     * never arrives. The grid (every position with every velocity and acceleration) is invented for the test.
     */
    @ParameterizedTest(name = "station at ({0}, {1}, 0) ly moving at {2} c along x; receiver burning {3} g0 from {4} yr")
    @MethodSource("stationGrid")
    void theHorizonOfAStationMatchesTheReference(double xLy, double yLy, double beta, double aG0, double leaveYears) {
        TwinCraft receiver = TwinCraft.of(new double[] {0, 0, 0}, new double[] {1, 0, 0}, leaveYears * YR, 0, 0,
                new LegSpec.Burn(aG0 * G0, new LegSpec.Forever()));
        double[] r0 = {xLy * LY, yLy * LY, 0};
        double[] v = {beta * C, 0, 0};
        InertialWorldline station = InertialWorldline.of(TwinCraft.vec(r0), TwinCraft.vec(v), 0);
        Horizon h = LightCone.horizon(station, receiver.craft());
        RefHorizon ref = RefSolver.horizon(RefStation.of(r0, v, 0), receiver.ref());
        assertTrue(h.exists() && ref.exists());
        double scale = Math.max(Math.abs(ref.tDouble()), Math.abs(ref.limit().doubleValue()) / C);
        assertEquals(ref.tDouble(), h.lastSend().timeSeconds(), 1e-12 * scale, "last send, mission time");
        assertFalse(LightCone.future(h.lastSend(), receiver.craft()).delivered(), "a send at the horizon never arrives");
    }

    static java.util.stream.Stream<Arguments> stationGrid() {
        java.util.stream.Stream.Builder<Arguments> grid = java.util.stream.Stream.builder();
        for (double x : new double[] {-2.3, -0.41, 0.17, 1.9}) {
            for (double y : new double[] {0, 0.37}) {
                for (double beta : new double[] {0, 0.31, -0.53}) {
                    for (double a : new double[] {0.7, 1, 2.3}) {
                        grid.add(Arguments.of(x, y, beta, a, x < 0 ? 0.6 : -0.2));
                    }
                }
            }
        }
        return grid.build();
    }

    @Test
    void aCraftAlwaysReachesItsOwnLaterSelf() {
        // the same open burn as sender and receiver: the sender's null coordinate never exceeds its own limit
        StraightLineCraft craft = openBurnFromRest(G0);
        assertFalse(LightCone.horizon(craft, craft).exists());
    }
}
