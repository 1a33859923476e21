package org.nullpath.worldline;

import java.util.Optional;

import org.nullpath.spacetime.Elementary;
import org.nullpath.spacetime.Hyperbolic;
import org.nullpath.spacetime.Vec3;
import org.nullpath.units.Constants;

/**
 * A body at rest or in uniform motion: a station. Its clock reads its proper time since mission time
 * 0 plus an offset: {@code clock = t / gamma + offset}.
 */
public final class InertialWorldline implements Worldline {
    private final Vec3 positionAtZero;
    private final Vec3 velocity;
    private final double clockOffset;
    private final Vec3 direction;
    private final double rapidity;
    private final double gamma;

    private InertialWorldline(Vec3 positionAtZero, Vec3 velocity, double clockOffset) {
        double speed = velocity.norm();
        if (!(speed < Constants.C)) {
            throw new IllegalArgumentException("speed must be below c, got " + speed / Constants.C + " c");
        }
        this.positionAtZero = positionAtZero;
        this.velocity = velocity;
        this.clockOffset = clockOffset;
        this.direction = speed == 0 ? new Vec3(1, 0, 0) : velocity.unit();
        this.rapidity = Hyperbolic.atanh(speed / Constants.C);
        this.gamma = Elementary.cosh(rapidity);
    }

    /** A station at {@code position} at mission time 0, moving with {@code velocity} (m/s), clock offset in s. */
    public static InertialWorldline of(Vec3 position, Vec3 velocity, double clockOffsetSeconds) {
        return new InertialWorldline(position, velocity, clockOffsetSeconds);
    }

    /** A station at rest at {@code position} whose clock reads mission time. */
    public static InertialWorldline atRest(Vec3 position) {
        return new InertialWorldline(position, Vec3.ZERO, 0);
    }

    public Vec3 positionAtZero() {
        return positionAtZero;
    }

    public Vec3 velocity() {
        return velocity;
    }

    public double clockOffset() {
        return clockOffset;
    }

    public boolean atRest() {
        return velocity.isZero();
    }

    @Override
    public State atClock(double clockSeconds) {
        double t = (clockSeconds - clockOffset) * gamma;
        return new State(clockSeconds, t, positionAtZero.plus(velocity.times(t)), direction, rapidity);
    }

    @Override
    public State atTime(double timeSeconds) {
        double clock = timeSeconds / gamma + clockOffset;
        return new State(clock, timeSeconds, positionAtZero.plus(velocity.times(timeSeconds)), direction, rapidity);
    }

    @Override
    public Step advance(State from, double dtSeconds) {
        Vec3 d = velocity.times(dtSeconds);
        double dClock = dtSeconds / gamma;
        State end = new State(from.clock() + dClock, from.timeSeconds() + dtSeconds, from.position().plus(d),
                direction, rapidity);
        return new Step(dtSeconds, dClock, d, end);
    }

    @Override
    public Step advanceClock(State from, double dClockSeconds) {
        return advance(from, dClockSeconds * gamma);
    }

    @Override
    public double clockChange(State from, double dtSeconds) {
        return dtSeconds / gamma;
    }

    @Override
    public double timeChange(State from, double dClockSeconds) {
        return dClockSeconds * gamma;
    }

    @Override
    public double properAccelerationAt(double timeSeconds) {
        return 0;
    }

    @Override
    public Optional<Asymptote> asymptote() {
        return Optional.empty();
    }
}
