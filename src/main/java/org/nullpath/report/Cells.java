package org.nullpath.report;

import java.nio.charset.StandardCharsets;

/** How numbers appear in output files: full precision (parses back to the same double), empty when absent. */
public final class Cells {
    private Cells() {
    }

    /**
     * The shortest decimal text that parses back to {@code v} exactly (Raffaello Giulietti's Schubfach
     * algorithm, {@link ShortestDecimal}; the same text as Double.toString from Java 19 on, which Java 17's
     * sometimes lengthens by a digit); whole numbers below 1e15 without a fraction; empty for NaN (a value that
     * does not exist). An infinite value is a bug upstream and is refused rather than written.
     */
    public static String num(double v) {
        if (Double.isNaN(v)) {
            return "";
        }
        if (Double.isInfinite(v)) {
            throw new IllegalStateException("an infinite value reached an output file");
        }
        byte[] b = new byte[ShortestDecimal.MAX_BYTES];
        return new String(b, 0, num(v, b, 0), StandardCharsets.ISO_8859_1);
    }

    /**
     * The text of {@link #num(double)} for a finite {@code v}, as ASCII bytes into {@code b} from {@code at}
     * ({@link ShortestDecimal#MAX_BYTES} free); returns the index after the last byte. The one place both the
     * text cells and the byte rows ({@link RowBytes}) take a number's form from.
     */
    static int num(double v, byte[] b, int at) {
        return whole(v) ? ShortestDecimal.signedWhole((long) v, b, at) : ShortestDecimal.write(v, b, at);
    }

    /** Whether {@code v} is written as an integer: a whole number below 1e15 in magnitude, not -0. */
    static boolean whole(double v) {
        return v == Math.rint(v) && Math.abs(v) < 1e15 && !(v == 0 && 1 / v < 0);
    }

    /**
     * The calendar instant {@code seconds} after {@code epoch} (ISO-8601, to the nanosecond), or empty
     * for NaN and for an instant beyond the calendar's years (about a billion years either way).
     */
    public static String utc(java.time.Instant epoch, double seconds) {
        if (Double.isNaN(seconds)) {
            return "";
        }
        double whole = Math.floor(seconds);
        long nanos = Math.round((seconds - whole) * 1e9);
        if (!(Math.abs(whole) < 3.2e16)) {
            return ""; // beyond the calendar's years (about +-1e9 yr): no calendar instant
        }
        try {
            return epoch.plusSeconds((long) whole).plusNanos(nanos).toString();
        } catch (java.time.DateTimeException | ArithmeticException e) {
            return ""; // beyond the calendar's years
        }
    }

    /** Text for a CSV cell, behind an apostrophe when a spreadsheet would read it as a formula. */
    public static String text(String s) {
        if (!s.isEmpty() && "=+-@\t\r".indexOf(s.charAt(0)) >= 0) {
            return "'" + s;
        }
        return s;
    }

    public static String bool(boolean b) {
        return b ? "true" : "false";
    }
}
