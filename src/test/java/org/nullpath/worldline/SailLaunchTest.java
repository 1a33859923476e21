package org.nullpath.worldline;

import java.util.List;

import org.junit.jupiter.api.Test;
import org.nullpath.spacetime.Vec3;
import org.nullpath.units.Constants;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

/**
 * A sail launched from its beam station (distance zero): the beam is a plane wave along the flight line,
 * so the push is the same as from any distance behind. Closed form for a station at rest and a sail from
 * rest (Kulkarni, Lubin &amp; Zhang, AJ 155:155, 2018, with D = exp(-eta)): d eta / du = k exp(-2 eta) / c,
 * k = (1 + R) P / (m c), so exp(2 eta) = 1 + 2 k u / c.
 */
class SailLaunchTest {
    private static final double C = Constants.C;
    private static final InertialWorldline ARRAY = InertialWorldline.of(Vec3.ZERO, Vec3.ZERO, 0);

    private static StraightLineCraft sailFrom(Vec3 start) {
        return StraightLineCraft.of(start, new Vec3(1, 0, 0), 0, 0, 0,
                List.of(new LegSpec.Sail(ARRAY, 1e9, 1.0, 1.0, 3600)));
    }

    @Test
    void aSailLaunchedFromItsBeamStationFollowsTheClosedForm() {
        StraightLineCraft craft = sailFrom(Vec3.ZERO);
        double k = 2 * 1e9 / (1.0 * C);
        for (double u : new double[] {1, 100, 1000, 3000}) {
            double expected = 0.5 * Math.log1p(2 * k * u / C);
            assertEquals(expected, craft.lineAtClock(u).rapidity(), 1e-10 * expected, "rapidity at u = " + u + " s");
        }
        // the same push as from 1 km behind the sail
        StraightLineCraft behind = sailFrom(new Vec3(1000, 0, 0));
        assertEquals(behind.lineAtClock(1000).rapidity(), craft.lineAtClock(1000).rapidity(),
                1e-12 * craft.lineAtClock(1000).rapidity());
    }

    @Test
    void aBeamStationAheadOfTheSailIsRefused() {
        WorldlineException e = assertThrows(WorldlineException.class, () -> sailFrom(new Vec3(-1000, 0, 0)));
        assertTrue(e.getMessage().contains("behind the craft (or where it is)"), e.getMessage());
    }
}
