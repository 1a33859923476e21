package org.nullpath.schedule;

import org.nullpath.link.Budget;

import static org.nullpath.schedule.Extremes.max;
import static org.nullpath.schedule.Extremes.min;

/**
 * What a link's budget came to over its delivered messages (mutable while the schedule runs; read the
 * finished values through {@link #snapshot()}).
 */
public final class BudgetTally {
    private double worstMargin = Double.NaN;
    private double bestMargin = Double.NaN;
    private double minRxHz = Double.NaN;
    private double maxRxHz = Double.NaN;
    private double maxAbsRate = Double.NaN;
    private double minMaxRate = Double.NaN;
    private double maxMaxRate = Double.NaN;
    private long closing;
    private long outOfTuning;
    private long overRate;
    private final double carrierHz;

    BudgetTally(double carrierHz) {
        this.carrierHz = carrierHz;
    }

    void add(Budget b) {
        worstMargin = min(worstMargin, b.reception().marginDb());
        bestMargin = max(bestMargin, b.reception().marginDb());
        minRxHz = min(minRxHz, b.frequency().rxFrequencyHz());
        maxRxHz = max(maxRxHz, b.frequency().rxFrequencyHz());
        maxAbsRate = max(maxAbsRate, Math.abs(b.frequency().dopplerRateHzPerS()));
        minMaxRate = min(minMaxRate, b.reception().maxDataRateBps());
        maxMaxRate = max(maxMaxRate, b.reception().maxDataRateBps());
        closing += b.closes() ? 1 : 0;
        outOfTuning += b.frequency().inTuningRange() ? 0 : 1;
        overRate += b.frequency().withinDopplerRate() ? 0 : 1;
    }

    /** Takes in the figures of {@code later}, the tally of the messages that follow these. */
    void merge(BudgetTally later) {
        worstMargin = min(worstMargin, later.worstMargin);
        bestMargin = max(bestMargin, later.bestMargin);
        minRxHz = min(minRxHz, later.minRxHz);
        maxRxHz = max(maxRxHz, later.maxRxHz);
        maxAbsRate = max(maxAbsRate, later.maxAbsRate);
        minMaxRate = min(minMaxRate, later.minMaxRate);
        maxMaxRate = max(maxMaxRate, later.maxMaxRate);
        closing += later.closing;
        outOfTuning += later.outOfTuning;
        overRate += later.overRate;
    }

    /**
     * The finished figures.
     *
     * @param worstMarginDb         lowest margin
     * @param bestMarginDb          highest margin
     * @param minRxFrequencyHz      lowest received frequency (with the highest: the tuning range a receiver needs)
     * @param maxRxFrequencyHz      highest received frequency
     * @param maxAbsDopplerRateHzPerS largest |Doppler rate|
     * @param minMaxDataRateBps     the highest sender-frame rate that closes for every delivered message
     * @param maxMaxDataRateBps     the highest sender-frame rate that closes for any delivered message
     * @param closing               messages that close (margin, tuning, rate)
     * @param outOfTuning           messages received outside the tuning range
     * @param overDopplerRate       messages whose Doppler rate exceeds the receiver's limit
     * @param extremeShift          received frequency outside [carrier / 2, 2 carrier] for some message
     */
    public record Figures(double worstMarginDb, double bestMarginDb, double minRxFrequencyHz, double maxRxFrequencyHz,
                          double maxAbsDopplerRateHzPerS, double minMaxDataRateBps, double maxMaxDataRateBps,
                          long closing, long outOfTuning, long overDopplerRate, boolean extremeShift) {
    }

    public Figures snapshot() {
        boolean extreme = !Double.isNaN(minRxHz) && (minRxHz < carrierHz / 2 || maxRxHz > 2 * carrierHz);
        return new Figures(worstMargin, bestMargin, minRxHz, maxRxHz, maxAbsRate, minMaxRate, maxMaxRate, closing,
                outOfTuning, overRate, extreme);
    }
}
