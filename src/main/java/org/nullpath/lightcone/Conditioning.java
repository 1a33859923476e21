package org.nullpath.lightcone;

import org.nullpath.spacetime.Vec3;
import org.nullpath.units.Constants;

/**
 * How sensitive a light time is to the send event's coordinates, which reach the solver rounded to
 * double precision: the relative condition number
 * <pre>
 *   kappa = ( |t_e| |q - 1| + |r_e| / (c (1 - beta_r . k)) ) / T,   q = (1 - beta_s . k) / (1 - beta_r . k)
 * </pre>
 * (dT/dt_e = q - 1 and |dT/dr_e| = 1 / (c (1 - beta_r . k)) follow from differentiating the cone condition
 * c T = |r_rx(t_e + T) - r_e|). A light time is then known to about kappa * 1.1e-16 relative, whatever the
 * method; nullpath reports kappa so that a planner can see when a value is ill-conditioned (for example a
 * signal chasing a craft that recedes at high gamma, sent from far off its line).
 */
public final class Conditioning {
    /** Unit roundoff of double precision. */
    public static final double EPSILON = 0x1.0p-53;

    private Conditioning() {
    }

    /** The relative condition number of the light time of a delivered signal (1 for a zero light time). */
    public static double ofLightTime(SignalPath p) {
        if (!p.delivered() || p.lightTimeSeconds() == 0 || p.path().isZero()) {
            return 1.0;
        }
        Vec3 k = p.path().unit();
        return ofLightTime(p, MotionFactor.of(p.send(), k), MotionFactor.of(p.receive(), k));
    }

    /** The same, from the bodies' motion factors already formed for the signal's photon direction. */
    public static double ofLightTime(SignalPath p, MotionFactor send, MotionFactor receive) {
        if (!p.delivered() || p.lightTimeSeconds() == 0 || p.path().isZero()) {
            return 1.0;
        }
        double oneMinusS = send.value() / p.send().gamma();
        double oneMinusR = receive.value() / p.receive().gamma();
        double q = oneMinusS / oneMinusR;
        double kappa = (Math.abs(p.send().timeSeconds()) * Math.abs(q - 1)
                + p.send().position().norm() / (Constants.C * oneMinusR)) / p.lightTimeSeconds();
        return Math.max(1.0, kappa);
    }
}
