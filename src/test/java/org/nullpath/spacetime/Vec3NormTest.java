package org.nullpath.spacetime;

import net.jqwik.api.Arbitraries;
import net.jqwik.api.Arbitrary;
import net.jqwik.api.ForAll;
import net.jqwik.api.Property;
import net.jqwik.api.Provide;

import static org.junit.jupiter.api.Assertions.assertEquals;

/**
 * {@link Vec3#norm} skips zero components; the result must be the nested hypot's own bits (java.lang.Math.hypot,
 * specified by fdlibm's e_hypot.c), for zeros of both signs beside tiny, huge, infinite and NaN components.
 */
class Vec3NormTest {
    private static final Double[] SPECIAL = {0.0, -0.0, Double.MIN_VALUE, -Double.MIN_VALUE, Double.MIN_NORMAL,
        1e-300, -3.5, 1.0, 299792458.0, 9.4607e15, 1e154, -1e300, Double.MAX_VALUE, Double.POSITIVE_INFINITY,
        Double.NEGATIVE_INFINITY, Double.NaN};

    @Provide
    Arbitrary<Double> components() {
        return Arbitraries.<Double>frequencyOf(
                net.jqwik.api.Tuple.of(3, Arbitraries.of(0.0, -0.0)),
                net.jqwik.api.Tuple.of(2, Arbitraries.of(SPECIAL)),
                net.jqwik.api.Tuple.of(3, Arbitraries.doubles().between(-1e20, 1e20)),
                net.jqwik.api.Tuple.of(2, Arbitraries.longs().map(Double::longBitsToDouble)));
    }

    @Property(tries = 20000)
    void theNormIsTheNestedHypot(@ForAll("components") double x, @ForAll("components") double y,
                                 @ForAll("components") double z) {
        assertEquals(Math.hypot(Math.hypot(x, y), z), new Vec3(x, y, z).norm(), () -> x + ", " + y + ", " + z);
    }

    @Property(tries = 1)
    void everyCombinationOfSpecialComponents() {
        for (double x : SPECIAL) {
            for (double y : SPECIAL) {
                for (double z : SPECIAL) {
                    assertEquals(Math.hypot(Math.hypot(x, y), z), new Vec3(x, y, z).norm(), x + ", " + y + ", " + z);
                }
            }
        }
    }
}
