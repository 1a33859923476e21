package org.nullpath.reference;

import java.math.BigDecimal;
import java.math.MathContext;
import java.util.Arrays;

/**
 * A spacetime event in the mission frame: mission time t (s), position (m), and the clock reading of the
 * worldline it lies on where that is known (otherwise null). Arrays are shared: do not modify them.
 */
public record RefEvent(BigDecimal t, BigDecimal[] position, BigDecimal clock) {

    public RefEvent {
        if (t == null || position == null || position.length != 3) {
            throw new IllegalArgumentException("an event needs t and a 3-vector position");
        }
    }

    /** An event at exactly converted doubles, with no clock. */
    public static RefEvent of(double t, double[] position) {
        return new RefEvent(RefMath.bd(t), RefMath.bd(position), null);
    }

    /** The event of a worldline state, carrying its clock. */
    public static RefEvent of(RefState state) {
        return new RefEvent(state.t(), state.position(), state.clock());
    }

    public boolean hasClock() {
        return clock != null;
    }

    public double tDouble() {
        return t.doubleValue();
    }

    public double clockDouble() {
        if (clock == null) {
            throw new IllegalStateException("no clock known for this event");
        }
        return clock.doubleValue();
    }

    public double[] positionDouble() {
        return RefMath.d(position);
    }

    @Override
    public String toString() {
        return "RefEvent[t=" + t.round(new MathContext(20)) + ", position=" + Arrays.toString(positionDouble())
                + (clock == null ? "" : ", clock=" + clock.round(new MathContext(20))) + "]";
    }
}
