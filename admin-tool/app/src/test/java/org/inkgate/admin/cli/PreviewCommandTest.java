package org.inkgate.admin.cli;

import static org.inkgate.admin.testutil.AdminCommand.admin;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertInstanceOf;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Path;
import org.inkgate.admin.testutil.AdminCommand.Run;
import org.inkgate.admin.core.bundling.PreviewBundle;
import org.inkgate.admin.core.source.ExamSource;
import org.inkgate.admin.core.source.ExamSourceReader;
import org.inkgate.admin.testutil.DemoSource;
import org.inkgate.client.practice.PracticeExam;
import org.inkgate.client.practice.PracticeForm;
import org.inkgate.client.practice.PracticeLoad;
import org.inkgate.client.practice.PracticeLoader;
import org.inkgate.client.practice.PracticeTask;
import org.inkgate.format.bundle.BundleReader;
import org.inkgate.format.bundle.OpenedBundle;
import org.inkgate.format.trust.TrustPolicy;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * The bundle-building half of {@code preview}, without a window: the preview bundle holds the one
 * task under the one condition's policy exactly as the exam source declares them (read back by
 * the format's reader and the client's practice loader, the client's own path to the screen).
 */
class PreviewCommandTest {

    @TempDir
    Path dir;



    @Test
    void preview_taskUnderCondition_bundleHoldsTheSourcesTaskAndPolicy() throws Exception {
        Path exam = DemoSource.DEMO.resolve("exam-source");
        ExamSource source = ExamSourceReader.read(exam);
        for (ExamSource.Condition condition : source.conditions()) {
            for (ExamSource.Task task : source.tasks()) {
                Path file = dir.resolve(task.id() + "-" + condition.id() + ".inkexam");
                Run run = admin("preview", exam.toString(), "--task", task.id(), "--condition", condition.id(),
                        "--write-only", file.toString());
                assertEquals(InkgateAdmin.OK, run.code(), run.err());
                assertTrue(run.out().contains("not a locked sitting"), run.out());

                try (OpenedBundle b = new BundleReader(TrustPolicy.anySigner()).open(file)) {
                    assertTrue(b.manifest().practice(), "a preview is a practice bundle");
                    assertEquals(null, b.manifest().invigilatorPin());
                    assertTrue(b.manifest().roster().isEmpty());
                    assertEquals(1, b.manifest().forms().size());
                    var slot = b.manifest().forms().get(0).slots();
                    assertEquals(1, slot.size());
                    assertEquals(task.id(), slot.get(0).taskId());
                    assertEquals(condition.id(), slot.get(0).conditionId());
                    // the policy the exam source declares for this task under this condition
                    assertEquals(condition.policyFor(task.id()), slot.get(0).policy());
                    var spec = b.manifest().task(task.id()).orElseThrow();
                    assertEquals(task.timeLimitSeconds(), spec.timeLimitSeconds());
                    assertEquals(task.words(), spec.words());
                    assertEquals(java.nio.file.Files.readString(exam.resolve(task.promptFile())),
                            b.readText(spec.promptFile()), "the prompt is the source's file, byte for byte");
                }
                PracticeLoad load = new PracticeLoader().load(file);
                PracticeExam opened = assertInstanceOf(PracticeLoad.Opened.class, load).exam();
                PracticeForm form = opened.forms().get(0);
                assertEquals(1, form.tasks().size());
                PracticeTask shown = form.tasks().get(0);
                assertEquals(task.id(), shown.taskId());
                assertEquals(condition.policyFor(task.id()), shown.policy());
                assertEquals(condition.label(), shown.conditionLabel());
            }
        }
    }

    @Test
    void preview_defaultCondition_isTheFirstOfExamYaml() throws Exception {
        Path exam = DemoSource.DEMO.resolve("exam-source");
        ExamSource source = ExamSourceReader.read(exam);
        PreviewBundle.Built built = PreviewBundle.build(source, "market-square", null, dir.resolve("p.inkexam"));
        // src/demo/exam-source/exam.yaml lists with-resources first
        assertEquals("with-resources", built.condition().id());
    }

    @Test
    void help_listsPreviewAndGui() {
        Run run = admin("--help");
        assertTrue(run.out().contains("preview") && run.out().contains("gui"), run.out());
    }

    @Test
    void preview_unknownTask_exitsOneAndNamesTheTasks() {
        Run run = admin("preview", DemoSource.DEMO.resolve("exam-source").toString(), "--task", "no-such-task",
                "--write-only", dir.resolve("x.inkexam").toString());
        assertEquals(InkgateAdmin.PROBLEMS, run.code());
        assertTrue(run.err().contains("there is no task \"no-such-task\""), run.err());
        assertTrue(run.err().contains("ferry-complaint"), run.err());
        assertTrue(!dir.resolve("x.inkexam").toFile().exists());
    }
}
