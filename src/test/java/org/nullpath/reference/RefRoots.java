package org.nullpath.reference;

import java.math.BigDecimal;
import java.math.MathContext;

/**
 * Safeguarded Newton iteration for a strictly increasing function on a bracket, at the current
 * {@link RefMath} precision. A Newton step is taken when it lands inside the bracket and shrinks fast
 * enough; otherwise the bracket is split (geometrically when it spans orders of magnitude on one side
 * of zero, else at the midpoint). Each evaluation narrows the bracket, so it always converges.
 */
final class RefRoots {

    /** f and its derivative at x. */
    interface Fn {
        /**
         * Returns {f(x), f'(x)} or {f(x), f'(x), noise}: the derivative may be approximate (it only steers the
         * steps); the optional noise is the size of the rounding error in f(x), below which |f| means "converged".
         */
        BigDecimal[] valueAndSlope(BigDecimal x);
    }

    private static final BigDecimal SIXTEEN = BigDecimal.valueOf(16);

    private RefRoots() {
    }

    /**
     * Root of a strictly increasing f with f(lo) &lt;= 0 &lt;= f(hi) (the caller has checked the signs).
     *
     * @param guess    a starting point, or null (then a split of the bracket)
     * @param absFloor magnitude below which the relative tolerance is applied to absFloor instead of |x|
     */
    static BigDecimal increasing(Fn f, BigDecimal lo, BigDecimal hi, BigDecimal guess, BigDecimal absFloor) {
        MathContext mc = RefMath.mc();
        BigDecimal tol = RefMath.tenToMinus(mc.getPrecision() - 6);
        if (lo.compareTo(hi) > 0) {
            throw new IllegalArgumentException("empty bracket");
        }
        if (lo.compareTo(hi) == 0) {
            return lo;
        }
        BigDecimal x = (guess != null && guess.compareTo(lo) > 0 && guess.compareTo(hi) < 0) ? guess : split(lo, hi);
        BigDecimal dx = hi.subtract(lo, mc).abs();
        BigDecimal dxOld = dx;
        for (int iter = 0; iter < 5000; iter++) {
            BigDecimal[] v = f.valueAndSlope(x);
            BigDecimal fx = v[0];
            BigDecimal df = v[1];
            int s = fx.signum();
            if (s == 0 || (v.length > 2 && fx.abs().compareTo(v[2]) <= 0)) {
                return x;
            }
            if (s < 0) {
                lo = x;
            } else {
                hi = x;
            }
            BigDecimal scale = RefMath.max(RefMath.max(lo.abs(), hi.abs()), absFloor);
            if (hi.subtract(lo, mc).compareTo(tol.multiply(scale)) <= 0) {
                return x;
            }
            BigDecimal next = null;
            if (df.signum() > 0) {
                BigDecimal step = fx.divide(df, mc);
                BigDecimal cand = x.subtract(step, mc);
                BigDecimal stepAbs = step.abs();
                if (stepAbs.compareTo(tol.multiply(RefMath.max(cand.abs(), absFloor))) <= 0) {
                    // converged: Newton has doubled the digits past the tolerance
                    if (cand.compareTo(lo) < 0) {
                        return lo;
                    }
                    if (cand.compareTo(hi) > 0) {
                        return hi;
                    }
                    return cand;
                }
                if (cand.compareTo(lo) > 0 && cand.compareTo(hi) < 0
                        && stepAbs.multiply(BigDecimal.valueOf(2)).compareTo(dxOld) <= 0) {
                    next = cand;
                    dxOld = dx;
                    dx = stepAbs;
                }
            }
            if (next == null) {
                next = split(lo, hi);
                dxOld = dx;
                dx = next.subtract(x, mc).abs();
                if (dx.signum() == 0) {
                    return x;
                }
            }
            x = next;
        }
        throw new IllegalStateException("root finder did not converge");
    }

    /** A point strictly inside (lo, hi), geometric when the bracket spans orders of magnitude. */
    static BigDecimal split(BigDecimal lo, BigDecimal hi) {
        MathContext mc = RefMath.mc();
        if (lo.signum() > 0 && hi.compareTo(lo.multiply(SIXTEEN)) > 0) {
            return RefMath.sqrt(lo.multiply(hi, mc));
        }
        if (hi.signum() < 0 && lo.compareTo(hi.multiply(SIXTEEN)) < 0) {
            return RefMath.sqrt(lo.multiply(hi, mc)).negate();
        }
        if (lo.signum() == 0 && hi.signum() > 0) {
            return hi.divide(SIXTEEN, mc);
        }
        if (hi.signum() == 0 && lo.signum() < 0) {
            return lo.divide(SIXTEEN, mc);
        }
        return lo.add(hi, mc).multiply(new BigDecimal("0.5"), mc);
    }
}
