package org.nullpath.reference;

import java.math.BigDecimal;
import java.math.MathContext;

/**
 * Where the future light cone of an emission meets a receiver's worldline: the arrival mission time t,
 * the receiver's clock there, the position, the light time t - t_emission (solved for as the unknown, so it
 * keeps its own relative precision), the receiver's full state, and an estimate of the number of
 * significant digits of the light time (from the conditioning of c T = |r(t_e + T) - r_e| at the working
 * precision). When {@link #never()} is true the signal never arrives (it is beyond the receiver's horizon)
 * and every other field except {@code emission} is null.
 */
public record RefArrival(boolean never, RefEvent emission, BigDecimal t, BigDecimal clock, BigDecimal[] position,
                         BigDecimal lightTime, RefState state, double estimatedDigits) {

    static RefArrival neverArrives(RefEvent emission) {
        return new RefArrival(true, emission, null, null, null, null, null, Double.NaN);
    }

    /** The arrival as an event (with the receiver's clock). */
    public RefEvent event() {
        requireArrived();
        return new RefEvent(t, position, clock);
    }

    public double tDouble() {
        requireArrived();
        return t.doubleValue();
    }

    public double clockDouble() {
        requireArrived();
        return clock.doubleValue();
    }

    public double lightTimeDouble() {
        requireArrived();
        return lightTime.doubleValue();
    }

    public double[] positionDouble() {
        requireArrived();
        return RefMath.d(position);
    }

    private void requireArrived() {
        if (never) {
            throw new IllegalStateException("the signal never arrives");
        }
    }

    @Override
    public String toString() {
        if (never) {
            return "RefArrival[never, emission=" + emission + "]";
        }
        MathContext m = new MathContext(25);
        return "RefArrival[t=" + t.round(m) + ", clock=" + clock.round(m) + ", lightTime=" + lightTime.round(m)
                + ", digits~" + Math.round(estimatedDigits) + "]";
    }
}
