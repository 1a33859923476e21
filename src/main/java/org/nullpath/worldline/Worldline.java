package org.nullpath.worldline;

import java.util.Optional;

/**
 * The history of one body (station or craft) in the mission frame, defined for every mission time.
 *
 * <p>Contract: the worldline is timelike (speed below c everywhere), its clock increases strictly
 * with mission time, and {@link #atClock} and {@link #atTime} are inverses of each other to a few
 * ulps. {@link #advance} computes the move as an offset from the given state, so that a short step
 * keeps its own relative precision even when the absolute times are large.
 */
public interface Worldline {

    /** The state when the body's clock reads {@code clockSeconds}. */
    State atClock(double clockSeconds);

    /** The state at mission time {@code timeSeconds}. */
    State atTime(double timeSeconds);

    /** The move from {@code from} (a state of this worldline) by mission time {@code dtSeconds} (any sign). */
    Step advance(State from, double dtSeconds);

    /** The move from {@code from} (a state of this worldline) by own-clock time {@code dClockSeconds} (any sign). */
    Step advanceClock(State from, double dClockSeconds);

    /**
     * The own-clock change over mission time {@code dtSeconds} from {@code from}: the same number as
     * {@code advance(from, dtSeconds).dClockSeconds()}, bit for bit, for callers that need only it (an
     * implementation may skip the position, which costs a craft on a burn most of the move).
     */
    default double clockChange(State from, double dtSeconds) {
        return advance(from, dtSeconds).dClockSeconds();
    }

    /** Mission-time change over own-clock time {@code dClockSeconds}: {@code advanceClock(...).dtSeconds()}, bitwise. */
    default double timeChange(State from, double dClockSeconds) {
        return advanceClock(from, dClockSeconds).dtSeconds();
    }

    /**
     * Proper acceleration at mission time {@code timeSeconds}, m/s^2, signed along the state's
     * {@link State#direction()}; at a leg boundary, the value of the leg that starts there.
     */
    double properAccelerationAt(double timeSeconds);

    /** The null plane this worldline approaches, if it runs away for ever at a non-zero proper acceleration. */
    Optional<Asymptote> asymptote();
}
