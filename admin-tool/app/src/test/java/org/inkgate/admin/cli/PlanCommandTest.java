package org.inkgate.admin.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.inkgate.admin.testutil.AdminCommand;
import org.inkgate.admin.testutil.AdminCommand.Run;
import org.junit.jupiter.api.Test;

/**
 * {@code inkgate-admin plan} through the launcher's own command line. Figures come from base R 4.2.2
 * (admin-tool/analysis/src/test/resources/reference/planning_reference.R, output planning_reference.txt).
 */
class PlanCommandTest {

    private static Run run(String... args) {
        return AdminCommand.admin(args);
    }

    @Test
    void paired_effectAndCorrelation_printsCandidatesNeededAndCaveat() {
        // planning_reference.txt: d 0.4, rho 0.6 -> d_z 0.447; power .8 needs n 42 (power 0.807801, 41: 0.797928)
        Run r = run("plan", "paired", "--effect", "0.4", "--correlation", "0.6", "--power", "0.8");
        assertEquals(0, r.code(), r.err());
        assertTrue(r.out().contains("d_z = d / sqrt(2 (1 - r)) = 0.447"), r.out());
        assertTrue(r.out().contains("Candidates needed for power 0.8: 42"), r.out());
        assertTrue(r.out().contains("power with 42: 0.8078; with 41: 0.7979"), r.out());
        assertTrue(r.out().contains("planning figures, not promises"), r.out());
        assertTrue(r.out().contains("test owner's regulations"), r.out());
    }

    @Test
    void paired_givenCandidates_printsPower() {
        // planning_reference.txt: n 30, d_z 0.447, alpha .05 two-sided: power 0.658304
        Run r = run("plan", "paired", "--effect", "0.4", "--correlation", "0.6", "--candidates", "30");
        assertEquals(0, r.code(), r.err());
        assertTrue(r.out().contains("Power with 30 candidates: 0.658"), r.out());
    }

    @Test
    void groups_unequalAllocation_printsBothGroups() {
        // planning_reference.txt: d 0.5, ratio 2, power .8: n1 48, n2 96
        Run r = run("plan", "groups", "--effect", "0.5", "--ratio", "2", "--power", "0.8");
        assertEquals(0, r.code(), r.err());
        assertTrue(r.out().contains("Candidates needed for power 0.8: 48 + 96 = 144"), r.out());
        assertTrue(r.out().contains("allocation 1 : 2"), r.out());
    }

    @Test
    void groups_logitDifference_convertsThroughTheCandidateSd() {
        // 0.625 logits over 1.25 logits is d = 0.5: Cohen (1992, Table 2, from memory) and R both give 64 per group
        Run r = run("plan", "groups", "--logit-difference", "0.625", "--candidate-sd-logits", "1.25", "--power", "0.8");
        assertEquals(0, r.code(), r.err());
        assertTrue(r.out().contains("d = 0.500 (0.625 logits / candidate standard deviation 1.25 logits)"), r.out());
        assertTrue(r.out().contains("64 + 64 = 128"), r.out());
    }

    @Test
    void conditions_withEpsilon_printsCandidatesNeeded() {
        // planning_reference.txt: k 4, f 0.2, rho 0.7, epsilon 0.75, power .9: n 35 (power 0.907813)
        Run r = run("plan", "conditions", "--conditions", "4", "--effect-f", "0.2", "--correlation", "0.7",
                "--epsilon", "0.75", "--power", "0.9");
        assertEquals(0, r.code(), r.err());
        assertTrue(r.out().contains("Candidates needed for power 0.9: 35"), r.out());
        assertTrue(r.out().contains("power with 35: 0.9078"), r.out());
    }

    @Test
    void conditions_meansThatDoNotMatchTheConditions_isWrongUsage() {
        Run r = run("plan", "conditions", "--conditions", "3", "--means", "50,53", "--sd", "10", "--correlation", "0.5",
                "--power", "0.8");
        assertEquals(2, r.code(), r.out());
        assertTrue(r.err().contains("--means has 2 values but --conditions is 3"), r.err());
    }

    @Test
    void paired_withoutCorrelation_saysWhatIsMissing() {
        Run r = run("plan", "paired", "--effect", "0.4", "--power", "0.8");
        assertEquals(2, r.code(), r.out());
        assertTrue(r.err().contains("--correlation is missing"), r.err());
    }

    @Test
    void paired_powerAndCandidatesTogether_isWrongUsage() {
        Run r = run("plan", "paired", "--effect-of-differences", "0.5", "--power", "0.8", "--candidates", "20");
        assertEquals(2, r.code(), r.out());
    }

    @Test
    void paired_zeroEffect_explainsAndExitsWithProblems() {
        Run r = run("plan", "paired", "--effect-of-differences", "0", "--power", "0.8");
        assertEquals(1, r.code(), r.out());
        assertTrue(r.err().contains("too small (or zero) to plan a study for"), r.err());
    }

    @Test
    void reliability_pilotComponents_printsTheDStudyTable() {
        // planning_reference.txt dstudy lines: 2 raters, 2 tasks: relative 0.145, absolute 0.1825, g 0.733945, phi 0.686695
        Run r = run("plan", "reliability", "--candidate", "0.40", "--rater", "0.02", "--task", "0.05",
                "--candidate-rater", "0.04", "--candidate-task", "0.15", "--rater-task", "0.01", "--residual", "0.20",
                "--raters", "1,2", "--tasks", "2");
        assertEquals(0, r.code(), r.err());
        assertTrue(r.out().contains("       2      2          0.1450          0.1825             0.734          0.687"),
                r.out());
        assertTrue(r.out().contains("test owner's"), r.out());
    }

    @Test
    void reliability_negativeComponent_isRefusedWithTheFix() {
        Run r = run("plan", "reliability", "--candidate", "0.40", "--rater", "-0.01", "--task", "0.05",
                "--candidate-rater", "0.04", "--candidate-task", "0.15", "--rater-task", "0.01", "--residual", "0.20");
        assertEquals(1, r.code(), r.out());
        assertTrue(r.err().contains("set a negative G-study estimate to 0"), r.err());
    }
}
