package org.nullpath.worldline;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTimeoutPreemptively;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.time.Duration;
import java.util.List;

import org.junit.jupiter.api.Test;
import org.nullpath.spacetime.Vec3;

/**
 * Integrated legs under extreme pushes end within a bounded time and heap: computed where the physics
 * stays inside what doubles hold, refused at the leg otherwise (never a hang, an out-of-memory error or
 * an integrator's exception). The preemptive timeouts are a bound on a hang (ten seconds against runs
 * that took minutes), not a measurement. Reference values are closed forms: hyperbolic motion at constant
 * proper acceleration, eta = a tau / c and v = c tanh(eta) (Rindler, Relativity: Special, General and
 * Cosmological, 2006, ch. 3), and Ackeret's rocket equation, eta = (v_ex / c) ln(m0 / m1) (Ackeret,
 * Helv. Phys. Acta 19, 1946; the citations from memory, the formulas handbook-standard). All craft and numbers are invented for the tests.
 */
class IntegratedLegBoundsTest {
    static final double C = 299_792_458.0;
    static final Duration BOUND = Duration.ofSeconds(10);

    private static StraightLineCraft fly(LegSpec leg) {
        return StraightLineCraft.of(Vec3.ZERO, new Vec3(1, 0, 0), 0, 0, 0, List.of(leg));
    }

    private static LineState end(StraightLineCraft craft) {
        return craft.legs().get(0).end();
    }

    private static WorldlineException refused(LegSpec leg) {
        return assertTimeoutPreemptively(BOUND, () -> assertThrows(WorldlineException.class, () -> fly(leg)));
    }

    @Test
    void aProfileBeyondTheRapidityLimitIsRefusedAtTheLegWhereItReachesTheLimit() {
        LegSpec.Profile leg = new LegSpec.Profile(new double[] {0, 288}, new double[] {1e30, 1e30});
        WorldlineException e = refused(leg);
        assertEquals(0, e.legIndex());
        assertFalse(e.aboutEnd(), e.getMessage());
        // constant proper acceleration: the limit is reached at tau = 700 c / a (closed form above)
        assertTrue(e.getMessage().contains("reaches rapidity 700"), e.getMessage());
        java.util.regex.Matcher m = java.util.regex.Pattern.compile("after (\\S+) s of craft clock").matcher(e.getMessage());
        assertTrue(m.find(), e.getMessage());
        double tau = 700 * C / 1e30;
        assertEquals(tau, Double.parseDouble(m.group(1)), 1e-9 * tau); // an event located to 1e-15 relative
    }

    @Test
    void anEndBeforeTheRapidityLimitIsStillHonoured() {
        double a = 1e30;
        LegSpec.Profile leg = new LegSpec.Profile(new double[] {0, 288}, new double[] {a, a},
                new LegSpec.UntilSpeed(0.5 * C));
        StraightLineCraft craft = assertTimeoutPreemptively(BOUND, () -> fly(leg));
        double tau = C * 0.5 * Math.log(3) / a; // atanh(0.5) = ln(3) / 2
        assertEquals(tau, end(craft).clock(), 1e-9 * tau);
    }

    @Test
    void aRocketOfEnormousThrustIsComputedByAckeretsEquation() {
        double ve = 0.1 * C;
        LegSpec.ThrustRocket leg = new LegSpec.ThrustRocket(1e36, 100e3, 20e3, ve); // 1e30 MN
        StraightLineCraft craft = assertTimeoutPreemptively(BOUND, () -> fly(leg));
        double eta = ve / C * Math.log(5);
        assertEquals(eta, end(craft).rapidity(), 1e-10 * eta);
        assertEquals(leg.burnTime(), end(craft).clock(), 1e-12 * leg.burnTime());
    }

    @Test
    void aRocketOfTinyThrustIsComputedByAckeretsEquation() {
        double ve = 0.1 * C;
        LegSpec.ThrustRocket leg = new LegSpec.ThrustRocket(1e-6, 100e3, 20e3, ve);
        StraightLineCraft craft = assertTimeoutPreemptively(BOUND, () -> fly(leg));
        double eta = ve / C * Math.log(5);
        assertEquals(eta, end(craft).rapidity(), 1e-10 * eta);
    }

    @Test
    void aSailOfEnormousBeamPowerIsRefusedWithinSeconds() {
        InertialWorldline station = InertialWorldline.atRest(Vec3.ZERO);
        LegSpec.Sail leg = new LegSpec.Sail(station, 1e30, 0.01, 1, 600);
        WorldlineException e = assertTimeoutPreemptively(BOUND, () -> assertThrows(WorldlineException.class,
                () -> StraightLineCraft.of(new Vec3(1e6, 0, 0), new Vec3(1, 0, 0), 0, 0, 0, List.of(leg))));
        assertEquals(0, e.legIndex());
        assertFalse(e.aboutEnd(), e.getMessage());
        assertTrue(e.getMessage().contains("not reached within"), e.getMessage());
    }

    @Test
    void aProfileThatChangesTooOftenSpendsItsStepBudgetAndIsRefused() {
        // a saw tooth of 1e4 m/s^2 switching every microsecond over 10 s: one step per knot at least,
        // 1e7 knots, far beyond the step budget
        int n = 2 * LegIntegration.MAX_STEPS + 2;
        double[] clock = new double[n];
        double[] acc = new double[n];
        for (int i = 0; i < n; i++) {
            clock[i] = i * 1e-6;
            acc[i] = (i & 1) == 0 ? 1e4 : -1e4;
        }
        WorldlineException e = refused(new LegSpec.Profile(clock, acc));
        assertFalse(e.aboutEnd(), e.getMessage());
        assertTrue(e.getMessage().contains("more than " + LegIntegration.MAX_STEPS + " integration steps"),
                e.getMessage());
        // where it stopped, out of the planned span (the last knot)
        assertTrue(e.getMessage().contains(") after "), e.getMessage());
        assertTrue(e.getMessage().contains(" s of craft clock (of " + LegFlight.num(clock[n - 1])
                + " s); shorten the leg, smooth its acceleration or weaken it"), e.getMessage());
    }
}
