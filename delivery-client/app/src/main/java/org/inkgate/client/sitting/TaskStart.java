package org.inkgate.client.sitting;

import java.util.List;
import java.util.Optional;
import org.inkgate.client.sitting.replay.ReplayMismatch;
import org.inkgate.format.bundle.FormSlot;
import org.inkgate.format.bundle.TaskSpec;
import org.inkgate.format.response.ProcessEvent;

/**
 * A task as it (re)starts: what to build the workspace from.
 *
 * @param slot     the form slot (condition and policy)
 * @param task     the task
 * @param text     the answer so far: empty for a new task, recovered after a restart
 * @param caret    where the caret goes
 * @param resumed  true when the task had begun before (after a restart)
 * @param mismatch a disagreement between the saved snapshot and the log, to show the invigilator
 * @param loggedBefore the task's events logged before the restart (empty for a new task), so the
 *                 workspace counts its tool use on from them
 */
public record TaskStart(FormSlot slot, TaskSpec task, String text, int caret, boolean resumed,
        Optional<ReplayMismatch> mismatch, List<ProcessEvent> loggedBefore) {

    public TaskStart {
        loggedBefore = List.copyOf(loggedBefore);
    }
}
