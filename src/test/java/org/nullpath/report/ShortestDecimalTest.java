package org.nullpath.report;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.nio.charset.StandardCharsets;
import java.util.SplittableRandom;

import com.fasterxml.jackson.core.io.schubfach.DoubleToDecimal;

import org.junit.jupiter.api.Test;

/**
 * ShortestDecimal against two references outside this project: jackson-core's copy of Raffaello Giulietti's
 * Schubfach (the same algorithm and text layout; general-purpose library from Maven Central), byte for byte,
 * and Double.parseDouble (the Java SE specification's decimal reading), which must give back the same bits.
 * Values: random bit patterns (every exponent, subnormals included), random decimals of few digits (where a
 * shorter text exists), whole numbers, powers of two (the asymmetric rounding interval), the layout's
 * boundaries (1e-3 and 1e7) and the ends of the double range.
 */
class ShortestDecimalTest {
    private static String mine(double v) {
        byte[] b = new byte[ShortestDecimal.MAX_BYTES + 3];
        int n = ShortestDecimal.write(v, b, 3);
        return new String(b, 3, n - 3, StandardCharsets.ISO_8859_1);
    }

    private static void same(double v) {
        if (!Double.isFinite(v)) {
            return; // never written: an output file refuses infinities before formatting
        }
        String s = mine(v);
        assertEquals(DoubleToDecimal.toString(v), s, () -> "bits " + Long.toHexString(Double.doubleToRawLongBits(v)));
        assertEquals(Double.doubleToRawLongBits(v), Double.doubleToRawLongBits(Double.parseDouble(s)), s);
    }

    @Test
    void randomBitPatternsOfEveryExponent() {
        SplittableRandom r = new SplittableRandom(20261202);
        for (int i = 0; i < 3_000_000; i++) {
            double v = Double.longBitsToDouble(r.nextLong());
            if (Double.isFinite(v)) {
                same(v);
            }
        }
    }

    @Test
    void decimalsOfFewDigitsWholeNumbersAndPowersOfTwo() {
        SplittableRandom r = new SplittableRandom(7);
        for (int i = 0; i < 1_000_000; i++) {
            same(r.nextInt(1_000_000) / Math.pow(10, r.nextInt(-20, 25)));
            same(-(double) r.nextLong(1L << 53));
        }
        for (int e = -1074; e <= 1023; e++) {
            double p = Math.scalb(1.0, e);
            same(p);
            same(Math.nextUp(p));
            same(Math.nextDown(p));
            same(3 * p);
        }
    }

    @Test
    void boundariesOfTheLayoutAndOfTheRange() {
        double[] edges = {0.0, -0.0, 1e-3, 1e7, 9_999_999.999999998, 0.001, 1e-4, 1e22, 1e23, 2e23, 5e-324,
            Double.MIN_VALUE, Double.MIN_NORMAL, Double.MAX_VALUE, 1.0, 0.1, 0.3, 2.0 / 3, 1e15, 1e16, 1e17,
            123456789012345678.0, 4.9e-324, 1.7976931348623157e308};
        for (double v : edges) {
            same(v);
            same(-v);
            same(Math.nextUp(v));
            same(Math.nextDown(v));
        }
        // Double.toString's layout (Java SE API specification of Double.toString)
        assertEquals("1.0E7", mine(1e7));
        assertEquals("9999999.0", mine(9_999_999));
        assertEquals("0.001", mine(1e-3));
        assertEquals("9.99E-4", mine(9.99e-4));
        assertEquals("-0.0", mine(-0.0));
        assertEquals("4.9E-324", mine(Double.MIN_VALUE));
        assertEquals("1.7976931348623157E308", mine(Double.MAX_VALUE));
        // the shortest text; Java 17's Double.toString lengthens some values by a digit (JDK-4511638, from memory:
        // 2.0E-3 as 0.0020)
        assertEquals("0.002", mine(2e-3));
        assertEquals("1.0E23", mine(1e23));
    }

    /** Every eight-digit group the writer can be asked for, against the digits by division (exhaustive). */
    @Test
    void everyGroupOfEightDigits() {
        for (int m = 0; m < 100_000_000; m++) {
            long d = ShortestDecimal.digits(m);
            int x = m;
            for (int k = 7; k >= 0; k--) {
                int digit = (int) (d >>> (8 * k)) & 0xFF;
                if (digit != '0' + x % 10) {
                    assertEquals('0' + x % 10, digit, "digit " + k + " of " + m);
                }
                x /= 10;
            }
        }
    }

    /** A writer of a whole number's digits into an array from an index, returning the index after them. */
    private interface WholeWriter {
        int write(long v, byte[] b, int at);
    }

    /** {@code writer}'s digits of {@code v}, written from index 5 of a fresh array, are Long.toString's. */
    private static void assertWritesLongToString(WholeWriter writer, long v) {
        byte[] b = new byte[40];
        int n = writer.write(v, b, 5);
        assertEquals(Long.toString(v), new String(b, 5, n - 5, StandardCharsets.ISO_8859_1));
    }

    /** Whole numbers against Long.toString: every value up to 10^6, each power of ten and its neighbours, random. */
    @Test
    void wholeNumbersAsLongToStringWritesThem() {
        java.util.function.LongConsumer check = v -> assertWritesLongToString(ShortestDecimal::whole, v);
        for (long v = 0; v <= 1_000_000; v++) {
            check.accept(v);
        }
        for (long p = 1; p > 0 && p <= Long.MAX_VALUE / 10 * 10; p *= 10) {
            check.accept(p - 1);
            check.accept(p);
            check.accept(p + 1);
        }
        check.accept(Long.MAX_VALUE);
        SplittableRandom r = new SplittableRandom(11);
        for (int i = 0; i < 1_000_000; i++) {
            check.accept(r.nextLong(Long.MAX_VALUE) >>> r.nextInt(63));
        }
    }

    /** Signed whole numbers against Long.toString, the extremes included (-2^63 has no positive twin). */
    @Test
    void signedWholeNumbersAsLongToStringWritesThem() {
        java.util.function.LongConsumer check = v -> assertWritesLongToString(ShortestDecimal::signedWhole, v);
        for (long v = -100_000; v <= 100_000; v++) {
            check.accept(v);
        }
        for (long v : new long[] {Long.MIN_VALUE, Long.MIN_VALUE + 1, Long.MAX_VALUE, -999_999_999_999_999L,
            -10_000_000_000_000_000L, -(1L << 53)}) {
            check.accept(v);
        }
        SplittableRandom r = new SplittableRandom(12);
        for (int i = 0; i < 1_000_000; i++) {
            check.accept(r.nextLong() >> r.nextInt(63));
        }
    }
}
