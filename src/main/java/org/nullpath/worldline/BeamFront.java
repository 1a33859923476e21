package org.nullpath.worldline;

import org.nullpath.spacetime.Hyperbolic;
import org.nullpath.spacetime.Vec3;
import org.nullpath.units.Constants;

/**
 * A beam from a station on a craft's flight line, seen from the start of a sail leg: the station's
 * rapidity along the heading and how far (in U = c t - along, from the leg start) the light of the
 * beam's switch-off is behind the sail.
 *
 * @param stationRapidity rapidity of the station along the heading
 * @param switchOffU      U of the switch-off's light front minus U at the leg start, metres (positive)
 */
record BeamFront(double stationRapidity, double switchOffU) {

    /**
     * @throws WorldlineException naming the leg when the station is off the flight line, ahead of the
     *                            craft, or switches off before its light reaches the sail
     */
    static BeamFront of(LegStart start, InertialWorldline station, double beamOffClock) {
        LineState lo = start.state();
        Vec3 n = start.heading();
        int i = start.index();
        State atStart = station.atTime(lo.timeSeconds());
        Vec3 rel = atStart.position().minus(start.origin());
        double along = n.dot(rel);
        Vec3 perpendicular = rel.minus(n.times(along));
        double scale = Math.max(rel.norm(), Math.abs(lo.along()));
        Vec3 v = station.velocity();
        if (perpendicular.norm() > 1e-12 * scale || v.cross(n).norm() > 1e-12 * Math.max(v.norm(), 1)) {
            throw new WorldlineException(i, "the beam station must sit (and move, if it moves) on the craft's flight line");
        }
        // at the station itself (distance 0, a launch from the array) the beam is a plane wave along the line
        if (!(along <= lo.along() + 1e-12 * scale)) {
            throw new WorldlineException(i, "the beam station must be behind the craft (or where it is) on its flight line"
                    + " at the start of the leg; it is " + Math.abs(along - lo.along()) + " m ahead");
        }
        double c = Constants.C;
        State off = station.atClock(beamOffClock);
        double targetU = c * (off.timeSeconds() - lo.timeSeconds()) - (n.dot(off.position().minus(start.origin())) - lo.along());
        if (!(targetU > 0)) {
            throw new WorldlineException(i, "the beam is switched off before its light reaches the sail at the start of the leg");
        }
        return new BeamFront(Hyperbolic.atanh(n.dot(v) / c), targetU);
    }
}
