package org.nullpath.reference;

import java.math.BigDecimal;
import java.math.MathContext;
import java.math.RoundingMode;
import java.util.Map;
import java.util.concurrent.ConcurrentHashMap;

/**
 * Gauss–Legendre quadrature at the {@link RefMath} working precision, for the profiled-leg reference
 * ({@link RefProfiledCraft}). Test-only.
 *
 * <p>The n nodes are the roots of the Legendre polynomial P_n, found by Newton's iteration on the three-term
 * recurrence (k P_k = (2k - 1) x P_{k-1} - (k - 1) P_{k-2}) from the usual starting points
 * x_i ~ cos(pi (i - 1/4) / (n + 1/2)); the weights are w_i = 2 / ((1 - x_i^2) P_n'(x_i)^2) (Abramowitz &amp;
 * Stegun, <i>Handbook of Mathematical Functions</i>, 1964, formula 25.4.29; the formula number is cited from
 * memory, the self-test checks the rule against its defining properties and against Hipparchus). The rule integrates polynomials of degree 2n - 1
 * exactly; for a function analytic inside the Bernstein ellipse with parameter rho around the panel its
 * error falls like rho^-2n, which is why the reference grades its panels by the distance to the nearest
 * singularity. Nodes are computed with 10 guard digits and cached per (n, precision).
 */
final class RefProfiledQuadrature {

    /** Nodes x_i in (-1, 1) and weights w_i, index-aligned. */
    record Rule(BigDecimal[] nodes, BigDecimal[] weights) {
        int size() {
            return nodes.length;
        }
    }

    /** The integrand: for each point, one or more values (integrated component by component). */
    interface Integrand {
        BigDecimal[] at(BigDecimal x);
    }

    private static final Map<Long, Rule> RULES = new ConcurrentHashMap<>();
    private static final BigDecimal TWO = BigDecimal.valueOf(2);
    private static final BigDecimal HALF = new BigDecimal("0.5");

    private RefProfiledQuadrature() {
    }

    /** The n-point rule at the working precision (cached). */
    static Rule rule(int n) {
        if (n < 2) {
            throw new IllegalArgumentException("at least 2 nodes");
        }
        int p = RefMath.digits();
        return RULES.computeIfAbsent(((long) n << 32) | p, k -> build(n, p));
    }

    private static Rule build(int n, int digits) {
        MathContext w = new MathContext(digits + 10, RoundingMode.HALF_EVEN);
        MathContext out = new MathContext(digits, RoundingMode.HALF_EVEN);
        BigDecimal[] x = new BigDecimal[n];
        BigDecimal[] wt = new BigDecimal[n];
        BigDecimal eps = RefMath.tenToMinus(digits + 7);
        int half = (n + 1) / 2;
        for (int i = 1; i <= half; i++) {
            BigDecimal xi = new BigDecimal(Math.cos(Math.PI * (i - 0.25) / (n + 0.5)));
            BigDecimal dp = null;
            for (int iter = 0; iter < 200; iter++) {
                BigDecimal[] pd = legendre(n, xi, w);
                dp = pd[1];
                BigDecimal dx = pd[0].divide(dp, w);
                xi = xi.subtract(dx, w);
                if (dx.abs().compareTo(eps) <= 0) {
                    dp = legendre(n, xi, w)[1];
                    break;
                }
                if (iter == 199) {
                    throw new IllegalStateException("Legendre root did not converge");
                }
            }
            BigDecimal weight = TWO.divide(BigDecimal.ONE.subtract(xi.multiply(xi, w), w).multiply(dp.multiply(dp, w), w), w);
            // i-th root from the top: x_{i} > 0 (or 0 for the middle one of an odd rule)
            x[i - 1] = xi.round(out);
            wt[i - 1] = weight.round(out);
            x[n - i] = xi.negate().round(out);
            wt[n - i] = weight.round(out);
        }
        if (n % 2 == 1) {
            x[half - 1] = BigDecimal.ZERO;
        }
        return new Rule(x, wt);
    }

    /** {P_n(x), P_n'(x)} by the three-term recurrence; P_n' = n (x P_n - P_{n-1}) / (x^2 - 1). */
    static BigDecimal[] legendre(int n, BigDecimal x, MathContext w) {
        BigDecimal p0 = BigDecimal.ONE;
        BigDecimal p1 = x;
        for (int k = 2; k <= n; k++) {
            BigDecimal pk = BigDecimal.valueOf(2L * k - 1).multiply(x, w).multiply(p1, w)
                    .subtract(BigDecimal.valueOf(k - 1).multiply(p0, w), w)
                    .divide(BigDecimal.valueOf(k), w);
            p0 = p1;
            p1 = pk;
        }
        BigDecimal dp = BigDecimal.valueOf(n).multiply(x.multiply(p1, w).subtract(p0, w), w)
                .divide(x.multiply(x, w).subtract(BigDecimal.ONE, w), w);
        return new BigDecimal[] {p1, dp};
    }

    /**
     * The n-point rule on [a, b] (any order of a and b), component by component; {@code dims} is the number
     * of values the integrand returns.
     */
    static BigDecimal[] integrate(Integrand f, BigDecimal a, BigDecimal b, int n, int dims) {
        MathContext mc = RefMath.mc();
        BigDecimal[] sum = new BigDecimal[dims];
        for (int d = 0; d < dims; d++) {
            sum[d] = BigDecimal.ZERO;
        }
        if (a.compareTo(b) == 0) {
            return sum;
        }
        Rule r = rule(n);
        BigDecimal mid = a.add(b, mc).multiply(HALF, mc);
        BigDecimal halfWidth = b.subtract(a, mc).multiply(HALF, mc);
        for (int i = 0; i < r.size(); i++) {
            BigDecimal xi = mid.add(halfWidth.multiply(r.nodes()[i], mc), mc);
            BigDecimal[] v = f.at(xi);
            for (int d = 0; d < dims; d++) {
                sum[d] = sum[d].add(r.weights()[i].multiply(v[d], mc), mc);
            }
        }
        for (int d = 0; d < dims; d++) {
            sum[d] = sum[d].multiply(halfWidth, mc);
        }
        return sum;
    }
}
