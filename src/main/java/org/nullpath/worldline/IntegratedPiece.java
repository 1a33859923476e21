package org.nullpath.worldline;

import org.hipparchus.analysis.solvers.AllowedSolution;
import org.hipparchus.analysis.solvers.BracketingNthOrderBrentSolver;
import org.hipparchus.analysis.UnivariateFunction;
import org.nullpath.units.Constants;

/**
 * A leg whose proper acceleration varies (constant thrust, beam-pushed sail, tabulated profile),
 * integrated in proper time u from the leg start with Hipparchus' Dormand–Prince 8(5,3) integrator
 * and kept as dense output ({@link StepStore}) so that any point of the leg can be queried.
 *
 * <p>The state is {@code [eta, t - t0, (s - s0)/c, (U - U0)/c, (V - V0)/c]} with U = c t - s, V = c t + s:
 * <pre>
 *   d eta/du = a(u, eta) / c,  dt/du = cosh eta,  d(s/c)/du = sinh eta,  d(U/c)/du = e^-eta,  d(V/c)/du = e^eta
 * </pre>
 * Integrating the null coordinates directly (rather than forming c t -+ s afterwards) keeps them
 * free of cancellation at high rapidity; dividing the lengths by c keeps every derivative finite up to
 * rapidity 709 (c e^eta would overflow from rapidity 690, below {@link StraightLineCraft#MAX_RAPIDITY}).
 *
 * <p>Bounds (so that hostile or extreme legs end within seconds and a bounded heap): the integration
 * stops where |eta| reaches {@link StraightLineCraft#MAX_RAPIDITY} (a Hipparchus event), when the
 * step or evaluation budget of LegIntegration is spent, or where the state stops being finite. The
 * piece then ends there and carries the reason ({@link #cut()}); an end condition met before that point
 * is still honoured, one beyond it is refused with the reason.
 *
 * <p>Tolerance: {@value #RELATIVE_TOLERANCE} relative per step;
 * positions and times meet 1e-10 relative against independent quadrature (tests). Inversions (the
 * proper time at which t, U or V reach a value) are Brent solves on the dense output, all of which
 * increase strictly with u. End conditions on the rapidity or the distance, which may turn, are found
 * by {@link #firstReach} on monotonic stretches of the dense output; a leg ended early keeps the
 * dense output and only moves its end ({@link #endedAt}).
 *
 * @param start    the state at the leg start
 * @param law      the proper acceleration the leg integrates
 * @param model    the dense output of the integration
 * @param duration proper time the leg lasts (at most the integrated span)
 * @param knots    the proper times where the law may change its form, from 0
 * @param cut      why the integration stopped before the leg's own limit (a sentence for the user), or null when
 *                 it did not
 */
record IntegratedPiece(LineState start, Law law, StepStore model, double duration, double[] knots, String cut)
        implements Piece {
    /** Relative tolerance of each integration step. */
    static final double RELATIVE_TOLERANCE = 1e-13;

    private static final double C = Constants.C;
    /**
     * Relative accuracy (in proper time, with an absolute floor of this times the leg's span) to which an
     * end condition is located on the dense output, and to which inversions are solved.
     */
    static final double ROOT_TOLERANCE = 1e-15;


    static final int ETA = 0;
    static final int T = 1;
    static final int S = 2;
    static final int U = 3;
    static final int V = 4;

    /**
     * Proper acceleration as a function of proper time since the leg start and of rapidity. Between two
     * consecutive knots of the integration it may change sign at most once (true of a linear profile
     * and of laws of one sign), so the rapidity has at most one turning point there.
     */
    interface Law {
        double at(double u, double eta);
    }

    /** The same motion ended after proper time {@code du} (at most the integrated span). */
    IntegratedPiece endedAt(double du) {
        if (du == duration) {
            return this;
        }
        if (!(du >= 0 && du < duration)) {
            throw new IllegalArgumentException("a leg can only end inside its integrated span");
        }
        return new IntegratedPiece(start, law, model, du, knots, cut);
    }

    /**
     * The first proper time in [0, end of the leg] at which component {@code k} of the state
     * ({@link #ETA} absolute rapidity, {@link #T} or {@link #S} offset from the leg start) equals
     * {@code target}; NaN when it never does. The leg is cut where the component may turn (for the
     * rapidity, at the knots and where the acceleration changes sign; for the distance, also where the
     * rapidity crosses zero; mission time only grows), so each part is monotonic and the first part
     * whose ends bracket the target holds the first crossing, solved by Brent to
     * {@link #ROOT_TOLERANCE}.
     */
    double firstReach(int k, double target) {
        double[] cuts = k == T ? new double[] {0, duration} : monotoneParts(k == S);
        for (int i = 0; i + 1 < cuts.length; i++) {
            double a = cuts[i];
            double b = cuts[i + 1];
            double fa = y(a)[k] - target;
            double fb = y(b)[k] - target;
            if (fa == 0) {
                return a;
            }
            if (Math.signum(fa) != Math.signum(fb)) {
                return fb == 0 ? b : solve(x -> y(x)[k] - target, a, b);
            }
        }
        return Double.NaN;
    }

    /** Cuts from 0 to the leg end between which the rapidity (or, with {@code distance}, the distance) is monotonic. */
    private double[] monotoneParts(boolean distance) {
        java.util.List<Double> cuts = new java.util.ArrayList<>();
        cuts.add(0.0);
        for (int i = 0; i + 1 < knots.length && knots[i] < duration; i++) {
            double a = knots[i];
            double b = Math.min(knots[i + 1], duration);
            UnivariateFunction acc = x -> law.at(x, y(x)[ETA]);
            double turn = signChange(acc, a, b);
            double[] parts = Double.isNaN(turn) ? new double[] {a, b} : new double[] {a, turn, b};
            for (int j = 0; j + 1 < parts.length; j++) {
                if (distance) {
                    double stop = signChange(x -> y(x)[ETA], parts[j], parts[j + 1]);
                    if (!Double.isNaN(stop)) {
                        cuts.add(stop);
                    }
                }
                cuts.add(parts[j + 1]);
            }
        }
        return cuts.stream().mapToDouble(Double::doubleValue).toArray();
    }

    /** Where {@code f} changes sign strictly inside [a, b] (it changes at most once there), or NaN. */
    private double signChange(UnivariateFunction f, double a, double b) {
        double fa = f.value(a);
        double fb = f.value(b);
        if (fa == 0 || fb == 0 || Math.signum(fa) == Math.signum(fb)) {
            return Double.NaN;
        }
        return solve(f, a, b);
    }

    private double solve(UnivariateFunction f, double a, double b) {
        BracketingNthOrderBrentSolver solver = new BracketingNthOrderBrentSolver(ROOT_TOLERANCE,
                ROOT_TOLERANCE * Math.max(duration, Double.MIN_NORMAL), 0.0, 5);
        return solver.solve(400, f, a, b, AllowedSolution.ANY_SIDE);
    }

    private double[] y(double u) {
        if (u <= 0) {
            return new double[] {start.rapidity(), 0, 0, 0, 0};
        }
        if (model.steps() == 0) {
            return new double[] {start.rapidity(), 0, 0, 0, 0};
        }
        double[] y = model.at(Math.min(u, duration));
        y[S] *= C;
        y[U] *= C;
        y[V] *= C;
        return y;
    }

    private double local(LineState cur) {
        return cur.local();
    }

    private double offset(LineState cur, double du, int k) {
        double u = local(cur);
        return y(u + du)[k] - y(u)[k];
    }

    private double invert(LineState cur, double amount, int k) {
        double u0 = local(cur);
        double target = y(u0)[k] + amount;
        double lo = amount >= 0 ? u0 : 0;
        double hi = amount >= 0 ? duration : u0;
        double fLo = y(lo)[k] - target;
        double fHi = y(hi)[k] - target;
        if (fLo > 0 || fHi < 0) {
            return Double.NaN;
        }
        if (fLo == 0) {
            return lo - u0;
        }
        if (fHi == 0) {
            return hi - u0;
        }
        BracketingNthOrderBrentSolver solver = new BracketingNthOrderBrentSolver(ROOT_TOLERANCE, ROOT_TOLERANCE * Math.max(duration, Double.MIN_NORMAL),
                0.0, 5);
        double u = solver.solve(400, x -> y(x)[k] - target, lo, hi, AllowedSolution.ANY_SIDE);
        return u - u0;
    }

    @Override
    public double acceleration(LineState cur) {
        return law.at(local(cur), cur.rapidity());
    }

    @Override
    public double constantAcceleration() {
        return Double.NaN;
    }

    /**
     * Exact for every law nullpath integrates: between knots the acceleration is linear in the leg clock (a
     * profile) or monotone (constant thrust: |F| / m(u) grows; a sail: D^2 falls as the rapidity grows), so its
     * extremes lie at the knots and the ends.
     */
    @Override
    public AccelerationRange accelerationRange(LineState lo, double du) {
        double u0 = local(lo);
        double u1 = u0 + du;
        double first = law.at(u0, y(u0)[ETA]);
        double last = law.at(u1, y(u1)[ETA]);
        double largest = Math.abs(last) > Math.abs(first) ? last : first;
        for (double k : knots) {
            if (k > u0 && k < u1) {
                double a = law.at(k, y(k)[ETA]);
                largest = Math.abs(a) > Math.abs(largest) ? a : largest;
            }
        }
        return new AccelerationRange(first, last, largest);
    }

    @Override
    public double rapidityAfter(LineState cur, double du) {
        return y(local(cur) + du)[ETA];
    }

    @Override
    public double offset(Measure m, LineState cur, double du) {
        return m == Measure.CLOCK ? du : offset(cur, du, column(m));
    }

    @Override
    public double properTimeFor(Measure m, LineState cur, double amount) {
        if (m == Measure.DISTANCE) {
            throw new UnsupportedOperationException("distance along a profiled leg may turn back");
        }
        return m == Measure.CLOCK ? amount : invert(cur, amount, column(m));
    }

    /** The integrated state's column of a measure other than the clock. */
    private static int column(Measure m) {
        return switch (m) {
            case TIME -> T;
            case DISTANCE -> S;
            case U -> U;
            case V -> V;
            case CLOCK -> throw new IllegalArgumentException("the clock is the integration variable");
        };
    }
}
