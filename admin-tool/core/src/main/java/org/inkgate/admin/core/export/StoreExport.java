package org.inkgate.admin.core.export;

import java.io.IOException;
import java.io.Writer;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import org.inkgate.admin.core.rating.RatingException;
import org.inkgate.admin.core.rating.RatingStore;
import org.inkgate.admin.core.store.ResultsStore;
import org.inkgate.admin.core.store.StoreException;
import org.inkgate.admin.core.store.StoreLocation;
import org.inkgate.admin.core.store.Stores;

/**
 * One exam's whole export (tidy CSV, questionnaire answers, QTI results, xAPI statements) into
 * {@code OUT/EXAM-ID/}: what the {@code export} command and the admin window's export step both
 * run, so the two cannot drift apart; {@link Written#lines} is the summary both show.
 */
public final class StoreExport {

    /** What the test owner is told after every export, whatever was written. */
    public static final String HANDLING = "Exports hold candidate numbers, never names or other personal roster"
            + " fields; they still hold the candidates' texts: handle them under your data-protection rules.";

    /** The parts of one exam's export, in the order they are written (for progress). */
    public static final List<String> PARTS = List.of("tidy CSV", "QTI results", "xAPI statements");

    /** Told when each part starts: its index in {@link #PARTS}. */
    public interface Listener {
        void part(int index);
    }

    /** What was written for one exam. */
    public record Written(String examId, Path folder, long responses, long toolUse, long events, long questionnaire,
            QtiResultsExport.Written qti, XapiExport.Written xapi, boolean xapiLight, int conflicts) {

        /** The summary for people, the same on the command line and in the window. */
        public List<String> lines() {
            List<String> w = new ArrayList<>();
            w.add(examId + " -> " + folder);
            w.add("  csv/responses.csv " + responses + " rows, csv/tool_use.csv " + toolUse + " rows, csv/events.csv "
                    + events + " rows, csv/" + QuestionnaireCsv.FILE_NAME + " " + questionnaire + " rows");
            w.add("  qti-results/ " + qti.files() + " assessmentResult files (" + qti.scored()
                    + " task results with a final score)");
            w.add("  xapi-statements.jsonl " + xapi.statements() + " statements (" + xapi.notExported()
                    + " events of the client, timer or invigilator not exported" + (xapiLight ? ", "
                    + xapi.keystrokesLeftOut() + " keystroke events left out (--xapi-light)" : "")
                    + "; docs/data-dictionary.md)");
            if (qti.replaced() > 0) {
                w.add("  NOTE: " + qti.replaced() + " characters that XML 1.0 forbids (control characters) were"
                        + " written as U+FFFD in qti-results; csv/responses.csv keeps the texts exactly.");
            }
            if (xapi.unknownType() > 0) {
                w.add("  NOTE: " + xapi.unknownType() + " stored events have a type this version does not know and"
                        + " are not in the statements; they stay in csv/events.csv.");
            }
            if (conflicts > 0) {
                w.add("  NOTE: " + conflicts + " candidate-task pairs have more than one response; every copy"
                        + " is exported (column copies > 1). Decide which counts before scoring.");
            }
            return w;
        }
    }

    private StoreExport() {
    }

    /** The exams to export: the one named, or every exam in the store when none is. */
    public static List<String> exams(ResultsStore store, String examId) throws StoreException {
        return examId != null ? List.of(examId) : store.examIds();
    }

    /** Writes one exam's export into {@code out/examId/}; {@code storeFile} is the store's file (for its ratings). */
    public static Written write(Path storeFile, ResultsStore store, String examId, Path out, XapiExport.Options xapiOptions,
            Listener listener) throws IOException, StoreException {
        return write(storeFile, store, examId, out, xapiOptions, false, listener);
    }

    /**
     * As above; {@code spreadsheetSafe} writes the CSV files for opening in a spreadsheet
     * ({@link org.inkgate.admin.core.csv.SpreadsheetSafe}). Every file and folder written is owner-only.
     */
    public static Written write(Path storeFile, ResultsStore store, String examId, Path out, XapiExport.Options xapiOptions,
            boolean spreadsheetSafe, Listener listener) throws IOException, StoreException {
        return write(StoreLocation.file(storeFile), store, examId, out, xapiOptions, spreadsheetSafe, listener);
    }

    /** As above, from the store at {@code location} (a file or a server). */
    public static Written write(StoreLocation location, ResultsStore store, String examId, Path out,
            XapiExport.Options xapiOptions, boolean spreadsheetSafe, Listener listener) throws IOException, StoreException {
        try (WholeFolder whole = WholeFolder.start(OutputFolder.file(out, examId))) {
            Written w = write(location, store, examId, whole.folder(), xapiOptions, spreadsheetSafe, listener, whole);
            return w;
        }
    }

    private static Written write(StoreLocation location, ResultsStore store, String examId, Path dir, XapiExport.Options xapiOptions,
            boolean spreadsheetSafe, Listener listener, WholeFolder whole) throws IOException, StoreException {
        listener.part(0);
        org.inkgate.format.io.OwnerOnly.folder(dir.resolve("csv"));
        long[] rows = TidyCsvExport.write(store, examId, dir.resolve("csv"), spreadsheetSafe);
        long questionnaire;
        try (Writer plain = Files.newBufferedWriter(dir.resolve("csv").resolve(QuestionnaireCsv.FILE_NAME),
                StandardCharsets.UTF_8);
                Writer csv = spreadsheetSafe ? org.inkgate.admin.core.csv.SpreadsheetSafe.writer(plain) : plain) {
            questionnaire = QuestionnaireCsv.write(store, examId, csv);
        }
        listener.part(1);
        QtiResultsExport.Written qti = QtiResultsExport.write(store, examId, dir.resolve("qti-results"),
                scoring(location, examId));
        listener.part(2);
        XapiExport.Written xapi = XapiExport.write(store, examId, dir.resolve("xapi-statements.jsonl"), xapiOptions);
        org.inkgate.format.io.OwnerOnly.tree(dir);
        int conflicts = store.conflicts(examId).size();
        Path placed = whole.finish();
        return new Written(examId, placed, rows[0], rows[1], rows[2], questionnaire, qti, xapi, xapiOptions.light(),
                conflicts);
    }

    /** The ratings to report, once the store holds a rubric for the exam (collect --exam registers it). */
    private static QtiResultsExport.Scoring scoring(StoreLocation location, String id) throws IOException {
        if (location instanceof StoreLocation.Server) {
            return QtiResultsExport.Scoring.NONE; // rating is on store files only in this version: a server store holds no ratings
        }
        try {
            if (!Stores.hasRubric(location, id)) {
                return QtiResultsExport.Scoring.NONE;
            }
            try (RatingStore rating = Stores.openRating(location, id)) {
                return new QtiResultsExport.Scoring(rating.rubric(), rating.scoresByResponse());
            }
        } catch (RatingException e) {
            throw new IOException("reading the ratings of " + id + " for the QTI results failed: " + e.getMessage(), e);
        }
    }
}
