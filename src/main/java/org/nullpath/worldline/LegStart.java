package org.nullpath.worldline;

import org.nullpath.spacetime.Vec3;

/**
 * Where a leg starts: its number, the craft's state on its line then, and the line itself.
 *
 * @param index   0-based leg number in the scenario
 * @param state   the craft's line state at the leg start
 * @param origin  the craft's start position (where {@code along} is 0)
 * @param heading the unit heading of the flight line
 */
public record LegStart(int index, LineState state, Vec3 origin, Vec3 heading) {
}
