package org.nullpath.worldline;

import java.math.BigDecimal;
import java.math.MathContext;
import java.util.List;
import java.util.Map;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;
import org.nullpath.reference.RefCraft;
import org.nullpath.spacetime.Vec3;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.nullpath.testkit.Si.C;
import static org.nullpath.testkit.Si.G0;
import static org.nullpath.testkit.Si.LY;
import static org.nullpath.testkit.Si.YR;

/**
 * Where legs end and when they are refused: the slack at a closed-form leg's own limit, until-distance on
 * coasts and burns against the 50-digit reference, until-speed at and beyond c, the bounds each leg kind
 * accepts, the figures it gives, and how numbers are written in refusals. Physics: Ackeret's rocket equation
 * (Ackeret 1946: rapidity budget (v_ex / c) ln R, so a rocket at proper acceleration a burns v_ex ln R / |a|
 * of craft clock), hyperbolic motion (Rindler 2006), time dilation on a coast (d tau = dx / (gamma v)). The
 * craft are invented.
 */
class LegLimitsAndRefusalsTest {
    static final double TOL = 1e-12;

    static StraightLineCraft fly(double startSpeed, LegSpec... legs) {
        return StraightLineCraft.of(Vec3.ZERO, Vec3.of(1, 0, 0), 0, 0, startSpeed, List.of(legs));
    }

    static WorldlineException refused(double startSpeed, LegSpec... legs) {
        return assertThrows(WorldlineException.class, () -> fly(startSpeed, legs));
    }

    static void close(String what, double actual, double expected, double tol) {
        assertEquals(expected, actual, tol * Math.abs(expected), what);
    }

    // a rocket at 1 g0 with v_ex = 0.5 c and mass ratio 4: burn time 0.5 c ln 4 / g0 (Ackeret)
    static final double VE = 0.5 * C;
    static final double RATIO = 4;
    static final double BURN = VE * Math.log(RATIO) / G0;

    @Test
    void aRocketDurationWithinTheSlackOfItsBurnTimeEndsAtTheBurnTime() {
        StraightLineCraft c = fly(0, new LegSpec.Rocket(G0, VE, RATIO,
                new LegSpec.ClockDuration(BURN * (1 + 0.5 * LegFlight.LIMIT_SLACK))));
        assertEquals(BURN, c.legs().get(0).end().clock(), "clamped to the limit");
        // rapidity at burnout: the whole budget, (v_ex / c) ln R
        close("rapidity at burnout", c.legs().get(0).end().rapidity(), 0.5 * Math.log(RATIO), TOL);
        WorldlineException e = refused(0, new LegSpec.Rocket(G0, VE, RATIO,
                new LegSpec.ClockDuration(BURN * (1 + 4 * LegFlight.LIMIT_SLACK))));
        assertTrue(e.aboutEnd());
        assertEquals(0, e.legIndex());
        // speed at burnout from rest: tanh(0.5 ln 4) = (4 - 1) / (4 + 1) = 0.6 c
        assertTrue(e.getMessage().contains("is not reached before the propellant is spent (after "
                + LegFlight.num(BURN) + " s of craft clock, at speed 0.6 c)"), e.getMessage());
        // a second leg starts from the first one's rapidity: burnout after the same time, at tanh(0.5 ln 4 + 0.5 ln 4)
        WorldlineException second = refused(0, new LegSpec.Rocket(G0, VE, RATIO),
                new LegSpec.Rocket(G0, VE, RATIO, new LegSpec.MissionDuration(10 * YR)));
        assertEquals(1, second.legIndex());
        // tanh(ln 4) = (16 - 1) / (16 + 1)
        assertTrue(second.getMessage().contains("at speed " + LegFlight.num(15.0 / 17) + " c)"), second.getMessage());
        assertTrue(second.getMessage().startsWith("duration-mission "), second.getMessage());
    }

    @Test
    void untilSpeedMustBeBelowLight() {
        for (double v : new double[] {C, -C, 1.5 * C}) {
            WorldlineException e = refused(0, new LegSpec.Burn(G0, new LegSpec.UntilSpeed(v)));
            assertEquals("until-speed must be below c in magnitude", e.getMessage());
            WorldlineException p = refused(0, new LegSpec.Profile(new double[] {0, YR}, new double[] {G0, G0},
                    new LegSpec.UntilSpeed(v)));
            assertEquals("until-speed must be below c in magnitude", p.getMessage());
        }
    }

    @ParameterizedTest(name = "coast at {0} c for {1} ly")
    @CsvSource({
        "0.5,   1.0",
        "-0.8, -2.0",
    })
    void aCoastReachesItsDistanceAtTheDilatedTime(double beta, double lightYears) {
        StraightLineCraft c = fly(beta * C, new LegSpec.Coast(new LegSpec.UntilDistance(lightYears * LY)));
        double gamma = 1 / Math.sqrt(1 - beta * beta);
        close("clock", c.legs().get(0).end().clock(), lightYears * LY / (gamma * beta * C), TOL);
        close("along", c.legs().get(0).end().along(), lightYears * LY, TOL);
    }

    @ParameterizedTest(name = "coast at {0} c: {1}")
    @CsvSource({
        "0.0,  the craft coasts at rest",
        "0.3,  the craft coasts the other way",
    })
    void aCoastNeverReachesADistanceAtRestOrBehindIt(double beta, String why) {
        WorldlineException e = refused(beta * C, new LegSpec.Coast(new LegSpec.UntilDistance(-LY)));
        assertEquals("until-distance is never reached: " + why.strip(), e.getMessage());
        assertTrue(e.aboutEnd());
    }

    @ParameterizedTest(name = "burn {0} g0 from {1} c to {2} ly")
    @CsvSource({
        // acceleration (g0), start speed (c), distance (ly)
        "1.0,   0.0,   1.0",   // from rest
        "-1.0,  0.0,  -0.5",   // from rest, backwards
        "-1.0,  0.6,   0.2",   // braking, reached before turning round
        "-1.0,  0.6,  -0.3",   // braking, turns round and passes the start
        "1.0,  -0.6,  -0.2",   // braking a backward flight
        "1.0,  -0.6,   0.4",   // turns round forwards
        "0.5,   0.9,   3.0",   // at speed already (|eta| >= 0.5)
        "-0.5, -0.9,  -3.0",
    })
    void aBurnEndsAtTheFirstCrossingOfItsDistance(double aG0, double beta, double lightYears) {
        double a = aG0 * G0;
        double d = lightYears * LY;
        StraightLineCraft c = fly(beta * C, new LegSpec.Burn(a, new LegSpec.UntilDistance(d)),
                new LegSpec.Coast(new LegSpec.ClockDuration(YR)));
        BigDecimal[] ref = RefCraft.start(null, new double[] {1, 0, 0}, 0, 0, beta * C).burnUntilDistance(a, d)
                .legEnd(0); // {t, clock, s, eta}
        LineState end = c.legs().get(0).end();
        assertRelative("clock", end.clock(), ref[1]);
        assertRelative("time", end.timeSeconds(), ref[0]);
        assertRelative("along", end.along(), ref[2]);
        assertRelative("rapidity", end.rapidity(), ref[3]);
    }

    static void assertRelative(String what, double actual, BigDecimal expected) {
        double rel = new BigDecimal(actual).subtract(expected).abs().divide(expected.abs(), MathContext.DECIMAL64)
                .doubleValue();
        assertTrue(rel <= TOL, what + ": got " + actual + ", reference " + expected.round(MathContext.DECIMAL64)
                + " (relative error " + rel + ")");
    }

    @Test
    void aZeroDistanceOrDurationOrASpeedAlreadyReachedEndsTheLegAtOnce() {
        StraightLineCraft c = fly(0.2 * C, new LegSpec.Burn(G0, new LegSpec.UntilDistance(0)),
                new LegSpec.Profile(new double[] {0, YR}, new double[] {G0, G0}, new LegSpec.UntilDistance(0)),
                new LegSpec.Profile(new double[] {0, YR}, new double[] {G0, G0}, new LegSpec.MissionDuration(0)),
                new LegSpec.Coast(new LegSpec.ClockDuration(1)));
        for (int i = 0; i < 3; i++) {
            assertEquals(0.0, c.legs().get(i).end().clock(), "leg " + i);
        }
        // the profile is flown through, so it may start an until-speed at the start speed as well
        StraightLineCraft p = fly(0.2 * C, new LegSpec.Profile(new double[] {0, YR}, new double[] {G0, G0},
                new LegSpec.UntilSpeed(0.2 * C)));
        assertEquals(0.0, p.legs().get(0).end().clock());
    }

    @Test
    void anIntegratedLegThatNeverReachesItsEndSaysHowFarItGot() {
        // constant 0.5 g0 for 0.1 yr from rest: speed tanh(0.5 g0 0.1 yr / c) at its end (Rindler)
        LegSpec.Profile p = new LegSpec.Profile(new double[] {0, 0.1 * YR}, new double[] {0.5 * G0, 0.5 * G0},
                new LegSpec.UntilSpeed(0.5 * C));
        WorldlineException e = refused(0, p);
        double end = Math.tanh(0.5 * G0 * 0.1 * YR / C);
        assertTrue(e.getMessage().startsWith("until-speed 0.5 c is not reached before the profile's last sample"
                + " (speed at the leg start 0 c, at its end "), e.getMessage());
        String got = e.getMessage().replaceAll(".*at its end ([-0-9.E]+) c\\)$", "$1");
        close("speed at the end", Double.parseDouble(got), end, 1e-10);
        WorldlineException tooLong = refused(0, new LegSpec.Profile(new double[] {0, YR}, new double[] {G0, G0},
                new LegSpec.ClockDuration(2 * YR)));
        assertEquals("duration " + LegFlight.num(2 * YR) + " s is not reached before the profile's last sample"
                + " (after " + LegFlight.num(YR) + " s of craft clock)", tooLong.getMessage());
        WorldlineException back = refused(0, new LegSpec.Profile(new double[] {0, YR}, new double[] {G0, G0},
                new LegSpec.MissionDuration(-YR)));
        assertTrue(back.getMessage().startsWith("duration-mission " + LegFlight.num(-YR) + " s is not reached"),
                back.getMessage());
    }

    @ParameterizedTest(name = "num({0}) = {1}")
    @CsvSource({
        // 12 significant digits, no trailing zeros; plain for 1e-4 <= |x| < 1e15 and for 0
        "0,                    0",
        "1.0E-4,               0.0001",
        "1.23456789012345E-7,  1.23456789012E-7",
        "123456789.123456789,  123456789.123",
        "-2.5,                 -2.5",
        "9.99999999999E14,     999999999999000",
        "1.0E15,               1E+15",
        "Infinity,             Infinity",
        "NaN,                  NaN",
    })
    void numbersInRefusalsHaveTwelveDigits(double x, String written) {
        assertEquals(written, LegFlight.num(x));
    }

    @Test
    void eachLegKindRefusesWhatItCannotFly() {
        Runnable[] refusedSpecs = {
            () -> new LegSpec.Rocket(G0, VE, 1.0),
            () -> new LegSpec.Rocket(G0, 0, 2.0),
            () -> new LegSpec.Rocket(G0, 1.0000001 * C, 2.0),
            () -> new LegSpec.ThrustRocket(1e3, 1e3, 0, VE),
            () -> new LegSpec.ThrustRocket(1e3, 1e3, 1e3, VE),
            () -> new LegSpec.ThrustRocket(1e3, 1e3, 5e2, 0),
            () -> new LegSpec.ThrustRocket(1e3, 1e3, 5e2, 1.0000001 * C),
            () -> new LegSpec.Sail(InertialWorldline.atRest(Vec3.ZERO), 1e9, 1, -1e-9, 0),
            () -> new LegSpec.Sail(InertialWorldline.atRest(Vec3.ZERO), 1e9, 1, 1 + 1e-9, 0),
            () -> new LegSpec.Sail(InertialWorldline.atRest(Vec3.ZERO), 0, 1, 0.5, 0),
            () -> new LegSpec.Sail(InertialWorldline.atRest(Vec3.ZERO), 1e9, 0, 0.5, 0),
            () -> new LegSpec.Profile(new double[] {0, 1, 1}, new double[] {1, 1, 1}),
            () -> new LegSpec.Profile(new double[] {1, 2}, new double[] {1, 1}),
        };
        for (int i = 0; i < refusedSpecs.length; i++) {
            assertThrows(IllegalArgumentException.class, refusedSpecs[i]::run, "spec " + i);
        }
        // the bounds themselves are allowed: v_ex = c, reflectivity 0 and 1
        assertEquals(Math.log(2), new LegSpec.Rocket(G0, C, 2.0).rapidityBudget(), 1e-16);
        assertEquals(1.0, new LegSpec.ThrustRocket(1e3, 1e3, 5e2, C).accelerationMetresPerSecond2());
        assertEquals(0.0, new LegSpec.Sail(InertialWorldline.atRest(Vec3.ZERO), 1e9, 1, 0, 0).reflectivity());
        assertEquals(1.0, new LegSpec.Sail(InertialWorldline.atRest(Vec3.ZERO), 1e9, 1, 1, 0).reflectivity());
        assertTrue(Double.isNaN(new LegSpec.Sail(InertialWorldline.atRest(Vec3.ZERO), 1e9, 1, 1, 0)
                .accelerationMetresPerSecond2()), "a sail's acceleration is not fixed in advance");
    }

    @Test
    void rocketFiguresFollowAckeret() {
        // Ackeret: rapidity budget (v_ex / c) ln R
        assertEquals(Map.of("mass_ratio", 4.0, "exhaust_speed_c", 0.5, "rapidity_budget", 0.5 * Math.log(4)),
                new LegSpec.Rocket(G0, VE, RATIO).figures());
        // F = 2 kN, m0 = 1000 kg, m1 = 250 kg, v_ex = 0.01 c: burn time (m0 - m1) v_ex / |F| = 750 x 0.01 c / 2000
        Map<String, Double> f = new LegSpec.ThrustRocket(-2e3, 1e3, 250, 0.01 * C).figures();
        assertEquals(4.0, f.get("mass_ratio"));
        assertEquals(0.01, f.get("exhaust_speed_c"), 1e-17);
        assertEquals(750.0, f.get("propellant_kg"));
        close("burn time", f.get("burn_time_s"), 750 * 0.01 * C / 2e3, 1e-15);
        assertEquals(-2.0, new LegSpec.ThrustRocket(-2e3, 1e3, 250, 0.01 * C).accelerationMetresPerSecond2());
    }

    @Test
    void aFlightKnowsItsOwnLimitAndWhetherItMayLastForEver() {
        LegStart rest = new LegStart(2, new LineState(0, 0, 0, 0, 0, 0), Vec3.ZERO, Vec3.of(1, 0, 0));
        LegFlight rocket = new LegSpec.Rocket(G0, VE, RATIO).fly(rest);
        close("Ackeret burn time", rocket.limit(), BURN, 1e-15);
        WorldlineException e = assertThrows(WorldlineException.class, rocket::forever);
        assertEquals("the leg cannot last for ever: it ends when the propellant is spent", e.getMessage());
        assertEquals(2, e.legIndex());
        LegFlight burn = new LegSpec.Burn(G0, new LegSpec.Forever()).fly(rest);
        assertEquals(Double.POSITIVE_INFINITY, burn.limit());
        assertEquals(Double.POSITIVE_INFINITY, burn.forever());
        assertTrue(fly(0, new LegSpec.Burn(G0, new LegSpec.Forever())).legs().get(0).openEnded());
        assertTrue(!fly(0, new LegSpec.Burn(G0, new LegSpec.ClockDuration(1))).legs().get(0).openEnded());
    }

    @Test
    void aFiniteLegBeyondWhatDoublesHoldIsRefused() {
        // 1e30 m/s^2 for 1 s of clock: rapidity a tau / c = 3.3e21 (Rindler), far past the limit of 700
        WorldlineException e = refused(0, new LegSpec.Burn(1e30, new LegSpec.ClockDuration(1)));
        assertEquals("the leg reaches a rapidity or distance beyond what double precision can hold (rapidity limit 700.0)",
                e.getMessage());
        assertEquals(0, e.legIndex());
    }

    @Test
    void aStateKnowsItsEventAndGamma() {
        State s = fly(0.6 * C).atTime(1e6);
        assertEquals(new org.nullpath.spacetime.Event(1e6, s.position()), s.event());
        // 0.6 c: gamma = 1.25 (Einstein 1905)
        close("gamma", s.gamma(), 1.25, 1e-15);
        close("beta", s.beta(), 0.6, 1e-15);
        close("velocity", s.velocity().x(), 0.6 * C, 1e-15);
        close("clock", s.clock(), 1e6 / 1.25, 1e-15);
    }
}
