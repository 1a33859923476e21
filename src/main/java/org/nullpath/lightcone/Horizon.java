package org.nullpath.lightcone;

import org.nullpath.worldline.State;

/**
 * The last send that still arrives: the supremum of send events on the sender's worldline whose
 * signals reach the receiver. A send at or after it never arrives.
 *
 * @param exists   false when every send arrives
 * @param lastSend the sender's state at the supremum (null when {@code exists} is false)
 */
public record Horizon(boolean exists, State lastSend) {
    public static Horizon none() {
        return new Horizon(false, null);
    }
}
