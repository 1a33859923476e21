package org.nullpath.worldline;

/**
 * A state of a straight-line craft in its own line coordinates.
 *
 * @param clock       craft clock, seconds
 * @param timeSeconds mission time, seconds
 * @param along       distance along the heading from the start position, metres
 * @param rapidity    rapidity along the heading
 * @param segment     index of the piece of the worldline this state lies in (internal bookkeeping)
 * @param local       proper time since the start of that piece (before the first leg: since the first
 *                    leg's start, so negative), seconds. Moves along the line take proper-time steps
 *                    as differences of these small numbers, never of the large clock readings, so a
 *                    light time does not depend on what the craft's clock happens to read.
 */
public record LineState(double clock, double timeSeconds, double along, double rapidity, int segment, double local) {
}
