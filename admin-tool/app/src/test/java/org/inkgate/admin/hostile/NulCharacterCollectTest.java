package org.inkgate.admin.hostile;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import org.inkgate.admin.cli.InkgateAdmin;
import org.inkgate.admin.core.simulation.SimulatedSitting;
import org.inkgate.admin.core.store.StoreLocation;
import org.inkgate.admin.core.testutil.PostgresServer;
import org.inkgate.admin.testutil.ForgedPackages;
import org.inkgate.format.response.ProcessEvent;
import org.inkgate.format.response.QuestionnaireAnswers;
import org.inkgate.format.response.ResponseDocument;
import org.inkgate.format.response.TaskResponse;
import org.junit.jupiter.api.io.TempDir;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.ValueSource;

/**
 * A NUL character (U+0000) in a text a package carries: PostgreSQL refuses it in a text column
 * (PostgreSQL docs, 8.3 "Character Types": "the character with code zero ... cannot be stored"),
 * SQLite would keep it, and exports and analyses downstream mishandle it. A client of this version
 * writes none; such a package is refused with reason {@code nul-character}, naming where the
 * character is, the same on both stores, and the honest package beside it is imported. Before this
 * rule, one such package stopped a collect into PostgreSQL at the same place on every rerun.
 */
class NulCharacterCollectTest {

    @TempDir
    Path dir;

    @ParameterizedTest(name = "into a {0} store")
    @ValueSource(strings = {"SQLite", "PostgreSQL"})
    void collect_packagesWithNulCharacters_refusedWithWhereAndTheHonestOneImported(String kind) throws Exception {
        ForgedPackages p = ForgedPackages.prepare(dir);
        Path folder = dir.resolve("packages");
        p.write(p.document("H1001", 1), folder.resolve("honest.inkresp"));
        ResponseDocument text = p.document("H1002", 2);
        List<TaskResponse> tasks = new ArrayList<>(text.tasks());
        TaskResponse t = tasks.get(0);
        int at = t.text().indexOf(' ') - 1; // the last letter of the first word: the word count stays
        tasks.set(0, new TaskResponse(t.taskId(), t.conditionId(), t.text().substring(0, at) + "\u0000"
                + t.text().substring(at + 1), t.wordCount(), t.startedAt(), t.endedAt(), t.extraTimeSeconds(), t.policy(),
                t.toolsOffered(), t.toolUse(), t.endReason()));
        p.write(new ResponseDocument(text.format(), text.schemaVersion(), text.packageId(), text.examId(),
                text.bundleManifestSha256(), text.candidateNumber(), text.seat(), text.formId(), text.clientVersion(),
                text.startedAt(), text.submittedAt(), tasks, text.questionnaires()), folder.resolve("nul-text.inkresp"));
        ResponseDocument seat = p.document("H1003", 3);
        p.write(new ResponseDocument(seat.format(), seat.schemaVersion(), seat.packageId(), seat.examId(),
                seat.bundleManifestSha256(), seat.candidateNumber(), "A\u00007", seat.formId(), seat.clientVersion(),
                seat.startedAt(), seat.submittedAt(), seat.tasks(), seat.questionnaires()), folder.resolve("nul-seat.inkresp"));
        ResponseDocument answer = p.document("H1004", 4);
        p.write(new ResponseDocument(answer.format(), answer.schemaVersion(), answer.packageId(), answer.examId(),
                answer.bundleManifestSha256(), answer.candidateNumber(), answer.seat(), answer.formId(),
                answer.clientVersion(), answer.startedAt(), answer.submittedAt(), answer.tasks(),
                List.of(new QuestionnaireAnswers("after-writing", Map.of("time-enough", "3\u0000")))),
                folder.resolve("nul-answer.inkresp"));
        ResponseDocument typed = p.document("H1005", 5);
        List<ProcessEvent> events = new ArrayList<>(SimulatedSitting.events(typed, 40, 5));
        ProcessEvent e = events.get(5);
        events.set(5, new ProcessEvent(e.seq(), e.at(), e.mono(), "note\u0000", e.task(), e.data()));
        p.write(typed, events, folder.resolve("nul-event.inkresp"));

        String store = dir.resolve("results.db").toString();
        if (kind.equals("PostgreSQL")) {
            StoreLocation.Server s = PostgresServer.freshStore("nul");
            store = "postgresql://postgres@localhost:" + s.port() + "/" + s.database();
        }
        ForgedPackages.Run collect = ForgedPackages.process(dir, "collect", folder.toString(), "--store", store,
                "--bundle", p.bundle().toString(), "--keys", p.keys().toString(), "--any-installation",
                "--passphrase-env", ForgedPackages.PASSPHRASE_ENV);
        String out = collect.out();
        assertEquals(InkgateAdmin.ATTENTION, collect.code(), out);
        assertTrue(out.contains("Imported 1,") && out.contains("refused 4."), out);
        assertRefused(out, "nul-text.inkresp", "the text of task " + t.taskId());
        assertRefused(out, "nul-seat.inkresp", "the seat");
        assertRefused(out, "nul-answer.inkresp", "the answer to item time-enough of questionnaire after-writing");
        assertRefused(out, "nul-event.inkresp", "the type of event " + e.seq());
    }

    private static void assertRefused(String out, String file, String where) {
        String line = out.lines().filter(l -> l.contains(file)).findFirst().orElse("");
        assertTrue(line.startsWith("REFUSED ") && line.contains(file + " (nul-character)") && line.contains(where)
                && line.contains("NUL character (U+0000)"), file + " should be refused naming " + where + ": " + out);
    }
}
