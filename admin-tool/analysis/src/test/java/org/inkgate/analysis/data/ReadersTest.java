package org.inkgate.analysis.data;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.StringReader;
import java.util.List;
import org.junit.jupiter.api.Test;

class ReadersTest {

    private static final String HEADER = "candidate,level,form,task,condition,rater,criterion,score\n";

    @Test
    void ratings_quotedCellsAndAnyColumnOrder_areRead() throws Exception {
        List<Rating> r = RatingsReader.read("r.csv", new StringReader(
                "\uFEFFScore,Candidate,level,form,task,condition,rater,criterion\n"
                        + "2.5,\"Doe, \"\"J\"\"\",B1,,t1,none,R1,content\n"));
        assertEquals(1, r.size());
        assertEquals("Doe, \"J\"", r.get(0).candidate());
        assertEquals(2.5, r.get(0).score());
        assertEquals("", r.get(0).form());
    }

    @Test
    void ratings_everyBadRow_isReportedWithRowAndColumn() {
        InputRejected e = assertThrows(InputRejected.class, () -> RatingsReader.read("r.csv", new StringReader(HEADER
                + "C1,B1,,t1,none,R1,content,3\n"
                + "C1,B1,,t1,none,R1,content,4\n"
                + "C1,B2,,t1,none,R2,content,4\n"
                + "C2,B1,,t1,none,R1,content,NaN\n"
                + "C3,B1,,t1,none,R1\n"
                + "C1,B1,,t1,with,R3,content,2\n")));
        List<String> p = e.problems().stream().map(InputProblem::describe).toList();
        assertTrue(p.contains("r.csv, row 3, column rater: rater R1 already scored content of candidate C1, task t1 in row 2;"
                + " keep one rating per rater, criterion and response"), p.toString());
        assertTrue(p.stream().anyMatch(x -> x.startsWith("r.csv, row 4, column level: candidate C1 has level 'B2'")), p.toString());
        assertTrue(p.stream().anyMatch(x -> x.startsWith("r.csv, row 5, column score: 'NaN' is not a number")), p.toString());
        assertTrue(p.stream().anyMatch(x -> x.startsWith("r.csv, row 6: has 6 cells but the header has 8")), p.toString());
        assertTrue(p.stream().anyMatch(x -> x.startsWith("r.csv, row 7, column condition:")), p.toString());
    }

    @Test
    void ratings_levelOnSomeRowsAndEmptyOnOthers_isOneLevelFilledIntoTheEmptyRows() throws Exception {
        // issue 18: an empty level is not a second level (docs/analysis.md, Ratings)
        List<Rating> r = RatingsReader.read("r.csv", new StringReader(HEADER
                + "C1,,,t1,none,R1,content,3\n"
                + "C1,B1,,t2,none,R1,content,4\n"
                + "C2,,,t1,none,R1,content,2\n"));
        assertEquals(List.of("B1", "B1", ""), r.stream().map(Rating::level).toList());
    }

    @Test
    void ratings_headerOnly_isRefused() {
        InputRejected e = assertThrows(InputRejected.class, () -> RatingsReader.read("r.csv", new StringReader(HEADER)));
        assertTrue(e.getMessage().contains("no ratings below the header"));
    }

    @Test
    void ratings_emptyFile_isRefused() {
        InputRejected e = assertThrows(InputRejected.class, () -> RatingsReader.read("r.csv", new StringReader("")));
        assertTrue(e.getMessage().contains("needs a header row"));
    }

    @Test
    void candidates_surveyColumns_becomeItems() throws Exception {
        CandidatesReader.Result r = CandidatesReader.read("c.csv",
                new StringReader("candidate,level,q1,q2\nC1,B1,4,\nC2,B2,2,3\n"));
        assertEquals(List.of("q1", "q2"), r.items());
        assertEquals(4.0, r.candidates().get(0).survey().get("q1"));
        assertTrue(!r.candidates().get(0).survey().containsKey("q2"), "empty answer = not answered");
    }

    @Test
    void candidates_duplicateId_isRefused() {
        InputRejected e = assertThrows(InputRejected.class, () -> CandidatesReader.read("c.csv",
                new StringReader("candidate,level\nC1,B1\nC1,B2\n")));
        assertTrue(e.getMessage().contains("c.csv, row 3, column candidate: candidate C1 appears twice"));
    }

    @Test
    void toolUse_negativeCount_isRefused() {
        InputRejected e = assertThrows(InputRejected.class, () -> ToolUseReader.read("u.csv",
                new StringReader("candidate,task,tool,uses\nC1,t1,dictionary,-2\n")));
        assertTrue(e.getMessage().contains("u.csv, row 2, column uses: '-2' is not a whole number >= 0"));
    }

    @Test
    void processLog_unknownType_isRefused() {
        InputRejected e = assertThrows(InputRejected.class, () -> ProcessLogReader.read("p.csv",
                new StringReader("candidate,task,time_ms,type,position,text\nC1,t1,0,text.insrt,0,a\n")));
        assertTrue(e.getMessage().contains("unknown event type 'text.insrt'"));
    }
}
