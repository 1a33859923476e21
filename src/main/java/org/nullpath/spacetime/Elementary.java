package org.nullpath.spacetime;

/**
 * sinh, cosh, tanh, expm1 and log1p by the algorithms of fdlibm 5.3 (Sun Microsystems, 1993), written out in
 * Java: for every double they give the same bits as {@link StrictMath}, whose contract is exactly those
 * algorithms.
 *
 * <p>Why not call {@code Math} or {@code StrictMath}: on Java 17 these five are native methods, so every call
 * crosses into C through JNI, and the JIT can neither inline them nor keep values in registers across them.
 * The light-cone solves and worldline walks call them a dozen times a message. Here they are plain Java, which
 * the JIT inlines. (Java 21 and later carry the same algorithms in Java themselves, with the same results.)
 * {@code exp} inside sinh and cosh is {@link StrictMath#exp}, fdlibm's own, which Java 17 already has in Java;
 * it is needed only past |x| = 22.
 *
 * <p>Every operation is the one fdlibm does, in its order: IEEE double arithmetic is exact to specification in
 * both languages, so the same operations give the same results. The bit-level steps (reading the high word of a
 * double, adding k to its exponent) are spelled with {@link Double#doubleToRawLongBits}. ElementaryTest holds
 * all five to StrictMath bit for bit at every branch threshold, at the special values and on millions of
 * random arguments.
 *
 * <p>The method (from fdlibm's own description): expm1 reduces x = k ln2 + r with |r| <= ln2 / 2 and a
 * correction term for the rounding of r, then uses a rational approximation of r / (e^r - 1) (coefficients
 * Q1..Q5) whose error is below 2^-61; log1p writes 1 + x = 2^k (1 + f) with sqrt(2)/2 < 1 + f < sqrt(2) and
 * a correction for the rounding of 1 + x, then log(1 + f) = f - s (f - R) with s = f / (2 + f) and R a
 * polynomial in s^2 (coefficients Lp1..Lp7). sinh, cosh and tanh are built on expm1 (on exp for large
 * arguments), so they keep full relative precision near zero.
 */
public final class Elementary {
    private static final double TINY = 1.0e-300;
    private static final double HUGE = 1.0e300;
    private static final double SINH_HUGE = 1.0e307;
    private static final double TWO54 = 1.80143985094819840000e+16;

    private static final double LN2_HI = 6.93147180369123816490e-01;
    private static final double LN2_LO = 1.90821492927058770002e-10;
    private static final double INV_LN2 = 1.44269504088896338700e+00;
    private static final double EXP_OVERFLOW = 7.09782712893383973096e+02;

    private static final double Q1 = -3.33333333333331316428e-02;
    private static final double Q2 = 1.58730158725481460165e-03;
    private static final double Q3 = -7.93650757867487942473e-05;
    private static final double Q4 = 4.00821782732936239552e-06;
    private static final double Q5 = -2.01099218183624371326e-07;

    private static final double LP1 = 6.666666666666735130e-01;
    private static final double LP2 = 3.999999999940941908e-01;
    private static final double LP3 = 2.857142874366239149e-01;
    private static final double LP4 = 2.222219843214978396e-01;
    private static final double LP5 = 1.818357216161805012e-01;
    private static final double LP6 = 1.531383769920937332e-01;
    private static final double LP7 = 1.479819860511658591e-01;

    // high words (sign bit cleared) of the branch thresholds
    private static final int HI_INFINITE = 0x7ff00000;
    private static final int HI_22 = 0x40360000;             // 22
    private static final int HI_ONE = 0x3ff00000;            // 1
    private static final int HI_EXP_LIMIT = 0x40862E42;      // ln(Double.MAX_VALUE), about 709.78
    private static final int HI_SINH_LIMIT = 0x408633CE;     // about 710.48, where sinh and cosh overflow
    private static final int LO_SINH_LIMIT = 0x8fb9f87d;     // its low word (compared unsigned)

    private Elementary() {
    }

    private static int high(double x) {
        return (int) (Double.doubleToRawLongBits(x) >>> 32);
    }

    private static int low(double x) {
        return (int) Double.doubleToRawLongBits(x);
    }

    /** x with its high word replaced. */
    private static double withHigh(double x, int high) {
        return Double.longBitsToDouble((long) high << 32 | Double.doubleToRawLongBits(x) & 0xffffffffL);
    }

    /** x with k added to its binary exponent (x normal and the result normal): x 2^k, exactly. */
    private static double addExponent(double x, int k) {
        return Double.longBitsToDouble(Double.doubleToRawLongBits(x) + ((long) k << 52));
    }

    /** True when |x| is past the point where sinh and cosh overflow, given |x|'s high word. */
    private static boolean pastHyperbolicLimit(int ix, double x) {
        return !(ix < HI_SINH_LIMIT || ix == HI_SINH_LIMIT && Integer.compareUnsigned(low(x), LO_SINH_LIMIT) <= 0);
    }

    /** e^x - 1, as {@link StrictMath#expm1}. */
    public static double expm1(double x) {
        int hx = high(x);
        boolean negative = hx < 0;
        hx &= 0x7fffffff;
        // filter out huge and non-finite arguments
        if (hx >= 0x4043687A) {                    // |x| >= 56 ln2
            if (hx >= HI_EXP_LIMIT) {              // |x| >= 709.78
                if (hx >= HI_INFINITE) {
                    if (((hx & 0xfffff) | low(x)) != 0) {
                        return x + x;              // NaN
                    }
                    return negative ? -1.0 : x;    // expm1(+-inf) = {+inf, -1}
                }
                if (x > EXP_OVERFLOW) {
                    return HUGE * HUGE;            // overflow
                }
            }
            if (negative && x + TINY < 0.0) {      // x < -56 ln2: e^x - 1 rounds to -1 (inexact)
                return TINY - 1.0;
            }
        }
        // argument reduction: x = k ln2 + (hi - lo), c the error of the reduced argument
        double c = 0;
        int k;
        if (hx > 0x3fd62e42) {                     // |x| > ln2 / 2
            double hi;
            double lo;
            if (hx < 0x3FF0A2B2) {                 // and |x| < 3 ln2 / 2
                if (!negative) {
                    hi = x - LN2_HI;
                    lo = LN2_LO;
                    k = 1;
                } else {
                    hi = x + LN2_HI;
                    lo = -LN2_LO;
                    k = -1;
                }
            } else {
                k = (int) (INV_LN2 * x + (negative ? -0.5 : 0.5));
                double t = k;
                hi = x - t * LN2_HI;               // t ln2_hi is exact here
                lo = t * LN2_LO;
            }
            x = hi - lo;
            c = (hi - x) - lo;
        } else if (hx < 0x3c900000) {              // |x| < 2^-54: e^x - 1 = x (inexact unless x = 0)
            double t = HUGE + x;
            return x - (t - (HUGE + x));
        } else {
            k = 0;
        }
        // x is now in [-ln2/2, ln2/2]
        double hfx = 0.5 * x;
        double hxs = x * hfx;
        double r1 = 1.0 + hxs * (Q1 + hxs * (Q2 + hxs * (Q3 + hxs * (Q4 + hxs * Q5))));
        double t = 3.0 - r1 * hfx;
        double e = hxs * ((r1 - t) / (6.0 - x * t));
        if (k == 0) {
            return x - (x * e - hxs);              // c is 0
        }
        e = x * (e - c) - c;
        e -= hxs;
        if (k == -1) {
            return 0.5 * (x - e) - 0.5;
        }
        if (k == 1) {
            if (x < -0.25) {
                return -2.0 * (e - (x + 0.5));
            }
            return 1.0 + 2.0 * (x - e);
        }
        if (k <= -2 || k > 56) {                   // e^x - 1 is e^x to the precision kept
            double y = 1.0 - (e - x);
            return addExponent(y, k) - 1.0;
        }
        if (k < 20) {
            double oneMinus2k = withHigh(1.0, 0x3ff00000 - (0x200000 >> k));     // 1 - 2^-k
            double y = oneMinus2k - (e - x);
            return addExponent(y, k);
        }
        double twoMinusK = withHigh(1.0, (0x3ff - k) << 20);                     // 2^-k
        double y = x - (e + twoMinusK);
        y += 1.0;
        return addExponent(y, k);
    }

    /** ln(1 + x), as {@link StrictMath#log1p}. */
    public static double log1p(double x) {
        int hx = high(x);
        int ax = hx & 0x7fffffff;
        int k = 1;
        double f = 0;
        int hu = 0;
        if (hx < 0x3FDA827A) {                     // x < sqrt(2) - 1 (negative x included)
            if (ax >= HI_ONE) {                    // x <= -1
                if (x == -1.0) {
                    return Double.NEGATIVE_INFINITY;
                }
                return (x - x) / (x - x);          // NaN
            }
            if (ax < 0x3e200000) {                 // |x| < 2^-29
                if (TWO54 + x > 0 && ax < 0x3c900000) {
                    return x;                      // |x| < 2^-54
                }
                return x - x * x * 0.5;
            }
            if (hx > 0 || hx <= 0xbfd2bec3) {      // sqrt(2)/2 - 1 <= x < sqrt(2) - 1: no reduction
                k = 0;
                f = x;
                hu = 1;
            }
        }
        if (hx >= HI_INFINITE) {
            return x + x;                          // +inf or NaN
        }
        double c = 0;
        if (k != 0) {
            double u;
            if (hx < 0x43400000) {                 // x < 2^53: 1 + x is rounded, keep its error in c
                u = 1.0 + x;
                hu = high(u);
                k = (hu >> 20) - 1023;
                c = k > 0 ? 1.0 - (u - x) : x - (u - 1.0);
                c /= u;
            } else {
                u = x;
                hu = high(u);
                k = (hu >> 20) - 1023;
                c = 0;
            }
            hu &= 0x000fffff;
            if (hu < 0x6a09e) {                    // mantissa of u below sqrt(2): u = 2^k (1 + f)
                u = withHigh(u, hu | 0x3ff00000);
            } else {                               // else normalise to [sqrt(2)/2, 1) and add one to k
                k += 1;
                u = withHigh(u, hu | 0x3fe00000);
                hu = (0x00100000 - hu) >> 2;
            }
            f = u - 1.0;
        }
        double hfsq = 0.5 * f * f;
        if (hu == 0) {                             // |f| < 2^-20
            if (f == 0) {
                if (k == 0) {
                    return 0;
                }
                c += k * LN2_LO;
                return k * LN2_HI + c;
            }
            double r = hfsq * (1.0 - 0.66666666666666666 * f);
            if (k == 0) {
                return f - r;
            }
            return k * LN2_HI - ((r - (k * LN2_LO + c)) - f);
        }
        double s = f / (2.0 + f);
        double z = s * s;
        double r = z * (LP1 + z * (LP2 + z * (LP3 + z * (LP4 + z * (LP5 + z * (LP6 + z * LP7))))));
        if (k == 0) {
            return f - (hfsq - s * (hfsq + r));
        }
        return k * LN2_HI - ((hfsq - (s * (hfsq + r) + (k * LN2_LO + c))) - f);
    }

    /** sinh x, as {@link StrictMath#sinh}. */
    public static double sinh(double x) {
        int jx = high(x);
        int ix = jx & 0x7fffffff;
        if (ix >= HI_INFINITE) {
            return x + x;                          // +-inf or NaN
        }
        double h = jx < 0 ? -0.5 : 0.5;
        if (ix < HI_22) {                          // |x| < 22
            if (ix < 0x3e300000 && SINH_HUGE + x > 1.0) {
                return x;                          // |x| < 2^-28: sinh x = x (inexact unless 0)
            }
            double t = expm1(Math.abs(x));
            if (ix < HI_ONE) {
                return h * (2.0 * t - t * t / (t + 1.0));
            }
            return h * (t + t / (t + 1.0));
        }
        if (ix < HI_EXP_LIMIT) {                   // |x| in [22, ln(MAX_VALUE)]: e^|x| / 2
            return h * StrictMath.exp(Math.abs(x));
        }
        if (!pastHyperbolicLimit(ix, x)) {         // |x| up to the overflow point: (e^(|x|/2) / 2) e^(|x|/2)
            double w = StrictMath.exp(0.5 * Math.abs(x));
            double t = h * w;
            return t * w;
        }
        return x * SINH_HUGE;                      // overflow
    }

    /** cosh x, as {@link StrictMath#cosh}. */
    public static double cosh(double x) {
        int ix = high(x) & 0x7fffffff;
        if (ix >= HI_INFINITE) {
            return x * x;                          // +inf or NaN
        }
        if (ix < 0x3fd62e43) {                     // |x| < ln2 / 2: 1 + t^2 / (2 (1 + t)), t = expm1(|x|)
            double t = expm1(Math.abs(x));
            double w = 1.0 + t;
            if (ix < 0x3c800000) {
                return w;                          // cosh of a tiny x is 1
            }
            return 1.0 + (t * t) / (w + w);
        }
        if (ix < HI_22) {                          // |x| in [ln2 / 2, 22]: (e^|x| + 1 / e^|x|) / 2
            double t = StrictMath.exp(Math.abs(x));
            return 0.5 * t + 0.5 / t;
        }
        if (ix < HI_EXP_LIMIT) {
            return 0.5 * StrictMath.exp(Math.abs(x));
        }
        if (!pastHyperbolicLimit(ix, x)) {
            double w = StrictMath.exp(0.5 * Math.abs(x));
            double t = 0.5 * w;
            return t * w;
        }
        return HUGE * HUGE;                        // overflow
    }

    /** tanh x, as {@link StrictMath#tanh}. */
    public static double tanh(double x) {
        int jx = high(x);
        int ix = jx & 0x7fffffff;
        if (ix >= HI_INFINITE) {
            return jx >= 0 ? 1.0 / x + 1.0 : 1.0 / x - 1.0;    // tanh(+-inf) = +-1, NaN stays NaN
        }
        double z;
        if (ix < HI_22) {
            if (ix < 0x3c800000) {
                return x * (1.0 + x);              // |x| < 2^-55: tanh x = x
            }
            if (ix >= HI_ONE) {                    // |x| >= 1: 1 - 2 / (expm1(2|x|) + 2)
                double t = expm1(2.0 * Math.abs(x));
                z = 1.0 - 2.0 / (t + 2.0);
            } else {                               // -expm1(-2|x|) / (expm1(-2|x|) + 2)
                double t = expm1(-2.0 * Math.abs(x));
                z = -t / (t + 2.0);
            }
        } else {
            z = 1.0 - TINY;                        // |x| >= 22: tanh rounds to +-1
        }
        return jx >= 0 ? z : -z;
    }
}
