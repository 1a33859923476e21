package org.nullpath.schedule;

/**
 * A planned message, deadline or scan that reaches beyond what double precision can hold (a craft on an
 * open-ended burn past rapidity 700): the scenario asks for something nullpath cannot compute, named by
 * its key in the scenario.
 */
public final class RangeException extends RuntimeException {
    private final String key;

    public RangeException(String key, String message, Throwable cause) {
        super(message, cause);
        this.key = key;
    }

    /** The scenario key at fault, e.g. "links.up (message 12, send clock 3.1e10 s)". */
    public String key() {
        return key;
    }
}
