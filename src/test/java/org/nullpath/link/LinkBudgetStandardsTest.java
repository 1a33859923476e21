package org.nullpath.link;

import org.apache.commons.math3.special.Erf;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;
import org.nullpath.lightcone.LightCone;
import org.nullpath.lightcone.SignalPath;
import org.nullpath.spacetime.Vec3;
import org.nullpath.worldline.InertialWorldline;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.nullpath.testkit.Si.AU;
import static org.nullpath.testkit.Si.C;
import static org.nullpath.testkit.Si.H;
import static org.nullpath.testkit.Si.K_B;
import static org.nullpath.testkit.Si.LY;

/**
 * Link-budget checks that need no relativity: two stations at rest, so D = 1 and the budget must reduce
 * to the textbook radio and optical formulas. Every expected value below is computed here from the named
 * published formula, not from the production code.
 *
 * <p>Constants: c = 299 792 458 m/s (SI Brochure, 9th ed., 2019, exact); au = 149 597 870 700 m (IAU 2012
 * Resolution B2); ly = c x 365.25 d (IAU); k_B = 1.380 649e-23 J/K and h = 6.626 070 15e-34 J s (SI 2019
 * redefinition, exact).
 */
class LinkBudgetStandardsTest {
    /** dB columns against an exact formula: the product's bar for dB values. */
    static final double EXACT_DB = 1e-9;
    /** Against ITU-R P.525's rounded constant 92.45 and the rounded -228.6 dBW/K/Hz. */
    static final double ROUNDED_DB = 0.01;

    // ---------------------------------------------------------------- helpers

    private static double db(double x) {
        return 10 * Math.log10(x);
    }

    /**
     * The signal between two stations at rest {@code d} metres apart, along an oblique direction
     * (3, 4, 12)/13 so that no axis is special; sent when the sender's clock reads 1000 s.
     */
    private static SignalPath atRest(double d) {
        InertialWorldline from = InertialWorldline.atRest(Vec3.ZERO);
        InertialWorldline to = InertialWorldline.atRest(new Vec3(3 * d / 13, 4 * d / 13, 12 * d / 13));
        SignalPath p = LightCone.future(from.atClock(1000.0), to);
        assertTrue(p.delivered());
        return p;
    }

    /** The distance between the two stations of {@link #atRest}, from the photon's own path. */
    private static double distance(SignalPath p) {
        return p.path().norm();
    }

    private static LinkTerms coherent(double carrierHz, double txWatts, Antenna tx, double txLossDb, Antenna rx,
                                      double rxLossDb, double noiseKelvin, double dataRateBps, double requiredEbN0Db) {
        return new LinkTerms(carrierHz, false, txWatts, tx, txLossDb, rx, noiseKelvin, rxLossDb, Double.NaN,
                Double.NaN, Double.NaN, LinkTerms.Detection.COHERENT, dataRateBps, requiredEbN0Db, Double.NaN);
    }

    private static Budget evaluate(LinkTerms t, SignalPath p) {
        Doppler.Factor d = Doppler.of(p);
        assertEquals(1.0, d.doppler(), 0.0, "stations at rest: no Doppler shift");
        return LinkBudget.evaluate(t, p, d, 0.0);
    }

    /**
     * Friis, Proc. IRE 34 (1946): P_rx = P_tx G_tx G_rx (lambda / (4 pi d))^2, lambda = c / f; losses
     * (linear, from dB) divide it. Returned in dBW.
     */
    private static double friisDbw(double txWatts, double gTx, double gRx, double f, double d, double lossDb) {
        double lambda = C / f;
        double ratio = lambda / (4 * Math.PI * d);
        return db(txWatts * gTx * gRx * ratio * ratio) - lossDb;
    }

    /** ITU-R P.525: free-space basic transmission loss L_fs(dB) = 92.45 + 20 log10(f/GHz) + 20 log10(d/km). */
    private static double itu525Db(double f, double d) {
        return 92.45 + 20 * Math.log10(f / 1e9) + 20 * Math.log10(d / 1e3);
    }

    // ---------------------------------------------------------------- Friis and ITU-R P.525

    @ParameterizedTest(name = "{0} Hz over {1} m: Friis (1946) and ITU-R P.525")
    @CsvSource({
        // frequency Hz, distance m (1 au, IAU 2012 B2; 1 ly, IAU)
        "2.2e9,   149597870700",
        "8.4e9,   149597870700",
        "32e9,    149597870700",
        "2.2e9,   9460730472580800",
        "8.4e9,   9460730472580800",
        "32e9,    9460730472580800",
        "300e6,   9460730472580800",
    })
    void atZeroVelocityTheBudgetIsTheFriisEquationAndTheFreeSpaceLossIsItuP525(double f, double d) {
        SignalPath p = atRest(d);
        assertEquals(d, distance(p), 1e-12 * d, "station separation");
        assertEquals(d / C, p.lightTimeSeconds(), 1e-12 * d / C, "light time d / c");

        // isotropic antennas, 1 W, no losses: received power is minus the free-space loss
        Budget bare = evaluate(coherent(f, 1.0, new Antenna.FixedGain(0), 0, new Antenna.FixedGain(0), 0, 300,
                1000, 3), p);
        assertEquals(friisDbw(1.0, 1.0, 1.0, f, distance(p), 0), bare.reception().rxPowerDbw(), EXACT_DB, "Friis (1946), 0 dBi");
        assertEquals(itu525Db(f, d), -bare.reception().rxPowerDbw(), ROUNDED_DB, "ITU-R P.525 free-space loss");

        // a full budget: 20 kW, 74 dBi transmit, 68 dBi receive, 1 dB + 2 dB losses
        Budget full = evaluate(coherent(f, 20e3, new Antenna.FixedGain(74), 1, new Antenna.FixedGain(68), 2, 300,
                1000, 3), p);
        double friis = friisDbw(20e3, Math.pow(10, 7.4), Math.pow(10, 6.8), f, distance(p), 3);
        assertEquals(friis, full.reception().rxPowerDbw(), EXACT_DB, "Friis (1946) with gains and losses");
        // the same in the link-budget sum of ITU-R P.525's loss: P_tx + G_tx + G_rx - L_fs - losses
        assertEquals(db(20e3) + 74 + 68 - itu525Db(f, d) - 3, full.reception().rxPowerDbw(), ROUNDED_DB,
                "budget sum with the ITU-R P.525 loss");

        // at rest there is no frequency change and the received rate is the sent rate
        assertEquals(f, full.frequency().txFrequencyHz(), 0.0);
        assertEquals(f, full.frequency().rxFrequencyHz(), 0.0);
        assertEquals(1000.0, full.rxDataRateBps(), 0.0);
        assertEquals(0.0, full.frequency().dopplerRateHzPerS(), 0.0);
    }

    // ---------------------------------------------------------------- Boltzmann constant

    @Test
    void boltzmannConstantIsMinus228Point6DbwPerKelvinPerHertz() {
        // SI 2019: k_B = 1.380 649e-23 J/K exactly; -228.6 dBW/K/Hz is the common-practice figure (no single source),
        // 10 log10(1.380649e-23) = -228.599 17 (computed). The product's constant, and the noise density its budget
        // subtracts (P_rx - C/N0 - 10 log10 T = 10 log10 k_B) at 1 K:
        assertEquals(K_B, org.nullpath.units.Constants.BOLTZMANN, 0.0, "k_B, SI 2019");
        Budget b = evaluate(coherent(8.4e9, 20e3, new Antenna.FixedGain(74), 1, new Antenna.FixedGain(68), 1, 1.0,
                1000, 3), atRest(AU));
        double n0Db = b.reception().rxPowerDbw() - cn0(b);
        assertEquals(-228.599_17, n0Db, 1e-5, "N0 = k_B x 1 K in dBW/Hz");
        assertEquals(-228.6, n0Db, ROUNDED_DB, "the common-practice -228.6 dBW/K/Hz");
    }

    @ParameterizedTest(name = "noise temperature {0} K: C/N0 = P_rx + 228.6 - 10 log10 T")
    @CsvSource({"20", "75", "300", "1500"})
    void carrierToNoiseDensityUsesBoltzmannConstant(double kelvin) {
        SignalPath p = atRest(AU);
        Budget b = evaluate(coherent(8.4e9, 20e3, new Antenna.FixedGain(74), 1, new Antenna.FixedGain(68), 1,
                kelvin, 1000, 3), p);
        // N0 = k_B T (Nyquist noise density), C/N0 = P_rx / N0
        assertEquals(b.reception().rxPowerDbw() + 228.6 - db(kelvin), cn0(b), ROUNDED_DB,
                "with -228.6 dBW/K/Hz (common practice)");
        assertEquals(b.reception().rxPowerDbw() - db(K_B) - db(kelvin), cn0(b), EXACT_DB, "with k_B from SI 2019 (exact)");
        // and the received power itself still is Friis
        assertEquals(friisDbw(20e3, Math.pow(10, 7.4), Math.pow(10, 6.8), 8.4e9, distance(p), 2), b.reception().rxPowerDbw(),
                EXACT_DB);
        assertTrue(b.reception(Budget.Reception.PhotonCounting.class).isEmpty(), "coherent: no photon figures");
    }

    // ---------------------------------------------------------------- Shannon limit and uncoded BPSK

    @Test
    void atTheShannonLimitTheHighestRateIsTheInfiniteBandwidthCapacity() {
        // Shannon (1948): C = B log2(1 + S / (N0 B)) tends to (S / N0) log2 e = S / (N0 ln 2) as B grows without
        // bound, so the least Eb/N0 that carries information is ln 2 (-1.59 dB, the common-practice figure). A link
        // that requires exactly that Eb/N0 closes at most at the capacity, from Friis and N0 = k_B T.
        SignalPath p = atRest(LY);
        double fHz = 32e9;
        double kelvin = 25;
        double s = Math.pow(10, friisDbw(1e6, Math.pow(10, 8.0), Math.pow(10, 8.5), fHz, distance(p), 1.5) / 10);
        double capacity = s / (K_B * kelvin * Math.log(2));
        Budget exact = evaluate(coherent(fHz, 1e6, new Antenna.FixedGain(80), 0.5, new Antenna.FixedGain(85), 1.0,
                kelvin, 1000, db(Math.log(2))), p);
        assertEquals(capacity, exact.reception().maxDataRateBps(), 1e-12 * capacity, "S / (N0 ln 2)");
        Budget rounded = evaluate(coherent(fHz, 1e6, new Antenna.FixedGain(80), 0.5, new Antenna.FixedGain(85), 1.0,
                kelvin, 1000, -1.59), p);
        assertEquals(db(capacity), db(rounded.reception().maxDataRateBps()), 0.005, "with the rounded -1.59 dB");
    }

    @Test
    void uncodedBpskNeeds9Point6DbForABitErrorRateOf1eMinus5() {
        // Proakis, Digital Communications (4th ed., ch. 5; edition and section from memory): coherent BPSK has
        // P_b = Q(sqrt(2 Eb/N0)) = erfc(sqrt(Eb/N0)) / 2 (Apache Commons Math's erfc), which first reaches 1e-5 near
        // 9.6 dB (common-practice figure). A link run at the highest rate that closes against 9.6 dB sees an Eb/N0
        // with P_b just under 1e-5; at a rate 0.1 dB higher its Eb/N0 gives more than 1e-5 and it does not close.
        SignalPath p = atRest(AU);
        LinkTerms probe = coherent(8.4e9, 20e3, new Antenna.FixedGain(74), 1, new Antenna.FixedGain(68), 1, 300, 1000,
                9.6);
        double rate = evaluate(probe, p).reception().maxDataRateBps();
        Budget atRate = evaluate(coherent(8.4e9, 20e3, new Antenna.FixedGain(74), 1, new Antenna.FixedGain(68), 1, 300,
                rate, 9.6), p);
        double pb = Erf.erfc(Math.sqrt(Math.pow(10, ebn0(atRate) / 10))) / 2;
        assertTrue(pb <= 1e-5 && pb > 0.95e-5, "P_b at the highest closing rate = " + pb);
        assertEquals(9.6, ebn0(atRate), 1e-9, "Eb/N0 at the highest closing rate is the requirement");
        assertEquals(0.0, atRate.reception().marginDb(), EXACT_DB, "zero margin there");
        Budget faster = evaluate(coherent(8.4e9, 20e3, new Antenna.FixedGain(74), 1, new Antenna.FixedGain(68), 1, 300,
                rate * Math.pow(10, 0.01), 9.6), p);
        double pbFaster = Erf.erfc(Math.sqrt(Math.pow(10, ebn0(faster) / 10))) / 2;
        assertEquals(9.5, ebn0(faster), 1e-9, "0.1 dB more rate, 0.1 dB less Eb/N0");
        assertTrue(pbFaster > 1e-5, "9.5 dB is not enough: P_b = " + pbFaster);
        assertTrue(!faster.closes(), "and it does not close");
    }

    @ParameterizedTest(name = "required Eb/N0 {0} dB ({1}): margin 0 and max rate = data rate when Eb/N0 equals it")
    @CsvSource({
        "-1.591745389548616,  Shannon 1948 limit 10 log10(ln 2)",
        "9.6,                 uncoded BPSK at 1e-5 (Proakis)",
    })
    void aLinkExactlyAtItsRequirementHasZeroMarginAndMaxRateEqualToItsRate(double requiredDb, String source) {
        SignalPath p = atRest(LY);
        double fHz = 32e9;
        double kelvin = 25;
        // C/N0 from Friis and N0 = k_B T, then the data rate at which Eb/N0 = (C/N0) / R equals the requirement
        double cn0 = Math.pow(10, friisDbw(1e6, Math.pow(10, 8.0), Math.pow(10, 8.5), fHz, distance(p), 1.5) / 10)
                / (K_B * kelvin);
        double rate = cn0 / Math.pow(10, requiredDb / 10);
        Budget b = evaluate(coherent(fHz, 1e6, new Antenna.FixedGain(80), 0.5, new Antenna.FixedGain(85), 1.0,
                kelvin, rate, requiredDb), p);
        assertEquals(db(cn0), cn0(b), EXACT_DB, "C/N0");
        assertEquals(requiredDb, ebn0(b), EXACT_DB, "Eb/N0 = (C/N0) / R");
        assertEquals(0.0, b.reception().marginDb(), EXACT_DB, "margin = Eb/N0 - required");
        assertEquals(rate, b.reception().maxDataRateBps(), 1e-12 * rate, "max rate = (C/N0) / (Eb/N0)_req");

        // twice the rate costs 10 log10 2 = 3.0103 dB of margin; the highest rate that closes does not change
        Budget twice = evaluate(coherent(fHz, 1e6, new Antenna.FixedGain(80), 0.5, new Antenna.FixedGain(85), 1.0,
                kelvin, 2 * rate, requiredDb), p);
        assertEquals(-db(2), twice.reception().marginDb(), EXACT_DB);
        assertEquals(rate, twice.reception().maxDataRateBps(), 1e-12 * rate);
        assertTrue(b.closes() && !twice.closes(), "closes() follows the margin's sign");
    }

    // ---------------------------------------------------------------- aperture gain

    @ParameterizedTest(name = "aperture {0} m, efficiency {1}, {2} Hz: G = e (pi d f / c)^2 (Balanis)")
    @CsvSource({
        "4,     0.6,  7.2e9",
        "34,    0.7,  8.4e9",
        "70,    0.65, 2.3e9",
        "0.3,   0.8,  2.8176e14",
        "10,    0.5,  2.8176e14",
    })
    void apertureGainIsEfficiencyTimesPiDiameterOverWavelengthSquared(double diameter, double efficiency, double f) {
        // Balanis, Antenna Theory: G = e 4 pi A / lambda^2 for a uniformly illuminated aperture of physical area
        // A = pi d^2 / 4, i.e. G = e (pi d f / c)^2; both forms are checked
        double lambda = C / f;
        double area = Math.PI * diameter * diameter / 4;
        double byArea = efficiency * 4 * Math.PI * area / (lambda * lambda);
        double x = Math.PI * diameter * f / C;
        double byDiameter = efficiency * x * x;
        Antenna a = new Antenna.Aperture(diameter, efficiency);
        assertEquals(byDiameter, a.gainAt(f), 1e-12 * byDiameter);
        assertEquals(byArea, a.gainAt(f), 1e-12 * byArea);

        // the aperture as the receive antenna of a link at rest: Friis with that gain
        SignalPath p = atRest(AU);
        Budget b = evaluate(coherent(f, 100, new Antenna.FixedGain(60), 0, a, 0, 300, 1000, 3), p);
        assertEquals(friisDbw(100, 1e6, byDiameter, f, distance(p), 0), b.reception().rxPowerDbw(), EXACT_DB);
    }

    // ---------------------------------------------------------------- photon counting at rest

    @Test
    void photonCountingAtRestDividesReceivedPowerByPlanckTimesFrequency() {
        // Planck-Einstein relation E = h f (h exact, SI 2019); 1064 nm carrier; Friis for the received power
        double f = C / 1064e-9;
        SignalPath p = atRest(AU);
        Antenna tx = new Antenna.Aperture(0.5, 0.8);
        Antenna rx = new Antenna.Aperture(4, 0.7);
        double rate = 1e4;
        double required = 2;
        LinkTerms t = new LinkTerms(f, false, 10, tx, 1, rx, Double.NaN, 2, Double.NaN, Double.NaN, Double.NaN,
                LinkTerms.Detection.PHOTON_COUNTING, rate, Double.NaN, required);
        Budget b = evaluate(t, p);
        double gTx = 0.8 * Math.pow(Math.PI * 0.5 * f / C, 2);
        double gRx = 0.7 * Math.pow(Math.PI * 4 * f / C, 2);
        double pRxDbw = friisDbw(10, gTx, gRx, f, distance(p), 3);
        assertEquals(pRxDbw, b.reception().rxPowerDbw(), EXACT_DB, "Friis (1946)");
        double photons = Math.pow(10, pRxDbw / 10) / (H * f);
        assertEquals(photons, photonRate(b), 1e-12 * photons, "photon rate P_rx / (h f)");
        assertEquals(photons / rate, photonsPerBit(b), 1e-12 * photons / rate, "photons per bit");
        assertEquals(db(photons / rate / required), b.reception().marginDb(), EXACT_DB, "margin in dB of photons per bit");
        assertEquals(photons / required, b.reception().maxDataRateBps(), 1e-12 * photons / required, "max rate");
        assertTrue(b.reception(Budget.Reception.Coherent.class).isEmpty(), "photon counting: no C/N0, Eb/N0");
    }

    // ---------------------------------------------------------------- edges (docs/link-budget.md)

    private static LinkTerms withLimits(double tuningMin, double tuningMax, double maxRate, double requiredDb) {
        return new LinkTerms(8.4e9, false, 20e3, new Antenna.FixedGain(74), 1, new Antenna.FixedGain(68), 300, 1,
                tuningMin, tuningMax, maxRate, LinkTerms.Detection.COHERENT, 1000, requiredDb, Double.NaN);
    }

    @Test
    void theTuningRangeAndTheRateLimitIncludeTheirEdges() {
        // at rest D = 1 exactly, so the carrier itself is received and the Doppler rate is 0: a receiver whose range
        // starts or ends at the carrier, or whose rate limit is 0 Hz/s, still takes it: the range and the limit are
        // closed intervals (docs/link-budget.md says "inside" and "within"; edges included is nullpath's reading,
        // recorded here so that it does not change unnoticed)
        SignalPath p = atRest(AU);
        assertTrue(evaluate(withLimits(8.4e9, 9e9, 0.0, 3), p).frequency().inTuningRange(), "at the low edge");
        assertTrue(evaluate(withLimits(8e9, 8.4e9, 0.0, 3), p).frequency().inTuningRange(), "at the high edge");
        assertTrue(evaluate(withLimits(8e9, 8.4e9, 0.0, 3), p).frequency().withinDopplerRate(), "at the rate limit");
        assertTrue(!evaluate(withLimits(8.5e9, 9e9, 0.0, 3), p).frequency().inTuningRange(), "below the range");
        assertTrue(!evaluate(withLimits(7e9, 8.3e9, 0.0, 3), p).frequency().inTuningRange(), "above the range");
    }

    @Test
    void aMessageWithZeroMarginCloses() {
        // margin = Eb/N0 - required; a link required exactly the Eb/N0 it gets has margin 0 and closes (>= 0)
        SignalPath p = atRest(AU);
        double ebn0 = ebn0(evaluate(withLimits(Double.NaN, Double.NaN, Double.NaN, 3), p));
        Budget exact = evaluate(withLimits(Double.NaN, Double.NaN, Double.NaN, ebn0), p);
        assertEquals(0.0, exact.reception().marginDb(), 0.0);
        assertTrue(exact.closes(), "zero margin closes");
        assertTrue(!evaluate(withLimits(Double.NaN, Double.NaN, Double.NaN, Math.nextUp(ebn0)), p).closes(),
                "a hair short does not");
    }

    @Test
    void atZeroDistanceTheBudgetHasFrequenciesAndRatesButNoPowerFigures() {
        // a far-field budget (Friis) has no value where sender and receiver are at one place (d = 0): the power
        // columns are left empty, frequencies and the received data rate stay (Budget's contract)
        InertialWorldline here = InertialWorldline.atRest(new Vec3(1e6, 2e6, 3e6));
        SignalPath p = LightCone.future(here.atClock(50.0), InertialWorldline.atRest(new Vec3(1e6, 2e6, 3e6)));
        assertEquals(0.0, p.lightTimeSeconds(), 0.0);
        Budget b = LinkBudget.evaluate(withLimits(8e9, 9e9, 1.0, 3), p, Doppler.of(p), 0.0);
        assertEquals(8.4e9, b.frequency().txFrequencyHz(), 0.0);
        assertEquals(8.4e9, b.frequency().rxFrequencyHz(), 0.0);
        assertEquals(1000.0, b.rxDataRateBps(), 0.0);
        assertTrue(Double.isNaN(b.reception().rxPowerDbw()) && Double.isNaN(cn0(b)) && Double.isNaN(ebn0(b))
                && Double.isNaN(b.reception().marginDb()) && Double.isNaN(b.reception().maxDataRateBps()), b.toString());
        assertTrue(b.closes(), "no far-field margin: it closes on frequency and rate alone");
    }

    private static double cn0(Budget b) {
        return b.reception(Budget.Reception.Coherent.class).orElseThrow().cn0DbHz();
    }

    private static double ebn0(Budget b) {
        return b.reception(Budget.Reception.Coherent.class).orElseThrow().ebN0Db();
    }

    private static double photonRate(Budget b) {
        return b.reception(Budget.Reception.PhotonCounting.class).orElseThrow().rxPhotonRatePerS();
    }

    private static double photonsPerBit(Budget b) {
        return b.reception(Budget.Reception.PhotonCounting.class).orElseThrow().photonsPerBit();
    }
}
