package org.inkgate.client.practice;

import java.util.List;
import java.util.Objects;
import org.inkgate.format.bundle.WordGuidance;
import org.inkgate.packs.policy.PastePolicy;
import org.inkgate.packs.policy.ResourcePolicy;

/**
 * One task of a form as practice mode shows it: read whole from the bundle, so nothing refers
 * back to the bundle's files once it is closed.
 *
 * @param position         1-based place of the task in its form
 * @param taskId           the task's id in the bundle
 * @param title            the task's title
 * @param conditionLabel   the label of the condition it is sat under in this form
 * @param policy           the resource policy of this task in this form
 * @param tools            the offered tools in plain words ({@link TaskWording#tools})
 * @param prompt           the prompt, as plain blocks
 * @param words            word guidance, or null
 * @param timeLimitSeconds the time allowed in a real sitting; 0 for untimed
 */
public record PracticeTask(
        int position,
        String taskId,
        String title,
        String conditionLabel,
        ResourcePolicy policy,
        List<String> tools,
        PromptText prompt,
        WordGuidance words,
        int timeLimitSeconds) {

    public PracticeTask {
        Objects.requireNonNull(taskId, "taskId");
        Objects.requireNonNull(title, "title");
        Objects.requireNonNull(conditionLabel, "conditionLabel");
        Objects.requireNonNull(policy, "policy");
        Objects.requireNonNull(prompt, "prompt");
        tools = List.copyOf(tools);
    }

    /** Whether the task offers any tool at all. */
    public boolean offersTools() {
        return !policy.offeredTools().isEmpty() || policy.insertFromPanel()
                || policy.paste() != PastePolicy.NONE;
    }
}
