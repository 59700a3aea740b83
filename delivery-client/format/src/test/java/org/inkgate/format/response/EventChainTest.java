package org.inkgate.format.response;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.charset.StandardCharsets;
import java.util.List;
import org.inkgate.format.crypto.Sha256;
import org.inkgate.format.refusal.BrokenHashChain;
import org.inkgate.format.refusal.InvalidContent;
import org.inkgate.format.testutil.SampleResponse;
import org.junit.jupiter.api.Test;

class EventChainTest {

    @Test
    void encode_eachLine_carriesTheDigestOfThePreviousLine() {
        byte[] encoded = EventChain.encode(SampleResponse.events(3));
        String[] lines = new String(encoded, StandardCharsets.UTF_8).split("\n");
        assertEquals(3, lines.length);
        assertTrue(lines[0].endsWith("\"prev\":\"" + EventChain.GENESIS + "\"}"), lines[0]);
        assertTrue(lines[1].endsWith("\"prev\":\"" + Sha256.hex(lines[0].getBytes(StandardCharsets.UTF_8)) + "\"}"), lines[1]);
        assertEquals(Sha256.hex(lines[2].getBytes(StandardCharsets.UTF_8)), EventChain.head(encoded));
    }

    @Test
    void decode_encodedEvents_givesThemBack() throws Exception {
        List<ProcessEvent> events = SampleResponse.events(25);
        assertEquals(events, EventChain.decode("f", "events.jsonl", EventChain.encode(events)));
    }

    @Test
    void decode_swappedLines_isRefusedAtTheFirstSwappedLine() {
        String[] lines = new String(EventChain.encode(SampleResponse.events(6)), StandardCharsets.UTF_8).split("\n");
        String keep = lines[2];
        lines[2] = lines[3];
        lines[3] = keep;
        BrokenHashChain refusal = assertThrows(BrokenHashChain.class, () -> EventChain.decode("f", "events.jsonl",
                (String.join("\n", lines) + "\n").getBytes(StandardCharsets.UTF_8)));
        assertEquals(3, refusal.line());
    }

    @Test
    void decode_truncatedLastLine_isRefused() {
        byte[] encoded = EventChain.encode(SampleResponse.events(4));
        byte[] cut = java.util.Arrays.copyOf(encoded, encoded.length - 7);
        assertThrows(InvalidContent.class, () -> EventChain.decode("f", "events.jsonl", cut));
    }

    /**
     * A prev of 64 characters that are not the digest as the writer spells it is judged as the general reader
     * (Jackson's binding) judges the line: the right digest in capitals or the wrong one breaks the chain, a raw
     * control character makes the line malformed JSON, the digest with an escaped digit is read as the digest.
     */
    @Test
    void decode_prevNotAsWritten_isJudgedAsTheBindingJudgesIt() throws Exception {
        String[] lines = new String(EventChain.encode(SampleResponse.events(2)), StandardCharsets.UTF_8).split("\n");
        String digest = Sha256.hex(lines[0].getBytes(StandardCharsets.UTF_8));
        String capitals = digest.toUpperCase(java.util.Locale.ROOT);
        String wrong = Sha256.hex(lines[1].getBytes(StandardCharsets.UTF_8));
        for (String prev : List.of(capitals, wrong, "\u0001" + digest.substring(1))) {
            String changed = lines[1].replace(digest, prev);
            if (!capitals.equals(digest)) {
                assertTrue(!changed.equals(lines[1]));
            }
            byte[] log = (lines[0] + "\n" + changed + "\n").getBytes(StandardCharsets.UTF_8);
            org.inkgate.format.refusal.FormatRefusal refusal = assertThrows(org.inkgate.format.refusal.FormatRefusal.class,
                    () -> EventChain.decode("f", "events.jsonl", log), prev);
            assertEquals(prev.startsWith("\u0001") ? org.inkgate.format.refusal.MalformedJson.class : BrokenHashChain.class,
                    refusal.getClass(), prev);
        }
        String escaped = lines[1].replace("\"prev\":\"" + digest.charAt(0), "\"prev\":\"\\u00" + Integer.toHexString(digest.charAt(0)));
        List<ProcessEvent> read = EventChain.decode("f", "events.jsonl",
                (lines[0] + "\n" + escaped + "\n").getBytes(StandardCharsets.UTF_8));
        assertEquals(2, read.size(), escaped);
    }

    @Test
    void encode_gapInSequence_isRejected() {
        List<ProcessEvent> events = new java.util.ArrayList<>(SampleResponse.events(3));
        events.remove(1);
        assertThrows(IllegalArgumentException.class, () -> EventChain.encode(events));
    }
}
