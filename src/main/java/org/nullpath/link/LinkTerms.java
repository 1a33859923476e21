package org.nullpath.link;

/**
 * The radio or optical terms of a one-way link (docs/link-budget.md). Frequencies are
 * in the sender's frame unless named otherwise. Absent limits are NaN.
 *
 * @param carrierHz              nominal carrier frequency (from {@code carrier}, or c / {@code wavelength})
 * @param precompensate          true: the sender transmits carrier / D so the receiver sees the carrier
 * @param txPowerWatts           transmitter power
 * @param txAntenna              transmit antenna, gain taken at the transmitted frequency
 * @param txLossDb               transmit-side losses, dB
 * @param rxAntenna              receive antenna, gain taken at the received frequency
 * @param noiseTemperatureKelvin system noise temperature (coherent detection)
 * @param rxLossDb               receive-side losses, dB
 * @param tuningMinHz            lower edge of the receiver's tuning range, NaN when unlimited
 * @param tuningMaxHz            upper edge of the receiver's tuning range, NaN when unlimited
 * @param maxDopplerRateHzPerS   largest |d f_rx / d clock_rx| the receiver tracks, NaN when unlimited
 * @param detection              coherent (radio) or photon counting (optical)
 * @param dataRateBps            data rate in the sender's frame
 * @param requiredEbN0Db         required Eb/N0 (coherent), NaN otherwise
 * @param requiredPhotonsPerBit  required photons per bit (photon counting), NaN otherwise
 * @param txPointing             how the transmit antenna is pointed
 * @param rxPointing             how the receive antenna is pointed
 */
public record LinkTerms(double carrierHz, boolean precompensate, double txPowerWatts, Antenna txAntenna,
                        double txLossDb, Antenna rxAntenna, double noiseTemperatureKelvin, double rxLossDb,
                        double tuningMinHz, double tuningMaxHz, double maxDopplerRateHzPerS, Detection detection,
                        double dataRateBps, double requiredEbN0Db, double requiredPhotonsPerBit,
                        Pointing txPointing, Pointing rxPointing) {

    /** Terms whose antennas both track the signal exactly (no pointing loss). */
    public LinkTerms(double carrierHz, boolean precompensate, double txPowerWatts, Antenna txAntenna,
                     double txLossDb, Antenna rxAntenna, double noiseTemperatureKelvin, double rxLossDb,
                     double tuningMinHz, double tuningMaxHz, double maxDopplerRateHzPerS, Detection detection,
                     double dataRateBps, double requiredEbN0Db, double requiredPhotonsPerBit) {
        this(carrierHz, precompensate, txPowerWatts, txAntenna, txLossDb, rxAntenna, noiseTemperatureKelvin, rxLossDb,
                tuningMinHz, tuningMaxHz, maxDopplerRateHzPerS, detection, dataRateBps, requiredEbN0Db,
                requiredPhotonsPerBit, Pointing.EXACT, Pointing.EXACT);
    }

    /** How the receiver detects the signal. */
    public enum Detection {
        COHERENT, PHOTON_COUNTING
    }

    public boolean hasTuningRange() {
        return !Double.isNaN(tuningMinHz);
    }

    public boolean hasDopplerRateLimit() {
        return !Double.isNaN(maxDopplerRateHzPerS);
    }
}
