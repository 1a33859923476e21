package org.nullpath.report;

import java.math.BigInteger;

import org.junit.jupiter.api.Test;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

/**
 * Every entry of {@link SchubfachTable} against its definition, computed exactly with java.math.BigInteger:
 * g(k) = floor(10^-k 2^-r) + 1 with 2^125 <= 10^-k 2^-r < 2^126 (Giulietti, "The Schubfach way to render
 * doubles", 2020, section 9), split into g1 = g >> 63 and g0 = g mod 2^63.
 */
class SchubfachTableTest {
    @Test
    void everyPowerOfTenIsItsDefinition() {
        BigInteger mask63 = BigInteger.ONE.shiftLeft(63).subtract(BigInteger.ONE);
        BigInteger low = BigInteger.ONE.shiftLeft(125);
        BigInteger high = BigInteger.ONE.shiftLeft(126);
        assertEquals(2 * (SchubfachTable.K_MAX - SchubfachTable.K_MIN + 1), SchubfachTable.G.length);
        for (int k = SchubfachTable.K_MIN; k <= SchubfachTable.K_MAX; k++) {
            // beta = floor(10^-k 2^-r), with r found from the bit lengths so that beta has 126 bits
            BigInteger beta;
            if (k <= 0) { // 10^-k = N, a whole number: N 2^-r
                BigInteger n = BigInteger.TEN.pow(-k);
                int r = n.bitLength() - 126;
                beta = r >= 0 ? n.shiftRight(r) : n.shiftLeft(-r);
            } else { // 10^-k = 1 / D, D not a power of two: floor(2^s / D) with s = bitLength(D) + 125
                BigInteger d = BigInteger.TEN.pow(k);
                beta = BigInteger.ONE.shiftLeft(d.bitLength() + 125).divide(d);
            }
            assertTrue(beta.compareTo(low) >= 0 && beta.compareTo(high) < 0, "k = " + k + ": 126 bits");
            BigInteger g = beta.add(BigInteger.ONE);
            int at = 2 * (k - SchubfachTable.K_MIN);
            assertEquals(g.shiftRight(63).longValueExact(), SchubfachTable.G[at], "g1 at k = " + k);
            assertEquals(g.and(mask63).longValueExact(), SchubfachTable.G[at + 1], "g0 at k = " + k);
        }
    }
}
