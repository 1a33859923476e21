package org.nullpath.report;

import java.math.BigDecimal;
import java.math.MathContext;
import java.math.RoundingMode;
import java.time.Instant;
import java.util.List;
import java.util.Locale;
import java.util.Optional;

import org.nullpath.mission.Craft;
import org.nullpath.mission.Mission;
import org.nullpath.worldline.LegSpan;
import org.nullpath.worldline.LineState;
import org.nullpath.units.Constants;

/** Short human-readable forms of times and counts for terminal and report text (never for data files). */
public final class Readable {
    private Readable() {
    }

    /** A unit for reading a time: its size in seconds and its symbol. */
    private record TimeUnit(double seconds, String symbol) {
    }

    /** The largest convenient unit for a time of size {@code a} seconds: yr, d, h, min or s. */
    private static TimeUnit unitOf(double a) {
        if (a >= Constants.JULIAN_YEAR) {
            return new TimeUnit(Constants.JULIAN_YEAR, " yr");
        }
        if (a >= Constants.DAY) {
            return new TimeUnit(Constants.DAY, " d");
        }
        if (a >= 3600) {
            return new TimeUnit(3600, " h");
        }
        return a >= 60 ? new TimeUnit(60, " min") : new TimeUnit(1, " s");
    }

    /** A duration or clock reading in the largest convenient unit, 4 significant digits: "1.234 yr". */
    public static String time(double seconds) {
        if (Double.isNaN(seconds)) {
            return "-";
        }
        if (seconds == 0) {
            return "0 s";
        }
        TimeUnit u = unitOf(Math.abs(seconds));
        return fmt(seconds / u.seconds()) + u.symbol();
    }

    /** Significant digits of a deadline: 1 part in 10^7, about 3 s in a year. */
    static final int DEADLINE_DIGITS = 7;

    /**
     * A latest time ("send by"), rounded toward earlier to {@value #DEADLINE_DIGITS} significant digits in
     * the largest convenient unit, so that the time shown is never later than the true one: "1.503879 yr".
     */
    public static String notAfter(double seconds) {
        return directed(seconds, RoundingMode.FLOOR);
    }

    /**
     * An earliest time ("arrives after", "opens at"), rounded toward later to {@value #DEADLINE_DIGITS}
     * significant digits, so that the time shown is never earlier than the true one.
     */
    public static String notBefore(double seconds) {
        return directed(seconds, RoundingMode.CEILING);
    }

    /** A latest calendar instant, {@code seconds} after {@code epoch}, rounded down to the whole second. */
    public static String instantNotAfter(Instant epoch, double seconds) {
        return calendar(epoch, seconds, RoundingMode.FLOOR);
    }

    /** An earliest calendar instant, rounded up to the whole second. */
    public static String instantNotBefore(Instant epoch, double seconds) {
        return calendar(epoch, seconds, RoundingMode.CEILING);
    }

    private static String directed(double seconds, RoundingMode mode) {
        if (!Double.isFinite(seconds)) {
            return Double.isNaN(seconds) ? "-" : seconds > 0 ? "never" : "always";
        }
        if (seconds == 0) {
            return "0 s";
        }
        TimeUnit u = unitOf(Math.abs(seconds));
        // exact decimal division of the binary values, rounded once in the stated direction
        BigDecimal v = new BigDecimal(seconds).divide(new BigDecimal(u.seconds()),
                new MathContext(DEADLINE_DIGITS, mode));
        return v.stripTrailingZeros().toPlainString() + u.symbol();
    }

    private static String calendar(Instant epoch, double seconds, RoundingMode mode) {
        if (!Double.isFinite(seconds)) {
            return "-";
        }
        BigDecimal at = BigDecimal.valueOf(epoch.getEpochSecond()).add(BigDecimal.valueOf(epoch.getNano(), 9))
                .add(new BigDecimal(seconds)).setScale(0, mode);
        try {
            return Instant.ofEpochSecond(at.longValueExact()).toString();
        } catch (ArithmeticException | java.time.DateTimeException e) {
            return "beyond the calendar";
        }
    }

    /**
     * Where a craft's flight plan ends: "last leg ends at 1.234 yr on its clock, 2.345 yr mission time", with
     * the calendar instant when there is an epoch, and its speed then; or that its last leg is open-ended.
     */
    public static String flightEnd(Craft c, Optional<Instant> epoch) {
        List<LegSpan> legs = c.worldline().legs();
        if (legs.isEmpty()) {
            return "no legs: it coasts at its start speed";
        }
        LegSpan last = legs.get(legs.size() - 1);
        if (last.openEnded()) {
            return "its last leg, an open-ended " + last.spec().kind().key() + ", starts at " + time(last.start().clock()) + " on its clock ("
                    + time(last.start().timeSeconds()) + " mission time) and never ends";
        }
        LineState end = last.end();
        return "last leg ends at " + time(end.clock()) + " on its clock, " + time(end.timeSeconds()) + " mission time"
                + epoch.map(e -> " (" + instantNotBefore(e, end.timeSeconds()) + ")").orElse("")
                + (Math.abs(end.rapidity()) < 1e-9 ? ", at rest in the mission frame; then it stays there"
                : ", at " + number(Math.tanh(end.rapidity())) + " c; then it coasts");
    }

    /** A frequency in the SI-prefixed unit that puts it between 1 and 1000, 7 significant digits: "5.856910 GHz". */
    public static String frequency(double hz) {
        if (Double.isNaN(hz)) {
            return "-";
        }
        Scales.Unit u = Scales.frequency(hz);
        return String.format(Locale.ROOT, "%.7g", u.of(hz)) + " " + u.symbol();
    }

    /** A data volume in the SI-prefixed unit that puts it between 1 and 1000, 4 significant digits: "12.35 Mbit". */
    public static String volume(double bits) {
        if (Double.isNaN(bits)) {
            return "-";
        }
        Scales.Unit u = Scales.volume(bits);
        return String.format(Locale.ROOT, "%.4g", u.of(bits)) + " " + u.symbol();
    }

    /** "lark", "lark and wren", "lark, wren and tern". */
    public static String names(List<String> names) {
        if (names.size() <= 1) {
            return String.join("", names);
        }
        return String.join(", ", names.subList(0, names.size() - 1)) + " and " + names.get(names.size() - 1);
    }

    /** A plain number to 6 significant digits. */
    public static String number(double v) {
        if (Double.isNaN(v)) {
            return "-";
        }
        return String.format(Locale.ROOT, "%.6g", v);
    }

    private static String fmt(double v) {
        return String.format(Locale.ROOT, "%.4g", v);
    }

    /** "1 station", "2 stations". */
    public static String count(long n, String noun) {
        return n + " " + noun + (n == 1 ? "" : "s");
    }

    /**
     * What a scenario plans, in the same words for check and plan: "182 messages planned: 156 on links, 26 in
     * 13 round trips"; {@code onLinks} is put after the links' count ("156 on links (...)").
     */
    public static String planned(Mission s, String onLinks) {
        long trips = s.plannedRoundTrips();
        String head = count(s.plannedMessages(), "message") + " planned";
        if (trips == 0) {
            return head + onLinks;
        }
        return head + ": " + s.plannedOnLinks() + " on links" + onLinks + ", " + (2 * trips) + " in "
                + count(trips, "round trip");
    }

    /** "2 stations, 1 craft, 3 links". */
    public static String bodies(Mission s) {
        return count(s.stations().size(), "station") + ", " + s.craft().size() + " craft, "
                + count(s.links().size(), "link");
    }
}
