package org.nullpath.worldline;

/**
 * A state of a straight-line craft in its own line coordinates.
 *
 * @param clock       craft clock, seconds
 * @param timeSeconds mission time, seconds
 * @param along       distance along the heading from the start position, metres
 * @param rapidity    rapidity along the heading
 * @param segment     index of the piece of the worldline this state lies in (internal bookkeeping)
 */
public record LineState(double clock, double timeSeconds, double along, double rapidity, int segment) {
}
