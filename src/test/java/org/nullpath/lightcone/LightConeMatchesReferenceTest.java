package org.nullpath.lightcone;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.nullpath.testkit.Si.C;
import static org.nullpath.testkit.Si.G0;
import static org.nullpath.testkit.Si.LY;
import static org.nullpath.testkit.Si.YR;

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
 * Future and past cones of an invented flight that starts moving, burns, coasts and brakes, held to the
 * independent 50-digit reference (src/test/.../reference) at the product's 1e-12 relative for light times,
 * clocks and the photon's displacement, for stations beside, behind and ahead of it and on its line. Each
 * case runs twice: against the craft itself (the solves in null coordinates on and off its line) and against
 * the same craft known only through the {@link Worldline} interface ({@link TwinCraft#opaque}), which takes
 * the general bracketed solve of c T = |r(t_e + T) - r_e|.
 */
class LightConeMatchesReferenceTest {
    private static final TwinCraft FLIGHT = TwinCraft.of(new double[] {0.1 * LY, -0.2 * LY, 0},
            new double[] {2, 1, -1}, 0.3 * YR, 5e6, 0.1 * C,
            new LegSpec.Burn(0.5 * G0, new LegSpec.ClockDuration(YR)),
            new LegSpec.Coast(new LegSpec.ClockDuration(0.5 * YR)),
            new LegSpec.Burn(-0.8 * G0, new LegSpec.UntilSpeed(0)));
    /** From rest at the origin along +x: along-track distances are the x coordinates themselves, exactly. */
    private static final TwinCraft ALONG_X = TwinCraft.of(new double[] {0, 0, 0}, new double[] {1, 0, 0}, 0, 0, 0,
            new LegSpec.Burn(G0, new LegSpec.ClockDuration(YR)));
    private static final double TOL = 1e-12;

    private static void assertPath(double[] from, double[] to, Vec3 path, double lightTime) {
        double length = C * lightTime;
        assertEquals(to[0] - from[0], path.x(), TOL * length, "photon displacement along x");
        assertEquals(to[1] - from[1], path.y(), TOL * length, "photon displacement along y");
        assertEquals(to[2] - from[2], path.z(), TOL * length, "photon displacement along z");
    }

    private static Worldline target(boolean hidden) {
        return hidden ? FLIGHT.opaque() : FLIGHT.craft();
    }

    /** A point {@code alongLy} light years from the flight's start along its heading. */
    private static double[] onTheLine(double alongLy) {
        Vec3 p = FLIGHT.craft().origin().plus(FLIGHT.craft().heading().times(alongLy * LY));
        return new double[] {p.x(), p.y(), p.z()};
    }

    private static double[] at(State s) {
        return new double[] {s.position().x(), s.position().y(), s.position().z()};
    }

    @ParameterizedTest(name = "station at ({0}, {1}, {2}) ly, moving at ({3}, 0, 0) c, sends at {4} yr, hidden {5}")
    @CsvSource({
        "0.5, 0.4, 0.0, 0.0, 0.2, false",      // beside the line, before the burn
        "0.5, 0.4, 0.0, 0.0, 0.2, true",
        "-1.0, 0.3, 0.2, 0.0, 1.1, false",     // behind, the craft receding during the burn
        "-1.0, 0.3, 0.2, 0.0, 1.1, true",
        "3.0, 2.0, -1.0, -0.3, 1.8, false",    // ahead, the craft coming during the coast
        "3.0, 2.0, -1.0, -0.3, 1.8, true",
        "0.2, -0.1, 0.5, 0.6, 4.0, false",     // a station chasing the craft after it has stopped
        "0.2, -0.1, 0.5, 0.6, 4.0, true",
    })
    void aSendReachesTheCraftWhereTheReferenceSays(double x, double y, double z, double beta, double sendYears,
                                                   boolean hidden) {
        InertialWorldline station = InertialWorldline.of(Vec3.of(x * LY, y * LY, z * LY), Vec3.of(beta * C, 0, 0), 0);
        assertArrival(station.atTime(sendYears * YR), hidden, false);
    }

    @ParameterizedTest(name = "station at rest {0} ly along the line, sends at {1} yr, hidden {2}")
    @CsvSource({"-0.5, 0.5, false", "-0.5, 0.5, true", "4.0, 1.2, false", "4.0, 1.2, true"})
    void aSendFromTheFlightLineReachesTheCraftWhereTheReferenceSays(double alongLy, double sendYears, boolean hidden) {
        // behind the start (the photon chases the craft) and far ahead (the craft comes towards it)
        assertArrival(InertialWorldline.atRest(TwinCraft.vec(onTheLine(alongLy))).atTime(sendYears * YR), hidden, !hidden);
    }

    private static void assertArrival(State send, boolean hidden, boolean onFlightLine) {
        SignalPath p = LightCone.future(send, target(hidden));
        RefArrival ref = RefSolver.futureCone(send.timeSeconds(), at(send), FLIGHT.ref());
        assertTrue(p.delivered());
        assertEquals(onFlightLine, p.onFlightLine(), "the signal is said to run along the flight line");
        assertEquals(ref.lightTimeDouble(), p.lightTimeSeconds(), TOL * ref.lightTimeDouble(), "light time");
        assertEquals(ref.clockDouble(), p.receive().clock(), TOL * Math.abs(ref.clockDouble()), "craft clock at arrival");
        assertEquals(ref.tDouble(), p.receive().timeSeconds(), TOL * Math.abs(ref.tDouble()), "arrival time");
        assertPath(at(send), ref.positionDouble(), p.path(), ref.lightTimeDouble());
    }

    @ParameterizedTest(name = "station at ({0}, {1}, {2}) ly, deadline {3} yr, hidden {4}")
    @CsvSource({
        "0.5, 0.4, 0.0, 1.0, false",
        "0.5, 0.4, 0.0, 1.0, true",
        "-1.0, 0.3, 0.2, 2.5, false",
        "-1.0, 0.3, 0.2, 2.5, true",
        "3.0, 2.0, -1.0, 4.0, false",
        "3.0, 2.0, -1.0, 4.0, true",
        "0.2, -0.1, 0.5, 9.0, false",
        "0.2, -0.1, 0.5, 9.0, true",
    })
    void theLatestSendFromTheCraftIsWhereTheReferenceSays(double x, double y, double z, double deadlineYears,
                                                          boolean hidden) {
        assertEmission(InertialWorldline.atRest(Vec3.of(x * LY, y * LY, z * LY)).atTime(deadlineYears * YR), hidden);
    }

    @ParameterizedTest(name = "station at rest {0} ly along the line, deadline {1} yr, hidden {2}")
    @CsvSource({"-0.5, 2.0, false", "-0.5, 2.0, true", "4.0, 3.0, false", "4.0, 3.0, true"})
    void theLatestSendFromTheCraftToItsLineIsWhereTheReferenceSays(double alongLy, double deadlineYears,
                                                                    boolean hidden) {
        assertEmission(InertialWorldline.atRest(TwinCraft.vec(onTheLine(alongLy))).atTime(deadlineYears * YR), hidden);
    }

    private static void assertEmission(State receive, boolean hidden) {
        SignalPath p = LightCone.past(receive, target(hidden));
        RefEvent ref = RefSolver.pastCone(RefEvent.of(receive.timeSeconds(), at(receive)), FLIGHT.ref());
        double lightTime = receive.timeSeconds() - ref.tDouble();
        assertEquals(lightTime, p.lightTimeSeconds(), TOL * lightTime, "light time");
        assertEquals(ref.clockDouble(), p.send().clock(), TOL * Math.abs(ref.clockDouble()), "craft clock at the send");
        assertEquals(ref.tDouble(), p.send().timeSeconds(), TOL * Math.abs(ref.tDouble()), "send time");
        assertPath(ref.positionDouble(), at(receive), p.path(), lightTime);
    }

    @ParameterizedTest(name = "hidden {0}")
    @CsvSource({"false", "true"})
    void aSignalFromTheCraftToItselfTakesNoTime(boolean hidden) {
        // an event on the worldline lies on its own cone: zero light time, both ways (definition of the cone);
        // the event is taken at a mission time, where the worldline's own state there is the same double state,
        // on a line along x, where that state's along-track distance is exact
        Worldline craft = hidden ? ALONG_X.opaque() : ALONG_X.craft();
        State on = craft.atTime(0.9 * YR);
        SignalPath out = LightCone.future(on, craft);
        SignalPath in = LightCone.past(on, craft);
        assertEquals(0.0, out.lightTimeSeconds());
        assertEquals(0.0, in.lightTimeSeconds());
        assertEquals(on.clock(), out.receive().clock());
        assertEquals(on.clock(), in.send().clock());
        assertTrue(out.path().isZero() && in.path().isZero());
    }
}
