package org.inkgate.admin.core.forms;

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
    @CsvSource({"2,2,latin-square,4", "3,2,latin-square,6", "4,2,latin-square,8", "3,3,latin-square,9", "2,2,crossover,2"})
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
}
