package org.nullpath.spacetime;

import java.util.ArrayList;
import java.util.List;
import java.util.SplittableRandom;
import java.util.function.DoubleUnaryOperator;

import org.junit.jupiter.api.Test;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.junit.jupiter.api.Assertions.fail;

/**
 * {@link Elementary} against java.lang.StrictMath, whose specification is fdlibm 5.3's results (on Java 17 it
 * calls the C fdlibm itself through JNI): the same bits for every argument tried. NaNs are compared as NaN
 * (Double.doubleToLongBits), as Java arithmetic does not promise one NaN pattern over another.
 *
 * <p>The arguments: the special values; every branch threshold of the five algorithms, as the high words
 * fdlibm tests, with the low words around them and a few ulps either side, both signs; the points where
 * expm1's reduction k changes and where log1p's 1 + x crosses a power of two or sqrt(2) times one; and
 * several million random arguments (seeded): uniform bit patterns, which cover every exponent, and uniform
 * and log-uniform draws over the ranges a mission uses.
 */
class ElementaryTest {
    private static final long SEED = 20261202L;

    private record Function(String name, DoubleUnaryOperator ours, DoubleUnaryOperator reference, int[] thresholds) {
    }

    private static final List<Function> FUNCTIONS = List.of(
            new Function("expm1", Elementary::expm1, StrictMath::expm1,
                    new int[] {0x4043687A, 0x40862E42, 0x7ff00000, 0x3fd62e42, 0x3FF0A2B2, 0x3c900000}),
            new Function("log1p", Elementary::log1p, StrictMath::log1p,
                    new int[] {0x3FDA827A, 0x3ff00000, 0x3e200000, 0x3c900000, 0x3fd2bec3, 0x43400000, 0x7ff00000}),
            new Function("sinh", Elementary::sinh, StrictMath::sinh,
                    new int[] {0x40360000, 0x3e300000, 0x3ff00000, 0x40862E42, 0x408633CE, 0x7ff00000}),
            new Function("cosh", Elementary::cosh, StrictMath::cosh,
                    new int[] {0x3fd62e43, 0x3c800000, 0x40360000, 0x40862E42, 0x408633CE, 0x7ff00000}),
            new Function("tanh", Elementary::tanh, StrictMath::tanh,
                    new int[] {0x40360000, 0x3c800000, 0x3ff00000, 0x7ff00000}));

    private static final double[] SPECIAL = {0.0, -0.0, Double.MIN_VALUE, -Double.MIN_VALUE, Double.MIN_NORMAL,
        -Double.MIN_NORMAL, Double.MAX_VALUE, -Double.MAX_VALUE, Double.POSITIVE_INFINITY, Double.NEGATIVE_INFINITY,
        Double.NaN, Double.longBitsToDouble(0xfff8000000000000L), Double.longBitsToDouble(0x7ff0000000000001L),
        1.0, -1.0, 0.5, -0.5, 2.0, -2.0, 22.0, -22.0, 709.782712893384, 709.7827128933841, 710.4758600739439,
        710.475860073944, -745.1332191019412, -745.1332191019411, Math.log(2), -Math.log(2), 1e-300, -1e-300};

    /** The mismatches found: how many, and the first few in words. */
    private static final class Failures {
        private final List<String> first = new ArrayList<>();
        private long count;
        private long checked;

        void add(String what) {
            count++;
            if (first.size() < 20) {
                first.add(what);
            }
        }
    }

    private static void check(Function f, double x, Failures failures) {
        failures.checked++;
        long ours = Double.doubleToLongBits(f.ours().applyAsDouble(x));
        long reference = Double.doubleToLongBits(f.reference().applyAsDouble(x));
        if (ours != reference) {
            failures.add(f.name() + "(" + x + " = 0x" + Long.toHexString(Double.doubleToRawLongBits(x)) + "): "
                    + Double.longBitsToDouble(ours) + " against StrictMath's " + Double.longBitsToDouble(reference));
        }
    }

    /** x and the few doubles either side of it, in both signs. */
    private static void around(Function f, double x, Failures failures) {
        for (double s : new double[] {x, -x}) {
            double up = s;
            double down = s;
            check(f, s, failures);
            for (int i = 0; i < 4; i++) {
                up = Math.nextUp(up);
                down = Math.nextDown(down);
                check(f, up, failures);
                check(f, down, failures);
            }
        }
    }

    private static void assertNone(Failures failures, long atLeast) {
        if (failures.count > 0) {
            fail(failures.count + " mismatches in " + failures.checked + ", the first: "
                    + String.join("; ", failures.first));
        }
        assertTrue(failures.checked >= atLeast, () -> failures.checked + " arguments checked");
    }

    @Test
    void theSpecialValuesAreStrictMathsOwn() {
        Failures failures = new Failures();
        for (Function f : FUNCTIONS) {
            for (double x : SPECIAL) {
                around(f, x, failures);
            }
        }
        assertNone(failures, 5 * 2 * 9 * SPECIAL.length);
    }

    @Test
    void everyBranchThresholdIsStrictMathsOwn() {
        Failures failures = new Failures();
        SplittableRandom random = new SplittableRandom(SEED);
        for (Function f : FUNCTIONS) {
            for (int threshold : f.thresholds()) {
                for (int high = threshold - 2; high <= threshold + 2; high++) {
                    for (int low : new int[] {0, 1, 0x7fffffff, 0x80000000, 0x8fb9f87d, 0x8fb9f87e, 0xffffffff,
                        random.nextInt(), random.nextInt()}) {
                        around(f, Double.longBitsToDouble((long) high << 32 | low & 0xffffffffL), failures);
                    }
                }
            }
        }
        assertNone(failures, 29 * 5 * 9 * 2 * 9);
    }

    @Test
    void expm1sReductionStepsAreStrictMathsOwn() {
        // k = round(x / ln2) changes at (k + 1/2) ln2, and expm1 takes other paths at k = 1, -1, 20, 56
        Failures failures = new Failures();
        Function expm1 = FUNCTIONS.get(0);
        for (int k = -60; k <= 1030; k++) {
            around(expm1, (k + 0.5) * Math.log(2), failures);
            around(expm1, k * Math.log(2), failures);
        }
        assertNone(failures, 1091 * 2 * 18);
    }

    @Test
    void log1psReductionStepsAreStrictMathsOwn() {
        // 1 + x near 2^k (f near 0, the |f| < 2^-20 path) and near sqrt(2) 2^k (where k steps by one)
        Failures failures = new Failures();
        Function log1p = FUNCTIONS.get(1);
        for (int k = -60; k <= 1023; k++) {
            double p = Math.scalb(1.0, k);
            for (double x : new double[] {p - 1, p * Math.sqrt(2) - 1, p * (1 + 0x1p-21) - 1, p * (1 - 0x1p-22) - 1}) {
                around(log1p, x, failures);
            }
            around(log1p, p, failures);
        }
        assertNone(failures, 1084 * 5 * 18);
    }

    @Test
    void millionsOfRandomArgumentsAreStrictMathsOwn() {
        Failures failures = new Failures();
        SplittableRandom random = new SplittableRandom(SEED);
        for (Function f : FUNCTIONS) {
            for (int i = 0; i < 400_000; i++) {
                check(f, Double.longBitsToDouble(random.nextLong()), failures);
                check(f, random.nextDouble(-1, 1), failures);
                check(f, random.nextDouble(-40, 40), failures);
                check(f, random.nextDouble(-720, 720), failures);
                double magnitude = Math.pow(10, random.nextDouble(-20, 3));
                check(f, random.nextBoolean() ? magnitude : -magnitude, failures);
            }
        }
        assertNone(failures, 5 * 400_000 * 5);
    }

    @Test
    void aFewValuesFromTheirDefinitions() {
        // independent of fdlibm: values that follow from the definitions exactly or to an ulp (common practice)
        assertEquals(0.0, Elementary.sinh(0.0));
        assertEquals(-0.0, Elementary.tanh(-0.0));
        assertEquals(1.0, Elementary.cosh(0.0));
        assertEquals(1.0, Elementary.tanh(30.0));
        assertEquals(Double.POSITIVE_INFINITY, Elementary.cosh(711.0));
        assertEquals(-1.0, Elementary.expm1(Double.NEGATIVE_INFINITY));
        assertEquals(Double.NEGATIVE_INFINITY, Elementary.log1p(-1.0));
        assertEquals(Math.log(2), Elementary.log1p(1.0), Math.ulp(Math.log(2)));
        // sinh(ln 2) = (2 - 1/2) / 2 = 0.75, cosh(ln 2) = 1.25, tanh(ln 2) = 0.6
        assertEquals(0.75, Elementary.sinh(Math.log(2)), 2 * Math.ulp(0.75));
        assertEquals(1.25, Elementary.cosh(Math.log(2)), 2 * Math.ulp(1.25));
        assertEquals(0.6, Elementary.tanh(Math.log(2)), 2 * Math.ulp(0.6));
        assertEquals(1.0, Elementary.expm1(Math.log(2)), 2 * Math.ulp(1.0));
    }
}
