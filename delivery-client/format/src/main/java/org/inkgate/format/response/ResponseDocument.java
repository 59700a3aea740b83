package org.inkgate.format.response;

import java.time.Instant;
import java.util.List;
import java.util.Objects;

/**
 * What one candidate wrote in one sitting ({@code response.json}), with the record of which
 * tools each task offered and how they were used. Field by field: docs/formats.md.
 *
 * @param format               always {@link #FORMAT}
 * @param schemaVersion        the schema this document follows
 * @param packageId            random UUID naming this package; a re-sent copy keeps it
 * @param examId               the exam's id from the bundle
 * @param bundleManifestSha256 SHA-256 of the bundle manifest the sitting ran from
 * @param candidateNumber      the number the candidate signed in with
 * @param seat                 the seat or machine label the invigilator set
 * @param formId               the form sat
 * @param clientVersion        version of the delivery client
 * @param startedAt            wall-clock start of the sitting
 * @param submittedAt          wall-clock time of final submission
 * @param tasks                one entry per task, in the order sat
 * @param questionnaires       answers to the form's questionnaires
 */
public record ResponseDocument(
        String format,
        int schemaVersion,
        String packageId,
        String examId,
        String bundleManifestSha256,
        String candidateNumber,
        String seat,
        String formId,
        String clientVersion,
        Instant startedAt,
        Instant submittedAt,
        List<TaskResponse> tasks,
        List<QuestionnaireAnswers> questionnaires) {

    public static final String FORMAT = "inkgate-response";
    public static final int SCHEMA_VERSION = 1;

    public ResponseDocument {
        tasks = List.copyOf(Objects.requireNonNullElse(tasks, List.of()));
        questionnaires = List.copyOf(Objects.requireNonNullElse(questionnaires, List.of()));
    }
}
