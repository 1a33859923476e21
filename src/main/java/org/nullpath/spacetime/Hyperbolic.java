package org.nullpath.spacetime;

import org.nullpath.units.Constants;

/**
 * Numerically stable pieces of hyperbolic motion (constant proper acceleration along a line).
 *
 * <p>Everything here is an <em>offset</em> from a reference state with rapidity {@code eta}: the
 * product forms of Rindler (2006), e.g. {@code t - t0 = (2c/a) cosh(eta0 + h) sinh(h)}, stay exact as
 * {@code a u / c -> 0} where the textbook differences {@code (c/a)(sinh eta - sinh eta0)} cancel.
 * Null-coordinate offsets ({@code U = c t - s}, {@code V = c t + s}) use {@code expm1}/{@code log1p}.
 * A zero acceleration is a coast and is handled exactly. Accuracy: a few ulps relative for every
 * finite input, rapidities up to several hundred.
 */
public final class Hyperbolic {
    private static final double C = Constants.C;
    private static final double C2 = Constants.C2;

    private Hyperbolic() {
    }

    /** Mission-time offset after proper time {@code du} from rapidity {@code eta} at acceleration {@code a}. */
    public static double timeOffset(double eta, double a, double du) {
        if (a == 0 || du == 0) {
            return coshOf(eta) * du;
        }
        return timeOffset(eta, a, du, sinhc(a, du));
    }

    /** Distance offset along the line after proper time {@code du}. */
    public static double distanceOffset(double eta, double a, double du) {
        if (a == 0 || du == 0) {
            return C * sinhOf(eta) * du;
        }
        return distanceOffset(eta, a, du, sinhc(a, du));
    }

    /**
     * sinh(h) / h for h = a du / (2 c), the factor that the time and distance offsets of a burn share: a caller
     * that needs both computes it once ({@link #timeOffset(double, double, double, double)}). For a != 0, du != 0.
     */
    public static double sinhc(double a, double du) {
        return sinhcLike(a * du / (2 * C));
    }

    /** {@link #timeOffset(double, double, double)} of a burn (a != 0, du != 0) given its {@link #sinhc}: same bits. */
    public static double timeOffset(double eta, double a, double du, double sinhc) {
        double h = a * du / (2 * C);
        return du * sinhc * Elementary.cosh(eta + h);
    }

    /** {@link #distanceOffset(double, double, double)} of a burn (a != 0, du != 0) given its {@link #sinhc}. */
    public static double distanceOffset(double eta, double a, double du, double sinhc) {
        double h = a * du / (2 * C);
        return C * du * sinhc * Elementary.sinh(eta + h);
    }

    /**
     * sinh, cosh and tanh of a rapidity, without a call at rest (a station; a leg that starts from rest has
     * rapidity 0 at its start, where every query of that leg begins): sinh(+-0) = tanh(+-0) = +-0 and
     * cosh(0) = 1 exactly, as the library functions give them.
     */
    public static double sinhOf(double eta) {
        return eta == 0 ? eta : Elementary.sinh(eta);
    }

    public static double coshOf(double eta) {
        return eta == 0 ? 1.0 : Elementary.cosh(eta);
    }

    public static double tanhOf(double eta) {
        return eta == 0 ? eta : Elementary.tanh(eta);
    }

    /** sinh(h)/h, exact near zero. */
    private static double sinhcLike(double h) {
        double ah = Math.abs(h);
        if (ah < 1e-4) {
            double h2 = h * h;
            return 1 + h2 / 6 * (1 + h2 / 20);
        }
        return Elementary.sinh(h) / h;
    }

    /**
     * Proper time needed to advance mission time by {@code dt} from rapidity {@code eta}:
     * {@code sinh(eta1) = sinh(eta) + a dt / c}.
     */
    public static double properTimeForTime(double eta, double a, double dt) {
        if (a == 0 || dt == 0) {
            return dt / coshOf(eta);
        }
        double x = a * dt / C;
        double b = sinhOf(eta);
        double dEta = deltaAsinh(b + x, b, x);
        return C * dEta / a;
    }

    /**
     * {@code asinh(A) - asinh(B)} given {@code A}, {@code B} and {@code A - B} (accurately known), without
     * cancellation: for arguments of one sign it uses asinh((A-B)(A+B)/(A sqrt(1+B^2) + B sqrt(1+A^2))).
     */
    public static double deltaAsinh(double a, double b, double aMinusB) {
        if (b == 0 && a != 0 && Double.isFinite(a)) {
            // from rest (every query in a leg that starts from rest): in the product form below cosh(b) is 1,
            // the denominator is a, and sum / denominator is exactly 1, so it gives asinh(aMinusB) exactly;
            // this skips its two square roots and its division
            return asinh(aMinusB);
        }
        return deltaAsinhProduct(a, b, aMinusB);
    }

    /** {@link #deltaAsinh} by its product form alone (package-private for the test of the shortcut from rest). */
    static double deltaAsinhProduct(double a, double b, double aMinusB) {
        if (a * b >= 0) {
            double ca = cosh(a);
            double cb = cosh(b);
            double sum = a + b;
            if (sum == 0) {
                return 0;
            }
            // (A-B)(A+B) / (A cb + B ca): for huge arguments divide through to avoid overflow
            double denominator = a * cb + b * ca;
            return asinh(aMinusB * (sum / denominator));
        }
        return asinh(a) - asinh(b);
    }

    /**
     * asinh(x) = sign(x) log1p(|x| + x^2 / (1 + sqrt(1 + x^2))): exact to an ulp or two from tiny to huge
     * arguments (log(2|x|) beyond 1e150, where x^2 would overflow).
     */
    public static double asinh(double x) {
        double ax = Math.abs(x);
        double r = ax > 1e150 ? Math.log(2) + Math.log(ax)
                : Elementary.log1p(ax + ax * ax / (1 + Math.sqrt(1 + ax * ax)));
        return Math.copySign(r, x);
    }

    /** atanh(x) = log1p(2x / (1 - x)) / 2, |x| < 1, exact to an ulp or two near 0 and near 1. */
    public static double atanh(double x) {
        double ax = Math.abs(x);
        return Math.copySign(0.5 * Elementary.log1p(2 * ax / (1 - ax)), x);
    }

    /** sqrt(1 + x^2), the cosh of asinh(x), without overflow (and faster than Math.hypot). */
    private static double cosh(double x) {
        double ax = Math.abs(x);
        return ax < 1e150 ? Math.sqrt(1 + x * x) : ax;
    }

    /** Proper time for a null offset of U (coast or burn); NaN beyond a horizon. */
    public static double properTimeForU(double eta, double a, double dU) {
        double base = dU * Math.exp(eta) / C;
        double y = -a * base / C;
        if (y <= -1) {
            return Double.NaN;
        }
        return base * log1pOverX(y);
    }

    /** Proper time for a null offset of V (coast or burn); NaN beyond a horizon. */
    public static double properTimeForV(double eta, double a, double dV) {
        double base = dV * Math.exp(-eta) / C;
        double y = a * base / C;
        if (y <= -1) {
            return Double.NaN;
        }
        return base * log1pOverX(y);
    }

    /** log1p(y)/y, exact near zero. */
    private static double log1pOverX(double y) {
        if (Math.abs(y) < 1e-8) {
            return 1 - y / 2 + y * y / 3;
        }
        return Elementary.log1p(y) / y;
    }

    /** Offset of {@code U = ct - s} after proper time {@code du}. */
    public static double uOffset(double eta, double a, double du) {
        if (a == 0 || du == 0) {
            return C * du * Math.exp(-eta);
        }
        double dEta = a * du / C;
        return C * du * Math.exp(-eta) * expm1OverX(-dEta);
    }

    /** Offset of {@code V = ct + s} after proper time {@code du}. */
    public static double vOffset(double eta, double a, double du) {
        if (a == 0 || du == 0) {
            return C * du * Math.exp(eta);
        }
        double dEta = a * du / C;
        return C * du * Math.exp(eta) * expm1OverX(dEta);
    }

    /** expm1(x)/x, exact near zero; note the sign convention: returns expm1(x)/x. */
    private static double expm1OverX(double x) {
        if (Math.abs(x) < 1e-8) {
            return 1 + x / 2 + x * x / 6;
        }
        return Elementary.expm1(x) / x;
    }

    /** Rapidity of a speed given as a fraction of c, |beta| < 1. */
    public static double rapidityOfBeta(double beta) {
        return atanh(beta);
    }

    /**
     * atanh(b1) - atanh(b0) without cancellation. When the two rapidities are close, the difference
     * cancels and atanh((b1 - b0)/(1 - b1 b0)) is used instead; when they are far apart that quotient
     * nears 1, where atanh amplifies rounding, and the plain difference is exact to rounding.
     */
    public static double deltaRapidity(double beta1, double beta0) {
        double e1 = atanh(beta1);
        double e0 = atanh(beta0);
        double direct = e1 - e0;
        if (Math.abs(direct) >= 0.5 * Math.max(Math.abs(e1), Math.abs(e0))) {
            return direct;
        }
        return atanh((beta1 - beta0) / (1 - beta1 * beta0));
    }

    /** gamma - 1, exact for small rapidities: {@link #gammaMinusOne(double, double)} with its own sinh. */
    public static double gammaMinusOne(double eta) {
        return gammaMinusOne(eta, Elementary.sinh(eta));
    }

    /**
     * cosh eta - 1 = sinh^2 eta / (cosh eta + 1) without cancellation, given {@code sinhEta} = sinh eta (a caller
     * that has it saves the call); past |eta| = 300 sinh^2 would overflow (at about 355), so the equal
     * 2 sinh^2(eta / 2) is used there (finite up to the rapidity limit of 700).
     */
    public static double gammaMinusOne(double eta, double sinhEta) {
        if (Math.abs(eta) < 300) {
            return sinhEta * sinhEta / (Elementary.cosh(eta) + 1);
        }
        double half = Elementary.sinh(eta / 2);
        return 2 * half * half;
    }
}
