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
 * @param <R>     the row type
 */
public record Column<R>(String name, String unit, String meaning, Function<R, Object> value) {
    public Column {
        Objects.requireNonNull(name, "name");
        Objects.requireNonNull(unit, "unit");
        Objects.requireNonNull(meaning, "meaning");
        Objects.requireNonNull(value, "value");
    }

    /** A number at full precision (it parses back to the same double); NaN where it does not exist. */
    public static <R> Column<R> number(String name, String unit, String meaning, ToDoubleFunction<R> value) {
        return new Column<>(name, unit, meaning, r -> value.applyAsDouble(r));
    }

    /** A whole number. */
    public static <R> Column<R> count(String name, String meaning, ToLongFunction<R> value) {
        return new Column<>(name, "", meaning, r -> value.applyAsLong(r));
    }

    /** {@code true} or {@code false}. */
    public static <R> Column<R> flag(String name, String meaning, Predicate<R> value) {
        return new Column<>(name, "", meaning, r -> value.test(r));
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
        });
    }

    /**
     * The CSV cell: full-precision numbers, {@code true}/{@code false}, text; empty where there is no value.
     * A text that a spreadsheet would take for a formula (starting with =, +, -, @, a tab or a carriage
     * return) is written behind an apostrophe, the usual guard; nullpath's own names never start so.
     */
    public String cell(R row) {
        return cellOf(value.apply(row));
    }

    /**
     * Appends this column's cell of {@code row} to a CSV row's text, after a comma unless it is the first:
     * the same text as {@link #cell}, quoted by the RFC 4180 rule ({@link CsvText}); a number, which never
     * needs quotes, without the scan.
     */
    void appendCell(StringBuilder line, R row, boolean first) {
        Object v = value.apply(row);
        if (v instanceof Double d && !Double.isNaN(d) || v instanceof Long) {
            CsvText.appendPlain(line, cellOf(v), first);
        } else {
            CsvText.append(line, cellOf(v), first);
        }
    }

    private String cellOf(Object v) {
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

    /** The JSON value: null where there is none (JSON has no NaN or infinity). */
    public Object json(R row) {
        Object v = value.apply(row);
        return v instanceof Double d && !Double.isFinite(d) ? null : v;
    }
}
