package org.nullpath.reference;

import java.math.BigDecimal;
import java.math.MathContext;
import java.util.Arrays;
import java.util.Map;
import java.util.concurrent.ConcurrentHashMap;

/**
 * A craft on a straight flight line r = r0 + s n (n the unit heading, normalised at the working precision)
 * that coasts at its start speed until its start, flies ONE profiled leg from there (docs/legs.md) and coasts for ever after it. Test-only reference, independent of the production code.
 *
 * <p>The leg's proper acceleration a(u, eta), u the craft-clock time since the leg start, is one of:
 * <ul>
 *   <li><b>constant thrust</b> F (signed along n) with exhaust speed v_ex, mass m(u) = m0 - |F| u / v_ex,
 *       a = F / m(u), until the burnout mass m1 at u1 = (m0 - m1) v_ex / |F|. The rapidity has the closed
 *       form eta(u) = eta0 + sign(F) (v_ex / c) ln(m0 / m(u)) (the relativistic rocket equation, Ackeret,
 *       Helv. Phys. Acta 19, 1946, 103; volume and page cited from memory; in proper time the mass law is the Newtonian one, so eta is
 *       linear in ln m whatever the thrust history);</li>
 *   <li><b>beam-pushed sail</b>: a = (1 + R) P D^2 / (m c), D = exp(-eta) the Doppler factor of the beam from a
 *       station at rest on the flight line behind the sail (Kulkarni, Lubin &amp; Zhang, AJ 155:155, 2018),
 *       so d(e^{2 eta})/du = 2 (1 + R) P / (m c^2) and exp(2 eta) = exp(2 eta0) + 2 (1 + R) P u / (m c^2). The
 *       station sits at along-track coordinate b (measured from the start position, b &lt; 0) and switches off
 *       at mission time t_off; the leg ends where that switch-off's light reaches the sail:
 *       c t_off - b = c t(u) - s(u), i.e. where the integral of e^{-eta} from the leg start reaches
 *       t_off - t0 - b/c. Since d(c t - s)/du = c e^{-eta} decreases (the sail only speeds up), that function
 *       of u is increasing and concave: Newton's iteration from u = 0 (in doubles, with the same rule) rises
 *       monotonically to the end and seeds a safeguarded Newton solve at the working precision on the last
 *       panel of the leg's quadrature table;</li>
 *   <li><b>tabulated profile</b>: a(u) linear between samples (u_i, a_i), the leg lasting to the last sample;
 *       eta(u) = eta_i + (a_i d + (a_{i+1} - a_i) d^2 / (2 h_i)) / c with d = u - u_i, h_i = u_{i+1} - u_i, and
 *       eta_{i+1} = eta_i + (a_i + a_{i+1}) h_i / (2c) (exact integration of a piecewise linear function).</li>
 * </ul>
 *
 * <p>Mission time and position follow from dt/du = cosh eta, ds/du = c sinh eta (docs/physics.md, "Craft on a
 * straight line"), integrated here by composite Gauss–Legendre quadrature ({@link RefProfiledQuadrature}) at the
 * working precision: the leg is cut into panels (at the profile's samples, and graded geometrically in
 * mass for the rocket and in e^{2 eta} for the sail so that every panel keeps the same ratio of width to
 * distance from the integrand's branch point), the integrals at the panel edges are accumulated once per
 * working precision (cached), and a point inside a panel adds one n-point rule from the panel's left edge.
 * The result is an analytic function of u inside each panel and continuous across panels, so root finders
 * running at the working precision see a smooth worldline; its agreement with the exact integrals is
 * checked by refinement (doubling the panels, raising the order) and against the closed-form antiderivatives
 * of the rocket and sail laws in {@code RefProfiledSelfTest}, to at least 45 digits.
 *
 * <p>Mission time is mapped to the craft clock by Newton's iteration on t(u) (safeguarded by the panel as a
 * bracket), so {@link #atTime} and {@link #atClock} are inverses to the working precision. Like
 * {@link RefCraft}, the craft keeps its double inputs and rebuilds at each working precision it is used at.
 */
public final class RefProfiledCraft implements RefWorldline {

    /** Gauss–Legendre order used by default. */
    static final int DEFAULT_NODES = 16;

    private static final BigDecimal TWO = BigDecimal.valueOf(2);
    private static final BigDecimal HALF = new BigDecimal("0.5");

    private final double[] startPosition;
    private final double[] headingIn;
    private final double startTime;
    private final double startClock;
    private final double startSpeed;
    private final Law law;
    private final int nodes;
    private final int refine;
    private final Map<Integer, Model> models = new ConcurrentHashMap<>();

    private RefProfiledCraft(double[] startPosition, double[] heading, double startTime, double startClock,
                             double startSpeed, Law law, int nodes, int refine) {
        if (heading == null) {
            throw new IllegalArgumentException("a heading is required");
        }
        this.startPosition = startPosition == null ? new double[3] : startPosition.clone();
        this.headingIn = heading.clone();
        this.startTime = startTime;
        this.startClock = startClock;
        this.startSpeed = startSpeed;
        this.law = law;
        this.nodes = nodes;
        this.refine = refine;
        model(); // validate now
    }

    // ------------------------------------------------------------------ factories

    /**
     * Constant thrust {@code thrust} (N, signed along the heading) from {@code initialMass} down to
     * {@code burnoutMass} (kg) with exhaust speed {@code exhaustSpeed} (m/s, 0 &lt; v_ex &lt;= c); the start
     * arguments are those of {@link RefCraft#start}.
     */
    public static RefProfiledCraft thrust(double[] startPosition, double[] heading, double startTime,
                                          double startClock, double startSpeed, double thrust, double initialMass,
                                          double burnoutMass, double exhaustSpeed) {
        if (!(thrust != 0) || !(burnoutMass > 0) || !(initialMass > burnoutMass) || !(exhaustSpeed > 0)
                || !(exhaustSpeed <= RefMath.C.doubleValue())) {
            throw new IllegalArgumentException("thrust != 0, 0 < burnout mass < initial mass, 0 < v_ex <= c");
        }
        return new RefProfiledCraft(startPosition, heading, startTime, startClock, startSpeed,
                new ThrustLaw(thrust, initialMass, burnoutMass, exhaustSpeed), DEFAULT_NODES, 1);
    }

    /**
     * A sail of {@code mass} (kg) and reflectivity {@code reflectivity} (0..1) pushed by a beam of
     * {@code beamPower} (W) from a station at rest on the flight line at along-track coordinate
     * {@code stationAlong} (m, measured along the heading from the start position; negative: behind), switched
     * off at mission time {@code beamOffTime} (s); the start arguments are those of {@link RefCraft#start}.
     */
    public static RefProfiledCraft sail(double[] startPosition, double[] heading, double startTime,
                                        double startClock, double startSpeed, double stationAlong, double beamPower,
                                        double mass, double reflectivity, double beamOffTime) {
        if (!(stationAlong < 0) || !(beamPower > 0) || !(mass > 0) || !(reflectivity >= 0 && reflectivity <= 1)) {
            throw new IllegalArgumentException("station behind, positive power and mass, reflectivity in [0, 1]");
        }
        return new RefProfiledCraft(startPosition, heading, startTime, startClock, startSpeed,
                new SailLaw(stationAlong, beamPower, mass, reflectivity, beamOffTime), DEFAULT_NODES, 1);
    }

    /**
     * A tabulated proper acceleration (m/s^2, signed along the heading) against the leg's own clock (s, first
     * sample 0, strictly increasing), linear between samples; the start arguments are those of
     * {@link RefCraft#start}.
     */
    public static RefProfiledCraft profile(double[] startPosition, double[] heading, double startTime,
                                           double startClock, double startSpeed, double[] clocks,
                                           double[] accelerations) {
        if (clocks.length < 2 || clocks.length != accelerations.length || clocks[0] != 0) {
            throw new IllegalArgumentException("at least two samples, the first at clock 0");
        }
        for (int i = 1; i < clocks.length; i++) {
            if (!(clocks[i] > clocks[i - 1])) {
                throw new IllegalArgumentException("clock samples must increase strictly");
            }
        }
        return new RefProfiledCraft(startPosition, heading, startTime, startClock, startSpeed,
                new ProfileLaw(clocks.clone(), accelerations.clone()), DEFAULT_NODES, 1);
    }

    /**
     * The same craft with another quadrature: {@code nodes} Gauss–Legendre points per panel and
     * {@code refine} times as many panels (for the refinement checks of the self-test).
     */
    RefProfiledCraft withQuadrature(int nodes, int refine) {
        return new RefProfiledCraft(startPosition, headingIn, startTime, startClock, startSpeed, law, nodes, refine);
    }

    private Model model() {
        return models.computeIfAbsent(RefMath.digits(), p -> new Model());
    }

    // ------------------------------------------------------------------ evaluation

    @Override
    public RefState atClock(BigDecimal clock) {
        Model m = model();
        BigDecimal u = clock.subtract(m.u0, RefMath.mc());
        BigDecimal[] p = m.atLegClock(u);
        return m.state(clock, p[0], p[1], p[2]);
    }

    @Override
    public RefState atTime(BigDecimal t) {
        Model m = model();
        BigDecimal u = m.legClockAtTime(t);
        BigDecimal[] p = m.atLegClock(u);
        // report the requested mission time itself (p[0] equals it to the working precision)
        return m.state(m.u0.add(u, RefMath.mc()), t, p[1], p[2]);
    }

    /** Rapidity along the heading when the craft clock reads {@code clock}. */
    public BigDecimal rapidityAtClock(BigDecimal clock) {
        Model m = model();
        return m.atLegClock(clock.subtract(m.u0, RefMath.mc()))[2];
    }

    /** Displacement s along the heading from the start position when the craft clock reads {@code clock}. */
    public BigDecimal displacementAtClock(BigDecimal clock) {
        return lineAtClock(clock)[1];
    }

    /** {t, s, eta} (mission time, displacement along the heading, rapidity) at craft clock {@code clock}. */
    public BigDecimal[] lineAtClock(BigDecimal clock) {
        Model m = model();
        return m.atLegClock(clock.subtract(m.u0, RefMath.mc()));
    }

    /** {t, clock, s, eta} at the start of the leg. */
    public BigDecimal[] legStart() {
        Model m = model();
        return new BigDecimal[] {m.t0, m.u0, BigDecimal.ZERO, m.eta0};
    }

    /** {t, clock, s, eta} at the end of the leg. */
    public BigDecimal[] legEnd() {
        Model m = model();
        return new BigDecimal[] {m.t1, m.u0.add(m.length, RefMath.mc()), m.s1, m.eta1};
    }

    /** The craft clock at the end of the leg as the nearest double. */
    public double legEndClockDouble() {
        return legEnd()[1].doubleValue();
    }

    /** The unit heading n. */
    public BigDecimal[] heading() {
        return model().heading.clone();
    }

    @Override
    public String toString() {
        return "RefProfiledCraft[" + law.getClass().getSimpleName() + ", " + nodes + " nodes x "
                + model().edges.length + " edges]";
    }

    /** The panel edges of the leg (leg clock, s), for the self-test. */
    BigDecimal[] panelEdges() {
        return model().edges.clone();
    }

    // ------------------------------------------------------------------ the leg laws

    /** A leg law prepared at one working precision. */
    private interface Leg {
        /** Rapidity at leg clock u in [0, length]. */
        BigDecimal eta(BigDecimal u);

        /** Panel edges 0 = p_0 &lt; ... &lt; p_N = length. */
        BigDecimal[] edges();
    }

    /** A leg law as given (doubles), prepared at the working precision from the start rapidity and time. */
    private interface Law {
        Leg prepare(BigDecimal eta0, BigDecimal t0, int nodes, int refine);
    }

    /**
     * Panels for a rapidity change of {@code dEta}: at least {@code min}, at most 1/24 of rapidity each (for the
     * sail, graded in e^{2 eta}, this keeps every panel ~24 half-widths from the branch point e^{2 eta} = 0, so
     * the n-point rule converges like 48^-2n).
     */
    private static int panelsFor(double dEta, int min, int refine) {
        return refine * Math.max(min, (int) Math.ceil(24 * Math.abs(dEta)));
    }

    private record ThrustLaw(double force, double m0, double m1, double vex) implements Law {
        @Override
        public Leg prepare(BigDecimal eta0, BigDecimal t0, int nodes, int refine) {
            MathContext mc = RefMath.mc();
            BigDecimal fAbs = RefMath.bd(Math.abs(force));
            BigDecimal mass0 = RefMath.bd(m0);
            BigDecimal mass1 = RefMath.bd(m1);
            BigDecimal ve = RefMath.bd(vex);
            BigDecimal w = force > 0 ? ve.divide(RefMath.C, mc) : ve.divide(RefMath.C, mc).negate();
            // q(u) = |F| u / (v_ex m0): m(u) = m0 (1 - q)
            BigDecimal rate = fAbs.divide(ve.multiply(mass0, mc), mc);
            BigDecimal length = mass0.subtract(mass1).multiply(ve, mc).divide(fAbs, mc);
            BigDecimal lnRatio = RefMath.ln(mass1.divide(mass0, mc)); // ln(m1/m0) < 0
            // equal steps in ln m: each panel's distance to the branch point m = 0 is ~2N / ln(m0/m1) half-widths
            int panels = refine * Math.max(16, (int) Math.ceil(12 * Math.abs(lnRatio.doubleValue())));
            BigDecimal[] edges = new BigDecimal[panels + 1];
            edges[0] = BigDecimal.ZERO;
            BigDecimal scale = mass0.multiply(ve, mc).divide(fAbs, mc);
            for (int j = 1; j < panels; j++) {
                // mass m_j = m0 (m1/m0)^(j/N): u_j = (m0 - m_j) v_ex / |F|
                BigDecimal frac = BigDecimal.valueOf(j).divide(BigDecimal.valueOf(panels), mc);
                edges[j] = RefMath.expm1(lnRatio.multiply(frac, mc)).negate().multiply(scale, mc);
            }
            edges[panels] = length;
            return new Leg() {
                @Override
                public BigDecimal eta(BigDecimal u) {
                    // ln(m0 / m) = -log1p(-q)
                    BigDecimal lnM0OverM = RefMath.log1p(rate.multiply(u, mc).negate()).negate();
                    return eta0.add(w.multiply(lnM0OverM, mc), mc);
                }

                @Override
                public BigDecimal[] edges() {
                    return edges;
                }
            };
        }
    }

    private record SailLaw(double stationAlong, double power, double mass, double reflectivity, double offTime)
            implements Law {
        @Override
        public Leg prepare(BigDecimal eta0, BigDecimal t0, int nodes, int refine) {
            MathContext mc = RefMath.mc();
            // X(u) = e^{2 eta} = A + K u;  eta(u) = eta0 + log1p(K u / A) / 2
            BigDecimal a = RefMath.exp(eta0.multiply(TWO, mc));
            BigDecimal k = BigDecimal.ONE.add(RefMath.bd(reflectivity)).multiply(RefMath.bd(power), mc).multiply(TWO, mc)
                    .divide(RefMath.bd(mass).multiply(RefMath.C2, mc), mc);
            BigDecimal kOverA = k.divide(a, mc);
            java.util.function.UnaryOperator<BigDecimal> eta =
                u -> eta0.add(RefMath.log1p(kOverA.multiply(u, mc)).multiply(HALF, mc), mc);
            // the leg ends where c t - s = c t_off - b, i.e. where the integral of e^{-eta} from 0 reaches D0
            BigDecimal d0 = RefMath.bd(offTime).subtract(t0, mc)
                    .subtract(RefMath.bd(stationAlong).divide(RefMath.C, mc), mc);
            if (d0.signum() <= 0) {
                throw new IllegalArgumentException("the beam is switched off before its light reaches the sail's start");
            }
            RefProfiledQuadrature.Integrand expMinus = x -> new BigDecimal[] {RefMath.exp(eta.apply(x).negate())};
            // 1. a double-precision estimate of the end (it only seeds the solve below)
            double uEst = doubleEstimate(a.doubleValue(), k.doubleValue(), eta0.doubleValue(), d0.doubleValue(), nodes);
            double dEta = Math.log1p(k.doubleValue() / a.doubleValue() * uEst) / 2;
            BigDecimal[] edges = graded(BigDecimal.ZERO, new BigDecimal(uEst), a, k, panelsFor(dEta, 8, refine));
            int last = edges.length - 1;
            // 2. the integral of e^{-eta} up to the last inner edge, then Newton on the last panel
            BigDecimal acc = BigDecimal.ZERO;
            for (int j = 0; j + 1 < last; j++) {
                acc = acc.add(RefProfiledQuadrature.integrate(expMinus, edges[j], edges[j + 1], nodes, 1)[0], mc);
            }
            BigDecimal lo = edges[last - 1];
            BigDecimal base = acc.subtract(d0, mc);
            if (base.signum() > 0) {
                throw new IllegalStateException("the double-precision seed of the beam-off solve is too far off");
            }
            RefRoots.Fn g = x -> new BigDecimal[] {
                base.add(RefProfiledQuadrature.integrate(expMinus, lo, x, nodes, 1)[0], mc),
                RefMath.exp(eta.apply(x).negate())
            };
            BigDecimal hi = edges[last];
            for (int i = 0; g.valueAndSlope(hi)[0].signum() < 0; i++) {
                if (i > 60) {
                    throw new IllegalStateException("no bracket for the beam-off");
                }
                hi = lo.add(hi.subtract(lo, mc).multiply(TWO), mc);
            }
            edges[last] = RefRoots.increasing(g, lo, hi, edges[last].compareTo(hi) < 0 ? edges[last] : null, hi);
            return new Leg() {
                @Override
                public BigDecimal eta(BigDecimal x) {
                    return eta.apply(x);
                }

                @Override
                public BigDecimal[] edges() {
                    return edges;
                }
            };
        }

        /**
         * The end of the leg in double precision: Newton's iteration from u = 0 on the integral of e^{-eta}
         * (increasing and concave, so the iterates rise monotonically to the root), each step integrated with
         * the same Gauss–Legendre rule in doubles on panels graded as below. Only a starting point.
         */
        private static double doubleEstimate(double a, double k, double eta0, double d0, int nodes) {
            RefProfiledQuadrature.Rule rule = RefProfiledQuadrature.rule(nodes);
            double[] x = RefMath.d(rule.nodes());
            double[] w = RefMath.d(rule.weights());
            double kOverA = k / a;
            double u = 0;
            double h = -d0;
            for (int iter = 0; iter < 200; iter++) {
                double step = -h * Math.exp(eta0 + Math.log1p(kOverA * u) / 2);
                double next = u + step;
                double xLo = (a + k * u) / k;
                double logRatio = Math.log1p(step / xLo);
                int panels = panelsFor(logRatio / 2, 8, 1);
                double left = u;
                for (int j = 1; j <= panels; j++) {
                    double right = j == panels ? next : u + xLo * Math.expm1(logRatio * j / panels);
                    double mid = (left + right) / 2;
                    double half = (right - left) / 2;
                    double sum = 0;
                    for (int i = 0; i < x.length; i++) {
                        sum += w[i] * Math.exp(-eta0 - Math.log1p(kOverA * (mid + half * x[i])) / 2);
                    }
                    h += sum * half;
                    left = right;
                }
                u = next;
                if (!(step > 1e-15 * u)) {
                    break;
                }
            }
            return u;
        }

        /** Edges from lo to hi with X = A + K u growing geometrically (equal steps of rapidity). */
        private static BigDecimal[] graded(BigDecimal lo, BigDecimal hi, BigDecimal a, BigDecimal k, int panels) {
            MathContext mc = RefMath.mc();
            BigDecimal[] e = new BigDecimal[panels + 1];
            e[0] = lo;
            e[panels] = hi;
            BigDecimal xLoOverK = a.add(k.multiply(lo, mc), mc).divide(k, mc);
            BigDecimal logRatio = RefMath.log1p(hi.subtract(lo, mc).divide(xLoOverK, mc));
            for (int j = 1; j < panels; j++) {
                BigDecimal frac = BigDecimal.valueOf(j).divide(BigDecimal.valueOf(panels), mc);
                e[j] = lo.add(xLoOverK.multiply(RefMath.expm1(logRatio.multiply(frac, mc)), mc), mc);
            }
            return e;
        }
    }

    private record ProfileLaw(double[] clocks, double[] accelerations) implements Law {
        @Override
        public Leg prepare(BigDecimal eta0, BigDecimal t0, int nodes, int refine) {
            MathContext mc = RefMath.mc();
            int n = clocks.length;
            BigDecimal[] uc = new BigDecimal[n];
            BigDecimal[] ac = new BigDecimal[n];
            BigDecimal[] etaAt = new BigDecimal[n];
            for (int i = 0; i < n; i++) {
                uc[i] = RefMath.bd(clocks[i]);
                ac[i] = RefMath.bd(accelerations[i]);
            }
            BigDecimal[] width = new BigDecimal[n - 1];
            BigDecimal[] slope = new BigDecimal[n - 1]; // (a_{i+1} - a_i) / (2 h_i)
            etaAt[0] = eta0;
            java.util.List<BigDecimal> edges = new java.util.ArrayList<>();
            edges.add(BigDecimal.ZERO);
            for (int i = 0; i + 1 < n; i++) {
                width[i] = uc[i + 1].subtract(uc[i]);
                slope[i] = ac[i + 1].subtract(ac[i]).divide(width[i].multiply(TWO), mc);
                etaAt[i + 1] = etaAt[i].add(ac[i].add(ac[i + 1]).multiply(width[i], mc).divide(RefMath.C.multiply(TWO), mc), mc);
                double bound = Math.max(Math.abs(accelerations[i]), Math.abs(accelerations[i + 1]))
                        * (clocks[i + 1] - clocks[i]) / RefMath.C.doubleValue();
                int panels = panelsFor(bound, 4, refine);
                for (int j = 1; j < panels; j++) {
                    edges.add(uc[i].add(width[i].multiply(BigDecimal.valueOf(j), mc)
                            .divide(BigDecimal.valueOf(panels), mc), mc));
                }
                edges.add(uc[i + 1]);
            }
            BigDecimal[] e = edges.toArray(new BigDecimal[0]);
            return new Leg() {
                @Override
                public BigDecimal eta(BigDecimal u) {
                    int i = Arrays.binarySearch(uc, u);
                    if (i < 0) {
                        i = -i - 2;
                    }
                    i = Math.max(0, Math.min(n - 2, i));
                    BigDecimal d = u.subtract(uc[i], mc);
                    BigDecimal da = ac[i].add(slope[i].multiply(d, mc), mc).multiply(d, mc); // a_i d + (a_{i+1}-a_i) d^2/(2h)
                    return etaAt[i].add(da.divide(RefMath.C, mc), mc);
                }

                @Override
                public BigDecimal[] edges() {
                    return e;
                }
            };
        }
    }

    // ------------------------------------------------------------------ the worldline at one precision

    /** The worldline at one working precision: start, panel table of the leg, end. */
    private final class Model {
        final BigDecimal[] origin;
        final BigDecimal[] heading;
        final BigDecimal t0;
        final BigDecimal u0;
        final BigDecimal eta0;
        final BigDecimal cosh0;
        final BigDecimal sinh0;
        final Leg leg;
        final BigDecimal[] edges;
        /** Integrals of cosh eta and sinh eta (s) from the leg start to each panel edge. */
        final BigDecimal[] cumT;
        final BigDecimal[] cumS;
        final BigDecimal[] coshAtEdge;
        final BigDecimal length;
        final BigDecimal t1;
        final BigDecimal s1;
        final BigDecimal eta1;
        final BigDecimal cosh1;
        final BigDecimal sinh1;
        final RefProfiledQuadrature.Integrand coshSinh;

        Model() {
            MathContext mc = RefMath.mc();
            BigDecimal[] raw = RefMath.bd(headingIn);
            BigDecimal norm = RefMath.norm(raw);
            if (norm.signum() == 0) {
                throw new IllegalArgumentException("heading must not be the zero vector");
            }
            heading = new BigDecimal[] {raw[0].divide(norm, mc), raw[1].divide(norm, mc), raw[2].divide(norm, mc)};
            origin = RefMath.bd(startPosition);
            t0 = RefMath.bd(startTime);
            u0 = RefMath.bd(startClock);
            BigDecimal beta = RefMath.bd(startSpeed).divide(RefMath.C, mc);
            if (beta.abs().compareTo(BigDecimal.ONE) >= 0) {
                throw new IllegalArgumentException("start speed must be below c");
            }
            eta0 = RefMath.atanh(beta);
            BigDecimal[] cs0 = RefMath.coshSinh(eta0);
            cosh0 = cs0[0];
            sinh0 = cs0[1];
            leg = law.prepare(eta0, t0, nodes, refine);
            coshSinh = x -> RefMath.coshSinh(leg.eta(x));
            edges = leg.edges();
            int n = edges.length;
            cumT = new BigDecimal[n];
            cumS = new BigDecimal[n];
            coshAtEdge = new BigDecimal[n];
            cumT[0] = BigDecimal.ZERO;
            cumS[0] = BigDecimal.ZERO;
            coshAtEdge[0] = cosh0;
            for (int k = 1; k < n; k++) {
                if (edges[k].compareTo(edges[k - 1]) <= 0) {
                    throw new IllegalStateException("panel edges must increase");
                }
                BigDecimal[] q = RefProfiledQuadrature.integrate(coshSinh, edges[k - 1], edges[k], nodes, 2);
                cumT[k] = cumT[k - 1].add(q[0], mc);
                cumS[k] = cumS[k - 1].add(q[1], mc);
                coshAtEdge[k] = RefMath.cosh(leg.eta(edges[k]));
            }
            length = edges[n - 1];
            t1 = t0.add(cumT[n - 1], mc);
            s1 = RefMath.C.multiply(cumS[n - 1], mc);
            eta1 = leg.eta(length);
            BigDecimal[] cs1 = RefMath.coshSinh(eta1);
            cosh1 = cs1[0];
            sinh1 = cs1[1];
        }

        /** Index k of the panel [p_k, p_{k+1}] holding leg clock u (0 &lt; u &lt; length). */
        private int panel(BigDecimal u) {
            int i = Arrays.binarySearch(edges, u);
            if (i < 0) {
                i = -i - 2;
            }
            return Math.max(0, Math.min(edges.length - 2, i));
        }

        /** {t, s, eta} at leg clock u (any real u: coasts before and after the leg). */
        BigDecimal[] atLegClock(BigDecimal u) {
            MathContext mc = RefMath.mc();
            if (u.signum() <= 0) {
                return new BigDecimal[] {t0.add(u.multiply(cosh0, mc), mc), RefMath.C.multiply(u, mc).multiply(sinh0, mc),
                    eta0};
            }
            if (u.compareTo(length) >= 0) {
                BigDecimal du = u.subtract(length, mc);
                return new BigDecimal[] {t1.add(du.multiply(cosh1, mc), mc),
                    s1.add(RefMath.C.multiply(du, mc).multiply(sinh1, mc), mc), eta1};
            }
            int k = panel(u);
            BigDecimal[] q = RefProfiledQuadrature.integrate(coshSinh, edges[k], u, nodes, 2);
            return new BigDecimal[] {t0.add(cumT[k].add(q[0], mc), mc),
                RefMath.C.multiply(cumS[k].add(q[1], mc), mc), leg.eta(u)};
        }

        /** Leg clock u at which the mission time is t (Newton on t(u), bracketed by the panel). */
        BigDecimal legClockAtTime(BigDecimal t) {
            MathContext mc = RefMath.mc();
            BigDecimal tau = t.subtract(t0, mc);
            if (tau.signum() <= 0) {
                return tau.divide(cosh0, mc);
            }
            if (t.compareTo(t1) >= 0) {
                return length.add(t.subtract(t1, mc).divide(cosh1, mc), mc);
            }
            int i = Arrays.binarySearch(cumT, tau);
            if (i >= 0) {
                return edges[i];
            }
            int k = Math.max(0, Math.min(edges.length - 2, -i - 2));
            BigDecimal base = cumT[k];
            BigDecimal lo = edges[k];
            RefRoots.Fn f = u -> {
                BigDecimal q = RefProfiledQuadrature.integrate(coshSinh, lo, u, nodes, 2)[0];
                return new BigDecimal[] {base.add(q, mc).subtract(tau, mc), RefMath.cosh(leg.eta(u))};
            };
            return RefRoots.increasing(f, lo, edges[k + 1], hermiteGuess(k, tau), length);
        }

        /**
         * A starting point for the Newton iteration: the root of the cubic Hermite interpolant of t(u) on panel k
         * (values and slopes cosh eta at both edges), in double precision; it only steers the iteration.
         */
        private BigDecimal hermiteGuess(int k, BigDecimal tau) {
            double h = edges[k + 1].subtract(edges[k]).doubleValue();
            double y0 = cumT[k].doubleValue();
            double y1 = cumT[k + 1].doubleValue();
            double d0 = coshAtEdge[k].doubleValue() * h;
            double d1 = coshAtEdge[k + 1].doubleValue() * h;
            double target = tau.subtract(cumT[k]).doubleValue();
            double dy = y1 - y0;
            // p(x) = d0 x + (3 dy - 2 d0 - d1) x^2 + (d0 + d1 - 2 dy) x^3 on x in [0, 1], p(x) = target
            double c2 = 3 * dy - 2 * d0 - d1;
            double c3 = d0 + d1 - 2 * dy;
            double x = Math.min(1, Math.max(0, target / dy));
            for (int i = 0; i < 8; i++) {
                double p = ((c3 * x + c2) * x + d0) * x - target;
                double dp = (3 * c3 * x + 2 * c2) * x + d0;
                if (!(dp > 0)) {
                    break;
                }
                x = Math.min(1, Math.max(0, x - p / dp));
            }
            BigDecimal guess = edges[k].add(new BigDecimal(x * h), RefMath.mc());
            return guess;
        }

        RefState state(BigDecimal clock, BigDecimal t, BigDecimal s, BigDecimal eta) {
            MathContext mc = RefMath.mc();
            BigDecimal[] r = RefMath.add(origin, RefMath.scale(heading, s));
            BigDecimal[] cs = RefMath.coshSinh(eta);
            BigDecimal v = RefMath.C.multiply(cs[1], mc).divide(cs[0], mc);
            return new RefState(clock, t, r, RefMath.scale(heading, v), cs[0]);
        }
    }
}
