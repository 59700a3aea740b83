package org.inkgate.admin.core.store;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.math.BigInteger;
import java.nio.charset.StandardCharsets;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.SplittableRandom;
import java.util.TreeMap;
import org.inkgate.format.json.Json;
import org.junit.jupiter.api.Test;

/**
 * EventText writes event data itself where it can; the reference for both of its texts is the old
 * path it replaces: Jackson's compact JSON ({@code Json.writeLine}, the library the store's JSON
 * always came from) and {@code Map.toString} (the JDK's, which the content digest hashes).
 */
class EventTextTest {

    @Test
    void everySingleCharacterAsKeyAndValue_isWrittenAsJacksonAndToStringWriteIt() {
        for (int c = 0; c <= 0xFFFF; c++) {
            String s = String.valueOf((char) c);
            check(sorted("k", s));
            check(sorted(s, 1));
        }
    }

    @Test
    void randomMapsOfEveryValueKind_areWrittenAsJacksonAndToStringWriteThem() {
        SplittableRandom random = new SplittableRandom(16);
        for (int round = 0; round < 20_000; round++) {
            TreeMap<String, Object> data = new TreeMap<>();
            int n = random.nextInt(6);
            for (int i = 0; i < n; i++) {
                data.put(text(random, 6), value(random));
            }
            check(java.util.Collections.unmodifiableMap(data));
        }
    }

    @Test
    void aMapNotSortedByKey_isWrittenAsJacksonAndToStringWriteIt() {
        java.util.LinkedHashMap<String, Object> data = new java.util.LinkedHashMap<>();
        data.put("text", "b");
        data.put("pos", 3);
        data.put("len", 1);
        check(data);
        data.put("pos", 4); // same order, other value
        check(data);
    }

    private static Object value(SplittableRandom random) {
        return switch (random.nextInt(12)) {
            case 0, 1, 2 -> text(random, 20);
            case 3 -> random.nextInt();
            case 4 -> random.nextInt(1000);
            case 5 -> random.nextLong();
            case 6 -> random.nextBoolean();
            case 7 -> random.nextDouble() * 1e6;
            case 8 -> new BigInteger(80, new java.util.Random(random.nextLong()));
            case 9 -> List.of(random.nextInt(9), text(random, 3));
            case 10 -> new TreeMap<>(Map.of(text(random, 3), random.nextInt(9)));
            default -> "typed";
        };
    }

    /** Mostly letters, now and then a character JSON escapes, one outside ASCII, or a surrogate. */
    private static String text(SplittableRandom random, int max) {
        StringBuilder out = new StringBuilder();
        int n = random.nextInt(max + 1);
        for (int i = 0; i < n; i++) {
            int kind = random.nextInt(40);
            out.append(switch (kind) {
                case 0 -> (char) random.nextInt(0x20);
                case 1 -> '"';
                case 2 -> '\\';
                case 3 -> (char) (0xD800 + random.nextInt(0x800));
                case 4 -> (char) (0x80 + random.nextInt(0xFF80 - 0x80));
                case 5 -> ' ';
                default -> (char) ('a' + random.nextInt(26));
            });
        }
        return out.toString();
    }

    private static Map<String, Object> sorted(String key, Object value) {
        return java.util.Collections.unmodifiableMap(new TreeMap<>(Map.of(key, value)));
    }

    private static void check(Map<String, Object> data) {
        StringBuilder digest = new StringBuilder("seq|at|");
        String json = EventText.json(data, new StringBuilder(), digest);
        assertEquals(new String(Json.writeLine(data), StandardCharsets.UTF_8), json, () -> "JSON of " + escaped(data));
        assertEquals("seq|at|" + data, digest.toString(), () -> "digest text of " + escaped(data));
        // the event log written from the map in one pass: the same array as from the reference JSON, the same digest text
        StringBuilder viaMap = new StringBuilder("seq|at|");
        String logFromMap = new EventLog(1).add(7, "at", -3, "type", null, data, viaMap).text();
        String logFromJson = new EventLog(1).add(7, "at", -3, "type", null, new String(Json.writeLine(data),
                StandardCharsets.UTF_8)).text();
        assertEquals(logFromJson, logFromMap, () -> "event log of " + escaped(data));
        assertEquals("seq|at|" + data, viaMap.toString(), () -> "digest text via the log of " + escaped(data));
    }

    private static String escaped(Map<String, Object> data) {
        List<String> out = new ArrayList<>();
        data.forEach((k, v) -> out.add(k.chars().mapToObj(c -> String.format("\\u%04x", c)).reduce("", String::concat)
                + "=" + v));
        return out.toString();
    }
}
