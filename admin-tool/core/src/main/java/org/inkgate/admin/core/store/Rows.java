package org.inkgate.admin.core.store;

/** The plain rows the results store hands to reports and exports. */
public final class Rows {

    private Rows() {
    }

    /** A refused file and why. */
    public record Refusal(String sourceFile, String fileSha256, String reason, String message, String firstSeenAt) {
    }

    /** One candidate with more than one response to one task: every copy is kept. */
    public record Conflict(String examId, String candidateNumber, String taskId, int copies, String packageIds) {
    }

    /** A candidate on the exam's roster (no personal fields). */
    public record Candidate(String candidateNumber, String level, String formId, boolean sat) {
    }

    /** One task position of a form. */
    public record Slot(String formId, int position, String taskId, String conditionId) {
    }

    public record Answered(String candidateNumber, String taskId) {
    }

    /** One response: one candidate, one task, one package. */
    public record Response(String examId, String candidateNumber, String level, String formId, String packageId,
            long sittingId, int position, String taskId, String conditionId, String spelling, String glossaryPack,
            String dictionaryPack, boolean insertFromPanel, boolean showWordCount, String paste, String toolsOffered,
            String text, int wordCount, String startedAt, String endedAt, long extraTimeSeconds, String endReason,
            String submittedAt, int copies, String installationFingerprint) {
    }

    /** One tool's use summary in one response. */
    public record ToolUseRow(String examId, String candidateNumber, String packageId, String taskId, String conditionId,
            String tool, int queries, int emptyQueries, int entriesOpened, int suggestionsShown, int suggestionsAccepted,
            int suggestionsIgnored, int insertions) {
    }

    /** One process event. */
    public record Event(String examId, String candidateNumber, String packageId, String registration, long seq,
            String at, long mono, String type, String taskId, String dataJson) {
    }

    /**
     * One questionnaire item asked in one sitting, with the answer if one was given. {@code timing} is
     * {@code before} or {@code after} the tasks; {@code kind} ({@code likert} or {@code free-text}),
     * {@code position}, {@code text} and {@code labelsJson} are null when the store holds no definition
     * of the item; {@code value} is null when the item was not answered. {@code conditions} lists the
     * conditions of the sitting's responses in the order sat, separated by spaces.
     */
    public record QuestionnaireAnswer(String examId, String candidateNumber, String level, String formId,
            String packageId, String conditions, String questionnaireId, String timing, Integer position,
            String itemId, String kind, String text, String labelsJson, String value) {
    }
}
