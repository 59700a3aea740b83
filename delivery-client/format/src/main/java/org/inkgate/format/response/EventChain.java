package org.inkgate.format.response;

import com.fasterxml.jackson.annotation.JsonPropertyOrder;
import java.io.ByteArrayOutputStream;
import java.nio.charset.StandardCharsets;
import java.time.Instant;
import java.security.MessageDigest;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import java.util.Map;
import org.inkgate.format.crypto.Hex;
import org.inkgate.format.crypto.Sha256;
import org.inkgate.format.json.Json;
import org.inkgate.format.refusal.BrokenHashChain;
import org.inkgate.format.refusal.FormatRefusal;
import org.inkgate.format.refusal.InvalidContent;
import org.inkgate.format.refusal.MalformedJson;

/**
 * The events.jsonl encoding: one JSON object per line, each carrying in {@code prev} the
 * SHA-256 (hex) of the previous line's exact bytes; the first line carries 64 zeros. Removing,
 * inserting, reordering or editing a line breaks the chain at that line.
 */
public final class EventChain {

    public static final String GENESIS = "0".repeat(64);

    /** The on-disk shape of one line. */
    @JsonPropertyOrder({"seq", "at", "mono", "type", "task", "data", "prev"})
    record Line(long seq, Instant at, long mono, String type, String task, Map<String, Object> data, String prev) {
    }

    private EventChain() {
    }

    /** Encodes events in order; their seq must run 1, 2, 3... */
    public static byte[] encode(List<ProcessEvent> events) {
        ByteArrayOutputStream out = new ByteArrayOutputStream();
        String prev = GENESIS;
        long expected = 1;
        for (ProcessEvent e : events) {
            if (e.seq() != expected) {
                throw new IllegalArgumentException("event seq " + e.seq() + " where " + expected + " was expected");
            }
            byte[] line = Json.writeLine(new Line(e.seq(), e.at(), e.mono(), e.type(), e.task(), e.data(), prev));
            out.writeBytes(line);
            out.write('\n');
            prev = Sha256.hex(line);
            expected++;
        }
        return out.toByteArray();
    }

    /** The digest the next line would carry; the head of the chain. */
    public static String head(byte[] encoded) {
        String prev = GENESIS;
        for (byte[] line : lines(encoded)) {
            prev = Sha256.hex(line);
        }
        return prev;
    }

    /** Decodes and checks the chain, naming the first line that breaks it. */
    public static List<ProcessEvent> decode(String file, String entry, byte[] encoded) throws FormatRefusal {
        return decodeWithHead(file, entry, encoded).events();
    }

    /**
     * The events of a checked chain, its head (what {@link #head} returns) and where the events' fields lie in the
     * log's bytes, from one pass.
     */
    public record Decoded(List<ProcessEvent> events, String head, EventLines lines) {
    }

    /**
     * Decodes and checks the chain in one pass over the bytes: each line is parsed and hashed where
     * it lies (no copy per line, one digest object), so the collector reads a log once.
     */
    public static Decoded decodeWithHead(String file, String entry, byte[] encoded) throws FormatRefusal {
        if (encoded.length > 0 && encoded[encoded.length - 1] != '\n') {
            throw new InvalidContent(file, "the event log \"" + entry + "\" does not end with a complete line (truncated?)");
        }
        List<ProcessEvent> events = new ArrayList<>();
        // a written line is some 200 bytes: a first guess at the count, grown if short
        EventLines spans = new EventLines(encoded, encoded.length / 160);
        MessageDigest digest = Sha256.newDigest();
        // the previous line's digest as bytes, compared with each line's prev without writing it out as hex
        byte[] prev = new byte[32];
        int number = 0;
        int start = 0;
        EventLineScanner scanner = new EventLineScanner(encoded);
        EventLineReader.Log lines = new EventLineReader.Log(encoded);
        while (start < encoded.length) {
            number++;
            Line parsed = scanner.read(start);
            // the scanner leaves prev's 64 digits as bytes to compare here; if they do not spell the digest, the
            // general reader says what the line holds, and the chain is judged on its reading
            boolean chained = parsed != null && parsed.prev() == null && Hex.spells(encoded, scanner.prevFrom(), prev);
            if (parsed != null && parsed.prev() == null && !chained) {
                parsed = null;
            }
            int end;
            if (parsed != null) {
                end = scanner.lineEnd();
                if (scanner.plain()) {
                    spans.addPlain(scanner.fields());
                } else {
                    spans.addOther();
                }
            } else {
                spans.addOther();
                // not in the writer's exact form: Jackson's streaming parser, and the binding if that cannot say
                end = start;
                while (encoded[end] != '\n') {
                    end++;
                }
                parsed = lines.read(start, end);
                if (parsed == null) {
                    parsed = bind(file, entry, encoded, start, end - start, number);
                }
            }
            if (!chained && !Hex.spells(parsed.prev(), prev)) {
                throw new BrokenHashChain(file, entry, number);
            }
            if (parsed.seq() != number) {
                throw new InvalidContent(file, "the event log \"" + entry + "\" numbers line " + number + " as event " + parsed.seq());
            }
            events.add(new ProcessEvent(parsed.seq(), parsed.at(), parsed.mono(), parsed.type(), parsed.task(), parsed.data()));
            digest.update(encoded, start, end - start);
            try {
                digest.digest(prev, 0, prev.length);
            } catch (java.security.DigestException e) {
                throw new IllegalStateException("SHA-256 gives 32 bytes", e);
            }
            start = end + 1;
        }
        lines.close();
        return new Decoded(events, Hex.of(prev), spans);
    }

    /** One line bound by the mapper: the reference reading, and the one that locates and words refusals. */
    static Line bind(String file, String entry, byte[] encoded, int start, int length, int number) throws MalformedJson {
        try {
            return Json.bind(file, entry, encoded, start, length, Line.class);
        } catch (MalformedJson e) {
            throw new MalformedJson(file, entry, number, e.column(), "line " + number + " is not a valid event", e);
        }
    }

    private static List<byte[]> lines(byte[] encoded) {
        List<byte[]> lines = new ArrayList<>();
        int start = 0;
        for (int i = 0; i < encoded.length; i++) {
            if (encoded[i] == '\n') {
                lines.add(Arrays.copyOfRange(encoded, start, i));
                start = i + 1;
            }
        }
        if (start < encoded.length) {
            lines.add(Arrays.copyOfRange(encoded, start, encoded.length));
        }
        return lines;
    }

    static String utf8(byte[] bytes) {
        return new String(bytes, StandardCharsets.UTF_8);
    }
}
