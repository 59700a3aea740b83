package org.inkgate.format.response;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.junit.jupiter.api.Assertions.fail;

import java.math.BigInteger;
import java.nio.charset.StandardCharsets;
import java.time.Instant;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.SplittableRandom;
import org.inkgate.format.refusal.MalformedJson;
import org.junit.jupiter.api.Test;

/**
 * The scanner against the reference it stands in front of: Jackson's binding of a line to
 * {@link EventChain.Line} (the mapper every file of Inkgate is read with). Whatever line the scanner
 * accepts, the binding accepts with the same values and the same kinds of number; lines as the
 * writer writes them are accepted, or nothing is gained; and damaged lines (bytes changed, dropped or
 * added at random, 200,000 of them) are either refused by the scanner or read exactly as the binding
 * reads them.
 */
class EventLineScannerTest {

    private static final List<String> TEXTS = List.of("", "a", "typing", "plain words", "quote \" and backslash \\",
            "tab\tnew\nline\r", "\u0000\u0001\u001f\u007f", "é ü ß – “curly”", "€ 中文 العربية", "\uD83D\uDE00 emoji",
            "/slash/ <tag> &amp;", "\u2028\u2029", "\b\f", "long ".repeat(400));

    /** What the scanner leaves to Jackson on purpose: text over its limit (numbers beyond a long are made below). */
    private static final String TOO_LONG = "x".repeat(EventLineScanner.MAX_TEXT + 1);

    @Test
    void writtenLines_areAccepted_andReadAsTheBindingReadsThem() {
        SplittableRandom random = new SplittableRandom(16);
        for (int round = 0; round < 5_000; round++) {
            byte[] line = written(random, false);
            assertTrue(check(line), () -> "a written line left to Jackson: " + new String(line, StandardCharsets.UTF_8));
            EventLineScanner scanner = new EventLineScanner(line);
            scanner.read(0);
            // the writer spells times as InstantText does: only an escape makes a written line not plain
            assertEquals(!contains(line, (byte) '\\'), scanner.plain(), () -> new String(line, StandardCharsets.UTF_8));
            check(written(random, true)); // with what is left to Jackson: refused, or read as the binding reads it
        }
    }

    @Test
    void damagedLines_areRefused_orReadAsTheBindingReadsThem() {
        SplittableRandom random = new SplittableRandom(2026);
        byte[] interesting = "\"\\{}[]:,.-+0123456789eEtruefalsn u/ \n\t".getBytes(StandardCharsets.UTF_8);
        int[] high = {0x80, 0xbf, 0xc0, 0xc2, 0xc3, 0xdf, 0xe0, 0xed, 0xef, 0xf0, 0xf4, 0xf5, 0xff, 0xa0, 0x9f, 0x90, 0x8f};
        int acceptedDamaged = 0;
        for (int round = 0; round < 200_000; round++) {
            byte[] line = written(random, random.nextInt(10) == 0);
            int changes = 1 + random.nextInt(3);
            for (int c = 0; c < changes; c++) {
                int at = random.nextInt(line.length);
                byte value = random.nextInt(4) == 0 ? (byte) high[random.nextInt(high.length)]
                        : interesting[random.nextInt(interesting.length)];
                line = switch (random.nextInt(3)) {
                    case 0 -> {
                        byte[] copy = line.clone();
                        copy[at] = value;
                        yield copy;
                    }
                    case 1 -> concat(Arrays.copyOfRange(line, 0, at), Arrays.copyOfRange(line, at + 1, line.length));
                    default -> concat(Arrays.copyOfRange(line, 0, at), new byte[] {value}, Arrays.copyOfRange(line, at, line.length));
                };
            }
            if (check(line)) {
                acceptedDamaged++;
            }
        }
        assertTrue(acceptedDamaged > 1_000, "damaged lines still in the writer's form, read: " + acceptedDamaged);
    }

    @Test
    void linesOfALog_areReadOneAfterAnother_withTheirEnds() {
        SplittableRandom random = new SplittableRandom(7);
        List<ProcessEvent> events = new ArrayList<>();
        for (int seq = 1; seq <= 300; seq++) {
            events.add(event(random, seq, false));
        }
        int read = readEachLine(EventChain.encode(events));
        assertEquals(300, read, "lines read by the scanner");
    }

    /**
     * One scanner over a log whose events repeat a few key sets, among them sets that differ only in a middle key
     * or in a value's kind, and keys outside ASCII or with escapes (new texts every time): every line reads as the
     * binding reads it alone, although the scanner shares key arrays between events with the same keys.
     */
    @Test
    void aLogOfRepeatedKeySets_readsEveryLineAsTheBindingReadsIt() {
        List<List<String>> sets = List.of(List.of("len", "pos", "source", "text"), List.of("len", "pos", "sourcf", "text"),
                List.of("len", "pos", "text"), List.of("len"), List.of("tool"), List.of("é", "len"),
                List.of("a\"b", "len"), List.of("hits", "micros", "pack", "query", "tool"));
        SplittableRandom random = new SplittableRandom(64);
        List<ProcessEvent> events = new ArrayList<>();
        for (int seq = 1; seq <= 5_000; seq++) {
            Map<String, Object> data = new LinkedHashMap<>();
            for (String key : sets.get(random.nextInt(sets.size()))) {
                data.put(key, random.nextBoolean() ? (Object) random.nextInt(100) : pick(random, TEXTS));
            }
            events.add(new ProcessEvent(seq, Instant.ofEpochSecond(1_780_000_000L + seq), seq, "text.insert", "t1", data));
        }
        int read = readEachLine(EventChain.encode(events));
        assertEquals(5_000, read, "lines read by the scanner");
    }

    /**
     * Reads a log's lines one after another with one scanner, each as the binding reads it alone and ending where it
     * ends; returns how many the scanner read.
     */
    private static int readEachLine(byte[] log) {
        EventLineScanner scanner = new EventLineScanner(log);
        int start = 0;
        int read = 0;
        while (start < log.length) {
            int end = start;
            while (log[end] != '\n') {
                end++;
            }
            EventChain.Line line = scanner.read(start);
            if (line != null) {
                assertEquals(end, scanner.lineEnd());
                assertEquals(bound(Arrays.copyOfRange(log, start, end)), scanner.withPrevText(line));
                read++;
            }
            start = end + 1;
        }
        return read;
    }

    /** True if the scanner accepted the line; fails if it accepted what the binding refuses or reads otherwise. */
    private static boolean check(byte[] line) {
        EventLineScanner scanner = new EventLineScanner(line);
        EventChain.Line scanned = scanner.read(0);
        if (scanned == null || scanner.lineEnd() != line.length) {
            return false;
        }
        if (scanned.prev() == null && !lowerHexDigits(line, scanner.prevFrom(), EventLineScanner.PREV_DIGITS)) {
            return false; // prev left as bytes that spell no digest: the chain never takes the line as read (EventChain)
        }
        EventChain.Line reference = bound(line);
        String shown = new String(line, StandardCharsets.UTF_8);
        if (reference == null) {
            fail("the scanner accepted a line the binding refuses: " + shown);
        }
        assertEquals(reference, scanner.withPrevText(scanned), shown);
        for (Map.Entry<String, Object> e : reference.data().entrySet()) {
            assertEquals(e.getValue().getClass(), scanned.data().get(e.getKey()).getClass(), () -> "kind of " + e.getKey() + " in " + shown);
        }
        if (scanner.plain()) {
            assertPlainFields(line, scanner.fields(), reference, shown);
        }
        return true;
    }

    /**
     * A plain line's fields are byte for byte the JSON the mapper writes for the binding's values (texts without
     * their quotes), as {@link EventLines} promises: whatever reads the bytes instead of the values reads the same.
     */
    private static void assertPlainFields(byte[] line, int[] fields, EventChain.Line reference, String shown) {
        assertTrue(!contains(line, (byte) '\\'), () -> "plain with an escape: " + shown);
        assertEquals(json(reference.seq()), span(line, fields, EventLines.Field.SEQ), shown);
        assertEquals(unquoted(json(reference.at())), span(line, fields, EventLines.Field.AT), shown);
        assertEquals(json(reference.mono()), span(line, fields, EventLines.Field.MONO), shown);
        assertEquals(unquoted(json(reference.type())), span(line, fields, EventLines.Field.TYPE), shown);
        if (reference.task() == null) {
            assertEquals(-1, fields[2 * EventLines.Field.TASK.ordinal()], shown);
        } else {
            assertEquals(unquoted(json(reference.task())), span(line, fields, EventLines.Field.TASK), shown);
        }
        assertEquals(json(reference.data()), span(line, fields, EventLines.Field.DATA), shown);
    }

    private static String json(Object value) {
        return new String(org.inkgate.format.json.Json.writeLine(value), StandardCharsets.UTF_8);
    }

    private static String unquoted(String jsonText) {
        return jsonText.substring(1, jsonText.length() - 1);
    }

    private static String span(byte[] line, int[] fields, EventLines.Field field) {
        int from = fields[2 * field.ordinal()];
        return new String(line, from, fields[2 * field.ordinal() + 1] - from, StandardCharsets.UTF_8);
    }

    private static boolean lowerHexDigits(byte[] bytes, int from, int count) {
        for (int k = from; k < from + count; k++) {
            if (Character.digit(bytes[k], 16) < 0 || bytes[k] >= 'A' && bytes[k] <= 'F') {
                return false;
            }
        }
        return true;
    }

    private static boolean contains(byte[] bytes, byte wanted) {
        for (byte b : bytes) {
            if (b == wanted) {
                return true;
            }
        }
        return false;
    }

    private static EventChain.Line bound(byte[] line) {
        try {
            return EventChain.bind("f", "events.jsonl", line, 0, line.length, 1);
        } catch (MalformedJson refused) {
            return null;
        }
    }

    private static byte[] written(SplittableRandom random, boolean unusual) {
        byte[] log = EventChain.encode(List.of(event(random, 1, unusual)));
        return Arrays.copyOf(log, log.length - 1);
    }

    /** An event as the writer makes them; an unusual one also has over-long text or a number beyond a long. */
    private static ProcessEvent event(SplittableRandom random, long seq, boolean unusual) {
        Map<String, Object> data = new LinkedHashMap<>();
        int fields = random.nextInt(6);
        for (int f = 0; f < fields; f++) {
            data.put(pick(random, TEXTS) + f, switch (random.nextInt(7)) {
                case 0, 1 -> pick(random, TEXTS);
                case 2 -> random.nextInt();
                case 3 -> random.nextLong();
                case 4 -> random.nextBoolean();
                case 5 -> -random.nextInt(1000);
                default -> (long) random.nextInt(1000);
            });
        }
        if (unusual) {
            data.put(random.nextBoolean() ? "big" : TOO_LONG, random.nextBoolean() ? TOO_LONG
                    : new BigInteger(100, new java.util.Random(random.nextLong())));
        }
        String task = random.nextInt(4) == 0 ? null : pick(random, TEXTS);
        Instant at = Instant.ofEpochSecond(1_700_000_000L + random.nextInt(100_000_000),
                random.nextInt(4) == 0 ? 0 : random.nextInt(1_000_000_000));
        long mono = random.nextInt(10) == 0 ? -random.nextLong(Long.MAX_VALUE) : random.nextLong(Long.MAX_VALUE);
        return new ProcessEvent(seq, at, mono, pick(random, TEXTS), task, data);
    }

    private static byte[] concat(byte[]... parts) {
        int n = 0;
        for (byte[] p : parts) {
            n += p.length;
        }
        byte[] out = new byte[n];
        int at = 0;
        for (byte[] p : parts) {
            System.arraycopy(p, 0, out, at, p.length);
            at += p.length;
        }
        return out;
    }

    private static <T> T pick(SplittableRandom random, List<T> from) {
        return from.get(random.nextInt(from.size()));
    }
}
