package org.nullpath.units;

import java.util.Collections;
import java.util.LinkedHashMap;
import java.util.Locale;
import java.util.Map;
import java.util.regex.Matcher;
import java.util.regex.Pattern;

/**
 * Reads quantity texts of the form {@code NUMBER UNIT} ("1 g0", "-0.5 g0", "4.2 ly", "7.2 GHz") and
 * converts them to SI doubles, checking that the unit is of the expected dimension.
 *
 * <p>Conversion multiplies the decimal number by the unit's factor once, so a value given in the SI
 * unit itself is taken exactly as written. Decibel units (dBW, dBm, dBi, dB) are handled as such:
 * powers in dBW or dBm become watts; gains (dBi) and ratios (dB) stay in decibels.
 */
public final class Units {
    private Units() {
    }

    private record Unit(Dimension dimension, double factor, boolean decibel, double decibelOffset) {
    }

    private static final Map<String, Unit> UNITS;

    static {
        Map<String, Unit> u = new LinkedHashMap<>();
        lin(u, Dimension.TIME, of("s", 1.0), of("ms", 1e-3), of("us", 1e-6), of("ns", 1e-9), of("min", 60.0),
                of("h", 3600.0), of("d", Constants.DAY), of("yr", Constants.JULIAN_YEAR));
        lin(u, Dimension.LENGTH, of("m", 1.0), of("km", 1e3), of("cm", 1e-2), of("mm", 1e-3), of("um", 1e-6),
                of("nm", 1e-9), of("au", Constants.AU), of("ly", Constants.LIGHT_YEAR), of("pc", Constants.PARSEC));
        lin(u, Dimension.SPEED, of("m/s", 1.0), of("km/s", 1e3), of("c", Constants.C));
        lin(u, Dimension.ACCELERATION, of("m/s^2", 1.0), of("g0", Constants.G0));
        lin(u, Dimension.FREQUENCY, of("Hz", 1.0), of("kHz", 1e3), of("MHz", 1e6), of("GHz", 1e9), of("THz", 1e12));
        lin(u, Dimension.FREQUENCY_RATE, of("Hz/s", 1.0), of("kHz/s", 1e3), of("MHz/s", 1e6));
        lin(u, Dimension.POWER, of("W", 1.0), of("mW", 1e-3), of("kW", 1e3), of("MW", 1e6), of("GW", 1e9));
        u.put("dBW", new Unit(Dimension.POWER, 1.0, true, 0.0));
        u.put("dBm", new Unit(Dimension.POWER, 1.0, true, -30.0));
        u.put("dBi", new Unit(Dimension.GAIN, 1.0, false, 0.0));
        u.put("dB", new Unit(Dimension.RATIO, 1.0, false, 0.0));
        lin(u, Dimension.TEMPERATURE, of("K", 1.0));
        lin(u, Dimension.DATA_RATE, of("bit/s", 1.0), of("kbit/s", 1e3), of("Mbit/s", 1e6), of("Gbit/s", 1e9));
        lin(u, Dimension.ANGLE, of("rad", 1.0), of("mrad", 1e-3), of("urad", 1e-6), of("deg", Math.PI / 180.0),
                of("arcsec", Math.PI / 648_000.0));
        lin(u, Dimension.MASS, of("kg", 1.0), of("g", 1e-3), of("t", 1e3));
        lin(u, Dimension.FORCE, of("N", 1.0), of("kN", 1e3), of("MN", 1e6));
        UNITS = Collections.unmodifiableMap(u);
    }

    /** Units of dimension {@code d}, each its symbol and its factor to SI. */
    @SafeVarargs
    private static void lin(Map<String, Unit> u, Dimension d, Map.Entry<String, Double>... units) {
        for (Map.Entry<String, Double> e : units) {
            u.put(e.getKey(), new Unit(d, e.getValue(), false, 0.0));
        }
    }

    private static Map.Entry<String, Double> of(String symbol, double factor) {
        return Map.entry(symbol, factor);
    }

    /**
     * What people often type for a unit of each kind, and the unit nullpath spells it as: hints only, never
     * accepted silently (a scenario says exactly what it means).
     */
    private static final Map<Dimension, Map<String, String>> COMMON = Map.of(
            Dimension.TIME, Map.ofEntries(Map.entry("sec", "s"), Map.entry("secs", "s"), Map.entry("second", "s"),
                    Map.entry("seconds", "s"), Map.entry("mins", "min"), Map.entry("minute", "min"),
                    Map.entry("minutes", "min"), Map.entry("hr", "h"), Map.entry("hrs", "h"), Map.entry("hour", "h"),
                    Map.entry("hours", "h"), Map.entry("day", "d"), Map.entry("days", "d"), Map.entry("y", "yr"),
                    Map.entry("yrs", "yr"), Map.entry("year", "yr"), Map.entry("years", "yr")),
            Dimension.DATA_RATE, Map.ofEntries(Map.entry("bps", "bit/s"), Map.entry("b/s", "bit/s"),
                    Map.entry("kbps", "kbit/s"), Map.entry("kb/s", "kbit/s"), Map.entry("Mbps", "Mbit/s"),
                    Map.entry("Mb/s", "Mbit/s"), Map.entry("Gbps", "Gbit/s"), Map.entry("Gb/s", "Gbit/s")),
            Dimension.ACCELERATION, Map.of("g", "g0", "G", "g0", "gee", "g0", "m/s2", "m/s^2", "m/s/s", "m/s^2"),
            Dimension.SPEED, Map.of("C", "c", "kms", "km/s", "mps", "m/s"),
            Dimension.LENGTH, Map.of("AU", "au", "LY", "ly", "lyr", "ly", "parsec", "pc", "pcs", "pc"),
            Dimension.TEMPERATURE, Map.of("C", "K", "degC", "K", "\u00b0C", "K", "F", "K", "degF", "K"));

    /** The hint for a unit typed in a common but wrong way, or null. */
    private static String commonHint(String symbol, Dimension expected) {
        Map<String, String> m = COMMON.getOrDefault(expected, Map.of());
        String hint = m.get(symbol);
        if (hint == null) {
            hint = m.get(symbol.toLowerCase(Locale.ROOT));
        }
        return hint;
    }

    /** " (did you mean 'K'?)", with a word on absolute temperatures where they are asked for; "" for null. */
    private static String didYouMean(String hint, Dimension expected) {
        if (hint == null) {
            return "";
        }
        return " (did you mean '" + hint + "'?" + (expected == Dimension.TEMPERATURE
                ? " noise temperatures are absolute, in kelvin: 20 \u00b0C is 293.15 K)" : ")");
    }

    /** Celsius or Fahrenheit written with a space ("20 deg C"), which the 'NUMBER UNIT' form cannot read. */
    private static final Pattern RELATIVE_TEMPERATURE = Pattern.compile(
            "(?i)\\s*[+-]?[0-9.]+(e[+-]?[0-9]+)?\\s*(deg|\u00b0|degrees)\\s*[cf]\\s*");

    /**
     * The plain decimal NUMBER of a quantity: an optional sign, digits with an optional point, an optional
     * exponent ({@code [+-]digits[.digits][e[+-]digits]}); no hexadecimal, no type suffixes, no NaN or Infinity.
     */
    public static final Pattern NUMBER = Pattern.compile("[+-]?(?:\\d+(?:\\.\\d*)?|\\.\\d+)(?:[eE][+-]?\\d+)?");

    private static final Pattern FORM = Pattern.compile("\\s*(" + NUMBER.pattern() + ")\\s*(\\S*)\\s*");

    /**
     * Parses {@code text} as a quantity of dimension {@code expected}.
     *
     * @throws UnitException naming what was expected and what was found
     */
    public static Quantity parse(String text, Dimension expected) {
        if (text == null) {
            throw new UnitException("expected " + expected.description() + ", got nothing");
        }
        Matcher m = FORM.matcher(text);
        if (!m.matches()) {
            String lower = text.trim().toLowerCase(Locale.ROOT);
            if (lower.startsWith("nan") || lower.contains("inf")) {
                throw new UnitException("expected " + expected.description() + ", got a non-finite number '" + text.trim() + "'");
            }
            if (RELATIVE_TEMPERATURE.matcher(text).matches()) {
                throw new UnitException("expected " + expected.description() + " in K, got '" + text.trim()
                        + "': noise temperatures are absolute, in kelvin (e.g. 20 \u00b0C is 293.15 K)");
            }
            throw new UnitException("expected " + expected.description() + " as 'NUMBER UNIT' (e.g. "
                    + example(expected) + "), got '" + text.trim() + "'");
        }
        double number = Double.parseDouble(m.group(1));
        String symbol = m.group(2);
        if (symbol.isEmpty()) {
            if (expected == Dimension.DIMENSIONLESS) {
                return checked(number, expected, text);
            }
            throw new UnitException("expected " + expected.description() + " with a unit (e.g. "
                    + example(expected) + "), got the plain number '" + text.trim() + "'");
        }
        Unit unit = UNITS.get(symbol);
        String common = commonHint(symbol, expected);
        if (unit == null) {
            String hint = common != null ? common : closestSymbol(symbol, expected);
            throw new UnitException("expected " + expected.description() + ", got unknown unit '" + symbol + "' in '"
                    + text.trim() + "'" + didYouMean(hint, expected));
        }
        if (unit.dimension() != expected) {
            throw new UnitException("expected " + expected.description() + ", got " + unit.dimension().description()
                    + " ('" + text.trim() + "')" + didYouMean(common, expected));
        }
        double si = unit.decibel() ? Math.pow(10.0, (number + unit.decibelOffset()) / 10.0) : number * unit.factor();
        return checked(si, expected, text);
    }

    /** Parses a quantity and returns its SI value. */
    public static double si(String text, Dimension expected) {
        return parse(text, expected).si();
    }

    private static Quantity checked(double si, Dimension d, String text) {
        if (!Double.isFinite(si)) {
            throw new UnitException("expected " + d.description() + ", got a value too large to hold: '" + text.trim() + "'");
        }
        return new Quantity(si, d, text.trim());
    }

    /** The unit symbols known for a dimension, in a stable order, for help texts. */
    public static String symbolsOf(Dimension d) {
        StringBuilder b = new StringBuilder();
        UNITS.forEach((s, u) -> {
            if (u.dimension() == d) {
                b.append(b.length() == 0 ? "" : " ").append(s);
            }
        });
        return b.toString();
    }

    /** A typical quantity text of a dimension, quoted, for messages: "'4.2 ly'". */
    public static String example(Dimension d) {
        return switch (d) {
            case TIME -> "'10 d'";
            case LENGTH -> "'4.2 ly'";
            case SPEED -> "'0.3 c'";
            case ACCELERATION -> "'1 g0'";
            case FREQUENCY -> "'7.2 GHz'";
            case FREQUENCY_RATE -> "'100 Hz/s'";
            case POWER -> "'20 kW'";
            case GAIN -> "'74 dBi'";
            case RATIO -> "'1 dB'";
            case TEMPERATURE -> "'300 K'";
            case DATA_RATE -> "'1 kbit/s'";
            case ANGLE -> "'1 urad'";
            case MASS -> "'10 g'";
            case FORCE -> "'2 MN'";
            case DIMENSIONLESS -> "'0.6'";
        };
    }

    private static String closestSymbol(String symbol, Dimension expected) {
        String best = null;
        int bestDistance = Integer.MAX_VALUE;
        for (Map.Entry<String, Unit> e : UNITS.entrySet()) {
            int d = Spelling.distance(symbol.toLowerCase(Locale.ROOT), e.getKey().toLowerCase(Locale.ROOT));
            if (e.getValue().dimension() == expected) {
                d -= 1;
            }
            if (d < bestDistance) {
                bestDistance = d;
                best = e.getKey();
            }
        }
        return bestDistance <= 1 ? best : null;
    }
}
