package org.nullpath.spacetime;

import java.math.BigDecimal;
import java.math.MathContext;
import java.math.RoundingMode;

/**
 * High-precision elementary functions in {@link BigDecimal}, written out here from their Taylor series
 * so that the foundation tests have a reference that shares no code with the program under test.
 *
 * <p>Working precision is {@value #DIGITS} significant digits, so every value handed back is good to
 * well over 40 digits even after the cancellation in a textbook difference such as
 * {@code sinh(eta0 + x) - sinh(eta0)} with {@code x ~ 1e-18}. Inputs given as doubles are taken at
 * their exact binary value ({@code new BigDecimal(double)}).
 */
public final class Decimal {
    /** Significant digits carried in every operation. */
    public static final int DIGITS = 70;
    public static final MathContext MC = new MathContext(DIGITS, RoundingMode.HALF_EVEN);

    /** Speed of light, m/s, exact (SI Brochure, 9th ed., 2019). */
    public static final BigDecimal C = new BigDecimal("299792458");
    /** Standard gravity, m/s^2, exact (3rd CGPM, 1901). */
    public static final BigDecimal G0 = new BigDecimal("9.80665");
    /** Julian year, s, exact (IAU). */
    public static final BigDecimal YEAR = new BigDecimal("31557600");
    /** Light year, m: c times one Julian year (IAU). */
    public static final BigDecimal LIGHT_YEAR = C.multiply(YEAR);

    private static final BigDecimal TWO = BigDecimal.valueOf(2);
    private static final BigDecimal HALF = new BigDecimal("0.5");
    private static final BigDecimal TINY = BigDecimal.ONE.movePointLeft(DIGITS + 5);

    private Decimal() {
    }

    public static BigDecimal of(double x) {
        return new BigDecimal(x);
    }

    public static BigDecimal of(String x) {
        return new BigDecimal(x);
    }

    public static BigDecimal add(BigDecimal a, BigDecimal b) {
        return a.add(b, MC);
    }

    public static BigDecimal sub(BigDecimal a, BigDecimal b) {
        return a.subtract(b, MC);
    }

    public static BigDecimal mul(BigDecimal a, BigDecimal b) {
        return a.multiply(b, MC);
    }

    public static BigDecimal div(BigDecimal a, BigDecimal b) {
        return a.divide(b, MC);
    }

    public static BigDecimal sqrt(BigDecimal x) {
        return x.sqrt(MC);
    }

    /** exp(x): Taylor series after halving the argument below 1/2, then squaring back. */
    public static BigDecimal exp(BigDecimal x) {
        int halvings = 0;
        BigDecimal r = x;
        while (r.abs().compareTo(HALF) > 0) {
            r = r.divide(TWO, MC);
            halvings++;
        }
        MathContext wide = new MathContext(DIGITS + 10, RoundingMode.HALF_EVEN);
        BigDecimal sum = BigDecimal.ONE;
        BigDecimal term = BigDecimal.ONE;
        for (int k = 1; k < 500; k++) {
            term = term.multiply(r, wide).divide(BigDecimal.valueOf(k), wide);
            sum = sum.add(term, wide);
            if (term.abs().compareTo(TINY.multiply(sum.abs())) < 0) {
                break;
            }
        }
        for (int i = 0; i < halvings; i++) {
            sum = sum.multiply(sum, wide);
        }
        return sum.round(MC);
    }

    /** sinh(x): the odd Taylor series for |x| < 1 (no cancellation), (e^x - e^-x)/2 otherwise. */
    public static BigDecimal sinh(BigDecimal x) {
        if (x.abs().compareTo(BigDecimal.ONE) < 0) {
            return series(x, 1);
        }
        BigDecimal e = exp(x);
        return div(sub(e, div(BigDecimal.ONE, e)), TWO);
    }

    /** cosh(x) = (e^x + e^-x)/2. */
    public static BigDecimal cosh(BigDecimal x) {
        BigDecimal e = exp(x);
        return div(add(e, div(BigDecimal.ONE, e)), TWO);
    }

    /** cosh(x) - 1: the even Taylor series from x^2/2 for |x| < 1 (no cancellation). */
    public static BigDecimal coshMinusOne(BigDecimal x) {
        if (x.abs().compareTo(BigDecimal.ONE) < 0) {
            return series(x, 2);
        }
        return sub(cosh(x), BigDecimal.ONE);
    }

    /** tanh(x) = sinh(x)/cosh(x). */
    public static BigDecimal tanh(BigDecimal x) {
        return div(sinh(x), cosh(x));
    }

    /** exp(x) - 1: the Taylor series from x for |x| < 1. */
    public static BigDecimal expm1(BigDecimal x) {
        if (x.abs().compareTo(BigDecimal.ONE) < 0) {
            MathContext wide = new MathContext(DIGITS + 10, RoundingMode.HALF_EVEN);
            BigDecimal sum = BigDecimal.ZERO;
            BigDecimal term = BigDecimal.ONE;
            for (int k = 1; k < 500; k++) {
                term = term.multiply(x, wide).divide(BigDecimal.valueOf(k), wide);
                sum = sum.add(term, wide);
                if (term.abs().compareTo(TINY.multiply(sum.abs())) < 0) {
                    break;
                }
            }
            return sum.round(MC);
        }
        return sub(exp(x), BigDecimal.ONE);
    }

    /** Sum of x^k/k! for k = first, first + 2, first + 4, ... */
    private static BigDecimal series(BigDecimal x, int first) {
        MathContext wide = new MathContext(DIGITS + 10, RoundingMode.HALF_EVEN);
        BigDecimal x2 = x.multiply(x, wide);
        BigDecimal term = first == 1 ? x : x2.divide(TWO, wide);
        BigDecimal sum = term;
        for (int k = first + 2; k < 1000; k += 2) {
            term = term.multiply(x2, wide).divide(BigDecimal.valueOf((long) k * (k - 1)), wide);
            sum = sum.add(term, wide);
            if (term.abs().compareTo(TINY.multiply(sum.abs())) < 0) {
                break;
            }
        }
        return sum.round(MC);
    }

    /** Natural logarithm, x > 0, by Newton's iteration on exp from the double estimate. */
    public static BigDecimal ln(BigDecimal x) {
        if (x.signum() <= 0) {
            throw new ArithmeticException("ln of " + x);
        }
        // scale into [0.5, 2) by powers of two so the double seed is good
        int twos = 0;
        BigDecimal m = x;
        while (m.compareTo(TWO) >= 0) {
            m = m.divide(TWO, MC);
            twos++;
        }
        while (m.compareTo(HALF) < 0) {
            m = m.multiply(TWO, MC);
            twos--;
        }
        BigDecimal y = new BigDecimal(Math.log(m.doubleValue()));
        for (int i = 0; i < 8; i++) {
            BigDecimal e = exp(y);
            // Halley step for exp(y) = m: y += 2 (m - e)/(m + e)
            BigDecimal step = div(mul(TWO, sub(m, e)), add(m, e));
            y = add(y, step);
            if (step.abs().compareTo(TINY) < 0) {
                break;
            }
        }
        return add(y, mul(BigDecimal.valueOf(twos), ln2()));
    }

    private static BigDecimal ln2Cache;

    private static synchronized BigDecimal ln2() {
        if (ln2Cache == null) {
            // ln 2 = 2 atanh(1/3) = 2 sum (1/3)^(2k+1)/(2k+1)
            MathContext wide = new MathContext(DIGITS + 10, RoundingMode.HALF_EVEN);
            BigDecimal z = BigDecimal.ONE.divide(BigDecimal.valueOf(3), wide);
            BigDecimal z2 = z.multiply(z, wide);
            BigDecimal power = z;
            BigDecimal sum = BigDecimal.ZERO;
            for (int k = 0; k < 400; k++) {
                BigDecimal term = power.divide(BigDecimal.valueOf(2L * k + 1), wide);
                sum = sum.add(term, wide);
                if (term.compareTo(TINY) < 0) {
                    break;
                }
                power = power.multiply(z2, wide);
            }
            ln2Cache = sum.multiply(TWO, wide).round(MC);
        }
        return ln2Cache;
    }

    /** asinh(y) = sign(y) ln(|y| + sqrt(1 + y^2)); for |y| < 1e-3 by its Taylor series. */
    public static BigDecimal asinh(BigDecimal y) {
        if (y.signum() == 0) {
            return BigDecimal.ZERO;
        }
        if (y.abs().compareTo(new BigDecimal("1e-3")) < 0) {
            // asinh y = y - y^3/6 + 3 y^5/40 - 15 y^7/336 + 105 y^9/3456 - ...
            MathContext wide = new MathContext(DIGITS + 10, RoundingMode.HALF_EVEN);
            BigDecimal y2 = y.multiply(y, wide);
            BigDecimal term = y;
            BigDecimal sum = y;
            for (int n = 1; n < 200; n++) {
                // term_n = term_{n-1} * (-(2n-1)^2 y^2) / ((2n)(2n+1))
                long num = (2L * n - 1) * (2L * n - 1);
                long den = (2L * n) * (2L * n + 1);
                term = term.multiply(y2, wide).multiply(BigDecimal.valueOf(-num), wide)
                        .divide(BigDecimal.valueOf(den), wide);
                sum = sum.add(term, wide);
                if (term.abs().compareTo(TINY.multiply(sum.abs())) < 0) {
                    break;
                }
            }
            return sum.round(MC);
        }
        BigDecimal a = y.abs();
        BigDecimal r = ln(add(a, sqrt(add(BigDecimal.ONE, mul(a, a)))));
        return y.signum() < 0 ? r.negate() : r;
    }

    /** acosh(x) = ln(x + sqrt(x^2 - 1)), x >= 1. */
    public static BigDecimal acosh(BigDecimal x) {
        return ln(add(x, sqrt(sub(mul(x, x), BigDecimal.ONE))));
    }

    /** atanh(b) = ln((1 + b)/(1 - b))/2, |b| < 1. */
    public static BigDecimal atanh(BigDecimal b) {
        if (b.signum() == 0) {
            return BigDecimal.ZERO;
        }
        if (b.abs().compareTo(new BigDecimal("1e-3")) < 0) {
            MathContext wide = new MathContext(DIGITS + 10, RoundingMode.HALF_EVEN);
            BigDecimal b2 = b.multiply(b, wide);
            BigDecimal power = b;
            BigDecimal sum = BigDecimal.ZERO;
            for (int k = 0; k < 400; k++) {
                BigDecimal term = power.divide(BigDecimal.valueOf(2L * k + 1), wide);
                sum = sum.add(term, wide);
                if (term.abs().compareTo(TINY.multiply(sum.abs())) < 0) {
                    break;
                }
                power = power.multiply(b2, wide);
            }
            return sum.round(MC);
        }
        return div(ln(div(add(BigDecimal.ONE, b), sub(BigDecimal.ONE, b))), TWO);
    }

    /** Relative difference |actual - expected| / |expected| (expected must not be zero). */
    public static double relativeError(double actual, BigDecimal expected) {
        return of(actual).subtract(expected, MC).abs().divide(expected.abs(), MC).doubleValue();
    }
}
