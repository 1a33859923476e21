package org.nullpath.lightcone;

import org.nullpath.spacetime.Elementary;
import org.nullpath.spacetime.Hyperbolic;
import org.nullpath.spacetime.Vec3;
import org.nullpath.worldline.State;

/**
 * A body's factor gamma (1 - beta . k) for a photon travelling along the unit vector k, and that factor
 * minus one, both without cancellation: for a body receding along k it is
 * {@code exp(-|eta|) + |sinh eta| (1 - |mu|)} (minus one: {@code expm1(-|eta|) + ...} within 60 degrees of the
 * line of motion, {@code (cosh eta - 1) - |sinh eta| |mu|} beyond), otherwise {@code cosh eta + |sinh eta| |mu|}, with
 * {@code 1 - |mu| = sin^2(theta) / (1 + |mu|)} from a cross product (mu = n . k). Directions within
 * {@link LightCone#ON_LINE_ANGLE} of the body's line of motion count as on it. The Doppler factor is the
 * receiver's over the sender's; the sender-frame distance is the sender's times c T.
 *
 * @param value    gamma (1 - beta . k)
 * @param minusOne value - 1, from expm1 and (gamma beta)^2 / (gamma + 1)
 */
public record MotionFactor(double value, double minusOne) {

    /** True when unit vectors {@code n} and {@code k} are parallel or antiparallel to within the on-line angle. */
    public static boolean alongLine(Vec3 n, Vec3 k) {
        return onLine(n.cross(k).normSquared());
    }

    private static boolean onLine(double sin2) {
        return sin2 <= LightCone.ON_LINE_ANGLE * LightCone.ON_LINE_ANGLE;
    }

    /** The factor of the body in state {@code s} for the photon direction {@code k} (a unit vector). */
    public static MotionFactor of(State s, Vec3 k) {
        double eta = s.rapidity();
        if (eta == 0) {
            return new MotionFactor(1.0, 0.0);
        }
        Vec3 n = s.direction();
        double mu = n.dot(k);
        double sin2 = n.cross(k).normSquared();
        if (onLine(sin2)) {
            sin2 = 0;
            mu = Math.signum(mu);
        }
        double absMu = Math.abs(mu);
        double oneMinusAbsMu = sin2 / (1 + absMu);
        double sh = Elementary.sinh(eta);
        double ash = Math.abs(sh);
        if (eta * mu >= 0) {
            double a = Math.abs(eta);
            // value - 1: within 60 degrees of the line of motion from expm1(-|eta|); nearer the perpendicular the
            // two terms of that form (about -|eta| and +|eta|) cancel for a slow body, and (cosh eta - 1) -
            // |sinh eta| |mu| does not (it cancels only where the offset itself passes through zero)
            double minusOne = absMu < 0.5 ? Hyperbolic.gammaMinusOne(eta, sh) - ash * absMu
                    : Elementary.expm1(-a) + ash * oneMinusAbsMu;
            return new MotionFactor(Math.exp(-a) + ash * oneMinusAbsMu, minusOne);
        }
        return new MotionFactor(Elementary.cosh(eta) + ash * absMu, Hyperbolic.gammaMinusOne(eta, sh) + ash * absMu);
    }
}
