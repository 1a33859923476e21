package org.nullpath.reference;

import java.math.BigDecimal;
import java.math.MathContext;

import org.hipparchus.dfp.Dfp;
import org.hipparchus.dfp.DfpField;
import org.hipparchus.dfp.DfpMath;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.ValueSource;

import static org.junit.jupiter.api.Assertions.assertTrue;

/**
 * Self-test of {@link RefAberration}: its angle against an outside arbitrary-precision library (Hipparchus
 * Dfp's arc cosine, at 60 digits), and its aberration against the textbook cos(theta') = (cos(theta) - beta) /
 * (1 - beta cos(theta)) (Rindler 2006; cited from memory) written out with Dfp. Both run at 64 digits and must
 * agree to 45: the plain forms lose about log10(gamma^2) digits to cancellation near the velocity (12 at
 * gamma 1e6) and the chord |u - v| as many near an angle of pi, which is why the tests that use the reference
 * run it at 50 digits or more for double-precision answers.
 */
class RefAberrationSelfTest {
    private static final DfpField DFP = new DfpField(60);

    private static BigDecimal[] inPlane(Dfp cos, Dfp sin) {
        return new BigDecimal[] {new BigDecimal(cos.toString()), new BigDecimal(sin.toString()), BigDecimal.ZERO};
    }

    private static boolean agree(BigDecimal a, Dfp b, int digits) {
        return RefMath.agreeingDigits(a, new BigDecimal(b.toString())) >= digits;
    }

    @ParameterizedTest
    @ValueSource(strings = {"1e-12", "3e-5", "0.25", "1", "1.5707963", "2.5", "3.14159"})
    void angleMatchesDfpArcCosine(String angle) {
        Dfp a = DFP.newDfp(angle);
        Dfp half = a.divide(2);
        BigDecimal[] u = inPlane(DfpMath.cos(half), DfpMath.sin(half));
        BigDecimal[] v = inPlane(DfpMath.cos(half), DfpMath.sin(half).negate());
        BigDecimal got = RefMath.withDigits(64, () -> RefAberration.angle(u, v));
        assertTrue(agree(got, a, 45), "angle " + angle + ": got " + got.round(new MathContext(50)));
    }

    @ParameterizedTest
    @ValueSource(strings = {"0.001", "0.6", "0.999999", "0.999999999999"})
    void aberrationMatchesTheTextbookCosineWrittenInDfp(String betaText) {
        Dfp beta = DFP.newDfp(betaText);
        Dfp gamma = DFP.getOne().divide(DfpMath.pow(DFP.getOne().subtract(beta.multiply(beta)), DFP.newDfp("0.5")));
        for (String theta : new String[] {"0", "0.001", "1", "2", "3"}) {
            Dfp cos = DfpMath.cos(DFP.newDfp(theta));
            Dfp expected = cos.subtract(beta).divide(DFP.getOne().subtract(beta.multiply(cos)));
            BigDecimal[] k = inPlane(cos, DfpMath.sin(DFP.newDfp(theta)));
            BigDecimal[] velocity = {new BigDecimal(beta.toString()).multiply(RefMath.C), BigDecimal.ZERO, BigDecimal.ZERO};
            BigDecimal got = RefMath.withDigits(64, () -> RefAberration.toRestFrame(velocity,
                    new BigDecimal(gamma.toString()), k)[0]);
            assertTrue(agree(got, expected, 45), "beta " + betaText + ", theta " + theta + ": got " + got);
        }
    }
}
