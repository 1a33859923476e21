package org.nullpath.report;

import java.math.BigDecimal;
import java.math.MathContext;
import java.text.FieldPosition;
import java.text.NumberFormat;
import java.text.ParsePosition;
import java.util.Locale;

import org.nullpath.units.Constants;

/**
 * Display units chosen by scale for the report's axes, and tick steps and labels that do not depend on
 * the machine's locale. Only presentation: a value is divided by its unit's size, nothing more.
 */
final class Scales {
    private Scales() {
    }

    /**
     * A display unit.
     *
     * @param symbol how it is written on an axis
     * @param size   its size in SI units: a value in SI divided by this is the number shown
     */
    record Unit(String symbol, double size) {
        double of(double si) {
            return si / size;
        }
    }

    /** A unit of a ladder, used from {@code from} (in SI, by magnitude) up to the next larger unit's own start. */
    private record Rung(double from, Unit unit) {
        Rung(double from, String symbol, double size) {
            this(from, new Unit(symbol, size));
        }
    }

    private static final Rung[] TIME = {
        new Rung(2 * Constants.JULIAN_YEAR, "yr", Constants.JULIAN_YEAR),
        new Rung(2 * Constants.DAY, "d", Constants.DAY),
        new Rung(2 * 3600, "h", 3600),
        new Rung(120, "min", 60),
        new Rung(0, "s", 1),
    };

    private static final Rung[] LENGTH = {
        new Rung(0.05 * Constants.LIGHT_YEAR, "ly", Constants.LIGHT_YEAR),
        new Rung(0.05 * Constants.AU, "au", Constants.AU),
        new Rung(0, "km", 1000),
    };

    private static final Rung[] DATA_RATE = {
        new Rung(1e9, "Gbit/s", 1e9),
        new Rung(1e6, "Mbit/s", 1e6),
        new Rung(1e3, "kbit/s", 1e3),
        new Rung(0, "bit/s", 1),
    };

    /** The first unit, largest first, whose start |value| reaches; the smallest otherwise (NaN included). */
    private static Unit pick(double value, Rung[] ladder) {
        double a = Math.abs(value);
        for (int i = 0; i < ladder.length - 1; i++) {
            if (a >= ladder[i].from()) {
                return ladder[i].unit();
            }
        }
        return ladder[ladder.length - 1].unit();
    }

    /** Time: yr from 2 yr, d from 2 d, h from 2 h, else min or s. */
    static Unit time(double largestSeconds) {
        return pick(largestSeconds, TIME);
    }

    /** Distance: ly from 0.05 ly, au from 0.05 au, else km. */
    static Unit length(double largestMetres) {
        return pick(largestMetres, LENGTH);
    }

    private static final String[] HERTZ = {"Hz", "kHz", "MHz", "GHz", "THz", "PHz"};
    private static final String[] BITS = {"bit", "kbit", "Mbit", "Gbit", "Tbit", "Pbit", "Ebit"};

    /** Frequency: the SI prefix that puts the value between 1 and 1000 (up to PHz). */
    static Unit frequency(double typicalHz) {
        return prefixed(typicalHz, HERTZ);
    }

    /** A data volume: the SI prefix that puts the value between 1 and 1000 (up to Ebit). */
    static Unit volume(double bits) {
        return prefixed(bits, BITS);
    }

    /** The unit of {@code names} (powers of 1000, smallest first) that puts |value| between 1 and 1000. */
    private static Unit prefixed(double value, String[] names) {
        double a = Math.abs(value);
        int i = 0;
        while (i < names.length - 1 && a >= 1000 * Math.pow(1000, i)) {
            i++;
        }
        return new Unit(names[i], Math.pow(1000, i));
    }

    /** Data rate: bit/s, kbit/s, Mbit/s or Gbit/s, by the planned rate. */
    static Unit dataRate(double typicalBps) {
        return pick(typicalBps, DATA_RATE);
    }

    /** A tick step of 1, 2 or 5 times a power of ten giving about {@code ticks} intervals over {@code span}. */
    static double step(double span, int ticks) {
        if (!(span > 0) || !Double.isFinite(span)) {
            return 1;
        }
        double raw = span / ticks;
        double mag = Math.pow(10, Math.floor(Math.log10(raw)));
        double norm = raw / mag;
        double k = norm < 1.5 ? 1 : norm < 3.5 ? 2 : norm < 7.5 ? 5 : 10;
        return k * mag;
    }

    /** Tick labels with as many decimals as the step needs, '.' as the decimal point, no grouping. */
    static NumberFormat ticks(double step) {
        int decimals = Math.max(0, (int) -Math.floor(Math.log10(step) + 1e-9));
        return new Fixed(decimals);
    }

    /** Labels for powers of ten on a logarithmic axis: plain from 0.001 to 10000, else 10 with an exponent. */
    static NumberFormat powers() {
        return new Powers();
    }

    /** A number for text (tables, captions): 4 significant digits, plain or with a power of ten. */
    static String number(double v) {
        if (Double.isNaN(v)) {
            return "-";
        }
        if (v == 0) {
            return "0";
        }
        double a = Math.abs(v);
        BigDecimal b = new BigDecimal(v).round(new MathContext(4));
        if (a >= 1e-3 && a < 1e6) {
            return b.stripTrailingZeros().toPlainString();
        }
        int exp = b.precision() - b.scale() - 1;
        BigDecimal mantissa = b.movePointLeft(exp).stripTrailingZeros();
        String m = mantissa.toPlainString();
        return (m.equals("1") ? "" : m.equals("-1") ? "-" : m + "\u00d7") + "10" + superscript(exp);
    }

    static String superscript(int exp) {
        String digits = "\u2070\u00b9\u00b2\u00b3\u2074\u2075\u2076\u2077\u2078\u2079";
        StringBuilder sb = new StringBuilder();
        for (char ch : Integer.toString(exp).toCharArray()) {
            sb.append(ch == '-' ? '\u207b' : digits.charAt(ch - '0'));
        }
        return sb.toString();
    }

    /** Fixed decimals, locale-free; "-0" shown as "0". */
    /** A number format for axis labels only: whole numbers as doubles, no parsing. */
    private abstract static class DisplayFormat extends NumberFormat {
        @Override
        public StringBuffer format(long number, StringBuffer toAppendTo, FieldPosition pos) {
            return format((double) number, toAppendTo, pos);
        }

        @Override
        public Number parse(String source, ParsePosition parsePosition) {
            throw new UnsupportedOperationException("display only");
        }
    }

    private static final class Fixed extends DisplayFormat {
        private final int decimals;

        Fixed(int decimals) {
            this.decimals = decimals;
        }

        @Override
        public StringBuffer format(double number, StringBuffer toAppendTo, FieldPosition pos) {
            String s = String.format(Locale.ROOT, "%." + decimals + "f", number);
            if (s.matches("-0(\\.0*)?")) {
                s = s.substring(1);
            }
            return toAppendTo.append(s);
        }
    }

    private static final class Powers extends DisplayFormat {
        @Override
        public StringBuffer format(double number, StringBuffer toAppendTo, FieldPosition pos) {
            if (!(number > 0)) {
                return toAppendTo.append(number(number));
            }
            int exp = (int) Math.round(Math.log10(number));
            if (Math.abs(number / Math.pow(10, exp) - 1) > 1e-6) {
                return toAppendTo.append(number(number));
            }
            if (exp >= -3 && exp <= 4) {
                return toAppendTo.append(new BigDecimal(BigDecimal.ONE.scaleByPowerOfTen(exp).toString())
                        .toPlainString());
            }
            return toAppendTo.append("10").append(superscript(exp));
        }
    }
}
