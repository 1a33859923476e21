package org.nullpath.link;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.math.BigDecimal;
import java.util.List;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.ValueSource;
import org.nullpath.lightcone.LightCone;
import org.nullpath.lightcone.SignalPath;
import org.nullpath.spacetime.Decimal;
import org.nullpath.spacetime.Vec3;
import org.nullpath.worldline.InertialWorldline;
import org.nullpath.worldline.LegSpec;
import org.nullpath.worldline.StraightLineCraft;
import static org.nullpath.testkit.Si.C;
import static org.nullpath.testkit.Si.G0;
import static org.nullpath.testkit.Si.LY;
import static org.nullpath.testkit.Si.YR;

/**
 * The Doppler factor D = f_rx / f_tx = gamma_r (1 - beta_r . k) / (gamma_s (1 - beta_s . k)) (Einstein,
 * "Zur Elektrodynamik bewegter Koerper", 1905, sec. 7; Jackson, <i>Classical Electrodynamics</i>, 3rd ed.,
 * sec. 11.3) in the cases with textbook answers: transverse motion (D = 1/gamma of the sender, gamma of the
 * receiver), collinear recession (D = exp(-eta)), the radar echo ((1 - beta)/(1 + beta) = exp(-2 eta)),
 * and a frequency offset of 1e-13 that must keep its digits (physics.md).
 */
class DopplerTest {
    @Test
    void aSenderMovingAcrossTheLineOfSightIsRedshiftedByOneOverGamma() {
        // transverse Doppler (Einstein 1905, sec. 7): beta_s . k = 0, so D = 1/gamma_s; 0.6 c: gamma = 1.25
        InertialWorldline sender = InertialWorldline.of(Vec3.ZERO, Vec3.of(0, 0.6 * C, 0), 0);
        InertialWorldline receiver = InertialWorldline.atRest(Vec3.of(1e12, 0, 0));
        Doppler.Factor d = Doppler.of(LightCone.future(sender.atTime(0), receiver));
        assertEquals(0.8, d.doppler(), 1e-15);
        assertEquals(-0.2, d.offset(), 1e-15);
    }

    @Test
    void aReceiverMovingAcrossTheLineOfSightSeesABlueshiftOfGamma() {
        // transverse Doppler in the mission frame: beta_r . k = 0 at reception, so D = gamma_r = 1.25 at 0.6 c
        double l = 1e12;
        double v = 0.6 * C;
        InertialWorldline receiver = InertialWorldline.of(Vec3.of(l, -v * l / C, 0), Vec3.of(0, v, 0), 0);
        SignalPath p = LightCone.future(InertialWorldline.atRest(Vec3.ZERO).atTime(0), receiver);
        assertEquals(l / C, p.lightTimeSeconds(), 1e-12 * l / C);
        Doppler.Factor d = Doppler.of(p);
        assertEquals(1.25, d.doppler(), 1e-12);
        assertEquals(0.25, d.offset(), 1e-12);
    }

    private static StraightLineCraft oneGeeFromRest() {
        return StraightLineCraft.of(Vec3.ZERO, Vec3.of(1, 0, 0), 0, 0, 0,
                List.of(new LegSpec.Burn(G0, new LegSpec.Forever())));
    }

    /** exp(-g0 tau / c) in 70 digits. */
    private static BigDecimal expMinusEta(double tau) {
        return Decimal.exp(Decimal.div(Decimal.mul(Decimal.G0, Decimal.of(tau)), Decimal.C).negate());
    }

    @ParameterizedTest(name = "craft clock {0} s")
    @ValueSource(doubles = {1, 86400, 31557600, 157788000})
    void aDownlinkFromACraftFleeingHomeIsRedshiftedByExpMinusEta(double tau) {
        // physics.md / Jackson 11.3: receiver fleeing the sender (here: sender fleeing the receiver) with relative
        // rapidity eta: D = exp(-eta); eta = g0 tau / c (Rindler 2006). At 1 yr: eta = 1.032 295 3,
        // D = 0.356 19 (physics.md, check values)
        SignalPath p = LightCone.future(oneGeeFromRest().atClock(tau), InertialWorldline.atRest(Vec3.ZERO));
        Doppler.Factor d = Doppler.of(p);
        BigDecimal expected = expMinusEta(tau);
        assertTrue(Decimal.relativeError(d.doppler(), expected) < 1e-12, () -> d.doppler() + " expected " + expected);
        BigDecimal offset = Decimal.sub(expected, BigDecimal.ONE);
        assertTrue(Decimal.relativeError(d.offset(), offset) < 1e-12, () -> d.offset() + " expected " + offset);
    }

    @ParameterizedTest(name = "send at t = {0} yr")
    @ValueSource(doubles = {0.01, 0.3, 0.9})
    void anUplinkCatchingACraftFleeingHomeIsRedshiftedByExpMinusEtaAtArrival(double teYears) {
        StraightLineCraft craft = oneGeeFromRest();
        SignalPath p = LightCone.future(InertialWorldline.atRest(Vec3.ZERO).atTime(teYears * YR), craft);
        double tau = p.receive().clock();
        BigDecimal expected = expMinusEta(tau);
        assertTrue(Decimal.relativeError(Doppler.of(p).doppler(), expected) < 1e-12);
    }

    @Test
    void aCraftFlyingTowardsAStationAheadIsBlueshiftedByExpEta() {
        // the station 3 ly ahead on the flight line: the photon travels with the craft's motion, D = exp(+eta)
        StraightLineCraft craft = oneGeeFromRest();
        SignalPath p = LightCone.future(craft.atClock(YR), InertialWorldline.atRest(Vec3.of(3 * LY, 0, 0)));
        BigDecimal expected = Decimal.exp(Decimal.div(Decimal.mul(Decimal.G0, Decimal.of(YR)), Decimal.C));
        assertTrue(Decimal.relativeError(Doppler.of(p).doppler(), expected) < 1e-12);
    }

    @ParameterizedTest(name = "beta = {0}")
    @ValueSource(doubles = {1e-6, 0.1, 0.5, 0.9, -0.5})
    void aRadarEchoFromACoastingCraftComesBackAtOneMinusBetaOverOnePlusBeta(double beta) {
        // radar Doppler from the two one-way factors: ((1 - beta)/(1 + beta)) = exp(-2 eta) for a craft moving
        // away (beta > 0) along the line of sight (Einstein 1905 / Jackson 11.3 applied twice)
        StraightLineCraft craft = StraightLineCraft.of(Vec3.of(LY, 0, 0), Vec3.of(1, 0, 0), 0, 0, beta * C, List.of());
        InertialWorldline home = InertialWorldline.atRest(Vec3.ZERO);
        SignalPath up = LightCone.future(home.atTime(1e6), craft);
        SignalPath down = LightCone.future(up.receive(), home);
        double echo = Doppler.of(up).doppler() * Doppler.of(down).doppler();
        BigDecimal b = Decimal.of(beta);
        BigDecimal expected = Decimal.div(Decimal.sub(BigDecimal.ONE, b), Decimal.add(BigDecimal.ONE, b));
        assertTrue(Decimal.relativeError(echo, expected) < 1e-12, () -> echo + " expected " + expected);
    }

    @ParameterizedTest(name = "craft clock {0} s")
    @ValueSource(doubles = {3600, 10800, 36000})
    void aFaintPushGivesAFrequencyOffsetOfAbout1e13ThatKeepsItsDigits(double tau) {
        // physics.md: at a = 1e-9 m/s^2 the offset is ~1e-13 and must be right to 1e-9 relative;
        // D - 1 = expm1(-eta), eta = a tau / c (both directions, station at rest at the start)
        double a = 1e-9;
        StraightLineCraft craft = StraightLineCraft.of(Vec3.ZERO, Vec3.of(1, 0, 0), 0, 0, 0,
                List.of(new LegSpec.Burn(a, new LegSpec.Forever())));
        InertialWorldline home = InertialWorldline.atRest(Vec3.ZERO);
        BigDecimal offset = Decimal.expm1(Decimal.div(Decimal.mul(Decimal.of(a), Decimal.of(tau)), Decimal.C).negate());
        Doppler.Factor down = Doppler.of(LightCone.future(craft.atClock(tau), home));
        assertTrue(Decimal.relativeError(down.offset(), offset) < 1e-9, () -> down.offset() + " expected " + offset);
        assertTrue(Math.abs(down.offset()) < 2e-13 && Math.abs(down.offset()) > 1e-14);
        // uplink sent so that it arrives at craft clock tau: use the past cone of that event
        SignalPath up = LightCone.past(craft.atClock(tau), home);
        Doppler.Factor d = Doppler.of(up);
        assertTrue(Decimal.relativeError(d.offset(), offset) < 1e-9, () -> d.offset() + " expected " + offset);
    }

    @Test
    void whereSenderAndReceiverMeetThePhotonIsTakenAlongTheReceiversMotion() {
        // a zero path has no direction of its own; nullpath takes the receiver's direction of motion (Doppler's
        // contract), so a receiver passing a sender at rest at 0.6 c recedes along k: D = sqrt((1 - b)/(1 + b)) = 0.5
        // (Einstein 1905, sec. 7)
        InertialWorldline passing = InertialWorldline.of(Vec3.ZERO, Vec3.of(0, 0, 0.6 * C), 0);
        SignalPath p = LightCone.future(InertialWorldline.atRest(Vec3.ZERO).atTime(0), passing);
        assertTrue(p.path().isZero());
        assertEquals(0.5, Doppler.of(p).doppler(), 1e-15);
        assertEquals(-0.5, Doppler.of(p).offset(), 1e-15);
    }

    @Test
    void aSignalThatNeverArrivesHasNoDopplerFactor() {
        StraightLineCraft craft = oneGeeFromRest();
        SignalPath never = LightCone.future(InertialWorldline.atRest(Vec3.ZERO).atTime(2 * YR), craft);
        assertTrue(!never.delivered());
        assertThrows(IllegalArgumentException.class, () -> Doppler.of(never));
    }
}
