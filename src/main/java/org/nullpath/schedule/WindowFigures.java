package org.nullpath.schedule;

/**
 * A link window with its open durations and data volumes (docs/output-files.md, windows.csv).
 *
 * @param window             the window's edges and what closed it
 * @param sendOpenSeconds    closes - opens on the sender's clock, s
 * @param receiveOpenSeconds the arrivals of the window's first and last sends, their interval on the
 *                           receiver's clock, s; NaN when the last send never arrives (closed by the horizon)
 * @param volumeBits         the planned data rate times {@code sendOpenSeconds}, bit; NaN without a planned rate
 * @param adaptiveVolumeBits the integral of the highest closing rate (max_data_rate_bps) over the window on
 *                           the sender's clock, bit; NaN where that rate has no value
 */
public record WindowFigures(WindowRow window, double sendOpenSeconds, double receiveOpenSeconds, double volumeBits,
                            double adaptiveVolumeBits) {
}
