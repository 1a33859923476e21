package org.nullpath.reference;

import java.math.BigDecimal;
import java.math.MathContext;

/**
 * Independent high-precision reference for light cones, Doppler factors and horizons, for tests only.
 *
 * <p>It shares nothing with the production code: arithmetic is {@link java.math.BigDecimal} at the
 * {@link RefMath} working precision (default {@value RefMath#DEFAULT_DIGITS} digits) with elementary
 * functions written in {@link RefMath} (not Hipparchus {@code Dfp}). Arrivals are not taken from null-coordinate
 * closed forms: the light time T is the unknown of the scalar equation
 * <pre>
 *   g(T) = c T - |r(t_e + T) - r_e| = 0,   g'(T) = c - v . k &gt;= c (1 - |beta|) &gt; 0
 * </pre>
 * (docs/physics.md, "Light cones" and "Horizons"), bracketed by doubling T and solved by safeguarded Newton
 * iteration ({@link RefRoots}); because T itself is the unknown it keeps its own relative precision even
 * when the mission times are far larger. Past cones solve c T = |r_r - r(t_r - T)| the same way.
 *
 * <p>Horizons: a receiver whose last leg is an open-ended burn with a != 0 has the asymptotic null coordinate
 * L = c t0 - s0' + (c^2/|a|) exp(-eta0'); a send at (t_e, r_e) arrives iff c t_e - (r_e - r0).u &lt; L with
 * u = sign(a) n. {@link #futureCone} applies this criterion and confirms it by its own search: when the
 * criterion says "never" it checks g(T) &lt; 0 on a doubling sequence of T out to 10^15 times the problem's
 * time scale; when it says "arrives" the bracket search must find the crossing. A disagreement throws.
 */
public final class RefSolver {

    private static final BigDecimal TWO = BigDecimal.valueOf(2);
    private static final int MAX_DOUBLINGS = 6000;
    /** Results estimated to carry fewer significant digits than this are recomputed at a higher precision. */
    public static final int TARGET_DIGITS = 50;
    /** Highest working precision the automatic re-solve goes to. */
    public static final int MAX_DIGITS = 1000;

    private RefSolver() {
    }

    // ------------------------------------------------------------------ future cone

    /**
     * The arrival of the future light cone of {@code emission} on {@code receiver}, or a never-arrival. The
     * event's coordinates are taken as exact. If the arrival is so ill-conditioned (very close to a horizon)
     * that the working precision would leave fewer than {@value #TARGET_DIGITS} digits of light time, it is
     * recomputed at a higher precision (worldlines rebuild their legs from the double inputs there).
     */
    public static RefArrival futureCone(RefEvent emission, RefWorldline receiver) {
        return futureCone(emission, receiver, null);
    }

    private static RefArrival futureCone(RefEvent emission, RefWorldline receiver, BigDecimal[] bracketHint) {
        Attempt at = futureConeOnce(emission, receiver, bracketHint);
        if (at.raiseTo() > 0) {
            return RefMath.withDigits(at.raiseTo(), () -> futureCone(emission, receiver, at.bracket()));
        }
        return at.arrival();
    }

    /** One solve at the working precision: the arrival, or the precision to retry at and the bracket found. */
    private record Attempt(RefArrival arrival, int raiseTo, BigDecimal[] bracket) {
    }

    /** The higher precision to re-solve at, or 0 when the estimate already meets the target. */
    private static int raisedDigits(double estimatedDigits) {
        int p = RefMath.digits();
        if (estimatedDigits >= TARGET_DIGITS || p >= MAX_DIGITS) {
            return 0;
        }
        return Math.min(MAX_DIGITS, p + (int) Math.ceil(TARGET_DIGITS - estimatedDigits) + 20);
    }

    private static Attempt futureConeOnce(RefEvent emission, RefWorldline receiver, BigDecimal[] bracketHint) {
        MathContext mc = RefMath.mc();
        BigDecimal te = emission.t();
        BigDecimal[] re = emission.position();
        Boolean criterion = arrivesByCriterion(emission, receiver);

        RefRoots.Fn g = cone(te, re, receiver, true);
        BigDecimal d0 = RefMath.norm(RefMath.sub(receiver.atTime(te).position(), re));
        if (d0.signum() == 0) {
            if (Boolean.FALSE.equals(criterion)) {
                throw new IllegalStateException("emission on the receiver's worldline judged beyond its horizon");
            }
            return new Attempt(arrival(emission, receiver, BigDecimal.ZERO, g), 0, null);
        }
        BigDecimal t1 = d0.divide(RefMath.C, mc);
        if (Boolean.FALSE.equals(criterion)) {
            confirmNever(g, t1, te, ((RefCraft) receiver).asymptote());
            return new Attempt(RefArrival.neverArrives(emission), 0, null);
        }
        BigDecimal lo = BigDecimal.ZERO;
        BigDecimal hi = t1;
        if (bracketHint != null && g.valueAndSlope(bracketHint[0])[0].signum() < 0
                && g.valueAndSlope(bracketHint[1])[0].signum() >= 0) {
            // the bracket found at a lower precision still holds
            lo = bracketHint[0];
            hi = bracketHint[1];
        }
        int i = 0;
        BigDecimal[] atHi;
        while ((atHi = g.valueAndSlope(hi))[0].signum() < 0) {
            if (++i > MAX_DOUBLINGS) {
                throw new IllegalStateException(criterion == null
                        ? "no arrival found for a receiver without a horizon"
                        : "horizon criterion says the signal arrives but the search found no arrival");
            }
            lo = hi;
            hi = hi.multiply(TWO);
        }
        BigDecimal[] bracket = {lo, hi};
        // conditioning at the top of the bracket (pessimistic for a receiver speeding away): if the working
        // precision cannot give the target digits, go up before spending iterations here
        int raise = raisedDigits(conditionedDigits(atHi[2].movePointRight(RefMath.digits() - 1),
                atHi[1].multiply(hi, mc)));
        if (raise > 0) {
            return new Attempt(null, raise, bracket);
        }
        BigDecimal lightTime = RefRoots.increasing(g, lo, hi, null, BigDecimal.ZERO);
        RefArrival a = arrival(emission, receiver, lightTime, g);
        raise = raisedDigits(a.estimatedDigits());
        return raise > 0 ? new Attempt(null, raise, bracket) : new Attempt(a, 0, null);
    }

    /** Convenience: emission at exactly converted doubles. */
    public static RefArrival futureCone(double te, double[] re, RefWorldline receiver) {
        return futureCone(RefEvent.of(te, re), receiver);
    }

    /**
     * The horizon criterion of docs/physics.md ("Horizons") for a receiver craft with an open-ended burn: TRUE if the signal
     * arrives, FALSE if it never does, null when the receiver has no horizon (then it always arrives).
     */
    public static Boolean arrivesByCriterion(RefEvent emission, RefWorldline receiver) {
        if (!(receiver instanceof RefCraft craft)) {
            return null;
        }
        RefCraft.Asymptote as = craft.asymptote();
        if (as == null) {
            return null;
        }
        MathContext mc = RefMath.mc();
        BigDecimal b = RefMath.dot(RefMath.sub(emission.position(), as.origin()), as.direction());
        BigDecimal lhs = RefMath.C.multiply(emission.t(), mc).subtract(b, mc);
        return lhs.compareTo(as.limit()) < 0;
    }

    private static void confirmNever(RefRoots.Fn g, BigDecimal t1, BigDecimal te, RefCraft.Asymptote as) {
        MathContext mc = RefMath.mc();
        BigDecimal scale = BigDecimal.ONE;
        scale = RefMath.max(scale, RefMath.C.divide(as.accelerationAbs(), mc));
        scale = RefMath.max(scale, te.abs());
        scale = RefMath.max(scale, as.burnStartTime().abs());
        scale = RefMath.max(scale, t1);
        BigDecimal stop = scale.multiply(BigDecimal.TEN.pow(15));
        BigDecimal t = t1;
        BigDecimal previous = null;
        while (t.compareTo(stop) <= 0) {
            BigDecimal v = g.valueAndSlope(t)[0];
            if (v.signum() >= 0) {
                throw new IllegalStateException(
                        "horizon criterion says never, but the light cone reaches the receiver by light time " + t);
            }
            if (previous != null && v.compareTo(previous) < 0) {
                throw new IllegalStateException("c T - distance is not increasing: inconsistent worldline");
            }
            previous = v;
            t = t.multiply(TWO);
        }
    }

    /** g(T) for the future cone (sign +1: t = t_e + T) or the past cone (t = t_r - T). */
    private static RefRoots.Fn cone(BigDecimal tEvent, BigDecimal[] rEvent, RefWorldline line, boolean future) {
        MathContext mc = RefMath.mc();
        return lightTime -> {
            BigDecimal t = future ? tEvent.add(lightTime, mc) : tEvent.subtract(lightTime, mc);
            RefState s = line.atTime(t);
            BigDecimal[] dr = future ? RefMath.sub(s.position(), rEvent) : RefMath.sub(rEvent, s.position());
            BigDecimal dist = RefMath.norm(dr);
            BigDecimal value = RefMath.C.multiply(lightTime, mc).subtract(dist, mc);
            BigDecimal slope = RefMath.C;
            if (dist.signum() > 0) {
                slope = slope.subtract(RefMath.dot(s.velocity(), dr).divide(dist, mc), mc);
            }
            // rounding error of the value: 10^-(p-1) of the terms that enter it
            BigDecimal noise = RefMath.C.multiply(t.abs().add(tEvent.abs()).add(lightTime), mc)
                    .add(dist).add(RefMath.norm(s.position())).add(RefMath.norm(rEvent))
                    .multiply(RefMath.tenToMinus(RefMath.digits() - 1), mc);
            return new BigDecimal[] {value, slope, noise};
        };
    }

    private static RefArrival arrival(RefEvent emission, RefWorldline receiver, BigDecimal lightTime, RefRoots.Fn g) {
        MathContext mc = RefMath.mc();
        BigDecimal t = emission.t().add(lightTime, mc);
        RefState s = receiver.atTime(t);
        double digits = RefMath.digits() - 6;
        if (lightTime.signum() > 0) {
            // error of g ~ 10^-p times the magnitudes that enter it; error of T = that / g'(T)
            BigDecimal magnitude = RefMath.C.multiply(t.abs().add(emission.t().abs()).add(lightTime), mc)
                    .add(RefMath.norm(s.position())).add(RefMath.norm(emission.position()));
            BigDecimal slope = g.valueAndSlope(lightTime)[1];
            digits = conditionedDigits(magnitude, slope.multiply(lightTime, mc));
        }
        return new RefArrival(false, emission, t, s.clock(), s.position(), lightTime, s, digits);
    }

    /**
     * Digits left in a root x of g when g is evaluated with relative error 10^-p on terms of size
     * {@code magnitude}: p - 2 - log10(magnitude / (g' |x|)), capped at p - 6 (the solver's tolerance).
     * (The cone solvers stop once |g| is below 10^-(p-1) times those terms.)
     */
    private static double conditionedDigits(BigDecimal magnitude, BigDecimal slopeTimesRoot) {
        int p = RefMath.digits();
        if (slopeTimesRoot.signum() <= 0 || magnitude.signum() <= 0) {
            return p - 6;
        }
        double cond = RefMath.log10Approx(magnitude) - RefMath.log10Approx(slopeTimesRoot.abs());
        return Math.min(p - 6, p - 2 - Math.max(0.0, cond));
    }

    // ------------------------------------------------------------------ past cone

    /**
     * The emission event on {@code sender} whose signal arrives at {@code reception} (with the sender's clock);
     * re-solved at a higher precision when ill-conditioned, as in {@link #futureCone}.
     */
    public static RefEvent pastCone(RefEvent reception, RefWorldline sender) {
        double[] digits = new double[1];
        RefEvent e = pastConeOnce(reception, sender, digits);
        int raised = raisedDigits(digits[0]);
        return raised > 0 ? RefMath.withDigits(raised, () -> pastCone(reception, sender)) : e;
    }

    private static RefEvent pastConeOnce(RefEvent reception, RefWorldline sender, double[] digitsOut) {
        MathContext mc = RefMath.mc();
        digitsOut[0] = RefMath.digits() - 6;
        BigDecimal tr = reception.t();
        BigDecimal[] rr = reception.position();
        RefState now = sender.atTime(tr);
        BigDecimal d0 = RefMath.norm(RefMath.sub(rr, now.position()));
        if (d0.signum() == 0) {
            return RefEvent.of(now);
        }
        RefRoots.Fn g = cone(tr, rr, sender, false);
        BigDecimal lo = BigDecimal.ZERO;
        BigDecimal hi = d0.divide(RefMath.C, mc);
        int i = 0;
        while (g.valueAndSlope(hi)[0].signum() < 0) {
            if (++i > MAX_DOUBLINGS) {
                throw new IllegalStateException("no emission found on the past cone");
            }
            lo = hi;
            hi = hi.multiply(TWO);
        }
        BigDecimal lightTime = RefRoots.increasing(g, lo, hi, null, BigDecimal.ZERO);
        RefState s = sender.atTime(tr.subtract(lightTime, mc));
        BigDecimal magnitude = RefMath.C.multiply(tr.abs().add(s.t().abs()).add(lightTime), mc)
                .add(RefMath.norm(s.position())).add(RefMath.norm(rr));
        digitsOut[0] = conditionedDigits(magnitude, g.valueAndSlope(lightTime)[1].multiply(lightTime, mc));
        return RefEvent.of(s);
    }

    /**
     * Latest send on {@code sender} that arrives at {@code receiver} when its clock reads {@code arriveByClock}
     * (the past cone of that reception): a cut-off.
     */
    public static RefEvent latestSendArrivingBy(RefWorldline sender, RefWorldline receiver, BigDecimal arriveByClock) {
        return pastCone(receiver.eventAtClock(arriveByClock), sender);
    }

    // ------------------------------------------------------------------ Doppler

    /**
     * f_rx / f_tx = gamma_r (1 - beta_r . k) / (gamma_s (1 - beta_s . k)), k the unit vector from the send
     * position to the receive position (Einstein 1905; Jackson, <i>Classical Electrodynamics</i>, 3rd ed.,
     * sec. 11.3).
     */
    public static BigDecimal doppler(RefState sender, RefState receiver) {
        MathContext mc = RefMath.mc();
        BigDecimal[] dr = RefMath.sub(receiver.position(), sender.position());
        BigDecimal dist = RefMath.norm(dr);
        if (dist.signum() == 0) {
            throw new IllegalArgumentException("send and receive positions coincide: no photon direction");
        }
        BigDecimal[] k = RefMath.scale(dr, BigDecimal.ONE.divide(dist, mc));
        BigDecimal num = receiver.gamma().multiply(
                BigDecimal.ONE.subtract(RefMath.dot(receiver.velocity(), k).divide(RefMath.C, mc), mc), mc);
        BigDecimal den = sender.gamma().multiply(
                BigDecimal.ONE.subtract(RefMath.dot(sender.velocity(), k).divide(RefMath.C, mc), mc), mc);
        return num.divide(den, mc);
    }

    /** Doppler factor minus one (plain subtraction: at the working precision there is ample headroom). */
    public static BigDecimal frequencyOffset(RefState sender, RefState receiver) {
        return doppler(sender, receiver).subtract(BigDecimal.ONE, RefMath.mc());
    }

    /**
     * One message sent when the sender's clock reads {@code sendClock}; when the arrival is ill-conditioned
     * the whole message (send event included) is recomputed at a higher precision.
     */
    public static RefSignal send(RefWorldline sender, BigDecimal sendClock, RefWorldline receiver) {
        return send(sender, sendClock, receiver, null);
    }

    private static RefSignal send(RefWorldline sender, BigDecimal sendClock, RefWorldline receiver,
                                  BigDecimal[] bracketHint) {
        RefState tx = sender.atClock(sendClock);
        Attempt at = futureConeOnce(RefEvent.of(tx), receiver, bracketHint);
        if (at.raiseTo() > 0) {
            return RefMath.withDigits(at.raiseTo(), () -> send(sender, sendClock, receiver, at.bracket()));
        }
        RefArrival arrival = at.arrival();
        if (arrival.never()) {
            return new RefSignal(tx, arrival, null, null);
        }
        BigDecimal d = doppler(tx, arrival.state());
        return new RefSignal(tx, arrival, d, d.subtract(BigDecimal.ONE, RefMath.mc()));
    }

    /** Convenience: {@link #send(RefWorldline, BigDecimal, RefWorldline)} with an exactly converted double. */
    public static RefSignal send(RefWorldline sender, double sendClock, RefWorldline receiver) {
        return send(sender, RefMath.bd(sendClock), receiver);
    }

    /**
     * dD/d(receiver clock) at the message sent at {@code sendClock}, by a central difference of two full
     * solutions at send clocks sendClock +- delta, delta = 10^(-p/3) max(1, |sendClock|) (p the working
     * precision): an independent numerical derivative, not a formula. Multiply by f_tx for the Doppler
     * rate in Hz/s. Not meaningful exactly at a leg boundary (the acceleration jumps there).
     */
    public static BigDecimal dopplerRate(RefWorldline sender, BigDecimal sendClock, RefWorldline receiver) {
        MathContext mc = RefMath.mc();
        BigDecimal delta = RefMath.tenToMinus(RefMath.digits() / 3).multiply(RefMath.max(BigDecimal.ONE, sendClock.abs()));
        RefSignal plus = send(sender, sendClock.add(delta, mc), receiver);
        RefSignal minus = send(sender, sendClock.subtract(delta, mc), receiver);
        if (plus.never() || minus.never()) {
            throw new IllegalArgumentException("the message does not arrive");
        }
        BigDecimal dClock = plus.arrival().clock().subtract(minus.arrival().clock(), mc);
        return plus.doppler().subtract(minus.doppler(), mc).divide(dClock, mc);
    }

    /**
     * A query-reply round trip: query sent at {@code querySendClock} on the querier's clock, reply sent
     * {@code turnaround} later on the responder's clock. Returns {query receive clock, reply send clock,
     * reply receive clock, round trip on the querier's clock}, or null when either leg never arrives.
     */
    public static BigDecimal[] exchange(RefWorldline querier, RefWorldline responder, BigDecimal querySendClock,
                                        BigDecimal turnaround) {
        MathContext mc = RefMath.mc();
        RefSignal q = send(querier, querySendClock, responder);
        if (q.never()) {
            return null;
        }
        BigDecimal replySend = q.arrival().clock().add(turnaround, mc);
        RefSignal r = send(responder, replySend, querier);
        if (r.never()) {
            return null;
        }
        return new BigDecimal[] {q.arrival().clock(), replySend, r.arrival().clock(),
            r.arrival().clock().subtract(querySendClock, mc)};
    }

    // ------------------------------------------------------------------ horizon

    /**
     * The supremum of the sender's mission times whose signals still reach {@code receiver}, with the sender's
     * clock there; none when the receiver has no open-ended burn or when every send arrives (a sender whose own
     * open-ended burn runs in exactly the same direction with a limit not above the receiver's). Re-solved at a
     * higher precision when ill-conditioned, as in {@link #futureCone}.
     */
    public static RefHorizon horizon(RefWorldline sender, RefCraft receiver) {
        double[] digits = new double[1];
        RefHorizon h = horizonOnce(sender, receiver, digits);
        int raised = h.exists() ? raisedDigits(digits[0]) : 0;
        return raised > 0 ? RefMath.withDigits(raised, () -> horizon(sender, receiver)) : h;
    }

    private static RefHorizon horizonOnce(RefWorldline sender, RefCraft receiver, double[] digitsOut) {
        RefCraft.Asymptote as = receiver.asymptote();
        if (as == null) {
            return RefHorizon.none();
        }
        MathContext mc = RefMath.mc();
        BigDecimal limit = as.limit();
        BigDecimal[] u = as.direction();
        BigDecimal[] r0 = as.origin();
        if (sender instanceof RefCraft sc) {
            RefCraft.Asymptote sa = sc.asymptote();
            if (sa != null && sameDirection(sa.rawDirection(), as.rawDirection())) {
                BigDecimal supremum = sa.limit().subtract(RefMath.dot(RefMath.sub(sa.origin(), r0), u), mc);
                if (supremum.compareTo(limit) <= 0) {
                    return RefHorizon.none();
                }
            }
        }
        // G(t) = c t - (r_s(t) - r0).u - L, strictly increasing (slope c - v.u > 0)
        RefRoots.Fn gFn = t -> {
            RefState s = sender.atTime(t);
            BigDecimal value = RefMath.C.multiply(t, mc)
                    .subtract(RefMath.dot(RefMath.sub(s.position(), r0), u), mc).subtract(limit, mc);
            BigDecimal slope = RefMath.C.subtract(RefMath.dot(s.velocity(), u), mc);
            return new BigDecimal[] {value, slope};
        };
        BigDecimal scale = RefMath.max(BigDecimal.ONE, limit.abs().divide(RefMath.C, mc));
        BigDecimal lo;
        BigDecimal hi;
        if (gFn.valueAndSlope(BigDecimal.ZERO)[0].signum() < 0) {
            lo = BigDecimal.ZERO;
            hi = scale;
            for (int i = 0; gFn.valueAndSlope(hi)[0].signum() < 0; i++) {
                if (i > MAX_DOUBLINGS) {
                    throw new IllegalStateException("no horizon crossing found");
                }
                lo = hi;
                hi = hi.multiply(TWO);
            }
        } else {
            hi = BigDecimal.ZERO;
            lo = scale.negate();
            for (int i = 0; gFn.valueAndSlope(lo)[0].signum() >= 0; i++) {
                if (i > MAX_DOUBLINGS) {
                    throw new IllegalStateException("no horizon crossing found");
                }
                hi = lo;
                lo = lo.multiply(TWO);
            }
        }
        BigDecimal t = RefRoots.increasing(gFn, lo, hi, null, scale.multiply(RefMath.tenToMinus(30)));
        RefState s = sender.atTime(t);
        BigDecimal magnitude = RefMath.C.multiply(t.abs(), mc).add(RefMath.norm(s.position()))
                .add(RefMath.norm(r0)).add(limit.abs());
        digitsOut[0] = conditionedDigits(magnitude, gFn.valueAndSlope(t)[1].multiply(t.abs().add(BigDecimal.ONE), mc));
        return new RefHorizon(true, t, s.clock(), limit);
    }

    /** Exact test on the doubles given as headings (signed by the acceleration): parallel, same sense. */
    private static boolean sameDirection(BigDecimal[] a, BigDecimal[] b) {
        BigDecimal[] x = RefMath.crossExact(a, b);
        BigDecimal dot = a[0].multiply(b[0]).add(a[1].multiply(b[1])).add(a[2].multiply(b[2]));
        return x[0].signum() == 0 && x[1].signum() == 0 && x[2].signum() == 0 && dot.signum() > 0;
    }
}
