package org.nullpath.worldline;

import org.hipparchus.analysis.UnivariateFunction;
import org.hipparchus.analysis.solvers.BracketedUnivariateSolver;
import org.hipparchus.analysis.solvers.BracketingNthOrderBrentSolver;
import org.hipparchus.exception.MathRuntimeException;
import org.hipparchus.ode.ODEState;
import org.hipparchus.ode.ODEStateAndDerivative;
import org.hipparchus.ode.OrdinaryDifferentialEquation;
import org.hipparchus.ode.events.Action;
import org.hipparchus.ode.events.AdaptableInterval;
import org.hipparchus.ode.events.ODEEventDetector;
import org.hipparchus.ode.events.ODEEventHandler;
import org.hipparchus.ode.nonstiff.DormandPrince853Integrator;
import org.nullpath.spacetime.Elementary;
import org.nullpath.units.Constants;
import org.nullpath.worldline.IntegratedPiece.Law;

import static org.nullpath.worldline.IntegratedPiece.ETA;
import static org.nullpath.worldline.IntegratedPiece.RELATIVE_TOLERANCE;
import static org.nullpath.worldline.IntegratedPiece.U;

/**
 * Integrates an {@link IntegratedPiece} (equations and bounds in its class comment) with Hipparchus'
 * Dormand–Prince 8(5,3) integrator, within the bounds that keep a hostile or extreme leg to seconds and a
 * bounded heap: a rapidity-limit event, {@value #MAX_STEPS} accepted steps kept in a {@link StepStore},
 * {@value #MAX_EVALUATIONS} evaluations of the equations, and a first step chosen from the acceleration.
 */
final class LegIntegration {
    private static final double C = Constants.C;
    /** Accepted integration steps one leg may keep (328 bytes each: about 82 MB at most). */
    static final int MAX_STEPS = 250_000;
    /** Evaluations of the equations one leg may spend (accepted and rejected steps). */
    static final long MAX_EVALUATIONS = 20L * MAX_STEPS;
    /** Rapidity beyond which the equations are evaluated as at this rapidity (never reached: the integration stops at the limit). */
    private static final double CLAMP = 709.0;

    private LegIntegration() {
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
                return new double[] {law.at(u, eta) / C, Elementary.cosh(eta), Elementary.sinh(eta), Math.exp(-eta),
                    Math.exp(eta)};
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
}
