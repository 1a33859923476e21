package org.nullpath.report;

import java.io.BufferedWriter;
import java.io.IOException;
import java.io.UncheckedIOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;

import org.apache.commons.csv.CSVFormat;
import org.apache.commons.csv.CSVPrinter;

/**
 * An output table: its columns in order. The header and every row's cells come from the same list, so a
 * column is added in one place.
 *
 * @param columns the columns, in file order
 * @param <R>     the row type
 */
public record Table<R>(List<Column<R>> columns) {
    /** RFC 4180 CSV (Apache Commons CSV), one header line, LF line ends. */
    static final CSVFormat FORMAT = CSVFormat.DEFAULT.builder().setRecordSeparator("\n").get();

    public Table {
        columns = List.copyOf(columns);
    }

    /** The header names. */
    public List<String> header() {
        return columns.stream().map(Column::name).toList();
    }

    /** The rows as JSON objects: column name to value, in column order. */
    public List<Map<String, Object>> json(Iterable<R> rows) {
        List<Map<String, Object>> out = new ArrayList<>();
        for (R r : rows) {
            Map<String, Object> m = new LinkedHashMap<>();
            for (Column<R> c : columns) {
                m.put(c.name(), c.json(r));
            }
            out.add(m);
        }
        return out;
    }

    /** Opens {@code file} and writes the header; rows follow with {@link Writer#write}. */
    public Writer<R> open(Path file) throws IOException {
        return new Writer<>(this, file);
    }

    /** Writes a whole table at once. */
    public void write(Path file, Iterable<R> rows) throws IOException {
        try (Writer<R> w = open(file)) {
            for (R r : rows) {
                w.write(r);
            }
        }
    }

    /** A streaming writer of one table's rows: memory does not grow with the rows. */
    public static final class Writer<R> implements AutoCloseable {
        private final List<Column<R>> columns;
        private final CSVPrinter printer;
        private final String[] cells;

        private Writer(Table<R> table, Path file) throws IOException {
            this.columns = table.columns();
            BufferedWriter w = Files.newBufferedWriter(file, StandardCharsets.UTF_8);
            printer = new CSVPrinter(w, FORMAT);
            cells = new String[columns.size()];
            printer.printRecord(table.header());
        }

        /** Writes one row; an I/O failure surfaces as {@link UncheckedIOException}. */
        public void write(R row) {
            for (int i = 0; i < cells.length; i++) {
                cells[i] = columns.get(i).cell(row);
            }
            try {
                printer.printRecord((Object[]) cells);
            } catch (IOException e) {
                throw new UncheckedIOException(e);
            }
        }

        @Override
        public void close() throws IOException {
            printer.close(true);
        }
    }
}
