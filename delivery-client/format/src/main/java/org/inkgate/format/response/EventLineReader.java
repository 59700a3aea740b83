package org.inkgate.format.response;

import com.fasterxml.jackson.core.JsonParser;
import com.fasterxml.jackson.core.JsonToken;
import java.io.IOException;
import java.time.Instant;
import java.util.Arrays;
import java.util.Map;
import java.util.TreeMap;
import org.inkgate.format.json.Json;

/**
 * Reads one event line with Jackson's streaming parser (the same parser, features and limits as
 * {@link Json#mapper()}, but repeated names found here rather than by the parser) instead of binding it to {@link EventChain.Line} by reflection: binding
 * every line of a log was about half of opening a package (docs/benchmarks.md, issue 16).
 *
 * <p>It reads only the shape the writer produces: the seven fields in any order, {@code task}
 * missing or a string, whole numbers for {@code seq} and {@code mono}, the writer's own form of a
 * time, and data values that are text, whole numbers or booleans. For anything else (a missing or
 * unknown field, a null, a decimal, a list, a nested object, an unusual time, a syntax error) it
 * answers null and the caller binds the line as before, so exactly the same lines are accepted
 * and refused, with the same messages; {@code EventLineReaderTest} checks the values against the
 * binding's.
 */
final class EventLineReader {

    private EventLineReader() {
    }

    /** The line, or null if the binding must decide (anything outside the writer's shape, or an error). */
    static EventChain.Line read(byte[] bytes, int offset, int length) {
        EventLineScanner scanner = new EventLineScanner(bytes);
        EventChain.Line scanned = scanner.read(offset);
        if (scanned != null && scanner.lineEnd() == offset + length) {
            return scanner.withPrevText(scanned);
        }
        return parse(bytes, offset, length);
    }

    /** The line read by Jackson's streaming parser alone, or null if the binding must decide. */
    static EventChain.Line parse(byte[] bytes, int offset, int length) {
        try (JsonParser p = Json.mapper().createParser(bytes, offset, length)) {
            // this reader finds repeated names itself (and leaves such a line to the binding, which refuses it);
            // the parser's own detection keeps a hash set per object, a tenth of a collect's reading time
            p.disable(JsonParser.Feature.STRICT_DUPLICATE_DETECTION);
            EventChain.Line line = readObject(p);
            // trailing content after the object: the binding refuses it
            return line != null && p.nextToken() == null ? line : null;
        } catch (IOException | RuntimeException e) {
            return null; // the binding reports it, located as before
        }
    }

    /**
     * The lines of one log read by one parser, one after the other, instead of a parser per line:
     * making a parser (its buffers and its table of names) for each of 5,000 lines was about a
     * quarter of reading a log (docs/benchmarks.md, issue 16). The caller finds each line's bounds
     * itself; a line is taken from this parser only if its object starts exactly at the line's
     * start and ends exactly at its end. At the first line that is anything else (space around the
     * object, an object running over the line's end, anything this reader leaves to the binding)
     * this parser is given up, and that line and every later one are read one by one as before, so
     * exactly the same lines are accepted and refused, with the same messages.
     */
    static final class Log implements AutoCloseable {

        private final byte[] bytes;
        private JsonParser parser;
        /** Where the parser's input starts in the bytes (its offsets count from there). */
        private int base;
        /** Where the line after the parser's last one starts. */
        private int next = -1;

        Log(byte[] bytes) {
            this.bytes = bytes;
        }

        /** The line from {@code start} to {@code end} (its newline), or null if the binding must decide. */
        EventChain.Line read(int start, int end) {
            if (parser == null || start != next) {
                // the first line read here, or lines in between were read by the scanner: start again at this line
                close();
                try {
                    parser = Json.mapper().createParser(bytes, start, bytes.length - start);
                    parser.disable(JsonParser.Feature.STRICT_DUPLICATE_DETECTION);
                    base = start;
                } catch (IOException e) {
                    return EventLineReader.parse(bytes, start, end - start);
                }
            }
            try {
                if (parser.nextToken() == JsonToken.START_OBJECT
                        && base + parser.currentTokenLocation().getByteOffset() == start) {
                    EventChain.Line line = readFields(parser);
                    if (line != null && base + parser.currentLocation().getByteOffset() == end) {
                        next = end + 1;
                        return line;
                    }
                }
            } catch (IOException | RuntimeException e) {
                // as below: the line on its own decides
            }
            close();
            return EventLineReader.parse(bytes, start, end - start);
        }

        /** Whether the parser reads on from the last line (tests: a writer's log never gives it up). */
        boolean shared() {
            return parser != null;
        }

        @Override
        public void close() {
            if (parser != null) {
                try {
                    parser.close();
                } catch (IOException ignored) {
                    // nothing was written; the parser only read from memory
                }
                parser = null;
            }
        }
    }

    private static EventChain.Line readObject(JsonParser p) throws IOException {
        if (p.nextToken() != JsonToken.START_OBJECT) {
            return null;
        }
        return readFields(p);
    }

    /** The fields of an event object whose opening brace was just read. */
    private static EventChain.Line readFields(JsonParser p) throws IOException {
        long seq = 0;
        long mono = 0;
        Instant at = null;
        String type = null;
        String task = null;
        Map<String, Object> data = null;
        String prev = null;
        int seen = 0;
        JsonToken token;
        while ((token = p.nextToken()) == JsonToken.FIELD_NAME) {
            String name = p.currentName();
            JsonToken value = p.nextToken();
            int bit = bit(name);
            if (bit == 0 || (seen & bit) != 0) {
                return null; // unknown or repeated
            }
            seen |= bit;
            switch (name) {
                case "seq" -> {
                    if (!isLong(p, value)) {
                        return null;
                    }
                    seq = p.getLongValue();
                }
                case "at" -> {
                    at = value == JsonToken.VALUE_STRING ? org.inkgate.format.json.InstantText.parse(p.getText()) : null;
                    if (at == null) {
                        return null;
                    }
                }
                case "mono" -> {
                    if (!isLong(p, value)) {
                        return null;
                    }
                    mono = p.getLongValue();
                }
                case "type" -> {
                    if (value != JsonToken.VALUE_STRING) {
                        return null;
                    }
                    type = p.getText();
                }
                case "task" -> {
                    if (value != JsonToken.VALUE_STRING) {
                        return null;
                    }
                    task = p.getText();
                }
                case "data" -> {
                    data = readData(p, value);
                    if (data == null) {
                        return null;
                    }
                }
                case "prev" -> {
                    if (value != JsonToken.VALUE_STRING) {
                        return null;
                    }
                    prev = p.getText();
                }
                default -> throw new AssertionError(name);
            }
        }
        // every field but task present (the writer leaves out only a null task)
        return token == JsonToken.END_OBJECT && (seen & ALL_BUT_TASK) == ALL_BUT_TASK ? new EventChain.Line(seq, at, mono, type, task, data, prev) : null;
    }

    private static final int ALL_BUT_TASK = 0b0111111; // seq, at, mono, type, data, prev

    /** The field's bit in {@code seen}; 0 for a field the line does not have. */
    private static int bit(String name) {
        return switch (name) {
            case "seq" -> 1;
            case "at" -> 2;
            case "mono" -> 4;
            case "type" -> 8;
            case "data" -> 16;
            case "prev" -> 32;
            case "task" -> 64;
            default -> 0;
        };
    }

    private static boolean isLong(JsonParser p, JsonToken value) throws IOException {
        if (value != JsonToken.VALUE_NUMBER_INT) {
            return false;
        }
        JsonParser.NumberType kind = p.getNumberType();
        return kind == JsonParser.NumberType.INT || kind == JsonParser.NumberType.LONG;
    }

    /** A flat object of text, whole numbers and booleans, as the binding's map would hold it; else null. */
    private static Map<String, Object> readData(JsonParser p, JsonToken value) throws IOException {
        if (value != JsonToken.START_OBJECT) {
            return null;
        }
        String[] keys = new String[8];
        Object[] values = new Object[8];
        int size = 0;
        JsonToken token;
        while ((token = p.nextToken()) == JsonToken.FIELD_NAME) {
            String key = p.currentName();
            Object entry = switch (p.nextToken()) {
                case VALUE_STRING -> p.getText();
                // Integer, Long or BigInteger by size, as the binding's untyped values
                case VALUE_NUMBER_INT -> p.getNumberValue();
                case VALUE_TRUE -> Boolean.TRUE;
                case VALUE_FALSE -> Boolean.FALSE;
                default -> null;
            };
            if (entry == null) {
                return null; // another kind of value: the binding decides
            }
            if (size == keys.length) {
                keys = Arrays.copyOf(keys, size * 2);
                values = Arrays.copyOf(values, size * 2);
            }
            keys[size] = key;
            values[size++] = entry;
        }
        if (token != JsonToken.END_OBJECT) {
            return null;
        }
        EventData sorted = EventData.ofSorted(keys, values, size);
        if (sorted != null) {
            return sorted;
        }
        // keys out of the writer's order: a sorted map, as before
        Map<String, Object> data = new TreeMap<>();
        for (int i = 0; i < size; i++) {
            if (data.put(keys[i], values[i]) != null) {
                return null; // a repeated key: the binding decides
            }
        }
        return data;
    }
}
