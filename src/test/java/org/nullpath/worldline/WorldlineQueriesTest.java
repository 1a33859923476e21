package org.nullpath.worldline;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertNull;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.ValueSource;
import org.nullpath.spacetime.Decimal;
import org.nullpath.spacetime.Vec3;
import static org.nullpath.testkit.Si.C;
import static org.nullpath.testkit.Si.G0;
import static org.nullpath.testkit.Si.LY;
import static org.nullpath.testkit.Si.YR;

/**
 * Queries on station and craft worldlines: inverse clock/time lookups, leg bookkeeping, every kind of
 * leg end, and the plans that cannot be flown. Physics: special relativity as in physics.md (Rindler,
 * <i>Relativity: Special, General, and Cosmological</i>, 2nd ed., 2006, hyperbolic motion).
 */
class WorldlineQueriesTest {
    /** An invented demo craft, "Wren": moving start, every finite leg-end kind, then an open burn. */
    private static StraightLineCraft wren() {
        return StraightLineCraft.of(Vec3.of(LY, 2 * LY, -LY), Vec3.of(1, 1, 0), 3 * YR, 100.0, 0.2 * C, List.of(
                new LegSpec.Burn(G0, new LegSpec.ClockDuration(YR)),
                new LegSpec.Coast(new LegSpec.MissionDuration(2 * YR)),
                new LegSpec.Burn(-G0, new LegSpec.UntilSpeed(0.1 * C)),
                new LegSpec.Burn(0.5 * G0, new LegSpec.UntilDistance(2 * LY)),
                new LegSpec.Burn(2 * G0, new LegSpec.Forever())));
    }

    @ParameterizedTest(name = "clock = {0} yr")
    @ValueSource(doubles = {-50, -1, 0, 0.5, 1.0, 2.2, 3.1, 4.0, 5.5, 8, 12, 30})
    void atTimeUndoesAtClockOnEveryPieceOfTheCraftWorldline(double clockYears) {
        StraightLineCraft craft = wren();
        double clock = 100.0 + clockYears * YR;
        State s = craft.atClock(clock);
        State back = craft.atTime(s.timeSeconds());
        assertEquals(clock, back.clock(), 1e-13 * Math.max(Math.abs(clock), YR));
        assertEquals(s.rapidity(), back.rapidity(), 1e-13 * Math.max(1, Math.abs(s.rapidity())));
        assertEquals(0, back.position().minus(s.position()).norm(), 1e-13 * s.position().norm());
    }

    @ParameterizedTest(name = "clock = {0} s")
    @ValueSource(doubles = {-1e9, 0, 1, 3.2e7, 1e10})
    void aStationClockRunsSlowByGammaAndAtTimeUndoesAtClock(double clock) {
        // time dilation: a station moving at 0.6 c has gamma = 1.25 (special relativity, Einstein 1905)
        InertialWorldline station = InertialWorldline.of(Vec3.of(1e12, 0, 0), Vec3.of(0, 0.6 * C, 0), 42.0);
        State s = station.atClock(clock);
        assertEquals((clock - 42.0) * 1.25, s.timeSeconds(), 1e-15 * Math.max(1, Math.abs(s.timeSeconds())));
        assertEquals(clock, station.atTime(s.timeSeconds()).clock(), 1e-15 * Math.max(42, Math.abs(clock)));
        assertEquals(0.6, s.beta(), 1e-15);
        assertEquals(1e12, s.position().x(), 0.0);
        assertEquals(0.6 * C * s.timeSeconds(), s.position().y(), 1e-15 * Math.abs(0.6 * C * s.timeSeconds()));
    }

    @Test
    void legsJoinEndToStartAndTheFirstStartsAtTheCraftStart() {
        StraightLineCraft craft = wren();
        List<LegSpan> legs = craft.legs();
        assertEquals(5, legs.size());
        LineState first = legs.get(0).start();
        assertEquals(100.0, first.clock(), 0.0);
        assertEquals(3 * YR, first.timeSeconds(), 0.0);
        assertEquals(0.0, first.along(), 0.0);
        assertEquals(0.5 * Math.log(1.2 / 0.8), first.rapidity(), 1e-16);
        for (int i = 0; i < legs.size() - 1; i++) {
            LineState end = legs.get(i).end();
            LineState next = legs.get(i + 1).start();
            assertEquals(i, legs.get(i).index());
            assertEquals(end.clock(), next.clock(), 0.0, "clock at leg " + i + " end");
            assertEquals(end.timeSeconds(), next.timeSeconds(), 0.0, "time at leg " + i + " end");
            assertEquals(end.along(), next.along(), 0.0, "distance at leg " + i + " end");
            assertEquals(end.rapidity(), next.rapidity(), 0.0, "rapidity at leg " + i + " end");
            // and the worldline passes through the leg end
            LineState at = craft.lineAtClock(end.clock());
            assertEquals(end.timeSeconds(), at.timeSeconds(), 1e-14 * end.timeSeconds());
            assertEquals(end.along(), at.along(), 1e-14 * Math.abs(end.along()));
            assertEquals(end.rapidity(), at.rapidity(), 1e-14);
            assertTrue(end.clock() >= legs.get(i).start().clock());
        }
        assertTrue(legs.get(4).openEnded());
        assertNull(legs.get(4).end());
    }

    @Test
    void eachLegEndKindEndsWhereItShould() {
        List<LegSpan> legs = wren().legs();
        // craft-clock duration: exactly 1 yr on the craft clock
        assertEquals(YR, legs.get(0).end().clock() - legs.get(0).start().clock(), 1e-15 * YR);
        // mission duration: 2 yr of mission time
        assertEquals(2 * YR, legs.get(1).end().timeSeconds() - legs.get(1).start().timeSeconds(), 1e-12 * 2 * YR);
        // a coast keeps its rapidity
        assertEquals(legs.get(1).start().rapidity(), legs.get(1).end().rapidity(), 0.0);
        // until-speed: 0.1 c along the heading
        assertEquals(0.1, Math.tanh(legs.get(2).end().rapidity()), 1e-14);
        // until-distance: 2 ly covered during the leg
        assertEquals(2 * LY, legs.get(3).end().along() - legs.get(3).start().along(), 1e-12 * 2 * LY);
        // forever: no end, and the craft runs away behind an asymptote
        assertTrue(legs.get(4).openEnded());
        assertTrue(wren().asymptote().isPresent());
    }

    @Test
    void aCraftCoastsAtItsStartSpeedBeforeTheFirstLegAndAfterAFiniteLastLeg() {
        // physics.md: before its first leg the craft moves inertially; after a finite last leg it coasts
        double v0 = 0.6 * C; // gamma 1.25, gamma beta 0.75
        StraightLineCraft craft = StraightLineCraft.of(Vec3.ZERO, Vec3.of(0, 0, -2), 10.0, 5.0, v0,
                List.of(new LegSpec.Burn(-G0, new LegSpec.UntilSpeed(0))));
        LineState before = craft.lineAtClock(5.0 - YR);
        assertEquals(10.0 - 1.25 * YR, before.timeSeconds(), 1e-15 * YR);
        assertEquals(-0.75 * C * YR, before.along(), 1e-15 * C * YR);
        LineState stop = craft.legs().get(0).end();
        assertEquals(0.0, stop.rapidity(), 1e-15);
        LineState later = craft.lineAtClock(stop.clock() + 7 * YR);
        assertEquals(stop.along(), later.along(), 1e-6);
        assertEquals(stop.timeSeconds() + 7 * YR, later.timeSeconds(), 1e-15 * later.timeSeconds());
        assertFalse(craft.asymptote().isPresent());
        // the heading (0, 0, -2) is normalised: the craft moved towards -z
        assertTrue(craft.atClock(stop.clock()).position().z() < 0);
    }

    @Test
    void untilDistanceOnABrakingBurnEndsAtTheFirstCrossing() {
        // starting at 0.5 c and braking at 1 g0 the craft gets (c^2/a)(cosh eta0 - 1) ahead before it turns;
        // half of that distance is first reached on the way out, at positive speed
        double eta0 = 0.5 * Math.log(3.0);
        double reach = C * C / G0 * (Math.cosh(eta0) - 1);
        StraightLineCraft craft = StraightLineCraft.of(Vec3.ZERO, Vec3.of(1, 0, 0), 0, 0, 0.5 * C,
                List.of(new LegSpec.Burn(-G0, new LegSpec.UntilDistance(0.5 * reach))));
        LineState end = craft.legs().get(0).end();
        assertEquals(0.5 * reach, end.along(), 1e-12 * reach);
        assertTrue(end.rapidity() > 0);
        // cosh(eta1) = cosh(eta0) - a d / c^2 on the way out (Rindler 2006)
        double ch1 = Math.cosh(eta0) - G0 * 0.5 * reach / (C * C);
        assertEquals(Math.log(ch1 + Math.sqrt(ch1 * ch1 - 1)), end.rapidity(), 1e-12);
    }

    @Test
    void anUntilSpeedTheAccelerationPointsAwayFromIsRejectedNamingTheLeg() {
        WorldlineException e = assertThrows(WorldlineException.class, () -> StraightLineCraft.of(Vec3.ZERO,
                Vec3.of(1, 0, 0), 0, 0, 0, List.of(
                        new LegSpec.Burn(G0, new LegSpec.ClockDuration(YR)),
                        new LegSpec.Burn(G0, new LegSpec.UntilSpeed(0.1 * C)))));
        assertEquals(1, e.legIndex());
        assertTrue(e.getMessage().contains("never reached"), e.getMessage());
    }

    @Test
    void anUntilSpeedOnACoastIsRejectedNamingTheLeg() {
        WorldlineException e = assertThrows(WorldlineException.class, () -> StraightLineCraft.of(Vec3.ZERO,
                Vec3.of(1, 0, 0), 0, 0, 0, List.of(new LegSpec.Coast(new LegSpec.UntilSpeed(0.5 * C)))));
        assertEquals(0, e.legIndex());
    }

    @Test
    void anUntilDistanceBehindABrakingBurnThatTurnsRoundIsRejected() {
        // from 0.5 c braking at 1 g0 the craft never gets 1 ly ahead (it turns at 0.15 ly)
        WorldlineException e = assertThrows(WorldlineException.class, () -> StraightLineCraft.of(Vec3.ZERO,
                Vec3.of(1, 0, 0), 0, 0, 0.5 * C, List.of(
                        new LegSpec.Coast(new LegSpec.ClockDuration(1)),
                        new LegSpec.Burn(-G0, new LegSpec.UntilDistance(LY)))));
        assertEquals(1, e.legIndex());
    }

    @Test
    void aForeverLegThatIsNotLastIsRejected() {
        WorldlineException e = assertThrows(WorldlineException.class, () -> StraightLineCraft.of(Vec3.ZERO,
                Vec3.of(1, 0, 0), 0, 0, 0, List.of(
                        new LegSpec.Burn(G0, new LegSpec.ClockDuration(YR)),
                        new LegSpec.Burn(G0, new LegSpec.Forever()),
                        new LegSpec.Coast(new LegSpec.ClockDuration(YR)))));
        assertEquals(1, e.legIndex());
        assertTrue(e.getMessage().contains("last leg"), e.getMessage());
    }

    @Test
    void aZeroHeadingIsRejected() {
        WorldlineException e = assertThrows(WorldlineException.class, () -> StraightLineCraft.of(Vec3.ZERO,
                Vec3.ZERO, 0, 0, 0, List.of(new LegSpec.Burn(G0, new LegSpec.Forever()))));
        assertEquals(-1, e.legIndex());
        assertTrue(e.getMessage().contains("heading"), e.getMessage());
    }

    @Test
    void aStartSpeedAtOrAboveLightIsRejected() {
        assertThrows(WorldlineException.class, () -> StraightLineCraft.of(Vec3.ZERO, Vec3.of(1, 0, 0), 0, 0, C,
                List.of()));
        assertThrows(IllegalArgumentException.class, () -> InertialWorldline.of(Vec3.ZERO, Vec3.of(0, C, 0), 0));
    }

    @Test
    void aBurnNeedsAFiniteNonZeroAcceleration() {
        assertThrows(IllegalArgumentException.class, () -> new LegSpec.Burn(0, new LegSpec.Forever()));
        assertThrows(IllegalArgumentException.class, () -> new LegSpec.Burn(Double.NaN, new LegSpec.Forever()));
    }

    @Test
    void advanceAddsAShortStepFarIntoTheMissionWithItsOwnPrecision() {
        // a 1 ms step 30 yr in (on the open 2 g0 burn): the closed forms of Rindler (2006) in 70 digits,
        // sinh(eta1) = sinh(eta0) + a dt / c, ds = (c^2/a)(cosh eta1 - cosh eta0), du = c (eta1 - eta0)/a
        StraightLineCraft craft = wren();
        State from = craft.atTime(30 * YR);
        assertEquals(2 * G0, craft.legs().get(4).spec().accelerationMetresPerSecond2());
        assertTrue(from.timeSeconds() > craft.legs().get(4).start().timeSeconds());
        Step step = craft.advance(from, 1e-3);
        java.math.BigDecimal a = Decimal.of(2 * G0);
        java.math.BigDecimal eta0 = Decimal.of(from.rapidity());
        java.math.BigDecimal eta1 = Decimal.asinh(Decimal.add(Decimal.sinh(eta0),
                Decimal.div(Decimal.mul(a, Decimal.of(1e-3)), Decimal.C)));
        java.math.BigDecimal ds = Decimal.mul(Decimal.div(Decimal.mul(Decimal.C, Decimal.C), a),
                Decimal.sub(Decimal.cosh(eta1), Decimal.cosh(eta0)));
        java.math.BigDecimal du = Decimal.div(Decimal.mul(Decimal.C, Decimal.sub(eta1, eta0)), a);
        assertEquals(1e-3, step.dtSeconds(), 0.0);
        assertTrue(Decimal.relativeError(step.displacement().norm(), ds) < 1e-12, "displacement " + step.displacement());
        assertTrue(Decimal.relativeError(step.dClockSeconds(), du) < 1e-12, "clock step " + step.dClockSeconds());
    }
}
