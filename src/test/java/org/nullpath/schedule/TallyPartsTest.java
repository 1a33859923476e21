package org.nullpath.schedule;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import java.util.Optional;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;
import org.nullpath.link.Budget;
import org.nullpath.mission.Link;
import org.nullpath.mission.MessagePlan;
import org.nullpath.mission.Station;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

/**
 * The schedule's bookkeeping parts on their own: NaN-skipping extremes, the budget tally, the round-trip
 * median and the merge of message plans into send order. The inputs are hand-chosen numbers; what each
 * part must give follows from its definition (the smallest, the largest, a count, the median of a sorted
 * list, an ascending merge), so the expected values are written out by hand beside each check.
 */
class TallyPartsTest {
    static final double NAN = Double.NaN;

    // ---------------------------------------------------------------- Extremes

    @ParameterizedTest(name = "min/max({0}, {1}) = {2}/{3}")
    @CsvSource({
        // a,   b,    min,  max   (NaN on either side is skipped; NaN only when both are)
        "1.5,  -2.0, -2.0,  1.5",
        "-2.0,  1.5, -2.0,  1.5",
        "NaN,   3.0,  3.0,  3.0",
        "3.0,   NaN,  3.0,  3.0",
        "NaN,   NaN,  NaN,  NaN",
        "-0.0,  0.0, -0.0,  0.0",
    })
    void extremesSkipMissingValues(double a, double b, double min, double max) {
        assertEquals(min, Extremes.min(a, b));
        assertEquals(max, Extremes.max(a, b));
    }

    // ---------------------------------------------------------------- BudgetTally

    static final double CARRIER = 8.0e9;

    /** A coherent budget with the figures the tally reads; the others are irrelevant to it (zero). */
    static Budget budget(double rxHz, double rateHzPerS, boolean inTuning, boolean withinRate, double margin,
                         double maxRate) {
        return new Budget(new Budget.FrequencyPlan(CARRIER, rxHz, rateHzPerS, inTuning, withinRate), 0,
                new Budget.Reception.Coherent(0, 0, 0, margin, maxRate));
    }

    @Test
    void theBudgetTallyTakesExtremesAndCountsEachFailure() {
        BudgetTally t = new BudgetTally(CARRIER);
        assertFigures(t.snapshot(), new double[] {NAN, NAN, NAN, NAN, NAN, NAN, NAN}, 0, 0, 0, false);
        t.add(budget(7.9e9, -30.0, true, true, 3.0, 2000));   // closes
        t.add(budget(8.2e9, 12.0, false, true, 5.0, 9000));   // out of tuning
        t.add(budget(4.1e9, 20.0, true, false, -1.0, 500));   // over the rate limit, negative margin
        t.add(budget(6.0e9, -45.0, true, true, NAN, NAN));    // sender and receiver at one place: no margin
        assertFigures(t.snapshot(),
                // worst, best margin; min, max rx Hz; max |rate|; min, max of the highest closing data rate
                new double[] {-1.0, 5.0, 4.1e9, 8.2e9, 45.0, 500, 9000},
                2, 1, 1, false); // closing: the first and the NaN-margin one (Budget.closes)
    }

    @ParameterizedTest(name = "rx {0} .. {1} Hz on 8 GHz: extreme {2}")
    @CsvSource({
        // the extreme-shift flag: some received frequency outside [carrier / 2, 2 carrier], bounds included
        "4.0e9,  1.6e10, false",
        "3.99e9, 8.0e9,  true",
        "8.0e9,  1.601e10, true",
        "5.0e9,  1.2e10, false",
    })
    void theExtremeShiftFlagLooksAtBothEndsOfTheReceivedRange(double lo, double hi, boolean extreme) {
        BudgetTally t = new BudgetTally(CARRIER);
        t.add(budget(hi, 0, true, true, 1, 1));
        t.add(budget(lo, 0, true, true, 1, 1));
        assertEquals(extreme, t.snapshot().extremeShift());
        assertEquals(lo, t.snapshot().minRxFrequencyHz());
        assertEquals(hi, t.snapshot().maxRxFrequencyHz());
    }

    static void assertFigures(BudgetTally.Figures f, double[] extremes, long closing, long outOfTuning, long overRate,
                              boolean extreme) {
        assertArrayEquals(extremes, new double[] {f.worstMarginDb(), f.bestMarginDb(), f.minRxFrequencyHz(),
            f.maxRxFrequencyHz(), f.maxAbsDopplerRateHzPerS(), f.minMaxDataRateBps(), f.maxMaxDataRateBps()});
        assertEquals(closing, f.closing(), "closing");
        assertEquals(outOfTuning, f.outOfTuning(), "out of tuning");
        assertEquals(overRate, f.overDopplerRate(), "over the Doppler-rate limit");
        assertEquals(extreme, f.extremeShift(), "extreme shift");
    }

    // ---------------------------------------------------------------- RoundTrips

    @ParameterizedTest(name = "{0}: median {1}")
    @CsvSource({
        // values (in the order added),           min,  median, max
        "'',                                       NaN,  NaN,   NaN",
        "'7',                                      7,    7,     7",
        "'9 1 5',                                  1,    5,     9",
        "'9 1 5 3',                                1,    4,     9",
        "'4 8 15 16 23 42 1 2 3 5 6 7 9 10 11 12 13 14', 1, 9.5, 42",
    })
    void roundTripsGiveTheirSmallestMedianAndLargest(String values, double min, double median, double max) {
        RoundTrips r = new RoundTrips();
        for (String v : values.isBlank() ? new String[0] : values.trim().split(" +")) {
            r.add(Double.parseDouble(v));
        }
        assertEquals(min, r.min());
        assertEquals(median, r.median());
        assertEquals(max, r.max());
    }

    @Test
    void theMedianOfTwoHugeRoundTripsDoesNotOverflow() {
        RoundTrips r = new RoundTrips();
        r.add(Double.MAX_VALUE);
        r.add(0.5 * Double.MAX_VALUE);
        // the mean of the middle two, formed as lo + (hi - lo) / 2
        assertEquals(0.75 * Double.MAX_VALUE, r.median());
    }

    @Test
    void pastTheKeptCountTheMedianIsUnknownButTheExtremesAreNot() {
        RoundTrips r = new RoundTrips();
        for (int i = 0; i < RoundTrips.KEPT; i++) {
            r.add(i % 2 == 0 ? 10.0 : 20.0);
        }
        assertEquals(15.0, r.median(), "exactly KEPT values: the median is still exact");
        r.add(30.0);
        assertEquals(NAN, r.median());
        assertEquals(10.0, r.min());
        assertEquals(30.0, r.max());
    }

    // ---------------------------------------------------------------- SendOrder

    @Test
    void plansMergeIntoOneAscendingStreamAndEmptyPlansAreSkipped() {
        Station home = new Station("home", org.nullpath.worldline.InertialWorldline.of(
                org.nullpath.spacetime.Vec3.ZERO, org.nullpath.spacetime.Vec3.ZERO, 0));
        Link link = new Link("loop", home, home, Optional.empty());
        List<MessagePlan> plans = List.of(
                new MessagePlan.Series(link, 0, 100, 25),            // 0 25 50 75 100
                new MessagePlan.At(link, List.of()),                 // nothing
                new MessagePlan.At(link, List.of(60.0, 10.0, 110.0)), // 10 60 110 (held ascending)
                new MessagePlan.Series(link, 5, 4, 1));               // last < first: nothing
        SendOrder order = new SendOrder(plans);
        List<Double> got = new ArrayList<>();
        while (order.hasNext()) {
            got.add(order.next());
        }
        assertEquals(Arrays.asList(0.0, 10.0, 25.0, 50.0, 60.0, 75.0, 100.0, 110.0), got);
        assertFalse(new SendOrder(List.of()).hasNext());
        assertTrue(new SendOrder(List.of(new MessagePlan.At(link, List.of(1.0)))).hasNext());
    }

    // ---------------------------------------------------------------- refusals

    @Test
    void aRangeRefusalNamesItsScenarioKeyAndAWindowNeedsLinkTerms() {
        ArithmeticException cause = new ArithmeticException("beyond doubles");
        RangeException e = new RangeException("links.up", "message 3: beyond doubles", cause);
        assertEquals("links.up", e.key());
        assertEquals("message 3: beyond doubles", e.getMessage());
        assertEquals(cause, e.getCause());
        Station home = new Station("home", org.nullpath.worldline.InertialWorldline.atRest(org.nullpath.spacetime.Vec3.ZERO));
        Link bare = new Link("bare", home, home, Optional.empty());
        IllegalArgumentException w = org.junit.jupiter.api.Assertions.assertThrows(IllegalArgumentException.class,
                () -> Windows.scan(new org.nullpath.mission.WindowScan(bare, 0, 1)));
        assertEquals("window on link bare needs link terms", w.getMessage());
    }
}
