package org.nullpath.reference;

import java.math.BigDecimal;
import java.math.BigInteger;
import java.math.MathContext;
import java.math.RoundingMode;
import java.util.Map;
import java.util.concurrent.ConcurrentHashMap;
import java.util.function.Supplier;

/**
 * Arbitrary-precision elementary functions for the test-only reference implementation.
 *
 * <p><b>Method choice.</b> Everything here is plain {@link java.math.BigDecimal} with functions
 * written for this package (no Hipparchus {@code Dfp}; Dfp is used only by the self-test as an
 * outside cross-check of these functions):
 * <ul>
 *   <li>{@code exp}: reduction by multiples of ln 2, then by 2^-j (j ~ sqrt of the digits), Taylor series
 *       in binary fixed point (BigInteger), j squarings;</li>
 *   <li>{@code expm1}: for |x| &lt;= 2^-10 the series x (1 + x/2! + x^2/3! + ...) in fixed point, which keeps
 *       the relative precision for tiny arguments; otherwise exp(x) - 1 with extra guard digits;</li>
 *   <li>{@code ln}/{@code log1p}: reduction to [1/sqrt 2, sqrt 2] by powers of two, then
 *       ln m = 2 atanh((m - 1)/(m + 1)) by its power series; ln 2 = 2 atanh(1/3), cached per precision;</li>
 *   <li>{@code sqrt}: Newton (Heron) iteration from a double-precision seed;</li>
 *   <li>{@code sinh, cosh, tanh, asinh, atanh}: from the above in cancellation-free forms.</li>
 * </ul>
 *
 * <p><b>Precision.</b> The working precision is a thread-local {@link MathContext}, by default
 * {@value #DEFAULT_DIGITS} significant digits; {@link #withDigits(int, Supplier)} runs a block at another
 * precision (used by the self-test to re-solve a problem at a higher precision and count the digits that
 * agree). Each function works internally with guard digits and rounds its result to the current context.
 *
 * <p>Inputs from double-precision code are converted exactly with {@code new BigDecimal(double)}, see
 * {@link #bd(double)}; the reference therefore sees exactly the same inputs as the double code.
 */
public final class RefMath {

    /** Default working precision in significant decimal digits. */
    public static final int DEFAULT_DIGITS = 100;

    /** Speed of light in vacuum, m/s, exact (SI Brochure, 9th ed., 2019). */
    public static final BigDecimal C = BigDecimal.valueOf(299_792_458L);
    /** c^2, m^2/s^2, exact. */
    public static final BigDecimal C2 = C.multiply(C);
    /** Standard gravity, m/s^2, exact (3rd CGPM, 1901). */
    public static final BigDecimal G0 = new BigDecimal("9.80665");
    /** Julian year, s, exact (IAU: 365.25 d of 86 400 s). */
    public static final BigDecimal JULIAN_YEAR = BigDecimal.valueOf(31_557_600L);
    /** Light year, m, exact (IAU: c times one Julian year). */
    public static final BigDecimal LIGHT_YEAR = C.multiply(JULIAN_YEAR);

    private static final BigDecimal TWO = BigDecimal.valueOf(2);
    private static final BigDecimal HALF = new BigDecimal("0.5");
    private static final int GUARD = 12;
    /** Largest |x| accepted by exp (e^100000 ~ 1e43429: far beyond any physical rapidity here). */
    private static final BigDecimal EXP_LIMIT = BigDecimal.valueOf(100_000);
    /** 2^-10: below it expm1 sums its own series. */
    private static final BigDecimal EXPM1_SERIES_LIMIT = new BigDecimal("0.0009765625");

    private static final ThreadLocal<MathContext> CONTEXT =
            ThreadLocal.withInitial(() -> new MathContext(DEFAULT_DIGITS, RoundingMode.HALF_EVEN));
    private static final Map<Integer, BigDecimal> LN2_CACHE = new ConcurrentHashMap<>();

    private RefMath() {
    }

    // ------------------------------------------------------------------ precision control

    /** The current working precision (thread-local). */
    public static MathContext mc() {
        return CONTEXT.get();
    }

    /** The current working precision in digits. */
    public static int digits() {
        return CONTEXT.get().getPrecision();
    }

    /**
     * Runs {@code body} with the working precision set to {@code digits} significant digits (on this thread),
     * then restores the previous precision. Worldlines built inside the block carry that precision in their
     * precomputed leg boundaries, so build them inside the block too.
     */
    public static <T> T withDigits(int digits, Supplier<T> body) {
        if (digits < 30) {
            throw new IllegalArgumentException("at least 30 digits, got " + digits);
        }
        MathContext previous = CONTEXT.get();
        CONTEXT.set(new MathContext(digits, RoundingMode.HALF_EVEN));
        try {
            return body.get();
        } finally {
            CONTEXT.set(previous);
        }
    }

    // ------------------------------------------------------------------ conversions

    /** Exact conversion of a finite double. */
    public static BigDecimal bd(double x) {
        if (!Double.isFinite(x)) {
            throw new IllegalArgumentException("not a finite number: " + x);
        }
        return new BigDecimal(x);
    }

    /** Exact conversion of a 3-vector of finite doubles. */
    public static BigDecimal[] bd(double[] v) {
        if (v == null || v.length != 3) {
            throw new IllegalArgumentException("a 3-vector is required");
        }
        return new BigDecimal[] {bd(v[0]), bd(v[1]), bd(v[2])};
    }

    /** Nearest double. */
    public static double d(BigDecimal x) {
        return x.doubleValue();
    }

    /** Nearest doubles of a vector. */
    public static double[] d(BigDecimal[] v) {
        double[] out = new double[v.length];
        for (int i = 0; i < v.length; i++) {
            out[i] = v[i].doubleValue();
        }
        return out;
    }

    /** 10^-n. */
    public static BigDecimal tenToMinus(int n) {
        return BigDecimal.ONE.movePointLeft(n);
    }

    /**
     * Number of leading decimal digits in which {@code a} agrees with {@code b}: -log10(|a - b| / |b|),
     * capped at the current precision; for b = 0, -log10|a|.
     */
    public static double agreeingDigits(BigDecimal a, BigDecimal b) {
        BigDecimal diff = a.subtract(b).abs();
        if (diff.signum() == 0) {
            return digits();
        }
        BigDecimal rel = b.signum() == 0 ? diff : diff.divide(b.abs(), new MathContext(20));
        return Math.min(digits(), -log10Approx(rel));
    }

    /** Approximate log10 of a positive number of any magnitude (double accuracy). */
    public static double log10Approx(BigDecimal x) {
        if (x.signum() <= 0) {
            throw new ArithmeticException("log10 of non-positive number");
        }
        int e = x.precision() - x.scale() - 1;
        double mant = x.movePointLeft(e).doubleValue();
        return e + Math.log10(mant);
    }

    // ------------------------------------------------------------------ exp family

    public static BigDecimal exp(BigDecimal x) {
        return exp(x, mc());
    }

    public static BigDecimal exp(BigDecimal x, MathContext mc) {
        if (x.signum() == 0) {
            return BigDecimal.ONE;
        }
        if (x.abs().compareTo(EXP_LIMIT) > 0) {
            throw new ArithmeticException("exp argument out of range: " + x.round(new MathContext(6)));
        }
        long k = Math.round(x.doubleValue() / Math.log(2.0));
        int kDigits = Long.toString(Math.abs(k)).length();
        MathContext w = new MathContext(mc.getPrecision() + GUARD + kDigits, RoundingMode.HALF_EVEN);
        BigDecimal r = k == 0 ? x : x.subtract(ln2(w).multiply(BigDecimal.valueOf(k)), w);
        BigDecimal er = expReduced(r, w);
        if (k != 0) {
            er = er.multiply(TWO.pow((int) k, w), w);
        }
        return er.round(mc);
    }

    /** Bits of binary fixed point equivalent to {@code digits} decimal digits, plus {@code extra}. */
    private static int bitsFor(int digits, int extra) {
        return (int) Math.ceil(digits * 3.3219280948873626) + extra;
    }

    /** round(x 2^bits) as an integer. */
    private static BigInteger toFixed(BigDecimal x, int bits) {
        return x.multiply(new BigDecimal(BigInteger.ONE.shiftLeft(bits))).setScale(0, RoundingMode.HALF_EVEN)
                .unscaledValue();
    }

    /** v 2^-bits rounded to mc. */
    private static BigDecimal fromFixed(BigInteger v, int bits, MathContext mc) {
        return new BigDecimal(v).divide(new BigDecimal(BigInteger.ONE.shiftLeft(bits)), mc);
    }

    /**
     * e^r for |r| below about 0.5, at precision w: binary fixed point, r / 2^j, Taylor series, j squarings
     * (each squaring can double the relative error: j + 16 guard bits cover it).
     */
    private static BigDecimal expReduced(BigDecimal r, MathContext w) {
        final int halvings = Math.max(8, (int) Math.round(1.2 * Math.sqrt(w.getPrecision())));
        final int bits = bitsFor(w.getPrecision(), halvings + 16);
        BigInteger one = BigInteger.ONE.shiftLeft(bits);
        BigInteger y = toFixed(r, bits).shiftRight(halvings);
        BigInteger sum = one;
        BigInteger term = one;
        for (int n = 1; n < 100_000; n++) {
            term = term.multiply(y).shiftRight(bits).divide(BigInteger.valueOf(n));
            if (term.signum() == 0) {
                break;
            }
            sum = sum.add(term);
        }
        for (int i = 0; i < halvings; i++) {
            sum = sum.multiply(sum).shiftRight(bits);
        }
        return fromFixed(sum, bits, w);
    }

    /** e^x - 1 without cancellation for small x. */
    public static BigDecimal expm1(BigDecimal x) {
        return expm1(x, mc());
    }

    public static BigDecimal expm1(BigDecimal x, MathContext mc) {
        if (x.signum() == 0) {
            return BigDecimal.ZERO;
        }
        if (x.abs().compareTo(EXPM1_SERIES_LIMIT) > 0) {
            // |x| > 2^-10: the subtraction cancels at most 4 digits, covered by the extra guard
            MathContext w = new MathContext(mc.getPrecision() + GUARD + 4, RoundingMode.HALF_EVEN);
            return exp(x, w).subtract(BigDecimal.ONE, w).round(mc);
        }
        // e^x - 1 = x S(x), S(x) = sum x^n / (n+1)! ~ 1, summed in binary fixed point (no cancellation)
        MathContext w = new MathContext(mc.getPrecision() + GUARD, RoundingMode.HALF_EVEN);
        final int bits = bitsFor(w.getPrecision(), 16);
        BigInteger one = BigInteger.ONE.shiftLeft(bits);
        BigInteger y = toFixed(x, bits);
        BigInteger sum = one;
        BigInteger term = one;
        for (int n = 1; n < 100_000; n++) {
            term = term.multiply(y).shiftRight(bits).divide(BigInteger.valueOf(n + 1));
            if (term.signum() == 0) {
                break;
            }
            sum = sum.add(term);
        }
        return x.multiply(fromFixed(sum, bits, w), w).round(mc);
    }

    // ------------------------------------------------------------------ logarithms

    /** ln 2 at precision w (cached). */
    static BigDecimal ln2(MathContext w) {
        int p = w.getPrecision();
        BigDecimal cached = LN2_CACHE.get(p);
        if (cached == null) {
            MathContext ww = new MathContext(p + GUARD, RoundingMode.HALF_EVEN);
            BigDecimal third = BigDecimal.ONE.divide(BigDecimal.valueOf(3), ww);
            cached = atanhSeries(third, ww).multiply(TWO).round(w);
            LN2_CACHE.put(p, cached);
        }
        return cached;
    }

    /** The atanh power series z + z^3/3 + z^5/5 + ..., for |z| well below 1. */
    private static BigDecimal atanhSeries(BigDecimal z, MathContext w) {
        if (z.signum() == 0) {
            return BigDecimal.ZERO;
        }
        BigDecimal z2 = z.multiply(z, w);
        BigDecimal power = z;
        BigDecimal sum = z;
        BigDecimal eps = tenToMinus(w.getPrecision() + 1);
        for (int n = 1; n < 100_000; n++) {
            power = power.multiply(z2, w);
            BigDecimal term = power.divide(BigDecimal.valueOf(2L * n + 1), w);
            sum = sum.add(term, w);
            if (term.abs().compareTo(sum.abs().multiply(eps)) < 0) {
                break;
            }
        }
        return sum;
    }

    public static BigDecimal ln(BigDecimal x) {
        return ln(x, mc());
    }

    public static BigDecimal ln(BigDecimal x, MathContext mc) {
        if (x.signum() <= 0) {
            throw new ArithmeticException("ln of non-positive number");
        }
        if (x.compareTo(BigDecimal.ONE) == 0) {
            return BigDecimal.ZERO;
        }
        long k = Math.round(log10Approx(x) / Math.log10(2.0));
        int kDigits = Long.toString(Math.abs(k)).length();
        MathContext w = new MathContext(mc.getPrecision() + GUARD + kDigits, RoundingMode.HALF_EVEN);
        // m = x / 2^k, exact when k = 0 (so ln stays relative-accurate near 1)
        BigDecimal m = k == 0 ? x : x.multiply(TWO.pow((int) -k, w), w);
        double md = m.doubleValue();
        while (md > Math.sqrt(2.0)) {
            m = m.multiply(HALF);
            md /= 2;
            k++;
        }
        while (md < Math.sqrt(0.5)) {
            m = m.multiply(TWO);
            md *= 2;
            k--;
        }
        BigDecimal z = m.subtract(BigDecimal.ONE).divide(m.add(BigDecimal.ONE), w);
        BigDecimal lnm = atanhSeries(z, w).multiply(TWO);
        BigDecimal result = k == 0 ? lnm : lnm.add(ln2(w).multiply(BigDecimal.valueOf(k)), w);
        return result.round(mc);
    }

    /** ln(1 + y) without cancellation for small y. */
    public static BigDecimal log1p(BigDecimal y) {
        return log1p(y, mc());
    }

    public static BigDecimal log1p(BigDecimal y, MathContext mc) {
        if (y.signum() == 0) {
            return BigDecimal.ZERO;
        }
        if (y.compareTo(BigDecimal.ONE.negate()) <= 0) {
            throw new ArithmeticException("log1p of y <= -1");
        }
        MathContext w = new MathContext(mc.getPrecision() + GUARD, RoundingMode.HALF_EVEN);
        if (y.abs().compareTo(HALF) <= 0) {
            BigDecimal z = y.divide(TWO.add(y), w);
            return atanhSeries(z, w).multiply(TWO).round(mc);
        }
        return ln(BigDecimal.ONE.add(y), mc);
    }

    // ------------------------------------------------------------------ roots

    public static BigDecimal sqrt(BigDecimal x) {
        return sqrt(x, mc());
    }

    /** Square root by Newton's iteration y <- (y + x/y)/2 from a double-precision seed. */
    public static BigDecimal sqrt(BigDecimal x, MathContext mc) {
        int sign = x.signum();
        if (sign < 0) {
            throw new ArithmeticException("sqrt of negative number");
        }
        if (sign == 0) {
            return BigDecimal.ZERO;
        }
        MathContext w = new MathContext(mc.getPrecision() + GUARD, RoundingMode.HALF_EVEN);
        int e = x.precision() - x.scale() - 1;
        if ((e & 1) != 0) {
            e -= 1; // even exponent, mantissa in [1, 100)
        }
        double mant = x.movePointLeft(e).doubleValue();
        BigDecimal y = new BigDecimal(Math.sqrt(mant)).movePointRight(e / 2);
        BigDecimal eps = tenToMinus(w.getPrecision() - 2);
        for (int i = 0; i < 100; i++) {
            BigDecimal next = y.add(x.divide(y, w), w).multiply(HALF, w);
            boolean done = next.subtract(y).abs().compareTo(next.multiply(eps).abs()) <= 0;
            y = next;
            if (done) {
                break;
            }
        }
        return y.round(mc);
    }

    // ------------------------------------------------------------------ hyperbolic functions

    public static BigDecimal sinh(BigDecimal x) {
        return sinh(x, mc());
    }

    public static BigDecimal sinh(BigDecimal x, MathContext mc) {
        if (x.signum() == 0) {
            return BigDecimal.ZERO;
        }
        MathContext w = new MathContext(mc.getPrecision() + GUARD, RoundingMode.HALF_EVEN);
        if (x.abs().compareTo(BigDecimal.ONE) < 0) {
            // sinh x = E (E + 2) / (2 (E + 1)), E = e^x - 1: no cancellation
            BigDecimal e = expm1(x, w);
            return e.multiply(e.add(TWO), w).divide(TWO.multiply(e.add(BigDecimal.ONE)), w).round(mc);
        }
        BigDecimal e = exp(x, w);
        return e.subtract(BigDecimal.ONE.divide(e, w), w).multiply(HALF).round(mc);
    }

    public static BigDecimal cosh(BigDecimal x) {
        return cosh(x, mc());
    }

    public static BigDecimal cosh(BigDecimal x, MathContext mc) {
        MathContext w = new MathContext(mc.getPrecision() + GUARD, RoundingMode.HALF_EVEN);
        BigDecimal e = exp(x.abs(), w);
        return e.add(BigDecimal.ONE.divide(e, w), w).multiply(HALF).round(mc);
    }

    /**
     * {cosh x, sinh x} from a single exponential (sinh through expm1 for |x| &lt; 1, so it keeps its relative
     * precision for small x).
     */
    public static BigDecimal[] coshSinh(BigDecimal x) {
        MathContext mc = mc();
        if (x.signum() == 0) {
            return new BigDecimal[] {BigDecimal.ONE, BigDecimal.ZERO};
        }
        MathContext w = new MathContext(mc.getPrecision() + GUARD, RoundingMode.HALF_EVEN);
        BigDecimal ch;
        BigDecimal sh;
        if (x.abs().compareTo(BigDecimal.ONE) < 0) {
            BigDecimal e = expm1(x, w);
            BigDecimal ep = e.add(BigDecimal.ONE);
            ch = ep.add(BigDecimal.ONE.divide(ep, w), w).multiply(HALF);
            sh = e.multiply(e.add(TWO), w).divide(ep.multiply(TWO), w);
        } else {
            BigDecimal e = exp(x, w);
            BigDecimal inv = BigDecimal.ONE.divide(e, w);
            ch = e.add(inv, w).multiply(HALF);
            sh = e.subtract(inv, w).multiply(HALF);
        }
        return new BigDecimal[] {ch.round(mc), sh.round(mc)};
    }

    public static BigDecimal tanh(BigDecimal x) {
        return tanh(x, mc());
    }

    public static BigDecimal tanh(BigDecimal x, MathContext mc) {
        if (x.signum() == 0) {
            return BigDecimal.ZERO;
        }
        MathContext w = new MathContext(mc.getPrecision() + GUARD, RoundingMode.HALF_EVEN);
        BigDecimal ax = x.abs();
        BigDecimal t;
        if (ax.compareTo(BigDecimal.ONE) < 0) {
            BigDecimal e = expm1(ax.multiply(TWO), w);
            t = e.divide(e.add(TWO), w);
        } else {
            BigDecimal e = exp(ax.multiply(TWO), w);
            t = BigDecimal.ONE.subtract(TWO.divide(e.add(BigDecimal.ONE), w), w);
        }
        return (x.signum() < 0 ? t.negate() : t).round(mc);
    }

    public static BigDecimal asinh(BigDecimal x) {
        return asinh(x, mc());
    }

    public static BigDecimal asinh(BigDecimal x, MathContext mc) {
        if (x.signum() == 0) {
            return BigDecimal.ZERO;
        }
        MathContext w = new MathContext(mc.getPrecision() + GUARD, RoundingMode.HALF_EVEN);
        BigDecimal s = x.abs();
        BigDecimal r;
        BigDecimal root = sqrt(s.multiply(s).add(BigDecimal.ONE), w);
        if (s.compareTo(BigDecimal.ONE) <= 0) {
            // asinh s = log1p(s + s^2 / (1 + sqrt(1 + s^2)))
            r = log1p(s.add(s.multiply(s).divide(BigDecimal.ONE.add(root), w), w), w);
        } else {
            r = ln(s.add(root, w), w);
        }
        return (x.signum() < 0 ? r.negate() : r).round(mc);
    }

    public static BigDecimal atanh(BigDecimal x) {
        return atanh(x, mc());
    }

    public static BigDecimal atanh(BigDecimal x, MathContext mc) {
        if (x.abs().compareTo(BigDecimal.ONE) >= 0) {
            throw new ArithmeticException("atanh needs |x| < 1");
        }
        if (x.signum() == 0) {
            return BigDecimal.ZERO;
        }
        MathContext w = new MathContext(mc.getPrecision() + GUARD, RoundingMode.HALF_EVEN);
        BigDecimal s = x.abs();
        BigDecimal r;
        if (s.compareTo(new BigDecimal("0.2")) <= 0) {
            r = atanhSeries(s, w);
        } else {
            // atanh s = log1p(2 s / (1 - s)) / 2; 1 - s is exact
            r = log1p(s.multiply(TWO).divide(BigDecimal.ONE.subtract(s), w), w).multiply(HALF);
        }
        return (x.signum() < 0 ? r.negate() : r).round(mc);
    }

    // ------------------------------------------------------------------ small vector helpers

    static BigDecimal[] add(BigDecimal[] a, BigDecimal[] b) {
        MathContext mc = mc();
        return new BigDecimal[] {a[0].add(b[0], mc), a[1].add(b[1], mc), a[2].add(b[2], mc)};
    }

    static BigDecimal[] sub(BigDecimal[] a, BigDecimal[] b) {
        MathContext mc = mc();
        return new BigDecimal[] {a[0].subtract(b[0], mc), a[1].subtract(b[1], mc), a[2].subtract(b[2], mc)};
    }

    static BigDecimal[] scale(BigDecimal[] a, BigDecimal k) {
        MathContext mc = mc();
        return new BigDecimal[] {a[0].multiply(k, mc), a[1].multiply(k, mc), a[2].multiply(k, mc)};
    }

    static BigDecimal dot(BigDecimal[] a, BigDecimal[] b) {
        MathContext mc = mc();
        return a[0].multiply(b[0], mc).add(a[1].multiply(b[1], mc), mc).add(a[2].multiply(b[2], mc), mc);
    }

    static BigDecimal norm(BigDecimal[] a) {
        return sqrt(dot(a, a));
    }

    /** Exact cross product (no rounding). */
    static BigDecimal[] crossExact(BigDecimal[] a, BigDecimal[] b) {
        return new BigDecimal[] {
            a[1].multiply(b[2]).subtract(a[2].multiply(b[1])),
            a[2].multiply(b[0]).subtract(a[0].multiply(b[2])),
            a[0].multiply(b[1]).subtract(a[1].multiply(b[0]))
        };
    }

    static BigDecimal max(BigDecimal a, BigDecimal b) {
        return a.compareTo(b) >= 0 ? a : b;
    }
}
