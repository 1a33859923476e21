package org.nullpath.worldline;

import java.util.ArrayList;
import java.util.Collections;
import java.util.List;

import org.hipparchus.exception.MathRuntimeException;
import org.nullpath.spacetime.Hyperbolic;
import org.nullpath.spacetime.Vec3;
import org.nullpath.units.Constants;

/**
 * Builds a {@link StraightLineCraft} from its legs: each leg flies from where the last one ended
 * ({@link LegSpec#fly}) and its end condition finds its proper time on that flight
 * ({@link LegSpec.LegEnd#properTime}); the pieces are then laid end to end. Before the first leg the
 * craft coasts at its start speed (for ever into the past); after a finite last leg it coasts for ever.
 */
final class FlightPlan {
    private FlightPlan() {
    }

    /**
     * The flight laid out: the flight line and the pieces end to end.
     *
     * @param origin   the start position
     * @param heading  the unit heading
     * @param segments the pieces in order, from the coast before the first leg to the last
     * @param legs     the legs as flown
     */
    record Flown(Vec3 origin, Vec3 heading, List<Segment> segments, List<LegSpan> legs) {
    }

    /** Flies the legs; see {@link StraightLineCraft#of}. */
    static Flown fly(Vec3 startPosition, Vec3 heading, double startTime, double startClock,
                                 double startSpeed, List<LegSpec> legSpecs) {
        if (heading.isZero() || !heading.isFinite()) {
            throw new WorldlineException(-1, "the heading must be a non-zero vector");
        }
        if (!(Math.abs(startSpeed) < Constants.C)) {
            throw new WorldlineException(-1, "the start speed must be below c in magnitude");
        }
        Vec3 n = heading.unit();
        double eta0 = Hyperbolic.rapidityOfBeta(startSpeed / Constants.C);
        LineState start = new LineState(startClock, startTime, 0.0, eta0, 0, 0.0);
        List<Segment> segs = new ArrayList<>();
        segs.add(new Segment(new ConstantPiece(0.0), start, null, start));
        List<LegSpan> spans = new ArrayList<>();
        LineState cur = start;
        boolean open = false;
        for (int i = 0; i < legSpecs.size(); i++) {
            LegSpec leg = legSpecs.get(i);
            // an open-ended leg that is not the last is refused here, so none is ever followed by another
            boolean openEnded = leg.end().openEnded();
            if (openEnded && i != legSpecs.size() - 1) {
                throw new WorldlineException(i, "an open-ended leg (duration: forever) must be the last leg");
            }
            LineState lo = withSegment(cur, segs.size());
            LegFlight flight;
            double du;
            try {
                flight = leg.fly(new LegStart(i, lo, startPosition, n));
                du = leg.end().properTime(flight);
            } catch (MathRuntimeException e) {
                // a root search on an extreme leg that does not converge in double precision
                throw new WorldlineException(i, "the leg cannot be computed in double precision (its end or its"
                        + " own limit is not found); shorten the leg or weaken its acceleration");
            }
            if (openEnded) {
                Piece forever = flight.piece(du);
                segs.add(new Segment(forever, lo, lo, null));
                spans.add(new LegSpan(i, leg, lo, null, forever.accelerationRange(lo, 0)));
                open = true;
                continue;
            }
            if (!(du >= 0) || !Double.isFinite(du)) {
                throw WorldlineException.aboutEnd(i, "the leg has a negative or undefined duration");
            }
            Piece piece = flight.piece(du);
            LineState hi = new LineState(cur.clock() + du,
                    cur.timeSeconds() + piece.offset(Measure.TIME, lo, du),
                    cur.along() + piece.offset(Measure.DISTANCE, lo, du),
                    piece.rapidityAfter(lo, du), segs.size(), du);
            checkRepresentable(i, hi);
            spans.add(new LegSpan(i, leg, lo, hi, piece.accelerationRange(lo, du)));
            if (du > 0) {
                segs.add(new Segment(piece, lo, lo, hi));
            }
            cur = hi;
        }
        if (!open) {
            LineState lo = withSegment(cur, segs.size());
            segs.add(new Segment(new ConstantPiece(0.0), lo, lo, null));
        }
        return new Flown(startPosition, n, Collections.unmodifiableList(segs), Collections.unmodifiableList(spans));
    }

    private static LineState withSegment(LineState s, int index) {
        return new LineState(s.clock(), s.timeSeconds(), s.along(), s.rapidity(), index, 0.0);
    }

    private static void checkRepresentable(int leg, LineState s) {
        double max = StraightLineCraft.MAX_RAPIDITY;
        if (!(Math.abs(s.rapidity()) <= max) || !Double.isFinite(s.timeSeconds())
                || !Double.isFinite(s.along()) || !Double.isFinite(s.clock())) {
            throw new WorldlineException(leg, "the leg reaches a rapidity or distance beyond what double precision can hold"
                    + " (rapidity limit " + max + ")");
        }
    }
}
