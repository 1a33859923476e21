package org.nullpath.report;

import java.nio.charset.StandardCharsets;
import java.util.Arrays;

/**
 * CSV rows built straight as UTF-8 bytes: numbers by {@link ShortestDecimal} and integer digits with no
 * String on the way, text by the quoting rule of {@link CsvText}. One buffer serves one chunk of rows on one
 * thread; it grows as needed.
 */
final class RowBytes {
    private static final byte[] TRUE = {'t', 'r', 'u', 'e'};
    private static final byte[] FALSE = {'f', 'a', 'l', 's', 'e'};

    private byte[] b;
    private int n;
    /** The last text cell written and its bytes: a column of a few words (a status) repeats them row after row. */
    private String lastText;
    private byte[] lastTextBytes;

    RowBytes(int capacity) {
        b = new byte[Math.max(64, capacity)];
    }

    /** Empties the buffer (its room is kept). */
    void clear() {
        n = 0;
    }

    int length() {
        return n;
    }

    byte[] toArray() {
        return Arrays.copyOf(b, n);
    }

    void writeTo(java.io.OutputStream out) throws java.io.IOException {
        out.write(b, 0, n);
    }

    private void room(int more) {
        if (n + more > b.length) {
            b = Arrays.copyOf(b, Math.max(b.length * 2, n + more));
        }
    }

    void put(char ascii) {
        room(1);
        b[n++] = (byte) ascii;
    }

    /**
     * A number as {@link Cells#num} writes it (whole numbers below 1e15 as integers, otherwise the shortest
     * decimal); nothing for NaN; an infinite value is refused, naming {@code column}.
     */
    void number(double v, String column) {
        if (Double.isNaN(v)) {
            return;
        }
        if (Double.isInfinite(v)) {
            throw new IllegalStateException("an infinite value reached column " + column);
        }
        room(ShortestDecimal.MAX_BYTES);
        n = Cells.num(v, b, n);
    }

    /** A whole number's digits. */
    void count(long v) {
        room(25);
        n = ShortestDecimal.signedWhole(v, b, n);
    }

    void flag(boolean v) {
        byte[] s = v ? TRUE : FALSE;
        room(s.length);
        System.arraycopy(s, 0, b, n, s.length);
        n += s.length;
    }

    /**
     * A text cell, quoted when {@link CsvText#needsQuotes} says so; nothing for an empty one (an empty first
     * cell is quoted by the table, which knows it is first).
     */
    void text(String cell) {
        if (cell.isEmpty()) {
            return;
        }
        if (cell != lastText) { // the same String object: its bytes are known
            StringBuilder quoted = new StringBuilder(cell.length() + 2);
            CsvText.append(quoted, cell, true); // true: no comma before it (the table writes commas)
            lastTextBytes = quoted.toString().getBytes(StandardCharsets.UTF_8);
            lastText = cell;
        }
        byte[] u = lastTextBytes;
        room(u.length);
        System.arraycopy(u, 0, b, n, u.length);
        n += u.length;
    }
}
