package org.nullpath.link;

import org.nullpath.lightcone.MotionFactor;
import org.nullpath.spacetime.Elementary;
import org.nullpath.spacetime.Vec3;
import org.nullpath.worldline.State;

/**
 * Relativistic aberration of light: a photon's unit direction of travel k in the mission frame, as it is in
 * the rest frame of a body moving with velocity beta n (mission axes carried by the pure boost, no rotation).
 * With mu = n . k and gamma = cosh eta, beta = tanh eta (Einstein 1905, sec. 7; Rindler, <i>Relativity:
 * Special, General, and Cosmological</i>, 2nd ed., 2006, the aberration formula):
 * <pre>
 *   k' = (k + [ (gamma - 1) mu - gamma beta ] n) / (gamma (1 - beta mu))
 *      = (k_perp + gamma (mu - beta) n) / (gamma (1 - beta mu)),        k_perp = k - mu n
 *   cos(theta') = (cos(theta) - beta) / (1 - beta cos(theta)),           theta measured from n
 * </pre>
 * The denominator is {@link MotionFactor}'s gamma (1 - beta . k), formed without cancellation. The numerator's
 * part along n, gamma (mu - beta) = mu cosh eta - sinh eta, is formed the same way: for a photon moving with the
 * body (eta mu &gt; 0) it is {@code sign(eta) (exp(-|eta|) - cosh eta (1 - |mu|))}, {@code 1 - |mu| = sin^2(theta) /
 * (1 + |mu|)}, and otherwise a sum of terms of one sign. A photon within {@code LightCone.ON_LINE_ANGLE} of the
 * line of motion is taken as on it, as {@link MotionFactor} takes it, and keeps its direction exactly.
 *
 * <p>Accuracy: the result is the exact aberration of a direction within a few ulps of k (backward stable). The
 * problem itself magnifies a turn of k by up to gamma (1 + beta), about 2 gamma, for photons within about
 * 1 / gamma of the direction of motion, so there a direction known to 1e-16 is seen to about 2 gamma 1e-16.
 * The result is not renormalised; its length is 1 to within that (the tests check it).
 */
public final class Aberration {
    private Aberration() {
    }

    /** The direction of travel {@code k} (a unit vector) of a photon in the rest frame of the body in state {@code s}. */
    public static Vec3 toRestFrame(State s, Vec3 k) {
        return toRestFrame(s, k, MotionFactor.of(s, k));
    }

    /** As {@link #toRestFrame(State, Vec3)}, with the body's motion factor for {@code k} already known. */
    public static Vec3 toRestFrame(State s, Vec3 k, MotionFactor f) {
        double eta = s.rapidity();
        if (eta == 0) {
            return k;
        }
        Vec3 n = s.direction();
        if (MotionFactor.alongLine(n, k)) {
            // along the line of motion a photon keeps its direction (cos theta' = +-1 for cos theta = +-1)
            return n.times(Math.signum(n.dot(k)));
        }
        double mu = n.dot(k);
        double sin2 = n.cross(k).normSquared();
        double absMu = Math.abs(mu);
        double a = Math.abs(eta);
        double along;
        if (eta * mu >= 0) {
            along = Math.signum(eta) * (Math.exp(-a) - Elementary.cosh(a) * (sin2 / (1 + absMu)));
        } else {
            along = -Math.signum(eta) * (Elementary.cosh(a) * absMu + Elementary.sinh(a));
        }
        Vec3 v = k.minus(n.times(mu)).plus(n.times(along));
        double g = f.value();
        return new Vec3(v.x() / g, v.y() / g, v.z() / g);
    }
}
