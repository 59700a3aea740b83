package org.inkgate.admin.cli;

import java.io.IOException;
import java.io.PrintWriter;
import java.nio.file.Path;
import java.util.List;
import java.util.concurrent.Callable;
import org.inkgate.admin.core.export.OutputFolder;
import org.inkgate.admin.core.export.QtiResultsExport;
import org.inkgate.admin.core.export.QuestionnaireCsv;
import org.inkgate.admin.core.export.TidyCsvExport;
import org.inkgate.admin.core.export.XapiExport;
import org.inkgate.admin.core.rating.RatingException;
import org.inkgate.admin.core.rating.SqliteRatingStore;
import org.inkgate.admin.core.store.ResultsStore;
import org.inkgate.admin.core.store.Rows;
import org.inkgate.admin.core.store.SqliteResultsStore;
import org.inkgate.format.io.OwnerOnly;
import picocli.CommandLine.Command;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Option;
import picocli.CommandLine.Spec;

/** {@code export}: tidy CSV, QTI 3.0 results and xAPI statements from the results store. */
@Command(name = "export", description = "Export responses, tool use, process events and questionnaire answers: tidy"
        + " CSV (see docs/data-dictionary.md), QTI 3.0 results per response package (with the scores once ratings"
        + " exist), xAPI statements as JSON lines.")
final class ExportCommand implements Callable<Integer> {
    @Spec
    CommandSpec spec;

    @Option(names = "--store", required = true, paramLabel = "DB", description = "the results store")
    Path storeFile;

    @Option(names = "--out", required = true, paramLabel = "DIR", description = "folder for the exported files")
    Path out;

    @Option(names = "--exam-id", paramLabel = "ID", description = "only this exam (default: every exam in the store)")
    String examId;

    @Option(names = "--xapi-base", paramLabel = "IRI", description = "IRI base of the xAPI activities, extensions and"
            + " account home page, under a domain you control (default: the placeholder " + XapiExport.BASE + ")")
    String xapiBase = XapiExport.BASE;

    @Option(names = "--xapi-light", description = "leave the per-keystroke statements (text.insert, text.delete) out of"
            + " the xAPI export: tool use, task and sitting boundaries, focus and navigation remain")
    boolean xapiLight;

    @Option(names = "--spreadsheet-safe", description = "write the CSV files for opening in a spreadsheet: a cell that"
            + " starts with = + - @, a tab or a carriage return gets a single quote in front, so it is never run as a"
            + " formula (OWASP, CSV Injection); programs and analyse read the plain export (docs/data-dictionary.md)")
    boolean spreadsheetSafe;

    /** The ratings to report, once the store holds a rubric for the exam (collect --exam registers it). */
    private QtiResultsExport.Scoring scoring(String id) throws IOException {
        try {
            if (!SqliteRatingStore.hasRubric(storeFile, id)) {
                return QtiResultsExport.Scoring.NONE;
            }
            try (SqliteRatingStore rating = SqliteRatingStore.open(storeFile, id)) {
                return new QtiResultsExport.Scoring(rating.rubric(), rating.scoresByResponse());
            }
        } catch (RatingException e) {
            throw new IOException("reading the ratings of " + id + " for the QTI results failed: " + e.getMessage(), e);
        }
    }

    @Override
    public Integer call() throws Exception {
        PrintWriter w = spec.commandLine().getOut();
        XapiExport.Options xapiOptions = new XapiExport.Options(xapiBase, xapiLight);
        try (ResultsStore store = SqliteResultsStore.open(ExistingStore.require(storeFile))) {
            List<String> exams = examId != null ? List.of(examId) : store.examIds();
            for (String id : exams) {
                Path dir = OutputFolder.file(out, id);
                OwnerOnly.folder(dir.resolve("csv"));
                long[] rows = TidyCsvExport.write(store, id, dir.resolve("csv"), spreadsheetSafe);
                QtiResultsExport.Written qti = QtiResultsExport.write(store, id, dir.resolve("qti-results"), scoring(id));
                XapiExport.Written xapi = XapiExport.write(store, id, dir.resolve("xapi-statements.jsonl"),
                        xapiOptions);
                long questionnaire;
                try (var plain = java.nio.file.Files.newBufferedWriter(dir.resolve("csv").resolve(QuestionnaireCsv.FILE_NAME),
                        java.nio.charset.StandardCharsets.UTF_8);
                        var csv = spreadsheetSafe ? org.inkgate.admin.core.csv.SpreadsheetSafe.writer(plain) : plain) {
                    questionnaire = QuestionnaireCsv.write(store, id, csv);
                }
                OwnerOnly.tree(dir);
                w.println(TerminalText.value(id) + " -> " + TerminalText.value(dir));
                w.println("  csv/responses.csv " + rows[0] + " rows, csv/tool_use.csv " + rows[1] + " rows, csv/events.csv "
                        + rows[2] + " rows, csv/" + QuestionnaireCsv.FILE_NAME + " " + questionnaire + " rows");
                w.println("  qti-results/ " + qti.files() + " assessmentResult files (" + qti.scored()
                        + " task results with a final score)");
                w.println("  xapi-statements.jsonl " + xapi.statements() + " statements (" + xapi.notExported()
                        + " events of the client, timer or invigilator not exported" + (xapiLight ? ", " + xapi.keystrokesLeftOut()
                        + " keystroke events left out (--xapi-light)" : "") + "; docs/data-dictionary.md)");
                if (qti.replaced() > 0) {
                    w.println("  NOTE: " + qti.replaced() + " characters that XML 1.0 forbids (control characters) were"
                            + " written as U+FFFD in qti-results; csv/responses.csv keeps the texts exactly.");
                }
                if (xapi.unknownType() > 0) {
                    w.println("  NOTE: " + xapi.unknownType() + " stored events have a type this version does not know and"
                            + " are not in the statements; they stay in csv/events.csv.");
                }
                List<Rows.Conflict> conflicts = store.conflicts(id);
                if (!conflicts.isEmpty()) {
                    w.println("  NOTE: " + conflicts.size() + " candidate-task pairs have more than one response; every copy"
                            + " is exported (column copies > 1). Decide which counts before scoring.");
                }
            }
        }
        w.println("Exports hold candidate numbers, never names or other personal roster fields; they still hold the");
        w.println("candidates' texts: handle them under your data-protection rules.");
        return InkgateAdmin.OK;
    }
}
