package org.inkgate.admin.core.testutil;

import java.time.Instant;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import org.inkgate.format.response.EventType;
import org.inkgate.format.response.ProcessEvent;
import org.inkgate.format.response.ResponseDocument;

/**
 * One event of every {@link EventType}, each with its required data keys (invented values) and a
 * task exactly where the type's level asks for one (the response's first task for "either"): a log
 * that keeps the contract while using the whole vocabulary.
 */
public final class EveryEventType {

    private EveryEventType() {
    }

    public static List<ProcessEvent> log(ResponseDocument d) {
        String task = d.tasks().get(0).taskId();
        Instant at = d.startedAt();
        List<ProcessEvent> out = new ArrayList<>();
        for (EventType t : EventType.values()) {
            Map<String, Object> data = new LinkedHashMap<>();
            for (String key : t.requiredKeys()) {
                data.put(key, key.equals("pos") || key.equals("len") || key.endsWith("Millis") || key.endsWith("Seconds")
                        || key.equals("seconds") || key.equals("words") || key.equals("hits") || key.equals("micros")
                        || key.equals("issues") || key.equals("minutesLeft") ? (Object) 1 : "x");
            }
            String taskOf = t.level() == EventType.Level.SITTING ? null : task;
            long seq = out.size() + 1;
            out.add(new ProcessEvent(seq, at.plusSeconds(seq), 1_000_000_000L * seq, t, taskOf, data));
        }
        return out;
    }
}
