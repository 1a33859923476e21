package org.nullpath.reference;

import java.math.BigDecimal;

/**
 * One message: the sender's state at the send, the arrival (possibly {@code never}), and the Doppler
 * factor f_rx/f_tx and frequency offset D - 1 (null when it never arrives).
 */
public record RefSignal(RefState sender, RefArrival arrival, BigDecimal doppler, BigDecimal frequencyOffset) {

    public boolean never() {
        return arrival.never();
    }

    public double dopplerDouble() {
        return doppler.doubleValue();
    }

    public double frequencyOffsetDouble() {
        return frequencyOffset.doubleValue();
    }
}
