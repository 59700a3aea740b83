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
    void processEvent_panelEventsAreThePanelAndAnOpenedEntryIsNot() {
        assertEquals(new ProcessEvent("C001", "t1", 3, ProcessEvent.Type.PANEL_OPEN, -1, ""),
                StoreStudyInput.processEvent(event("panel.open", "t1", 3_000_000L, "{\"tool\":\"glossary\"}")));
        assertEquals(ProcessEvent.Type.PANEL_CLOSE,
                StoreStudyInput.processEvent(event("panel.close", "t1", 0, "{\"tool\":\"glossary\"}")).type());
        assertNull(StoreStudyInput.processEvent(event("tool.open", "t1", 0,
                "{\"tool\":\"glossary\",\"pack\":\"p\",\"entry\":\"e1\"}")));
        assertEquals(ProcessEvent.Type.TASK_END,
                StoreStudyInput.processEvent(event("task.end", "t1", 0, "{\"reason\":\"submitted\",\"words\":3}")).type());
    }

    @Test
    void typeFor_everyEventType_isDecidedAndOnlyTheMeasuresTypesAreKept() {
        java.util.Map<String, String> kept = new java.util.TreeMap<>();
        for (org.inkgate.format.response.EventType t : org.inkgate.format.response.EventType.values()) {
            AnalysisEvents.typeFor(t).ifPresent(a -> kept.put(t.wireName(), a.logName()));
        }
        // the analysis's names are the format's wire names (docs/analysis.md, "Process log")
        assertEquals(java.util.Map.of("task.start", "task.start", "task.end", "task.end", "text.insert", "text.insert",
                "text.delete", "text.delete", "panel.open", "panel.open", "panel.close", "panel.close",
                "tool.query", "tool.query"), kept);
        assertEquals(ProcessEvent.Type.values().length, kept.size(), "every analysis type has its source event");
    }

    @Test
    void processEvent_typeUnknownToThisVersion_isLeftOut() {
        assertNull(StoreStudyInput.processEvent(event("tool.close", "t1", 0, "{}")));
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
