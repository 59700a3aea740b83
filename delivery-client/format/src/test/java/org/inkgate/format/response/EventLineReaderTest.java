package org.inkgate.format.response;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.math.BigInteger;
import java.nio.charset.StandardCharsets;
import java.time.Instant;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Random;
import org.inkgate.format.refusal.MalformedJson;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.ValueSource;

/**
 * The streaming reader of event lines against the reference: Jackson's own binding of the same line
 * with the project's mapper ({@link EventChain#bind}). For every line, either the streaming reader
 * leaves the line to the binding (null), or the binding accepts it and gives an equal line: equal
 * numbers, texts and time, and data values of the same classes (Integer, Long or BigInteger, as
 * the binding picks them by size). A line the binding refuses is never accepted by the streaming
 * reader. Lines as the writer writes them must take the streaming path, or nothing is gained.
 */
class EventLineReaderTest {

    private static final String PREV = EventChain.GENESIS;

    /** Awkward text: escapes, control characters, quotes, backslashes, non-ASCII, pairs and lone surrogates. */
    private static final List<String> TEXTS = List.of("", "a", "plain words", "quote \" and backslash \\", "tab\tnew\nline\r",
            "\u0000\u0001\u001f\u007f", "é ü ß – “curly”", "€ 中文 العربية", "\uD83D\uDE00 emoji", "\uD800", "\uDFFF",
            "x\uDBFF\uDFFFy", "/slash/ <tag> &amp;", "\u2028\u2029", "long ".repeat(400));

    /** JSON numbers of every size, as text, so the binding and the streaming reader each read them. */
    private static final List<String> NUMBERS = List.of("0", "-0", "1", "-1", "2147483647", "2147483648", "-2147483648",
            "-2147483649", "9223372036854775807", "9223372036854775808", "-9223372036854775808", "-9223372036854775809",
            "123456789012345678901234567890", "1.0", "-0.0", "1e3", "1E-3", "2.5e+300", "0.1", "3.141592653589793238462643");

    @Test
    void writtenEvents_takeTheStreamingPath_andReadAsTheBindingReadsThem() {
        Random random = new Random(16);
        int streamed = 0;
        for (int i = 0; i < 5_000; i++) {
            Map<String, Object> data = new LinkedHashMap<>();
            int fields = random.nextInt(6);
            for (int f = 0; f < fields; f++) {
                data.put(pick(random, TEXTS) + f, switch (random.nextInt(6)) {
                    case 0 -> pick(random, TEXTS);
                    case 1 -> random.nextInt();
                    case 2 -> random.nextLong();
                    case 3 -> random.nextBoolean();
                    case 4 -> new BigInteger(100, random);
                    default -> (long) random.nextInt(1000);
                });
            }
            String task = random.nextInt(4) == 0 ? null : pick(random, TEXTS);
            Instant at = Instant.ofEpochSecond(1_700_000_000L + random.nextInt(100_000_000), random.nextInt(4) == 0 ? 0 : random.nextInt(1_000_000_000));
            ProcessEvent event = new ProcessEvent(1, at, random.nextLong(), pick(random, TEXTS), task, data);
            byte[] line = oneLine(event);
            assertSameAsBinding(line);
            if (bindingAccepts(line)) { // not always: Jackson writes a lone low surrogate in a key that its reader refuses
                EventChain.Line fast = EventLineReader.read(line, 0, line.length);
                assertNotNull(fast, () -> "a written line left to the binding: " + new String(line, StandardCharsets.UTF_8));
                streamed++;
            }
        }
        assertTrue(streamed > 2_500, "lines the binding accepts, all streamed: " + streamed);
    }

    @Test
    void handWrittenData_ofEveryKind_readsAsTheBindingReadsIt() {
        Random random = new Random(1603);
        for (int i = 0; i < 5_000; i++) {
            StringBuilder data = new StringBuilder("{");
            int fields = random.nextInt(5);
            for (int f = 0; f < fields; f++) {
                if (f > 0) {
                    data.append(random.nextBoolean() ? "," : " , ");
                }
                data.append(jsonText(random, pick(random, TEXTS) + f)).append(':').append(value(random, 0));
            }
            data.append('}');
            String line = "{\"seq\":" + pick(random, NUMBERS) + ",\"at\":\"2026-03-14T09:00:18.180Z\",\"mono\":" + pick(random, NUMBERS)
                    + ",\"type\":\"text.insert\",\"task\":\"t1\",\"data\":" + data + ",\"prev\":\"" + PREV + "\"}";
            assertSameAsBinding(line.getBytes(StandardCharsets.UTF_8));
        }
    }

    @ParameterizedTest
    @ValueSource(strings = {
        // the writer's shape, in other field orders, with spacing, without task or with a null task
        "{\"seq\":1,\"at\":\"2026-03-14T09:00:18.180Z\",\"mono\":5,\"type\":\"text.insert\",\"task\":\"t1\",\"data\":{\"len\":1},\"prev\":\"P\"}",
        "{\"prev\":\"P\",\"data\":{},\"type\":\"sitting.start\",\"mono\":0,\"at\":\"2026-03-14T09:00:18Z\",\"seq\":1}",
        " { \"seq\" : 1 , \"at\" : \"2026-03-14T09:00:18.1Z\" , \"mono\" : -5 , \"type\" : \"x\" , \"data\" : { } , \"prev\" : \"P\" } ",
        "{\"seq\":1,\"at\":\"2026-03-14T09:00:18Z\",\"mono\":0,\"type\":\"x\",\"task\":null,\"data\":{},\"prev\":\"P\"}",
        // what the binding decides: missing, null, unknown, repeated fields, wrong kinds, other times, trailing content
        "{\"at\":\"2026-03-14T09:00:18Z\",\"mono\":0,\"type\":\"x\",\"data\":{},\"prev\":\"P\"}",
        "{\"seq\":1,\"at\":\"2026-03-14T09:00:18Z\",\"mono\":0,\"type\":\"x\",\"prev\":\"P\"}",
        "{\"seq\":1,\"at\":\"2026-03-14T09:00:18Z\",\"mono\":0,\"type\":\"x\",\"data\":null,\"prev\":\"P\"}",
        "{\"seq\":null,\"at\":\"2026-03-14T09:00:18Z\",\"mono\":0,\"type\":\"x\",\"data\":{},\"prev\":\"P\"}",
        "{\"seq\":1,\"at\":\"2026-03-14T09:00:18Z\",\"mono\":0,\"type\":null,\"data\":{},\"prev\":\"P\"}",
        "{\"seq\":1,\"at\":\"2026-03-14T09:00:18Z\",\"mono\":0,\"type\":\"x\",\"data\":{},\"prev\":null}",
        "{\"seq\":1,\"at\":\"2026-03-14T09:00:18Z\",\"mono\":0,\"type\":\"x\",\"data\":{},\"prev\":\"P\",\"extra\":1}",
        "{\"seq\":1,\"seq\":2,\"at\":\"2026-03-14T09:00:18Z\",\"mono\":0,\"type\":\"x\",\"data\":{},\"prev\":\"P\"}",
        "{\"seq\":1,\"at\":\"2026-03-14T09:00:18Z\",\"mono\":0,\"type\":\"x\",\"data\":{\"a\":1,\"a\":2},\"prev\":\"P\"}",
        "{\"seq\":\"1\",\"at\":\"2026-03-14T09:00:18Z\",\"mono\":0,\"type\":\"x\",\"data\":{},\"prev\":\"P\"}",
        "{\"seq\":1.0,\"at\":\"2026-03-14T09:00:18Z\",\"mono\":0,\"type\":\"x\",\"data\":{},\"prev\":\"P\"}",
        "{\"seq\":true,\"at\":\"2026-03-14T09:00:18Z\",\"mono\":0,\"type\":\"x\",\"data\":{},\"prev\":\"P\"}",
        "{\"seq\":1,\"at\":\"2026-03-14T09:00:18Z\",\"mono\":9223372036854775808,\"type\":\"x\",\"data\":{},\"prev\":\"P\"}",
        "{\"seq\":1,\"at\":\"2026-03-14T09:00:18Z\",\"mono\":0,\"type\":5,\"data\":{},\"prev\":\"P\"}",
        "{\"seq\":1,\"at\":\"2026-03-14T09:00:18Z\",\"mono\":0,\"type\":\"x\",\"task\":7,\"data\":{},\"prev\":\"P\"}",
        "{\"seq\":1,\"at\":\"2026-03-14T09:00:18Z\",\"mono\":0,\"type\":\"x\",\"data\":[],\"prev\":\"P\"}",
        "{\"seq\":1,\"at\":\"2026-03-14T09:00:18Z\",\"mono\":0,\"type\":\"x\",\"data\":\"{}\",\"prev\":\"P\"}",
        "{\"seq\":1,\"at\":\"2026-03-14T09:00:18+01:00\",\"mono\":0,\"type\":\"x\",\"data\":{},\"prev\":\"P\"}",
        "{\"seq\":1,\"at\":\"2026-02-30T00:00:00Z\",\"mono\":0,\"type\":\"x\",\"data\":{},\"prev\":\"P\"}",
        "{\"seq\":1,\"at\":1710406818,\"mono\":0,\"type\":\"x\",\"data\":{},\"prev\":\"P\"}",
        "{\"seq\":1,\"at\":\"2026-03-14T09:00:18Z\",\"mono\":0,\"type\":\"x\",\"data\":{},\"prev\":\"P\"} {}",
        "{\"seq\":1,\"at\":\"2026-03-14T09:00:18Z\",\"mono\":0,\"type\":\"x\",\"data\":{},\"prev\":\"P\"}x",
        "{\"seq\":1,\"at\":\"2026-03-14T09:00:18Z\",\"mono\":0,\"type\":\"x\",\"data\":{},\"prev\":\"P\"",
        "{\"seq\":1,\"at\":\"2026-03-14T09:00:18Z\",\"mono\":0,\"type\":\"x\",\"data\":{\"a\":},\"prev\":\"P\"}",
        "{\"seq\":1,\"at\":\"2026-03-14T09:00:18Z\",\"mono\":0,\"type\":\"bad \u0001 raw\",\"data\":{},\"prev\":\"P\"}",
        "{\"seq\":1,\"at\":\"2026-03-14T09:00:18Z\",\"mono\":0,\"type\":\"\\uD800\",\"data\":{\"\\uDC00\":\"\\ud83d\\ude00\"},\"prev\":\"P\"}",
        "{'seq':1}", "[]", "null", "", "   ", "1", "{}"})
    void edgeLines_areReadAsTheBindingReadsThem_orLeftToIt(String line) {
        assertSameAsBinding(line.getBytes(StandardCharsets.UTF_8));
    }

    /**
     * One parser over a whole log against the reference of a parser per line (the reading before
     * it, itself checked against the binding above): every line gives the same answer, wherever in
     * the log an odd line stands, and a log as the writer writes it is read by the one parser to the end.
     */
    @Test
    void aWholeLog_readByOneParser_givesEveryLineAsReadAlone() {
        Random random = new Random(29);
        List<String> written = new java.util.ArrayList<>();
        for (int i = 0; i < 40; i++) {
            Map<String, Object> data = new LinkedHashMap<>();
            data.put("text", pick(random, TEXTS));
            data.put("pos", random.nextInt(1000));
            byte[] line = oneLine(new ProcessEvent(1, Instant.ofEpochSecond(1_700_000_000L + i, random.nextInt(1_000_000_000)),
                    random.nextLong(), "text.insert", i % 3 == 0 ? null : "t1", data));
            if (bindingAccepts(line)) {
                written.add(new String(line, StandardCharsets.UTF_8));
            }
        }
        String good = "{\"seq\":1,\"at\":\"2026-03-14T09:00:18Z\",\"mono\":0,\"type\":\"x\",\"data\":{\"n\":1},\"prev\":\"P\"}";
        List<String> odd = List.of(" " + good, good + " ", good + "\r", good + " {}", good + "x", good.substring(0, good.length() - 1),
                good.replace("{\"n\":1}", "{\"n\":1.5}"), good.replace("{\"n\":1}", "{\"b\":1,\"a\":2}"), "", "{}", "[]",
                "{\"seq\":1,", "\"text\"", good + "\n" + good);
        assertTrue(sameAsAlone(String.join("\n", written) + "\n"), "a written log is read by the one parser to its end");
        for (String line : odd) {
            for (int at : List.of(0, 1, written.size() / 2, written.size())) {
                List<String> lines = new java.util.ArrayList<>(written);
                lines.add(at, line);
                sameAsAlone(String.join("\n", lines) + "\n");
            }
        }
    }

    /** Reads the log both ways, line by line, asserting the same answers; whether the one parser lasted to the end. */
    private static boolean sameAsAlone(String log) {
        byte[] bytes = log.getBytes(StandardCharsets.UTF_8);
        try (EventLineReader.Log shared = new EventLineReader.Log(bytes)) {
            int start = 0;
            for (int end = 0; end < bytes.length; end++) {
                if (bytes[end] == '\n') {
                    String shown = new String(bytes, start, end - start, StandardCharsets.UTF_8);
                    assertEquals(EventLineReader.read(bytes, start, end - start), shared.read(start, end), shown);
                    start = end + 1;
                }
            }
            return shared.shared();
        }
    }

    @Test
    void aLineInsideALargerBuffer_isReadFromItsOwnBytesOnly() {
        String line = "{\"seq\":1,\"at\":\"2026-03-14T09:00:18Z\",\"mono\":0,\"type\":\"x\",\"data\":{\"n\":12},\"prev\":\"P\"}";
        byte[] buffer = ("garbage\n" + line + "\nmore garbage").getBytes(StandardCharsets.UTF_8);
        EventChain.Line read = EventLineReader.read(buffer, 8, line.length());
        assertEquals(new EventChain.Line(1, Instant.parse("2026-03-14T09:00:18Z"), 0, "x", null, Map.of("n", 12), "P"), read);
    }

    @Test
    void invalidUtf8_isLeftToTheBinding() {
        byte[] line = "{\"seq\":1,\"at\":\"2026-03-14T09:00:18Z\",\"mono\":0,\"type\":\"?\",\"data\":{},\"prev\":\"P\"}"
                .getBytes(StandardCharsets.UTF_8);
        line[new String(line, StandardCharsets.UTF_8).indexOf('?')] = (byte) 0xC3; // a lead byte where the type's text is, with no continuation
        assertNull(EventLineReader.read(line, 0, line.length));
        assertSameAsBinding(line);
    }

    private static void assertSameAsBinding(byte[] line) {
        String shown = new String(line, StandardCharsets.UTF_8);
        EventChain.Line fast = EventLineReader.read(line, 0, line.length);
        EventChain.Line bound;
        try {
            bound = EventChain.bind("f", "events.jsonl", line, 0, line.length, 1);
        } catch (MalformedJson refused) {
            assertNull(fast, () -> "accepted a line the binding refuses (" + refused.getMessage() + "): " + shown);
            return;
        }
        if (fast == null) {
            return; // left to the binding, which is what runs then
        }
        assertEquals(bound, fast, shown);
        for (Map.Entry<String, Object> e : bound.data().entrySet()) {
            assertEquals(e.getValue().getClass(), fast.data().get(e.getKey()).getClass(), () -> "the class of " + e.getKey() + " in " + shown);
        }
        assertTrue(bound.data().keySet().equals(fast.data().keySet()), shown);
    }

    private static boolean bindingAccepts(byte[] line) {
        try {
            EventChain.bind("f", "events.jsonl", line, 0, line.length, 1);
            return true;
        } catch (MalformedJson refused) {
            return false;
        }
    }

    private static byte[] oneLine(ProcessEvent event) {
        byte[] log = EventChain.encode(List.of(event));
        return java.util.Arrays.copyOf(log, log.length - 1); // without its newline
    }

    private static String value(Random random, int depth) {
        return switch (random.nextInt(depth > 1 ? 5 : 7)) {
            case 0 -> jsonText(random, pick(random, TEXTS));
            case 1 -> pick(random, NUMBERS);
            case 2 -> random.nextBoolean() ? "true" : "false";
            case 3 -> "null";
            case 4 -> pick(random, NUMBERS);
            case 5 -> "{\"in\":" + value(random, depth + 1) + ",\"deeper\":{\"x\":" + value(random, depth + 1) + "}}";
            default -> "[" + value(random, depth + 1) + "," + value(random, depth + 1) + "]";
        };
    }

    /** Text as JSON, with escapes chosen at random: short forms, \\u forms (also for surrogates) or raw characters where JSON allows. */
    private static String jsonText(Random random, String text) {
        StringBuilder out = new StringBuilder("\"");
        for (char c : text.toCharArray()) {
            boolean mustEscape = c < 0x20 || c == '"' || c == '\\';
            if (mustEscape || Character.isSurrogate(c) || random.nextInt(8) == 0) {
                switch (c) {
                    case '"' -> out.append("\\\"");
                    case '\\' -> out.append("\\\\");
                    case '\n' -> out.append(random.nextBoolean() ? "\\n" : "\\u000a");
                    case '\t' -> out.append("\\t");
                    case '/' -> out.append("\\/");
                    default -> out.append(String.format(random.nextBoolean() ? "\\u%04x" : "\\u%04X", (int) c));
                }
            } else {
                out.append(c);
            }
        }
        return out.append('"').toString();
    }

    private static <T> T pick(Random random, List<T> from) {
        return from.get(random.nextInt(from.size()));
    }
}
