package org.inkgate.format.response;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertNull;
import static org.junit.jupiter.api.Assertions.assertSame;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.charset.StandardCharsets;
import java.time.Instant;
import java.util.ArrayList;
import java.util.Collections;
import java.util.List;
import java.util.Map;
import java.util.TreeMap;
import org.junit.jupiter.api.Test;

/**
 * The line reader's data map against the JDK's own sorted map (the reference: {@link TreeMap}
 * wrapped read-only, which is what an event held before): equal both ways, the same hash code,
 * text, order and answers, and read-only.
 */
class EventDataTest {

    private static Map<String, Object> read(String dataJson) {
        String line = "{\"seq\":1,\"at\":\"2026-06-15T09:00:00Z\",\"mono\":0,\"type\":\"text.insert\",\"data\":" + dataJson
                + ",\"prev\":\"" + "0".repeat(64) + "\"}";
        byte[] bytes = line.getBytes(StandardCharsets.UTF_8);
        EventChain.Line parsed = EventLineReader.read(bytes, 0, bytes.length);
        return new ProcessEvent(parsed.seq(), parsed.at(), parsed.mono(), parsed.type(), parsed.task(), parsed.data()).data();
    }

    @Test
    void sortedData_behavesAsTheJdksSortedMap() {
        Map<String, Object> data = read("{\"at\":7,\"length\":2147483648,\"ok\":true,\"text\":\"h\\u00e9\"}");
        Map<String, Object> reference = new TreeMap<>(Map.of("at", 7, "length", 2_147_483_648L, "ok", true, "text", "h\u00e9"));
        assertEquals(EventData.class, data.getClass(), "the writer's order takes the array map");
        assertEquals(reference, data);
        assertEquals(data, reference);
        assertEquals(reference.hashCode(), data.hashCode());
        assertEquals(reference.toString(), data.toString(), "the content digest hashes this text");
        assertEquals(new ArrayList<>(reference.keySet()), new ArrayList<>(data.keySet()));
        assertEquals(new ArrayList<>(reference.values()), new ArrayList<>(data.values()));
        for (String key : List.of("at", "length", "ok", "text", "absent", "")) {
            assertEquals(reference.get(key), data.get(key), key);
            assertEquals(reference.containsKey(key), data.containsKey(key), key);
        }
        assertNull(data.get(7));
        assertFalse(data.containsKey(null));
    }

    @Test
    void data_isReadOnly() {
        Map<String, Object> data = read("{\"a\":1,\"b\":2}");
        assertThrows(UnsupportedOperationException.class, () -> data.put("c", 3));
        assertThrows(UnsupportedOperationException.class, () -> data.remove("a"));
        assertThrows(UnsupportedOperationException.class, data::clear);
        var entries = data.entrySet().iterator();
        var first = entries.next();
        assertThrows(UnsupportedOperationException.class, () -> first.setValue(9));
        assertThrows(UnsupportedOperationException.class, entries::remove);
        assertEquals(Map.of("a", 1, "b", 2), data);
    }

    @Test
    void keysOutOfOrderOrRepeated_areSortedOrLeftToTheBinding() {
        Map<String, Object> unordered = read("{\"b\":1,\"a\":2}");
        assertEquals(new TreeMap<>(Map.of("a", 2, "b", 1)), unordered);
        assertEquals("{a=2, b=1}", unordered.toString());
        byte[] repeated = ("{\"seq\":1,\"at\":\"2026-06-15T09:00:00Z\",\"mono\":0,\"type\":\"t\",\"data\":{\"a\":1,\"a\":2},"
                + "\"prev\":\"x\"}").getBytes(StandardCharsets.UTF_8);
        assertNull(EventLineReader.read(repeated, 0, repeated.length), "a repeated key goes to the binding, which refuses it");
    }

    @Test
    void emptyData_andDataGivenByCode_stayAsBefore() {
        assertEquals(Collections.emptyMap(), read("{}"));
        assertSame(read("{}"), read("{}"));
        Map<String, Object> given = new java.util.HashMap<>(Map.of("z", 1, "a", 2));
        ProcessEvent e = new ProcessEvent(1, Instant.EPOCH, 0, "t", null, given);
        given.put("m", 3);
        assertEquals(Map.of("z", 1, "a", 2), e.data(), "a caller's map is copied");
        assertEquals("{a=2, z=1}", e.data().toString());
    }
}
