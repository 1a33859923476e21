package org.nullpath.report;

/** How numbers appear in output files: full precision (parses back to the same double), empty when absent. */
public final class Cells {
    private Cells() {
    }

    /** The shortest decimal text that parses back to {@code v}; empty for NaN. */
    public static String num(double v) {
        if (Double.isNaN(v)) {
            return "";
        }
        if (v == Math.rint(v) && Math.abs(v) < 1e15) {
            return Long.toString((long) v);
        }
        return Double.toString(v);
    }

    public static String bool(boolean b) {
        return b ? "true" : "false";
    }
}
