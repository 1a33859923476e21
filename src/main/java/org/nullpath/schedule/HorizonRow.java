package org.nullpath.schedule;

/**
 * A link's horizon (docs/output-files.md, horizons.csv): the supremum of send times that still arrive.
 *
 * @param link          link name
 * @param hasHorizon    false when every send arrives
 * @param lastSendClock sender's clock at the supremum, s (NaN when none)
 * @param lastSendTime  mission time of the supremum, s (NaN when none)
 */
public record HorizonRow(String link, boolean hasHorizon, double lastSendClock, double lastSendTime) {
}
