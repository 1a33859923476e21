package org.nullpath.worldline;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;

import org.apache.commons.math3.ode.FirstOrderDifferentialEquations;
import org.apache.commons.math3.ode.FirstOrderIntegrator;
import org.apache.commons.math3.ode.nonstiff.GraggBulirschStoerIntegrator;
import org.junit.jupiter.api.Test;
import org.nullpath.spacetime.Vec3;

/**
 * until-speed and until-distance on legs that end by their own physics (rocket at constant
 * acceleration, rocket at constant thrust, sail, profile), against closed forms where they exist and
 * otherwise against an independent integration: Apache Commons Math 3.6.1's Gragg–Bulirsch–Stoer
 * integrator with its own event location (not Hipparchus, not the dense-output root search of
 * {@link IntegratedPiece#firstReach}) of d(eta)/du = a/c, dt/du = cosh(eta), ds/du = c sinh(eta)
 * (hyperbolic motion: Rindler, Relativity: Special, General and Cosmological, 2006; MTW 1973 ch. 6).
 *
 * <p>Tolerances: closed forms 1e-12 relative (the end is a root of a closed form or of the dense
 * output, located to {@link IntegratedPiece#ROOT_TOLERANCE}; the integration itself meets 1e-13 per
 * step); the independent integration 1e-10 relative, as in {@link ProfiledLegsAgainstCommonsMathTest}.
 * All craft and numbers here are invented for the tests.
 */
class LimitedLegEndsTest {
    static final double C = 299_792_458.0;
    static final double G0 = 9.80665; // standard gravity, CGPM 1901
    static final double INDEPENDENT = 1e-10;
    static final double CLOSED = 1e-12;

    /**
     * Integrates [eta, t, s] from {@code y0} through the knots until the stop event; returns
     * [u, eta, t, s] at the event, or null when the last knot comes first.
     */
    static double[] commonsMathUntil(ProfiledLegsAgainstCommonsMathTest.Law law, double[] y0, double[] knots,
                                     IndependentIntegrationTest.Stop stop) {
        double[] y = y0.clone();
        FirstOrderDifferentialEquations ode = ProfiledLegsAgainstCommonsMathTest.equations(law);
        for (int i = 1; i < knots.length; i++) {
            double span = knots[i] - knots[i - 1];
            FirstOrderIntegrator gbs = new GraggBulirschStoerIntegrator(1e-12, span,
                    new double[] {1e-20, 1e-12, 1e-4}, new double[] {1e-14, 1e-14, 1e-14});
            // check every 1/1000 of the span, locate to 1e-9 s of proper time
            gbs.addEventHandler(stop, span / 1000, 1e-9, 1000);
            double end = gbs.integrate(ode, knots[i - 1], y, knots[i], y);
            if (end < knots[i]) {
                return new double[] {end, y[0], y[1], y[2]};
            }
        }
        return null;
    }

    private static StraightLineCraft fly(LegSpec... legs) {
        return StraightLineCraft.of(Vec3.ZERO, Vec3.of(1, 0, 0), 0, 0, 0, List.of(legs));
    }

    private static void assertRelative(double expected, double actual, double tol, String what) {
        assertEquals(expected, actual, tol * Math.abs(expected), what);
    }

    /** The end of the leg against the independent integration [u, eta, t, s]. */
    private static void assertEndMatches(double[] ref, LineState end, String what) {
        assertTrue(ref != null, what + ": the reference integration must reach the end condition");
        assertRelative(ref[0], end.clock(), INDEPENDENT, what + ": end clock");
        assertRelative(ref[1], end.rapidity(), INDEPENDENT, what + ": end rapidity");
        assertRelative(ref[2], end.timeSeconds(), INDEPENDENT, what + ": end mission time");
        assertRelative(ref[3], end.along(), INDEPENDENT, what + ": end distance");
    }

    private static WorldlineException refused(int leg, LegSpec... legs) {
        WorldlineException e = assertThrows(WorldlineException.class, () -> fly(legs));
        assertEquals(leg, e.legIndex(), e.getMessage());
        assertTrue(e.aboutEnd(), "the refusal is about the end condition: " + e.getMessage());
        return e;
    }

    // --- rocket at constant proper acceleration: closed forms --------------------------------------

    /** Budget (Ackeret 1946): delta eta = (v_ex / c) ln 10 = 1.1513, about 0.818 c. */
    private static LegSpec.Rocket rocket(LegSpec.LegEnd end) {
        return new LegSpec.Rocket(G0, 0.5 * C, 10, end);
    }

    @Test
    void aRocketStopsAtItsUntilSpeedOnTheHyperbola() {
        // 0.6 c is rapidity ln 2 exactly (atanh 0.6 = ln 2): cosh = 5/4, sinh = 3/4, so at constant a
        // u = (c/a) ln 2, t = (c/a) 3/4, s = (c^2/a) (cosh - 1) = (c^2/a) / 4
        LineState end = fly(rocket(new LegSpec.UntilSpeed(0.6 * C))).legs().get(0).end();
        assertRelative(C / G0 * Math.log(2), end.clock(), CLOSED, "craft clock");
        assertRelative(Math.log(2), end.rapidity(), CLOSED, "rapidity");
        assertRelative(0.75 * C / G0, end.timeSeconds(), CLOSED, "mission time");
        assertRelative(0.25 * C * C / G0, end.along(), CLOSED, "distance");
    }

    @Test
    void aRocketStopsAtItsUntilDistanceOnTheHyperbola() {
        // cosh(eta) = 1 + a d / c^2 = 5/4 for d = c^2 / (4 a): speed 0.6 c after (c/a) ln 2
        LineState end = fly(rocket(new LegSpec.UntilDistance(0.25 * C * C / G0))).legs().get(0).end();
        assertRelative(C / G0 * Math.log(2), end.clock(), CLOSED, "craft clock");
        assertRelative(0.6, Math.tanh(end.rapidity()), CLOSED, "speed / c");
        assertRelative(0.75 * C / G0, end.timeSeconds(), CLOSED, "mission time");
    }

    @Test
    void aRocketRefusesAnUntilSpeedBeyondItsPropellant() {
        LegSpec coast = new LegSpec.Coast(new LegSpec.ClockDuration(1000));
        // 0.875 c (exact in doubles, as is 0.875 c / c) is beyond the budget's 9/11 c
        WorldlineException e = refused(1, coast, rocket(new LegSpec.UntilSpeed(0.875 * C)));
        assertTrue(e.getMessage().contains("until-speed 0.875 c is not reached before the propellant is spent"),
                e.getMessage());
        // the speed then is the rocket equation's (MR^(2 v_ex/c) - 1) / (MR^(2 v_ex/c) + 1) = 9/11 c
        assertTrue(e.getMessage().contains("0.81818181818"), e.getMessage());
    }

    @Test
    void aRocketRefusesAnUntilSpeedBehindIt() {
        WorldlineException e = refused(0, rocket(new LegSpec.UntilSpeed(-0.1 * C)));
        assertTrue(e.getMessage().contains("until-speed -0.1 c is never reached"), e.getMessage());
    }

    @Test
    void aRocketRefusesAnUntilDistanceBeyondItsPropellant() {
        // the budget covers (c^2/a)(cosh(1.1513) - 1) = 0.7393 c^2/a; one c^2/a is too far
        WorldlineException e = refused(0, rocket(new LegSpec.UntilDistance(C * C / G0)));
        assertTrue(e.getMessage().contains("until-distance") && e.getMessage().contains("propellant is spent"),
                e.getMessage());
    }

    @Test
    void anUntilSpeedOfExactlyWhatThePropellantBuysIsAccepted() {
        // Ackeret: MR = 10, v_ex = c/2 gives (10 - 1) / (10 + 1) = 9/11 c, at the end of the burn, which
        // the closed form may put an ulp beyond the limit (LegFlight.LIMIT_SLACK)
        LegSpec.Rocket r = rocket(new LegSpec.UntilSpeed(9.0 / 11.0 * C));
        LineState end = fly(r).legs().get(0).end();
        assertRelative(r.burnTime(), end.clock(), 1e-12, "ends where the propellant is spent");
        assertRelative(0.5 * Math.log(10), end.rapidity(), 1e-12, "with the whole rapidity budget");
    }

    @Test
    void aLegWithItsOwnLimitCannotLastForEverAndABurnHasNoLimitToEndAt() {
        WorldlineException forever = refused(0, rocket(new LegSpec.Forever()));
        assertTrue(forever.getMessage().contains("cannot last for ever"), forever.getMessage());
        WorldlineException beam = refused(0, new LegSpec.Burn(G0, new LegSpec.BeamOff()));
        assertTrue(beam.getMessage().contains("no end of its own"), beam.getMessage());
    }

    @Test
    void aRocketWithoutAnEndBurnsItsWholeBudget() {
        LineState end = fly(new LegSpec.Rocket(G0, 0.5 * C, 10)).legs().get(0).end();
        assertRelative(0.5 * Math.log(10), end.rapidity(), 1e-15, "Ackeret's rapidity budget");
    }

    // --- rocket at constant thrust: Ackeret's equation and the independent integration --------------

    private static final double F = 2e6;
    private static final double M0 = 1e5;
    private static final double M1 = 2e4;
    private static final double VE = 0.1 * C;

    private static double[] thrustKnots() {
        return new double[] {0, (M0 - M1) * VE / F};
    }

    @Test
    void aThrustRocketStopsAtItsUntilSpeedWhereAckeretSays() {
        for (double sign : new double[] {1, -1}) {
            double v = sign * 0.1 * C;
            LineState end = fly(new LegSpec.ThrustRocket(sign * F, M0, M1, VE, new LegSpec.UntilSpeed(v)))
                    .legs().get(0).end();
            // eta = (v_ex / c) ln(m0 / m): m = m0 exp(-|eta| c / v_ex), after (m0 - m) v_ex / |F|
            double eta = 0.5 * Math.log((C + v) / (C - v));
            double m = M0 * Math.exp(-Math.abs(eta) * C / VE);
            assertRelative((M0 - m) * VE / F, end.clock(), CLOSED, "craft clock, thrust sign " + sign);
            assertRelative(eta, end.rapidity(), CLOSED, "rapidity, thrust sign " + sign);
            double[] ref = commonsMathUntil((u, e) -> sign * F / (M0 - F / VE * u), new double[3], thrustKnots(),
                    new IndependentIntegrationTest.Stop(y -> y[0], eta));
            assertEndMatches(ref, end, "thrust sign " + sign);
        }
    }

    @Test
    void aThrustRocketStopsAtItsUntilDistance() {
        double d = 1e13;
        LineState end = fly(new LegSpec.ThrustRocket(F, M0, M1, VE, new LegSpec.UntilDistance(d))).legs().get(0).end();
        assertRelative(d, end.along(), CLOSED, "distance");
        double[] ref = commonsMathUntil((u, e) -> F / (M0 - F / VE * u), new double[3], thrustKnots(),
                new IndependentIntegrationTest.Stop(y -> y[2], d));
        assertEndMatches(ref, end, "until-distance");
    }

    @Test
    void aThrustRocketRefusesAnUntilSpeedBeyondItsPropellant() {
        // the budget is 0.1 ln 5 = 0.161 in rapidity, about 0.16 c
        WorldlineException e = refused(0, new LegSpec.ThrustRocket(F, M0, M1, VE, new LegSpec.UntilSpeed(0.2 * C)));
        assertTrue(e.getMessage().contains("until-speed 0.2 c is not reached before the propellant is spent"),
                e.getMessage());
    }

    @Test
    void aThrustRocketRefusesAnUntilSpeedBehindIt() {
        refused(0, new LegSpec.ThrustRocket(F, M0, M1, VE, new LegSpec.UntilSpeed(-0.01 * C)));
    }

    // --- sail: closed form from rest and the independent integration -------------------------------

    private static final double P = 1e11;
    private static final double MASS = 10.0;
    private static final double K = 2 * P / (MASS * C);

    private static LegSpec.Sail sail(LegSpec.LegEnd end) {
        return new LegSpec.Sail(InertialWorldline.atRest(Vec3.ZERO), P, MASS, 1, 86_400, end);
    }

    @Test
    void aSailStopsAtItsUntilSpeedOnItsClosedForm() {
        double v = 0.001 * C;
        StraightLineCraft craft = StraightLineCraft.of(Vec3.of(1e6, 0, 0), Vec3.of(1, 0, 0), 0, 0, 0,
                List.of(sail(new LegSpec.UntilSpeed(v))));
        LineState end = craft.legs().get(0).end();
        // beam from directly behind, station at rest, from rest: exp(2 eta) = 1 + 2 (1 + R) P u / (m c^2)
        double eta = 0.5 * Math.log((C + v) / (C - v));
        assertRelative(C * Math.expm1(2 * eta) / (2 * K), end.clock(), CLOSED, "craft clock");
        double[] ref = commonsMathUntil((u, e) -> K * Math.exp(-2 * e), new double[3], new double[] {0, 1e7},
                new IndependentIntegrationTest.Stop(y -> y[0], eta));
        assertEndMatches(ref, end, "sail until-speed");
    }

    @Test
    void aSailStopsAtItsUntilDistance() {
        double d = 1e9;
        StraightLineCraft craft = StraightLineCraft.of(Vec3.of(1e6, 0, 0), Vec3.of(1, 0, 0), 0, 0, 0,
                List.of(sail(new LegSpec.UntilDistance(d))));
        LineState end = craft.legs().get(0).end();
        double[] ref = commonsMathUntil((u, e) -> K * Math.exp(-2 * e), new double[3], new double[] {0, 1e7},
                new IndependentIntegrationTest.Stop(y -> y[2], d));
        assertEndMatches(ref, end, "sail until-distance");
    }

    @Test
    void aSailRefusesAnUntilSpeedItDoesNotReachBeforeTheBeamGoesOff() {
        WorldlineException e = assertThrows(WorldlineException.class, () -> StraightLineCraft.of(Vec3.of(1e6, 0, 0),
                Vec3.of(1, 0, 0), 0, 0, 0, List.of(sail(new LegSpec.UntilSpeed(0.5 * C)))));
        assertTrue(e.aboutEnd(), e.getMessage());
        assertTrue(e.getMessage().contains("until-speed 0.5 c is not reached before the beam's switch-off reaches the sail"),
                e.getMessage());
    }

    // --- profile: a speed that rises and falls, a craft that turns round ---------------------------

    /** +20 m/s^2 for a day, ramping to -40 m/s^2 over the next, then -40 m/s^2 for two days. */
    private static final double[] CLOCKS = {0, 86_400, 172_800, 345_600};
    private static final double[] ACCEL = {20, 20, -40, -40};

    private static LegSpec.Profile profile(LegSpec.LegEnd end) {
        return new LegSpec.Profile(CLOCKS, ACCEL, end);
    }

    private static double[] profileUntil(IndependentIntegrationTest.Stop stop) {
        LegSpec.Profile p = new LegSpec.Profile(CLOCKS, ACCEL);
        return commonsMathUntil((u, e) -> p.at(u), new double[3], CLOCKS, stop);
    }

    @Test
    void aProfileStopsAtTheFirstTimeItReachesItsUntilSpeed() {
        // the speed passes 0.004 c on the way up (first day, constant 20 m/s^2: eta = a u / c) and again
        // on the way down; the leg ends at the first
        double v = 0.004 * C;
        double eta = 0.5 * Math.log((C + v) / (C - v));
        LineState end = fly(profile(new LegSpec.UntilSpeed(v))).legs().get(0).end();
        assertRelative(C * eta / 20, end.clock(), CLOSED, "craft clock on the way up");
        assertEndMatches(profileUntil(new IndependentIntegrationTest.Stop(y -> y[0], eta)), end, "profile until-speed up");
    }

    @Test
    void aProfileReachesABackwardSpeedAfterTurningRound() {
        double v = -0.002 * C;
        double eta = 0.5 * Math.log((C + v) / (C - v));
        LineState end = fly(profile(new LegSpec.UntilSpeed(v))).legs().get(0).end();
        assertTrue(end.clock() > 172_800, "reached on the last, decelerating part");
        assertEndMatches(profileUntil(new IndependentIntegrationTest.Stop(y -> y[0], eta)), end, "profile until-speed backwards");
    }

    @Test
    void aProfileReachesABackwardDistanceAfterTurningRound() {
        double d = -1e9;
        LineState end = fly(profile(new LegSpec.UntilDistance(d))).legs().get(0).end();
        assertRelative(d, end.along(), CLOSED, "distance");
        assertEndMatches(profileUntil(new IndependentIntegrationTest.Stop(y -> y[2], d)), end, "profile until-distance backwards");
    }

    @Test
    void aProfileReachesAForwardDistanceBeforeTurningRound() {
        double d = 1e10;
        LineState end = fly(profile(new LegSpec.UntilDistance(d))).legs().get(0).end();
        assertEndMatches(profileUntil(new IndependentIntegrationTest.Stop(y -> y[2], d)), end, "profile until-distance forwards");
    }

    @Test
    void aProfileFindsASpeedReachedAndLeftBetweenTwoSamples() {
        // 0.0065 c lies between the speed at the second sample (0.00576 c) and the peak (0.00672 c, where
        // the ramp crosses zero at u = 115200 s); the speed at the third sample is lower again, so the
        // crossing is found only by cutting the ramp where the acceleration changes sign
        double v = 0.0065 * C;
        double eta = 0.5 * Math.log((C + v) / (C - v));
        LineState end = fly(profile(new LegSpec.UntilSpeed(v))).legs().get(0).end();
        assertTrue(end.clock() > 86_400 && end.clock() < 115_200, "on the ramp, before the peak: " + end.clock());
        assertEndMatches(profileUntil(new IndependentIntegrationTest.Stop(y -> y[0], eta)), end, "profile until-speed near the peak");
    }

    @Test
    void aProfileFindsADistanceReachedAndLeftBetweenTwoSamples() {
        // the craft turns round (rapidity 0) between the third and fourth samples; a distance just short
        // of the turning point is reached and left again within that stretch
        double[] turn = profileUntil(new IndependentIntegrationTest.Stop(y -> y[0], 0.0));
        assertTrue(turn != null && turn[0] > 172_800, "the reference turns round on the last stretch");
        double d = turn[3] - 1e8;
        LineState end = fly(profile(new LegSpec.UntilDistance(d))).legs().get(0).end();
        assertTrue(end.clock() > 172_800 && end.clock() < turn[0], "before the turning point: " + end.clock());
        assertEndMatches(profileUntil(new IndependentIntegrationTest.Stop(y -> y[2], d)), end, "profile until-distance near the turn");
    }

    @Test
    void aProfileRefusesASpeedOrDistanceItNeverReaches() {
        // peak speed: (20 * 86400 + 86400 / 3 * 20 / 2) / c, about 0.0067 c; peak distance below 1e12 m
        WorldlineException speed = refused(0, profile(new LegSpec.UntilSpeed(0.01 * C)));
        assertTrue(speed.getMessage().contains("until-speed 0.01 c is not reached before the profile's last sample"),
                speed.getMessage());
        WorldlineException far = refused(0, profile(new LegSpec.UntilDistance(1e12)));
        assertTrue(far.getMessage().contains("until-distance 1000000000000 m is not reached before the profile's last sample"),
                far.getMessage());
    }

    @Test
    void anIntegratedLegFindsAMissionDurationToo() {
        double t = 5e5;
        LineState end = fly(new LegSpec.ThrustRocket(F, M0, M1, VE, new LegSpec.MissionDuration(t))).legs().get(0).end();
        assertRelative(t, end.timeSeconds(), CLOSED, "mission time");
        double[] ref = commonsMathUntil((u, e) -> F / (M0 - F / VE * u), new double[3], thrustKnots(),
                new IndependentIntegrationTest.Stop(y -> y[1], t));
        assertEndMatches(ref, end, "thrust rocket duration-mission");
    }
}
