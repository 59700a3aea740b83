package org.inkgate.analysis.mfrm;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;

import java.io.StringReader;
import java.util.List;
import org.junit.jupiter.api.Test;

class RatingCsvReaderTest {

    private static RatingData read(String text) throws Exception {
        return RatingCsvReader.read(new StringReader(text), "ratings.csv");
    }

    @Test
    void read_tidyHeader_keepsColumnsInOrder() throws Exception {
        RatingData d = read(String.join(",", RatingCsvReader.TIDY_HEADER) + "\n"
                + "k1,B1,F1,t1,dictionary,r1,content,3\n\"k2\",B2,F2,t1,\"none, offline\",r2,content,0\n");
        assertEquals(List.of("level", "form", "task", "condition", "rater", "criterion"), d.columns());
        assertEquals(2, d.size());
        assertEquals("none, offline", d.labels(d.columnIndex("condition"))[1]);
        assertEquals(0, d.scoresView()[1]);
    }

    @Test
    void read_badScore_namesLineAndColumn() {
        Exception e = assertThrows(RatingCsvReader.RatingFormatException.class,
                () -> read("candidate,rater,score\nk1,r1,3\nk2,r1,three\n"));
        assertEquals("ratings.csv, line 3, column 'score': 'three' is not a whole number; scores are category"
                + " numbers 0, 1, 2, ...", e.getMessage());
    }

    @Test
    void read_emptyFieldOrWrongCount_namesLine() {
        Exception e = assertThrows(RatingCsvReader.RatingFormatException.class,
                () -> read("candidate,rater,score\nk1,,3\n"));
        assertEquals("ratings.csv, line 2, column 'rater': empty value; every rating needs every column",
                e.getMessage());
        e = assertThrows(RatingCsvReader.RatingFormatException.class, () -> read("candidate,rater,score\nk1,r1\n"));
        assertEquals("ratings.csv, line 2: 2 fields, the header has 3", e.getMessage());
    }

    @Test
    void read_missingScoreColumnOrNoRows_isRefused() {
        Exception e = assertThrows(RatingCsvReader.RatingFormatException.class, () -> read("candidate,rater\nk,r\n"));
        assertEquals("ratings.csv, line 1: the header needs columns 'candidate' and 'score' (found [candidate, rater])",
                e.getMessage());
        e = assertThrows(RatingCsvReader.RatingFormatException.class, () -> read("candidate,score\n"));
        assertEquals("ratings.csv: the header is the only line; there are no ratings", e.getMessage());
        e = assertThrows(RatingCsvReader.RatingFormatException.class, () -> read("candidate,score\nk1,-1\n"));
        assertEquals("ratings.csv, line 2, column 'score': -1 is negative; scores are category numbers 0, 1, 2, ...",
                e.getMessage());
    }
}
