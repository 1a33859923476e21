package org.nullpath.worldline;

import org.hipparchus.analysis.solvers.AllowedSolution;
import org.hipparchus.analysis.solvers.BracketedUnivariateSolver;
import org.hipparchus.analysis.solvers.BracketingNthOrderBrentSolver;
import org.hipparchus.analysis.UnivariateFunction;
import org.hipparchus.exception.MathRuntimeException;
import org.hipparchus.ode.ODEState;
import org.hipparchus.ode.ODEStateAndDerivative;
import org.hipparchus.ode.OrdinaryDifferentialEquation;
import org.hipparchus.ode.events.Action;
import org.hipparchus.ode.events.AdaptableInterval;
import org.hipparchus.ode.events.ODEEventDetector;
import org.hipparchus.ode.events.ODEEventHandler;
import org.hipparchus.ode.nonstiff.DormandPrince853Integrator;
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
 * stops where |eta| reaches {@link StraightLineCraft#MAX_RAPIDITY} (a Hipparchus event), after
 * {@value #MAX_STEPS} accepted steps or {@value #MAX_EVALUATIONS} evaluations of the equations, or where
 * the state stops being finite. The piece then ends there and carries the reason ({@link #cut()}); an end
 * condition met before that point is still honoured, one beyond it is refused with the reason. Tolerance: {@value #RELATIVE_TOLERANCE} relative per step;
 * positions and times meet 1e-10 relative against independent quadrature (tests). Inversions (the
 * proper time at which t, U or V reach a value) are Brent solves on the dense output, all of which
 * increase strictly with u. End conditions on the rapidity or the distance, which may turn, are found
 * by {@link #firstReach} on monotonic stretches of the dense output; a leg ended early keeps the
 * dense output and only moves its end ({@link #endedAt}).
 */
final class IntegratedPiece implements Piece {
    /** Relative tolerance of each integration step. */
    static final double RELATIVE_TOLERANCE = 1e-13;

    private static final double C = Constants.C;
    /**
     * Relative accuracy (in proper time, with an absolute floor of this times the leg's span) to which an
     * end condition is located on the dense output, and to which inversions are solved.
     */
    static final double ROOT_TOLERANCE = 1e-15;

    /** Accepted integration steps one leg may keep (328 bytes each: about 82 MB at most). */
    static final int MAX_STEPS = 250_000;
    /** Evaluations of the equations one leg may spend (accepted and rejected steps). */
    static final long MAX_EVALUATIONS = 20L * MAX_STEPS;
    /** Rapidity beyond which the equations are evaluated as at this rapidity (never reached: the integration stops at the limit). */
    private static final double CLAMP = 709.0;

    static final int ETA = 0;
    static final int T = 1;
    static final int S = 2;
    private static final int U = 3;
    private static final int V = 4;

    /**
     * Proper acceleration as a function of proper time since the leg start and of rapidity. Between two
     * consecutive knots of the integration it may change sign at most once (true of a linear profile
     * and of laws of one sign), so the rapidity has at most one turning point there.
     */
    interface Law {
        double at(double u, double eta);
    }

    private final LineState start;
    private final Law law;
    private final StepStore model;
    private final double uEnd;
    private final double[] knots;
    private final String cut;

    private IntegratedPiece(LineState start, Law law, StepStore model, double uEnd, double[] knots, String cut) {
        this.start = start;
        this.law = law;
        this.model = model;
        this.uEnd = uEnd;
        this.knots = knots;
        this.cut = cut;
    }

    /** Why the integration stopped before the leg's own limit (a sentence for the user), or null when it did not. */
    String cut() {
        return cut;
    }

    /** The same motion ended after proper time {@code du} (at most the integrated span). */
    IntegratedPiece endedAt(double du) {
        if (du == uEnd) {
            return this;
        }
        if (!(du >= 0 && du < uEnd)) {
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
        double[] cuts = k == T ? new double[] {0, uEnd} : monotoneParts(k == S);
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
        for (int i = 0; i + 1 < knots.length && knots[i] < uEnd; i++) {
            double a = knots[i];
            double b = Math.min(knots[i + 1], uEnd);
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
                ROOT_TOLERANCE * Math.max(uEnd, Double.MIN_NORMAL), 0.0, 5);
        return solver.solve(400, f, a, b, AllowedSolution.ANY_SIDE);
    }

    /** Proper time the leg lasts. */
    double duration() {
        return uEnd;
    }

    /** What one integration spends and why it stopped early. */
    private static final class Run {
        final StepStore store = new StepStore(MAX_STEPS);
        long evaluations;
        boolean atRapidityLimit;
    }

    private static OrdinaryDifferentialEquation equations(Law law, Run run) {
        return new OrdinaryDifferentialEquation() {
            @Override
            public int getDimension() {
                return 5;
            }

            @Override
            public double[] computeDerivatives(double u, double[] y) {
                if (++run.evaluations > MAX_EVALUATIONS) {
                    throw new StepStore.Full();
                }
                double eta = Math.max(-CLAMP, Math.min(CLAMP, y[ETA]));
                // Math.sinh, not (e^eta - e^-eta)/2, which cancels to noise at small rapidity
                return new double[] {law.at(u, eta) / C, Math.cosh(eta), Math.sinh(eta), Math.exp(-eta), Math.exp(eta)};
            }
        };
    }

    /** Largest change of rapidity in a first step: the integrator's own first-step estimate overflows (to a step of 0) under extreme accelerations. */
    private static final double FIRST_STEP_RAPIDITY = 1e-3;

    /**
     * The first step from {@code u} at rapidity {@code eta}: the last step kept (0 for none), at most the span,
     * and short enough that the rapidity changes by at most {@value #FIRST_STEP_RAPIDITY}.
     */
    private static double firstStep(Law law, double u, double eta, double span, double last) {
        double h = last > 0 ? Math.min(last, span) : span;
        double rate = Math.abs(law.at(u, eta)) / C;
        return rate * h > FIRST_STEP_RAPIDITY ? FIRST_STEP_RAPIDITY / rate : h;
    }

    private static DormandPrince853Integrator integrator(double span, Run run, double initialStep) {
        // absolute floors far below anything a link planner resolves (1e-20 in rapidity, a picosecond,
        // a nanometre over c), so error control stays relative also early in the leg where the offsets are
        // small, without driving the step size to zero where an offset starts flat
        double nm = 1e-9 / C;
        double[] abs = {1e-20, 1e-12, nm, nm, nm};
        double[] rel = {RELATIVE_TOLERANCE, RELATIVE_TOLERANCE, RELATIVE_TOLERANCE, RELATIVE_TOLERANCE,
                        RELATIVE_TOLERANCE};
        DormandPrince853Integrator integrator = new DormandPrince853Integrator(0.0, span > 0 ? span : 1e-9, abs, rel);
        if (initialStep > 0 && span > 0) {
            integrator.setInitialStepSize(Math.min(initialStep, span));
        }
        integrator.addStepHandler(run.store);
        integrator.addEventDetector(new RapidityLimit(span, run));
        return integrator;
    }

    /** The reason an integration that stopped at {@code u} short of {@code planned} gives, or null when it did not. */
    private static String reason(Run run, double u, double planned, String failure) {
        if (run.atRapidityLimit) {
            return "the leg reaches rapidity " + LegFlight.num(StraightLineCraft.MAX_RAPIDITY) + " (the most nullpath"
                    + " holds: a speed indistinguishable from c) after " + LegFlight.num(u) + " s of craft clock; end it"
                    + " earlier or give it a gentler acceleration";
        }
        if (failure != null) {
            return failure + (failure.endsWith("reached") ? " within " : " after ") + LegFlight.num(u) + " s of craft clock" + (Double.isFinite(planned) ? " (of "
                    + LegFlight.num(planned) + " s)" : "") + "; shorten the leg, smooth its acceleration or weaken it";
        }
        return null;
    }

    private static String budget() {
        return "the leg needs more than " + MAX_STEPS + " integration steps (its acceleration changes too fast or"
                + " lasts too long for the integrator's tolerance)";
    }

    /** Stops the integration where |eta| reaches the rapidity limit. */
    private record RapidityLimit(double span, Run run) implements ODEEventDetector {
        @Override
        public AdaptableInterval getMaxCheckInterval() {
            return AdaptableInterval.of(span > 0 ? span : 1e-9);
        }

        @Override
        public int getMaxIterationCount() {
            return 200;
        }

        @Override
        public BracketedUnivariateSolver<UnivariateFunction> getSolver() {
            return new BracketingNthOrderBrentSolver(1e-15, Double.MIN_NORMAL, 0.0, 5);
        }

        @Override
        public ODEEventHandler getHandler() {
            return (state, detector, increasing) -> {
                run.atRapidityLimit = true;
                return Action.STOP;
            };
        }

        @Override
        public double g(ODEStateAndDerivative state) {
            return StraightLineCraft.MAX_RAPIDITY - Math.abs(state.getPrimaryState()[ETA]);
        }
    }

    /**
     * Integrates from {@code start} through the given knots (ascending proper times from the leg start,
     * the first 0, the last the leg's end), restarting at each knot where the law's derivative may jump.
     */
    static IntegratedPiece throughKnots(LineState start, Law law, double[] knots) {
        Run run = new Run();
        OrdinaryDifferentialEquation ode = equations(law, run);
        double[] y = {start.rapidity(), 0, 0, 0, 0};
        double last = knots[knots.length - 1];
        double reached = 0;
        double h = 0;
        String failure = null;
        try {
            for (int i = 0; i + 1 < knots.length && !run.atRapidityLimit; i++) {
                double a = knots[i];
                double b = knots[i + 1];
                ODEStateAndDerivative end = integrator(b - a, run, firstStep(law, a, y[ETA], b - a, h))
                        .integrate(ode, new ODEState(a, y), b);
                y = end.getPrimaryState();
                reached = end.getTime();
                h = lastStep(run.store);
            }
        } catch (StepStore.Full e) {
            failure = budget();
        } catch (MathRuntimeException e) {
            failure = "the leg cannot be integrated in double precision";
        }
        if (failure != null) {
            reached = run.store.steps() == 0 ? 0 : run.store.end();
        }
        String why = reason(run, reached, last, failure);
        return new IntegratedPiece(start, law, run.store, why == null ? last : reached, knots.clone(), why);
    }

    /** The length of the last step kept, to start the next knot's integration with (0: let the integrator guess). */
    private static double lastStep(StepStore store) {
        return store.steps() == 0 ? 0 : store.lastLength();
    }

    /**
     * Integrates from {@code start} until U - U0 reaches {@code targetU} (a switching function handled
     * by Hipparchus' event detection), extending the span by doubling from {@code guess}; the leg is cut
     * (see the class comment) when that takes more than 2^60 times the guess.
     */
    static IntegratedPiece untilU(LineState start, Law law, double targetU, double guess) {
        Run run = new Run();
        OrdinaryDifferentialEquation ode = equations(law, run);
        double[] y = {start.rapidity(), 0, 0, 0, 0};
        double a = 0;
        double b = Math.max(guess, 1e-6);
        String failure = null;
        try {
            for (int k = 0; k < 60; k++) {
                DormandPrince853Integrator integrator = integrator(b - a, run,
                        firstStep(law, a, y[ETA], b - a, lastStep(run.store)));
                integrator.addEventDetector(new ReachU(targetU / C, b - a));
                ODEStateAndDerivative end = integrator.integrate(ode, new ODEState(a, y), b);
                y = end.getPrimaryState();
                if (run.atRapidityLimit) {
                    break;
                }
                if (y[U] * C >= targetU || end.getTime() < b) {
                    return new IntegratedPiece(start, law, run.store, end.getTime(), new double[] {0, end.getTime()}, null);
                }
                a = b;
                b = 2 * b;
            }
            if (!run.atRapidityLimit) {
                failure = "the leg's own end is not reached";
            }
        } catch (StepStore.Full e) {
            failure = budget();
        } catch (MathRuntimeException e) {
            failure = "the leg cannot be integrated in double precision";
        }
        double reached = run.store.steps() == 0 ? 0 : run.store.end();
        return new IntegratedPiece(start, law, run.store, reached, new double[] {0, reached},
                reason(run, reached, Double.NaN, failure));
    }

    /** The switching function U - U0 - target, which increases strictly along the leg. */
    private record ReachU(double target, double span) implements ODEEventDetector {
        @Override
        public AdaptableInterval getMaxCheckInterval() {
            return AdaptableInterval.of(span);
        }

        @Override
        public int getMaxIterationCount() {
            return 200;
        }

        @Override
        public BracketedUnivariateSolver<UnivariateFunction> getSolver() {
            return new BracketingNthOrderBrentSolver(1e-15, 1e-15 * Math.max(span, Double.MIN_NORMAL), 0.0, 5);
        }

        @Override
        public ODEEventHandler getHandler() {
            return (state, detector, increasing) -> Action.STOP;
        }

        @Override
        public double g(ODEStateAndDerivative state) {
            return state.getPrimaryState()[U] - target;
        }
    }

    private double[] y(double u) {
        if (u <= 0) {
            return new double[] {start.rapidity(), 0, 0, 0, 0};
        }
        if (model.steps() == 0) {
            return new double[] {start.rapidity(), 0, 0, 0, 0};
        }
        double[] y = model.at(Math.min(u, uEnd));
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
        double hi = amount >= 0 ? uEnd : u0;
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
        BracketingNthOrderBrentSolver solver = new BracketingNthOrderBrentSolver(ROOT_TOLERANCE, ROOT_TOLERANCE * Math.max(uEnd, Double.MIN_NORMAL),
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
