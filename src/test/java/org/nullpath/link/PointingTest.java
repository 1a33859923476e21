package org.nullpath.link;

import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;
import org.junit.jupiter.api.Test;
import org.nullpath.spacetime.Vec3;
import org.nullpath.worldline.State;

import static org.junit.jupiter.api.Assertions.assertEquals;

/**
 * The antenna pattern of {@link Pointing} against its stated rule, G(theta) = G0 - 12 (theta / theta_3dB)^2 dB
 * floored at the sidelobe level (common link-budget practice, no single source), and the default width
 * 70 lambda / D degrees (common practice for a parabolic reflector, cited from memory).
 */
class PointingTest {
    private static Pointing fixed(double sidelobe) {
        return new Pointing(Pointing.Boresight.FIXED, Vec3.of(1, 0, 0), Math.toRadians(2), 0, sidelobe);
    }

    /** theta / theta_3dB, G0 dBi, sidelobe dBi, the loss the rule gives (worked by hand: 12 r^2, capped at G0 - floor). */
    @ParameterizedTest(name = "r {0}, G0 {1}, floor {2}")
    @CsvSource(textBlock = """
        0,    40, -10, 0
        0.5,  40, -10, 3
        1,    40, -10, 12
        1.5,  40, -10, 27
        2,    40, -10, 48
        2.5,  40, -10, 50
        90,   40, -10, 50
        1,    40,  35, 5
        1,     5,  10, 0
        0.25,  0, -10, 0.75
        """)
    void lossFollowsTheTwelveDecibelRuleDownToTheSidelobeLevel(double r, double g0, double floor, double loss) {
        double width = Math.toRadians(2);
        assertEquals(loss, fixed(floor).lossDb(g0, r * width, width), 1e-12, "12 (theta / theta_3dB)^2, floored");
    }

    @Test
    void theDefaultBeamwidthIsSeventyLambdaOverDDegrees() {
        // 4 m at 8.4 GHz: lambda = c / f = 0.035689578333... m (c exact, SI 2019), 70 lambda / D = 0.624567... deg
        double lambda = 299_792_458.0 / 8.4e9;
        assertEquals(Math.toRadians(70 * lambda / 4), Pointing.defaultBeamwidthRadians(4, 8.4e9), 1e-18);
        assertEquals(0.6245676208333333, Math.toDegrees(Pointing.defaultBeamwidthRadians(4, 8.4e9)), 1e-15);
        Pointing aperture = new Pointing(Pointing.Boresight.TRACKING, null, Double.NaN, 1e-3, -10);
        assertEquals(Pointing.defaultBeamwidthRadians(4, 8.4e9),
                aperture.beamwidthRadians(new Antenna.Aperture(4, 0.6), 8.4e9), 0.0, "the aperture's own default");
        assertEquals(Double.NaN, aperture.beamwidthRadians(new Antenna.FixedGain(60), 8.4e9), "no diameter, no default");
    }

    @Test
    void offBoresightAnglesFollowTheBoresight() {
        Vec3 heading = Vec3.of(2, 3, 6).times(1.0 / 7);
        State craft = new State(0, 0, Vec3.ZERO, heading, 0.7);
        Vec3 behind = heading.times(-1);
        assertEquals(0.0, new Pointing(Pointing.Boresight.AFT, null, 0.01, 0, -10).offBoresightRadians(behind, craft),
                0.0, "aft antenna, signal straight behind");
        assertEquals(Math.PI, new Pointing(Pointing.Boresight.FORWARD, null, 0.01, 0, -10)
                .offBoresightRadians(behind, craft), 0.0, "forward antenna, signal straight behind");
        assertEquals(Math.PI / 2, new Pointing(Pointing.Boresight.FIXED, Vec3.of(0, 0, 1), 0.01, 0, -10)
                .offBoresightRadians(Vec3.of(1, 0, 0), craft), 1e-16, "fixed boresight at right angles");
        assertEquals(2e-4, new Pointing(Pointing.Boresight.TRACKING, null, 0.01, 2e-4, -10)
                .offBoresightRadians(behind, craft), 0.0, "tracking: the pointing error");
    }
}
