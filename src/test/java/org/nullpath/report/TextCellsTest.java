package org.nullpath.report;

import org.junit.jupiter.api.Test;

import static org.junit.jupiter.api.Assertions.assertEquals;

/**
 * Text cells a spreadsheet would evaluate are guarded by a leading apostrophe (the usual defence against
 * formula injection in CSV; common practice, as described by OWASP's "CSV Injection" page, from memory);
 * control and format characters in report text are shown as code points.
 */
class TextCellsTest {
    @Test
    void aFormulaLikeTextIsWrittenBehindAnApostrophe() {
        assertEquals("'=HYPERLINK(1)", Cells.text("=HYPERLINK(1)"));
        assertEquals("'+1", Cells.text("+1"));
        assertEquals("'-x", Cells.text("-x"));
        assertEquals("'@SUM(A1)", Cells.text("@SUM(A1)"));
        assertEquals("before-flip", Cells.text("before-flip"));
        assertEquals("", Cells.text(""));
    }

    @Test
    void controlCharactersAreShownNotPassedToTheBrowser() {
        assertEquals("a\nb\tc\\u001B[31m\\u202E", Html.escape("a\nb\tc\u001b[31m\u202e"));
        assertEquals("&lt;b&gt;", Html.escape("<b>"));
    }
}
