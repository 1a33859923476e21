package org.nullpath.worldline;

/**
 * The motion inside one leg of a straight-line craft, queried as offsets from a state that lies in
 * the leg. Offsets are exact differences of the leg's own functions, so short moves keep their
 * relative precision. Every "for" method returns the proper time {@code du} (any sign) that changes
 * a {@link Measure} by the given amount, or NaN when no such proper time exists.
 */
interface Piece {

    /** Proper acceleration (signed along the heading) at {@code cur}, m/s^2. */
    double acceleration(LineState cur);

    /** The constant proper acceleration of this piece, or NaN when it varies. */
    double constantAcceleration();

    /**
     * The proper acceleration over the piece from its start {@code lo} for proper time {@code du}: at the
     * start, at the end, and the one of largest size, m/s^2.
     */
    AccelerationRange accelerationRange(LineState lo, double du);

    double rapidityAfter(LineState cur, double du);

    /** The change of {@code m} over proper time {@code du} (any sign) from {@code cur}. */
    double offset(Measure m, LineState cur, double du);

    /**
     * The mission-time and distance offsets over {@code du} together, each the same bits as {@link #offset} gives
     * it alone (a burn computes the factor they share once).
     */
    default Offsets timeAndDistance(LineState cur, double du) {
        return new Offsets(offset(Measure.TIME, cur, du), offset(Measure.DISTANCE, cur, du));
    }

    /** A move's mission-time and distance offsets (seconds, metres). */
    record Offsets(double time, double distance) {
    }

    /**
     * The proper time {@code du} (any sign) from {@code cur} over which {@code m} changes by {@code amount},
     * NaN when it never does within the piece. Every measure but {@link Measure#DISTANCE} (which may turn
     * back) can be inverted.
     */
    double properTimeFor(Measure m, LineState cur, double amount);
}
