package org.nullpath.report;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.util.List;

import net.jqwik.api.Arbitraries;
import net.jqwik.api.Arbitrary;
import net.jqwik.api.ForAll;
import net.jqwik.api.Property;
import net.jqwik.api.Provide;
import org.apache.commons.csv.CSVFormat;
import org.junit.jupiter.api.Test;

/**
 * Output cells as written into CSV rows: quoting by the RFC 4180 rule of Apache Commons CSV's default format
 * (Commons CSV 1.14.1 itself is the reference: its CSVFormat.print on the same cell), and numbers as the
 * shortest decimal that parses back to the same double (Java's own Double.parseDouble is the reference;
 * Java 17's Double.toString, the former writer, is never shorter).
 */
class CsvCellsTest {
    private static final CSVFormat COMMONS = CSVFormat.DEFAULT.builder().setRecordSeparator("\n").get();

    private static String commons(List<String> cells) throws IOException {
        StringBuilder b = new StringBuilder();
        for (int i = 0; i < cells.size(); i++) {
            COMMONS.print(cells.get(i), b, i == 0);
        }
        return b.toString();
    }

    private static String ours(List<String> cells) {
        StringBuilder b = new StringBuilder();
        for (int i = 0; i < cells.size(); i++) {
            CsvText.append(b, cells.get(i), i == 0);
        }
        return b.toString();
    }

    @Provide
    Arbitrary<List<String>> rows() {
        // the characters that decide quoting (separators, quotes, line ends, spaces, controls, '!', '#', '$'),
        // letters, digits, signs and non-ASCII text
        Arbitrary<String> cell = Arbitraries.strings().withChars(",\"\n\r \t\u0000\u001f!#$'=+-@.0123456789aZé\u202e")
                .ofMinLength(0).ofMaxLength(6);
        return cell.list().ofMinSize(1).ofMaxSize(5);
    }

    @Property(tries = 2000, seed = "20261202")
    void quotingAgreesWithCommonsCsv(@ForAll("rows") List<String> cells) throws IOException {
        assertEquals(commons(cells), ours(cells));
    }

    @Test
    void quotingOfTheCellsNullpathWrites() throws IOException {
        List<List<String>> rows = List.of(List.of("", "", "x"), List.of("1", "-2.5E-7", "never"),
                List.of("a,b", "say \"hi\"", "two\nlines"), List.of(" lead", "trail ", "#hash"), List.of("'=cmd", "é"));
        for (List<String> r : rows) {
            assertEquals(commons(r), ours(r), r.toString());
        }
        // examples read off Commons CSV 1.14.1: an empty first cell is quoted, an inner quote doubled
        assertEquals("\"\",,x", ours(rows.get(0)));
        assertEquals("\"a,b\",\"say \"\"hi\"\"\",\"two\nlines\"", ours(rows.get(2)));
    }

    @Test
    void numbersAreTheShortestDecimalThatReadsBack() {
        // Java 17's Double.toString writes 2e23 as 1.9999999999999998E23 and 3.160701594026542E17 with a
        // 17th digit; both texts read back to the same double (JDK-4511638, fixed in Java 19)
        assertEquals("2.0E23", Cells.num(2e23));
        assertEquals("3.160701594026542E17", Cells.num(3.1607015940265421E17));
        assertEquals(Double.parseDouble("3.1607015940265421E17"), Double.parseDouble(Cells.num(3.1607015940265421E17)));
        // Java's scientific form below 1e-3 and from 1e7; whole numbers below 1e15 as integers
        assertEquals("0.001", Cells.num(1e-3));
        assertEquals("1.0E-4", Cells.num(1e-4));
        assertEquals("123456789", Cells.num(123456789.0));
        assertEquals("1.0E15", Cells.num(1e15));
        assertEquals("-0.0", Cells.num(-0.0));
        assertEquals("4.9E-324", Cells.num(Double.MIN_VALUE));
        assertEquals("1.7976931348623157E308", Cells.num(Double.MAX_VALUE));
        assertEquals("", Cells.num(Double.NaN));
    }

    @Provide
    Arbitrary<Double> anyFinite() {
        return Arbitraries.longs().map(Double::longBitsToDouble).filter(Double::isFinite);
    }

    @Property(tries = 20000, seed = "20261202")
    void everyNumberReadsBackAndIsNeverLongerThanJavaSeventeens(@ForAll("anyFinite") double v) {
        String s = Cells.num(v);
        assertEquals(Double.doubleToRawLongBits(v), Double.doubleToRawLongBits(Double.parseDouble(s)), s);
        assertTrue(s.length() <= Double.toString(v).length() || v == Math.rint(v), s + " vs " + Double.toString(v));
    }
}
