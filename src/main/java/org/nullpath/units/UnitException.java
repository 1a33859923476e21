package org.nullpath.units;

/** A quantity text that cannot be read: the message says what was expected and what was found. */
public final class UnitException extends IllegalArgumentException {
    public UnitException(String message) {
        super(message);
    }
}
