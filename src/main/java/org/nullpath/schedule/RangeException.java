package org.nullpath.schedule;

/**
 * A planned message, deadline or scan that reaches beyond what double precision can hold (a craft on an
 * open-ended burn past rapidity 700, or a frequency, rate or power past about 1.8e308): the scenario asks
 * for something nullpath cannot compute, named by its key in the scenario. {@code check} and {@code plan}
 * both compute every message, so both report it.
 */
public final class RangeException extends RuntimeException {
    /** What to do when a send, deadline or scan lies too far out on a craft's flight. */
    public static final String FAR_STATES = "a state beyond what double precision holds: plan sends, deadlines and"
            + " scans nearer the mission's start";
    /** What to do when a frequency, rate or power overflows. */
    public static final String EXTREME_VALUES = "the scenario's carrier, acceleration, speeds or link terms lie far"
            + " outside what any link can reach; check their units";

    private final String key;
    private final String hint;

    /** A state too far out on a craft's flight ({@link #FAR_STATES}). */
    public RangeException(String key, String message, Throwable cause) {
        this(key, message, FAR_STATES, cause);
    }

    public RangeException(String key, String message, String hint, Throwable cause) {
        super(message, cause);
        this.key = key;
        this.hint = hint;
    }

    /** The scenario key path at fault, such as {@code links.up} or {@code cutoffs[0].arrive-by}. */
    public String key() {
        return key;
    }

    /** What the user can do, in a few words. */
    public String hint() {
        return hint;
    }
}
