package org.inkgate.client.sitting.recovery;

import java.util.List;
import java.util.Optional;
import org.inkgate.client.sitting.replay.ReplayException;
import org.inkgate.client.sitting.replay.ReplayMismatch;
import org.inkgate.client.sitting.replay.Replayed;
import org.inkgate.client.sitting.replay.TextReplay;
import org.inkgate.client.sitting.store.SittingStateStore;
import org.inkgate.format.response.ProcessEvent;

/**
 * Rebuilds a task's text after a restart: the newest snapshot, then the text events logged
 * after it. The snapshot is also checked against a replay of the whole log up to it; a
 * disagreement is reported (and the snapshot with its tail kept, since the snapshot is what the
 * candidate last saw on screen).
 */
public final class TextRecovery {

    /**
     * The recovered text.
     *
     * @param text          the text to put back in the editor
     * @param caret         the caret
     * @param snapshotSeq   the event the snapshot followed (0 when there was none)
     * @param replayedAfter text events replayed after the snapshot
     * @param mismatch      a disagreement between snapshot and log, or a log that does not replay
     */
    public record Recovered(String text, int caret, long snapshotSeq, int replayedAfter, Optional<ReplayMismatch> mismatch,
            Optional<String> problem) {
    }

    private TextRecovery() {
    }

    /** Recovers one task's text from its newest snapshot and logged events, as the state store read them. */
    public static Recovered recover(String taskId, SittingStateStore.TaskLog logged) {
        List<ProcessEvent> all = logged.events();
        if (logged.snapshot().isEmpty()) {
            try {
                Replayed r = TextReplay.replay(taskId, all);
                return new Recovered(r.text(), r.caret(), 0, r.applied(), Optional.empty(), Optional.empty());
            } catch (ReplayException e) {
                return new Recovered("", 0, 0, 0, Optional.empty(), Optional.of(e.getMessage()));
            }
        }
        String snapText = logged.snapshot().get().text();
        int snapCaret = logged.snapshot().get().caret();
        long snapSeq = logged.snapshot().get().afterSeq();
        final long upTo = snapSeq;
        Optional<ReplayMismatch> mismatch;
        Optional<String> problem = Optional.empty();
        try {
            Replayed before = TextReplay.replay(taskId, all.stream().filter(e -> e.seq() <= upTo).toList());
            mismatch = TextReplay.compare(taskId, snapText, before.text());
        } catch (ReplayException e) {
            mismatch = Optional.of(ReplayMismatch.unreplayable(taskId, snapText.length(), e));
            problem = Optional.of(e.getMessage());
        }
        List<ProcessEvent> tail = all.stream().filter(e -> e.seq() > upTo).toList();
        try {
            Replayed after = TextReplay.replay(snapText, snapCaret, taskId, tail);
            return new Recovered(after.text(), after.caret(), snapSeq, after.applied(), mismatch, problem);
        } catch (ReplayException e) {
            return new Recovered(snapText, Math.min(snapCaret, snapText.length()), snapSeq, 0, mismatch,
                    Optional.of(e.getMessage()));
        }
    }
}
