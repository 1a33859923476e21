package org.nullpath.report;

import java.util.Objects;
import java.util.Optional;
import java.util.function.Function;
import java.util.function.Predicate;
import java.util.function.ToDoubleFunction;
import java.util.function.ToLongFunction;

/**
 * One column of an output table: its name, its unit, what it means (the text of the docs' column tables)
 * and how its value is read from a row. The same column gives the CSV cell ({@link #cell}) and the JSON value
 * ({@link #json}); a value that does not exist (NaN, or a missing part of the row) is an empty cell and a JSON
 * null.
 *
 * @param name    the header name (and the JSON key)
 * @param unit    the unit of its values ("" for counts, flags, words and ratios without a unit)
 * @param meaning one line for the docs
 * @param value   the row's value: a Double, Long, Boolean or String; null where the row has none
 * @param bytes   how the CSV cell is written into a row's bytes: the same text as {@link #cell}, without
 *                boxing for numbers
 * @param <R>     the row type
 */
public record Column<R>(String name, String unit, String meaning, Function<R, Object> value, Bytes<R> bytes) {
    public Column {
        Objects.requireNonNull(name, "name");
        Objects.requireNonNull(unit, "unit");
        Objects.requireNonNull(meaning, "meaning");
        Objects.requireNonNull(value, "value");
        Objects.requireNonNull(bytes, "bytes");
    }

    /** A column of any of the value kinds, its cell written from the value. */
    public Column(String name, String unit, String meaning, Function<R, Object> value) {
        this(name, unit, meaning, value, (out, r) -> any(out, value.apply(r), name));
    }

    /** Writes one row's cell into a row's bytes (nothing for no value). */
    @FunctionalInterface
    interface Bytes<R> {
        void write(RowBytes out, R row);
    }

    /** A number at full precision (it parses back to the same double); NaN where it does not exist. */
    public static <R> Column<R> number(String name, String unit, String meaning, ToDoubleFunction<R> value) {
        return new Column<>(name, unit, meaning, r -> value.applyAsDouble(r),
                (out, r) -> out.number(value.applyAsDouble(r), name));
    }

    /** A whole number. */
    public static <R> Column<R> count(String name, String meaning, ToLongFunction<R> value) {
        return new Column<>(name, "", meaning, r -> value.applyAsLong(r), (out, r) -> out.count(value.applyAsLong(r)));
    }

    /** {@code true} or {@code false}. */
    public static <R> Column<R> flag(String name, String meaning, Predicate<R> value) {
        return new Column<>(name, "", meaning, r -> value.test(r), (out, r) -> out.flag(value.test(r)));
    }

    /** Text as it is. */
    public static <R> Column<R> text(String name, String meaning, Function<R, String> value) {
        return new Column<>(name, "", meaning, value::apply);
    }

    /** This column read from a part of another row; no value where the part is missing. */
    public <P> Column<P> from(Function<P, Optional<R>> part) {
        return new Column<>(name, unit, meaning, p -> {
            Optional<R> r = part.apply(p);
            return r.isPresent() ? value.apply(r.get()) : null;
        }, (out, p) -> {
            Optional<R> r = part.apply(p);
            if (r.isPresent()) {
                bytes.write(out, r.get());
            }
        });
    }

    /**
     * The CSV cell: full-precision numbers, {@code true}/{@code false}, text; empty where there is no value.
     * A text that a spreadsheet would take for a formula (starting with =, +, -, @, a tab or a carriage
     * return) is written behind an apostrophe, the usual guard; nullpath's own names never start so.
     */
    public String cell(R row) {
        return cellOf(value.apply(row), name);
    }

    private static String cellOf(Object v, String name) {
        if (v instanceof Double d) {
            if (Double.isInfinite(d)) {
                throw new IllegalStateException("an infinite value reached column " + name);
            }
            return Cells.num(d);
        }
        if (v instanceof Boolean b) {
            return Cells.bool(b);
        }
        if (v instanceof String s) {
            return Cells.text(s);
        }
        return v == null ? "" : v.toString();
    }

    /**
     * A value of any kind into a row's bytes: a number unboxed (it never needs quotes), anything else as
     * {@link #cellOf} writes it, quoted by the RFC 4180 rule.
     */
    private static void any(RowBytes out, Object v, String name) {
        if (v instanceof Double d) {
            out.number(d, name);
        } else {
            out.text(cellOf(v, name));
        }
    }

    /** The JSON value: null where there is none (JSON has no NaN or infinity). */
    public Object json(R row) {
        Object v = value.apply(row);
        return v instanceof Double d && !Double.isFinite(d) ? null : v;
    }
}
