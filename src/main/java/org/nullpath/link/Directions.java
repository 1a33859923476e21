package org.nullpath.link;

import org.nullpath.lightcone.LightCone;
import org.nullpath.lightcone.MotionFactor;
import org.nullpath.lightcone.SignalPath;
import org.nullpath.spacetime.Vec3;
import org.nullpath.worldline.State;
import org.nullpath.worldline.Worldline;

/**
 * Where one message's signal leaves and where it comes from, each in its body's rest frame (the mission axes
 * carried by the pure boost of the body's velocity, no rotation), by the aberration of light
 * ({@link Aberration}). A value that does not exist is NaN: every one when the path has zero length (sender
 * and receiver at one place), the point-ahead angle also when the receiver's light on the send event's past
 * cone has zero length.
 *
 * @param aim               unit vector, sender's frame at the send event: the direction the signal must leave in,
 *                          the photon direction k = path / |path| boosted into that frame
 * @param look              unit vector, receiver's frame at arrival: where the receiver sees the sender, minus
 *                          the photon direction boosted into that frame
 * @param pointAheadRadians in the sender's frame, the angle between aim and where the sender sees the receiver
 *                          at the send event (the receiver's light arriving there, from the past cone)
 */
public record Directions(Vec3 aim, Vec3 look, double pointAheadRadians) {
    private static final Vec3 NONE = new Vec3(Double.NaN, Double.NaN, Double.NaN);

    /** Components of zero are written as 0, never -0 (adding 0.0 turns -0.0 into +0.0). */
    public Directions {
        aim = new Vec3(aim.x() + 0.0, aim.y() + 0.0, aim.z() + 0.0);
        look = new Vec3(look.x() + 0.0, look.y() + 0.0, look.z() + 0.0);
    }

    /** The directions of a delivered signal {@code p} whose receiver flies {@code receiver}. */
    public static Directions of(SignalPath p, Worldline receiver) {
        if (!p.delivered()) {
            throw new IllegalArgumentException("no directions for a signal that never arrives");
        }
        if (p.path().isZero()) {
            return new Directions(NONE, NONE, Double.NaN);
        }
        Vec3 k = photonDirection(p);
        Vec3 aim = Aberration.toRestFrame(p.send(), k);
        Vec3 look = Aberration.toRestFrame(p.receive(), k).times(-1);
        SignalPath seen = LightCone.past(p.send(), receiver);
        double pointAhead = Double.NaN;
        if (seen.path() != null && !seen.path().isZero()) {
            Vec3 toReceiver = Aberration.toRestFrame(p.send(), photonDirection(seen)).times(-1);
            pointAhead = angle(aim, toReceiver);
        }
        return new Directions(aim, look, pointAhead);
    }

    /**
     * The unit direction of the photon's travel, path / |path|; on a craft's flight line exactly plus or minus
     * the heading (the direction of whichever body's line of motion the path runs along), so that directions
     * along one line compare exactly.
     */
    static Vec3 photonDirection(SignalPath p) {
        Vec3 k = p.path().unit();
        if (p.onFlightLine()) {
            for (State s : new State[] {p.send(), p.receive()}) {
                Vec3 n = s.direction();
                if (MotionFactor.alongLine(n, k)) {
                    return n.times(Math.signum(n.dot(k)));
                }
            }
        }
        return k;
    }

    /**
     * The angle between unit vectors u and v as 2 atan2(|u - v|, |u + v|): accurate for small angles and near pi
     * alike, where acos of the dot product would lose half the digits (the form W. Kahan recommends for the
     * angle between vectors; cited from memory).
     */
    static double angle(Vec3 u, Vec3 v) {
        return 2 * Math.atan2(u.minus(v).norm(), u.plus(v).norm());
    }
}
