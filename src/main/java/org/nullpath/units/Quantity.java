package org.nullpath.units;

/**
 * A parsed quantity: its value in the SI unit of its dimension (for {@link Dimension#GAIN} and
 * {@link Dimension#RATIO} the value is in decibels, since that is how they are given and used).
 *
 * @param si        value in the SI unit of {@code dimension} (dB for gains and ratios)
 * @param dimension what kind of quantity this is
 * @param text      the text it was parsed from, for echoing back
 */
public record Quantity(double si, Dimension dimension, String text) {
    public Quantity {
        if (!Double.isFinite(si)) {
            throw new IllegalArgumentException("quantity must be finite: " + text);
        }
    }

    /** A ratio or gain in decibels as a linear factor. */
    public double linear() {
        if (dimension != Dimension.GAIN && dimension != Dimension.RATIO) {
            throw new IllegalStateException(dimension + " has no decibel form");
        }
        return Math.pow(10.0, si / 10.0);
    }
}
