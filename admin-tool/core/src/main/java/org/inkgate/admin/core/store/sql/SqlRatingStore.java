package org.inkgate.admin.core.store.sql;

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

/**
 * The {@link RatingStore} of one exam in a results store, on any {@link Dialect}: hands each call to
 * the part that owns its concern. The SQL of every part is written once for SQLite and PostgreSQL;
 * what differs lives in the dialect. Subclasses open the connection ({@code SqliteRatingStore} a
 * file, {@code PostgresRatingStore} a server database). Every method is synchronized: one
 * connection serves one call at a time, whichever thread it comes from, and a call's reads and its
 * transaction see one state. Many raters at once each use their own store (their own connection);
 * the database keeps them apart (docs/formats.md, "Isolation and locking").
 */
public class SqlRatingStore implements RatingStore {

    public static final SqlSession.Errors<RatingException> ERRORS = new SqlSession.Errors<>(RatingException.class,
            RatingException::new);

    private final RatingSession s;
    private final SqlRaters raters;
    private final SqlAssignmentRuns runs;
    private final SqlDiscrepancyReview review;
    private final SqlDeskRecords records;
    private final SqlReferrals referrals;
    private final SqlDesk desk;
    private final SqlRatingResults results;
    private final SqlControlScripts controls;
    private final SqlQualificationSet qualification;

    /**
     * Rating of {@code examId} on an open connection to a results store at schema version latest;
     * refused when the store holds no such exam or no rubric for it. The caller closes the
     * connection when this fails.
     *
     * @param where the store, for messages
     */
    protected SqlRatingStore(Connection c, Dialect dialect, String where, String examId, Clock clock, BlindIds ids)
            throws RatingException, SQLException {
        this(c, ERRORS, dialect, where, examId, clock, ids);
    }

    /** As above, with failures a person can act on put in plain words by {@code errors}. */
    protected SqlRatingStore(Connection c, SqlSession.Errors<RatingException> errors, Dialect dialect, String where,
            String examId, Clock clock, BlindIds ids) throws RatingException, SQLException {
        SqlSession<RatingException> db = new SqlSession<>(c, dialect, errors);
        List<String> exams = examIds(db);
        if (!exams.contains(examId)) {
            throw new RatingException("the store " + where + " holds no exam " + examId + "; it holds " + exams);
        }
        ExamSource.Rubric rubric = loadRubric(db, dialect, examId);
        if (rubric.criteria().isEmpty()) {
            throw new RatingException("the store holds no rubric for exam " + examId + "; run collect again with"
                    + " --exam SOURCE-FOLDER so the rubric is registered");
        }
        this.s = new RatingSession(db, dialect, examId, rubric, clock, ids);
        this.raters = new SqlRaters(s);
        this.runs = new SqlAssignmentRuns(s);
        this.review = new SqlDiscrepancyReview(s);
        this.records = new SqlDeskRecords(s, review);
        this.referrals = new SqlReferrals(s);
        this.desk = new SqlDesk(s, records, referrals);
        this.results = new SqlRatingResults(s);
        this.controls = new SqlControlScripts(s);
        this.qualification = new SqlQualificationSet(s);
    }

    /** The exams in the store on {@code c}, to choose one when the store holds several. */
    public static List<String> exams(Connection c) throws SQLException {
        return examIds(new SqlSession<>(c, ERRORS));
    }

    /** Whether the store on {@code c} holds a rubric for the exam, the precondition of opening rating. */
    public static boolean hasRubric(Connection c, Dialect dialect, String examId) throws SQLException {
        SqlSession<RatingException> db = new SqlSession<>(c, ERRORS);
        return dialect.hasTable(c, "rubric_criteria")
                && db.exists("SELECT 1 FROM rubric_criteria WHERE exam_id=? LIMIT 1", examId);
    }

    private static List<String> examIds(SqlSession<RatingException> db) throws SQLException {
        return db.list("SELECT exam_id FROM exams ORDER BY exam_id", rs -> rs.getString(1));
    }

    private static ExamSource.Rubric loadRubric(SqlSession<RatingException> db, Dialect dialect, String examId)
            throws SQLException {
        Map<String, List<ExamSource.Band>> bands = new HashMap<>();
        db.each("SELECT criterion_id, from_score, to_score, descriptor FROM rubric_bands WHERE exam_id=?"
                + " ORDER BY criterion_id, from_score", rs -> bands.computeIfAbsent(rs.getString(1), k -> new ArrayList<>())
                .add(new ExamSource.Band(rs.getInt(2), rs.getInt(3), rs.getString(4))), examId);
        // the criteria in the rubric's own order, which is the order collect registered them in
        List<ExamSource.Criterion> criteria = db.list("SELECT criterion_id, name, min_score, max_score FROM"
                + " rubric_criteria WHERE exam_id=? ORDER BY " + dialect.insertionOrder(), rs -> new ExamSource.Criterion(
                rs.getString(1), rs.getString(2), rs.getInt(3), rs.getInt(4),
                bands.getOrDefault(rs.getString(1), List.of())), examId);
        return new ExamSource.Rubric("results store", criteria);
    }

    /** For tests of the connection's settings. */
    protected Connection connection() {
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
