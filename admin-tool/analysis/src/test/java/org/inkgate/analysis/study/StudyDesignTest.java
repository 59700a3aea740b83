package org.inkgate.analysis.study;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.List;
import org.inkgate.analysis.data.Rating;
import org.inkgate.analysis.data.StudyDesign;
import org.inkgate.analysis.data.StudyDesign.Kind;
import org.junit.jupiter.api.Test;

/** The design read from each candidate's set of conditions, and a declaration checked against it. */
class StudyDesignTest {

    private static Rating r(String candidate, String condition) {
        return new Rating(candidate, "", "", "t-" + condition, condition, "R1", "c", 3);
    }

    @Test
    void everyCandidateUnderEveryCondition_isWithin() {
        List<Rating> x = List.of(r("A", "x"), r("A", "y"), r("A", "z"), r("B", "x"), r("B", "y"), r("B", "z"));
        StudyDesign d = StudyDesign.of(x, null);
        assertEquals(Kind.WITHIN, d.analysed());
        assertTrue(d.reason().contains("all 3 conditions"), d.reason());
    }

    @Test
    void everyCandidateUnderOneCondition_isParallel() {
        StudyDesign d = StudyDesign.of(List.of(r("A", "x"), r("B", "y"), r("C", "x")), null);
        assertEquals(Kind.PARALLEL, d.analysed());
        assertEquals(2, d.perCondition().get("x"));
    }

    @Test
    void candidateUnderTwoConditionsInParallelStudy_isUnfitAndNamed() {
        List<Rating> x = new ArrayList<>(List.of(r("A", "x"), r("B", "y"), r("C", "x"), r("D", "y")));
        x.add(r("C", "y"));
        StudyDesign d = StudyDesign.of(x, Kind.PARALLEL);
        assertEquals(Kind.UNFIT, d.analysed());
        assertEquals(List.of("C"), d.misfits());
    }

    @Test
    void candidateUnderTwoOfThree_isUnfit() {
        List<Rating> x = List.of(r("A", "x"), r("A", "y"), r("A", "z"), r("B", "x"), r("B", "y"));
        StudyDesign d = StudyDesign.of(x, null);
        assertEquals(Kind.UNFIT, d.analysed());
        assertEquals(List.of("B"), d.misfits());
    }

    @Test
    void declarationAgainstData_isMismatchAndNotAnalysed() {
        StudyDesign d = StudyDesign.of(List.of(r("A", "x"), r("B", "y")), Kind.WITHIN);
        assertTrue(d.mismatch());
        assertEquals(Kind.PARALLEL, d.found());
        assertEquals(Kind.UNFIT, d.analysed());
        assertTrue(d.reason().startsWith("The design was declared within"), d.reason());
        StudyDesign agree = StudyDesign.of(List.of(r("A", "x"), r("B", "y")), Kind.PARALLEL);
        assertFalse(agree.mismatch());
        assertEquals(Kind.PARALLEL, agree.analysed());
    }

    @Test
    void unknownDeclaration_isRefusedWithTheChoices() {
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class,
                () -> StudyDesign.parseDeclared("crossover"));
        assertTrue(e.getMessage().contains("within") && e.getMessage().contains("parallel"));
    }
}
