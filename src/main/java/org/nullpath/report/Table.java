package org.nullpath.report;

import java.io.BufferedOutputStream;
import java.io.IOException;
import java.io.OutputStream;
import java.io.UncheckedIOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Queue;
import java.util.concurrent.ConcurrentLinkedQueue;


/**
 * An output table: its columns in order. The header and every row's cells come from the same list, so a
 * column is added in one place. Files are RFC 4180 CSV with one header line and LF line ends
 * ({@link CsvText}).
 *
 * @param columns the columns, in file order
 * @param <R>     the row type
 */
public record Table<R>(List<Column<R>> columns) {
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
            out.add(json(r));
        }
        return out;
    }

    /** One row as a JSON object: column name to value, in column order. */
    public Map<String, Object> json(R row) {
        Map<String, Object> m = new LinkedHashMap<>();
        for (Column<R> c : columns) {
            m.put(c.name(), c.json(row));
        }
        return m;
    }

    /** Opens {@code file} and writes the header; rows follow with {@link Writer#write}. */
    public Writer<R> open(Path file) throws IOException {
        return new Writer<>(this, Files.newOutputStream(file));
    }

    /** Writes the header to {@code out}, which the writer then owns (and closes); rows follow. */
    public Writer<R> open(OutputStream out) throws IOException {
        return new Writer<>(this, out);
    }

    /** Writes a whole table at once. */
    public void write(Path file, Iterable<R> rows) throws IOException {
        try (Writer<R> w = open(file)) {
            for (R r : rows) {
                w.write(r);
            }
        }
    }

    /** The header line and every row of {@code rows} as the file holds them, in UTF-8. */
    public byte[] encodeWithHeader(List<R> rows) {
        byte[] head = headerLine().getBytes(StandardCharsets.UTF_8);
        byte[] body = encode(rows);
        byte[] all = java.util.Arrays.copyOf(head, head.length + body.length);
        System.arraycopy(body, 0, all, head.length, body.length);
        return all;
    }

    /**
     * Every row of {@code rows} as the file holds them after its header, in UTF-8; keeps no state. Cells are
     * separated by commas; a row whose first cell is empty starts with {@code ""} (the RFC 4180 rule of
     * {@link CsvText}, so that a row of one empty cell is not an empty line).
     */
    public byte[] encode(List<R> rows) {
        return bytes(rows).toArray();
    }

    /** {@link #encode} into a buffer of its own, which the caller writes without a copy. */
    RowBytes bytes(List<R> rows) {
        return bytes(rows, new RowBytes(rows.size() * 16 * columns.size()));
    }

    /** {@link #encode} into {@code b} (emptied first), which is returned. */
    RowBytes bytes(List<R> rows, RowBytes b) {
        int k = columns.size();
        b.clear();
        for (R r : rows) {
            int start = b.length();
            columns.get(0).bytes().write(b, r);
            if (b.length() == start) {
                b.put('"');
                b.put('"');
            }
            for (int i = 1; i < k; i++) {
                b.put(',');
                columns.get(i).bytes().write(b, r);
            }
            b.put('\n');
        }
        return b;
    }

    /** The header line, ending in LF. */
    String headerLine() {
        StringBuilder head = new StringBuilder();
        List<String> names = header();
        for (int i = 0; i < names.size(); i++) {
            CsvText.append(head, names.get(i), i == 0);
        }
        return head.append('\n').toString();
    }

    /**
     * A streaming writer of one table's rows: memory does not grow with the rows. Rows may be turned into
     * text on any thread ({@link #encode}, which keeps no state) and appended in order ({@link #append}).
     */
    public static final class Writer<R> implements AutoCloseable {
        private final Table<R> table;
        private final OutputStream out;
        /** Row buffers written out, to be filled again. */
        private final Queue<RowBytes> free = new ConcurrentLinkedQueue<>();

        private Writer(Table<R> table, OutputStream file) throws IOException {
            this.table = table;
            this.out = new BufferedOutputStream(file, 1 << 16);
            out.write(table.headerLine().getBytes(StandardCharsets.UTF_8));
        }

        /** Writes one row; an I/O failure surfaces as {@link UncheckedIOException}. */
        public void write(R row) {
            append(encode(List.of(row)));
        }

        /** The CSV text of {@code rows} in UTF-8; safe to call from several threads at once. */
        public byte[] encode(List<R> rows) {
            return table.encode(rows);
        }

        /**
         * {@link #encode} without the copy into an array of its own; safe to call from several threads at once.
         * The buffer is one that {@link #append} has written before when there is one: a few buffers serve
         * the whole file, and stay in the processor's caches instead of new memory for every chunk.
         */
        RowBytes encodeInPlace(List<R> rows) {
            RowBytes b = free.poll();
            return b == null ? table.bytes(rows) : table.bytes(rows, b);
        }

        /** Appends rows made by {@link #encodeInPlace}; an I/O failure surfaces as {@link UncheckedIOException}. */
        void append(RowBytes rows) {
            try {
                rows.writeTo(out);
            } catch (IOException e) {
                throw new UncheckedIOException(e);
            }
            free.offer(rows);
        }

        /** Appends text made by {@link #encode}; an I/O failure surfaces as {@link UncheckedIOException}. */
        public void append(byte[] lines) {
            try {
                out.write(lines);
            } catch (IOException e) {
                throw new UncheckedIOException(e);
            }
        }

        @Override
        public void close() throws IOException {
            out.close();
        }
    }
}
