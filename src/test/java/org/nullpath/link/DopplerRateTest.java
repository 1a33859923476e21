package org.nullpath.link;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.nullpath.testkit.Si.C;
import static org.nullpath.testkit.Si.G0;
import static org.nullpath.testkit.Si.LY;
import static org.nullpath.testkit.Si.YR;

import java.math.BigDecimal;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;
import org.nullpath.lightcone.LightCone;
import org.nullpath.lightcone.SignalPath;
import org.nullpath.lightcone.TwinCraft;
import org.nullpath.reference.RefMath;
import org.nullpath.reference.RefSolver;
import org.nullpath.reference.RefStation;
import org.nullpath.reference.RefWorldline;
import org.nullpath.spacetime.Decimal;
import org.nullpath.spacetime.Vec3;
import org.nullpath.worldline.InertialWorldline;
import org.nullpath.worldline.LegSpec;
import org.nullpath.worldline.State;
import org.nullpath.worldline.Worldline;

/**
 * The rate of the Doppler factor on the receiver's clock, dD/d(tau_rx), at the product's 1e-6 relative for
 * Doppler rates (docs/testing.md). On the flight line against the closed form of hyperbolic motion (Rindler,
 * <i>Relativity: Special, General, and Cosmological</i>, 2nd ed., 2006): D = exp(-+eta) with eta = a tau / c,
 * and d(tau_s)/d(tau_r) = D. Off the line and next to a horizon against the independent 50-digit reference's
 * own numerical derivative ({@code RefSolver.dopplerRate}, src/test/.../reference).
 */
class DopplerRateTest {
    private static final double RATE_REL = 1e-6;
    /**
     * The central difference off the line: DopplerRate states a truncation error of ~1e-16 and a rounding error
     * of ~1e-11 relative, so it is held to 1e-9 there (the one-sided difference next to a horizon to RATE_REL).
     */
    private static final double CENTRAL_REL = 1e-9;
    /** Runs off for ever at 1 g0 from rest at the origin along +x: a horizon at t = c / g0 for home. */
    private static final TwinCraft PROBE = TwinCraft.of(new double[] {0, 0, 0}, new double[] {1, 0, 0}, 0, 0, 0,
            new LegSpec.Burn(G0, new LegSpec.Forever()));
    /** Burns at 0.5 g0 for half a year of its clock, then coasts on. */
    private static final TwinCraft COASTER = TwinCraft.of(new double[] {0, 0, 0}, new double[] {1, 0, 0}, 0, 0, 0,
            new LegSpec.Burn(0.5 * G0, new LegSpec.ClockDuration(0.5 * YR)));

    private static double rate(Worldline sender, Worldline receiver, SignalPath p) {
        assertTrue(p.delivered());
        return DopplerRate.of(sender, receiver, p, Doppler.of(p));
    }

    /** exp(s a tau / c) in 70 digits. */
    private static BigDecimal exp(int s, double a, double tau) {
        return Decimal.exp(Decimal.div(Decimal.mul(Decimal.of(s * a), Decimal.of(tau)), Decimal.C));
    }

    @ParameterizedTest(name = "downlink from craft clock {0} s to a station {1} ly along the line")
    @CsvSource({"1, 0", "31557600, 0", "94672800, 0", "31557600, 5", "3600, 1"})
    void aDownlinkAlongTheLineChangesAtMinusOrPlusAOverCTimesDSquared(double tau, double stationLy) {
        // behind the craft (home): D = exp(-eta_s), dD/d(tau_r) = (dD/d tau_s) D = -(a/c) D^2; a station ahead
        // that the craft has not reached yet: D = exp(+eta_s), dD/d(tau_r) = +(a/c) D^2 (Rindler 2006)
        InertialWorldline station = InertialWorldline.atRest(Vec3.of(stationLy * LY, 0, 0));
        SignalPath p = LightCone.future(PROBE.craft().atClock(tau), station);
        int s = p.path().x() < 0 ? -1 : 1;
        BigDecimal d = exp(s, G0, tau);
        double expected = s * G0 / C * d.multiply(d).doubleValue();
        assertEquals(expected, rate(PROBE.craft(), station, p), RATE_REL * Math.abs(expected));
    }

    @ParameterizedTest(name = "uplink from home at {0} yr")
    @CsvSource({"0.01", "0.5", "0.9"})
    void anUplinkChasingTheCraftChangesAtMinusAOverCTimesD(double sendYears) {
        // the receiver recedes along the photon: D = exp(-eta_r) with eta_r = a tau_r / c, so dD/d(tau_r) = -(a/c) D
        InertialWorldline home = InertialWorldline.atRest(Vec3.ZERO);
        SignalPath p = LightCone.future(home.atTime(sendYears * YR), PROBE.craft());
        double expected = -G0 / C * exp(-1, G0, p.receive().clock()).doubleValue();
        assertEquals(expected, rate(home, PROBE.craft(), p), RATE_REL * Math.abs(expected));
    }

    @Test
    void anUplinkAtTheMomentTheCraftLeavesItsStationChangesAtMinusAOverC() {
        // sender and receiver at one place (zero path): the photon runs with the craft, D = exp(-eta_r) -> 1 and
        // dD/d(tau_r) = -(a/c) D = -a/c, the one-sided value of the closed form as the craft departs (Rindler 2006)
        InertialWorldline home = InertialWorldline.atRest(Vec3.ZERO);
        SignalPath p = LightCone.future(home.atTime(0), PROBE.craft());
        assertTrue(p.path().isZero());
        assertEquals(-G0 / C, rate(home, PROBE.craft(), p), RATE_REL * G0 / C);
    }

    @ParameterizedTest(name = "{0}: sent at clock {1} s")
    @CsvSource({
        "up, 1e7",        // the accelerating craft receives beside its line
        "down, 2e7",      // the accelerating craft sends to a station beside its line
        "coast-up, 3e7",  // a coasting craft (no acceleration on either side) receives from beside its line
        "coast-down, 4e7",
        "stations, 1e7",  // two stations, the receiver moving across the line of sight: only the geometry turns
    })
    void offTheLineTheRateMatchesTheReferenceDerivative(String link, double sendClock) {
        double[] aside = {0.3 * LY, 0.2 * LY, 0};
        InertialWorldline station = InertialWorldline.atRest(Vec3.of(aside[0], aside[1], aside[2]));
        RefStation refStation = RefStation.atRest(aside);
        if (link.equals("stations")) {
            double[] velocity = {0, -0.4 * C, 0.1 * C};
            InertialWorldline mover = InertialWorldline.of(Vec3.ZERO, Vec3.of(velocity[0], velocity[1], velocity[2]), 0);
            double expected = RefSolver.dopplerRate(refStation, RefMath.bd(sendClock),
                    RefStation.of(new double[] {0, 0, 0}, velocity, 0)).doubleValue();
            assertEquals(expected, rate(station, mover, LightCone.future(station.atClock(sendClock), mover)),
                    CENTRAL_REL * Math.abs(expected));
            return;
        }
        TwinCraft craft = link.startsWith("coast") ? COASTER : PROBE;
        boolean up = link.endsWith("up");
        Worldline sender = up ? station : craft.craft();
        Worldline receiver = up ? craft.craft() : station;
        RefWorldline refSender = up ? refStation : craft.ref();
        RefWorldline refReceiver = up ? craft.ref() : refStation;
        double expected = RefSolver.dopplerRate(refSender, RefMath.bd(sendClock), refReceiver).doubleValue();
        State send = sender.atClock(sendClock);
        assertEquals(expected, rate(sender, receiver, LightCone.future(send, receiver)), CENTRAL_REL * Math.abs(expected));
    }

    @Test
    void aReceiverCrossingTheLineOfSightMatchesTheReferenceDerivative() {
        // a station at rest at the origin signals at t = 0 to one that passes (1 ly, 0, 0) across the line of sight
        // at t = 1 yr: the photon runs along the sender's (default) direction, at right angles to the receiver's
        // motion, and only the turning geometry changes D
        double[] velocity = {0, -0.4 * C, 0.1 * C};
        double[] atZero = {LY, 0.4 * LY, -0.1 * LY};
        InertialWorldline home = InertialWorldline.atRest(Vec3.ZERO);
        InertialWorldline mover = InertialWorldline.of(Vec3.of(atZero[0], atZero[1], atZero[2]),
                Vec3.of(velocity[0], velocity[1], velocity[2]), 0);
        double expected = RefSolver.dopplerRate(RefStation.atRest(new double[] {0, 0, 0}), BigDecimal.ZERO,
                RefStation.of(atZero, velocity, 0)).doubleValue();
        assertEquals(expected, rate(home, mover, LightCone.future(home.atClock(0), mover)),
                CENTRAL_REL * Math.abs(expected));
    }

    @ParameterizedTest(name = "{0} s before the horizon")
    @CsvSource({"1500", "4500"})
    void nextToAHorizonTheRateMatchesTheReferenceDerivative(double before) {
        // the stencil's step is about 3057 s here: 1500 s before the last send that reaches the probe both later
        // points of a central stencil never arrive, 4500 s before only the outer one
        double[] aside = {0.3 * LY, 0.2 * LY, 0};
        InertialWorldline station = InertialWorldline.atRest(Vec3.of(aside[0], aside[1], aside[2]));
        RefStation refStation = RefStation.atRest(aside);
        double sendClock = RefSolver.horizon(refStation, PROBE.ref()).clock().doubleValue() - before;
        assertTrue(RefSolver.send(refStation, sendClock + 2 * 3057, PROBE.ref()).never(), "next to the horizon");
        double expected = RefSolver.dopplerRate(refStation, RefMath.bd(sendClock), PROBE.ref()).doubleValue();
        SignalPath p = LightCone.future(station.atClock(sendClock), PROBE.craft());
        assertEquals(expected, rate(station, PROBE.craft(), p), RATE_REL * Math.abs(expected));
    }
}
