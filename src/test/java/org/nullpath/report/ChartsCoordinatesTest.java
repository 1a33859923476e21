package org.nullpath.report;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.math.BigDecimal;
import java.math.RoundingMode;
import java.util.Locale;
import java.util.SplittableRandom;

import org.junit.jupiter.api.Test;

/**
 * The charts' coordinates and transforms, written without the JDK's Formatter, against the Formatter itself
 * (Java SE's {@code String.format("%.2f")} and {@code "%.4f"}, the text they replaced), trimmed the same way.
 * Values: the chart range of pixels and far beyond, ties at the last kept decimal (0.125, 2.675, 1.005: the
 * Formatter rounds the decimal digits of Double.toString half up), negatives, signed zeroes, tiny values and
 * non-finite ones.
 */
class ChartsCoordinatesTest {
    /** The Formatter's text, trimmed as the charts trim it. */
    private static String formatter(double v, int places) {
        return Charts.trim(String.format(Locale.ROOT, "%." + places + "f", v));
    }

    private static void same(double v) {
        assertEquals(formatter(v, 2), Charts.coordinate(v), () -> "coordinate " + v);
        assertEquals(formatter(v, 4), Charts.transform(v), () -> "transform " + v);
    }

    @Test
    void tiesSignsAndEdges() {
        double[] values = {0.0, -0.0, 0.125, -0.125, 2.675, 1.005, 0.005, 0.015, 0.00005, 0.00015, 1e-7, -1e-7,
            0.995, 9.995, 99.995, 999.9999, 1e7, 1.5e300, -1.5e300, Double.MIN_VALUE, -Double.MIN_VALUE,
            Double.MAX_VALUE, Double.NaN, Double.POSITIVE_INFINITY, Double.NEGATIVE_INFINITY, 760.5, 379.995};
        for (double v : values) {
            same(v);
        }
    }

    @Test
    void randomPixelsAndRandomBits() {
        SplittableRandom r = new SplittableRandom(42);
        for (int i = 0; i < 200_000; i++) {
            same(r.nextDouble(-100, 1000)); // a chart's pixels
            same(Math.round(r.nextDouble(-1e4, 1e4) * 1000) / 1000.0 + 0.0005 * r.nextInt(-1, 2)); // near ties
            same(Double.longBitsToDouble(r.nextLong())); // anything at all
        }
    }

    /** The text rounding under the coordinates against java.math.BigDecimal's HALF_UP, places 0 to 6. */
    @Test
    void textRoundingIsBigDecimalsHalfUp() {
        String[] edges = {"0.0", "0.5", "0.05", "0.005", "9.995", "99.995", "0.995", "9.5E-3", "5.0E-3", "9.9999E-5",
            "1.0E-5", "4.9E-324", "9.999999999999999E22", "1.7976931348623157E308", "999.9999", "1.0E7", "2.675"};
        for (String s : edges) {
            for (int places = 0; places <= 6; places++) {
                assertEquals(new BigDecimal(s).setScale(places, RoundingMode.HALF_UP).toPlainString(),
                        Charts.halfUp(s, places), s + " to " + places);
            }
        }
        SplittableRandom r = new SplittableRandom(7);
        for (int i = 0; i < 100_000; i++) {
            double v = Math.abs(i % 2 == 0 ? Double.longBitsToDouble(r.nextLong()) : r.nextDouble(0, 2000));
            if (Double.isFinite(v)) {
                String s = Double.toString(v);
                int places = r.nextInt(0, 7);
                assertEquals(new BigDecimal(s).setScale(places, RoundingMode.HALF_UP).toPlainString(),
                        Charts.halfUp(s, places), s + " to " + places);
            }
        }
    }
}
