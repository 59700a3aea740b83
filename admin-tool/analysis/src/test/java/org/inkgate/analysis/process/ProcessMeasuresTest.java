package org.inkgate.analysis.process;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.util.List;
import org.inkgate.analysis.data.ProcessEvent;
import org.inkgate.analysis.data.ProcessEvent.Type;
import org.junit.jupiter.api.Test;

class ProcessMeasuresTest {

    private static ProcessEvent e(long t, Type type, int pos, String text) {
        return new ProcessEvent("C1", "t1", t, type, pos, text);
    }

    @Test
    void measures_handWorkedLog_matchDefinitions() {
        // a log worked by hand from the definitions in ProcessMeasures (after Chenoweth & Hayes 2001):
        // "The" typed at 0/200/400 ms, 3 s pause, " cat" at 3400..4000, delete 2 chars (revision, R-burst),
        // "ow" at 4500/4700, panel open 5000-8000 with a query "cow", then " cow" typed at 9000 (pause 4.3 s)
        List<ProcessEvent> log = List.of(
                e(0, Type.INSERT, 0, "T"), e(200, Type.INSERT, 1, "h"), e(400, Type.INSERT, 2, "e"),
                e(3400, Type.INSERT, 3, " "), e(3600, Type.INSERT, 4, "c"), e(3800, Type.INSERT, 5, "a"),
                e(4000, Type.INSERT, 6, "t"),
                e(4200, Type.DELETE, 6, "t"), e(4300, Type.DELETE, 5, "a"),
                e(4500, Type.INSERT, 5, "o"), e(4700, Type.INSERT, 6, "w"),
                e(5000, Type.PANEL_OPEN, -1, ""), e(6000, Type.TOOL_QUERY, -1, "cow"), e(8000, Type.PANEL_CLOSE, -1, ""),
                e(9000, Type.INSERT, 7, " cow"));
        ProcessMeasures m = ProcessMeasures.of(log, ProcessMeasures.Parameters.DEFAULT);
        assertEquals(9.0, m.timeOnTaskS(), 1e-12);
        // text-event gaps: 200 200 3000 200 200 200 200 100 200 200 4300 -> pauses 3000 and 4300
        assertEquals(2, m.pauses());
        assertEquals(3.65, m.meanPauseS(), 1e-12);
        assertEquals(1.7, m.activeWritingS(), 1e-12); // 7 x 200 + 100 + 200
        // bursts: "The" ends in a pause (P), " cat" ends in the deletion (R), "ow" ends in a pause (P),
        // " cow" ends the log (P)
        assertEquals(3, m.pBursts());
        assertEquals(1, m.rBursts());
        assertEquals((3 + 2 + 4) / 3.0, m.meanPBurstChars(), 1e-12);
        assertEquals(1, m.revisions());
        assertEquals(13, m.charsInserted());
        assertEquals(11, m.finalChars());
        assertEquals(11 / 13.0, m.productProcessRatio(), 1e-12);
        assertEquals(13 / (9.0 / 60), m.charsPerMinute(), 1e-9);
        assertEquals(3.0, m.panelTimeS(), 1e-12);
        assertEquals(1, m.lookups());
        assertEquals(1, m.lookupsUsed());
    }

    @Test
    void measures_taskBoundsAndPanelSpans_followTheDefinitions() {
        // worked by hand from the definitions in ProcessMeasures: the task runs 0-10 s; the glossary's page is in
        // view 1-3 s, a tab switch at 3 s brings the dictionary's page, still in view when the task ends at 10 s
        // (the client logs that page's close at 10.5 s, after task.end; the insert at 11 s is not in the task)
        List<ProcessEvent> log = List.of(e(0, Type.TASK_START, -1, ""), e(1000, Type.PANEL_OPEN, -1, ""),
                e(2000, Type.INSERT, 0, "a"), e(3000, Type.PANEL_CLOSE, -1, ""), e(3000, Type.PANEL_OPEN, -1, ""),
                e(4000, Type.INSERT, 1, "b"), e(10_000, Type.TASK_END, -1, ""), e(10_500, Type.PANEL_CLOSE, -1, ""),
                e(11_000, Type.INSERT, 2, "c"));
        ProcessMeasures m = ProcessMeasures.of(log, ProcessMeasures.Parameters.DEFAULT);
        assertEquals(9.0, m.panelTimeS(), 1e-12, "(3 - 1) + (10 - 3) s");
        assertEquals(10.0, m.timeOnTaskS(), 1e-12);
        assertEquals(2, m.charsInserted());
    }

    @Test
    void measures_panelOpenAtTheEndOfALogWithoutTaskEnd_closesAtTheLastEvent() {
        List<ProcessEvent> log = List.of(e(0, Type.INSERT, 0, "a"), e(2000, Type.PANEL_OPEN, -1, ""),
                e(2500, Type.PANEL_OPEN, -1, ""), e(6000, Type.INSERT, 1, "b"));
        assertEquals(4.0, ProcessMeasures.of(log, ProcessMeasures.Parameters.DEFAULT).panelTimeS(), 1e-12,
                "a second open continues the span: 6 - 2 s");
    }

    @Test
    void measures_lookupOutsideWindow_isNotCountedAsUsed() {
        List<ProcessEvent> log = List.of(e(0, Type.TOOL_QUERY, -1, "harbour"),
                e(1000, Type.INSERT, 0, "x"), e(70_000, Type.INSERT, 1, "harbour"));
        ProcessMeasures m = ProcessMeasures.of(log, ProcessMeasures.Parameters.DEFAULT);
        assertEquals(0, m.lookupsUsed());
        ProcessMeasures wide = ProcessMeasures.of(log, new ProcessMeasures.Parameters(2000, 80_000));
        assertEquals(1, wide.lookupsUsed());
    }
}
