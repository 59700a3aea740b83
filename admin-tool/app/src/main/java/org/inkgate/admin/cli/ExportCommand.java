package org.inkgate.admin.cli;

import java.io.PrintWriter;
import java.nio.file.Path;
import java.util.List;
import java.util.concurrent.Callable;
import org.inkgate.admin.core.export.QtiResultsExport;
import org.inkgate.admin.core.export.QuestionnaireCsv;
import org.inkgate.admin.core.export.TidyCsvExport;
import org.inkgate.admin.core.export.XapiExport;
import org.inkgate.admin.core.store.ResultsStore;
import org.inkgate.admin.core.store.Rows;
import org.inkgate.admin.core.store.SqliteResultsStore;
import picocli.CommandLine.Command;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Option;
import picocli.CommandLine.Spec;

/** {@code export}: tidy CSV, QTI 3.0 results and xAPI statements from the results store. */
@Command(name = "export", description = "Export responses, tool use, process events and questionnaire answers: tidy CSV (see"
        + " docs/data-dictionary.md), QTI 3.0 results per candidate, xAPI statements as JSON lines.")
final class ExportCommand implements Callable<Integer> {
    @Spec
    CommandSpec spec;

    @Option(names = "--store", required = true, paramLabel = "DB", description = "the results store")
    Path storeFile;

    @Option(names = "--out", required = true, paramLabel = "DIR", description = "folder for the exported files")
    Path out;

    @Option(names = "--exam-id", paramLabel = "ID", description = "only this exam (default: every exam in the store)")
    String examId;

    @Override
    public Integer call() throws Exception {
        PrintWriter w = spec.commandLine().getOut();
        try (ResultsStore store = SqliteResultsStore.open(storeFile)) {
            List<String> exams = examId != null ? List.of(examId) : store.examIds();
            for (String id : exams) {
                Path dir = out.resolve(id);
                long[] rows = TidyCsvExport.write(store, id, dir.resolve("csv"));
                int qti = QtiResultsExport.write(store, id, dir.resolve("qti-results"));
                long statements = XapiExport.write(store, id, dir.resolve("xapi-statements.jsonl"));
                long questionnaire;
                try (var csv = java.nio.file.Files.newBufferedWriter(dir.resolve("csv").resolve(QuestionnaireCsv.FILE_NAME),
                        java.nio.charset.StandardCharsets.UTF_8)) {
                    questionnaire = QuestionnaireCsv.write(store, id, csv);
                }
                w.println(id + " -> " + dir);
                w.println("  csv/responses.csv " + rows[0] + " rows, csv/tool_use.csv " + rows[1] + " rows, csv/events.csv "
                        + rows[2] + " rows, csv/" + QuestionnaireCsv.FILE_NAME + " " + questionnaire + " rows");
                w.println("  qti-results/ " + qti + " assessmentResult files; xapi-statements.jsonl " + statements
                        + " statements");
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
