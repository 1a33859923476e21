package org.nullpath.worldline;

/**
 * The motion inside one leg of a straight-line craft, queried as offsets from a state that lies in
 * the leg. Offsets are exact differences of the leg's own functions, so short moves keep their
 * relative precision. Every "for" method returns the proper time {@code du} (any sign) that changes
 * the named quantity by the given amount, or NaN when no such proper time exists.
 */
interface Piece {

    /** Proper acceleration (signed along the heading) at {@code cur}, m/s^2. */
    double acceleration(LineState cur);

    /** The constant proper acceleration of this piece, or NaN when it varies. */
    double constantAcceleration();

    double rapidityAfter(LineState cur, double du);

    double timeOffset(LineState cur, double du);

    double distanceOffset(LineState cur, double du);

    /** Offset of {@code U = c t - along}. */
    double uOffset(LineState cur, double du);

    /** Offset of {@code V = c t + along}. */
    double vOffset(LineState cur, double du);

    double properTimeForTime(LineState cur, double dt);

    double properTimeForU(LineState cur, double dU);

    double properTimeForV(LineState cur, double dV);
}
