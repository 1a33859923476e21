package org.nullpath.reference;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertNull;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.math.BigDecimal;
import java.math.MathContext;
import java.util.List;
import java.util.function.Supplier;
import org.hipparchus.dfp.Dfp;
import org.hipparchus.dfp.DfpField;
import org.hipparchus.dfp.DfpMath;
import org.hipparchus.ode.ODEState;
import org.hipparchus.ode.ODEStateAndDerivative;
import org.hipparchus.ode.OrdinaryDifferentialEquation;
import org.hipparchus.ode.nonstiff.DormandPrince853Integrator;
import org.junit.jupiter.api.Test;
import org.nullpath.testkit.Ode;

/**
 * Self-test of the high-precision reference: published check values, an outside arbitrary-precision library
 * (Hipparchus Dfp), an outside ODE integrator (Hipparchus DormandPrince853), closed forms for inertial
 * motion, and internal consistency (past cone inverts future cone, Doppler equals the clock-rate ratio,
 * round trips). All runs at the default working precision of {@value RefMath#DEFAULT_DIGITS} digits unless
 * a check says otherwise.
 */
class RefSelfTest {

    // Inputs as the double-precision code sees them.
    /** Standard gravity, m/s^2 (3rd CGPM, 1901). */
    private static final double G0 = 9.80665;
    /** Julian year, s (IAU). */
    private static final double YR = 31_557_600.0;
    /** Speed of light, m/s (SI Brochure, 9th ed., 2019). */
    private static final double C = 299_792_458.0;
    /** Light year, m (IAU: c times a Julian year); exactly representable as a double. */
    private static final double LY = C * YR;
    private static final double[] ORIGIN = {0, 0, 0};
    private static final double[] X = {1, 0, 0};

    private static double digits(BigDecimal a, BigDecimal b) {
        return RefMath.agreeingDigits(a, b);
    }

    private static BigDecimal big(String s) {
        return new BigDecimal(s);
    }

    private static BigDecimal big(double x) {
        return RefMath.bd(x);
    }

    private static BigDecimal ratio(BigDecimal a, BigDecimal b) {
        return a.divide(b, RefMath.mc());
    }

    private static RefCraft fromRest(double[] heading) {
        return RefCraft.start(ORIGIN, heading, 0, 0, 0);
    }

    // ------------------------------------------------------------------ elementary functions

    @Test
    void elementaryFunctionsAgreeWithHipparchusDfp() {
        // Outside reference: Hipparchus 4.0.2 Dfp (Maven Central) at 120 decimal digits. Arguments are kept
        // away from 0, where Dfp's sinh/expm1 lose digits to cancellation (the tiny-argument check is below).
        DfpField field = new DfpField(120);
        for (String s : List.of("0.5", "-3.7", "123.456", "1000", "2.5", "-0.03125", "7e-3", "-250.75")) {
            BigDecimal x = big(s);
            Dfp d = field.newDfp(s);
            assertTrue(digits(RefMath.exp(x), dfp(DfpMath.exp(d))) >= 97, "exp " + s);
            assertTrue(digits(RefMath.cosh(x), dfp(d.cosh())) >= 97, "cosh " + s);
            assertTrue(digits(RefMath.sinh(x), dfp(d.sinh())) >= 97, "sinh " + s);
            assertTrue(digits(RefMath.tanh(x), dfp(d.tanh())) >= 97, "tanh " + s);
            assertTrue(digits(RefMath.asinh(x), dfp(d.asinh())) >= 97, "asinh " + s);
            if (x.signum() > 0) {
                assertTrue(digits(RefMath.ln(x), dfp(DfpMath.log(d))) >= 97, "ln " + s);
                assertTrue(digits(RefMath.sqrt(x), dfp(d.sqrt())) >= 97, "sqrt " + s);
                // the JDK's own BigDecimal.sqrt as a second outside reference
                assertTrue(digits(RefMath.sqrt(x), x.sqrt(new MathContext(110))) >= 97, "sqrt/JDK " + s);
            }
        }
        for (String s : List.of("0.1", "-0.6", "0.9", "-0.999999")) {
            Dfp d = field.newDfp(s);
            assertTrue(digits(RefMath.atanh(big(s)), dfp(d.atanh())) >= 94, "atanh " + s);
        }
        // constants: Dfp's own e and ln 2
        assertTrue(digits(RefMath.exp(BigDecimal.ONE), dfp(field.getE())) >= 99);
        assertTrue(digits(RefMath.ln(BigDecimal.valueOf(2)), dfp(field.getLn2())) >= 99);
    }

    private static BigDecimal dfp(Dfp d) {
        return new BigDecimal(d.toString());
    }

    @Test
    void tinyArgumentsKeepRelativePrecision() {
        // Taylor series (common practice, any calculus text): for x = 1e-30 the terms shown leave < 1e-150.
        MathContext m = new MathContext(120);
        BigDecimal x = big("1e-30");
        BigDecimal x2 = x.multiply(x);
        BigDecimal x3 = x2.multiply(x);
        BigDecimal x4 = x3.multiply(x);
        BigDecimal x5 = x4.multiply(x);
        BigDecimal expm1 = x.add(x2.divide(BigDecimal.valueOf(2), m)).add(x3.divide(BigDecimal.valueOf(6), m))
                .add(x4.divide(BigDecimal.valueOf(24), m));
        BigDecimal sinh = x.add(x3.divide(BigDecimal.valueOf(6), m)).add(x5.divide(BigDecimal.valueOf(120), m));
        BigDecimal asinh = x.subtract(x3.divide(BigDecimal.valueOf(6), m)).add(x5.multiply(big("0.075")));
        BigDecimal atanh = x.add(x3.divide(BigDecimal.valueOf(3), m)).add(x5.divide(BigDecimal.valueOf(5), m));
        BigDecimal log1p = x.subtract(x2.divide(BigDecimal.valueOf(2), m)).add(x3.divide(BigDecimal.valueOf(3), m))
                .subtract(x4.divide(BigDecimal.valueOf(4), m));
        assertTrue(digits(RefMath.expm1(x), expm1) >= 98);
        assertTrue(digits(RefMath.expm1(x.negate()), expm1(x.negate(), m)) >= 98);
        assertTrue(digits(RefMath.sinh(x), sinh) >= 98);
        assertTrue(digits(RefMath.tanh(x), x.subtract(x3.divide(BigDecimal.valueOf(3), m))) >= 98);
        assertTrue(digits(RefMath.asinh(x), asinh) >= 98);
        assertTrue(digits(RefMath.atanh(x), atanh) >= 98);
        assertTrue(digits(RefMath.log1p(x), log1p) >= 98);
        assertTrue(digits(RefMath.ln(BigDecimal.ONE.add(x)), log1p) >= 98);
        // inverse pairs over many magnitudes
        for (String s : List.of("1e-25", "3e-9", "0.37", "-1.5", "40", "-700", "3000")) {
            BigDecimal y = big(s);
            assertTrue(digits(RefMath.asinh(RefMath.sinh(y)), y) >= 95, "asinh(sinh) " + s);
            if (y.compareTo(BigDecimal.ONE.negate()) >= 0) {
                // (for y far below -1, expm1(y) rounds towards -1 and log1p cannot recover y)
                assertTrue(digits(RefMath.log1p(RefMath.expm1(y)), y) >= 95, "log1p(expm1) " + s);
            }
            if (y.abs().compareTo(big("0.3")) >= 0) {
                // (for tiny y, exp(y) rounded to 100 digits keeps only 100 + log10|y| digits of y)
                assertTrue(digits(RefMath.ln(RefMath.exp(y)), y) >= 95, "ln(exp) " + s);
            }
            if (y.abs().compareTo(BigDecimal.TEN) < 0) {
                assertTrue(digits(RefMath.atanh(RefMath.tanh(y)), y) >= 95 - 2 * y.abs().doubleValue(), "atanh " + s);
            }
        }
    }

    private static BigDecimal expm1(BigDecimal x, MathContext m) {
        BigDecimal sum = BigDecimal.ZERO;
        BigDecimal term = BigDecimal.ONE;
        for (int n = 1; n < 8; n++) {
            term = term.multiply(x).divide(BigDecimal.valueOf(n), m);
            sum = sum.add(term);
        }
        return sum;
    }

    // ------------------------------------------------------------------ published check values

    @Test
    void checkValuesOfHyperbolicMotion() {
        // Rindler, Relativity: Special, General, and Cosmological (2nd ed., 2006), hyperbolic motion; the
        // check values are those of docs/physics.md, "Check values" (computed there from these formulas with
        // g0 of the 3rd CGPM, 1901, and the IAU Julian year).
        MathContext six = new MathContext(20);
        RefCraft oneYearClock = fromRest(X).burnForClock(G0, YR);
        BigDecimal v1 = oneYearClock.atClock(YR).velocity()[0].divide(RefMath.C, six);
        assertEquals(0.774_827, v1.doubleValue(), 5e-7, "v after 1 yr of craft clock at 1 g0, in c");

        RefCraft oneYearMission = fromRest(X).burnForMissionTime(G0, YR);
        BigDecimal v2 = oneYearMission.atTime(YR).velocity()[0].divide(RefMath.C, six);
        assertEquals(0.718_253, v2.doubleValue(), 5e-7, "v after 1 yr of mission time at 1 g0, in c");
        // the same from an open-ended burn sampled at t = 1 yr, and from the closed form v = a t / sqrt(1 + (a t/c)^2)
        BigDecimal v3 = fromRest(X).burnForever(G0).atTime(YR).velocity()[0];
        BigDecimal at = big(G0).multiply(big(YR));
        BigDecimal closed = at.divide(RefMath.sqrt(BigDecimal.ONE.add(at.divide(RefMath.C, RefMath.mc()).pow(2))), RefMath.mc());
        assertTrue(digits(v3, closed) >= 95);

        // c^2/g0 = 0.968 715 ly: the limit L = lim (c t - s) of an open-ended 1 g0 burn from rest is c^2/a
        RefHorizon h = RefSolver.horizon(RefStation.atRest(ORIGIN), fromRest(X).burnForever(G0));
        assertEquals(0.968_715, h.limit().divide(RefMath.LIGHT_YEAR, six).doubleValue(), 5e-7, "c^2/g0 in ly");

        // reaching 1000 ly from rest at 1 g0: 1000.968 yr of mission time, 7.394 84 yr of craft clock
        RefCraft far = fromRest(X).burnUntilDistance(G0, 1000 * LY);
        BigDecimal[] end = far.legEnd(0);
        assertEquals(1000.968, end[0].divide(RefMath.JULIAN_YEAR, six).doubleValue(), 5e-4, "mission time, yr");
        assertEquals(7.394_84, end[1].divide(RefMath.JULIAN_YEAR, six).doubleValue(), 5e-6, "craft clock, yr");
        assertTrue(digits(end[2], big(1000 * LY)) >= 95, "the leg ends at the distance asked for");
    }

    @Test
    void lastSendFromOriginIsCOverA() {
        // docs/physics.md, "Horizons" (Rindler 2006): from rest at the origin at t = 0, an
        // open-ended burn a has the last arriving send from the origin at t = c/a; headings and signs varied.
        RefStation home = RefStation.atRest(ORIGIN);
        double[][] headings = {X, {0, 1, 0}, {1, 2, 2}, {-3, 0, 4}};
        double[] accels = {G0, 1e-9, -2 * G0, 0.01 * G0};
        for (int i = 0; i < headings.length; i++) {
            RefCraft craft = fromRest(headings[i]).burnForever(accels[i]);
            RefHorizon h = RefSolver.horizon(home, craft);
            assertTrue(h.exists());
            BigDecimal expected = RefMath.C.divide(big(accels[i]).abs(), RefMath.mc());
            assertTrue(digits(h.t(), expected) >= 95, "horizon t = c/|a| for a = " + accels[i]);
            assertTrue(digits(h.clock(), expected) >= 95, "station clock = mission time");
            // the criterion and the search agree on both sides of it
            BigDecimal eps = RefMath.tenToMinus(40);
            RefEvent before = new RefEvent(h.t().multiply(BigDecimal.ONE.subtract(eps)), RefMath.bd(ORIGIN), null);
            RefEvent after = new RefEvent(h.t().multiply(BigDecimal.ONE.add(eps)), RefMath.bd(ORIGIN), null);
            assertFalse(RefSolver.futureCone(before, craft).never());
            assertTrue(RefSolver.futureCone(after, craft).never());
        }
    }

    // ------------------------------------------------------------------ cones

    /** A busy invented craft: every leg kind, off-axis heading, moving start. */
    private static RefCraft busyCraft() {
        return RefCraft.start(new double[] {1e10, -3e9, 2e8}, new double[] {1, 1, 0}, 1e6, 5, 0.1 * C)
                .burnForClock(G0, YR)
                .coastForClock(2 * YR)
                .burnUntilSpeed(-G0, 0)
                .burnUntilDistance(0.5 * G0, 0.3 * LY)
                .burnForMissionTime(-0.1 * G0, YR)
                .coastForMissionTime(0.25 * YR)
                .burnForever(G0);
    }

    @Test
    void pastConeInvertsFutureCone() {
        RefCraft craft = busyCraft();
        RefStation station = RefStation.of(new double[] {0, 2 * LY, 0.1 * LY}, new double[] {0.01 * C, 0, -0.02 * C}, 100);
        RefCraft chaser = RefCraft.start(new double[] {-1e12, 0, 0}, new double[] {2, 1, 0}, -5e6, -1e3, -0.2 * C)
                .burnForClock(0.3 * G0, 3 * YR);
        int arrived = 0;
        for (double sendClock : new double[] {-1e8, 1e6, 0.5 * YR, 2 * YR, 5 * YR}) {
            for (RefWorldline[] pair : new RefWorldline[][] {{station, craft}, {craft, station}, {chaser, craft},
                {craft, chaser}}) {
                RefEvent e = pair[0].eventAtClock(sendClock);
                RefArrival a = RefSolver.futureCone(e, pair[1]);
                if (a.never()) {
                    continue;
                }
                arrived++;
                // the cone equation itself holds to the working precision
                BigDecimal dist = RefMath.norm(RefMath.sub(a.position(), e.position()));
                BigDecimal ct = RefMath.C.multiply(a.lightTime());
                assertTrue(digits(ct, dist) >= 90, "c T = |dr|");
                // the past cone returns the emission (the brief asks for 40 digits)
                RefEvent back = RefSolver.pastCone(a.event(), pair[0]);
                assertTrue(digits(back.t(), e.t()) >= 80, "emission time back from the past cone");
                assertTrue(digits(back.clock(), e.clock()) >= 80, "emission clock back from the past cone");
                for (int k = 0; k < 3; k++) {
                    BigDecimal absErr = back.position()[k].subtract(e.position()[k]).abs();
                    assertTrue(absErr.compareTo(RefMath.norm(e.position()).multiply(RefMath.tenToMinus(80))) <= 0);
                }
                assertTrue(a.estimatedDigits() >= 80, "well-conditioned arrivals: " + a);
            }
        }
        assertTrue(arrived >= 15, "most of these messages arrive");
    }

    @Test
    void inertialArrivalMatchesTheQuadraticClosedForm() {
        // Independent closed form for an inertial receiver (textbook quadratic): with p = r0 + v t_e - r_e,
        // (c^2 - v^2) T^2 - 2 (p.v) T - p^2 = 0, T = (p.v + sqrt((p.v)^2 + (c^2 - v^2) p^2)) / (c^2 - v^2).
        double[][] velocities = {{0, 0, 0}, {0.6 * C, 0, 0}, {-0.999 * C, 0, 0}, {0.1 * C, -0.3 * C, 0.5 * C}};
        for (double[] vel : velocities) {
            RefStation rx = RefStation.of(new double[] {4.2 * LY, -1e12, 3e11}, vel, -7);
            for (double te : new double[] {-3e8, 0, 1e9}) {
                RefEvent e = RefEvent.of(te, new double[] {1e11, 2e11, -5e10});
                RefArrival a = RefSolver.futureCone(e, rx);
                BigDecimal[] v = RefMath.bd(vel);
                BigDecimal[] p = RefMath.sub(rx.atTime(e.t()).position(), e.position());
                BigDecimal pv = RefMath.dot(p, v);
                BigDecimal k = RefMath.C2.subtract(RefMath.dot(v, v));
                BigDecimal expected = pv.add(RefMath.sqrt(pv.multiply(pv).add(k.multiply(RefMath.dot(p, p)))))
                        .divide(k, RefMath.mc());
                assertTrue(digits(a.lightTime(), expected) >= 90, "light time, v = " + vel[0] + "," + vel[1]);
            }
        }
    }

    @Test
    void lightTimeKeepsItsOwnPrecisionAtLateMissionTimes() {
        // a 1-second light time at mission time 1e9 s: T is the unknown, so its digits are not spent on t
        RefStation a = RefStation.atRest(ORIGIN);
        // station b passes (c m, 0, 0) at mission time 1e9 s, moving at (1, 2, 0) km/s
        double[] b0 = {C - 1e12, -2e12, 0};
        double[] bv = {1e3, 2e3, 0};
        RefStation b = RefStation.of(b0, bv, 0);
        RefArrival arr = RefSolver.futureCone(RefEvent.of(1e9, ORIGIN), b);
        assertEquals(1.0, arr.lightTimeDouble(), 1e-4);
        Supplier<BigDecimal> solve = () -> RefSolver.futureCone(RefEvent.of(1e9, ORIGIN),
                RefStation.of(b0, bv, 0)).lightTime();
        BigDecimal high = RefMath.withDigits(140, solve);
        assertTrue(digits(arr.lightTime(), high) >= 90, "light time vs a 140-digit solution");
        // and a pure distance: station at rest c metres away, T = 1 s exactly
        RefArrival exact = RefSolver.futureCone(RefEvent.of(1e9, ORIGIN), RefStation.atRest(new double[] {C, 0, 0}));
        assertTrue(digits(exact.lightTime(), BigDecimal.ONE) >= 95);
        // past cone from a reception at 1e9 s onto a craft 1 light-second away
        RefCraft craft = RefCraft.start(new double[] {C, 0, 0}, X, 0, 0, 0.5 * C).burnForever(1e-9);
        RefEvent emission = RefSolver.pastCone(RefEvent.of(1e9, new double[] {C * 0.5e9 + 2 * C, 0, 0}), craft);
        BigDecimal lightTime = big(1e9).subtract(emission.t());
        RefEvent emissionHigh = RefMath.withDigits(140, () -> RefSolver.pastCone(
                RefEvent.of(1e9, new double[] {C * 0.5e9 + 2 * C, 0, 0}),
                RefCraft.start(new double[] {C, 0, 0}, X, 0, 0, 0.5 * C).burnForever(1e-9)));
        assertTrue(digits(lightTime, big(1e9).subtract(emissionHigh.t())) >= 80);
    }

    @Test
    void precisionIsVerifiedByResolvingAtHigherPrecision() {
        // Re-solve the same problems at 200 digits; the default (100-digit) answer must agree to at least its
        // own estimate, and in every case to more than the 45 digits promised for light times.
        double tNearHorizon = Math.nextDown(C / G0);
        Supplier<List<RefArrival>> problems = () -> {
            RefCraft craft = busyCraft();
            RefStation station = RefStation.of(new double[] {0, 2 * LY, 0.1 * LY}, new double[] {0.01 * C, 0, -0.02 * C}, 100);
            RefCraft simple = fromRest(X).burnForever(G0);
            return List.of(
                    RefSolver.futureCone(station.eventAtClock(0.5 * YR), craft),
                    RefSolver.futureCone(craft.eventAtClock(4 * YR), station),
                    RefSolver.futureCone(RefEvent.of(tNearHorizon, ORIGIN), simple),
                    RefSolver.futureCone(RefEvent.of(0.999 * C / G0, new double[] {0, LY, 0}), simple),
                    // 1e-30 relative before the horizon: gamma ~ 1e30 at arrival, 60 digits lost to conditioning,
                    // so the solver must raise its own precision to keep 50
                    RefSolver.futureCone(new RefEvent(RefMath.C.divide(big(G0), RefMath.mc())
                            .multiply(BigDecimal.ONE.subtract(RefMath.tenToMinus(30))), RefMath.bd(ORIGIN), null), simple));
        };
        List<RefArrival> lo = problems.get();
        List<RefArrival> hi = RefMath.withDigits(200, problems);
        for (int i = 0; i < lo.size(); i++) {
            double agree = digits(lo.get(i).lightTime(), hi.get(i).lightTime());
            assertTrue(agree >= lo.get(i).estimatedDigits() - 1, "estimate is honest: " + agree + " vs " + lo.get(i));
            assertTrue(agree >= 50, "light time digits " + agree);
            assertTrue(digits(lo.get(i).clock(), hi.get(i).clock()) >= 50, "receiver clock digits");
        }
    }

    // ------------------------------------------------------------------ Doppler

    @Test
    void collinearRecessionGivesExpOfMinusRelativeRapidity() {
        // Einstein (1905); Jackson, Classical Electrodynamics (3rd ed.), sec. 11.3: on the flight line, a
        // receiver fleeing the sender with relative rapidity eta sees D = exp(-eta).
        RefStation home = RefStation.atRest(ORIGIN);
        // inertial receiver receding at 0.6 c: D = exp(-atanh 0.6) (= 1/2 for exactly 0.6 c)
        RefStation away = RefStation.of(new double[] {LY, 0, 0}, new double[] {0.6 * C, 0, 0}, 0);
        RefSignal s1 = RefSolver.send(home, 1e7, away);
        BigDecimal eta1 = RefMath.atanh(big(0.6 * C).divide(RefMath.C, RefMath.mc()));
        assertTrue(digits(s1.doppler(), RefMath.exp(eta1.negate())) >= 95);
        assertEquals(0.5, s1.dopplerDouble(), 1e-15);

        // a burning receiver: eta is the craft's rapidity at the reception
        RefCraft craft = RefCraft.start(ORIGIN, X, 0, 0, 0.1 * C).burnForClock(G0, YR).coastForClock(YR).burnForever(0.5 * G0);
        for (double t : new double[] {1e6, 0.5 * YR, 1.2 * YR}) {
            RefSignal s = RefSolver.send(home, t, craft);
            assertFalse(s.never());
            BigDecimal eta = craft.rapidityAtClock(s.arrival().clock());
            assertTrue(digits(s.doppler(), RefMath.exp(eta.negate())) >= 95);
            assertTrue(digits(s.frequencyOffset(), RefMath.expm1(eta.negate())) >= 95);
            // and back: the craft sends to the station behind it, sender receding
            RefSignal back = RefSolver.send(craft, t, home);
            BigDecimal etaS = craft.rapidityAtClock(big(t));
            assertTrue(digits(back.doppler(), RefMath.exp(etaS.negate())) >= 95);
        }
        // a chaser on the same line: D = exp(-sigma (eta_rx - eta_tx)), sigma = +1 for a photon running along +x;
        // by the last send the chaser has overtaken the craft (sigma = -1)
        RefCraft chaser = RefCraft.start(new double[] {-LY, 0, 0}, X, 0, 0, 0.3 * C).burnForClock(2 * G0, 2 * YR);
        int[] sigmas = {1, 1, -1};
        double[] sends = {1e5, YR, 4 * YR};
        for (int i = 0; i < sends.length; i++) {
            RefSignal s = RefSolver.send(chaser, sends[i], craft);
            assertFalse(s.never());
            int sigma = s.arrival().position()[0].compareTo(s.sender().position()[0]);
            assertEquals(sigmas[i], sigma);
            BigDecimal rel = craft.rapidityAtClock(s.arrival().clock()).subtract(chaser.rapidityAtClock(big(sends[i])));
            assertTrue(digits(s.doppler(), RefMath.exp(sigma > 0 ? rel.negate() : rel)) >= 95);
        }
        // approaching: a station ahead of the craft sees a blue shift exp(+eta)
        RefStation ahead = RefStation.atRest(new double[] {100 * LY, 0, 0});
        RefSignal blue = RefSolver.send(craft, 2 * YR, ahead);
        assertTrue(digits(blue.doppler(), RefMath.exp(craft.rapidityAtClock(big(2 * YR)))) >= 95);
    }

    @Test
    void tinyAccelerationOffsetKeepsRelativePrecision() {
        // physics.md: at a = 1e-9 m/s^2 the offset is ~1e-13 and must stay right to 1e-9 relative; here exp(-eta)
        // gives it independently as expm1(-eta), eta = a tau / c.
        RefCraft craft = fromRest(X).burnForever(1e-9);
        RefSignal s = RefSolver.send(RefStation.atRest(ORIGIN), 1e4, craft);
        BigDecimal eta = big(1e-9).multiply(s.arrival().clock()).divide(RefMath.C, RefMath.mc());
        assertTrue(Math.abs(s.frequencyOffsetDouble()) < 1e-12 && Math.abs(s.frequencyOffsetDouble()) > 1e-15);
        assertTrue(digits(s.frequencyOffset(), RefMath.expm1(eta.negate())) >= 80);
    }

    @Test
    void dopplerEqualsTheRatioOfClockIntervals() {
        // A series sent every dT on the sender's clock arrives every dT / D (physics.md): check the formula
        // against central differences of full cone solutions, off the flight line, with moving stations.
        RefCraft craft = busyCraft();
        RefStation station = RefStation.of(new double[] {-LY, 3 * LY, 0.5 * LY}, new double[] {0.2 * C, -0.1 * C, 0.3 * C}, 42);
        BigDecimal delta = RefMath.tenToMinus(30);
        for (double clock : new double[] {3e6, 1.5 * YR, 3.3 * YR}) {
            for (RefWorldline[] pair : new RefWorldline[][] {{station, craft}, {craft, station}}) {
                RefSignal mid = RefSolver.send(pair[0], clock, pair[1]);
                if (mid.never()) {
                    continue;
                }
                BigDecimal c0 = big(clock);
                RefSignal plus = RefSolver.send(pair[0], c0.add(delta), pair[1]);
                RefSignal minus = RefSolver.send(pair[0], c0.subtract(delta), pair[1]);
                BigDecimal rate = delta.multiply(BigDecimal.valueOf(2))
                        .divide(plus.arrival().clock().subtract(minus.arrival().clock()), RefMath.mc());
                assertTrue(digits(mid.doppler(), rate) >= 50, "D vs clock-rate ratio: " + digits(mid.doppler(), rate));
            }
        }
    }

    @Test
    void roundTripsBetweenInertialStations() {
        MathContext mc = RefMath.mc();
        // Stations at mutual rest (both moving at the same velocity in the mission frame, apart across it):
        // the up and down Doppler factors multiply to 1 and every round trip takes the same querier time.
        double[] v = {0.3 * C, -0.2 * C, 0.1 * C};
        RefStation a = RefStation.of(new double[] {0, 0, 0}, v, 0);
        RefStation b = RefStation.of(new double[] {1e12, 4e12, -2e12}, v, 1e5);
        BigDecimal rt0 = null;
        for (double q : new double[] {0, 1e6, 3e7}) {
            RefSignal up = RefSolver.send(a, q, b);
            RefSignal down = RefSolver.send(b, up.arrival().clock(), a);
            assertTrue(digits(up.doppler().multiply(down.doppler(), mc), BigDecimal.ONE) >= 95);
            BigDecimal rt = down.arrival().clock().subtract(big(q));
            if (rt0 == null) {
                rt0 = rt;
            }
            assertTrue(digits(rt, rt0) >= 90, "round trip on the querier's clock is constant");
        }
        // Receding along a line at rapidity eta: the two-way (radar) factor is exp(-2 eta), i.e. each leg
        // exp(-eta) (Bondi's k-calculus, Relativity and Common Sense, 1964, k^2 for radar; from memory).
        RefStation home = RefStation.atRest(ORIGIN);
        RefStation away = RefStation.of(new double[] {LY, 0, 0}, new double[] {0.8 * C, 0, 0}, 0);
        BigDecimal eta = RefMath.atanh(big(0.8 * C).divide(RefMath.C, mc));
        RefSignal up = RefSolver.send(home, 1e7, away);
        RefSignal down = RefSolver.send(away, up.arrival().clock(), home);
        assertTrue(digits(up.doppler().multiply(down.doppler(), mc), RefMath.exp(eta.multiply(BigDecimal.valueOf(-2)))) >= 95);
        // General 3-D relative motion: the product equals the querier's rate of echo returns, d(send)/d(echo),
        // measured by central differences of full round trips.
        RefStation p = RefStation.of(new double[] {1e11, 0, 0}, new double[] {0.1 * C, 0.2 * C, 0}, 0);
        RefStation r = RefStation.of(new double[] {0, 2 * LY, LY}, new double[] {-0.3 * C, 0, 0.4 * C}, -3);
        BigDecimal q = big(2e7);
        BigDecimal delta = RefMath.tenToMinus(30);
        BigDecimal turnaround = big(3600);
        BigDecimal[] mid = RefSolver.exchange(p, r, q, turnaround);
        RefSignal upMid = RefSolver.send(p, q, r);
        RefSignal downMid = RefSolver.send(r, mid[1], p);
        BigDecimal[] plus = RefSolver.exchange(p, r, q.add(delta), turnaround);
        BigDecimal[] minus = RefSolver.exchange(p, r, q.subtract(delta), turnaround);
        BigDecimal echoRate = delta.multiply(BigDecimal.valueOf(2)).divide(plus[2].subtract(minus[2]), mc);
        assertTrue(digits(upMid.doppler().multiply(downMid.doppler(), mc), echoRate) >= 50);
        assertFalse(digits(upMid.doppler().multiply(downMid.doppler(), mc), BigDecimal.ONE) > 3,
                "with relative motion the round-trip product is not 1");
    }

    @Test
    void cutoffRateAndExchangeMatchClosedForms() {
        MathContext mc = RefMath.mc();
        BigDecimal a = big(G0);
        BigDecimal cOverA = RefMath.C.divide(a, mc);
        RefStation home = RefStation.atRest(ORIGIN);
        RefCraft craft = fromRest(X).burnForever(G0);
        // Cut-off: the latest send from the origin that reaches the craft by its clock X is the past cone of
        // the craft at X: t_e = t_r - x_r / c = (c/a)(1 - exp(-a X / c)) (hyperbolic motion, Rindler 2006).
        for (double clock : new double[] {1e3, 0.5 * YR, 3 * YR}) {
            RefEvent latest = RefSolver.latestSendArrivingBy(home, craft, big(clock));
            BigDecimal expected = cOverA.multiply(RefMath.expm1(a.multiply(big(clock)).divide(RefMath.C, mc).negate()).negate());
            assertTrue(digits(latest.t(), expected) >= 90, "cut-off send time");
            assertTrue(digits(latest.clock(), expected) >= 90, "cut-off send clock");
        }
        // Doppler rate: from rest at the origin, D = exp(-a tau_r / c), so dD/d(tau_r) = -(a/c) D.
        for (double clock : new double[] {1e4, 0.3 * YR}) {
            RefSignal s = RefSolver.send(home, clock, craft);
            BigDecimal rate = RefSolver.dopplerRate(home, big(clock), craft);
            assertTrue(digits(rate, s.doppler().multiply(a).divide(RefMath.C, mc).negate()) >= 45, "Doppler rate");
        }
        // Exchange with a craft coasting away at v from the origin since t = 0: the query sent at t_q arrives at
        // t1 = t_q / (1 - beta) (craft clock t1 / gamma); the reply leaves at craft clock t1/gamma + turnaround,
        // i.e. mission time t2 = gamma (t1/gamma + turnaround), and lands home at t2 (1 + beta).
        double v = 0.45 * C;
        RefCraft coaster = RefCraft.start(ORIGIN, X, 0, 0, v);
        BigDecimal beta = big(v).divide(RefMath.C, mc);
        BigDecimal gamma = BigDecimal.ONE.divide(RefMath.sqrt(BigDecimal.ONE.subtract(beta.multiply(beta))), mc);
        BigDecimal tq = big(1e6);
        BigDecimal turnaround = big(3600);
        BigDecimal t1 = tq.divide(BigDecimal.ONE.subtract(beta), mc);
        BigDecimal replySend = t1.divide(gamma, mc).add(turnaround);
        BigDecimal t3 = gamma.multiply(replySend).multiply(BigDecimal.ONE.add(beta), mc);
        BigDecimal[] ex = RefSolver.exchange(home, coaster, tq, turnaround);
        assertTrue(digits(ex[0], t1.divide(gamma, mc)) >= 90, "query received on the craft clock");
        assertTrue(digits(ex[1], replySend) >= 90);
        assertTrue(digits(ex[2], t3) >= 90, "reply received on the home clock");
        assertTrue(digits(ex[3], t3.subtract(tq)) >= 90, "round trip on the querier's clock");
    }

    // ------------------------------------------------------------------ worldline

    @Test
    void worldlineHasTheHyperbolicMotionDerivatives() {
        // Rindler (2006): dt/dtau = cosh eta, ds/dtau = c sinh eta, d eta/dtau = a / c; checked by central
        // differences at 100 digits (step 1e-30 s: truncation ~1e-60, rounding ~1e-70).
        RefCraft craft = busyCraft();
        BigDecimal[] n = craft.heading();
        BigDecimal h = RefMath.tenToMinus(30);
        MathContext mc = RefMath.mc();
        for (double u : new double[] {-3e7, 2e6, 0.7 * YR, 1.6 * YR, 6 * YR, 12 * YR}) {
            BigDecimal uu = big(u);
            RefState sp = craft.atClock(uu.add(h));
            RefState sm = craft.atClock(uu.subtract(h));
            BigDecimal eta = craft.rapidityAtClock(uu);
            BigDecimal two = h.multiply(BigDecimal.valueOf(2));
            BigDecimal dtdu = sp.t().subtract(sm.t()).divide(two, mc);
            BigDecimal dsdu = RefMath.dot(RefMath.sub(sp.position(), sm.position()), n).divide(two, mc);
            assertTrue(digits(dtdu, RefMath.cosh(eta)) >= 50, "dt/dtau at " + u);
            assertTrue(digits(dsdu, RefMath.C.multiply(RefMath.sinh(eta))) >= 45, "ds/dtau at " + u);
            // inversion mission time -> clock
            RefState s = craft.atClock(uu);
            assertTrue(digits(craft.atTime(s.t()).clock(), uu) >= 90, "atTime(atClock(u)) = u");
            assertTrue(digits(craft.atTime(s.t()).position()[0], s.position()[0]) >= 90);
        }
        // the legs join continuously (clock, time, position, rapidity)
        for (int i = 1; i < craft.legCount(); i++) {
            BigDecimal[] endPrev = craft.legEnd(i - 1);
            BigDecimal[] start = craft.legStart(i);
            for (int k = 0; k < 4; k++) {
                assertEquals(0, endPrev[k].compareTo(start[k]));
            }
        }
    }

    @Test
    void worldlineAgreesWithAnOdeIntegrator() {
        // Outside reference: Hipparchus DormandPrince853 (Maven Central) integrating d eta/dtau = a/c,
        // dt/dtau = cosh eta, ds/dtau = c sinh eta through a decelerating burn that turns the craft round.
        double a = -0.7 * G0;
        double v0 = 0.6 * C;
        double dur = 2.5 * YR;
        RefCraft craft = RefCraft.start(ORIGIN, X, 1e5, 10, v0).burnForClock(a, dur);
        double eta0 = 0.5 * Math.log((1 + v0 / C) / (1 - v0 / C));
        OrdinaryDifferentialEquation ode = Ode.of(3, (tau, y) -> new double[] {a / C, Math.cosh(y[0]), C * Math.sinh(y[0])});
        DormandPrince853Integrator integrator = new DormandPrince853Integrator(1e-6, 1e6, 1e-14, 1e-14);
        ODEStateAndDerivative end = integrator.integrate(ode, new ODEState(10, new double[] {eta0, 1e5, 0}), 10 + dur);
        BigDecimal[] legEnd = craft.legEnd(0);
        assertEquals(end.getPrimaryState()[0], legEnd[3].doubleValue(), 1e-12, "rapidity");
        assertEquals(end.getPrimaryState()[1], legEnd[0].doubleValue(), 1e-12 * legEnd[0].doubleValue(), "t");
        assertEquals(end.getPrimaryState()[2], legEnd[2].doubleValue(), 1e-11 * C * C / Math.abs(a), "s");
    }

    @Test
    void legEndsMeetTheirConditions() {
        MathContext mc = RefMath.mc();
        RefCraft base = RefCraft.start(ORIGIN, X, 0, 0, -0.5 * C);
        // until-speed: the speed at the end is the one asked for
        RefCraft s = base.burnUntilSpeed(G0, 0.25 * C);
        assertTrue(digits(s.atClock(s.legEnd(0)[1]).velocity()[0], big(0.25 * C)) >= 95);
        // mission-time duration
        RefCraft m = base.burnForMissionTime(-G0, 0.8 * YR);
        assertTrue(digits(m.legEnd(0)[0], big(0.8 * YR)) >= 95);
        RefCraft cm = base.coastForMissionTime(0.8 * YR);
        assertTrue(digits(cm.legEnd(0)[0], big(0.8 * YR)) >= 95);
        assertTrue(digits(cm.legEnd(0)[1], big(0.8 * YR).multiply(RefMath.sqrt(big("0.75")))) >= 95, "t / gamma");
        // until-distance, moving backwards at the start and accelerating forwards:
        // a negative displacement is reached first on the way back ...
        RefCraft dNeg = base.burnUntilDistance(G0, -0.05 * LY);
        BigDecimal uNeg = dNeg.legEnd(0)[1];
        assertTrue(digits(dNeg.legEnd(0)[2], big(-0.05 * LY)) >= 95);
        assertTrue(dNeg.legEnd(0)[3].signum() < 0, "reached while still moving backwards");
        // ... a positive one only after turning round and passing the start again
        RefCraft dPos = base.burnUntilDistance(G0, 0.05 * LY);
        assertTrue(digits(dPos.legEnd(0)[2], big(0.05 * LY)) >= 95);
        assertTrue(dPos.legEnd(0)[3].signum() > 0);
        assertTrue(dPos.legEnd(0)[1].compareTo(uNeg) > 0);
        // the turn-around point is the most negative displacement: c^2/a (1 - cosh eta0) (Rindler 2006)
        BigDecimal eta0 = RefMath.atanh(big(-0.5 * C).divide(RefMath.C, mc));
        BigDecimal deepest = RefMath.C2.divide(big(G0), mc).multiply(BigDecimal.ONE.subtract(RefMath.cosh(eta0)));
        assertThrows(IllegalArgumentException.class, () -> base.burnUntilDistance(G0, deepest.doubleValue() * 1.0001));
        RefCraft turn = base.burnUntilDistance(G0, deepest.doubleValue() * 0.9999);
        assertTrue(turn.legEnd(0)[3].signum() < 0);
        // unreachable ends are refused
        assertThrows(IllegalArgumentException.class, () -> base.burnUntilSpeed(-G0, 0));
        assertThrows(IllegalArgumentException.class, () -> base.coastForClock(1).burnUntilDistance(0, 1e9));
        assertThrows(IllegalStateException.class, () -> base.burnForever(G0).coastForClock(1));
        // before the first leg the craft coasts at its start speed, for ever into the past
        RefState past = s.atTime(-1e9);
        assertTrue(digits(past.position()[0], big(-1e9).multiply(big(-0.5 * C))) >= 95);
        assertTrue(digits(past.clock(), big(-1e9).multiply(RefMath.sqrt(big("0.75")))) >= 95);
        // after a finite last leg it coasts at its final speed
        RefState later = s.atTime(1e10);
        assertTrue(digits(later.velocity()[0], big(0.25 * C)) >= 95);
    }

    // ------------------------------------------------------------------ horizons

    @Test
    void horizonCriterionAgreesWithTheSearchOffTheLine() {
        // Off the flight line, a moving station, a multi-leg receiver ending in a decelerating open-ended burn.
        RefCraft craft = RefCraft.start(new double[] {LY, 0, 0}, new double[] {1, 1, 0}, 0, 0, 0.2 * C)
                .burnForClock(G0, 0.5 * YR).coastForClock(YR).burnForever(-0.3 * G0);
        RefStation station = RefStation.of(new double[] {0, 2 * LY, -LY}, new double[] {0.05 * C, 0, 0.1 * C}, 7);
        RefHorizon h = RefSolver.horizon(station, craft);
        assertTrue(h.exists());
        BigDecimal eps = RefMath.tenToMinus(20);
        RefEvent justBefore = RefEvent.of(station.atTime(h.t().subtract(eps.multiply(h.t().abs()))));
        RefEvent justAfter = RefEvent.of(station.atTime(h.t().add(eps.multiply(h.t().abs()))));
        assertEquals(Boolean.TRUE, RefSolver.arrivesByCriterion(justBefore, craft));
        assertEquals(Boolean.FALSE, RefSolver.arrivesByCriterion(justAfter, craft));
        RefArrival arrives = RefSolver.futureCone(justBefore, craft);   // the search must find it
        assertFalse(arrives.never());
        assertTrue(RefSolver.futureCone(justAfter, craft).never());     // the search confirms it never arrives
        assertTrue(arrives.t().compareTo(h.t().multiply(BigDecimal.valueOf(1000))) > 0, "arrives very late");
        // the station's clock at the horizon
        assertTrue(digits(h.clock(), station.atTime(h.t()).clock()) >= 95);
        // no open-ended burn, or a zero one: no horizon, and late sends arrive
        RefCraft coaster = RefCraft.start(ORIGIN, X, 0, 0, 0).burnForClock(G0, YR);
        assertFalse(RefSolver.horizon(station, coaster).exists());
        assertNull(RefSolver.arrivesByCriterion(RefEvent.of(1e12, ORIGIN), coaster));
        assertFalse(RefSolver.futureCone(RefEvent.of(1e9, ORIGIN), coaster).never());
        assertFalse(RefSolver.horizon(station, fromRest(X).burnForever(0)).exists());
    }

    @Test
    void senderBurningTheSameWayMayHaveNoHorizon() {
        RefCraft leader = fromRest(X).burnForever(G0);
        // a sender starting ahead of the receiver with the same open-ended burn: its own c t - (r - r0).u tends
        // to c^2/a - 0.5 ly, below the receiver's limit c^2/a, so every one of its messages arrives
        RefCraft ahead = RefCraft.start(new double[] {0.5 * LY, 0, 0}, X, 0, 0, 0).burnForever(G0);
        assertFalse(RefSolver.horizon(ahead, leader).exists());
        assertFalse(RefSolver.send(ahead, 20 * YR, leader).never());
        // ... while one starting behind (limit c^2/a + 0.5 ly) has a horizon, found by the search
        RefCraft behind = RefCraft.start(new double[] {-0.5 * LY, 0, 0}, X, 0, 0, 0).burnForever(G0);
        RefHorizon h = RefSolver.horizon(behind, leader);
        assertTrue(h.exists());
        assertFalse(RefSolver.send(behind, h.clock().multiply(big("0.999999")), leader).never());
        assertTrue(RefSolver.send(behind, h.clock().multiply(big("1.000001")), leader).never());
        // the same start with the same burn: the sender is the receiver, its limit equals L, no horizon
        assertFalse(RefSolver.horizon(fromRest(new double[] {3, 0, 0}).burnForever(G0), leader).exists());
        // a sender burning the other way (parallel heading, opposite sense) loses contact
        RefCraft opposite = RefCraft.start(new double[] {0.5 * LY, 0, 0}, new double[] {-2, 0, 0}, 0, 0, 0).burnForever(G0);
        assertNotNull(RefSolver.horizon(opposite, leader).t());
    }
}
