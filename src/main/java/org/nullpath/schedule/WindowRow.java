package org.nullpath.schedule;

/**
 * A send-clock interval in which a message on a link would be received: margin >= 0, inside the
 * tuning range and within the Doppler-rate limit (docs/output-files.md, windows.csv).
 *
 * @param link        link name
 * @param opensClock  sender's clock where the window opens, s
 * @param closesClock sender's clock where it closes, s
 * @param closedBy    what closed it: margin, tuning, doppler-rate, horizon, or end (of the scanned range)
 */
public record WindowRow(String link, double opensClock, double closesClock, String closedBy) {
}
