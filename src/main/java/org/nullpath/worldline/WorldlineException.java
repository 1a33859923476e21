package org.nullpath.worldline;

/** A craft plan that cannot be flown (an unreachable leg end) or cannot be held in doubles. */
public final class WorldlineException extends IllegalArgumentException {
    private final int legIndex;
    private final boolean aboutEnd;

    public WorldlineException(int legIndex, String message) {
        this(legIndex, false, message);
    }

    private WorldlineException(int legIndex, boolean aboutEnd, String message) {
        super(message);
        this.legIndex = legIndex;
        this.aboutEnd = aboutEnd;
    }

    /** A leg whose end condition is never met (or is met only beyond the leg's own limit). */
    public static WorldlineException aboutEnd(int legIndex, String message) {
        return new WorldlineException(legIndex, true, message);
    }

    /** The leg at fault (0-based), or -1 when the craft as a whole is at fault. */
    public int legIndex() {
        return legIndex;
    }

    /** Whether the fault lies in the leg's end condition rather than in the rest of the leg. */
    public boolean aboutEnd() {
        return aboutEnd;
    }
}
