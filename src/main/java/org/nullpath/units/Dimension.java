package org.nullpath.units;

/** The physical kinds of quantity a scenario may give, each converted to one SI unit. */
public enum Dimension {
    TIME("a time", "s"),
    LENGTH("a length", "m"),
    SPEED("a speed", "m/s"),
    ACCELERATION("an acceleration", "m/s^2"),
    FREQUENCY("a frequency", "Hz"),
    FREQUENCY_RATE("a frequency rate", "Hz/s"),
    POWER("a power", "W"),
    GAIN("a gain", "dBi"),
    RATIO("a ratio", "dB"),
    TEMPERATURE("a temperature", "K"),
    DATA_RATE("a data rate", "bit/s"),
    ANGLE("an angle", "rad"),
    MASS("a mass", "kg"),
    FORCE("a force", "N"),
    DIMENSIONLESS("a plain number", "");

    private final String description;
    private final String siSymbol;

    Dimension(String description, String siSymbol) {
        this.description = description;
        this.siSymbol = siSymbol;
    }

    /** Words for messages: "a length". */
    public String description() {
        return description;
    }

    /** The unit every value of this dimension is converted to. */
    public String siSymbol() {
        return siSymbol;
    }
}
