package org.nullpath.report;

import java.util.Objects;
import java.util.function.Function;
import java.util.function.Predicate;
import java.util.function.ToDoubleFunction;
import java.util.function.ToLongFunction;

/**
 * One column of an output table: its name in the header, its unit, what it means (the text of the docs'
 * column tables) and how its cell is made from a row. A number that does not exist (NaN) is an empty cell.
 *
 * @param name    the header name
 * @param unit    the unit of its values ("" for counts, flags, words and ratios without a unit)
 * @param meaning one line for the docs
 * @param cell    the cell's text for a row
 * @param <R>     the row type
 */
public record Column<R>(String name, String unit, String meaning, Function<R, String> cell) {
    public Column {
        Objects.requireNonNull(name, "name");
        Objects.requireNonNull(unit, "unit");
        Objects.requireNonNull(meaning, "meaning");
        Objects.requireNonNull(cell, "cell");
    }

    /** A number at full precision (it parses back to the same double); empty for NaN. */
    public static <R> Column<R> number(String name, String unit, String meaning, ToDoubleFunction<R> value) {
        return new Column<>(name, unit, meaning, r -> Cells.num(value.applyAsDouble(r)));
    }

    /** A whole number. */
    public static <R> Column<R> count(String name, String meaning, ToLongFunction<R> value) {
        return new Column<>(name, "", meaning, r -> Long.toString(value.applyAsLong(r)));
    }

    /** {@code true} or {@code false}. */
    public static <R> Column<R> flag(String name, String meaning, Predicate<R> value) {
        return new Column<>(name, "", meaning, r -> Cells.bool(value.test(r)));
    }

    /** Text as it is. */
    public static <R> Column<R> text(String name, String meaning, Function<R, String> value) {
        return new Column<>(name, "", meaning, value);
    }

    /** This column read from a part of another row, empty where the part is missing. */
    public <P> Column<P> from(Function<P, java.util.Optional<R>> part) {
        return new Column<>(name, unit, meaning, p -> {
            java.util.Optional<R> r = part.apply(p);
            return r.isPresent() ? cell.apply(r.get()) : "";
        });
    }
}
