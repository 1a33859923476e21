package org.nullpath.worldline;

import java.util.List;
import java.util.Optional;

import org.nullpath.spacetime.Vec3;
import org.nullpath.units.Constants;

/**
 * A craft moving on a straight line through its start position along a unit heading, flying a list of
 * legs (built by {@link FlightPlan}; this class answers the queries). Before the first leg it coasts at
 * its start speed (for ever into the past); after a finite last leg it coasts for ever.
 *
 * <p>Every position and time inside a leg is computed from the leg's start state with the product
 * forms of {@link org.nullpath.spacetime.Hyperbolic}, so nothing cancels as {@code a u / c -> 0}. Moves along the worldline
 * ({@link #walkTime}, {@link #walkU}, {@link #walkV}) add offsets piece by piece, so a light time of a
 * few seconds far into a mission keeps its own relative precision.
 */
public final class StraightLineCraft implements Worldline {
    /** Rapidities beyond this overflow cosh and sinh in double precision (cosh 710 > 1.8e308). */
    public static final double MAX_RAPIDITY = 700.0;

    private static final double C = Constants.C;

    private final Vec3 origin;
    private final Vec3 heading;
    private final List<Segment> segments;
    private final List<LegSpan> legs;
    private final Optional<Asymptote> asymptote;

    StraightLineCraft(Vec3 origin, Vec3 heading, List<Segment> segments, List<LegSpan> legs) {
        this.origin = origin;
        this.heading = heading;
        this.segments = segments;
        this.legs = legs;
        this.asymptote = findAsymptote();
    }

    /**
     * Builds a craft (the legs are flown by {@link FlightPlan}).
     *
     * @param startPosition  where the first leg starts (metres)
     * @param heading        direction of the flight line (any non-zero length)
     * @param startTime      mission time at which the first leg starts
     * @param startClock     craft clock reading then
     * @param startSpeed     speed along the heading then, m/s, |v| < c
     * @param legSpecs       the legs in order; only the last may be open-ended
     * @throws WorldlineException naming the leg when a leg end can never be reached or doubles cannot hold the flight
     */
    public static StraightLineCraft of(Vec3 startPosition, Vec3 heading, double startTime, double startClock,
                                       double startSpeed, List<LegSpec> legSpecs) {
        FlightPlan.Flown f = FlightPlan.fly(startPosition, heading, startTime, startClock, startSpeed, legSpecs);
        return new StraightLineCraft(f.origin(), f.heading(), f.segments(), f.legs());
    }

    public Vec3 origin() {
        return origin;
    }

    public Vec3 heading() {
        return heading;
    }

    /**
     * The last craft-clock reading doubles can hold: where an open-ended burn reaches rapidity
     * {@link #MAX_RAPIDITY}; +infinity when the craft ends coasting.
     */
    public double maxClock() {
        Segment last = segments.get(segments.size() - 1);
        double a = last.piece().constantAcceleration();
        if (a == 0 || Double.isNaN(a)) {
            return Double.POSITIVE_INFINITY;
        }
        LineState lo = last.lo();
        return lo.clock() + (Math.signum(a) * MAX_RAPIDITY - lo.rapidity()) * C / a;
    }

    /** The legs as flown, with their start and end states. */
    public List<LegSpan> legs() {
        return legs;
    }

    /** Distance along the heading of a position, from the start position. */
    public double alongOf(Vec3 position) {
        return heading.dot(position.minus(origin));
    }

    /** The part of {@code position - origin} perpendicular to the flight line. */
    public Vec3 perpendicularOf(Vec3 position) {
        Vec3 d = position.minus(origin);
        return d.minus(heading.times(heading.dot(d)));
    }

    private int segmentOfClock(double clock) {
        return lastSegmentStartingBy(clock, LineState::clock);
    }

    private int segmentOfTime(double t) {
        return lastSegmentStartingBy(t, LineState::timeSeconds);
    }

    /** The last segment whose start (by {@code key}) is at or before {@code x}; segment 0 runs from -infinity. */
    private int lastSegmentStartingBy(double x, java.util.function.ToDoubleFunction<LineState> key) {
        int lo = 0;
        int hi = segments.size() - 1;
        while (lo < hi) {
            int mid = (lo + hi + 1) >>> 1;
            if (key.applyAsDouble(segments.get(mid).lo()) <= x) {
                lo = mid;
            } else {
                hi = mid - 1;
            }
        }
        return lo;
    }

    /** Line state at a craft-clock reading. */
    public LineState lineAtClock(double clock) {
        int i = segmentOfClock(clock);
        Segment g = segments.get(i);
        LineState r = g.ref();
        double du = clock - r.clock();
        Piece p = g.piece();
        Piece.Offsets o = p.timeAndDistance(r, du);
        return checked(new LineState(clock, r.timeSeconds() + o.time(), r.along() + o.distance(),
                p.rapidityAfter(r, du), i, r.local() + du));
    }

    /** Line state at a mission time. */
    public LineState lineAtTime(double t) {
        return lineAtTime(t, true);
    }

    /**
     * @param along whether to compute the distance along the line; without it the state's along is NaN, for the
     *              clock and time changes only, which never read it
     */
    private LineState lineAtTime(double t, boolean along) {
        int i = segmentOfTime(t);
        Segment g = segments.get(i);
        LineState r = g.ref();
        Piece p = g.piece();
        double du = p.properTimeFor(Measure.TIME, r, t - r.timeSeconds());
        double s = along ? r.along() + p.offset(Measure.DISTANCE, r, du) : Double.NaN;
        return checked(new LineState(r.clock() + du, t, s, p.rapidityAfter(r, du), i, r.local() + du), true, along);
    }

    private static LineState checked(LineState s) {
        return checked(s, true, true);
    }

    /** @param time, along whether the state's mission time and along were computed (else they are NaN, unchecked) */
    private static LineState checked(LineState s, boolean time, boolean along) {
        if (!(Math.abs(s.rapidity()) <= MAX_RAPIDITY) || time && !Double.isFinite(s.timeSeconds())
                || along && !Double.isFinite(s.along()) || !Double.isFinite(s.clock())) {
            throw new ArithmeticException("craft state beyond what double precision can hold (rapidity "
                    + s.rapidity() + ")");
        }
        return s;
    }

    /** The mission-frame state of a line state. */
    public State toState(LineState s) {
        return new State(s.clock(), s.timeSeconds(), origin.plus(heading.times(s.along())), heading, s.rapidity());
    }

    @Override
    public State atClock(double clockSeconds) {
        return toState(lineAtClock(clockSeconds));
    }

    @Override
    public State atTime(double timeSeconds) {
        return toState(lineAtTime(timeSeconds));
    }

    @Override
    public Step advance(State from, double dtSeconds) {
        LineWalk w = walkTime(lineAtTime(from.timeSeconds()), dtSeconds);
        Vec3 d = heading.times(w.dAlong());
        State end = new State(from.clock() + w.dClock(), from.timeSeconds() + dtSeconds, from.position().plus(d),
                heading, w.end().rapidity());
        return new Step(dtSeconds, w.dClock(), d, end);
    }

    @Override
    public Step advanceClock(State from, double dClockSeconds) {
        // the null offsets of walkClock are for the off-line cone only: not summed here
        LineWalk w = walk(lineAtTime(from.timeSeconds()), dClockSeconds, Measure.CLOCK, false, Sums.TIME_AND_DISTANCE);
        Vec3 d = heading.times(w.dAlong());
        State end = new State(from.clock() + dClockSeconds, from.timeSeconds() + w.dt(), from.position().plus(d),
                heading, w.end().rapidity());
        return new Step(w.dt(), dClockSeconds, d, end);
    }

    /** {@link #advance}'s clock change, walked without the distances along the line (two sinh a piece fewer). */
    @Override
    public double clockChange(State from, double dtSeconds) {
        return walk(lineAtTime(from.timeSeconds(), false), dtSeconds, Measure.TIME, true, Sums.TIME).dClock();
    }

    /** {@link #advanceClock}'s time change, walked without the distances along the line. */
    @Override
    public double timeChange(State from, double dClockSeconds) {
        return walk(lineAtTime(from.timeSeconds(), false), dClockSeconds, Measure.CLOCK, false, Sums.TIME).dt();
    }

    @Override
    public double properAccelerationAt(double timeSeconds) {
        LineState s = lineAtTime(timeSeconds);
        return segments.get(s.segment()).piece().acceleration(s);
    }

    @Override
    public Optional<Asymptote> asymptote() {
        return asymptote;
    }

    private Optional<Asymptote> findAsymptote() {
        Segment last = segments.get(segments.size() - 1);
        double a = last.piece().constantAcceleration();
        if (a == 0 || Double.isNaN(a)) {
            return Optional.empty();
        }
        LineState s = last.lo();
        if (a > 0) {
            double lineLimit = C * s.timeSeconds() - s.along() + Constants.C2 / a * Math.exp(-s.rapidity());
            return Optional.of(new Asymptote(heading, lineLimit - heading.dot(origin)));
        }
        double lineLimit = C * s.timeSeconds() + s.along() + Constants.C2 / -a * Math.exp(s.rapidity());
        return Optional.of(new Asymptote(heading.times(-1), lineLimit + heading.dot(origin)));
    }

    /**
     * A move along the line, its differences summed piece by piece.
     *
     * @param dt     mission-time difference
     * @param dClock craft-clock difference
     * @param dAlong distance difference along the heading
     * @param dU     difference of U = c t - along, summed from the pieces' own offsets (no cancellation);
     *               given by {@link #walkClock} only (NaN otherwise)
     * @param dV     difference of V = c t + along, likewise
     * @param end    the state reached, or null when the move can never be completed (beyond a horizon)
     */
    public record LineWalk(double dt, double dClock, double dAlong, double dU, double dV, LineState end) {
        public boolean never() {
            return end == null;
        }
    }

    /** Moves by mission time {@code dt} (any sign). */
    public LineWalk walkTime(LineState from, double dt) {
        return walk(from, dt, Measure.TIME, true, Sums.TIME_AND_DISTANCE);
    }

    /** Moves by craft-clock time {@code dClock} (any sign). */
    public LineWalk walkClock(LineState from, double dClock) {
        return walk(from, dClock, Measure.CLOCK, false, Sums.ALL);
    }

    /**
     * {@link #walkClock} summing only the null offsets: its dU, dV and end rapidity are walkClock's own bits, while
     * dt, dAlong and the end state's mission time and along are NaN (the off-line cone's Newton steps read nothing
     * else, and skip a burn's sinh and cosh for time and distance).
     */
    public LineWalk walkClockNulls(LineState from, double dClock) {
        return walk(from, dClock, Measure.CLOCK, false, Sums.NULLS);
    }

    /**
     * Moves until {@code U = c t - along} has changed by {@code dU} (any sign): the path of a light
     * signal travelling along +heading meets the craft there. {@link LineWalk#never()} when it never does.
     */
    public LineWalk walkU(LineState from, double dU) {
        return walk(from, dU, Measure.U, false, Sums.TIME_AND_DISTANCE);
    }

    /** Moves until {@code V = c t + along} has changed by {@code dV} (any sign); see {@link #walkU}. */
    public LineWalk walkV(LineState from, double dV) {
        return walk(from, dV, Measure.V, false, Sums.TIME_AND_DISTANCE);
    }

    /** What a walk sums besides the craft clock; a sum it skips is NaN, in the walk and in its end state. */
    private enum Sums {
        /** mission time: the clock and time changes */
        TIME(true, false, false),
        /** mission time and the distance along the line: every move that ends in a whole state */
        TIME_AND_DISTANCE(true, true, false),
        /** those and the null offsets U and V: the off-line cone's answer */
        ALL(true, true, true),
        /** the null offsets alone: the off-line cone's Newton steps */
        NULLS(false, false, true);

        final boolean time;
        final boolean along;
        final boolean nulls;

        Sums(boolean time, boolean along, boolean nulls) {
            this.time = time;
            this.along = along;
            this.nulls = nulls;
        }
    }

    private LineWalk walk(LineState from, double amount, Measure m, boolean exactTime, Sums sums) {
        boolean along = sums.along;
        boolean nulls = sums.nulls;
        if (amount == 0) {
            return new LineWalk(0, 0, 0, 0, 0, from);
        }
        boolean forward = amount > 0;
        int i = from.segment();
        LineState cur = from;
        double dt = 0;
        double dClock = 0;
        double dAlong = 0;
        double dU = 0;
        double dV = 0;
        double rem = amount;
        while (true) {
            Segment g = segments.get(i);
            Piece p = g.piece();
            LineState boundary = forward ? g.hi() : g.lo();
            if (boundary != null) {
                // every step is an offset over a proper time that is a difference of local (small) values
                double du = boundary.local() - cur.local();
                double cap = p.offset(m, cur, du);
                if (forward ? rem > cap : rem < cap) {
                    if (along) {
                        Piece.Offsets o = p.timeAndDistance(cur, du);
                        dt += o.time();
                        dAlong += o.distance();
                    } else if (sums.time) {
                        dt += p.offset(Measure.TIME, cur, du);
                    }
                    dClock += du;
                    if (nulls) {
                        dU += p.offset(Measure.U, cur, du);
                        dV += p.offset(Measure.V, cur, du);
                    }
                    rem -= cap;
                    i += forward ? 1 : -1;
                    Segment next = segments.get(i);
                    cur = forward ? next.lo() : next.hi();
                    continue;
                }
            }
            double du = p.properTimeFor(m, cur, rem);
            if (Double.isNaN(du)) {
                return new LineWalk(Double.POSITIVE_INFINITY, Double.POSITIVE_INFINITY, Double.NaN, Double.NaN,
                        Double.NaN, null);
            }
            double ddt;
            double dds;
            if (!exactTime && along) {
                Piece.Offsets o = p.timeAndDistance(cur, du);
                ddt = o.time();
                dds = o.distance();
            } else {
                ddt = exactTime ? rem : sums.time ? p.offset(Measure.TIME, cur, du) : Double.NaN;
                dds = along ? p.offset(Measure.DISTANCE, cur, du) : Double.NaN;
            }
            LineState end = checked(new LineState(cur.clock() + du, cur.timeSeconds() + ddt, cur.along() + dds,
                    p.rapidityAfter(cur, du), i, cur.local() + du), sums.time, along);
            return nulls
                    ? new LineWalk(dt + ddt, dClock + du, dAlong + dds, dU + p.offset(Measure.U, cur, du), dV + p.offset(Measure.V, cur, du), end)
                    : new LineWalk(dt + ddt, dClock + du, dAlong + dds, Double.NaN, Double.NaN, end);
        }
    }
}
