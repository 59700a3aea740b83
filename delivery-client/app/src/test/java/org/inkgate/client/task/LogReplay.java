package org.inkgate.client.task;

import java.time.Instant;
import java.util.ArrayList;
import java.util.List;
import org.inkgate.client.sitting.replay.ReplayException;
import org.inkgate.client.sitting.replay.TextReplay;
import org.inkgate.format.response.ProcessEvent;

/**
 * Rebuilds an answer from the recorded events alone with the sitting core's {@link TextReplay}
 * (the replay the recovery and the researcher's checks use), which refuses any delete that does
 * not remove exactly the text it names.
 */
final class LogReplay {

    private LogReplay() {
    }

    static String replay(String startText, List<RecordingLog.Event> recorded) {
        List<ProcessEvent> events = new ArrayList<>();
        long seq = 0;
        String task = null;
        for (RecordingLog.Event e : recorded) {
            events.add(new ProcessEvent(++seq, Instant.EPOCH, seq, e.type(), e.taskId(), e.data()));
            task = task == null ? e.taskId() : task;
        }
        try {
            return TextReplay.replay(startText, startText.length(), task == null ? TestTools.TASK.id() : task, events).text();
        } catch (ReplayException e) {
            throw new AssertionError("the log does not replay: " + e.getMessage(), e);
        }
    }
}
