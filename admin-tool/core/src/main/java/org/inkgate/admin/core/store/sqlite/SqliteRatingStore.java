package org.inkgate.admin.core.store.sqlite;

import java.nio.file.Files;
import java.nio.file.Path;
import java.sql.Connection;
import java.sql.SQLException;
import java.time.Clock;
import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.function.Consumer;
import org.inkgate.admin.core.rating.BlindIds;
import org.inkgate.admin.core.rating.DiscrepancyRule;
import org.inkgate.admin.core.rating.RaterLinks;
import org.inkgate.admin.core.rating.RatingAssigner;
import org.inkgate.admin.core.rating.RatingException;
import org.inkgate.admin.core.rating.RatingStore;
import org.inkgate.admin.core.rating.Referrals;
import org.inkgate.admin.core.rating.ResponseScores;
import org.inkgate.admin.core.source.ExamSource;
import org.inkgate.admin.core.store.sql.SqlSession;

/**
 * The {@link RatingStore} of one exam in a SQLite results store: opens the store and hands each
 * call to the part that owns its concern. Its own connection to the store file uses the client's
 * storage discipline (write-ahead log, synchronous FULL): a draft or rating is on disk when a call
 * returns, so a crash or power cut loses nothing a rater saved. Every method is synchronized: one
 * connection serves one call at a time, whichever thread it comes from, and a call's reads and its
 * transaction see one state.
 */
public final class SqliteRatingStore implements RatingStore {

    static final SqlSession.Errors<RatingException> ERRORS = new SqlSession.Errors<>(RatingException.class,
            RatingException::new);

    private final RatingSession s;
    private final SqliteRaters raters;
    private final SqliteAssignmentRuns runs;
    private final SqliteDiscrepancyReview review;
    private final SqliteDeskRecords records;
    private final SqliteReferrals referrals;
    private final SqliteDesk desk;
    private final SqliteRatingResults results;
    private final SqliteControlScripts controls;
    private final SqliteQualificationSet qualification;

    private SqliteRatingStore(RatingSession s) {
        this.s = s;
        this.raters = new SqliteRaters(s);
        this.runs = new SqliteAssignmentRuns(s);
        this.review = new SqliteDiscrepancyReview(s);
        this.records = new SqliteDeskRecords(s, review);
        this.referrals = new SqliteReferrals(s);
        this.desk = new SqliteDesk(s, records, referrals);
        this.results = new SqliteRatingResults(s);
        this.controls = new SqliteControlScripts(s);
        this.qualification = new SqliteQualificationSet(s);
    }

    /** Opens rating of {@code examId} in an existing results store (migrating its schema if older). */
    public static SqliteRatingStore open(Path file, String examId) throws RatingException {
        return open(file, examId, Clock.systemUTC(), new BlindIds());
    }

    /** As {@link #open(Path, String)} with a given clock and blind id source (tests, reproducible demos). */
    public static SqliteRatingStore open(Path file, String examId, Clock clock, BlindIds ids) throws RatingException {
        requireFile(file);
        Connection c = null;
        try {
            if (ReadOnlyStore.writable(file)) {
                c = SqliteFiles.connect(file, SqliteFiles.Durability.EVERY_COMMIT);
                Migrations.migrate(c, Migrations.latest());
            } else {
                // read-only media: export and analyse read the ratings; any write is refused by SQLite
                c = ReadOnlyStore.connect(file);
            }
            SqlSession<RatingException> db = new SqlSession<>(c, ERRORS);
            List<String> exams = examIds(db);
            if (!exams.contains(examId)) {
                throw new RatingException("the store " + file + " holds no exam " + examId + "; it holds " + exams);
            }
            ExamSource.Rubric rubric = loadRubric(db, examId);
            if (rubric.criteria().isEmpty()) {
                throw new RatingException("the store holds no rubric for exam " + examId + "; run collect again with"
                        + " --exam SOURCE-FOLDER so the rubric is registered");
            }
            return new SqliteRatingStore(new RatingSession(db, examId, rubric, clock, ids));
        } catch (SQLException e) {
            SqliteFiles.closeQuietly(c);
            throw new RatingException("cannot open the results store " + file + " for rating: " + e.getMessage(), e);
        } catch (RatingException e) {
            SqliteFiles.closeQuietly(c);
            throw e;
        }
    }

    private static void requireFile(Path file) throws RatingException {
        if (!Files.isRegularFile(file)) {
            throw new RatingException("no results store at " + file + "; give the store that collect wrote");
        }
    }

    /** The exams in a store, to choose one when the store holds several. */
    public static List<String> exams(Path file) throws RatingException {
        requireFile(file);
        try (SqlSession<RatingException> db = new SqlSession<>(SqliteFiles.connectForReading(file), ERRORS)) {
            return examIds(db);
        } catch (SQLException e) {
            throw new RatingException("cannot read the results store " + file + ": " + e.getMessage(), e);
        }
    }

    /** Whether the store holds a rubric for the exam, the precondition of {@link #open}; false when there is no store. */
    public static boolean hasRubric(Path file, String examId) throws RatingException {
        if (!Files.isRegularFile(file)) {
            return false;
        }
        try (SqlSession<RatingException> db = new SqlSession<>(SqliteFiles.connectForReading(file), ERRORS)) {
            // sqlite_master is SQLite's catalogue; PostgreSQL asks information_schema.tables
            return db.exists("SELECT 1 FROM sqlite_master WHERE type='table' AND name='rubric_criteria'")
                    && db.exists("SELECT 1 FROM rubric_criteria WHERE exam_id=? LIMIT 1", examId);
        } catch (SQLException e) {
            throw new RatingException("cannot read the results store " + file + ": " + e.getMessage(), e);
        }
    }

    private static List<String> examIds(SqlSession<RatingException> db) throws SQLException {
        return db.list("SELECT exam_id FROM exams ORDER BY exam_id", rs -> rs.getString(1));
    }

    private static ExamSource.Rubric loadRubric(SqlSession<RatingException> db, String examId) throws SQLException {
        Map<String, List<ExamSource.Band>> bands = new HashMap<>();
        db.each("SELECT criterion_id, from_score, to_score, descriptor FROM rubric_bands WHERE exam_id=?"
                + " ORDER BY criterion_id, from_score", rs -> bands.computeIfAbsent(rs.getString(1), k -> new ArrayList<>())
                .add(new ExamSource.Band(rs.getInt(2), rs.getInt(3), rs.getString(4))), examId);
        // rowid (insertion order, the rubric's own order) is SQLite's; the PostgreSQL schema needs a position column
        List<ExamSource.Criterion> criteria = db.list("SELECT criterion_id, name, min_score, max_score FROM"
                + " rubric_criteria WHERE exam_id=? ORDER BY rowid", rs -> new ExamSource.Criterion(rs.getString(1),
                rs.getString(2), rs.getInt(3), rs.getInt(4), bands.getOrDefault(rs.getString(1), List.of())), examId);
        return new ExamSource.Rubric("results store", criteria);
    }

    /** For tests of the connection's settings. */
    Connection connection() {
        return s.db.connection();
    }

    @Override
    public synchronized String examId() {
        return s.examId;
    }

    @Override
    public synchronized ExamSource.Rubric rubric() {
        return s.rubric;
    }

    // ---------------------------------------------------------------- raters

    @Override
    public synchronized boolean addRater(String id, String label, Integer capacity) throws RatingException {
        return raters.addRater(id, label, capacity);
    }

    @Override
    public synchronized List<RaterEntry> raterEntries() throws RatingException {
        return raters.raterEntries();
    }

    // ---------------------------------------------------------------- assignment runs

    @Override
    public synchronized List<RatingAssigner.Response> unassignedResponses() throws RatingException {
        return runs.unassignedResponses();
    }

    @Override
    public synchronized AssignmentOutcome assign(int k, long seed, boolean allowUnlinked) throws RatingException {
        return runs.assign(k, seed, allowUnlinked);
    }

    @Override
    public synchronized RaterLinks.Report design() throws RatingException {
        return runs.design();
    }

    // ---------------------------------------------------------------- the desk

    @Override
    public synchronized List<Rater> raters() throws RatingException {
        return desk.raters();
    }

    @Override
    public synchronized List<QueueItem> queue(String raterId) throws RatingException {
        return desk.queue(raterId);
    }

    @Override
    public synchronized BlindResponse response(String raterId, String blindId) throws RatingException {
        return desk.response(raterId, blindId);
    }

    @Override
    public synchronized ExamSource.Rubric rubric(String blindId) throws RatingException {
        return desk.rubric(blindId);
    }

    @Override
    public synchronized Optional<RatingSheet> sheet(String raterId, String blindId) throws RatingException {
        return desk.sheet(raterId, blindId);
    }

    @Override
    public synchronized void saveDraft(String raterId, String blindId, RatingSheet sheet) throws RatingException {
        desk.saveDraft(raterId, blindId, sheet);
    }

    @Override
    public synchronized void submit(String raterId, String blindId, RatingSheet sheet) throws RatingException {
        desk.submit(raterId, blindId, sheet);
    }

    @Override
    public synchronized long refer(String raterId, String blindId, Referrals.Reason reason, String note)
            throws RatingException {
        return desk.refer(raterId, blindId, reason, note);
    }

    @Override
    public synchronized Progress progress(String raterId) throws RatingException {
        return desk.progress(raterId);
    }

    // ---------------------------------------------------------------- desk records

    @Override
    public synchronized Optional<String> settledAt(String blindId) throws RatingException {
        return records.settledAt(blindId);
    }

    @Override
    public synchronized Optional<String> raterOf(String blindId) throws RatingException {
        return records.raterOf(blindId);
    }

    @Override
    public synchronized Optional<RatingSheet> submitted(String raterId, String blindId) throws RatingException {
        return records.submitted(raterId, blindId);
    }

    @Override
    public synchronized List<String> check(RatingSheet sheet, boolean complete) {
        return records.check(sheet, complete);
    }

    @Override
    public synchronized int submitAll(String raterId, Map<String, RatingSheet> sheets, String via) throws RatingException {
        return records.submitAll(raterId, sheets, via);
    }

    @Override
    public synchronized List<HistoryEntry> history(String blindId) throws RatingException {
        return records.history(blindId);
    }

    @Override
    public synchronized List<ProgressRow> progressRows() throws RatingException {
        return records.progressRows();
    }

    // ---------------------------------------------------------------- referrals

    @Override
    public synchronized List<Referrals.Referral> referrals(boolean openOnly) throws RatingException {
        return referrals.referrals(openOnly);
    }

    @Override
    public synchronized void decide(long referralId, String decidedBy, String decision) throws RatingException {
        referrals.decide(referralId, decidedBy, decision);
    }

    // ---------------------------------------------------------------- discrepancy review and adjudication

    @Override
    public synchronized int setRule(DiscrepancyRule rule) throws RatingException {
        return review.setRule(rule);
    }

    @Override
    public synchronized Optional<DiscrepancyRule> rule() throws RatingException {
        return review.rule();
    }

    @Override
    public synchronized int review() throws RatingException {
        return review.review();
    }

    @Override
    public synchronized List<Flag> flags() throws RatingException {
        return review.flags();
    }

    @Override
    public synchronized void resolve(long flagId, String resolvedBy, Map<String, Integer> scores, String comment)
            throws RatingException {
        review.resolve(flagId, resolvedBy, scores, comment);
    }

    // ---------------------------------------------------------------- ratings and final scores

    @Override
    public synchronized void forEachRating(Consumer<RatingRow> sink) throws RatingException {
        results.forEachRating(sink);
    }

    @Override
    public synchronized void forEachFinalScore(Consumer<FinalRow> sink) throws RatingException {
        results.forEachFinalScore(sink);
    }

    @Override
    public synchronized Map<ResponseScores.Key, ResponseScores> scoresByResponse() throws RatingException {
        return results.scoresByResponse();
    }

    @Override
    public synchronized String studyDesign() throws RatingException {
        return results.studyDesign();
    }

    @Override
    public synchronized int pendingResponses() throws RatingException {
        return results.pendingResponses();
    }

    // ---------------------------------------------------------------- control scripts

    @Override
    public synchronized void markControl(String candidateNumber, String taskId, Map<String, Integer> agreed, String source)
            throws RatingException {
        controls.markControl(candidateNumber, taskId, agreed, source);
    }

    @Override
    public synchronized int mixControls(long seed) throws RatingException {
        return controls.mixControls(seed);
    }

    @Override
    public synchronized List<Control> controls() throws RatingException {
        return controls.controls();
    }

    @Override
    public synchronized List<ControlRating> controlRatings() throws RatingException {
        return controls.controlRatings();
    }

    @Override
    public synchronized void markQualification(String candidateNumber, String taskId, Map<String, Integer> agreed,
            String source) throws RatingException {
        qualification.markQualification(candidateNumber, taskId, agreed, source);
    }

    @Override
    public synchronized void setQualificationRule(Rule rule) throws RatingException {
        qualification.setQualificationRule(rule);
    }

    @Override
    public synchronized Optional<Rule> qualificationRule() throws RatingException {
        return qualification.qualificationRule();
    }

    @Override
    public synchronized int giveQualificationSet() throws RatingException {
        return qualification.giveQualificationSet();
    }

    @Override
    public synchronized List<Script> qualificationScripts() throws RatingException {
        return qualification.qualificationScripts();
    }

    @Override
    public synchronized List<org.inkgate.admin.core.rating.QualificationStanding> qualificationStandings()
            throws RatingException {
        return qualification.qualificationStandings();
    }

    @Override
    public synchronized void admitRater(String raterId, String by, String reason) throws RatingException {
        qualification.admitRater(raterId, by, reason);
    }

    @Override
    public synchronized void close() throws RatingException {
        s.db.close();
    }
}
