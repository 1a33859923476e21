package org.nullpath.cli;

import java.math.BigDecimal;
import java.math.MathContext;
import java.math.RoundingMode;

import org.nullpath.reference.RefMath;
import org.nullpath.reference.RefSignal;
import org.nullpath.reference.RefSolver;
import org.nullpath.reference.RefState;
import org.nullpath.reference.RefWorldline;

/**
 * Test-only, independent link budget of one message in BigDecimal (100 digits, {@link RefMath}), from the
 * reference's send and arrival states. It uses the RECEIVER-frame form that docs/link-budget.md names under
 * {@code rx_power_dbw} (Friis, Proc. IRE 34, 1946; D^4 flux transformation of Rybicki &amp; Lightman, <i>Radiative
 * Processes in Astrophysics</i>, 1979, ch. 4):
 * <pre>
 *   P_rx = P_tx G_tx(f_tx) G_rx(f_rx) (lambda_rx / (4 pi R_rx))^2 D^4 / L,
 *   R_rx = gamma_r (1 - beta_r . k) c (t_rx - t_tx),   lambda_rx = c / f_rx
 * </pre>
 * while the production code sums the sender-frame form, so the two forms are checked against each other.
 * It shares no code with src/main: pi comes from Machin's formula, logarithms and powers of ten from
 * {@link RefMath#ln} and {@link RefMath#exp}.
 */
final class BudgetReference {
    /** Boltzmann constant, J/K: SI 2019 redefinition, exact. */
    static final BigDecimal K_B = new BigDecimal("1.380649e-23");
    /** Planck constant, J s: SI 2019 redefinition, exact. */
    static final BigDecimal H = new BigDecimal("6.62607015e-34");

    private static final MathContext MC = new MathContext(100, RoundingMode.HALF_EVEN);
    private static final MathContext WIDE = new MathContext(120, RoundingMode.HALF_EVEN);
    /** pi = 16 atan(1/5) - 4 atan(1/239) (Machin, 1706), summed at 120 digits. */
    static final BigDecimal PI = atanInverse(5).multiply(BigDecimal.valueOf(16))
            .subtract(atanInverse(239).multiply(BigDecimal.valueOf(4))).round(MC);
    private static final BigDecimal LN10 = RefMath.ln(BigDecimal.TEN, WIDE);

    private BudgetReference() {
    }

    /** atan(1/n) = sum (-1)^j / ((2j + 1) n^(2j+1)), at 120 digits. */
    private static BigDecimal atanInverse(int n) {
        BigDecimal n2 = BigDecimal.valueOf((long) n * n);
        BigDecimal power = BigDecimal.ONE.divide(BigDecimal.valueOf(n), WIDE);
        BigDecimal sum = power;
        BigDecimal eps = BigDecimal.ONE.movePointLeft(125);
        for (int j = 1; power.compareTo(eps) > 0; j++) {
            power = power.divide(n2, WIDE);
            BigDecimal term = power.divide(BigDecimal.valueOf(2L * j + 1), WIDE);
            sum = (j % 2 == 1) ? sum.subtract(term, WIDE) : sum.add(term, WIDE);
        }
        return sum;
    }

    static BigDecimal bd(double x) {
        return new BigDecimal(x);
    }

    static BigDecimal log10(BigDecimal x) {
        return RefMath.ln(x, WIDE).divide(LN10, MC);
    }

    /** 10 log10(x). */
    static BigDecimal db(BigDecimal x) {
        return log10(x).multiply(BigDecimal.TEN, MC);
    }

    /** 10^(dB / 10). */
    static BigDecimal fromDb(double db) {
        return RefMath.exp(bd(db).divide(BigDecimal.TEN, WIDE).multiply(LN10, WIDE), MC);
    }

    /** An antenna's linear gain at a frequency in its own frame. */
    interface Gain {
        BigDecimal at(BigDecimal hz);

        /** A fixed gain in dBi. */
        static Gain fixed(double dbi) {
            BigDecimal g = fromDb(dbi);
            return hz -> g;
        }

        /** A circular aperture: G = e (pi d f / c)^2 (Balanis, <i>Antenna Theory</i>). */
        static Gain aperture(double diameterMetres, double efficiency) {
            return hz -> {
                BigDecimal x = PI.multiply(bd(diameterMetres), MC).multiply(hz, MC).divide(RefMath.C, MC);
                return bd(efficiency).multiply(x.multiply(x, MC), MC);
            };
        }
    }

    /**
     * A link's terms, each as the double the scenario's text converts to (number times unit factor).
     *
     * @param maxRateHzPerS NaN when the receiver has no Doppler-rate limit
     * @param tuneLoHz      NaN when the receiver has no tuning range
     * @param required      required Eb/N0 in dB (coherent) or required photons per bit (photon counting)
     */
    record Terms(double carrierHz, boolean precompensate, double txWatts, Gain txGain, double txLossDb, Gain rxGain,
                 double noiseKelvin, double rxLossDb, double tuneLoHz, double tuneHiHz, double maxRateHzPerS,
                 boolean photonCounting, double dataRateBps, double required) {
    }

    /**
     * The expected budget of one message. {@code dopplerRate} (and so {@code withinRate}) is null when it is not
     * compared (a leg boundary is too close).
     */
    record Expected(BigDecimal doppler, BigDecimal txHz, BigDecimal rxHz, BigDecimal dopplerRate, boolean inRange,
                    Boolean withinRate, BigDecimal rxPowerDbw, BigDecimal cn0DbHz, BigDecimal photonRate,
                    BigDecimal rxRateBps, BigDecimal ebn0Db, BigDecimal photonsPerBit, BigDecimal marginDb,
                    BigDecimal maxRateBps) {
    }

    /**
     * The budget of the message sent at {@code sendClock} (sender's clock, s), or null when it never arrives.
     *
     * @param withRate whether to compute the Doppler rate (by the reference's own central difference)
     */
    static Expected of(Terms t, RefWorldline sender, BigDecimal sendClock, RefWorldline receiver, boolean withRate) {
        RefSignal s = RefSolver.send(sender, sendClock, receiver);
        if (s.never()) {
            return null;
        }
        BigDecimal d = s.doppler();
        RefState tx = s.sender();
        RefState rx = s.arrival().state();

        // frequency plan (docs/link-budget.md, tx_frequency_hz: pre-compensation transmits f_nom / D)
        BigDecimal carrier = bd(t.carrierHz());
        BigDecimal fTx = t.precompensate() ? carrier.divide(d, MC) : carrier;
        BigDecimal fRx = t.precompensate() ? carrier : fTx.multiply(d, MC);
        BigDecimal rate = null;
        Boolean withinRate = null;
        if (withRate) {
            // d f_rx / d(receiver clock): zero when the sender keeps f_rx at the carrier, else f_tx dD/d(tau_rx)
            rate = t.precompensate() ? BigDecimal.ZERO
                    : fTx.multiply(RefSolver.dopplerRate(sender, sendClock, receiver), MC);
            withinRate = Double.isNaN(t.maxRateHzPerS()) || rate.abs().compareTo(bd(t.maxRateHzPerS())) <= 0;
        }
        boolean inRange = Double.isNaN(t.tuneLoHz())
                || (fRx.compareTo(bd(t.tuneLoHz())) >= 0 && fRx.compareTo(bd(t.tuneHiHz())) <= 0);

        // receiver-frame distance R_rx = gamma_r (1 - beta_r . k) c T, k the photon's unit direction
        BigDecimal[] path = new BigDecimal[3];
        for (int i = 0; i < 3; i++) {
            path[i] = rx.position()[i].subtract(tx.position()[i], MC);
        }
        BigDecimal length = RefMath.sqrt(path[0].multiply(path[0], MC).add(path[1].multiply(path[1], MC), MC)
                .add(path[2].multiply(path[2], MC), MC), MC);
        BigDecimal vDotK = BigDecimal.ZERO;
        for (int i = 0; i < 3; i++) {
            vDotK = vDotK.add(rx.velocity()[i].multiply(path[i], MC), MC);
        }
        vDotK = vDotK.divide(length, MC);
        BigDecimal rRx = rx.gamma().multiply(BigDecimal.ONE.subtract(vDotK.divide(RefMath.C, MC), MC), MC)
                .multiply(RefMath.C, MC).multiply(s.arrival().lightTime(), MC);

        BigDecimal lambdaRx = RefMath.C.divide(fRx, MC);
        BigDecimal spread = lambdaRx.divide(BigDecimal.valueOf(4).multiply(PI, MC).multiply(rRx, MC), MC);
        BigDecimal d2 = d.multiply(d, MC);
        BigDecimal pRx = bd(t.txWatts()).multiply(t.txGain().at(fTx), MC).multiply(t.rxGain().at(fRx), MC)
                .multiply(spread.multiply(spread, MC), MC).multiply(d2.multiply(d2, MC), MC)
                .divide(fromDb(t.txLossDb() + t.rxLossDb()), MC);
        BigDecimal rxRate = d.multiply(bd(t.dataRateBps()), MC);

        if (!t.photonCounting()) {
            BigDecimal cn0 = pRx.divide(K_B.multiply(bd(t.noiseKelvin()), MC), MC);
            BigDecimal ebn0 = cn0.divide(rxRate, MC);
            BigDecimal ebn0Db = db(ebn0);
            BigDecimal maxRate = cn0.divide(d.multiply(fromDb(t.required()), MC), MC);
            return new Expected(d, fTx, fRx, rate, inRange, withinRate, db(pRx), db(cn0), null, rxRate, ebn0Db, null,
                    ebn0Db.subtract(bd(t.required()), MC), maxRate);
        }
        BigDecimal photons = pRx.divide(H.multiply(fRx, MC), MC);
        BigDecimal ppb = photons.divide(rxRate, MC);
        BigDecimal margin = db(ppb.divide(bd(t.required()), MC));
        BigDecimal maxRate = photons.divide(d.multiply(bd(t.required()), MC), MC);
        return new Expected(d, fTx, fRx, rate, inRange, withinRate, db(pRx), null, photons, rxRate, null, ppb, margin,
                maxRate);
    }
}
