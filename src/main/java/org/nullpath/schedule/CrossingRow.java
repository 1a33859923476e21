package org.nullpath.schedule;

/**
 * One limit's own crossing in a scanned window range (docs/output-files.md, crossings.csv): where that
 * condition starts or stops holding as the send clock increases, whether or not it closes a window.
 *
 * @param link         link name
 * @param limit        {@code margin}, {@code tuning-low}, {@code tuning-high}, {@code doppler-rate} or {@code horizon}
 * @param direction    {@code enters} (the condition starts to hold) or {@code leaves}
 * @param sendClock    sender's clock at the crossing, s
 * @param sendTime     mission time of that send, s
 * @param receiveClock receiver's clock at its arrival, s; NaN when it never arrives (the horizon)
 */
public record CrossingRow(String link, String limit, String direction, double sendClock, double sendTime,
                          double receiveClock) {
}
