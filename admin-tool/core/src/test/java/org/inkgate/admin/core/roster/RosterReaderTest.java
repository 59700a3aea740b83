package org.inkgate.admin.core.roster;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;

import java.util.List;
import org.inkgate.admin.core.source.InvalidSourceException;
import org.inkgate.admin.core.source.Problem;
import org.junit.jupiter.api.Test;

class RosterReaderTest {

    @Test
    void parse_goodRoster_keepsAccommodationsAndPersonalFields() throws Exception {
        List<RosterCandidate> r = RosterReader.parse("r.csv", """
                Candidate_Number,level,first_language,extra_time_percent,large_print,high_contrast,family_name
                A-001,B1,Welsh,25,yes,no,"Invented, Name"
                A-002,B2,,,,,Other
                """);
        assertEquals(2, r.size());
        assertEquals(new RosterCandidate("A-001", "B1", "Welsh", 25, true, false, java.util.Map.of("family_name", "Invented, Name")),
                r.get(0));
        assertEquals(0, r.get(1).extraTimePercent());
    }

    @Test
    void parse_badRows_everyRowReportedWithLineAndColumn() {
        InvalidSourceException e = assertThrows(InvalidSourceException.class, () -> RosterReader.parse("r.csv", """
                candidate_number,level,extra_time_percent,large_print
                A-001,B1,25,yes
                A 002,B1,0,no
                A-001,,500,maybe
                A-004,B2,10
                """));
        List<String> p = e.problems().stream().map(Problem::toString).toList();
        assertEquals(List.of(
                "r.csv:3:1: candidate_number: \"A 002\" is not a usable candidate number: use 1-32 letters, digits, '-' or '_', starting with a letter or digit",
                "r.csv:4:1: candidate_number: candidate A-001 is already on line 2 (letter case does not tell candidates"
                        + " apart); each candidate appears once",
                "r.csv:4:2: level: is empty; give the proficiency level forms are balanced within (e.g. B1)",
                "r.csv:4:3: extra_time_percent: \"500\" is not a whole percentage from 0 to 400 (25 means a quarter more time)",
                "r.csv:4:4: large_print: \"maybe\" is not yes or no",
                "r.csv:5: has 3 fields but the header has 4; check for a missing or extra comma, or quote a field that holds a comma"),
                p);
    }

    /** The client matches a typed number without regard to case (format's CandidateNumber), so the roster may not rely on it. */
    @Test
    void parse_numbersDifferingOnlyInLetterCase_areOneCandidateListedTwice() {
        InvalidSourceException e = assertThrows(InvalidSourceException.class, () -> RosterReader.parse("r.csv", """
                candidate_number,level
                ab-7,B1
                AB-7,B2
                """));
        assertEquals(List.of("r.csv:3:1: candidate_number: candidate AB-7 is already on line 2 (letter case does not"
                + " tell candidates apart); each candidate appears once"),
                e.problems().stream().map(Problem::toString).toList());
    }

    @Test
    void parse_missingRequiredColumn_isNamed() {
        InvalidSourceException e = assertThrows(InvalidSourceException.class,
                () -> RosterReader.parse("r.csv", "candidate_number,name\nA-1,x\n"));
        assertEquals("r.csv:1: level: the column is missing from the first line; add it", e.problems().get(0).toString());
    }
}
