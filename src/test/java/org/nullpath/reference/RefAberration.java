package org.nullpath.reference;

import java.math.BigDecimal;
import java.math.MathContext;

/**
 * Aberration of light at the working precision (50 digits or more), written from the textbook and sharing no
 * code with src/main: a photon travelling along the unit vector k in the mission frame travels, in the rest
 * frame of a body with velocity v = beta c (mission axes carried by the pure boost), along
 * <pre>
 *   k' = (k + [ (gamma - 1) (beta . k) / beta^2 - gamma ] beta) / (gamma (1 - beta . k))
 * </pre>
 * (Einstein 1905, sec. 7; Rindler, <i>Relativity: Special, General, and Cosmological</i>, 2nd ed., 2006;
 * cited from memory). At this precision the plain form has ample headroom: gamma = 1e6 costs 12 digits.
 */
public final class RefAberration {
    private RefAberration() {
    }

    /** The unit vector from {@code from} to {@code to}. */
    public static BigDecimal[] direction(BigDecimal[] from, BigDecimal[] to) {
        return unit(RefMath.sub(to, from));
    }

    /** {@code a} scaled to unit length. */
    public static BigDecimal[] unit(BigDecimal[] a) {
        BigDecimal n = RefMath.norm(a);
        if (n.signum() == 0) {
            throw new IllegalArgumentException("a zero vector has no direction");
        }
        return RefMath.scale(a, BigDecimal.ONE.divide(n, RefMath.mc()));
    }

    /** The photon direction {@code k} (unit) in the rest frame of a body with velocity {@code velocity} (m/s) and Lorentz factor {@code gamma}. */
    public static BigDecimal[] toRestFrame(BigDecimal[] velocity, BigDecimal gamma, BigDecimal[] k) {
        MathContext mc = RefMath.mc();
        BigDecimal[] beta = RefMath.scale(velocity, BigDecimal.ONE.divide(RefMath.C, mc));
        BigDecimal b2 = RefMath.dot(beta, beta);
        if (b2.signum() == 0) {
            return k.clone();
        }
        BigDecimal bk = RefMath.dot(beta, k);
        BigDecimal coefficient = gamma.subtract(BigDecimal.ONE).multiply(bk, mc).divide(b2, mc).subtract(gamma, mc);
        BigDecimal denominator = gamma.multiply(BigDecimal.ONE.subtract(bk, mc), mc);
        return RefMath.scale(RefMath.add(k, RefMath.scale(beta, coefficient)), BigDecimal.ONE.divide(denominator, mc));
    }

    /** The same for a body in state {@code s}. */
    public static BigDecimal[] toRestFrame(RefState s, BigDecimal[] k) {
        return toRestFrame(s.velocity(), s.gamma(), k);
    }

    /** gamma (1 - beta . k) of a body in state {@code s}: the photon energy in its frame over that in the mission frame. */
    public static BigDecimal energyFactor(RefState s, BigDecimal[] k) {
        MathContext mc = RefMath.mc();
        return s.gamma().multiply(BigDecimal.ONE.subtract(RefMath.dot(s.velocity(), k).divide(RefMath.C, mc), mc), mc);
    }

    /**
     * The angle between unit vectors u and v, 2 asin(x) with x = |u - v| / 2 = sin(angle / 2). The arcsine is
     * halved until x &lt; 0.1 by asin(x) = 2 asin(x / sqrt(2 (1 + sqrt(1 - x^2)))) (the half-angle formula
     * sin(a/2) = sqrt((1 - cos a) / 2), written without cancellation), then summed by its power series
     * sum (2n)! / (4^n (n!)^2 (2n + 1)) x^(2n + 1) (any table of series, e.g. Abramowitz &amp; Stegun 4.4.40;
     * both cited from memory). Any angle from 0 to pi.
     */
    public static BigDecimal angle(BigDecimal[] u, BigDecimal[] v) {
        MathContext mc = RefMath.mc();
        BigDecimal two = BigDecimal.valueOf(2);
        BigDecimal x = RefMath.norm(RefMath.sub(u, v)).divide(two, mc).min(BigDecimal.ONE);
        BigDecimal scale = two;
        while (x.compareTo(new BigDecimal("0.1")) >= 0) {
            BigDecimal cos = RefMath.sqrt(BigDecimal.ONE.subtract(x.multiply(x, mc), mc).max(BigDecimal.ZERO));
            x = x.divide(RefMath.sqrt(two.multiply(BigDecimal.ONE.add(cos, mc), mc)), mc);
            scale = scale.multiply(two);
        }
        BigDecimal x2 = x.multiply(x, mc);
        BigDecimal power = x;
        BigDecimal coefficient = BigDecimal.ONE;
        BigDecimal sum = BigDecimal.ZERO;
        BigDecimal limit = RefMath.tenToMinus(mc.getPrecision() + 5);
        for (int n = 0; n < 10_000; n++) {
            BigDecimal term = coefficient.multiply(power, mc).divide(BigDecimal.valueOf(2L * n + 1), mc);
            sum = sum.add(term, mc);
            if (term.abs().compareTo(limit.multiply(sum.abs().max(limit))) <= 0) {
                return sum.multiply(scale, mc);
            }
            // (2n + 2)! / (4^(n+1) ((n + 1)!)^2) over (2n)! / (4^n (n!)^2) is (2n + 1) / (2n + 2)
            coefficient = coefficient.multiply(BigDecimal.valueOf(2L * n + 1), mc).divide(BigDecimal.valueOf(2L * n + 2), mc);
            power = power.multiply(x2, mc);
        }
        throw new IllegalStateException("arcsine series did not converge");
    }
}
