package org.nullpath.worldline;

/**
 * One piece of a straight-line craft's worldline: its motion, the state its offsets are taken from,
 * and its bounds (lo or hi null where it runs to infinity).
 */
record Segment(Piece piece, LineState ref, LineState lo, LineState hi) {
}
