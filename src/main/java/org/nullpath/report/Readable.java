package org.nullpath.report;

import java.util.Locale;

import org.nullpath.units.Constants;

/** Short human-readable forms of times for terminal and report text (never for data files). */
public final class Readable {
    private Readable() {
    }

    /** A duration or clock reading in the largest convenient unit, 4 significant digits: "1.234 yr". */
    public static String time(double seconds) {
        if (Double.isNaN(seconds)) {
            return "-";
        }
        double a = Math.abs(seconds);
        if (a >= Constants.JULIAN_YEAR) {
            return fmt(seconds / Constants.JULIAN_YEAR) + " yr";
        }
        if (a >= Constants.DAY) {
            return fmt(seconds / Constants.DAY) + " d";
        }
        if (a >= 3600) {
            return fmt(seconds / 3600) + " h";
        }
        if (a >= 60 || a == 0) {
            return a == 0 ? "0 s" : fmt(seconds / 60) + " min";
        }
        return fmt(seconds) + " s";
    }

    /** A plain number to 6 significant digits. */
    public static String number(double v) {
        if (Double.isNaN(v)) {
            return "-";
        }
        return String.format(Locale.ROOT, "%.6g", v);
    }

    private static String fmt(double v) {
        return String.format(Locale.ROOT, "%.4g", v);
    }
}
