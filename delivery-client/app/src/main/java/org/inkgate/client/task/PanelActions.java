package org.inkgate.client.task;

import javafx.beans.value.ObservableBooleanValue;
import org.inkgate.packs.policy.Tool;

/**
 * What the resource panel's pages may do to the rest of the workspace. Pages never touch the
 * answer themselves: insertion goes through here, and only when the policy allows it.
 */
interface PanelActions {

    /** Whether text may be inserted from the panel (the policy's {@code insertFromPanel}). */
    boolean insertAllowed();

    /** Inserts text from an entry at the caret; does nothing while frozen or when not allowed. */
    void insert(Tool tool, String entryId, String text);

    /** The word at (or just before) the caret, to prefill a lookup; empty when there is none. */
    String wordAtCaret();

    /** Moves focus back to the answer. */
    void backToAnswer();

    /** True while the workspace is frozen: pages answer nothing. */
    ObservableBooleanValue frozen();
}
