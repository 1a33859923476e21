package org.nullpath.schedule;

/** Smallest and largest of values that may not exist (NaN): a NaN on either side is skipped. */
final class Extremes {
    private Extremes() {
    }

    /** The smaller of {@code a} and {@code b}, skipping NaN on either side; NaN when both are. */
    static double min(double a, double b) {
        if (Double.isNaN(b)) {
            return a;
        }
        return Double.isNaN(a) ? b : Math.min(a, b);
    }

    /** The larger of {@code a} and {@code b}, skipping NaN on either side; NaN when both are. */
    static double max(double a, double b) {
        if (Double.isNaN(b)) {
            return a;
        }
        return Double.isNaN(a) ? b : Math.max(a, b);
    }
}
