package org.nullpath.spacetime;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.util.SplittableRandom;

import org.junit.jupiter.api.Test;

/**
 * {@link Hyperbolic#deltaAsinh} from rest (B = +-0) skips the product form's square roots and division; it must
 * give that form's bits exactly (they are equal by arithmetic: cosh 0 = 1, the denominator is A, A / A = 1). The
 * product form itself is held to the 70-digit reference through {@code properTimeForTime} in HyperbolicTest.
 */
class DeltaAsinhFromRestTest {
    private static void same(double a, double b, double aMinusB) {
        assertEquals(Double.doubleToLongBits(Hyperbolic.deltaAsinhProduct(a, b, aMinusB)),
                Double.doubleToLongBits(Hyperbolic.deltaAsinh(a, b, aMinusB)), () -> a + ", " + b + ", " + aMinusB);
    }

    @Test
    void fromRestTheShortcutIsTheProductForm() {
        double[] special = {1.0, -1.0, 1e-300, -1e-300, Double.MIN_VALUE, -Double.MIN_VALUE, 1e150, -1e150, 2e150,
            1e300, -1e300, Double.MAX_VALUE, -Double.MAX_VALUE, 0.0, -0.0, Double.POSITIVE_INFINITY,
            Double.NEGATIVE_INFINITY, Double.NaN, 3.3e-9, 0.0327};
        for (double b : new double[] {0.0, -0.0}) {
            for (double a : special) {
                same(a, b, a - b);
                for (double aMinusB : special) {
                    same(a, b, aMinusB);
                }
            }
        }
        SplittableRandom r = new SplittableRandom(11);
        for (int i = 0; i < 200_000; i++) {
            double a = i % 3 == 0 ? Double.longBitsToDouble(r.nextLong()) : r.nextDouble(-50, 50);
            double b = r.nextBoolean() ? 0.0 : -0.0;
            same(a, b, a - b);
            same(a, b, i % 2 == 0 ? Double.longBitsToDouble(r.nextLong()) : a * (1 + r.nextDouble(-1e-9, 1e-9)));
        }
    }
}
