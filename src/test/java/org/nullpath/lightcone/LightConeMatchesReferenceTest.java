package org.nullpath.lightcone;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.nullpath.testkit.Si.C;
import static org.nullpath.testkit.Si.G0;
import static org.nullpath.testkit.Si.LY;
import static org.nullpath.testkit.Si.YR;

import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.Arguments;
import org.junit.jupiter.params.provider.CsvSource;
import org.junit.jupiter.params.provider.MethodSource;
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
        assertArrival(send, target(hidden), FLIGHT, onFlightLine);
    }

    private static void assertArrival(State send, Worldline receiver, TwinCraft flight, boolean onFlightLine) {
        SignalPath p = LightCone.future(send, receiver);
        RefArrival ref = RefSolver.futureCone(send.timeSeconds(), at(send), flight.ref());
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

    /**
     * Stations 0.02 to 2 ly off the flight line, level with the craft, behind it or ahead of it at the moment of
     * the send (or of the deadline), on each leg: light times from a week to years, so that the off-line solve
     * runs from guesses both good and poor. The grid is invented for the test; each point against the 50-digit
     * reference at 1e-12 (all well conditioned: docs/physics.md, "How well a light time is known").
     */
    @ParameterizedTest(name = "{0} m off the line, {1} of that along it, at {2} yr")
    @MethodSource("offLineGrid")
    void stationsNearAndFarOffTheLineMatchTheReference(double offMetres, double alongRatio, double years) {
        assertBothCones(FLIGHT, offMetres, alongRatio, years * YR);
    }

    static java.util.stream.Stream<Arguments> offLineGrid() {
        java.util.stream.Stream.Builder<Arguments> grid = java.util.stream.Stream.builder();
        for (double along : new double[] {-20, -1, 0, 1, 20}) {
            for (double off : new double[] {0.02 * LY, 0.3 * LY, 2 * LY}) {
                for (double years : new double[] {0.2, 0.9, 1.5, 2.4}) {
                    grid.add(Arguments.of(off, along, years));
                }
            }
        }
        return grid.build();
    }

    /**
     * Stations 100 km and 3000 km off the line of a craft 100 s into a 1 g0 burn from rest at the origin, level
     * with it, ahead or behind: light times from 0.33 ms, 2e5 times shorter than the send time, so that a light time taken
     * as the difference of two rounded times would already be off by 1e-11 relative.
     */
    @ParameterizedTest(name = "{0} m off the line, {1} of that along it")
    @CsvSource({"1e5, -1", "1e5, 1", "1e5, 0", "3e6, -20", "3e6, 20"})
    void aStationAHundredKilometresOffTheLineMatchesTheReference(double offMetres, double alongRatio) {
        assertBothCones(ALONG_X, offMetres, alongRatio, 100.0);
    }

    private static void assertBothCones(TwinCraft flight, double offMetres, double alongRatio, double seconds) {
        Vec3 heading = flight.craft().heading();
        Vec3 tilt = Vec3.of(1, -2, 0.5);
        Vec3 across = tilt.minus(heading.times(heading.dot(tilt))).unit();
        Vec3 where = flight.craft().atTime(seconds).position().plus(across.times(offMetres))
                .plus(heading.times(alongRatio * offMetres));
        InertialWorldline station = InertialWorldline.atRest(where);
        assertArrival(station.atTime(seconds), flight.craft(), flight, false);
        assertEmission(station.atTime(seconds), flight.craft(), flight);
    }

    private static void assertEmission(State receive, boolean hidden) {
        assertEmission(receive, target(hidden), FLIGHT);
    }

    private static void assertEmission(State receive, Worldline sender, TwinCraft flight) {
        SignalPath p = LightCone.past(receive, sender);
        RefEvent ref = RefSolver.pastCone(RefEvent.of(receive.timeSeconds(), at(receive)), flight.ref());
        // the light time as the reference's own difference, rounded once (not a difference of two rounded times)
        double lightTime = new java.math.BigDecimal(receive.timeSeconds()).subtract(ref.t()).doubleValue();
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
