package org.nullpath.worldline;

/**
 * A leg as flown: where it starts and ends on the craft's line.
 *
 * @param index        0-based leg number in the scenario
 * @param spec         the leg as planned
 * @param start        the state at its start
 * @param end          the state at its end; null for an open-ended leg
 * @param acceleration the proper acceleration over the leg as flown
 */
public record LegSpan(int index, LegSpec spec, LineState start, LineState end, AccelerationRange acceleration) {
    public boolean openEnded() {
        return end == null;
    }
}
