package org.nullpath.lightcone;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.nullpath.lightcone.Flights.YR;

import java.util.List;

import org.junit.jupiter.api.Test;
import org.nullpath.spacetime.Vec3;
import org.nullpath.worldline.InertialWorldline;
import org.nullpath.worldline.LegSpec;
import org.nullpath.worldline.State;
import org.nullpath.worldline.StraightLineCraft;

/**
 * The off-line cone's search for an upper end must stay within the craft's representable clock
 * ({@link StraightLineCraft#maxClock}): a case found by LightConeLawsTest's horizon property (seed
 * 2683291692490609928), where doubling the craft-clock step from a poor first guess walked an open-ended
 * reverse burn past rapidity 700 and the solve threw, although the signal arrives long before that.
 */
class OffLineSearchLimitTest {
    private static StraightLineCraft craft() {
        return StraightLineCraft.of(Vec3.of(-1.4217339873429388E16, -8.474718965450283E15, -1.5766168740202218E15),
                Vec3.of(0.609098611, 0.892264002, -0.694486036), 1.3812475757731603E7, -6199901.835315909,
                2.591015641196589E8, List.of(
                        new LegSpec.Burn(12.57000340571955, new LegSpec.ClockDuration(3.90479318052192E7)),
                        new LegSpec.Burn(12.9349730759704, new LegSpec.ClockDuration(2.90587259289384E7)),
                        new LegSpec.Burn(17.25296027080115, new LegSpec.ClockDuration(3.47645153745216E7)),
                        new LegSpec.Burn(-6.6937696715309, new LegSpec.Forever())));
    }

    private static InertialWorldline station() {
        return InertialWorldline.of(Vec3.of(1.8673721961550924E16, 5.637600471578875E14, -2.3018836773853308E16),
                Vec3.of(8.51384264439536E7, -1.1241794132812253E8, 1.6507138948561493E8), 2.973684419665939E7);
    }

    @Test
    void aSendJustBeforeTheHorizonArrivesWithinTheRepresentableClock() {
        StraightLineCraft craft = craft();
        InertialWorldline home = station();
        Horizon h = LightCone.horizon(home, craft);
        assertTrue(h.exists(), "an open-ended burn has a horizon");
        double th = h.lastSend().timeSeconds();
        double delta = Math.pow(10, -6.317) * Math.max(Math.abs(th), YR);
        SignalPath p = LightCone.future(home.atTime(th - delta), craft);
        assertTrue(p.delivered(), "just before the horizon");
        State arrival = p.receive();
        // the arrival itself is an ordinary state of the craft, well inside the limit the search must respect
        assertTrue(arrival.clock() < craft.maxClock(), arrival.clock() + " against " + craft.maxClock());
        assertTrue(Math.abs(arrival.rapidity()) < StraightLineCraft.MAX_RAPIDITY, "rapidity " + arrival.rapidity());
        // and it lies on the send's future light cone: c T = |r_rx - r_tx| (the definition of the solve), to the
        // 1e-12 relative the product holds light times to where they are well conditioned
        double distance = arrival.position().minus(p.send().position()).norm();
        double cT = Flights.C * p.lightTimeSeconds();
        assertEquals(cT, distance, 1e-12 * cT);
        assertEquals(arrival.timeSeconds(), p.send().timeSeconds() + p.lightTimeSeconds(),
                1e-12 * p.lightTimeSeconds());
        assertFalse(LightCone.future(home.atTime(th + delta), craft).delivered(), "just after the horizon");
    }
}
