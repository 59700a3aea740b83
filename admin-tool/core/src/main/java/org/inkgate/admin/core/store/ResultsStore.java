package org.inkgate.admin.core.store;

import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.function.Consumer;
import org.inkgate.admin.core.roster.RosterCandidate;
import org.inkgate.admin.core.source.ExamSource;
import org.inkgate.format.bundle.BundleManifest;
import org.inkgate.format.response.OpenedResponse;

/**
 * The results store as its callers see it: exams, the roster, imported sittings, refusals, and the
 * rows exports need. The SQL lives behind this interface ({@code store.sqlite.SqliteResultsStore}, opened by {@link Stores}), so a server
 * database can be added later without touching collection or exports.
 */
public interface ResultsStore extends AutoCloseable {

    /** The store's file name that the guides, the command examples and the admin window suggest. */
    String DEFAULT_FILE_NAME = "results.db";

    /** Records an exam and its bundle (tasks, conditions, forms with policies, the bundle's roster); repeatable. */
    void registerBundle(BundleManifest manifest, String manifestSha256, String signerFingerprint) throws StoreException;

    /** Adds the roster's levels, first languages and personal fields to the exam's candidates; repeatable. */
    void registerRoster(String examId, List<RosterCandidate> roster) throws StoreException;

    /** Records the seed and design a form assignment was made with. */
    void recordAssignmentRun(String examId, long seed, String design) throws StoreException;

    /** Records the exam's rubric (criteria and band descriptors); repeatable. */
    void registerRubric(String examId, ExamSource.Rubric rubric) throws StoreException;

    /** Records each task's prompt (Markdown source as written) for raters; repeatable. */
    void registerPrompts(String examId, Map<String, String> promptByTask) throws StoreException;

    boolean hasBundle(String manifestSha256) throws StoreException;

    /** The sitting imported from exactly these package bytes, if any. */
    Optional<Long> sittingByPackageFile(String packageSha256) throws StoreException;

    /** SHA-256 of every package file already imported, so a rerun skips them without decrypting. */
    java.util.Set<String> importedPackageFiles() throws StoreException;

    /** The sitting with this package id and content (a re-sent copy), if any. */
    Optional<Long> sittingByContent(String packageId, String contentSha256) throws StoreException;

    /**
     * Imports one opened package in one transaction; returns the new sitting id, or empty when the
     * store holds the package already (the same file, or the same package id and content), which
     * another collect into the same store may have stored since this one looked: each package is
     * stored once (docs/formats.md, "Several collects at once").
     */
    Optional<Long> importSitting(SittingRecord sitting) throws StoreException;

    /** As {@link #importSitting(SittingRecord)}. */
    default Optional<Long> importSitting(OpenedResponse opened, String contentSha256, String sourceFile)
            throws StoreException {
        return importSitting(SittingRecord.of(opened, contentSha256, sourceFile));
    }

    /** Records a refused file once per file and reason. */
    void recordRefusal(String fileSha256, String sourceFile, String reason, String message) throws StoreException;

    List<Rows.Refusal> refusals() throws StoreException;

    List<Rows.Conflict> conflicts(String examId) throws StoreException;

    List<Rows.Candidate> candidates(String examId) throws StoreException;

    /**
     * The named roster fields of the exam's candidates: {@code first_language} from the roster's
     * column of that name, any other name from the personal fields. Only for a caller the test owner
     * has allowed to use them; candidate number to field to value, candidates without a value left out.
     */
    Map<String, Map<String, String>> rosterFields(String examId, List<String> fields) throws StoreException;

    List<Rows.Slot> formSlots(String examId) throws StoreException;

    /** (candidate, task) pairs that have at least one response. */
    List<Rows.Answered> answered(String examId) throws StoreException;

    List<String> examIds() throws StoreException;

    void forEachResponse(String examId, Consumer<Rows.Response> sink) throws StoreException;

    void forEachToolUse(String examId, Consumer<Rows.ToolUseRow> sink) throws StoreException;

    void forEachEvent(String examId, Consumer<Rows.Event> sink) throws StoreException;

    /**
     * Every questionnaire item each sitting's form asked, answered or not, with its definition, and
     * every stored answer to an item the store has no definition of; by candidate, sitting, before
     * the tasks then after, item position.
     */
    void forEachQuestionnaireAnswer(String examId, Consumer<Rows.QuestionnaireAnswer> sink) throws StoreException;

    /** Row counts per table, for reports and tests. */
    java.util.Map<String, Long> counts() throws StoreException;

    /**
     * Keeps what this store was opened to write ({@link Stores#openResultsToCollect}): a new store file built aside
     * gets its name now, whole; closed without this it is discarded. Any other store has kept each import at its
     * commit, and this does nothing.
     */
    default void keep() throws StoreException {
    }

    @Override
    void close() throws StoreException;
}
