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
 * The exams' whole export (tidy CSV, questionnaire answers, QTI results, xAPI statements) into
 * {@code OUT/EXAM-ID/}: what the {@code export} command and the admin window's export step both
 * run, so the two cannot drift apart; {@link Written#lines} is the summary both show, and
 * {@link Progress} the progress both draw. Written whole or not at all ({@link StagedFolder}).
 */
public final class StoreExport {

    /** What the test owner is told after every export, whatever was written. */
    public static final String HANDLING = "Exports hold candidate numbers, never names or other personal roster"
            + " fields; they still hold the candidates' texts: handle them under your data-protection rules.";

    /** The parts of one exam's export, in the order they are written (for progress). */
    public static final List<String> PARTS = List.of("tidy CSV", "QTI results", "xAPI statements");

    /**
     * Told as an export goes, on the thread that runs it: each step as it starts (every part of
     * every exam, then moving the files into place), and the moments around the commit point
     * ({@link StagedFolder.Moments}). The command draws it with its terminal counter, the window
     * with its progress bar.
     */
    public interface Progress extends StagedFolder.Moments {
        Progress NONE = (done, total, what) -> { };

        /** Step {@code done} (from 0) of {@code total} starts; {@code what} names it for people. */
        void step(long done, long total, String what);
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

    /** The number of progress steps of an export of {@code exams} exams: their parts, then the move into place. */
    public static long steps(int exams) {
        return (long) exams * PARTS.size() + 1;
    }

    /**
     * Writes the export of {@code exams} into {@code out/EXAM-ID/} for each, all or nothing: every
     * exam is written into one hidden folder beside {@code out} ({@link StagedFolder}) and moved in
     * only when all are written and {@code cancellation} has not won. A cancel (or Ctrl+C) before
     * that throws {@link java.util.concurrent.CancellationException} and leaves {@code out} as it was;
     * a failure leaves it as it was too. {@code location} is where the store is (for its ratings);
     * {@code spreadsheetSafe} writes the CSV files for opening in a spreadsheet
     * ({@link org.inkgate.admin.core.csv.SpreadsheetSafe}). Every file and folder written is owner-only.
     * No exams: nothing is written.
     */
    public static List<Written> write(StoreLocation location, ResultsStore store, List<String> exams, Path out,
            XapiExport.Options xapiOptions, boolean spreadsheetSafe, Progress progress, Cancellation cancellation)
            throws IOException, StoreException {
        if (exams.isEmpty()) {
            return List.of();
        }
        long total = steps(exams.size());
        List<Path> finalFolders = new ArrayList<>();
        for (String id : exams) {
            finalFolders.add(OutputFolder.file(out, id)); // refuses an unsafe exam id before anything is written
        }
        try (StagedFolder staged = StagedFolder.open(out, cancellation)) {
            staged.tellEarlierRun(progress);
            List<Written> written = new ArrayList<>();
            for (int e = 0; e < exams.size(); e++) {
                String id = exams.get(e);
                long first = (long) e * PARTS.size();
                Path dir = OutputFolder.file(staged.folder(), id);
                Written w = writeOne(location, store, id, dir, xapiOptions, spreadsheetSafe,
                        part -> {
                            progress.step(first + part, total, id + ": " + PARTS.get(part));
                            cancellation.stopIfCancelled(PARTS.get(part) + " of " + id);
                        });
                written.add(new Written(id, finalFolders.get(e), w.responses(), w.toolUse(), w.events(),
                        w.questionnaire(), w.qti(), w.xapi(), w.xapiLight(), w.conflicts()));
            }
            progress.step(total - 1, total, "moving the files into " + out);
            cancellation.stopIfCancelled("the files were moved into " + out);
            staged.publish(progress);
            progress.step(total, total, "done");
            return written;
        }
    }

    /** Told when each part of one exam starts: its index in {@link #PARTS}. */
    private interface PartStarts {
        void part(int index);
    }

    private static Written writeOne(StoreLocation location, ResultsStore store, String examId, Path dir,
            XapiExport.Options xapiOptions, boolean spreadsheetSafe, PartStarts listener)
            throws IOException, StoreException {
        listener.part(0);
        org.inkgate.format.io.OwnerOnly.folder(dir);
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
        return new Written(examId, dir, rows[0], rows[1], rows[2], questionnaire, qti, xapi, xapiOptions.light(),
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
