package org.nullpath.link;

import org.nullpath.lightcone.MotionFactor;
import org.nullpath.lightcone.SignalPath;
import org.nullpath.spacetime.Vec3;
import org.nullpath.units.Constants;

/**
 * The relativistic link budget of one message, in the sender-frame form of the Friis equation
 * (Friis, Proc. IRE 34, 1946; the D^4 flux transformation of Rybicki &amp; Lightman, <i>Radiative
 * Processes in Astrophysics</i>, 1979, ch. 4, makes it equal to the receiver-frame form):
 * <pre>
 *   P_rx = P_tx G_tx(f_tx) G_rx(f_rx) (lambda_tx / (4 pi R_tx))^2 / L,
 *   R_tx = gamma_s (1 - beta_s . k) c (t_rx - t_tx)
 * </pre>
 * Everything is summed in decibels, so dB columns are exact to rounding. At zero velocity this is the
 * Friis equation and the free-space loss is ITU-R P.525's 92.45 + 20 log10(f/GHz) + 20 log10(d/km).
 * Noise: N0 = k_B T_sys in the receiver's frame; received data rate D R_tx; Eb/N0 = (C/N0)/R_rx;
 * photon counting: photon rate P_rx / (h f_rx), photons per bit = photon rate / R_rx.
 */
public final class LinkBudget {
    private LinkBudget() {
    }

    private static final double BOLTZMANN_DB = 10 * Math.log10(Constants.BOLTZMANN);

    /** Decibels of a positive linear ratio. */
    static double db(double x) {
        return 10 * Math.log10(x);
    }

    /** The frequency the sender transmits for this message: the carrier, or carrier / D when pre-compensating. */
    public static double txFrequency(LinkTerms t, Doppler.Factor d) {
        return t.precompensate() ? t.carrierHz() / d.doppler() : t.carrierHz();
    }

    /** The sender-frame distance R_tx = gamma_s (1 - beta_s . k) c T, metres. */
    public static double senderFrameDistance(SignalPath p) {
        if (p.path().isZero()) {
            return 0;
        }
        MotionFactor s = MotionFactor.of(p.send(), p.path().unit());
        return s.value() * Constants.C * p.lightTimeSeconds();
    }

    /**
     * The antennas' angles off boresight and their loss (docs/link-budget.md, "Pointing"): each antenna's gain
     * off boresight from the main-lobe rule of {@link Pointing}, the transmitter's on-axis gain and beamwidth at
     * {@code fTx}, the receiver's at {@code fRx}; the transmitter judged against aim, the receiver against look.
     */
    public static Budget.PointingLoss pointingLoss(LinkTerms t, SignalPath p, Directions dir, double fTx, double fRx) {
        double txOff = t.txPointing().offBoresightRadians(dir.aim(), p.send());
        double rxOff = t.rxPointing().offBoresightRadians(dir.look(), p.receive());
        double txLoss = t.txPointing().lossDb(db(t.txAntenna().gainAt(fTx)), txOff,
                t.txPointing().beamwidthRadians(t.txAntenna(), fTx));
        double rxLoss = t.rxPointing().lossDb(db(t.rxAntenna().gainAt(fRx)), rxOff,
                t.rxPointing().beamwidthRadians(t.rxAntenna(), fRx));
        return new Budget.PointingLoss(txOff, rxOff, txLoss + rxLoss);
    }

    /**
     * The budget of a delivered message on a link whose antennas both track the signal, given its Doppler factor
     * and its Doppler factor's rate dD/d(tau_rx): their pointing needs no directions.
     */
    public static Budget evaluate(LinkTerms t, SignalPath p, Doppler.Factor d, double dopplerFactorRate) {
        if (t.txPointing().boresight() != Pointing.Boresight.TRACKING
                || t.rxPointing().boresight() != Pointing.Boresight.TRACKING) {
            throw new IllegalArgumentException("an antenna with a fixed boresight needs the signal's directions");
        }
        Vec3 none = new Vec3(Double.NaN, Double.NaN, Double.NaN);
        return evaluate(t, p, d, dopplerFactorRate, new Directions(none, none, Double.NaN));
    }

    /**
     * The budget of a delivered message, given its Doppler factor, its Doppler factor's rate dD/d(tau_rx) and
     * its pointing directions (the pointing loss is subtracted from the received power last, so that antennas
     * exactly on the signal leave every figure as it is without pointing).
     */
    public static Budget evaluate(LinkTerms t, SignalPath p, Doppler.Factor d, double dopplerFactorRate,
                                  Directions dir) {
        double fTx = txFrequency(t, d);
        double fRx = t.precompensate() ? t.carrierHz() : fTx * d.doppler();
        double rate = t.precompensate() ? 0.0 : fTx * dopplerFactorRate;
        boolean inRange = !t.hasTuningRange() || (fRx >= t.tuningMinHz() && fRx <= t.tuningMaxHz());
        boolean withinRate = !t.hasDopplerRateLimit() || Math.abs(rate) <= t.maxDopplerRateHzPerS();
        double rTx = senderFrameDistance(p);
        Budget.FrequencyPlan plan = new Budget.FrequencyPlan(fTx, fRx, rate, inRange, withinRate);
        double rxRate = d.doppler() * t.dataRateBps();
        boolean coherent = t.detection() == LinkTerms.Detection.COHERENT;
        Budget.PointingLoss pointing = pointingLoss(t, p, dir, fTx, fRx);
        if (!(rTx > 0)) {
            // sender and receiver at one place (a craft leaving its station): the far-field budget has no
            // value there; frequencies and flags still do, the power figures do not exist
            double n = Double.NaN;
            return new Budget(plan, rxRate, coherent ? new Budget.Reception.Coherent(n, n, n, n, n)
                    : new Budget.Reception.PhotonCounting(n, n, n, n, n), pointing);
        }
        double lambdaTx = Constants.C / fTx;
        double pathDb = 20 * Math.log10(lambdaTx / (4 * Math.PI * rTx));
        double rxPowerDbw = db(t.txPowerWatts()) + db(t.txAntenna().gainAt(fTx)) + db(t.rxAntenna().gainAt(fRx))
                + pathDb - t.txLossDb() - t.rxLossDb() - pointing.lossDb();
        if (coherent) {
            double cn0 = rxPowerDbw - BOLTZMANN_DB - db(t.noiseTemperatureKelvin());
            double ebn0 = cn0 - db(rxRate);
            double margin = ebn0 - t.requiredEbN0Db();
            double maxRate = Math.pow(10, (cn0 - t.requiredEbN0Db()) / 10) / d.doppler();
            return new Budget(plan, rxRate, new Budget.Reception.Coherent(rxPowerDbw, cn0, ebn0, margin, maxRate),
                    pointing);
        }
        double photonRate = Math.pow(10, rxPowerDbw / 10) / (Constants.PLANCK * fRx);
        double ppb = photonRate / rxRate;
        double margin = db(ppb) - db(t.requiredPhotonsPerBit());
        double maxRate = photonRate / (d.doppler() * t.requiredPhotonsPerBit());
        return new Budget(plan, rxRate, new Budget.Reception.PhotonCounting(rxPowerDbw, photonRate, ppb, margin, maxRate),
                pointing);
    }
}
