package org.inkgate.admin.core.store.sql;

import java.nio.charset.StandardCharsets;
import java.sql.Connection;
import java.sql.PreparedStatement;
import java.sql.ResultSet;
import java.sql.SQLException;
import java.time.Instant;
import java.util.HashMap;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.function.Consumer;
import org.inkgate.admin.core.roster.RosterCandidate;
import org.inkgate.admin.core.source.ExamSource;
import org.inkgate.admin.core.store.ResultsStore;
import org.inkgate.admin.core.store.Rows;
import org.inkgate.admin.core.store.SittingRecord;
import org.inkgate.admin.core.store.StoreException;
import org.inkgate.format.bundle.BundleManifest;
import org.inkgate.format.bundle.FormSlot;
import org.inkgate.format.bundle.FormSpec;
import org.inkgate.format.bundle.QuestionItem;
import org.inkgate.format.bundle.QuestionnaireSpec;
import org.inkgate.format.bundle.RosterEntry;
import org.inkgate.format.bundle.TaskSpec;
import org.inkgate.format.json.Json;
import org.inkgate.format.response.OpenedResponse;
import org.inkgate.format.response.ProcessEvent;
import org.inkgate.format.response.QuestionnaireAnswers;
import org.inkgate.format.response.ResponseDocument;
import org.inkgate.format.response.TaskResponse;
import org.inkgate.format.response.ToolUse;
import org.inkgate.packs.policy.ResourcePolicy;
import org.inkgate.packs.policy.Tool;

/**
 * The results store's SQL, written once for every dialect: each statement is in the part of SQL
 * that SQLite (3.44 and later, for {@code string_agg ... ORDER BY}) and PostgreSQL read alike
 * ({@code INSERT ... ON CONFLICT DO NOTHING / DO UPDATE}, {@code CASE WHEN EXISTS}, explicit
 * {@code NULLS FIRST/LAST}), so a PostgreSQL store answers exactly as a SQLite one. Booleans are
 * stored as 0/1 integers in both. Opening a store (a file, a server) is each dialect's subclass.
 */
public abstract class SqlResultsStore implements ResultsStore {

    private final SqlSession<StoreException> db;
    private final Connection c;
    private final Map<String, Long> policyIds = new HashMap<>();

    /**
     * @param dialect begins its write transactions ({@link Dialect#beginWrite})
     * @param plain   a failure a person can act on (a full disk, a lost server) in plain words, or null
     */
    protected SqlResultsStore(Connection c, Dialect dialect, java.util.function.Function<Throwable, String> plain) {
        this.c = c;
        // ids cached inside a rolled-back transaction no longer exist
        this.db = new SqlSession<>(c, dialect, new SqlSession.Errors<>(StoreException.class, StoreException::new, plain),
                policyIds::clear);
    }

    protected Connection connection() {
        return c;
    }

    /** Runs the work in one transaction: all of it is kept, or none; rerun whole when the store is busy. */
    private <T> T tx(String what, SqlSession.Work<T> work) throws StoreException {
        return db.transaction(what, work);
    }

    private <T> T read(String what, SqlSession.Work<T> work) throws StoreException {
        return db.read(what, work);
    }

    @Override
    public void registerBundle(BundleManifest m, String manifestSha256, String signerFingerprint) throws StoreException {
        tx("registering bundle of " + m.examId(), () -> {
            update("INSERT INTO exams(exam_id, title, language, practice) VALUES (?,?,?,?) ON CONFLICT DO NOTHING",
                    m.examId(), m.title(), m.language(), m.practice() ? 1 : 0);
            if (m.design() != null) {
                // a bundle written before designs were recorded leaves it NULL; a later one fills it in
                update("UPDATE exams SET design = ? WHERE exam_id = ? AND design IS NULL", m.design().word(), m.examId());
            }
            update("INSERT INTO bundles(manifest_sha256, exam_id, signer_fingerprint, registered_at) VALUES (?,?,?,?) ON CONFLICT DO NOTHING",
                    manifestSha256, m.examId(), signerFingerprint, Instant.now().toString());
            for (TaskSpec t : m.tasks()) {
                update("INSERT INTO tasks(exam_id, task_id, title, time_limit_seconds, words_min, words_max)"
                        + " VALUES (?,?,?,?,?,?) ON CONFLICT DO NOTHING", m.examId(), t.id(), t.title(), t.timeLimitSeconds(),
                        t.words() == null ? null : t.words().min(), t.words() == null ? null : t.words().max());
            }
            m.conditions().forEach(cd -> unchecked(() -> update(
                    "INSERT INTO conditions(exam_id, condition_id, label) VALUES (?,?,?) ON CONFLICT DO NOTHING", m.examId(), cd.id(), cd.label())));
            registerQuestionnaires(m);
            for (FormSpec f : m.forms()) {
                update("INSERT INTO forms(exam_id, form_id) VALUES (?,?) ON CONFLICT DO NOTHING", m.examId(), f.id());
                for (String[] q : new String[][] {{"before", f.preQuestionnaire()}, {"after", f.postQuestionnaire()}}) {
                    if (q[1] != null) {
                        update("INSERT INTO form_questionnaires(exam_id, form_id, timing, questionnaire_id)"
                                + " VALUES (?,?,?,?) ON CONFLICT(exam_id, form_id, timing)"
                                + " DO UPDATE SET questionnaire_id=excluded.questionnaire_id", m.examId(), f.id(), q[0], q[1]);
                    }
                }
                for (int i = 0; i < f.slots().size(); i++) {
                    FormSlot s = f.slots().get(i);
                    long policy = policyId(s.policy());
                    Optional<Object[]> existing = first("SELECT task_id, condition_id, policy_id FROM form_slots"
                            + " WHERE exam_id=? AND form_id=? AND position=?", 3, m.examId(), f.id(), i);
                    if (existing.isPresent()) {
                        Object[] e = existing.get();
                        if (!s.taskId().equals(e[0]) || !s.conditionId().equals(e[1]) || policy != ((Number) e[2]).longValue()) {
                            throw new SQLException("form " + f.id() + " of exam " + m.examId() + " differs from the form of"
                                    + " that id in a bundle registered before; give a changed exam a new exam id or new form ids");
                        }
                    } else {
                        update("INSERT INTO form_slots(exam_id, form_id, position, task_id, condition_id, policy_id)"
                                + " VALUES (?,?,?,?,?,?)", m.examId(), f.id(), i, s.taskId(), s.conditionId(), policy);
                    }
                }
            }
            for (RosterEntry r : m.roster()) {
                update("INSERT INTO candidates(exam_id, candidate_number, extra_time_percent, large_print, high_contrast, form_id)"
                        + " VALUES (?,?,?,?,?,?) ON CONFLICT(exam_id, candidate_number) DO UPDATE SET"
                        + " extra_time_percent=excluded.extra_time_percent, large_print=excluded.large_print,"
                        + " high_contrast=excluded.high_contrast, form_id=excluded.form_id",
                        m.examId(), r.candidateNumber(), r.extraTimePercent(), r.largePrint() ? 1 : 0,
                        r.highContrast() ? 1 : 0, r.formId());
            }
            return null;
        });
    }

    /**
     * The bundle's questionnaire items, as the contract ({@link QuestionItem}) defines them, so that
     * exports and the analysis take kinds and scales from the bundle rather than guessing them.
     */
    private void registerQuestionnaires(BundleManifest m) throws SQLException {
        for (QuestionnaireSpec q : m.questionnaires()) {
            for (int i = 0; i < q.items().size(); i++) {
                QuestionItem item = q.items().get(i);
                String kind = Json.mapper().valueToTree(item.kind()).asText();
                String labels = new String(Json.writeLine(item.labels()), StandardCharsets.UTF_8).strip();
                Optional<Object[]> existing = first("SELECT position, kind, text, labels_json FROM questionnaire_items"
                        + " WHERE exam_id=? AND questionnaire_id=? AND item_id=?", 4, m.examId(), q.id(), item.id());
                if (existing.isPresent()) {
                    Object[] e = existing.get();
                    if (((Number) e[0]).intValue() != i + 1 || !kind.equals(e[1]) || !item.text().equals(e[2])
                            || !labels.equals(e[3])) {
                        throw new SQLException("item " + item.id() + " of questionnaire " + q.id() + " of exam " + m.examId()
                                + " differs from the item of that id in a bundle registered before; give a changed"
                                + " questionnaire a new id (or the exam a new exam id)");
                    }
                } else {
                    update("INSERT INTO questionnaire_items(exam_id, questionnaire_id, position, item_id, kind, text,"
                            + " labels_json) VALUES (?,?,?,?,?,?,?)", m.examId(), q.id(), i + 1, item.id(), kind,
                            item.text(), labels);
                }
            }
        }
    }

    private long policyId(ResourcePolicy p) throws SQLException {
        String json = new String(Json.writeLine(p), StandardCharsets.UTF_8);
        Long cached = policyIds.get(json);
        if (cached != null) {
            return cached;
        }
        update("INSERT INTO policy_snapshots(policy_json, spelling, glossary_pack, dictionary_pack,"
                + " insert_from_panel, show_word_count, paste) VALUES (?,?,?,?,?,?,?) ON CONFLICT DO NOTHING", json,
                Json.mapper().valueToTree(p.spelling()).asText(), p.glossaryPack(), p.dictionaryPack(),
                p.insertFromPanel() ? 1 : 0, p.showWordCount() ? 1 : 0, Json.mapper().valueToTree(p.paste()).asText());
        long id = ((Number) first("SELECT policy_id FROM policy_snapshots WHERE policy_json=?", 1, json).orElseThrow()[0]).longValue();
        policyIds.put(json, id);
        return id;
    }

    @Override
    public void registerRoster(String examId, List<RosterCandidate> roster) throws StoreException {
        tx("registering the roster of " + examId, () -> {
            for (RosterCandidate r : roster) {
                update("INSERT INTO candidates(exam_id, candidate_number, level, first_language, extra_time_percent,"
                        + " large_print, high_contrast) VALUES (?,?,?,?,?,?,?) ON CONFLICT(exam_id, candidate_number)"
                        + " DO UPDATE SET level=excluded.level, first_language=excluded.first_language",
                        examId, r.candidateNumber(), r.level(), r.firstLanguage(), r.extraTimePercent(),
                        r.largePrint() ? 1 : 0, r.highContrast() ? 1 : 0);
                for (Map.Entry<String, String> f : r.personal().entrySet()) {
                    update("INSERT INTO candidate_personal(exam_id, candidate_number, field, value) VALUES (?,?,?,?)"
                            + " ON CONFLICT(exam_id, candidate_number, field) DO UPDATE SET value=excluded.value",
                            examId, r.candidateNumber(), f.getKey(), f.getValue());
                }
            }
            return null;
        });
    }

    @Override
    public void recordAssignmentRun(String examId, long seed, String design) throws StoreException {
        tx("recording the form assignment", () -> update("INSERT INTO form_assignment_runs(exam_id, seed, design,"
                + " recorded_at) VALUES (?,?,?,?) ON CONFLICT DO NOTHING", examId, seed, design, Instant.now().toString()));
    }

    @Override
    public void registerRubric(String examId, ExamSource.Rubric rubric) throws StoreException {
        tx("registering the rubric of " + examId, () -> {
            for (ExamSource.Criterion cr : rubric.criteria()) {
                update("INSERT INTO rubric_criteria(exam_id, criterion_id, name, min_score, max_score)"
                        + " VALUES (?,?,?,?,?) ON CONFLICT(exam_id, criterion_id) DO UPDATE SET name=excluded.name,"
                        + " min_score=excluded.min_score, max_score=excluded.max_score", examId, cr.id(), cr.name(), cr.minScore(), cr.maxScore());
                update("DELETE FROM rubric_bands WHERE exam_id=? AND criterion_id=?", examId, cr.id());
                for (ExamSource.Band b : cr.bands()) {
                    update("INSERT INTO rubric_bands(exam_id, criterion_id, from_score, to_score, descriptor) VALUES (?,?,?,?,?)",
                            examId, cr.id(), b.from(), b.to(), b.descriptor());
                }
            }
            return null;
        });
    }

    @Override
    public void registerPrompts(String examId, Map<String, String> promptByTask) throws StoreException {
        tx("registering the prompts of " + examId, () -> {
            for (Map.Entry<String, String> e : promptByTask.entrySet()) {
                update("UPDATE tasks SET prompt=? WHERE exam_id=? AND task_id=?", e.getValue(), examId, e.getKey());
            }
            return null;
        });
    }

    @Override
    public boolean hasBundle(String manifestSha256) throws StoreException {
        return read("looking up a bundle", () -> first("SELECT 1 FROM bundles WHERE manifest_sha256=?", 1, manifestSha256)
                .isPresent());
    }

    @Override
    public Optional<Long> sittingByPackageFile(String packageSha256) throws StoreException {
        return read("looking up a package", () -> first("SELECT sitting_id FROM sittings WHERE package_sha256=?", 1,
                packageSha256).map(r -> ((Number) r[0]).longValue()));
    }

    @Override
    public java.util.Set<String> importedPackageFiles() throws StoreException {
        return read("listing imported packages", () -> new java.util.HashSet<>(list("SELECT package_sha256 FROM sittings",
                rs -> rs.getString(1))));
    }

    @Override
    public Optional<Long> sittingByContent(String packageId, String contentSha256) throws StoreException {
        return read("looking up a package", () -> first("SELECT sitting_id FROM sittings WHERE package_id=? AND content_sha256=?",
                1, packageId, contentSha256).map(r -> ((Number) r[0]).longValue()));
    }

    @Override
    public Optional<Long> importSitting(SittingRecord record) throws StoreException {
        OpenedResponse opened = record.opened();
        String contentSha256 = record.contentSha256();
        String sourceFile = record.sourceFile();
        ResponseDocument d = opened.response();
        return tx("importing " + sourceFile, () -> {
            // ON CONFLICT DO NOTHING on both unique keys (the file's digest; package id and content): a package
            // another collect stored meanwhile gives no row here instead of a failure. In PostgreSQL the insert
            // waits for that other transaction and then sees its row (unique index checks see uncommitted
            // inserts, PostgreSQL docs 13.2.1 and INSERT "ON CONFLICT"); in SQLite one writer runs at a time.
            Optional<Long> inserted = first("INSERT INTO sittings(package_sha256, package_id, content_sha256,"
                    + " exam_id, bundle_manifest_sha256, candidate_number, form_id, seat, client_version,"
                    + " installation_fingerprint, started_at, submitted_at, source_file, imported_at)"
                    + " VALUES (?,?,?,?,?,?,?,?,?,?,?,?,?,?) ON CONFLICT DO NOTHING RETURNING sitting_id", 1,
                    opened.packageSha256(), d.packageId(), contentSha256, d.examId(), d.bundleManifestSha256(),
                    d.candidateNumber(), d.formId(), d.seat(), d.clientVersion(), opened.installationFingerprint(),
                    str(d.startedAt()), str(d.submittedAt()), sourceFile, Instant.now().toString())
                    .map(row -> ((Number) row[0]).longValue());
            if (inserted.isEmpty()) {
                return inserted;
            }
            long sitting = inserted.get();
            for (int i = 0; i < d.tasks().size(); i++) {
                TaskResponse t = d.tasks().get(i);
                update("INSERT INTO responses(sitting_id, task_id, position, condition_id, policy_id, tools_offered, text,"
                        + " word_count, started_at, ended_at, extra_time_seconds, end_reason) VALUES (?,?,?,?,?,?,?,?,?,?,?,?)",
                        sitting, t.taskId(), i, t.conditionId(), policyId(t.policy()), tools(t.toolsOffered()), t.text(),
                        t.wordCount(), str(t.startedAt()), str(t.endedAt()), t.extraTimeSeconds(),
                        Json.mapper().valueToTree(t.endReason()).asText());
                for (Map.Entry<Tool, ToolUse> u : t.toolUse().entrySet()) {
                    ToolUse x = u.getValue();
                    update("INSERT INTO tool_use(sitting_id, task_id, tool, queries, empty_queries, entries_opened,"
                            + " suggestions_shown, suggestions_accepted, suggestions_ignored, insertions) VALUES (?,?,?,?,?,?,?,?,?,?)",
                            sitting, t.taskId(), Json.mapper().valueToTree(u.getKey()).asText(), x.queries(), x.emptyQueries(),
                            x.entriesOpened(), x.suggestionsShown(), x.suggestionsAccepted(), x.suggestionsIgnored(), x.insertions());
                }
            }
            for (QuestionnaireAnswers q : d.questionnaires()) {
                for (Map.Entry<String, String> a : q.answers().entrySet()) {
                    update("INSERT INTO questionnaire_answers(sitting_id, questionnaire_id, item_id, value) VALUES (?,?,?,?)",
                            sitting, q.questionnaireId(), a.getKey(), a.getValue());
                }
            }
            insertEvents(sitting, record);
            return inserted;
        });
    }

    /**
     * Stores the package's events, inside the import's transaction: one value, the log the reading
     * thread wrote ({@link org.inkgate.admin.core.store.EventLog}), where there used to be a row per event.
     */
    private void insertEvents(long sitting, SittingRecord record) throws SQLException {
        update("INSERT INTO event_logs(sitting_id, event_count, events) VALUES (?,?,?)", sitting,
                record.opened().events().size(), record.eventLog());
    }

    private static String tools(java.util.Set<Tool> tools) {
        return String.join(" ", tools.stream().sorted().map(t -> Json.mapper().valueToTree(t).asText()).toList());
    }

    private static String str(Instant i) {
        return i == null ? null : org.inkgate.format.json.InstantText.text(i);
    }

    @Override
    public void recordRefusal(String fileSha256, String sourceFile, String reason, String message) throws StoreException {
        tx("recording a refusal", () -> update("INSERT INTO refusals(file_sha256, source_file, reason, message,"
                + " first_seen_at) VALUES (?,?,?,?,?) ON CONFLICT DO NOTHING", fileSha256, sourceFile, reason, message, Instant.now().toString()));
    }

    @Override
    public List<Rows.Refusal> refusals() throws StoreException {
        return read("listing refusals", () -> list("SELECT source_file, file_sha256, reason, message, first_seen_at FROM refusals"
                + " ORDER BY source_file, reason", rs -> new Rows.Refusal(rs.getString(1), rs.getString(2), rs.getString(3),
                rs.getString(4), rs.getString(5))));
    }

    @Override
    public List<Rows.Conflict> conflicts(String examId) throws StoreException {
        return read("listing conflicts", () -> list("SELECT v.exam_id, v.candidate_number, v.task_id, v.copies,"
                + " (SELECT string_agg(s.package_id, ' ' ORDER BY s.sitting_id) FROM sittings s JOIN responses r ON r.sitting_id = s.sitting_id"
                + "  WHERE s.exam_id = v.exam_id AND s.candidate_number = v.candidate_number AND r.task_id = v.task_id)"
                + " FROM response_conflicts v WHERE v.exam_id=? ORDER BY v.candidate_number, v.task_id",
                rs -> new Rows.Conflict(rs.getString(1), rs.getString(2), rs.getString(3), rs.getInt(4), rs.getString(5)), examId));
    }

    @Override
    public List<Rows.Candidate> candidates(String examId) throws StoreException {
        return read("listing candidates", () -> list("SELECT candidate_number, level, form_id,"
                + " CASE WHEN EXISTS(SELECT 1 FROM sittings s WHERE s.exam_id = c.exam_id"
                + "   AND s.candidate_number = c.candidate_number) THEN 1 ELSE 0 END"
                + " FROM candidates c WHERE exam_id=? ORDER BY candidate_number",
                rs -> new Rows.Candidate(rs.getString(1), rs.getString(2), rs.getString(3), rs.getInt(4) == 1), examId));
    }

    @Override
    public Map<String, Map<String, String>> rosterFields(String examId, List<String> fields) throws StoreException {
        Map<String, Map<String, String>> out = new java.util.TreeMap<>();
        for (String field : fields) {
            String sql = "first_language".equals(field)
                    ? "SELECT candidate_number, first_language FROM candidates WHERE exam_id=? AND first_language IS NOT NULL"
                            + " AND first_language <> '' ORDER BY candidate_number"
                    : "SELECT candidate_number, value FROM candidate_personal WHERE exam_id=? AND field=? AND value <> ''"
                            + " ORDER BY candidate_number";
            Object[] args = "first_language".equals(field) ? new Object[] {examId} : new Object[] {examId, field};
            List<String[]> rows = read("reading roster fields", () -> list(sql, rs -> new String[] {rs.getString(1),
                rs.getString(2)}, args));
            rows.forEach(r -> out.computeIfAbsent(r[0], k -> new java.util.LinkedHashMap<>()).put(field, r[1]));
        }
        return out;
    }

    @Override
    public List<Rows.Slot> formSlots(String examId) throws StoreException {
        return read("listing forms", () -> list("SELECT form_id, position, task_id, condition_id FROM form_slots WHERE exam_id=?"
                + " ORDER BY form_id, position", rs -> new Rows.Slot(rs.getString(1), rs.getInt(2), rs.getString(3),
                rs.getString(4)), examId));
    }

    @Override
    public List<Rows.Answered> answered(String examId) throws StoreException {
        return read("listing responses", () -> list("SELECT DISTINCT s.candidate_number, r.task_id FROM responses r"
                + " JOIN sittings s ON s.sitting_id = r.sitting_id WHERE s.exam_id=?",
                rs -> new Rows.Answered(rs.getString(1), rs.getString(2)), examId));
    }

    @Override
    public List<String> examIds() throws StoreException {
        return read("listing exams", () -> list("SELECT exam_id FROM exams ORDER BY exam_id", rs -> rs.getString(1)));
    }

    @Override
    public void forEachResponse(String examId, Consumer<Rows.Response> sink) throws StoreException {
        read("reading responses", () -> {
            each("SELECT s.exam_id, s.candidate_number, c.level, s.form_id, s.package_id, s.sitting_id, r.position, r.task_id,"
                    + " r.condition_id, p.spelling, p.glossary_pack, p.dictionary_pack, p.insert_from_panel, p.show_word_count,"
                    + " p.paste, r.tools_offered, r.text, r.word_count, r.started_at, r.ended_at, r.extra_time_seconds,"
                    + " r.end_reason, s.submitted_at,"
                    + " (SELECT COUNT(*) FROM responses r2 JOIN sittings s2 ON s2.sitting_id = r2.sitting_id"
                    + "   WHERE s2.exam_id = s.exam_id AND s2.candidate_number = s.candidate_number AND r2.task_id = r.task_id),"
                    + " s.installation_fingerprint"
                    + " FROM responses r JOIN sittings s ON s.sitting_id = r.sitting_id"
                    + " JOIN policy_snapshots p ON p.policy_id = r.policy_id"
                    + " LEFT JOIN candidates c ON c.exam_id = s.exam_id AND c.candidate_number = s.candidate_number"
                    + " WHERE s.exam_id=? ORDER BY s.candidate_number, s.sitting_id, r.position",
                    rs -> sink.accept(new Rows.Response(rs.getString(1), rs.getString(2), rs.getString(3), rs.getString(4),
                            rs.getString(5), rs.getLong(6), rs.getInt(7), rs.getString(8), rs.getString(9), rs.getString(10),
                            rs.getString(11), rs.getString(12), rs.getInt(13) == 1, rs.getInt(14) == 1, rs.getString(15),
                            rs.getString(16), rs.getString(17), rs.getInt(18), rs.getString(19), rs.getString(20),
                            rs.getLong(21), rs.getString(22), rs.getString(23), rs.getInt(24), rs.getString(25))), examId);
            return null;
        });
    }

    @Override
    public void forEachToolUse(String examId, Consumer<Rows.ToolUseRow> sink) throws StoreException {
        read("reading tool use", () -> {
            each("SELECT s.exam_id, s.candidate_number, s.package_id, u.task_id, r.condition_id, u.tool, u.queries,"
                    + " u.empty_queries, u.entries_opened, u.suggestions_shown, u.suggestions_accepted, u.suggestions_ignored,"
                    + " u.insertions FROM tool_use u JOIN responses r ON r.sitting_id = u.sitting_id AND r.task_id = u.task_id"
                    + " JOIN sittings s ON s.sitting_id = u.sitting_id WHERE s.exam_id=?"
                    + " ORDER BY s.candidate_number, s.sitting_id, r.position, u.tool",
                    rs -> sink.accept(new Rows.ToolUseRow(rs.getString(1), rs.getString(2), rs.getString(3), rs.getString(4),
                            rs.getString(5), rs.getString(6), rs.getInt(7), rs.getInt(8), rs.getInt(9), rs.getInt(10),
                            rs.getInt(11), rs.getInt(12), rs.getInt(13))), examId);
            return null;
        });
    }

    @Override
    public void forEachEvent(String examId, Consumer<Rows.Event> sink) throws StoreException {
        // the logs themselves rather than the view: each is in seq order already, so nothing is sorted
        read("reading events", () -> {
            each("SELECT s.exam_id, s.candidate_number, s.package_id, l.events FROM event_logs l"
                    + " JOIN sittings s ON s.sitting_id = l.sitting_id WHERE s.exam_id=?"
                    + " ORDER BY s.candidate_number, s.sitting_id",
                    rs -> {
                        String exam = rs.getString(1);
                        String candidate = rs.getString(2);
                        String packageId = rs.getString(3);
                        try {
                            org.inkgate.admin.core.store.EventLog.forEach(rs.getString(4), e -> sink.accept(new Rows.Event(
                                    exam, candidate, packageId, packageId, e.seq(), e.at(), e.mono(), e.type(), e.task(),
                                    e.dataJson())));
                        } catch (org.inkgate.admin.core.store.EventLog.Unreadable bad) {
                            throw new SQLException("the stored events of candidate " + candidate + " (package "
                                    + packageId + ") cannot be read (" + bad.getMessage() + "): the store was"
                                    + " changed by another program. Collect the package again into a new store", bad);
                        }
                    }, examId);
            return null;
        });
    }

    @Override
    public void forEachQuestionnaireAnswer(String examId, Consumer<Rows.QuestionnaireAnswer> sink) throws StoreException {
        // every item the sitting's form asks (answered or not), then every stored answer to an item the
        // store has no definition of, so that nothing stored is left out of an export
        String sitting = "s.exam_id, s.candidate_number, c.level, s.form_id, s.package_id, s.sitting_id,"
                + " (SELECT string_agg(r.condition_id, ' ' ORDER BY r.position) FROM responses r"
                + "   WHERE r.sitting_id = s.sitting_id),";
        String candidate = " LEFT JOIN candidates c ON c.exam_id = s.exam_id AND c.candidate_number = s.candidate_number";
        read("reading questionnaire answers", () -> {
            each("SELECT " + sitting + " q.questionnaire_id, fq.timing,"
                    + " q.position, q.item_id, q.kind, q.text, q.labels_json, a.value"
                    + " FROM sittings s JOIN form_questionnaires fq ON fq.exam_id = s.exam_id AND fq.form_id = s.form_id"
                    + " JOIN questionnaire_items q ON q.exam_id = s.exam_id AND q.questionnaire_id = fq.questionnaire_id"
                    + " LEFT JOIN questionnaire_answers a ON a.sitting_id = s.sitting_id"
                    + "   AND a.questionnaire_id = q.questionnaire_id AND a.item_id = q.item_id" + candidate
                    + " WHERE s.exam_id=?"
                    + " UNION ALL SELECT " + sitting + " a.questionnaire_id, NULL, NULL, a.item_id, NULL, NULL, NULL, a.value"
                    + " FROM questionnaire_answers a JOIN sittings s ON s.sitting_id = a.sitting_id" + candidate
                    + " WHERE s.exam_id=? AND NOT EXISTS (SELECT 1 FROM form_questionnaires fq JOIN questionnaire_items q"
                    + "   ON q.exam_id = fq.exam_id AND q.questionnaire_id = fq.questionnaire_id"
                    + "   WHERE fq.exam_id = s.exam_id AND fq.form_id = s.form_id"
                    + "   AND q.questionnaire_id = a.questionnaire_id AND q.item_id = a.item_id)"
                    + " ORDER BY 2, 6, 9 DESC NULLS LAST, 10 NULLS FIRST, 11",
                    // candidate, sitting, before then after, position, item; NULLs placed as SQLite places them by
                    // default (first when ascending), which PostgreSQL does the other way round
                    rs -> sink.accept(new Rows.QuestionnaireAnswer(rs.getString(1), rs.getString(2), rs.getString(3),
                            rs.getString(4), rs.getString(5), rs.getString(7), rs.getString(8), rs.getString(9),
                            rs.getObject(10) == null ? null : rs.getInt(10), rs.getString(11), rs.getString(12),
                            rs.getString(13), rs.getString(14), rs.getString(15))), examId, examId);
            return null;
        });
    }

    @Override
    public Map<String, Long> counts() throws StoreException {
        return read("counting rows", () -> {
            Map<String, Long> out = new LinkedHashMap<>();
            for (String t : List.of("exams", "bundles", "tasks", "conditions", "forms", "form_slots", "policy_snapshots",
                    "candidates", "candidate_personal", "sittings", "responses", "tool_use", "process_events",
                    "questionnaire_answers", "rubric_criteria", "rubric_bands", "refusals")) {
                // the events' count is kept beside each log: counting the view's rows would parse every log
                String count = t.equals("process_events") ? "SELECT COALESCE(SUM(event_count), 0) FROM event_logs"
                        : "SELECT COUNT(*) FROM " + t;
                out.put(t, ((Number) first(count, 1).orElseThrow()[0]).longValue());
            }
            return out;
        });
    }

    @Override
    public void close() throws StoreException {
        db.close();
    }

    // --- small JDBC helpers ---

    private interface SqlRunnable {
        Object run() throws SQLException;
    }

    private static void unchecked(SqlRunnable r) {
        try {
            r.run();
        } catch (SQLException e) {
            throw new IllegalStateException(e.getMessage(), e);
        }
    }

    private int update(String sql, Object... args) throws SQLException {
        return db.update(sql, args);
    }

    private Optional<Object[]> first(String sql, int columns, Object... args) throws SQLException {
        try (PreparedStatement ps = c.prepareStatement(sql)) {
            SqlSession.bind(ps, args);
            try (ResultSet rs = ps.executeQuery()) {
                if (!rs.next()) {
                    return Optional.empty();
                }
                Object[] row = new Object[columns];
                for (int i = 0; i < columns; i++) {
                    row[i] = rs.getObject(i + 1);
                }
                return Optional.of(row);
            }
        }
    }

    private <T> List<T> list(String sql, SqlSession.RowMapper<T> mapper, Object... args) throws SQLException {
        return db.list(sql, mapper, args);
    }

    private void each(String sql, SqlSession.RowSink sink, Object... args) throws SQLException {
        db.each(sql, sink, args);
    }
}
