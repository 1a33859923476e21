package org.nullpath.report;

import java.time.Instant;

import org.junit.jupiter.api.Test;

import static org.junit.jupiter.api.Assertions.assertEquals;

/**
 * Deadlines shown for reading are rounded in the safe direction: a latest send toward earlier, an
 * earliest time toward later. Expected digits computed independently with Python's decimal module at
 * 40 digits (e.g. 47458798.76129842 s / 31 557 600 s = 1.50387858269635...).
 */
class ReadableTest {
    private static final Instant EPOCH = Instant.parse("2061-03-01T00:00:00Z");

    @Test
    void aLatestSendIsShownNoLaterThanItIs() {
        // 47458798.76129842 s = 1.5038785826963526 yr (Julian year 31 557 600 s, IAU)
        assertEquals("1.503878 yr", Readable.notAfter(4.745879876129842E7));
        assertEquals("1.503879 yr", Readable.notBefore(4.745879876129842E7));
        // 28003879.618522286 s = 324.11897706623016 d
        assertEquals("324.1189 d", Readable.notAfter(2.8003879618522286E7));
        assertEquals("324.119 d", Readable.notBefore(2.8003879618522286E7));
        // -100 s = -1.6666666... min: earlier is more negative
        assertEquals("-1.666667 min", Readable.notAfter(-100));
        assertEquals("-1.666666 min", Readable.notBefore(-100));
        assertEquals("0 s", Readable.notAfter(0));
        assertEquals("12.5 s", Readable.notAfter(12.5));
        assertEquals("-", Readable.notAfter(Double.NaN));
    }

    @Test
    void aLatestCalendarInstantIsRoundedDownToTheSecond() {
        // 2061-03-01T00:00:00Z + 47458798.76129842 s = 2062-09-01T06:59:58.761...Z
        assertEquals("2062-09-01T06:59:58Z", Readable.instantNotAfter(EPOCH, 4.745879876129842E7));
        assertEquals("2062-09-01T06:59:59Z", Readable.instantNotBefore(EPOCH, 4.745879876129842E7));
        assertEquals("2061-02-28T23:59:59Z", Readable.instantNotAfter(EPOCH, -0.25));
        assertEquals("2061-03-01T00:00:00Z", Readable.instantNotBefore(EPOCH, -0.25));
    }
}
