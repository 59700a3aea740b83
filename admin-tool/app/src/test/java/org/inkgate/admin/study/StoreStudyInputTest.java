package org.inkgate.admin.study;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNull;

import org.inkgate.admin.core.store.Rows;
import org.inkgate.analysis.data.ProcessEvent;
import org.inkgate.analysis.data.ToolUse;
import org.junit.jupiter.api.Test;

/** Stored rows map onto the analysis's tables by the rules in docs/analysis.md (invented rows). */
class StoreStudyInputTest {

    private static Rows.Event event(String type, String task, long monoNs, String json) {
        return new Rows.Event("exam", "C001", "pkg", "reg", 1, "2026-12-02T09:00:00Z", monoNs, type, task, json);
    }

    @Test
    void processEvent_insert_keepsPositionTextAndMillisecondTime() {
        ProcessEvent e = StoreStudyInput.processEvent(event("text.insert", "t1", 2_500_000_000L,
                "{\"pos\":12,\"len\":3,\"text\":\"cat\"}"));
        assertEquals(new ProcessEvent("C001", "t1", 2500, ProcessEvent.Type.INSERT, 12, "cat"), e);
    }

    @Test
    void processEvent_deleteLoggedWithLengthOnly_keepsItsLength() {
        ProcessEvent e = StoreStudyInput.processEvent(event("text.delete", "t1", 0, "{\"pos\":4,\"len\":2}"));
        assertEquals(2, e.text().length());
        assertEquals(4, e.position());
    }

    @Test
    void processEvent_query_takesTheQueryText() {
        ProcessEvent e = StoreStudyInput.processEvent(event("tool.query", "t2", 0, "{\"tool\":\"glossary\",\"query\":\"ferry\"}"));
        assertEquals(ProcessEvent.Type.TOOL_QUERY, e.type());
        assertEquals("ferry", e.text());
    }

    @Test
    void processEvent_sittingLevelOrUnusedType_isLeftOut() {
        assertNull(StoreStudyInput.processEvent(event("focus.lost", "t1", 0, "{}")));
        assertNull(StoreStudyInput.processEvent(event("text.insert", "", 0, "{\"pos\":0,\"text\":\"a\"}")));
    }

    @Test
    void toolUse_countsTheCandidatesOwnActionsOnly() {
        ToolUse u = StoreStudyInput.toolUse(new Rows.ToolUseRow("exam", "C001", "pkg", "t1", "with", "spelling",
                0, 0, 0, 9, 2, 3, 0));
        assertEquals(new ToolUse("C001", "t1", "spelling", 5, 0, 2, 3), u, "9 shown, 2 accepted, 3 ignored: 5 uses");
    }
}
