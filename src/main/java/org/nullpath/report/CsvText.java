package org.nullpath.report;

/**
 * RFC 4180 cells written straight into a row's text, with the quoting rule of Apache Commons CSV's default
 * format (minimal quoting), so that the files read as before while numbers skip the quoting scan:
 * a cell is quoted when it holds a comma, a double quote, CR or LF, when it starts with a character at or
 * below '#' (space, control characters, '!', '"', '#') or ends with one at or below a space, and when it is
 * empty and first in its row (so that a row of one empty cell is not an empty line). Inside quotes a double
 * quote is doubled. {@code CsvTextTest} holds it to Commons CSV itself.
 */
final class CsvText {
    private CsvText() {
    }

    /** Appends {@code cell} to {@code row}, after a comma unless it is the row's first. */
    static void append(StringBuilder row, String cell, boolean first) {
        if (!first) {
            row.append(',');
        }
        if (!needsQuotes(cell, first)) {
            row.append(cell);
            return;
        }
        row.append('"');
        for (int i = 0; i < cell.length(); i++) {
            char c = cell.charAt(i);
            if (c == '"') {
                row.append('"');
            }
            row.append(c);
        }
        row.append('"');
    }

    static boolean needsQuotes(String cell, boolean first) {
        int n = cell.length();
        if (n == 0) {
            return first;
        }
        if (cell.charAt(0) <= '#' || cell.charAt(n - 1) <= ' ') {
            return true;
        }
        for (int i = 0; i < n; i++) {
            char c = cell.charAt(i);
            if (c == ',' || c == '"' || c == '\n' || c == '\r') {
                return true;
            }
        }
        return false;
    }
}
