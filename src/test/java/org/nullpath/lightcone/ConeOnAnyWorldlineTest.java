package org.nullpath.lightcone;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.nullpath.testkit.Si.C;
import static org.nullpath.testkit.Si.G0;
import static org.nullpath.testkit.Si.LY;
import static org.nullpath.testkit.Si.YR;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;
import org.nullpath.reference.RefArrival;
import org.nullpath.reference.RefEvent;
import org.nullpath.reference.RefSolver;
import org.nullpath.spacetime.Vec3;
import org.nullpath.worldline.InertialWorldline;
import org.nullpath.worldline.LegSpec;
import org.nullpath.worldline.State;
import org.nullpath.worldline.Worldline;

/**
 * The light-cone solve for a worldline the solver knows only through the {@link Worldline} interface (a
 * craft wrapped so that its type is hidden): the general bracketed solve of c T = |r(t_e + T) - r_e|, held
 * to the independent 50-digit reference (src/test/.../reference) at the product's 1e-12 relative for light
 * times, clocks and the photon's displacement, for sends and receptions beside and behind an invented
 * flight that starts moving, burns, coasts and brakes.
 */
class ConeOnAnyWorldlineTest {
    private static final TwinCraft FLIGHT = TwinCraft.of(new double[] {0.1 * LY, -0.2 * LY, 0},
            new double[] {2, 1, -1}, 0.3 * YR, 5e6, 0.1 * C,
            new LegSpec.Burn(0.5 * G0, new LegSpec.ClockDuration(YR)),
            new LegSpec.Coast(new LegSpec.ClockDuration(0.5 * YR)),
            new LegSpec.Burn(-0.8 * G0, new LegSpec.UntilSpeed(0)));
    private static final double TOL = 1e-12;

    private static void assertPath(double[] from, double[] to, Vec3 path, double lightTime) {
        double length = C * lightTime;
        assertEquals(to[0] - from[0], path.x(), TOL * length, "photon displacement along x");
        assertEquals(to[1] - from[1], path.y(), TOL * length, "photon displacement along y");
        assertEquals(to[2] - from[2], path.z(), TOL * length, "photon displacement along z");
    }

    private static double[] at(State s) {
        return new double[] {s.position().x(), s.position().y(), s.position().z()};
    }

    @ParameterizedTest(name = "station at ({0}, {1}, {2}) ly, moving at ({3}, 0, 0) c, sends at {4} yr")
    @CsvSource({
        "0.5, 0.4, 0.0, 0.0, 0.2",      // beside the line, before the burn
        "-1.0, 0.3, 0.2, 0.0, 1.1",     // behind, the craft receding during the burn
        "3.0, 2.0, -1.0, -0.3, 1.8",    // ahead, the craft coming during the coast
        "0.2, -0.1, 0.5, 0.6, 4.0",     // a station chasing the craft after it has stopped
    })
    void aSendReachesTheHiddenCraftWhereTheReferenceSays(double x, double y, double z, double beta,
                                                         double sendYears) {
        InertialWorldline station = InertialWorldline.of(Vec3.of(x * LY, y * LY, z * LY), Vec3.of(beta * C, 0, 0), 0);
        State send = station.atTime(sendYears * YR);
        SignalPath p = LightCone.future(send, FLIGHT.opaque());
        RefArrival ref = RefSolver.futureCone(send.timeSeconds(), at(send), FLIGHT.ref());
        assertTrue(p.delivered());
        assertFalse(p.onFlightLine(), "the general solve does not claim the flight line");
        assertEquals(ref.lightTimeDouble(), p.lightTimeSeconds(), TOL * ref.lightTimeDouble(), "light time");
        assertEquals(ref.clockDouble(), p.receive().clock(), TOL * Math.abs(ref.clockDouble()), "craft clock at arrival");
        assertEquals(ref.tDouble(), p.receive().timeSeconds(), TOL * Math.abs(ref.tDouble()), "arrival time");
        assertPath(at(send), ref.positionDouble(), p.path(), ref.lightTimeDouble());
    }

    @ParameterizedTest(name = "station at ({0}, {1}, {2}) ly, deadline {3} yr")
    @CsvSource({
        "0.5, 0.4, 0.0, 1.0",
        "-1.0, 0.3, 0.2, 2.5",
        "3.0, 2.0, -1.0, 4.0",
        "0.2, -0.1, 0.5, 9.0",
    })
    void theLatestSendFromTheHiddenCraftIsWhereTheReferenceSays(double x, double y, double z, double deadlineYears) {
        State receive = InertialWorldline.atRest(Vec3.of(x * LY, y * LY, z * LY)).atTime(deadlineYears * YR);
        SignalPath p = LightCone.past(receive, FLIGHT.opaque());
        RefEvent ref = RefSolver.pastCone(RefEvent.of(receive.timeSeconds(), at(receive)), FLIGHT.ref());
        double lightTime = receive.timeSeconds() - ref.tDouble();
        assertEquals(lightTime, p.lightTimeSeconds(), TOL * lightTime, "light time");
        assertEquals(ref.clockDouble(), p.send().clock(), TOL * Math.abs(ref.clockDouble()), "craft clock at the send");
        assertEquals(ref.tDouble(), p.send().timeSeconds(), TOL * Math.abs(ref.tDouble()), "send time");
        assertPath(ref.positionDouble(), at(receive), p.path(), lightTime);
    }

    @Test
    void aSignalFromTheHiddenCraftToItselfTakesNoTime() {
        // an event on the worldline lies on its own cone: zero light time, both ways (definition of the cone);
        // the event is taken at a mission time, where the worldline's own state there is the same double state
        Worldline hidden = FLIGHT.opaque();
        State on = hidden.atTime(0.9 * YR);
        SignalPath out = LightCone.future(on, hidden);
        SignalPath in = LightCone.past(on, hidden);
        assertEquals(0.0, out.lightTimeSeconds());
        assertEquals(0.0, in.lightTimeSeconds());
        assertEquals(on.clock(), out.receive().clock());
        assertEquals(on.clock(), in.send().clock());
        assertTrue(out.path().isZero() && in.path().isZero());
    }
}
