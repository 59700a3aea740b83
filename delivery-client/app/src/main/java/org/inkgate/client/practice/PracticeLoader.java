package org.inkgate.client.practice;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Objects;
import org.inkgate.format.bundle.BundleManifest;
import org.inkgate.format.bundle.BundleReader;
import org.inkgate.format.bundle.ConditionSpec;
import org.inkgate.format.bundle.FormSlot;
import org.inkgate.format.bundle.FormSpec;
import org.inkgate.format.bundle.OpenedBundle;
import org.inkgate.format.bundle.QuestionnaireSpec;
import org.inkgate.format.bundle.TaskSpec;
import org.inkgate.format.trust.TrustPolicy;
import org.inkgate.format.refusal.FormatRefusal;

/**
 * Opens a bundle for practice. Practice accepts any signer (the fingerprint is shown, so people
 * can compare it with the one the test owner published), but only practice bundles: a bundle
 * made for a live sitting is refused. The bundle is read whole and closed before anything is
 * shown, so a refusal never leaves part of an exam on screen.
 */
public final class PracticeLoader {

    private final BundleReader reader = new BundleReader(TrustPolicy.anySigner());

    public PracticeLoad load(Path bundleFile) {
        String name = String.valueOf(bundleFile.getFileName());
        if (!Files.isRegularFile(bundleFile)) {
            return new PracticeLoad.Refused(name + ": there is no such file (" + bundleFile.toAbsolutePath()
                    + "). Check the path and try again.");
        }
        try (OpenedBundle bundle = reader.open(bundleFile)) {
            BundleManifest manifest = bundle.manifest();
            if (!manifest.practice()) {
                return new PracticeLoad.Refused(name + ": this bundle is for a live sitting, not for practice,"
                        + " so practice mode does not open it. Live exams are opened only on an invigilated,"
                        + " locked machine. Ask the test owner for the practice bundle of this exam.");
            }
            if (!bundle.readable()) {
                return new PracticeLoad.Refused(name + ": this bundle is sealed with a release code, which"
                        + " practice mode does not ask for. Ask the test owner for an unsealed practice bundle.");
            }
            return new PracticeLoad.Opened(read(bundle));
        } catch (FormatRefusal e) {
            return new PracticeLoad.Refused(e.getMessage());
        } catch (IOException e) {
            return new PracticeLoad.Refused(name + ": the file could not be read (" + e.getMessage()
                    + "). Check that it is not open elsewhere and that the disk is readable, then try again.");
        }
    }

    private static PracticeExam read(OpenedBundle bundle) throws IOException {
        BundleManifest m = bundle.manifest();
        PromptText instructions = m.instructionsFile() == null
                ? new PromptText(List.of())
                : PromptText.parse(bundle.readText(m.instructionsFile()));
        List<PracticeForm> forms = new ArrayList<>();
        for (FormSpec form : m.forms()) {
            forms.add(readForm(bundle, form));
        }
        return new PracticeExam(m.title(), bundle.fileName(), bundle.signerFingerprint(), instructions, forms);
    }

    private static PracticeForm readForm(OpenedBundle bundle, FormSpec form) throws IOException {
        BundleManifest m = bundle.manifest();
        List<PracticeTask> tasks = new ArrayList<>();
        int position = 1;
        // the reader has checked that every slot names a task and condition of the manifest
        for (FormSlot slot : form.slots()) {
            TaskSpec task = m.task(slot.taskId()).orElseThrow();
            ConditionSpec condition = m.condition(slot.conditionId()).orElseThrow();
            String conditionLabel = Objects.requireNonNullElse(condition.label(), condition.id());
            tasks.add(new PracticeTask(position++, task.id(), task.title(), conditionLabel, slot.policy(),
                    TaskWording.tools(slot.policy()), PromptText.parse(bundle.readText(task.promptFile())),
                    task.words(), task.timeLimitSeconds()));
        }
        return new PracticeForm(form.id(), "Form " + form.id(), tasks, afterTasks(m, form));
    }

    private static String afterTasks(BundleManifest m, FormSpec form) {
        if (form.postQuestionnaire() == null) {
            return "";
        }
        QuestionnaireSpec q = m.questionnaire(form.postQuestionnaire()).orElseThrow();
        int items = q.items().size();
        return "After the last task: a short questionnaire, \"" + q.title() + "\" (" + items
                + (items == 1 ? " question" : " questions") + "). It is not part of practice.";
    }
}
