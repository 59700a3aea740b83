package org.inkgate.client.task;

import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import org.inkgate.client.processlog.EventRecording;
import org.inkgate.client.processlog.ProcessLog;
import org.inkgate.format.response.EventType;

/** A process log that keeps every event in memory, for tests (thread-safe: tools log from several threads). */
final class RecordingLog implements ProcessLog {

    record Event(String type, String taskId, Map<String, Object> data) {
        Object get(String field) {
            return data.get(field);
        }
    }

    record Snapshot(String taskId, String text, int caret) {
    }

    private final List<Event> events = new ArrayList<>();
    private final List<Snapshot> snapshots = new ArrayList<>();

    @Override
    public synchronized void record(EventType type, String taskId, Map<String, Object> data) {
        assert EventRecording.keepsContract(type, taskId, data);
        events.add(new Event(type.wireName(), taskId, Map.copyOf(data.entrySet().stream()
                .filter(e -> e.getValue() != null).collect(java.util.stream.Collectors.toMap(Map.Entry::getKey, Map.Entry::getValue)))));
    }

    @Override
    public synchronized void snapshot(String taskId, String text, int caret) {
        snapshots.add(new Snapshot(taskId, text, caret));
    }

    synchronized List<Event> events() {
        return List.copyOf(events);
    }

    synchronized List<Event> events(EventType type) {
        return events.stream().filter(e -> e.type().equals(type.wireName())).toList();
    }

    synchronized List<Snapshot> snapshots() {
        return List.copyOf(snapshots);
    }

    synchronized void clear() {
        events.clear();
        snapshots.clear();
    }
}
