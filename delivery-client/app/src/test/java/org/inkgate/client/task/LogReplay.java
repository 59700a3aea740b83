package org.inkgate.client.task;

import java.util.List;
import org.inkgate.client.sitting.EventTypes;

/**
 * Rebuilds an answer from the process log alone, as a researcher would: applies every
 * text.insert and text.delete in order, checking that each delete removes exactly the text it
 * names. Written here because the sitting core's replay was not yet on this branch.
 */
final class LogReplay {

    private LogReplay() {
    }

    static String replay(String startText, List<RecordingLog.Event> events) {
        StringBuilder text = new StringBuilder(startText);
        for (RecordingLog.Event e : events) {
            switch (e.type()) {
                case EventTypes.TEXT_INSERT -> {
                    int pos = (Integer) e.get("pos");
                    String inserted = (String) e.get("text");
                    if ((Integer) e.get("len") != inserted.length()) {
                        throw new AssertionError("len does not match text in " + e);
                    }
                    text.insert(pos, inserted);
                }
                case EventTypes.TEXT_DELETE -> {
                    int pos = (Integer) e.get("pos");
                    int len = (Integer) e.get("len");
                    String removed = text.substring(pos, pos + len);
                    if (!removed.equals(e.get("text"))) {
                        throw new AssertionError("delete at " + pos + " names \"" + e.get("text") + "\" but the replayed text holds \"" + removed + "\"");
                    }
                    text.delete(pos, pos + len);
                }
                default -> { }
            }
        }
        return text.toString();
    }
}
