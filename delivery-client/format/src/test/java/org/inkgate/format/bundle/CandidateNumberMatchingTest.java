package org.inkgate.format.bundle;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import org.inkgate.format.testutil.SampleExam;
import org.junit.jupiter.api.Test;

/** The one rule both sides compare candidate numbers by (issue 13): case and surrounding spaces do not tell them apart. */
class CandidateNumberMatchingTest {

    @Test
    void same_ignoresAsciiLetterCaseAndSurroundingSpaces_notDashesOrUnderscores() {
        assertTrue(CandidateNumber.same("D1001", " d1001 "));
        assertTrue(CandidateNumber.same("ab-12_c", "AB-12_C"));
        assertFalse(CandidateNumber.same("AB-12", "AB_12"));
        assertFalse(CandidateNumber.same("AB12", "AB-12"));
    }

    @Test
    void find_typedInOtherCase_returnsTheRosterEntryWithItsOwnSpelling() {
        List<RosterEntry> roster = List.of(new RosterEntry("D1001", "A", 0, false, false),
                new RosterEntry("D1002", "B", 25, false, false));
        assertEquals("D1002", CandidateNumber.find(roster, "d1002").orElseThrow().candidateNumber());
        assertTrue(CandidateNumber.find(roster, "D1003").isEmpty());
    }

    @Test
    void manifestRules_rosterWithNumbersDifferingOnlyInCase_isRefusedAsListingTheCandidateTwice() {
        BundleManifest m = SampleExam.manifest();
        BundleManifest twice = new BundleManifest(m.format(), m.schemaVersion(), m.examId(), m.title(), m.language(),
                m.instructionsFile(), m.tasks(), m.conditions(), m.forms(), m.questionnaires(), m.packs(),
                List.of(new RosterEntry("ab12", "A", 0, false, false), new RosterEntry("AB12", "B", 0, false, false)),
                m.ownerKeys(), m.invigilatorPin(), m.seal(), m.practice(), m.entries());

        List<String> problems = ManifestRules.problems(twice);

        assertTrue(problems.stream().anyMatch(p -> p.startsWith("roster lists candidate \"AB12\" twice")),
                problems.toString());
        assertFalse(ManifestRules.problems(m).stream().anyMatch(p -> p.contains("twice")));
    }
}
