package org.inkgate.format.testutil;

import java.time.Instant;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.UUID;
import org.inkgate.format.response.EventType;
import org.inkgate.format.response.ProcessEvent;
import org.inkgate.format.response.QuestionnaireAnswers;
import org.inkgate.format.response.ResponseDocument;
import org.inkgate.format.response.TaskResponse;
import org.inkgate.format.response.ToolUse;
import org.inkgate.packs.policy.ResourcePolicy;
import org.inkgate.packs.policy.Tool;

/** A small response and event log for format tests. */
public final class SampleResponse {

    private static final Instant START = Instant.parse("2026-03-14T09:00:00Z");

    private SampleResponse() {
    }

    public static ResponseDocument document(String packageId) {
        TaskResponse t1 = new TaskResponse("t1", "with", "Dear Sam, I cannot come on Friday.", 7,
                START, START.plusSeconds(900), 0, SampleExam.WITH_TOOLS, SampleExam.WITH_TOOLS.offeredTools(),
                Map.of(Tool.SPELLING, new ToolUse(0, 0, 0, 2, 1, 1, 0)), TaskResponse.EndReason.SUBMITTED);
        TaskResponse t2 = new TaskResponse("t2", "without", "Yes, because families are free on Sundays.", 7,
                START.plusSeconds(960), START.plusSeconds(2700), 0, ResourcePolicy.noTools(),
                ResourcePolicy.noTools().offeredTools(), Map.of(), TaskResponse.EndReason.TIME_UP);
        return new ResponseDocument(ResponseDocument.FORMAT, ResponseDocument.SCHEMA_VERSION, packageId, "sample-exam",
                "0".repeat(64), "1001", "seat-07", "A", "test", START, START.plusSeconds(2800), List.of(t1, t2),
                List.of(new QuestionnaireAnswers("after", Map.of("q1", "3"))));
    }

    public static ResponseDocument document() {
        return document(UUID.nameUUIDFromBytes("sample".getBytes(java.nio.charset.StandardCharsets.UTF_8)).toString());
    }

    /** A typing session of {@code count} events in task t1: inserts with a deletion every fifth, keeping the event contract. */
    public static List<ProcessEvent> events(int count) {
        List<ProcessEvent> events = new ArrayList<>();
        for (int i = 1; i <= count; i++) {
            boolean delete = i % 5 == 0;
            Map<String, Object> data = delete
                    ? Map.of("pos", i - 1, "len", 1, "text", "x", "source", "typing")
                    : Map.of("pos", i - 1, "len", 1, "text", String.valueOf((char) ('a' + i % 26)), "source", "typing");
            events.add(new ProcessEvent(i, START.plusMillis(180L * i), 1_000_000_000L + 180_000_000L * i,
                    delete ? EventType.TEXT_DELETE : EventType.TEXT_INSERT, "t1", data));
        }
        return events;
    }
}
