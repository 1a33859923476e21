package org.nullpath.link;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.math.BigDecimal;
import java.util.List;

import net.jqwik.api.Arbitraries;
import net.jqwik.api.Arbitrary;
import net.jqwik.api.Assume;
import net.jqwik.api.Combinators;
import net.jqwik.api.ForAll;
import net.jqwik.api.Property;
import net.jqwik.api.Provide;
import net.jqwik.api.ShrinkingMode;
import net.jqwik.api.constraints.DoubleRange;
import net.jqwik.api.constraints.Scale;
import org.nullpath.lightcone.Flights;
import org.nullpath.lightcone.LightCone;
import org.nullpath.lightcone.SignalPath;
import org.nullpath.spacetime.Decimal;
import org.nullpath.spacetime.Vec3;
import org.nullpath.worldline.InertialWorldline;
import org.nullpath.worldline.LegSpec;
import org.nullpath.worldline.State;
import org.nullpath.worldline.StraightLineCraft;

/**
 * Laws of the Doppler factor (Einstein 1905, sec. 7; Jackson, <i>Classical Electrodynamics</i>, 3rd ed.,
 * sec. 11.3; physics.md): its inverse is the rate at which the receiver's clock advances per unit of the
 * sender's clock along the light cone (checked against a 70-digit numerical derivative of the exact
 * light-cone map between two inertial stations); a round trip between stations at rest relative to each other comes back
 * at D_up D_down = 1; a round trip in general comes back at the radar rate; collinear motion gives
 * exp(-relative rapidity); and a 1e-13 offset keeps nine digits.
 */
class DopplerLawsTest {
    private static final double C = Flights.C;
    private static final double YR = Flights.YR;
    private static final double LY = Flights.LY;

    /** Two stations: positions within 3 ly, speeds below 0.9 c, clock offsets within a year. */
    record Two(Flights.Station a, Flights.Station b) {
    }

    @Provide
    Arbitrary<Two> twoStations() {
        return Combinators.combine(Flights.stations(), Flights.stations()).as(Two::new);
    }

    @Provide
    Arbitrary<Two> coMoving() {
        return Combinators.combine(Flights.positionWithin(3 * LY), Flights.positionWithin(3 * LY),
                Flights.velocityBelow(0.9)).as((p, q, v) -> new Two(new Flights.Station(p, v, 0), new Flights.Station(q, v, 0)));
    }

    // ---- the exact light-cone map between two inertial stations, in 70 digits -----------------------

    private static BigDecimal[] vec(Vec3 v) {
        return new BigDecimal[] {Decimal.of(v.x()), Decimal.of(v.y()), Decimal.of(v.z())};
    }

    private static BigDecimal dot(BigDecimal[] p, BigDecimal[] q) {
        return Decimal.add(Decimal.add(Decimal.mul(p[0], q[0]), Decimal.mul(p[1], q[1])), Decimal.mul(p[2], q[2]));
    }

    private static BigDecimal gamma(BigDecimal[] v) {
        BigDecimal b2 = Decimal.div(dot(v, v), Decimal.mul(Decimal.C, Decimal.C));
        return Decimal.div(BigDecimal.ONE, Decimal.sqrt(Decimal.sub(BigDecimal.ONE, b2)));
    }

    /**
     * The receiver's clock at arrival of a signal sent when the sender's clock reads {@code clock}: the
     * positive root T of |d0 + v_r T| = c T, d0 the separation at the send time (special relativity).
     */
    static BigDecimal receiverClock(Flights.Station s, Flights.Station r, BigDecimal clock) {
        BigDecimal[] ps = vec(s.position());
        BigDecimal[] vs = vec(s.velocity());
        BigDecimal[] pr = vec(r.position());
        BigDecimal[] vr = vec(r.velocity());
        BigDecimal ts = Decimal.mul(Decimal.sub(clock, Decimal.of(s.clockOffset())), gamma(vs));
        BigDecimal[] d0 = new BigDecimal[3];
        for (int i = 0; i < 3; i++) {
            d0[i] = Decimal.sub(Decimal.add(pr[i], Decimal.mul(vr[i], ts)), Decimal.add(ps[i], Decimal.mul(vs[i], ts)));
        }
        BigDecimal qa = Decimal.sub(Decimal.mul(Decimal.C, Decimal.C), dot(vr, vr));
        BigDecimal qb = dot(d0, vr);
        BigDecimal t = Decimal.div(Decimal.add(qb, Decimal.sqrt(Decimal.add(Decimal.mul(qb, qb), Decimal.mul(qa, dot(d0, d0))))), qa);
        return Decimal.add(Decimal.div(Decimal.add(ts, t), gamma(vr)), Decimal.of(r.clockOffset()));
    }

    /** d(receiver clock)/d(sender clock) by a central difference with step 1e-20 of the clock scale. */
    static BigDecimal clockRate(java.util.function.UnaryOperator<BigDecimal> map, double clock) {
        BigDecimal h = Decimal.of(1e-20 * Math.max(Math.abs(clock), YR));
        BigDecimal c0 = Decimal.of(clock);
        return Decimal.div(Decimal.sub(map.apply(Decimal.add(c0, h)), map.apply(Decimal.sub(c0, h))),
                Decimal.mul(Decimal.of(2.0), h));
    }

    @Property(tries = 200, shrinking = ShrinkingMode.OFF)
    void theDopplerFactorIsTheSenderClockRatePerReceiverClockAlongTheLightCone(
            @ForAll("twoStations") Two two, @ForAll @Scale(9) @DoubleRange(min = -5, max = 5) double sendYears) {
        // physics.md: a series sent every dT on the sender's clock arrives every dT / D on the receiver's clock,
        // so D = 1 / (d receiver clock / d sender clock)
        double clock = sendYears * YR;
        SignalPath p = LightCone.future(two.a().worldline().atClock(clock), two.b().worldline());
        Assume.that(p.path().norm() > 1e-6 * LY);
        BigDecimal rate = clockRate(c -> receiverClock(two.a(), two.b(), c), clock);
        double d = Doppler.of(p).doppler();
        BigDecimal expected = Decimal.div(BigDecimal.ONE, rate);
        assertTrue(Decimal.relativeError(d, expected) < 1e-12, () -> "D = " + d + ", 1 / clock rate " + expected);
    }

    @Property(tries = 200, shrinking = ShrinkingMode.OFF)
    void aRoundTripBetweenStationsAtRestRelativeToEachOtherComesBackAtOne(
            @ForAll("coMoving") Two two, @ForAll @Scale(9) @DoubleRange(min = -5, max = 5) double sendYears) {
        // stations sharing one velocity (< 0.9 c) are at rest in a common inertial frame: the echo returns
        // at the frequency sent, D_up D_down = 1 (Einstein 1905: Doppler depends on relative motion only)
        InertialWorldline a = two.a().worldline();
        InertialWorldline b = two.b().worldline();
        SignalPath up = LightCone.future(a.atClock(sendYears * YR), b);
        SignalPath down = LightCone.future(up.receive(), a);
        Assume.that(up.path().norm() > 1e-6 * LY);
        double product = Doppler.of(up).doppler() * Doppler.of(down).doppler();
        assertEquals(1.0, product, 1e-12);
        // and each leg alone is 1 as well
        assertEquals(0.0, Doppler.of(up).offset(), 1e-12);
    }

    @Property(tries = 200, shrinking = ShrinkingMode.OFF)
    void aRoundTripBetweenAnyTwoStationsComesBackAtTheRadarRate(
            @ForAll("twoStations") Two two, @ForAll @Scale(9) @DoubleRange(min = -5, max = 5) double sendYears) {
        // the echo's frequency ratio D_up D_down is d(clock of A at the send)/d(clock of A at the echo):
        // 1 only when the stations are at rest relative to each other (radar Doppler otherwise)
        double clock = sendYears * YR;
        InertialWorldline a = two.a().worldline();
        InertialWorldline b = two.b().worldline();
        SignalPath up = LightCone.future(a.atClock(clock), b);
        SignalPath down = LightCone.future(up.receive(), a);
        Assume.that(up.path().norm() > 1e-6 * LY);
        BigDecimal rate = clockRate(c -> receiverClock(two.b(), two.a(), receiverClock(two.a(), two.b(), c)), clock);
        double product = Doppler.of(up).doppler() * Doppler.of(down).doppler();
        BigDecimal expected = Decimal.div(BigDecimal.ONE, rate);
        assertTrue(Decimal.relativeError(product, expected) < 1e-12,
                () -> "D_up D_down = " + product + ", 1 / radar rate " + expected);
    }

    @Provide
    Arbitrary<Flights.Pair> onLine() {
        return Flights.onLine(Flights.plans());
    }

    /** The signed rapidity of a station along a unit direction n: atanh(v . n / c). */
    private static double rapidityAlong(InertialWorldline s, Vec3 n) {
        double b = s.velocity().dot(n) / C;
        return 0.5 * Math.log1p(2 * b / (1 - b));
    }

    @Property(tries = 200, shrinking = ShrinkingMode.OFF)
    void onTheFlightLineTheDopplerFactorIsExpOfMinusTheRelativeRapidity(
            @ForAll("onLine") Flights.Pair pair, @ForAll @Scale(9) @DoubleRange(min = -2, max = 6) double sendYears) {
        // collinear motion (Jackson 11.3, physics.md): a photon running along +n from a sender at rapidity eta_s
        // to a receiver at eta_r has D = exp(-(eta_r - eta_s)); along -n, D = exp(+(eta_r - eta_s))
        StraightLineCraft craft = pair.craft();
        InertialWorldline home = pair.home();
        Vec3 n = craft.heading();
        double etaHome = rapidityAlong(home, n);
        SignalPath down = LightCone.future(craft.atClock(sendYears * YR), home);
        checkCollinear(down, down.send().rapidity(), etaHome, n);
        SignalPath up = LightCone.future(home.atClock(sendYears * YR), craft);
        if (up.delivered()) {
            checkCollinear(up, etaHome, up.receive().rapidity(), n);
        }
    }

    private static void checkCollinear(SignalPath p, double etaSender, double etaReceiver, Vec3 n) {
        Assume.that(p.path().norm() > 1e-6 * LY);
        double sigma = Math.signum(p.path().dot(n));
        double expected = Math.exp(-sigma * (etaReceiver - etaSender));
        double d = Doppler.of(p).doppler();
        assertEquals(expected, d, 1e-12 * expected, () -> "D = " + d + ", exp(-relative rapidity) = " + expected);
    }

    @Property(tries = 200, shrinking = ShrinkingMode.OFF)
    void twoStationsMovingOnOneLineSeeExpOfMinusTheirRelativeRapidity(
            @ForAll("lines") Vec3[] line, @ForAll @Scale(9) @DoubleRange(min = -0.9, max = 0.9) double beta1,
            @ForAll @Scale(9) @DoubleRange(min = -0.9, max = 0.9) double beta2,
            @ForAll @Scale(9) @DoubleRange(min = -3, max = 3) double x2Ly,
            @ForAll @Scale(9) @DoubleRange(min = -5, max = 5) double sendYears) {
        // Einstein 1905 / Jackson 11.3: recession (or approach) along the line of sight with relative rapidity
        // eta gives D = exp(-eta); rapidities add along one line, eta = atanh(beta2) - atanh(beta1)
        Vec3 p0 = line[0];
        Vec3 n = line[1];
        InertialWorldline s = InertialWorldline.of(p0, n.times(beta1 * C), 0);
        InertialWorldline r = InertialWorldline.of(p0.plus(n.times(x2Ly * LY)), n.times(beta2 * C), 0);
        SignalPath p = LightCone.future(s.atClock(sendYears * YR), r);
        Assume.that(p.path().norm() > 1e-6 * LY);
        double sigma = Math.signum(p.path().dot(n));
        BigDecimal eta = Decimal.sub(Decimal.atanh(Decimal.of(beta2)), Decimal.atanh(Decimal.of(beta1)));
        BigDecimal expected = Decimal.exp(sigma > 0 ? eta.negate() : eta);
        double d = Doppler.of(p).doppler();
        assertTrue(Decimal.relativeError(d, expected) < 1e-12, () -> "D = " + d + " expected " + expected);
    }

    @Provide
    Arbitrary<Vec3[]> lines() {
        return Combinators.combine(Flights.positionWithin(2 * LY), Flights.unitish())
                .as((p, u) -> new Vec3[] {p, u.unit()});
    }

    @Property(tries = 200, shrinking = ShrinkingMode.OFF)
    void aFaintPushOfOneNanometrePerSecondSquaredGivesAnOffsetRightToNineDigits(
            @ForAll @Scale(6) @DoubleRange(min = 3600, max = 36000) double tau,
            @ForAll("headings") Vec3 heading) {
        // physics.md: a = 1e-9 m/s^2 a few hours after the start (from rest at the origin, station at rest
        // there): |D - 1| ~ 1e-13, and it must match expm1(-eta), eta = a tau / c, to 1e-9 relative
        double a = 1e-9;
        StraightLineCraft craft = StraightLineCraft.of(Vec3.ZERO, heading, 0, 0, 0,
                List.of(new LegSpec.Burn(a, new LegSpec.Forever())));
        InertialWorldline home = InertialWorldline.atRest(Vec3.ZERO);
        double eta = a * tau / C;
        double expected = Math.expm1(-eta);
        State at = craft.atClock(tau);
        Doppler.Factor down = Doppler.of(LightCone.future(at, home));
        assertEquals(expected, down.offset(), 1e-9 * Math.abs(expected), "downlink offset");
        Doppler.Factor up = Doppler.of(LightCone.past(at, home));
        assertEquals(expected, up.offset(), 1e-9 * Math.abs(expected), "uplink offset");
    }

    @Provide
    Arbitrary<Vec3> headings() {
        return Arbitraries.of(Vec3.of(1, 0, 0), Vec3.of(0, -1, 0), Vec3.of(0.3, 0.4, -0.5));
    }
}
