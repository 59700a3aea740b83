package org.inkgate.admin.core.csv;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;

import java.io.StringWriter;
import java.util.List;
import java.util.Random;
import org.junit.jupiter.api.Test;

class CsvTest {

    private static List<List<String>> fields(String text) throws Exception {
        return Csv.parse(text).stream().map(Csv.Row::fields).toList();
    }

    @Test
    void parse_rfc4180Section2Examples_givesTheFieldsTheRfcDescribes() throws Exception {
        // RFC 4180 section 2, rules 1-2: records separated by CRLF, the last CRLF optional
        assertEquals(List.of(List.of("aaa", "bbb", "ccc"), List.of("zzz", "yyy", "xxx")),
                fields("aaa,bbb,ccc\r\nzzz,yyy,xxx\r\n"));
        assertEquals(List.of(List.of("aaa", "bbb", "ccc"), List.of("zzz", "yyy", "xxx")),
                fields("aaa,bbb,ccc\r\nzzz,yyy,xxx"));
        // rule 5: fields may be enclosed in double quotes
        assertEquals(List.of(List.of("aaa", "bbb", "ccc"), List.of("zzz", "yyy", "xxx")),
                fields("\"aaa\",\"bbb\",\"ccc\"\r\nzzz,yyy,xxx"));
        // rule 6: line breaks and commas inside quoted fields
        assertEquals(List.of(List.of("aaa", "b\r\nbb", "ccc"), List.of("zzz", "yyy", "xxx")),
                fields("\"aaa\",\"b\r\nbb\",\"ccc\"\r\nzzz,yyy,xxx"));
        // rule 7: a double quote inside a quoted field is written twice
        assertEquals(List.of(List.of("aaa", "b\"bb", "ccc")), fields("\"aaa\",\"b\"\"bb\",\"ccc\""));
    }

    @Test
    void parse_lfLineEndsAndByteOrderMark_areAcceptedAsSpreadsheetsWriteThem() throws Exception {
        assertEquals(List.of(List.of("a", "b"), List.of("c", "")), fields("\uFEFFa,b\nc,\n"));
    }

    @Test
    void parse_badQuoting_namesTheLine() {
        Csv.CsvSyntaxException e = assertThrows(Csv.CsvSyntaxException.class, () -> Csv.parse("a,b\nc,d\"x\n"));
        assertEquals(2, e.line());
        assertEquals(3, assertThrows(Csv.CsvSyntaxException.class, () -> Csv.parse("a\nb\n\"open,\n")).line());
    }

    @Test
    void writeThenParse_randomAwkwardFields_roundTrip() throws Exception {
        Random random = new Random(4180);
        String alphabet = "ab,\"\r\n ;é\u00e9\t";
        for (int trial = 0; trial < 300; trial++) {
            List<List<String>> rows = new java.util.ArrayList<>();
            for (int r = 0; r < 1 + random.nextInt(4); r++) {
                List<String> row = new java.util.ArrayList<>();
                for (int f = 0; f < 1 + random.nextInt(5); f++) {
                    StringBuilder s = new StringBuilder();
                    for (int i = 0; i < random.nextInt(6); i++) {
                        s.append(alphabet.charAt(random.nextInt(alphabet.length())));
                    }
                    row.add(s.toString());
                }
                if (row.size() == 1 && row.get(0).isEmpty()) {
                    row.set(0, "x"); // a record of one empty field is an empty line, which RFC 4180 does not define
                }
                rows.add(row);
            }
            StringWriter out = new StringWriter();
            for (List<String> row : rows) {
                Csv.writeRow(out, row);
            }
            assertEquals(rows, fields(out.toString()), out.toString());
        }
    }
}
