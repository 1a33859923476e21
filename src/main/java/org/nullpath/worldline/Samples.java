package org.nullpath.worldline;

import java.util.Arrays;

/** Tabulated functions. */
final class Samples {
    private Samples() {
    }

    /**
     * Linear interpolation of {@code ys} over strictly increasing {@code xs} at {@code x}, held at the
     * first and last values outside the table; a sample's own value at a sample.
     */
    static double linear(double[] xs, double[] ys, double x) {
        int n = xs.length;
        if (x <= xs[0]) {
            return ys[0];
        }
        if (x >= xs[n - 1]) {
            return ys[n - 1];
        }
        int i = Arrays.binarySearch(xs, x);
        if (i >= 0) {
            return ys[i];
        }
        int hi = -i - 1;
        int lo = hi - 1;
        double w = (x - xs[lo]) / (xs[hi] - xs[lo]);
        return ys[lo] + w * (ys[hi] - ys[lo]);
    }
}
