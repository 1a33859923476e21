package org.nullpath.reference;

import java.math.BigDecimal;
import java.util.Arrays;

/**
 * The state of a worldline at one event: its clock reading, mission time t (s), position (m) and
 * velocity (m/s), both as 3-vectors in the mission frame, and the Lorentz factor gamma (kept separately
 * because for craft it is known exactly as cosh(rapidity), which is better than recomputing it from the
 * velocity when the speed is very close to c). Arrays are shared: do not modify them.
 */
public record RefState(BigDecimal clock, BigDecimal t, BigDecimal[] position, BigDecimal[] velocity,
                       BigDecimal gamma) {

    /** A state whose gamma is computed from the velocity. */
    public RefState(BigDecimal clock, BigDecimal t, BigDecimal[] position, BigDecimal[] velocity) {
        this(clock, t, position, velocity, gammaOf(velocity));
    }

    static BigDecimal gammaOf(BigDecimal[] velocity) {
        BigDecimal beta2 = RefMath.dot(velocity, velocity).divide(RefMath.C2, RefMath.mc());
        if (beta2.compareTo(BigDecimal.ONE) >= 0) {
            throw new IllegalArgumentException("speed must be below c");
        }
        return BigDecimal.ONE.divide(RefMath.sqrt(BigDecimal.ONE.subtract(beta2)), RefMath.mc());
    }

    /** Speed |v| (m/s). */
    public BigDecimal speed() {
        return RefMath.norm(velocity);
    }

    public double clockDouble() {
        return clock.doubleValue();
    }

    public double tDouble() {
        return t.doubleValue();
    }

    public double[] positionDouble() {
        return RefMath.d(position);
    }

    public double[] velocityDouble() {
        return RefMath.d(velocity);
    }

    @Override
    public String toString() {
        return "RefState[clock=" + clock.round(new java.math.MathContext(20)) + ", t="
                + t.round(new java.math.MathContext(20)) + ", position=" + Arrays.toString(positionDouble())
                + ", velocity=" + Arrays.toString(velocityDouble()) + "]";
    }
}
