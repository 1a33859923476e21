package org.nullpath.worldline;

import org.nullpath.spacetime.Vec3;

/**
 * A move along a worldline from one state to another, with the differences kept as offsets so that
 * short steps keep their relative precision far into a mission.
 *
 * @param dtSeconds     mission-time difference
 * @param dClockSeconds own-clock difference
 * @param displacement  position difference, metres
 * @param end           the state reached
 */
public record Step(double dtSeconds, double dClockSeconds, Vec3 displacement, State end) {
}
