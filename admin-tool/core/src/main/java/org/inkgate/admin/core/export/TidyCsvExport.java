package org.inkgate.admin.core.export;

import java.io.BufferedWriter;
import java.io.IOException;
import java.io.UncheckedIOException;
import java.io.Writer;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import org.inkgate.admin.core.csv.Csv;
import org.inkgate.admin.core.csv.SpreadsheetSafe;
import org.inkgate.admin.core.store.ResultsStore;
import org.inkgate.admin.core.store.StoreException;

/**
 * Tidy CSV (one row per observation, one column per variable; RFC 4180) of responses, tool use
 * and process events. The columns are described in docs/data-dictionary.md. No personal roster
 * fields are written: candidates appear by candidate number only.
 */
public final class TidyCsvExport {

    public static final List<String> RESPONSE_COLUMNS = List.of("exam_id", "candidate_number", "level", "form_id",
            "package_id", "position", "task_id", "condition_id", "spelling", "glossary_pack", "dictionary_pack",
            "insert_from_panel", "show_word_count", "paste", "tools_offered", "word_count", "started_at", "ended_at",
            "extra_time_seconds", "end_reason", "submitted_at", "copies", "installation_fingerprint", "text");
    public static final List<String> TOOL_USE_COLUMNS = List.of("exam_id", "candidate_number", "package_id", "task_id",
            "condition_id", "tool", "queries", "empty_queries", "entries_opened", "suggestions_shown",
            "suggestions_accepted", "suggestions_ignored", "insertions");
    public static final List<String> EVENT_COLUMNS = List.of("exam_id", "candidate_number", "package_id", "seq", "at",
            "mono_ns", "type", "task_id", "data_json");

    private TidyCsvExport() {
    }

    /** Writes responses.csv, tool_use.csv and events.csv into {@code folder}; returns the row counts. */
    public static long[] write(ResultsStore store, String examId, Path folder) throws IOException, StoreException {
        return write(store, examId, folder, false);
    }

    /** As {@link #write(ResultsStore, String, Path)}; {@code spreadsheetSafe} writes every cell as {@link SpreadsheetSafe} does. */
    public static long[] write(ResultsStore store, String examId, Path folder, boolean spreadsheetSafe)
            throws IOException, StoreException {
        Files.createDirectories(folder);
        long[] counts = new long[3];
        try (Writer out = open(folder.resolve("responses.csv"), spreadsheetSafe)) {
            Csv.writeRow(out, RESPONSE_COLUMNS);
            store.forEachResponse(examId, r -> row(out, List.of(r.examId(), r.candidateNumber(), nz(r.level()), r.formId(),
                    r.packageId(), String.valueOf(r.position() + 1), r.taskId(), r.conditionId(), r.spelling(),
                    nz(r.glossaryPack()), nz(r.dictionaryPack()), String.valueOf(r.insertFromPanel()),
                    String.valueOf(r.showWordCount()), r.paste(), r.toolsOffered(), String.valueOf(r.wordCount()),
                    nz(r.startedAt()), nz(r.endedAt()), String.valueOf(r.extraTimeSeconds()), r.endReason(),
                    nz(r.submittedAt()), String.valueOf(r.copies()), r.installationFingerprint(), r.text()), counts, 0));
        }
        try (Writer out = open(folder.resolve("tool_use.csv"), spreadsheetSafe)) {
            Csv.writeRow(out, TOOL_USE_COLUMNS);
            store.forEachToolUse(examId, u -> row(out, List.of(u.examId(), u.candidateNumber(), u.packageId(), u.taskId(),
                    u.conditionId(), u.tool(), String.valueOf(u.queries()), String.valueOf(u.emptyQueries()),
                    String.valueOf(u.entriesOpened()), String.valueOf(u.suggestionsShown()),
                    String.valueOf(u.suggestionsAccepted()), String.valueOf(u.suggestionsIgnored()),
                    String.valueOf(u.insertions())), counts, 1));
        }
        try (Writer out = open(folder.resolve("events.csv"), spreadsheetSafe)) {
            Csv.writeRow(out, EVENT_COLUMNS);
            store.forEachEvent(examId, e -> row(out, List.of(e.examId(), e.candidateNumber(), e.packageId(),
                    String.valueOf(e.seq()), e.at(), String.valueOf(e.mono()), e.type(), nz(e.taskId()), e.dataJson()),
                    counts, 2));
        }
        return counts;
    }

    private static Writer open(Path file, boolean spreadsheetSafe) throws IOException {
        Writer w = new BufferedWriter(Files.newBufferedWriter(file, StandardCharsets.UTF_8), 1 << 16);
        return spreadsheetSafe ? SpreadsheetSafe.writer(w) : w;
    }

    private static void row(Writer out, List<String> fields, long[] counts, int i) {
        try {
            Csv.writeRow(out, fields);
            counts[i]++;
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
    }

    private static String nz(String s) {
        return s == null ? "" : s;
    }
}
