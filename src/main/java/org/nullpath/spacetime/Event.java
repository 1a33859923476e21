package org.nullpath.spacetime;

/**
 * A point of spacetime in the mission frame.
 *
 * @param timeSeconds mission time
 * @param position    mission-frame position, metres
 */
public record Event(double timeSeconds, Vec3 position) {
    public static Event of(double timeSeconds, Vec3 position) {
        return new Event(timeSeconds, position);
    }
}
