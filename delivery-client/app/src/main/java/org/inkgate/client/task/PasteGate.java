package org.inkgate.client.task;

import java.util.Objects;
import org.inkgate.packs.policy.PastePolicy;

/**
 * Decides what a paste does under the task's paste policy. Text copied or cut inside this
 * answer is remembered here; anything else on the clipboard came from outside the response
 * (another program, another task, before the sitting) and is never pasted under any policy.
 */
final class PasteGate {

    /** What a paste request turns into. */
    sealed interface Decision permits Insert, Refuse {
    }

    /** Paste this text (it was copied inside the same response). */
    record Insert(String text) implements Decision {
    }

    /**
     * Refuse and log it.
     *
     * @param reason {@code outside-clipboard} or {@code paste-forbidden}, as {@code paste.refused} names them
     * @param length length of what the clipboard held (0 when empty)
     */
    record Refuse(String reason, int length) implements Decision {
    }

    static final String OUTSIDE = "outside-clipboard";
    static final String FORBIDDEN = "paste-forbidden";

    private final PastePolicy policy;
    private String copiedHere;

    PasteGate(PastePolicy policy) {
        this.policy = Objects.requireNonNull(policy, "policy");
    }

    /** Whether copy and cut put anything on the clipboard at all (not when paste is forbidden). */
    boolean copyAllowed() {
        return policy == PastePolicy.WITHIN_RESPONSE;
    }

    /** Remembers text the candidate copied or cut inside this answer. */
    void copied(String text) {
        if (copyAllowed() && text != null && !text.isEmpty()) {
            copiedHere = text;
        }
    }

    /**
     * The decision for a paste when the clipboard holds {@code clipboard} (null when it holds no text).
     * Only the exact text last copied inside this answer passes, and only when the policy allows paste.
     */
    Decision decide(String clipboard) {
        int length = clipboard == null ? 0 : clipboard.length();
        if (policy == PastePolicy.NONE) {
            return new Refuse(FORBIDDEN, length);
        }
        if (clipboard == null || clipboard.isEmpty()) {
            return new Refuse(OUTSIDE, 0);
        }
        if (clipboard.equals(copiedHere)) {
            return new Insert(clipboard);
        }
        return new Refuse(OUTSIDE, length);
    }
}
