package org.nullpath.link;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;
import org.nullpath.lightcone.LightCone;
import org.nullpath.lightcone.SignalPath;
import org.nullpath.spacetime.Vec3;
import org.nullpath.worldline.InertialWorldline;

import static org.nullpath.testkit.Si.C;

/**
 * The frequency plan and the rate figures of a budget when D is not 1: a sender moving across the line of
 * sight at 0.6 c has D = 1/gamma = 0.8 exactly (transverse Doppler, Einstein 1905, sec. 7). Then the
 * receiver gets f_tx D and the data at D R (time dilation of the sender's clock); Eb/N0 = (C/N0) / (D R) meets
 * the requirement up to R = (C/N0) / (D Eb/N0_req); a sender pre-compensating sends f / D so that f arrives,
 * and the received frequency then does not drift (docs/link-budget.md). The Doppler factor's rate is an input
 * here: 2e-9 per second of receiver clock, so the received frequency drifts at f_tx x 2e-9 Hz/s.
 */
class BudgetWithDopplerTest {
    private static final double CARRIER = 8.4e9;
    private static final double RATE = 1000;
    private static final double FACTOR_RATE = 2e-9;

    private static LinkTerms terms(boolean precompensate, double tuningMin, double tuningMax, double maxRate) {
        return new LinkTerms(CARRIER, precompensate, 20e3, new Antenna.FixedGain(74), 1, new Antenna.FixedGain(68),
                300, 1, tuningMin, tuningMax, maxRate, LinkTerms.Detection.COHERENT, RATE, 3, Double.NaN);
    }

    private static SignalPath transverse() {
        InertialWorldline sender = InertialWorldline.of(Vec3.ZERO, Vec3.of(0, 0.6 * C, 0), 0);
        return LightCone.future(sender.atTime(0), InertialWorldline.atRest(Vec3.of(1e12, 0, 0)));
    }

    private static Budget budget(LinkTerms t) {
        SignalPath p = transverse();
        Doppler.Factor d = Doppler.of(p);
        assertEquals(0.8, d.doppler(), 1e-15, "transverse Doppler at 0.6 c");
        return LinkBudget.evaluate(t, p, d, FACTOR_RATE);
    }

    @ParameterizedTest(name = "pre-compensated: {0}")
    @CsvSource({"false", "true"})
    void theFrequenciesAndRatesFollowTheDopplerFactor(boolean precompensate) {
        Budget b = budget(terms(precompensate, Double.NaN, Double.NaN, Double.NaN));
        double tx = precompensate ? CARRIER / 0.8 : CARRIER;
        assertEquals(tx, b.frequency().txFrequencyHz(), 1e-15 * tx, "transmitted frequency");
        assertEquals(precompensate ? CARRIER : 0.8 * CARRIER, b.frequency().rxFrequencyHz(), 1e-15 * CARRIER, "received frequency");
        assertEquals(precompensate ? 0.0 : CARRIER * FACTOR_RATE, b.frequency().dopplerRateHzPerS(), 1e-15 * CARRIER * FACTOR_RATE,
                "drift of the received frequency");
        assertEquals(0.8 * RATE, b.rxDataRateBps(), 1e-15 * RATE, "received data rate");
        double cn0 = b.reception(Budget.Reception.Coherent.class).orElseThrow().cn0DbHz();
        double maxRate = Math.pow(10, (cn0 - 3) / 10) / 0.8;
        assertEquals(maxRate, b.reception().maxDataRateBps(), 1e-12 * maxRate, "highest sender-frame rate that closes");
        assertEquals(cn0 - 10 * Math.log10(0.8 * RATE) - 3, b.reception().marginDb(), 1e-9, "margin at the received data rate");
    }

    @ParameterizedTest(name = "rate limit {0} Hz/s")
    @CsvSource({"16.7, false", "16.8, true", "17, true"})
    void aDriftAboveTheReceiversRateLimitFailsIt(double limit, boolean within) {
        // the drift is 8.4e9 x 2e-9 = 16.8 Hz/s; the limit is a closed bound (docs/link-budget.md: "within")
        Budget b = budget(terms(false, Double.NaN, Double.NaN, limit));
        assertEquals(within, b.frequency().withinDopplerRate());
        assertEquals(within, b.closes(), "the rest of the budget closes");
    }

    @ParameterizedTest(name = "tuning {0} .. {1} Hz, pre-compensated {2}")
    @CsvSource({
        "6.7e9, 6.8e9, false, true",    // 6.72 GHz received
        "8.3e9, 8.5e9, false, false",   // the carrier's own range misses the shifted signal
        "8.3e9, 8.5e9, true, true",     // pre-compensation brings it back
        "6.7e9, 6.8e9, true, false",
    })
    void theTuningRangeIsJudgedAtTheReceivedFrequency(double min, double max, boolean precompensate, boolean in) {
        Budget b = budget(terms(precompensate, min, max, Double.NaN));
        assertEquals(in, b.frequency().inTuningRange());
        assertEquals(in, b.closes(), "the rest of the budget closes");
        assertTrue(b.frequency().withinDopplerRate(), "no rate limit");
    }
}
