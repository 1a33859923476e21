package org.nullpath.report;

import java.lang.invoke.MethodHandles;
import java.lang.invoke.VarHandle;
import java.nio.ByteOrder;
import java.nio.charset.StandardCharsets;

/**
 * The shortest decimal that parses back to a double, written as ASCII bytes straight into a caller's array:
 * Raffaello Giulietti's Schubfach algorithm ("The Schubfach way to render doubles", 2020; the algorithm of
 * {@code Double.toString} from Java 19 on), in the text layout of {@code Double.toString}: plain notation
 * ({@code 123.45}, {@code 0.00123}) for magnitudes in [1e-3, 1e7), otherwise one digit, a point and an
 * exponent ({@code 1.2345E7}, {@code 1.0E-5}); at least one digit after the point.
 *
 * <p>Numbers are the bulk of every output file, and this writes them without a String or any other object
 * per number. {@code ShortestDecimalTest} holds it, byte for byte, to the same algorithm as jackson-core
 * ships it, and every value to {@code Double.parseDouble}. The 126-bit powers of ten are {@link SchubfachTable}'s.
 */
final class ShortestDecimal {
    /** Most bytes one double takes: sign, 17 digits, point, 'E', exponent sign and three digits. */
    static final int MAX_BYTES = 24;

    private static final int P = 53; // the precision of a double, in bits
    private static final int Q_MIN = -1074; // the least binary exponent of a subnormal
    private static final long C_MIN = 1L << (P - 1);
    private static final int BQ_MASK = (1 << 11) - 1;
    private static final long T_MASK = (1L << (P - 1)) - 1;
    private static final long C_TINY = 3; // below this, a subnormal's significand takes one more digit
    private static final int K_MIN = SchubfachTable.K_MIN;
    private static final int H = 17; // digits of the decimal significand kept
    private static final long MASK_63 = (1L << 63) - 1;

    /** Eight bytes at once into a byte array, the first byte lowest. */
    private static final VarHandle LONG_LE =
            MethodHandles.byteArrayViewVarHandle(long[].class, ByteOrder.LITTLE_ENDIAN);
    /** '0' in every byte. */
    private static final long ZEROES = 0x3030_3030_3030_3030L;

    private static final long[] POW10 = new long[H + 1];
    /** g1(k) and g0(k) for k = K_MIN..K_MAX, at 2 (k - K_MIN) and 2 (k - K_MIN) + 1. */
    private static final long[] G = SchubfachTable.G;

    static {
        long p = 1;
        for (int i = 0; i <= H; i++) {
            POW10[i] = p;
            p *= 10;
        }
    }

    private ShortestDecimal() {
    }

    /**
     * Writes {@code v} (finite) into {@code b} from {@code at} and returns the index after the last byte;
     * {@code b} must have {@link #MAX_BYTES} free from {@code at}.
     */
    static int write(double v, byte[] b, int at) {
        long bits = Double.doubleToRawLongBits(v);
        long t = bits & T_MASK;
        int bq = (int) (bits >>> (P - 1)) & BQ_MASK;
        if (bq == BQ_MASK) {
            throw new IllegalArgumentException("not a finite number: " + v);
        }
        int i = at;
        if (bits < 0) {
            b[i++] = '-';
        }
        if (bq != 0) { // normal
            int mq = -Q_MIN + 1 - bq;
            long c = C_MIN | t;
            if (0 < mq && mq < P) { // a whole number: its digits as they are
                long f = c >> mq;
                if (f << mq == c) {
                    return chars(f, 0, b, i);
                }
            }
            return decimal(-mq, c, 0, b, i);
        }
        if (t != 0) { // subnormal
            return t < C_TINY ? decimal(Q_MIN, 10 * t, -1, b, i) : decimal(Q_MIN, t, 0, b, i);
        }
        // zero: "0.0" or "-0.0"
        b[i++] = '0';
        b[i++] = '.';
        b[i++] = '0';
        return i;
    }

    /** The shortest decimal of c 2^q, times 10^-dk. */
    private static int decimal(int q, long c, int dk, byte[] b, int at) {
        int out = (int) c & 0x1;
        long cb = c << 2;
        long cbr = cb + 2;
        long cbl;
        int k;
        if (c != C_MIN || q == Q_MIN) {
            cbl = cb - 2;
            k = flog10pow2(q);
        } else { // the rounding interval is asymmetric at a power of two
            cbl = cb - 1;
            k = flog10threeQuartersPow2(q);
        }
        int h = q + flog2pow10(-k) + 2;
        long g1 = G[2 * (k - K_MIN)];
        long g0 = G[2 * (k - K_MIN) + 1];
        long vb = rop(g1, g0, cb << h);
        long vbl = rop(g1, g0, cbl << h);
        long vbr = rop(g1, g0, cbr << h);
        long s = vb >> 2;
        if (s >= 100) {
            long sp10 = 10 * Math.multiplyHigh(s, 115_292_150_460_684_698L << 4); // 10 floor(s / 10)
            long tp10 = sp10 + 10;
            boolean upin = vbl + out <= sp10 << 2;
            boolean wpin = (tp10 << 2) + out <= vbr;
            if (upin != wpin) {
                return chars(upin ? sp10 : tp10, k, b, at);
            }
        }
        long tt = s + 1;
        boolean uin = vbl + out <= s << 2;
        boolean win = (tt << 2) + out <= vbr;
        if (uin != win) {
            return chars(uin ? s : tt, k + dk, b, at);
        }
        long cmp = vb - (s + tt << 1);
        return chars(cmp < 0 || cmp == 0 && (s & 0x1) == 0 ? s : tt, k + dk, b, at);
    }

    /** Round to odd of g cp 2^-127 (g = g1 2^63 + g0). */
    private static long rop(long g1, long g0, long cp) {
        long x1 = Math.multiplyHigh(g0, cp);
        long y0 = g1 * cp;
        long y1 = Math.multiplyHigh(g1, cp);
        long z = (y0 >>> 1) + x1;
        long vbp = y1 + (z >>> 63);
        return vbp | (z & MASK_63) + MASK_63 >>> 63;
    }

    /** The digits of f 10^e in Double.toString's layout. */
    private static int chars(long f, int e, byte[] b, int at) {
        int len = flog10pow2(Long.SIZE - Long.numberOfLeadingZeros(f));
        if (f >= POW10[len]) {
            len += 1;
        }
        f *= POW10[H - len]; // 17 digits
        e += len;
        long hm = Math.multiplyHigh(f, 193_428_131_138_340_668L) >>> 20; // f / 10^8
        int l = (int) (f - 100_000_000L * hm);
        int h = (int) (hm * 1_441_151_881L >>> 57); // hm / 10^8
        int m = (int) (hm - 100_000_000 * h);
        int i = at;
        if (0 < e && e <= 7) { // plain: ddd.ddd
            b[i++] = (byte) ('0' + h);
            // the eight digits of m with the point after the first e - 1 of them: nine bytes
            long d = digits(m);
            int k = 8 * (e - 1);
            long before = (1L << k) - 1;
            LONG_LE.set(b, i, d & before | (long) '.' << k | (d & ~before) << 8);
            b[i + 8] = (byte) (d >>> 56);
            return lowDigits(l, b, i + 9);
        }
        if (-3 < e && e <= 0) { // plain: 0.00ddd
            b[i++] = '0';
            b[i++] = '.';
            for (; e < 0; ++e) {
                b[i++] = '0';
            }
            b[i++] = (byte) ('0' + h);
            i = eightDigits(m, b, i);
            return lowDigits(l, b, i);
        }
        b[i++] = (byte) ('0' + h); // d.dddEx
        b[i++] = '.';
        i = eightDigits(m, b, i);
        i = lowDigits(l, b, i);
        return exponent(e - 1, b, i);
    }

    private static int lowDigits(int l, byte[] b, int i) {
        if (l != 0) { // eight digits, less their trailing zeroes (the last digits are the highest bytes)
            long d = digits(l);
            LONG_LE.set(b, i, d);
            return i + 8 - (Long.numberOfLeadingZeros(d - ZEROES) >>> 3);
        }
        // no trailing zeroes, but one digit after the point
        while (b[i - 1] == '0') {
            i--;
        }
        if (b[i - 1] == '.') {
            i++;
        }
        return i;
    }

    private static int eightDigits(int m, byte[] b, int i) {
        LONG_LE.set(b, i, digits(m));
        return i + 8;
    }

    /**
     * Any whole number's digits from {@code at}, a minus sign first when it is negative; returns the index after
     * the last. {@code b} must have 25 bytes free from {@code at} (17 for |v| < 10^16).
     */
    static int signedWhole(long v, byte[] b, int at) {
        if (v == Long.MIN_VALUE) { // -v does not exist
            byte[] s = Long.toString(v).getBytes(StandardCharsets.US_ASCII);
            System.arraycopy(s, 0, b, at, s.length);
            return at + s.length;
        }
        if (v < 0) {
            b[at++] = '-';
            return whole(-v, b, at);
        }
        return whole(v, b, at);
    }

    /**
     * The digits of a whole number {@code v >= 0} from {@code at}, without leading zeroes; returns the index
     * after the last. {@code b} must have 24 bytes free from {@code at} (16 for {@code v < 10^16}: every group
     * is stored as eight bytes, whatever its digits).
     */
    static int whole(long v, byte[] b, int at) {
        if (v >= 10_000_000_000_000_000L) {
            int top = (int) (v / 10_000_000_000_000_000L); // at most 922
            int i = whole(top, b, at);
            long rest = v - 10_000_000_000_000_000L * top;
            long hi = rest / 100_000_000;
            LONG_LE.set(b, i, digits((int) hi));
            LONG_LE.set(b, i + 8, digits((int) (rest - 100_000_000 * hi)));
            return i + 16;
        }
        if (v >= 100_000_000) {
            long hi = v / 100_000_000;
            int i = whole(hi, b, at);
            LONG_LE.set(b, i, digits((int) (v - 100_000_000 * hi)));
            return i + 8;
        }
        if (v == 0) {
            b[at] = '0';
            return at + 1;
        }
        long d = digits((int) v);
        int leading = Long.numberOfTrailingZeros(d - ZEROES) >>> 3; // the first digits are the lowest bytes
        LONG_LE.set(b, at, d >>> 8 * leading);
        return at + 8 - leading;
    }

    /**
     * The eight decimal digits of {@code m} (0 <= m < 10^8, leading zeroes kept) as ASCII bytes in one long,
     * the first digit in the lowest byte: split into two halves of four digits, each half into two pairs, each
     * pair into two digits, every lane at once (the divisions by 100 and 10 as multiplications, exact for
     * these ranges: 10486 / 2^20 for x <= 9999, 103 / 2^10 for x <= 99).
     */
    static long digits(int m) {
        long hi = m / 10_000;
        long v = hi | (m - 10_000 * hi) << 32; // [first four | last four], 32-bit lanes
        long q = (v * 10_486 >>> 20) & 0x0000_007F_0000_007FL;
        v = q | (v - 100 * q) << 16; // 16-bit lanes of two digits
        long t = (v * 103 >>> 10) & 0x000F_000F_000F_000FL;
        v = t | (v - 10 * t) << 8; // one digit a byte
        return v + ZEROES;
    }

    private static int exponent(int e, byte[] b, int i) {
        b[i++] = 'E';
        if (e < 0) {
            b[i++] = '-';
            e = -e;
        }
        if (e < 10) {
            b[i++] = (byte) ('0' + e);
            return i;
        }
        int d;
        if (e >= 100) {
            d = e * 1_311 >>> 17; // e / 100
            b[i++] = (byte) ('0' + d);
            e -= 100 * d;
        }
        d = e * 103 >>> 10; // e / 10
        b[i++] = (byte) ('0' + d);
        b[i++] = (byte) ('0' + e - 10 * d);
        return i;
    }

    /** floor(e log10 2), for |e| <= 5456721. */
    private static int flog10pow2(int e) {
        return (int) (e * 661_971_961_083L >> 41);
    }

    /** floor(e log10 (3/4 2)), for |e| <= 5456721. */
    private static int flog10threeQuartersPow2(int e) {
        return (int) (e * 661_971_961_083L + -274_743_187_321L >> 41);
    }

    /** floor(e log2 10), for |e| <= 1838394. */
    private static int flog2pow10(int e) {
        return (int) (e * 913_124_641_741L >> 38);
    }
}
