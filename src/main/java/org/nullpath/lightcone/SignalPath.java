package org.nullpath.lightcone;

import org.nullpath.spacetime.Vec3;
import org.nullpath.worldline.State;

/**
 * One light signal between two worldlines: the send and receive states and the light time between
 * them, solved for directly (not as the difference of two large mission times).
 *
 * @param send             the sender's state at emission
 * @param receive          the receiver's state at arrival; null when the signal never arrives
 * @param lightTimeSeconds mission-frame light time t_rx - t_tx; +infinity when it never arrives
 * @param path             r_rx - r_tx, the photon's displacement in the mission frame (metres); its direction is
 *                         the photon's direction k; null when it never arrives
 * @param onFlightLine     true when the signal ran along a craft's flight line, so k is exactly +-heading
 */
public record SignalPath(State send, State receive, double lightTimeSeconds, Vec3 path, boolean onFlightLine) {

    public static SignalPath never(State send) {
        return new SignalPath(send, null, Double.POSITIVE_INFINITY, null, false);
    }

    public boolean delivered() {
        return receive != null;
    }
}
