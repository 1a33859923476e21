package org.nullpath.link;

import org.hipparchus.util.FastMath;
import org.nullpath.lightcone.LightCone;
import org.nullpath.lightcone.SignalPath;
import org.nullpath.spacetime.Vec3;
import org.nullpath.worldline.State;

/**
 * The Doppler factor of a signal, D = f_rx / f_tx = gamma_r (1 - beta_r . k) / (gamma_s (1 - beta_s . k)),
 * k the unit vector of the photon's travel in the mission frame (Einstein 1905; Jackson,
 * <i>Classical Electrodynamics</i>, 3rd ed., sec. 11.3).
 *
 * <p>Each factor gamma (1 - beta . k) is formed without cancellation: for a body receding along k it is
 * {@code exp(-|eta|) + |sinh eta| (1 - |mu|)}, otherwise {@code cosh eta + |sinh eta| |mu|}, with
 * {@code 1 - |mu| = sin^2(theta) / (1 + |mu|)} from a cross product. The offset D - 1 is formed from the
 * factors' own offsets ({@code expm1}, {@code (gamma beta)^2 / (gamma + 1)}), so a frequency offset of
 * 1e-13 keeps about nine significant digits or more.
 */
public final class Doppler {
    private Doppler() {
    }

    /**
     * @param doppler f_rx / f_tx
     * @param offset  doppler - 1, computed without cancellation
     */
    public record Factor(double doppler, double offset) {
    }

    /** A body's factor gamma (1 - beta . k) and that factor minus one. */
    record BodyFactor(double value, double minusOne) {
    }

    /** The Doppler factor of a delivered signal. */
    public static Factor of(SignalPath p) {
        if (!p.delivered()) {
            throw new IllegalArgumentException("no Doppler factor for a signal that never arrives");
        }
        Vec3 k = photonDirection(p);
        BodyFactor r = bodyFactor(p.receive(), k);
        BodyFactor s = bodyFactor(p.send(), k);
        return new Factor(r.value() / s.value(), (r.minusOne() - s.minusOne()) / s.value());
    }

    private static Vec3 photonDirection(SignalPath p) {
        if (p.path().isZero()) {
            // sender and receiver coincide: take the receiver's own direction of motion (D is then the
            // ratio of the bodies' factors along it)
            return p.receive().direction();
        }
        return p.path().unit();
    }

    static BodyFactor bodyFactor(State s, Vec3 k) {
        double eta = s.rapidity();
        if (eta == 0) {
            return new BodyFactor(1.0, 0.0);
        }
        Vec3 n = s.direction();
        double mu = n.dot(k);
        double sin2 = n.cross(k).normSquared();
        if (sin2 < LightCone.ON_LINE_ANGLE * LightCone.ON_LINE_ANGLE) {
            sin2 = 0;
            mu = Math.signum(mu);
        }
        double absMu = Math.abs(mu);
        double oneMinusAbsMu = sin2 / (1 + absMu);
        double ash = Math.abs(FastMath.sinh(eta));
        if (eta * mu >= 0) {
            // receding along the photon's direction: gamma (1 - |beta| |mu|)
            double a = Math.abs(eta);
            return new BodyFactor(FastMath.exp(-a) + ash * oneMinusAbsMu, FastMath.expm1(-a) + ash * oneMinusAbsMu);
        }
        double sh = FastMath.sinh(eta);
        double gm1 = sh * sh / (FastMath.cosh(eta) + 1);
        return new BodyFactor(FastMath.cosh(eta) + ash * absMu, gm1 + ash * absMu);
    }
}
