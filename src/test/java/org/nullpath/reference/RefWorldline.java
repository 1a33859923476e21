package org.nullpath.reference;

import java.math.BigDecimal;

/**
 * A timelike worldline in the inertial mission frame, with its own clock (proper time plus an offset).
 * Test-only reference; see {@link RefSolver}.
 */
public interface RefWorldline {

    /** The state at mission time {@code t} (s). */
    RefState atTime(BigDecimal t);

    /** The state when this worldline's own clock reads {@code clock} (s). */
    RefState atClock(BigDecimal clock);

    /** Convenience: {@link #atTime(BigDecimal)} with an exactly converted double. */
    default RefState atTime(double t) {
        return atTime(RefMath.bd(t));
    }

    /** Convenience: {@link #atClock(BigDecimal)} with an exactly converted double. */
    default RefState atClock(double clock) {
        return atClock(RefMath.bd(clock));
    }

    /** The event at this worldline's clock reading {@code clock}, with that clock attached. */
    default RefEvent eventAtClock(BigDecimal clock) {
        return RefEvent.of(atClock(clock));
    }

    /** Convenience: {@link #eventAtClock(BigDecimal)} with an exactly converted double. */
    default RefEvent eventAtClock(double clock) {
        return eventAtClock(RefMath.bd(clock));
    }
}
