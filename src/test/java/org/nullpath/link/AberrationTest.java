package org.nullpath.link;

import java.math.BigDecimal;
import java.math.MathContext;
import java.util.ArrayList;
import java.util.List;
import java.util.Random;
import java.util.stream.Stream;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.Arguments;
import org.junit.jupiter.params.provider.MethodSource;
import org.nullpath.reference.RefAberration;
import org.nullpath.reference.RefMath;
import org.nullpath.spacetime.Vec3;
import org.nullpath.worldline.State;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

/**
 * The aberration of light ({@link Aberration}) against the textbook formula
 * cos(theta') = (cos(theta) - beta) / (1 - beta cos(theta)), sin(theta') = sin(theta) / (gamma (1 - beta cos(theta)))
 * (Einstein 1905, sec. 7; Rindler, <i>Relativity: Special, General, and Cosmological</i>, 2nd ed., 2006; cited
 * from memory), evaluated at 50 digits, and against the independent 50-digit vector form in
 * {@link RefAberration} in 3-D.
 *
 * <p>Tolerance: the implementation is backward stable (the exact aberration of a direction within a few ulps
 * of the one given), and aberration turns a direction's error by the angle magnification
 * d(theta')/d(theta) = 1 / (gamma (1 - beta cos(theta))), up to gamma (1 + beta) near the velocity. So each
 * component must be within {@code 8 eps (1 + magnification)} of the reference (eps = 2^-52), a bound derived,
 * not fitted: far from the velocity that is a few ulps, at gamma 1e6 looking forward about 2e6 ulps.
 */
class AberrationTest {
    private static final double EPS = Math.ulp(1.0);

    private static State moving(Vec3 direction, double rapidity) {
        return new State(0, 0, Vec3.ZERO, direction, rapidity);
    }

    private static double acosh(double g) {
        return Math.log(g + Math.sqrt((g - 1) * (g + 1)));
    }

    static Stream<Arguments> anglesAndSpeeds() {
        List<Arguments> out = new ArrayList<>();
        double[] gammas = {1 + 1e-12, 1 + 1e-6, 1.25, 3, 100, 1e4, 1e6};
        double[] thetas = {0, 1e-9, 1e-6, 1e-3, 0.1, 0.7, Math.PI / 2, 2.0, 3.0, Math.PI - 1e-6, Math.PI};
        for (double g : gammas) {
            for (double th : thetas) {
                out.add(Arguments.of(g, th));
                out.add(Arguments.of(g, -th));
            }
        }
        return out.stream();
    }

    /** Textbook: the photon direction at angle theta from the velocity, in the plane of x and y. */
    @ParameterizedTest
    @MethodSource("anglesAndSpeeds")
    void matchesTheTextbookAberrationFormula(double gamma, double theta) {
        double eta = acosh(gamma);
        Vec3 k = Vec3.of(Math.cos(theta), Math.sin(theta), 0);
        Vec3 kp = Aberration.toRestFrame(moving(Vec3.of(1, 0, 0), eta), k);
        RefMath.withDigits(50, () -> {
            MathContext mc = RefMath.mc();
            BigDecimal[] unit = RefAberration.unit(new BigDecimal[] {RefMath.bd(k.x()), RefMath.bd(k.y()), BigDecimal.ZERO});
            BigDecimal cos = unit[0];
            BigDecimal sin = unit[1];
            BigDecimal beta = RefMath.tanh(RefMath.bd(eta));
            BigDecimal g = RefMath.cosh(RefMath.bd(eta));
            BigDecimal oneMinusBetaCos = BigDecimal.ONE.subtract(beta.multiply(cos, mc), mc);
            BigDecimal cosPrime = cos.subtract(beta, mc).divide(oneMinusBetaCos, mc);
            BigDecimal sinPrime = sin.divide(g.multiply(oneMinusBetaCos, mc), mc);
            double magnification = BigDecimal.ONE.divide(g.multiply(oneMinusBetaCos, mc), mc).doubleValue();
            double tol = 8 * EPS * (1 + magnification);
            String what = "gamma " + gamma + ", theta " + theta;
            assertEquals(cosPrime.doubleValue(), kp.x(), tol, "cos(theta') " + what);
            assertEquals(sinPrime.doubleValue(), kp.y(), tol, "sin(theta') " + what);
            assertEquals(0.0, kp.z(), 0.0, what);
            assertEquals(1.0, kp.norm(), tol, "|k'| is 1 without renormalising, " + what);
            return null;
        });
    }

    /** Textbook limits: a photon along the velocity keeps its direction exactly, one across it leans back by beta. */
    @Test
    void photonsAlongTheVelocityKeepTheirDirectionAndOnesAcrossItLeanBackByBeta() {
        Vec3 n = Vec3.of(2, 3, 6).times(1.0 / 7);
        for (double eta : new double[] {1e-9, 0.5, 14.5, -3, 700}) {
            State s = moving(n, eta);
            assertEquals(n, Aberration.toRestFrame(s, n), "forward, eta " + eta);
            assertEquals(n.times(-1), Aberration.toRestFrame(s, n.times(-1)), "backward, eta " + eta);
        }
        // across the velocity: cos(theta') = -beta (theta = pi/2 in the textbook formula)
        Vec3 across = Aberration.toRestFrame(moving(Vec3.of(0, 0, 1), 0.5), Vec3.of(1, 0, 0));
        assertEquals(-Math.tanh(0.5), across.z(), 2 * EPS);
        assertEquals(1 / Math.cosh(0.5), across.x(), 2 * EPS);
    }

    static Stream<Arguments> threeD() {
        Random r = new Random(20260412);
        List<Arguments> out = new ArrayList<>();
        double[] rapidities = {1e-7, -0.01, 0.3, -1.2, 3, 7.6, -14.5, 14.5};
        for (double eta : rapidities) {
            for (int i = 0; i < 12; i++) {
                Vec3 n = Vec3.of(r.nextGaussian(), r.nextGaussian(), r.nextGaussian()).unit();
                Vec3 k = Vec3.of(r.nextGaussian(), r.nextGaussian(), r.nextGaussian()).unit();
                if (i < 4) {
                    // within a few 1/gamma of plus or minus the velocity: where aberration magnifies most
                    double spread = Math.exp(-Math.abs(eta)) * (i + 1);
                    k = n.times(i % 2 == 0 ? 1 : -1).plus(k.times(spread)).unit();
                }
                out.add(Arguments.of(n, eta, k));
            }
        }
        return out.stream();
    }

    /** Against the independent 50-digit vector formula (RefAberration), on headings in every direction. */
    @ParameterizedTest
    @MethodSource("threeD")
    void matchesTheFiftyDigitReferenceInThreeDimensions(Vec3 n, double eta, Vec3 k) {
        Vec3 kp = Aberration.toRestFrame(moving(n, eta), k);
        RefMath.withDigits(50, () -> {
            MathContext mc = RefMath.mc();
            BigDecimal[] nn = RefAberration.unit(vec(n));
            BigDecimal beta = RefMath.tanh(RefMath.bd(eta));
            BigDecimal gamma = RefMath.cosh(RefMath.bd(eta));
            BigDecimal[] velocity = {nn[0].multiply(beta, mc).multiply(RefMath.C, mc),
                nn[1].multiply(beta, mc).multiply(RefMath.C, mc), nn[2].multiply(beta, mc).multiply(RefMath.C, mc)};
            BigDecimal[] kk = RefAberration.unit(vec(k));
            BigDecimal[] ref = RefAberration.toRestFrame(velocity, gamma, kk);
            BigDecimal factor = RefAberration.energyFactor(
                    new org.nullpath.reference.RefState(BigDecimal.ZERO, BigDecimal.ZERO, vec(Vec3.ZERO), velocity, gamma), kk);
            double tol = 8 * EPS * (1 + BigDecimal.ONE.divide(factor, mc).doubleValue());
            double[] got = {kp.x(), kp.y(), kp.z()};
            for (int i = 0; i < 3; i++) {
                assertEquals(ref[i].doubleValue(), got[i], tol, "component " + i + " of k' for n " + n + ", eta " + eta
                        + ", k " + k);
            }
            assertEquals(1.0, kp.norm(), tol, "|k'| is 1 without renormalising");
            return null;
        });
    }

    /**
     * Far from the velocity the directions are as good as the inputs: at gamma 1e6 a photon across the velocity
     * is right to 4 ulps (the bound above would allow 8).
     */
    @Test
    void acrossTheVelocityTheResultIsGoodToAFewUlpsEvenAtGammaAMillion() {
        double eta = acosh(1e6);
        Vec3 kp = Aberration.toRestFrame(moving(Vec3.of(0, 1, 0), eta), Vec3.of(1, 0, 0));
        // textbook: cos(theta') = -beta, sin(theta') = 1 / gamma (theta = pi/2)
        assertEquals(-Math.tanh(eta), kp.y(), 4 * EPS);
        assertEquals(1 / Math.cosh(eta), kp.x(), 4 * Math.ulp(1 / Math.cosh(eta)));
        assertTrue(kp.z() == 0);
    }

    private static BigDecimal[] vec(Vec3 v) {
        return new BigDecimal[] {RefMath.bd(v.x()), RefMath.bd(v.y()), RefMath.bd(v.z())};
    }
}
