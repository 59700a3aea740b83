package org.inkgate.admin.hostile;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.function.UnaryOperator;
import org.inkgate.admin.cli.InkgateAdmin;
import org.inkgate.admin.core.simulation.SimulatedSitting;
import org.inkgate.admin.testutil.ForgedPackages;
import org.inkgate.format.response.ProcessEvent;
import org.inkgate.format.response.QuestionnaireAnswers;
import org.inkgate.format.response.ResponseDocument;
import org.inkgate.format.response.TaskResponse;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * Packages with a good signature whose content breaks an obvious rule, each collected beside an
 * honest one through the real {@code collect}: every one is refused with its reason, the honest one
 * is imported. The demo form asks questionnaire after-writing (time-enough: a five-point Likert item).
 */
class ContentRulesCollectTest {

    @TempDir
    Path dir;

    private static ResponseDocument withTasks(ResponseDocument d, UnaryOperator<TaskResponse> change) {
        List<TaskResponse> tasks = new ArrayList<>(d.tasks());
        tasks.set(0, change.apply(tasks.get(0)));
        return new ResponseDocument(d.format(), d.schemaVersion(), d.packageId(), d.examId(), d.bundleManifestSha256(),
                d.candidateNumber(), d.seat(), d.formId(), d.clientVersion(), d.startedAt(), d.submittedAt(), tasks,
                d.questionnaires());
    }

    private static TaskResponse task(TaskResponse t, int words, long extraSeconds) {
        return new TaskResponse(t.taskId(), t.conditionId(), t.text(), words, t.startedAt(), t.endedAt(), extraSeconds,
                t.policy(), t.toolsOffered(), t.toolUse(), t.endReason());
    }

    private static ResponseDocument withAnswers(ResponseDocument d, Map<String, String> answers) {
        return new ResponseDocument(d.format(), d.schemaVersion(), d.packageId(), d.examId(), d.bundleManifestSha256(),
                d.candidateNumber(), d.seat(), d.formId(), d.clientVersion(), d.startedAt(), d.submittedAt(), d.tasks(),
                List.of(new QuestionnaireAnswers("after-writing", answers)));
    }

    @Test
    void collect_contentBreakingObviousRules_refusedWithReasonsAndTheHonestPackageImported() throws Exception {
        ForgedPackages p = ForgedPackages.prepare(dir);
        Path folder = dir.resolve("packages");
        p.write(p.document("H1001", 1), folder.resolve("honest.inkresp"));
        ResponseDocument d = p.document("H1002", 2);
        p.write(withTasks(d, t -> task(t, -3, t.extraTimeSeconds())), folder.resolve("negative-words.inkresp"));
        p.write(withTasks(p.document("H1003", 3), t -> task(t, t.wordCount(), -600)), folder.resolve("negative-time.inkresp"));
        p.write(withTasks(p.document("H1004", 4), t -> task(t, t.wordCount() + 500, t.extraTimeSeconds())),
                folder.resolve("word-count.inkresp"));
        p.write(withAnswers(p.document("H1005", 5), Map.of("time-enough", "9")), folder.resolve("likert.inkresp"));
        p.write(withAnswers(p.document("H1006", 6), Map.of("not-an-item", "2")), folder.resolve("no-item.inkresp"));
        ResponseDocument early = p.document("H1007", 7);
        p.write(new ResponseDocument(early.format(), early.schemaVersion(), early.packageId(), early.examId(),
                early.bundleManifestSha256(), early.candidateNumber(), early.seat(), early.formId(), early.clientVersion(),
                early.startedAt(), early.startedAt().minusSeconds(3600), early.tasks(), early.questionnaires()),
                folder.resolve("submitted-early.inkresp"));
        ResponseDocument strayDoc = p.document("H1008", 8);
        List<ProcessEvent> events = new ArrayList<>(SimulatedSitting.events(strayDoc, 40, 8));
        ProcessEvent e = events.get(3);
        events.set(3, new ProcessEvent(e.seq(), e.at(), e.mono(), e.type(), "task-not-in-the-form", e.data()));
        p.write(strayDoc, events, folder.resolve("stray-event.inkresp"));

        ForgedPackages.Run collect = p.collect(folder, dir.resolve("results.db"));
        String out = collect.out();
        assertEquals(InkgateAdmin.ATTENTION, collect.code(), out);
        assertTrue(out.contains("Imported 1,") && out.contains("refused 7."), out);
        assertRefused(out, "negative-words.inkresp", "negative-count", "negative word count (-3)");
        assertRefused(out, "negative-time.inkresp", "negative-time", "negative extra time (-600 s)");
        assertRefused(out, "word-count.inkresp", "word-count", "words but its text has");
        assertRefused(out, "likert.inkresp", "questionnaire", "is \"9\", not a point of the scale 1-5");
        assertRefused(out, "no-item.inkresp", "questionnaire", "not-an-item, which the questionnaire does not have");
        assertRefused(out, "submitted-early.inkresp", "time-order", "before it started");
        assertRefused(out, "stray-event.inkresp", "event-contract", "task-not-in-the-form");
    }

    private static void assertRefused(String out, String file, String reason, String says) {
        String line = out.lines().filter(l -> l.contains(file)).findFirst().orElse("");
        assertTrue(line.startsWith("REFUSED ") && line.contains(file + " (" + reason + ")") && line.contains(says),
                file + " should be refused (" + reason + ") saying \"" + says + "\": " + out);
    }

}
