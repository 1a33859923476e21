package org.nullpath.worldline;

import org.nullpath.spacetime.Event;
import org.nullpath.spacetime.Hyperbolic;
import org.nullpath.spacetime.Vec3;
import org.nullpath.units.Constants;

/**
 * Where a body is and how it moves at one instant, in the mission frame.
 *
 * @param clock       the body's own clock reading (proper time plus its offset), seconds
 * @param timeSeconds mission time, seconds
 * @param position    mission-frame position, metres
 * @param direction   unit vector along which the rapidity is measured (the heading of a craft)
 * @param rapidity    signed rapidity along {@code direction}: velocity = c tanh(rapidity) direction
 */
public record State(double clock, double timeSeconds, Vec3 position, Vec3 direction, double rapidity) {

    public Event event() {
        return new Event(timeSeconds, position);
    }

    /** Speed as a fraction of c, signed along {@code direction}. */
    public double beta() {
        return Hyperbolic.tanhOf(rapidity);
    }

    public double gamma() {
        return Hyperbolic.coshOf(rapidity);
    }

    /** Velocity in m/s. */
    public Vec3 velocity() {
        return direction.times(Constants.C * beta());
    }
}
