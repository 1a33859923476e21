package org.nullpath.link;

import java.util.Objects;
import java.util.Optional;

/**
 * One message's frequency plan and link budget (docs/link-budget.md): the part every link has (frequencies,
 * limits, received data rate) and the reception, radio ({@link Reception.Coherent}) or optical
 * ({@link Reception.PhotonCounting}). A number that does not exist is NaN: the power figures when sender and
 * receiver are at one place, where a far-field budget has no value.
 *
 * @param frequency     transmitted and received frequency, Doppler rate and the receiver's limits
 * @param rxDataRateBps received data rate, D times the sender's rate
 * @param reception     received power, the detection's own figures, margin and the highest rate that closes
 *                      (the pointing loss included)
 * @param pointing      the antennas' angles off boresight and their pointing loss
 */
public record Budget(FrequencyPlan frequency, double rxDataRateBps, Reception reception, PointingLoss pointing) {
    public Budget {
        Objects.requireNonNull(frequency, "frequency");
        Objects.requireNonNull(reception, "reception");
        Objects.requireNonNull(pointing, "pointing");
    }

    /** A budget whose antennas point exactly along the signal. */
    public Budget(FrequencyPlan frequency, double rxDataRateBps, Reception reception) {
        this(frequency, rxDataRateBps, reception, PointingLoss.NONE);
    }

    /**
     * The antennas' pointing (docs/link-budget.md, "Pointing"); NaN where a value does not exist.
     *
     * @param txOffBoresightRadians the transmit antenna's angle between aim and its boresight (its pointing
     *                              error when tracking)
     * @param rxOffBoresightRadians the receive antenna's angle between look and its boresight
     * @param lossDb                both antennas' loss off boresight, dB, included in the received power
     */
    public record PointingLoss(double txOffBoresightRadians, double rxOffBoresightRadians, double lossDb) {
        /** Both antennas exactly on the signal. */
        public static final PointingLoss NONE = new PointingLoss(0, 0, 0);
    }

    /**
     * The frequency plan of one message.
     *
     * @param txFrequencyHz     transmitted frequency in the sender's frame
     * @param rxFrequencyHz     received frequency in the receiver's frame
     * @param dopplerRateHzPerS d(rx frequency) / d(receiver clock)
     * @param inTuningRange     received frequency inside the receiver's tuning range (true when none)
     * @param withinDopplerRate |Doppler rate| within the receiver's limit (true when none)
     */
    public record FrequencyPlan(double txFrequencyHz, double rxFrequencyHz, double dopplerRateHzPerS,
                                boolean inTuningRange, boolean withinDopplerRate) {
    }

    /** What the receiver gets: power, the detection's own figures, margin and the highest rate that closes. */
    public sealed interface Reception permits Reception.Coherent, Reception.PhotonCounting {
        /** Received power, dBW. */
        double rxPowerDbw();

        /** Eb/N0 (or photons per bit) over the requirement, dB. */
        double marginDb();

        /** Highest sender-frame data rate that closes with zero margin, bit/s. */
        double maxDataRateBps();

        /** The first of this reception's figures that is infinite (beyond the double range), by its name. */
        Optional<String> beyondDoubleRange();

        /**
         * Coherent (radio) reception.
         *
         * @param rxPowerDbw     received power
         * @param cn0DbHz        carrier to noise density
         * @param ebN0Db         energy per bit over noise density
         * @param marginDb       Eb/N0 over the requirement
         * @param maxDataRateBps highest sender-frame data rate that closes with zero margin
         */
        record Coherent(double rxPowerDbw, double cn0DbHz, double ebN0Db, double marginDb, double maxDataRateBps)
                implements Reception {
            @Override
            public Optional<String> beyondDoubleRange() {
                if (noneInfinite(rxPowerDbw, cn0DbHz, ebN0Db, marginDb, maxDataRateBps)) {
                    return Optional.empty();
                }
                return firstInfinite("received power", rxPowerDbw, "C/N0", cn0DbHz, "Eb/N0", ebN0Db, "margin", marginDb,
                        "highest closing data rate", maxDataRateBps);
            }
        }

        /**
         * Photon-counting (optical direct detection) reception.
         *
         * @param rxPowerDbw       received power
         * @param rxPhotonRatePerS received photons per second
         * @param photonsPerBit    received photons per bit
         * @param marginDb         photons per bit over the requirement, dB
         * @param maxDataRateBps   highest sender-frame data rate that closes with zero margin
         */
        record PhotonCounting(double rxPowerDbw, double rxPhotonRatePerS, double photonsPerBit, double marginDb,
                              double maxDataRateBps) implements Reception {
            @Override
            public Optional<String> beyondDoubleRange() {
                if (noneInfinite(rxPowerDbw, rxPhotonRatePerS, photonsPerBit, marginDb, maxDataRateBps)) {
                    return Optional.empty();
                }
                return firstInfinite("received power", rxPowerDbw, "received photon rate", rxPhotonRatePerS,
                        "photons per bit", photonsPerBit, "margin", marginDb, "highest closing data rate", maxDataRateBps);
            }
        }
    }

    /** The reception as {@code kind}, when it is of that kind. */
    public <T extends Reception> Optional<T> reception(Class<T> kind) {
        return kind.isInstance(reception) ? Optional.of(kind.cast(reception)) : Optional.empty();
    }

    /**
     * The first figure of this budget that is infinite, by its name: a frequency, rate or power beyond what a
     * double holds (about 1.8e308), which happens only at Doppler factors or accelerations far outside any
     * mission (for example a 1e15 Hz carrier at relative rapidity 700). Empty when every figure is finite or
     * absent (NaN).
     */
    public Optional<String> beyondDoubleRange() {
        if (noneInfinite(frequency.rxFrequencyHz(), frequency.dopplerRateHzPerS(), rxDataRateBps, 0, 0)) {
            return reception.beyondDoubleRange();
        }
        Optional<String> shared = firstInfinite("received frequency", frequency.rxFrequencyHz(),
                "Doppler rate", frequency.dopplerRateHzPerS(), "received data rate", rxDataRateBps);
        return shared.isPresent() ? shared : reception.beyondDoubleRange();
    }

    /**
     * Whether none of five values is infinite (NaN, no value, is not); the check every message passes, so it
     * allocates nothing, and the names are looked up only when one is.
     */
    public static boolean noneInfinite(double a, double b, double c, double d, double e) {
        return !(Double.isInfinite(a) || Double.isInfinite(b) || Double.isInfinite(c) || Double.isInfinite(d)
                || Double.isInfinite(e));
    }

    /** The name before the first infinite value among names and values given in turn. */
    static Optional<String> firstInfinite(Object... namesAndValues) {
        for (int i = 0; i < namesAndValues.length; i += 2) {
            if (Double.isInfinite((Double) namesAndValues[i + 1])) {
                return Optional.of((String) namesAndValues[i]);
            }
        }
        return Optional.empty();
    }

    /**
     * True when a message would be received: margin >= 0 (or no far-field margin at all, sender and
     * receiver being at one place), in the tuning range, within the rate limit.
     */
    public boolean closes() {
        double margin = reception.marginDb();
        return (margin >= 0 || Double.isNaN(margin)) && frequency.inTuningRange() && frequency.withinDopplerRate();
    }
}
