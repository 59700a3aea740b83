package org.inkgate.admin.core.forms;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;

import java.nio.file.Path;
import java.util.HashMap;
import java.util.HashSet;
import java.util.List;
import java.util.Map;
import java.util.Set;
import org.inkgate.admin.core.source.ExamSource;
import org.inkgate.admin.core.source.ExamSourceReader;
import org.inkgate.admin.core.testutil.ExamFolders;
import org.inkgate.format.bundle.FormSlot;
import org.inkgate.format.bundle.FormSpec;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;
import org.junit.jupiter.params.provider.ValueSource;

class FormDesignerTest {

    @TempDir
    Path dir;

    /** Latin square: every row and every column holds each task once (definition of a Latin square). */
    @ParameterizedTest
    @ValueSource(ints = {1, 2, 3, 4, 5, 6, 7, 8})
    void latinSquare_anySize_isLatin(int k) {
        List<int[]> rows = FormDesigner.latinSquare(k);
        assertEquals(k, rows.size());
        for (int c = 0; c < k; c++) {
            Set<Integer> column = new HashSet<>();
            for (int[] row : rows) {
                assertEquals(k, java.util.Arrays.stream(row).distinct().count());
                column.add(row[c]);
            }
            assertEquals(k, column.size());
        }
    }

    /**
     * Williams' design for even k: each task immediately follows every other task exactly once
     * (balance for first-order carry-over; Williams 1949 [memory], the property itself is the definition).
     */
    @ParameterizedTest
    @ValueSource(ints = {2, 4, 6, 8})
    void latinSquare_evenSize_isBalancedForCarryOver(int k) {
        Map<String, Integer> pairs = new HashMap<>();
        for (int[] row : FormDesigner.latinSquare(k)) {
            for (int i = 0; i + 1 < k; i++) {
                pairs.merge(row[i] + ">" + row[i + 1], 1, Integer::sum);
            }
        }
        assertEquals(k * (k - 1), pairs.size());
        pairs.values().forEach(n -> assertEquals(1, n));
    }

    @ParameterizedTest
    @CsvSource({"2,2,latin-square,4", "3,2,latin-square,6", "4,2,latin-square,8", "3,3,latin-square,9", "2,2,crossover,2",
        "3,3,crossover,6", "4,4,crossover,4", "5,5,crossover,10", "2,3,parallel,6", "3,2,parallel,6", "1,3,parallel,3"})
    void forms_crossTasksAndConditions_everyTaskMeetsEveryConditionEquallyOften(int tasks, int conditions, String design,
            int expectedForms) throws Exception {
        ExamSource exam = ExamSourceReader.read(ExamFolders.withTasks(dir, tasks, conditions, design, true));
        List<FormSpec> forms = FormDesigner.forms(exam);
        assertEquals(expectedForms, forms.size());
        Map<String, Integer> cells = new HashMap<>();
        for (FormSpec f : forms) {
            assertEquals(tasks, f.slots().stream().map(FormSlot::taskId).distinct().count(), "each task once per form");
            f.slots().forEach(s -> cells.merge(s.taskId() + "/" + s.conditionId(), 1, Integer::sum));
        }
        assertEquals(tasks * conditions, cells.size());
        assertEquals(1, cells.values().stream().distinct().count(), cells.toString());
    }

    /**
     * The Williams design for 3 treatments as R's crossdes package prints it (williams(3), the
     * example output on https://rdrr.io/cran/crossdes/man/williams.html; crossdes by O. Sailer,
     * after Williams 1949): rows 123, 231, 312, 321, 132, 213 (1-based there, 0-based here).
     */
    @Test
    void williams_threeTreatments_matchesCrossdesTable() {
        assertEquals(List.of("012", "120", "201", "210", "021", "102"), rows(FormDesigner.williams(3)));
    }

    /** williams(10) on the same page: its first rows 1 2 10 3 9 4 8 5 7 6 / 2 3 1 4 10 5 9 6 8 7 / ... */
    @Test
    void williams_tenTreatments_matchesCrossdesRows() {
        int[][] published = {
            {1, 2, 10, 3, 9, 4, 8, 5, 7, 6},
            {2, 3, 1, 4, 10, 5, 9, 6, 8, 7},
            {3, 4, 2, 5, 1, 6, 10, 7, 9, 8},
            {4, 5, 3, 6, 2, 7, 1, 8, 10, 9},
            {5, 6, 4, 7, 3, 8, 2, 9, 1, 10},
            {6, 7, 5, 8, 4, 9, 3, 10, 2, 1}};
        List<int[]> ours = FormDesigner.williams(10);
        assertEquals(10, ours.size());
        for (int r = 0; r < published.length; r++) {
            assertArrayEquals(java.util.Arrays.stream(published[r]).map(v -> v - 1).toArray(), ours.get(r));
        }
    }

    /**
     * Four treatments: ABDC, BCAD, CDBA, DACB, the Williams square quoted in the bioequivalence
     * forum thread https://forum.bebac.at/forum_entry.php?id=24359 ("Y", each ordered pair once).
     */
    @Test
    void williams_fourTreatments_matchesTheQuotedSquare() {
        assertEquals(List.of("0132", "1203", "2310", "3021"), rows(FormDesigner.williams(4)));
    }

    /**
     * The defining properties (Williams 1949): every treatment once in each position of each
     * square, and every ordered pair of different treatments adjacent equally often (once for
     * even c over c sequences, twice for odd c over 2c).
     */
    @ParameterizedTest
    @ValueSource(ints = {2, 3, 4, 5, 6, 7, 8, 9})
    void williams_anyNumberOfTreatments_isPositionAndCarryOverBalanced(int c) {
        List<int[]> rows = FormDesigner.williams(c);
        int squares = c % 2 == 0 ? 1 : 2;
        assertEquals(c * squares, rows.size());
        Map<String, Integer> pairs = new HashMap<>();
        for (int p = 0; p < c; p++) {
            int[] inPosition = new int[c];
            for (int[] row : rows) {
                inPosition[row[p]]++;
                assertEquals(c, java.util.Arrays.stream(row).distinct().count());
            }
            for (int t = 0; t < c; t++) {
                assertEquals(squares, inPosition[t]);
            }
        }
        for (int[] row : rows) {
            for (int i = 0; i + 1 < c; i++) {
                pairs.merge(row[i] + ">" + row[i + 1], 1, Integer::sum);
            }
        }
        assertEquals(c * (c - 1), pairs.size());
        pairs.values().forEach(n -> assertEquals(squares, n));
    }

    @Test
    void forms_crossoverWithThreeConditions_keepsTheTaskOrderAndTakesConditionOrdersFromWilliams() throws Exception {
        ExamSource exam = ExamSourceReader.read(ExamFolders.withTasks(dir, 3, 3, "crossover", true));
        List<FormSpec> forms = FormDesigner.forms(exam);
        List<String> orders = new java.util.ArrayList<>();
        for (FormSpec f : forms) {
            assertEquals(List.of("t1", "t2", "t3"), f.slots().stream().map(FormSlot::taskId).toList());
            orders.add(String.join("", f.slots().stream().map(s -> s.conditionId().substring(1)).toList()));
        }
        assertEquals(List.of("123", "231", "312", "321", "132", "213"), orders);
        assertEquals(6, FormDesigner.blockSize(exam));
    }

    @Test
    void forms_parallel_giveEachFormOneConditionAndEachGroupEveryTaskOrder() throws Exception {
        ExamSource exam = ExamSourceReader.read(ExamFolders.withTasks(dir, 2, 3, "parallel", true));
        List<FormSpec> forms = FormDesigner.forms(exam);
        assertEquals(List.of("c1 t1 t2", "c1 t2 t1", "c2 t1 t2", "c2 t2 t1", "c3 t1 t2", "c3 t2 t1"), forms.stream()
                .map(f -> f.slots().get(0).conditionId() + " " + String.join(" ", f.slots().stream()
                        .map(FormSlot::taskId).toList())).toList());
        forms.forEach(f -> assertEquals(1, f.slots().stream().map(FormSlot::conditionId).distinct().count()));
    }

    private static List<String> rows(List<int[]> rows) {
        return rows.stream().map(r -> String.join("", java.util.Arrays.stream(r).mapToObj(String::valueOf).toList()))
                .toList();
    }
}
