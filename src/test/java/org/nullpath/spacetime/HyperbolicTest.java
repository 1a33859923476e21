package org.nullpath.spacetime;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.nullpath.spacetime.Decimal.*;

import java.math.BigDecimal;
import java.util.ArrayList;
import java.util.List;
import java.util.stream.Stream;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.Arguments;
import org.junit.jupiter.params.provider.MethodSource;
import static org.nullpath.testkit.Si.G0;
import static org.nullpath.testkit.Si.YR;

/**
 * The stable offsets of hyperbolic motion against the textbook difference forms of Rindler,
 * <i>Relativity: Special, General, and Cosmological</i> (2nd ed., 2006), hyperbolic motion, and
 * Misner, Thorne &amp; Wheeler, <i>Gravitation</i> (1973), ch. 6:
 * <pre>
 *   t - t0 = (c/a)(sinh eta - sinh eta0),  s - s0 = (c^2/a)(cosh eta - cosh eta0),  eta = eta0 + a u / c
 * </pre>
 * evaluated in {@link Decimal} at 70 digits, where the cancellation of the difference forms does no
 * harm. Required agreement: 1e-12 relative, from a u / c ~ 3e-18 (1e-9 m/s^2 for 1 s) to rapidity 50.
 */
class HyperbolicTest {
    private static final double TOL = 1e-12;

    /** (eta0, a, u) combinations spanning the regimes, with |eta0| + |a u / c| <= 50. */
    static Stream<Arguments> regimes() {
        double[] etas = {0.0, 1e-9, 0.5, -0.9, 3.0, -20.0};
        double[] accelerations = {1e-9, 3e-7, G0, -G0, 1e6 * G0, -1e3 * G0};
        double[] durations = {1.0, 3600.0, YR, 100 * YR};
        List<Arguments> rows = new ArrayList<>();
        for (double eta : etas) {
            for (double a : accelerations) {
                for (double u : durations) {
                    double x = a * u / 299_792_458.0;
                    double end = eta + x;
                    // stay inside rapidity 50, and away from the turn-round where s - s0 itself is ~0
                    if (Math.abs(eta) + Math.abs(x) <= 50 && Math.abs(end + eta) > 1e-3 * Math.abs(x)) {
                        rows.add(Arguments.of(eta, a, u));
                    }
                }
            }
        }
        rows.add(Arguments.of(0.0, 1e6 * G0, 1500.0)); // rapidity 49.07
        rows.add(Arguments.of(49.0, -G0, 10.0));
        return rows.stream();
    }

    private static BigDecimal x(double a, double u) {
        return div(mul(of(a), of(u)), C);
    }

    static BigDecimal timeOffsetReference(double eta0, double a, double u) {
        BigDecimal e0 = of(eta0);
        return mul(div(C, of(a)), sub(sinh(add(e0, x(a, u))), sinh(e0)));
    }

    static BigDecimal distanceOffsetReference(double eta0, double a, double u) {
        BigDecimal e0 = of(eta0);
        return mul(div(mul(C, C), of(a)), sub(coshMinusOne(add(e0, x(a, u))), coshMinusOne(e0)));
    }

    @ParameterizedTest(name = "eta0 = {0}, a = {1} m/s^2, u = {2} s")
    @MethodSource("regimes")
    void timeOffsetMatchesTheTextbookDifferenceAt70Digits(double eta0, double a, double u) {
        double got = Hyperbolic.timeOffset(eta0, a, u);
        assertTrue(relativeError(got, timeOffsetReference(eta0, a, u)) < TOL,
                () -> "t - t0 = " + got + " expected " + timeOffsetReference(eta0, a, u));
    }

    @ParameterizedTest(name = "eta0 = {0}, a = {1} m/s^2, u = {2} s")
    @MethodSource("regimes")
    void distanceOffsetMatchesTheTextbookDifferenceAt70Digits(double eta0, double a, double u) {
        double got = Hyperbolic.distanceOffset(eta0, a, u);
        BigDecimal ref = distanceOffsetReference(eta0, a, u);
        assertTrue(relativeError(got, ref) < TOL, () -> "s - s0 = " + got + " expected " + ref);
    }

    /** U = c t - s: dU = c dt - ds = (c^2/a)(e^-eta0 - e^-eta) (sinh x - cosh x = -e^-x). */
    static BigDecimal uOffsetReference(double eta0, double a, double u) {
        BigDecimal e0 = of(eta0);
        BigDecimal e1 = add(e0, x(a, u));
        return mul(div(mul(C, C), of(a)), sub(exp(e0.negate()), exp(e1.negate())));
    }

    /** V = c t + s: dV = c dt + ds = (c^2/a)(e^eta - e^eta0). */
    static BigDecimal vOffsetReference(double eta0, double a, double u) {
        BigDecimal e0 = of(eta0);
        BigDecimal e1 = add(e0, x(a, u));
        return mul(div(mul(C, C), of(a)), sub(exp(e1), exp(e0)));
    }

    @ParameterizedTest(name = "eta0 = {0}, a = {1} m/s^2, u = {2} s")
    @MethodSource("regimes")
    void uOffsetMatchesTheExponentialForm(double eta0, double a, double u) {
        BigDecimal ref = uOffsetReference(eta0, a, u);
        double got = Hyperbolic.uOffset(eta0, a, u);
        assertTrue(relativeError(got, ref) < TOL, () -> "U offset " + got + " expected " + ref);
    }

    @Test
    void uOffsetOfACoastIsCTimesProperTimeTimesExpMinusEta() {
        // a = 0: dt = cosh(eta) du, ds = c sinh(eta) du, so c dt - ds = c e^-eta du
        double eta = 0.75;
        assertEquals(299_792_458.0 * Math.exp(-eta) * 10.0, Hyperbolic.uOffset(eta, 0, 10.0),
                1e-15 * 299_792_458.0 * 10.0);
    }

    @ParameterizedTest(name = "eta0 = {0}, a = {1} m/s^2, u = {2} s")
    @MethodSource("regimes")
    void vOffsetMatchesTheExponentialForm(double eta0, double a, double u) {
        BigDecimal ref = vOffsetReference(eta0, a, u);
        double got = Hyperbolic.vOffset(eta0, a, u);
        assertTrue(relativeError(got, ref) < TOL, () -> "V offset " + got + " expected " + ref);
    }

    @ParameterizedTest(name = "eta0 = {0}, a = {1} m/s^2, u = {2} s")
    @MethodSource("regimes")
    void properTimeForAMissionTimeOffsetInvertsTheTimeOffset(double eta0, double a, double u) {
        // sinh(eta1) = sinh(eta0) + a dt / c  =>  u = (c/a)(asinh(sinh eta0 + a dt / c) - eta0)
        double dt = timeOffsetReference(eta0, a, u).doubleValue();
        BigDecimal e0 = of(eta0);
        BigDecimal ref = mul(div(C, of(a)), sub(asinh(add(sinh(e0), div(mul(of(a), of(dt)), C))), e0));
        assertTrue(relativeError(Hyperbolic.properTimeForTime(eta0, a, dt), ref) < TOL,
                () -> "u = " + Hyperbolic.properTimeForTime(eta0, a, dt) + " expected " + ref);
    }

    @ParameterizedTest(name = "eta0 = {0}, a = {1} m/s^2, u = {2} s")
    @MethodSource("regimes")
    void properTimeForNullOffsetsInvertsTheNullOffsets(double eta0, double a, double u) {
        BigDecimal e0 = of(eta0);
        BigDecimal k = div(of(a), mul(C, C));
        double dU = uOffsetReference(eta0, a, u).doubleValue();
        double dV = vOffsetReference(eta0, a, u).doubleValue();
        // u = -(c/a) ln(1 - a dU e^eta0 / c^2),  u = (c/a) ln(1 + a dV e^-eta0 / c^2)
        BigDecimal refU = mul(div(C, of(a)), ln(sub(BigDecimal.ONE, mul(mul(k, of(dU)), exp(e0))))).negate();
        BigDecimal refV = mul(div(C, of(a)), ln(add(BigDecimal.ONE, mul(mul(k, of(dV)), exp(e0.negate())))));
        // Recovering u from a null offset is ill-conditioned when the craft runs with the signal
        // (a > 0 for U, a < 0 for V): a relative change in dU moves u by kappa = (e^|x| - 1)/|x| times as
        // much, x = a u / c. Check only where kappa * 1e-16 stays well below the 1e-12 target.
        double x = Math.abs(a * u / 299_792_458.0);
        double kappa = Math.expm1(x) / x;
        if (a < 0 || kappa < 1e3) {
            assertTrue(relativeError(Hyperbolic.properTimeForU(eta0, a, dU), refU) < TOL, "from U");
        }
        if (a > 0 || kappa < 1e3) {
            assertTrue(relativeError(Hyperbolic.properTimeForV(eta0, a, dV), refV) < TOL, "from V");
        }
    }

    @Test
    void aNullOffsetBeyondTheHorizonHasNoProperTime() {
        // from rest at 1 g0, U = c t - s never exceeds c^2/a (Rindler 2006, hyperbolic motion)
        double limit = 299_792_458.0 * 299_792_458.0 / G0;
        assertTrue(Double.isNaN(Hyperbolic.properTimeForU(0, G0, limit)));
        assertTrue(Double.isNaN(Hyperbolic.properTimeForU(0, G0, 1.5 * limit)));
        assertTrue(Double.isFinite(Hyperbolic.properTimeForU(0, G0, 0.999 * limit)));
        assertTrue(Double.isNaN(Hyperbolic.properTimeForV(0, -G0, limit)));
    }

    @Test
    void aCoastAdvancesTimeByGammaAndDistanceByGammaBetaC() {
        // special relativity: dt = gamma du, ds = gamma beta c du for a = 0
        double eta = 1.25;
        double du = 1000.0;
        assertEquals(Math.cosh(eta) * du, Hyperbolic.timeOffset(eta, 0, du), 1e-15 * Math.cosh(eta) * du);
        assertEquals(299_792_458.0 * Math.sinh(eta) * du, Hyperbolic.distanceOffset(eta, 0, du),
                1e-15 * 299_792_458.0 * Math.sinh(eta) * du);
        assertEquals(du / Math.cosh(eta) * Math.cosh(eta), Hyperbolic.properTimeForTime(eta, 0, Math.cosh(eta) * du),
                1e-15 * du);
    }

    @ParameterizedTest(name = "eta = {0}")
    @org.junit.jupiter.params.provider.ValueSource(doubles = {1e-12, 3.3e-14, 1e-6, 0.01, 0.7, 5.0, 40.0, 299.0,
        -299.0, 300.0, 450.0, -650.0})
    void gammaMinusOneKeepsItsDigitsFromTinyRapiditiesToTheLimit(double eta) {
        // gamma - 1 = cosh(eta) - 1, reference by its series below 1 (no cancellation), cosh - 1 at 50 digits above
        assertTrue(relativeError(Hyperbolic.gammaMinusOne(eta), coshMinusOne(of(eta))) < TOL);
    }

    @Test
    void rapidityDifferenceKeepsFullPrecisionNearTheSpeedOfLight() {
        BigDecimal ref = sub(atanh(of(0.999999)), atanh(of(0.9)));
        assertTrue(relativeError(Hyperbolic.deltaRapidity(0.999999, 0.9), ref) < TOL);
    }

    @ParameterizedTest(name = "beta1 = {0}, beta0 = {1}")
    @org.junit.jupiter.params.provider.CsvSource({"0.5, 0.4999999", "1e-13, 0", "-0.3, 0.6", "0.99, 0.9", "0.2, 0.2000000001"})
    void rapidityDifferenceEqualsTheDifferenceOfAtanhs(double beta1, double beta0) {
        // relativistic velocity subtraction: eta1 - eta0 = atanh(b1) - atanh(b0)
        BigDecimal ref = sub(atanh(of(beta1)), atanh(of(beta0)));
        assertTrue(relativeError(Hyperbolic.deltaRapidity(beta1, beta0), ref) < TOL,
                () -> Hyperbolic.deltaRapidity(beta1, beta0) + " expected " + ref);
    }

    @ParameterizedTest(name = "x = {0}")
    @org.junit.jupiter.params.provider.ValueSource(doubles = {1e-300, 1e-20, 1e-8, 0.5, 3, 1e8, 1e149, 1e151, 1e300, -1e300,
        -2.5})
    void asinhMatchesTheLogarithmFormFromTinyToHugeArguments(double x) {
        // asinh(x) = ln(x + sqrt(1 + x^2)) (any calculus text), in 70 digits; beyond 1e150 the product switches to
        // ln 2 + ln |x|, where x^2 would overflow a double
        BigDecimal ref = asinh(of(x));
        double got = Hyperbolic.asinh(x);
        assertTrue(relativeError(got, ref) < 1e-15, () -> "asinh(" + x + ") = " + got + " expected " + ref);
    }

    @Test
    void anEventKeepsItsTimeAndPosition() {
        Event e = Event.of(12.5, Vec3.of(1, -2, 3));
        assertEquals(new Event(12.5, Vec3.of(1, -2, 3)), e);
        assertEquals(12.5, e.timeSeconds(), 0.0);
        assertEquals(Vec3.of(1, -2, 3), e.position());
    }
}
