package org.nullpath.worldline;

import org.nullpath.spacetime.Vec3;

/**
 * The null plane a worldline approaches for ever (the mark of a horizon): along the worldline,
 * {@code c t - direction . r} increases strictly towards {@code limitMetres} and never reaches it.
 * A signal sent from event (t_e, r_e) reaches the worldline if and only if
 * {@code c t_e - direction . r_e < limitMetres} (physics.md, "Light cones and horizons").
 *
 * @param direction   unit vector in which the body runs away
 * @param limitMetres the supremum of {@code c t - direction . r} along the worldline
 */
public record Asymptote(Vec3 direction, double limitMetres) {

    /** {@code c t - direction . r} of an event, the quantity compared with the limit. */
    public double nullCoordinate(double timeSeconds, Vec3 position) {
        return org.nullpath.units.Constants.C * timeSeconds - direction.dot(position);
    }
}
