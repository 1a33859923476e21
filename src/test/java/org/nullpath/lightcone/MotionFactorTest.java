package org.nullpath.lightcone;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.nullpath.spacetime.Decimal.*;

import java.math.BigDecimal;

import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;
import org.nullpath.spacetime.Vec3;
import org.nullpath.worldline.State;

/**
 * A body's factor gamma (1 - beta . k) = cosh(eta) - sinh(eta) (n . k) for a photon along the unit vector k
 * (the factor of the Doppler formula, Einstein 1905, sec. 7; Jackson, <i>Classical Electrodynamics</i>, 3rd
 * ed., sec. 11.3), and that factor minus one = (cosh(eta) - 1) - sinh(eta) (n . k), against 70-digit decimals
 * of those textbook forms with n and k normalised in 70 digits. 1e-12 relative, the product's bar for Doppler
 * factors. Directions within 1e-14 rad of the line of motion count as on it (LightCone.ON_LINE_ANGLE): there
 * the reference takes n . k = +-1 too.
 */
class MotionFactorTest {

    private static BigDecimal[] unit(double x, double y, double z) {
        BigDecimal n = sqrt(add(add(mul(of(x), of(x)), mul(of(y), of(y))), mul(of(z), of(z))));
        return new BigDecimal[] {div(of(x), n), div(of(y), n), div(of(z), n)};
    }

    @ParameterizedTest(name = "eta = {0}, n = ({1}, {2}, {3}), k = ({4}, {5}, {6})")
    @CsvSource({
        "0.5, 1, 0, 0, 1, 0, 0",              // receding along the photon: exp(-eta)
        "-0.5, 1, 0, 0, 1, 0, 0",             // negative rapidity: coming towards it, exp(+eta)
        "2.0, 1, 0, 0, -1, 0, 0",             // approaching head on
        "1e-9, 0, 0, 1, 0, 0, 1",             // slow: the offset keeps its digits
        "3.0, 0, 1, 0, 0.6, 0.8, 0",          // receding at an angle
        "-3.0, 0, 1, 0, 0.6, 0.8, 0",         // approaching at an angle
        "1.0, 1, 0, 0, 0, 1, 0",              // across the line of sight: gamma
        "1e-9, 1, 0, 0, 0, 1, 0",             // slow, exactly across: the offset (gamma - 1 = 5e-19) keeps its digits
        "1e-9, 1, 0, 0, 1e-12, 1, 0",         // slow, receding a hair off the perpendicular
        "-1e-9, 1, 0, 0, 1e-12, 1, 0",        // slow, approaching a hair off the perpendicular
        "5.0, 1, 0, 0, 1, 1e-15, 0",          // within the on-line angle: taken as on the line
        "60.0, 1, 0, 0, 1, 1e-13, 0",         // beyond it: the small angle dominates exp(-60)
        "400, 1, 0, 0, -0.6, 0.8, 0",         // past |eta| = 300, where sinh^2 nears overflow
        "-450, 1, 0, 0, 0.6, 0.8, 0",
        "400, 2, -1, 2, 2, -1, 2.5",          // receding at high rapidity, at an angle
        "310, 0, 0, 1, 0, 0, -1",             // approaching head on past 300
    })
    void theFactorAndItsOffsetMatchTheTextbookForm(double eta, double nx, double ny, double nz, double kx, double ky,
                                                   double kz) {
        Vec3 n = Vec3.of(nx, ny, nz).unit();
        Vec3 k = Vec3.of(kx, ky, kz).unit();
        MotionFactor f = MotionFactor.of(new State(0, 0, Vec3.ZERO, n, eta), k);
        BigDecimal[] nn = unit(nx, ny, nz);
        BigDecimal[] kk = unit(kx, ky, kz);
        BigDecimal mu = add(add(mul(nn[0], kk[0]), mul(nn[1], kk[1])), mul(nn[2], kk[2]));
        if (MotionFactor.alongLine(n, k)) {
            mu = BigDecimal.valueOf(mu.signum());
        }
        BigDecimal value = sub(cosh(of(eta)), mul(sinh(of(eta)), mu));
        BigDecimal minusOne = sub(coshMinusOne(of(eta)), mul(sinh(of(eta)), mu));
        assertTrue(relativeError(f.value(), value) < 1e-12, () -> "factor " + f.value() + " expected " + value);
        assertTrue(relativeError(f.minusOne(), minusOne) < 1e-12,
                () -> "factor - 1 " + f.minusOne() + " expected " + minusOne);
    }

    @ParameterizedTest(name = "k = ({0}, {1}, {2}): on the line {3}")
    @CsvSource({
        "1, 0, 0, true",
        "-1, 0, 0, true",
        "-1, 9e-15, 0, true",
        "1, 1e-14, 0, true",                  // exactly at the angle: "within" includes its edge, as LightCone.onLine
        "1, 0, 1.1e-14, false",
        "0.6, 0.8, 0, false",
    })
    void aDirectionWithinTheOnLineAngleIsOnTheLine(double kx, double ky, double kz, boolean along) {
        // n = +x; |n x k| = sin(theta) is compared with ON_LINE_ANGLE = 1e-14 rad
        assertEquals(along, MotionFactor.alongLine(Vec3.of(1, 0, 0), Vec3.of(kx, ky, kz).unit()));
    }

    @ParameterizedTest(name = "a body at rest, k = ({0}, {1}, {2})")
    @CsvSource({"1, 0, 0", "0, -1, 0"})
    void aBodyAtRestHasFactorOne(double kx, double ky, double kz) {
        MotionFactor f = MotionFactor.of(new State(0, 0, Vec3.ZERO, Vec3.of(1, 0, 0), 0), Vec3.of(kx, ky, kz));
        assertEquals(1.0, f.value(), 0.0);
        assertEquals(0.0, f.minusOne(), 0.0);
    }
}
