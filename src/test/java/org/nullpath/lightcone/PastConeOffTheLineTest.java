package org.nullpath.lightcone;

import java.math.BigDecimal;
import java.util.List;

import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;
import org.nullpath.reference.RefCraft;
import org.nullpath.reference.RefEvent;
import org.nullpath.reference.RefSolver;
import org.nullpath.reference.RefStation;
import org.nullpath.spacetime.Vec3;
import org.nullpath.worldline.InertialWorldline;
import org.nullpath.worldline.LegSpec;
import org.nullpath.worldline.State;
import org.nullpath.worldline.StraightLineCraft;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;

/**
 * The past cone of an event off a craft's flight line (the latest send from the craft that still reaches a
 * station beside its line by a deadline), against the independent 50-digit reference (src/test/.../reference,
 * which never reads src/main), for sends during a burn, a coast and a braking burn.
 */
class PastConeOffTheLineTest {
    private static final double C = 299_792_458.0; // SI 2019
    private static final double G0 = 9.80665; // 3rd CGPM 1901
    private static final double YR = 31_557_600.0; // Julian year (IAU)
    private static final double LY = C * YR; // IAU

    private static final StraightLineCraft CRAFT = StraightLineCraft.of(Vec3.ZERO, new Vec3(1, 0, 0), 0, 0, 0, List.of(
            new LegSpec.Burn(G0, new LegSpec.ClockDuration(YR)),
            new LegSpec.Coast(new LegSpec.ClockDuration(YR)),
            new LegSpec.Burn(-G0, new LegSpec.UntilSpeed(0))));
    private static final RefCraft REF = RefCraft.start(new double[] {0, 0, 0}, new double[] {1, 0, 0}, 0, 0, 0)
            .burnForClock(G0, YR).coastForClock(YR).burnUntilSpeed(-G0, 0);

    @ParameterizedTest(name = "station at ({0}, {1}) ly, deadline {2} yr on its clock")
    @CsvSource({
        "0.3, 0.2, 1.2",
        "0.5, 0.4, 2.5",
        "-0.2, 0.7, 4.0",
        "2.0, 0.05, 5.5",
        "1.0, 3.0, 9.0",
    })
    void theLatestSendBesideTheLineMatchesTheReference(double x, double y, double deadlineYears) {
        double[] at = {x * LY, y * LY, 0};
        InertialWorldline station = InertialWorldline.atRest(new Vec3(at[0], at[1], at[2]));
        State deadline = station.atClock(deadlineYears * YR);
        SignalPath p = LightCone.past(deadline, CRAFT);
        assertFalse(p.onFlightLine(), "the off-line solve runs");
        RefEvent ref = RefSolver.latestSendArrivingBy(REF, RefStation.atRest(at), new BigDecimal(deadlineYears * YR));
        double clock = ref.clock().doubleValue();
        double time = ref.t().doubleValue();
        // 1e-12 relative, the accuracy the light-cone solver states for well-conditioned inputs
        assertEquals(clock, p.send().clock(), 1e-12 * Math.abs(clock), "latest send on the craft's clock");
        assertEquals(time, p.send().timeSeconds(), 1e-12 * Math.abs(time), "latest send in mission time");
        double lightTime = deadline.timeSeconds() - time;
        assertEquals(lightTime, p.lightTimeSeconds(), 1e-12 * lightTime, "light time");
        // the photon's displacement, reception minus emission: its length is c times the light time
        double[] emit = {ref.position()[0].doubleValue(), ref.position()[1].doubleValue(),
            ref.position()[2].doubleValue()};
        double length = C * lightTime;
        assertEquals(at[0] - emit[0], p.path().x(), 1e-12 * length, "path along x");
        assertEquals(at[1] - emit[1], p.path().y(), 1e-12 * length, "path along y");
        assertEquals(at[2] - emit[2], p.path().z(), 1e-12 * length, "path along z");
    }
}
