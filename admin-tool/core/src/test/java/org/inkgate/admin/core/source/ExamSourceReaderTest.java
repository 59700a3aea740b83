package org.inkgate.admin.core.source;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import org.inkgate.admin.core.testutil.ExamFolders;
import org.inkgate.packs.policy.SpellingMode;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

class ExamSourceReaderTest {

    @TempDir
    Path dir;

    @Test
    void read_validFolder_givesTasksConditionsPacksAndRubric() throws Exception {
        ExamSource exam = ExamSourceReader.read(ExamFolders.valid(dir));
        assertEquals("test-exam", exam.examId());
        assertEquals(List.of("t1", "t2"), exam.tasks().stream().map(ExamSource.Task::id).toList());
        assertEquals(1200, exam.tasks().get(0).timeLimitSeconds());
        assertEquals(SpellingMode.SUGGESTIONS, exam.conditions().get(0).policy().spelling());
        assertEquals("test-glossary", exam.conditions().get(0).policy().glossaryPack());
        assertEquals(SpellingMode.OFF, exam.conditions().get(1).policy().spelling());
        assertEquals(3, exam.rubric().criteria().get(0).bands().size());
    }

    @Test
    void check_manyMistakes_listsEveryProblemWithFileLineAndField() throws Exception {
        ExamFolders.valid(dir);
        String yaml = Files.readString(dir.resolve("exam.yaml"))
                .replace("    timeLimitMinutes: 20\n    warningMinutes: [5, 1]\n    words: {min: 100, max: 150}\n  - id: t2",
                        "    timeLimitMinutes: twenty\n    warningMinutes: [5, 1]\n    words: {min: 100, max: 150}\n  - id: t2")
                .replace("prompts/t2.md", "prompts/missing.md")
                .replace("spelling: suggestions", "spelling: lots")
                .replace("title: Invented task 1", "title: Invented task 1\n    colour: blue");
        Files.writeString(dir.resolve("exam.yaml"), yaml);
        Files.writeString(dir.resolve("rubric.yaml"), Files.readString(dir.resolve("rubric.yaml")).replace("4-6", "4-5"));
        List<Problem> problems = new java.util.ArrayList<>();
        ExamSourceReader.check(dir, problems);
        List<String> lines = problems.stream().map(Problem::toString).toList();
        // line:column of the offending value in the file ExamFolders writes (line 1 is "id: test-exam")
        assertTrue(lines.contains("exam.yaml:9:13: tasks[0].colour: unknown field \"colour\"; the fields allowed here are"
                + " id, prompt, timeLimitMinutes, title, warningMinutes, words (check the spelling)"), lines.toString());
        assertTrue(lines.stream().anyMatch(l -> l.startsWith("exam.yaml:11:23: tasks[0].timeLimitMinutes: must be a whole number")), lines.toString());
        assertTrue(lines.stream().anyMatch(l -> l.startsWith("exam.yaml:16:13: tasks[1].prompt: \"prompts/missing.md\" does not exist")), lines.toString());
        assertTrue(lines.stream().anyMatch(l -> l.startsWith("exam.yaml:") && l.contains("conditions[0].tools.spelling: \"lots\" is not one of")), lines.toString());
        assertTrue(lines.stream().anyMatch(l -> l.startsWith("rubric.yaml:") && l.contains("no band describes score 6")), lines.toString());
        assertEquals(5, problems.size(), lines.toString());
        assertThrows(InvalidSourceException.class, () -> ExamSourceReader.read(dir));
    }

    @Test
    void check_brokenYaml_pointsAtTheLine() throws Exception {
        ExamFolders.valid(dir);
        Files.writeString(dir.resolve("exam.yaml"), "id: x\ntitle: [unclosed\nlanguage: en\n");
        List<Problem> problems = new java.util.ArrayList<>();
        ExamSourceReader.check(dir, problems);
        assertEquals(1, problems.size());
        assertEquals("exam.yaml", problems.get(0).file());
        assertTrue(problems.get(0).line() >= 2, problems.toString());
    }

    @Test
    void read_perTaskPolicy_overridesTheConditionForThatTaskOnly() throws Exception {
        ExamFolders.valid(dir);
        Files.writeString(dir.resolve("exam.yaml"), Files.readString(dir.resolve("exam.yaml")).replace(
                "      glossary: test-glossary\n",
                "      glossary: test-glossary\n    perTask:\n      t2: {spelling: underline-only}\n"));
        ExamSource exam = ExamSourceReader.read(dir);
        ExamSource.Condition with = exam.conditions().get(0);
        assertEquals(SpellingMode.SUGGESTIONS, with.policyFor("t1").spelling());
        assertEquals(SpellingMode.UNDERLINE_ONLY, with.policyFor("t2").spelling());
        assertEquals(null, with.policyFor("t2").glossaryPack(), "a per-task policy is written out in full");
        var slot = org.inkgate.admin.core.forms.FormDesigner.forms(exam).stream().flatMap(f -> f.slots().stream())
                .filter(s -> s.taskId().equals("t2") && s.conditionId().equals("c1")).findFirst().orElseThrow();
        assertEquals(SpellingMode.UNDERLINE_ONLY, slot.policy().spelling());
    }

    @Test
    void check_unquotedYesNoLabels_explainYamlBooleans() throws Exception {
        ExamFolders.valid(dir);
        Files.writeString(dir.resolve("exam.yaml"), Files.readString(dir.resolve("exam.yaml"))
                .replace("labels: [\"not at all\", maybe, \"very much\"]", "labels: [no, maybe, yes]"));
        List<Problem> problems = new java.util.ArrayList<>();
        ExamSourceReader.check(dir, problems);
        assertEquals(2, problems.size(), problems.toString());
        assertTrue(problems.get(0).message().contains("put the text in quotes"), problems.toString());
    }

    @Test
    void check_unsafeFileNamesAndUnknownPack_areRefused() throws Exception {
        ExamFolders.valid(dir);
        Files.writeString(dir.resolve("exam.yaml"), Files.readString(dir.resolve("exam.yaml"))
                .replace("prompt: prompts/t1.md", "prompt: ../outside.md")
                .replace("glossary: test-glossary", "glossary: no-such-pack"));
        List<Problem> problems = new java.util.ArrayList<>();
        ExamSourceReader.check(dir, problems);
        assertTrue(problems.stream().anyMatch(p -> p.field().equals("tasks[0].prompt") && p.message().contains("cannot be used")),
                problems.toString());
        assertTrue(problems.stream().anyMatch(p -> p.field().equals("conditions[0].tools.glossary")
                && p.message().contains("not declared under packs")), problems.toString());
    }

    @Test
    void check_crossoverWithThreeTasks_isRefusedWithAdvice() throws Exception {
        ExamFolders.withTasks(dir, 3, 2, "crossover", true);
        List<Problem> problems = new java.util.ArrayList<>();
        ExamSourceReader.check(dir, problems);
        assertEquals(1, problems.size(), problems.toString());
        assertTrue(problems.get(0).message().contains("use latin-square"));
    }

    @Test
    void check_missingExamFile_saysWhatAFolderHolds() {
        List<Problem> problems = new java.util.ArrayList<>();
        ExamSourceReader.check(dir, problems);
        assertTrue(problems.get(0).message().contains("holds exam.yaml"));
    }
}
