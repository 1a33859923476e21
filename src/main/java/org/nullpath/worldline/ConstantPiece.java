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
    public double rapidityAfter(LineState cur, double du) {
        return cur.rapidity() + a * du / Constants.C;
    }

    @Override
    public double timeOffset(LineState cur, double du) {
        return Hyperbolic.timeOffset(cur.rapidity(), a, du);
    }

    @Override
    public double distanceOffset(LineState cur, double du) {
        return Hyperbolic.distanceOffset(cur.rapidity(), a, du);
    }

    @Override
    public double uOffset(LineState cur, double du) {
        return Hyperbolic.uOffset(cur.rapidity(), a, du);
    }

    @Override
    public double vOffset(LineState cur, double du) {
        return Hyperbolic.vOffset(cur.rapidity(), a, du);
    }

    @Override
    public double properTimeForTime(LineState cur, double dt) {
        return Hyperbolic.properTimeForTime(cur.rapidity(), a, dt);
    }

    @Override
    public double properTimeForU(LineState cur, double dU) {
        return Hyperbolic.properTimeForU(cur.rapidity(), a, dU);
    }

    @Override
    public double properTimeForV(LineState cur, double dV) {
        return Hyperbolic.properTimeForV(cur.rapidity(), a, dV);
    }
}
