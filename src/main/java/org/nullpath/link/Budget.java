package org.nullpath.link;

/**
 * One message's frequency plan and link budget (contract.md, "Link budget additions"). Values that
 * do not apply are NaN (photon columns on a coherent link, C/N0 and Eb/N0 on a photon-counting one; the
 * power columns when sender and receiver are at one place, where a far-field budget has no value).
 *
 * @param txFrequencyHz        transmitted frequency in the sender's frame
 * @param rxFrequencyHz        received frequency in the receiver's frame
 * @param dopplerRateHzPerS    d(rx frequency) / d(receiver clock)
 * @param inTuningRange        received frequency inside the receiver's tuning range (true when none)
 * @param withinDopplerRate    |Doppler rate| within the receiver's limit (true when none)
 * @param rxPowerDbw           received power
 * @param cn0DbHz              carrier to noise density (coherent)
 * @param rxPhotonRatePerS     received photons per second (photon counting)
 * @param rxDataRateBps        received data rate, D times the sender's rate
 * @param ebN0Db               energy per bit over noise density (coherent)
 * @param photonsPerBit        received photons per bit (photon counting)
 * @param marginDb             Eb/N0 (or photons per bit) over the requirement, dB
 * @param maxDataRateBps       highest sender-frame data rate that closes with zero margin
 */
public record Budget(double txFrequencyHz, double rxFrequencyHz, double dopplerRateHzPerS, boolean inTuningRange,
                     boolean withinDopplerRate, double rxPowerDbw, double cn0DbHz, double rxPhotonRatePerS,
                     double rxDataRateBps, double ebN0Db, double photonsPerBit, double marginDb,
                     double maxDataRateBps) {

    /**
     * True when a message would be received: margin >= 0 (or no far-field margin at all, sender and
     * receiver being at one place), in the tuning range, within the rate limit.
     */
    public boolean closes() {
        return (marginDb >= 0 || Double.isNaN(marginDb)) && inTuningRange && withinDopplerRate;
    }
}
