package org.inkgate.client.sitting.replay;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.time.Instant;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.Random;
import javax.swing.text.PlainDocument;
import org.inkgate.format.response.EventType;
import org.inkgate.format.response.ProcessEvent;
import org.junit.jupiter.api.Test;

class TextReplayTest {

    private static final Instant AT = Instant.parse("2026-03-02T09:00:00Z");

    /**
     * Reference: the JDK's own text model, javax.swing.text.PlainDocument (insertString/remove
     * with UTF-16 offsets), a general-purpose library outside this project. Seeded random edits
     * (seed 20261202), including surrogate pairs and line breaks, are applied to it and logged as
     * events; the replay must equal the document's text.
     */
    @Test
    void replay_seededRandomEdits_equalsTheJdkDocumentModel() throws Exception {
        Random random = new Random(20261202L);
        String[] pieces = {"a", "the ", "\n", "é", "\uD83D\uDE00", "Stra\u00DFe", " ", "word,"};
        PlainDocument reference = new PlainDocument();
        List<ProcessEvent> events = new ArrayList<>();
        for (int i = 0; i < 5_000; i++) {
            int length = reference.getLength();
            if (length > 0 && random.nextInt(3) == 0) {
                int pos = random.nextInt(length);
                int len = 1 + random.nextInt(Math.min(8, length - pos));
                String removed = reference.getText(pos, len);
                reference.remove(pos, len);
                events.add(event(i + 1, EventType.TEXT_DELETE.wireName(), pos, removed));
            } else {
                int pos = random.nextInt(length + 1);
                String piece = pieces[random.nextInt(pieces.length)];
                reference.insertString(pos, piece, null);
                events.add(event(i + 1, EventType.TEXT_INSERT.wireName(), pos, piece));
            }
        }
        Replayed replayed = TextReplay.replay("t1", events);
        assertEquals(reference.getText(0, reference.getLength()), replayed.text());
        assertEquals(5_000, replayed.applied());
    }

    @Test
    void replay_fromASnapshot_appliesOnlyTheTail() throws Exception {
        List<ProcessEvent> tail = List.of(event(7, EventType.TEXT_INSERT.wireName(), 5, " world"), event(8, EventType.TEXT_DELETE.wireName(), 0, "H"),
                event(9, EventType.TEXT_INSERT.wireName(), 0, "h"));
        Replayed r = TextReplay.replay("Hello", 5, "t1", tail);
        assertEquals("hello world", r.text());
        assertEquals(1, r.caret(), "the caret follows the last change");
        assertEquals(9, r.lastSeq());
    }

    @Test
    void replay_eventsOfOtherTasksAndTypes_areIgnored() throws Exception {
        List<ProcessEvent> events = List.of(event(1, EventType.TEXT_INSERT.wireName(), 0, "abc"),
                new ProcessEvent(2, AT, 2, EventType.TEXT_INSERT.wireName(), "t2", Map.of("pos", 0, "len", 1, "text", "X")),
                new ProcessEvent(3, AT, 3, EventType.TOOL_QUERY.wireName(), "t1", Map.of("query", "abc")));
        assertEquals("abc", TextReplay.replay("t1", events).text());
    }

    @Test
    void replay_deleteOfTextThatIsNotThere_namesTheEvent() {
        List<ProcessEvent> events = List.of(event(1, EventType.TEXT_INSERT.wireName(), 0, "abc"), event(2, EventType.TEXT_DELETE.wireName(), 1, "x"));
        ReplayException e = assertThrows(ReplayException.class, () -> TextReplay.replay("t1", events));
        assertEquals(2, e.seq());
        assertTrue(e.getMessage().contains("\"x\""), e.getMessage());
    }

    @Test
    void replay_positionOutsideTheText_namesTheEvent() {
        List<ProcessEvent> events = List.of(event(1, EventType.TEXT_INSERT.wireName(), 0, "abc"), event(2, EventType.TEXT_INSERT.wireName(), 9, "d"));
        assertEquals(2, assertThrows(ReplayException.class, () -> TextReplay.replay("t1", events)).seq());
    }

    @Test
    void replay_lengthDisagreeingWithText_namesTheEvent() {
        List<ProcessEvent> events = List.of(new ProcessEvent(1, AT, 1, EventType.TEXT_INSERT.wireName(), "t1",
                Map.of("pos", 0, "len", 2, "text", "abc")));
        assertEquals(1, assertThrows(ReplayException.class, () -> TextReplay.replay("t1", events)).seq());
    }

    @Test
    void compare_differentTexts_reportsTheFirstDifference() {
        ReplayMismatch m = TextReplay.compare("t1", "the cat sat", "the car sat").orElseThrow();
        assertEquals(6, m.firstDifference());
        assertTrue(TextReplay.compare("t1", "same", "same").isEmpty());
    }

    private static ProcessEvent event(long seq, String type, int pos, String text) {
        return new ProcessEvent(seq, AT, seq, type, "t1", Map.of("pos", pos, "len", text.length(), "text", text, "source", "typing"));
    }
}
