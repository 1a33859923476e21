package org.nullpath.worldline;

/**
 * A quantity that changes along a straight-line craft's worldline, measured as an offset from a state:
 * the craft's clock, mission time, distance along the heading, and the null coordinates
 * {@code U = c t - along} and {@code V = c t + along} (a light signal along +heading keeps U, one
 * against it keeps V).
 */
enum Measure {
    /** The craft's clock (proper time), s. */
    CLOCK,
    /** Mission time, s. */
    TIME,
    /** Distance along the heading, m. */
    DISTANCE,
    /** {@code U = c t - along}, m. */
    U,
    /** {@code V = c t + along}, m. */
    V
}
