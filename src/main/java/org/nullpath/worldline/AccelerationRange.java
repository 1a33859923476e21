package org.nullpath.worldline;

/**
 * The proper acceleration over a leg, signed along the heading, m/s^2.
 *
 * @param atStart         at the leg's start
 * @param atEnd           at its end (for an open-ended leg, the constant acceleration)
 * @param largestMagnitude the value of largest size over the leg
 */
public record AccelerationRange(double atStart, double atEnd, double largestMagnitude) {
}
