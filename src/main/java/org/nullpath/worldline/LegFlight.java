package org.nullpath.worldline;

import org.nullpath.spacetime.Elementary;
import org.nullpath.spacetime.Hyperbolic;
import org.nullpath.units.Constants;

/**
 * A leg flown from its start state up to its own physical limit (propellant spent, beam-off front,
 * last profile sample; none for burns and coasts), asked for the proper time at which an end condition
 * is met. This is where an end condition meets a kind of leg, the way an event detector meets an
 * integrator: a closed form on a leg at constant acceleration, a bracketed root search on the dense
 * output of an integrated leg.
 *
 * <p>Rule: an end condition that is not met before the leg's own limit is refused with a
 * {@link WorldlineException} about the end condition ({@link WorldlineException#aboutEnd()}) that
 * names the key, as is one that can never be met (a speed or distance the wrong way); a leg is never
 * silently cut short or stretched. A closed-form end within {@value #LIMIT_SLACK} (relative) beyond
 * the limit counts as the limit, so an end written as exactly the limit is not refused for a rounding.
 */
public abstract sealed class LegFlight permits LegFlight.ClosedForm, LegFlight.Integrated {
    /** Relative slack for a closed-form end lying just beyond the leg's own limit. */
    static final double LIMIT_SLACK = 1e-12;

    private static final double C = Constants.C;

    final LegStart start;
    final double limit;
    final String limitName;

    private LegFlight(LegStart start, double limit, String limitName) {
        this.start = start;
        this.limit = limit;
        this.limitName = limitName;
    }

    /** A leg at constant proper acceleration {@code a} whose own physics ends it after proper time {@code limit} (+infinity: never). */
    static LegFlight closedForm(LegStart start, double a, double limit, String limitName) {
        return new ClosedForm(start, a, limit, limitName);
    }

    /** An integrated leg; its own limit is the end of the integration. */
    static LegFlight integrated(LegStart start, IntegratedPiece piece, String limitName) {
        return new Integrated(start, piece, limitName);
    }

    /** Proper time of the leg's own limit from its start, +infinity when it has none. */
    public double limit() {
        return limit;
    }

    /** The motion of the leg ended after proper time {@code du} (+infinity for an open-ended leg). */
    abstract Piece piece(double du);

    /** Proper time after {@code seconds} of craft clock. */
    public abstract double afterClock(double seconds);

    /** Proper time after {@code seconds} of mission time. */
    public abstract double afterMission(double seconds);

    /** Proper time at which the speed, signed along the heading, reaches {@code metresPerSecond}. */
    public abstract double untilSpeed(double metresPerSecond);

    /** Proper time at which the displacement along the heading during the leg first reaches {@code metres}. */
    public abstract double untilDistance(double metres);

    /** Proper time of the leg's own limit. */
    public double atLimit() {
        if (limit == Double.POSITIVE_INFINITY) {
            throw refusal("the leg has no end of its own (no beam to switch off, no propellant to spend); give it"
                    + " a duration");
        }
        return limit;
    }

    /** +infinity, for a leg that may last for ever. */
    public double forever() {
        if (limit != Double.POSITIVE_INFINITY) {
            throw refusal("the leg cannot last for ever: it ends when " + limitName);
        }
        return Double.POSITIVE_INFINITY;
    }

    /** A number for a message: 12 significant digits, no trailing zeros, plain unless very large or small. */
    static String num(double x) {
        if (!Double.isFinite(x)) {
            return Double.toString(x);
        }
        java.math.BigDecimal d = new java.math.BigDecimal(x).round(new java.math.MathContext(12)).stripTrailingZeros();
        double a = Math.abs(x);
        return a == 0 || (a >= 1e-4 && a < 1e15) ? d.toPlainString() : d.toString();
    }

    final WorldlineException refusal(String message) {
        return WorldlineException.aboutEnd(start.index(), message);
    }

    private static void checkBelowLight(int i, double speed) {
        if (!(Math.abs(speed) < C)) {
            throw WorldlineException.aboutEnd(i, "until-speed must be below c in magnitude");
        }
    }

    /** Closed forms of {@link Hyperbolic}. */
    static final class ClosedForm extends LegFlight {
        private final double a;

        private ClosedForm(LegStart start, double a, double limit, String limitName) {
            super(start, limit, limitName);
            this.a = a;
        }

        @Override
        Piece piece(double du) {
            return new ConstantPiece(a);
        }

        /** {@code du}, or the limit for a {@code du} within the slack beyond it; refused further out. */
        private double withinLimit(double du, String what) {
            if (!(du > limit)) {
                return du; // NaN too: the flight plan refuses an undefined duration
            }
            if (du <= limit * (1 + LIMIT_SLACK)) {
                return limit;
            }
            double eta = start.state().rapidity() + a * limit / C;
            throw refusal(what + " is not reached before " + limitName + " (after " + num(limit)
                    + " s of craft clock, at speed " + num(Elementary.tanh(eta)) + " c)");
        }

        @Override
        public double afterClock(double seconds) {
            return withinLimit(seconds, "duration " + num(seconds) + " s");
        }

        @Override
        public double afterMission(double seconds) {
            return withinLimit(Hyperbolic.properTimeForTime(start.state().rapidity(), a, seconds),
                    "duration-mission " + num(seconds) + " s");
        }

        @Override
        public double untilSpeed(double speed) {
            int i = start.index();
            checkBelowLight(i, speed);
            double eta = start.state().rapidity();
            double target = speed / C;
            double dEta = Math.abs(eta) < 0.5
                    ? Hyperbolic.deltaRapidity(target, Elementary.tanh(eta))
                    : Hyperbolic.rapidityOfBeta(target) - eta;
            if (dEta == 0) {
                return 0;
            }
            if (a == 0 || Math.signum(dEta) != Math.signum(a)) {
                throw refusal("until-speed " + num(speed / C) + " c is never reached: the leg's acceleration "
                        + (a == 0 ? "is zero" : "points away from it") + " (speed at the leg start "
                        + num(Elementary.tanh(eta)) + " c)");
            }
            return withinLimit(C * dEta / a, "until-speed " + num(speed / C) + " c");
        }

        /** The first proper time at which the displacement is {@code d}: cosh(eta1) = cosh(eta0) + a d / c^2. */
        @Override
        public double untilDistance(double d) {
            if (d == 0) {
                return 0;
            }
            double eta = start.state().rapidity();
            if (a == 0) {
                double v = C * Elementary.sinh(eta);
                if (v == 0 || Math.signum(v) != Math.signum(d)) {
                    throw refusal("until-distance is never reached: the craft coasts "
                            + (v == 0 ? "at rest" : "the other way"));
                }
                return withinLimit(d / v, "until-distance " + num(d) + " m");
            }
            double x = a * d / Constants.C2;
            double ch = Elementary.cosh(eta);
            double sh = Elementary.sinh(eta);
            double q = sh * sh + x * (2 * ch + x); // sinh^2(eta1)
            if (!(q >= 0)) {
                throw refusal("until-distance is never reached: the burn turns the craft round before it gets there");
            }
            double s1 = Math.sqrt(q);
            double best = Double.POSITIVE_INFINITY;
            for (double target : new double[] {s1, -s1}) {
                double dEta;
                if (target * sh >= 0 && target + sh != 0) {
                    double diff = x * (2 * ch + x) / (target + sh);
                    dEta = Hyperbolic.deltaAsinh(target, sh, diff);
                } else {
                    dEta = Hyperbolic.asinh(target) - eta;
                }
                double du = C * dEta / a;
                if (du > 0 && du < best) {
                    best = du;
                }
            }
            if (!Double.isFinite(best)) {
                throw refusal("until-distance is never reached by this burn");
            }
            return withinLimit(best, "until-distance " + num(d) + " m");
        }
    }

    /**
     * Root search on the dense output: {@link IntegratedPiece#firstReach} splits the leg where the
     * quantity may turn, then solves the first bracketed crossing with a Brent solver to
     * {@link IntegratedPiece#ROOT_TOLERANCE} relative in proper time.
     */
    static final class Integrated extends LegFlight {
        private final IntegratedPiece piece;

        private Integrated(LegStart start, IntegratedPiece piece, String limitName) {
            super(start, piece.duration(), limitName);
            this.piece = piece;
        }

        @Override
        Piece piece(double du) {
            return piece.endedAt(du);
        }

        /** A refusal at the leg (not its end) when the integration stopped short of the leg's own limit. */
        private void checkNotCut() {
            if (piece.cut() != null) {
                throw new WorldlineException(start.index(), piece.cut());
            }
        }

        @Override
        public double atLimit() {
            checkNotCut();
            return super.atLimit();
        }

        private double found(double du, String what, String atLimit) {
            if (Double.isNaN(du)) {
                checkNotCut();
                throw refusal(what + " is not reached before " + limitName + " (" + atLimit + ")");
            }
            return du;
        }

        private String speeds() {
            return "speed at the leg start " + num(Elementary.tanh(start.state().rapidity())) + " c, at its end "
                    + num(Elementary.tanh(piece.rapidityAfter(start.state(), limit))) + " c";
        }

        @Override
        public double afterClock(double seconds) {
            if (!(seconds <= limit)) {
                checkNotCut();
                throw refusal("duration " + num(seconds) + " s is not reached before " + limitName + " (after " + num(limit)
                        + " s of craft clock)");
            }
            return seconds;
        }

        @Override
        public double afterMission(double seconds) {
            if (seconds == 0) {
                return 0;
            }
            return found(seconds > 0 ? piece.firstReach(IntegratedPiece.T, seconds) : Double.NaN,
                    "duration-mission " + num(seconds) + " s",
                    "after " + num(piece.offset(Measure.TIME, start.state(), limit)) + " s of mission time");
        }

        @Override
        public double untilSpeed(double speed) {
            checkBelowLight(start.index(), speed);
            double target = Hyperbolic.rapidityOfBeta(speed / C);
            if (target == start.state().rapidity()) {
                return 0;
            }
            return found(piece.firstReach(IntegratedPiece.ETA, target), "until-speed " + num(speed / C) + " c", speeds());
        }

        @Override
        public double untilDistance(double d) {
            if (d == 0) {
                return 0;
            }
            return found(piece.firstReach(IntegratedPiece.S, d), "until-distance " + num(d) + " m",
                    "distance covered by then " + num(piece.offset(Measure.DISTANCE, start.state(), limit)) + " m");
        }
    }
}
