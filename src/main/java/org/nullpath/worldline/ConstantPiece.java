package org.nullpath.worldline;

import org.nullpath.spacetime.Hyperbolic;
import org.nullpath.units.Constants;

/** A burn at constant proper acceleration, or a coast (a = 0): closed forms of {@link Hyperbolic}. */
record ConstantPiece(double a) implements Piece {

    @Override
    public double acceleration(LineState cur) {
        return a;
    }

    @Override
    public double constantAcceleration() {
        return a;
    }

    @Override
    public AccelerationRange accelerationRange(LineState lo, double du) {
        return new AccelerationRange(a, a, a);
    }

    @Override
    public double rapidityAfter(LineState cur, double du) {
        return cur.rapidity() + a * du / Constants.C;
    }

    @Override
    public double offset(Measure m, LineState cur, double du) {
        double eta = cur.rapidity();
        return switch (m) {
            case CLOCK -> du;
            case TIME -> Hyperbolic.timeOffset(eta, a, du);
            case DISTANCE -> Hyperbolic.distanceOffset(eta, a, du);
            case U -> Hyperbolic.uOffset(eta, a, du);
            case V -> Hyperbolic.vOffset(eta, a, du);
        };
    }

    @Override
    public Offsets timeAndDistance(LineState cur, double du) {
        if (a == 0 || du == 0) {
            return Piece.super.timeAndDistance(cur, du);
        }
        double eta = cur.rapidity();
        double s = Hyperbolic.sinhc(a, du);
        return new Offsets(Hyperbolic.timeOffset(eta, a, du, s), Hyperbolic.distanceOffset(eta, a, du, s));
    }

    @Override
    public double properTimeFor(Measure m, LineState cur, double amount) {
        double eta = cur.rapidity();
        return switch (m) {
            case CLOCK -> amount;
            case TIME -> Hyperbolic.properTimeForTime(eta, a, amount);
            case U -> Hyperbolic.properTimeForU(eta, a, amount);
            case V -> Hyperbolic.properTimeForV(eta, a, amount);
            case DISTANCE -> throw new UnsupportedOperationException("distance along a burn may turn back");
        };
    }
}
