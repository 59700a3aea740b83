package org.inkgate.admin.core.forms;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNotEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import java.util.Random;
import org.inkgate.admin.core.source.ExamSourceReader;
import org.inkgate.admin.core.testutil.ExamFolders;
import org.inkgate.format.bundle.FormSlot;
import org.inkgate.format.bundle.FormSpec;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

/**
 * Counterbalancing as the issue states it: every task under every condition equally often overall
 * and within each level, exactly for balanced rosters and at most one apart otherwise; same seed,
 * same assignment. The expected counts follow from the roster sizes alone.
 */
class FormAssignerTest {

    @TempDir
    Path dir;

    private List<FormSpec> forms(int tasks, int conditions) throws Exception {
        return FormDesigner.forms(ExamSourceReader.read(ExamFolders.withTasks(dir, tasks, conditions, "latin-square", true)));
    }

    private static List<FormAssigner.Candidate> roster(int... perLevel) {
        List<FormAssigner.Candidate> out = new ArrayList<>();
        for (int l = 0; l < perLevel.length; l++) {
            for (int i = 0; i < perLevel[l]; i++) {
                out.add(new FormAssigner.Candidate(String.format("L%d-%04d", l, i), "level-" + l));
            }
        }
        return out;
    }

    @ParameterizedTest
    @CsvSource({"2,2,8,16,24", "3,2,12,6,18", "2,3,6,12,6"})
    void assign_balancedRoster_exactCounts(int tasks, int conditions, int a, int b, int c) throws Exception {
        List<FormSpec> forms = forms(tasks, conditions);
        Assignment assignment = FormAssigner.assign(roster(a, b, c), forms, conditions, 42);
        for (String level : List.of("level-0", "level-1", "level-2")) {
            int n = level.equals("level-0") ? a : level.equals("level-1") ? b : c;
            Map<String, Integer> perForm = formCounts(assignment, level);
            forms.forEach(f -> assertEquals(n / forms.size(), perForm.getOrDefault(f.id(), 0), level + " " + perForm));
            cellCounts(assignment, forms, level).values()
                    .forEach(count -> assertEquals(n * tasks / (tasks * conditions), count, level));
        }
        cellCounts(assignment, forms, null).values()
                .forEach(count -> assertEquals((a + b + c) / conditions, count));
    }

    @Test
    void assign_unbalancedRosters_formsAtMostOneApartWithinLevels_taskConditionsWithinLevelsAndOverall() throws Exception {
        List<FormSpec> twoByTwo = forms(2, 2);
        List<FormSpec> threeByTwo = forms(3, 2);
        List<FormSpec> crossover = FormDesigner.forms(ExamSourceReader.read(
                ExamFolders.withTasks(dir.resolve("crossover"), 2, 2, "crossover", true)));
        Random sizes = new Random(7);
        for (int trial = 0; trial < 150; trial++) {
            List<FormSpec> forms = trial % 3 == 0 ? twoByTwo : trial % 3 == 1 ? threeByTwo : crossover;
            int levels = 1 + sizes.nextInt(5);
            int[] perLevel = new int[levels];
            for (int l = 0; l < levels; l++) {
                perLevel[l] = 1 + sizes.nextInt(40);
            }
            Assignment assignment = FormAssigner.assign(roster(perLevel), forms, 2, trial);
            for (int l = 0; l < levels; l++) {
                assertAtMostOneApart(formCounts(assignment, "level-" + l), forms.size(), "forms in level " + l + " trial " + trial);
                assertTaskConditionsAtMostOneApart(cellCounts(assignment, forms, "level-" + l), "level " + l + " trial " + trial);
            }
            assertTaskConditionsAtMostOneApart(cellCounts(assignment, forms, null), "overall, trial " + trial);
        }
    }

    @Test
    void assign_sameSeed_sameAssignment_otherSeed_otherAssignment() throws Exception {
        List<FormSpec> forms = forms(2, 2);
        List<FormAssigner.Candidate> candidates = roster(13, 21);
        Assignment first = FormAssigner.assign(candidates, forms, 2, 20260315L);
        Assignment again = FormAssigner.assign(new ArrayList<>(candidates).reversed(), forms, 2, 20260315L);
        assertEquals(first, again, "the seed, not the roster's row order, decides");
        assertEquals(20260315L, first.seed());
        assertNotEquals(first.rows(), FormAssigner.assign(candidates, forms, 2, 20260316L).rows());
    }

    @Test
    void assignmentTable_roundTrip_keepsRowsAndSeed() throws Exception {
        Assignment a = FormAssigner.assign(roster(5, 7), forms(2, 2), 2, 99);
        Path file = dir.resolve("assignment.csv");
        AssignmentTable.write(a, file);
        assertEquals(a, AssignmentTable.read(file));
    }

    private static Map<String, Integer> formCounts(Assignment a, String level) {
        Map<String, Integer> counts = new HashMap<>();
        a.rows().stream().filter(r -> level == null || r.level().equals(level))
                .forEach(r -> counts.merge(r.formId(), 1, Integer::sum));
        return counts;
    }

    private static Map<String, Integer> cellCounts(Assignment a, List<FormSpec> forms, String level) {
        Map<String, FormSpec> byId = new HashMap<>();
        forms.forEach(f -> byId.put(f.id(), f));
        Map<String, Integer> cells = new HashMap<>();
        for (FormSpec f : forms) {
            for (FormSlot s : f.slots()) {
                cells.putIfAbsent(s.taskId() + "/" + s.conditionId(), 0);
            }
        }
        a.rows().stream().filter(r -> level == null || r.level().equals(level)).forEach(r -> byId.get(r.formId()).slots()
                .forEach(s -> cells.merge(s.taskId() + "/" + s.conditionId(), 1, Integer::sum)));
        return cells;
    }

    private static void assertAtMostOneApart(Map<String, Integer> counts, int forms, String what) {
        List<Integer> all = new ArrayList<>(counts.values());
        while (all.size() < forms) {
            all.add(0);
        }
        int spread = all.stream().mapToInt(i -> i).max().orElse(0) - all.stream().mapToInt(i -> i).min().orElse(0);
        assertTrue(spread <= 1, what + ": " + counts);
    }

    /** For each task, its counts under the different conditions differ by at most one. */
    private static void assertTaskConditionsAtMostOneApart(Map<String, Integer> cells, String what) {
        Map<String, List<Integer>> byTask = new HashMap<>();
        cells.forEach((k, v) -> byTask.computeIfAbsent(k.substring(0, k.indexOf('/')), x -> new ArrayList<>()).add(v));
        byTask.forEach((task, counts) -> assertTrue(
                counts.stream().mapToInt(i -> i).max().getAsInt() - counts.stream().mapToInt(i -> i).min().getAsInt() <= 1,
                what + " task " + task + ": " + cells));
    }
}
