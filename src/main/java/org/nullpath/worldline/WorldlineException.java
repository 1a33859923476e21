package org.nullpath.worldline;

/** A craft plan that cannot be flown (an unreachable leg end) or cannot be held in doubles. */
public final class WorldlineException extends IllegalArgumentException {
    private final int legIndex;

    public WorldlineException(int legIndex, String message) {
        super(message);
        this.legIndex = legIndex;
    }

    /** The leg at fault (0-based), or -1 when the craft as a whole is at fault. */
    public int legIndex() {
        return legIndex;
    }
}
