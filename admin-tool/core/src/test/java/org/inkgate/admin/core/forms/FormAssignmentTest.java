package org.inkgate.admin.core.forms;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import org.inkgate.admin.core.roster.RosterCandidate;
import org.inkgate.admin.core.source.ExamSource;
import org.inkgate.admin.core.source.ExamSourceReader;
import org.inkgate.admin.core.source.InvalidSourceException;
import org.inkgate.admin.core.testutil.ExamFolders;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

class FormAssignmentTest {

    @TempDir
    Path dir;

    private static List<RosterCandidate> roster(Map<String, Integer> perLevel, String... languages) {
        List<RosterCandidate> out = new ArrayList<>();
        perLevel.forEach((level, n) -> {
            for (int i = 0; i < n; i++) {
                out.add(new RosterCandidate(level + "-" + i, level, languages.length == 0 ? ""
                        : languages[i % languages.length], 0, false, false, Map.of("school", "s" + (i % 2))));
            }
        });
        return out;
    }

    @Test
    void assign_exactBalanceWithAWilliamsDesignAndAnUnevenLevel_isRefusedWithWhatWouldBalanceIt() throws Exception {
        ExamSource exam = ExamSourceReader.read(ExamFolders.withDesign(dir, 3, 3,
                "  kind: crossover\n  exactBalance: true\n", true));
        var forms = FormDesigner.forms(exam);
        InvalidSourceException e = assertThrows(InvalidSourceException.class, () -> FormAssignment.assign(exam, forms,
                roster(new java.util.TreeMap<>(Map.of("A2", 12, "B1", 7))), 1));
        assertEquals(1, e.problems().size(), e.getMessage());
        String message = e.problems().get(0).message();
        assertTrue(message.contains("level B1 has 7 candidates; exact balance needs a multiple of 6 (the Williams design"
                + " for 3 conditions has 6 sequences, two Latin squares as 3 is odd): add 5 or remove 1 candidate"), message);
    }

    @Test
    void assign_exactBalanceWithWholeCycles_isEvenInEveryLevel() throws Exception {
        ExamSource exam = ExamSourceReader.read(ExamFolders.withDesign(dir, 3, 3,
                "  kind: crossover\n  exactBalance: true\n", true));
        var forms = FormDesigner.forms(exam);
        FormAssignment.Result r = FormAssignment.assign(exam, forms, roster(Map.of("A2", 12, "B1", 6)), 1);
        forms.forEach(f -> {
            assertEquals(2, r.counts().count("A2", f.id()));
            assertEquals(1, r.counts().count("B1", f.id()));
        });
    }

    @Test
    void assign_parallelStratifiedByFirstLanguage_reportsEveryStratumAndTheAchievedRatio() throws Exception {
        ExamSource exam = ExamSourceReader.read(ExamFolders.withDesign(dir, 2, 2,
                "  kind: parallel\n  allocation: \"2:1\"\n  stratifyBy: [first_language]\n", true));
        var forms = FormDesigner.forms(exam);
        FormAssignment.Result r = FormAssignment.assign(exam, forms, roster(Map.of("B1", 12), "es", "pl"), 3);
        String text = String.join("\n", r.balance());
        assertTrue(text.contains("B1 / es"), text);
        assertTrue(text.contains("B1 / pl"), text);
        assertTrue(text.contains("allocation ratio achieved: 2.00:1.00 (stated 2:1)"), text);
    }

    @Test
    void assign_stratifyByAColumnTheRosterLacks_isRefusedNamingIt() throws Exception {
        ExamSource exam = ExamSourceReader.read(ExamFolders.withDesign(dir, 2, 2,
                "  kind: parallel\n  stratifyBy: [region]\n", true));
        InvalidSourceException e = assertThrows(InvalidSourceException.class, () -> FormAssignment.assign(exam,
                FormDesigner.forms(exam), roster(Map.of("B1", 4)), 1));
        assertTrue(e.getMessage().contains("names the roster column \"region\", which the roster does not have"),
                e.getMessage());
    }

    @Test
    void assign_parallelStratifiedByAPersonalColumn_balancesWithinIt() throws Exception {
        ExamSource exam = ExamSourceReader.read(ExamFolders.withDesign(dir, 1, 2,
                "  kind: parallel\n  stratifyBy: [school]\n", true));
        var forms = FormDesigner.forms(exam);
        FormAssignment.Result r = FormAssignment.assign(exam, forms, roster(Map.of("B1", 8)), 9);
        String text = String.join("\n", r.balance());
        assertTrue(text.contains("B1 / s0") && text.contains("B1 / s1"), text);
    }
}
