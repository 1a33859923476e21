package org.nullpath.link;

import org.nullpath.units.Constants;

/** An antenna (or telescope) gain model. */
public sealed interface Antenna {

    /** Linear gain at frequency {@code hz} in the antenna's own frame. */
    double gainAt(double hz);

    /** A fixed gain, given in dBi. */
    record FixedGain(double dbi) implements Antenna {
        @Override
        public double gainAt(double hz) {
            return Math.pow(10, dbi / 10);
        }
    }

    /**
     * A circular aperture: G = e (pi d f / c)^2 at its own frequency (any antenna text, e.g. Balanis,
     * <i>Antenna Theory</i>).
     */
    record Aperture(double diameterMetres, double efficiency) implements Antenna {
        @Override
        public double gainAt(double hz) {
            double x = Math.PI * diameterMetres * hz / Constants.C;
            return efficiency * x * x;
        }
    }
}
