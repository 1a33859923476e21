package org.nullpath.worldline;

/**
 * One leg of a straight-line craft, as planned: a burn at signed constant proper acceleration or a
 * coast, each with a rule for where it ends.
 */
public sealed interface LegSpec {

    /** Proper acceleration along the heading, m/s^2 (0 for a coast). */
    double accelerationMetresPerSecond2();

    /** How the leg ends. */
    LegEnd end();

    /** A constant proper acceleration burn ({@code acceleration} signed along the heading, not 0). */
    record Burn(double accelerationMetresPerSecond2, LegEnd end) implements LegSpec {
        public Burn {
            if (!Double.isFinite(accelerationMetresPerSecond2) || accelerationMetresPerSecond2 == 0) {
                throw new IllegalArgumentException("a burn needs a finite non-zero acceleration");
            }
        }
    }

    /** Unpowered flight. */
    record Coast(LegEnd end) implements LegSpec {
        @Override
        public double accelerationMetresPerSecond2() {
            return 0;
        }
    }

    /** Where a leg ends. */
    sealed interface LegEnd {
    }

    /** After this much craft-clock time. */
    record ClockDuration(double seconds) implements LegEnd {
    }

    /** After this much mission time. */
    record MissionDuration(double seconds) implements LegEnd {
    }

    /** When the speed, signed along the heading, reaches {@code metresPerSecond}. */
    record UntilSpeed(double metresPerSecond) implements LegEnd {
    }

    /** When the displacement along the heading during this leg first reaches {@code metres}. */
    record UntilDistance(double metres) implements LegEnd {
    }

    /** Never: the leg lasts for ever (last leg only). */
    record Forever() implements LegEnd {
    }
}
