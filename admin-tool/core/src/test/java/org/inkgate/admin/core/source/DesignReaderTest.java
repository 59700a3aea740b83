package org.inkgate.admin.core.source;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import org.inkgate.admin.core.testutil.ExamFolders;
import org.inkgate.format.bundle.StudyDesign;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

class DesignReaderTest {

    @TempDir
    Path dir;

    private List<Problem> problems(int tasks, int conditions, String designLines) throws Exception {
        ExamFolders.withDesign(dir, tasks, conditions, designLines, true);
        List<Problem> problems = new ArrayList<>();
        ExamSourceReader.check(dir, problems);
        return problems;
    }

    @Test
    void read_parallelWithRatioAndStrata_keepsThemInDeclaredOrder() throws Exception {
        ExamFolders.withDesign(dir, 2, 3, "  kind: parallel\n  allocation: \"2:1:1\"\n  stratifyBy: [first_language,"
                + " school]\n  counterbalanceTasks: false\n", true);
        ExamSource.Design d = ExamSourceReader.read(dir).design();
        assertEquals(StudyDesign.PARALLEL, d.kind());
        assertEquals(List.of(2, 1, 1), d.allocation());
        assertEquals(List.of("first_language", "school"), d.stratifyBy());
        assertEquals(false, d.counterbalanceTasks());
    }

    @Test
    void read_ratioWithoutQuotes_isReadAsTheRatio() throws Exception {
        ExamFolders.withDesign(dir, 2, 2, "  kind: parallel\n  allocation: 2:1\n", true);
        assertEquals(List.of(2, 1), ExamSourceReader.read(dir).design().allocation());
    }

    @Test
    void read_parallelWithoutRatio_allocatesEvenly() throws Exception {
        ExamFolders.withDesign(dir, 2, 3, "  kind: parallel\n", true);
        assertEquals(List.of(1, 1, 1), ExamSourceReader.read(dir).design().allocation());
    }

    @Test
    void check_crossoverWithMoreConditionsThanTasks_saysHowManyTasksItNeeds() throws Exception {
        List<Problem> p = problems(2, 3, "  kind: crossover\n");
        assertEquals(1, p.size(), p.toString());
        assertTrue(p.get(0).message().contains("crossover needs as many tasks as conditions, at least 2 (found 2 tasks"
                + " and 3 conditions)") && p.get(0).message().contains("Declare 3 tasks"), p.toString());
        assertEquals("design.kind", p.get(0).field());
    }

    @Test
    void check_ratioWithTheWrongNumberOfParts_isRefused() throws Exception {
        List<Problem> p = problems(2, 3, "  kind: parallel\n  allocation: \"2:1\"\n");
        assertEquals(1, p.size(), p.toString());
        assertTrue(p.get(0).message().contains("has 2 parts but the exam declares 3 conditions"), p.toString());
    }

    @Test
    void check_ratioNotInQuotesOrNotWholeNumbers_isRefusedWithTheFix() throws Exception {
        List<Problem> p = problems(2, 2, "  kind: parallel\n  allocation: 2\n");
        assertTrue(p.get(0).message().contains("must be a ratio, one whole number per condition"), p.toString());
        p = problems(2, 2, "  kind: parallel\n  allocation: \"2:0\"\n");
        assertTrue(p.get(0).message().contains("is not a ratio: write whole numbers from 1 to 20"), p.toString());
    }

    @Test
    void check_parallelWithOneCondition_isRefused() throws Exception {
        List<Problem> p = problems(2, 1, "  kind: parallel\n");
        assertTrue(p.stream().anyMatch(x -> x.message().contains("declare at least 2 conditions")), p.toString());
    }

    @Test
    void check_parallelSettingsOnAWithinDesign_andRotationOnAParallelOne_areRefused() throws Exception {
        List<Problem> p = problems(2, 2, "  kind: latin-square\n  allocation: \"1:1\"\n");
        assertEquals(1, p.size(), p.toString());
        assertTrue(p.get(0).message().contains("applies to parallel designs only"), p.toString());
        p = problems(2, 2, "  kind: parallel\n  rotateConditions: true\n");
        assertTrue(p.get(0).message().contains("applies to latin-square only"), p.toString());
    }

    @Test
    void check_levelAmongTheStrata_isRefusedAsAlwaysAStratum() throws Exception {
        List<Problem> p = problems(2, 2, "  kind: parallel\n  stratifyBy: [level]\n");
        assertTrue(p.get(0).message().contains("the level is always a stratum"), p.toString());
    }

    @Test
    void check_unknownDesign_namesTheThreeDesigns() throws Exception {
        List<Problem> p = problems(2, 2, "  kind: between\n");
        assertTrue(p.get(0).message().contains("use crossover, latin-square or parallel"), p.toString());
    }
}
