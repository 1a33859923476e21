package org.nullpath.link;

import org.nullpath.lightcone.MotionFactor;
import org.nullpath.lightcone.SignalPath;
import org.nullpath.spacetime.Vec3;

/**
 * The Doppler factor of a signal, D = f_rx / f_tx = gamma_r (1 - beta_r . k) / (gamma_s (1 - beta_s . k)),
 * k the unit vector of the photon's travel in the mission frame (Einstein 1905; Jackson,
 * <i>Classical Electrodynamics</i>, 3rd ed., sec. 11.3).
 *
 * <p>Each factor gamma (1 - beta . k) is formed without cancellation ({@link MotionFactor}). The offset D - 1 is formed from the
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

    /** The Doppler factor of a delivered signal. */
    public static Factor of(SignalPath p) {
        if (!p.delivered()) {
            throw new IllegalArgumentException("no Doppler factor for a signal that never arrives");
        }
        Vec3 k = photonDirection(p);
        return of(MotionFactor.of(p.send(), k), MotionFactor.of(p.receive(), k));
    }

    /** The Doppler factor from the sender's and the receiver's motion factors (for the same photon direction). */
    public static Factor of(MotionFactor send, MotionFactor receive) {
        return new Factor(receive.value() / send.value(), (receive.minusOne() - send.minusOne()) / send.value());
    }

    /** The photon's unit direction of a delivered signal (the receiver's direction of motion for a zero path). */
    public static Vec3 photonDirection(SignalPath p) {
        if (p.path().isZero()) {
            // sender and receiver coincide: take the receiver's own direction of motion (D is then the
            // ratio of the bodies' factors along it)
            return p.receive().direction();
        }
        return p.path().unit();
    }
}
