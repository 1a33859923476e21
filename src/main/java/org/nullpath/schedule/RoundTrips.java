package org.nullpath.schedule;

import java.util.Arrays;

/**
 * The round-trip times of an exchange plan, for its smallest, middle and largest. The median is exact: the
 * completed round trips are kept (8 bytes each) up to {@value #KEPT}; past that only the extremes are
 * known and the median is NaN (the exchange's CSV holds every round trip).
 */
final class RoundTrips {
    /** Most round trips kept for the median. */
    static final int KEPT = 1 << 22;

    private double[] values = new double[16];
    private int n;
    private long seen;
    private double min = Double.NaN;
    private double max = Double.NaN;

    void add(double roundTrip) {
        seen++;
        min = Extremes.min(min, roundTrip);
        max = Extremes.max(max, roundTrip);
        if (seen > KEPT) {
            return;
        }
        if (n == values.length) {
            values = Arrays.copyOf(values, 2 * n);
        }
        values[n++] = roundTrip;
    }

    double min() {
        return min;
    }

    double max() {
        return max;
    }

    /** The median (the mean of the middle two for an even count); NaN when none, or more than {@link #KEPT}. */
    double median() {
        if (n == 0 || seen > KEPT) {
            return Double.NaN;
        }
        double[] v = Arrays.copyOf(values, n);
        Arrays.sort(v);
        return n % 2 == 1 ? v[n / 2] : v[n / 2 - 1] + (v[n / 2] - v[n / 2 - 1]) / 2;
    }
}
