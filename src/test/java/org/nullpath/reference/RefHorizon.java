package org.nullpath.reference;

import java.math.BigDecimal;
import java.math.MathContext;

/**
 * The horizon of a link: the supremum of the sender's mission times (and the sender's clock there) whose
 * signals still reach the receiver; a send at or after it never arrives. {@link #exists()} is false when
 * every send arrives; then {@code t} and {@code clock} are null. {@code limit} is the receiver's asymptotic
 * null coordinate L used by the criterion (null when none).
 */
public record RefHorizon(boolean exists, BigDecimal t, BigDecimal clock, BigDecimal limit) {

    static RefHorizon none() {
        return new RefHorizon(false, null, null, null);
    }

    public double tDouble() {
        if (!exists) {
            throw new IllegalStateException("no horizon");
        }
        return t.doubleValue();
    }

    public double clockDouble() {
        if (!exists) {
            throw new IllegalStateException("no horizon");
        }
        return clock.doubleValue();
    }

    @Override
    public String toString() {
        return exists ? "RefHorizon[t=" + t.round(new MathContext(25)) + ", clock=" + clock.round(new MathContext(25))
                + "]" : "RefHorizon[none]";
    }
}
