package org.inkgate.client.sitting;

import java.util.Optional;
import org.inkgate.client.sitting.replay.ReplayMismatch;
import org.inkgate.format.bundle.FormSlot;
import org.inkgate.format.bundle.TaskSpec;

/**
 * A task as it (re)starts: what to build the workspace from.
 *
 * @param slot     the form slot (condition and policy)
 * @param task     the task
 * @param text     the answer so far: empty for a new task, recovered after a restart
 * @param caret    where the caret goes
 * @param resumed  true when the task had begun before (after a restart)
 * @param mismatch a disagreement between the saved snapshot and the log, to show the invigilator
 */
public record TaskStart(FormSlot slot, TaskSpec task, String text, int caret, boolean resumed,
        Optional<ReplayMismatch> mismatch) {
}
