package org.inkgate.format.response;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.time.Instant;
import java.util.Arrays;
import java.util.List;
import java.util.Map;
import org.inkgate.format.response.EventContract.Problem;
import org.inkgate.format.response.EventContract.Violation;
import org.inkgate.format.testutil.SampleResponse;
import org.junit.jupiter.api.Test;

class EventContractTest {

    private static final Instant AT = Instant.parse("2026-03-14T09:00:00Z");
    private static final ResponseDocument DOC = SampleResponse.document(); // tasks t1 and t2

    private static ProcessEvent event(long seq, String type, String task, Map<String, Object> data) {
        return new ProcessEvent(seq, AT, seq * 1_000_000L, type, task, data);
    }

    private static List<Problem> problems(ProcessEvent... events) {
        return EventContract.check(DOC, Arrays.asList(events)).stream().map(Violation::problem).toList();
    }

    @Test
    void parse_everyWireName_isKnownAndUnknownNamesAreTyped() {
        for (EventType t : EventType.values()) {
            assertEquals(new EventType.Known(t), EventType.parse(t.wireName()));
        }
        assertEquals(new EventType.Unknown("tool.close"), EventType.parse("tool.close"));
        assertEquals(new EventType.Unknown("sitting.submit"), EventType.parse("sitting.submit"));
        assertEquals(new EventType.Unknown(null), EventType.parse(null));
    }

    @Test
    void check_sampleLog_keepsTheContract() {
        assertEquals(List.of(), EventContract.check(DOC, SampleResponse.events(40)));
    }

    @Test
    void check_unknownType_isNamedWithItsSeq() {
        List<Violation> v = EventContract.check(DOC, List.of(event(7, "tool.close", "t1", Map.of("tool", "glossary"))));
        assertEquals(1, v.size());
        assertEquals(Problem.UNKNOWN_TYPE, v.get(0).problem());
        assertTrue(v.get(0).describe().startsWith("event 7 (tool.close): not an event type"), v.get(0).describe());
    }

    @Test
    void check_missingRequiredKey_namesTheKey() {
        List<Violation> v = EventContract.check(DOC, List.of(event(3, "tool.query", "t1",
                Map.of("tool", "glossary", "pack", "p", "hits", 0, "micros", 5))));
        assertEquals(List.of(Problem.MISSING_KEY), v.stream().map(Violation::problem).toList());
        assertEquals("event 3 (tool.query): data key \"query\" missing", v.get(0).describe());
    }

    @Test
    void check_optionalKeyAbsentOrPresent_isFineButAnUndeclaredKeyIsNot() {
        Map<String, Object> end = Map.of("reason", "submitted", "words", 12);
        assertEquals(List.of(), problems(event(1, "task.end", "t1", end)));
        assertEquals(List.of(), problems(event(1, "task.end", "t1", Map.of("reason", "time-up", "words", 0, "begun", false))));
        assertEquals(List.of(Problem.UNDECLARED_KEY),
                problems(event(1, "task.end", "t1", Map.of("reason", "submitted", "words", 1, "replayProblem", "x"))));
    }

    @Test
    void check_levels_taskEventsNeedATaskAndSittingEventsMayNotHaveOne() {
        assertEquals(List.of(Problem.TASK_MISSING), problems(event(1, "panel.open", null, Map.of("tool", "glossary"))));
        assertEquals(List.of(Problem.TASK_NOT_ALLOWED), problems(event(1, "sitting.end", "t1", Map.of("reason", "submitted"))));
        // either level: with or without a task
        assertEquals(List.of(), problems(event(1, "focus.lost", null, Map.of()), event(2, "focus.lost", "t2", Map.of())));
    }

    @Test
    void check_eventForATaskNotInTheResponse_isNamed() {
        List<Violation> v = EventContract.check(DOC, List.of(event(9, "panel.open", "t9", Map.of("tool", "glossary"))));
        assertEquals(List.of(Problem.TASK_NOT_IN_RESPONSE), v.stream().map(Violation::problem).toList());
        assertTrue(v.get(0).describe().contains("\"t9\", which is not one of the response's tasks [t1, t2]"), v.get(0).describe());
    }

    @Test
    void describe_controlCharactersFromTheFile_areShownEscaped() {
        List<Violation> v = EventContract.check(DOC, List.of(event(2, "x\u001b[2Jy\u202e", "t1", Map.of())));
        String text = v.get(0).describe();
        assertTrue(text.contains("x\\u001b[2Jy\\u202e"), text);
    }
}
