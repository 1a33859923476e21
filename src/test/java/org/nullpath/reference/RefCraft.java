package org.nullpath.reference;

import java.math.BigDecimal;
import java.math.MathContext;
import java.util.ArrayList;
import java.util.Collections;
import java.util.List;
import java.util.Map;
import java.util.concurrent.ConcurrentHashMap;
import java.util.function.UnaryOperator;

/**
 * A craft on a straight flight line r = r0 + s n (n the unit heading, normalised here at the working
 * precision), built from legs of constant proper acceleration or coasting. Immutable: every builder method
 * returns a new craft with one more leg.
 *
 * <p>Hyperbolic motion (Rindler, <i>Relativity: Special, General, and Cosmological</i>, 2nd ed. 2006;
 * Misner, Thorne &amp; Wheeler, <i>Gravitation</i>, 1973, ch. 6), from (t0, s0, eta0) after craft-clock time
 * u with h = a u / (2c), evaluated only in the product forms
 * <pre>
 *   t - t0 = (2c/a)   cosh(eta0 + h) sinh(h)
 *   s - s0 = (2c^2/a) sinh(eta0 + h) sinh(h),     eta = eta0 + 2h
 * </pre>
 * which have no cancellation as a u / c goes to 0. Mission time is mapped to craft clock by solving the
 * first line for h with a safeguarded Newton iteration (not by the inverse closed form); leg ends given by
 * distance or mission time are found the same way.
 *
 * <p>Before the first leg (clock below the start clock) the craft coasts at its start speed for ever into
 * the past; after a finite last leg it coasts for ever. Only the last leg may be open-ended.
 *
 * <p>The craft keeps its double inputs and builds its leg boundaries at each working precision it is used at
 * (cached), so a solve re-run at a higher precision sees leg boundaries of that precision too.
 */
public final class RefCraft implements RefWorldline {

    private final double[] startPosition;
    private final double[] headingIn;
    private final double startTime;
    private final double startClock;
    private final double startSpeed;
    private final List<UnaryOperator<Shape>> steps;
    /** The worldline built at each working precision used so far (legs are recomputed from the doubles). */
    private final Map<Integer, Shape> shapes = new ConcurrentHashMap<>();

    private RefCraft(double[] startPosition, double[] headingIn, double startTime, double startClock, double startSpeed,
                     List<UnaryOperator<Shape>> steps) {
        this.startPosition = startPosition;
        this.headingIn = headingIn;
        this.startTime = startTime;
        this.startClock = startClock;
        this.startSpeed = startSpeed;
        this.steps = List.copyOf(steps);
    }

    /**
     * A craft that coasts at {@code startSpeed} until mission time {@code startTime}, when it is at
     * {@code startPosition} and its clock reads {@code startClock}; legs added afterwards start there.
     *
     * @param startPosition m; null means the origin
     * @param heading       direction of the flight line (normalised here at the working precision)
     * @param startSpeed    signed along the heading, m/s, |v| &lt; c
     */
    public static RefCraft start(double[] startPosition, double[] heading, double startTime, double startClock,
                                 double startSpeed) {
        if (heading == null) {
            throw new IllegalArgumentException("a heading is required");
        }
        RefCraft craft = new RefCraft(startPosition == null ? null : startPosition.clone(), heading.clone(), startTime,
                startClock, startSpeed, List.of());
        craft.shape(); // validate now
        return craft;
    }

    private Shape shape() {
        return shapes.computeIfAbsent(RefMath.digits(), p -> {
            Shape s = Shape.start(startPosition, headingIn, startTime, startClock, startSpeed);
            for (UnaryOperator<Shape> step : steps) {
                s = step.apply(s);
            }
            return s;
        });
    }

    private RefCraft then(UnaryOperator<Shape> step) {
        List<UnaryOperator<Shape>> next = new ArrayList<>(steps);
        next.add(step);
        RefCraft craft = new RefCraft(startPosition, headingIn, startTime, startClock, startSpeed, next);
        craft.shapes.put(RefMath.digits(), step.apply(shape())); // validates the new leg now
        return craft;
    }

    // ------------------------------------------------------------------ builders

    /** Constant proper acceleration {@code a} (m/s^2, signed along heading) for {@code du} s of craft clock. */
    public RefCraft burnForClock(double a, double du) {
        return then(s -> s.burnForClock(a, du));
    }

    /** Constant proper acceleration for {@code dt} s of mission time. */
    public RefCraft burnForMissionTime(double a, double dt) {
        return then(s -> s.burnForMissionTime(a, dt));
    }

    /** Constant proper acceleration until the speed along the heading is {@code v} (m/s, signed). */
    public RefCraft burnUntilSpeed(double a, double v) {
        return then(s -> s.burnUntilSpeed(a, v));
    }

    /**
     * Constant proper acceleration until the displacement covered during this leg, along the heading, first
     * equals {@code d} (m, signed).
     */
    public RefCraft burnUntilDistance(double a, double d) {
        return then(s -> s.burnUntilDistance(a, d));
    }

    /** Constant proper acceleration for ever (last leg only). */
    public RefCraft burnForever(double a) {
        return then(s -> s.burnForever(a));
    }

    /** Coast for {@code du} s of craft clock. */
    public RefCraft coastForClock(double du) {
        return then(s -> s.coastForClock(du));
    }

    /** Coast for {@code dt} s of mission time. */
    public RefCraft coastForMissionTime(double dt) {
        return then(s -> s.coastForMissionTime(dt));
    }

    // ------------------------------------------------------------------ evaluation

    @Override
    public RefState atClock(BigDecimal clock) {
        return shape().atClock(clock);
    }

    @Override
    public RefState atTime(BigDecimal t) {
        return shape().atTime(t);
    }

    /** Rapidity along the heading when the craft clock reads {@code clock}. */
    public BigDecimal rapidityAtClock(BigDecimal clock) {
        return shape().rapidityAtClock(clock);
    }

    /** Rapidity along the heading at mission time {@code t}. */
    public BigDecimal rapidityAtTime(BigDecimal t) {
        return shape().rapidityAtTime(t);
    }

    /** Displacement s along the heading from the start position when the craft clock reads {@code clock}. */
    public BigDecimal displacementAtClock(BigDecimal clock) {
        return shape().displacementAtClock(clock);
    }

    /** Number of legs. */
    public int legCount() {
        return steps.size();
    }

    /** {t, clock, s, eta} at the start of leg {@code i}. */
    public BigDecimal[] legStart(int i) {
        return shape().legStart(i);
    }

    /** {t, clock, s, eta} at the end of leg {@code i}; throws for an open-ended leg. */
    public BigDecimal[] legEnd(int i) {
        return shape().legEnd(i);
    }

    /** The unit heading n. */
    public BigDecimal[] heading() {
        return shape().heading();
    }

    /** The start position r0. */
    public BigDecimal[] origin() {
        return shape().origin();
    }

    /** The asymptote of an open-ended final burn with a != 0, or null. */
    Asymptote asymptote() {
        return shape().asymptote();
    }

    /**
     * The asymptote of an open-ended final burn with a != 0: the unit direction of travel u = sign(a) n,
     * and L = lim (c t - (r - r0).u) = c t0 - s0' + (c^2/|a|) exp(-eta0') with s0' = sign(a) s0 and
     * eta0' = sign(a) eta0 at the start of that burn (docs/physics.md, "Light cones" and "Horizons").
     */
    record Asymptote(BigDecimal[] direction, BigDecimal[] rawDirection, BigDecimal[] origin, BigDecimal limit,
                     BigDecimal accelerationAbs, BigDecimal burnStartTime) {
    }

    /** The worldline at one working precision. */
    static final class Shape {


        /** One piece of the worldline: a = 0 is a coast. End fields are null when open-ended. */
        static final class Seg {
            final String kind;
            final BigDecimal a;
            final BigDecimal t0;
            final BigDecimal u0;
            final BigDecimal s0;
            final BigDecimal eta0;
            final BigDecimal t1;
            final BigDecimal u1;
            final BigDecimal s1;
            final BigDecimal eta1;
            final BigDecimal cosh0;
            final BigDecimal sinh0;

            Seg(String kind, BigDecimal a, BigDecimal t0, BigDecimal u0, BigDecimal s0, BigDecimal eta0,
                BigDecimal t1, BigDecimal u1, BigDecimal s1, BigDecimal eta1) {
                this.kind = kind;
                this.a = a;
                this.t0 = t0;
                this.u0 = u0;
                this.s0 = s0;
                this.eta0 = eta0;
                this.t1 = t1;
                this.u1 = u1;
                this.s1 = s1;
                this.eta1 = eta1;
                this.cosh0 = RefMath.cosh(eta0);
                this.sinh0 = RefMath.sinh(eta0);
            }

            boolean coast() {
                return a.signum() == 0;
            }

            boolean open() {
                return u1 == null;
            }

            /** {t, s, eta} at clock offset du from the start of this piece (any sign for a coast). */
            BigDecimal[] atClockOffset(BigDecimal du) {
                MathContext mc = RefMath.mc();
                if (du.signum() == 0) {
                    return new BigDecimal[] {t0, s0, eta0};
                }
                if (coast()) {
                    return new BigDecimal[] {
                        t0.add(du.multiply(cosh0, mc), mc),
                        s0.add(RefMath.C.multiply(du, mc).multiply(sinh0, mc), mc),
                        eta0
                    };
                }
                BigDecimal h = a.multiply(du, mc).divide(RefMath.C.multiply(BigDecimal.valueOf(2)), mc);
                BigDecimal sh = RefMath.sinh(h);
                BigDecimal[] ce = RefMath.coshSinh(eta0.add(h, mc));
                BigDecimal twoCOverA = RefMath.C.multiply(BigDecimal.valueOf(2)).divide(a, mc);
                BigDecimal dt = twoCOverA.multiply(ce[0], mc).multiply(sh, mc);
                BigDecimal ds = twoCOverA.multiply(RefMath.C, mc).multiply(ce[1], mc).multiply(sh, mc);
                return new BigDecimal[] {t0.add(dt, mc), s0.add(ds, mc), eta0.add(h.multiply(BigDecimal.valueOf(2)), mc)};
            }

            /** Clock offset du from the start of this piece at which the mission time is t0 + dt. */
            BigDecimal clockOffsetForTime(BigDecimal dt) {
                MathContext mc = RefMath.mc();
                if (dt.signum() == 0) {
                    return BigDecimal.ZERO;
                }
                if (coast()) {
                    return dt.divide(cosh0, mc);
                }
                BigDecimal twoC = RefMath.C.multiply(BigDecimal.valueOf(2));
                BigDecimal h = solveBurnTime(eta0, a.multiply(dt, mc).divide(twoC, mc));
                return h.multiply(twoC, mc).divide(a, mc);
            }
        }

        private final BigDecimal[] origin;
        private final BigDecimal[] heading;
        private final BigDecimal[] rawHeading;
        private final Seg before;
        private final List<Seg> legs;
        private final Seg after;

        private Shape(BigDecimal[] origin, BigDecimal[] heading, BigDecimal[] rawHeading, Seg before, List<Seg> legs) {
            this.origin = origin;
            this.heading = heading;
            this.rawHeading = rawHeading;
            this.before = before;
            this.legs = Collections.unmodifiableList(legs);
            if (legs.isEmpty()) {
                this.after = before;
            } else {
                Seg last = legs.get(legs.size() - 1);
                this.after = last.open() ? null
                        : new Seg("coast-after", BigDecimal.ZERO, last.t1, last.u1, last.s1, last.eta1,
                                  null, null, null, null);
            }
        }

        /** The start: coasting at the start speed, legs to follow (see {@link RefCraft#start}). */
        static Shape start(double[] startPosition, double[] heading, double startTime, double startClock,
                           double startSpeed) {
            BigDecimal[] raw = RefMath.bd(heading);
            BigDecimal norm = RefMath.norm(raw);
            if (norm.signum() == 0) {
                throw new IllegalArgumentException("heading must not be the zero vector");
            }
            MathContext mc = RefMath.mc();
            BigDecimal[] n = {raw[0].divide(norm, mc), raw[1].divide(norm, mc), raw[2].divide(norm, mc)};
            BigDecimal beta = RefMath.bd(startSpeed).divide(RefMath.C, mc);
            if (beta.abs().compareTo(BigDecimal.ONE) >= 0) {
                throw new IllegalArgumentException("start speed must be below c");
            }
            BigDecimal eta = RefMath.atanh(beta);
            Seg before = new Seg("coast-before", BigDecimal.ZERO, RefMath.bd(startTime), RefMath.bd(startClock),
                    BigDecimal.ZERO, eta, null, null, null, null);
            BigDecimal[] r0 = startPosition == null
                    ? new BigDecimal[] {BigDecimal.ZERO, BigDecimal.ZERO, BigDecimal.ZERO} : RefMath.bd(startPosition);
            return new Shape(r0, n, raw, before, new ArrayList<>());
        }

        // ------------------------------------------------------------------ builders

        /** Constant proper acceleration {@code a} (m/s^2, signed along heading) for {@code du} s of craft clock. */
        Shape burnForClock(double a, double du) {
            return closedLeg("burn-clock", RefMath.bd(a), nonNegative(du, "duration"));
        }

        /** Constant proper acceleration for {@code dt} s of mission time. */
        Shape burnForMissionTime(double a, double dt) {
            Seg open = openLeg("burn-mission", RefMath.bd(a));
            BigDecimal du = open.clockOffsetForTime(nonNegative(dt, "duration"));
            return closedLeg("burn-mission", open.a, du);
        }

        /** Constant proper acceleration until the speed along the heading is {@code v} (m/s, signed). */
        Shape burnUntilSpeed(double a, double v) {
            MathContext mc = RefMath.mc();
            BigDecimal aa = RefMath.bd(a);
            BigDecimal beta = RefMath.bd(v).divide(RefMath.C, mc);
            if (beta.abs().compareTo(BigDecimal.ONE) >= 0) {
                throw new IllegalArgumentException("target speed must be below c");
            }
            Seg open = openLeg("burn-speed", aa);
            BigDecimal dEta = RefMath.atanh(beta).subtract(open.eta0, mc);
            if (dEta.signum() == 0) {
                return closedLeg("burn-speed", aa, BigDecimal.ZERO);
            }
            if (aa.signum() == 0 || dEta.signum() != aa.signum()) {
                throw new IllegalArgumentException("the target speed is not reached with this acceleration");
            }
            return closedLeg("burn-speed", aa, dEta.multiply(RefMath.C, mc).divide(aa, mc));
        }

        /**
         * Constant proper acceleration until the displacement covered during this leg, along the heading, first
         * equals {@code d} (m, signed).
         */
        Shape burnUntilDistance(double a, double d) {
            MathContext mc = RefMath.mc();
            BigDecimal aa = RefMath.bd(a);
            BigDecimal dd = RefMath.bd(d);
            Seg open = openLeg("burn-distance", aa);
            if (dd.signum() == 0) {
                return closedLeg("burn-distance", aa, BigDecimal.ZERO);
            }
            if (aa.signum() == 0) {
                // a coast reaches d only if moving towards it
                if (open.sinh0.signum() != dd.signum()) {
                    throw new IllegalArgumentException("the distance is not reached while coasting");
                }
                return closedLeg("burn-distance", aa, dd.divide(RefMath.C.multiply(open.sinh0, mc), mc));
            }
            // mirror so that the acceleration is positive: eta' = sigma eta, d' = sigma d, h' = sigma h >= 0
            int sigma = aa.signum();
            BigDecimal aAbs = aa.abs();
            BigDecimal e0 = sigma > 0 ? open.eta0 : open.eta0.negate();
            BigDecimal target = aAbs.multiply(sigma > 0 ? dd : dd.negate(), mc)
                    .divide(RefMath.C2.multiply(BigDecimal.valueOf(2)), mc);
            // G(h) = sinh(e0 + h) sinh(h), G'(h) = sinh(e0 + 2h): decreasing up to h* = -e0/2 when e0 < 0
            RefRoots.Fn g = h -> new BigDecimal[] {
                RefMath.sinh(e0.add(h, mc)).multiply(RefMath.sinh(h), mc).subtract(target, mc),
                RefMath.sinh(e0.add(h.multiply(BigDecimal.valueOf(2)), mc))
            };
            BigDecimal h;
            if (target.signum() < 0) {
                if (e0.signum() >= 0) {
                    throw new IllegalArgumentException("the distance is not reached: the craft moves away from it");
                }
                BigDecimal hStar = e0.negate().divide(BigDecimal.valueOf(2), mc);
                BigDecimal sHalf = RefMath.sinh(hStar);
                BigDecimal gMin = sHalf.multiply(sHalf, mc).negate();
                if (target.compareTo(gMin) < 0) {
                    throw new IllegalArgumentException("the distance is not reached: the craft turns back before it");
                }
                // decreasing branch: solve the increasing function -G(h) + target on [0, h*]
                RefRoots.Fn neg = x -> {
                    BigDecimal[] v = g.valueAndSlope(x);
                    return new BigDecimal[] {v[0].negate(), v[1].negate()};
                };
                h = RefRoots.increasing(neg, BigDecimal.ZERO, hStar, null, BigDecimal.ZERO);
            } else {
                BigDecimal lo = e0.signum() < 0 ? e0.negate() : BigDecimal.ZERO; // G(lo) = 0 < target
                BigDecimal hi = lo.add(BigDecimal.ONE);
                for (int i = 0; g.valueAndSlope(hi)[0].signum() < 0; i++) {
                    if (i > 200) {
                        throw new IllegalStateException("no bracket for the distance");
                    }
                    lo = hi;
                    hi = hi.multiply(BigDecimal.valueOf(2));
                }
                h = RefRoots.increasing(g, lo, hi, null, BigDecimal.ZERO);
            }
            BigDecimal du = h.multiply(RefMath.C.multiply(BigDecimal.valueOf(2)), mc).divide(aAbs, mc);
            return closedLeg("burn-distance", aa, du);
        }

        /** Constant proper acceleration for ever (last leg only). */
        Shape burnForever(double a) {
            return withLeg(openLeg("burn-forever", RefMath.bd(a)));
        }

        /** Coast for {@code du} s of craft clock. */
        Shape coastForClock(double du) {
            return closedLeg("coast-clock", BigDecimal.ZERO, nonNegative(du, "duration"));
        }

        /** Coast for {@code dt} s of mission time. */
        Shape coastForMissionTime(double dt) {
            Seg open = openLeg("coast-mission", BigDecimal.ZERO);
            return closedLeg("coast-mission", BigDecimal.ZERO, nonNegative(dt, "duration").divide(open.cosh0, RefMath.mc()));
        }

        private static BigDecimal nonNegative(double x, String what) {
            BigDecimal v = RefMath.bd(x);
            if (v.signum() < 0) {
                throw new IllegalArgumentException(what + " must not be negative");
            }
            return v;
        }

        private Seg openLeg(String kind, BigDecimal a) {
            BigDecimal t0;
            BigDecimal u0;
            BigDecimal s0;
            BigDecimal eta0;
            if (legs.isEmpty()) {
                t0 = before.t0;
                u0 = before.u0;
                s0 = before.s0;
                eta0 = before.eta0;
            } else {
                Seg last = legs.get(legs.size() - 1);
                if (last.open()) {
                    throw new IllegalStateException("no leg can follow an open-ended leg");
                }
                t0 = last.t1;
                u0 = last.u1;
                s0 = last.s1;
                eta0 = last.eta1;
            }
            return new Seg(kind, a, t0, u0, s0, eta0, null, null, null, null);
        }

        private Shape closedLeg(String kind, BigDecimal a, BigDecimal du) {
            Seg open = openLeg(kind, a);
            BigDecimal[] end = open.atClockOffset(du);
            Seg closed = new Seg(kind, a, open.t0, open.u0, open.s0, open.eta0,
                    end[0], open.u0.add(du, RefMath.mc()), end[1], end[2]);
            return withLeg(closed);
        }

        private Shape withLeg(Seg seg) {
            List<Seg> next = new ArrayList<>(legs);
            next.add(seg);
            return new Shape(origin, heading, rawHeading, before, next);
        }

        // ------------------------------------------------------------------ evaluation

        private Seg segForClock(BigDecimal u) {
            if (u.compareTo(before.u0) <= 0) {
                return before;
            }
            for (Seg leg : legs) {
                if (leg.open() || u.compareTo(leg.u1) <= 0) {
                    return leg;
                }
            }
            return after;
        }

        private Seg segForTime(BigDecimal t) {
            if (t.compareTo(before.t0) <= 0) {
                return before;
            }
            for (Seg leg : legs) {
                if (leg.open() || t.compareTo(leg.t1) <= 0) {
                    return leg;
                }
            }
            return after;
        }

        private RefState state(BigDecimal u, BigDecimal t, BigDecimal s, BigDecimal eta) {
            MathContext mc = RefMath.mc();
            BigDecimal[] r = RefMath.add(origin, RefMath.scale(heading, s));
            BigDecimal[] cs = RefMath.coshSinh(eta);
            BigDecimal v = RefMath.C.multiply(cs[1], mc).divide(cs[0], mc);
            return new RefState(u, t, r, RefMath.scale(heading, v), cs[0]);
        }

        RefState atClock(BigDecimal clock) {
            Seg seg = segForClock(clock);
            BigDecimal[] p = seg.atClockOffset(clock.subtract(seg.u0, RefMath.mc()));
            return state(clock, p[0], p[1], p[2]);
        }

        RefState atTime(BigDecimal t) {
            Seg seg = segForTime(t);
            BigDecimal du = seg.clockOffsetForTime(t.subtract(seg.t0, RefMath.mc()));
            BigDecimal u = seg.u0.add(du, RefMath.mc());
            BigDecimal[] p = seg.atClockOffset(du);
            // report the requested mission time itself (p[0] equals it to the working precision)
            return state(u, t, p[1], p[2]);
        }

        /** Rapidity along the heading when the craft clock reads {@code clock}. */
        public BigDecimal rapidityAtClock(BigDecimal clock) {
            Seg seg = segForClock(clock);
            return seg.atClockOffset(clock.subtract(seg.u0, RefMath.mc()))[2];
        }

        /** Rapidity along the heading at mission time {@code t}. */
        public BigDecimal rapidityAtTime(BigDecimal t) {
            Seg seg = segForTime(t);
            return seg.atClockOffset(seg.clockOffsetForTime(t.subtract(seg.t0, RefMath.mc())))[2];
        }

        /** Displacement s along the heading from the start position when the craft clock reads {@code clock}. */
        public BigDecimal displacementAtClock(BigDecimal clock) {
            Seg seg = segForClock(clock);
            return seg.atClockOffset(clock.subtract(seg.u0, RefMath.mc()))[1];
        }

        /** Number of legs. */
        public int legCount() {
            return legs.size();
        }

        /** {t, clock, s, eta} at the start of leg {@code i}. */
        public BigDecimal[] legStart(int i) {
            Seg s = legs.get(i);
            return new BigDecimal[] {s.t0, s.u0, s.s0, s.eta0};
        }

        /** {t, clock, s, eta} at the end of leg {@code i}; throws for an open-ended leg. */
        public BigDecimal[] legEnd(int i) {
            Seg s = legs.get(i);
            if (s.open()) {
                throw new IllegalStateException("leg " + i + " is open-ended");
            }
            return new BigDecimal[] {s.t1, s.u1, s.s1, s.eta1};
        }

        /** The unit heading n. */
        public BigDecimal[] heading() {
            return heading.clone();
        }

        /** The start position r0. */
        public BigDecimal[] origin() {
            return origin.clone();
        }

        // ------------------------------------------------------------------ horizon data


        Asymptote asymptote() {
            if (legs.isEmpty()) {
                return null;
            }
            Seg last = legs.get(legs.size() - 1);
            if (!last.open() || last.coast()) {
                return null;
            }
            MathContext mc = RefMath.mc();
            int sigma = last.a.signum();
            BigDecimal sPrime = sigma > 0 ? last.s0 : last.s0.negate();
            BigDecimal etaPrime = sigma > 0 ? last.eta0 : last.eta0.negate();
            BigDecimal limit = RefMath.C.multiply(last.t0, mc).subtract(sPrime, mc)
                    .add(RefMath.C2.divide(last.a.abs(), mc).multiply(RefMath.exp(etaPrime.negate()), mc), mc);
            BigDecimal[] dir = sigma > 0 ? heading.clone() : RefMath.scale(heading, BigDecimal.ONE.negate());
            BigDecimal[] raw = sigma > 0 ? rawHeading.clone()
                    : new BigDecimal[] {rawHeading[0].negate(), rawHeading[1].negate(), rawHeading[2].negate()};
            return new Asymptote(dir, raw, origin.clone(), limit, last.a.abs(), last.t0);
        }

        // ------------------------------------------------------------------ burn-time inversion

        /**
         * Solves cosh(eta0 + h) sinh(h) = target for h (the function is strictly increasing on the whole line,
         * derivative cosh(eta0 + 2h); |root| &lt;= |target| since |cosh(.) sinh(h)| &gt;= |h|).
         */
        static BigDecimal solveBurnTime(BigDecimal eta0, BigDecimal target) {
            if (target.signum() == 0) {
                return BigDecimal.ZERO;
            }
            MathContext mc = RefMath.mc();
            RefRoots.Fn f = h -> {
                BigDecimal[] ce = RefMath.coshSinh(eta0.add(h, mc));
                BigDecimal[] chh = RefMath.coshSinh(h);
                // f = cosh(eta0 + h) sinh h - target;  f' = cosh(eta0 + 2h) = cosh(E) cosh(h) + sinh(E) sinh(h)
                return new BigDecimal[] {
                    ce[0].multiply(chh[1], mc).subtract(target, mc),
                    ce[0].multiply(chh[0], mc).add(ce[1].multiply(chh[1], mc), mc)
                };
            };
            BigDecimal lo = target.signum() > 0 ? BigDecimal.ZERO : target;
            BigDecimal hi = target.signum() > 0 ? target : BigDecimal.ZERO;
            return RefRoots.increasing(f, lo, hi, doubleGuess(eta0, target), BigDecimal.ZERO);
        }

        /** A rough double-precision starting point (only steers the iteration), or null. */
        private static BigDecimal doubleGuess(BigDecimal eta0, BigDecimal target) {
            double e0 = eta0.doubleValue();
            double f = target.doubleValue();
            double ch = Math.cosh(e0);
            if (!Double.isFinite(ch) || !Double.isFinite(f) || f == 0) {
                return null;
            }
            double g;
            if (Math.abs(2 * f) < 1e-6 * ch) {
                g = f / ch;
            } else {
                double x = Math.sinh(e0) + 2 * f;
                double asinh = Math.signum(x) * Math.log(Math.abs(x) + Math.sqrt(x * x + 1));
                g = (asinh - e0) / 2;
            }
            return Double.isFinite(g) && g != 0 ? new BigDecimal(g) : null;
        }
    }
}
