package org.inkgate.admin.core.bundling;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.security.KeyPair;
import java.util.Base64;
import java.util.List;
import java.util.Map;
import org.inkgate.admin.core.source.ExamSource;
import org.inkgate.admin.core.source.InvalidSourceException;
import org.inkgate.admin.core.source.Problem;
import org.inkgate.format.bundle.BundleManifest;
import org.inkgate.format.bundle.BundleWriter;
import org.inkgate.format.bundle.FormSlot;
import org.inkgate.format.bundle.FormSpec;
import org.inkgate.format.bundle.OwnerKeys;
import org.inkgate.format.crypto.Ed25519;
import org.inkgate.format.crypto.X25519;

/**
 * Builds a practice bundle of one task under one condition's resource policy, for the test
 * owner to look at in the client's practice window. It is signed with a throw-away key made for
 * this preview alone (practice mode accepts any signer), so it can never pass for the owner's
 * signed bundle, and it carries no roster and no PIN: it is not a locked sitting.
 */
public final class PreviewBundle {

    /** The form id of the single form in a preview bundle. */
    public static final String FORM_ID = "PREVIEW";

    /** What was built: the file, its manifest, and the task and condition it shows. */
    public record Built(Path file, BundleManifest manifest, ExamSource.Task task, ExamSource.Condition condition) {
    }

    private PreviewBundle() {
    }

    /**
     * Writes the preview bundle of {@code taskId} under {@code conditionId} (null: the exam's
     * first condition) to {@code out}.
     */
    public static Built build(ExamSource exam, String taskId, String conditionId, Path out)
            throws InvalidSourceException, IOException {
        ExamSource.Task task = exam.task(taskId).orElse(null);
        ExamSource.Condition condition = conditionId == null
                ? exam.conditions().stream().findFirst().orElse(null)
                : exam.conditions().stream().filter(c -> c.id().equals(conditionId)).findFirst().orElse(null);
        if (task == null) {
            throw new InvalidSourceException("no preview", List.of(new Problem("exam.yaml", 0, 0, "tasks",
                    "there is no task \"" + taskId + "\"; the tasks are " + exam.tasks().stream().map(ExamSource.Task::id)
                            .toList() + ". Name one of them with --task")));
        }
        if (condition == null) {
            throw new InvalidSourceException("no preview", List.of(new Problem("exam.yaml", 0, 0, "conditions",
                    "there is no condition \"" + conditionId + "\"; the conditions are " + exam.conditions().stream()
                            .map(ExamSource.Condition::id).toList() + ". Name one of them with --condition")));
        }
        // one task, one condition, no questionnaires: the preview shows the writing task alone
        ExamSource single = new ExamSource(exam.folder(), exam.examId() + "-preview", exam.title() + " (preview)",
                exam.language(), exam.instructionsFile(), true, List.of(task), List.of(condition),
                new ExamSource.Design(org.inkgate.format.bundle.StudyDesign.LATIN_SQUARE, false, null, null, 0), List.of(),
                exam.packs(), null);
        KeyPair signing = Ed25519.generate();
        KeyPair encryption = X25519.generate();
        Base64.Encoder b64 = Base64.getEncoder();
        OwnerKeys throwAway = new OwnerKeys(b64.encodeToString(Ed25519.rawPublic(signing.getPublic())),
                b64.encodeToString(X25519.rawPublic(encryption.getPublic())));
        Map.Entry<BundleManifest, Map<String, byte[]>> prepared = BundleBuilder.prepare(single, List.of(), null,
                throwAway, null);
        BundleManifest m = prepared.getKey();
        FormSpec form = new FormSpec(FORM_ID, List.of(new FormSlot(task.id(), condition.id(),
                condition.policyFor(task.id()))), null, null, 0);
        BundleManifest manifest = new BundleManifest(m.format(), m.schemaVersion(), m.examId(), m.title(), m.language(),
                m.instructionsFile(), m.tasks(), m.conditions(), List.of(form), m.questionnaires(), m.packs(), m.roster(),
                m.ownerKeys(), null, null, true, m.entries());
        Path parent = out.toAbsolutePath().getParent();
        if (parent != null) {
            Files.createDirectories(parent);
        }
        new BundleWriter(signing.getPrivate()).write(manifest, prepared.getValue(), out);
        return new Built(out, manifest, task, condition);
    }
}
