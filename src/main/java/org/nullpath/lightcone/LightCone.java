package org.nullpath.lightcone;

import java.util.Optional;
import java.util.function.DoubleUnaryOperator;

import org.hipparchus.analysis.solvers.AllowedSolution;
import org.hipparchus.analysis.solvers.BracketingNthOrderBrentSolver;
import org.nullpath.spacetime.Vec3;
import org.nullpath.units.Constants;
import org.nullpath.worldline.Asymptote;
import org.nullpath.worldline.InertialWorldline;
import org.nullpath.worldline.LineState;
import org.nullpath.worldline.State;
import org.nullpath.worldline.Step;
import org.nullpath.worldline.StraightLineCraft;
import org.nullpath.worldline.Worldline;

/**
 * Where light cones meet worldlines.
 *
 * <p><b>Uniqueness.</b> For the future cone of an event (t_e, r_e) and a timelike worldline r(t), the
 * function {@code F(T) = c T - |r(t_e + T) - r_e|} has derivative at least {@code c (1 - beta) > 0}, so
 * it has at most one root; it has one unless the worldline runs away behind a horizon, which is decided
 * exactly by the worldline's {@link Asymptote} before any solving. The past cone is the mirror image.
 *
 * <p><b>Methods.</b> The unknown is always the light time T itself, measured from the known event, so
 * it keeps its own relative precision far into a mission:
 * <ul>
 *   <li>an inertial partner: the quadratic {@code |d0 + v T| = c T} in a cancellation-free form;</li>
 *   <li>a straight-line craft with the other event on its flight line: closed forms in the null
 *   coordinates {@code c t -+ s}, walked leg by leg ({@link StraightLineCraft#walkU});</li>
 *   <li>a straight-line craft with the other event off its flight line: A B = rho^2 in null-coordinate
 *   offsets, solved in the craft's proper time by Newton's method on ln(A / rho) + ln(B / rho) inside a
 *   bracket ({@code offLineRoot}, see {@code futureOffLine});</li>
 *   <li>any other {@link Worldline} implementation (none ships today): a bracketed Brent solver on F(T),
 *   to a relative accuracy of {@value #RELATIVE_ACCURACY} in T.</li>
 * </ul>
 * Accuracy: within a few times {@link Conditioning#ofLightTime} x 1.1e-16 relative, which meets the
 * product's 1e-12 target wherever the light time is well conditioned (tests against 50- to 100-digit
 * references).
 */
public final class LightCone {
    /** Relative tolerance on the light time for the bracketed solve. */
    public static final double RELATIVE_ACCURACY = 1e-15;
    /** A direction within this angle (rad) of a flight line is taken as on it: doubles cannot resolve less. */
    public static final double ON_LINE_ANGLE = 1e-14;

    private static final double C = Constants.C;
    private static final int MAX_EVALUATIONS = 400;

    private LightCone() {
    }

    /** The future light cone of {@code send} (a state of the sender) against {@code receiver}. */
    public static SignalPath future(State send, Worldline receiver) {
        if (receiver instanceof InertialWorldline station) {
            State at = station.atTime(send.timeSeconds());
            Vec3 d0 = at.position().minus(send.position());
            double t = inertialLightTime(d0, station.velocity());
            Step step = station.advance(at, t);
            return new SignalPath(send, step.end(), t, d0.plus(step.displacement()), false);
        }
        Optional<Asymptote> asymptote = receiver.asymptote();
        if (asymptote.isPresent()
                && !(asymptote.get().nullCoordinate(send.timeSeconds(), send.position()) < asymptote.get().limitMetres())) {
            return SignalPath.never(send);
        }
        if (receiver instanceof StraightLineCraft craft) {
            return onLine(craft, send.position()) ? futureOnLine(send, craft) : futureOffLine(send, craft);
        }
        State at = receiver.atTime(send.timeSeconds());
        Vec3 d0 = at.position().minus(send.position());
        DoubleUnaryOperator f = tt -> C * tt - d0.plus(receiver.advance(at, tt).displacement()).norm();
        double t = solveIncreasing(f, d0.norm() / C);
        Step step = receiver.advance(at, t);
        return new SignalPath(send, step.end(), t, d0.plus(step.displacement()), false);
    }

    /** The past light cone of {@code receive} (a state of the receiver) against {@code sender}: the emission. */
    public static SignalPath past(State receive, Worldline sender) {
        if (sender instanceof InertialWorldline station) {
            State at = station.atTime(receive.timeSeconds());
            Vec3 d0 = receive.position().minus(at.position());
            double t = inertialLightTime(d0, station.velocity());
            Step step = station.advance(at, -t);
            return new SignalPath(step.end(), receive, t, d0.minus(step.displacement()), false);
        }
        if (sender instanceof StraightLineCraft craft) {
            return onLine(craft, receive.position()) ? pastOnLine(receive, craft) : pastOffLine(receive, craft);
        }
        State at = sender.atTime(receive.timeSeconds());
        Vec3 d0 = receive.position().minus(at.position());
        DoubleUnaryOperator f = tt -> C * tt - d0.minus(sender.advance(at, -tt).displacement()).norm();
        double t = solveIncreasing(f, d0.norm() / C);
        Step step = sender.advance(at, -t);
        return new SignalPath(step.end(), receive, t, d0.minus(step.displacement()), false);
    }

    /**
     * The horizon of signals from {@code sender} to {@code receiver}: the supremum of send events that
     * still arrive. Only a receiver running away on an open-ended burn has one.
     */
    public static Horizon horizon(Worldline sender, Worldline receiver) {
        Optional<Asymptote> ra = receiver.asymptote();
        if (ra.isEmpty()) {
            return Horizon.none();
        }
        Asymptote a = ra.get();
        Optional<Asymptote> sa = sender.asymptote();
        if (sa.isPresent() && sa.get().direction().equals(a.direction())
                && sa.get().limitMetres() <= a.limitMetres()) {
            // the sender's own null coordinate never exceeds the receiver's limit: every send arrives
            return Horizon.none();
        }
        if (sender instanceof InertialWorldline station) {
            Vec3 k = a.direction();
            double t = (a.limitMetres() + k.dot(station.positionAtZero())) / (C - k.dot(station.velocity()));
            return new Horizon(true, firstNever(sender, a, t));
        }
        // c t - k.r increases strictly along a timelike worldline (by at least gamma c (1 - beta) per unit clock)
        State ref = sender.atTime(0);
        double g0 = a.nullCoordinate(ref.timeSeconds(), ref.position()) - a.limitMetres();
        DoubleUnaryOperator g = dt -> {
            Step s = sender.advance(ref, dt);
            return g0 + C * dt - a.direction().dot(s.displacement());
        };
        double dt = solveSigned(g, Math.max(1.0, Math.abs(g0) / C));
        return new Horizon(true, firstNever(sender, a, ref.timeSeconds() + dt));
    }

    /**
     * The send state at {@code t}, moved up by the few ulps needed so that the future-cone test itself
     * classes it as never arriving: the reported supremum is then consistent with every message row
     * (a send at or after it never arrives).
     */
    private static State firstNever(Worldline sender, Asymptote a, double t) {
        State s = sender.atTime(t);
        for (int i = 0; i < 64; i++) {
            double deficit = a.limitMetres() - a.nullCoordinate(s.timeSeconds(), s.position());
            if (!(deficit > 0)) {
                break;
            }
            // c t - k . r grows at c - k . v along the sender: step by the deficit at that rate, at least an ulp
            double rate = C - a.direction().dot(s.velocity());
            t = Math.max(Math.nextUp(t), t + deficit / rate);
            s = sender.atTime(t);
        }
        return s;
    }

    /** True when {@code position} lies on the craft's flight line to within {@link #ON_LINE_ANGLE}. */
    static boolean onLine(StraightLineCraft craft, Vec3 position) {
        Vec3 perpendicular = craft.perpendicularOf(position);
        if (perpendicular.isZero()) {
            return true;
        }
        double scale = position.minus(craft.origin()).norm();
        return perpendicular.norm() <= ON_LINE_ANGLE * scale;
    }

    private static SignalPath futureOnLine(State send, StraightLineCraft craft) {
        double b = craft.alongOf(send.position());
        LineState at = craft.lineAtTime(send.timeSeconds());
        double gap = at.along() - b;
        // +1: the craft is ahead of the send along its heading, the photon follows it (walk in U); -1: behind (V)
        double sign = Math.signum(gap);
        if (sign == 0) {
            return new SignalPath(send, craft.toState(at), 0.0, Vec3.ZERO, true);
        }
        StraightLineCraft.LineWalk w = sign == 1 ? craft.walkU(at, gap) : craft.walkV(at, -gap);
        if (w.never()) {
            return SignalPath.never(send);
        }
        // photon displacement: (along_rx - b) heading, with along_rx - b = gap + dAlong; its length is c T
        Vec3 path = craft.heading().times(sign * C * w.dt());
        return new SignalPath(send, craft.toState(w.end()), w.dt(), path, true);
    }

    private static SignalPath pastOnLine(State receive, StraightLineCraft craft) {
        double b = craft.alongOf(receive.position());
        LineState at = craft.lineAtTime(receive.timeSeconds());
        double gap = b - at.along();
        StraightLineCraft.LineWalk w;
        double sign;
        if (gap > 0) {
            w = craft.walkU(at, -gap);
            sign = 1;
        } else if (gap < 0) {
            w = craft.walkV(at, gap);
            sign = -1;
        } else {
            return new SignalPath(craft.toState(at), receive, 0.0, Vec3.ZERO, true);
        }
        double t = -w.dt();
        return new SignalPath(craft.toState(w.end()), receive, t, craft.heading().times(sign * C * t), true);
    }

    /**
     * A craft receiver off its flight line, emitter at along-track b and distance rho from the line. With
     * A = c dt - dz and B = c dt + dz (dz the craft's along-track distance from b, dt the light time), the
     * cone condition c^2 dt^2 = dz^2 + rho^2 reads A B = rho^2. A and B are null-coordinate offsets that
     * the craft's pieces give without cancellation, so h(du) = A B - rho^2 is evaluated to a few ulps of
     * rho^2 even for a craft fleeing at high gamma (where c T - |dr| loses 2 gamma^2 of precision). h is
     * negative while A or B is not positive and increases strictly once both are, so its root in the
     * craft's proper time du is unique; {@link #offLineRoot} finds it to {@value #RELATIVE_ACCURACY} relative.
     */
    private static SignalPath futureOffLine(State send, StraightLineCraft craft) {
        double b = craft.alongOf(send.position());
        Vec3 perpendicular = craft.perpendicularOf(send.position());
        LineState at = craft.lineAtTime(send.timeSeconds());
        double a0 = b - at.along();
        State there = craft.toState(at);
        // first guess: the light time to the craft were it to keep its present velocity, on its clock
        double guess = inertialLightTime(there.position().minus(send.position()), there.velocity()) / there.gamma();
        // forward on the craft's clock the search may not pass the last reading its state can be held at
        StraightLineCraft.LineWalk w = offLineRoot(du -> craft.walkClockNulls(at, du), du -> craft.walkClock(at, du), a0, 1,
                perpendicular.norm(), guess, craft.maxClock() - at.clock());
        double dz = 0.5 * (w.dV() - w.dU()) - a0;
        Vec3 path = craft.heading().times(dz).minus(perpendicular);
        return new SignalPath(send, craft.toState(w.end()), w.dt(), path, false);
    }

    /** The mirror image of {@link #futureOffLine}: the emission on a craft off whose line the reception lies. */
    private static SignalPath pastOffLine(State receive, StraightLineCraft craft) {
        double b = craft.alongOf(receive.position());
        Vec3 perpendicular = craft.perpendicularOf(receive.position());
        LineState at = craft.lineAtTime(receive.timeSeconds());
        double a0 = at.along() - b;
        State there = craft.toState(at);
        double guess = inertialLightTime(there.position().minus(receive.position()), there.velocity().times(-1))
                / there.gamma();
        StraightLineCraft.LineWalk w = offLineRoot(du -> craft.walkClockNulls(at, -du), du -> craft.walkClock(at, -du), a0,
                -1, perpendicular.norm(), guess, Double.POSITIVE_INFINITY);
        // photon displacement: receive minus emit = (b - along_emit) heading + perpendicular
        double dzEmit = a0 + 0.5 * (w.dV() - w.dU()); // along_emit - b
        Vec3 path = perpendicular.minus(craft.heading().times(dzEmit));
        return new SignalPath(craft.toState(w.end()), receive, -w.dt(), path, false);
    }

    /**
     * The craft-clock step du > 0 at which the cone condition A B = rho^2 holds, with A = a0 + s dU and
     * B = -a0 + s dV from {@code walk} (s = +1 walking forward, -1 backward). At du = 0 one of A, B is not
     * positive; both grow with du (dU/dtau = c e^-eta, dV/dtau = c e^eta along any worldline of rapidity eta), so
     * the root is unique and lies where both are positive. There Newton's method runs on
     * g(du) = ln(A / rho) + ln(B / rho), nearly linear in du however fast the craft moves (A B itself grows like
     * e^(2 eta)), with g' = c (e^-eta / A + e^eta / B); a step that would leave the bracket found so far is
     * replaced by bisection, or by doubling while no upper end is known. Starting from the craft's inertial
     * light time, a few steps meet {@value #RELATIVE_ACCURACY} relative in du.
     */
    static StraightLineCraft.LineWalk offLineRoot(java.util.function.DoubleFunction<StraightLineCraft.LineWalk> walk,
                                                          double a0, double s, double rho, double guess) {
        return offLineRoot(walk, walk, a0, s, rho, guess, Double.POSITIVE_INFINITY);
    }

    /**
     * {@link #offLineRoot(java.util.function.DoubleFunction, double, double, double, double)} with the Newton steps
     * taken by {@code probe}, which need give only dU, dV and the end rapidity (as {@code walk} gives them, bit for
     * bit); the walk returned is {@code walk}'s, whole. No step is tried beyond {@code maxStep}, past which the
     * craft's state cannot be held in doubles (an open-ended burn beyond {@link StraightLineCraft#MAX_RAPIDITY}):
     * while no upper end is known, a step beyond it is cut to it, and a root beyond it is an ArithmeticException.
     */
    static StraightLineCraft.LineWalk offLineRoot(java.util.function.DoubleFunction<StraightLineCraft.LineWalk> probe,
                                                  java.util.function.DoubleFunction<StraightLineCraft.LineWalk> walk,
                                                  double a0, double s, double rho, double guess, double maxStep) {
        // the last 1e-12 of the range is kept clear, so that rounding in a walk cannot carry a step's rapidity over
        double top = maxStep * (1 - 1e-12);
        double lo = 0;
        double hi = Double.POSITIVE_INFINITY;
        double x = Math.min(guess > 0 && Double.isFinite(guess) ? guess : 1.0, top);
        double lastStep = Double.NaN;
        for (int i = 0; i < MAX_EVALUATIONS; i++) {
            StraightLineCraft.LineWalk w = probe.apply(x);
            double a = (a0 + s * w.dU()) / rho;
            double b = (-a0 + s * w.dV()) / rho;
            double next = Double.NaN;
            if (a > 0 && b > 0) {
                double g = Math.log(a) + Math.log(b);
                if (g == 0) {
                    return walk.apply(x);
                }
                if (g > 0) {
                    hi = x;
                } else {
                    lo = x;
                }
                double eta = w.end().rapidity();
                double step = g / (C / rho * (Math.exp(-eta) / a + Math.exp(eta) / b));
                next = x - step;
                // converged: this step is below the tolerance, or Newton's quadratic convergence, seen in the
                // last two steps (error of next ~ step^3 / lastStep^2), puts next within a tenth of it. That
                // estimate holds only once the steps are in the quadratic regime: the last step must itself
                // have been small (at most 1e-3 of du), not the first jump from a poor guess.
                double size = Math.abs(step);
                if (size <= RELATIVE_ACCURACY * x || size < Math.abs(lastStep) && Math.abs(lastStep) <= 1e-3 * x
                        && size * size * size <= 0.1 * RELATIVE_ACCURACY * x * lastStep * lastStep) {
                    return walk.apply(Math.min(Math.max(next, lo), hi));
                }
                lastStep = step;
            } else {
                lo = x;
                lastStep = Double.NaN;
            }
            if (!(next > lo && next < hi && next <= top)) {
                if (hi < Double.POSITIVE_INFINITY) {
                    next = 0.5 * (lo + hi);
                } else if (x < top) {
                    next = Math.min(2 * x, top);
                } else {
                    throw new ArithmeticException("light-cone solve: the signal would reach the craft only where its"
                            + " state is beyond what double precision can hold (rapidity "
                            + StraightLineCraft.MAX_RAPIDITY + ")");
                }
                lastStep = Double.NaN;
            }
            if (hi < Double.POSITIVE_INFINITY && hi - lo <= RELATIVE_ACCURACY * hi) {
                return walk.apply(next);
            }
            x = next;
        }
        throw new ArithmeticException("light-cone solve: no root found");
    }

    /**
     * The root T >= 0 of |d0 + v T| = c T, |v| < c:
     * (c^2 - v^2) T^2 - 2 (d0.v) T - |d0|^2 = 0, taking the positive root in the form that does not cancel.
     */
    static double inertialLightTime(Vec3 d0, Vec3 v) {
        double distance = d0.norm();
        if (distance == 0) {
            return 0;
        }
        // scaled to the unit direction, so distances far beyond 1e146 m do not overflow the squares
        Vec3 u = d0.times(1 / distance);
        double beta = v.norm() / C;
        double a = C * C * (1 - beta) * (1 + beta);
        double bHalf = u.dot(v);
        double disc = Math.sqrt(bHalf * bHalf + a);
        return distance * (bHalf >= 0 ? (bHalf + disc) / a : 1 / (disc - bHalf));
    }

    /** Root of an increasing function with f(0) <= 0, bracketed by doubling from {@code guess}. */
    private static double solveIncreasing(DoubleUnaryOperator f, double guess) {
        double f0 = f.applyAsDouble(0);
        if (f0 >= 0) {
            return 0;
        }
        double hi = guess > 0 ? guess : 1.0;
        int doublings = 0;
        while (f.applyAsDouble(hi) < 0) {
            hi = doubled(hi, ++doublings, "light-cone solve: no bracket found (signal never arrives?)");
        }
        double half = hi / 2;
        return brent(f, half > 0 && f.applyAsDouble(half) < 0 ? half : 0, hi);
    }

    /** Root of an increasing function of any sign at 0, bracketed by doubling on the side it lies. */
    private static double solveSigned(DoubleUnaryOperator g, double step) {
        double g0 = g.applyAsDouble(0);
        if (g0 == 0) {
            return 0;
        }
        double dir = g0 < 0 ? 1 : -1;
        double span = step;
        int doublings = 0;
        while (Math.signum(g.applyAsDouble(dir * span)) == Math.signum(g0)) {
            span = doubled(span, ++doublings, "horizon solve: no bracket found");
        }
        // the root lies between the last two points tried: dir span and the one before it (0 when none)
        double before = doublings == 0 ? 0 : dir * span / 2;
        return brent(g, Math.min(before, dir * span), Math.max(before, dir * span));
    }

    /** {@code x} doubled, for the {@code doublings}-th time of a bracket search; past 2000 or infinity it fails. */
    private static double doubled(double x, int doublings, String failure) {
        double twice = x * 2;
        if (doublings > 2000 || !Double.isFinite(twice)) {
            throw new ArithmeticException(failure);
        }
        return twice;
    }

    private static double brent(DoubleUnaryOperator f, double lo, double hi) {
        BracketingNthOrderBrentSolver solver =
                new BracketingNthOrderBrentSolver(RELATIVE_ACCURACY, Double.MIN_NORMAL, 0.0, 5);
        return solver.solve(MAX_EVALUATIONS, f::applyAsDouble, lo, hi, AllowedSolution.ANY_SIDE);
    }
}
